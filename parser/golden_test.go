package parser

import (
	"bytes"
	"encoding/json"
	"flag"
	"os"
	"path/filepath"
	"testing"

	"github.com/google/go-cmp/cmp"
)

var update = flag.Bool("update", false, "rewrite the golden files in testdata/explain")

// goldenQueries pin the whole JSON contract and the human table for a few
// queries. The files were read and checked by a person; -update rewrites
// them, and the diff must be read again before it is committed.
var goldenQueries = map[string]string{
	"sweater":       "charcoal merino crew sweater size l under $90",
	"lens":          "85 lens",
	"lumber":        "2x6 12 ft",
	"rug":           `24"w x 36"h rug`,
	"exclusions":    "not white -leather sneakers without zip",
	"compatibility": "replacement filter for vt-200 vacuum",
	"tyre":          "225/45 r17 winter tyres",
	"errors":        "1/0 lens \xff under 99999999999999999999 usd",
	"alternatives":  "navy or black shirt size s/m under $40",
}

func TestGolden(t *testing.T) {
	for name, q := range goldenQueries {
		t.Run(name, func(t *testing.T) {
			r := Parse(q)
			var js bytes.Buffer
			b, err := json.Marshal(r)
			if err != nil {
				t.Fatal(err)
			}
			if err := json.Indent(&js, b, "", "  "); err != nil {
				t.Fatal(err)
			}
			js.WriteByte('\n')
			var txt bytes.Buffer
			if err := r.WriteText(&txt, TextStyle{}); err != nil {
				t.Fatal(err)
			}
			for ext, got := range map[string][]byte{".json": js.Bytes(), ".txt": txt.Bytes()} {
				path := filepath.Join("..", "testdata", "explain", name+ext)
				if *update {
					if err := os.MkdirAll(filepath.Dir(path), 0o755); err != nil {
						t.Fatal(err)
					}
					if err := os.WriteFile(path, got, 0o644); err != nil {
						t.Fatal(err)
					}
				}
				want, err := os.ReadFile(path)
				if err != nil {
					t.Fatalf("%v (run go test ./parser -run TestGolden -update)", err)
				}
				if diff := cmp.Diff(string(want), string(got)); diff != "" {
					t.Errorf("%s changed (-golden +now):\n%s", path, diff)
				}
			}
		})
	}
}

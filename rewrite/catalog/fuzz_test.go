package catalog

import (
	"bufio"
	"encoding/json"
	"errors"
	"io"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/google/go-cmp/cmp"
	"github.com/google/go-cmp/cmp/cmpopts"
)

// FuzzReadLine reads a generated catalog line. Its seed corpus holds the
// lines of the test shop and of the error tests. A line either reads to
// a product with an id and a title, which written out as JSON reads back
// the same, or fails with a *LineError on line 1.
func FuzzReadLine(f *testing.F) {
	if fh, err := os.Open(filepath.Join("..", "..", "testdata", "catalog", "shop.jsonl")); err == nil {
		sc := bufio.NewScanner(fh)
		for sc.Scan() {
			f.Add(sc.Text())
		}
		fh.Close()
	}
	for _, s := range []string{`{"id": "a", "title": "x", "sizes": "m"}`, `{"id": "a", "title": "x", "measures": {"length": "long"}}`,
		`{"id": "a", "title": "x", "price": {"amount": "5", "currency": "XYZ"}}`, `{"id": "a", "title": "x", "spec": ["3x5"]}`,
		`{"id": "a", "title": "x", "colour_lab": [150, 1, 1]}`, "not json", "[1, 2]", `{"id": "a", "title": "x", "price": 59}`, `{"id": "a\u001eb", "title": "x"}`} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, line string) {
		if strings.ContainsAny(line, "\n\r") {
			return // one line at a time
		}
		p, err := NewReader(strings.NewReader(line), nil).Next()
		if err != nil {
			var le *LineError
			if errors.Is(err, io.EOF) {
				return
			}
			if !errors.As(err, &le) || le.Line != 1 || le.Msg == "" {
				t.Fatalf("%q: error %v (%T), want a *LineError on line 1", line, err, err)
			}
			return
		}
		if strings.TrimSpace(p.ID) == "" || strings.TrimSpace(p.Title) == "" {
			t.Fatalf("%q: product without an id or a title: %+v", line, p)
		}
		b, err := json.Marshal(p)
		if err != nil {
			t.Fatalf("%q: %v", line, err)
		}
		back, err := NewReader(strings.NewReader(string(b)), nil).Next()
		if err != nil {
			t.Fatalf("%q: written as %s, reads back with %v", line, b, err)
		}
		// An empty list or map is written as none at all.
		if diff := cmp.Diff(p, back, cmpopts.EquateEmpty()); diff != "" {
			t.Fatalf("%q: reads back differently (-first +again):\n%s", line, diff)
		}
	})
}

package signals

import (
	"bytes"
	"errors"
	"strings"
	"testing"

	"github.com/google/go-cmp/cmp"

	"github.com/whittle-search/whittle/rewrite/catalog"
)

// FuzzReadEvent reads a generated line. It must not panic; a line is
// skipped as blank, read as one event, or refused with a *LineError on
// line 1 that renders with the file and line. An event read is written
// by the Writer and reads back the same.
func FuzzReadEvent(f *testing.F) {
	for _, s := range []string{goodSearch, goodClick, "", "   ", "{", "null", "[]", `{"type":"search"}`,
		`{"type":"search","session":"s1","time":"2025-03-14T09:00:00.25+01:00","query":"mustard rain jacket","category":"apparel",` +
			`"relaxations":[{"op":"widen","kind":"colour","text":"mustard"}],"shown":["RJ-1","RJ-2"],` +
			`"explored":{"rank":2,"relaxations":[{"op":"drop","kind":"product_type"}]},"shuffled":true}`,
		`{"type":"add_to_cart","session":"s\u0031","time":"2025-03-14T09:05:00Z","product":"SC-\u00e9\"1"}`,
		`{"type":"click","session":"s1","time":"2025-03-14T09:00:10+24:00","product":"SC-2"}`,
		`{"type":"click","session":"s1","time":"2025-03-14T09:00:10Z","product":"SC-2","shown":[]}`,
		`{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","shown":["SC-1",2]}`,
		`{"type":"search","session":"s1","time":"2025-03-14T09:00:00Z","query":"q","shown":["SC-1"],"explored":{"rank":1.5}}`,
	} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, line string) {
		if strings.ContainsAny(line, "\n") {
			return // one line at a time
		}
		var got []Event
		for e, err := range Read(strings.NewReader(line), "f.jsonl") {
			if err != nil {
				var le *LineError
				if !errors.As(err, &le) || le.Line != 1 || le.File != "f.jsonl" || le.Msg == "" || !strings.HasPrefix(err.Error(), "f.jsonl: line 1: ") {
					t.Fatalf("%q: error %v (%T), want a *LineError on line 1", line, err, err)
				}
				var cle *catalog.LineError
				if !errors.As(err, &cle) {
					t.Fatalf("%q: no catalog.LineError in %v", line, err)
				}
				return
			}
			got = append(got, e)
		}
		if len(got) == 0 {
			if len(bytes.TrimSpace([]byte(line))) != 0 {
				t.Fatalf("%q: no event and no error", line)
			}
			return
		}
		if len(got) != 1 || got[0].Line != 1 {
			t.Fatalf("%q: events %+v", line, got)
		}
		var buf bytes.Buffer
		if err := NewWriter(&buf).Write(got[0]); err != nil {
			t.Fatalf("%q: read as %+v, which the Writer refuses: %v", line, got[0], err)
		}
		var back []Event
		for e, err := range Read(&buf, "f.jsonl") {
			if err != nil {
				t.Fatalf("%q: written as %s, reads back with %v", line, buf.String(), err)
			}
			back = append(back, e)
		}
		if diff := cmp.Diff(got, back); diff != "" {
			t.Fatalf("%q: written as %s, reads back otherwise (-read +back):\n%s", line, buf.String(), diff)
		}
	})
}

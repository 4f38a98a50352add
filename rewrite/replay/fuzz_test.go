package replay

import (
	"encoding/json"
	"errors"
	"strings"
	"testing"
	"unicode/utf8"

	"github.com/whittle-search/whittle/rewrite/catalog"
)

// FuzzReadLog reads a generated log line. A line is skipped as blank,
// read as an entry with a query and a count of at least one (which,
// written as a JSON line, reads back the same when it is valid UTF-8),
// or refused with a
// *catalog.LineError on line 1.
func FuzzReadLog(f *testing.F) {
	for _, s := range append(strings.Split(log, "\n"), `{"query": 5}`, `{"query": "x", "count": 0}`, `{"query": "x"} {"query": "y"}`,
		`{"query": "x", "shopper": "a"}`, `{"count": 3}`, "   ", `{`) {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, line string) {
		if strings.ContainsAny(line, "\n\r") {
			return // one line at a time
		}
		var got []Entry
		for e, err := range Read(strings.NewReader(line)) {
			if err != nil {
				var le *catalog.LineError
				if !errors.As(err, &le) || le.Line != 1 || le.Msg == "" {
					t.Fatalf("%q: error %v (%T), want a *catalog.LineError on line 1", line, err, err)
				}
				return
			}
			got = append(got, e)
		}
		if len(got) == 0 {
			if strings.TrimSpace(line) != "" {
				t.Fatalf("%q: no entry and no error", line)
			}
			return
		}
		e := got[0]
		if len(got) != 1 || e.Line != 1 || strings.TrimSpace(e.Query) == "" || e.Count < 1 {
			t.Fatalf("%q: entries %+v", line, got)
		}
		if !utf8.ValidString(e.Query) {
			return // JSON holds text: invalid bytes come back as U+FFFD
		}
		b, _ := json.Marshal(map[string]any{"query": e.Query, "count": e.Count, "category": e.Category})
		for back, err := range Read(strings.NewReader(string(b))) {
			if err != nil || back.Query != e.Query || back.Count != e.Count || back.Category != e.Category {
				t.Fatalf("%q: written as %s, reads back as %+v, %v", line, b, back, err)
			}
		}
	})
}

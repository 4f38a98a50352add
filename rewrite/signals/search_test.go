package signals

import (
	"encoding/json"
	"fmt"
	"testing"
	"time"

	"github.com/google/go-cmp/cmp"

	"github.com/whittle-search/whittle/rewrite"
)

func TestSearchEvent(t *testing.T) {
	at := time.Date(2026, 3, 4, 10, 0, 0, 0, time.UTC)
	widen := rewrite.ReportRelaxation{Op: "widen", Kind: "colour", Text: "mustard", Detail: "to 1 catalog colours within ΔE00 4 of mustard"}
	drop := rewrite.ReportRelaxation{Op: "drop", Kind: "colour", Text: "mustard", Detail: "dropped"}
	for _, tc := range []struct {
		name, reason string
		rep          rewrite.Report
		want         string
	}{
		{name: "exact", reason: "an exact match has no relaxations, and the log leaves the field out",
			rep: rewrite.Report{Query: "rain jacket", Chosen: rewrite.ReportStep{Relaxations: []rewrite.ReportRelaxation{}, Count: 3},
				Hits: []rewrite.ReportHit{{ID: "RJ-1"}, {ID: "RJ-2"}}},
			want: `{"type":"search","session":"s1","time":"2026-03-04T10:00:00Z","query":"rain jacket","category":"apparel","shown":["RJ-1","RJ-2"]}`},
		{name: "relaxed", reason: "the chosen relaxations are named by op, kind and text, as in chosen.relaxations; the detail is the report's, not the log's",
			rep: rewrite.Report{Query: "mustard rain jacket", Chosen: rewrite.ReportStep{Relaxations: []rewrite.ReportRelaxation{widen}, Count: 1},
				Hits: []rewrite.ReportHit{{ID: "RJ-1"}}},
			want: `{"type":"search","session":"s1","time":"2026-03-04T10:00:00Z","query":"mustard rain jacket","category":"apparel","relaxations":[{"op":"widen","kind":"colour","text":"mustard"}],"shown":["RJ-1"]}`},
		{name: "explored", reason: "the explored hit keeps its place among the shown ids, and the mark says its rank and what its plan added",
			rep: rewrite.Report{Query: "mustard rain jacket", Chosen: rewrite.ReportStep{Relaxations: []rewrite.ReportRelaxation{widen}, Count: 1},
				Hits:     []rewrite.ReportHit{{ID: "RJ-2", Explored: true}, {ID: "RJ-1"}},
				Explored: &rewrite.ReportExplored{Rank: 1, Relaxations: []rewrite.ReportRelaxation{drop}}},
			want: `{"type":"search","session":"s1","time":"2026-03-04T10:00:00Z","query":"mustard rain jacket","category":"apparel","relaxations":[{"op":"widen","kind":"colour","text":"mustard"}],"shown":["RJ-2","RJ-1"],"explored":{"rank":1,"relaxations":[{"op":"drop","kind":"colour","text":"mustard"}]}}`},
		{name: "nothing found", reason: "a search that shows nothing has no shown ids",
			rep:  rewrite.Report{Query: "trail running shoes size 13", Chosen: rewrite.ReportStep{Relaxations: []rewrite.ReportRelaxation{}}, Hits: []rewrite.ReportHit{}},
			want: `{"type":"search","session":"s1","time":"2026-03-04T10:00:00Z","query":"trail running shoes size 13","category":"apparel"}`},
	} {
		t.Run(tc.name, func(t *testing.T) {
			b, err := json.Marshal(SearchEvent("s1", at, "apparel", tc.rep))
			if err != nil {
				t.Fatal(err)
			}
			if d := cmp.Diff(tc.want, string(b)); d != "" {
				t.Errorf("%s (-want +got):\n%s", tc.reason, d)
			}
		})
	}
}

// SearchEvent turns a search's report into the line the signals log
// keeps of it.
func ExampleSearchEvent() {
	rep := rewrite.Report{Query: "striped rain jacket",
		Chosen: rewrite.ReportStep{Relaxations: []rewrite.ReportRelaxation{{Op: "drop", Kind: "pattern", Text: "striped", Detail: "dropped"}}},
		Hits:   []rewrite.ReportHit{{ID: "RJ-1"}, {ID: "RJ-2"}}}
	ev := SearchEvent("b7e1", time.Date(2026, 3, 4, 10, 0, 0, 0, time.UTC), "", rep)
	b, _ := json.Marshal(ev)
	fmt.Println(string(b))
	// Output: {"type":"search","session":"b7e1","time":"2026-03-04T10:00:00Z","query":"striped rain jacket","relaxations":[{"op":"drop","kind":"pattern","text":"striped"}],"shown":["RJ-1","RJ-2"]}
}

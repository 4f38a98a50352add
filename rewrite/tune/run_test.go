package tune

import (
	"context"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite/signals"
)

// Read joins the log before tuning: the click comes before its search in
// the file, and still counts, at rank 2 (worth 2 with η = 1), over the
// 2 products shown.
func TestReadJoinsTheLog(t *testing.T) {
	log := `{"type": "click", "session": "a", "time": "2026-11-02T09:00:30Z", "product": "RJ-2"}
{"type": "search", "session": "a", "time": "2026-11-02T09:00:00Z", "query": "rain jacket", "category": "apparel", "shown": ["RJ-1", "RJ-2"]}
{"type": "click", "session": "a", "time": "2026-11-02T09:00:40Z", "product": "RJ-9"}
`
	tu := handTuner(t, "", nil)
	if err := tu.Read(context.Background(), signals.Read(strings.NewReader(log), "log.jsonl"), signals.JoinOptions{}); err != nil {
		t.Fatal(err)
	}
	r := tu.Report()
	if r.Join.Events != 3 || r.Join.Joined != 1 || r.Join.NotShown != 1 || r.Stats.Searches != 1 {
		t.Errorf("join %+v, stats %+v", r.Join, r.Stats)
	}
	if c := findCategory(r, "apparel"); c == nil || c.Exact.Engagement != 1 {
		t.Errorf("apparel = %+v, want engagement 1 (a click at rank 2 over 2 shown)", c)
	}
	// A malformed line stops the read, with its file and line.
	err := handTuner(t, "", nil).Read(context.Background(), signals.Read(strings.NewReader(log+"{\n"), "log.jsonl"), signals.JoinOptions{})
	if err == nil || !strings.Contains(err.Error(), "log.jsonl: line 4") {
		t.Errorf("malformed line: %v", err)
	}
}

// An explored product is judged with the relaxation that brought it,
// not with the exact matches it was shown among: here a click at rank 2
// (worth 2 with η = 1) on a product shown by dropping the pattern.
func TestExploredProduct(t *testing.T) {
	s := session("A", "apparel", 4, nil, 2)
	s.Searches[0].Search.Explored = &signals.Explored{Rank: 2, Relaxations: []signals.Relaxed{{Op: "drop", Kind: parser.KindPattern, Text: "striped"}}}
	r := add(t, handTuner(t, "", nil), s, session("B", "apparel", 3, nil, 1))
	c := findCategory(r, "apparel")
	// Exact: A's three others (no click) and B's three (a click at 1).
	if c == nil || c.Exact.Shown != 6 || c.Exact.Engagement != 1.0/6 {
		t.Fatalf("exact = %+v, want 6 shown, 1/6", c)
	}
	k := findKind(r, "apparel", parser.KindPattern)
	if k == nil || len(k.Ops) != 1 || k.Ops[0].Shown != 1 || k.Ops[0].Engagement != 2 || r.Stats.Explored != 1 {
		t.Errorf("pattern = %+v, stats %+v", k, r.Stats)
	}
}

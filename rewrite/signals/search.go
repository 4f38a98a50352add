package signals

import (
	"time"

	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
)

// SearchEvent is the search event of a report of `whittle search` (or of
// the rescue endpoint): in session, at t, in category ("" when whittle
// read it from the query), with the relaxations chosen (none for an
// exact match), the ids shown in order, and the explored mark when one
// of them came from a looser plan.
func SearchEvent(session string, t time.Time, category string, rep rewrite.Report) Event {
	ev := Event{Type: Search, Session: session, Time: t, Query: rep.Query, Category: category,
		Relaxations: relaxed(rep.Chosen.Relaxations)}
	for _, h := range rep.Hits {
		ev.Shown = append(ev.Shown, h.ID)
	}
	if x := rep.Explored; x != nil {
		ev.Explored = &Explored{Rank: x.Rank, Relaxations: relaxed(x.Relaxations)}
	}
	return ev
}

// relaxed names the contract's relaxations as the log does; nil for none.
func relaxed(rs []rewrite.ReportRelaxation) []Relaxed {
	var out []Relaxed
	for _, r := range rs {
		out = append(out, Relaxed{Op: r.Op, Kind: parser.Kind(r.Kind), Text: r.Text})
	}
	return out
}

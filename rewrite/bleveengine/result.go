package bleveengine

import (
	"context"

	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
)

// Result is the JSON contract of `whittle search --json`: the report of
// the rescue with its hits, and the blind partial match's when it was
// asked for.
type Result struct {
	rewrite.Report
	Baseline *Baseline `json:"baseline,omitempty"`
	// Outcome is the rescue itself, for callers that print more of it;
	// it is not part of the contract.
	Outcome *rewrite.Outcome `json:"-"`
}

// Rescue rescues a parsed query with rw against e, shows the top k of the
// plan it settles on, and, when baseline is set, runs the blind partial
// match on the query as typed beside it. Everything honours ctx.
func (e *Engine) Rescue(ctx context.Context, rw *rewrite.Rewriter, r *parser.Result, k int, baseline bool) (*Result, error) {
	o, err := rw.RescueParsed(ctx, r)
	if err != nil {
		return nil, err
	}
	var hits []rewrite.ReportHit
	if o.Count > 0 && k > 0 {
		if hits, err = e.Show(ctx, o.Plan, k); err != nil {
			return nil, err
		}
	}
	res := &Result{Report: rewrite.NewReport(o, hits), Outcome: o}
	if baseline {
		if res.Baseline, err = e.Baseline(ctx, o.Query, k); err != nil {
			return nil, err
		}
	}
	return res, nil
}

package bleveengine

import (
	"context"
	"fmt"
	"math/rand/v2"
	"slices"

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

// RescueOptions say what Rescue shows of a rescue.
type RescueOptions struct {
	// K is how many hits to show; 0 shows none.
	K int
	// Baseline runs the blind partial match on the query as typed beside
	// the rescue.
	Baseline bool
	// Fallback is the blind partial match Baseline runs; the zero value
	// is MostWords.
	Fallback Fallback
	// Explore is the chance, from 0 to 1, that one of the hits shown
	// comes from the plan one step looser than the rescue's
	// (rewrite.Rewriter.Loosen): its best product that the rescue's own
	// hits do not hold, at a rank drawn uniformly from 1 to one past the
	// last hit (at most K; the last hit drops off when K are shown). The
	// report marks it (rewrite.Report.Explored). When there is no looser
	// plan, or it finds nothing new, nothing is explored.
	Explore float64
	// Rand draws whether to explore, and the rank; it is needed when
	// Explore is above 0, and is the caller's, so that a seed repeats a
	// run. Rescue uses it from one goroutine at a time only as far as
	// the caller does.
	Rand *rand.Rand
}

// check refuses options Rescue cannot follow.
func (o RescueOptions) check() error {
	switch {
	case !(o.Explore >= 0 && o.Explore <= 1):
		return fmt.Errorf("bleveengine: explore %g: want a chance from 0 to 1", o.Explore)
	case o.Explore > 0 && o.Rand == nil:
		return fmt.Errorf("bleveengine: explore %g needs a source of random numbers", o.Explore)
	case o.K < 0:
		return fmt.Errorf("bleveengine: %d hits: want 0 or more", o.K)
	}
	return o.Fallback.check()
}

// Rescue rescues a parsed query with rw against e and shows the top
// opts.K of the plan it settles on; with opts.Explore, one of them may
// come from a plan one step looser; with opts.Baseline, it runs the
// blind partial match opts.Fallback on the query as typed beside it.
// Everything honours ctx; a deadline that passes while exploring leaves the hits
// as the rescue found them. A query with nothing to search for is
// refused with the rewriter's *rewrite.RefusedError (errors.Is
// rewrite.ErrNothingToSearch): nothing is counted or shown.
func (e *Engine) Rescue(ctx context.Context, rw *rewrite.Rewriter, r *parser.Result, opts RescueOptions) (*Result, error) {
	if err := opts.check(); err != nil {
		return nil, err
	}
	o, err := rw.RescueParsed(ctx, r)
	if err != nil {
		return nil, err
	}
	var hits []rewrite.ReportHit
	if o.Count > 0 && opts.K > 0 {
		if hits, err = e.Show(ctx, o.Plan, opts.K); err != nil {
			return nil, err
		}
	}
	res := &Result{Report: rewrite.NewReport(o, hits), Outcome: o}
	if err := e.explore(ctx, rw, res, opts); err != nil && ctx.Err() == nil {
		return nil, err
	}
	if opts.Baseline {
		if res.Baseline, err = e.Baseline(ctx, opts.Fallback, o.Query, opts.K); err != nil {
			return nil, err
		}
	}
	return res, nil
}

// explore draws, with chance opts.Explore, whether to show a product of
// the plan one step looser than the rescue's, and if so puts the best
// one not shown yet at a rank drawn uniformly among the places open.
func (e *Engine) explore(ctx context.Context, rw *rewrite.Rewriter, res *Result, opts RescueOptions) error {
	if opts.K < 1 || opts.Explore <= 0 || opts.Rand.Float64() >= opts.Explore {
		return nil
	}
	l, err := rw.Loosen(ctx, res.Outcome)
	if err != nil || l == nil {
		return err
	}
	shown := res.Hits
	more, err := e.Show(ctx, l.Plan, len(shown)+1)
	if err != nil {
		return err
	}
	for _, h := range more {
		if !slices.ContainsFunc(shown, func(s Shown) bool { return s.ID == h.ID }) {
			rank := 1 + opts.Rand.IntN(min(len(shown)+1, opts.K))
			res.AddExplored(h, rank, opts.K, l.Added)
			return nil
		}
	}
	return nil
}

package rewrite

import (
	"context"
	"slices"
)

// settled is the search an outcome settled on: the constraints with
// their ladders, the state chosen, and the misspelt product type fixed
// before planning, if any. laddered says whether the ladders go below
// the exact states (a query that found enough as typed never built them).
type settled struct {
	items    []*item
	state    []int
	fix      *Relaxation
	laddered bool
}

// Loosening is a plan one step looser than an outcome's: one more
// constraint one level further down its ladder.
type Loosening struct {
	// Plan is the looser plan, for the engine's Search.
	Plan Plan `json:"plan"`
	// Relaxations are all the changes in Plan, as in Outcome.Relaxations.
	Relaxations []Relaxation `json:"relaxations"`
	// Added is the change Plan makes on top of the outcome's: a new
	// relaxation, or the next one down the ladder of a constraint already
	// relaxed (a colour widened, then dropped).
	Added []Relaxation `json:"added"`
	// Cost is the planner's cost of Plan, as in Step.Cost.
	Cost float64 `json:"cost"`
}

// Loosen returns the cheapest plan one step looser than o's, which rw
// (or a rewriter Tuned from it) returned: o's plan with one more
// constraint one level further down the ladder the planner built for it,
// priced as the planner prices its own steps, cheapest first, ties to
// the earlier constraint. For an exact match it is the cheapest single
// relaxation of the query. It counts nothing, so the looser plan may
// find nothing new; a plan that matches what o's does is passed over.
//
// The ladders are the planner's own, so the policy holds as it does in
// a rescue: hard constraints and exclusions are never relaxed, and the
// head product type is widened but never dropped. Loosen returns nil
// when no constraint can step further, when o's plan keeps only the hard
// constraints (a hard stop), when o shows available products like
// unavailable ones, and for an outcome read back from JSON. It returns
// ctx's error if ctx ends while it reads what the catalog carries.
func (rw *Rewriter) Loosen(ctx context.Context, o *Outcome) (*Loosening, error) {
	st := o.settled
	if st == nil {
		return nil, nil
	}
	items := st.items
	if !st.laddered {
		var err error
		if items, err = rw.laddered(ctx, items, o.Policy); err != nil {
			return nil, err
		}
		if err := ctx.Err(); err != nil {
			return nil, err
		}
	}
	s := &search{items: items, fix: st.fix}
	current := s.plan(st.state).Key()
	var best []int
	bestCost := 0.0
	for _, next := range s.looser(st.state) {
		if s.plan(next).Key() == current {
			continue
		}
		if c := s.cost(next); best == nil || c < bestCost {
			best, bestCost = next, c
		}
	}
	if best == nil {
		return nil, nil
	}
	l := &Loosening{Plan: s.plan(best), Relaxations: s.relaxationsOf(best), Cost: bestCost}
	for i, it := range items {
		if best[i] != st.state[i] {
			l.Added = append(l.Added, *it.levels[best[i]].relax)
		}
	}
	return l, nil
}

// laddered is a copy of items, each with its exact state and the states
// the policy allows below it; items are left as they are, so that an
// outcome may be loosened from several goroutines.
func (rw *Rewriter) laddered(ctx context.Context, items []*item, e Effective) ([]*item, error) {
	out := make([]*item, len(items))
	for i, it := range items {
		c := *it
		c.levels = slices.Clone(it.levels[:1])
		out[i] = &c
	}
	if err := rw.addRelaxations(ctx, out, e); err != nil {
		return nil, err
	}
	return out, nil
}

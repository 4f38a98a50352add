package rewrite

import (
	"context"
	"fmt"
	"math"
	"strings"

	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/parser"
)

// alternatives handles a plan whose every match is unavailable: it finds
// available products like the best of them (the same product type; then
// the catalog colours near its colour, its measures within the
// tolerance, and what it is compatible with, giving these up in that
// order of importance, least first) and makes them the outcome. The
// query's hard constraints and exclusions hold for the alternatives too
// (a size, a thread, a wire gauge is not swapped for another because the
// one asked for is out of stock), except a part number, which names the
// very product that is unavailable. It reports whether it did.
func (rw *Rewriter) alternatives(ctx context.Context, s *search, p Plan) bool {
	desc, ok := rw.engine.(Describer)
	if !ok {
		return false
	}
	avail := Plan{Clauses: append(append([]Clause(nil), p.Clauses...), Clause{Field: FieldInStock, Values: []string{"true"}, From: -1})}
	if n, err := s.countPlan(avail, nil, "available products only"); err != nil || n > 0 {
		return false
	}
	hits, err := rw.engine.Search(ctx, p, 1)
	if err != nil || len(hits) == 0 {
		s.fail(err)
		return false
	}
	f, err := desc.Describe(ctx, hits[0].ID)
	if err != nil || f.ProductType == "" {
		s.fail(err)
		return false
	}
	stock := Clause{Field: FieldInStock, Values: []string{"true"}, From: -1}
	kept := keptForAlternatives(s.out.Parsed, p)
	// Its designations, and the hard measures a substitute for could
	// hurt someone (a breaker's current, a bolt's diameter), hold for
	// every alternative, exactly: an unavailable 20 A breaker or 205/55R16
	// tyre is no reason to show another rating or size.
	pol := rw.policy.For(f.Category, f.ProductType, rw.lex)
	for _, sys := range sortedKeys(f.Spec) {
		kept = append(kept, Clause{Field: "spec", Dimension: sys, Values: []string{f.Spec[sys]}, From: -1})
	}
	kind := Clause{Field: "product_type", Values: []string{f.ProductType}, From: -1}
	var near *Clause
	pal, err := rw.palette(ctx)
	s.fail(err)
	if pal != nil && f.Lab != nil {
		var names []string
		for _, m := range pal.Within(colour.Lab{L: f.Lab[0], A: f.Lab[1], B: f.Lab[2]}, s.out.Policy.ColourTolerance) {
			names = append(names, m.Name)
		}
		if len(names) > 0 {
			near = &Clause{Field: "colour", Values: names, From: -1}
		}
	}
	var compat *Clause
	if len(f.Compat) > 0 {
		compat = &Clause{Field: "compatibility", Values: f.Compat, From: -1}
	}
	// Its measures, within the policy's tolerance (at least ±10%).
	var sized []Clause
	tol := math.Max(s.out.Policy.MeasureTolerance, 0.10)
	for _, dim := range sortedKeys(f.Measures) {
		v := f.Measures[dim]
		if pol.substituteHurts(dim) {
			exact := v
			kept = append(kept, Clause{Field: "measure", Dimension: dim, Min: &exact, Max: &exact, From: -1})
			continue
		}
		lo, hi := v*(1-tol), v*(1+tol)
		sized = append(sized, Clause{Field: "measure", Dimension: dim, Min: &lo, Max: &hi, From: -1})
	}
	fit := "fitting " + strings.Join(f.Compat, ", ")
	type try struct {
		clauses []*Clause
		sized   bool
		like    []string
	}
	tries := []try{
		{[]*Clause{near, compat}, true, []string{"near its colour", "of about its size", fit}},
		{[]*Clause{near}, true, []string{"near its colour", "of about its size"}},
		{[]*Clause{compat}, true, []string{"of about its size", fit}},
		{[]*Clause{near, compat}, false, []string{"near its colour", fit}},
		{[]*Clause{compat}, false, []string{fit}},
		{[]*Clause{near}, false, []string{"near its colour"}},
		{nil, true, []string{"of about its size"}},
		{nil, false, nil},
	}
	for _, t := range tries {
		if t.sized && len(sized) == 0 {
			continue
		}
		plan := Plan{Clauses: append([]Clause{kind, stock}, kept...)}
		skip := false
		for _, c := range t.clauses {
			if c == nil {
				skip = true
				break
			}
			plan.Clauses = append(plan.Clauses, *c)
		}
		if skip {
			continue
		}
		if t.sized {
			plan.Clauses = append(plan.Clauses, sized...)
		}
		n, err := s.countPlan(plan, nil, "available alternatives")
		if err != nil {
			return false
		}
		if n == 0 {
			continue
		}
		what := strings.TrimSpace(s.out.Query)
		msg := fmt.Sprintf("“%s” is unavailable. Showing available %s like it", what, plural(f.ProductType))
		if len(t.like) > 0 {
			msg += ": " + strings.Join(t.like, ", ")
		}
		s.out.Message = msg + "."
		s.out.Plan, s.out.Count, s.out.Exact = plan, n, false
		s.out.Unavailable = []string{hits[0].ID}
		return true
	}
	return false
}

// keptForAlternatives are the clauses of p that alternatives must keep:
// those of hard constraints, but for part numbers, and exclusions.
func keptForAlternatives(r *parser.Result, p Plan) []Clause {
	var out []Clause
	for _, c := range p.Clauses {
		if c.From < 0 || c.From >= len(r.Constraints) {
			continue
		}
		pc := r.Constraints[c.From]
		if c.Excluded || pc.Strictness == parser.Hard && pc.Kind != parser.KindPartNumber {
			out = append(out, c)
		}
	}
	return out
}

package rewrite

import (
	"context"
	"fmt"
	"strings"

	"github.com/whittle-search/whittle/lexicon/colour"
)

// alternatives handles a plan whose every match is unavailable: it finds
// available products like the best of them (same product type, then the
// catalog colours near its colour, then shared compatibility) and makes
// them the outcome. It reports whether it did.
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
		return false
	}
	f, err := desc.Describe(ctx, hits[0].ID)
	if err != nil || f.ProductType == "" {
		return false
	}
	stock := Clause{Field: FieldInStock, Values: []string{"true"}, From: -1}
	kind := Clause{Field: "product_type", Values: []string{f.ProductType}, From: -1}
	var near *Clause
	if pal := rw.palette(ctx); pal != nil && f.Lab != nil {
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
	type try struct {
		clauses []*Clause
		like    []string
	}
	tries := []try{
		{[]*Clause{near, compat}, []string{"near its colour", "fitting " + strings.Join(f.Compat, ", ")}},
		{[]*Clause{compat}, []string{"fitting " + strings.Join(f.Compat, ", ")}},
		{[]*Clause{near}, []string{"near its colour"}},
		{nil, nil},
	}
	for _, t := range tries {
		plan := Plan{Clauses: []Clause{kind, stock}}
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

package rewrite

import (
	"context"
	"errors"
	"slices"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/parser"
)

// FuzzParsePolicy reads generated policy files. Its seed corpus is the
// embedded policy and the error cases of the tests. A file either reads,
// and then gives an effective policy in range for every category, or
// fails with errors that name a line of the file (or none, for the
// file as a whole) and render with the message.
func FuzzParsePolicy(f *testing.F) {
	f.Add(defaultPolicy)
	for _, s := range []string{"[defaults\nmin_results = 1\n", "[defaults]\nmin_results = \"one\"\n", "[defaults.strictness]\nsize = \"strict\"\n",
		"[category.aparel]\nmin_results = 2\n", "[category.lumber.standard_sizes]\nlength = [\"8 ft\", \"ten\"]\n",
		"[product_type.\"chelsea boot\"]\ncolour_tolerance = 3\n[product_type.\"chelsea boot\".dimensions]\nlength = \"soft\"\n"} {
		f.Add(s)
	}
	lex := lexicon.Default()
	f.Fuzz(func(t *testing.T, text string) {
		p, err := ParsePolicy("f.toml", text, lex)
		lines := strings.Count(text, "\n") + 1
		if err != nil {
			errs := []error{err}
			if j, ok := err.(interface{ Unwrap() []error }); ok {
				errs = j.Unwrap()
			}
			for _, e := range errs {
				var pe *PolicyError
				if !errors.As(e, &pe) {
					t.Fatalf("%q: error %v (%T) is not a *PolicyError", text, e, e)
				}
				if pe.Line < 0 || pe.Line > lines || pe.Column < 0 || pe.Msg == "" {
					t.Fatalf("%q: error at line %d column %d of %d lines: %q", text, pe.Line, pe.Column, lines, pe.Msg)
				}
				if r := pe.Render(); !strings.Contains(r, pe.Msg) {
					t.Fatalf("%q: %q renders as %q", text, pe.Msg, r)
				}
			}
			return
		}
		for _, c := range append([]string{""}, lexicon.Categories()...) {
			e := p.For(c, "", lex)
			if e.MinResults < 1 || e.ColourTolerance < 0 || e.MeasureTolerance < 0 || e.MeasureTolerance > 1 || e.PriceStretch < 0 {
				t.Fatalf("%q: category %q gives %+v", text, c, e)
			}
		}
	})
}

// FuzzRescue rescues generated queries against the invented shop of
// memengine_test.go. Whatever the query, a rescue either is refused or
// returns an outcome that counts no more than the budget, keeps every
// hard constraint in its plan and relaxes none, says something to the
// shopper when it relaxed anything, and finds what it says it found.
func FuzzRescue(f *testing.F) {
	for _, q := range []string{"merino crew sweater oatmeal", "velvet throw pillow cover 18x18 mustard", "m6 x 20 screw",
		"type c charger", "bra 32a", "uk 8 1/2 boots", "50mm 1.8 lens", "cat6 cable 25 ft white", "-red -blue jacket", "zorblax",
		"trail running shoes size 13 or 12", "navy or black rain jacket", "not red or blue sweater", "mens and womens boots"} {
		f.Add(q, uint8(DefaultBudget))
	}
	f.Fuzz(func(t *testing.T, q string, budget uint8) {
		eng := &memEngine{products: shop}
		o, err := New(eng, nil, WithBudget(int(budget))).Rescue(context.Background(), q)
		if err != nil {
			if !errors.Is(err, ErrNothingToSearch) && !strings.Contains(err.Error(), "budget allows no count") {
				t.Fatalf("%q: %v", q, err)
			}
			return
		}
		if n := len(eng.counted); n > max(1, int(budget)) {
			t.Fatalf("%q: %d counts for a budget of %d", q, n, budget)
		}
		if o.Message == "" && !o.Exact {
			t.Fatalf("%q: rescued with no message", q)
		}
		for _, r := range o.Relaxations {
			if o.Parsed.Constraints[r.Constraint].Strictness == parser.Hard {
				t.Fatalf("%q: relaxed hard %q", q, r.Text)
			}
		}
		for i, c := range o.Parsed.Constraints {
			// An alternative is kept by its group's clause, which comes
			// from the first of the group.
			first := o.Parsed.Alternatives(i)[0]
			if c.Strictness == parser.Hard && !slices.ContainsFunc(o.Plan.Clauses, func(cl Clause) bool { return cl.From == first }) {
				t.Fatalf("%q: hard %q is not in the plan", q, c.Text)
			}
		}
		if n, _ := (&memEngine{products: shop}).Count(context.Background(), o.Plan); n != o.Count {
			t.Fatalf("%q: the outcome says %d found, its plan finds %d", q, o.Count, n)
		}
	})
}

package rewrite_test

import (
	"context"
	"errors"
	"fmt"
	"os"
	"slices"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
)

func ExampleRelaxOrder() {
	for _, c := range rewrite.RelaxOrder(parser.Parse("red wool scarf size m")) {
		fmt.Println(c.Strictness, c.Text)
	}
	// Output:
	// soft wool
	// firm scarf
	// firm red
}

func ExampleDefaultPolicy() {
	e := rewrite.DefaultPolicy().For("camera", "lens", lexicon.Default())
	fmt.Println(e.Dimensions["focal_length"], e.Strictness[parser.KindColour], e.ColourTolerance)
	// Output: hard firm 10
}

func ExampleParsePolicy() {
	_, err := rewrite.ParsePolicy("shop.toml", "[category.aparel]\ncolour_tolerance = 3\n", lexicon.Default())
	fmt.Println(err)
	// Output: shop.toml:1:1: unknown category "aparel"; did you mean "apparel"?
}

func ExamplePolicy_Apply() {
	r := parser.Parse("sage paint")
	rewrite.DefaultPolicy().Apply(r, lexicon.Default())
	fmt.Println(r.Constraints[0].Text, r.Constraints[0].Strictness)
	// Output: sage hard
}

func ExamplePolicyError_Render() {
	_, err := rewrite.ParsePolicy("shop.toml", "[defaults]\ncolour_tolerence = 4\n", lexicon.Default())
	var pe *rewrite.PolicyError
	if errors.As(err, &pe) {
		fmt.Println(pe.Render())
	}
	// Output:
	// shop.toml:2:1:
	// colour_tolerence = 4
	// ^
	// unknown key "defaults.colour_tolerence"; did you mean "colour_tolerance"?
}

// shopEngine is a tiny in-memory engine for the example: products by
// type and colour.
type shopEngine []struct{ kind, colour string }

func (s shopEngine) Count(_ context.Context, p rewrite.Plan) (int, error) {
	n := 0
	for _, pr := range s {
		ok := true
		for _, c := range p.Clauses {
			v := map[string]string{"product_type": pr.kind, "colour": pr.colour}[c.Field]
			if slices.Contains(c.Values, v) == c.Excluded {
				ok = false
			}
		}
		if ok {
			n++
		}
	}
	return n, nil
}

func (s shopEngine) Search(context.Context, rewrite.Plan, int) ([]rewrite.Hit, error) {
	return nil, nil
}

func ExampleRewriter_Rescue() {
	eng := shopEngine{{"rain jacket", "ember"}, {"rain jacket", "morning fog"}}
	rw := rewrite.New(eng, nil)
	out, err := rw.Rescue(context.Background(), "mustard rain jacket")
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(out.Count, out.Message)
	// Output: 2 No exact match for “mustard rain jacket”. Showing rain jackets in any colour.
}

func ExampleRewriter_Parse() {
	eng := shopEngine{{"rain jacket", "red"}}
	rw := rewrite.New(eng, nil)
	r := rw.Parse("red rain jacket")
	for _, c := range r.Constraints {
		fmt.Println(c.Kind, c.Name)
	}
	out, _ := rw.RescueParsed(context.Background(), r)
	fmt.Println(out.Exact, out.Count)
	// Output:
	// colour red
	// product_type rain jacket
	// true 1
}

// A misspelt product type is fixed and the query read again; the spans
// still point into the query as typed.
func ExampleOutcome_Corrected() {
	eng := shopEngine{{"ceiling fan", "white"}, {"fan", "white"}}
	out, err := rewrite.New(eng, nil).Rescue(context.Background(), "ceeiling fan")
	if err != nil {
		fmt.Println(err)
		return
	}
	head := out.Parsed.Constraints[0]
	fmt.Println(out.Corrected, "|", head.Name, "|", head.Text)
	fmt.Println(out.Count, out.Message)
	// Output:
	// ceiling fan | ceiling fan | ceeiling fan
	// 1 No exact match for “ceeiling fan”. Showing ceiling fans, reading “ceeiling” as “ceiling”.
}

// Read is the reading `whittle explain` shows: the query parsed and the
// policy's strictness applied (the README's table of "85 lens": focal
// length is hard in camera).
func ExamplePolicy_Read() {
	r := rewrite.DefaultPolicy().Read("85 lens", parser.Options{})
	for _, c := range r.Constraints {
		fmt.Println(c.Kind, c.Text, c.Strictness)
	}
	// Output:
	// measure 85 hard
	// product_type lens firm
}

// A tuning changes a policy's numbers at every level, here apparel's
// colour tolerance of 4, and leaves its strictness alone.
func ExamplePolicy_Tuned() {
	tol := 1.5
	p := rewrite.DefaultPolicy().Tuned(rewrite.Tuning{ColourTolerance: &tol})
	e := p.For("apparel", "", lexicon.Default())
	fmt.Println(e.ColourTolerance, e.Strictness[parser.KindSize])
	// Output: 1.5 hard
}

// Check refuses a tuning a policy file could not hold.
func ExampleTuning_Check() {
	none := 0
	fmt.Println(rewrite.Tuning{MinResults: &none}.Check())
	// Output: min_results 0: want 1 to 10000
}

// Tuned gives one request its own numbers: with a minimum of 2, the one
// red rain jacket is no longer enough as typed.
func ExampleRewriter_Tuned() {
	eng := shopEngine{{"rain jacket", "red"}}
	rw := rewrite.New(eng, nil)
	two := 2
	typed, _ := rw.Rescue(context.Background(), "red rain jacket")
	tuned, _ := rw.Tuned(rewrite.Tuning{MinResults: &two}).Rescue(context.Background(), "red rain jacket")
	fmt.Println(typed.Exact, tuned.Exact)
	// Output: true false
}

func ExampleRewriter_ParseIn() {
	rw := rewrite.New(shopEngine{{"rain jacket", "red"}}, nil)
	fmt.Println(rw.ParseIn("red", "apparel").Category, rw.ParseIn("red rain jacket", "home").Category)
	// Output: apparel apparel
}

func ExamplePolicy_WriteTOML() {
	p, err := rewrite.ParsePolicy("shop.toml", "[category.apparel]\ncolour_tolerance = 8\n\n[category.apparel.strictness]\nsize = \"hard\"\n", lexicon.Default())
	if err != nil {
		panic(err)
	}
	p.WriteTOML(os.Stdout)
	// Output:
	// [category.apparel]
	// colour_tolerance = 8.0
	//
	// [category.apparel.strictness]
	// size = "hard"
}

func ExamplePolicy_Signals() {
	s := rewrite.DefaultPolicy().Signals()
	fmt.Println(s.Weights["purchase"], s.JoinWindow, s.KeepShare)
	// Output: 10 30m0s 0.8
}

// Loosen gives the cheapest plan one step looser than a rescue's: here
// the query matched as typed, and the head is widened to its parent
// type. A paint's colour is hard, and paint has no parent type, so
// "sage paint" has no looser plan.
func ExampleRewriter_Loosen() {
	rw := rewrite.New(shopEngine{{"rain jacket", "ember"}, {"paint", "sage"}}, nil)
	for _, q := range []string{"ember rain jacket", "sage paint"} {
		out, err := rw.Rescue(context.Background(), q)
		if err != nil {
			fmt.Println(err)
			return
		}
		l, err := rw.Loosen(context.Background(), out)
		if err != nil {
			fmt.Println(err)
			return
		}
		if l == nil {
			fmt.Printf("%s: no looser plan\n", q)
			continue
		}
		for _, r := range l.Added {
			fmt.Printf("%s: %s %s %q %s\n", q, r.Operator, r.Kind, r.Text, r.Detail)
		}
	}
	// Output:
	// ember rain jacket: widen product_type "rain jacket" to the broader type jacket
	// sage paint: no looser plan
}

// AddExplored puts a product from a looser plan among the hits: here at
// rank 2 of at most 3, so the last hit drops off.
func ExampleReport_AddExplored() {
	rep := rewrite.Report{Hits: []rewrite.ReportHit{{ID: "RJ-1"}, {ID: "RJ-2"}, {ID: "RJ-3"}}}
	rep.AddExplored(rewrite.ReportHit{ID: "RJ-9"}, 2, 3, []rewrite.Relaxation{{Text: "mustard", Kind: parser.KindColour, Operator: rewrite.OpDrop, Detail: "dropped"}})
	for _, h := range rep.Hits {
		fmt.Println(h.ID, h.Explored)
	}
	fmt.Println(rep.Explored.Rank, rep.Explored.Relaxations[0].Op, rep.Explored.Relaxations[0].Text)
	// Output:
	// RJ-1 false
	// RJ-9 true
	// RJ-2 false
	// 2 drop mustard
}

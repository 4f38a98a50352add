package rewrite_test

import (
	"context"
	"errors"
	"fmt"
	"os"
	"path/filepath"
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
	// Read in apparel, the m of "navy m" is a letter size.
	for _, c := range rw.ParseIn("navy m", "apparel").Constraints {
		fmt.Println(c.Kind, c.Value())
	}
	// Output:
	// apparel apparel
	// colour navy
	// size m (letter)
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
	fmt.Println(s.Weights.Purchase, s.JoinWindow, s.KeepShare)
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

// New makes a rewriter that asks an engine and follows a policy. The
// example's engine knows no sizes, so a size clause matches nothing.
// The built-in policy (nil) holds a size hard in apparel, so "rain
// jacket size m" is not relaxed and says what is missing; a shop's
// policy that makes the size soft lets the rescue drop it.
func ExampleNew() {
	eng := shopEngine{{"rain jacket", "ember"}, {"rain jacket", "morning fog"}}
	soft, err := rewrite.ParsePolicy("shop.toml", "[category.apparel.strictness]\nsize = \"soft\"\n", lexicon.Default())
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, p := range []*rewrite.Policy{nil, soft} {
		out, err := rewrite.New(eng, p).Rescue(context.Background(), "rain jacket size m")
		if err != nil {
			fmt.Println(err)
			return
		}
		fmt.Println(out.Count, out.Message)
		for _, r := range out.Relaxations {
			fmt.Println(" ", r.Operator, r.Kind, r.Text)
		}
	}
	// Output:
	// 0 No results for “rain jacket size m”. size m is not carried in rain jackets.
	// 2 No exact match for “rain jacket size m”. Showing rain jackets in any size.
	//   drop size size m
}

// WithBudget bounds the engine counts of one rescue. With a budget of
// one, only the query as typed is counted, and it finds nothing; the
// default budget counts the query, the hard constraints alone (none
// here, so every product) and each constraint alone, and drops the
// colour that matches nothing.
func ExampleWithBudget() {
	eng := shopEngine{{"rain jacket", "ember"}, {"rain jacket", "morning fog"}}
	for _, n := range []int{1, rewrite.DefaultBudget} {
		out, err := rewrite.New(eng, nil, rewrite.WithBudget(n)).Rescue(context.Background(), "mustard rain jacket")
		if err != nil {
			fmt.Println(err)
			return
		}
		fmt.Printf("budget %d: %d counted, %d found. %s\n", n, len(out.Steps), out.Count, out.Note)
	}
	// Output:
	// budget 1: 1 counted, 0 found. the budget of 1 engine counts ran out; showing the best plan found so far
	// budget 24: 4 counted, 2 found.
}

// WithParseOptions sets how the rewriter reads queries: here a shop in
// Canada, where a bare "$" means Canadian dollars. Amounts are written
// to the currency's minor unit.
func ExampleWithParseOptions() {
	eng := shopEngine{{"rain jacket", "ember"}}
	for _, rw := range []*rewrite.Rewriter{
		rewrite.New(eng, nil),
		rewrite.New(eng, nil, rewrite.WithParseOptions(parser.Options{Currency: "CAD"})),
	} {
		pr := rw.Parse("rain jacket under $60").Of(parser.KindPrice)[0].Price
		fmt.Println(*pr.Max, pr.Currency)
	}
	// Output:
	// 60.00 USD
	// 60.00 CAD
}

// RescueParsed rescues a query the caller has read and adjusted: here
// the shopper asked for that colour only, so the colour is made hard
// before the rescue, and the rescue, which would otherwise show rain
// jackets in any colour (see Rescue), keeps it and says it is missing.
func ExampleRewriter_RescueParsed() {
	eng := shopEngine{{"rain jacket", "ember"}, {"rain jacket", "morning fog"}}
	rw := rewrite.New(eng, nil)
	r := rw.Parse("mustard rain jacket")
	for i, c := range r.Constraints {
		if c.Kind == parser.KindColour {
			r.Constraints[i].Strictness = parser.Hard
		}
	}
	out, err := rw.RescueParsed(context.Background(), r)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(out.Count, out.Message)
	// Output: 0 No results for “mustard rain jacket”. mustard is not carried in rain jackets.
}

// LoadPolicy reads a shop's policy file over the built-in policy: the
// file's apparel colour tolerance holds, home keeps its built-in 6, and
// a purchase weighed below an add to cart earns a warning.
func ExampleLoadPolicy() {
	tmp, err := os.MkdirTemp("", "whittle-example")
	if err != nil {
		fmt.Println(err)
		return
	}
	defer os.RemoveAll(tmp)
	path := filepath.Join(tmp, "shop.toml")
	file := "[category.apparel]\ncolour_tolerance = 8.0\n\n[signals.weights]\npurchase = 0.5\n"
	if err := os.WriteFile(path, []byte(file), 0o644); err != nil {
		fmt.Println(err)
		return
	}
	p, err := rewrite.LoadPolicy(path, lexicon.Default())
	if err != nil {
		fmt.Println(err)
		return
	}
	lex := lexicon.Default()
	fmt.Println(p.For("apparel", "", lex).ColourTolerance, p.For("home", "", lex).ColourTolerance)
	fmt.Println(p.Warnings)
	// Output:
	// 8 6
	// [signals.weights: purchase (0.5) is worth less than add_to_cart (3); tune then prizes the cheaper signal]
}

// Overlay lays one policy over another level by level: a file that sets
// only apparel's colour tolerance has, alone, no measure tolerance or
// price stretch; laid over the built-in policy, it keeps their 0.1 and
// 0.15.
func ExamplePolicy_Overlay() {
	lex := lexicon.Default()
	user, err := rewrite.ParsePolicy("shop.toml", "[category.apparel]\ncolour_tolerance = 8.0\n", lex)
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, p := range []*rewrite.Policy{user, rewrite.DefaultPolicy().Overlay(user)} {
		e := p.For("apparel", "", lex)
		fmt.Println(e.ColourTolerance, e.MeasureTolerance, e.PriceStretch)
	}
	// Output:
	// 8 0 0
	// 8 0.1 0.15
}

// For settles the policy for a category and a product type: the
// defaults' colour tolerance of 5, apparel's 4, then jacket's 3, which
// a rain jacket, a kind of jacket, inherits; the minimum of 5 results
// is the rain jacket's own.
func ExamplePolicy_For() {
	lex := lexicon.Default()
	user, err := rewrite.ParsePolicy("shop.toml", "[product_type.jacket]\ncolour_tolerance = 3.0\n\n[product_type.\"rain jacket\"]\nmin_results = 5\n", lex)
	if err != nil {
		fmt.Println(err)
		return
	}
	p := rewrite.DefaultPolicy().Overlay(user)
	for _, t := range []struct{ category, productType string }{{"", ""}, {"apparel", ""}, {"apparel", "jacket"}, {"apparel", "rain jacket"}} {
		e := p.For(t.category, t.productType, lex)
		fmt.Printf("%q %q: colour tolerance %g, min results %d\n", t.category, t.productType, e.ColourTolerance, e.MinResults)
	}
	// Output:
	// "" "": colour tolerance 5, min results 1
	// "apparel" "": colour tolerance 4, min results 1
	// "apparel" "jacket": colour tolerance 3, min results 1
	// "apparel" "rain jacket": colour tolerance 3, min results 5
}

// StrictnessOf gives each constraint its strictness in apparel: the
// material soft, the product type firm, the size hard, and a quoted
// phrase, soft as a keyword by the policy, stays as hard as the quotes
// made it.
func ExampleEffective_StrictnessOf() {
	e := rewrite.DefaultPolicy().For("apparel", "sweater", lexicon.Default())
	for _, c := range parser.Parse(`merino sweater "machine washable" size m`).Constraints {
		fmt.Println(c.Kind, e.StrictnessOf(c))
	}
	// Output:
	// material soft
	// product_type firm
	// keyword hard
	// size hard
}

// Key tells plans apart by what they match: the order of the clauses
// does not change it; excluding a clause does, and so does a price's
// currency.
func ExamplePlan_Key() {
	jacket := rewrite.Clause{Field: "product_type", Values: []string{"rain jacket"}}
	large := rewrite.Clause{Field: "size", Values: []string{"l"}}
	notEmber := rewrite.Clause{Field: "colour", Values: []string{"ember"}, Excluded: true}
	a := rewrite.Plan{Clauses: []rewrite.Clause{jacket, large}}
	b := rewrite.Plan{Clauses: []rewrite.Clause{large, jacket}}
	c := rewrite.Plan{Clauses: []rewrite.Clause{jacket, notEmber}}
	fmt.Println(a.Key())
	fmt.Println(a.Key() == b.Key())
	fmt.Println(c.Key())
	sixty := 60.0
	usd := rewrite.Plan{Clauses: []rewrite.Clause{{Field: "price", Max: &sixty, Unit: "USD"}}}
	eur := rewrite.Plan{Clauses: []rewrite.Clause{{Field: "price", Max: &sixty, Unit: "EUR"}}}
	fmt.Println(usd.Key(), usd.Key() == eur.Key())
	// Output:
	// product_type//false/rain jacket & size//false/l
	// true
	// colour//true/ember & product_type//false/rain jacket
	// price//false/<=60 USD false
}

// Settle takes the category from the product type: a rain jacket is
// apparel, so it gets apparel's colour tolerance of 4, and a category
// that says otherwise is refused.
func ExamplePolicy_Settle() {
	lex := lexicon.Default()
	p := rewrite.DefaultPolicy()
	e, err := p.Settle("", "rain jacket", lex)
	fmt.Println(e.Category, e.ColourTolerance, err)
	_, err = p.Settle("paint", "rain jacket", lex)
	fmt.Println(err)
	// Output:
	// apparel 4 <nil>
	// product type "rain jacket" is in category apparel, not paint
}

func ExampleRefusedError() {
	rw := rewrite.New(shopEngine{{"rain jacket", "ember"}}, nil)
	for _, q := range []string{"!!!", "nice", "1/0", "   "} {
		_, err := rw.Rescue(context.Background(), q)
		var re *rewrite.RefusedError
		var pe *parser.Error
		if errors.Is(err, rewrite.ErrNothingToSearch) && errors.As(err, &re) && errors.As(err, &pe) {
			fmt.Printf("%q: %s at %d-%d: %v\n", q, re.Reason, pe.Start, pe.End, err)
		}
	}
	// Output:
	// "!!!": query_unreadable at 0-3: query not searched: no word or number to search for
	// "nice": query_unreadable at 0-4: query not searched: only filler words ("nice"), nothing to search for
	// "1/0": query_unreadable at 0-3: query not searched: 1/0 divides by zero
	// "   ": query_empty at 0-3: query not searched: query is empty
}

func ExampleRefusedError_Render() {
	_, err := rewrite.New(shopEngine{{"rain jacket", "ember"}}, nil).Rescue(context.Background(), "the 1/0")
	var re *rewrite.RefusedError
	if errors.As(err, &re) {
		fmt.Println(re.Render())
	}
	// Output:
	// the 1/0
	//     ^^^
	// 1/0 divides by zero
}

// A query with a badly formed part beside what was read is searched for
// what was read; the report lists the part as a ReportProblem.
func ExampleReportProblem() {
	eng := shopEngine{{"rain jacket", "ember"}, {"rain jacket", "morning fog"}}
	out, err := rewrite.New(eng, nil).Rescue(context.Background(), "1/0 rain jacket")
	if err != nil {
		fmt.Println(err)
		return
	}
	rep := rewrite.NewReport(out, nil)
	fmt.Println(rep.ExactCount, rep.Problems)
	// Output: 2 [{0 3 1/0 divides by zero}]
}

// Refusal says, counting nothing, whether a rescue would refuse a query.
func ExampleRewriter_Refusal() {
	rw := rewrite.New(shopEngine{{"rain jacket", "ember"}}, nil)
	for _, q := range []string{"nice", "nice rain jacket"} {
		fmt.Printf("%q: %v\n", q, rw.Refusal(rw.Parse(q)))
	}
	// Output:
	// "nice": query not searched: only filler words ("nice"), nothing to search for
	// "nice rain jacket": <nil>
}

func ExampleExactMessage() {
	fmt.Println(rewrite.ExactMessage(1))
	fmt.Println(rewrite.ExactMessage(63))
	// Output:
	// 1 exact match.
	// 63 exact matches.
}

package eval_test

import (
	"context"
	"fmt"
	"os"

	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/catalog"
	"github.com/whittle-search/whittle/rewrite/eval"
)

// Two invented products for the examples.
var examples = []catalog.Product{
	{ID: "SK-1", Title: "Brellow cotton skirt", ProductType: "skirt", Category: "apparel", Sizes: []string{"s", "m"}},
	{ID: "SK-2", Title: "Brellow linen skirt", ProductType: "skirt", Category: "apparel", Sizes: []string{"l", "xl"}},
}

// The two skirts have no colour, pattern or measure to make miss. Asked
// for five cases, Generate takes ten turns of the failures (colour,
// pattern, typo, keyword, measure, twice); only the typos (turns 3 and 8)
// and the extra words (4 and 9) give a case. A size is always typed, and
// apparel sizes are hard.
func ExampleGenerate() {
	cases := eval.Generate(examples, eval.Options{Queries: 5, Seed: 1})
	for _, c := range cases {
		fmt.Println(c.Failure, c.Hard[0].Kind)
	}
	// Output:
	// typo size
	// keyword size
	// typo size
	// keyword size
}

func ExampleSatisfies() {
	xl := eval.Attr{Kind: parser.KindSize, Value: "xl"}
	fmt.Println(eval.Satisfies(&examples[0], xl), eval.Satisfies(&examples[1], xl))
	// Output: false true
}

func ExampleSatisfiesAll() {
	want := []eval.Attr{{Kind: parser.KindProductType, Value: "skirt"}, {Kind: parser.KindSize, Value: "m"}}
	fmt.Println(eval.SatisfiesAll(&examples[0], want), eval.SatisfiesAll(&examples[1], want))
	// Output: true false
}

func ExampleScore() {
	cases := []eval.Case{{Query: "striped skirt size xl", Product: "SK-2", ProductType: "skirt", Failure: eval.FailPattern,
		Hard: []eval.Attr{{Kind: parser.KindSize, Value: "xl"}}}}
	// SK-1 lacks xl; SK-2, the product meant, is second.
	f := eval.Score(cases, []eval.Result{{Hits: []string{"SK-1", "SK-2"}}}, examples)
	fmt.Printf("preserved %.0f%%, precision %.0f%%, MRR %.2f\n", f.HardPreservation()*100, f.AttributePrecision()*100, f.MRR())
	// Output: preserved 50%, precision 50%, MRR 0.50
}

func ExampleNewReport() {
	cases := []eval.Case{{Query: "striped skirt size xl", Product: "SK-2", ProductType: "skirt", Failure: eval.FailPattern,
		Hard: []eval.Attr{{Kind: parser.KindSize, Value: "xl"}}}}
	// whittle's one hit is SK-2, all it matched; the baseline showed and
	// matched SK-1 (no xl) and SK-2.
	whittle := eval.Result{Hits: []string{"SK-2"}, Set: eval.SetScore{Matched: 1, OnTarget: 1}}
	baseline := eval.Result{Hits: []string{"SK-1", "SK-2"}, Set: eval.SetScore{Matched: 2, OnTarget: 1}}
	rep := eval.NewReport(cases, []eval.Result{whittle}, []eval.Result{baseline}, examples, 10)
	for _, g := range rep.Goals {
		fmt.Println(g.Name, g.Met)
	}
	// Output:
	// rescue rate true
	// hard-constraint preservation true
	// attribute precision vs baseline, top k true
	// attribute precision vs baseline, all matches true
}

// WriteText prints a report as tables. This example has no Output: the
// layout is pinned by the golden file testdata/eval/report.txt, read by
// a person, which TestWriteTextGolden checks.
func ExampleReport_WriteText() {
	cases := []eval.Case{{Query: "striped skirt size xl", Product: "SK-2", ProductType: "skirt", Failure: eval.FailPattern}}
	rep := eval.NewReport(cases, []eval.Result{{Hits: []string{"SK-2"}}}, []eval.Result{{Hits: []string{"SK-2"}}}, examples, 10)
	rep.WriteText(os.Stdout)
}

// Evaluate runs labelled cases through whittle and a baseline on one
// index. This example, and those of Run and RunStyles, have no Output:
// their figures come from whole runs, too many to work out by hand; the
// tests check Evaluate on cases whose every figure is worked out by hand
// (run_test.go), and README gives the figures of full runs.
func ExampleEvaluate() {
	ctx := context.Background()
	dir, _ := os.MkdirTemp("", "whittle-example-")
	defer os.RemoveAll(dir)
	if _, err := bleveengine.BuildProducts(ctx, examples, dir+"/index", bleveengine.BuildOptions{}); err != nil {
		fmt.Println(err)
		return
	}
	eng, err := bleveengine.Open(dir + "/index")
	if err != nil {
		fmt.Println(err)
		return
	}
	defer eng.Close()
	cases := eval.Generate(examples, eval.Options{Queries: 10, Seed: 1})
	rep, err := eval.Evaluate(ctx, eng, rewrite.New(eng, nil), cases, examples, eval.EvaluateOptions{K: 10})
	if err != nil {
		fmt.Println(err)
		return
	}
	rep.WriteText(os.Stdout)
}

// Run builds the demo catalog's index, writes a labelled set and
// evaluates it; Met says whether every goal was met.
func ExampleRun() {
	rep, err := eval.Run(context.Background(), eval.RunOptions{Products: 1000, Generate: eval.Options{Queries: 100, Seed: 1}})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(rep.Met())
}

func ExampleReport_Met() {
	cases := []eval.Case{{Query: "striped skirt size xl", Product: "SK-2", ProductType: "skirt", Failure: eval.FailPattern}}
	rep := eval.NewReport(cases, []eval.Result{{}}, []eval.Result{{Hits: []string{"SK-2"}}}, examples, 10)
	fmt.Println(rep.Met())
	// Output: false
}

// Cases gives the set Run would evaluate, without an index: here the
// first of 5 on the first 300 products of the demo catalog.
func ExampleCases() {
	cases := eval.Cases(eval.RunOptions{Products: 300, Generate: eval.Options{Queries: 5, Seed: 1}})
	fmt.Println(len(cases), cases[0].Failure)
	// Output: 5 colour
}

// In the long style a query has four to seven constraints. This rug has
// only a type too short to misspell, a brand and a price, so of ten turns
// only the two extra-word turns give a case: the type, the brand, a
// price ceiling and the extra word.
func ExampleGenerate_long() {
	rug := []catalog.Product{{ID: "RG-9", Title: "Mossel rug", ProductType: "rug", Category: "home", Brand: "Mossel",
		Price: &catalog.Price{Amount: "100.00", Currency: "USD"}}}
	for _, c := range eval.Generate(rug, eval.Options{Queries: 5, Seed: 1, Style: eval.StyleLong}) {
		fmt.Println(c.Style, c.Failure, len(c.Typed))
	}
	// Output:
	// long keyword 4
	// long keyword 4
}

// RunStyles evaluates a set of each style on one index.
func ExampleRunStyles() {
	reps, err := eval.RunStyles(context.Background(), eval.RunOptions{Products: 1000, Generate: eval.Options{Queries: 100, Seed: 1}}, eval.Styles())
	if err != nil {
		fmt.Println(err)
		return
	}
	eval.WriteGoals(os.Stdout, reps)
}

// The goals of two sets side by side. In the short set whittle's one hit
// is SK-2, in size xl and a skirt, and all it matched; the baseline's two
// are SK-1 (no xl) and SK-2, all it matched: precision 100% against 50%,
// 2×, on the top k and on all matches. In the long set both show SK-2
// alone, 1×, but the baseline matched SK-1 too, and whittle did not:
// 2× on all matches.
func ExampleWriteGoals() {
	xl := []eval.Attr{{Kind: parser.KindSize, Value: "xl"}}
	one := eval.SetScore{Matched: 1, OnTarget: 1}
	both := eval.SetScore{Matched: 2, OnTarget: 1}
	short := eval.NewReport([]eval.Case{{Query: "striped skirt size xl", Product: "SK-2", ProductType: "skirt", Failure: eval.FailPattern, Hard: xl}},
		[]eval.Result{{Hits: []string{"SK-2"}, Set: one}}, []eval.Result{{Hits: []string{"SK-1", "SK-2"}, Set: both}}, examples, 10)
	long := eval.NewReport([]eval.Case{{Query: "brellow striped linen skirt size xl under $60", Product: "SK-2", ProductType: "skirt", Failure: eval.FailPattern, Hard: xl}},
		[]eval.Result{{Hits: []string{"SK-2"}, Set: one}}, []eval.Result{{Hits: []string{"SK-2"}, Set: both}}, examples, 10)
	short.Style, long.Style = eval.StyleShort, eval.StyleLong
	eval.WriteGoals(os.Stdout, []eval.Report{short, long})
	// Output:
	// goal                                          target  short (1 query)  long (1 query)
	// rescue rate                                   ≥ 95%   100.0% met       100.0% met
	// hard-constraint preservation                  100%    100.0% met       100.0% met
	// attribute precision vs baseline, top k        ≥ 2×    2.00× met        1.00× not met
	// attribute precision vs baseline, all matches  ≥ 2×    2.00× met        2.00× met
}

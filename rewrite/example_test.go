package rewrite_test

import (
	"errors"
	"fmt"

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

package rewrite_test

import (
	"fmt"

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

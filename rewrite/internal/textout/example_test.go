package textout_test

import (
	"fmt"
	"os"

	"github.com/whittle-search/whittle/rewrite/internal/textout"
)

func ExamplePrinter() {
	p := &textout.Printer{W: os.Stdout}
	p.F("%d searches\n", 3)
	fmt.Println(p.Err)
	// Output:
	// 3 searches
	// <nil>
}

func ExampleCount() {
	fmt.Println(textout.Count(1, "search", "searches"), "and", textout.Count(0, "query", "queries"))
	// Output: 1 search and 0 queries
}

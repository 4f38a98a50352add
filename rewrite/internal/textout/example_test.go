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

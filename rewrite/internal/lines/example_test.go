package lines_test

import (
	"fmt"
	"io"
	"strings"

	"github.com/whittle-search/whittle/rewrite/internal/lines"
)

func ExampleReader() {
	r := lines.NewReader(strings.NewReader("\ufeffred dress\n"+strings.Repeat("x", 50)+"\nblue jeans\n"), 20)
	for {
		b, long, err := r.Next()
		if err == io.EOF {
			break
		}
		if long {
			fmt.Printf("line %d: too long\n", r.Line())
			continue
		}
		fmt.Printf("line %d: %q\n", r.Line(), b)
	}
	// Output:
	// line 1: "red dress"
	// line 2: too long
	// line 3: "blue jeans"
}

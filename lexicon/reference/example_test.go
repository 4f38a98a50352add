package reference_test

import (
	"fmt"

	"github.com/whittle-search/whittle/lexicon/reference"
)

func ExampleRead() {
	t, err := reference.Read("iso216_paper_sizes.tsv")
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, r := range t.Rows {
		if r["size"] == "A4" {
			fmt.Println(r["width_mm"], "x", r["height_mm"], "mm")
		}
	}
	// Output: 210 x 297 mm
}

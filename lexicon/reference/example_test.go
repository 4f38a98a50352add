package reference_test

import (
	"fmt"
	"path/filepath"

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

func ExampleDir() {
	dir, err := reference.Dir()
	fmt.Println(filepath.Base(filepath.Dir(dir)), filepath.Base(dir), err)
	// Output: testdata reference <nil>
}

func ExampleRow_Float() {
	v, err := reference.Row{"factor_to_si": "0.0254"}.Float("factor_to_si")
	fmt.Println(v, err)
	// Output: 0.0254 <nil>
}

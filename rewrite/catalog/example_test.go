package catalog_test

import (
	"errors"
	"fmt"
	"io"
	"maps"
	"os"
	"path/filepath"
	"slices"
	"strings"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

func ExampleReadColours() {
	lines := `{"id": "FH-1", "title": "Tarn fleece", "colour": "Glacier", "colour_hex": "#8ecae6"}
{"id": "FH-2", "title": "Bothy crew", "colour": "navy"}`
	v, err := catalog.ReadColours(strings.NewReader(lines), lexicon.Default())
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, c := range v.Colours {
		fmt.Printf("%s %.1f\n", c.Name, c.Lab.L)
	}
	// Output:
	// glacier 78.3
	// navy 13.0
}

func ExampleLineError() {
	_, err := catalog.ReadColours(strings.NewReader(`{"id": "FH-1"}`), lexicon.Default())
	fmt.Println(err)
	// Output: line 1: title: missing; every line needs it
}

func ExampleProduct_Lab() {
	p := catalog.Product{ID: "RJ-1", Title: "Ridgeline rain jacket", Colour: "harvest gold", ColourHex: "#dfaa0a"}
	l := p.Lab(lexicon.Default())
	fmt.Printf("L* %.0f\n", l.L)
	// Output: L* 73
}

// NewReader reads a catalog product by product: here the invented test
// shop, whose thirteen products fall in six categories.
func ExampleNewReader() {
	f, err := os.Open(filepath.Join("..", "..", "testdata", "catalog", "shop.jsonl"))
	if err != nil {
		fmt.Println(err)
		return
	}
	defer f.Close()
	rd := catalog.NewReader(f, lexicon.Default())
	byCategory := map[string]int{}
	for {
		p, err := rd.Next()
		if err == io.EOF {
			break
		}
		if err != nil {
			fmt.Println(err)
			return
		}
		byCategory[p.Category]++
	}
	for _, c := range slices.Sorted(maps.Keys(byCategory)) {
		fmt.Println(c, byCategory[c])
	}
	// Output:
	// apparel 5
	// camera 2
	// electrical 1
	// footwear 2
	// home 1
	// lumber 2
}

// Next returns a malformed line as a *LineError, and reading goes on
// with the next line; Line is the number of the line last read, blank
// lines counted. A product type is read in lower case.
func ExampleReader_Next() {
	lines := `{"id": "RJ-1", "title": "Ridgeline rain jacket", "product_type": "rain jacket"}

{"id": "RJ-2", "product_type": "rain jacket"}
{"id": "RJ-3", "title": "Tarn shell rain jacket", "product_type": "Rain Jacket"}
`
	rd := catalog.NewReader(strings.NewReader(lines), nil)
	for {
		p, err := rd.Next()
		if err == io.EOF {
			break
		}
		var le *catalog.LineError
		if errors.As(err, &le) {
			fmt.Println("skipped", le)
			continue
		}
		if err != nil {
			fmt.Println(err)
			return
		}
		fmt.Println(rd.Line(), p.ID, p.ProductType)
	}
	// Output:
	// 1 RJ-1 rain jacket
	// skipped line 3: title: missing; every line needs it
	// 4 RJ-3 rain jacket
}

package catalog_test

import (
	"fmt"
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

package parser_test

import (
	"fmt"
	"slices"
	"testing"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/parser"
)

// Every dimension a reading gives is one Dimensions lists: checked on
// queries whose measures take each way a dimension is named.
func TestDimensionsCoverReadings(t *testing.T) {
	dims := parser.Dimensions(lexicon.Default())
	for _, tc := range []struct {
		query, dim, reason string
	}{
		{"85mm lens", "focal_length", "a lens's slot (lexicon/data/product_types.wlx)"},
		{"5 kg", "mass", "no product type: the quantity's own name"},
		{"8 pack socks", "pack_size", "a count of the things in a pack"},
		{"30x20x10 cm box", "depth", "the third part of a dimension"},
	} {
		t.Run(tc.query, func(t *testing.T) {
			r := parser.Parse(tc.query)
			var got []string
			for _, c := range r.Of(parser.KindMeasure) {
				got = append(got, c.Measure.Dimension)
				if !slices.Contains(dims, c.Measure.Dimension) {
					t.Errorf("%q reads dimension %q, which Dimensions lacks", tc.query, c.Measure.Dimension)
				}
			}
			if !slices.Contains(got, tc.dim) {
				t.Errorf("%q: dimensions %q, want %q among them (%s)", tc.query, got, tc.dim, tc.reason)
			}
		})
	}
	if slices.Contains(dims, "focal_lenght") || !slices.IsSorted(dims) {
		t.Errorf("Dimensions should be sorted and hold no misspelling: %q", dims)
	}
}

func ExampleDimensions() {
	dims := parser.Dimensions(lexicon.Default())
	fmt.Println(slices.Contains(dims, "focal_length"), slices.Contains(dims, "pack_size"), slices.Contains(dims, "focal_lenght"))
	// Output: true true false
}

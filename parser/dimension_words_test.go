package parser

import "testing"

// The word after a length names its dimension (common English usage),
// which a measure's range alone would have chosen otherwise.
func TestDimensionWords(t *testing.T) {
	for _, tc := range []struct {
		query, reason, dim string
	}{
		{"bookcase 72 inch tall", "a bookcase's only slot is its height, and tall says so", "height"},
		{"rug 5 ft wide", "5 ft is in a rug's width slot and its length's: wide says which", "width"},
		{"rug 8 ft long", "8 ft is in the width slot first, but long says length", "length"},
		{"desk 48 in long", "a desk has a width and a depth and no length: its long side is its width", "width"},
		{"desk 24 in deep", "deep names the depth, where 24 in lay in the width slot first", "depth"},
		{"shelf 10 in deep", "a shelf has no slots: the dimension is the word's", "depth"},
	} {
		ms := Parse(tc.query).Of(KindMeasure)
		if len(ms) != 1 || ms[0].Measure.Dimension != tc.dim {
			t.Errorf("%q: %s\n%+v", tc.query, tc.reason, ms)
		}
	}
}

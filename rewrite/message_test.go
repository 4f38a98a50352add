package rewrite

import (
	"strings"
	"testing"
)

// A colour that must match exactly (colour is hard in paint) and is not
// carried is answered with the colours carried nearest it first, by
// CIEDE2000, not in the alphabet's order. Duck egg blue is #c3dfd6 in the
// lexicon (from memory); the shop's colours are invented: a pale green
// near it, and a red and a navy far from it.
func TestMissingColourNearestFirst(t *testing.T) {
	shop := []product{
		{ID: "CP-1", Type: "chalk paint", Colour: "apricot crush", Hex: "#d2452f"},
		{ID: "CP-2", Type: "chalk paint", Colour: "harbour night", Hex: "#1b2a4a"},
		{ID: "CP-3", Type: "chalk paint", Colour: "pale mint", Hex: "#c6e3d2"},
	}
	o := mustRescue(t, shop, "chalk paint duck egg blue")
	want := "duck egg blue is not carried in chalk paints; colours carried, nearest first: pale mint, "
	if o.Count != 0 || !strings.Contains(o.Message, want) {
		t.Errorf("count %d, message %q; want 0 and %q\n%s", o.Count, o.Message, want, o.Explanation)
	}
	if i, j := strings.Index(o.Message, "harbour night"), strings.Index(o.Message, "apricot crush"); i < 0 || j < 0 {
		t.Errorf("message %q does not name every colour carried", o.Message)
	}
}

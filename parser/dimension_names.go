package parser

import (
	"slices"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/units"
)

// Dimensions lists, sorted, every name a measure's Dimension may take
// when queries are read with lex: the slots of its product types, the
// names of the quantities, the width, height, depth and length a
// dimension's parts are read as, the things counted ("pack_size",
// "seats"), and "number" and "dimension" for unitless numbers. A policy
// names measures by these.
func Dimensions(lex *lexicon.Lexicon) []string {
	if lex == nil {
		lex = lexicon.Default()
	}
	seen := map[string]bool{"number": true, "dimension": true, "thread_count": true, "gauge": true}
	for _, q := range units.Quantities() {
		seen[string(q)] = true
	}
	for _, d := range labels {
		seen[d] = true
	}
	for _, d := range countWords {
		seen[d] = true
	}
	for _, e := range lex.Entries(lexicon.ProductType) {
		for _, s := range e.Slots {
			seen[s.Dimension] = true
		}
	}
	out := make([]string, 0, len(seen))
	for d := range seen {
		out = append(out, d)
	}
	slices.Sort(out)
	return out
}

package rewrite

import (
	"sort"

	"github.com/whittle-search/whittle/parser"
)

// RelaxOrder returns the constraints of r that may be relaxed, least
// important first: by strictness (filler, then soft, then firm), and
// within one level the later span first, since shoppers tend to type the
// words that matter most first. Hard constraints are never returned, nor
// are exclusions, which only ever narrow a result.
func RelaxOrder(r *parser.Result) []parser.Constraint {
	var out []parser.Constraint
	for _, c := range r.Constraints {
		if c.Strictness == parser.Hard || c.Excluded {
			continue
		}
		out = append(out, c)
	}
	sort.SliceStable(out, func(i, j int) bool {
		if out[i].Strictness != out[j].Strictness {
			return out[i].Strictness < out[j].Strictness
		}
		return out[i].Start > out[j].Start
	})
	return out
}

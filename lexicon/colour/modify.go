package colour

import (
	"math"
	"strings"
)

// Lightness limits of [Modify]: a modifier moves L no further than these.
const (
	modifyMaxL = 98
	modifyMinL = 5
)

// modifiers holds, for each modifier word, the change of lightness and
// the factor on chroma.
var modifiers = map[string]struct{ dL, cScale float64 }{
	"light":  {dL: +12, cScale: 1},
	"dark":   {dL: -15, cScale: 1},
	"pale":   {dL: +15, cScale: 0.6},
	"deep":   {dL: -8, cScale: 1.15},
	"bright": {dL: +3, cScale: 1.25},
	"muted":  {dL: 0, cScale: 0.55},
}

// Modify applies a shade modifier word to a colour, working in LCh and
// keeping the hue:
//
//	light   L + 12
//	dark    L - 15
//	pale    L + 15, C × 0.6
//	deep    L - 8,  C × 1.15
//	bright  L + 3,  C × 1.25
//	muted   C × 0.55
//
// A lightening never takes L above 98 and a darkening never below 5; a
// colour already beyond that limit keeps its L, so a modifier never moves
// lightness the wrong way. C stays >= 0. The word is matched without
// regard to case or surrounding spaces; for any other word Modify returns
// l unchanged and false.
func Modify(l Lab, modifier string) (Lab, bool) {
	m, ok := modifiers[strings.ToLower(strings.TrimSpace(modifier))]
	if !ok {
		return l, false
	}
	c := l.LCh()
	switch {
	case m.dL > 0:
		c.L = math.Max(c.L, math.Min(c.L+m.dL, modifyMaxL))
	case m.dL < 0:
		c.L = math.Min(c.L, math.Max(c.L+m.dL, modifyMinL))
	}
	c.C = math.Max(0, c.C*m.cScale)
	return c.Lab(), true
}

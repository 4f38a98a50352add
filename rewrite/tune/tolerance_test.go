package tune

import (
	"fmt"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/parser"
)

// fill gives group k n searches of one product each, at rank 1, worth v.
func fill(tu *Tuner, k groupKey, n int, v float64) {
	for i := range n {
		var w [replicates]uint8
		draws(uint64(i)*7919+uint64(k.bin), &w)
		tu.group(k).add([]slot{{rank: 1, worth: v}}, &w)
	}
}

// The colour tolerance is read off the bands of ΔE00: the furthest band
// before engagement falls clearly below the keep share (0.8), the
// nearer bound when bands in between are too thin to say, and the
// current setting when nothing nearer holds. Each band's searches all
// earn the same, so its interval is the ratio itself.
func TestToleranceBands(t *testing.T) {
	for _, tc := range []struct {
		name    string
		bands   map[int]float64 // band → worth a product (exact matches earn 1)
		current float64
		want    float64
		verdict verdict
		reason  string
	}{
		{"falls at 6", map[int]float64{0: 1, 1: 1, 2: 0.9, 3: 1, 4: 1, 5: 1, 6: 0, 7: 0.1}, 10, 6, accepted, "falls clearly below it from there"},
		{"a gap, set within it", map[int]float64{0: 1, 5: 0}, 3, 3, accepted, "the current ΔE00 3 stays"},
		{"a gap, set past it", map[int]float64{0: 1, 5: 0}, 8, 5, accepted, "ΔE00 5, not ΔE00 8"},
		{"a gap, set short of it", map[int]float64{1: 1, 5: 0}, 0.5, 2, accepted, "ΔE00 2, not ΔE00 0.5"},
		{"nothing near holds", map[int]float64{5: 0}, 5, 5, unclear, "the current ΔE00 5 stays"},
		{"not even the nearest", map[int]float64{0: 0.1, 1: 1}, 5, 0, refused, "even in the nearest band"},
		{"holds as far as shown, set wider", map[int]float64{0: 1, 1: 1, 2: 1}, 5, 5, accepted, "the current ΔE00 5 stays"},
		{"holds as far as shown, set narrower", map[int]float64{0: 1, 1: 1, 2: 1}, 1, 3, accepted, "ΔE00 3, not ΔE00 1"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			tu := handTuner(t, "", nil)
			fill(tu, groupKey{category: "apparel"}, 50, 1)
			for b, v := range tc.bands {
				fill(tu, groupKey{category: "apparel", kind: parser.KindColour, axis: byColour, bin: b}, 50, v)
			}
			inv := propensities(1)
			tol := tu.tolerance("apparel", parser.KindColour, byColour, colourBin, tc.current, tu.groups[groupKey{category: "apparel"}], &inv)
			if tol == nil || tol.Recommended != tc.want || tol.verdict != tc.verdict || !strings.Contains(tol.Reason, tc.reason) {
				t.Errorf("got %s, want %g, verdict %d, a reason with %q", describe(tol), tc.want, tc.verdict, tc.reason)
			}
		})
	}
}

func describe(tol *Tolerance) string {
	if tol == nil {
		return "nil"
	}
	return fmt.Sprintf("%g (verdict %d): %s", tol.Recommended, tol.verdict, tol.Reason)
}

// Paint's colour is hard in the built-in policy, so however far
// shoppers accept a colour, no colour tolerance is proposed for paint:
// a hard constraint is never widened, and its tolerance is not used.
func TestNoToleranceForAHardKind(t *testing.T) {
	tu := handTuner(t, "", simProducts{})
	fill(tu, groupKey{category: "paint"}, 50, 1)
	for b := range 5 {
		fill(tu, groupKey{category: "paint", kind: parser.KindColour, axis: byColour, bin: b}, 50, 1)
	}
	r := tu.Report()
	if len(r.Changes) != 0 {
		t.Errorf("changes %+v, want none", r.Changes)
	}
	c := findCategory(r, "paint")
	if c == nil || c.Colour == nil || c.Colour.Recommended != c.Colour.Current || !strings.Contains(c.Colour.Reason, "colour stays hard here") {
		t.Errorf("paint colour tolerance %s", describe(c.Colour))
	}
}

// A colour widened and held, but never dropped: the reason says what is
// known and what is not, and the setting stays.
func TestWidenedNeverDropped(t *testing.T) {
	tu := handTuner(t, "", simProducts{})
	fill(tu, groupKey{category: "apparel"}, 50, 1)
	fill(tu, groupKey{category: "apparel", kind: parser.KindColour, op: "widen"}, 50, 1)
	for b := range 3 {
		fill(tu, groupKey{category: "apparel", kind: parser.KindColour, axis: byColour, bin: b}, 50, 1)
	}
	k := findKind(tu.Report(), "apparel", parser.KindColour)
	if k == nil || k.Recommended != k.Current || !strings.Contains(k.Reason, "too few searches dropped it") {
		t.Errorf("colour = %+v", k)
	}
}

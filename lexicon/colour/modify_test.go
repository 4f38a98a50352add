package colour

import (
	"math"
	"testing"
)

// TestModify checks the shade modifiers against the documented rules
// (whittle's own; values worked out by hand). The 3-4-5 colour
// (a, b) = (30, 40) has C = 50, so scaled chromas stay easy to check.
func TestModify(t *testing.T) {
	tests := []struct {
		name     string
		in       Lab
		modifier string
		want     Lab
		wantOK   bool
		reason   string
	}{
		{"light", Lab{50, 30, 40}, "light", Lab{62, 30, 40}, true, "L + 12"},
		{"dark", Lab{50, 30, 40}, "dark", Lab{35, 30, 40}, true, "L - 15"},
		{"pale", Lab{50, 30, 40}, "pale", Lab{65, 18, 24}, true, "L + 15, C 50 -> 30"},
		{"deep", Lab{50, 30, 40}, "deep", Lab{42, 34.5, 46}, true, "L - 8, C 50 -> 57.5"},
		{"bright", Lab{50, 30, 40}, "bright", Lab{53, 37.5, 50}, true, "L + 3, C 50 -> 62.5"},
		{"muted", Lab{50, 30, 40}, "muted", Lab{50, 16.5, 22}, true, "C 50 -> 27.5"},
		{"light capped", Lab{90, 0, 0}, "light", Lab{98, 0, 0}, true, "L stops at 98"},
		{"light above cap", Lab{99, 0, 0}, "light", Lab{99, 0, 0}, true, "a lighter colour keeps its L"},
		{"pale capped", Lab{90, -30, -40}, "pale", Lab{98, -18, -24}, true, "L stops at 98; C still scales; hue kept"},
		{"dark floored", Lab{10, 0, 0}, "dark", Lab{5, 0, 0}, true, "L stops at 5"},
		{"dark below floor", Lab{3, 0, 0}, "dark", Lab{3, 0, 0}, true, "a darker colour keeps its L"},
		{"deep floored", Lab{8, 3, 4}, "deep", Lab{5, 3.45, 4.6}, true, "L stops at 5; C 5 -> 5.75"},
		{"neutral stays neutral", Lab{50, 0, 0}, "bright", Lab{53, 0, 0}, true, "C 0 stays 0"},
		{"case and spaces", Lab{50, 30, 40}, " Light ", Lab{62, 30, 40}, true, "the word is matched case-insensitively"},
		{"unknown word", Lab{50, 30, 40}, "lighter", Lab{50, 30, 40}, false, "only the six words"},
		{"empty word", Lab{50, 30, 40}, "", Lab{50, 30, 40}, false, "no word"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got, ok := Modify(tt.in, tt.modifier)
			if ok != tt.wantOK || DeltaE76(got, tt.want) > 1e-9 {
				t.Errorf("Modify(%v, %q) = %v, %v; want %v, %v (%s)", tt.in, tt.modifier, got, ok, tt.want, tt.wantOK, tt.reason)
			}
		})
	}
}

// TestModifyKeepsHue checks that every modifier keeps the hue angle of
// the CSS named colours (source: css_named_colours.tsv) that have one.
func TestModifyKeepsHue(t *testing.T) {
	for _, c := range cssColours(t) {
		in := c.rgb.Lab().LCh()
		if in.C < 1 {
			continue
		}
		for w := range modifiers {
			out, _ := Modify(c.rgb.Lab(), w)
			h := out.LCh().H
			if d := math.Abs(h - in.H); math.Min(d, 360-d) > 1e-9 {
				t.Errorf("Modify(%s, %s): hue %v -> %v", c.name, w, in.H, h)
			}
		}
	}
}

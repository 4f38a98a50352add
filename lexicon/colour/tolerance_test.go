package colour

import "testing"

func TestToleranceFor(t *testing.T) {
	for _, tc := range []struct {
		category string
		want     float64
		reason   string
	}{
		{"apparel", 4, "fashion shoppers notice small shifts"},
		{"paint", 2, "paint colours are matched closely"},
		{"hardware", 10, "colour matters little"},
		{"", DefaultTolerance, "no category"},
		{"toys", DefaultTolerance, "unknown category"},
	} {
		if got := ToleranceFor(tc.category); got != tc.want {
			t.Errorf("ToleranceFor(%q) = %v, want %v (%s)", tc.category, got, tc.want, tc.reason)
		}
	}
}

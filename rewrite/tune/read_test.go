package tune

import "testing"

// A colour or a measure offered with alternatives ("navy or black", "50
// or 55 inch") is no one colour or amount asked, so it sets no distance
// a product strayed from; one asked alone does.
func TestReadAlternatives(t *testing.T) {
	tu := New(Options{})
	for _, tc := range []struct {
		query           string
		colour, measure bool
	}{
		{"navy rain jacket", true, false},
		{"navy or black rain jacket", false, false},
		{"55 inch tv", false, true},
		{"50 or 55 inch tv", false, false},
		{"navy or black rain jacket 20 in", false, true},
	} {
		r := tu.read(tc.query)
		if (r.lab != nil) != tc.colour || (r.amount != 0) != tc.measure {
			t.Errorf("%q: colour %v, measure %v; want %v, %v", tc.query, r.lab != nil, r.amount != 0, tc.colour, tc.measure)
		}
	}
}

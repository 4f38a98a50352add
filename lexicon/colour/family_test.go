package colour

import (
	"math"
	"slices"
	"testing"
)

// TestFamiliesCSS checks FamiliesOf on well-known CSS named colours, their
// values from testdata/reference/css_named_colours.tsv (CSS Color 4).
// What family a colour name belongs to is common practice, not a
// standard; every expectation below is common practice.
func TestFamiliesCSS(t *testing.T) {
	tests := []struct {
		name   string   // CSS colour name
		exact  []Family // if set, the whole result
		want   []Family // must all be present
		oneOf  []Family // at least one must be present
		not    []Family // must all be absent
		reason string
	}{
		{name: "black", exact: []Family{Black}, reason: "common practice: black is black"},
		{name: "white", exact: []Family{White}, reason: "common practice: white is white"},
		{name: "gray", exact: []Family{Grey}, reason: "common practice: mid grey"},
		{name: "silver", exact: []Family{Grey}, reason: "common practice: a light grey, not white"},
		{name: "dimgray", exact: []Family{Grey}, reason: "common practice: a dark grey, not black"},
		{name: "red", exact: []Family{Red}, reason: "common practice: the red primary"},
		{name: "green", exact: []Family{Green}, reason: "common practice"},
		{name: "lime", exact: []Family{Green}, not: []Family{Yellow}, reason: "common practice: the green primary"},
		{name: "blue", exact: []Family{Blue}, reason: "common practice: the blue primary, not purple although CIELAB puts it at h = 306"},
		{name: "yellow", exact: []Family{Yellow}, reason: "common practice: the yellow secondary, not green"},
		{name: "navy", want: []Family{Blue}, not: []Family{Purple, Black}, reason: "common practice: navy is a dark blue"},
		{name: "midnightblue", want: []Family{Blue}, not: []Family{Purple}, reason: "common practice: a very dark blue"},
		{name: "royalblue", want: []Family{Blue}, reason: "common practice"},
		{name: "skyblue", want: []Family{Blue}, reason: "common practice"},
		{name: "maroon", want: []Family{Red, Brown}, reason: "common practice: maroon is a brownish dark red"},
		{name: "darkred", want: []Family{Red}, reason: "common practice"},
		{name: "firebrick", want: []Family{Red}, reason: "common practice: a brick red"},
		{name: "crimson", want: []Family{Red}, not: []Family{Brown, Pink}, reason: "common practice: a strong, slightly bluish red"},
		{name: "olive", oneOf: []Family{Green, Yellow}, not: []Family{Brown}, reason: "common practice: a dark yellow-green"},
		{name: "olivedrab", want: []Family{Green}, reason: "common practice"},
		{name: "tan", want: []Family{Beige}, reason: "common practice: tan is sold as beige"},
		{name: "wheat", want: []Family{Beige}, reason: "common practice"},
		{name: "beige", want: []Family{Beige}, not: []Family{Green}, reason: "common practice: CIELAB puts it at h = 109, yet no one calls it green"},
		{name: "burlywood", want: []Family{Beige}, reason: "common practice: a tan"},
		{name: "chocolate", want: []Family{Brown}, reason: "common practice"},
		{name: "saddlebrown", want: []Family{Brown}, reason: "common practice"},
		{name: "sienna", want: []Family{Brown}, reason: "common practice: a reddish brown (a rust is brown and orange)"},
		{name: "brown", want: []Family{Brown}, reason: "common practice: CSS brown is a red-brown"},
		{name: "gold", want: []Family{Yellow}, not: []Family{Brown, Orange}, reason: "common practice"},
		{name: "goldenrod", want: []Family{Yellow}, reason: "common practice: a golden yellow"},
		{name: "orange", exact: []Family{Orange}, reason: "common practice"},
		{name: "darkorange", want: []Family{Orange}, not: []Family{Brown}, reason: "common practice: a strong orange, not brown"},
		{name: "orangered", oneOf: []Family{Orange, Red}, not: []Family{Brown}, reason: "common practice: between orange and red, bright, never brown"},
		{name: "coral", oneOf: []Family{Orange, Pink}, reason: "common practice: an orange-pink"},
		{name: "salmon", oneOf: []Family{Orange, Pink}, reason: "common practice: a pink-orange"},
		{name: "hotpink", want: []Family{Pink}, reason: "common practice"},
		{name: "deeppink", want: []Family{Pink}, reason: "common practice"},
		{name: "pink", want: []Family{Pink}, reason: "common practice"},
		{name: "lightpink", want: []Family{Pink}, reason: "common practice"},
		{name: "mistyrose", want: []Family{Pink}, reason: "common practice: a very pale pink"},
		{name: "purple", exact: []Family{Purple}, reason: "common practice"},
		{name: "indigo", want: []Family{Purple}, reason: "common practice: a deep violet"},
		{name: "rebeccapurple", want: []Family{Purple}, reason: "common practice"},
		{name: "mediumpurple", want: []Family{Purple}, reason: "common practice: a soft purple; CIELAB gives it the hue of pure blue"},
		{name: "lavender", want: []Family{Purple}, reason: "common practice: a pale purple"},
		{name: "plum", want: []Family{Purple}, reason: "common practice"},
		{name: "magenta", oneOf: []Family{Purple, Pink}, reason: "common practice: a purple-pink"},
		{name: "slategray", want: []Family{Grey}, reason: "common practice: a blue-grey"},
		{name: "teal", oneOf: []Family{Blue, Green}, reason: "common practice: a dark blue-green"},
		{name: "turquoise", oneOf: []Family{Blue, Green}, reason: "common practice: a blue-green"},
		{name: "ivory", want: []Family{White}, reason: "common practice: an off-white"},
		{name: "whitesmoke", exact: []Family{White}, reason: "common practice: a near-white neutral"},
		{name: "linen", want: []Family{White, Beige}, reason: "common practice: an off-white sold as cream or beige"},
		{name: "khaki", oneOf: []Family{Yellow, Beige}, not: []Family{Green}, reason: "common practice: a pale yellow-tan"},
	}
	byName := map[string]Lab{}
	for _, c := range cssColours(t) {
		byName[c.name] = c.rgb.Lab()
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			lab, ok := byName[tt.name]
			if !ok {
				t.Fatalf("%s is not in css_named_colours.tsv", tt.name)
			}
			got := FamiliesOf(lab)
			if tt.exact != nil && !slices.Equal(got, tt.exact) {
				t.Errorf("FamiliesOf(%s) = %v; want exactly %v (%s)", tt.name, got, tt.exact, tt.reason)
			}
			for _, f := range tt.want {
				if !slices.Contains(got, f) {
					t.Errorf("FamiliesOf(%s) = %v; want %s in it (%s)", tt.name, got, f, tt.reason)
				}
			}
			if tt.oneOf != nil && !slices.ContainsFunc(tt.oneOf, func(f Family) bool { return slices.Contains(got, f) }) {
				t.Errorf("FamiliesOf(%s) = %v; want one of %v (%s)", tt.name, got, tt.oneOf, tt.reason)
			}
			for _, f := range tt.not {
				if slices.Contains(got, f) {
					t.Errorf("FamiliesOf(%s) = %v; want no %s (%s)", tt.name, got, f, tt.reason)
				}
			}
		})
	}
}

// TestFamiliesRules checks the documented thresholds on colours built in
// LCh just either side of them, 0.01 or 0.1 away so that the LCh -> Lab ->
// LCh round trip cannot move them across (the rules are whittle's own,
// stated in the package comment).
func TestFamiliesRules(t *testing.T) {
	lch := func(l, c, h float64) Lab { return LCh{l, c, h}.Lab() }
	tests := []struct {
		name   string
		lab    Lab
		want   []Family
		reason string
	}{
		{"neutral white", lch(88, 2, 200), []Family{White}, "C < 8 and L >= 88"},
		{"neutral grey under white", lch(87.9, 2, 200), []Family{Grey}, "L just under 88"},
		{"neutral black", lch(18, 7.9, 200), []Family{Black}, "L <= 18, C just under 8"},
		{"neutral grey over black", lch(18.1, 0, 0), []Family{Grey}, "L just over 18"},
		{"warm off-white", lch(95, 5, 80), []Family{White, Beige}, "C >= 4, L >= 75, warm hue"},
		{"warm grey", lch(80, 5, 80), []Family{Grey, Beige}, "L >= 75 but under 88"},
		{"cool off-white", lch(95, 5, 250), []Family{White}, "hue not warm"},
		{"faint warm white", lch(95, 3.9, 80), []Family{White}, "C under 4"},
		{"chromatic from C 8", lch(50, 8.01, 140), []Family{Green, Grey}, "C = 8 is chromatic; C < 13 mid-L is also grey"},
		{"pink bin start", lch(50, 40, 340.01), []Family{Pink}, "pink [340, 5)"},
		{"pink bin wraps", lch(50, 40, 4.9), []Family{Pink}, "pink [340, 5)"},
		{"red bin", lch(50, 40, 5.01), []Family{Red}, "red [5, 45)"},
		{"orange bin", lch(65, 40, 45.01), []Family{Orange}, "orange [45, 78)"},
		{"yellow bin", lch(65, 40, 78.01), []Family{Yellow}, "yellow [78, 112)"},
		{"green bin", lch(65, 40, 112.01), []Family{Green}, "green [112, 195)"},
		{"blue bin", lch(65, 40, 195.01), []Family{Blue}, "blue [195, 310)"},
		{"purple bin", lch(50, 70, 310.01), []Family{Purple}, "purple [310, 340)"},
		{"light red is pink", lch(65, 40, 20), []Family{Red, Pink}, "red hue, L >= 65"},
		{"light purple is pink", lch(65, 40, 320), []Family{Purple, Pink}, "purple hue, L >= 65"},
		{"dark pink is red", lch(39.9, 40, 350), []Family{Pink, Red}, "pink hue, L < 40"},
		{"violet blue", lch(40, 64.9, 285.01), []Family{Blue, Purple}, "blue hue in [285, 310), L >= 40, C < 65"},
		{"strong blue", lch(40, 65.01, 300), []Family{Blue}, "C >= 65"},
		{"dark red is brown", lch(39.9, 50, 20.01), []Family{Red, Brown}, "hue [20, 45), L < 40"},
		{"red not brown at L 40", lch(40, 50, 30), []Family{Red}, "L >= 40"},
		{"dark orange is brown", lch(59.9, 74.9, 60), []Family{Orange, Brown}, "hue [45, 90), L < 60, C < 75"},
		{"vivid dark orange", lch(50, 75.01, 60), []Family{Orange}, "C >= 75 is not brown"},
		{"dark yellow at 90", lch(50, 40, 90.01), []Family{Yellow}, "hue 90 is past the brown range"},
		{"beige", lch(70, 31.9, 100), []Family{Yellow, Beige}, "hue [40, 112), L >= 70, C < 32"},
		{"yellow not beige", lch(70, 32.01, 100), []Family{Yellow}, "C >= 32"},
		{"slate grey", lch(50, 12.9, 250), []Family{Blue, Grey}, "C < 13 at mid lightness"},
		{"pale blue not grey", lch(88, 10, 250), []Family{Blue}, "L >= 88 is not grey"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := FamiliesOf(tt.lab); !slices.Equal(got, tt.want) {
				t.Errorf("FamiliesOf(%v) = %v; want %v (%s)", tt.lab.LCh(), got, tt.want, tt.reason)
			}
		})
	}
	if got := FamiliesOf(Lab{math.NaN(), 0, 0}); got != nil {
		t.Errorf("FamiliesOf(NaN) = %v; want nil", got)
	}
}

// TestFamiliesNeverMulti checks over the whole 8-bit gamut, sampled, that
// FamiliesOf returns at least one family, never Multi, and no family
// twice.
func TestFamiliesNeverMulti(t *testing.T) {
	for r := 0; r < 256; r += 15 {
		for g := 0; g < 256; g += 15 {
			for b := 0; b < 256; b += 15 {
				c := RGB{uint8(r), uint8(g), uint8(b)}
				fs := FamiliesOf(c.Lab())
				if len(fs) == 0 || slices.Contains(fs, Multi) {
					t.Fatalf("FamiliesOf(%s) = %v", c.Hex(), fs)
				}
				s := slices.Clone(fs)
				slices.Sort(s)
				if len(slices.Compact(s)) != len(fs) {
					t.Fatalf("FamiliesOf(%s) = %v repeats a family", c.Hex(), fs)
				}
			}
		}
	}
}

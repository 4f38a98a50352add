package parser

import (
	"strings"
	"testing"

	"github.com/google/go-cmp/cmp"
)

// alt is one constraint of a query as TestAlternatives sees it: its
// text, kind, value, exclusion and the or-group it is in.
type alt struct {
	Text     string
	Kind     Kind
	Value    string
	Excluded bool
	Group    int
	// Borrowed is set on a number read with the unit after its "or".
	Borrowed bool
}

func TestAlternatives(t *testing.T) {
	for _, tc := range []struct {
		name, query, reason string
		want                []alt
	}{
		{name: "colours joined by or", query: "navy or black shirt",
			reason: "a shopper who types \"navy or black\" takes either: no shirt is both, and asking for both finds nothing (common English usage)",
			want:   []alt{{"navy", KindColour, "navy", false, 1, false}, {"black", KindColour, "black", false, 1, false}, {"shirt", KindProductType, "shirt", false, 0, false}}},
		{name: "a list with commas", query: "red, blue or green shirt",
			reason: "the items of a list before its \"or\" are alternatives with the last (common English usage)",
			want: []alt{{"red", KindColour, "red", false, 1, false}, {"blue", KindColour, "blue", false, 1, false},
				{"green", KindColour, "green", false, 1, false}, {"shirt", KindProductType, "shirt", false, 0, false}}},
		{name: "or twice", query: "red or blue or green shirt",
			reason: "each \"or\" joins the same group",
			want: []alt{{"red", KindColour, "red", false, 1, false}, {"blue", KindColour, "blue", false, 1, false},
				{"green", KindColour, "green", false, 1, false}, {"shirt", KindProductType, "shirt", false, 0, false}}},
		{name: "colours joined by a slash", query: "black/white sneakers",
			reason: "a slash between colours names one two-tone colourway, not a choice (common practice in footwear and apparel listings)",
			want:   []alt{{"black", KindColour, "black", false, 0, false}, {"white", KindColour, "white", false, 0, false}, {"sneakers", KindProductType, "sneaker", false, 0, false}}},
		{name: "bed sizes joined by a slash", query: "full/queen quilt",
			reason: "\"full/queen\" is how a quilt that fits either bed is labelled (common practice); it asks for either size",
			want:   []alt{{"full", KindSize, "full (bed)", false, 1, false}, {"queen", KindSize, "queen (bed)", false, 1, false}, {"quilt", KindProductType, "quilt", false, 0, false}}},
		{name: "letter sizes joined by a slash", query: "s/m tee",
			reason: "\"s/m\" is a combined letter size (common practice)",
			want:   []alt{{"s", KindSize, "s (letter)", false, 1, false}, {"m", KindSize, "m (letter)", false, 1, false}, {"tee", KindProductType, "t-shirt", false, 0, false}}},
		{name: "shoe sizes", query: "size 8 or 9 sandals",
			reason: "both numbers are shoe sizes, either will do",
			want:   []alt{{"size 8", KindSize, "8 (shoe)", false, 1, false}, {"9", KindSize, "9 (shoe)", false, 1, false}, {"sandals", KindProductType, "sandal", false, 0, false}}},
		{name: "sizes of two systems", query: "size 9 or m sandals",
			reason: "a shoe size and a letter size are no choice within one system: each stays its own constraint",
			want:   []alt{{"size 9", KindSize, "9 (shoe)", false, 0, false}, {"m", KindSize, "m (letter)", false, 0, false}, {"sandals", KindProductType, "sandal", false, 0, false}}},
		{name: "a gauge lends its unit", query: "12 or 14 awg wire",
			reason: "\"12 or 14 awg\" is 12 AWG or 14 AWG (common English usage); read alone, the 12 was 12 ft of wire",
			want:   []alt{{"12", KindSpec, "12 AWG (awg)", false, 1, true}, {"14 awg", KindSpec, "14 AWG (awg)", false, 1, false}, {"wire", KindProductType, "electrical wire", false, 0, false}}},
		{name: "a unit lent to a measure", query: "8 or 10 mm drill bit",
			reason: "the 8 takes the millimetres typed after \"or\", and either diameter will do: two points of one dimension, not the range between",
			want:   []alt{{"8", KindMeasure, "8 mm", false, 1, true}, {"10 mm", KindMeasure, "10 mm", false, 1, false}, {"drill bit", KindProductType, "drill bit", false, 0, false}}},
		{name: "measures of two dimensions", query: "rug 5x8 or 6x9",
			reason: "the length of one and the width of the other are no choice between values of one dimension",
			want: []alt{{"rug", KindProductType, "rug", false, 0, false}, {"5", KindMeasure, "5 ft", false, 0, false}, {"8", KindMeasure, "8 ft", false, 0, false},
				{"6", KindMeasure, "6 ft", false, 0, false}, {"9", KindMeasure, "9 ft", false, 0, false}}},
		{name: "an exclusion covers the or", query: "not red or blue shirt",
			reason: "\"not red or blue\" is neither (common English usage)",
			want:   []alt{{"not red", KindColour, "not red", true, 1, false}, {"blue", KindColour, "not blue", true, 1, false}, {"shirt", KindProductType, "shirt", false, 0, false}}},
		{name: "product types", query: "shirt or blouse navy",
			reason: "two product types offered as alternatives: a shopper takes either",
			want:   []alt{{"shirt", KindProductType, "shirt", false, 1, false}, {"blouse", KindProductType, "blouse", false, 1, false}, {"navy", KindColour, "navy", false, 0, false}}},
		{name: "audiences side by side", query: "toddler boys pajamas",
			reason: "a product is made for one audience, so two asked together find nothing; toddler is filed under baby (audiences.wlx)",
			want: []alt{{"toddler", KindAudience, "baby", false, 1, false}, {"boys", KindAudience, "boys", false, 1, false},
				{"pajamas", KindProductType, "pajamas", false, 0, false}}},
		{name: "audiences joined by and", query: "mens and womens hiking boots",
			reason: "\"mens and womens\" asks for either: no boot is made for both",
			want: []alt{{"mens", KindAudience, "men", false, 1, false}, {"womens", KindAudience, "women", false, 1, false},
				{"hiking boots", KindProductType, "hiking boot", false, 0, false}}},
		{name: "audiences apart", query: "kids rain boots yellow toddler", reason: "wherever they stand, two audiences are either: no boot is made for both",
			want: []alt{{"kids", KindAudience, "kids", false, 1, false}, {"rain boots", KindProductType, "rain boot", false, 0, false},
				{"yellow", KindColour, "yellow", false, 0, false}, {"toddler", KindAudience, "baby", false, 1, false}}},
		{name: "audiences excluded", query: "-kids -baby hats", reason: "excluded audiences are one group too: neither",
			want: []alt{{"-kids", KindAudience, "not kids", true, 1, false}, {"-baby", KindAudience, "not baby", true, 1, false}, {"hats", KindProductType, "hat", false, 0, false}}},
		{name: "audiences joined by an ampersand", query: "kids & baby hats", reason: "the same with \"&\"",
			want: []alt{{"kids", KindAudience, "kids", false, 1, false}, {"baby", KindAudience, "baby", false, 1, false},
				{"hats", KindProductType, "hat", false, 0, false}}},
		{name: "colours joined by and", query: "navy and white striped shirt",
			reason: "a shirt may be both colours at once: \"and\" joins only audiences",
			want: []alt{{"navy", KindColour, "navy", false, 0, false}, {"white", KindColour, "white", false, 0, false},
				{"striped", KindPattern, "striped", false, 0, false}, {"shirt", KindProductType, "shirt", false, 0, false}}},
		{name: "models fitted", query: "phone case for jx-10 or jx-12",
			reason: "a code after \"or\" after a model fitted is a second model: it was a part number, hard, that no case has",
			want: []alt{{"phone case", KindProductType, "phone case", false, 0, false}, {"for jx-10", KindCompatibility, "fits jx-10", false, 1, false},
				{"jx-12", KindCompatibility, "fits jx-12", false, 1, false}}},
		{name: "models fitted, each with for", query: "case for jx-10 or for jx-12",
			reason: "two targets, each after \"for\", are alternatives too",
			want: []alt{{"case", KindKeyword, "case", false, 0, false}, {"for jx-10", KindCompatibility, "fits jx-10", false, 1, false},
				{"for jx-12", KindCompatibility, "fits jx-12", false, 1, false}}},
		{name: "either before the first", query: "either black or navy shirt", reason: "\"either\" only opens the choice: it is filler, where it was a stray word",
			want: []alt{{"black", KindColour, "black", false, 1, false}, {"navy", KindColour, "navy", false, 1, false}, {"shirt", KindProductType, "shirt", false, 0, false}}},
		{name: "kinds differ", query: "navy or cotton shirt",
			reason: "a colour and a material are no choice between values of one kind",
			want:   []alt{{"navy", KindColour, "navy", false, 0, false}, {"cotton", KindMaterial, "cotton", false, 0, false}, {"shirt", KindProductType, "shirt", false, 0, false}}},
		{name: "two groups", query: "navy or grey wool or cotton sweater",
			reason: "groups are numbered in query order, one for each kind",
			want: []alt{{"navy", KindColour, "navy", false, 1, false}, {"grey", KindColour, "grey", false, 1, false},
				{"wool", KindMaterial, "wool", false, 2, false}, {"cotton", KindMaterial, "cotton", false, 2, false}, {"sweater", KindProductType, "sweater", false, 0, false}}},
		{name: "counts", query: "dining table 4 or 6 seats",
			reason: "the 4 takes the seats after \"or\", and either count will do",
			want: []alt{{"dining table", KindProductType, "dining table", false, 0, false},
				{"4", KindMeasure, "4 count", false, 1, true}, {"6 seats", KindMeasure, "6 count", false, 1, false}}},
		{name: "navy or black and red", query: "navy or red and white shirt",
			reason: "only the values next to the \"or\" are joined: white is asked for as well",
			want: []alt{{"navy", KindColour, "navy", false, 1, false}, {"red", KindColour, "red", false, 1, false},
				{"white", KindColour, "white", false, 0, false}, {"shirt", KindProductType, "shirt", false, 0, false}}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			r := Parse(tc.query)
			var got []alt
			for _, c := range r.Constraints {
				if c.Kind != KindFiller {
					got = append(got, alt{c.Text, c.Kind, c.Value(), c.Excluded, c.OrGroup, strings.Contains(c.Evidence, "after \"or\"")})
				}
			}
			if diff := cmp.Diff(tc.want, got); diff != "" {
				t.Errorf("%s\n%q (-want +got):\n%s", tc.reason, tc.query, diff)
			}
			checkInvariants(t, tc.query, r)
		})
	}
}

// The alternatives of a constraint are its group, in query order, or
// itself alone.
func TestResultAlternatives(t *testing.T) {
	r := Parse("navy or black shirt")
	for _, tc := range []struct {
		i    int
		want []int
	}{{0, []int{0, 2}}, {2, []int{0, 2}}, {3, []int{3}}, {-1, nil}, {4, nil}} {
		if got := r.Alternatives(tc.i); !cmp.Equal(got, tc.want) {
			t.Errorf("Alternatives(%d) = %v, want %v", tc.i, got, tc.want)
		}
	}
}

// The text of a group is its span when nothing else stands between its
// members, else their texts joined by "or".
func TestAlternativesText(t *testing.T) {
	for _, tc := range []struct {
		query string
		i     int
		want  string
	}{{"navy or black shirt", 2, "navy or black"}, {"kids rain boots yellow toddler", 0, "kids or toddler"},
		{"size 8 or 9 sandals", 0, "size 8 or 9"}, {"navy shirt", 1, "shirt"}, {"navy shirt", 5, ""}} {
		if got := Parse(tc.query).AlternativesText(tc.i); got != tc.want {
			t.Errorf("%q: AlternativesText(%d) = %q, want %q", tc.query, tc.i, got, tc.want)
		}
	}
}

// A group cut short by MaxConstraints is numbered again: "kids rain
// boots toddler", cut after its first two, leaves kids alone.
func TestAlternativesCutRenumbered(t *testing.T) {
	r := ParseWith("kids rain boots navy or black toddler", Options{MaxConstraints: 5})
	for _, c := range r.Constraints {
		if c.Kind == KindAudience && c.OrGroup != 0 || c.Kind == KindColour && c.OrGroup != 1 {
			t.Errorf("%s %q in group %d", c.Kind, c.Text, c.OrGroup)
		}
	}
	checkInvariants(t, r.Query, r)
}

// Cut by MaxConstraints, an alternative whose others were cut stands
// alone.
func TestAlternativesCut(t *testing.T) {
	r := ParseWith("navy or black shirt", Options{MaxConstraints: 2})
	if len(r.Constraints) != 2 || r.Constraints[0].OrGroup != 0 {
		t.Fatalf("got %+v", r.Constraints)
	}
}

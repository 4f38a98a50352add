package eval

import (
	"math/rand/v2"
	"reflect"
	"slices"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/lexicon/units"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// typedOf returns the typed attribute of kind k in c.
func typedOf(c Case, k parser.Kind) (Attr, bool) {
	for _, a := range c.Typed {
		if a.Kind == k {
			return a, true
		}
	}
	return Attr{}, false
}

// nearestUnused finds, by brute force over the lexicon with CIEDE2000
// (checked against Sharma, Wu and Dalal 2005 in lexicon/colour), the
// lexicon colour nearest hex that is not one of used.
func nearestUnused(t *testing.T, hex string, used []string) string {
	t.Helper()
	rgb, err := colour.ParseHex(hex)
	if err != nil {
		t.Fatal(err)
	}
	best, bestD := "", 1e9
	for _, e := range lexicon.Default().Entries(lexicon.Colour) {
		lab, ok := e.ColourLab()
		if !ok || slices.Contains(used, e.Name) {
			continue
		}
		if d := colour.DeltaE2000(rgb.Lab(), lab); d < bestD {
			best, bestD = e.Name, d
		}
	}
	return best
}

// On the tiny catalog every case can be checked by hand: what each
// failure can do to which product follows from the six products.
func TestGenerateTiny(t *testing.T) {
	ps := tiny(t)
	cases := Generate(ps, Options{Queries: 40, Seed: 1})
	if len(cases) != 40 {
		t.Fatalf("%d cases, want 40", len(cases))
	}
	used := []string{"black", "morning fog", "ember", "dune"} // the tiny catalog's colour names
	checks := map[Failure]struct {
		reason string
		ok     func(c Case) bool
	}{
		FailColour: {
			reason: "only SK-2, SW-1 and RG-1 have a shop colour, and the SK-1 and lenses' black is a lexicon colour too; the word is the nearest lexicon colour no product is named",
			ok: func(c Case) bool {
				a, _ := typedOf(c, parser.KindColour)
				p := product(t, ps, c.Product)
				hex := p.ColourHex
				if hex == "" {
					e, _ := lexicon.Default().Lookup(lexicon.Colour, p.Colour)
					hex = e.Hex
				}
				return a.Value == nearestUnused(t, hex, used)
			}},
		FailPattern: {
			reason: "apparel comes in solid (SK-1), floral (SK-2) and cable knit (SW-1): a skirt lacks cable knit, a sweater solid and floral; home and camera have no second pattern",
			ok: func(c Case) bool {
				a, _ := typedOf(c, parser.KindPattern)
				return c.ProductType == "skirt" && a.Value == "cable knit" || c.ProductType == "sweater" && (a.Value == "solid" || a.Value == "floral")
			}},
		FailTypo: {
			reason: "skirt, sweater and prime have five letters or more; rug has three; LN-2 is out of stock",
			ok: func(c Case) bool {
				a, _ := typedOf(c, parser.KindProductType)
				word := strings.Fields(c.ProductType)[0]
				typo := strings.Fields(a.Value)[0]
				return slices.Contains([]string{"SK-1", "SK-2", "SW-1", "LN-1"}, c.Product) && lexicon.EditDistance(word, typo) == 1
			}},
		FailKeyword: {
			reason: "the extra word is one of the list, and no product's text has it",
			ok: func(c Case) bool {
				a, _ := typedOf(c, parser.KindKeyword)
				return slices.Contains(extraWords, a.Value)
			}},
		FailMeasure: {
			reason: "focal length is hard in camera, so only the rug's width, 5 ft, moves: by 4, 6 or 8% (of a 10% tolerance) to 5.2, 5.3, 5.4, 4.8, 4.7 or 4.6 ft",
			ok: func(c Case) bool {
				a, _ := typedOf(c, parser.KindMeasure)
				return c.Product == "RG-1" && a.Dimension == "width" && slices.Contains([]string{"4.6 ft", "4.7 ft", "4.8 ft", "5.2 ft", "5.3 ft", "5.4 ft"}, a.Value)
			}},
	}
	for i, c := range cases {
		if want := failures[i%len(failures)]; c.Failure != want {
			t.Errorf("case %d is %s, want %s: the failures take turns", i, c.Failure, want)
		}
		chk := checks[c.Failure]
		if !chk.ok(c) {
			t.Errorf("%+v: %s", c, chk.reason)
		}
		// Hard, by the built-in policy: sizes and audiences (apparel),
		// compatibility and focal length (camera); nothing of the rug.
		for _, a := range c.Typed {
			isHard := slices.Contains(c.Hard, a)
			wantHard := a.Kind == parser.KindSize || a.Kind == parser.KindAudience || a.Kind == parser.KindCompatibility || a.Kind == parser.KindMeasure && a.Dimension == "focal_length"
			if isHard != wantHard {
				t.Errorf("%q: %s hard=%v, want %v (policy.toml)", c.Query, a.Kind, isHard, wantHard)
			}
		}
	}
}

// The same products and seed give the same cases; another seed others.
func TestGenerateSeeded(t *testing.T) {
	ps := catalog.Demo(2000, 1)
	a := Generate(ps, Options{Queries: 100, Seed: 3})
	b := Generate(ps, Options{Queries: 100, Seed: 3})
	c := Generate(ps, Options{Queries: 100, Seed: 4})
	for _, tc := range []struct {
		name, reason string
		x, y         []Case
		same         bool
	}{
		{name: "same seed", x: a, y: b, same: true, reason: "the procedure is one seeded stream"},
		{name: "other seed", x: a, y: c, same: false, reason: "a seed that gives the same set would be no seed"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			if reflect.DeepEqual(tc.x, tc.y) != tc.same {
				t.Errorf("%s: equal=%v, want %v", tc.reason, !tc.same, tc.same)
			}
		})
	}
}

// On a demo catalog every case keeps the truth it claims: the product
// exists and is in stock, has every hard attribute, the query writes
// every attribute, and no product at all has every attribute as asked.
// In the long style a query also has 4 to 7 constraints.
func TestGenerateDemoTruth(t *testing.T) {
	ps := catalog.Demo(2000, 1)
	for _, style := range Styles() {
		t.Run(string(style), func(t *testing.T) { demoTruth(t, ps, style) })
	}
}

func demoTruth(t *testing.T, ps []catalog.Product, style Style) {
	cases := Generate(ps, Options{Queries: 250, Seed: 1, Style: style})
	if len(cases) != 250 {
		t.Fatalf("%d cases, want 250", len(cases))
	}
	byID := index(ps)
	kinds := map[Failure]int{}
	for _, c := range cases {
		kinds[c.Failure]++
		p, ok := byID[c.Product]
		if !ok || p.InStock != nil && !*p.InStock || p.ProductType != c.ProductType {
			t.Errorf("%q: product %s missing, out of stock or not a %s", c.Query, c.Product, c.ProductType)
			continue
		}
		if !SatisfiesAll(p, c.Hard) {
			t.Errorf("%q: %s lacks a hard attribute of %+v", c.Query, c.Product, c.Hard)
		}
		for _, a := range c.Typed {
			if !strings.Contains(c.Query, a.Text) {
				t.Errorf("%q does not write %q", c.Query, a.Text)
			}
			if a.Kind == parser.KindPrice && !Satisfies(p, a) {
				t.Errorf("%q: %s at %s is over the ceiling %s", c.Query, p.ID, p.Price.Amount, a.Value)
			}
		}
		if n := len(c.Typed); style == StyleLong && (n < 4 || n > 7) || c.Style != style {
			t.Errorf("%q: %d constraints in the %s style", c.Query, n, c.Style)
		}
		for i := range ps {
			if SatisfiesAll(&ps[i], c.Typed) {
				t.Errorf("%q: %s has every attribute as asked, so the query does not miss", c.Query, ps[i].ID)
			}
		}
	}
	for _, f := range Failures() {
		if kinds[f] != 50 {
			t.Errorf("%d cases of %s, want 50: the failures take turns", kinds[f], f)
		}
	}
}

// A misspelling is one edit from the word (optimal string alignment:
// insert, delete, replace or swap neighbours) and keeps the first letter.
func TestMisspell(t *testing.T) {
	for _, tc := range []struct{ name, word, reason string }{
		{name: "five letters", word: "skirt", reason: "the shortest word misspelt"},
		{name: "double letters", word: "sweater", reason: "a doubled or swapped e is still one edit"},
		{name: "long", word: "flashlight", reason: "long words get one edit too"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			r := rand.New(rand.NewPCG(1, 2))
			for range 200 {
				m := misspell(r, tc.word)
				if m[0] != tc.word[0] || m != tc.word && lexicon.EditDistance(m, tc.word) != 1 {
					t.Errorf("%s: misspell(%q) = %q", tc.reason, tc.word, m)
				}
			}
		})
	}
}

// Every spelling a query may use for a unit is that unit for
// lexicon/units, whose table follows NIST SP 811.
func TestUnitSpellings(t *testing.T) {
	for unit, spellings := range unitSpellings {
		want, ok := units.Lookup(unit, units.USCustomary)
		if !ok {
			t.Errorf("%q is no unit", unit)
			continue
		}
		for _, s := range spellings {
			if got, ok := units.Lookup(s, units.USCustomary); !ok || got.Symbol != want.Symbol {
				t.Errorf("%q spells %v, want %s", s, got, want.Symbol)
			}
		}
	}
}

// A query lists its attributes in one of the orders, each once, and puts
// the keyword somewhere among them.
func TestPhrase(t *testing.T) {
	typed := []Attr{
		{Kind: parser.KindProductType, Text: "sweater"},
		{Kind: parser.KindColour, Text: "navy"},
		{Kind: parser.KindSize, Text: "size m"},
		{Kind: parser.KindKeyword, Text: "sturdy"},
	}
	for _, tc := range []struct {
		name   string
		seed   uint64
		reason string
	}{
		{name: "seed 1", seed: 1, reason: "any order holds every attribute once"},
		{name: "seed 2", seed: 2, reason: "another draw, the same words"},
		{name: "seed 3", seed: 3, reason: "another draw, the same words"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			q := phrase(rand.New(rand.NewPCG(tc.seed, 0)), typed, orders)
			words := strings.Fields(q)
			slices.Sort(words)
			want := []string{"m", "navy", "size", "sturdy", "sweater"}
			if !slices.Equal(words, want) {
				t.Errorf("%s: %q has words %v, want %v", tc.reason, q, words, want)
			}
			if !strings.Contains(q, "size m") {
				t.Errorf("%s: %q splits %q", tc.reason, q, "size m")
			}
		})
	}
}

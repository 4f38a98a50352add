package eval

import (
	"math/rand/v2"
	"slices"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// The long style on the tiny catalog, checked by hand: which kinds each
// product can give, which ceilings its price can give, how many
// constraints a query has.
func TestGenerateLongTiny(t *testing.T) {
	ps := tiny(t)
	cases := Generate(ps, Options{Queries: 40, Seed: 1, Style: StyleLong})
	if len(cases) != 40 {
		t.Fatalf("%d cases, want 40", len(cases))
	}
	k := func(ks ...parser.Kind) []parser.Kind { return ks }
	const (
		typ, col, pat, mat = parser.KindProductType, parser.KindColour, parser.KindPattern, parser.KindMaterial
		aud, brd, siz, cmp = parser.KindAudience, parser.KindBrand, parser.KindSize, parser.KindCompatibility
		msr, prc           = parser.KindMeasure, parser.KindPrice
	)
	// What each product in stock can give, worked out from tiny.jsonl:
	// a colour only when it is a lexicon word without a shop hex (black;
	// not morning fog, ember or dune), a pattern unless solid, no
	// silhouette (none has one), the brand, the rug's main measure (its
	// first slot, width, 5 ft) and the lens's (focal length, 50 mm), and
	// a price ceiling: the price times 1, 1.25 or 1.5, up to the next
	// multiple of 5 under $50, of 10 under $200, of 50 under $1,000.
	for _, tc := range []struct {
		id       string
		kinds    []parser.Kind
		ceilings []string
		must     []parser.Kind
	}{
		// 39.95 → 40; 49.94 → 50; 59.93 → 60 (10s from 50).
		{"SK-1", k(typ, col, mat, aud, brd, siz, prc), []string{"40 USD", "50 USD", "60 USD"}, k(typ, siz)},
		// 54 → 60; 67.5 → 70; 81 → 90.
		{"SK-2", k(typ, pat, mat, aud, brd, siz, prc), []string{"60 USD", "70 USD", "90 USD"}, k(typ, siz)},
		// 89 → 90; 111.25 → 120; 133.5 → 140.
		{"SW-1", k(typ, pat, mat, brd, siz, prc), []string{"90 USD", "120 USD", "140 USD"}, k(typ, siz)},
		// 249 → 250 (50s from 200); 311.25 → 350; 373.5 → 400.
		{"LN-1", k(typ, col, brd, cmp, msr, prc), []string{"250 USD", "350 USD", "400 USD"}, k(typ)},
		// 189.99 → 190; 237.49 → 250; 284.99 → 300.
		{"RG-1", k(typ, pat, mat, brd, msr, prc), []string{"190 USD", "250 USD", "300 USD"}, k(typ)},
	} {
		for _, c := range cases {
			if c.Product != tc.id {
				continue
			}
			p := product(t, ps, c.Product)
			if c.Style != StyleLong {
				t.Errorf("%q: style %q, want long", c.Query, c.Style)
			}
			if n := len(c.Typed); n < 4 || n > 7 {
				t.Errorf("%q: %d constraints, want 4 to 7", c.Query, n)
			}
			if c.Typed[0].Kind != typ {
				t.Errorf("%q: the product type is not first of %+v", c.Query, c.Typed)
			}
			var kinds []parser.Kind
			for _, a := range c.Typed {
				kinds = append(kinds, a.Kind)
				injected := a.Kind == failedKind[c.Failure]
				switch {
				case !injected && !slices.Contains(tc.kinds, a.Kind):
					t.Errorf("%q: %s is no attribute %s can give (%v)", c.Query, a.Kind, tc.id, tc.kinds)
				case !injected && !Satisfies(p, a):
					t.Errorf("%q: %s has not %+v, and it was not injected (%s)", c.Query, tc.id, a, c.Injected)
				case a.Kind == prc && !slices.Contains(tc.ceilings, a.Value):
					t.Errorf("%q: ceiling %s, want one of %v", c.Query, a.Value, tc.ceilings)
				}
				if !strings.Contains(c.Query, a.Text) {
					t.Errorf("%q does not write %q", c.Query, a.Text)
				}
			}
			for _, m := range tc.must {
				if !slices.Contains(kinds, m) {
					t.Errorf("%q: no %s, which is always typed when %s has it", c.Query, m, tc.id)
				}
			}
		}
	}
	// The failures are those of the short style, and so are their checks
	// (TestGenerateTiny): the products and their attributes are the same.
	for i, c := range cases {
		if want := failures[i%len(failures)]; c.Failure != want {
			t.Errorf("case %d is %s, want %s: the failures take turns", i, c.Failure, want)
		}
		if c.Product == "LN-2" {
			t.Errorf("%q: LN-2 is out of stock", c.Query)
		}
	}
}

// failedKind is the kind of attribute each failure is injected in.
var failedKind = map[Failure]parser.Kind{FailColour: parser.KindColour, FailPattern: parser.KindPattern,
	FailTypo: parser.KindProductType, FailKeyword: parser.KindKeyword, FailMeasure: parser.KindMeasure}

// A product with too little to say gives no long case: a sweater with a
// brand alone has, with its type misspelt, two constraints, and with an
// extra word three. A rug with a brand and a price has, with an extra
// word, exactly four (its type is too short to misspell, and it has no
// colour, pattern or measure to make miss), and a $100 price gives a
// ceiling of 110 (100 × 1), 130 (125) or 160 (150), multiples of 10.
func TestGenerateLongFew(t *testing.T) {
	price := &catalog.Price{Amount: "100.00", Currency: "USD"}
	few := []catalog.Product{{ID: "SW-9", Title: "Plain sweater", ProductType: "sweater", Category: "apparel", Brand: "Quillet"}}
	if cases := Generate(few, Options{Queries: 5, Seed: 1, Style: StyleLong}); len(cases) != 0 {
		t.Errorf("%d cases of a sweater with two or three constraints to give, want none: %+v", len(cases), cases)
	}
	four := []catalog.Product{{ID: "RG-9", Title: "Plain rug", ProductType: "rug", Category: "home", Brand: "Mossel", Price: price}}
	cases := Generate(four, Options{Queries: 5, Seed: 1, Style: StyleLong})
	if len(cases) != 2 {
		t.Fatalf("%d cases, want 2: ten turns, only the two keyword turns give a case", len(cases))
	}
	for _, c := range cases {
		var kinds []parser.Kind
		for _, a := range c.Typed {
			kinds = append(kinds, a.Kind)
		}
		want := []parser.Kind{parser.KindProductType, parser.KindBrand, parser.KindPrice, parser.KindKeyword}
		if c.Failure != FailKeyword || !slices.Equal(kinds, want) {
			t.Errorf("%q: %s with %v, want keyword with %v", c.Query, c.Failure, kinds, want)
		}
		if a, _ := typedOf(c, parser.KindPrice); !slices.Contains([]string{"110 USD", "130 USD", "160 USD"}, a.Value) {
			t.Errorf("%q: ceiling %s, want 110, 130 or 160 USD", c.Query, a.Value)
		}
	}
}

// Every way a query states a ceiling is read by the parser as a price
// with that maximum, in US dollars, and nothing else.
func TestPriceText(t *testing.T) {
	r := rand.New(rand.NewPCG(1, 2))
	seen := map[string]bool{}
	for range 200 {
		q := "sweater " + priceText(r, 90)
		seen[q] = true
		res := parser.Parse(q)
		if len(res.Constraints) != 2 {
			t.Errorf("%q: %d constraints, want the type and the price", q, len(res.Constraints))
			continue
		}
		c := res.Constraints[1]
		if c.Kind != parser.KindPrice || c.Price == nil || c.Price.Max == nil || *c.Price.Max != "90.00" || c.Price.Currency != "USD" {
			t.Errorf("%q: %s %+v, want a price of at most 90 USD", q, c.Kind, c.Price)
		}
	}
	if len(seen) != len(priceWords) {
		t.Errorf("%d phrasings drawn, want all %d", len(seen), len(priceWords))
	}
}

// A long order ranks every kind the long style writes, each at its own
// place.
func TestLongOrders(t *testing.T) {
	for i, o := range longOrders {
		places := map[int]bool{}
		for _, k := range longKinds {
			if k == parser.KindKeyword {
				continue
			}
			r, ok := o[k]
			if !ok || places[r] {
				t.Errorf("order %d: %s unranked or sharing place %d", i, k, r)
			}
			places[r] = true
		}
	}
}

// withinCeiling compares in hundredths and in one currency.
func TestWithinCeiling(t *testing.T) {
	for _, tc := range []struct {
		name, amount, cur, ceiling, reason string
		want                               bool
	}{
		{"under", "39.95", "USD", "40 USD", "39.95 is under 40", true},
		{"equal", "40.00", "USD", "40 USD", "a ceiling is inclusive, as the parser reads \"under\"", true},
		{"over", "40.01", "USD", "40 USD", "a cent over is over", false},
		{"other currency", "39.95", "CAD", "40 USD", "Canadian dollars are not US dollars (ISO 4217)", false},
	} {
		t.Run(tc.name, func(t *testing.T) {
			if got := withinCeiling(&catalog.Price{Amount: tc.amount, Currency: tc.cur}, tc.ceiling); got != tc.want {
				t.Errorf("%s: got %v", tc.reason, got)
			}
		})
	}
	if withinCeiling(nil, "40 USD") {
		t.Error("a product with no price meets no ceiling")
	}
}

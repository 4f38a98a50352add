package eval

import (
	"math"
	"math/rand/v2"
	"slices"
	"strconv"
	"strings"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// The long style's bounds on the constraints a query asks for, the
// product type and the injected attribute among them.
const (
	longMin = 4
	longMax = 7
)

// longOrders are the long style's word orders; a query lists its
// attributes by rank, and a keyword goes anywhere.
var longOrders = []map[parser.Kind]int{
	// "women's drafnolo navy striped merino crew sweater size m for jx-10 under $90"
	{parser.KindAudience: 0, parser.KindBrand: 1, parser.KindColour: 2, parser.KindPattern: 3, parser.KindMaterial: 4,
		parser.KindSilhouette: 5, parser.KindSpec: 6, parser.KindMeasure: 7, parser.KindProductType: 8, parser.KindSize: 9,
		parser.KindCompatibility: 10, parser.KindPrice: 11},
	// "sweater drafnolo navy merino crew striped size m 85mm women's under $90 for jx-10"
	{parser.KindProductType: 0, parser.KindBrand: 1, parser.KindColour: 2, parser.KindMaterial: 3, parser.KindSilhouette: 4,
		parser.KindPattern: 5, parser.KindSize: 6, parser.KindSpec: 7, parser.KindMeasure: 8, parser.KindAudience: 9,
		parser.KindPrice: 10, parser.KindCompatibility: 11},
	// "under $90 2x4 8 ft navy merino striped crew drafnolo sweater women's for jx-10 size m"
	{parser.KindPrice: 0, parser.KindSpec: 1, parser.KindMeasure: 2, parser.KindColour: 3, parser.KindMaterial: 4,
		parser.KindPattern: 5, parser.KindSilhouette: 6, parser.KindBrand: 7, parser.KindProductType: 8, parser.KindAudience: 9,
		parser.KindCompatibility: 10, parser.KindSize: 11},
	// "navy crew sweater merino striped drafnolo 85mm size m under $90 women's for jx-10"
	{parser.KindColour: 0, parser.KindSilhouette: 1, parser.KindProductType: 2, parser.KindMaterial: 3, parser.KindPattern: 4,
		parser.KindBrand: 5, parser.KindSpec: 6, parser.KindMeasure: 7, parser.KindSize: 8, parser.KindPrice: 9,
		parser.KindAudience: 10, parser.KindCompatibility: 11},
}

// orders are the word orders of the generator's style.
func (g *generator) orders() []map[parser.Kind]int {
	if g.style == StyleLong {
		return longOrders
	}
	return orders
}

// longChoice is an attribute the long style may type for a product, and
// how to write it.
type longChoice struct {
	kind  parser.Kind
	write func() Attr
}

// longAttributes chooses what a shopper types for p in the long style:
// the product type, the injected attribute and, when p has them, a size
// and a designation always; then, until the query has n constraints (n
// drawn from 4 to 7), attributes drawn at random without replacement
// from the others p has (a lexicon colour, a pattern other than solid, a
// material, a silhouette, an audience, its brand, a model it fits, its
// main measure, a price ceiling it meets). A product with fewer than 4
// constraints to give gives no case. The attributes come in a fixed
// order of kinds, the product type first.
func (g *generator) longAttributes(r *rand.Rand, p *catalog.Product, entry *lexicon.Entry, inj Attr) ([]Attr, bool) {
	must, may := g.longChoices(r, p, entry, inj)
	n := longMin + r.IntN(longMax-longMin+1)
	if len(must)+len(may) < longMin {
		return nil, false
	}
	r.Shuffle(len(may), func(i, j int) { may[i], may[j] = may[j], may[i] })
	chosen := map[parser.Kind]bool{}
	for _, c := range must {
		chosen[c.kind] = true
	}
	for _, c := range may {
		if len(chosen) >= n {
			break
		}
		chosen[c.kind] = true
	}
	var out []Attr
	for _, c := range append(must, may...) {
		if chosen[c.kind] {
			out = append(out, c.write())
		}
	}
	slices.SortStableFunc(out, func(a, b Attr) int { return kindRank(a.Kind) - kindRank(b.Kind) })
	return out, true
}

// longKinds is the fixed order of kinds a long case lists its attributes
// in, the product type first.
var longKinds = []parser.Kind{parser.KindProductType, parser.KindColour, parser.KindPattern, parser.KindMaterial,
	parser.KindSilhouette, parser.KindAudience, parser.KindBrand, parser.KindSize, parser.KindSpec,
	parser.KindCompatibility, parser.KindMeasure, parser.KindPrice, parser.KindKeyword}

// kindRank is a kind's place in longKinds.
func kindRank(k parser.Kind) int {
	if i := slices.Index(longKinds, k); i >= 0 {
		return i
	}
	return len(longKinds)
}

// longChoices are the attributes p must have typed and those it may, in
// the order of longKinds; the injected attribute takes its kind's place.
func (g *generator) longChoices(r *rand.Rand, p *catalog.Product, entry *lexicon.Entry, inj Attr) (must, may []longChoice) {
	w := g.writers(r, p, entry)
	for _, kind := range longKinds {
		always := kind == parser.KindProductType || kind == parser.KindSize || kind == parser.KindSpec
		switch {
		case inj.Kind == kind:
			must = append(must, longChoice{kind, func() Attr { return inj }})
		case w[kind].has && always:
			must = append(must, longChoice{kind, w[kind].write})
		case w[kind].has:
			may = append(may, longChoice{kind, w[kind].write})
		}
	}
	return must, may
}

// dollars is a price in US dollars, the currency a bare "$" means to
// the parser by default.
func dollars(p *catalog.Price) (float64, bool) {
	if p == nil || p.Currency != "USD" {
		return 0, false
	}
	v, err := strconv.ParseFloat(p.Amount, 64)
	return v, err == nil && v > 0
}

// priceCeiling is the budget a shopper states for a product of the
// given price: the price raised by 0, 25 or 50% at random, then the
// next round amount above it (a multiple of 5 dollars under 50, of 10
// under 200, of 50 under 1,000, of 100 from there), so that the product
// is always within it.
func priceCeiling(r *rand.Rand, price float64) int {
	v := price * []float64{1, 1.25, 1.5}[r.IntN(3)]
	step := 100.0
	switch {
	case v < 50:
		step = 5
	case v < 200:
		step = 10
	case v < 1000:
		step = 50
	}
	return int((math.Floor(v/step) + 1) * step)
}

// priceWords are the ways a query states a ceiling; %s is the amount.
var priceWords = []string{"under $%s", "below $%s", "less than $%s", "max $%s", "up to $%s", "$%s or less", "under %s dollars"}

func priceText(r *rand.Rand, ceiling int) string {
	return strings.Replace(priceWords[r.IntN(len(priceWords))], "%s", strconv.Itoa(ceiling), 1)
}

// brandText writes a brand as the catalog does, or in lower case.
func brandText(r *rand.Rand, brand string) string {
	if r.IntN(2) == 0 {
		return strings.ToLower(brand)
	}
	return brand
}

// silhouetteText writes a silhouette: its name, or one time in three
// one of the lexicon's aliases ("crew neck" for crew).
func (g *generator) silhouetteText(r *rand.Rand, name string) string {
	e, ok := g.lex.Lookup(lexicon.Silhouette, name)
	if !ok || len(e.Aliases) == 0 || r.IntN(3) != 0 {
		return name
	}
	return e.Aliases[r.IntN(len(e.Aliases))]
}

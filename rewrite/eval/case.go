package eval

import (
	"math"
	"slices"
	"strconv"
	"strings"

	"github.com/whittle-search/whittle/lexicon/units"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// Failure names the way a query of the set was made to miss its exact
// match.
type Failure string

// The failures Generate injects.
const (
	// FailColour asks for a shopper's colour word near the product's
	// colour, which the shop does not use as a colour name.
	FailColour Failure = "colour"
	// FailPattern asks for a pattern no product of the type comes in.
	FailPattern Failure = "pattern"
	// FailTypo misspells the product type by one edit.
	FailTypo Failure = "typo"
	// FailKeyword adds a word no product's text has.
	FailKeyword Failure = "keyword"
	// FailMeasure asks for a measure a few percent off the product's,
	// which no product of the type has.
	FailMeasure Failure = "measure"
)

// failures are the failures in the order Generate takes turns with
// them.
var failures = []Failure{FailColour, FailPattern, FailTypo, FailKeyword, FailMeasure}

// Failures returns every failure, in the order Generate takes turns with
// them, in a slice of the caller's own.
func Failures() []Failure { return slices.Clone(failures) }

// Style names how the queries of a set are written.
type Style string

// The styles Generate writes in.
const (
	// StyleShort writes the product type with a few attributes, about
	// three constraints a query.
	StyleShort Style = "short"
	// StyleLong writes four to seven constraints a query, from more of
	// the product's attributes: brand, silhouette and a price ceiling too.
	StyleLong Style = "long"
)

// Styles returns every style, in the order reports give them, in a
// slice of the caller's own.
func Styles() []Style { return []Style{StyleShort, StyleLong} }

// Attr is one attribute a query asks for, as the generator wrote it.
type Attr struct {
	// Kind is the constraint kind the words express.
	Kind parser.Kind `json:"kind"`
	// Dimension names a measure ("focal_length") where Kind is measure.
	Dimension string `json:"dimension,omitempty"`
	// Value is the attribute as the catalog writes it: a product type,
	// colour, pattern or material name, a size, a designation, a model
	// code, an audience, a brand, a measure with its unit ("85 mm"), a
	// word, or for a price the ceiling with its currency ("90 USD").
	Value string `json:"value"`
	// Text is how the query writes it ("85mm", "sz l", "fits jx-10").
	Text string `json:"text"`
}

// Case is one labelled query.
type Case struct {
	// Query is the text a shopper would type, and Style how it was
	// written.
	Query string `json:"query"`
	Style Style  `json:"style"`
	// Product is the id of the product the query was written for, and
	// ProductType its type.
	Product     string `json:"product"`
	ProductType string `json:"product_type"`
	// Failure is how the query was made to miss, and Injected says what
	// was put in: "dusty blue (the shop's morning fog)".
	Failure  Failure `json:"failure"`
	Injected string  `json:"injected"`
	// Typed are the attributes the query asks for, in the order written.
	Typed []Attr `json:"typed"`
	// Hard are the typed attributes the policy makes hard for the
	// product's category and type: every hit should have them.
	Hard []Attr `json:"hard"`
}

// Satisfies reports whether product p has attribute a, read from the
// product's own fields: a size among its sizes, a designation among its
// specs, a model among those it fits, an equal name, a measure equal in
// base units, a price at or under the ceiling in the same currency, a
// keyword among the words of its title and description.
func Satisfies(p *catalog.Product, a Attr) bool {
	switch a.Kind {
	case parser.KindProductType:
		return strings.EqualFold(p.ProductType, a.Value)
	case parser.KindColour:
		return strings.EqualFold(p.Colour, a.Value)
	case parser.KindPattern:
		return strings.EqualFold(p.Pattern, a.Value)
	case parser.KindMaterial:
		return strings.EqualFold(p.Material, a.Value)
	case parser.KindSilhouette:
		return strings.EqualFold(p.Silhouette, a.Value)
	case parser.KindBrand:
		return strings.EqualFold(p.Brand, a.Value)
	case parser.KindPrice:
		return withinCeiling(p.Price, a.Value)
	case parser.KindAudience:
		return strings.EqualFold(p.Audience, a.Value)
	case parser.KindSize:
		return slices.ContainsFunc(p.Sizes, func(s string) bool { return strings.EqualFold(s, a.Value) })
	case parser.KindSpec:
		return slices.ContainsFunc(p.Spec, func(s string) bool { return sameCode(s, a.Value) })
	case parser.KindCompatibility:
		return slices.ContainsFunc(p.CompatibleWith, func(s string) bool { return sameCode(s, a.Value) })
	case parser.KindMeasure:
		got, ok1 := baseAmount(p.Measures[a.Dimension])
		want, ok2 := baseAmount(a.Value)
		return ok1 && ok2 && math.Abs(got-want) <= 1e-9*math.Max(1, math.Abs(want))
	case parser.KindKeyword:
		return slices.Contains(textWords(p), strings.ToLower(a.Value))
	}
	return false
}

// SatisfiesAll reports whether p has every one of attrs.
func SatisfiesAll(p *catalog.Product, attrs []Attr) bool {
	for _, a := range attrs {
		if !Satisfies(p, a) {
			return false
		}
	}
	return true
}

// sameCode compares designations and model codes without regard to case
// or spaces ("14 AWG" is "14 awg" is "14awg").
func sameCode(a, b string) bool {
	strip := func(s string) string { return strings.ToLower(strings.ReplaceAll(s, " ", "")) }
	return strip(a) == strip(b)
}

// baseAmount reads a catalog measure, a number, a space and a unit
// ("85 mm", "12 fl oz"), into the unit's base unit (lexicon/units, US
// customary volumes). A range or anything else is not read.
func baseAmount(s string) (float64, bool) {
	num, unit, ok := strings.Cut(strings.TrimSpace(s), " ")
	if !ok {
		return 0, false
	}
	v, err := strconv.ParseFloat(num, 64)
	if err != nil {
		return 0, false
	}
	u, ok := units.Lookup(unit, units.USCustomary)
	if !ok {
		return 0, false
	}
	return v * u.ToBase, true
}

// textWords are the lower-case words of a product's title and
// description, split at anything but letters and digits.
func textWords(p *catalog.Product) []string {
	return strings.FieldsFunc(strings.ToLower(p.Title+" "+p.Description), func(r rune) bool {
		return !(r >= 'a' && r <= 'z' || r >= '0' && r <= '9')
	})
}

// withinCeiling reports whether price is at most ceiling ("90 USD"), in
// the same currency, compared in hundredths.
func withinCeiling(price *catalog.Price, ceiling string) bool {
	amount, cur, ok := strings.Cut(ceiling, " ")
	if price == nil || !ok || !strings.EqualFold(price.Currency, cur) {
		return false
	}
	have, err1 := strconv.ParseFloat(price.Amount, 64)
	limit, err2 := strconv.ParseFloat(amount, 64)
	return err1 == nil && err2 == nil && math.Round(have*100) <= math.Round(limit*100)
}

package eval

import (
	"math/rand/v2"
	"slices"
	"strconv"
	"strings"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/units"
	"github.com/whittle-search/whittle/parser"
)

// orders are the word orders a query is written in: each ranks the kinds
// of attribute, and a query lists its attributes by rank. A keyword goes
// anywhere.
var orders = []map[parser.Kind]int{
	// "women's navy striped merino 85mm sweater size m for jx-10"
	{parser.KindAudience: 0, parser.KindColour: 1, parser.KindPattern: 2, parser.KindMaterial: 3, parser.KindMeasure: 4,
		parser.KindSpec: 5, parser.KindProductType: 6, parser.KindSize: 7, parser.KindCompatibility: 8},
	// "sweater navy merino striped size m 85mm women's for jx-10"
	{parser.KindProductType: 0, parser.KindColour: 1, parser.KindMaterial: 2, parser.KindPattern: 3, parser.KindSize: 4,
		parser.KindMeasure: 5, parser.KindSpec: 6, parser.KindAudience: 7, parser.KindCompatibility: 8},
	// "85mm navy merino striped sweater women's for jx-10 size m"
	{parser.KindMeasure: 0, parser.KindSpec: 1, parser.KindColour: 2, parser.KindMaterial: 3, parser.KindPattern: 4,
		parser.KindProductType: 5, parser.KindAudience: 6, parser.KindCompatibility: 7, parser.KindSize: 8},
}

// phrase writes the attributes' texts in one of the orders.
func phrase(r *rand.Rand, typed []Attr, orders []map[parser.Kind]int) string {
	rank := orders[r.IntN(len(orders))]
	var kw []string
	var rest []Attr
	for _, a := range typed {
		if a.Kind == parser.KindKeyword {
			kw = append(kw, a.Text)
			continue
		}
		rest = append(rest, a)
	}
	slices.SortStableFunc(rest, func(a, b Attr) int { return rank[a.Kind] - rank[b.Kind] })
	words := make([]string, 0, len(typed))
	for _, a := range rest {
		words = append(words, a.Text)
	}
	for _, k := range kw {
		i := r.IntN(len(words) + 1)
		words = slices.Insert(words, i, k)
	}
	return strings.Join(words, " ")
}

// typeText writes a product type: its name, a one-word alias of the
// lexicon, or the name's plural.
func (g *generator) typeText(r *rand.Rand, e *lexicon.Entry) string {
	switch r.IntN(5) {
	case 0:
		var one []string
		for _, a := range e.Aliases {
			if !strings.ContainsAny(a, " '") {
				one = append(one, a)
			}
		}
		if len(one) > 0 {
			return one[r.IntN(len(one))]
		}
	case 1:
		if !strings.ContainsAny(e.Name[len(e.Name)-1:], "sxyh'") {
			return e.Name + "s"
		}
	}
	return e.Name
}

// colourText writes a colour: its name, or a shorter one-word alias of
// the lexicon (an abbreviation such as "blk").
func (g *generator) colourText(r *rand.Rand, name string) string {
	e, ok := g.lex.Lookup(lexicon.Colour, name)
	if !ok || r.IntN(3) != 0 {
		return name
	}
	var short []string
	for _, a := range e.Aliases {
		if len(a) < len(name) && !strings.ContainsAny(a, " -") {
			short = append(short, a)
		}
	}
	if len(short) == 0 {
		return name
	}
	return short[r.IntN(len(short))]
}

// audienceWords are the ways a query names an audience, each an alias in
// lexicon/data/audiences.wlx.
var audienceWords = map[string][]string{
	"women":  {"women's", "womens", "ladies", "women"},
	"men":    {"men's", "mens", "men"},
	"kids":   {"kids", "kids'", "children's"},
	"unisex": {"unisex"},
}

func audienceText(r *rand.Rand, audience string) string {
	ws := audienceWords[audience]
	if len(ws) == 0 {
		return audience
	}
	return ws[r.IntN(len(ws))]
}

// sizeText writes a size: a bed size bare or with "size" after it, any
// other after "size" or "sz".
func sizeText(r *rand.Rand, s string) string {
	switch s {
	case "twin", "full", "queen", "king":
		if r.IntN(2) == 0 {
			return s
		}
		return s + " size"
	}
	if r.IntN(3) == 0 {
		return "sz " + s
	}
	return "size " + s
}

// compatText writes a compatible model after one of the phrases that say
// "it must fit".
func compatText(r *rand.Rand, model string) string {
	lead := []string{"for", "fits", "compatible with"}
	return lead[r.IntN(len(lead))] + " " + model
}

// unitSpellings are the ways a query writes each unit the catalog uses,
// every one a spelling units.Lookup knows; marks and one-letter symbols
// are written against the number.
var unitSpellings = map[string][]string{
	"in": {"in", "inch", `"`}, "ft": {"ft", "foot", "'"}, "mm": {"mm", "millimeter"},
	"L": {"l", "litre", "liter"}, "mL": {"ml"}, "qt": {"qt", "quart"}, "gal": {"gal", "gallon"},
	"fl oz": {"fl oz"}, "oz": {"oz", "ounce"}, "lb": {"lb", "lbs", "pound"}, "kg": {"kg", "kilo"},
	"W": {"w", "watt"}, "V": {"v", "volt"}, "A": {"a", "amp"}, "mAh": {"mah"}, "GB": {"gb"}, "TB": {"tb"},
}

// measureText writes a measure ("85 mm"): with the unit left out, one
// time in three, where the slot's unit is the measure's and its range
// holds the amount, so that the parser infers it; else with a spelling of
// the unit, against the number or after a space.
func measureText(r *rand.Rand, slot lexicon.Slot, value string) string {
	num, unit, _ := strings.Cut(value, " ")
	u, ok := units.Lookup(unit, units.USCustomary)
	v, err := strconv.ParseFloat(num, 64)
	if ok && err == nil && u.Symbol == slot.Unit.Symbol && slot.Holds(v) && r.IntN(3) == 0 {
		return num
	}
	sp := unitSpellings[unit]
	if len(sp) == 0 {
		return value
	}
	s := sp[r.IntN(len(sp))]
	if len(s) == 1 || r.IntN(2) == 0 && len(s) <= 3 {
		return num + s
	}
	return num + " " + s
}

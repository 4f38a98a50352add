package parser

import (
	"math"
	"strings"
	"testing"

	"github.com/google/go-cmp/cmp"

	"github.com/whittle-search/whittle/lexicon/units"
)

// tagged is the part of a constraint the table tests compare.
type tagged struct {
	Kind       Kind
	Text       string
	Value      string
	Strictness Strictness
	Excluded   bool
	Inferred   bool
}

func project(r *Result) []tagged {
	out := make([]tagged, 0, len(r.Constraints))
	for _, c := range r.Constraints {
		if c.Kind == KindFiller {
			continue
		}
		out = append(out, tagged{c.Kind, c.Text, c.Value(), c.Strictness, c.Excluded, c.Inferred})
	}
	return out
}

// t builds an expected constraint at its default strictness.
func tg(k Kind, text, value string) tagged {
	return tagged{Kind: k, Text: text, Value: value, Strictness: DefaultStrictness(k)}
}

func (x tagged) excluded() tagged { x.Excluded = true; return x }
func (x tagged) inferred() tagged { x.Inferred = true; return x }
func (x tagged) hard() tagged     { x.Strictness = Hard; return x }
func (x tagged) firm() tagged     { x.Strictness = Firm; return x }

type parseCase struct {
	name, query, reason string
	category            string
	want                []tagged
}

// parseCases are the hand-checked readings. The reason says where the
// expected reading comes from: a standard, a fact of the trade (common
// practice), or a rule of whittle's documented on ParseWith.
var parseCases = []parseCase{
	{
		name: "sweater with size and price", query: "charcoal merino crew sweater size l under $90",
		reason: "every word of a typical apparel query is tagged; size is hard, price a ceiling in USD (common practice)", category: "apparel",
		want: []tagged{tg(KindColour, "charcoal", "charcoal"), tg(KindMaterial, "merino", "merino"), tg(KindSilhouette, "crew", "crew"),
			tg(KindProductType, "sweater", "sweater"), tg(KindSize, "size l", "l (letter)"), tg(KindPrice, "under $90", "≤ 90.00 USD")},
	},
	{
		name: "lens focal length", query: "85 lens", category: "camera",
		reason: "a lens is sold by focal length in millimetres (common practice)",
		want:   []tagged{tg(KindMeasure, "85", "85 mm").inferred(), tg(KindProductType, "lens", "lens")},
	},
	{
		name: "tv diagonal", query: "43 tv", category: "electronics",
		reason: "TV screens are sold by diagonal in inches (common practice)",
		want:   []tagged{tg(KindMeasure, "43", "43 in").inferred(), tg(KindProductType, "tv", "tv")},
	},
	{
		name: "cushion cover dimensions", query: "20x20 cushion cover", category: "home",
		reason: "cushion covers are sold by side in inches in the US (common practice)",
		want: []tagged{tg(KindMeasure, "20", "20 in").inferred(), tg(KindMeasure, "20", "20 in").inferred(),
			tg(KindProductType, "cushion cover", "cushion cover")},
	},
	{
		name: "lumber with length", query: "2x6 12 ft", category: "lumber",
		reason: "2x6 is a PS 20 nominal size; the length is typed",
		want:   []tagged{tg(KindSpec, "2x6", "2x6 (lumber)"), tg(KindMeasure, "12 ft", "12 ft")},
	},
	{
		name: "lumber with bare length", query: "2x4x8", category: "lumber",
		reason: "a third number after a nominal size is the length in feet (common practice)",
		want:   []tagged{tg(KindSpec, "2x4", "2x4 (lumber)"), tg(KindMeasure, "8", "8 ft").inferred()},
	},
	{
		name: "dimension with inch marks and labels", query: `24"w x 36"h rug`, category: "home",
		reason: `" is the inch mark; w and h label width and height`,
		want:   []tagged{tg(KindMeasure, `24"w`, "24 in"), tg(KindMeasure, `36"h`, "36 in"), tg(KindProductType, "rug", "rug")},
	},
	{
		name: "dimension with foot marks", query: "10' x 12' rug", category: "home",
		reason: "' is the foot mark",
		want:   []tagged{tg(KindMeasure, "10'", "10 ft"), tg(KindMeasure, "12'", "12 ft"), tg(KindProductType, "rug", "rug")},
	},
	{
		name: "exclusions", query: "not white -leather sweater without hood", category: "apparel",
		reason: "not, -, without exclude the next span and the mark is part of its span",
		want: []tagged{tg(KindColour, "not white", "not white").excluded(), tg(KindMaterial, "-leather", "not leather").excluded(),
			tg(KindProductType, "sweater", "sweater"), tg(KindSilhouette, "without hood", "not hooded").excluded()},
	},
	{
		name: "minus before a battery size", query: "-cr2032 battery", category: "batteries",
		reason: "a minus stuck to a word excludes the designation the word starts (IEC 60086 CR2032), not just its letters",
		want:   []tagged{tg(KindSpec, "-cr2032", "not CR2032 (battery)").excluded(), tg(KindProductType, "battery", "battery")},
	},
	{
		name: "minus before a paper size", query: "-a4 paper", category: "office",
		reason: "the same for ISO 216 A4",
		want:   []tagged{tg(KindSpec, "-a4", "not A4 (paper)").excluded(), tg(KindProductType, "paper", "paper")},
	},
	{
		name: "minus before a wire gauge", query: "-12awg wire", category: "electrical",
		reason: "a minus before a number excludes the designation it starts (ASTM B258 12 AWG), as before a word",
		want:   []tagged{tg(KindSpec, "-12awg", "not 12 AWG (awg)").excluded(), tg(KindProductType, "wire", "electrical wire")},
	},
	{
		name: "minus before a price", query: "-$50 shoe", category: "footwear",
		reason: "the same for a price, a ceiling read as a bare price is",
		want:   []tagged{tg(KindPrice, "-$50", "not ≤ 50.00 USD").excluded(), tg(KindProductType, "shoe", "shoe")},
	},
	{
		name: "minus before a bare number", query: "-20 sleeping bag", category: "accessories",
		reason: "a minus right before a bare number may be its sign; whittle reads no negative amount, so it excludes nothing and the number stays",
		want:   []tagged{tg(KindMeasure, "20", "20"), tg(KindKeyword, "sleeping", "sleeping"), tg(KindProductType, "bag", "bag")},
	},
	{
		name: "minus before a thread", query: "-m8 bolt", category: "hardware",
		reason: "the same for ISO 261 M8",
		want:   []tagged{tg(KindSpec, "-m8", "not M8x1.25 (metric_thread)").excluded(), tg(KindProductType, "bolt", "bolt")},
	},
	{
		name: "no zip", query: "hoodie no zip", category: "apparel",
		reason: "no excludes the next span",
		want:   []tagged{tg(KindProductType, "hoodie", "hoodie"), tg(KindSilhouette, "no zip", "not zip").excluded()},
	},
	{
		name: "hyphen inside a word is not an exclusion", query: "3-ply toilet paper", category: "home",
		reason: "a dash stuck to the word before it joins, it does not exclude",
	},
	{
		name: "compatibility target", query: "phone case for jx-10", category: "electronics",
		reason: "the target of for runs to the end",
		want:   []tagged{tg(KindProductType, "phone case", "phone case"), tg(KindCompatibility, "for jx-10", "fits jx-10")},
	},
	{
		name: "a model named and numbered", query: "waterproof phone case for lumora 14", category: "electronics",
		reason: "a model is often a name and a number (common practice): the target is the model, hard, where the name was a stray word and the 14 a unitless number (the model is invented)",
		want:   []tagged{tg(KindSilhouette, "waterproof", "waterproof"), tg(KindProductType, "phone case", "phone case"), tg(KindCompatibility, "for lumora 14", "fits lumora 14")},
	},
	{
		name: "a model's variant words", query: "phone case for lumora 14 pro max clear", category: "electronics",
		reason: "the words a maker puts after a model (pro, max) are the model's, though max may also bound a price (invented model)",
		want:   []tagged{tg(KindProductType, "phone case", "phone case"), tg(KindCompatibility, "for lumora 14 pro max", "fits lumora 14 pro max"), tg(KindColour, "clear", "clear")},
	},
	{
		name: "max bounding a price after a model", query: "charger for zk-3 max $30", category: "electronics",
		reason: "max before a value is a bound, not the model's variant",
		want:   []tagged{tg(KindProductType, "charger", "charger"), tg(KindCompatibility, "for zk-3", "fits zk-3"), tg(KindPrice, "max $30", "≤ 30.00 USD")},
	},
	{
		name: "a word after a model code", query: "phone case for jx-10 roomy", category: "electronics",
		reason: "a model code ends the target; the word after it is the shopper's, not the model's",
		want:   []tagged{tg(KindProductType, "phone case", "phone case"), tg(KindCompatibility, "for jx-10", "fits jx-10"), tg(KindKeyword, "roomy", "roomy")},
	},
	{
		name: "a variant after a model code", query: "phone case for jx-10 pro", category: "electronics",
		reason: "pro names a variant of the model (common practice)",
		want:   []tagged{tg(KindProductType, "phone case", "phone case"), tg(KindCompatibility, "for jx-10 pro", "fits jx-10 pro")},
	},
	{
		name: "compatible with, then a colour", query: "phone case compatible with jx-10 black", category: "electronics",
		reason: "the target stops at the next tagged span (the colour)",
		want: []tagged{tg(KindProductType, "phone case", "phone case"), tg(KindCompatibility, "compatible with jx-10", "fits jx-10"),
			tg(KindColour, "black", "black")},
	},
	{
		name: "for an audience is not a target", query: "running shoes for women", category: "footwear",
		reason: "for followed straight away by a tagged span has no target",
		want:   []tagged{tg(KindProductType, "running shoes", "running shoe"), tg(KindAudience, "women", "women")},
	},
	{
		name: "range with unit", query: "20-30 mm", reason: "the unit after a range applies to both ends",
		want: []tagged{tg(KindMeasure, "20-30 mm", "20..30 mm")},
	},
	{
		name: "range with to", query: "20 to 30 mm", reason: "to joins a range",
		want: []tagged{tg(KindMeasure, "20 to 30 mm", "20..30 mm")},
	},
	{
		name: "between", query: "between 2 and 4 tb", reason: "between A and B is a range",
		want: []tagged{tg(KindMeasure, "between 2 and 4 tb", "2..4 TB")},
	},
	{
		name: "at least", query: "at least 2 tb", reason: "at least sets a floor",
		want: []tagged{tg(KindMeasure, "at least 2 tb", "≥ 2 TB")},
	},
	{
		name: "comparison signs", query: "<= 30 w", reason: "<= sets a ceiling",
		want: []tagged{tg(KindMeasure, "<= 30 w", "≤ 30 W")},
	},
	{
		name: "price range in dollars", query: "$20-$30", reason: "a range of prices",
		want: []tagged{tg(KindPrice, "$20-$30", "20.00..30.00 USD")},
	},
	{
		name: "price range, symbol once", query: "$20-30", reason: "the currency of one end applies to both",
		want: []tagged{tg(KindPrice, "$20-30", "20.00..30.00 USD")},
	},
	{
		name: "price max after", query: "$90 max", reason: "max after a price sets a ceiling",
		want: []tagged{tg(KindPrice, "$90 max", "≤ 90.00 USD")},
	},
	{
		name: "max before a price", query: "size 12 max $60", reason: "a bound word with a price right after it bounds the price, not the size before it",
		want: []tagged{tg(KindSize, "size 12", "12 (numeric)").hard(), tg(KindPrice, "max $60", "≤ 60.00 USD")},
	},
	{
		name: "or less before a measure", query: "$120 or less 1.9 litre rice cooker",
		reason:   "or less only ever follows what it bounds, so the number after it is a measure of its own (found by the long eval set, seed 1)",
		category: "kitchen",
		want:     []tagged{tg(KindPrice, "$120 or less", "≤ 120.00 USD"), tg(KindMeasure, "1.9 litre", "1.9 L"), tg(KindProductType, "rice cooker", "rice cooker")},
	},
	{
		name: "over-stemmed: ear", query: "ear plugs",
		reason: "Porter's stemmer (the one bleve's en analyzer uses) takes earrings to ear; a shopper's ear is no earring, so only a spelling of the entry, or the stem of a word at most two letters shorter than it, reads as the entry",
		want:   []tagged{tg(KindKeyword, "ear", "ear"), tg(KindKeyword, "plugs", "plugs")},
	},
	{
		name: "over-stemmed within a phrase", query: "clip on earrings", category: "accessories",
		reason: "on earrings stems to the headphone fit on ear, but earrings is five letters past ear: the shorter match is taken, and earrings stays the product type",
		want:   []tagged{tg(KindKeyword, "clip", "clip"), tg(KindProductType, "earrings", "earrings")},
	},
	{
		name: "short form in a phrase", query: "run shoe", category: "footwear",
		reason: "within a phrase the other words vouch for a short form: run shoe is a running shoe",
		want:   []tagged{tg(KindProductType, "run shoe", "running shoe")},
	},
	{
		name: "an ending the shopper adds", query: "showing uv filters", category: "camera",
		reason: "showing is three letters past the filler show, an -ing: still the filler; relaxations, four past relaxed, is no silhouette",
		want:   []tagged{tg(KindProductType, "uv filters", "uv filter")},
	},
	{
		name: "four letters past an entry", query: "relaxations",
		reason: "relaxations stems to relax, as the silhouette relaxed does, but is no relaxed fit",
		want:   []tagged{tg(KindKeyword, "relaxations", "relaxations")},
	},
	{
		name: "hyphenated plural", query: "flip-flops", category: "footwear",
		reason: "a hyphenated word is split as the lexicon splits it, so flip-flops is flip-flop's plural (a review of the over-stemming rule)",
		want:   []tagged{tg(KindProductType, "flip-flops", "flip-flop")},
	},
	{
		name: "over-stemmed: stock", query: "stock", reason: "stockings stems to stock; stock is no stocking",
		want: []tagged{tg(KindKeyword, "stock", "stock")},
	},
	{
		name: "for her", query: "watch for him", category: "accessories", reason: "for him and for her name who a product is for (common practice), not a model it fits: \"him\" was a stray word",
		want: []tagged{tg(KindProductType, "watch", "watch"), tg(KindAudience, "for him", "men")},
	},
	{
		name: "in stock", query: "lamp in stock", category: "home", reason: "availability is not an attribute of the product the shopper describes: filler, as free shipping is",
		want: []tagged{tg(KindProductType, "lamp", "lamp")},
	},
	{
		name: "stemmed and kept: a plural", query: "leggings women", category: "apparel",
		reason: "the shopper's word is the entry's own spelling",
		want:   []tagged{tg(KindProductType, "leggings", "leggings"), tg(KindAudience, "women", "women")},
	},
	{
		name: "stemmed and kept: one letter short", query: "sock", category: "apparel",
		reason: "sock is one letter short of socks: the stem is the entry's",
		want:   []tagged{tg(KindProductType, "sock", "socks")},
	},
	{
		name: "step-up ring", query: "step up ring 49-52mm", category: "camera",
		reason: "a step-up ring adapts a lens's filter thread to a larger filter, and is sold by the two threads (common practice); it is no ring to wear",
		want:   []tagged{tg(KindProductType, "step up ring", "step-up ring"), tg(KindMeasure, "49-52mm", "49..52 mm")},
	},
	{
		name: "headphone fit", query: "over ear headphones", category: "electronics",
		reason: "over-ear, on-ear and in-ear are how headphones are sold (common practice); over is not left as a comparison word, nor ear as an over-stemmed earring",
		want:   []tagged{tg(KindSilhouette, "over ear", "over-ear"), tg(KindProductType, "headphones", "headphones")},
	},
	{
		name: "headphone fit after a measure in inches", query: "7 in ear headphones", category: "electronics",
		reason: "a number before in takes it as its unit first: 7 in, then ear, which is no entry",
		want:   []tagged{tg(KindMeasure, "7 in", "7 in"), tg(KindKeyword, "ear", "ear"), tg(KindProductType, "headphones", "headphones")},
	},
	{
		name: "a comparison word left over", query: "less expensive lens", category: "camera",
		reason: "less with no value after it is a connecting word, not a keyword: as a keyword the typo reader took it for lens, one letter away",
		want:   []tagged{tg(KindKeyword, "expensive", "expensive"), tg(KindProductType, "lens", "lens")},
	},
	{
		name: "or less between a size and a price", query: "size 12 or less $60", category: "",
		reason: "a bare number's bound word with a value right after it bounds nothing: the hard size stays, and no $12 ceiling appears (a review of the or-less change)",
		want:   []tagged{tg(KindSize, "size 12", "12 (numeric)").hard(), tg(KindPrice, "$60", "≤ 60.00 USD")},
	},
	{
		name: "or higher between two numbers", query: "android 12 or higher 5g phone", category: "electronics",
		reason: "12 is bounded by nothing, and is no price",
		want: []tagged{tg(KindKeyword, "android", "android"), tg(KindMeasure, "12", "12"), tg(KindKeyword, "higher", "higher"),
			tg(KindMeasure, "5g", "5 g"), tg(KindProductType, "phone", "phone")},
	},
	{
		name: "or under before a price", query: "size 12 or under $60", reason: "or under may come before a value, as max does: it bounds the price",
		want: []tagged{tg(KindSize, "size 12", "12 (numeric)").hard(), tg(KindPrice, "under $60", "≤ 60.00 USD")},
	},
	{
		name: "max between a measure and a price", query: "9200mah max $45", reason: "the capacity stays a capacity; max bounds the price",
		want: []tagged{tg(KindMeasure, "9200mah", "9200 mAh"), tg(KindPrice, "max $45", "≤ 45.00 USD")},
	},
	{
		name: "price then tyre size", query: "up to $160 225/65r17", reason: "a price is never a mixed number: $160, then a tyre size, not $163.46",
		category: "tyres",
		want:     []tagged{tg(KindPrice, "up to $160", "≤ 160.00 USD"), tg(KindSpec, "225/65r17", "225/65R17 (tyre)").hard()},
	},
	{
		name: "price plus", query: "$40+", reason: "+ after a price sets a floor",
		want: []tagged{tg(KindPrice, "$40+", "≥ 40.00 USD")},
	},
	{
		name: "bare price", query: "$40", reason: "a bare price is a ceiling (whittle's rule)",
		want: []tagged{tg(KindPrice, "$40", "≤ 40.00 USD")},
	},
	{name: "usd code", query: "40 usd", reason: "ISO 4217 code after the amount", want: []tagged{tg(KindPrice, "40 usd", "≤ 40.00 USD")}},
	{name: "euro sign", query: "€35", reason: "€ is EUR", want: []tagged{tg(KindPrice, "€35", "≤ 35.00 EUR")}},
	{name: "named dollar", query: "C$50", reason: "C$ is the Canadian dollar, CAD in ISO 4217 (common practice)", want: []tagged{tg(KindPrice, "C$50", "≤ 50.00 CAD")}},
	{name: "australian dollar", query: "A$40 tee", category: "apparel", reason: "A$ is AUD",
		want: []tagged{tg(KindPrice, "A$40", "≤ 40.00 AUD"), tg(KindProductType, "tee", "t-shirt")}},
	{name: "thousands", query: "under $1.5k laptop", category: "electronics", reason: "k after an amount is a thousand (common practice): 1500, not 1.50",
		want: []tagged{tg(KindPrice, "under $1.5k", "≤ 1500.00 USD"), tg(KindProductType, "laptop", "laptop")}},
	{name: "thousands range", query: "$2k-3k sofa", category: "furniture", reason: "the k of both ends",
		want: []tagged{tg(KindPrice, "$2k-3k", "2000.00..3000.00 USD"), tg(KindProductType, "sofa", "sofa")}},
	{name: "euros word", query: "35 euros", reason: "euros is EUR", want: []tagged{tg(KindPrice, "35 euros", "≤ 35.00 EUR")}},
	{name: "pound sign", query: "£20", reason: "£ is GBP", want: []tagged{tg(KindPrice, "£20", "≤ 20.00 GBP")}},
	{name: "yen sign", query: "¥3000", reason: "¥ is JPY, which has no minor unit (ISO 4217)", want: []tagged{tg(KindPrice, "¥3000", "≤ 3000 JPY")}},
	{name: "decimal comma", query: "35,99 €", reason: "a comma before two digits is a decimal comma, as euro locales write it",
		want: []tagged{tg(KindPrice, "35,99 €", "≤ 35.99 EUR")}},
	{name: "thousands comma", query: "under $1,299", reason: "a comma before three digits groups thousands",
		want: []tagged{tg(KindPrice, "under $1,299", "≤ 1299.00 USD")}},
	{name: "fraction", query: "3/4 in", reason: "fraction with a unit", want: []tagged{tg(KindMeasure, "3/4 in", "0.75 in")}},
	{name: "mixed number spaced", query: "3 1/2 in", reason: "mixed number", want: []tagged{tg(KindMeasure, "3 1/2 in", "3.5 in")}},
	{name: "mixed number dashed", query: "3-3/4 in", reason: "mixed number with a dash", want: []tagged{tg(KindMeasure, "3-3/4 in", "3.75 in")}},
	{name: "vulgar fraction", query: "½ in", reason: "unicode fraction", want: []tagged{tg(KindMeasure, "½ in", "0.5 in")}},
	{name: "number and vulgar fraction", query: "3½ ft", reason: "unicode mixed number", want: []tagged{tg(KindMeasure, "3½ ft", "3.5 ft")}},
	{name: "unit attached", query: "50mm", reason: "unit stuck to the number", want: []tagged{tg(KindMeasure, "50mm", "50 mm")}},
	{name: "quarts", query: "7qt", reason: "qt is the US quart by default", want: []tagged{tg(KindMeasure, "7qt", "7 qt")}},
	{name: "gigabytes", query: "64gb", reason: "data size", want: []tagged{tg(KindMeasure, "64gb", "64 GB")}},
	{name: "volts", query: "12v", reason: "voltage", want: []tagged{tg(KindMeasure, "12v", "12 V")}},
	{name: "milliamp hours", query: "2500mah", reason: "charge", want: []tagged{tg(KindMeasure, "2500mah", "2500 mAh")}},
	{name: "inches spelt out", query: "24 inches", reason: "unit word", want: []tagged{tg(KindMeasure, "24 inches", "24 in")}},
	{name: "inch mark", query: `36"`, reason: `" after a number is the inch mark`, want: []tagged{tg(KindMeasure, `36"`, "36 in")}},
	{name: "prime marks", query: "8′ 36″", reason: "prime is feet, double prime inches", want: []tagged{tg(KindMeasure, "8′", "8 ft"), tg(KindMeasure, "36″", "36 in")}},
	{name: "two apostrophes", query: "36''", reason: "two apostrophes stand for the inch mark", want: []tagged{tg(KindMeasure, "36''", "36 in")}},
	{
		name: "metres after a number", query: "5 m extension cord", category: "electrical",
		reason: "m right after a number is metres",
		want:   []tagged{tg(KindMeasure, "5 m", "5 m"), tg(KindProductType, "extension cord", "extension cord")},
	},
	{
		name: "m alone in apparel is a size", query: "polo shirt m", category: "apparel",
		reason: "a lone m in apparel is the letter size",
		want:   []tagged{tg(KindProductType, "polo shirt", "polo shirt"), tg(KindSize, "m", "m (letter)")},
	},
	{name: "sz", query: "sz 8 dress", category: "apparel", reason: "sz marks a size",
		want: []tagged{tg(KindSize, "sz 8", "8 (numeric)"), tg(KindProductType, "dress", "dress")}},
	{name: "3xl", query: "3xl hoodie", category: "apparel", reason: "letter size with a count",
		want: []tagged{tg(KindSize, "3xl", "3xl (letter)"), tg(KindProductType, "hoodie", "hoodie")}},
	{name: "two-word letter size", query: "extra large hoodie", category: "apparel", reason: "extra large is XL",
		want: []tagged{tg(KindSize, "extra large", "xl (letter)"), tg(KindProductType, "hoodie", "hoodie")}},
	{name: "xs", query: "xs blazer", category: "apparel", reason: "letter size",
		want: []tagged{tg(KindSize, "xs", "xs (letter)"), tg(KindProductType, "blazer", "blazer")}},
	{name: "months of age", query: "baby bodysuit 6-12 months", category: "apparel", reason: "baby clothes are sized by months of age (common practice): a size, hard, as shops list it",
		want: []tagged{tg(KindAudience, "baby", "baby"), tg(KindProductType, "bodysuit", "bodysuit"), tg(KindSize, "6-12 months", "6-12m (age)")}},
	{name: "m for months", query: "baby onesie 12m", reason: "on a baby's clothes 12m is twelve months, not twelve metres",
		want: []tagged{tg(KindAudience, "baby", "baby"), tg(KindKeyword, "onesie", "onesie"), tg(KindSize, "12m", "12m (age)")}},
	{name: "m for metres", query: "rope 12m", category: "hardware", reason: "on a rope 12m is metres",
		want: []tagged{tg(KindProductType, "rope", "rope"), tg(KindMeasure, "12m", "12 m")}},
	{name: "bra size", query: "sports bra 34b", category: "apparel", reason: "34b on a bra is a band of 34 and a B cup (common practice): a size, hard",
		want: []tagged{tg(KindProductType, "sports bra", "sports bra"), tg(KindSize, "34b", "34b (bra)")}},
	{name: "bra size, A cup", query: "bralette 32a", category: "apparel", reason: "a is the ampere's symbol (SI), but on a bra 32a is a band of 32 and an A cup (common practice), not a current",
		want: []tagged{tg(KindProductType, "bralette", "bralette"), tg(KindSize, "32a", "32a (bra)")}},
	{name: "bra size, spaced", query: "bra 36 dd", category: "apparel", reason: "shoppers also type the cup apart from the band (common practice)",
		want: []tagged{tg(KindProductType, "bra", "bra"), tg(KindSize, "36 dd", "36dd (bra)")}},
	{name: "amperes off a bra", query: "32a fuse", category: "electrical", reason: "away from a bra, 32a is 32 amperes (SI symbol A)",
		want: []tagged{tg(KindMeasure, "32a", "32 A"), tg(KindProductType, "fuse", "fuse")}},
	{name: "no bra size on a tee", query: "t-shirt 34b", category: "apparel", reason: "away from a bra, 34b is a code-like word, not a size",
		want: []tagged{tg(KindProductType, "t-shirt", "t-shirt"), tg(KindKeyword, "34b", "34b")}},
	{name: "tall boots", query: "tall boots", category: "footwear", reason: "a fit size is a garment's; on boots tall is the shaft's height, no size",
		want: []tagged{tg(KindKeyword, "tall", "tall"), tg(KindProductType, "boots", "boot")}},
	{name: "big and tall", query: "big and tall shirts", category: "apparel", reason: "big and tall is one fit size range (common practice)",
		want: []tagged{tg(KindSize, "big and tall", "big and tall (fit)"), tg(KindProductType, "shirts", "shirt")}},
	{name: "petite", query: "petite jeans", category: "apparel", reason: "petite is a fit size",
		want: []tagged{tg(KindSize, "petite", "petite (fit)"), tg(KindProductType, "jeans", "jeans")}},
	{name: "waist by inseam", query: "jeans 32x30", category: "apparel", reason: "WxL on jeans is waist by inseam (common practice)",
		want: []tagged{tg(KindProductType, "jeans", "jeans"), tg(KindSize, "32x30", "32x30 (waist_inseam)")}},
	{name: "a child's size after size", query: "kids shoes size 13c", category: "footwear", reason: "13c is a child's size 13 (common practice), as it is read bare; the c was a stray letter",
		want: []tagged{tg(KindAudience, "kids", "kids"), tg(KindProductType, "shoes", "shoe"), tg(KindSize, "size 13c", "13c (numeric)")}},
	{name: "waist over inseam", query: "jeans 32/34", category: "apparel", reason: "32/34 on jeans is the waist over the inseam (common practice), not a size of 0.94",
		want: []tagged{tg(KindProductType, "jeans", "jeans"), tg(KindSize, "32/34", "32x34 (waist_inseam)")}},
	{name: "neck and sleeve", query: "dress shirt 16 34/35", category: "apparel", reason: "dress shirts are sized by neck and sleeve, 16 34/35 (common practice), not a size of 16.97",
		want: []tagged{tg(KindProductType, "dress shirt", "dress shirt"), tg(KindSize, "16 34/35", "16 34/35 (numeric)")}},
	{name: "a half-inch neck and sleeve", query: "dress shirt 15.5 34/35", category: "apparel", reason: "necks come in half inches (common practice): 15.5 34/35 was an error, a mixed number with a decimal whole",
		want: []tagged{tg(KindProductType, "dress shirt", "dress shirt"), tg(KindSize, "15.5 34/35", "15.5 34/35 (numeric)")}},
	{name: "a fraction naming a style", query: "1/2 zip sweater", category: "apparel", reason: "a half zip is a style (common practice); 1/2 was a hard size of 0.5 no sweater has",
		want: []tagged{tg(KindSilhouette, "1/2 zip", "half zip"), tg(KindProductType, "sweater", "sweater")}},
	{name: "three quarter sleeves", query: "3/4 sleeve top", category: "apparel", reason: "the sleeve's length, a style",
		want: []tagged{tg(KindSilhouette, "3/4 sleeve", "three quarter sleeve"), tg(KindProductType, "top", "top")}},
	{name: "neck and sleeve spelt", query: "mens dress shirt neck 16 sleeve 34", category: "apparel", reason: "dress shirts are sized by neck and sleeve in inches (common practice): there were two numeric sizes and two stray words",
		want: []tagged{tg(KindAudience, "mens", "men"), tg(KindProductType, "dress shirt", "dress shirt"), tg(KindSize, "neck 16 sleeve 34", "16 34 (numeric)")}},
	{name: "half a neck size", query: "shirt 15.5 neck 33 sleeve", category: "apparel", reason: "necks come in half inches, the number before its word",
		want: []tagged{tg(KindProductType, "shirt", "shirt"), tg(KindSize, "15.5 neck 33 sleeve", "15.5 33 (numeric)")}},
	{name: "waist and inseam spelt", query: "jeans 30 waist 32 length", category: "apparel", reason: "shops call the inseam the length too (common practice): one size, 30x32, where there were two numeric sizes and two stray words",
		want: []tagged{tg(KindProductType, "jeans", "jeans"), tg(KindSize, "30 waist 32 length", "30x32 (waist_inseam)")}},
	{name: "waist and inseam spelt first", query: "chinos inseam 32 waist 30", category: "apparel", reason: "the word before the number, in either order: the waist still comes first in the size",
		want: []tagged{tg(KindProductType, "chinos", "chinos"), tg(KindSize, "inseam 32 waist 30", "30x32 (waist_inseam)")}},
	{name: "waist spelt alone", query: "jeans 32 waist", category: "apparel", reason: "the waist alone, as 32w is",
		want: []tagged{tg(KindProductType, "jeans", "jeans"), tg(KindSize, "32 waist", "32 (waist)")}},
	{name: "waist and inseam letters", query: "jeans 32w 30l", category: "apparel", reason: "w and l after numbers on jeans are waist and inseam",
		want: []tagged{tg(KindProductType, "jeans", "jeans"), tg(KindSize, "32w 30l", "32x30 (waist_inseam)")}},
	{name: "shoe size with width", query: "boots 9.5 wide", category: "footwear", reason: "a shoe size may carry a width",
		want: []tagged{tg(KindProductType, "boots", "boot"), tg(KindSize, "9.5 wide", "9.5 (shoe, wide)")}},
	{name: "model number in footwear", query: "pelloran 90 sneakers", category: "footwear",
		reason: "no shoe size reaches 90 (EU sizes end near 50: common practice, from memory), so 90 is a word of the product's, not a hard size",
		want:   []tagged{tg(KindKeyword, "pelloran", "pelloran"), tg(KindKeyword, "90", "90"), tg(KindProductType, "sneakers", "sneaker")}},
	{name: "model number in apparel", query: "501 jeans", category: "apparel", reason: "nor does a numeric clothing size reach 501",
		want: []tagged{tg(KindKeyword, "501", "501"), tg(KindProductType, "jeans", "jeans")}},
	{name: "large shoe size", query: "boots 48", category: "footwear", reason: "48 is an EU shoe size",
		want: []tagged{tg(KindProductType, "boots", "boot"), tg(KindSize, "48", "48 (shoe)")}},
	{name: "8w shoes", query: "8w sneakers", category: "footwear", reason: "8w on shoes is size 8 wide (common practice)",
		want: []tagged{tg(KindSize, "8w", "8 (shoe, wide)"), tg(KindProductType, "sneakers", "sneaker")}},
	{name: "tyre joined", query: "225/45R17", category: "tyres", reason: "ISO metric tyre code",
		want: []tagged{tg(KindSpec, "225/45R17", "225/45R17 (tyre)")}},
	{name: "tyre spaced", query: "225/45 r17 tyres", category: "tyres", reason: "the construction letter may be spaced",
		want: []tagged{tg(KindSpec, "225/45 r17", "225/45R17 (tyre)"), tg(KindProductType, "tyres", "tyre")}},
	{name: "gauge", query: "14 gauge wire", category: "electrical", reason: "AWG by gauge",
		want: []tagged{tg(KindSpec, "14 gauge", "14 AWG (awg)"), tg(KindProductType, "wire", "electrical wire")}},
	{name: "cable gauge", query: "14/2 wire", category: "electrical", reason: "14/2 is 14 AWG with two conductors (common practice)",
		want: []tagged{tg(KindSpec, "14/2", "14/2 AWG (awg)"), tg(KindProductType, "wire", "electrical wire")}},
	{name: "metric thread", query: "m8 bolts", category: "hardware", reason: "ISO 261 designation",
		want: []tagged{tg(KindSpec, "m8", "M8x1.25 (metric_thread)"), tg(KindProductType, "bolts", "bolt")}},
	{name: "metric fine thread", query: "M8x1 bolts", category: "hardware", reason: "ISO 261 fine pitch",
		want: []tagged{tg(KindSpec, "M8x1", "M8x1 (metric_thread)"), tg(KindProductType, "bolts", "bolt")}},
	{name: "unified thread", query: "1/4-20 bolts", category: "hardware", reason: "ASME B1.1 designation",
		want: []tagged{tg(KindSpec, "1/4-20", "1/4-20 UNC (unified_thread)"), tg(KindProductType, "bolts", "bolt")}},
	{name: "paper", query: "a4 paper", category: "office", reason: "ISO 216 size",
		want: []tagged{tg(KindSpec, "a4", "A4 (paper)"), tg(KindProductType, "paper", "paper")}},
	{name: "aa batteries", query: "aa batteries", category: "batteries", reason: "IEC 60086 size",
		want: []tagged{tg(KindSpec, "aa", "AA (battery)"), tg(KindProductType, "batteries", "battery")}},
	{name: "9v battery", query: "9v battery", category: "batteries", reason: "9V is a battery size, not only a voltage",
		want: []tagged{tg(KindSpec, "9v", "9V (battery)"), tg(KindProductType, "battery", "battery")}},
	{name: "coin cell", query: "cr2032", category: "batteries", reason: "IEC 60086 coin cell",
		want: []tagged{tg(KindSpec, "cr2032", "CR2032 (battery)")}},
	{name: "part number", query: "xr-2200", reason: "letters and digits joined by a dash",
		want: []tagged{tg(KindPartNumber, "xr-2200", "XR-2200")}},
	{name: "sku", query: "sku 88-1042", reason: "sku marks a code",
		want: []tagged{tg(KindPartNumber, "sku 88-1042", "88-1042")}},
	{name: "quoted phrase", query: `"off the shoulder" dress`, category: "apparel", reason: "a quoted phrase is hard",
		want: []tagged{tg(KindSilhouette, `"off the shoulder"`, "off the shoulder").hard(), tg(KindProductType, "dress", "dress")}},
	{name: "plural and stem", query: "dresses", category: "apparel", reason: "stemming finds dress",
		want: []tagged{tg(KindProductType, "dresses", "dress")}},
	{name: "plural the stemmer splits", query: "silk ties", category: "accessories",
		reason: "Porter stems ties to ti but tie to tie (M. F. Porter, 1980, step 1a); the plural is filed under the singular's key",
		want:   []tagged{tg(KindMaterial, "silk", "silk"), tg(KindProductType, "ties", "tie")}},
	{name: "plural of a word in s", query: "prime lenses", category: "camera",
		reason: "Porter stems lens to len and lenses to lens; lenses is the plural of lens",
		want:   []tagged{tg(KindProductType, "prime lenses", "prime lens")}},
	{name: "wine rack", query: "wine rack", category: "furniture", reason: "a product type of two words beats the colour wine in its first",
		want: []tagged{tg(KindProductType, "wine rack", "wine rack")}},
	{name: "british spelling", query: "grey jumper", category: "apparel", reason: "jumper is a sweater in British English",
		want: []tagged{tg(KindColour, "grey", "grey"), tg(KindProductType, "jumper", "sweater")}},
	{name: "american spelling", query: "gray sweater", category: "apparel", reason: "gray is grey",
		want: []tagged{tg(KindColour, "gray", "grey"), tg(KindProductType, "sweater", "sweater")}},
	{name: "abbreviation", query: "blk tee", category: "apparel", reason: "blk is black",
		want: []tagged{tg(KindColour, "blk", "black"), tg(KindProductType, "tee", "t-shirt")}},
	{name: "multi-word colour", query: "navy blue chinos", category: "apparel", reason: "two-word colours match as one span",
		want: []tagged{tg(KindColour, "navy blue", "navy"), tg(KindProductType, "chinos", "chinos")}},
	{name: "unknown word", query: "zorblax dress", category: "apparel", reason: "unknown words are kept as keywords",
		want: []tagged{tg(KindKeyword, "zorblax", "zorblax"), tg(KindProductType, "dress", "dress")}},
	{name: "works with", query: "works with jx-10 charger 65w", category: "electronics", reason: "works with opens a target; the charger after it is the head",
		want: []tagged{tg(KindCompatibility, "works with jx-10", "fits jx-10"), tg(KindProductType, "charger", "charger"), tg(KindMeasure, "65w", "65 W")}},
	{name: "replacement for", query: "usb cable replacement for jx-10", category: "electronics", reason: "replacement for opens a target",
		want: []tagged{tg(KindProductType, "usb cable", "usb cable"), tg(KindCompatibility, "replacement for jx-10", "fits jx-10")}},
	{name: "fits", query: "fits vt-200 belt", category: "accessories", reason: "fits opens a target that stops at the product type",
		want: []tagged{tg(KindCompatibility, "fits vt-200", "fits vt-200"), tg(KindProductType, "belt", "belt")}},
	{name: "for a use is no target", query: "paint for bathroom", category: "paint",
		reason: "after a plain for, a word that names no model, brand or product is a use, not something the paint must fit",
		want:   []tagged{tg(KindProductType, "paint", "paint"), tg(KindKeyword, "bathroom", "bathroom")}},
	{name: "for a person is no target", query: "gift for dad", reason: "nor is a person",
		want: []tagged{tg(KindKeyword, "dad", "dad")}},
	{name: "for a model is a target", query: "case for jx-10", reason: "a model code is what a product fits",
		want: []tagged{tg(KindKeyword, "case", "case"), tg(KindCompatibility, "for jx-10", "fits jx-10")}},
	{name: "target takes the product it fits", query: "replacement filter for vt-200 vacuum", category: "home",
		reason: "a product type right after a target, other than the head, is what the target is",
		want:   []tagged{tg(KindProductType, "replacement filter", "filter"), tg(KindCompatibility, "for vt-200 vacuum", "fits vt-200 vacuum")}},
	{name: "pack size", query: "aaa batteries 8 pack", category: "batteries", reason: "a number before pack is a count",
		want: []tagged{tg(KindSpec, "aaa", "AAA (battery)"), tg(KindProductType, "batteries", "battery"), tg(KindMeasure, "8 pack", "8 count")}},
	{name: "pack of", query: "pack of 12 aa batteries", category: "batteries", reason: "pack of N is a count",
		want: []tagged{tg(KindMeasure, "pack of 12", "12 count"), tg(KindSpec, "aa", "AA (battery)"), tg(KindProductType, "batteries", "battery")}},
	{name: "hyphenated pack", query: "12-pack cr2032", category: "batteries", reason: "N-pack is a count",
		want: []tagged{tg(KindMeasure, "12-pack", "12 count"), tg(KindSpec, "cr2032", "CR2032 (battery)")}},
	{name: "explicit unit picks its slot", query: "m8 bolts 40mm", category: "hardware", reason: "40 mm is no bolt diameter (0.125..1.5 in) but a bolt length",
		want: []tagged{tg(KindSpec, "m8", "M8x1.25 (metric_thread)"), tg(KindProductType, "bolts", "bolt"), tg(KindMeasure, "40mm", "40 mm")}},
	{name: "b5", query: "b5 notebook", category: "office", reason: "ISO 216 B series",
		want: []tagged{tg(KindSpec, "b5", "B5 (paper)"), tg(KindProductType, "notebook", "notebook")}},
	{name: "aaa", query: "aaa batteries", category: "batteries", reason: "IEC 60086 size",
		want: []tagged{tg(KindSpec, "aaa", "AAA (battery)"), tg(KindProductType, "batteries", "battery")}},
	{name: "awg", query: "14 awg", category: "electrical", reason: "AWG by its own name; the category comes from the standard",
		want: []tagged{tg(KindSpec, "14 awg", "14 AWG (awg)")}},
	{name: "toddler size", query: "kids pajamas 4t", category: "apparel", reason: "4T is a toddler size (common practice)",
		want: []tagged{tg(KindAudience, "kids", "kids"), tg(KindProductType, "pajamas", "pajamas"), tg(KindSize, "4t", "4t (numeric)")}},
	{name: "plus size", query: "plus size wrap dress 2x", category: "apparel", reason: "plus size is one fit span; 2X is a plus letter size (common practice)",
		want: []tagged{tg(KindSize, "plus size", "plus (fit)"), tg(KindSilhouette, "wrap", "wrap"), tg(KindProductType, "dress", "dress"), tg(KindSize, "2x", "2x (letter)")}},
	{name: "number with an unknown unit", query: "merino base layer 1080p", category: "apparel", reason: "1080p is kept whole, not read as size 1080 or a model",
		want: []tagged{tg(KindMaterial, "merino", "merino"), tg(KindProductType, "base layer", "thermal underwear"), tg(KindKeyword, "1080p", "1080p")}},
	{name: "fabric weight", query: "merino base layer 200gsm", category: "apparel", reason: "gsm is grams per square metre, the weight textiles and paper are sold by (common practice), not a size 200",
		want: []tagged{tg(KindMaterial, "merino", "merino"), tg(KindProductType, "base layer", "thermal underwear"), tg(KindMeasure, "200gsm", "200 gsm")}},
	{name: "paper weight", query: "a4 printer paper 500 sheets 80gsm", category: "office", reason: "copy paper's grammage; gsm was an unknown unit",
		want: []tagged{tg(KindSpec, "a4", "A4 (paper)"), tg(KindProductType, "printer paper", "printer paper"), tg(KindMeasure, "500 sheets", "500 count"), tg(KindMeasure, "80gsm", "80 gsm")}},
	{name: "grade names the type", query: "cat6 cable 25 ft white", category: "electronics", reason: "category 6 is a grade of twisted-pair network cable (TIA-568, from memory): the cable is an ethernet cable, as the lexicon's \"cat6 cable\" says",
		want: []tagged{tg(KindKeyword, "cat6", "cat6").firm(), tg(KindProductType, "cable", "ethernet cable"), tg(KindMeasure, "25 ft", "25 ft"), tg(KindColour, "white", "white")}},
	{name: "grade beside its own type", query: "cat6 hdmi cable", category: "electronics", reason: "the type typed is not the grade's type's parent, so it stands",
		want: []tagged{tg(KindKeyword, "cat6", "cat6").firm(), tg(KindProductType, "hdmi cable", "hdmi cable")}},
	{name: "connector as two words", query: "type c charger", category: "electronics", reason: "type c is the USB-C connector, as titles write it (common practice): \"type\" was filler and \"c\" a stray letter, soft",
		want: []tagged{tg(KindKeyword, "type c", "usb-c").firm(), tg(KindProductType, "charger", "charger")}},
	{name: "two connectors and an adapter", query: "usb-c to hdmi adapter", category: "electronics", reason: "an adapter is named by the connectors it joins; each is firm",
		want: []tagged{tg(KindKeyword, "usb-c", "usb-c").firm(), tg(KindKeyword, "hdmi", "hdmi").firm(), tg(KindProductType, "adapter", "adapter")}},
	{name: "connector inside a product type", query: "usb c cable 6ft", category: "electronics", reason: "the lexicon's longer phrase wins: a usb-c cable is a usb cable",
		want: []tagged{tg(KindProductType, "usb c cable", "usb cable"), tg(KindMeasure, "6ft", "6 ft")}},
	{name: "belt size bare", query: "leather belt 34 brown", category: "accessories", reason: "belts are sized by the waist in inches, written bare (common practice): 34 was a unitless number",
		want: []tagged{tg(KindMaterial, "leather", "leather"), tg(KindProductType, "belt", "belt"), tg(KindSize, "34", "34 (belt)"), tg(KindColour, "brown", "brown")}},
	{name: "ring size bare", query: "ring 7.5", category: "accessories", reason: "rings come in US sizes and halves (common practice)",
		want: []tagged{tg(KindProductType, "ring", "ring"), tg(KindSize, "7.5", "7.5 (ring)")}},
	{name: "ring size after size", query: "14k ring size 7", category: "accessories", reason: "the same size system as written bare; 14k is gold's purity in karats (common practice), firm",
		want: []tagged{tg(KindKeyword, "14k", "14k").firm(), tg(KindProductType, "ring", "ring"), tg(KindSize, "size 7", "7 (ring)")}},
	{name: "karats spelt", query: "18kt gold necklace", category: "accessories", reason: "kt and karat are written too, read as titles write it, 18k",
		want: []tagged{tg(KindKeyword, "18kt", "18k").firm(), tg(KindColour, "gold", "gold"), tg(KindProductType, "necklace", "necklace")}},
	{name: "a pillar candle", query: "unscented pillar candles 3x6", category: "home", reason: "pillar candles are sold by diameter by height in inches (common practice); pillar and unscented were stray words",
		want: []tagged{tg(KindSilhouette, "unscented", "unscented"), tg(KindProductType, "pillar candles", "pillar candle"), tg(KindMeasure, "3", "3 in").inferred(), tg(KindMeasure, "6", "6 in").inferred()}},
	{name: "a weighted blanket", query: "weighted blanket 15 lb 60x80", category: "home", reason: "a weighted blanket's weight in pounds and size in inches (common practice)",
		want: []tagged{tg(KindProductType, "weighted blanket", "weighted blanket"), tg(KindMeasure, "15 lb", "15 lb"), tg(KindMeasure, "60", "60 in").inferred(), tg(KindMeasure, "80", "80 in").inferred()}},
	{name: "a lithium-ion cell size", query: "18650 rechargeable 3000mah", category: "", reason: "18650 names a cell 18 mm across and 65 mm long (common practice), which a charger or torch must take: hard, where it was a unitless number",
		want: []tagged{tg(KindKeyword, "18650", "18650").hard(), tg(KindKeyword, "rechargeable", "rechargeable"), tg(KindMeasure, "3000mah", "3000 mAh")}},
	{name: "a cell size on a torch", query: "flashlight 18650", category: "electrical", reason: "the torch takes that cell",
		want: []tagged{tg(KindProductType, "flashlight", "flashlight"), tg(KindKeyword, "18650", "18650").hard()}},
	{name: "a unit named alone", query: "paint quart navy satin", category: "paint", reason: "paint is sold by the quart and the gallon, and a quart named alone is one quart (common practice): quart was a stray word",
		want: []tagged{tg(KindProductType, "paint", "paint"), tg(KindMeasure, "quart", "1 qt"), tg(KindColour, "navy", "navy"), tg(KindPattern, "satin", "satin finish")}},
	{name: "a unit in the plural alone", query: "paint in gallons", category: "paint", reason: "gallons names no amount",
		want: []tagged{tg(KindProductType, "paint", "paint"), tg(KindKeyword, "gallons", "gallons")}},
	{name: "a mounting pattern", query: "tv wall mount 32-70 inch vesa 400x400", category: "electronics", reason: "a wall mount must match the screen's VESA hole pattern in mm (VESA mounting interface standard, from memory): hard, where 400x400 was two unitless numbers",
		want: []tagged{tg(KindProductType, "tv wall mount", "tv mount"), tg(KindMeasure, "32-70 inch", "32..70 in"), tg(KindKeyword, "vesa 400x400", "vesa 400x400").hard()}},
	{name: "a mounting pattern after", query: "monitor arm 100x100 vesa", category: "office", reason: "the word may follow the pattern",
		want: []tagged{tg(KindProductType, "monitor arm", "monitor arm"), tg(KindKeyword, "100x100 vesa", "vesa 100x100").hard()}},
	{name: "a laminating pouch's thickness", query: "laminating pouches a4 125 micron", category: "office", reason: "pouches are sold by thickness in microns, micrometres (SI prefix micro): the head was the laminator",
		want: []tagged{tg(KindProductType, "laminating pouches", "laminating pouch"), tg(KindSpec, "a4", "A4 (paper)"), tg(KindMeasure, "125 micron", "125 µm")}},
	{name: "a legal pad's size", query: "legal pad 8.5 x 14 yellow", category: "office", reason: "a pad's sheet in inches, as legal pads are sold (common practice)",
		want: []tagged{tg(KindProductType, "legal pad", "notebook"), tg(KindMeasure, "8.5", "8.5 in").inferred(), tg(KindMeasure, "14", "14 in").inferred(), tg(KindColour, "yellow", "yellow")}},
	{name: "a sheet of plywood", query: "3/4 plywood 4x8 sheet", category: "lumber", reason: "plywood comes in 4x8 sheets (common practice): the sheet was a bed sheet, and the head, so nothing had the plywood's measures",
		want: []tagged{tg(KindMeasure, "3/4", "0.75 in").inferred(), tg(KindProductType, "plywood", "plywood"), tg(KindMeasure, "4", "4 ft").inferred(), tg(KindMeasure, "8", "8 ft").inferred()}},
	{name: "sheets alone", query: "white cotton sheets queen", category: "home", reason: "with no product type before it, sheets are bedding",
		want: []tagged{tg(KindColour, "white", "white"), tg(KindMaterial, "cotton", "cotton"), tg(KindProductType, "sheets", "bed sheet"), tg(KindSize, "queen", "queen (bed)")}},
	{name: "refresh rate", query: "gaming monitor 27 inch 144hz", category: "electronics", reason: "a monitor's refresh rate in hertz (SI unit of frequency): 144hz was a stray word",
		want: []tagged{tg(KindProductType, "gaming monitor", "monitor"), tg(KindMeasure, "27 inch", "27 in"), tg(KindMeasure, "144hz", "144 Hz")}},
	{name: "a laptop's memory and storage", query: "laptop 16gb ram 512gb ssd", category: "electronics", reason: "computers are sold by memory and storage written before the part (common practice): the head was the ssd, and ram a product type of its own",
		want: []tagged{tg(KindProductType, "laptop", "laptop"), tg(KindMeasure, "16gb ram", "16 GB"), tg(KindMeasure, "512gb ssd", "512 GB")}},
	{name: "steps of a step ladder", query: "3 step ladder", category: "hardware", reason: "a step ladder is sold by its steps, \"3 step\" (common practice): the 3 was a height of 3 ft, from the ladder's height slot",
		want: []tagged{tg(KindMeasure, "3", "3 count"), tg(KindProductType, "step ladder", "step ladder")}},
	{name: "steps after a step stool", query: "step stool 2 step", category: "furniture", reason: "step is a count word too: the 2 was unitless and step a stray word",
		want: []tagged{tg(KindProductType, "step stool", "step stool"), tg(KindMeasure, "2 step", "2 count")}},
	{name: "cubic feet", query: "wheelbarrow 6 cu ft", category: "hardware", reason: "a wheelbarrow's capacity in cubic feet (common practice; the cubic foot is (0.3048 m)³, NIST SP 811): cu and ft were two stray words and the 6 a unitless number",
		want: []tagged{tg(KindProductType, "wheelbarrow", "wheelbarrow"), tg(KindMeasure, "6 cu ft", "6 ft3")}},
	{name: "cubic feet spelt", query: "mulch 2 cubic feet", category: "hardware", reason: "the unit spelt out, on a product sold by volume",
		want: []tagged{tg(KindProductType, "mulch", "mulch"), tg(KindMeasure, "2 cubic feet", "2 ft3")}},
	{name: "a metal finish", query: "door knob satin nickel", category: "hardware", reason: "door hardware is sold by finish, filed as its colour (common practice; value from memory): satin was a cloth and nickel a metal",
		want: []tagged{tg(KindProductType, "door knob", "door handle"), tg(KindColour, "satin nickel", "satin nickel")}},
	{name: "a faucet's pull-down spout", query: "kitchen faucet pull down matte black", category: "hardware", reason: "a pull-down faucet is a style of kitchen faucet (common practice): down was read as down filling, a material",
		want: []tagged{tg(KindProductType, "kitchen faucet", "kitchen faucet"), tg(KindSilhouette, "pull down", "pull down"), tg(KindPattern, "matte", "matte"), tg(KindColour, "black", "black")}},
	{name: "pipe diameter before its length", query: "3/4 x 10 ft copper pipe", category: "hardware", reason: "pipe is sold by a diameter in inches and a length in feet (common practice): 3/4 was read as 0.75 ft, the foot that ends the dimension",
		want: []tagged{tg(KindMeasure, "3/4", "0.75 in").inferred(), tg(KindMeasure, "10 ft", "10 ft"), tg(KindMaterial, "copper", "copper"), tg(KindProductType, "pipe", "pipe")}},
	{name: "thread and length, spaced", query: "m6 x 20 screw", category: "hardware", reason: "a metric screw is named by its thread, then its length in mm (common practice); 20 is no ISO 261 pitch, so it is the length, where it was a unitless number",
		want: []tagged{tg(KindSpec, "m6", "M6x1 (metric_thread)"), tg(KindMeasure, "20", "20 mm"), tg(KindProductType, "screw", "screw")}},
	{name: "thread and length, joined", query: "m6x20 screw", category: "hardware", reason: "written as one code it is the same designation, where it was a part number that no listing spells",
		want: []tagged{tg(KindSpec, "m6", "M6x1 (metric_thread)"), tg(KindMeasure, "20", "20 mm"), tg(KindProductType, "screw", "screw")}},
	{name: "thread, pitch and length", query: "M8x1.25x30 bolt", category: "hardware", reason: "ISO 261 lists 1.25 as M8's coarse pitch; the length comes after it",
		want: []tagged{tg(KindSpec, "M8x1.25", "M8x1.25 (metric_thread)"), tg(KindMeasure, "30", "30 mm"), tg(KindProductType, "bolt", "bolt")}},
	{name: "thread, pitch and length, spaced", query: "m8 x 1.25 x 30 bolt", category: "hardware", reason: "the pitch was read as a bolt 1.25 in across, hard, which no M8 bolt is",
		want: []tagged{tg(KindSpec, "m8 x 1.25", "M8x1.25 (metric_thread)"), tg(KindMeasure, "30", "30 mm"), tg(KindProductType, "bolt", "bolt")}},
	{name: "joined pitch, spaced length", query: "m8x1 x 30 bolt", category: "hardware", reason: "ISO 261 lists 1 as a fine pitch of M8",
		want: []tagged{tg(KindSpec, "m8x1", "M8x1 (metric_thread)"), tg(KindMeasure, "30", "30 mm"), tg(KindProductType, "bolt", "bolt")}},
	{name: "regional half size", query: "sneakers uk 8 1/2", category: "footwear", reason: "shoe sizes run in halves (common practice): uk 8 1/2 is 8.5, where the half was lost",
		want: []tagged{tg(KindProductType, "sneakers", "sneaker"), tg(KindSize, "uk 8 1/2", "8.5 (uk)")}},
	{name: "system after the size", query: "boots 42 eu black", category: "footwear", reason: "the system may follow the number (common practice); eu was a keyword",
		want: []tagged{tg(KindProductType, "boots", "boot"), tg(KindSize, "42 eu", "42 (eu)"), tg(KindColour, "black", "black")}},
	{name: "system after size N", query: "dress size 8 uk", category: "apparel", reason: "a UK 8 dress is not a US 8 (common practice): the system is part of the size",
		want: []tagged{tg(KindProductType, "dress", "dress"), tg(KindSize, "size 8 uk", "8 (uk)")}},
	{name: "size then system", query: "size eu 42 boots", category: "footwear", reason: "\"size\" opens the regional size and is part of its span, not a keyword",
		want: []tagged{tg(KindSize, "size eu 42", "42 (eu)"), tg(KindProductType, "boots", "boot")}},
	{name: "regional shoe size", query: "hiking boots eu 42 $80-120", category: "footwear", reason: "eu 42 is a size; the price range stays whole",
		want: []tagged{tg(KindProductType, "hiking boots", "hiking boot"), tg(KindSize, "eu 42", "42 (eu)"), tg(KindPrice, "$80-120", "80.00..120.00 USD")}},
	{name: "ee width", query: "oxford 10.5 ee", category: "footwear", reason: "EE is a wide fitting (common practice)",
		want: []tagged{tg(KindProductType, "oxford", "oxford"), tg(KindSize, "10.5 ee", "10.5 (shoe, wide)")}},
	{name: "stem is not a match", query: "polarized sunglasses", category: "accessories", reason: "polarized stems to polar and names no camera filter: it is the lenses' style, a silhouette",
		want: []tagged{tg(KindSilhouette, "polarized", "polarized"), tg(KindProductType, "sunglasses", "sunglasses")}},
	{name: "no show socks", query: "no show socks", category: "apparel", reason: "no show is a sock style (common practice), not an exclusion of socks",
		want: []tagged{tg(KindSilhouette, "no show", "no show"), tg(KindProductType, "socks", "socks")}},
	{name: "exclusion never reaches the head", query: "no nice socks", category: "apparel",
		reason: "an exclusion mark that would reach past filler to the product asked for excludes nothing: a query never asks for what it excludes",
		want:   []tagged{tg(KindProductType, "socks", "socks")}},
	{name: "without as w/o", query: "hoodie w/o zip", category: "apparel", reason: "w/o is without",
		want: []tagged{tg(KindProductType, "hoodie", "hoodie"), tg(KindSilhouette, "w/o zip", "not zip").excluded()}},
	{name: "letter size on gloves", query: "gloves womens m", category: "accessories", reason: "gloves come in letter sizes",
		want: []tagged{tg(KindProductType, "gloves", "gloves"), tg(KindAudience, "womens", "women"), tg(KindSize, "m", "m (letter)")}},
	{name: "lamp base", query: "e26 led bulb", category: "electrical",
		reason: "E26 is a lamp base (IEC 60061, from memory): a bulb of another base does not fit the socket, so it is hard, and no part number",
		want:   []tagged{tg(KindKeyword, "e26", "e26").hard(), tg(KindProductType, "led bulb", "led bulb")}},
	{name: "bulb shape", query: "a19 bulb", category: "electrical", reason: "A19 is a bulb's shape (from memory): firm, not a part number",
		want: []tagged{tg(KindKeyword, "a19", "a19").firm(), tg(KindProductType, "bulb", "light bulb")}},
	{name: "a standard's grade", query: "cat6 cable 50 ft", category: "electronics",
		reason: "Cat6 is a network cable category of TIA-568 (from memory), what the cable is, not a part number, which would be hard",
		want:   []tagged{tg(KindKeyword, "cat6", "cat6").firm(), tg(KindProductType, "cable", "ethernet cable"), tg(KindMeasure, "50 ft", "50 ft")}},
	{name: "aperture as a code", query: "50mm f1.8 lens", category: "camera", reason: "f1.8 is the lens's aperture (common practice), not a part number, which would be hard",
		want: []tagged{tg(KindMeasure, "50mm", "50 mm"), tg(KindKeyword, "f1.8", "f/1.8").firm(), tg(KindProductType, "lens", "lens")}},
	{name: "bare aperture after a focal length", query: "50mm 1.8 lens", category: "camera", reason: "lenses are named by focal length and widest aperture, \"50mm 1.8\" (common practice): the 1.8 was a unitless number",
		want: []tagged{tg(KindMeasure, "50mm", "50 mm"), tg(KindKeyword, "1.8", "f/1.8").firm(), tg(KindProductType, "lens", "lens")}},
	{name: "bare aperture a focal length slot holds", query: "70-300 4.5 lens", category: "camera", reason: "4.5 lies in the lens's focal length range, but after a focal length it is the aperture, not a 4.5 mm lens",
		want: []tagged{tg(KindMeasure, "70-300", "70..300 mm").inferred(), tg(KindKeyword, "4.5", "f/4.5").firm(), tg(KindProductType, "lens", "lens")}},
	{name: "aperture with a slash", query: "50mm f/1.8 lens", category: "camera", reason: "f/1.8 is one aperture, not a stray f and a number",
		want: []tagged{tg(KindMeasure, "50mm", "50 mm"), tg(KindKeyword, "f/1.8", "f/1.8").firm(), tg(KindProductType, "lens", "lens")}},
	{name: "a hose's diameter", query: "garden hose 50 ft 5/8", category: "hardware",
		reason: "garden hose is sold by length and inner diameter, 1/2, 5/8 or 3/4 in (common practice): 5/8 was a unitless number",
		want:   []tagged{tg(KindProductType, "garden hose", "garden hose"), tg(KindMeasure, "50 ft", "50 ft"), tg(KindMeasure, "5/8", "0.625 in").inferred()}},
	{name: "down alternative", query: "king size down alternative comforter", category: "home",
		reason: "down alternative is a synthetic fill, not down (common practice): one material, where down was read and alternative left a stray word",
		want:   []tagged{tg(KindSize, "king size", "king (bed)"), tg(KindMaterial, "down alternative", "down alternative"), tg(KindProductType, "comforter", "comforter")}},
	{name: "a keyboard's switches", query: "mechanical keyboard 75% brown switches", category: "electronics",
		reason: "switches named after a keyboard are its key switches, and their colour says how they press (common practice in keyboards): the head was a light switch, in electrical, and brown the keyboard's colour",
		want:   []tagged{tg(KindProductType, "mechanical keyboard", "keyboard"), tg(KindKeyword, "75%", "75%"), tg(KindKeyword, "brown switches", "brown switches")}},
	{name: "a light switch stays one", query: "brown light switch", category: "electrical", reason: "with no keyboard named, a switch is a light switch, and brown its colour",
		want: []tagged{tg(KindColour, "brown", "brown"), tg(KindProductType, "light switch", "light switch")}},
	{name: "a light's sensor", query: "led flood light 5000k motion sensor", category: "electrical",
		reason: "a motion sensor named after a light is the light's (common practice): the head was the sensor, and 5000k then no colour temperature",
		want: []tagged{tg(KindKeyword, "led", "led"), tg(KindProductType, "flood light", "outdoor light"), tg(KindMeasure, "5000k", "5000 K"),
			tg(KindKeyword, "motion sensor", "motion sensor")}},
	{name: "a light's sensor next to it", query: "flood light motion sensor", category: "electrical",
		reason: "as above, with no word between: the light is no modifier of the sensor",
		want:   []tagged{tg(KindProductType, "flood light", "outdoor light"), tg(KindKeyword, "motion sensor", "motion sensor")}},
	{name: "a sensor alone", query: "motion sensor 3 pack", category: "electrical",
		reason: "no light named: the sensor is the product",
		want:   []tagged{tg(KindProductType, "motion sensor", "motion sensor"), tg(KindMeasure, "3 pack", "3 count")}},
	{name: "a US paper size", query: "file folders letter size 100", category: "office",
		reason: "letter is the US paper size (8.5 x 11 in, from memory), a firm phrase: size took the 100 for a hard size of 100",
		want:   []tagged{tg(KindProductType, "file folders", "folder"), tg(KindKeyword, "letter size", "letter").firm(), tg(KindMeasure, "100", "100")}},
	{name: "a letter opener", query: "letter opener", reason: "no office goods and no size: letter stays a word",
		want: []tagged{tg(KindKeyword, "letter", "letter"), tg(KindKeyword, "opener", "opener")}},
	{name: "office features", query: "paper shredder cross cut 12 sheet", category: "office",
		reason: "how a shredder cuts (common practice): cross and cut were stray words",
		want:   []tagged{tg(KindProductType, "paper shredder", "shredder"), tg(KindSilhouette, "cross cut", "cross cut"), tg(KindMeasure, "12 sheet", "12 count")}},
	{name: "thousands after a comparison", query: "laptop under 2k", category: "electronics",
		reason: "2k is 2,000, and with k it is money (common practice): it was a ceiling of 2 USD and a stray k, and a 2000 would fit the laptop's storage slot",
		want:   []tagged{tg(KindProductType, "laptop", "laptop"), tg(KindPrice, "under 2k", "≤ 2000.00 USD")}},
	{name: "thousands and a currency", query: "sofa under 1.5k eur", category: "furniture", reason: "as above, in the currency named after it",
		want: []tagged{tg(KindProductType, "sofa", "sofa"), tg(KindPrice, "under 1.5k eur", "≤ 1500.00 EUR")}},
	{name: "pounds on clothes", query: "dress under 50 pounds", category: "apparel",
		reason: "a dress is sold by no weight, so pounds spelt out are pounds sterling (ISO 4217 GBP): it was a ceiling of 50 lb",
		want:   []tagged{tg(KindProductType, "dress", "dress"), tg(KindPrice, "under 50 pounds", "≤ 50.00 GBP")}},
	{name: "pounds on a ladder", query: "step ladder over 250 pounds", category: "hardware", reason: "a ladder is rated by weight: pounds stay a mass, its load rating",
		want: []tagged{tg(KindProductType, "step ladder", "step ladder"), tg(KindMeasure, "over 250 pounds", "≥ 250 lb")}},
	{name: "a candle's wicks", query: "candle soy lavender 3 wick", category: "home",
		reason: "candles are sold by their wicks and their wax (common practice): 3 was a diameter of 3 in, soy and wick stray words",
		want: []tagged{tg(KindProductType, "candle", "candle"), tg(KindMaterial, "soy", "soy wax"), tg(KindColour, "lavender", "lavender"),
			tg(KindMeasure, "3 wick", "3 count")}},
	{name: "a 3-way switch", query: "3-way switch white", category: "electrical",
		reason: "a 3-way switch works a light from two places (common practice), a firm phrase: 3 was a unitless number, way and switch stray words",
		want:   []tagged{tg(KindKeyword, "3-way", "3-way").firm(), tg(KindProductType, "switch", "light switch"), tg(KindColour, "white", "white")}},
	{name: "a toilet seat's shape", query: "toilet seat elongated soft close", category: "hardware",
		reason: "elongated or round, and soft close, are how a toilet seat is built (common practice): three stray words",
		want:   []tagged{tg(KindProductType, "toilet seat", "toilet seat"), tg(KindSilhouette, "elongated", "elongated"), tg(KindSilhouette, "soft close", "soft close")}},
	{name: "an inseam in inches", query: "mens shorts 9 inch inseam", category: "apparel",
		reason: "the inseam spelt out with its inch, as \"7 inseam\" is without it: it was a length and a stray word",
		want:   []tagged{tg(KindAudience, "mens", "men"), tg(KindProductType, "shorts", "shorts"), tg(KindSize, "9 inch inseam", "9 (inseam)")}},
	{name: "a weight capacity", query: "office chair 300 lb capacity", category: "furniture",
		reason: "a mass before capacity is the load the product is rated to carry, a load rating (hard by default): it was a plain mass and a stray word",
		want:   []tagged{tg(KindProductType, "office chair", "office chair"), tg(KindMeasure, "300 lb capacity", "300 lb")}},
	{name: "a volume capacity", query: "washing machine 4.5 cu ft capacity", category: "home",
		reason: "a volume's capacity is no load rating: the word stays as it was",
		want:   []tagged{tg(KindProductType, "washing machine", "washing machine"), tg(KindMeasure, "4.5 cu ft", "4.5 ft3"), tg(KindKeyword, "capacity", "capacity")}},
	{name: "a copper tube's wall type", query: "copper pipe 1/2 x 10 ft type l", category: "hardware",
		reason: "type K, L and M are copper water tube's walls (ASTM B88, from memory), which set the pressure it holds: type was filler and l a stray word a rescue dropped",
		want: []tagged{tg(KindMaterial, "copper", "copper"), tg(KindProductType, "pipe", "pipe"), tg(KindMeasure, "1/2", "0.5 in").inferred(),
			tg(KindMeasure, "10 ft", "10 ft"), tg(KindKeyword, "type l", "type l").hard()}},
	{name: "a wall type first", query: "type m copper pipe", category: "hardware", reason: "the wall type before the pipe is read the same",
		want: []tagged{tg(KindKeyword, "type m", "type m").hard(), tg(KindMaterial, "copper", "copper"), tg(KindProductType, "pipe", "pipe")}},
	{name: "a ladder's duty rating", query: "extension ladder 24 ft type 1a", category: "hardware",
		reason: "type IA is a ladder's duty rating, 300 lb (ANSI A14, from memory), a load rating written in roman numerals: type and 1a were filler and a number",
		want:   []tagged{tg(KindProductType, "extension ladder", "extension ladder"), tg(KindMeasure, "24 ft", "24 ft"), tg(KindKeyword, "type 1a", "type ia").hard()}},
	{name: "a wheel's size and bolt pattern", query: "wheel 17x7.5 5x114.3", category: "tyres",
		reason: "a wheel is sold by diameter by width in inches and its bolt pattern, lugs by pitch circle in mm (common practice): a wheel of another pattern cannot be fitted, so it is hard; 7.5, 5 and 114.3 were unitless",
		want: []tagged{tg(KindProductType, "wheel", "wheel"), tg(KindMeasure, "17", "17 in").inferred(), tg(KindMeasure, "7.5", "7.5 in").inferred(),
			tg(KindKeyword, "5x114.3", "5x114.3").hard()}},
	{name: "a lug nut's thread", query: "lug nuts 12x1.5", category: "tyres",
		reason: "M12x1.5 is an ISO 261 fine pitch (threads_metric_iso261_262.tsv): the lug nut's thread, hard, where it was two unitless numbers",
		want:   []tagged{tg(KindProductType, "lug nuts", "lug nut"), tg(KindSpec, "12x1.5", "M12x1.5 (metric_thread)")}},
	{name: "a tyre's load range", query: "lt265/75r16 load range e", category: "tyres",
		reason: "load range E is the tyre's load rating by letter (common practice): hard, where it was three stray words",
		want:   []tagged{tg(KindSpec, "lt265/75r16", "LT265/75R16 (tyre)"), tg(KindKeyword, "load range e", "load range e").hard()}},
	{name: "cold cranking amps", query: "car battery 650 cca", category: "batteries",
		reason: "a car battery is rated by its cold cranking amps (common practice): 650 was unitless and cca a stray word",
		want:   []tagged{tg(KindProductType, "car battery", "car battery"), tg(KindMeasure, "650 cca", "650 A")}},
	{name: "features of accessories", query: "wallet rfid blocking slim", category: "accessories",
		reason: "how a wallet, an umbrella or a suitcase is built (common practice): rfid and blocking were stray words",
		want:   []tagged{tg(KindProductType, "wallet", "wallet"), tg(KindSilhouette, "rfid blocking", "rfid blocking"), tg(KindSilhouette, "slim", "slim")}},
	{name: "sterling alone", query: "necklace 20 inch sterling", category: "accessories", reason: "sterling on jewellery is sterling silver (common practice)",
		want: []tagged{tg(KindProductType, "necklace", "necklace"), tg(KindMeasure, "20 inch", "20 in"), tg(KindMaterial, "sterling", "sterling silver")}},
	{name: "a nail's penny size", query: "framing nails 16d", category: "hardware",
		reason: "a 16d (sixteen penny) nail is 3 1/2 in long (common practice, from memory): the d was read as a depth, 16 of no unit",
		want:   []tagged{tg(KindKeyword, "framing", "framing"), tg(KindProductType, "nails", "nail"), tg(KindMeasure, "16d", "3.5 in")}},
	{name: "a sheet before the sheet good", query: "4x8 sheet 1/2 osb", category: "lumber",
		reason: "the sheet is the osb's form, as in \"plywood 4x8 sheet\": it was a bed sheet, a product type of its own",
		want: []tagged{tg(KindMeasure, "4", "4 ft").inferred(), tg(KindMeasure, "8", "8 ft").inferred(), tg(KindMeasure, "1/2", "0.5 in").inferred(),
			tg(KindProductType, "osb", "osb")}},
	{name: "drywall", query: "drywall 1/2 4x8", category: "lumber", reason: "gypsum board by thickness, width and length in the trade's units (common practice): drywall was a stray word",
		want: []tagged{tg(KindProductType, "drywall", "drywall"), tg(KindMeasure, "1/2", "0.5 in").inferred(), tg(KindMeasure, "4", "4 ft").inferred(),
			tg(KindMeasure, "8", "8 ft").inferred()}},
	{name: "a crown moulding's width", query: "crown molding 3 1/4", category: "lumber",
		reason: "crown moulding is sold by its width in inches, 2 1/4 to 7 1/4 (common practice): 3 1/4 was a length of 3.25 ft",
		want:   []tagged{tg(KindProductType, "crown molding", "crown moulding"), tg(KindMeasure, "3 1/4", "3.25 in").inferred()}},
	{name: "a connector names the cable", query: "type c cable 6 ft", category: "electronics",
		reason: "as a grade does (cat6 cable): a USB-C cable is a usb cable, never widened to cables of other kinds; the head was any cable",
		want:   []tagged{tg(KindKeyword, "type c", "usb-c").firm(), tg(KindProductType, "cable", "usb cable"), tg(KindMeasure, "6 ft", "6 ft")}},
	{name: "a grade with a space", query: "ethernet cable cat 6 25 ft", category: "electronics",
		reason: "cat 6 is the TIA-568 category cat6 (from memory) written with a space: cat was a stray word and 6 a second length of 6 ft",
		want:   []tagged{tg(KindProductType, "ethernet cable", "ethernet cable"), tg(KindKeyword, "cat 6", "cat6").firm(), tg(KindMeasure, "25 ft", "25 ft")}},
	{name: "a battery's group size", query: "car battery group 24f 650 cca", category: "batteries",
		reason: "a BCI group sets a car battery's case and terminals (from memory), so another does not fit: group was a stray word and 24f an unknown one",
		want:   []tagged{tg(KindProductType, "car battery", "car battery"), tg(KindKeyword, "group 24f", "group 24f").hard(), tg(KindMeasure, "650 cca", "650 A")}},
	{name: "a group size spelt out", query: "group size h6 car battery", category: "batteries", reason: "with \"size\" between, and a letter first",
		want: []tagged{tg(KindKeyword, "group size h6", "group h6").hard(), tg(KindProductType, "car battery", "car battery")}},
	{name: "a pen's point", query: "ballpoint pens blue medium point", category: "office",
		reason: "a pen's point is its line's width (common practice): point was a shoe's pointed toe",
		want:   []tagged{tg(KindProductType, "ballpoint pens", "ballpoint pen"), tg(KindColour, "blue", "blue"), tg(KindSilhouette, "medium point", "medium point")}},
	{name: "a roller's nap", query: "paint roller 9 inch 3/8 nap", category: "paint",
		reason: "a roller is sold with its cover, by the cover's nap: 3/8 was a unitless number and nap a stray word",
		want:   []tagged{tg(KindProductType, "paint roller", "paint roller"), tg(KindMeasure, "9 inch", "9 in"), tg(KindMeasure, "3/8 nap", "0.375 in")}},
	{name: "a flotation tyre size", query: "tire 33x12.50r20", category: "tyres",
		reason: "light truck tyres are sized by overall diameter by width in inches, then construction and rim (common practice, from memory): the dimension was unitless and r20 a hard part number nothing has",
		want:   []tagged{tg(KindProductType, "tire", "tyre"), tg(KindSpec, "33x12.50r20", "33X12.50R20 (tyre)")}},
	{name: "a flotation size for light trucks", query: "35x12.5r17lt tires", category: "tyres",
		reason: "the width may drop its trailing zero and the size may end in lt, the light truck service type",
		want:   []tagged{tg(KindSpec, "35x12.5r17lt", "35X12.50R17 (tyre)"), tg(KindProductType, "tires", "tyre")}},
	{name: "a dimension and a code elsewhere", query: "shelf 33x12 r20", category: "furniture",
		reason: "off tyres, with a space before the code, it is no tyre size",
		want:   []tagged{tg(KindProductType, "shelf", "shelf"), tg(KindMeasure, "33", "33"), tg(KindMeasure, "12", "12"), tg(KindPartNumber, "r20", "R20")}},
	{name: "a fine thread", query: "m8 fine thread bolt", category: "hardware",
		reason: "a bare M8 is the coarse M8x1.25; asked with fine thread it is any of ISO 261's fine pitches for M8, 0.75 and 1 (threads_metric_iso261_262.tsv)",
		want:   []tagged{tg(KindSpec, "m8", "M8x0.75 or M8x1 (metric_thread)"), tg(KindSilhouette, "fine thread", "fine thread"), tg(KindProductType, "bolt", "bolt")}},
	{name: "a pitch typed stays", query: "m8x1.25 fine thread", category: "hardware",
		reason: "a pitch typed is never changed, even when the words disagree",
		want:   []tagged{tg(KindSpec, "m8x1.25", "M8x1.25 (metric_thread)"), tg(KindSilhouette, "fine thread", "fine thread")}},
	{name: "a MERV rating with a space", query: "air filter 16x25x1 merv 11", category: "home",
		reason: "MERV 1 to 16 rate an air filter (ASHRAE 52.2, from memory): merv was a stray word and 11 a fourth dimension, 11 in wide",
		want: []tagged{tg(KindProductType, "air filter", "air filter"), tg(KindMeasure, "16", "16 in").inferred(), tg(KindMeasure, "25", "25 in").inferred(),
			tg(KindMeasure, "1", "1 in").inferred(), tg(KindKeyword, "merv 11", "merv11").firm()}},
	{name: "a MERV rating as one code", query: "furnace filter merv8 6 pack", category: "home",
		reason: "the rating written as one code is the same grade, not a part number, which would be hard",
		want:   []tagged{tg(KindProductType, "furnace filter", "air filter"), tg(KindKeyword, "merv8", "merv8").firm(), tg(KindMeasure, "6 pack", "6 count")}},
	{name: "an abrasive's grit", query: "sandpaper 220 grit 25 pack", category: "hardware",
		reason: "grit numbers follow their own scales (CAMI, FEPA P; from memory), named in listings: 220 was unitless and grit a stray word",
		want:   []tagged{tg(KindProductType, "sandpaper", "sandpaper"), tg(KindKeyword, "220 grit", "220 grit").firm(), tg(KindMeasure, "25 pack", "25 count")}},
	{name: "a grit stuck to its number", query: "sanding disc 5 inch 80grit", category: "hardware",
		reason: "80grit is the same grit; sanding was the colour sand, reached only by stemming an -ing word",
		want:   []tagged{tg(KindProductType, "sanding disc", "sanding disc"), tg(KindMeasure, "5 inch", "5 in"), tg(KindKeyword, "80grit", "80 grit").firm()}},
	{name: "a blade's teeth", query: "circular saw blade 7 1/4 24 tooth", category: "hardware",
		reason: "a saw blade is sold by its teeth (common practice): 24 was unitless and tooth a stray word",
		want:   []tagged{tg(KindProductType, "circular saw blade", "saw blade"), tg(KindMeasure, "7 1/4", "7.25 in").inferred(), tg(KindMeasure, "24 tooth", "24 count")}},
	{name: "an -ing word is no colour", query: "sanding sponge", category: "",
		reason: "sanding stems to sand, a colour; a verb's -ing form names no colour (common knowledge of English)",
		want:   []tagged{tg(KindKeyword, "sanding", "sanding"), tg(KindKeyword, "sponge", "sponge")}},
	{name: "battery operated", query: "smoke detector battery operated", category: "electrical",
		reason: "how the product is powered, not a battery: the head was a battery, in batteries",
		want:   []tagged{tg(KindProductType, "smoke detector", "smoke detector"), tg(KindSilhouette, "battery operated", "battery operated")}},
	{name: "a type then one of its kinds", query: "blanket throw wool grey", category: "home",
		reason: "a throw is a kind of blanket (product_types.wlx): \"blanket throw\" is the throw, where blanket was a modifier a rescue dropped or replaced",
		want:   []tagged{tg(KindProductType, "blanket throw", "throw"), tg(KindMaterial, "wool", "wool"), tg(KindColour, "grey", "grey")}},
	{name: "a type then a type of another kind", query: "lamp desk", category: "furniture",
		reason: "a desk is no kind of lamp: the first qualifies the second",
		want:   []tagged{tg(KindKeyword, "lamp", "lamp"), tg(KindProductType, "desk", "desk")}},
	{name: "a bag's size word", query: "tote bag canvas large", category: "accessories",
		reason: "a bag comes in no letter sizes (common practice): large says how big, soft, where it was a hard size l no tote has",
		want:   []tagged{tg(KindProductType, "tote bag", "tote bag"), tg(KindMaterial, "canvas", "canvas"), tg(KindKeyword, "large", "large")}},
	{name: "a bag's two-word size", query: "extra large duffel bag", category: "accessories", reason: "the same for \"extra large\"",
		want: []tagged{tg(KindKeyword, "extra large", "extra large"), tg(KindProductType, "duffel bag", "duffel bag")}},
	{name: "a bowl's size word", query: "large mixing bowl", category: "kitchen",
		reason: "kitchen goods come in no letter sizes: large says how big, where it was a stray word",
		want:   []tagged{tg(KindKeyword, "large", "large"), tg(KindProductType, "mixing bowl", "mixing bowl")}},
	{name: "a towel's letter size", query: "2xl towel", category: "home",
		reason: "a towel comes in no letter sizes: 2xl says how big, soft, where it was a hard size xxl",
		want:   []tagged{tg(KindKeyword, "2xl", "2xl"), tg(KindProductType, "towel", "towel")}},
	{name: "a letter size with no product", query: "xl", category: "",
		reason: "with no product type nothing says the goods are unsized: xl is a size",
		want:   []tagged{tg(KindSize, "xl", "xl (letter)")}},
	{name: "a helmet's size", query: "bike helmet medium", category: "accessories", reason: "a helmet is sold in letter sizes, as what is worn and fitted is",
		want: []tagged{tg(KindProductType, "bike helmet", "helmet"), tg(KindSize, "medium", "m (letter)")}},
	{name: "kitchen goods", query: "meat thermometer electric", category: "kitchen",
		reason: "no word was known: the query named no product type nor category",
		want:   []tagged{tg(KindProductType, "meat thermometer", "meat thermometer"), tg(KindSilhouette, "electric", "electric")}},
	{name: "electric blue stays a colour", query: "electric blue dress", category: "apparel", reason: "the longer phrase, the colour, wins over the feature",
		want: []tagged{tg(KindColour, "electric blue", "electric blue"), tg(KindProductType, "dress", "dress")}},
	{name: "garden and seasonal goods", query: "christmas tree 7 prelit", category: "home",
		reason: "a christmas tree is sold by its height in feet (common practice): christmas and tree were stray words and 7 unitless",
		want:   []tagged{tg(KindProductType, "christmas tree", "christmas tree"), tg(KindMeasure, "7", "7 ft").inferred(), tg(KindSilhouette, "prelit", "pre-lit")}},
	{name: "path lights", query: "solar path lights 8 pack", category: "electrical", reason: "no word was known, so no category either",
		want: []tagged{tg(KindProductType, "solar path lights", "path light"), tg(KindMeasure, "8 pack", "8 count")}},
	{name: "a doorbell camera", query: "doorbell camera wireless", category: "electrical", reason: "a doorbell with a camera, not a camera for a doorbell",
		want: []tagged{tg(KindProductType, "doorbell camera", "doorbell"), tg(KindSilhouette, "wireless", "wireless")}},
	{name: "a dimension in feet", query: "whiteboard 4x6 magnetic", category: "office",
		reason: "4 and 6 are too small for a whiteboard in inches, its slots' unit, and fit in feet, as boards are sold (common practice): they were unitless and dropped",
		want: []tagged{tg(KindProductType, "whiteboard", "whiteboard"), tg(KindMeasure, "4", "4 ft").inferred(), tg(KindMeasure, "6", "6 ft").inferred(),
			tg(KindSilhouette, "magnetic", "magnetic")}},
	{name: "a dimension in inches", query: "whiteboard 36x48", category: "office", reason: "numbers that fit the inch slots stay inches",
		want: []tagged{tg(KindProductType, "whiteboard", "whiteboard"), tg(KindMeasure, "36", "36 in").inferred(), tg(KindMeasure, "48", "48 in").inferred()}},
	{name: "a dimension too large for feet", query: "area rug 120x170", category: "home",
		reason: "too large for a rug in feet, its slots' unit, it may be inches or centimetres: it stays unitless rather than be guessed",
		want:   []tagged{tg(KindProductType, "area rug", "rug"), tg(KindMeasure, "120", "120"), tg(KindMeasure, "170", "170")}},
	{name: "a towel bar", query: "towel bar 24 inch brushed nickel", category: "home",
		reason: "a towel bar is bathroom hardware, no towel: bar was a stray word and the head a towel",
		want:   []tagged{tg(KindProductType, "towel bar", "towel bar"), tg(KindMeasure, "24 inch", "24 in"), tg(KindColour, "brushed nickel", "brushed nickel")}},
	{name: "a shower curtain rod", query: "shower curtain rod 72 inch", category: "home",
		reason: "the rod, not the curtain, whose 72 in width it took",
		want:   []tagged{tg(KindProductType, "shower curtain rod", "shower curtain rod"), tg(KindMeasure, "72 inch", "72 in")}},
	{name: "a length and its dimension", query: "bookcase 72 inch tall white", category: "furniture",
		reason: "the word after a length names what it measures (common English usage): tall was a stray word",
		want:   []tagged{tg(KindProductType, "bookcase", "bookcase"), tg(KindMeasure, "72 inch tall", "72 in"), tg(KindColour, "white", "white")}},
	{name: "a bare number and its dimension", query: "bookcase 72 tall", category: "furniture",
		reason: "a bare number takes the unit of the slot the word names",
		want:   []tagged{tg(KindProductType, "bookcase", "bookcase"), tg(KindMeasure, "72 tall", "72 in").inferred()}},
	{name: "a desk's long side", query: "desk 48 in long", category: "furniture",
		reason: "a desk has a width and a depth and no length (product_types.wlx): its long side is its width",
		want:   []tagged{tg(KindProductType, "desk", "desk"), tg(KindMeasure, "48 in long", "48 in")}},
	{name: "a length on clothes", query: "jeans 32 long", category: "apparel",
		reason: "on clothes \"long\" after a number is an inseam, not a length",
		want:   []tagged{tg(KindProductType, "jeans", "jeans"), tg(KindSize, "32 long", "32 (inseam)")}},
	{name: "a pressure", query: "pressure washer 3000 psi", category: "hardware",
		reason: "a pressure washer is sold by its pressure; psi was a stray word and 3000 unitless (unit_conversions.tsv gives psi)",
		want:   []tagged{tg(KindProductType, "pressure washer", "pressure washer"), tg(KindMeasure, "3000 psi", "3000 psi")}},
	{name: "a pressure inferred", query: "pressure washer 3000", category: "hardware", reason: "a bare number in the pressure slot's range takes psi",
		want: []tagged{tg(KindProductType, "pressure washer", "pressure washer"), tg(KindMeasure, "3000", "3000 psi").inferred()}},
	{name: "an energy", query: "surge protector 12 outlet 4000 joules", category: "electrical",
		reason: "a surge protector is rated in joules (common practice): joules was a stray word and 4000 unitless",
		want:   []tagged{tg(KindProductType, "surge protector", "surge protector"), tg(KindMeasure, "12 outlet", "12 count"), tg(KindMeasure, "4000 joules", "4000 J")}},
	{name: "watt-hours", query: "portable power station 1000wh", category: "electrical", reason: "a power station's capacity in watt-hours, 3600 J each",
		want: []tagged{tg(KindProductType, "portable power station", "portable power station"), tg(KindMeasure, "1000wh", "1000 Wh")}},
	{name: "bar is no unit", query: "3 bar stools", category: "furniture", reason: "bar names products too: it is no pressure",
		want: []tagged{tg(KindMeasure, "3", "3"), tg(KindProductType, "bar stools", "bar stool")}},
	{name: "a fertilizer's grade", query: "fertilizer 10-10-10 50 lb", category: "hardware",
		reason: "N-P-K is a fertilizer's grade (common practice): the numbers were a range and a second number, read as weights in the fertilizer's slot",
		want:   []tagged{tg(KindProductType, "fertilizer", "fertilizer"), tg(KindKeyword, "10-10-10", "10-10-10").firm(), tg(KindMeasure, "50 lb", "50 lb")}},
	{name: "a fertilizer's weight range", query: "fertilizer 10-20 lb", category: "hardware", reason: "two numbers and a unit are a range still",
		want: []tagged{tg(KindProductType, "fertilizer", "fertilizer"), tg(KindMeasure, "10-20 lb", "10..20 lb")}},
	{name: "garden goods", query: "pressure washer gas", category: "hardware",
		reason: "a pressure washer is no flat washer, whose diameter slot took any number",
		want:   []tagged{tg(KindProductType, "pressure washer", "pressure washer"), tg(KindKeyword, "gas", "gas")}},
	{name: "a stain's opacity", query: "wood stain semi transparent", category: "paint",
		reason: "semi transparent is a stain's opacity (common practice): transparent was the colour clear, hard in paint",
		want:   []tagged{tg(KindProductType, "wood stain", "wood stain"), tg(KindPattern, "semi transparent", "semi transparent")}},
	{name: "a version after the cable", query: "hdmi cable 10 ft 2.1", category: "electronics",
		reason: "HDMI 2.1 is the standard's version (common practice in listings): the 2.1 was a second length, 2.1 ft",
		want:   []tagged{tg(KindProductType, "hdmi cable", "hdmi cable"), tg(KindMeasure, "10 ft", "10 ft"), tg(KindKeyword, "2.1", "hdmi2.1").firm()}},
	{name: "a usb version after the cable", query: "usb cable 3.0 6 ft", category: "electronics",
		reason: "USB 3.0 is the standard's version (common practice in listings), not 3 ft",
		want:   []tagged{tg(KindProductType, "usb cable", "usb cable"), tg(KindKeyword, "3.0", "usb3.0").firm(), tg(KindMeasure, "6 ft", "6 ft")}},
	{name: "a usb version after a drive", query: "usb flash drive 128gb 3.0", category: "electronics",
		reason: "a flash drive is sold by its USB version too (common practice): 3.0 was read as 3 GB, a second capacity",
		want:   []tagged{tg(KindKeyword, "usb", "usb"), tg(KindProductType, "flash drive", "usb drive"), tg(KindMeasure, "128gb", "128 GB"), tg(KindKeyword, "3.0", "usb3.0").firm()}},
	{name: "a length after the cable", query: "hdmi cable 1.5", category: "electronics",
		reason: "1.5 is no HDMI version (1.4, 2.0 and 2.1 are, from memory): it stays a length",
		want:   []tagged{tg(KindProductType, "hdmi cable", "hdmi cable"), tg(KindMeasure, "1.5", "1.5 ft").inferred()}},
	{name: "a grade with a space names the type", query: "hdmi 2.1 cable", category: "electronics",
		reason: "as hdmi2.1 cable: an HDMI cable, never widened to cables of other kinds; 2.1 was a length of 2.1 ft",
		want:   []tagged{tg(KindKeyword, "hdmi 2.1", "hdmi2.1").firm(), tg(KindProductType, "cable", "hdmi cable")}},
	{name: "a port version with a space", query: "external hard drive 2tb usb 3.0", category: "electronics",
		reason: "usb 3.0 is the USB version: 3.0 was a unitless number",
		want:   []tagged{tg(KindProductType, "external hard drive", "external hard drive"), tg(KindMeasure, "2tb", "2 TB"), tg(KindKeyword, "usb 3.0", "usb3.0").firm()}},
	{name: "no grade", query: "cat 9 lives", reason: "cat9 is no category of TIA-568: the words stay as they are",
		want: []tagged{tg(KindKeyword, "cat", "cat"), tg(KindMeasure, "9", "9"), tg(KindKeyword, "lives", "lives")}},
	{name: "an hdmi switch", query: "hdmi switch 3 port", category: "electronics", reason: "a product type of its own: switch was a stray word",
		want: []tagged{tg(KindProductType, "hdmi switch", "hdmi switch"), tg(KindMeasure, "3 port", "3 count")}},
	{name: "a router's bands", query: "wifi router tri band", category: "electronics", reason: "tri band is how a router is built (common practice)",
		want: []tagged{tg(KindProductType, "wifi router", "router"), tg(KindSilhouette, "tri band", "tri band")}},
	{name: "a breaker's poles", query: "20 amp double pole breaker", category: "electrical",
		reason: "a double pole breaker serves a 240 V circuit, a single pole one cannot (common practice): double and pole were stray words",
		want:   []tagged{tg(KindMeasure, "20 amp", "20 A"), tg(KindMeasure, "double pole", "2 count"), tg(KindProductType, "breaker", "circuit breaker")}},
	{name: "a breaker's poles as a number", query: "30a 2 pole breaker", category: "electrical", reason: "as above, counted: 2 was a unitless number",
		want: []tagged{tg(KindMeasure, "30a", "30 A"), tg(KindMeasure, "2 pole", "2 count"), tg(KindProductType, "breaker", "circuit breaker")}},
	{name: "a double bed", query: "double bed sheet", category: "home", reason: "double before no pole is the bed size still",
		want: []tagged{tg(KindSize, "double", "double (bed)"), tg(KindProductType, "bed sheet", "bed sheet")}},
	{name: "an extinguisher's classes", query: "fire extinguisher abc 5 lb", category: "hardware",
		reason: "the classes of fire an extinguisher is rated for (NFPA 10, from memory), a hard phrase: abc was a stray word",
		want:   []tagged{tg(KindProductType, "fire extinguisher", "fire extinguisher"), tg(KindKeyword, "abc", "abc").hard(), tg(KindMeasure, "5 lb", "5 lb")}},
	{name: "a life jacket", query: "life jacket adult", category: "accessories", reason: "safety gear of its own, not a jacket with a stray word",
		want: []tagged{tg(KindProductType, "life jacket", "life jacket"), tg(KindKeyword, "adult", "adult")}},
	{name: "a propane tank", query: "propane tank 20 lb", category: "hardware", reason: "a propane tank, not a tank top",
		want: []tagged{tg(KindProductType, "propane tank", "propane tank"), tg(KindMeasure, "20 lb", "20 lb")}},
	{name: "a resolution", query: "hdmi cable 10 ft 4k", category: "electronics",
		reason: "a display resolution is what the cable or screen carries (common practice), a firm phrase: 4k was a stray soft word",
		want:   []tagged{tg(KindProductType, "hdmi cable", "hdmi cable"), tg(KindMeasure, "10 ft", "10 ft"), tg(KindKeyword, "4k", "4k").firm()}},
	{name: "a share of a material", query: "100% cotton tshirt", category: "apparel",
		reason: "100% qualifies the cotton asked for: it was a model number",
		want:   []tagged{tg(KindMaterial, "cotton", "cotton"), tg(KindProductType, "tshirt", "t-shirt")}},
	{name: "a discount", query: "50% off sofa", category: "furniture", reason: "no product's words hold a discount: filler, where off was a stray word",
		want: []tagged{tg(KindProductType, "sofa", "sofa")}},
	{name: "a percentage", query: "mechanical keyboard 75%", category: "electronics", reason: "a keyboard's layout by its share of a full one, in its words",
		want: []tagged{tg(KindProductType, "mechanical keyboard", "keyboard"), tg(KindKeyword, "75%", "75%")}},
	{name: "a feature of earbuds", query: "wireless earbuds noise cancelling", category: "electronics",
		reason: "wireless and noise cancelling are what the earbuds are built with (common practice): three stray words",
		want:   []tagged{tg(KindSilhouette, "wireless", "wireless"), tg(KindProductType, "earbuds", "earbuds"), tg(KindSilhouette, "noise cancelling", "noise cancelling")}},
	{name: "a laptop stand", query: "laptop stand adjustable", category: "office", reason: "a stand for a laptop, not a laptop and a stray word",
		want: []tagged{tg(KindProductType, "laptop stand", "laptop stand"), tg(KindSilhouette, "adjustable", "adjustable")}},
	{name: "a girl's 6x", query: "girls party dress 6x pink", category: "apparel",
		reason: "girls' sizes run 4, 5, 6, 6X, 7 (common practice): 6x was a stray word; letter sizes stop at 5x",
		want: []tagged{tg(KindAudience, "girls", "girls"), tg(KindKeyword, "party", "party"), tg(KindProductType, "dress", "dress"),
			tg(KindSize, "6x", "6x (numeric)"), tg(KindColour, "pink", "pink")}},
	{name: "a suit's chest and length", query: "mens suit jacket 42r charcoal", category: "apparel",
		reason: "suits are sized by chest and length, short, regular or long (common practice): 42r was a stray word",
		want: []tagged{tg(KindAudience, "mens", "men"), tg(KindProductType, "suit jacket", "blazer"), tg(KindSize, "42r", "42r (suit)"),
			tg(KindColour, "charcoal", "charcoal")}},
	{name: "a long suit", query: "suit 40l", category: "apparel", reason: "the L of a long suit, not 40 litres",
		want: []tagged{tg(KindProductType, "suit", "suit"), tg(KindSize, "40l", "40l (suit)")}},
	{name: "a suit's length spelt", query: "blazer 44 long", category: "apparel", reason: "long spelt is the L",
		want: []tagged{tg(KindProductType, "blazer", "blazer"), tg(KindSize, "44 long", "44l (suit)")}},
	{name: "a tailored coat's size", query: "mens navy wool peacoat size 42 regular", category: "apparel",
		reason: "peacoats and overcoats are tailored and sized as suits are, by chest and length (common practice in menswear): the size was 42 regular as one named size",
		want: []tagged{tg(KindAudience, "mens", "men"), tg(KindColour, "navy", "navy"), tg(KindMaterial, "wool", "wool"),
			tg(KindProductType, "peacoat", "peacoat"), tg(KindSize, "size 42 regular", "42r (suit)")}},
	{name: "a suit size after size", query: "wool blazer size 40r", category: "apparel",
		reason: "after \"size\" the chest and length are one suit size, as without it: the r was a stray word, and a hard numeric 40 no suit is sized by",
		want:   []tagged{tg(KindMaterial, "wool", "wool"), tg(KindProductType, "blazer", "blazer"), tg(KindSize, "size 40r", "40r (suit)")}},
	{name: "a suit's length spelt after size", query: "suit size 42 long", category: "apparel", reason: "long spelt is the L, after \"size\" too",
		want: []tagged{tg(KindProductType, "suit", "suit"), tg(KindSize, "size 42 long", "42l (suit)")}},
	{name: "a long suit after size", query: "suit size 40l", category: "apparel", reason: "the L of a long suit, not 40 litres, after \"size\" too",
		want: []tagged{tg(KindProductType, "suit", "suit"), tg(KindSize, "size 40l", "40l (suit)")}},
	{name: "a bra's cup c", query: "womens bra 36c", category: "apparel", reason: "c is a cup on a bra, not a child's size letter (13c)",
		want: []tagged{tg(KindAudience, "womens", "women"), tg(KindProductType, "bra", "bra"), tg(KindSize, "36c", "36c (bra)")}},
	{name: "light-up shoes", query: "kids light up shoes size 12", category: "footwear",
		reason: "light up is a style of children's shoes (common practice): light was a stray word and up filler",
		want:   []tagged{tg(KindAudience, "kids", "kids"), tg(KindSilhouette, "light up", "light up"), tg(KindProductType, "shoes", "shoe"), tg(KindSize, "size 12", "12 (shoe)")}},
	{name: "a run of shoe sizes", query: "slippers womens size 7-8", category: "footwear",
		reason: "slippers are labelled by runs of shoe sizes (common practice): \"size\" was a stray word and 7-8 a unitless range, firm",
		want:   []tagged{tg(KindProductType, "slippers", "slipper"), tg(KindAudience, "womens", "women"), tg(KindSize, "size 7-8", "7-8 (shoe)")}},
	{name: "a sock size", query: "socks 10-13 black", category: "apparel",
		reason: "socks are sized by the run of shoe sizes they fit (common practice): 10-13 was a unitless range",
		want:   []tagged{tg(KindProductType, "socks", "socks"), tg(KindSize, "10-13", "10-13 (numeric)"), tg(KindColour, "black", "black")}},
	{name: "a sock size after size", query: "wool socks size 9-11", category: "apparel", reason: "as above, after the word size",
		want: []tagged{tg(KindMaterial, "wool", "wool"), tg(KindProductType, "socks", "socks"), tg(KindSize, "size 9-11", "9-11 (numeric)")}},
	{name: "a sectional's side", query: "sectional sofa grey left facing", category: "furniture",
		reason: "a sectional's chaise or corner faces left or right (common practice): left and facing were stray words",
		want:   []tagged{tg(KindProductType, "sectional sofa", "sectional"), tg(KindColour, "grey", "grey"), tg(KindSilhouette, "left facing", "left facing")}},
	{name: "a memory card's speed class", query: "sd card 128gb v30 u3", category: "electronics",
		reason: "V30 and U3 are the SD Association's speed classes (from memory), what the card is, not its part number: they were hard part numbers",
		want: []tagged{tg(KindProductType, "sd card", "memory card"), tg(KindMeasure, "128gb", "128 GB"), tg(KindKeyword, "v30", "v30").firm(),
			tg(KindKeyword, "u3", "u3").firm()}},
	{name: "a roller's nap", query: "9 inch roller cover 3/8 nap", category: "paint",
		reason: "roller covers are sold by width and nap, 3/16 to 1 1/4 in (common practice): 3/8 was a unitless number and nap a stray word",
		want:   []tagged{tg(KindMeasure, "9 inch", "9 in"), tg(KindProductType, "roller cover", "roller cover"), tg(KindMeasure, "3/8 nap", "0.375 in")}},
	{name: "square drive", query: "3/8 drive torque wrench", category: "hardware",
		reason: "torque wrenches and sockets are sold by their square drive, 1/4, 3/8, 1/2, 3/4 or 1 in (ASME B107, ISO 1174, from memory): 3/8 was a unitless number and drive a stray word",
		want:   []tagged{tg(KindMeasure, "3/8 drive", "0.375 in"), tg(KindProductType, "torque wrench", "torque wrench")}},
	{name: "a socket's size and its drive", query: "10mm socket 1/2 inch drive", category: "hardware",
		reason: "the socket's size across flats as typed, then its drive",
		want:   []tagged{tg(KindMeasure, "10mm", "10 mm"), tg(KindProductType, "socket", "socket"), tg(KindMeasure, "1/2 inch drive", "0.5 in")}},
	{name: "a socket's size bare", query: "9/16 socket", category: "hardware",
		reason: "a bare fraction on a socket is its size across flats, in inches (common practice): 9/16 is no drive",
		want:   []tagged{tg(KindMeasure, "9/16", "0.5625 in").inferred(), tg(KindProductType, "socket", "socket")}},
	{name: "no drive on a drill", query: "drill 1/2 drive", category: "hardware",
		reason: "a drill has no square drive; its 1/2 in is the chuck",
		want:   []tagged{tg(KindProductType, "drill", "drill"), tg(KindMeasure, "1/2", "0.5"), tg(KindKeyword, "drive", "drive")}},
	{name: "pipe schedule", query: "sch 40 pvc pipe 2 inch", category: "hardware",
		reason: "schedule 40 sets a pipe's wall (ASME B36.10M; ASTM D1785 for PVC, from memory): a hard designation, where sch and 40 were a stray word and a unitless number",
		want:   []tagged{tg(KindSpec, "sch 40", "SCH 40 (pipe_schedule)"), tg(KindProductType, "pvc pipe", "pvc pipe"), tg(KindMeasure, "2 inch", "2 in")}},
	{name: "pipe schedule as one code", query: "sch80 conduit", category: "electrical",
		reason: "conduit is sold by schedule too; sch80 was a part number",
		want:   []tagged{tg(KindSpec, "sch80", "SCH 80 (pipe_schedule)"), tg(KindProductType, "conduit", "conduit")}},
	{name: "pipe schedule and the size after it", query: "pvc pipe sch 40 1/2 in", category: "hardware",
		reason: "the grammar joins 40 and 1/2 as a mixed number: the schedule, then a pipe of 1/2 in",
		want:   []tagged{tg(KindProductType, "pvc pipe", "pvc pipe"), tg(KindSpec, "sch 40", "SCH 40 (pipe_schedule)"), tg(KindMeasure, "1/2 in", "0.5 in")}},
	{name: "stainless pipe schedule", query: "stainless pipe sch 10s", category: "hardware",
		reason: "10S is an ASME B36.19M schedule (from memory), not 10 seconds",
		want:   []tagged{tg(KindMaterial, "stainless", "stainless steel"), tg(KindProductType, "pipe", "pipe"), tg(KindSpec, "sch 10s", "SCH 10S (pipe_schedule)")}},
	{name: "a schedule alone", query: "sch 40", category: "hardware",
		reason: "a pipe schedule says the category as other designations do (cr2032 is batteries): pipes are hardware",
		want:   []tagged{tg(KindSpec, "sch 40", "SCH 40 (pipe_schedule)")}},
	{name: "no such schedule", query: "sch 50 pvc pipe", category: "hardware",
		reason: "no standard lists schedule 50: not read as one",
		want:   []tagged{tg(KindKeyword, "sch", "sch"), tg(KindMeasure, "50", "50"), tg(KindProductType, "pvc pipe", "pvc pipe")}},
	{name: "a schedule off pipe", query: "planner schedule 40 pages", category: "office",
		reason: "a planner is no pipe: schedule stays a word",
		want:   []tagged{tg(KindProductType, "planner", "planner"), tg(KindKeyword, "schedule", "schedule"), tg(KindMeasure, "40", "40"), tg(KindKeyword, "pages", "pages")}},
	{name: "colour temperature stuck", query: "led bulb 2700k", category: "electrical",
		reason: "a lamp's white is sold by its colour temperature in kelvin (SI unit), 2700 K warm (common practice): 2700k was a stray word",
		want:   []tagged{tg(KindProductType, "led bulb", "led bulb"), tg(KindMeasure, "2700k", "2700 K")}},
	{name: "colour temperature spelt", query: "ceiling light 5000 kelvin", category: "electrical",
		reason: "kelvin spelt is the unit as typed; a ceiling light takes the slot from light fixture, its parent",
		want:   []tagged{tg(KindProductType, "ceiling light", "ceiling light"), tg(KindMeasure, "5000 kelvin", "5000 K")}},
	{name: "colour temperature inferred", query: "led bulb 3000", category: "electrical",
		reason: "3000 is no bulb's power (1 to 300 W) and is a colour temperature (1000 to 10000 K): the slots' ranges decide",
		want:   []tagged{tg(KindProductType, "led bulb", "led bulb"), tg(KindMeasure, "3000", "3000 K").inferred()}},
	{name: "a lamp's white by name", query: "warm white led bulb", category: "electrical",
		reason: "warm white is sold as 2700 to 3000 K (common practice, from memory): warm was a stray word and white a colour no bulb has",
		want:   []tagged{tg(KindMeasure, "warm white", "2700..3000 K"), tg(KindProductType, "led bulb", "led bulb")}},
	{name: "daylight on a lamp", query: "daylight string light", category: "electrical",
		reason: "daylight is sold as 5000 to 6500 K (common practice, from memory)",
		want:   []tagged{tg(KindMeasure, "daylight", "5000..6500 K"), tg(KindProductType, "string light", "string light")}},
	{name: "soft white off a lamp", query: "soft white towel", category: "home",
		reason: "a towel gives no light, so soft white is no colour temperature: white stays a colour",
		want:   []tagged{tg(KindKeyword, "soft", "soft"), tg(KindColour, "white", "white"), tg(KindProductType, "towel", "towel")}},
	{name: "k after a small number is no kelvin", query: "4k tv 55", category: "electronics",
		reason: "4k is a screen's resolution (a firm phrase), not 4 K: no lamp is that cold, and a tv has no colour temperature",
		want:   []tagged{tg(KindKeyword, "4k", "4k").firm(), tg(KindProductType, "tv", "tv"), tg(KindMeasure, "55", "55 in").inferred()}},
	{name: "equivalent wattage", query: "led bulb 60 watt equivalent", category: "electrical",
		reason: "60 watt equivalent is an LED's brightness, the light of a 60 W incandescent bulb (common practice), not the power it draws",
		want:   []tagged{tg(KindProductType, "led bulb", "led bulb"), tg(KindKeyword, "60 watt equivalent", "60w equivalent").firm()}},
	{name: "seats", query: "3 seater sofa", category: "furniture", reason: "a number before seater counts seats",
		want: []tagged{tg(KindMeasure, "3 seater", "3 count"), tg(KindProductType, "sofa", "sofa")}},
	{name: "thread count", query: "400 thread count sheet set", category: "home", reason: "thread count is one count",
		want: []tagged{tg(KindMeasure, "400 thread count", "400 count"), tg(KindProductType, "sheet set", "sheet set")}},
	{name: "feature after with", query: "laundry basket with lid", category: "home", reason: "a product type after with is a part, not the product",
		want: []tagged{tg(KindProductType, "laundry basket", "laundry basket"), tg(KindKeyword, "lid", "lid")}},
	{name: "modifier product type", query: "saucepan lid", category: "kitchen", reason: "the first of two product types qualifies the second",
		want: []tagged{tg(KindKeyword, "saucepan", "saucepan"), tg(KindProductType, "lid", "lid")}},
	{name: "broader type merges", query: "variable nd filter 77mm", category: "camera", reason: "filter after nd filter adds nothing",
		want: []tagged{tg(KindProductType, "variable nd filter", "nd filter"), tg(KindMeasure, "77mm", "77 mm")}},
	{name: "thread with length", query: "1/4-20 x 1 hex bolts", category: "hardware", reason: "ASME B1.1 thread, then the bolt's length",
		want: []tagged{tg(KindSpec, "1/4-20", "1/4-20 UNC (unified_thread)"), tg(KindMeasure, "1", "1 in").inferred(), tg(KindProductType, "hex bolts", "hex bolt")}},
	{name: "numbered thread with length", query: "machine screws #10-24 x 3/4", category: "hardware", reason: "ASME B1.1 numbered size, then the length",
		want: []tagged{tg(KindProductType, "machine screws", "machine screw"), tg(KindSpec, "#10-24", "#10-24 UNC (unified_thread)"), tg(KindMeasure, "3/4", "0.75 in").inferred()}},
	{name: "screw gauge", query: "wood screws #8 x 1-1/2", category: "hardware", reason: "#8 is a number size (common practice), then the length",
		want: []tagged{tg(KindProductType, "wood screws", "wood screw"), tg(KindSize, "#8", "#8 (number)"), tg(KindMeasure, "1-1/2", "1.5 in").inferred()}},
	{name: "spaced metric pitch", query: "M8 x 1.0 bolt", category: "hardware", reason: "ISO 261 fine pitch written with spaces",
		want: []tagged{tg(KindSpec, "M8 x 1.0", "M8x1 (metric_thread)"), tg(KindProductType, "bolt", "bolt")}},
	{name: "part number to the next space", query: "part no 4471-b hinge", category: "hardware", reason: "a code after a code marker runs to the next space",
		want: []tagged{tg(KindPartNumber, "part no 4471-b", "4471-B"), tg(KindProductType, "hinge", "hinge")}},
	{name: "cable", query: "12/2 wire", category: "electrical", reason: "12/2 is 12 AWG, two conductors (common practice)",
		want: []tagged{tg(KindSpec, "12/2", "12/2 AWG (awg)"), tg(KindProductType, "wire", "electrical wire")}},
	{name: "cable with a dash", query: "12-2 wire", category: "electrical", reason: "12-2 is written for 12/2, 12 AWG with two conductors (common practice)",
		want: []tagged{tg(KindSpec, "12-2", "12/2 AWG (awg)"), tg(KindProductType, "wire", "electrical wire")}},
	{name: "cord with a dash", query: "14-3 extension cord", category: "electrical", reason: "14-3 is 14 AWG with three conductors (common practice)",
		want: []tagged{tg(KindSpec, "14-3", "14/3 AWG (awg)"), tg(KindProductType, "extension cord", "extension cord")}},
	{name: "hyphenated gauge", query: "12-gauge wire", category: "electrical", reason: "12-gauge is 12 gauge joined by a hyphen",
		want: []tagged{tg(KindSpec, "12-gauge", "12 AWG (awg)"), tg(KindProductType, "wire", "electrical wire")}},
	{name: "misspelt gauge", query: "12 guage wire", category: "electrical", reason: "guage is a common misspelling of gauge",
		want: []tagged{tg(KindSpec, "12 guage", "12 AWG (awg)"), tg(KindProductType, "wire", "electrical wire")}},
	{name: "awg first", query: "awg 12 wire", category: "electrical", reason: "the standard's name may come before the number",
		want: []tagged{tg(KindSpec, "awg 12", "12 AWG (awg)"), tg(KindProductType, "wire", "electrical wire")}},
	{name: "aught by zeros", query: "00 awg", category: "electrical", reason: "00 is 2/0 AWG (ASTM B258 lists 4/0 to 1/0 above 1)",
		want: []tagged{tg(KindSpec, "00 awg", "2/0 AWG (awg)")}},
	{name: "aught on a battery cable", query: "2/0 battery cable", category: "electronics", reason: "2/0 is an aught gauge on a cable (ASTM B258), not a division by zero",
		want: []tagged{tg(KindSpec, "2/0", "2/0 AWG (awg)"), tg(KindKeyword, "battery", "battery"), tg(KindProductType, "cable", "cable")}},
	{name: "sheet metal gauge is no awg", query: "16 gauge sheet metal", category: "hardware", reason: "sheet metal gauges follow their own tables, not AWG (common practice)",
		want: []tagged{tg(KindMeasure, "16 gauge", "16 gauge"), tg(KindProductType, "sheet metal", "sheet metal")}},
	{name: "a count is no head", query: "a4 paper 500 sheets", category: "office",
		reason: "sheets after a number counts the paper (ISO 216 A4); it is no bed sheet heading the query",
		want:   []tagged{tg(KindSpec, "a4", "A4 (paper)"), tg(KindProductType, "paper", "paper"), tg(KindMeasure, "500 sheets", "500 count")}},
	{name: "sheets are bed sheets", query: "king sheets 400 thread count wht", category: "home", reason: "sheets alone are bedding (common practice); wht is white",
		want: []tagged{tg(KindSize, "king", "king (bed)"), tg(KindProductType, "sheets", "bed sheet"), tg(KindMeasure, "400 thread count", "400 count"), tg(KindColour, "wht", "white")}},
	{name: "body jewellery gauge is no awg", query: "20 gauge earrings", category: "accessories", reason: "a gauge on jewellery is a gauge number of its own, not a wire standard",
		want: []tagged{tg(KindMeasure, "20 gauge", "20 gauge"), tg(KindProductType, "earrings", "earrings")}},
	{name: "proper fraction is no gauge", query: "3/4 conduit", category: "electrical", reason: "3/4 is a trade size in inches, not a gauge",
		want: []tagged{tg(KindMeasure, "3/4", "0.75 in").inferred(), tg(KindProductType, "conduit", "conduit")}},
	{name: "light truck tyre", query: "lt265/70r17", category: "tyres", reason: "LT service type before an ISO metric size",
		want: []tagged{tg(KindSpec, "lt265/70r17", "LT265/70R17 (tyre)")}},
	{name: "zr tyre", query: "245/40zr18", category: "tyres", reason: "ZR is a speed-rated radial (common practice)",
		want: []tagged{tg(KindSpec, "245/40zr18", "245/40R18 (tyre)")}},
	{name: "service description", query: "205/55 r16 91v", category: "tyres", reason: "load index 91, speed symbol V follow the size",
		want: []tagged{tg(KindSpec, "205/55 r16 91v", "205/55R16 91V (tyre)")}},
	{name: "tyre load version", query: "205/55r16 xl", category: "tyres",
		reason: "XL on a tyre is its load version (extra load, common practice), not a clothing size, and a standard-load tyre is no substitute",
		want:   []tagged{tg(KindSpec, "205/55r16", "205/55R16 (tyre)"), tg(KindKeyword, "xl", "xl").hard()}},
	{name: "tyre extra load", query: "winter tyre 205/55r16 extra load", category: "tyres", reason: "extra load is XL written out",
		want: []tagged{tg(KindProductType, "winter tyre", "winter tyre"), tg(KindSpec, "205/55r16", "205/55R16 (tyre)"), tg(KindKeyword, "extra load", "extra load").hard()}},
	{name: "service description alone", query: "tyres 91v", category: "tyres",
		reason: "91V apart from a size is a load index and speed symbol (ISO 4000-1), not 91 volts",
		want:   []tagged{tg(KindProductType, "tyres", "tyre"), tg(KindKeyword, "91v", "91v").hard()}},
	{name: "xl on clothes", query: "xl tee", category: "apparel", reason: "away from tyres xl is still a letter size",
		want: []tagged{tg(KindSize, "xl", "xl (letter)"), tg(KindProductType, "tee", "t-shirt")}},
	{name: "d cell", query: "d cell 4 pack", category: "batteries", reason: "d before cell is the battery size",
		want: []tagged{tg(KindSpec, "d", "D (battery)"), tg(KindKeyword, "cell", "cell"), tg(KindMeasure, "4 pack", "4 count")}},
	{name: "iec name with cells", query: "6lr61", category: "batteries", reason: "6LR61 is the IEC name of the 9V battery (IEC 60086)",
		want: []tagged{tg(KindSpec, "6lr61", "9V (battery)")}},
	{name: "n in 1", query: "usb hub 7 in 1", category: "electronics", reason: "7 in 1 names a combination, not inches",
		want: []tagged{tg(KindProductType, "usb hub", "usb hub"), tg(KindKeyword, "7 in 1", "7 in 1")}},
	{name: "eggshell on paint is a sheen", query: "interior paint eggshell white", category: "paint",
		reason: "on paint eggshell is the finish (common practice), not a second colour beside white",
		want:   []tagged{tg(KindProductType, "interior paint", "interior paint"), tg(KindPattern, "eggshell", "eggshell finish"), tg(KindColour, "white", "white")}},
	{name: "eggshell on a dress is a colour", query: "eggshell dress", category: "apparel", reason: "away from paint it is the colour",
		want: []tagged{tg(KindColour, "eggshell", "eggshell"), tg(KindProductType, "dress", "dress")}},
	{name: "sheen beats a shoe", query: "ceiling paint flat white", category: "paint", reason: "with a product type named, flat is a finish, not a ballet flat",
		want: []tagged{tg(KindProductType, "ceiling paint", "ceiling paint"), tg(KindPattern, "flat", "matte"), tg(KindColour, "white", "white")}},
	{name: "size of no size", query: "travel size shampoo", reason: "after size only a named size (os, regular, tall...) is a size; shampoo is no size",
		want: []tagged{tg(KindKeyword, "travel", "travel"), tg(KindKeyword, "size", "size"), tg(KindKeyword, "shampoo", "shampoo")}},
	{name: "named size", query: "size os hat", category: "accessories", reason: "os is one size (common practice)",
		want: []tagged{tg(KindSize, "size os", "os (named)"), tg(KindProductType, "hat", "hat")}},
	{name: "one size fits all", query: "one size fits all beanie", category: "accessories",
		reason: "one size fits all says the product has no sizes: one soft phrase, not a size and not a model it fits",
		want:   []tagged{tg(KindKeyword, "one size fits all", "one size"), tg(KindProductType, "beanie", "beanie")}},
	{name: "bed size with size", query: "duvet cover king size giftable", category: "home",
		reason: "size after a bed size is part of its name (common practice), so the word after it is no named size",
		want:   []tagged{tg(KindProductType, "duvet cover", "duvet cover"), tg(KindSize, "king size", "king (bed)"), tg(KindKeyword, "giftable", "giftable")}},
	{name: "bed size", query: "queen duvet cover", category: "home", reason: "queen is a bed size (common practice)",
		want: []tagged{tg(KindSize, "queen", "queen (bed)"), tg(KindProductType, "duvet cover", "duvet cover")}},
	{name: "target with a measure", query: "tv stand for 65 inch tv", category: "furniture", reason: "the target is the tv the stand is for",
		want: []tagged{tg(KindProductType, "tv stand", "tv stand"), tg(KindCompatibility, "for 65 inch tv", "fits 65 inch tv")}},
	{name: "exact spelling wins", query: "215/60R16 studded snow tires", category: "tyres", reason: "studded is the silhouette it spells, not the stud it stems to",
		want: []tagged{tg(KindSpec, "215/60R16", "215/60R16 (tyre)"), tg(KindSilhouette, "studded", "studded"), tg(KindProductType, "snow tires", "winter tyre")}},
	{name: "size 8 boots", query: "size 8 boots", category: "footwear", reason: "a number after size on footwear is a shoe size",
		want: []tagged{tg(KindSize, "size 8", "8 (shoe)"), tg(KindProductType, "boots", "boot")}},
	{name: "spaced dimension", query: "22 x 36 picture frame", category: "home", reason: "22 x 36 with spaces is a dimension in the frame's inches",
		want: []tagged{tg(KindMeasure, "22", "22 in").inferred(), tg(KindMeasure, "36", "36 in").inferred(), tg(KindProductType, "picture frame", "picture frame")}},
	{name: "2x4 is a rug size in a rug query", query: "2x4 rug", category: "home", reason: "PS 20 lists 2x4, but the category is home, so it is the rug's size in feet",
		want: []tagged{tg(KindMeasure, "2", "2 ft").inferred(), tg(KindMeasure, "4", "4 ft").inferred(), tg(KindProductType, "rug", "rug")}},
	{name: "tall", query: "tall jeans", category: "apparel", reason: "tall is a fit size",
		want: []tagged{tg(KindSize, "tall", "tall (fit)"), tg(KindProductType, "jeans", "jeans")}},
	{name: "pressure treated", query: "2x6 pressure treated", category: "lumber", reason: "a multi-word material",
		want: []tagged{tg(KindSpec, "2x6", "2x6 (lumber)"), tg(KindMaterial, "pressure treated", "pressure treated")}},
	{name: "modified colour", query: "light sage shirt", category: "apparel", reason: "a modifier and the colour after it are one inferred colour",
		want: []tagged{tg(KindColour, "light sage", "light sage").inferred(), tg(KindProductType, "shirt", "shirt")}},
	{name: "colour phrase beats modifier", query: "light blue shirt", category: "apparel", reason: "CSS lightblue is a colour of its own, not blue made lighter",
		want: []tagged{tg(KindColour, "light blue", "light blue"), tg(KindProductType, "shirt", "shirt")}},
	{name: "linen is a material", query: "light sage linen shirt", category: "apparel", reason: "linen is a CSS colour too, but shoppers mean the cloth",
		want: []tagged{tg(KindColour, "light sage", "light sage").inferred(), tg(KindMaterial, "linen", "linen"), tg(KindProductType, "shirt", "shirt")}},
	{name: "unitless number", query: "500 lens", category: "camera", reason: "500 mm is within a lens's focal lengths",
		want: []tagged{tg(KindMeasure, "500", "500 mm").inferred(), tg(KindProductType, "lens", "lens")}},
	{name: "out of every slot", query: "5000 lens", category: "camera", reason: "no focal length slot holds 5000: stays unitless",
		want: []tagged{tg(KindMeasure, "5000", "5000"), tg(KindProductType, "lens", "lens")}},
}

func TestParse(t *testing.T) {
	for _, tc := range parseCases {
		t.Run(tc.name, func(t *testing.T) {
			r := Parse(tc.query)
			checkInvariants(t, tc.query, r)
			if len(r.Errors) > 0 {
				t.Errorf("unexpected errors: %v", r.Errors)
			}
			if r.Category != tc.category {
				t.Errorf("category = %q, want %q", r.Category, tc.category)
			}
			if tc.want == nil {
				return
			}
			if diff := cmp.Diff(tc.want, project(r)); diff != "" {
				t.Errorf("%s\n(-want +got):\n%s", tc.reason, diff)
			}
		})
	}
}

// errorCase is a badly formed query: the errors expected, by span and a
// part of the message, and what must still be understood around them.
type errorCase struct {
	name, query, reason string
	errs                []wantErr
	want                []tagged
}

type wantErr struct {
	start, end int
	msg        string
}

var errorCases = []errorCase{
	{name: "empty", query: "", reason: "nothing to parse", errs: []wantErr{{0, 0, "empty"}}},
	{name: "all space", query: "   \t ", reason: "nothing to parse", errs: []wantErr{{0, 5, "empty"}}},
	{name: "only bytes that are not UTF-8", query: " \xff\xfe ", reason: "not empty: the error says where the bad bytes are (RFC 3629)",
		errs: []wantErr{{1, 3, "invalid UTF-8 at byte 1"}}},
	{name: "too long", query: strings.Repeat("a", 1025), reason: "over the limit, named in the message", errs: []wantErr{{1024, 1025, "1024"}}},
	{name: "invalid utf-8", query: "red \xff\xfe dress", reason: "the error gives the byte offset, the rest is read",
		errs: []wantErr{{4, 6, "byte 4"}},
		want: []tagged{tg(KindColour, "red", "red"), tg(KindProductType, "dress", "dress")}},
	{name: "division by zero", query: "1/0 lens", reason: "a positioned error, the rest is read", errs: []wantErr{{0, 3, "divides by zero"}},
		want: []tagged{tg(KindProductType, "lens", "lens")}},
	{name: "zero over zero", query: "0/0 mm", reason: "not a number", errs: []wantErr{{0, 3, "not a number"}}},
	{name: "overflow", query: "99999999999999999999 mm bolt", reason: "more digits than a float holds exactly",
		errs: []wantErr{{0, 20, "significant digits"}}, want: []tagged{tg(KindProductType, "bolt", "bolt")}},
	{name: "unclosed quote", query: `"faux fur coat`, reason: "the phrase runs to the end", errs: []wantErr{{0, 1, "never closed"}},
		want: []tagged{tg(KindKeyword, `"faux fur coat`, "faux fur coat").hard()}},
	{name: "zero metric pitch", query: "m8x0 bolts", reason: "ISO 261 lists no pitch of zero; it is not read as the coarse M8x1.25",
		errs: []wantErr{{0, 4, "pitch is above zero"}}, want: []tagged{tg(KindProductType, "bolts", "bolt")}},
	{name: "zero metric pitch spaced", query: "M8 x 0 bolt", reason: "as m8x0, written with spaces",
		errs: []wantErr{{0, 6, "pitch is above zero"}}, want: []tagged{tg(KindProductType, "bolt", "bolt")}},
	{name: "unlisted metric pitch spaced", query: "m8 x 1.5 bolt", reason: "ISO 261 lists 1.25 (coarse), 1 and 0.75 for M8: an error, as m8x1.5 is, not M8 and a bolt 1.5 in long",
		errs: []wantErr{{0, 8, "ISO 261 lists pitch 1.25"}}, want: []tagged{tg(KindProductType, "bolt", "bolt")}},
	{name: "zero threads per inch", query: "1/4-0 bolts", reason: "ASME B1.1 lists 20 or 28 for 1/4; zero is not read as 1/4-20, nor as a range",
		errs: []wantErr{{0, 5, "0 threads per inch"}}, want: []tagged{tg(KindProductType, "bolts", "bolt")}},
	{name: "zero threads on a number size", query: "#10-0 x 3/4 machine screws", reason: "as 1/4-0; the length after it is still read",
		errs: []wantErr{{0, 5, "0 threads per inch"}},
		want: []tagged{tg(KindMeasure, "3/4", "0.75 in").inferred(), tg(KindProductType, "machine screws", "machine screw")}},
	{name: "unlisted thread count", query: "1/4-7 x 2 bolts", reason: "ASME B1.1 lists 20 or 28 for 1/4: an error, not a 1/4..7 in range; the length is read",
		errs: []wantErr{{0, 5, "ASME B1.1 lists 20 (UNC) or 28 (UNF)"}},
		want: []tagged{tg(KindMeasure, "2", "2 in").inferred(), tg(KindProductType, "bolts", "bolt")}},
	{name: "a decimal and a fraction", query: "2.5 1/2 in pipe", reason: "no mixed number has a decimal whole; off clothes it is no neck and sleeve either",
		errs: []wantErr{{0, 7, "a mixed number needs a whole part, not 2.5"}}, want: []tagged{tg(KindProductType, "pipe", "pipe")}},
	{name: "a decimal neck off the half inch", query: "dress shirt 15.25 34/35", reason: "necks come in half inches (common practice): 15.25 is no neck, and the mixed number is an error",
		errs: []wantErr{{12, 23, "not 15.25"}}, want: []tagged{tg(KindProductType, "dress shirt", "dress shirt")}},
	{name: "not a tyre", query: "999/45r17", reason: "a tyre code outside ISO widths", errs: []wantErr{{0, 9, "width"}},
		want: []tagged{tg(KindKeyword, "999/45r17", "999/45r17")}},
}

func TestParseErrors(t *testing.T) {
	for _, tc := range errorCases {
		t.Run(tc.name, func(t *testing.T) {
			r := Parse(tc.query)
			checkInvariants(t, tc.query, r)
			if len(r.Errors) != len(tc.errs) {
				t.Fatalf("%s: got errors %v, want %d", tc.reason, r.Errors, len(tc.errs))
			}
			for i, w := range tc.errs {
				e := r.Errors[i]
				if e.Start != w.start || e.End != w.end || !strings.Contains(e.Msg, w.msg) {
					t.Errorf("error %d = %d-%d %q, want %d-%d containing %q", i, e.Start, e.End, e.Msg, w.start, w.end, w.msg)
				}
			}
			if tc.want != nil {
				if diff := cmp.Diff(tc.want, project(r)); diff != "" {
					t.Errorf("%s\n(-want +got):\n%s", tc.reason, diff)
				}
			}
		})
	}
}

// Control characters are spaces: "red\x00dress" reads as "red dress".
func TestControlCharactersAreSpaces(t *testing.T) {
	r := Parse("red\x00dress")
	want := []tagged{tg(KindColour, "red", "red"), tg(KindProductType, "dress", "dress")}
	if diff := cmp.Diff(want, project(r)); diff != "" {
		t.Errorf("(-want +got):\n%s", diff)
	}
}

func TestOptions(t *testing.T) {
	r := ParseWith("under $50 shirt", Options{Currency: "CAD"})
	if c := only(t, r, KindPrice); c.Price.Currency != "CAD" {
		t.Errorf("$ with Currency CAD read as %s", c.Price.Currency)
	}
	r = ParseWith("under $50 shirt", Options{Currency: "EUR"})
	if c := only(t, r, KindPrice); c.Price.Currency != "USD" {
		t.Errorf("$ with Currency EUR (not a dollar) read as %s, want USD", c.Price.Currency)
	}
	r = ParseWith("85 lens", Options{Category: "apparel"})
	if r.Category != "apparel" {
		t.Errorf("forced category = %q", r.Category)
	}
}

// US and imperial gallons: 3.785411784 l and 4.54609 l (NIST SP 811; UK
// Weights and Measures Act 1985, via testdata/reference/unit_conversions.tsv).
func TestVolumeSystem(t *testing.T) {
	us := only(t, Parse("5 gal"), KindMeasure)
	imp := only(t, ParseWith("5 gal", Options{Volume: 1}), KindMeasure)
	if !near(*us.Measure.BaseAmount, 5*3785.411784, 1e-9) {
		t.Errorf("US 5 gal = %v ml", *us.Measure.BaseAmount)
	}
	if !near(*imp.Measure.BaseAmount, 5*4546.09, 1e-9) {
		t.Errorf("imperial 5 gal = %v ml", *imp.Measure.BaseAmount)
	}
}

// The dimension a measure names comes from a label, the product type's
// slots, or the quantity.
func TestMeasureDimensions(t *testing.T) {
	for _, tc := range []struct {
		query, reason string
		want          []string
	}{
		{"85 lens", "the lens slot", []string{"focal_length"}},
		{"43 tv", "the tv slot", []string{"diagonal"}},
		{"m8 bolts 40mm", "40 mm fits the bolt's length slot, not its diameter", []string{"length"}},
		// A bolt is named by its thread and its length, M8 × 30 a bolt of
		// thread M8 and length 30 mm (ISO 4017's designations, from memory);
		// ISO 261 gives M8 a major diameter of 8 mm.
		{"m8 x 30 bolt", "the length after the thread and an x (the same designations)", []string{"length"}},
		{"laptop 16gb ram 1tb", "the part names the first; the second is storage by the laptop's slot ranges", []string{"memory", "storage"}},
		// Copper and plastic pipe is sold by a nominal diameter in inches
		// and a length in feet, "3/4 in x 10 ft" (common practice).
		{"3/4 x 10 ft copper pipe", "the diameter is in inches though the foot comes last: the pipe's slot writes it so", []string{"diameter", "length"}},
		{"5 x 8 ft rug", "both of the rug's slots are in feet, so the foot after them serves both", []string{"width", "length"}},
		{"m8 bolt 30 mm", "30 mm lies in the bolt's diameter range too, but M8 gives the diameter", []string{"length"}},
		{"30 mm m8 bolt", "the same, with the thread typed after the measure", []string{"length"}},
		{"m8 bolt 1", "a bare 1 would be a 1 in diameter; with M8 it is a length, in the length slot's inches", []string{"length"}},
		{"m8 bolt 1/4-1/2", "a range of bare numbers, inch by the slots, is the length too", []string{"length"}},
		{"m8 bolt under 1", "and so is a bound", []string{"length"}},
		{"bolt 8 mm 30 mm", "the first amount is the diameter, so the second is the length", []string{"diameter", "length"}},
		{"-m8 bolt 30 mm", "a thread excluded gives no diameter, so 30 mm stays the diameter its range says", []string{"diameter"}},
		{"m8 bolt 5 mm", "5 mm is below the length slot's range, so it stays the diameter its range says", []string{"diameter"}},
		{`24"w x 36"h rug`, "labels w and h", []string{"width", "height"}},
		{"20x20 cushion cover", "the cover's two slots in order", []string{"width", "height"}},
		{"2x4x8", "the third number of a lumber size", []string{"length"}},
		{"64gb", "no product type: the quantity's name", []string{"data"}},
	} {
		var got []string
		for _, c := range Parse(tc.query).Of(KindMeasure) {
			got = append(got, c.Measure.Dimension)
		}
		if diff := cmp.Diff(tc.want, got); diff != "" {
			t.Errorf("%q: %s (-want +got):\n%s", tc.query, tc.reason, diff)
		}
	}
}

// Every comparison the grammar knows sets the bound it says; bounds are
// inclusive.
func TestComparisons(t *testing.T) {
	for _, tc := range []struct{ query, want string }{
		{"under 30 mm", "≤ 30 mm"}, {"below $20", "≤ 20.00 USD"}, {"less than 30 mm", "≤ 30 mm"},
		{"up to 2 tb", "≤ 2 TB"}, {"max 30w", "≤ 30 W"}, {"at most 5 kg", "≤ 5 kg"}, {"no more than 5 kg", "≤ 5 kg"},
		{"< 10 lb", "≤ 10 lb"}, {"<= 10 lb", "≤ 10 lb"}, {"10 lb or less", "≤ 10 lb"}, {"$50 and under", "≤ 50.00 USD"},
		{"over 100 w", "≥ 100 W"}, {"above 50 lb", "≥ 50 lb"}, {"more than 2 tb", "≥ 2 TB"}, {"at least 2 tb", "≥ 2 TB"},
		{"min 3000mah", "≥ 3000 mAh"}, {"> 5 kg", "≥ 5 kg"}, {">= 12v", "≥ 12 V"}, {"2 tb or more", "≥ 2 TB"},
		{"$100 and up", "≥ 100.00 USD"}, {"$40+", "≥ 40.00 USD"},
	} {
		r := Parse(tc.query)
		if len(r.Constraints) != 1 || r.Constraints[0].Value() != tc.want || r.Constraints[0].Text != tc.query {
			t.Errorf("%q: got %s, want one constraint over the whole query reading %s", tc.query, summary(r), tc.want)
		}
	}
}

// Parents come from the lexicon: bunk bed is a bed, chelsea boot a boot.
func TestParents(t *testing.T) {
	for q, want := range map[string]string{"bunk bed": "bed", "chelsea boots": "boot"} {
		if c := only(t, Parse(q), KindProductType); c.Parent != want {
			t.Errorf("%q: parent %q, want %q", q, c.Parent, want)
		}
	}
}

// A modified colour is the base colour moved by the modifier's rule: "light
// sage" is sage (#9caf88) with L* raised by 12, which an independent
// computation of the same IEC 61966-2-1 and CIE 1976 formulas (written
// for this check, outside whittle) puts at #bdd0a8.
func TestModifiedColourValue(t *testing.T) {
	c := only(t, Parse("light sage"), KindColour)
	if c.Colour.Hex != "#bdd0a8" {
		t.Errorf("light sage = %s, want #bdd0a8", c.Colour.Hex)
	}
}

// An ounce on a product that holds a volume and has no mass is a fluid
// ounce: "12oz mug" is 12 fl oz (common practice), which is 12 ×
// 29.5735295625 mL, US (NIST SP 811, via
// testdata/reference/unit_conversions.tsv), or 12 × 28.4130625 mL,
// imperial, with Options.Volume. On a product weighed, or with no
// product type, it stays an ounce of mass.
func TestFluidOunces(t *testing.T) {
	for _, tc := range []struct {
		query           string
		volume          units.VolumeSystem
		dimension       string
		baseMillilitres float64
	}{
		{"12oz mug", units.USCustomary, "capacity", 12 * 29.5735295625},
		{"12oz mug", units.Imperial, "capacity", 12 * 28.4130625},
		{"20 oz water bottle", units.USCustomary, "capacity", 20 * 29.5735295625},
	} {
		m := only(t, ParseWith(tc.query, Options{Volume: tc.volume}), KindMeasure).Measure
		if m.Dimension != tc.dimension || m.Quantity != "volume" || math.Abs(*m.BaseAmount-tc.baseMillilitres) > 1e-6 {
			t.Errorf("%q (%v): %s %s %v %s, want %s volume %v mL", tc.query, tc.volume, m.Dimension, m.Quantity, *m.BaseAmount, m.BaseUnit, tc.dimension, tc.baseMillilitres)
		}
	}
	if m := only(t, Parse("12 oz"), KindMeasure).Measure; m.Quantity != "mass" {
		t.Errorf("12 oz with no product type is %s, want mass", m.Quantity)
	}
}

// A head a grade code narrowed has no parent to widen to: a USB cable
// is no answer to "cat6 cable" (category 6 is a twisted-pair network
// cable grade of TIA-568, from memory). A head typed as the narrower
// type keeps its parent.
func TestGradeNarrowedHeadHasNoParent(t *testing.T) {
	for _, tc := range []struct{ query, name, parent string }{
		{"cat6 cable", "ethernet cable", ""},
		{"ethernet cable", "ethernet cable", "cable"},
		{"usb3 cable", "usb cable", ""},
	} {
		var head *Constraint
		for _, c := range Parse(tc.query).Constraints {
			if c.IsHead() {
				head = &c
			}
		}
		if head == nil || head.Name != tc.name || head.Parent != tc.parent {
			t.Errorf("%q: head %+v, want %s with parent %q", tc.query, head, tc.name, tc.parent)
		}
	}
}

package eval

import (
	"math"
	"math/rand/v2"
	"slices"
	"strconv"
	"strings"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// Options tune Generate. The zero value is ready to use.
type Options struct {
	// Queries is how many cases to write (default 500).
	Queries int
	// Seed seeds the generator: the same products, options and seed give
	// the same cases.
	Seed uint64
	// Lexicon is the vocabulary queries are written in; nil means the
	// default.
	Lexicon *lexicon.Lexicon
	// Policy says which attributes are hard and how far a colour or a
	// measure may be widened; nil means the built-in policy.
	Policy *rewrite.Policy
	// Style is how the queries are written; "" means StyleShort.
	Style Style
}

// DefaultQueries is how many cases Generate writes when Options.Queries
// is not set.
const DefaultQueries = 500

// genStream is the second word of the generator's PCG state; any fixed
// value will do.
const genStream = 0x6576616c73657473 // "evalsets"

// longStream is the long style's second word, so that its set is not
// drawn in step with the short one of the same seed.
const longStream = 0x6c6f6e6771756572 // "longquer"

// tries bounds how many products Generate draws for one case before it
// gives up on that case's failure.
const tries = 64

// Generate writes a labelled set of queries from products, by this
// procedure, all drawn from one PCG stream seeded by opts.Seed:
//
//  1. The cases take the failures of [Failures] in turn.
//  2. For each case a product in stock is drawn at random (one the shop
//     can sell is the one the shopper means), and the attributes a
//     shopper would type for it are chosen: always its product type and,
//     when it has them, one of its sizes and designations; each of its
//     lexicon colour, material, pattern, audience, compatible models and
//     main measure (the one a bare number fills) at random.
//  3. The failure is injected where the product allows it and the policy
//     lets whittle relax it (a hard attribute is never the one made to
//     miss): a colour becomes the nearest lexicon colour to the
//     product's that no product of the catalog uses as its name; a
//     pattern one that other types of the category come in and this type
//     does not; the product type's longest word is misspelt by one edit
//     (letters swapped, dropped, doubled or a vowel changed) into a word
//     no lexicon entry or product text has; an extra word is one of a
//     list of shopper's words that no product's text has; the main
//     measure moves by 40, 60 or 80% of the policy's measure tolerance to
//     an amount no product of the type has.
//  4. The query is written in one of three word orders, with varied
//     phrasings: "size l" or "sz l", "women's" or "ladies", "fits jx-10"
//     or "compatible with jx-10", a lexicon alias or a plural for the
//     product type, an abbreviation for a colour, a unit spelt or marked
//     ("12 in", `12"`, "12 inch") or left out where the product type's
//     measure slot lets the parser infer it.
//  5. A case is kept only if no product of the catalog has every
//     attribute as asked, so that it misses as typed; otherwise another
//     product is drawn (up to 64 times, then the turn passes to the next
//     failure). Generate stops after twice as many turns as cases asked
//     for, so a catalog that allows few failures gives fewer cases.
//
// The attributes the policy makes hard for the product's category and
// type (sizes, designations, compatible models, audiences, a camera's
// focal length, a paint's colour) are kept as the case's Hard attributes.
//
// With opts.Style set to StyleLong, steps 2 and 4 follow the long style's
// rules instead (see [StyleLong] and the README): four to seven
// constraints a query, from more of the product's attributes, in more
// word orders; the failures, step 3 and step 5 are the same.
func Generate(products []catalog.Product, opts Options) []Case {
	n := opts.Queries
	if n <= 0 {
		n = DefaultQueries
	}
	if len(products) == 0 {
		return nil
	}
	if opts.Style == "" {
		opts.Style = StyleShort
	}
	g := newGenerator(products, opts)
	stream := uint64(genStream)
	if opts.Style == StyleLong {
		stream = longStream
	}
	r := rand.New(rand.NewPCG(opts.Seed, stream))
	var out []Case
	for i := 0; len(out) < n && i < 2*n; i++ {
		fail := failures[i%len(failures)]
		for range tries {
			p := &products[r.IntN(len(products))]
			if c, ok := g.write(r, p, fail); ok {
				out = append(out, c)
				break
			}
		}
	}
	return out
}

// generator holds what Generate knows of the catalog.
type generator struct {
	style  Style
	lex    *lexicon.Lexicon
	policy *rewrite.Policy
	pal    *colour.Palette
	byType map[string][]*catalog.Product
	// patterns by type and by category; colour names the catalog uses.
	typePatterns map[string]map[string]bool
	catPatterns  map[string][]string
	colourNames  map[string]bool
	// known are the word keys of the lexicon and of every product's text:
	// a typo or an extra word must be none of them.
	known map[string]bool
}

func newGenerator(ps []catalog.Product, opts Options) *generator {
	g := &generator{style: opts.Style, lex: opts.Lexicon, policy: opts.Policy, byType: map[string][]*catalog.Product{},
		typePatterns: map[string]map[string]bool{}, catPatterns: map[string][]string{},
		colourNames: map[string]bool{}, known: map[string]bool{}}
	if g.lex == nil {
		g.lex = lexicon.Default()
	}
	if g.policy == nil {
		g.policy = rewrite.DefaultPolicy()
	}
	g.pal = g.lex.ColourPalette()
	for i := range ps {
		p := &ps[i]
		g.byType[p.ProductType] = append(g.byType[p.ProductType], p)
		if p.Pattern != "" {
			if g.typePatterns[p.ProductType] == nil {
				g.typePatterns[p.ProductType] = map[string]bool{}
			}
			g.typePatterns[p.ProductType][p.Pattern] = true
			if !slices.Contains(g.catPatterns[p.Category], p.Pattern) {
				g.catPatterns[p.Category] = append(g.catPatterns[p.Category], p.Pattern)
			}
		}
		if p.Colour != "" {
			g.colourNames[strings.ToLower(p.Colour)] = true
		}
		for _, w := range textWords(p) {
			g.known[g.key(w)] = true
		}
	}
	for _, pats := range g.catPatterns {
		slices.Sort(pats)
	}
	for _, k := range lexicon.Kinds() {
		for _, e := range g.lex.Entries(k) {
			for _, phrase := range append([]string{e.Name}, e.Aliases...) {
				for _, w := range lexicon.Words(phrase) {
					g.known[g.key(w)] = true
				}
			}
		}
	}
	return g
}

func (g *generator) key(w string) string { return g.lex.Key(lexicon.Normalise(w)) }

// write tries to write a case of failure fail for p.
func (g *generator) write(r *rand.Rand, p *catalog.Product, fail Failure) (Case, bool) {
	entry, ok := g.lex.Lookup(lexicon.ProductType, p.ProductType)
	if !ok || p.ProductType == "" || p.InStock != nil && !*p.InStock {
		return Case{}, false
	}
	eff := g.policy.For(p.Category, p.ProductType, g.lex)
	inj, said, ok := g.inject(r, p, entry, fail, eff.MeasureTolerance)
	if !ok || hard(eff, inj.Kind, inj.Dimension) {
		return Case{}, false
	}
	c := Case{Style: g.style, Product: p.ID, ProductType: p.ProductType, Failure: fail, Injected: said}
	if g.style == StyleLong {
		if c.Typed, ok = g.longAttributes(r, p, entry, inj); !ok {
			return Case{}, false
		}
	} else {
		c.Typed = g.attributes(r, p, entry, inj)
	}
	for _, a := range c.Typed {
		if hard(eff, a.Kind, a.Dimension) {
			c.Hard = append(c.Hard, a)
		}
	}
	if g.matchesAsTyped(c) {
		return Case{}, false
	}
	c.Query = phrase(r, c.Typed, g.orders())
	return c, true
}

// inject makes failure fail for p: the attribute, as asked, that makes
// the query miss, and what it is. A measure moves within tol, the
// policy's measure tolerance.
func (g *generator) inject(r *rand.Rand, p *catalog.Product, entry *lexicon.Entry, fail Failure, tol float64) (Attr, string, bool) {
	switch fail {
	case FailTypo:
		word, typo, ok := g.typo(r, p.ProductType)
		if !ok {
			return Attr{}, "", false
		}
		text := strings.Replace(p.ProductType, word, typo, 1)
		return Attr{Kind: parser.KindProductType, Value: text, Text: text}, typo + " (for " + word + ")", true
	case FailColour:
		word, ok := g.nearColour(p)
		if !ok {
			return Attr{}, "", false
		}
		return Attr{Kind: parser.KindColour, Value: word, Text: word}, word + " (the shop's " + p.Colour + ")", true
	case FailPattern:
		pat, ok := g.missingPattern(r, p)
		if !ok {
			return Attr{}, "", false
		}
		return Attr{Kind: parser.KindPattern, Value: pat, Text: pat}, pat + " (no " + p.ProductType + " has it)", true
	case FailKeyword:
		w, ok := g.extraWord(r)
		if !ok {
			return Attr{}, "", false
		}
		return Attr{Kind: parser.KindKeyword, Value: w, Text: w}, w, true
	case FailMeasure:
		slot, value, ok := mainMeasure(entry, p)
		if !ok {
			return Attr{}, "", false
		}
		off, ok := g.offMeasure(r, p, slot.Dimension, value, tol)
		if !ok {
			return Attr{}, "", false
		}
		return Attr{Kind: parser.KindMeasure, Dimension: slot.Dimension, Value: off, Text: measureText(r, slot, off)},
			off + " (the product's " + value + ")", true
	}
	return Attr{}, "", false
}

// attributes chooses what a shopper types for p, in a fixed order of
// kinds: the injected attribute in place of its kind's, the product type
// always, a size and a designation whenever p has them, the others at
// random.
func (g *generator) attributes(r *rand.Rand, p *catalog.Product, entry *lexicon.Entry, inj Attr) []Attr {
	w := g.writers(r, p, entry)
	var out []Attr
	take := func(kind parser.Kind, chosen bool) {
		switch {
		case inj.Kind == kind:
			out = append(out, inj)
		case chosen:
			out = append(out, w[kind].write())
		}
	}
	take(parser.KindProductType, true)
	take(parser.KindColour, w[parser.KindColour].has && r.IntN(2) == 0)
	take(parser.KindPattern, w[parser.KindPattern].has && r.IntN(3) == 0)
	take(parser.KindMaterial, w[parser.KindMaterial].has && r.IntN(3) == 0)
	take(parser.KindAudience, w[parser.KindAudience].has && r.IntN(2) == 0)
	take(parser.KindSize, w[parser.KindSize].has)
	take(parser.KindSpec, w[parser.KindSpec].has)
	take(parser.KindCompatibility, w[parser.KindCompatibility].has && r.IntN(2) == 0)
	take(parser.KindMeasure, w[parser.KindMeasure].has && r.IntN(2) == 0)
	take(parser.KindKeyword, false)
	return out
}

// writer says whether a product has an attribute a shopper could type,
// and writes it.
type writer struct {
	has   bool
	write func() Attr
}

// writers are the attributes of p a query may ask for, by kind, each
// written from p's own value: the product type, a lexicon colour (not a
// shop's own name), a pattern other than solid, the material,
// silhouette, audience and brand, one of its sizes, designations and
// compatible models, its main measure, and a price ceiling it meets.
func (g *generator) writers(r *rand.Rand, p *catalog.Product, entry *lexicon.Entry) map[parser.Kind]writer {
	slot, value, hasMeasure := mainMeasure(entry, p)
	price, hasPrice := dollars(p.Price)
	return map[parser.Kind]writer{
		parser.KindProductType: {true, func() Attr {
			return Attr{Kind: parser.KindProductType, Value: p.ProductType, Text: g.typeText(r, entry)}
		}},
		parser.KindColour: {p.Colour != "" && p.ColourHex == "" && g.isColour(p.Colour), func() Attr {
			return Attr{Kind: parser.KindColour, Value: p.Colour, Text: g.colourText(r, p.Colour)}
		}},
		parser.KindPattern: {p.Pattern != "" && p.Pattern != "solid", func() Attr {
			return Attr{Kind: parser.KindPattern, Value: p.Pattern, Text: p.Pattern}
		}},
		parser.KindMaterial: {p.Material != "", func() Attr {
			return Attr{Kind: parser.KindMaterial, Value: p.Material, Text: p.Material}
		}},
		parser.KindSilhouette: {p.Silhouette != "", func() Attr {
			return Attr{Kind: parser.KindSilhouette, Value: p.Silhouette, Text: g.silhouetteText(r, p.Silhouette)}
		}},
		parser.KindAudience: {p.Audience != "", func() Attr {
			return Attr{Kind: parser.KindAudience, Value: p.Audience, Text: audienceText(r, p.Audience)}
		}},
		parser.KindBrand: {p.Brand != "", func() Attr {
			return Attr{Kind: parser.KindBrand, Value: p.Brand, Text: brandText(r, p.Brand)}
		}},
		parser.KindSize: {len(p.Sizes) > 0, func() Attr {
			s := p.Sizes[r.IntN(len(p.Sizes))]
			return Attr{Kind: parser.KindSize, Value: s, Text: sizeText(r, s)}
		}},
		parser.KindSpec: {len(p.Spec) > 0, func() Attr {
			s := p.Spec[r.IntN(len(p.Spec))]
			return Attr{Kind: parser.KindSpec, Value: s, Text: strings.ToLower(s)}
		}},
		parser.KindCompatibility: {len(p.CompatibleWith) > 0, func() Attr {
			m := p.CompatibleWith[r.IntN(len(p.CompatibleWith))]
			return Attr{Kind: parser.KindCompatibility, Value: m, Text: compatText(r, m)}
		}},
		parser.KindMeasure: {hasMeasure, func() Attr {
			return Attr{Kind: parser.KindMeasure, Dimension: slot.Dimension, Value: value, Text: measureText(r, slot, value)}
		}},
		parser.KindPrice: {hasPrice, func() Attr {
			c := priceCeiling(r, price)
			return Attr{Kind: parser.KindPrice, Value: strconv.Itoa(c) + " USD", Text: priceText(r, c)}
		}},
	}
}

// isColour reports whether name is a lexicon colour with a value.
func (g *generator) isColour(name string) bool {
	_, _, ok := g.lex.ColourNamed(name)
	return ok
}

// hard reports whether the policy in force makes an attribute hard.
func hard(eff rewrite.Effective, kind parser.Kind, dim string) bool {
	c := parser.Constraint{Kind: kind}
	if dim != "" {
		c.Measure = &parser.Measure{Dimension: dim}
	}
	return eff.StrictnessOf(c) == parser.Hard
}

// matchesAsTyped reports whether some product has every attribute of c as
// asked. Only products of the type can, and a misspelt type has none.
func (g *generator) matchesAsTyped(c Case) bool {
	for _, p := range g.byType[c.Typed[0].Value] {
		if SatisfiesAll(p, c.Typed) {
			return true
		}
	}
	return false
}

// nearColour is the lexicon colour nearest p's colour that no product
// uses as its colour name.
func (g *generator) nearColour(p *catalog.Product) (string, bool) {
	var lab colour.Lab
	switch {
	case p.ColourHex != "":
		rgb, err := colour.ParseHex(p.ColourHex)
		if err != nil {
			return "", false
		}
		lab = rgb.Lab()
	case p.Colour != "":
		_, l, ok := g.lex.ColourNamed(p.Colour)
		if !ok {
			return "", false
		}
		lab = l
	default:
		return "", false
	}
	for _, m := range g.pal.Nearest(lab, 8) {
		if !g.colourNames[strings.ToLower(m.Name)] {
			return m.Name, true
		}
	}
	return "", false
}

// missingPattern is a pattern other types of p's category come in and
// p's type does not.
func (g *generator) missingPattern(r *rand.Rand, p *catalog.Product) (string, bool) {
	if len(g.typePatterns[p.ProductType]) == 0 {
		return "", false
	}
	var opts []string
	for _, pat := range g.catPatterns[p.Category] {
		if !g.typePatterns[p.ProductType][pat] {
			opts = append(opts, pat)
		}
	}
	if len(opts) == 0 {
		return "", false
	}
	return opts[r.IntN(len(opts))], true
}

// extraWords are words a shopper adds that say little about the product;
// extraWord takes one that neither the lexicon nor the catalog has.
var extraWords = []string{"sturdy", "giftable", "everyday", "roomy", "heirloom", "dependable", "handy", "snazzy"}

func (g *generator) extraWord(r *rand.Rand) (string, bool) {
	var opts []string
	for _, w := range extraWords {
		if !g.known[g.key(w)] {
			opts = append(opts, w)
		}
	}
	if len(opts) == 0 {
		return "", false
	}
	return opts[r.IntN(len(opts))], true
}

// typo misspells the longest all-letter word of a product type (of five
// letters or more) by one edit into a word the lexicon and catalog do not
// have; it returns the word and its misspelling.
func (g *generator) typo(r *rand.Rand, productType string) (string, string, bool) {
	word := ""
	for _, w := range strings.Fields(productType) {
		if len(w) > len(word) && strings.Trim(w, "abcdefghijklmnopqrstuvwxyz") == "" {
			word = w
		}
	}
	if len(word) < 5 {
		return "", "", false
	}
	for range 8 {
		t := misspell(r, word)
		if t != word && !g.known[g.key(t)] {
			return word, t, true
		}
	}
	return "", "", false
}

// misspell makes one edit to w (five letters or more), never to its
// first letter: two neighbours swapped, a letter dropped or doubled, or
// a vowel changed to another.
func misspell(r *rand.Rand, w string) string {
	b := []byte(w)
	i := 1 + r.IntN(len(b)-2) // 1..len-2: a letter with one after it
	switch r.IntN(4) {
	case 0:
		b[i], b[i+1] = b[i+1], b[i]
		return string(b)
	case 1:
		return string(b[:i]) + string(b[i+1:])
	case 2:
		return string(b[:i+1]) + string(b[i:])
	}
	const vowels = "aeiou"
	for j := i; j < len(b); j++ {
		if k := strings.IndexByte(vowels, b[j]); k >= 0 {
			b[j] = vowels[(k+1+r.IntN(4))%5]
			return string(b)
		}
	}
	return string(b[:i]) + string(b[i+1:])
}

// mainMeasure is the product type's first slot that p has a single
// measure for (the one a bare number fills), with p's value.
func mainMeasure(e *lexicon.Entry, p *catalog.Product) (lexicon.Slot, string, bool) {
	for _, s := range e.Slots {
		if v, ok := p.Measures[s.Dimension]; ok {
			if _, ok := baseAmount(v); ok {
				return s, v, true
			}
			return lexicon.Slot{}, "", false
		}
	}
	return lexicon.Slot{}, "", false
}

// offMeasure moves a measure ("85 mm") by 40, 60 or 80% of the tolerance,
// up or down, rounded to a whole number from 20 up and to a tenth below,
// to an amount no product of the type has in that dimension.
func (g *generator) offMeasure(r *rand.Rand, p *catalog.Product, dim, value string, tol float64) (string, bool) {
	num, unit, _ := strings.Cut(value, " ")
	v, err := strconv.ParseFloat(num, 64)
	if err != nil || tol <= 0 {
		return "", false
	}
	f := tol * float64(2+r.IntN(3)) / 5
	if r.IntN(2) == 0 {
		f = -f
	}
	w := v * (1 + f)
	if math.Abs(w) >= 20 {
		w = math.Round(w)
	} else {
		w = math.Round(w*10) / 10
	}
	if w <= 0 || w == v || math.Abs(w-v) > tol*v {
		return "", false
	}
	off := strconv.FormatFloat(w, 'f', -1, 64) + " " + unit
	for _, q := range g.byType[p.ProductType] {
		if Satisfies(q, Attr{Kind: parser.KindMeasure, Dimension: dim, Value: off}) {
			return "", false
		}
	}
	return off, true
}

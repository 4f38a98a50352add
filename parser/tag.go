package parser

import (
	"fmt"
	"regexp"
	"slices"
	"strconv"
	"strings"
	"unicode/utf8"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/units"
)

// Words the grammar of shopping gives a role to.
var (
	negators    = map[string]bool{"not": true, "no": true, "without": true, "w/o": true, "except": true, "excluding": true, "exclude": true, "minus": true, "non": true}
	sizeMarkers = map[string]bool{"size": true, "sz": true, "sizes": true, "sized": true}
	codeMarkers = map[string]bool{"sku": true, "part": true, "model": true, "mpn": true, "item": true, "ref": true, "pn": true, "p/n": true}
	// structural words carry no constraint of their own when left over:
	// the connecting words, and the comparison words of the grammar
	// ("less", "most", "under") when no value follows them. Read as
	// filler, they are never taken for a misspelt product type ("less"
	// is one letter from "lens").
	structural = map[string]bool{"with": true, "w/": true, "and": true, "or": true, "for": true, "to": true, "by": true,
		"x": true, "at": true, "from": true, "in": true, "of": true, "on": true, "fits": true, "fit": true,
		"compatible": true, "works": true, "replacement": true, "between": true, "than": true, "number": true, "no": true, "not": true,
		"less": true, "more": true, "fewer": true, "greater": true, "least": true, "most": true, "under": true, "below": true,
		"over": true, "above": true, "max": true, "min": true, "maximum": true, "minimum": true, "upto": true, "within": true, "up": true}
	letterSizes = map[string]string{
		"xxs": "xxs", "2xs": "xxs", "xs": "xs", "s": "s", "m": "m", "l": "l", "xl": "xl",
		"xxl": "xxl", "2xl": "xxl", "xxxl": "3xl", "3xl": "3xl", "4xl": "4xl", "5xl": "5xl",
		"small": "s", "medium": "m", "large": "l", "x-large": "xl", "xlarge": "xl",
		"extra large": "xl", "extra small": "xs", "x-small": "xs", "xsmall": "xs",
		"xx-large": "xxl", "sm": "s", "med": "m", "lg": "l", "lrg": "l",
		"1x": "1x", "2x": "2x", "3x": "3x", "4x": "4x", "5x": "5x",
	}
	// ambiguousLetters are letter sizes that are also units or words.
	ambiguousLetters = map[string]bool{"s": true, "m": true, "l": true, "small": true, "medium": true, "large": true, "sm": true, "med": true, "lg": true}
	fitSizes         = map[string]bool{"petite": true, "tall": true, "plus": true, "maternity": true, "husky": true}
	widths           = map[string]string{"wide": "wide", "narrow": "narrow", "extra wide": "extra wide", "ww": "extra wide", "xw": "extra wide", "w": "wide", "n": "narrow", "medium": "medium", "regular": "medium",
		"ee": "wide", "eee": "extra wide", "eeee": "extra wide"}
	// plusLetters are the plus-size letter sizes "1x".."5x", read only in
	// apparel ("2x" elsewhere is a magnification or a count).
	plusLetters = map[string]bool{"1x": true, "2x": true, "3x": true, "4x": true, "5x": true}
)

// kindOf maps a lexicon kind to the constraint kind it tags.
var kindOf = map[lexicon.Kind]Kind{
	lexicon.ProductType: KindProductType, lexicon.Colour: KindColour, lexicon.Pattern: KindPattern,
	lexicon.Silhouette: KindSilhouette, lexicon.Material: KindMaterial, lexicon.Audience: KindAudience,
	lexicon.Brand: KindBrand, lexicon.Filler: KindFiller,
}

// lexiconEvidence is the evidence of a plain lexicon match, by kind.
var lexiconEvidence = func() map[lexicon.Kind]string {
	m := make(map[lexicon.Kind]string)
	for _, k := range lexicon.Kinds() {
		m[k] = string(k) + " lexicon"
	}
	return m
}()

// kindOrder ranks the lexicon kinds when one phrase is several things.
// A word that is both a material and a colour (CSS linen) is read as the
// material, which is what shoppers nearly always mean by it.
var kindOrder = []lexicon.Kind{lexicon.ProductType, lexicon.Material, lexicon.Colour, lexicon.Pattern,
	lexicon.Silhouette, lexicon.Audience, lexicon.Brand, lexicon.Filler}

func pick(entries []*lexicon.Entry) *lexicon.Entry {
	for _, k := range kindOrder {
		for _, e := range entries {
			if e.Kind == k {
				return e
			}
		}
	}
	return nil
}

// choose settles, for each word unit whose phrase is several entries,
// which one it is: an entry that the surface spells exactly beats one
// found only through stemming ("studded" is the silhouette, not the stud
// it stems to); a product type yields to the other kinds when the query
// has another product type ("flat" in "ceiling paint flat white"); then
// the kinds rank as kindOrder says.
func (p *tagger) choose() {
	withPT := 0
	for i := range p.units {
		if hasKind(p.units[i].entries, lexicon.ProductType) {
			withPT++
		}
	}
	for i := range p.units {
		u := &p.units[i]
		es := u.entries
		if len(es) > 1 {
			var exact []*lexicon.Entry
			for _, e := range es {
				if spells(e, u.text) {
					exact = append(exact, e)
				}
			}
			if len(exact) > 0 {
				es = exact
			}
		}
		if len(es) > 1 && withPT > 1 && hasKind(es, lexicon.ProductType) {
			var rest []*lexicon.Entry
			for _, e := range es {
				if e.Kind != lexicon.ProductType {
					rest = append(rest, e)
				}
			}
			if len(rest) > 0 {
				es = rest
			}
		}
		u.chosen = pick(es)
	}
}

// spells reports whether text is e's name or one of its aliases.
func spells(e *lexicon.Entry, text string) bool {
	return e.Name == text || slices.Contains(e.Aliases, text)
}

// overStemmed reports whether text reaches e only because the stemmer cut
// a word down past recognition. Porter's stemmer takes "earrings" to
// "ear", "leggings" to "leg" and "stockings" to "stock", so a shopper's
// lone "ear" would read as earrings, and "clip on earrings" as the
// headphone fit "on ear". It is so when every spelling of e that text's
// words reach, stem for stem, has a word cut down: the shopper's at
// least four letters longer than e's ("earrings" for "ear",
// "relaxations" for "relaxed"), or, where e is one word, at least three
// shorter ("ear" for "earrings"). Within a phrase the other words vouch
// for a short form ("run shoe", "fold chair"), and an ending the shopper
// adds or leaves off ("jackets", "sock", "showing" for "show") is within
// those. A reading through a phrase written as one word ("vneck") is not
// judged.
//
// A colour is never reached through a word ending in "ing" that its
// spellings lack: "sanding disc" is no sand-coloured disc, as an -ing
// word is a verb's, and colours are named by nouns and adjectives
// (common knowledge of English).
func overStemmed(e *lexicon.Entry, text string) bool {
	tw := lexicon.Words(text)
	if e.Kind == lexicon.Colour && len(tw) > 0 && strings.HasSuffix(tw[len(tw)-1], "ing") && !spells(e, text) {
		return true
	}
	judged := false
	for _, p := range append([]string{e.Name}, e.Aliases...) {
		pw := lexicon.Words(p)
		if len(pw) != len(tw) || !sameKeys(pw, tw) {
			continue
		}
		if !cutDown(pw, tw) {
			return false
		}
		judged = true
	}
	return judged
}

// sameKeys reports whether two runs of words stem alike, word for word:
// whether the spelling pw is one text's words reach.
func sameKeys(pw, tw []string) bool {
	for i := range pw {
		if lexicon.Key(pw[i]) != lexicon.Key(tw[i]) {
			return false
		}
	}
	return true
}

// cutDown reports whether a word of the shopper's, tw, stands for a word
// of an entry's spelling, pw, only through the stemmer (see overStemmed).
func cutDown(pw, tw []string) bool {
	for i := range pw {
		d := utf8.RuneCountInString(tw[i]) - utf8.RuneCountInString(pw[i])
		if d >= 4 || d <= -3 && len(pw) == 1 {
			return true
		}
	}
	return false
}

func hasKind(es []*lexicon.Entry, k lexicon.Kind) bool {
	for _, e := range es {
		if e.Kind == k {
			return true
		}
	}
	return false
}

// isPT reports whether unit i is read as a product type.
func (p *tagger) isPT(i int) bool {
	return i >= 0 && i < len(p.units) && p.units[i].kind == uWord && p.units[i].chosen != nil && p.units[i].chosen.Kind == lexicon.ProductType
}

// compounds settles product types that stand next to each other: the
// same type twice ("thermal base layer"), a type and a broader one
// ("variable nd filter"), or a type and one of its own kinds ("blanket
// throw", read as the throw), become one span; otherwise the first qualifies
// the second ("saucepan lid") and is a modifier. A product type after
// "with", or after a material once a product type was named ("marble
// top"), is a feature of the product, and so is a light's part named
// after the light ("flood light motion sensor"), or a keyboard's
// switches named after the keyboard (partAfter).
func (p *tagger) compounds() {
	seenPT := false
	var owners []*lexicon.Entry // the product types named, not features
	for i := 0; i < len(p.units); i++ {
		if !p.isPT(i) {
			continue
		}
		u := &p.units[i]
		if i > 0 && p.units[i-1].kind == uWord && (p.units[i-1].text == "with" || p.units[i-1].text == "w/" ||
			seenPT && (p.units[i-1].text == "in" || p.units[i-1].text == "on")) {
			u.feature = true // "with lid"; "plant in pot"
			continue
		}
		if i > 0 && seenPT && p.units[i-1].chosen != nil && p.units[i-1].chosen.Kind == lexicon.Material {
			u.feature = true
			continue
		}
		if formWords[u.text] && (seenPT || p.lumberAfter(i)) {
			// "plywood 4x8 sheet", "4x8 sheet 1/2 osb": the sheet good's
			// form, not bedding.
			u.feature = true
			continue
		}
		if i > 0 && seenPT && dataParts[u.chosen.Name] != "" && p.dataAmount(&p.units[i-1]) {
			u.feature = true // "laptop 16gb ram": the laptop's memory
			continue
		}
		if p.partAfter(owners, u.chosen) {
			u.feature = true // "flood light 5000k motion sensor"
			if u.chosen.Name == "light switch" {
				// A keyboard's switches, with their colour, which names
				// how they press, not the keyboard's colour: "brown
				// switches".
				u.partTyped = true
				if prev := &p.units[i-1]; prev.kind == uWord && prev.chosen != nil && prev.chosen.Kind == lexicon.Colour {
					u.start, u.text = prev.start, prev.text+" "+u.text
					p.units = append(p.units[:i-1], p.units[i:]...)
					i--
				}
			}
			continue
		}
		seenPT = true
		owners = append(owners, u.chosen)
		for p.isPT(i + 1) {
			v := &p.units[i+1]
			if v.chosen == u.chosen || p.broader(v.chosen, u.chosen) {
				u.end, u.text = v.end, u.text+" "+v.text
				p.units = append(p.units[:i+1], p.units[i+2:]...)
				continue
			}
			if slices.Contains(p.lex.Lineage(v.chosen)[1:], u.chosen) {
				// "blanket throw", "sweater cardigan": a type, then one of
				// its own kinds, is that kind.
				u.end, u.text, u.chosen = v.end, u.text+" "+v.text, v.chosen
				p.units = append(p.units[:i+1], p.units[i+2:]...)
				continue
			}
			if p.partAfter(append(owners, u.chosen), v.chosen) {
				break // "flood light motion sensor": the light's sensor
			}
			u.modifier = true
			break
		}
	}
}

// lumberAfter reports whether a product type of lumber (plywood, osb,
// drywall) comes after unit i.
func (p *tagger) lumberAfter(i int) bool {
	for j := i + 1; j < len(p.units); j++ {
		if p.isPT(j) && p.units[j].chosen.Category == "lumber" {
			return true
		}
	}
	return false
}

// partAfter reports whether product type e, named after the product
// types owners, is a part of one of them rather than the product asked
// for: a light's motion sensor ("flood light motion sensor", where
// "motion sensor light" is a light too, the sensor qualifying it), a
// keyboard's switches ("mechanical keyboard brown switches" is a
// keyboard, not a light switch: common practice in keyboards).
func (p *tagger) partAfter(owners []*lexicon.Entry, e *lexicon.Entry) bool {
	for _, o := range owners {
		switch {
		case e.Name == "motion sensor" && p.givesLight(o):
			return true
		case e.Name == "light switch" && o.Name == "keyboard":
			return true
		}
	}
	return false
}

// givesLight reports whether product type e gives light: it has a
// colour temperature slot.
func (p *tagger) givesLight(e *lexicon.Entry) bool {
	for _, s := range p.lex.SlotsOf(e) {
		if s.Quantity == units.ColourTemperature {
			return true
		}
	}
	return false
}

// unitAlone tags a unit of volume named with no number, on a product
// sold by volume, as one of that unit: "paint quart navy" is a quart of
// paint, "gallon of paint" a gallon (common practice). It reports
// whether it tagged one.
func (p *tagger) unitAlone(k int) bool {
	u := &p.units[k]
	if u.entries != nil || k > 0 && p.units[k-1].kind == uItem || strings.HasSuffix(u.text, "s") {
		return false // "5 gallon" is read with its number; "in gallons" says no amount
	}
	un, ok := units.Lookup(u.text, p.opts.Volume)
	if !ok || un.Quantity != units.Volume || un.ToBase < 100 {
		return false // not a teaspoon or a millilitre
	}
	if _, ok := p.slotFor(units.Volume, 0); !ok {
		return false
	}
	one := quantity{num: number{value: 1, decimal: "1", integer: true, start: u.start, end: u.end}, unit: un, hasUnit: true}
	c := p.measure(u.start, u.end, one, "", nil, nil, un)
	c.Evidence = "a unit named alone: one " + un.Name
	p.add(c)
	return true
}

// childLetters are the letters children's sizes take after the number
// (common practice): toddler (4t), youth (10y), child (12c) and kids
// (3k).
var childLetters = map[string]bool{"t": true, "y": true, "c": true, "k": true}

// fireClasses matches a fire extinguisher's class letters as written
// together, in order: "abc", "bc", "ab", "k", "d".
var fireClasses = regexp.MustCompile(`^(a?b?c?|d|k)$`)

// formWords name the form a product comes in, after the product ("a 4x8
// sheet of plywood"), though alone they are a product type of their own
// (a bed sheet).
var formWords = map[string]bool{"sheet": true, "sheets": true}

// dataParts are the parts of a computer an amount of data before them
// measures, with the dimension it is: "16gb ram" is the memory, "512gb
// ssd" the storage.
var dataParts = map[string]string{"ram": "memory", "ssd": "storage", "hard drive": "storage"}

// dataAmount reports whether unit v is one amount of data ("16gb").
func (p *tagger) dataAmount(v *unit) bool {
	if v.kind != uItem || v.item.Value == nil || v.item.Value.To != nil || v.item.Value.From.Dims == nil || len(v.item.Value.From.Dims.Parts) != 1 {
		return false
	}
	u, ok := units.Lookup(v.item.Value.From.Dims.Parts[0].Unit, p.opts.Volume)
	return ok && u.Quantity == units.Data
}

// broader reports whether b is a or an ancestor of a, or names the last
// word of a's name ("filter" for "nd filter").
func (p *tagger) broader(b, a *lexicon.Entry) bool {
	if strings.HasSuffix(a.Name, " "+b.Name) {
		return true
	}
	return slices.Contains(p.lex.Lineage(a), b)
}

// everything are the words after "fits" that name no model: "fits all",
// "fits most".
var everything = map[string]bool{"all": true, "most": true, "any": true, "everyone": true, "everybody": true}

// namedSizes are the words after "size" that name a size of their own
// (common practice): "size os", "size regular", "size tall". Any other
// word after "size" is read as itself: "travel size shampoo" asks for
// no size called shampoo.
var namedSizes = map[string]bool{"os": true, "regular": true, "reg": true, "tall": true, "long": true, "short": true,
	"standard": true, "universal": true}

// oneSize reads "one size", "one size fits all", "one-size" and
// "onesize" at unit k as one soft keyword: the product has no sizes to
// choose from, which a title may say and a size filter cannot. It
// returns the extra units used, or -1.
func (p *tagger) oneSize(k int) int {
	u := &p.units[k]
	used := 0
	switch {
	case u.text == "one-size" || u.text == "onesize":
	case u.text == "one" && k+1 < len(p.units) && p.units[k+1].kind == uWord && p.units[k+1].text == "size":
		used = 1
	default:
		return -1
	}
	if j := k + used; j+2 < len(p.units) && p.units[j+1].kind == uWord && p.units[j+1].text == "fits" &&
		p.units[j+2].kind == uWord && everything[p.units[j+2].text] {
		used += 2
	}
	end := p.units[k+used].end
	p.add(Constraint{Kind: KindKeyword, Start: u.start, End: end, Name: "one size",
		Evidence: "one size: no size to choose, matched in the product's words"})
	return used
}

// compatAt reports whether a compatibility phrase starts at unit k, and
// how many units it takes.
func (p *tagger) compatAt(k int) int {
	u := &p.units[k]
	if u.kind != uWord || u.entries != nil {
		return 0
	}
	next := func(i int) string {
		if k+i < len(p.units) && p.units[k+i].kind == uWord {
			return p.units[k+i].text
		}
		return ""
	}
	switch u.text {
	case "for":
		return 1
	case "fits":
		if everything[next(1)] {
			return 0 // "fits all": a promise, not a model to fit
		}
		return 1
	case "compatible", "works", "made", "designed":
		if w := next(1); w == "with" || w == "for" {
			return 2
		}
		if u.text == "compatible" {
			return 1
		}
	case "replacement", "replaces":
		if next(1) == "for" {
			return 2
		}
	}
	return 0
}

// findHead picks the head product type: the last one before the first
// compatibility phrase, else the last one in the query.
func (p *tagger) findHead() {
	var last *lexicon.Entry
	at := -1
	for k := range p.units {
		if p.compatAt(k) > 0 && last != nil {
			break
		}
		if u := &p.units[k]; p.isPT(k) && !u.modifier && !u.feature && !p.negatedAt(k) && !p.countedAt(k) {
			last, at = u.chosen, k
		}
	}
	if child, by := p.gradeNarrows(last); child != nil {
		p.units[at].chosen, last = child, child
		p.narrowedBy = by
	}
	p.head = last
	switch {
	case p.opts.Category != "":
		p.category = p.opts.Category
	case last != nil:
		p.category = last.Category
	}
}

// gradeTypes are the product types a standard's grade names, by the
// grade's first letters: a cat6 cable is an ethernet cable, a usb3 cable
// a usb cable, an hdmi2.1 cable an hdmi cable (common practice).
var gradeTypes = []struct{ prefix, name string }{{"cat", "ethernet cable"}, {"usb", "usb cable"}, {"hdmi", "hdmi cable"}}

// gradeNarrows is the product type below head that a grade code or a
// connector of the query names, with the code, when head is that type's
// parent: "cat6 cable" heads with an ethernet cable, as the lexicon's
// "cat6 cable" would if the code were not read first, and "usb type c
// cable" with a usb cable. Else nil.
func (p *tagger) gradeNarrows(head *lexicon.Entry) (*lexicon.Entry, string) {
	if head == nil {
		return nil, ""
	}
	for k := range p.units {
		u := &p.units[k]
		if p.negatedAt(k) {
			continue
		}
		raw, _ := p.spacedCode(k) // "cat 6 cable"
		if raw == "" && u.kind == uItem && u.item.Code != nil {
			raw = strings.ToLower(p.q[u.start:u.end])
		}
		if raw == "" && u.kind == uWord {
			raw, _ = p.connectorSpan(k) // "usb type c cable"
		} else if !gradeCode.MatchString(raw) {
			continue
		}
		if raw == "" {
			continue
		}
		for _, g := range gradeTypes {
			if !strings.HasPrefix(raw, g.prefix) {
				continue
			}
			if e, ok := p.lex.Lookup(lexicon.ProductType, g.name); ok && e.Parent == head.Name {
				return e, raw
			}
		}
	}
	return nil, ""
}

// countedAt reports whether unit k is a word that counts the number
// before it ("500 sheets", "2 pairs"), which packOf and the counts read
// as a count, not as the product asked for.
func (p *tagger) countedAt(k int) bool {
	return k > 0 && countWords[p.units[k].text] != "" && p.units[k-1].kind == uItem && p.bareNumber(&p.units[k-1])
}

// negatedAt reports whether unit k follows an exclusion word or mark.
func (p *tagger) negatedAt(k int) bool {
	if k == 0 {
		return false
	}
	prev := &p.units[k-1]
	return prev.kind == uNeg || (prev.kind == uWord && prev.entries == nil && negators[prev.text])
}

func (p *tagger) apparel() bool {
	return p.category == "apparel" || p.category == "footwear"
}

// sized reports whether the category's goods come in letter sizes
// (clothes, shoes, gloves, hats, belts).
func (p *tagger) sized() bool {
	return p.apparel() || p.category == "accessories" && !p.unsized()
}

// letteredAccessories are the accessories sold in letter sizes (common
// practice): what is worn and fitted. A bag, a wallet, a watch or an
// umbrella is not, so "large" and "xl" on one say how big, not a size.
var letteredAccessories = []string{"hat", "gloves", "mittens", "belt", "helmet", "life jacket", "suspenders", "earmuffs"}

// sizeWordEvidence is the evidence of a size word ("large", "xl") on a
// product sold in no letter sizes.
const sizeWordEvidence = "a size word on a product sold in no letter sizes: how big it is, in the product's words"

// unsized reports whether the head is a product that comes in no
// letter sizes: one of another category than clothes, shoes and
// accessories (a mixing bowl, a vase), or an accessory not worn and
// fitted (a bag). With no head, nothing says.
func (p *tagger) unsized() bool {
	if p.head == nil || p.apparel() {
		return false
	}
	return p.category != "accessories" || !slices.ContainsFunc(letteredAccessories, p.headUnder)
}

// add appends a constraint, filling in its text and, when Strictness is
// left zero on a kind other than filler, the kind's default strictness;
// a pending exclusion applies to it.
func (p *tagger) add(c Constraint) {
	if c.Strictness == 0 && c.Kind != KindFiller {
		c.Strictness = DefaultStrictness(c.Kind)
	}
	c.Text = p.q[c.Start:c.End]
	if p.neg >= 0 && p.negText == "-" && c.Kind == KindMeasure && c.Measure != nil && c.Measure.Dimension == "number" && p.negEnd == c.Start {
		// "-20 sleeping bag": a minus right before a bare number may be
		// its sign, and no amount whittle reads is negative; the number
		// is neither excluded nor made negative, and the mark is filler.
		p.negFiller()
		p.res.Constraints[p.negIdx].Evidence = "minus before a bare number: not read as a sign or as an exclusion"
		p.neg = -1
	}
	if p.neg >= 0 && c.IsHead() {
		// "no show socks": an exclusion that reaches past filler to the
		// product asked for is no exclusion of it; a query never asks
		// for what it excludes. The mark is filler.
		p.negFiller()
		p.res.Constraints[p.negIdx].Evidence = "exclusion mark before the product asked for: not read as excluding it"
		p.neg = -1
	}
	if p.neg >= 0 && c.Kind != KindFiller {
		c.Excluded = true
		c.Evidence = join(c.Evidence, "excluded by "+fmt.Sprintf("%q", p.negText))
		if len(p.res.Constraints) == p.negIdx {
			// The mark is part of the span: "-leather", "not white".
			c.Start = p.neg
			c.Text = p.q[c.Start:c.End]
		} else {
			p.negFiller()
		}
		p.neg = -1
	}
	p.res.Constraints = append(p.res.Constraints, c)
}

// negFiller records a pending exclusion mark that could not join the span
// it excludes (a filler came between) as a filler of its own, in place.
func (p *tagger) negFiller() {
	f := Constraint{Kind: KindFiller, Start: p.neg, End: p.negEnd, Text: p.q[p.neg:p.negEnd], Strictness: Filler,
		Evidence: "exclusion mark"}
	cs := p.res.Constraints
	cs = append(cs, Constraint{})
	copy(cs[p.negIdx+1:], cs[p.negIdx:])
	cs[p.negIdx] = f
	p.res.Constraints = cs
}

func join(a, b string) string {
	if a == "" {
		return b
	}
	if b == "" {
		return a
	}
	return a + "; " + b
}

// tag walks the units and turns each into constraints.
func (p *tagger) tag() {
	p.neg = -1
	for k := 0; k < len(p.units); k++ {
		u := &p.units[k]
		switch u.kind {
		case uNeg:
			p.setNeg(u.start, u.end, "-")
		case uSym:
			k += p.symbol(k)
		case uItem:
			k += p.item(k)
		case uWord:
			k += p.wordUnit(k)
		}
	}
	if p.neg >= 0 {
		// An exclusion with nothing after it to exclude.
		p.negFiller()
		p.neg = -1
	}
}

// connectors are the plugs and ports shoppers name, however typed ("usb
// c", "type-c", "usbc"), as product titles write them (common practice),
// keyed by their words run together without dashes.
var connectors = map[string]string{
	"usbc": "usb-c", "typec": "usb-c", "usbtypec": "usb-c", "usba": "usb-a", "usbtypea": "usb-a",
	"microusb": "micro usb", "miniusb": "mini usb", "hdmi": "hdmi", "displayport": "displayport", "vga": "vga",
}

// connectorAt reads a connector's name at word unit k, of up to three
// words and the dashes between them, as one firm phrase matched in the
// product's words: "type c charger" asks for a USB-C charger, where
// "type" was filler and "c" a stray letter. It returns the extra units
// used, or -1.
func (p *tagger) connectorAt(k int) int {
	return p.firmPhrase(k, p.connectorSpan, "a connector, matched in the product's words")
}

// firmPhrase tags the phrase find finds at unit k, with the name and the
// last unit it gives, as a firm keyword with evidence. It returns the
// extra units used, or -1 when find finds none.
func (p *tagger) firmPhrase(k int, find func(int) (string, int), evidence string) int {
	name, last := find(k)
	if last < 0 {
		return -1
	}
	p.add(Constraint{Kind: KindKeyword, Start: p.units[k].start, End: p.units[last].end, Name: name, Strictness: Firm, Evidence: evidence})
	return last - k
}

// gradeWords start a grade a standard names that shoppers also write
// with a space: "cat 6", "usb 3.0", "hdmi 2.1", "wifi 6", "ddr 4",
// "merv 11".
var gradeWords = map[string]bool{"cat": true, "usb": true, "hdmi": true, "wifi": true, "ddr": true, "pcie": true, "merv": true}

// spacedGrade reads a grade written with a space at word unit k ("cat
// 6", "cat 5e", "usb 3.0") as the grade written as one code ("cat6"),
// where the number was read as a length and the word as a stray one. It
// returns the extra units used, or -1.
func (p *tagger) spacedGrade(k int) int {
	return p.firmPhrase(k, p.spacedCode, "a grade a standard names, written with a space, matched in the product's words")
}

// spacedCode is the grade written with a space that starts at unit k, as
// one code, and the index of its last unit; "", -1 when there is none.
func (p *tagger) spacedCode(k int) (string, int) {
	u := &p.units[k]
	if u.kind != uWord || !gradeWords[u.text] || k+1 >= len(p.units) || p.units[k+1].kind != uItem || !p.units[k+1].spaceBefore {
		return "", -1
	}
	last := k + 1
	if w, spaced := p.nextWord(k + 1); w != nil && !spaced {
		last = k + 2 // "cat 5e", "wifi 6e"
	}
	for ; last > k; last-- {
		code := u.text + strings.ReplaceAll(strings.ToLower(p.q[p.units[k+1].start:p.units[last].end]), " ", "")
		if gradeCode.MatchString(code) {
			return code, last
		}
	}
	return "", -1
}

// connectorSpan is the connector named at unit k (connectorAt), and the
// index of its last unit; "", -1 when there is none.
func (p *tagger) connectorSpan(k int) (string, int) {
	key, name, last := "", "", -1
	for j, words := k, 0; j < len(p.units) && words < 3; j++ {
		v := &p.units[j]
		if v.kind == uSym && p.q[v.start:v.end] == "-" && j > k {
			continue
		}
		if v.kind != uWord || j > k && v.entries != nil && !fillerOnly(v) {
			break
		}
		words++
		key += strings.ReplaceAll(v.text, "-", "")
		if c, ok := connectors[key]; ok {
			name, last = c, j
		}
	}
	return name, last
}

// fillerOnly reports whether every lexicon reading of unit v is filler.
func fillerOnly(v *unit) bool {
	for _, e := range v.entries {
		if e.Kind != lexicon.Filler {
			return false
		}
	}
	return true
}

// setNeg records an exclusion mark at [start, end). A second mark while
// one is pending is a filler ("not not white").
func (p *tagger) setNeg(start, end int, text string) {
	if p.neg >= 0 {
		p.add(Constraint{Kind: KindFiller, Start: start, End: end, Strictness: Filler, Evidence: "repeated exclusion mark"})
		return
	}
	p.neg, p.negEnd, p.negText, p.negIdx = start, end, text, len(p.res.Constraints)
}

// phraseReaders read a phrase that starts at a word unit, in order, before
// the word's lexicon entries: each returns the extra units it used, or
// -1 when the phrase is not its own. modifiedColour comes between the
// two lists.
var (
	phraseReaders = []func(*tagger, int) int{(*tagger).lightColour, (*tagger).poleCount, (*tagger).typeRating, (*tagger).groupSize, (*tagger).paperWord}
	// spacedGrade comes before connectorAt: "hdmi 2.1" is the grade.
	laterPhraseReaders = []func(*tagger, int) int{(*tagger).oneSize, (*tagger).apertureAt, (*tagger).spacedGrade, (*tagger).connectorAt, (*tagger).spelledSize}
)

// wordUnit tags a word unit and returns how many extra units it used.
func (p *tagger) wordUnit(k int) int {
	u := &p.units[k]
	for _, read := range phraseReaders {
		if n := read(p, k); n >= 0 {
			return n
		}
	}
	if n := p.modifiedColour(k); n > 0 {
		return n
	}
	for _, read := range laterPhraseReaders {
		if n := read(p, k); n >= 0 {
			return n
		}
	}
	if n, ok := p.vesaPattern(k+1, k, u.start); ok {
		return n // "vesa 400x400"
	}
	if p.unitAlone(k) {
		return 0
	}
	if u.entries == nil {
		switch {
		case negators[u.text] && k+1 < len(p.units):
			p.setNeg(u.start, u.end, u.text)
			return 0
		case sizeMarkers[u.text]:
			if n := p.sizeAfter(k); n > 0 {
				return n
			}
		case codeMarkers[u.text]:
			if n := p.codeAfter(k); n > 0 {
				return n
			}
		case u.text == "sch" || u.text == "schedule":
			if n := p.scheduleAfter(k); n > 0 {
				return n
			}
		case u.text == "awg":
			if n := p.gaugeBefore(k); n >= 0 {
				return n
			}
		}
		if n := p.packOf(k); n > 0 {
			return n
		}
		if n := p.compatAt(k); n > 0 {
			if used := p.compat(k, n); used > 0 {
				return used
			}
		}
		if n := p.letterSize(k); n >= 0 {
			return n
		}
		if d, ok := p.batteryWord(k); ok {
			p.add(specConstraint(u.start, u.end, d, "battery size word"))
			return 0
		}
		// A tyre's load range, "load range e" (the letter of its ply
		// rating, common practice), a load rating: hard.
		if u.text == "load" && (p.category == "tyres" || p.category == "") && k+2 < len(p.units) && p.units[k+1].text == "range" &&
			p.units[k+2].kind == uWord && len(p.units[k+2].text) == 1 && strings.Contains("bcdef", p.units[k+2].text) {
			p.add(Constraint{Kind: KindKeyword, Start: u.start, End: p.units[k+2].end, Name: "load range " + p.units[k+2].text, Strictness: Hard,
				Evidence: "a tyre's load range, a load rating, matched in the product's words; never dropped"})
			return 2
		}
		// A fire extinguisher's classes, "abc", "bc", "k" (the classes of
		// fire it is rated for, NFPA 10, from memory): one rated for less
		// is no substitute, so the phrase is hard.
		if p.headUnder("fire extinguisher") && fireClasses.MatchString(u.text) {
			p.add(Constraint{Kind: KindKeyword, Start: u.start, End: u.end, Name: u.text, Strictness: Hard,
				Evidence: "the classes of fire an extinguisher is rated for, matched in the product's words; never dropped"})
			return 0
		}
	}
	e := u.chosen
	if p.category == "paint" && e != nil && e.Kind != lexicon.Pattern {
		// On paint, a word that is also a sheen is the sheen: "eggshell
		// white" is white paint in an eggshell finish.
		for _, alt := range u.entries {
			if alt.Kind == lexicon.Pattern {
				e = alt
			}
		}
	}
	if e == nil {
		if structural[u.text] {
			p.add(Constraint{Kind: KindFiller, Start: u.start, End: u.end, Strictness: Filler, Evidence: "connecting word"})
			return 0
		}
		p.add(Constraint{Kind: KindKeyword, Start: u.start, End: u.end, Name: u.text, Evidence: "not in the lexicon"})
		p.res.Unrecognised = append(p.res.Unrecognised, u.text)
		return 0
	}
	if e.Kind == lexicon.ProductType && u.feature && formWords[u.text] {
		p.add(Constraint{Kind: KindFiller, Start: u.start, End: u.end, Strictness: Filler, Evidence: "the form the product comes in"})
		return 0
	}
	if e.Kind == lexicon.ProductType && (u.modifier || u.feature) {
		ev, name := "product type before another: a modifier", e.Name
		if u.feature {
			ev = "product type naming a part of the product: a feature"
		}
		if u.partTyped {
			ev, name = "a keyboard's switches: a feature, in the words typed", u.text
		}
		p.add(Constraint{Kind: KindKeyword, Start: u.start, End: u.end, Name: name, Evidence: ev})
		return 0
	}
	if e.Kind == lexicon.Audience || e.Kind == lexicon.Silhouette || e.Kind == lexicon.Filler {
		if n := p.letterSize(k); n >= 0 {
			return n
		}
	}
	c := Constraint{Kind: kindOf[e.Kind], Start: u.start, End: u.end, Name: e.Name, Evidence: lexiconEvidence[e.Kind]}
	switch e.Kind {
	case lexicon.ProductType:
		c.Category, c.Parent = e.Category, e.Parent
		if e == p.head {
			if p.narrowedBy != "" {
				c.Evidence = join(c.Evidence, "the type "+p.narrowedBy+" names, never widened to "+e.Parent)
				c.Parent = ""
			}
			c.Evidence = join(c.Evidence, headEvidence)
		}
	case lexicon.Filler:
		c.Strictness, c.Name = Filler, ""
	case lexicon.Colour:
		c.Colour = colourOf(e)
	}
	p.add(c)
	return 0
}

// letterSize tags a letter or fit size at unit k; -1 when it is none.
func (p *tagger) letterSize(k int) int {
	if n := p.loadVersion(k); n >= 0 {
		return n
	}
	u := &p.units[k]
	if k+1 < len(p.units) && p.units[k+1].kind == uWord && p.unsized() {
		if _, ok := letterSizes[u.text+" "+p.units[k+1].text]; ok {
			p.add(Constraint{Kind: KindKeyword, Start: u.start, End: p.units[k+1].end, Name: u.text + " " + p.units[k+1].text,
				Evidence: sizeWordEvidence})
			return 1
		}
	}
	if k+1 < len(p.units) && p.units[k+1].kind == uWord && p.sized() {
		// Two-word letter sizes: "extra large", "extra small".
		if v, ok := letterSizes[u.text+" "+p.units[k+1].text]; ok {
			p.add(Constraint{Kind: KindSize, Start: u.start, End: p.units[k+1].end, Size: &Size{System: "letter", Value: v}, Evidence: "letter size"})
			return 1
		}
	}
	if v, ok := letterSizes[u.text]; ok {
		if p.unsized() {
			p.add(Constraint{Kind: KindKeyword, Start: u.start, End: u.end, Name: u.text,
				Evidence: sizeWordEvidence})
			return 0
		}
		if ambiguousLetters[u.text] && !p.sized() || plusLetters[u.text] && !p.apparel() {
			return -1
		}
		p.add(Constraint{Kind: KindSize, Start: u.start, End: u.end, Size: &Size{System: "letter", Value: v},
			Evidence: sizeEvidence(u.text, p.category)})
		return 0
	}
	// "big and tall": one fit size range (common practice).
	if u.text == "big" && k+2 < len(p.units) && p.units[k+1].kind == uWord && p.units[k+1].text == "and" &&
		p.units[k+2].kind == uWord && p.units[k+2].text == "tall" && (p.category == "apparel" || p.head == nil) {
		p.add(Constraint{Kind: KindSize, Start: u.start, End: p.units[k+2].end, Size: &Size{System: "fit", Value: "big and tall"}, Evidence: "fit size"})
		return 2
	}
	// Fit sizes are clothes' ("tall" on boots is a shaft, not a fit).
	if fitSizes[u.text] && (p.category == "apparel" || p.head == nil) {
		c := Constraint{Kind: KindSize, Start: u.start, End: u.end, Size: &Size{System: "fit", Value: u.text}, Evidence: "fit size"}
		used := 0
		if k+1 < len(p.units) && p.units[k+1].kind == uWord && sizeMarkers[p.units[k+1].text] {
			c.End, used = p.units[k+1].end, 1 // "plus size", "petite sizes"
		}
		p.add(c)
		return used
	}
	if n := p.regionalSize(k); n > 0 {
		return n
	}
	if n := p.bedSize(k); n >= 0 {
		return n
	}
	return -1
}

// bedSizes are the mattress sizes that name bedding and beds.
var bedSizes = map[string]string{"twin": "twin", "twin xl": "twin xl", "full": "full", "double": "double", "queen": "queen",
	"king": "king", "california king": "california king", "cal king": "california king", "super king": "super king",
	"single": "single", "small double": "small double"}

// bedSize reads "queen", "king", "twin xl", "california king" in home and
// furniture (or with no product type) as a bed size, with the word size
// after it ("queen size").
func (p *tagger) bedSize(k int) int {
	u := &p.units[k]
	if p.category != "home" && p.category != "furniture" && p.head != nil {
		return -1
	}
	used, text, end := 0, u.text, u.end
	if k+1 < len(p.units) && p.units[k+1].kind == uWord && p.units[k+1].entries == nil {
		if v, ok := bedSizes[u.text+" "+p.units[k+1].text]; ok {
			used, text, end = 1, v, p.units[k+1].end
		}
	}
	v, ok := bedSizes[text]
	if !ok {
		return -1
	}
	// "queen size", "king size": the word size is part of the name
	// (common practice), not the opening of another size.
	if n := k + used + 1; n < len(p.units) && p.units[n].kind == uWord && p.units[n].text == "size" && p.units[n].spaceBefore {
		used, end = used+1, p.units[n].end
	}
	p.add(Constraint{Kind: KindSize, Start: u.start, End: end, Size: &Size{System: "bed", Value: v}, Evidence: "bed size"})
	return used
}

// regionalSize reads "eu 42", "uk 9", "us 10" as a size in that system.
func (p *tagger) regionalSize(k int) int { return p.regionalSizeFrom(k, p.units[k].start) }

// regionalSizeFrom is regionalSize with the span starting at start, so
// that "size eu 42" is one span.
func (p *tagger) regionalSizeFrom(k, start int) int {
	u := &p.units[k]
	if !regions[u.text] || !p.sized() || k+1 >= len(p.units) || p.units[k+1].kind != uItem || !p.bareNumber(&p.units[k+1]) {
		return 0
	}
	v := &p.units[k+1]
	n, err := parseNum(v.item.Value.From.Dims.Parts[0].Num)
	if err != nil || n.value <= 0 {
		return 0
	}
	p.add(regional(start, v.end, u.text, n))
	return 1
}

// regional is the size n in the system of region, "uk 8 1/2" or "42 eu",
// spanning start to end. A half size keeps its half: 8 1/2 is 8.5.
func regional(start, end int, region string, n number) Constraint {
	return Constraint{Kind: KindSize, Start: start, End: end, Size: &Size{System: region, Value: n.decimal},
		Evidence: "size in the " + strings.ToUpper(region) + " system"}
}

var regions = map[string]bool{"eu": true, "uk": true, "us": true, "fr": true, "it": true, "jp": true, "au": true, "mx": true, "cn": true}

func sizeEvidence(w, category string) string {
	if ambiguousLetters[w] {
		return fmt.Sprintf("letter size, since the category is %s", category)
	}
	return "letter size"
}

// sizeAfter reads "size X" at unit k.
func (p *tagger) sizeAfter(k int) int {
	if k+1 >= len(p.units) {
		return 0
	}
	u, v := &p.units[k], &p.units[k+1]
	c := Constraint{Kind: KindSize, Start: u.start, End: v.end, Evidence: "after \"" + u.text + "\""}
	used := 1
	switch v.kind {
	case uWord:
		switch s, ok := letterSizes[v.text]; {
		case ok:
			c.Size = &Size{System: "letter", Value: s}
		case fitSizes[v.text]:
			c.Size = &Size{System: "fit", Value: v.text}
		case v.entries == nil && namedSizes[v.text]:
			c.Size = &Size{System: "named", Value: v.text}
		case regions[v.text]:
			if n := p.regionalSizeFrom(k+1, u.start); n > 0 {
				return n + 1 // "size eu 42"
			}
			return 0
		default:
			return 0 // "letter size copy paper": the next word is no size
		}
	case uItem:
		if val := v.item.Value; val != nil && val.To != nil && (p.headUnder("socks") || p.category == "footwear") {
			// "size 10-13" on socks, "size 7-8" on shoes. What a range
			// that is none reports is reported when it is read as a
			// value.
			reported := len(p.res.Errors)
			from, ok1 := p.readSingle(val.From)
			to, ok2 := p.readSingle(val.To)
			p.res.Errors = p.res.Errors[:reported]
			if ok1 && ok2 && p.sockSize(u.start, v.end, from, to) {
				return 1
			}
			if ok1 && ok2 && p.shoeSizes(u.start, v.end, from, to) {
				return 1
			}
			return 0
		}
		s, ok := p.sizeValue(v)
		if !ok {
			return 0
		}
		c.Size = s
	default:
		return 0
	}
	// A child's or toddler's size letter stuck to the number: "size 13c",
	// "size 4t", as the number read bare takes it.
	if k+2 < len(p.units) && p.units[k+2].kind == uWord && !p.units[k+2].spaceBefore && childLetters[p.units[k+2].text] &&
		p.apparel() && (c.Size.System == "numeric" || c.Size.System == "shoe") && !strings.ContainsAny(c.Size.Value, ".x/ ") {
		c.Size.System, c.Size.Value = "numeric", c.Size.Value+p.units[k+2].text
		c.End = p.units[k+2].end
		p.add(c)
		return used + 1
	}
	// A suit's length after its chest: "size 40r", "size 42 long", and
	// "size 40l", whose L came as litres.
	if c.Size.System == "numeric" && p.tailored() {
		chest, length, next := c.Size.Value, "", false
		if n := len(chest); n > 0 && (chest[n-1] == 'l' || chest[n-1] == 's') {
			chest, length = chest[:n-1], chest[n-1:]
		} else if k+2 < len(p.units) && p.units[k+2].kind == uWord && suitLengths[p.units[k+2].text] != "" {
			length, next = suitLengths[p.units[k+2].text], true
		}
		if n, err := strconv.Atoi(chest); err == nil && n >= 32 && n <= 62 && length != "" {
			c.Size.System, c.Size.Value = "suit", chest+length
			c.Evidence += ": a suit's chest and length"
			if next {
				c.End = p.units[k+2].end
				used++
			}
			p.add(c)
			return used
		}
	}
	// A shoe width may follow: "size 9.5 wide".
	if k+2 < len(p.units) && p.units[k+2].kind == uWord {
		next := &p.units[k+2]
		if w, ok := widths[next.text]; ok && (c.Size.System == "numeric" || c.Size.System == "shoe") {
			c.Size.Width = w
			c.End = p.units[k+2].end
			used++
			if c.Size.System == "numeric" {
				c.Size.System = "shoe"
			}
		}
		// Or its system: "size 8 uk", "size 42 eu".
		if regions[next.text] && next.text != "it" && (c.Size.System == "numeric" || c.Size.System == "shoe") && c.Size.Width == "" {
			c.Size.System = next.text
			c.End = next.end
			used++
		}
	}
	p.add(c)
	return used
}

// codeAfter reads "sku 88-1042" at unit k.
func (p *tagger) codeAfter(k int) int {
	j := k + 1
	if j < len(p.units) && p.units[j].kind == uWord && (p.units[j].text == "number" || p.units[j].text == "no") {
		j++
	}
	if j < len(p.units) && p.units[j].kind == uSym && p.units[j].tok.Value == "#" {
		j++
	}
	if j >= len(p.units) || p.units[j].kind != uItem || p.units[j].item.Quoted != nil {
		return 0
	}
	v := &p.units[j]
	end := v.end
	for j+1 < len(p.units) && !p.units[j+1].spaceBefore && p.units[j+1].kind != uNeg {
		j++
		end = p.units[j].end // "4471-b": the code runs to the next space
	}
	p.add(Constraint{Kind: KindPartNumber, Start: p.units[k].start, End: end, Code: strings.ToUpper(p.q[v.start:end]),
		Evidence: "after \"" + p.units[k].text + "\""})
	return j - k
}

// compat reads a compatibility phrase of n units at k and its target.
// After a plain "for" the target must name something a product fits: a
// model code, a brand, or the product it goes on ("for jx-10", "filter
// for dyno vacuum"); "paint for bathroom" and "gift for dad" name a use
// or a person, no target, and their words are read as the query's.
func (p *tagger) compat(k, n int) int {
	j := k + n
	end := -1
	var parts []string
	code := false   // a model code or number is in the target
	fitted := false // a code, a brand or a product type is in it
	for ; j < len(p.units); j++ {
		v := &p.units[j]
		if v.kind == uWord {
			if code && modelSuffixes[v.text] && !(j+1 < len(p.units) && p.units[j+1].kind == uItem && p.units[j+1].item.Value != nil) {
				// "iphone 14 pro max": the variant, though max is also
				// a bound ("max $50").
				parts, end = append(parts, v.text), v.end
				continue
			}
			if v.chosen != nil {
				e := v.chosen
				if e.Kind == lexicon.Brand {
					parts, end, fitted = append(parts, v.text), v.end, true
					continue
				}
				if e.Kind == lexicon.Filler && len(parts) == 0 {
					continue
				}
				if e.Kind == lexicon.ProductType && len(parts) > 0 && p.head != nil && e != p.head {
					// "filter for dyno vacuum": the vacuum is what it fits.
					parts, end, fitted = append(parts, v.text), v.end, true
					j++
				}
				break
			}
			if _, ok := p.batteryWord(j); ok || negators[v.text] || sizeMarkers[v.text] || p.compatAt(j) > 0 || structural[v.text] {
				break
			}
			if _, ok := letterSizes[v.text]; ok {
				break
			}
			// A model code ends the target but for the words a maker
			// puts after one ("zk-3 pro"): "for zk-3 roomy" fits zk-3.
			if code && !modelSuffixes[v.text] {
				break
			}
			parts, end = append(parts, v.text), v.end
			continue
		}
		if v.kind == uItem && (v.item.Code != nil || (len(parts) > 0 && p.bareNumber(v) && !p.countAfter(j))) {
			// A code, or a name and its number ("iphone 14", "hp 63"):
			// a model either way.
			parts, end = append(parts, strings.ToLower(p.q[v.start:v.end])), v.end
			code, fitted = true, true
			continue
		}
		// "stand for 65 inch tv": a measure and the product it measures.
		if v.kind == uItem && len(parts) == 0 && p.head != nil && v.item.Value != nil && p.isPT(j+1) && p.units[j+1].chosen != p.head {
			parts = append(parts, strings.ToLower(p.q[v.start:v.end]), p.units[j+1].text)
			end, fitted = p.units[j+1].end, true
			j += 2
		}
		break
	}
	if end < 0 || n == 1 && p.units[k].text == "for" && !fitted {
		return 0
	}
	p.add(Constraint{Kind: KindCompatibility, Start: p.units[k].start, End: end, Target: strings.Join(parts, " "),
		Evidence: fmt.Sprintf("target after %q", p.q[p.units[k].start:p.units[k+n-1].end])})
	return j - k - 1
}

// modelSuffixes are the words makers put after a model code to name a
// variant of it (common practice).
var modelSuffixes = map[string]bool{"pro": true, "max": true, "plus": true, "mini": true, "ultra": true, "lite": true,
	"se": true, "xl": true, "air": true, "neo": true, "edge": true}

// symbol handles punctuation: "#10-24" opens a unified thread.
func (p *tagger) symbol(k int) int {
	u := &p.units[k]
	if u.tok.Value == "#" && k+1 < len(p.units) && !p.units[k+1].spaceBefore && p.units[k+1].kind == uItem {
		if n := p.numbered(u.start, &p.units[k+1]); n >= 0 {
			return 1 + n
		}
	}
	return 0
}

// finish sets the category from standard designations when no product
// type gave one.
func (p *tagger) finish() {
	p.res.Category = p.category
	if p.category != "" {
		return
	}
	for _, c := range p.res.Constraints {
		if c.Kind == KindSpec && !c.Excluded {
			if cat, ok := specCategory[c.Spec.System]; ok {
				p.res.Category = cat
				return
			}
		}
	}
}

var specCategory = map[string]string{
	"lumber": "lumber", "tyre": "tyres", "awg": "electrical", "metric_thread": "hardware",
	"unified_thread": "hardware", "paper": "office", "battery": "batteries", "pipe_schedule": "hardware",
}

// packOf reads "pack of 8" at unit k.
func (p *tagger) packOf(k int) int {
	u := &p.units[k]
	if countWords[u.text] == "" || k+2 >= len(p.units) || p.units[k+1].kind != uWord || p.units[k+1].text != "of" {
		return 0
	}
	v := &p.units[k+2]
	if v.kind != uItem || !p.bareNumber(v) {
		return 0
	}
	n := v.item.Value.From.Dims.Parts[0].Num
	if n.Whole == "" || n.Frac != nil {
		return 0
	}
	val, _, err := parseWhole(n.Whole)
	if err != nil || val != float64(int64(val)) {
		return 0
	}
	p.add(countConstraint(u.start, v.end, val, countWords[u.text], "number after \""+u.text+" of\""))
	return 2
}

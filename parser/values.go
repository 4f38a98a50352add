package parser

import (
	"fmt"
	"math"
	"regexp"
	"slices"
	"strconv"
	"strings"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/spec"
	"github.com/whittle-search/whittle/lexicon/units"
	"github.com/whittle-search/whittle/parser/internal/grammar"
)

// quantity is one number with what was written after it.
type quantity struct {
	num      number
	unit     units.Unit
	hasUnit  bool
	currency string // ISO code when a currency was written after the number
	label    string // w, h, d or l after a mark or unit
	fluid    bool   // "oz" read as fluid ounces, on a product that holds a volume
	start    int
	end      int
}

// single is a price or one or more quantities.
type single struct {
	price    bool
	currency string
	amount   number
	parts    []quantity
	start    int
	end      int
}

func (p *tagger) readSingle(s *grammar.Single) (single, bool) {
	out := single{start: s.Pos.Offset, end: s.EndPos.Offset}
	if m := s.Money; m != nil {
		n, err := parseNum(&grammar.Num{Pos: m.Amount.Pos, EndPos: m.Amount.EndPos, Whole: m.Amount.Number})
		if err != nil {
			p.res.Errors = append(p.res.Errors, err)
			return out, false
		}
		code, ok := p.currency(m.Symbol)
		if !ok {
			p.errorf(m.Pos.Offset, m.Amount.Pos.Offset, "unknown currency symbol %q", m.Symbol)
			return out, false
		}
		out.price, out.currency, out.amount = true, code, n
		return out, true
	}
	for _, q := range s.Dims.Parts {
		n, err := parseNum(q.Num)
		if err != nil {
			p.res.Errors = append(p.res.Errors, err)
			return out, false
		}
		qt := quantity{num: n, label: q.Label, start: q.Pos.Offset, end: q.EndPos.Offset}
		switch {
		case q.Mark == `"`:
			qt.unit, qt.hasUnit = mustUnit("in"), true
		case q.Mark == "'":
			qt.unit, qt.hasUnit = mustUnit("ft"), true
		case q.Unit != "":
			qt.unit, qt.hasUnit = units.Lookup(q.Unit, p.opts.Volume)
			if qt.hasUnit && qt.unit.Quantity == units.Mass && qt.unit.Symbol == "oz" && p.holdsVolume() {
				// "12oz mug": a mug's ounces are fluid ones (common practice).
				qt.unit, _ = units.Lookup("fl oz", p.opts.Volume)
				qt.fluid = true
			}
		case q.Currency != "":
			code, ok := p.currency(q.Currency)
			if !ok {
				p.errorf(qt.start, qt.end, "unknown currency %q", q.Currency)
				return out, false
			}
			qt.currency = code
		}
		out.parts = append(out.parts, qt)
	}
	if len(out.parts) == 1 && out.parts[0].currency != "" {
		out.price, out.currency, out.amount = true, out.parts[0].currency, out.parts[0].num
	}
	return out, true
}

func mustUnit(sym string) units.Unit {
	u, ok := units.BySymbol(sym)
	if !ok {
		panic("whittle: unit table lacks " + sym)
	}
	return u
}

// symbols maps currency signs to ISO 4217 codes; "$" is the option's
// dollar.
var currencySigns = map[string]string{
	"€": "EUR", "£": "GBP", "¥": "JPY", "₹": "INR", "₩": "KRW", "₽": "RUB", "₺": "TRY",
	"₪": "ILS", "₫": "VND", "฿": "THB", "₱": "PHP", "₴": "UAH", "₦": "NGN", "₡": "CRC",
	"₲": "PYG", "₵": "GHS", "₸": "KZT", "₼": "AZN", "₾": "GEL", "zł": "PLN", "¢": "",
	// A dollar named by its country before the sign (common practice).
	"us$": "USD", "c$": "CAD", "a$": "AUD", "nz$": "NZD", "hk$": "HKD", "s$": "SGD", "mx$": "MXN",
}

// currency returns the ISO 4217 code of a currency sign ("€", "$") or
// word ("eur", "euros", "dollars"); "$" and the dollar words take the
// option's dollar currency.
func (p *tagger) currency(w string) (string, bool) {
	if code, ok := currencySigns[w]; ok {
		return code, code != ""
	}
	if w == "$" {
		return p.opts.dollar(), true
	}
	code, ok := grammar.CurrencyWord(w)
	if ok && code == "" {
		code = p.opts.dollar()
	}
	return code, ok
}

// item tags a structured item at unit k; it returns the extra units used.
func (p *tagger) item(k int) int {
	u := &p.units[k]
	it := u.item
	switch {
	case it.Quoted != nil:
		p.quoted(u)
	case it.Tyre != nil:
		p.tyre(u)
	case it.Code != nil:
		return p.codeUnit(k)
	case it.Between != nil:
		a, ok1 := p.readSingle(it.Between.From)
		b, ok2 := p.readSingle(it.Between.To)
		if ok1 && ok2 {
			p.rangeOf(u.start, u.end, a, b, "between")
		}
	case it.Compare != nil:
		s, ok := p.readSingle(it.Compare.Val)
		if ok {
			// "under 1k", "under 2k usd": thousands, as shoppers write
			// prices, and a price whatever slot the number would fit (a
			// laptop's 2000 GB).
			if w, spaced := p.nextWord(k); w != nil && !spaced && w.text == "k" && thousands(&s) {
				end, used := w.end, 1
				if !s.price {
					s.price, s.currency, s.amount = true, p.opts.Currency, s.parts[0].num
					if c, ok := p.currency(strings.ToLower(p.wordAfter(k + 1))); ok {
						s.currency, end, used = c, p.units[k+2].end, 2
					}
					if s.currency == "" {
						s.currency = "USD"
					}
				}
				p.bound(u.start, end, s, it.Compare.Op)
				return used
			}
			p.bound(u.start, u.end, s, it.Compare.Op)
		}
	case it.Value != nil:
		return p.value(k)
	}
	return 0
}

func (p *tagger) value(k int) int {
	u := &p.units[k]
	v := u.item.Value
	if n, ok := aughtOf(v); ok {
		return p.aught(k, n)
	}
	if p.serviceAlone(k) {
		return 0
	}
	if n, ok := p.vesaPattern(k, k+1, u.start); ok {
		return n // "400x400 vesa"
	}
	if n, ok := p.fertilizerGrade(k); ok {
		return n // "10-10-10"
	}
	if n, ok := p.flotationTyre(k); ok {
		return n // "33x12.50r20"
	}
	if p.halfNeck(k) || p.wheelFit(k) {
		return 0
	}
	from, ok := p.readSingle(v.From)
	if !ok {
		return 0
	}
	if v.To != nil {
		to, ok := p.readSingle(v.To)
		if !ok {
			return 0
		}
		if c, ok := p.cableDash(u.start, u.end, from, to); ok {
			// "12-2 wire": gauge, a dash, conductors, as NM cable is sold.
			p.add(c)
			return 0
		}
		if n, ok := p.monthsSize(k, from, to); ok {
			return n
		}
		if p.sockSize(u.start, u.end, from, to) {
			return 0
		}
		if len(from.parts) == 1 && len(to.parts) >= 1 && !to.price {
			// "1/4-20", "1/4-20 x 1": a thread, then perhaps its length.
			threadEnd := to.parts[0].end
			if len(to.parts) == 1 {
				threadEnd = u.end
			}
			reported := len(p.res.Errors)
			if c, ok := p.unifiedThread(u.start, threadEnd, v.From, to.parts[0]); ok {
				p.add(c)
				p.lengths(to, 1, u.end, p.lengthSlot())
				return 0
			}
			if len(p.res.Errors) > reported {
				// A thread written wrong ("1/4-7") is an error, not a
				// range of lengths; a length after it is still read.
				p.lengths(to, 1, u.end, p.lengthSlot())
				return 0
			}
		}
		if len(from.parts) == 1 && len(to.parts) > 1 && !from.price {
			// "6-8 x 10": a range, then the other dimensions.
			first := single{parts: to.parts[:1], start: to.start, end: to.parts[0].end}
			p.rangeOf(u.start, to.parts[0].end, from, first, "range")
			p.lengths(to, 1, u.end, 1)
			return 0
		}
		if len(from.parts) > 1 || len(to.parts) > 1 {
			// "2x4-2x6": two dimensions, read one after the other.
			for _, side := range []struct {
				s   single
				end int
			}{{from, from.end}, {to, u.end}} {
				if side.s.price {
					p.price(side.s.start, side.end, side.s, nil, &side.s.amount, "a bare price reads as a ceiling")
				} else {
					p.dims(side.s.start, side.end, side.s)
				}
			}
			return 0
		}
		p.rangeOf(u.start, u.end, from, to, "range")
		return 0
	}
	if v.Post != "" {
		p.bound(u.start, u.end, from, v.Post)
		return 0
	}
	if from.price {
		p.price(u.start, u.end, from, nil, &from.amount, "a bare price reads as a ceiling")
		return 0
	}
	if len(from.parts) > 1 {
		p.dims(u.start, u.end, from)
		return 0
	}
	return p.point(k, from.parts[0])
}

// next returns unit k+1 when it is a word, and whether a space comes before it.
func (p *tagger) nextWord(k int) (*unit, bool) {
	if k+1 < len(p.units) && p.units[k+1].kind == uWord {
		return &p.units[k+1], p.units[k+1].spaceBefore
	}
	return nil, false
}

// point tags one quantity; it returns the extra units used.
func (p *tagger) point(k int, q quantity) int {
	u := &p.units[k]
	w, spaced := p.nextWord(k)
	if n, ok := p.monthsSize(k, single{parts: []quantity{q}}, single{}); ok {
		return n
	}
	if n, ok := p.apparelFraction(k, q); ok {
		return n
	}
	if n := p.percent(k, q); n > 0 {
		return n
	}
	// A version after a product of a standard's grades ("hdmi cable 10
	// ft 2.1", "usb flash drive 3.0"): the grade, as if written after the
	// standard's name, not a second length of 2.1 ft or capacity of 3 GB.
	if std := p.versionStandard(); std != "" && !q.hasUnit && !q.num.integer && gradeCode.MatchString(std+q.num.decimal) {
		p.add(Constraint{Kind: KindKeyword, Start: u.start, End: u.end, Name: std + q.num.decimal, Strictness: Firm,
			Evidence: "a version number after a product of the " + std + " standard: its grade, matched in the product's words"})
		return 0
	}
	// An abrasive's grit, "220 grit": a firm phrase in the product's
	// words (grit numbers follow their own scales, CAMI and FEPA P, not
	// a measure), where the number was unitless and grit a stray word.
	if !q.hasUnit && q.num.integer && w != nil && (w.text == "grit" || w.text == "grits") {
		p.add(Constraint{Kind: KindKeyword, Start: u.start, End: w.end, Name: q.num.decimal + " grit", Strictness: Firm,
			Evidence: "an abrasive's grit, matched in the product's words"})
		return 1
	}
	// A nail's penny size, "16d": its length (common practice; the table
	// of lengths from memory), where the d was read as a depth.
	if in, ok := pennyInches[q.num.decimal]; ok && q.label == "d" && !q.hasUnit && p.headUnder("nail") {
		c := p.measure(u.start, u.end, quantity{num: number{value: in, decimal: strconv.FormatFloat(in, 'f', -1, 64)}}, "length", nil, nil, mustUnit("in"))
		c.Evidence = fmt.Sprintf("a nail's penny size: %sd is %g in long", q.num.decimal, in)
		p.add(c)
		return 0
	}
	// "60 watt equivalent": an LED's brightness, as the incandescent bulb
	// of that power gives it (common practice), not the power it draws;
	// a power asked for would find no LED bulb at all.
	if q.hasUnit && q.unit.Quantity == units.Power && w != nil && w.entries == nil && equivalentWords[w.text] {
		p.add(Constraint{Kind: KindKeyword, Start: u.start, End: w.end, Name: q.num.decimal + "w equivalent", Strictness: Firm,
			Evidence: "the brightness of an incandescent bulb of that power, not the power the bulb draws"})
		return 1
	}
	// A measure named by the word after it: "3/8 drive" on sockets,
	// ratchets and torque wrenches, the square drive (ASME B107 and ISO
	// 1174 sizes, from memory), which the socket and its handle must
	// share, not on a drill, whose 1/2 in is its chuck; "3/8 nap" on a
	// roller cover, the depth of its pile (common practice).
	if n := p.namedMeasure(k, q); n > 0 {
		return n
	}
	// Gauge: "14 awg", "12 gauge", "12-gauge", "14/2 awg", "16 gauge".
	if used := p.gaugeWordAfter(k); used > 0 && !q.hasUnit {
		if c, ok := p.gauge(k, used, q); ok {
			p.add(c)
			return used
		}
	}
	// Cable: "12/2", "14/3" (gauge over conductors) where nothing says otherwise.
	if n := u.item.Value.From.Dims.Parts[0].Num; !q.hasUnit && cableFraction(n) && (p.category == "" || p.category == "electrical") {
		if c, ok := p.wireGauge(u.start, u.end, q, n); ok {
			c.Evidence = join(c.Evidence, "gauge over conductors, as cable is written (common practice)")
			p.add(c)
			return 0
		}
	}
	// A number stuck to a code: "6lr61".
	if k+1 < len(p.units) && p.units[k+1].kind == uItem && p.units[k+1].item.Code != nil && !p.units[k+1].spaceBefore && q.num.integer && !q.hasUnit {
		v := &p.units[k+1]
		p.code(u.start, v)
		return 1
	}
	if w != nil && !spaced && !q.hasUnit && q.num.integer {
		// A letter size stuck to a number: "3xl", "2x".
		if _, ok := letterSizes[q.num.decimal+w.text]; ok && p.unsized() {
			p.add(Constraint{Kind: KindKeyword, Start: u.start, End: w.end, Name: q.num.decimal + w.text,
				Evidence: sizeWordEvidence})
			return 1
		}
		if s, ok := letterSizes[q.num.decimal+w.text]; ok && (!plusLetters[s] || p.apparel()) {
			p.add(Constraint{Kind: KindSize, Start: u.start, End: w.end, Size: &Size{System: "letter", Value: s}, Evidence: "letter size"})
			return 1
		}
		// Toddler, youth and child sizes: "4t", "10y", "12c"; not on a
		// bra, whose "36c" is a band and a cup (read below).
		if p.apparel() && childLetters[w.text] && !p.headUnder("bra") {
			p.add(Constraint{Kind: KindSize, Start: u.start, End: w.end, Size: &Size{System: "numeric", Value: q.num.decimal + w.text},
				Evidence: "number with a size letter"})
			return 1
		}
		// A girl's 6X, the size between 6 and 7 (common practice), not a
		// sixth X: letter sizes stop at 5x.
		if p.apparel() && q.num.decimal == "6" && w.text == "x" {
			p.add(Constraint{Kind: KindSize, Start: u.start, End: w.end, Size: &Size{System: "numeric", Value: "6x"},
				Evidence: "a girl's size 6X"})
			return 1
		}
	}
	if n, ok := p.suitSize(k, q); ok {
		return n
	}
	if n := p.dimensionWord(k, q); n > 0 {
		return n
	}
	// "3 step ladder", "2 step stool": the steps, which the product
	// type's own name counts (common practice), not a height.
	if !q.hasUnit && q.num.integer && q.num.value <= 12 && k+1 < len(p.units) && p.units[k+1].chosen != nil &&
		p.units[k+1].chosen.Kind == lexicon.ProductType && strings.HasPrefix(p.units[k+1].text, "step ") {
		p.add(countConstraint(u.start, u.end, q.num.value, "steps", "number before \""+p.units[k+1].text+"\": its steps"))
		return 0
	}
	if n := p.spacedTyre(k, q); n > 0 {
		return n
	}
	// A count: "8 pack", "12-pack", "50 pcs".
	if !q.hasUnit && q.num.integer {
		if w != nil && w.text == "thread" && k+2 < len(p.units) && p.units[k+2].text == "count" {
			p.add(countConstraint(u.start, p.units[k+2].end, q.num.value, "thread_count", "number before \"thread count\""))
			return 2
		}
		if w != nil && countWords[w.text] != "" {
			p.add(countConstraint(u.start, w.end, q.num.value, countWords[w.text], "number before \""+w.text+"\""))
			return 1
		}
		if k+2 < len(p.units) && p.units[k+1].kind == uSym && p.units[k+1].tok.Value == "-" && !p.units[k+1].spaceBefore &&
			p.units[k+2].kind == uWord && !p.units[k+2].spaceBefore && countWords[p.units[k+2].text] != "" {
			p.add(countConstraint(u.start, p.units[k+2].end, q.num.value, countWords[p.units[k+2].text], "number before \""+p.units[k+2].text+"\""))
			return 2
		}
	}
	// A size with its system after it: "42 eu", "9.5 us" ("it" only
	// before the number, where it cannot be the pronoun).
	if w != nil && spaced && !q.hasUnit && regions[w.text] && w.text != "it" && p.sized() && q.num.value > 0 {
		p.add(regional(u.start, w.end, w.text, q.num))
		return 1
	}
	// A shoe size with its width: "9.5 wide".
	if w != nil && p.category == "footwear" && !q.hasUnit {
		if width, ok := widths[w.text]; ok {
			p.add(Constraint{Kind: KindSize, Start: u.start, End: w.end, Size: &Size{System: "shoe", Value: q.num.decimal, Width: width},
				Evidence: "shoe size with its width"})
			return 1
		}
	}
	// "16gb ram", "512gb ssd" on a laptop: the memory and the storage,
	// the part's name part of the span.
	if q.hasUnit && q.unit.Quantity == units.Data && k+1 < len(p.units) && p.units[k+1].feature && p.units[k+1].chosen != nil {
		if dim := dataParts[p.units[k+1].chosen.Name]; dim != "" {
			c := p.measure(u.start, p.units[k+1].end, q, dim, nil, nil, q.unit)
			c.Evidence = "an amount of data before \"" + p.units[k+1].text + "\": the " + dim
			p.add(c)
			return 1
		}
	}
	if q.hasUnit && p.isTrousers() && (q.unit.Symbol == "w" || q.unit.Symbol == "l") && q.num.integer {
		return p.waistInseam(k, q)
	}
	if n := p.spelledSize(k); n >= 0 {
		return n
	}
	// "7 in 1", "4 in 1": a count of functions, not inches.
	if q.hasUnit && q.unit.Symbol == "in" && strings.HasSuffix(strings.ToLower(p.q[u.start:u.end]), " in") && k+1 < len(p.units) &&
		p.units[k+1].kind == uItem && p.bareNumber(&p.units[k+1]) && p.units[k+1].item.Value.From.Dims.Parts[0].Num.Whole == "1" {
		v := &p.units[k+1]
		name := strings.ToLower(p.q[u.start:v.end])
		p.add(Constraint{Kind: KindKeyword, Start: u.start, End: v.end, Name: name, Evidence: "\"N in 1\" names a combination, not inches"})
		return 1
	}
	// A bra size: a band in inches and a cup, "34b", "36dd" (common
	// practice), on a bra, stuck or spaced. The A cup is read as the
	// ampere's symbol, so "32a" comes as 32 amperes: on a bra it is the
	// band and cup too.
	if p.headUnder("bra") && q.num.integer && q.num.value >= 28 && q.num.value <= 52 {
		if w != nil && !q.hasUnit && braCups[w.text] {
			p.add(Constraint{Kind: KindSize, Start: u.start, End: w.end, Size: &Size{System: "bra", Value: q.num.decimal + w.text},
				Evidence: "band and cup: a bra size"})
			return 1
		}
		if q.hasUnit && q.unit.Quantity == units.Current && strings.EqualFold(strings.ReplaceAll(p.q[u.start:u.end], " ", ""), q.num.decimal+"a") {
			p.add(Constraint{Kind: KindSize, Start: u.start, End: u.end, Size: &Size{System: "bra", Value: q.num.decimal + "a"},
				Evidence: "band and cup: a bra size, not amperes"})
			return 0
		}
	}
	// Gold's purity in karats on jewellery: "14k", "18kt", "10 karat"
	// (common practice; the fineness of 24 parts), a firm phrase in the
	// product's words, written as titles write it.
	if w != nil && !q.hasUnit && q.num.integer && karats[q.num.decimal] && (w.text == "karat" || !spaced && (w.text == "k" || w.text == "kt")) && p.headUnder("jewelry") {
		p.add(Constraint{Kind: KindKeyword, Start: u.start, End: w.end, Name: q.num.decimal + "k", Strictness: Firm,
			Evidence: "gold's purity in karats, matched in the product's words"})
		return 1
	}
	// A lamp's colour temperature: "2700k", "5000 k". Lamps are sold
	// from about 1800 K to 6500 K (common practice), so a number of 1000
	// to 10000 before a k is kelvin, on a product that has a colour
	// temperature or with no product type; "4k" and "14k" are not.
	if w != nil && w.text == "k" && !q.hasUnit && q.num.integer && q.num.value >= 1000 && q.num.value <= 10000 && p.lit() {
		return p.wordMeasure(u.start, w.end, q, "kelvin", "", "k after a number of 1000 to 10000: a colour temperature in kelvin")
	}
	// "3 way", "3-way", "4 way": a switch or a lamp that works from
	// three or four places or levels (common practice), a firm phrase in
	// the product's words, not a number and a stray word.
	if way, used := p.wayAfter(k); way != nil && !q.hasUnit && (q.num.decimal == "3" || q.num.decimal == "4") {
		p.add(Constraint{Kind: KindKeyword, Start: u.start, End: way.end, Name: q.num.decimal + "-way", Strictness: Firm,
			Evidence: "a switch's or a lamp's ways, matched in the product's words"})
		return used
	}
	// A display or video resolution: "4k", "1080p", on electronics and
	// cameras or with no product type (common practice), a firm phrase
	// in the product's words: a 4K screen is not a 1080p one.
	if w != nil && !spaced && !q.hasUnit && resolutions[q.num.decimal+w.text] &&
		(p.head == nil || p.category == "electronics" || p.category == "camera") {
		p.add(Constraint{Kind: KindKeyword, Start: u.start, End: w.end, Name: q.num.decimal + w.text, Strictness: Firm,
			Evidence: "a display or video resolution, matched in the product's words"})
		return 1
	}
	// A number stuck to a word that is no unit: "1080p", "4k".
	if w != nil && !spaced && !q.hasUnit {
		name := strings.ToLower(p.q[u.start:w.end])
		p.add(Constraint{Kind: KindKeyword, Start: u.start, End: w.end, Name: name, Evidence: "a number with a unit whittle does not know"})
		p.res.Unrecognised = append(p.res.Unrecognised, name)
		return 1
	}
	if q.hasUnit {
		if c, ok := p.unitAsSize(u, q); ok {
			p.add(c)
			return 0
		}
		if q.unit.Symbol == "v" && (p.category == "batteries" || p.head == nil) {
			if d, ok := spec.BatterySize(q.num.decimal + "v"); ok {
				p.add(specConstraint(u.start, u.end, d, "battery size"))
				return 0
			}
		}
		p.add(p.measure(u.start, u.end, q, q.label, nil, nil, q.unit))
		return 0
	}
	p.bare(u.start, u.end, q)
	return 0
}

// wayAfter is the word "way" after the number at unit k, spaced or after
// a dash ("3 way", "3-way"), and the units it takes; nil when there is
// none.
func (p *tagger) wayAfter(k int) (*unit, int) {
	if w, _ := p.nextWord(k); w != nil && w.text == "way" {
		return w, 1
	}
	if k+2 < len(p.units) && p.units[k+1].kind == uSym && p.units[k+1].tok.Value == "-" && !p.units[k+1].spaceBefore &&
		p.units[k+2].kind == uWord && p.units[k+2].text == "way" && !p.units[k+2].spaceBefore {
		return &p.units[k+2], 2
	}
	return nil, 0
}

// wordMeasure tags q, a number and the word after it, [start, end), as a
// measure in the unit of symbol sym and of dimension dim (or the one its
// range finds, for ""), with evidence. It returns 1, the word used.
func (p *tagger) wordMeasure(start, end int, q quantity, sym, dim, evidence string) int {
	q.unit, q.hasUnit = mustUnit(sym), true
	c := p.measure(start, end, q, dim, nil, nil, q.unit)
	c.Evidence = evidence
	p.add(c)
	return 1
}

// lit reports whether the query's product gives light, with a colour
// temperature slot, or the query names no product type.
func (p *tagger) lit() bool {
	if p.head == nil {
		return true
	}
	_, ok := p.slotFor(units.ColourTemperature, 0)
	return ok
}

// lightColours are the names lamps' whites are sold under, as ranges of
// colour temperature in kelvin: soft and warm white 2700 to 3000 K,
// bright and cool white 3500 to 4100 K, daylight 5000 to 6500 K (common
// practice in the trade's packaging, from memory; the nominal values
// 2700, 3000, 3500, 4000, 5000 and 6500 K are those of ANSI C78.377,
// also from memory).
var lightColours = map[string][2]float64{
	"soft white": {2700, 3000}, "warm white": {2700, 3000}, "bright white": {3500, 4100},
	"cool white": {3500, 4100}, "daylight": {5000, 6500},
}

// lightColour reads a white a lamp is sold under ("warm white",
// "daylight") as the range of colour temperature it names, on a product
// with a colour temperature slot; elsewhere "soft white" is a colour.
// It returns the extra units used, or -1.
func (p *tagger) lightColour(k int) int {
	if p.head == nil || !p.lit() {
		return -1
	}
	u := &p.units[k]
	for n := 1; n >= 0; n-- {
		if k+n >= len(p.units) || p.units[k+n].kind != uWord {
			continue
		}
		name := u.text
		if n == 1 {
			name += " " + p.units[k+1].text
		}
		r, ok := lightColours[name]
		if !ok {
			continue
		}
		kelvin := mustUnit("kelvin")
		c := p.measure(u.start, p.units[k+n].end, quantity{}, "", &r[0], &r[1], kelvin)
		c.Evidence = fmt.Sprintf("%q on a lamp: a colour temperature of %g to %g K", name, r[0], r[1])
		p.add(c)
		return n
	}
	return -1
}

// waistInseam reads "32w 30l" (or "32w" or "30l" alone) on trousers.
func (p *tagger) waistInseam(k int, q quantity) int {
	u := &p.units[k]
	if q.unit.Symbol == "w" && k+1 < len(p.units) && p.units[k+1].kind == uItem && p.bareOrUnit(&p.units[k+1], "l") {
		v := &p.units[k+1]
		inseam := v.item.Value.From.Dims.Parts[0].Num.Whole
		p.add(Constraint{Kind: KindSize, Start: u.start, End: v.end, Size: &Size{System: "waist_inseam", Value: q.num.decimal + "x" + inseam},
			Evidence: "waist (w) and inseam (l) on " + p.head.Name})
		return 1
	}
	sys := map[string]string{"w": "waist", "l": "inseam"}[q.unit.Symbol]
	p.add(Constraint{Kind: KindSize, Start: u.start, End: u.end, Size: &Size{System: sys, Value: q.num.decimal},
		Evidence: sys + " on " + p.head.Name})
	return 0
}

// fractionStyles are the styles clothes name by a fraction and a word
// (common practice): "1/2 zip" is a half zip, "3/4 sleeve" three quarter
// sleeves.
var fractionStyles = map[string]string{"1/2 zip": "half zip", "1/4 zip": "quarter zip", "3/4 sleeve": "three quarter sleeve",
	"3/4 sleeves": "three quarter sleeve", "3/4 length": "cropped", "7/8 length": "cropped"}

// apparelFraction reads a fraction on clothes, which is never a size of
// less than one: a style with the word after it ("1/2 zip", "3/4
// sleeve"), a pair of sizes ("32/34" on jeans is the waist by the
// inseam; "34/35" on a shirt its sleeve), or a shirt's neck and sleeve
// ("16 34/35"). It returns the extra units used, and whether it read one.
func (p *tagger) apparelFraction(k int, q quantity) (int, bool) {
	u := &p.units[k]
	if !p.apparel() || q.hasUnit || !q.num.fraction || u.item.Value == nil || u.item.Value.From.Dims == nil {
		return 0, false
	}
	n := u.item.Value.From.Dims.Parts[0].Num
	f := n.Only
	if f == nil {
		f = n.Frac
	}
	if f == nil || f.Vulgar != "" {
		return 0, false
	}
	if w, _ := p.nextWord(k); w != nil && n.Only != nil {
		if style, ok := fractionStyles[f.Num+"/"+f.Den+" "+w.text]; ok {
			p.add(Constraint{Kind: KindSilhouette, Start: u.start, End: w.end, Name: style, Evidence: "a fraction and a word that name a style"})
			return 1, true
		}
	}
	a, err1 := strconv.Atoi(f.Num)
	b, err2 := strconv.Atoi(f.Den)
	if err1 != nil || err2 != nil || a < 10 || b < 10 {
		return 0, false
	}
	size := &Size{System: "numeric", Value: f.Num + "/" + f.Den}
	evidence := "two sizes written as a fraction, not a size below one"
	switch {
	case n.Only != nil && p.isTrousers():
		size = &Size{System: "waist_inseam", Value: f.Num + "x" + f.Den}
		evidence = "waist over inseam on " + p.head.Name
	case n.Only == nil:
		size.Value = n.Whole + " " + size.Value
		evidence = "a neck size and a sleeve, as shirts are sized"
	}
	p.add(Constraint{Kind: KindSize, Start: u.start, End: u.end, Size: size, Evidence: evidence})
	return 0, true
}

// wheelFit reads what a wheel and its lug nuts must have to fit the
// car, written as two numbers by an x: a wheel's bolt pattern, "5x114.3"
// (the lugs, 3 to 10, on a pitch circle of 98 to 210 mm; common
// practice), a hard phrase in the product's words; and a lug nut's or a
// wheel stud's metric thread, "12x1.5" (ISO 261), a hard designation.
// Neither is ever widened: a wheel that does not fit can come off. It
// reports whether it read one.
func (p *tagger) wheelFit(k int) bool {
	u := &p.units[k]
	n := p.bareParts(u)
	if len(n) != 2 || n[0].fraction || n[1].fraction {
		return false
	}
	switch {
	case (p.headUnder("wheel") || p.headUnder("wheel spacer")) && n[0].integer && n[0].value >= 3 && n[0].value <= 10 && n[1].value >= 98 && n[1].value <= 210:
		p.add(Constraint{Kind: KindKeyword, Start: u.start, End: u.end, Name: n[0].decimal + "x" + n[1].decimal, Strictness: Hard,
			Evidence: "a wheel's bolt pattern, lugs by pitch circle in mm, matched in the product's words; never dropped"})
		return true
	case p.headUnder("lug nut") || p.headUnder("wheel stud"):
		d, err := spec.MetricThreadSize(n[0].value, n[1].value)
		if err != nil {
			return false
		}
		p.add(specConstraint(u.start, u.end, d, "a lug nut's thread, diameter by pitch in mm"))
		return true
	}
	return false
}

// halfNeck reads a shirt's neck in half inches and its sleeve, "15.5
// 34/35", on clothes: the grammar takes it for a mixed number with a
// decimal whole, an error anywhere else ("2.5 1/2 in"). Necks run from
// 13 to 20 inches in halves and sleeves are two-figure inches (common
// practice). It reports whether it read one.
func (p *tagger) halfNeck(k int) bool {
	u := &p.units[k]
	v := u.item.Value
	if !p.apparel() || v.To != nil || v.From.Dims == nil || len(v.From.Dims.Parts) != 1 {
		return false
	}
	q := v.From.Dims.Parts[0]
	n := q.Num
	if q.Mark != "" || q.Unit != "" || q.Currency != "" || q.Label != "" || n.Frac == nil || n.Frac.Vulgar != "" {
		return false
	}
	whole, half, ok := strings.Cut(n.Whole, ".")
	neck, err := strconv.Atoi(whole)
	if !ok || half != "5" || err != nil || neck < 13 || neck > 20 {
		return false
	}
	a, err1 := strconv.Atoi(n.Frac.Num)
	b, err2 := strconv.Atoi(n.Frac.Den)
	if err1 != nil || err2 != nil || a < 10 || a > 99 || b < 10 || b > 99 {
		return false
	}
	p.add(Constraint{Kind: KindSize, Start: u.start, End: u.end, Size: &Size{System: "numeric", Value: n.Whole + " " + n.Frac.Num + "/" + n.Frac.Den},
		Evidence: "a neck size in half inches and a sleeve, as shirts are sized"})
	return true
}

// trouserWords name a trouser size's two measures, spelt: the waist and
// the inseam, which shops also call the length or the leg.
var trouserWords = map[string]string{"waist": "waist", "length": "inseam", "inseam": "inseam", "leg": "inseam", "long": "inseam"}

// spelledGarments are the sizes of two measures that shoppers spell out,
// by the garment they size: a trouser's waist and inseam (which shops
// also call the length or the leg), a shirt's neck and sleeve. Each
// names the words of its measures, the first measure's name, and how
// the two are written together.
var spelledGarments = []struct {
	on    func(p *tagger) bool
	words map[string]string
	first string
	pair  func(first, second string) *Size
	noun  string
}{
	{func(p *tagger) bool { return p.isTrousers() }, trouserWords, "waist",
		func(a, b string) *Size { return &Size{System: "waist_inseam", Value: a + "x" + b} }, "waist and inseam"},
	{func(p *tagger) bool { return p.headUnder("shirt") }, map[string]string{"neck": "neck", "collar": "neck", "sleeve": "sleeve"}, "neck",
		func(a, b string) *Size { return &Size{System: "numeric", Value: a + " " + b} }, "neck and sleeve"},
}

// spelledSize reads a two-measure size spelt out, the number
// before its word or after it: "30 waist 32 length" and "waist 30 inseam
// 32" on trousers, "neck 16 sleeve 34" on a shirt; one alone ("32
// waist") is that measure. Both give the size as its garment writes it,
// 30x32, "16 34". k is the unit of the first number or word. It returns
// the extra units used, or -1.
func (p *tagger) spelledSize(k int) int {
	for _, g := range spelledGarments {
		if g.on(p) {
			return p.spelledPair(k, g.words, g.first, g.pair, g.noun)
		}
	}
	return -1
}

// spelledPair is spelledSize for one garment: its measures' words, the
// first measure's name, how the two are written together, and the noun
// for the evidence.
func (p *tagger) spelledPair(k int, words map[string]string, first string, pair func(a, b string) *Size, noun string) int {
	// one reads a number and its word at i, in either order.
	one := func(i int) (string, string, int, bool) {
		if i+1 >= len(p.units) {
			return "", "", 0, false
		}
		a, b := &p.units[i], &p.units[i+1]
		num, word := a, b
		if a.kind == uWord {
			num, word = b, a
		}
		if word.kind != uWord || word.entries != nil || words[word.text] == "" || num.kind != uItem {
			return "", "", 0, false
		}
		ns := p.bareParts(num)
		if len(ns) != 1 {
			ns = p.inchParts(num) // "9 inch inseam"
		}
		if len(ns) != 1 || ns[0].fraction {
			return "", "", 0, false
		}
		return words[word.text], ns[0].decimal, p.units[i+1].end, true
	}
	what, n, end, ok := one(k)
	if !ok {
		return -1
	}
	if what2, n2, end2, ok := one(k + 2); ok && what2 != what {
		if what != first {
			n, n2 = n2, n
		}
		p.add(Constraint{Kind: KindSize, Start: p.units[k].start, End: end2, Size: pair(n, n2),
			Evidence: noun + " spelt out on " + p.head.Name})
		return 3
	}
	p.add(Constraint{Kind: KindSize, Start: p.units[k].start, End: end, Size: &Size{System: what, Value: n},
		Evidence: what + " spelt out on " + p.head.Name})
	return 1
}

// inchParts is the number of unit v when it is one amount in inches
// ("9 inch", `30"`), as a garment's measures are written; else nil.
func (p *tagger) inchParts(v *unit) []number {
	it := v.item
	if it.Value == nil || it.Value.To != nil || it.Value.Post != "" || it.Value.From.Dims == nil || len(it.Value.From.Dims.Parts) != 1 {
		return nil
	}
	q := it.Value.From.Dims.Parts[0]
	if u, ok := units.Lookup(q.Unit, p.opts.Volume); !(q.Mark == `"` || ok && u.Symbol == "in") || q.Currency != "" {
		return nil
	}
	n, err := parseNum(q.Num)
	if err != nil {
		return nil
	}
	return []number{n}
}

// bareOrUnit reports whether unit v is one whole number with unit sym.
func (p *tagger) bareOrUnit(v *unit, sym string) bool {
	it := v.item
	if it.Value == nil || it.Value.To != nil || it.Value.Post != "" || it.Value.From.Dims == nil || len(it.Value.From.Dims.Parts) != 1 {
		return false
	}
	q := it.Value.From.Dims.Parts[0]
	return q.Unit == sym && q.Num.Whole != "" && q.Num.Frac == nil && !strings.ContainsAny(q.Num.Whole, ".,")
}

// unitAsSize reads "8w" on footwear and apparel as a size.
func (p *tagger) unitAsSize(u *unit, q quantity) (Constraint, bool) {
	if !p.apparel() || q.unit.Symbol != "w" || u.end-u.start > len(q.num.decimal)+1 {
		return Constraint{}, false
	}
	c := Constraint{Kind: KindSize, Start: u.start, End: u.end, Evidence: "number with w in " + p.category}
	if p.category == "footwear" {
		c.Size = &Size{System: "shoe", Value: q.num.decimal, Width: "wide"}
	} else {
		c.Size = &Size{System: "numeric", Value: q.num.decimal + "w"}
	}
	return c, true
}

// The largest bare numbers read as sizes (common practice, from memory):
// shoe sizes run to about 50 (EU; US and UK to 16), numeric clothing
// sizes to about 60 (EU dress sizes to 54, waists in inches to 60).
const (
	maxShoeSize    = 50
	maxApparelSize = 60
)

// bare tags a number written without a unit.
func (p *tagger) bare(start, end int, q quantity) {
	// "18650 rechargeable": a lithium-ion cell's size, its diameter and
	// length in mm run together (18 by 65.0; common practice), which a
	// charger or a torch must take: a hard phrase in the product's words.
	if cellSizes[q.num.decimal] && (p.head == nil || p.category == "batteries" || p.category == "electronics" || p.category == "electrical") {
		p.add(Constraint{Kind: KindKeyword, Start: start, End: end, Name: q.num.decimal, Strictness: Hard,
			Evidence: "a lithium-ion cell size, its diameter and length in mm, matched in the product's words"})
		return
	}
	// "50mm 1.8 lens", "70-300 4.5": a lens's widest aperture, written
	// bare after its focal length, though a lens's focal length slot
	// may hold it too.
	if apertures[q.num.decimal] && (p.headUnder("lens") || p.head == nil) && p.afterMillimetres() {
		p.aperture(start, end, q.num.decimal)
		return
	}
	slots := p.lex.SlotsOf(p.head)
	for _, s := range slots {
		if s.Holds(q.num.value) {
			c := p.measure(start, end, q, s.Dimension, nil, nil, s.Unit)
			c.Inferred = true
			c.Evidence = fmt.Sprintf("unit %s from product type %s (%s %s)", s.Unit, p.head.Name, s.Dimension, rangeText(s))
			p.markByRange(end)
			p.add(c)
			return
		}
	}
	// "lens 1.8": on a lens, a number no slot holds that is an aperture.
	if apertures[q.num.decimal] && p.headUnder("lens") {
		p.aperture(start, end, q.num.decimal)
		return
	}
	// "leather belt 34", "silver ring 7": belts are sized by the waist in
	// inches, rings by the US ring scale, each written bare (common
	// practice, ranges from memory).
	for _, b := range bareSized {
		if p.headUnder(b.head) && q.num.value >= b.min && q.num.value <= b.max {
			p.add(Constraint{Kind: KindSize, Start: start, End: end, Size: &Size{System: b.system, Value: q.num.decimal},
				Evidence: "a bare number on a " + b.head + " reads as its size"})
			return
		}
	}
	if p.apparel() {
		sys, most := "numeric", float64(maxApparelSize)
		if p.category == "footwear" {
			sys, most = "shoe", maxShoeSize
		}
		if q.num.value > most {
			// "501 jeans", "pelloran 90 sneakers": a model number, read
			// as a word of the product's, not a size no shop carries.
			p.add(Constraint{Kind: KindKeyword, Start: start, End: end, Name: q.num.decimal,
				Evidence: fmt.Sprintf("a bare number above %g, the largest %s size, reads as a word (a model number)", most, sys)})
			return
		}
		p.add(Constraint{Kind: KindSize, Start: start, End: end, Size: &Size{System: sys, Value: q.num.decimal},
			Evidence: "a bare number in " + p.category + " reads as a size"})
		return
	}
	c := Constraint{Kind: KindMeasure, Start: start, End: end, Measure: &Measure{Dimension: "number", Amount: ptr(q.num.value)}}
	switch {
	case p.head == nil:
		c.Evidence = "unitless: no product type to take a unit from"
	case len(slots) == 0:
		c.Evidence = fmt.Sprintf("unitless: product type %s has no measure slots", p.head.Name)
	default:
		c.Evidence = fmt.Sprintf("unitless: no measure slot of %s holds %s", p.head.Name, q.num.decimal)
	}
	p.add(c)
}

// cellSizes are the cylindrical lithium-ion cells sold by size (common
// practice).
var cellSizes = map[string]bool{"10440": true, "14500": true, "16340": true, "18350": true, "18650": true, "20700": true, "21700": true, "26650": true, "32650": true}

// namedDimensions are the words that, after a number, name the
// dimension it measures: the dimension, what it is (for the evidence),
// the unit a number of no unit is read in, and the amounts it takes.
var namedDimensions = map[string]struct {
	dimension, what, unit string
	holds                 func(amount float64) bool // in unit; nil for any
	// anywhere is set for a word that names the dimension on any
	// product, with a unit typed: "300 lb capacity" on a chair.
	anywhere bool
}{
	"drive":    {"drive_size", "the square drive", "in", func(v float64) bool { return driveSizes[v] }, false},
	"nap":      {"nap", "the depth of a roller's pile", "in", nil, false},
	"cca":      {"cold_cranking_amps", "a battery's cold cranking amps", "a", nil, false},
	"capacity": {"load_rating", "the load it is rated to carry", "lb", nil, true},
}

// namedMeasure tags q and the word after it at unit k as the measure the
// word names (namedDimensions), in its unit when no unit is typed, on a
// product with a slot of that dimension; a drive also on no product
// type, and a capacity, with its unit typed, on any. It returns the
// extra units used, or 0.
func (p *tagger) namedMeasure(k int, q quantity) int {
	w, _ := p.nextWord(k)
	if w == nil {
		return 0
	}
	end, used := w.end, 1
	if (w.text == "weight" || w.text == "load") && k+2 < len(p.units) && p.units[k+2].kind == uWord && p.units[k+2].text == "capacity" {
		w, end, used = &p.units[k+2], p.units[k+2].end, 2 // "300 lb weight capacity"
	}
	named, ok := namedDimensions[w.text]
	if !ok || named.anywhere && !q.hasUnit {
		return 0
	}
	in := mustUnit(named.unit)
	if q.hasUnit && q.unit.Quantity != in.Quantity {
		return 0
	}
	amount := q.num.value
	if q.hasUnit {
		amount = q.num.value * q.unit.ToBase / in.ToBase
	}
	if named.holds != nil && !named.holds(amount) {
		return 0
	}
	if !named.anywhere && !(p.head == nil && named.dimension == "drive_size") && !p.hasSlot(named.dimension) {
		return 0
	}
	sym := named.unit
	if q.hasUnit {
		sym = q.unit.Symbol
	}
	p.wordMeasure(p.units[k].start, end, q, sym, named.dimension, fmt.Sprintf("a number before %q: %s", w.text, named.what))
	return used
}

// npk matches a fertilizer's grade, the shares of nitrogen, phosphate
// and potash: "10-10-10", "20-5-10" (common practice).
var npk = regexp.MustCompile(`^\d{1,2}-\d{1,2}-\d{1,2}\b`)

// fertilizerGrade reads a fertilizer's grade at unit k ("fertilizer
// 10-10-10") as a firm phrase in the product's words, where its numbers
// were a range and a second number, weights in the fertilizer's slot.
// It returns the extra units used, and whether it read one.
func (p *tagger) fertilizerGrade(k int) (int, bool) {
	if !p.headUnder("fertilizer") {
		return 0, false
	}
	u := &p.units[k]
	m := npk.FindString(p.q[u.start:])
	if m == "" {
		return 0, false
	}
	end, last := u.start+len(m), k
	for last+1 < len(p.units) && p.units[last+1].start < end {
		last++
	}
	if p.units[last].end != end {
		return 0, false
	}
	p.add(Constraint{Kind: KindKeyword, Start: u.start, End: end, Name: m, Strictness: Firm,
		Evidence: "a fertilizer's grade, its shares of nitrogen, phosphate and potash, matched in the product's words"})
	return last - k, true
}

// versionStandard is the standard whose versions the head product type
// is sold by, "hdmi" for an hdmi cable or switch and "usb" for a usb cable,
// drive or hub; "" for any other.
func (p *tagger) versionStandard() string {
	switch {
	case p.headUnder("hdmi cable"), p.headUnder("hdmi switch"):
		return "hdmi"
	case p.headUnder("usb cable"), p.headUnder("usb drive"), p.headUnder("usb hub"):
		return "usb"
	}
	return ""
}

// dimensionWords are the words after a length that name what it
// measures: "30 inch wide", "72 in tall", "48 in long", "18 in deep".
var dimensionWords = map[string]string{
	"wide": "width", "width": "width", "long": "length", "length": "length",
	"tall": "height", "high": "height", "height": "height", "deep": "depth", "depth": "depth",
}

// dimensionWord reads a length and the word after it that names its
// dimension ("bookcase 72 inch tall"): the measure of that dimension,
// where the word was a stray one and the length took the first slot its
// range holds, a width. A bare number takes the unit of the head's slot
// of that dimension ("bookcase 72 tall"), and is read so only when there
// is one. Not on clothes, whose "32 long" is an inseam or a suit's
// length. It returns the extra units used, or 0.
func (p *tagger) dimensionWord(k int, q quantity) int {
	w, spaced := p.nextWord(k)
	if w == nil || !spaced || w.entries != nil && !fillerOnly(w) || p.apparel() {
		return 0
	}
	dim, ok := dimensionWords[w.text]
	if !ok {
		return 0
	}
	if dim == "length" && !p.hasSlot("length") && p.hasSlot("width") {
		dim = "width" // a desk's long side is its width, and it has no length
	}
	u := &p.units[k]
	if q.hasUnit {
		if q.unit.Quantity != units.Length {
			return 0
		}
		c := p.measure(u.start, w.end, q, dim, nil, nil, q.unit)
		c.Evidence = fmt.Sprintf("unit as typed; %q names the %s", w.text, dim)
		p.add(c)
		return 1
	}
	for _, sl := range p.lex.SlotsOf(p.head) {
		if sl.Dimension == dim && sl.Quantity == units.Length {
			c := p.measure(u.start, w.end, quantity{num: q.num, unit: sl.Unit, hasUnit: true}, dim, nil, nil, sl.Unit)
			c.Inferred = true
			c.Evidence = fmt.Sprintf("unit %s from product type %s's %s; %q names it", sl.Unit.Symbol, p.head.Name, dim, w.text)
			p.add(c)
			return 1
		}
	}
	return 0
}

// hasSlot reports whether the head product type has a slot of
// dimension dim.
func (p *tagger) hasSlot(dim string) bool {
	return slices.ContainsFunc(p.lex.SlotsOf(p.head), func(s lexicon.Slot) bool { return s.Dimension == dim })
}

// tailored reports whether the head is sized by chest and length, as
// suits are: a suit, a blazer, a peacoat or an overcoat (common
// practice in menswear).
func (p *tagger) tailored() bool {
	return p.headUnder("suit") || p.headUnder("blazer") || p.headUnder("peacoat") || p.headUnder("overcoat")
}

// suitSize reads a suit's chest and length, "42r", "40l", "38 short", on
// suits and their jackets (common practice: the chest in inches, then
// short, regular or long), and on coats tailored like them (tailored).
// The L and the S come as litres and seconds.
// It returns the extra units used, and whether it read one.
func (p *tagger) suitSize(k int, q quantity) (int, bool) {
	if !q.num.integer || q.num.value < 32 || q.num.value > 62 || !p.tailored() {
		return 0, false
	}
	u := &p.units[k]
	letter, end, used := "", u.end, 0
	if w, _ := p.nextWord(k); w != nil && !q.hasUnit && suitLengths[w.text] != "" {
		letter, end, used = suitLengths[w.text], w.end, 1
	} else if q.hasUnit && (q.unit.Symbol == "l" || q.unit.Symbol == "s") {
		letter = q.unit.Symbol
	}
	if letter == "" {
		return 0, false
	}
	p.add(Constraint{Kind: KindSize, Start: u.start, End: end, Size: &Size{System: "suit", Value: q.num.decimal + letter},
		Evidence: "a suit's chest and length"})
	return used, true
}

// pennyInches are the lengths in inches of nails by penny size (common
// practice in the trade, from memory).
var pennyInches = map[string]float64{"2": 1, "3": 1.25, "4": 1.5, "5": 1.75, "6": 2, "7": 2.25, "8": 2.5, "9": 2.75,
	"10": 3, "12": 3.25, "16": 3.5, "20": 4, "30": 4.5, "40": 5, "50": 5.5, "60": 6}

// resolutions are the display and video resolutions products are sold
// by (common practice).
var resolutions = map[string]bool{"480p": true, "720p": true, "1080p": true, "1080i": true, "1440p": true, "2160p": true,
	"4k": true, "5k": true, "8k": true}

// percent reads a number before a percent sign at unit k: before "off"
// a discount ("50% off"), filler; before a material ("100% cotton") the
// share of it, filler too, since the material is asked for anyway; else
// a percentage in the product's words ("75% keyboard"). It returns the extra units used, or 0 when no percent
// sign follows.
func (p *tagger) percent(k int, q quantity) int {
	if k+1 >= len(p.units) || p.units[k+1].kind != uSym || p.units[k+1].tok.Value != "%" || q.hasUnit {
		return 0
	}
	u, sign := &p.units[k], &p.units[k+1]
	if k+2 < len(p.units) && p.units[k+2].kind == uWord && p.units[k+2].text == "off" {
		p.add(Constraint{Kind: KindFiller, Start: u.start, End: p.units[k+2].end, Strictness: Filler,
			Evidence: "a discount, which no product's words hold"})
		return 2
	}
	if k+2 < len(p.units) && p.units[k+2].chosen != nil && p.units[k+2].chosen.Kind == lexicon.Material {
		p.add(Constraint{Kind: KindFiller, Start: u.start, End: sign.end, Strictness: Filler, Evidence: "the share of the material after it"})
		return 1
	}
	p.add(Constraint{Kind: KindKeyword, Start: u.start, End: sign.end, Name: strings.ToLower(p.q[u.start:sign.end]),
		Evidence: "a percentage, matched in the product's words"})
	return 1
}

// suitLengths are the letters of a suit's length after its chest size:
// short, regular, long (common practice).
var suitLengths = map[string]string{"s": "s", "r": "r", "l": "l", "short": "s", "regular": "r", "reg": "r", "long": "l"}

// driveSizes are the square drives of sockets and their handles, in
// inches (common practice; ASME B107 and ISO 1174 from memory).
var driveSizes = map[float64]bool{0.25: true, 0.375: true, 0.5: true, 0.75: true, 1: true}

// karats are the gold purities jewellery is sold in (common practice).
var karats = map[string]bool{"9": true, "10": true, "14": true, "18": true, "22": true, "24": true}

// bareSized are the accessories a bare number sizes, with the size
// system and the sizes they come in.
var bareSized = []struct {
	head, system string
	min, max     float64
}{{"belt", "belt", 20, 60}, {"ring", "ring", 1, 16}}

// apertures are the widest apertures lenses are sold by that are not
// whole numbers (common practice: the f-number scale in steps of a third
// of a stop, as lens names write it); a whole number after a focal
// length is too often something else to read as one.
var apertures = map[string]bool{"0.95": true, "1.2": true, "1.4": true, "1.7": true, "1.8": true, "2.5": true, "2.8": true, "3.5": true, "4.5": true, "5.6": true, "6.3": true}

// afterMillimetres reports whether the constraint tagged last is a
// measure in millimetres: a focal length, when no product type says so.
func (p *tagger) afterMillimetres() bool {
	cs := p.res.Constraints
	if len(cs) == 0 {
		return false
	}
	c := cs[len(cs)-1]
	return c.Kind == KindMeasure && c.Measure != nil && c.Measure.Unit == "mm"
}

func rangeText(s lexicon.Slot) string {
	return strconv.FormatFloat(s.Min, 'f', -1, 64) + ".." + strconv.FormatFloat(s.Max, 'f', -1, 64)
}

func ptr[T any](v T) *T { return &v }

// tidy rounds a computed amount to 12 significant digits, so that binary
// noise (24 in = 609.5999999999999 mm) does not reach the output.
func tidy(x float64) float64 {
	v, err := strconv.ParseFloat(strconv.FormatFloat(x, 'g', 12, 64), 64)
	if err != nil {
		return x
	}
	return v
}

// slotFor names the dimension of a quantity with a unit.
func (p *tagger) slotFor(q units.Quantity, nth int) (lexicon.Slot, bool) {
	seen := 0
	for _, s := range p.lex.SlotsOf(p.head) {
		if s.Quantity == q {
			if seen == nth {
				return s, true
			}
			seen++
		}
	}
	return lexicon.Slot{}, false
}

// dimensionFor names what amount (in unit u) measures: the first slot of
// the head product type, of the same quantity, whose range holds it; else
// the first slot of that quantity; else the quantity's own name.
func (p *tagger) dimensionFor(u units.Unit, amount float64) string {
	first := ""
	for _, s := range p.lex.SlotsOf(p.head) {
		if s.Quantity != u.Quantity {
			continue
		}
		if first == "" {
			first = s.Dimension
		}
		if v, err := units.Convert(amount, u, s.Unit); err == nil && s.Holds(v) {
			return s.Dimension
		}
	}
	if first != "" {
		return first
	}
	return string(u.Quantity)
}

var labels = map[string]string{"w": "width", "h": "height", "d": "depth", "l": "length"}

// measure builds a measure constraint: a point (min and max nil) or a
// range, in unit u. dim may be a label letter, a dimension name or "".
func (p *tagger) measure(start, end int, q quantity, dim string, min, max *float64, u units.Unit) Constraint {
	if l, ok := labels[dim]; ok {
		dim = l
	}
	if dim == "" {
		v := q.num.value
		if min != nil {
			v = *min
		} else if max != nil {
			v = *max
		}
		dim = p.dimensionFor(u, v)
		p.markByRange(end)
	}
	m := &Measure{Dimension: dim, Quantity: string(u.Quantity), Unit: u.String(), BaseUnit: mustUnit(units.Base(u.Quantity)).String()}
	evidence := "unit as typed"
	if q.fluid {
		evidence = fmt.Sprintf("oz read as fluid ounces: a %s holds a volume and has no mass to weigh", p.head.Name)
	}
	if min == nil && max == nil {
		m.Amount, m.BaseAmount = ptr(q.num.value), ptr(tidy(q.num.value*u.ToBase))
	} else {
		if min != nil {
			m.Min, m.BaseMin = ptr(*min), ptr(tidy(*min*u.ToBase))
		}
		if max != nil {
			m.Max, m.BaseMax = ptr(*max), ptr(tidy(*max*u.ToBase))
		}
	}
	return Constraint{Kind: KindMeasure, Start: start, End: end, Measure: m, Evidence: evidence}
}

// price adds a price constraint with the given bounds.
func (p *tagger) price(start, end int, s single, min, max *number, evidence string) {
	pr := &Price{Currency: s.currency}
	for _, b := range []struct {
		n   *number
		dst **string
	}{{min, &pr.Min}, {max, &pr.Max}} {
		if b.n == nil {
			continue
		}
		amt, err := amountText(b.n.decimal, s.currency)
		if err != nil {
			p.errorf(b.n.start, b.n.end, "%v", err)
			return
		}
		*b.dst = &amt
	}
	p.add(Constraint{Kind: KindPrice, Start: start, End: end, Price: pr, Evidence: evidence})
}

// bound applies a comparison word to a single value.
// wordAfter is the text of the word after unit k, spaced, or "".
func (p *tagger) wordAfter(k int) string {
	if w, spaced := p.nextWord(k); w != nil && spaced {
		return w.text
	}
	return ""
}

// thousands multiplies s, a price or a bare number, by a thousand, and
// reports whether it was one.
func thousands(s *single) bool {
	n := &s.amount
	if !s.price {
		if len(s.parts) != 1 || s.parts[0].hasUnit || s.parts[0].currency != "" {
			return false
		}
		n = &s.parts[0].num
	}
	n.value *= 1000
	n.decimal = strconv.FormatFloat(n.value, 'f', -1, 64)
	n.integer = n.value == math.Trunc(n.value)
	return true
}

func (p *tagger) bound(start, end int, s single, op string) {
	isMin := minOps[op]
	if !isMin && !maxOps[op] {
		p.errorf(start, end, "unknown comparison %q", op)
		return
	}
	ev := fmt.Sprintf("%q sets a %s", op, map[bool]string{true: "floor", false: "ceiling"}[isMin])
	if s.price {
		if isMin {
			p.price(start, end, s, &s.amount, nil, ev)
		} else {
			p.price(start, end, s, nil, &s.amount, ev)
		}
		return
	}
	if len(s.parts) != 1 {
		p.errorf(start, end, "a comparison needs one value, not a dimension")
		return
	}
	q := s.parts[0]
	v := q.num.value
	var lo, hi *float64
	if isMin {
		lo = &v
	} else {
		hi = &v
	}
	// "dress under 50 pounds": pounds spelt out, on a product sold by no
	// weight, are pounds sterling.
	if q.hasUnit && q.unit.Symbol == "lb" && strings.Contains(strings.ToLower(p.q[q.start:q.end]), "pound") && p.head != nil {
		if _, weighed := p.slotFor(units.Mass, 0); !weighed {
			s.price, s.currency, s.amount = true, "GBP", q.num
			ev = join(ev, "pounds on a product sold by no weight: pounds sterling")
			if isMin {
				p.price(start, end, s, &s.amount, nil, ev)
			} else {
				p.price(start, end, s, nil, &s.amount, ev)
			}
			return
		}
	}
	if q.hasUnit {
		c := p.measure(start, end, q, q.label, lo, hi, q.unit)
		c.Evidence = ev
		p.add(c)
		return
	}
	for _, sl := range p.lex.SlotsOf(p.head) {
		if sl.Holds(v) {
			c := p.measure(start, end, q, sl.Dimension, lo, hi, sl.Unit)
			c.Inferred = true
			c.Evidence = join(ev, fmt.Sprintf("unit %s from product type %s", sl.Unit, p.head.Name))
			p.markByRange(end)
			p.add(c)
			return
		}
	}
	// A bound on a bare number with no slot is most often a price.
	cur := p.opts.Currency
	if cur == "" {
		cur = "USD"
	}
	s.price, s.currency, s.amount = true, cur, q.num
	if isMin {
		p.price(start, end, s, &s.amount, nil, join(ev, "bare number after a comparison read as a price"))
	} else {
		p.price(start, end, s, nil, &s.amount, join(ev, "bare number after a comparison read as a price"))
	}
	p.res.Constraints[len(p.res.Constraints)-1].Inferred = true
}

var (
	maxOps = map[string]bool{"under": true, "below": true, "max": true, "maximum": true, "upto": true, "up to": true,
		"less than": true, "fewer than": true, "at most": true, "no more than": true, "within": true, "<": true, "<=": true,
		"or less": true, "or under": true, "or below": true, "or fewer": true, "or lower": true, "or cheaper": true,
		"and under": true, "and below": true}
	minOps = map[string]bool{"over": true, "above": true, "min": true, "minimum": true, "more than": true, "greater than": true,
		"at least": true, "no less than": true, ">": true, ">=": true, "or more": true, "or over": true, "or above": true,
		"or higher": true, "and up": true, "and over": true, "and above": true, "+": true}
)

// rangeOf tags "20-30 mm", "$20 to $30", "between 2 and 3 tb".
func (p *tagger) rangeOf(start, end int, a, b single, how string) {
	if a.price || b.price {
		cur := a.currency
		if cur == "" {
			cur = b.currency
		}
		if a.price && b.price && a.currency != b.currency {
			p.errorf(start, end, "a price range in two currencies (%s, %s)", a.currency, b.currency)
			return
		}
		lo, hi := p.singleNumber(a), p.singleNumber(b)
		if lo == nil || hi == nil {
			p.errorf(start, end, "a price range needs one amount on each side")
			return
		}
		lo, hi = ordered(lo, hi)
		p.price(start, end, single{price: true, currency: cur}, lo, hi, how+" of prices")
		return
	}
	if len(a.parts) != 1 || len(b.parts) != 1 {
		p.errorf(start, end, "a range of dimensions is not supported; give one range per dimension")
		return
	}
	qa, qb := a.parts[0], b.parts[0]
	u, has := qb.unit, qb.hasUnit
	if !has {
		u, has = qa.unit, qa.hasUnit
	}
	lo, hi := qa.num.value, qb.num.value
	if qa.hasUnit && qb.hasUnit && qa.unit.Symbol != qb.unit.Symbol {
		if qa.unit.Quantity != qb.unit.Quantity {
			p.errorf(start, end, "range from %s to %s mixes quantities", qa.unit, qb.unit)
			return
		}
		lo = qa.num.value * qa.unit.ToBase / u.ToBase
	}
	if lo > hi {
		lo, hi = hi, lo
	}
	if has {
		c := p.measure(start, end, qb, qb.label, &lo, &hi, u)
		c.Evidence = how + ", unit as typed"
		p.add(c)
		return
	}
	for _, sl := range p.lex.SlotsOf(p.head) {
		if sl.Holds(lo) && sl.Holds(hi) {
			c := p.measure(start, end, qb, sl.Dimension, &lo, &hi, sl.Unit)
			c.Inferred = true
			c.Evidence = fmt.Sprintf("%s; unit %s from product type %s", how, sl.Unit, p.head.Name)
			p.markByRange(end)
			p.add(c)
			return
		}
	}
	p.add(Constraint{Kind: KindMeasure, Start: start, End: end, Measure: &Measure{Dimension: "number", Min: &lo, Max: &hi},
		Evidence: how + "; unitless: no unit typed or inferred"})
}

func (p *tagger) singleNumber(s single) *number {
	if s.price {
		return &s.amount
	}
	if len(s.parts) == 1 && !s.parts[0].hasUnit {
		return &s.parts[0].num
	}
	return nil
}

func ordered(a, b *number) (*number, *number) {
	if a.value > b.value {
		return b, a
	}
	return a, b
}

// dims tags AxB(xC): a lumber size, a waist by inseam, or a dimension.
func (p *tagger) dims(start, end int, s single) {
	if len(s.parts) < 2 {
		p.lengths(s, 0, end, 0)
		return
	}
	anyUnit := false
	allInts := true
	for _, q := range s.parts {
		anyUnit = anyUnit || q.hasUnit || q.currency != ""
		allInts = allInts && q.num.integer
	}
	if !anyUnit && allInts && len(s.parts) <= 3 {
		a, b := int(s.parts[0].num.value), int(s.parts[1].num.value)
		if d, ok := spec.LumberNominal(a, b); ok && (p.category == "lumber" || p.category == "hardware" || p.head == nil) {
			endLumber := s.parts[1].end
			if len(s.parts) == 2 {
				endLumber = end
			}
			p.add(specConstraint(start, endLumber, d, "nominal lumber size"))
			if len(s.parts) == 3 {
				q := s.parts[2]
				c := p.measure(q.start, end, q, "length", nil, nil, mustUnit("ft"))
				c.Inferred = true
				c.Evidence = "third number of a lumber size is the length in feet (common practice)"
				p.add(c)
			}
			return
		}
		if len(s.parts) == 2 && p.isTrousers() && a >= 22 && a <= 60 && b >= 24 && b <= 40 {
			p.add(Constraint{Kind: KindSize, Start: start, End: end, Size: &Size{System: "waist_inseam", Value: fmt.Sprintf("%dx%d", a, b)},
				Evidence: "waist by inseam on " + p.head.Name})
			return
		}
	}
	p.lengths(s, 0, end, 0)
}

// lengths tags the parts of s from index from on as the dimensions of the
// head product type: a unit written only on the last part applies to all,
// a bare part takes the unit of the product's next length slot (starting
// at slot index first), and the last part's span runs to end.
func (p *tagger) lengths(s single, from, end, first int) {
	if from >= len(s.parts) {
		return
	}
	var shared *units.Unit
	if last := s.parts[len(s.parts)-1]; last.hasUnit {
		shared = &last.unit
	}
	filled := first
	generic := []string{"width", "height", "depth"}
	for i := from; i < len(s.parts); i++ {
		q := s.parts[i]
		qEnd := q.end
		if i == len(s.parts)-1 {
			qEnd = end
		}
		u, has := q.unit, q.hasUnit
		if !has && shared != nil {
			u, has = *shared, true
		}
		var c Constraint
		// "3/4 x 10 ft copper pipe": a pipe's diameter is written in
		// inches, its length in feet, so a bare part whose slot the head
		// writes in a unit of its own, and holds it in that unit, takes
		// that unit rather than the last part's.
		if !q.hasUnit && shared != nil && q.label == "" {
			if sl, ok := p.slotFor(shared.Quantity, filled); ok && sl.Unit != *shared && sl.Holds(q.num.value) {
				filled++
				c = p.measure(q.start, qEnd, q, sl.Dimension, nil, nil, sl.Unit)
				c.Inferred = true
				c.Evidence = fmt.Sprintf("unit %s from product type %s (%s %s), which writes it apart from the %s after it", sl.Unit, p.head.Name, sl.Dimension, rangeText(sl), shared.Symbol)
				p.add(c)
				continue
			}
		}
		switch {
		case has:
			dim := q.label
			if dim == "" {
				if sl, ok := p.slotFor(u.Quantity, filled); ok {
					dim = sl.Dimension
				} else if i < len(generic) {
					dim = generic[i]
				}
			}
			filled++
			c = p.measure(q.start, qEnd, q, dim, nil, nil, u)
			if !q.hasUnit {
				c.Evidence = "unit from the last part of the dimension"
			}
		default:
			sl, ok := p.slotFor(units.Length, filled)
			filled++
			if ok && sl.Holds(q.num.value) {
				c = p.measure(q.start, qEnd, q, sl.Dimension, nil, nil, sl.Unit)
				c.Inferred = true
				c.Evidence = fmt.Sprintf("unit %s from product type %s (%s %s)", sl.Unit, p.head.Name, sl.Dimension, rangeText(sl))
			} else if other, fits := otherLength(sl, q.num.value); ok && fits {
				// "4x6 whiteboard": 4 is no whiteboard's width in inches,
				// but 4 ft is.
				c = p.measure(q.start, qEnd, q, sl.Dimension, nil, nil, other)
				c.Inferred = true
				c.Evidence = fmt.Sprintf("unit %s: %g %s is outside product type %s's %s %s, %g %s within it", other, q.num.value, sl.Unit, p.head.Name, sl.Dimension, rangeText(sl), q.num.value, other)
			} else {
				dim := "dimension"
				if i < len(generic) {
					dim = generic[i]
				}
				c = Constraint{Kind: KindMeasure, Start: q.start, End: qEnd, Measure: &Measure{Dimension: dim, Amount: ptr(q.num.value)},
					Evidence: "unitless part of a dimension"}
			}
		}
		p.add(c)
	}
}

// otherLength is feet, when sl writes its range in inches and amount is
// too small for it in inches but lies in it in feet: "4x6 whiteboard" is
// 4 by 6 ft. The other way is not taken: a number too large for feet
// ("rug 120x170") is as likely centimetres as inches.
func otherLength(sl lexicon.Slot, amount float64) (units.Unit, bool) {
	if sl.Unit.Symbol != "in" {
		return units.Unit{}, false
	}
	ft := mustUnit("ft")
	v, err := units.Convert(amount, ft, sl.Unit)
	return ft, err == nil && sl.Holds(v) && !sl.Holds(amount)
}

// lengthSlot is the index, among the head product type's length slots,
// of the one named "length" (what follows a thread or a number size), or
// 0 when there is none.
func (p *tagger) lengthSlot() int {
	n := 0
	for _, s := range p.lex.SlotsOf(p.head) {
		if s.Quantity != units.Length {
			continue
		}
		if s.Dimension == "length" {
			return n
		}
		n++
	}
	return 0
}

func (p *tagger) isTrousers() bool {
	for _, e := range p.lex.Lineage(p.head) {
		switch e.Name {
		case "trousers", "jeans", "pants", "shorts", "chinos", "slacks":
			return true
		}
	}
	return false
}

// sizeValue reads the value after "size".
func (p *tagger) sizeValue(v *unit) (*Size, bool) {
	it := v.item
	if it.Value == nil || it.Value.To != nil || it.Value.Post != "" {
		return nil, false
	}
	s, ok := p.readSingle(it.Value.From)
	if !ok || s.price {
		return nil, false
	}
	if len(s.parts) == 2 && s.parts[0].num.integer && s.parts[1].num.integer {
		return &Size{System: "waist_inseam", Value: s.parts[0].num.decimal + "x" + s.parts[1].num.decimal}, true
	}
	if len(s.parts) != 1 {
		return nil, false
	}
	q := s.parts[0]
	sys := "numeric"
	if p.category == "footwear" {
		sys = "shoe"
	}
	for _, b := range bareSized {
		if p.headUnder(b.head) {
			sys = b.system
		}
	}
	val := q.num.decimal
	if q.hasUnit {
		if q.unit.Symbol == "w" && p.category == "footwear" {
			return &Size{System: "shoe", Value: val, Width: "wide"}, true
		}
		val = strings.ToLower(strings.TrimSpace(p.q[q.start:q.end]))
	}
	return &Size{System: sys, Value: val}, true
}

// monthsWords say that the number before them counts months, as baby
// clothes are sized.
var monthsWords = map[string]bool{"months": true, "month": true, "mo": true, "mos": true, "mths": true, "mth": true}

// monthsSize reads a baby's age size at unit k, on clothes: a number or
// a range of whole months, followed by a months word ("18 months",
// "6-12 months") or, on a baby's clothes, with m stuck to it ("12m",
// "3-6m": months, not metres), of at most 48 months, past which
// children's clothes are sized by years. It is a size, hard, written as
// shops list it ("6-12m"), and returns the extra units used.
func (p *tagger) monthsSize(k int, from, to single) (int, bool) {
	if !(p.apparel() || p.head == nil && p.forBaby()) || len(from.parts) != 1 || len(to.parts) > 1 || from.price || to.price {
		return 0, false
	}
	qs := append(slices.Clone(from.parts), to.parts...)
	last := qs[len(qs)-1]
	for i, q := range qs {
		if !q.num.integer || q.num.value > 48 || q.hasUnit && !(i == len(qs)-1 && q.unit.Symbol == "m") {
			return 0, false
		}
	}
	u := &p.units[k]
	end, used := u.end, 0
	w, _ := p.nextWord(k)
	switch {
	case !last.hasUnit && w != nil && w.entries == nil && monthsWords[w.text]:
		end, used = w.end, 1
	case last.hasUnit && p.forBaby():
	default:
		return 0, false
	}
	value := qs[0].num.decimal
	if len(qs) == 2 {
		value += "-" + qs[1].num.decimal
	}
	p.add(Constraint{Kind: KindSize, Start: u.start, End: end, Size: &Size{System: "age", Value: value + "m"},
		Evidence: "months of age: a baby's size"})
	return used, true
}

// sockSize reads a range of two whole numbers on socks, "10-13", as the
// sock size it names (common practice: socks are sized by the run of
// shoe sizes they fit), not a measure of no unit.
func (p *tagger) sockSize(start, end int, from, to single) bool {
	if !p.headUnder("socks") || len(from.parts) != 1 || len(to.parts) != 1 || from.price || to.price {
		return false
	}
	a, b := from.parts[0], to.parts[0]
	if a.hasUnit || b.hasUnit || !a.num.integer || !b.num.integer || a.num.value < 2 || b.num.value > 16 || a.num.value >= b.num.value {
		return false
	}
	p.add(Constraint{Kind: KindSize, Start: start, End: end, Size: &Size{System: "numeric", Value: a.num.decimal + "-" + b.num.decimal},
		Evidence: "a run of shoe sizes: a sock size"})
	return true
}

// shoeSizes reads "size 7-8" on footwear, from start to end, as a run
// of shoe sizes, "7-8", any size in which will do: a slipper labelled
// 7-8, or a shoe in 7, 7.5 or 8 (common practice in slippers' sizing;
// the planner lists the sizes in the run). Both ends are whole or half
// sizes of at most 20, the second above the first by no more than 3;
// else it reports false.
func (p *tagger) shoeSizes(start, end int, from, to single) bool {
	if len(from.parts) != 1 || len(to.parts) != 1 || from.price || to.price {
		return false
	}
	a, b := from.parts[0], to.parts[0]
	half := func(q quantity) bool {
		return !q.hasUnit && q.num.value*2 == math.Trunc(q.num.value*2) && q.num.value > 0 && q.num.value <= 20
	}
	if !half(a) || !half(b) || b.num.value <= a.num.value || b.num.value-a.num.value > 3 {
		return false
	}
	p.add(Constraint{Kind: KindSize, Start: start, End: end, Size: &Size{System: "shoe", Value: a.num.decimal + "-" + b.num.decimal},
		Evidence: "a run of shoe sizes: any size in it"})
	return true
}

// forBaby reports whether the query names the baby audience.
func (p *tagger) forBaby() bool {
	for i := range p.units {
		if e := p.units[i].chosen; e != nil && e.Kind == lexicon.Audience && e.Name == "baby" {
			return true
		}
	}
	return false
}

// braCups are the cup letters of bra sizes (common practice, from
// memory: UK and US run AA to K, with doubled letters).
var braCups = map[string]bool{"aa": true, "a": true, "b": true, "c": true, "d": true, "dd": true, "ddd": true, "e": true,
	"f": true, "ff": true, "g": true, "gg": true, "h": true, "hh": true, "j": true, "jj": true, "k": true}

// equivalentWords follow a power to say it is an incandescent bulb's
// that gives the same light ("60w equivalent", "60 watt equiv").
var equivalentWords = map[string]bool{"equivalent": true, "equiv": true, "eq": true, "replacement": true}

// holdsVolume reports whether the head product type has a volume slot
// and no mass slot, so that an ounce on it is a fluid ounce.
func (p *tagger) holdsVolume() bool {
	volume := false
	for _, s := range p.lex.SlotsOf(p.head) {
		switch s.Quantity {
		case units.Mass:
			return false
		case units.Volume:
			volume = true
		}
	}
	return volume
}

// bareNumber reports whether a unit holds just a number with no unit.
func (p *tagger) bareNumber(v *unit) bool {
	it := v.item
	if it.Value == nil || it.Value.To != nil || it.Value.Post != "" || it.Value.From.Dims == nil || len(it.Value.From.Dims.Parts) != 1 {
		return false
	}
	q := it.Value.From.Dims.Parts[0]
	return q.Unit == "" && q.Mark == "" && q.Currency == ""
}

// countWords map the words that count things to the dimension counted:
// items in a package ("8 pack") or parts of a product ("3 seater", "6
// drawer", "5 tier").
var countWords = map[string]string{
	"pack": "pack_size", "pk": "pack_size", "packs": "pack_size", "ct": "pack_size", "count": "pack_size",
	"pcs": "pack_size", "pc": "pack_size", "piece": "pack_size", "pieces": "pack_size", "pair": "pack_size",
	"pairs": "pack_size", "set": "pack_size", "roll": "pack_size", "rolls": "pack_size", "sheets": "sheets",
	"sheet": "sheets", "ream": "reams", "reams": "reams", "panel": "panels", "panels": "panels",
	"seater": "seats", "seat": "seats", "seats": "seats", "person": "seats", "drawer": "drawers", "drawers": "drawers",
	"tier": "tiers", "tiers": "tiers", "shelf": "shelves", "shelves": "shelves", "door": "doors", "doors": "doors",
	"burner": "burners", "burners": "burners", "slice": "slices", "outlet": "outlets", "outlets": "outlets",
	"port": "ports", "ports": "ports", "ring": "rings", "gang": "gangs", "light": "lights", "lights": "lights",
	"speed": "speeds", "blade": "blades", "blades": "blades", "ply": "ply", "step": "steps", "steps": "steps",
	"pole": "poles", "poles": "poles", "wick": "wicks", "wicks": "wicks", "tooth": "teeth", "teeth": "teeth",
}

// ladderTypes are a ladder's duty ratings (ANSI A14, from memory: type
// IAA 375 lb, IA 300 lb, I 250 lb, II 225 lb, III 200 lb).
// The key is as typed, the value as the standard writes it, in roman
// numerals.
var ladderTypes = map[string]string{"iaa": "iaa", "ia": "ia", "i": "i", "ii": "ii", "iii": "iii", "1aa": "iaa", "1a": "ia", "1": "i", "2": "ii", "3": "iii"}

// copperTubeTypes are the wall types of copper water tube (ASTM B88,
// from memory: type K has the thickest wall, then L, then M), which set
// the pressure a tube holds and where plumbing codes allow it.
var copperTubeTypes = map[string]string{"k": "k", "l": "l", "m": "m"}

// typeRating reads "type ia" at word unit k on a ladder as its duty
// rating, a load rating, and "type l" on a pipe as a copper tube's wall
// type: a hard phrase in the product's words, where "type" and "ia" or
// "l" were filler and a stray word, and a rescue dropped the letter. It
// returns the extra units used, or -1.
func (p *tagger) typeRating(k int) int {
	if p.units[k].text != "type" || k+1 >= len(p.units) {
		return -1
	}
	v := &p.units[k+1]
	typed := strings.ToLower(p.q[v.start:v.end])
	var rating, evidence string
	switch {
	case p.headUnder("ladder"):
		rating, evidence = ladderTypes[typed], "a ladder's duty rating, a load rating"
	case p.headUnder("pipe"):
		rating, evidence = copperTubeTypes[typed], "a copper tube's wall type (ASTM B88), which sets the pressure it holds"
	}
	if rating == "" {
		return -1
	}
	p.add(Constraint{Kind: KindKeyword, Start: p.units[k].start, End: v.end, Name: "type " + rating, Strictness: Hard,
		Evidence: evidence + ", matched in the product's words; never dropped"})
	return 1
}

// usPaper are the US paper sizes office goods are sold in (ANSI/ASME
// Y14.1 letter 8.5 x 11 in, legal 8.5 x 14 in, ledger or tabloid 11 x 17
// in; from memory).
var usPaper = map[string]bool{"letter": true, "legal": true, "tabloid": true, "ledger": true}

// paperWord reads a US paper size at word unit k ("letter", "letter
// size") on office goods, or with "size" after it and no product type,
// as a firm phrase in
// the product's words, where "size" after it took the next number for a
// hard size ("file folders letter size 100"). It returns the extra units
// used, or -1.
func (p *tagger) paperWord(k int) int {
	u := &p.units[k]
	if !usPaper[u.text] || u.entries != nil {
		return -1
	}
	end, used := u.end, 0
	if w, _ := p.nextWord(k); w != nil && w.text == "size" {
		end, used = w.end, 1
	}
	if p.category != "office" && (p.head != nil || used == 0) {
		return -1 // "letter opener"
	}
	p.add(Constraint{Kind: KindKeyword, Start: u.start, End: end, Name: u.text, Strictness: Firm,
		Evidence: "a US paper size, matched in the product's words"})
	return used
}

// poleWords count a breaker's or a switch's poles in words: "double pole"
// is two (common practice in electrical supply).
var poleWords = map[string]float64{"single": 1, "double": 2, "triple": 3}

// poleCount reads "single pole", "double pole" or "triple pole" at word
// unit k, in electrical goods or with no product type, as the count of
// poles. It returns the extra units used, or -1.
func (p *tagger) poleCount(k int) int {
	n, ok := poleWords[p.units[k].text]
	if !ok || k+1 >= len(p.units) || p.units[k+1].kind != uWord || p.units[k+1].text != "pole" || p.category != "" && p.category != "electrical" {
		return -1
	}
	p.add(countConstraint(p.units[k].start, p.units[k+1].end, n, "poles", "\""+p.units[k].text+" pole\": the count of poles"))
	return 1
}

// batteryGroup matches a BCI group size, the case size and terminal
// layout of a car battery ("24", "24f", "51r", "h6", "t5"; the BCI's
// layout, from memory).
var batteryGroup = regexp.MustCompile(`^(\d{1,3}[a-z]{0,2}|[ht]\d{1,2})$`)

// groupSize reads "group 24f" at word unit k on a car battery as its
// BCI group size: a hard phrase in the product's words, since a battery
// of another group does not fit the tray or reach the cables. "group"
// was a stray word and 24f one that whittle did not know. It returns
// the extra units used, or -1.
func (p *tagger) groupSize(k int) int {
	if p.units[k].text != "group" || k+1 >= len(p.units) || !p.headUnder("car battery") {
		return -1
	}
	first := k + 1
	if p.units[first].kind == uWord && p.units[first].text == "size" {
		first++ // "group size 24f"
	}
	if first >= len(p.units) {
		return -1
	}
	last := first
	if last+1 < len(p.units) && p.units[last+1].kind == uWord && !p.units[last+1].spaceBefore {
		last++ // "24f": the number and the letter after it
	}
	code := strings.ToLower(p.q[p.units[first].start:p.units[last].end])
	if !batteryGroup.MatchString(code) {
		return -1
	}
	p.add(Constraint{Kind: KindKeyword, Start: p.units[k].start, End: p.units[last].end, Name: "group " + code, Strictness: Hard,
		Evidence: "a car battery's BCI group size, which sets its case and terminals, matched in the product's words; never dropped"})
	return last - k
}

// countAfter reports whether unit k is followed by a counting word.
func (p *tagger) countAfter(k int) bool {
	return k+1 < len(p.units) && p.units[k+1].kind == uWord && countWords[p.units[k+1].text] != ""
}

// countConstraint is a count: a measure of quantity "count".
func countConstraint(start, end int, n float64, dimension, evidence string) Constraint {
	return Constraint{Kind: KindMeasure, Start: start, End: end, Evidence: evidence,
		Measure: &Measure{Dimension: dimension, Quantity: "count", Unit: "count", BaseUnit: "count", Amount: ptr(n), BaseAmount: ptr(n)}}
}

// cableDash tags "12-2", "14-3" between start and end as cable, gauge
// then conductors, where wire is sold: whole numbers, no unit, no space,
// an even gauge 6 to 18 and 2 to 4 conductors, as cableFraction.
func (p *tagger) cableDash(start, end int, from, to single) (Constraint, bool) {
	if !p.wiredCategory() || from.price || to.price || len(from.parts) != 1 || len(to.parts) != 1 || strings.ContainsAny(p.q[start:end], " \t") {
		return Constraint{}, false
	}
	a, b := from.parts[0], to.parts[0]
	if a.hasUnit || b.hasUnit || !a.num.integer || !b.num.integer {
		return Constraint{}, false
	}
	g, c := int(a.num.value), int(b.num.value)
	if g < 6 || g > 18 || g%2 != 0 || c < 2 || c > 4 {
		return Constraint{}, false
	}
	d, ok := p.awg(start, end, g, c)
	if ok {
		d.Evidence = join(d.Evidence, "gauge-conductors, as cable is written (common practice)")
	}
	return d, ok
}

// cableFraction reports whether n is written like cable, gauge over
// conductors ("12/2", "14/3", "10/3"): an even gauge 6 to 18 over 2 to 4.
func cableFraction(n *grammar.Num) bool {
	f := n.Only
	if f == nil || f.Vulgar != "" {
		return false
	}
	g, err1 := strconv.Atoi(f.Num)
	c, err2 := strconv.Atoi(f.Den)
	return err1 == nil && err2 == nil && g >= 6 && g <= 18 && g%2 == 0 && c >= 2 && c <= 4
}

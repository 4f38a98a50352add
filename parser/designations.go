package parser

import (
	"errors"
	"fmt"
	"strconv"
	"strings"

	"github.com/bojanz/currency"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/spec"
	"github.com/whittle-search/whittle/parser/internal/grammar"
)

// specConstraint wraps a standard designation.
func specConstraint(start, end int, d spec.Designation, evidence string) Constraint {
	for k, v := range d.Dimensions {
		d.Dimensions[k] = tidy(v)
	}
	return Constraint{Kind: KindSpec, Start: start, End: end, Evidence: join(evidence, d.Source),
		Spec: &Spec{System: string(d.System), Designation: d.Code, Dimensions: d.Dimensions, Attributes: d.Attributes, Standard: d.Source}}
}

// tyre tags "225/45R17".
func (p *tagger) tyre(u *unit) {
	t := u.item.Tyre
	w, err1 := strconv.Atoi(t.Width)
	a, err2 := strconv.Atoi(t.Aspect)
	rim, err3 := strconv.ParseFloat(t.Rim, 64)
	if err1 != nil || err2 != nil || err3 != nil {
		p.errorf(u.start, u.end, "cannot read %q as a tyre size", p.q[u.start:u.end])
		return
	}
	d, err := spec.TyreSize(w, a, t.Construction[0], rim)
	if err != nil {
		p.errorf(u.start, u.end, "%s", strings.TrimPrefix(err.Error(), "spec: "))
		p.add(Constraint{Kind: KindKeyword, Start: u.start, End: u.end, Evidence: "looks like a tyre size but is not one"})
		return
	}
	p.add(specConstraint(u.start, u.end, d, "ISO metric tyre size"))
}

// code tags a run like "xr-2200", "m8x1.25", "a4", "cr2032".
func (p *tagger) code(u *unit) {
	parts := u.item.Code.Parts
	text := strings.Join(parts, "")
	// Metric thread: m8, m8x1.25.
	if parts[0] == "m" && len(parts) >= 2 && (p.category == "" || p.category == "hardware") {
		dia, err := strconv.ParseFloat(parts[1], 64)
		pitch := 0.0
		ok := err == nil && (len(parts) == 2 || (len(parts) == 4 && parts[2] == "x"))
		if ok && len(parts) == 4 {
			pitch, err = strconv.ParseFloat(parts[3], 64)
			ok = err == nil
		}
		if ok {
			if d, err := spec.MetricThreadSize(dia, pitch); err == nil {
				p.add(specConstraint(u.start, u.end, d, "ISO metric thread"))
				return
			} else if p.category == "hardware" {
				p.errorf(u.start, u.end, "%s", strings.TrimPrefix(err.Error(), "spec: "))
			}
		}
	}
	if len(parts) == 2 && (parts[0] == "a" || parts[0] == "b") && (p.category == "" || p.category == "office") {
		if d, ok := spec.PaperSize(text); ok {
			p.add(specConstraint(u.start, u.end, d, "ISO 216 paper size"))
			return
		}
	}
	if p.category == "" || p.category == "batteries" || p.category == "electronics" {
		if d, ok := spec.BatterySize(text); ok {
			p.add(specConstraint(u.start, u.end, d, "battery size"))
			return
		}
	}
	p.add(Constraint{Kind: KindPartNumber, Start: u.start, End: u.end, Code: strings.ToUpper(p.q[u.start:u.end]),
		Evidence: "letters and digits with no space: a code"})
}

// batteryWord reads "aa", "aaa" and the IEC names as battery sizes.
func (p *tagger) batteryWord(w string) (spec.Designation, bool) {
	switch w {
	case "aa", "aaa", "pp3":
	case "c", "d", "n":
		if p.category != "batteries" {
			return spec.Designation{}, false
		}
	default:
		return spec.Designation{}, false
	}
	return spec.BatterySize(w)
}

// wireGauge tags "14 awg", "12 gauge" and "14/2".
func (p *tagger) wireGauge(start, end int, q quantity, n *grammar.Num) (Constraint, bool) {
	gauge, conductors := 0, 0
	switch {
	case q.num.integer:
		gauge = int(q.num.value)
	case n.Only != nil && n.Only.Vulgar == "":
		g, err1 := strconv.Atoi(n.Only.Num)
		c, err2 := strconv.Atoi(n.Only.Den)
		if err1 != nil || err2 != nil {
			return Constraint{}, false
		}
		gauge, conductors = g, c
	default:
		return Constraint{}, false
	}
	d, err := spec.WireGauge(gauge, conductors)
	if err != nil {
		p.errorf(start, end, "%s", strings.TrimPrefix(err.Error(), "spec: "))
		return Constraint{}, false
	}
	return specConstraint(start, end, d, "American Wire Gauge"), true
}

// unifiedThread tags "1/4-20" (a fraction, a dash, a thread count, no
// spaces) as a unified inch thread.
func (p *tagger) unifiedThread(u *unit, a, b single) (Constraint, bool) {
	if strings.ContainsAny(p.q[u.start:u.end], " \t") || len(a.parts) != 1 || len(b.parts) != 1 {
		return Constraint{}, false
	}
	f := u.item.Value.From.Dims
	if f == nil || f.Parts[0].Num.Only == nil || !b.parts[0].num.integer || a.parts[0].hasUnit || b.parts[0].hasUnit {
		return Constraint{}, false
	}
	fr := f.Parts[0].Num.Only
	size := fr.Vulgar
	if size == "" {
		size = fr.Num + "/" + fr.Den
	}
	d, err := spec.UnifiedThreadSize(size, int(b.parts[0].num.value))
	if err != nil {
		if p.category == "hardware" {
			p.errorf(u.start, u.end, "%s", strings.TrimPrefix(err.Error(), "spec: "))
		}
		return Constraint{}, false
	}
	return specConstraint(u.start, u.end, d, "unified inch thread"), true
}

// numberedThread tags "#10-24".
func (p *tagger) numberedThread(start int, v *unit) (Constraint, bool) {
	val := v.item.Value
	if val == nil || val.To == nil || strings.ContainsAny(p.q[v.start:v.end], " \t") {
		return Constraint{}, false
	}
	a, ok1 := p.readSingle(val.From)
	b, ok2 := p.readSingle(val.To)
	if !ok1 || !ok2 || len(a.parts) != 1 || len(b.parts) != 1 || !a.parts[0].num.integer || !b.parts[0].num.integer {
		return Constraint{}, false
	}
	d, err := spec.UnifiedThreadSize("#"+a.parts[0].num.decimal, int(b.parts[0].num.value))
	if err != nil {
		p.errorf(start, v.end, "%s", strings.TrimPrefix(err.Error(), "spec: "))
		return Constraint{}, false
	}
	return specConstraint(start, v.end, d, "unified inch thread"), true
}

// quoted tags a quoted phrase: one hard constraint.
func (p *tagger) quoted(u *unit) {
	q := u.item.Quoted
	innerStart := q.Pos.Offset + firstRuneLen(p.q[q.Pos.Offset:])
	innerEnd := u.end
	if q.Closed {
		innerEnd = u.end - lastRuneLen(p.q[:u.end])
	} else {
		p.errorf(q.Pos.Offset, q.Pos.Offset+firstRuneLen(p.q[q.Pos.Offset:]), "quotation mark is never closed; the phrase runs to the end")
	}
	inner := strings.TrimSpace(p.q[innerStart:innerEnd])
	c := Constraint{Kind: KindKeyword, Start: u.start, End: u.end, Strictness: Hard, Evidence: "quoted phrase"}
	if inner == "" {
		c.Kind, c.Strictness, c.Evidence = KindFiller, Filler, "empty quotation"
		p.add(c)
		return
	}
	ws := lexicon.Words(inner)
	keys := make([]string, len(ws))
	for i, w := range ws {
		keys[i] = lexicon.Key(w)
	}
	if n, es := p.lex.Match(keys); n == len(keys) {
		if e := pick(es); e != nil && e.Kind != lexicon.Filler {
			c.Kind = Kind(e.Kind)
			c.Name = e.Name
			if e.Kind == lexicon.ProductType {
				c.Category, c.Parent = e.Category, e.Parent
			}
			c.Evidence = fmt.Sprintf("quoted phrase; %s lexicon", e.Kind)
		}
	}
	if c.Kind == KindKeyword {
		c.Name = strings.Join(strings.Fields(lexicon.Normalise(inner)), " ")
		p.res.Unrecognised = append(p.res.Unrecognised, c.Name)
	}
	p.add(c)
}

func firstRuneLen(s string) int {
	for i := range s {
		if i > 0 {
			return i
		}
	}
	return len(s)
}

func lastRuneLen(s string) int {
	for i := len(s) - 1; i >= 0; i-- {
		if s[i] < 0x80 || s[i] >= 0xc0 {
			return len(s) - i
		}
	}
	return 0
}

// amountText rounds a decimal amount to the currency's minor unit, with
// decimal arithmetic: "90" in USD is "90.00", "3000" in JPY is "3000".
func amountText(dec, code string) (string, error) {
	if !currency.IsValid(code) {
		return "", fmt.Errorf("%s is not an ISO 4217 currency code", code)
	}
	a, err := currency.NewAmount(dec, code)
	if err != nil {
		var ie currency.InvalidNumberError
		if errors.As(err, &ie) {
			return "", fmt.Errorf("price %s is not a decimal amount", dec)
		}
		return "", err
	}
	return a.Round().Number(), nil
}

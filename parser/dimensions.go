package parser

import (
	"fmt"
	"strings"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/units"
)

// markByRange records that the measure ending at end took its dimension
// from the range its amount lies in, not from the query's words.
func (p *tagger) markByRange(end int) {
	if p.byRange == nil {
		p.byRange = make(map[int]bool)
	}
	p.byRange[end] = true
}

// settleDimensions reconsiders each measure whose dimension was chosen by
// its amount's range alone, when the query already gives that dimension:
// a designation does ("m8 bolt 30 mm": M8 is the bolt's diameter, so
// 30 mm is its length), or a measure before it does ("bolt 8 mm 30 mm").
// Such a measure moves to the head product type's next slot of the same
// quantity that is not given and whose range holds it; where there is
// none it stays as it was.
func (p *tagger) settleDimensions() {
	if p.head == nil || len(p.byRange) == 0 {
		return
	}
	given := make(map[string]string) // dimension → the text that gives it
	for _, c := range p.res.Constraints {
		if c.Kind != KindSpec || c.Spec == nil || c.Excluded {
			continue
		}
		for d := range c.Spec.Dimensions {
			given[d] = c.Spec.Designation
			// A designation's dimension names qualify a slot's:
			// a thread's major_diameter is a bolt's diameter.
			if i := strings.LastIndexByte(d, '_'); i >= 0 {
				given[d[i+1:]] = c.Spec.Designation
			}
		}
	}
	for i := range p.res.Constraints {
		c := &p.res.Constraints[i]
		if c.Kind != KindMeasure || c.Measure == nil || c.Measure.Unit == "" {
			continue
		}
		m := c.Measure
		if by, ok := given[m.Dimension]; ok && p.byRange[c.End] {
			if s, ok := p.freeSlot(c, given); ok {
				p.moveTo(c, s, by)
			}
		}
		if !c.Excluded {
			if _, ok := given[m.Dimension]; !ok {
				given[m.Dimension] = c.Text
			}
		}
	}
}

// freeSlot finds the first slot of the head product type, of c's
// quantity, that given does not hold and whose range holds c's amount.
// A bare number (its unit inferred) is read in each slot's own unit; an
// amount with a unit is converted to it.
func (p *tagger) freeSlot(c *Constraint, given map[string]string) (lexicon.Slot, bool) {
	m := c.Measure
	u, ok := units.BySymbol(m.Unit)
	if !ok {
		return lexicon.Slot{}, false
	}
	var amounts []float64 // the point, or each bound
	for _, v := range []*float64{m.Amount, m.Min, m.Max} {
		if v != nil {
			amounts = append(amounts, *v)
		}
	}
	holds := func(s lexicon.Slot) bool {
		for _, v := range amounts {
			if !c.Inferred {
				var err error
				if v, err = units.Convert(v, u, s.Unit); err != nil {
					return false
				}
			}
			if !s.Holds(v) {
				return false
			}
		}
		return len(amounts) > 0
	}
	for _, s := range p.lex.SlotsOf(p.head) {
		if _, ok := given[s.Dimension]; ok || s.Quantity != u.Quantity {
			continue
		}
		if holds(s) {
			return s, true
		}
	}
	return lexicon.Slot{}, false
}

// moveTo gives c the dimension of slot s, with s's unit when c's unit
// was inferred, and says why in its evidence.
func (p *tagger) moveTo(c *Constraint, s lexicon.Slot, by string) {
	m := c.Measure
	was := m.Dimension
	m.Dimension = s.Dimension
	if c.Inferred {
		// The numbers typed are read in the new slot's unit.
		m.Unit = s.Unit.String()
		for _, x := range []struct{ typed, base **float64 }{{&m.Amount, &m.BaseAmount}, {&m.Min, &m.BaseMin}, {&m.Max, &m.BaseMax}} {
			if *x.typed != nil {
				*x.base = ptr(tidy(**x.typed * s.Unit.ToBase))
			}
		}
		// The evidence named the slot it came from ("(diameter
		// 0.125..1.5)"): it names the new one.
		for _, old := range p.lex.SlotsOf(p.head) {
			if old.Dimension == was {
				c.Evidence = strings.Replace(c.Evidence, fmt.Sprintf("(%s %s)", was, rangeText(old)), fmt.Sprintf("(%s %s)", s.Dimension, rangeText(s)), 1)
				break
			}
		}
	}
	c.Evidence = join(c.Evidence, fmt.Sprintf("not the %s, which %s gives", was, by))
}

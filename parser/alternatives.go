package parser

import (
	"fmt"
	"strings"
)

// alternativeKinds are the kinds whose values a shopper may offer as
// alternatives, any of which will do ("navy or black"). Measures are
// among them when both are points of one dimension and unit ("50 or 55
// inch tv": either diagonal, not the range between); a price is not.
var alternativeKinds = map[Kind]bool{
	KindProductType: true, KindColour: true, KindPattern: true, KindSilhouette: true,
	KindMaterial: true, KindSize: true, KindAudience: true, KindSpec: true,
	KindBrand: true, KindPartNumber: true, KindCompatibility: true, KindMeasure: true,
}

// alternatives joins into one group (Constraint.OrGroup) the values a
// shopper offers as alternatives: values of one kind joined by "or"
// ("navy or black", "size 8 or 9"), a list of them with commas before
// the "or" ("red, blue or green"), sizes of one system joined by a slash
// ("full/queen", "s/m"), the way a size that fits either is written on
// a label (common practice), and a query's audiences ("toddler boys",
// "mens and womens"), since a product is made for one audience. Colours
// joined by a slash are not alternatives: "black/white" names one
// two-tone colourway (common practice).
//
// A number with no unit before "or" takes the unit after it: in "12 or
// 14 awg" both are gauges (borrowUnit). A code after "or" after a model
// fitted is a second model ("for jx-10 or jx-12"). An exclusion before
// "or" covers what follows it, as in English: "not red or blue" is
// neither.
func (p *tagger) alternatives() {
	cs := p.res.Constraints
	groups := 0
	link := func(a, b int) {
		g := cs[a].OrGroup
		if g == 0 {
			groups++
			g = groups
			cs[a].OrGroup = g
		}
		cs[b].OrGroup = g
	}
	for j := 1; j+1 < len(cs); j++ {
		if cs[j].Kind != KindFiller || !strings.EqualFold(cs[j].Text, "or") {
			continue
		}
		a, b := j-1, j+1
		p.borrowUnit(a, b)
		if cs[a].Kind == KindCompatibility && cs[b].Kind == KindPartNumber && cs[a].Excluded == cs[b].Excluded {
			// "case for jx-10 or jx-12": the code after "or" is a second
			// model it may fit, not a part number the case must have.
			cs[b].Kind, cs[b].Target, cs[b].Code = KindCompatibility, strings.ToLower(cs[b].Code), ""
			cs[b].Strictness = DefaultStrictness(KindCompatibility)
			cs[b].Evidence = fmt.Sprintf("a second target after %q", cs[a].Text)
		}
		if cs[a].Excluded && !cs[b].Excluded && cs[a].Kind == cs[b].Kind {
			cs[b].Excluded = true
			cs[b].Evidence = join(cs[b].Evidence, fmt.Sprintf("excluded with %q", cs[a].Text))
		}
		if !joinable(cs[a], cs[b]) {
			continue
		}
		// "red, blue or green": the list before the "or", joined by
		// commas, is one with it.
		first := a
		for first > 0 && joinable(cs[first-1], cs[first]) && cs[first].OrGroup == 0 &&
			strings.TrimSpace(p.q[cs[first-1].End:cs[first].Start]) == "," {
			first--
		}
		for i := first; i < a; i++ {
			link(i, i+1)
		}
		link(a, b)
	}
	for i := 0; i+1 < len(cs); i++ {
		x, y := cs[i], cs[i+1]
		if x.Kind == KindSize && joinable(x, y) && p.q[x.End:y.Start] == "/" {
			link(i, i+1)
		}
	}
	// Audiences, wherever they stand: a product is made for one, so
	// "toddler boys", "mens and womens" and "kids rain boots toddler"
	// ask for either, where all at once find nothing.
	for _, excluded := range []bool{false, true} {
		first := -1
		for i, c := range cs {
			if c.Kind != KindAudience || c.Excluded != excluded {
				continue
			}
			if first < 0 {
				first = i
				continue
			}
			link(first, i)
		}
	}
	if groups = p.res.renumber(); groups == 0 {
		return
	}
	for g := 1; g <= groups; g++ {
		members := p.res.Alternatives(p.res.first(g))
		text := p.res.AlternativesText(members[0])
		most := cs[members[0]].Strictness
		for _, m := range members {
			most = max(most, cs[m].Strictness)
		}
		for _, m := range members {
			cs[m].Strictness = most
			cs[m].Evidence = join(cs[m].Evidence, fmt.Sprintf("one of %q", text))
		}
	}
}

// joinable reports whether x and y may be alternatives of one group:
// of one kind that takes alternatives, both excluded or neither, and, for
// sizes and designations, of one system (a shoe size 8 or a letter size
// m; "9 or m" is no choice between sizes of one kind), and, for
// measures, points of one dimension in one unit.
func joinable(x, y Constraint) bool {
	if x.Kind != y.Kind || !alternativeKinds[x.Kind] || x.Excluded != y.Excluded {
		return false
	}
	switch {
	case x.Size != nil && y.Size != nil:
		return x.Size.System == y.Size.System
	case x.Spec != nil && y.Spec != nil:
		return x.Spec.System == y.Spec.System
	case x.Measure != nil && y.Measure != nil:
		a, b := x.Measure, y.Measure
		return a.BaseAmount != nil && b.BaseAmount != nil && a.BaseUnit != "" && a.BaseUnit == b.BaseUnit && a.Dimension == b.Dimension
	}
	return true
}

// borrowUnit reads constraint a, a number typed with no unit right
// before "or", with the unit or designation of constraint b after it:
// "12 or 14 awg" is 12 AWG or 14 AWG, not 12 ft of 14 AWG wire; "8 or
// 10 mm" is 8 mm or 10 mm. The number is read again with b's words after
// it; the reading is kept when it is one constraint of b's kind (and, for
// a measure, b's quantity, taking b's dimension), marked inferred.
func (p *tagger) borrowUnit(a, b int) {
	ca, cb := p.res.Constraints[a], p.res.Constraints[b]
	if cb.Inferred || cb.Excluded != ca.Excluded || cb.Kind != KindSpec && cb.Kind != KindMeasure || !plainNumber(ca.Text) {
		return
	}
	switch {
	case ca.Kind == KindMeasure && (ca.Inferred || ca.Measure.Unit == ""):
	case ca.Kind == KindKeyword:
	default:
		return
	}
	n := numberPrefix(cb.Text)
	if n == 0 || n == len(cb.Text) {
		return
	}
	text := ca.Text + cb.Text[n:]
	r := ParseWith(text, Options{Lexicon: p.lex, Currency: p.opts.Currency, Volume: p.opts.Volume, Category: p.category})
	if len(r.Constraints) != 1 || len(r.Errors) > 0 {
		return
	}
	c := r.Constraints[0]
	if c.Kind != cb.Kind || c.Start != 0 || c.End != len(text) {
		return
	}
	switch {
	case c.Spec != nil && c.Spec.System != cb.Spec.System:
		return
	case c.Measure != nil:
		if c.Measure.Quantity != cb.Measure.Quantity {
			return
		}
		c.Measure.Dimension = cb.Measure.Dimension
	}
	c.Start, c.End, c.Text = ca.Start, ca.End, ca.Text
	c.Excluded, c.Inferred = ca.Excluded, true
	c.Strictness = cb.Strictness
	c.Evidence = fmt.Sprintf("unit from %q after \"or\"", cb.Text)
	p.res.Constraints[a] = c
}

// plainNumber reports whether s is a whole or decimal number and nothing
// else ("12", "2.5").
func plainNumber(s string) bool {
	n := numberPrefix(s)
	return n > 0 && n == len(s)
}

// numberPrefix is the length of the whole or decimal number s starts
// with, 0 when it starts with none.
func numberPrefix(s string) int {
	i := 0
	for i < len(s) && s[i] >= '0' && s[i] <= '9' {
		i++
	}
	if i > 0 && i+1 < len(s) && s[i] == '.' && s[i+1] >= '0' && s[i+1] <= '9' {
		i++
		for i < len(s) && s[i] >= '0' && s[i] <= '9' {
			i++
		}
	}
	return i
}

// Alternatives returns the indices, in query order, of the constraints
// that are alternatives with constraint i (itself among them), any one
// of which meets what the shopper asked: those of its OrGroup. A
// constraint of no group is its own only alternative. It is nil when i
// is out of range.
func (r *Result) Alternatives(i int) []int {
	if i < 0 || i >= len(r.Constraints) {
		return nil
	}
	g := r.Constraints[i].OrGroup
	if g == 0 {
		return []int{i}
	}
	var out []int
	for j, c := range r.Constraints {
		if c.OrGroup == g {
			out = append(out, j)
		}
	}
	return out
}

// renumber numbers the or-groups from 1 in the order of their first
// members, drops a group of one (its constraint stands alone) and
// returns how many there are.
func (r *Result) renumber() int {
	cs := r.Constraints
	size := map[int]int{}
	for _, c := range cs {
		size[c.OrGroup]++
	}
	next, to := 0, map[int]int{}
	for i := range cs {
		g := cs[i].OrGroup
		if g == 0 {
			continue
		}
		if size[g] < 2 {
			cs[i].OrGroup = 0
			continue
		}
		if to[g] == 0 {
			next++
			to[g] = next
		}
		cs[i].OrGroup = to[g]
	}
	return next
}

// AlternativesText is what the shopper typed for constraint i and its
// alternatives: the span from the first to the last ("navy or black",
// "full/queen") when nothing else stands between them, else their texts
// joined by "or" ("kids or toddler" for "kids rain boots toddler").
func (r *Result) AlternativesText(i int) string {
	alts := r.Alternatives(i)
	if len(alts) == 0 {
		return ""
	}
	for j := alts[0]; j <= alts[len(alts)-1]; j++ {
		if c := r.Constraints[j]; c.OrGroup != r.Constraints[i].OrGroup && c.Kind != KindFiller {
			texts := make([]string, len(alts))
			for k, a := range alts {
				texts[k] = r.Constraints[a].Text
			}
			return strings.Join(texts, " or ")
		}
	}
	return r.Query[r.Constraints[alts[0]].Start:r.Constraints[alts[len(alts)-1]].End]
}

// first is the index of the first constraint of group g, or -1.
func (r *Result) first(g int) int {
	for i, c := range r.Constraints {
		if c.OrGroup == g {
			return i
		}
	}
	return -1
}

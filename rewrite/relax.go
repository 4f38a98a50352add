package rewrite

import (
	"cmp"
	"context"
	"fmt"
	"math"
	"slices"
	"sort"
	"strconv"
	"strings"
	"unicode/utf8"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite/internal/textout"
)

// Operators say how a constraint was relaxed.
const (
	OpWiden   = "widen"
	OpReplace = "replace"
	OpDrop    = "drop"
)

// Relaxation is one change made to one constraint.
type Relaxation struct {
	// Constraint is the index of the constraint in the parsed query.
	Constraint int         `json:"constraint"`
	Text       string      `json:"text"`
	Kind       parser.Kind `json:"kind"`
	Operator   string      `json:"operator"`
	// Detail says what the change was, for developers ("to 3 catalog
	// colours within ΔE00 4").
	Detail string `json:"detail"`
	// Phrase says it to a shopper ("in colours close to mustard").
	Phrase string `json:"phrase"`
}

// level is one state of a constraint: its clause (nil when dropped), the
// relaxation that led to it (nil for the exact state), and its cost.
type level struct {
	clause *Clause
	relax  *Relaxation
	cost   float64
}

// item is one constraint of the query and the ladder of states it may
// step down.
type item struct {
	index  int
	c      parser.Constraint
	levels []level
	// solo is the constraint's count on its own, or -1 when unknown;
	// rarity is 1 - solo over the largest solo count (0 for the commonest).
	solo   int
	rarity float64
	// names is set on the word that names what the shopper wants in a
	// query of no product type (unknownHead): like a head product type it
	// is never dropped.
	names bool
	// group holds the constraints of c's or-group, in query order, when
	// it has one ("navy or black"): the item is all of them as one
	// requirement, and c spans them, the head among them where there is
	// one. It is nil for a constraint on its own.
	group []parser.Constraint
}

// members are the constraints the item stands for: its or-group, or c.
func (it *item) members() []parser.Constraint {
	if it.group != nil {
		return it.group
	}
	return []parser.Constraint{it.c}
}

// nameList joins the canonical names of the item's members with "or"
// ("navy or black"), each through f (plural, say) when it is not nil.
func (it *item) nameList(f func(string) string) string {
	var names []string
	for _, m := range it.members() {
		n := m.Name
		if f != nil {
			n = f(n)
		}
		if !slices.Contains(names, n) {
			names = append(names, n)
		}
	}
	return orList(names)
}

// orList writes "a", "a or b", "a, b or c".
func orList(xs []string) string {
	if len(xs) < 2 {
		return strings.Join(xs, "")
	}
	return strings.Join(xs[:len(xs)-1], ", ") + " or " + xs[len(xs)-1]
}

// newItem is the item of constraint i of r with its exact state: with
// the alternatives of its or-group, when it is the first of one.
func (rw *Rewriter) newItem(r *parser.Result, i int) *item {
	it := &item{index: i, c: r.Constraints[i], solo: -1}
	if alts := r.Alternatives(i); len(alts) > 1 {
		first, last := r.Constraints[alts[0]], r.Constraints[alts[len(alts)-1]]
		most := first.Strictness
		for _, j := range alts {
			m := r.Constraints[j]
			it.group = append(it.group, m)
			if m.IsHead() {
				it.c = m
			}
			most = max(most, m.Strictness)
		}
		it.c.Strictness = most // the strictest of them holds the group
		it.c.Start, it.c.End = first.Start, last.End
		it.c.Text = r.AlternativesText(i)
	}
	exact := rw.itemClause(it)
	it.levels = []level{{clause: &exact}}
	return it
}

// itemClause is the item's exact clause: its constraint's, or any of the
// values of its or-group's, in query order.
func (rw *Rewriter) itemClause(it *item) Clause {
	if it.group == nil {
		return rw.exactClause(it.index, it.c)
	}
	cl := rw.exactClause(it.index, it.group[0])
	for _, m := range it.group[1:] {
		o := rw.exactClause(it.index, m)
		for _, v := range o.Values {
			if !slices.Contains(cl.Values, v) {
				cl.Values = append(cl.Values, v)
			}
		}
		if cl.Field == string(parser.KindMeasure) {
			cl.Also = append(cl.Also, Bounds{Min: o.Min, Max: o.Max}) // "50 or 55 inch"
		}
	}
	return cl
}

// ladders builds each constraint's states: exact first, then every
// allowed widening or replacement, then dropping where the strictness
// allows it. Hard constraints and exclusions have only their exact state;
// filler has none (it is dropped before anything is searched).
func (rw *Rewriter) ladders(ctx context.Context, r *parser.Result, e Effective) []*item {
	items := rw.exactItems(r)
	rw.addRelaxations(ctx, items, e)
	return items
}

// exactItems are the constraints of r that ask for something (filler
// aside), each with its exact state only.
func (rw *Rewriter) exactItems(r *parser.Result) []*item {
	var items []*item
	head := unknownHead(r)
	for i, c := range r.Constraints {
		if c.Kind == parser.KindFiller || c.Strictness == parser.Filler || r.Alternatives(i)[0] != i {
			continue // filler, or an alternative the first of its group stands for
		}
		it := rw.newItem(r, i)
		it.names = i == head
		items = append(items, it)
	}
	return items
}

// unknownHead is the index of the word that names the product in a
// query of no product type, when the lexicon does not know it: the last
// word before a word that starts what qualifies it ("shampoo for dry
// hair"), or else the last word of the query, as an English noun phrase
// ends in its noun (common knowledge of English). It is -1 when the
// query has a head product type, a designation, a part number or a
// model it fits, or that word is known or no plain word (a colour, a
// size, a number). Dropping it would show what the other words match, a
// hair dryer for "dry hair", when the shop carries no shampoo.
func unknownHead(r *parser.Result) int {
	if headIndex(r) >= 0 {
		return -1
	}
	for _, c := range r.Constraints {
		// A designation, a part number or a model fitted says what the
		// product is ("cr2032 blister" is a battery).
		if !c.Excluded && (c.Kind == parser.KindSpec || c.Kind == parser.KindPartNumber || c.Kind == parser.KindCompatibility) {
			return -1
		}
	}
	last := -1
	for i, c := range r.Constraints {
		if c.Kind == parser.KindFiller {
			if last >= 0 && postModifiers[strings.ToLower(c.Text)] {
				break
			}
			continue
		}
		last = i
	}
	if last < 0 || !unknownWord(r, r.Constraints[last]) {
		return -1
	}
	return last
}

// postModifiers are the words after a noun that start what qualifies it.
var postModifiers = map[string]bool{"for": true, "with": true, "w/": true, "without": true, "in": true, "on": true, "from": true, "to": true}

// addRelaxations gives each item the states below its exact one.
//
// It returns the first error the engine gave while asking what the
// catalog carries, unless ctx is done: without it the ladders would lack
// the widenings the catalog allows.
func (rw *Rewriter) addRelaxations(ctx context.Context, items []*item, e Effective) error {
	// What the catalog carries is asked among the products of the same
	// kind: those the product type and the hard constraints allow.
	var within Plan
	for _, it := range items {
		if it.c.Strictness == parser.Hard && !it.c.Excluded || it.c.Kind == parser.KindProductType && !it.c.Excluded {
			within.Clauses = append(within.Clauses, *it.levels[0].clause)
		}
	}
	var failed error
	for _, it := range items {
		if it.c.Strictness < parser.Hard && !it.c.Excluded {
			failed = cmp.Or(failed, rw.relaxations(ctx, it, e, without(within, it.index)))
		}
	}
	return failure(ctx, failed)
}

// without is p less the clause that comes from constraint i.
func without(p Plan, i int) Plan {
	var out Plan
	for _, c := range p.Clauses {
		if c.From != i {
			out.Clauses = append(out.Clauses, c)
		}
	}
	return out
}

// costs of the operators, before the evidence of the counts scales them.
const (
	costReplace = 0.4
	costWiden   = 1.5
	// costWidenType widens a product type to its parent: more than an
	// attribute's widening, since a counter stool of 26 in is nearer a
	// "28 in counter stool" than a stool of 28 in of any kind, and more
	// than dropping any one firm attribute, however rare (costDropFirm
	// scaled by rarity reaches 5), since the kind of product is what a
	// shopper asked for first: "mauve shirt" shows shirts in other
	// colours before tops in mauve. The type is widened when what must
	// hold (a hard size, a gauge) finds none of it, or when the shop
	// carries none.
	costWidenType = 5.5
	costDropSoft  = 1.0
	costDropFirm  = 4.0
)

func (rw *Rewriter) relaxations(ctx context.Context, it *item, e Effective, within Plan) error {
	c := it.c
	drops := dropPhrase(c)
	add := func(cl *Clause, op, detail, phrase string, cost float64) {
		it.levels = append(it.levels, level{clause: cl, cost: cost,
			relax: &Relaxation{Constraint: it.index, Text: c.Text, Kind: c.Kind, Operator: op, Detail: detail, Phrase: phrase}})
	}
	switch c.Kind {
	case parser.KindColour:
		cl, n, err := rw.widenColour(ctx, it, e.ColourTolerance)
		if err != nil {
			return err
		}
		if cl != nil {
			names := it.nameList(nil)
			add(cl, OpWiden, fmt.Sprintf("to %s within ΔE00 %g of %s", textout.Count(n, "catalog colour", "catalog colours"), e.ColourTolerance, names),
				"in colours close to "+names, costWiden)
		}
	case parser.KindMeasure:
		for _, w := range rw.widenMeasure(it, e) {
			add(w.clause, OpWiden, w.detail, w.phrase, costWiden)
		}
		if it.group != nil {
			break // the amounts carried near one of several is no one widening
		}
		w, err := rw.widenToCarried(ctx, it, within)
		if err != nil {
			return err
		}
		if w != nil {
			add(w.clause, OpWiden, w.detail, w.phrase, costWiden*1.5)
		}
	case parser.KindProductType:
		// Each type of an or-group widens to its parent; one with none
		// stays as it is.
		cl := rw.itemClause(it)
		cl.Values = nil
		var parents, plurals []string
		for _, m := range it.members() {
			vals := rw.exactClause(it.index, m).Values
			if parent, ok := rw.lex.Lookup(lexicon.ProductType, m.Parent); ok {
				vals = rw.typeValues(parent)
				if !slices.Contains(parents, parent.Name) {
					parents, plurals = append(parents, parent.Name), append(plurals, plural(parent.Name))
				}
			}
			for _, v := range vals {
				if !slices.Contains(cl.Values, v) {
					cl.Values = append(cl.Values, v)
				}
			}
		}
		if len(parents) > 0 {
			detail := "to the broader type " + parents[0]
			if len(parents) > 1 {
				detail = "to the broader types " + orList(parents)
			}
			add(&cl, OpWiden, detail, "other "+orList(plurals), costWidenType)
		}
	case parser.KindPrice:
		if c.Price.Max != nil && e.PriceStretch > 0 {
			cl := rw.exactClause(it.index, c)
			max := *cl.Max * (1 + e.PriceStretch)
			cl.Max = &max
			add(&cl, OpWiden, fmt.Sprintf("ceiling raised by %g%% to %.2f %s", e.PriceStretch*100, max, c.Price.Currency),
				fmt.Sprintf("up to %.2f %s", max, c.Price.Currency), costWiden)
		}
	case parser.KindKeyword:
		var cl *Clause
		var fixed string
		if !rw.knownWord(c) {
			var err error
			if cl, fixed, err = rw.replaceTypo(ctx, it.index, c); err != nil {
				return err
			}
		}
		if cl != nil && cl.Field == string(parser.KindColour) {
			// A colour misspelt: the colour, then the catalog colours near
			// it, as a colour typed right is widened; dropped, it is
			// dropped as a colour is.
			drops = "in any colour"
			add(cl, OpReplace, fmt.Sprintf("%q read as %q", c.Name, fixed), "in "+fixed, costReplace)
			wide, n, err := rw.widenFixedColour(ctx, cl, fixed, e.ColourTolerance)
			if err != nil {
				return err
			}
			if wide != nil {
				add(wide, OpReplace, fmt.Sprintf("%q read as %q, widened to %s within ΔE00 %g", c.Name, fixed,
					textout.Count(n, "catalog colour", "catalog colours"), e.ColourTolerance), "in colours close to "+fixed, costReplace+costWiden)
			}
		} else if cl != nil {
			add(cl, OpReplace, fmt.Sprintf("%q read as %q", c.Name, fixed), fmt.Sprintf("for “%s”", fixed), costReplace)
		}
	}
	if c.IsHead() {
		// The head is widened, never dropped: a shopper who asked for
		// lenses is not shown rugs.
		return nil
	}
	if it.names {
		// Nor is a word that names the product, unknown, when it is no
		// typo of any word whittle knows: a shopper who asked for shampoo
		// is not shown hair dryers. A word near one may be a typo read
		// wrong, and is dropped as any unknown word is.
		near, err := rw.nearestWords(ctx, c.Name)
		if err != nil || len(near) == 0 {
			return err
		}
	}
	drop := costDropSoft
	if c.Strictness >= parser.Firm {
		drop = costDropFirm
	}
	add(nil, OpDrop, "dropped", drops, drop)
	return nil
}

// exactClause is constraint c as a clause.
func (rw *Rewriter) exactClause(i int, c parser.Constraint) Clause {
	cl := Clause{Field: string(c.Kind), Excluded: c.Excluded, From: i}
	switch {
	case c.Kind == parser.KindProductType:
		if e, ok := rw.lex.Lookup(lexicon.ProductType, c.Name); ok {
			cl.Values = rw.typeValues(e)
		} else {
			cl.Values = []string{c.Name}
		}
	case c.Measure != nil && c.Measure.BaseUnit != "" && c.Kind == parser.KindMeasure:
		cl.Dimension, cl.Unit = c.Measure.Dimension, c.Measure.BaseUnit
		cl.Min, cl.Max = c.Measure.BaseAmount, c.Measure.BaseAmount
		if c.Measure.BaseAmount == nil {
			cl.Min, cl.Max = c.Measure.BaseMin, c.Measure.BaseMax
		}
	case c.Price != nil:
		cl.Unit = c.Price.Currency
		cl.Min, cl.Max = decimal(c.Price.Min), decimal(c.Price.Max)
	case c.Size != nil:
		cl.Dimension, cl.Values = c.Size.System, shoeRun(c.Size)
	case c.Spec != nil:
		key, d := c.Spec.Key()
		cl.Dimension, cl.Values = key, []string{d}
		for _, a := range c.Spec.Also {
			cl.Values = append(cl.Values, strings.ToLower(a))
		}
	case c.Kind == parser.KindCompatibility:
		cl.Values = []string{c.Target}
	case c.Kind == parser.KindPartNumber:
		cl.Values = []string{strings.ToLower(c.Code)}
	case c.Kind == parser.KindAudience && !c.Excluded:
		// "boys pajamas" finds the kids' pajamas, made for boys too; an
		// exclusion ("-kids") stays the audience named.
		cl.Values = lexicon.AudienceServes(c.Name)
	case c.Name != "":
		cl.Values = []string{c.Name}
	default:
		cl.Field = string(parser.KindKeyword)
		cl.Values = []string{strings.ToLower(c.Text)}
	}
	return cl
}

// shoeRun is the sizes a size asks for: its value, and for a run of
// shoe sizes ("7-8", as slippers are labelled) each whole and half size
// in it too, so that a shoe in 7.5 is found as a slipper labelled 7-8
// is.
func shoeRun(s *parser.Size) []string {
	out := []string{s.Value}
	lo, hi, ok := strings.Cut(s.Value, "-")
	if s.System != "shoe" || !ok {
		return out
	}
	a, err1 := strconv.ParseFloat(lo, 64)
	b, err2 := strconv.ParseFloat(hi, 64)
	if err1 != nil || err2 != nil || b <= a || b-a > 3 {
		return out
	}
	for v := a; v <= b+1e-9; v += 0.5 {
		out = append(out, strconv.FormatFloat(v, 'f', -1, 64))
	}
	return out
}

func decimal(s *string) *float64 {
	if s == nil {
		return nil
	}
	v, err := strconv.ParseFloat(*s, 64)
	if err != nil {
		return nil
	}
	return &v
}

// typeValues is a product type and all the types below it.
func (rw *Rewriter) typeValues(e *lexicon.Entry) []string {
	out := []string{e.Name}
	for _, t := range rw.lex.Descendants(e) {
		out = append(out, t.Name)
	}
	return out
}

// widenColour lists the catalog colours within tol of the query colour.
// An error is the engine's, reading the catalog's colours.
//
// For an or-group ("navy or black") it is the colours near any of them:
// those near the first, then those near the next, and so on.
func (rw *Rewriter) widenColour(ctx context.Context, it *item, tol float64) (*Clause, int, error) {
	var out *Clause
	var carried []string // the catalog's colours among the values
	for _, m := range it.members() {
		if m.Colour == nil || m.Colour.Lab == nil {
			continue
		}
		l := m.Colour.Lab
		cl, n, err := rw.nearColours(ctx, rw.exactClause(it.index, m), colour.Lab{L: l[0], A: l[1], B: l[2]}, m.Name, tol)
		if err != nil {
			return nil, 0, err
		}
		if cl == nil {
			continue
		}
		for _, v := range cl.Values[:n] {
			if !slices.Contains(carried, v) {
				carried = append(carried, v)
			}
		}
		if out == nil {
			out = cl
			continue
		}
		for _, v := range cl.Values {
			if !slices.Contains(out.Values, v) {
				out.Values = append(out.Values, v)
			}
		}
	}
	if out == nil {
		return nil, 0, nil
	}
	// The names asked, of the group, are in the clause too, whether or
	// not the catalog has them; the count is of those it has.
	for _, v := range rw.itemClause(it).Values {
		if !slices.Contains(out.Values, v) {
			out.Values = append(out.Values, v)
		}
	}
	return out, len(carried), nil
}

// widenFixedColour is the colour clause cl, a typo read as the lexicon
// colour name, widened to the catalog colours within tol of it; nil when
// the lexicon gives the name no value or none is near.
func (rw *Rewriter) widenFixedColour(ctx context.Context, cl *Clause, name string, tol float64) (*Clause, int, error) {
	_, lab, ok := rw.lex.ColourNamed(name)
	if !ok {
		return nil, 0, nil
	}
	return rw.nearColours(ctx, *cl, lab, name, tol)
}

// nearColours is cl asking for the catalog colours within tol of lab,
// nearest first, and name itself, with how many the catalog has; nil
// when none is near. An error is the engine's, reading the colours.
func (rw *Rewriter) nearColours(ctx context.Context, cl Clause, lab colour.Lab, name string, tol float64) (*Clause, int, error) {
	if tol <= 0 {
		return nil, 0, nil
	}
	pal, err := rw.palette(ctx)
	if err != nil || pal == nil {
		return nil, 0, err
	}
	ms := pal.Within(lab, tol)
	if len(ms) == 0 {
		return nil, 0, nil
	}
	cl.Values = make([]string, 0, len(ms)+1)
	for _, m := range ms {
		cl.Values = append(cl.Values, m.Name)
	}
	if !slices.Contains(cl.Values, name) {
		cl.Values = append(cl.Values, name)
	}
	return &cl, len(ms), nil
}

type widening struct {
	clause         *Clause
	detail, phrase string
}

// widenMeasure widens a measure by the policy's tolerance, then to the
// standard sizes around it, when the policy lists them.
func (rw *Rewriter) widenMeasure(it *item, e Effective) []widening {
	if it.group != nil {
		return rw.widenMeasures(it, e)
	}
	m := it.c.Measure
	if m == nil || m.BaseUnit == "" || m.BaseAmount == nil {
		return nil
	}
	v := *m.BaseAmount
	var out []widening
	count := m.Quantity == "count"
	// A count widened by a tolerance that holds no other whole number
	// (3 seats ± 10%) matches what it matched, and is not counted.
	if t := e.MeasureTolerance; t > 0 && (!count || reachesWhole(v, v*(1-t), v*(1+t))) {
		cl := rw.exactClause(it.index, it.c)
		lo, hi := v*(1-t), v*(1+t)
		cl.Min, cl.Max, cl.Near = &lo, &hi, &v
		phrase := fmt.Sprintf("about %s", strings.TrimSpace(m.String()))
		if count {
			phrase = countPhrase(m.Dimension, "about "+strconv.FormatFloat(v, 'f', -1, 64))
		}
		out = append(out, widening{&cl, fmt.Sprintf("to ±%g%% (%.4g..%.4g %s)", t*100, lo, hi, m.BaseUnit), phrase})
	}
	if sizes := e.StandardSizes[m.Dimension]; len(sizes) > 0 {
		var base []float64
		for _, s := range sizes {
			r := parser.ParseWith(s, parser.Options{Lexicon: rw.lex})
			if ms := r.Of(parser.KindMeasure); len(ms) == 1 && ms[0].Measure.BaseAmount != nil && ms[0].Measure.BaseUnit == m.BaseUnit {
				base = append(base, *ms[0].Measure.BaseAmount)
			}
		}
		sort.Float64s(base)
		// The nearest standard sizes below and above the asked amount.
		lo, hi := math.Inf(-1), math.Inf(1)
		for _, b := range base {
			if b < v-1e-9 {
				lo = b
			}
			if b > v+1e-9 && math.IsInf(hi, 1) {
				hi = b
			}
		}
		if !math.IsInf(lo, 0) || !math.IsInf(hi, 0) {
			if math.IsInf(lo, 0) {
				lo = hi
			}
			if math.IsInf(hi, 0) {
				hi = lo
			}
			lo, hi = math.Min(lo, v), math.Max(hi, v)
			cl := rw.exactClause(it.index, it.c)
			cl.Min, cl.Max, cl.Near = &lo, &hi, &v
			out = append(out, widening{&cl, fmt.Sprintf("to the standard sizes around it (%.4g..%.4g %s)", lo, hi, m.BaseUnit),
				"in the nearest standard " + strings.ReplaceAll(m.Dimension, "_", " ") + "s"})
		}
	}
	return out
}

// knownWord reports whether keyword c is a word of the lexicon, a
// product type read as a modifier or a feature ("blanket" in "blanket
// throw"): no typo, so never replaced, though a plural of it is one edit
// away.
func (rw *Rewriter) knownWord(c parser.Constraint) bool {
	for _, k := range []lexicon.Kind{lexicon.ProductType, lexicon.Colour, lexicon.Material, lexicon.Pattern, lexicon.Silhouette, lexicon.Brand} {
		if _, ok := rw.lex.Lookup(k, c.Name); ok {
			return true
		}
	}
	return false
}

// reachesWhole reports whether lo..hi, a count v widened, holds a whole
// number other than v: 3 seats ± 10% does not, so widening it matches
// what it matched.
func reachesWhole(v, lo, hi float64) bool {
	return math.Floor(hi) > v || math.Ceil(lo) < v
}

// widenMeasures widens each measure of an or-group ("50 or 55 inch")
// by the policy's tolerance, as widenMeasure widens one: the first in
// the clause's own bounds, the others in Also. It is nil when the
// tolerance is 0.
func (rw *Rewriter) widenMeasures(it *item, e Effective) []widening {
	t := e.MeasureTolerance
	if t <= 0 {
		return nil
	}
	cl := rw.itemClause(it)
	cl.Also = nil
	count, reaches := it.c.Measure.Quantity == "count", false
	var amounts []string
	for i, m := range it.group {
		v := *m.Measure.BaseAmount
		lo, hi := v*(1-t), v*(1+t)
		if i == 0 {
			cl.Min, cl.Max = &lo, &hi
		} else {
			cl.Also = append(cl.Also, Bounds{Min: &lo, Max: &hi})
		}
		// A count widened by a tolerance that holds no other whole
		// number matches what it matched (widenMeasure).
		reaches = reaches || !count || reachesWhole(v, lo, hi)
		if count {
			amounts = append(amounts, strconv.FormatFloat(v, 'f', -1, 64))
		} else {
			amounts = append(amounts, strings.TrimSpace(m.Measure.String()))
		}
	}
	if !reaches {
		return nil
	}
	phrase := "about " + orList(amounts)
	if count {
		phrase = countPhrase(it.c.Measure.Dimension, phrase)
	}
	return []widening{{&cl, fmt.Sprintf("each to ±%g%%", t*100), phrase}}
}

// replaceTypo reads an unknown word as the likeliest word nearestWords
// gives; never for numbers or codes.
func (rw *Rewriter) replaceTypo(ctx context.Context, i int, c parser.Constraint) (*Clause, string, error) {
	near, err := rw.nearestWords(ctx, c.Name)
	if len(near) == 0 {
		return nil, "", err
	}
	best := near[0]
	name := best.word
	if best.entry != nil {
		name = best.entry.Name
	}
	fixed := parser.Constraint{Kind: best.kind, Name: name, Text: c.Text}
	cl := rw.exactClause(i, fixed)
	return &cl, name, nil
}

// nearestWords are the vocabulary words an unknown word w may be a typo
// of, likeliest first: for words of 5 letters or more, those that differ
// from it only in vowels, within two edits ("sandles" for sandals), then
// those of the least edit distance, within 1 for words of 4 to 7 letters
// and 2 for longer ones ("candles"), each in the vocabulary's order. It
// is nil for shorter words, numbers and codes, or when no word is that
// near. An error is the engine's, reading the catalog's words.
func (rw *Rewriter) nearestWords(ctx context.Context, w string) ([]*wordEntry, error) {
	limit, ok := typoLimit(w)
	if !ok {
		return nil, nil
	}
	words, near, err := rw.words(ctx)
	if err != nil {
		return nil, err
	}
	var slips []int
	if utf8.RuneCountInString(w) >= 5 {
		slips = near.VowelSlips(w)
	}
	all, _ := near.AllNearest(w, limit)
	var out []*wordEntry
	for _, j := range slices.Concat(slips, all) {
		if !slices.ContainsFunc(out, func(e *wordEntry) bool { return e == &words[j] }) {
			out = append(out, &words[j])
		}
	}
	return out, nil
}

// typoLimit is how many edits a typo of w may be: 1 for words of 4 to 7
// letters, 2 for longer ones; none for shorter words, numbers and codes.
func typoLimit(w string) (int, bool) {
	n := len([]rune(w))
	if n < 4 || strings.ContainsAny(w, "0123456789 -") {
		return 0, false
	}
	if n >= 8 {
		return 2, true
	}
	return 1, true
}

func kindOfEntry(e *lexicon.Entry) parser.Kind {
	switch e.Kind {
	case lexicon.ProductType:
		return parser.KindProductType
	case lexicon.Colour:
		return parser.KindColour
	case lexicon.Material:
		return parser.KindMaterial
	case lexicon.Pattern:
		return parser.KindPattern
	case lexicon.Silhouette:
		return parser.KindSilhouette
	case lexicon.Brand:
		return parser.KindBrand
	}
	return parser.KindKeyword
}

// plural is the plural of a product type, for messages: "rain jackets",
// "lenses", "batteries", "knives", "shelves". A type already plural in form
// ("headphones", "socks", "swim trunks") or a mass noun ("lumber",
// "underwear") stays as it is. The rules are those of English spelling
// (common usage).
func plural(s string) string {
	i := strings.LastIndexByte(s, ' ') + 1
	head, last := s[:i], s[i:]
	if p, ok := irregularPlural[last]; ok {
		return head + p
	}
	switch {
	case unchangedPlural[last], pluralInForm(last):
		return s
	case strings.HasSuffix(s, "s"), strings.HasSuffix(s, "x"), strings.HasSuffix(s, "z"), strings.HasSuffix(s, "ch"), strings.HasSuffix(s, "sh"):
		return s + "es"
	case strings.HasSuffix(s, "ife"):
		return s[:len(s)-2] + "ves"
	case strings.HasSuffix(s, "elf"), strings.HasSuffix(s, "alf"), strings.HasSuffix(s, "arf"):
		return s[:len(s)-1] + "ves"
	case strings.HasSuffix(s, "y") && !strings.HasSuffix(s, "ey") && !strings.HasSuffix(s, "ay") && !strings.HasSuffix(s, "oy"):
		return s[:len(s)-1] + "ies"
	}
	return s + "s"
}

// pluralInForm reports whether a word already reads as a plural: it ends
// in an s that is not part of "ss", "us", "is" or "as" ("socks", "briefs",
// "shoes", "glasses", "batteries"), and is not one of the few singular
// nouns a shop sells that end so ("lens").
func pluralInForm(w string) bool {
	if !strings.HasSuffix(w, "s") || singularInS[w] {
		return false
	}
	for _, end := range []string{"ss", "us", "is", "as"} {
		if strings.HasSuffix(w, end) {
			return false
		}
	}
	return true
}

// singularInS are singular nouns ending in a single s.
var singularInS = map[string]bool{"lens": true}

// irregularPlural are plurals no spelling rule gives (common usage).
var irregularPlural = map[string]string{"mouse": "mice"}

// unchangedPlural are nouns a shop does not count, whose plural, as it
// writes it, is the word itself (common usage). Those plural in form
// need no entry (pluralInForm).
var unchangedPlural = map[string]bool{
	"lumber": true, "luggage": true, "furniture": true, "flooring": true, "decking": true, "mulch": true,
	"soil": true, "gravel": true, "sand": true, "cement": true, "concrete": true, "insulation": true,
	"underwear": true, "jewelry": true, "jewellery": true, "cutlery": true, "plywood": true, "mdf": true,
	"caulk": true, "wallpaper": true, "art": true, "polyurethane": true, "paper": true, "cardstock": true,
	"film": true, "glue": true, "tape": true, "ram": true, "wifi": true, "lvl": true, "osb": true, "glulam": true,
	"shiplap": true, "hardboard": true, "trim": true, "compound": true, "paste": true, "lacquer": true,
	"varnish": true, "pajamas": true, "pyjamas": true,
	// Measures named in "... carried" lists.
	"current": true, "data": true, "memory": true, "storage": true, "power": true, "charge": true, "time": true,
}

// dropPhrase says to a shopper what dropping c means.
func dropPhrase(c parser.Constraint) string {
	switch c.Kind {
	case parser.KindColour:
		return "in any colour"
	case parser.KindPattern:
		return "in any pattern"
	case parser.KindMaterial:
		return "in any material"
	case parser.KindSilhouette:
		return "in any style"
	case parser.KindBrand:
		return "from any brand"
	case parser.KindSize:
		return "in any size"
	case parser.KindMeasure:
		if c.Measure.Quantity == "count" {
			return countPhrase(c.Measure.Dimension, "any")
		}
		return "in any " + strings.ReplaceAll(c.Measure.Dimension, "_", " ")
	case parser.KindPrice:
		return "at any price"
	case parser.KindProductType:
		return "of any kind"
	}
	return fmt.Sprintf("without “%s”", strings.ToLower(c.Text))
}

// countPhrase says, to a shopper, a count of dimension dim that is how
// many ("any", "about 4"): "with any number of seats", "in packs of about
// 24", "in any thread count".
func countPhrase(dim, how string) string {
	switch dim {
	case "pack_size":
		if how == "any" {
			return "in any pack size"
		}
		return "in packs of " + how
	case "thread_count", "ply":
		if how == "any" {
			return "in any " + strings.ReplaceAll(dim, "_", " ")
		}
		return "of " + how + " " + strings.ReplaceAll(dim, "_", " ")
	}
	if how == "any" {
		return "with any number of " + strings.ReplaceAll(dim, "_", " ")
	}
	return "with " + how + " " + strings.ReplaceAll(dim, "_", " ")
}

// widenToCarried widens a measure to the nearest amounts the catalog
// carries below and above it, among products like the ones asked for.
func (rw *Rewriter) widenToCarried(ctx context.Context, it *item, within Plan) (*widening, error) {
	cat, ok := rw.engine.(Catalog)
	m := it.c.Measure
	if !ok || m == nil || m.BaseUnit == "" || m.BaseAmount == nil {
		return nil, nil
	}
	vals, err := cat.Values(ctx, string(parser.KindMeasure), m.Dimension, within)
	if err != nil || len(vals) == 0 {
		return nil, err
	}
	v := *m.BaseAmount
	lo, hi := math.Inf(-1), math.Inf(1)
	for s := range vals {
		x, err := parseNum(s)
		if err != nil {
			continue
		}
		if x < v && x > lo {
			lo = x
		}
		if x > v && x < hi {
			hi = x
		}
	}
	if math.IsInf(lo, 0) && math.IsInf(hi, 0) {
		return nil, nil
	}
	if math.IsInf(lo, 0) {
		lo = v
	}
	if math.IsInf(hi, 0) {
		hi = v
	}
	cl := rw.exactClause(it.index, it.c)
	cl.Min, cl.Max, cl.Near = &lo, &hi, &v
	phrase := "in the nearest " + plural(strings.ReplaceAll(m.Dimension, "_", " ")) + " carried"
	if m.Quantity == "count" && m.Dimension != "pack_size" && m.Dimension != "thread_count" && m.Dimension != "ply" {
		phrase = "with the nearest number of " + strings.ReplaceAll(m.Dimension, "_", " ") + " carried"
	}
	return &widening{&cl, fmt.Sprintf("to the nearest amounts carried (%.4g..%.4g %s)", lo, hi, m.BaseUnit), phrase}, nil
}

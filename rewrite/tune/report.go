package tune

import (
	"encoding/json"
	"fmt"
	"maps"
	"math"
	"slices"

	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/internal/textout"
	"github.com/whittle-search/whittle/rewrite/signals"
)

// Report is what tune found and recommends.
type Report struct {
	// Join sums up the join of the log, when Read joined it.
	Join  signals.JoinStats `json:"join"`
	Stats Stats             `json:"stats"`
	// Signals are the [signals] settings used.
	Signals rewrite.Signals `json:"signals"`
	Bias    Bias            `json:"position_bias"`
	// Categories holds the figures and recommendations, by category
	// name; "" is searches with no category.
	Categories []Category `json:"categories"`
	// Changes are the recommendations that differ from the policy in
	// force, as policy keys.
	Changes []Change `json:"changes"`
	Aliases []Alias  `json:"aliases"`
	// Proposed is the policy in force with Changes applied; it is not
	// applied anywhere by tune.
	Proposed *rewrite.Policy `json:"-"`
}

// Caveat is said in every report: what signals cannot show.
const Caveat = "Signals cover only what whittle showed: a relaxation it never made, or a product it never showed, can earn no engagement, so tune cannot recommend loosening what is hard today. Exploration (--explore) shows a relaxed alternative now and then so that tune sees it. Nothing here uses anything about a shopper beyond the session id."

// Category is one category's figures and recommendations.
type Category struct {
	Name    string     `json:"name"`
	Exact   Figure     `json:"exact"`
	Kinds   []Kind     `json:"kinds"`
	Colour  *Tolerance `json:"colour_tolerance,omitempty"`
	Measure *Tolerance `json:"measure_tolerance,omitempty"`
}

// Kind is the evidence on one kind of constraint in a category and the
// strictness it points to.
type Kind struct {
	Kind        parser.Kind       `json:"kind"`
	Ops         []Op              `json:"ops"`
	Current     parser.Strictness `json:"current"`
	Recommended parser.Strictness `json:"recommended"`
	Reason      string            `json:"reason"`
}

// Op is the figure for one operator applied to a kind.
type Op struct {
	Op string `json:"op"`
	Figure
}

// Tolerance is the engagement of the products shown by how far they
// strayed from the colour (ΔE00) or measure (a share of it) asked, and
// the tolerance it points to.
type Tolerance struct {
	Bins        []Bin   `json:"bins"`
	Current     float64 `json:"current"`
	Recommended float64 `json:"recommended"`
	Reason      string  `json:"reason"`
	verdict     verdict
}

// Bin is the figure for products that strayed From up to To.
type Bin struct {
	From float64 `json:"from"`
	To   float64 `json:"to"`
	Figure
}

// Change is one recommendation that differs from the policy in force.
type Change struct {
	// Key is the policy key, such as "category.apparel.strictness.size".
	Key    string `json:"key"`
	From   string `json:"from"`
	To     string `json:"to"`
	Reason string `json:"reason"`
}

// verdict is what a figure says about a relaxation.
type verdict uint8

const (
	few      verdict = iota // too few searches to say
	accepted                // the interval lies at or above the keep share
	refused                 // the interval lies below it
	unclear                 // the interval straddles it
)

func (t *Tuner) judge(f Figure, enough int) verdict {
	switch {
	case f.Searches < enough || f.Shown < enough || math.IsNaN(f.Low):
		return few
	case f.Low >= t.sig.KeepShare:
		return accepted
	case f.High < t.sig.KeepShare:
		return refused
	}
	return unclear
}

// Report sums up what the Tuner has read.
func (t *Tuner) Report() *Report {
	rep := &Report{Join: t.join, Stats: t.stats, Signals: t.sig, Bias: t.biasUsed(), Changes: []Change{}, Aliases: t.aliasList(), Categories: []Category{}}
	inv := propensities(rep.Bias.Eta)
	cats := map[string]bool{}
	for k := range t.groups {
		cats[k.category] = true
	}
	overlay := &rewrite.Policy{Categories: map[string]rewrite.Settings{}}
	for _, c := range slices.Sorted(maps.Keys(cats)) {
		cr, changes, set := t.category(c, &inv)
		rep.Categories = append(rep.Categories, cr)
		rep.Changes = append(rep.Changes, changes...)
		if len(changes) > 0 {
			overlay.Categories[c] = set
		}
	}
	rep.Proposed = t.pol.Overlay(overlay)
	return rep
}

// biasUsed is η: fitted from shuffled searches when the policy allows
// it and there are enough of them, else the policy's.
func (t *Tuner) biasUsed() Bias {
	eta, ranks, clicks := t.bias.fit()
	b := Bias{Eta: t.sig.PositionBias, Fitted: eta, Ranks: ranks, Clicks: clicks}
	switch {
	case math.IsNaN(eta):
		b.Note = fmt.Sprintf("too few clicks on shuffled searches to fit η (%d clicks at %d ranks; want %d at 3 ranks or more): the policy's position_bias is used", clicks, ranks, minBiasClicks)
	case !t.sig.EstimateBias:
		b.Note = "the policy sets estimate_position_bias = false: its position_bias is used"
	default:
		b.Eta, b.Estimated = math.Max(0, eta), true
	}
	return b
}

// category works out one category's figures, its changes, and the
// settings that make them.
func (t *Tuner) category(name string, inv *[maxRank]float64) (Category, []Change, rewrite.Settings) {
	exact := t.groups[groupKey{category: name}]
	if exact == nil {
		exact = &tally{}
	}
	cur := t.pol.For(name, "", t.lex)
	cr := Category{Name: name, Exact: figure(exact, exact, inv), Kinds: []Kind{}}
	var changes []Change
	set := rewrite.Settings{Strictness: map[parser.Kind]parser.Strictness{}}
	key := func(k string) string { return "category." + name + "." + k }
	if t.opts.Products != nil {
		cr.Colour = t.tolerance(name, parser.KindColour, byColour, colourBin, cur.ColourTolerance, exact, inv)
		cr.Measure = t.tolerance(name, parser.KindMeasure, byMeasure, measureBin, cur.MeasureTolerance, exact, inv)
	}
	kinds := map[parser.Kind]bool{}
	for k := range t.groups {
		if k.category == name && k.kind != "" && k.axis == byKind {
			kinds[k.kind] = true
		}
	}
	for _, k := range parser.AllKinds() {
		if !kinds[k] || k == parser.KindFiller {
			continue
		}
		kr := t.kind(name, k, cur.Strictness[k], exact, inv, cr)
		cr.Kinds = append(cr.Kinds, kr)
		if kr.Recommended != kr.Current && name != "" {
			set.Strictness[k] = kr.Recommended
			changes = append(changes, Change{Key: key("strictness." + string(k)), From: kr.Current.String(), To: kr.Recommended.String(), Reason: kr.Reason})
		}
	}
	for _, x := range []struct {
		tol  *Tolerance
		kind parser.Kind
		name string
		dst  **float64
	}{{cr.Colour, parser.KindColour, "colour_tolerance", &set.ColourTolerance}, {cr.Measure, parser.KindMeasure, "measure_tolerance", &set.MeasureTolerance}} {
		if x.tol == nil || x.tol.Recommended == x.tol.Current || name == "" {
			continue
		}
		// A kind that stays hard is never widened, so its tolerance is
		// not used: no change is proposed for it.
		if strict, ok := recommended(cr.Kinds, x.kind); !ok && cur.Strictness[x.kind] == parser.Hard || ok && strict == parser.Hard {
			x.tol.Reason += fmt.Sprintf("; but %s stays hard here, so its tolerance is not used and is left as it is", x.kind)
			x.tol.Recommended = x.tol.Current
			continue
		}
		v := x.tol.Recommended
		*x.dst = &v
		changes = append(changes, Change{Key: key(x.name), From: fmt.Sprintf("%g", x.tol.Current), To: fmt.Sprintf("%g", v), Reason: x.tol.Reason})
	}
	if name == "" {
		for i := range cr.Kinds {
			cr.Kinds[i].Recommended = cr.Kinds[i].Current
			cr.Kinds[i].Reason = "searches with no category: tune changes only categories; " + cr.Kinds[i].Reason
		}
	}
	return cr, changes, set
}

// recommended is the strictness recommended for kind k, if it has a row.
func recommended(ks []Kind, k parser.Kind) (parser.Strictness, bool) {
	for _, r := range ks {
		if r.Kind == k {
			return r.Recommended, true
		}
	}
	return 0, false
}

// kind weighs the evidence on one kind and recommends its strictness.
func (t *Tuner) kind(cat string, k parser.Kind, current parser.Strictness, exact *tally, inv *[maxRank]float64, cr Category) Kind {
	kr := Kind{Kind: k, Current: current, Recommended: current, Ops: []Op{}}
	min := t.sig.MinSearches
	var drop, widen verdict = few, few
	var dropFig *Figure
	for _, op := range []string{rewrite.OpWiden, rewrite.OpReplace, rewrite.OpDrop} {
		g := t.groups[groupKey{category: cat, kind: k, op: op}]
		if g == nil {
			continue
		}
		f := figure(g, exact, inv)
		kr.Ops = append(kr.Ops, Op{Op: op, Figure: f})
		v := t.judge(f, min)
		if op == rewrite.OpDrop {
			drop, dropFig = v, &kr.Ops[len(kr.Ops)-1].Figure
		} else {
			widen = combine(widen, v)
		}
	}
	// A colour or a measure is judged widened by its tolerance: widening
	// is accepted when products some way off still engage.
	if k == parser.KindColour && cr.Colour != nil {
		widen = cr.Colour.verdict
	}
	if k == parser.KindMeasure && cr.Measure != nil {
		widen = cr.Measure.verdict
	}
	say := func(s parser.Strictness, why string) {
		kr.Recommended, kr.Reason = s, why
	}
	dropped := ""
	if dropFig != nil {
		dropped = fmt.Sprintf("dropping %s kept %s of exact-match engagement (%s, %s)", k, pct(dropFig.Ratio), interval(*dropFig), textout.Count(int(dropFig.Searches), "search", "searches"))
	}
	switch {
	case drop == accepted:
		say(parser.Soft, dropped+": shoppers do without it")
	case drop == refused && widen == accepted:
		say(parser.Firm, dropped+", but widened it held up: widen, drop only when widening fails")
	case drop == refused:
		say(parser.Hard, dropped+" and nothing shows that widening helps: never relax it")
	case widen == refused && drop == few:
		say(parser.Hard, fmt.Sprintf("widening %s lost engagement and too few searches dropped it to say more: never relax it", k))
	case drop == few && widen == few:
		kr.Reason = fmt.Sprintf("too few searches relaxed %s (want %d): the current setting stays", k, min)
	case drop == few && widen == accepted:
		kr.Reason = fmt.Sprintf("widened %s held up, but too few searches dropped it (want %d) to say whether shoppers do without it: the current setting stays", k, min)
	case drop == unclear:
		kr.Reason = fmt.Sprintf("%s, an interval across the keep share of %s: the current setting stays", dropped, pct(t.sig.KeepShare))
	default:
		kr.Reason = fmt.Sprintf("the evidence on %s is unclear: the current setting stays", k)
	}
	if k == parser.KindSpec && kr.Recommended < current {
		kr.Recommended = current
		kr.Reason += "; but tune never loosens a standard designation (wire gauge, tyre size, thread): defer to local codes and the maker's specification"
	}
	return kr
}

// combine joins the verdicts of two operators that both widen.
func combine(a, b verdict) verdict {
	switch {
	case a == accepted || b == accepted:
		return accepted
	case a == few:
		return b
	case b == few:
		return a
	case a == refused && b == refused:
		return refused
	}
	return unclear
}

// tolerance bins a category's products shown after relaxing kind by how
// far they strayed and finds the furthest bin before engagement clearly
// falls below the keep share.
func (t *Tuner) tolerance(cat string, kind parser.Kind, ax axis, width, current float64, exact *tally, inv *[maxRank]float64) *Tolerance {
	n := colourBins
	unit := func(x float64) string { return fmt.Sprintf("ΔE00 %g", x) }
	if ax == byMeasure {
		n, unit = measureBins, func(x float64) string { return fmt.Sprintf("%g%%", math.Round(x*1000)/10) }
	}
	tol := &Tolerance{Bins: []Bin{}, Current: current, Recommended: current}
	reach, stop, judged := 0.0, -1.0, false
	// Thin bands are pooled with the next ones until the pool has enough
	// searches and products to judge: a band as wide as the data need.
	pool, from := (*tally)(nil), 0
	for b := range n {
		if g := t.groups[groupKey{category: cat, kind: kind, axis: ax, bin: b}]; g != nil {
			if pool == nil {
				pool = &tally{}
			}
			pool.merge(g)
		}
		if pool == nil {
			from = b + 1
			continue
		}
		last := b == n-1
		enough := pool.searches >= t.sig.MinSearches && int(pool.shown) >= t.sig.MinSearches
		if !enough && !last {
			continue
		}
		f := figure(pool, exact, inv)
		bin := Bin{From: round(float64(from) * width), To: round(float64(b+1) * width), Figure: f}
		if last {
			bin.To = math.Inf(1)
		}
		tol.Bins = append(tol.Bins, bin)
		pool, from = nil, b+1
		if stop >= 0 {
			continue
		}
		switch t.judge(f, t.sig.MinSearches) {
		case refused:
			stop, judged = bin.From, true
		case accepted:
			if !math.IsInf(bin.To, 1) {
				reach, judged = bin.To, true
			}
		case unclear:
			if f.Ratio >= t.sig.KeepShare && !math.IsInf(bin.To, 1) {
				reach, judged = bin.To, true
			}
		}
	}
	if len(tol.Bins) == 0 {
		return nil
	}
	switch {
	case !judged:
		tol.verdict = few
		tol.Reason = fmt.Sprintf("too few products shown in any one band (want %d searches and products): the current %s stays", t.sig.MinSearches, unit(current))
		return tol
	case stop == 0:
		tol.Recommended = 0
		tol.Reason = fmt.Sprintf("engagement falls clearly below %s of exact matches even in the nearest band: only what was asked holds", pct(t.sig.KeepShare))
	case stop > 0 && stop <= reach+width/2:
		tol.Recommended = stop
		tol.Reason = fmt.Sprintf("engagement stays within %s of exact matches up to %s and falls clearly below it from there", pct(t.sig.KeepShare), unit(stop))
	case stop > 0 && reach == 0:
		tol.verdict = unclear
		tol.Reason = fmt.Sprintf("engagement falls clearly below %s of exact matches from %s, and no nearer band has enough products shown to say where it holds: the current %s stays", pct(t.sig.KeepShare), unit(stop), unit(current))
		return tol
	case stop > 0:
		// Between reach and stop the data cannot say: a setting there
		// stays, one outside is brought to the nearer end.
		tol.Recommended = min(max(current, reach), stop)
		tol.Reason = fmt.Sprintf("engagement stays within %s of exact matches up to %s and falls clearly below it from %s; between them too few products were shown to say, so %s", pct(t.sig.KeepShare), unit(reach), unit(stop), settle(current, tol.Recommended, unit))
	default:
		// Nothing shown fell below the share: a wider setting is not
		// contradicted, a narrower one is raised to what held.
		tol.Recommended = max(current, reach)
		tol.Reason = fmt.Sprintf("engagement stays within %s of exact matches as far as products were shown, %s, so %s", pct(t.sig.KeepShare), unit(reach), settle(current, tol.Recommended, unit))
	}
	tol.verdict = accepted
	if tol.Recommended == 0 {
		tol.verdict = refused
	}
	if math.Abs(tol.Recommended-current) < width/2 {
		tol.Recommended = current
	}
	return tol
}

// settle says what becomes of the current setting.
func settle(current, recommended float64, unit func(float64) string) string {
	if current == recommended {
		return fmt.Sprintf("the current %s stays", unit(current))
	}
	return fmt.Sprintf("%s, not %s", unit(recommended), unit(current))
}

func round(x float64) float64 { return math.Round(x*1e6) / 1e6 }

func pct(x float64) string {
	if math.IsNaN(x) {
		return "?"
	}
	return fmt.Sprintf("%.0f%%", 100*x)
}

func interval(f Figure) string {
	if math.IsNaN(f.Low) {
		return "no interval"
	}
	return fmt.Sprintf("95%% interval %s–%s", pct(f.Low), pct(f.High))
}

// finite is x, or nil for NaN and infinities, which JSON cannot hold.
func finite(x float64) *float64 {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return nil
	}
	return &x
}

// MarshalJSON writes the figure with null for a ratio or bound that
// cannot be worked out.
func (f Figure) MarshalJSON() ([]byte, error) {
	return json.Marshal(struct {
		Searches   int      `json:"searches"`
		Shown      int      `json:"shown"`
		Engagement *float64 `json:"engagement"`
		Ratio      *float64 `json:"ratio"`
		Low        *float64 `json:"low"`
		High       *float64 `json:"high"`
	}{f.Searches, f.Shown, finite(f.Engagement), finite(f.Ratio), finite(f.Low), finite(f.High)})
}

// MarshalJSON writes the bin with null for the open end of the last.
func (b Bin) MarshalJSON() ([]byte, error) {
	return json.Marshal(struct {
		From   float64  `json:"from"`
		To     *float64 `json:"to"`
		Figure Figure   `json:"figure"`
	}{b.From, finite(b.To), b.Figure})
}

// MarshalJSON writes the bias with null for a fit not made.
func (b Bias) MarshalJSON() ([]byte, error) {
	type plain Bias
	return json.Marshal(struct {
		plain
		Fitted *float64 `json:"fitted"`
	}{plain(b), finite(b.Fitted)})
}

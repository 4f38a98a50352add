package tune

import (
	"context"
	"hash/fnv"
	"math"
	"strings"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/signals"
)

// Options configure a Tuner.
type Options struct {
	// Policy is the policy in force; nil means the built-in one. Its
	// [signals] table sets the weights, η, and the thresholds.
	Policy *rewrite.Policy
	// Lexicon reads the queries; nil means lexicon.Default().
	Lexicon *lexicon.Lexicon
	// Products describes the products shown (an index). Without it tune
	// cannot tell how far a colour or a measure strayed, nor what was
	// bought, so it recommends no tolerance and mines no alias.
	Products rewrite.Describer
	// MinAliasSupport is the fewest sessions behind an alias candidate
	// (default 2).
	MinAliasSupport int
}

// Bins of how far a shown product strayed from what was asked.
const (
	colourBin    = 1.0  // ΔE00
	colourBins   = 30   // up to ΔE00 30; further counts in the last bin
	measureBin   = 0.02 // share of the asked measure
	measureBins  = 25   // up to 50% off
	parseCache   = 1 << 13
	factsCache   = 1 << 17
	aliasLimit   = 1 << 16
	sessionLimit = 1 << 12 // searches of one session looked at for aliases
)

// axis says what a group's bins measure.
type axis uint8

const (
	byKind axis = iota
	byColour
	byMeasure
)

// groupKey names one group of shown products: the exact matches of a
// category (kind ""), the searches of a category that relaxed one kind
// with one operator, or the products of a category that strayed a
// binned distance from the colour or measure asked.
type groupKey struct {
	category string
	kind     parser.Kind
	op       string
	axis     axis
	bin      int
}

// reading is what tune needs of a parsed query.
type reading struct {
	category     string
	lab          *colour.Lab
	dimension    string
	amount       float64 // the measure asked, in base units; 0 if none
	unrecognised string
}

// Tuner accumulates joined sessions. It is not safe for concurrent use;
// memory grows with the groups seen (categories × kinds × bins), the
// caches of parsed queries and described products (both capped), and
// the alias candidates (capped), not with the log's length.
type Tuner struct {
	opts    Options
	lex     *lexicon.Lexicon
	pol     *rewrite.Policy
	sig     rewrite.Signals
	weights map[signals.Type]float64
	groups  map[groupKey]*tally
	bias    biasTally
	aliases map[alias]int
	parsed  map[string]*reading
	facts   map[string]*rewrite.Facts
	stats   Stats
	join    signals.JoinStats
}

// Stats count what a Tuner read.
type Stats struct {
	Sessions int `json:"sessions"`
	Searches int `json:"searches"`
	// Exact and Relaxed count searches by whether whittle relaxed them;
	// SetAside counts those that relaxed more than one kind, which say
	// nothing about any one kind alone.
	Exact    int `json:"exact"`
	Relaxed  int `json:"relaxed"`
	SetAside int `json:"set_aside"`
	Explored int `json:"explored"`
	Shuffled int `json:"shuffled"`
	// FoundNothing counts searches that showed nothing.
	FoundNothing int `json:"found_nothing"`
	// Engagements counts the interactions joined to searches.
	Engagements int `json:"engagements"`
	// Undescribed counts shown products the index could not describe.
	Undescribed int `json:"undescribed"`
	// AliasesDropped counts alias candidates not kept once the cap on
	// distinct candidates was reached.
	AliasesDropped int `json:"aliases_dropped"`
}

// New returns a Tuner.
func New(opts Options) *Tuner {
	if opts.Policy == nil {
		opts.Policy = rewrite.DefaultPolicy()
	}
	if opts.Lexicon == nil {
		opts.Lexicon = lexicon.Default()
	}
	if opts.MinAliasSupport < 1 {
		opts.MinAliasSupport = 2
	}
	t := &Tuner{opts: opts, lex: opts.Lexicon, pol: opts.Policy, sig: opts.Policy.Signals(),
		weights: map[signals.Type]float64{}, groups: map[groupKey]*tally{}, aliases: map[alias]int{},
		parsed: map[string]*reading{}, facts: map[string]*rewrite.Facts{}}
	w := t.sig.Weights
	t.weights[signals.Impression], t.weights[signals.Click] = w.Impression, w.Click
	t.weights[signals.AddToCart], t.weights[signals.Purchase] = w.AddToCart, w.Purchase
	return t
}

// Add reads one closed session. Only ctx's cancellation and the
// describer's errors other than an unknown product stop it.
func (t *Tuner) Add(ctx context.Context, s *signals.Session) error {
	t.stats.Sessions++
	for i := range s.Searches {
		if err := ctx.Err(); err != nil {
			return err
		}
		if err := t.search(ctx, s.ID, &s.Searches[i]); err != nil {
			return err
		}
	}
	return t.mine(ctx, s)
}

// search tallies one joined search.
func (t *Tuner) search(ctx context.Context, session string, j *signals.Joined) error {
	ev := &j.Search
	t.stats.Searches++
	t.stats.Engagements += len(j.Engagements)
	if len(ev.Shown) == 0 {
		t.stats.FoundNothing++
		return nil
	}
	slots := make([]slot, len(ev.Shown))
	for i := range slots {
		slots[i].rank = i + 1
	}
	for _, e := range j.Engagements {
		if e.Rank >= 1 && e.Rank <= len(slots) {
			slots[e.Rank-1].worth += t.weights[e.Type]
		}
	}
	var w [replicates]uint8
	draws(searchSeed(session, ev), &w)
	category := ev.Category
	if category == "" {
		category = t.read(ev.Query).category
	}
	kind, op, n := single(ev.Relaxations)
	switch {
	case n == 0:
		t.stats.Exact++
	case n == 1:
		t.stats.Relaxed++
	default:
		t.stats.Relaxed++
		t.stats.SetAside++
	}
	main := slots
	var explored []slot
	if x := ev.Explored; x != nil && x.Rank >= 1 && x.Rank <= len(slots) {
		t.stats.Explored++
		explored = []slot{slots[x.Rank-1]}
		main = append(append([]slot(nil), slots[:x.Rank-1]...), slots[x.Rank:]...)
		xk, xop, xn := single(x.Relaxations)
		if n == 0 && xn == 1 {
			if err := t.relaxed(ctx, category, xk, xop, ev, explored, &w); err != nil {
				return err
			}
		}
	}
	if ev.Shuffled {
		t.stats.Shuffled++
		t.bias.add(main, j.Engagements)
	}
	switch n {
	case 0:
		t.group(groupKey{category: category}).add(main, &w)
	case 1:
		return t.relaxed(ctx, category, kind, op, ev, main, &w)
	}
	return nil
}

// relaxed tallies products shown after relaxing one kind (all of a
// search's, or the one explored): by kind and operator, and for a colour
// or a measure by how far each strayed.
func (t *Tuner) relaxed(ctx context.Context, category string, kind parser.Kind, op string, ev *signals.Event, slots []slot, w *[replicates]uint8) error {
	t.group(groupKey{category: category, kind: kind, op: op}).add(slots, w)
	if t.opts.Products == nil || (kind != parser.KindColour && kind != parser.KindMeasure) || op == rewrite.OpReplace {
		return nil
	}
	r := t.read(ev.Query)
	if kind == parser.KindColour && r.lab == nil || kind == parser.KindMeasure && r.amount == 0 {
		return nil
	}
	bins := map[int][]slot{}
	for _, s := range slots {
		f, err := t.describe(ctx, ev.Shown[s.rank-1])
		if err != nil {
			return err
		}
		b, ok := binOf(kind, r, f)
		if !ok {
			continue
		}
		bins[b] = append(bins[b], s)
	}
	ax := byColour
	if kind == parser.KindMeasure {
		ax = byMeasure
	}
	for b, ss := range bins {
		t.group(groupKey{category: category, kind: kind, axis: ax, bin: b}).add(ss, w)
	}
	return nil
}

// binOf is the bin of how far product f strayed from reading r.
func binOf(kind parser.Kind, r *reading, f *rewrite.Facts) (int, bool) {
	if f == nil {
		return 0, false
	}
	if kind == parser.KindColour {
		if f.Lab == nil {
			return 0, false
		}
		d := colour.DeltaE2000(*r.lab, colour.Lab{L: f.Lab[0], A: f.Lab[1], B: f.Lab[2]})
		return min(int(d/colourBin), colourBins-1), true
	}
	v, ok := f.Measures[r.dimension]
	if !ok {
		return 0, false
	}
	d := math.Abs(v-r.amount) / r.amount
	return min(int(d/measureBin+1e-9), measureBins-1), true
}

func (t *Tuner) group(k groupKey) *tally {
	g := t.groups[k]
	if g == nil {
		g = &tally{}
		t.groups[k] = g
	}
	return g
}

// single returns the one kind a search relaxed (filler aside) with its
// strongest operator, and how many kinds it relaxed.
func single(rs []signals.Relaxed) (parser.Kind, string, int) {
	var kind parser.Kind
	op, n := "", 0
	for _, r := range rs {
		switch {
		case r.Kind == parser.KindFiller:
		case n == 0 || r.Kind == kind:
			kind, n = r.Kind, 1
			if opRank(r.Op) > opRank(op) {
				op = r.Op
			}
		default:
			return "", "", 2
		}
	}
	return kind, op, n
}

func opRank(op string) int {
	switch op {
	case rewrite.OpWiden:
		return 1
	case rewrite.OpReplace:
		return 2
	case rewrite.OpDrop:
		return 3
	}
	return 0
}

// searchSeed seeds a search's bootstrap weights from what identifies it.
func searchSeed(session string, ev *signals.Event) uint64 {
	h := fnv.New64a()
	h.Write([]byte(session))
	h.Write([]byte{0})
	h.Write([]byte(ev.Query))
	var b [8]byte
	n := uint64(ev.Time.UnixNano())
	for i := range b {
		b[i] = byte(n >> (8 * i))
	}
	h.Write(b[:])
	return h.Sum64()
}

// read parses a query, from the cache when it was read before.
func (t *Tuner) read(q string) *reading {
	if r, ok := t.parsed[q]; ok {
		return r
	}
	if len(t.parsed) >= parseCache {
		clear(t.parsed)
	}
	p := parser.ParseWith(q, parser.Options{Lexicon: t.lex})
	r := &reading{category: p.Category, unrecognised: strings.Join(p.Unrecognised, " ")}
	for _, c := range p.Constraints {
		switch {
		case c.Excluded:
		case c.OrGroup != 0:
			// "navy or black", "50 or 55 inch": no one colour or amount
			// was asked, so none measures how far a product strayed.
		case c.Kind == parser.KindColour && r.lab == nil && c.Colour != nil && c.Colour.Lab != nil:
			r.lab = &colour.Lab{L: c.Colour.Lab[0], A: c.Colour.Lab[1], B: c.Colour.Lab[2]}
		case c.Kind == parser.KindMeasure && r.amount == 0 && c.Measure != nil && c.Measure.BaseAmount != nil && *c.Measure.BaseAmount > 0:
			r.dimension, r.amount = c.Measure.Dimension, *c.Measure.BaseAmount
		}
	}
	t.parsed[q] = r
	return r
}

// describe returns a product's facts, from the cache when it was asked
// before; a product the index does not hold is nil, counted.
func (t *Tuner) describe(ctx context.Context, id string) (*rewrite.Facts, error) {
	if f, ok := t.facts[id]; ok {
		return f, nil
	}
	f, err := t.opts.Products.Describe(ctx, id)
	if err != nil {
		if ctx.Err() != nil {
			return nil, ctx.Err()
		}
		t.stats.Undescribed++
		f = nil
	}
	if len(t.facts) >= factsCache {
		clear(t.facts)
	}
	t.facts[id] = f
	return f, nil
}

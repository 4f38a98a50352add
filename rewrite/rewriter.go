package rewrite

import (
	"cmp"
	"container/heap"
	"context"
	"errors"
	"fmt"
	"math"
	"slices"
	"sort"
	"strings"
	"sync"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/parser"
)

// DefaultBudget is how many engine counts one rescue may spend.
const DefaultBudget = 24

// Rewriter rescues queries that find nothing. It is safe for concurrent
// use.
type Rewriter struct {
	engine Engine
	policy *Policy
	lex    *lexicon.Lexicon
	parse  parser.Options
	budget int

	// known is what has been read of the catalog, shared with the
	// rewriters Tuned makes from this one.
	*known
}

// known caches the catalog's colours and typo vocabulary, once each has
// been read without an error.
type known struct {
	mu        sync.Mutex
	palDone   bool
	pal       *colour.Palette
	wordsDone bool
	vocab     []wordEntry
	near      *lexicon.NearWords // the words of vocab, for typo lookups
}

// Option configures a Rewriter.
type Option func(*Rewriter)

// WithBudget sets how many engine counts one rescue may spend (default
// DefaultBudget); n below 1 is 1, the query as typed.
func WithBudget(n int) Option { return func(rw *Rewriter) { rw.budget = n } }

// WithParseOptions sets how queries are parsed; its lexicon is used too.
func WithParseOptions(o parser.Options) Option { return func(rw *Rewriter) { rw.parse = o } }

// New returns a Rewriter that asks engine and follows policy (nil means
// the built-in policy).
func New(engine Engine, policy *Policy, opts ...Option) *Rewriter {
	rw := &Rewriter{engine: engine, policy: policy, budget: DefaultBudget, known: &known{}}
	for _, o := range opts {
		o(rw)
	}
	if rw.policy == nil {
		rw.policy = DefaultPolicy()
	}
	rw.lex = rw.parse.Lexicon
	if rw.lex == nil {
		rw.lex = lexicon.Default()
	}
	if rw.budget < 1 {
		rw.budget = 1
	}
	return rw
}

// Tuned returns a rewriter like rw whose policy has t laid over every
// level, for a single request: it shares rw's engine, options and what
// rw has read of the catalog, and leaves rw as it was. A tuning sets no
// strictness, so it cannot loosen a hard constraint.
func (rw *Rewriter) Tuned(t Tuning) *Rewriter {
	c := *rw
	c.policy = rw.policy.Tuned(t)
	return &c
}

// palette returns the catalog's colours as a palette, or nil when the
// engine is no Catalog or the catalog has none, with the engine's error
// if it failed; a failed or cancelled read is tried again next time.
func (rw *Rewriter) palette(ctx context.Context) (*colour.Palette, error) {
	rw.mu.Lock()
	defer rw.mu.Unlock()
	if rw.palDone {
		return rw.pal, nil
	}
	cat, ok := rw.engine.(Catalog)
	if !ok {
		rw.palDone = true
		return nil, nil
	}
	cs, err := cat.Colours(ctx)
	if err != nil {
		return nil, err
	}
	if len(cs) > 0 {
		rw.pal = colour.NewPalette(cs)
	}
	rw.palDone = true
	return rw.pal, nil
}

// failure is err, unless ctx is done: a call cut short by the deadline
// ends the search as a count cut short does, with the best plan so far.
func failure(ctx context.Context, err error) error {
	if ctx.Err() != nil {
		return nil
	}
	return err
}

// wordEntry is a word a typo may be read as: a lexicon entry's name or
// alias, a value the catalog carries (entry nil), or one word of a
// product type of several words (entry nil, kind keyword). typeWord marks
// the words of product types, whole or in part, after whose fix the
// query is read again.
type wordEntry struct {
	word     string
	entry    *lexicon.Entry
	kind     parser.Kind
	typeWord bool
}

// words are the single words of the lexicon, and of the catalog's own
// product types, colours, brands, materials and patterns, that a typo may
// be read as; then the words of the product types of several words
// ("ceiling" of "ceiling fan"), which come last so that a whole entry
// wins a tie.
func (rw *Rewriter) words(ctx context.Context) ([]wordEntry, *lexicon.NearWords, error) {
	rw.mu.Lock()
	defer rw.mu.Unlock()
	if rw.wordsDone {
		return rw.vocab, rw.near, nil
	}
	var vocab []wordEntry
	var phrases []string // product types of several words
	var failed error
	if cat, ok := rw.engine.(Catalog); ok {
		for _, f := range []parser.Kind{parser.KindProductType, parser.KindColour, parser.KindBrand, parser.KindMaterial, parser.KindPattern} {
			vals, err := cat.Values(ctx, string(f), "", Plan{})
			if err != nil {
				failed = cmp.Or(failed, err)
				continue
			}
			for _, v := range sortedKeys(vals) {
				if f == parser.KindProductType {
					phrases = append(phrases, v)
				}
				if !strings.ContainsAny(v, " -") && len(v) >= 4 {
					vocab = append(vocab, wordEntry{word: v, kind: f, typeWord: f == parser.KindProductType})
				}
			}
		}
	}
	for _, k := range []lexicon.Kind{lexicon.ProductType, lexicon.Colour, lexicon.Material, lexicon.Pattern, lexicon.Silhouette, lexicon.Brand} {
		for _, e := range rw.lex.Entries(k) {
			for _, w := range append([]string{e.Name}, e.Aliases...) {
				if k == lexicon.ProductType {
					phrases = append(phrases, w)
				}
				if !strings.ContainsAny(w, " -") && len(w) >= 4 {
					vocab = append(vocab, wordEntry{word: w, entry: e, kind: kindOfEntry(e), typeWord: k == lexicon.ProductType})
					// Shoppers type product types in the plural, so a typo
					// of one is nearest the plural: "sandels" is one edit
					// from sandals, two from sandal.
					if pl := plural(w); k == lexicon.ProductType && pl != w {
						vocab = append(vocab, wordEntry{word: pl, entry: e, kind: kindOfEntry(e), typeWord: true})
					}
				}
			}
		}
	}
	vocab = append(vocab, partWords(phrases, vocab)...)
	list := make([]string, len(vocab))
	for i, w := range vocab {
		list[i] = w.word
	}
	near := lexicon.NewNearWords(list)
	if failed != nil {
		// What could be read, for this call; the catalog is asked again
		// next time.
		return vocab, near, failed
	}
	rw.vocab, rw.near, rw.wordsDone = vocab, near, true
	return vocab, near, nil
}

// partWords are the words of four letters or more of the phrases of
// several words, once each, less those the vocabulary already holds;
// those it holds ("chalk", a colour, of "chalk paint") it marks as words
// of a product type.
func partWords(phrases []string, vocab []wordEntry) []wordEntry {
	parts := make(map[string]bool)
	var order []string
	for _, p := range phrases {
		ws := strings.Fields(p)
		if len(ws) < 2 {
			continue
		}
		for _, w := range ws {
			if len(w) >= 4 && !strings.ContainsAny(w, "-0123456789") && !parts[w] {
				parts[w] = true
				order = append(order, w)
			}
		}
	}
	held := make(map[string]bool)
	for i := range vocab {
		if parts[vocab[i].word] {
			vocab[i].typeWord = true
			held[vocab[i].word] = true
		}
	}
	var out []wordEntry
	for _, w := range order {
		if !held[w] {
			out = append(out, wordEntry{word: w, kind: parser.KindKeyword, typeWord: true})
		}
	}
	return out
}

// Step is one plan the planner asked the engine to count.
type Step struct {
	// Label says what was counted: "the query as typed", "\"merino\"
	// alone", "the hard constraints alone", or "relaxed" for a step of
	// the search, whose Relaxations say how.
	Label       string       `json:"label"`
	Relaxations []Relaxation `json:"relaxations"`
	Count       int          `json:"count"`
	Cost        float64      `json:"cost"`
}

// Missing names a hard constraint that nothing in the catalog matches
// with the other hard constraints, and the values the catalog carries
// instead.
type Missing struct {
	Constraint int      `json:"constraint"`
	Text       string   `json:"text"`
	Carried    []string `json:"carried"`
}

// Outcome is what a rescue did.
type Outcome struct {
	Query  string         `json:"query"`
	Parsed *parser.Result `json:"parsed"`
	Policy Effective      `json:"policy"`
	// Exact is set when the query as typed found enough.
	Exact bool `json:"exact"`
	// Count is the final plan's count.
	Count int `json:"count"`
	// Plan is the final plan, for the engine's Search.
	Plan Plan `json:"plan"`
	// Relaxations are the changes in the final plan.
	Relaxations []Relaxation `json:"relaxations"`
	// Steps are every plan counted, in order.
	Steps []Step `json:"steps"`
	// Missing is set when the hard constraints alone match nothing.
	Missing []Missing `json:"missing,omitempty"`
	// Message is for the shopper: what was not found and what is shown
	// instead. It is "" when the query as typed found enough (Exact),
	// since then there is nothing to tell; ExactMessage words the count
	// for a caller that shows a line anyway.
	Message string `json:"message"`
	// Explanation is for developers: what was counted and why.
	Explanation string `json:"explanation"`
	// Note says why the search stopped early (the budget, the deadline, or
	// the most relaxation sets one rescue looks at), or "".
	Note string `json:"note,omitempty"`
	// Unavailable lists the products the query named that are not
	// available; Plan then finds available products like them.
	Unavailable []string `json:"unavailable,omitempty"`
	// Corrected is the query with a misspelt product type fixed, when
	// the plan comes from reading it so ("uv filter 52 millimeter" for
	// "uv filtar 52 millimeter"); Parsed is then that reading, its spans
	// pointing into Query, and the fix is the first of Relaxations.
	Corrected string `json:"corrected,omitempty"`

	// settled is the search the outcome settled on, for Loosen; nil when
	// its plan is not a state of the search (a hard stop, or available
	// products found for unavailable ones), or once it has been read back
	// from JSON.
	settled *settled
}

// Rescue parses query, applies the policy, and relaxes it until the
// engine finds at least the policy's minimum, within the budget and the
// context's deadline. A query with nothing to search for ("", "!!!",
// "nice") is refused with a *RefusedError. See [Rewriter.RescueParsed].
func (rw *Rewriter) Rescue(ctx context.Context, query string) (*Outcome, error) {
	return rw.RescueParsed(ctx, rw.Parse(query))
}

// maxBytes is the longest query the rewriter's parse options read.
func (rw *Rewriter) maxBytes() int {
	if rw.parse.MaxBytes > 0 {
		return rw.parse.MaxBytes
	}
	return parser.MaxQueryBytes
}

// Parse reads query with the rewriter's parse options, as Rescue does;
// a caller may adjust the result before RescueParsed (ParseIn gives it
// the category the shopper searched in).
func (rw *Rewriter) Parse(query string) *parser.Result {
	return parser.ParseWith(query, rw.parse)
}

// ParseIn is Parse for a query searched in a category (a log's, a page's):
// when the query gives no category of its own, by a product type or a
// standard designation, it is read again in that category, so "navy m"
// searched in apparel has its letter size. A query that gives one
// ("85 lens", "cr2032") keeps its own reading.
func (rw *Rewriter) ParseIn(query, category string) *parser.Result {
	r := rw.Parse(query)
	if r.Category != "" || category == "" || rw.parse.Category != "" {
		return r
	}
	o := rw.parse
	o.Category = category
	return parser.ParseWith(query, o)
}

// RescueParsed rescues a parsed query. A query with nothing to search
// for is not searched: when, once the policy is applied, no constraint
// is left to ask for or exclude (the query is empty or blank, over the
// parser's length limit, only badly formed parts, punctuation or
// symbols, or only filler words), RescueParsed counts nothing and
// returns a *RefusedError, which matches ErrNothingToSearch. A query
// with badly formed parts and constraints beside them ("1/0 jacket") is
// rescued on what was read; r.Errors keep the problems. Hard
// constraints and exclusions are never relaxed, and the head product
// type is widened but never dropped; filler is dropped before anything is counted. The
// planner searches relaxation sets cheapest first: cost comes from the
// strictness of what is relaxed, from the operator (widening and typo
// fixes cost less than dropping), and from the counts of each constraint
// with what every plan asks, the hard constraints and the head product
// type at its broadest (one that matches nothing so is the first
// suspect; a common one costs less to drop than a rare one). It never counts the
// same plan twice. When the budget or the deadline runs out it returns
// the best plan found so far, with a Note. When an engine call fails on
// the way (a count, the catalog's colours or words, the values carried,
// an unavailable product's facts), it returns that error and no outcome,
// since one without what the call would have found would pass for an
// answer; nothing read in the failure is kept, so a later call asks
// again.
//
// When r as typed finds too little and an unknown word of it is a typo
// of a product type, or of a word of one, that then heads the query
// ("uv filtar", "ceeiling fan"), the query is read again with the word
// fixed, with the rewriter's parse options, and planned from that
// reading: its spans mapped back onto the query as typed, the fix a
// replace relaxation in every plan after the first (Outcome.Corrected).
// A reading that would change a head r already had, or loosen a
// constraint hard in r, is not used.
func (rw *Rewriter) RescueParsed(ctx context.Context, r *parser.Result) (*Outcome, error) {
	var failed error
	out, err := rw.rescueParsed(ctx, r, &failed)
	if err == nil && failed != nil {
		// An engine call failed on the way: an outcome without what it
		// would have found is no answer.
		return nil, failed
	}
	return out, err
}

func (rw *Rewriter) rescueParsed(ctx context.Context, r *parser.Result, failed *error) (*Outcome, error) {
	e := rw.policy.Apply(r, rw.lex)
	out := &Outcome{Query: r.Query, Parsed: r, Policy: e}
	s := &search{rw: rw, ctx: ctx, out: out, seen: make(map[string]int), budget: rw.budget, failed: failed}
	s.items = rw.exactItems(r)
	if err := refusal(r, s.items, rw.maxBytes()); err != nil {
		return nil, err
	}

	exact := make([]int, len(s.items))
	n, err := s.count(exact)
	if err == errStop {
		if ctx.Err() != nil {
			return nil, ctx.Err()
		}
		return nil, errors.New("rewrite: the budget allows no count at all")
	}
	if err != nil {
		return nil, err
	}
	if n >= e.MinResults {
		out.Exact = true
		return rw.settle(s, exact, n), nil
	}
	// A misspelt product type: plan from the query read again with it
	// fixed, the fix being part of every plan from here on.
	rds, err := rw.reread(ctx, r)
	if err := failure(ctx, err); err != nil {
		return nil, err
	}
	p, err := s.pickReading(r, rds)
	if err != nil {
		return nil, err
	}
	switch {
	case p.search != nil:
		r, e, s, exact, n = p.reading.parsed, p.reading.policy, p.search, p.exact, p.n
		out.Parsed, out.Policy, out.Corrected = r, e, p.reading.corrected
		if n >= e.MinResults {
			return rw.settle(s, exact, n), nil
		}
	case p.stopped != "":
		// The budget or the deadline ran out before any reading counted.
		s.stopReason = p.stopped
		return rw.settle(s, exact, n), nil
	}
	if err := rw.addRelaxations(ctx, s.items, e); err != nil {
		return nil, err
	}
	s.laddered = true
	// The hard constraints alone, with the head product type at its
	// broadest, since it is never dropped: every plan asks at least that,
	// so if it finds nothing, stop.
	hard := s.hardOnly()
	if h := s.broadestHead(); h != nil {
		hard.Clauses = append(hard.Clauses, *h)
	}
	if hn, err := s.countPlan(hard, nil, "the hard constraints alone"); err == errStop {
		// The budget or the deadline ran out here: the query as typed is
		// the best plan counted, and the note says why.
		return rw.settle(s, exact, n), nil
	} else if err != nil {
		return nil, err
	} else if hn == 0 && s.stopReason == "" {
		rw.missing(ctx, s, hard)
		out.Plan = hard
		out.Count = hn
		out.Relaxations = s.relaxationsOf(nil)
		out.Message, out.Explanation = rw.hardStopMessage(out)
		return out, nil
	}
	best, bestN := exact, n
	if found, state, fn := s.bestFirst(e.MinResults); found || state != nil && fn > bestN {
		best, bestN = state, fn
	}
	return rw.settle(s, best, bestN), nil
}

// settle makes state, which counted n, the outcome of the search: its
// plan, relaxations, message and explanation, and available products
// like its matches if they are all unavailable.
func (rw *Rewriter) settle(s *search, state []int, n int) *Outcome {
	out := s.out
	out.Count, out.Plan, out.Relaxations = n, s.plan(state), s.relaxationsOf(state)
	out.Plan.Prefer = s.prefer(state)
	out.Note = s.stopReason
	if out.Exact {
		out.Explanation = fmt.Sprintf("the query as typed finds %d", n)
	} else {
		out.Message = rw.message(out, s.items, state, s.typeUncarried())
		out.Explanation = s.explain(state)
	}
	out.settled = &settled{items: s.items, state: slices.Clone(state), fix: s.fix, laddered: s.laddered}
	if n > 0 && rw.alternatives(s.ctx, s, out.Plan) {
		out.Explanation += "; every match is unavailable, so available products like them are shown"
		out.settled = nil
	}
	return out
}

// search is the state of one rescue.
type search struct {
	rw         *Rewriter
	ctx        context.Context
	out        *Outcome
	items      []*item
	seen       map[string]int // plan key → count
	budget     int
	stopReason string
	// fix is the misspelt product type fixed before planning, or nil; it
	// is part of every plan counted after the query as typed.
	fix *Relaxation
	// laddered is set once the items have their states below the exact
	// one.
	laddered bool
	// failed holds the first error an engine call returned, other than
	// the deadline's, for RescueParsed to return; it is shared with the
	// search of a query read again.
	failed *error
}

// fail records err, an engine call's error, unless it is nil, the
// deadline's, or not the first.
func (s *search) fail(err error) {
	if err != nil && s.failed != nil && *s.failed == nil && s.ctx.Err() == nil {
		*s.failed = err
	}
}

// plan builds the plan of a state: each item's clause at its level.
func (s *search) plan(state []int) Plan {
	var p Plan
	for i, it := range s.items {
		if cl := it.levels[state[i]].clause; cl != nil {
			p.Clauses = append(p.Clauses, *cl)
		}
	}
	return p
}

// prefer are the clauses, as typed, of the constraints state widens or
// drops, the costliest to drop first (the head product type before all):
// what the shopper asked for that a hit need not meet, for the engine to
// rank by. A replaced typo is left out: the word as typed matches
// nothing.
func (s *search) prefer(state []int) []Clause {
	type pref struct {
		cl     Clause
		weight float64
	}
	var ps []pref
	for i, it := range s.items {
		if i >= len(state) || state[i] == 0 {
			continue
		}
		r, cl := it.levels[state[i]].relax, it.levels[0].clause
		if r == nil || r.Operator == OpReplace || cl == nil || cl.Excluded {
			continue
		}
		w := it.scaled(len(it.levels) - 1)
		if it.c.IsHead() {
			w = math.Inf(1)
		}
		ps = append(ps, pref{*cl, w})
	}
	slices.SortStableFunc(ps, func(a, b pref) int { return cmp.Compare(b.weight, a.weight) })
	var out []Clause
	for _, p := range ps {
		out = append(out, p.cl)
	}
	return out
}

// keepsNothing reports whether state drops every constraint that asks
// for something, where the query had one: such a plan matches the
// whole catalog (less any exclusions), which rescues nothing. A query
// of unknown words alone ("zorblax") then finds nothing, and says so,
// rather than showing arbitrary products.
func (s *search) keepsNothing(state []int) bool {
	asked := false
	for i, it := range s.items {
		if cl := it.levels[0].clause; cl == nil || cl.Excluded {
			continue
		}
		asked = true
		if cl := it.levels[state[i]].clause; cl != nil && !cl.Excluded {
			return false
		}
	}
	return asked
}

func (s *search) relaxationsOf(state []int) []Relaxation {
	var rs []Relaxation
	if s.fix != nil {
		rs = append(rs, *s.fix)
	}
	for i, it := range s.items {
		if i >= len(state) {
			break
		}
		if r := it.levels[state[i]].relax; r != nil {
			rs = append(rs, *r)
		}
	}
	return rs
}

func (s *search) cost(state []int) float64 {
	var c float64
	if s.fix != nil {
		c = costReplace
	}
	for i, it := range s.items {
		c += it.scaled(state[i])
	}
	return c
}

// scaled is a level's cost, scaled by the evidence of the counts.
func (it *item) scaled(l int) float64 {
	c := it.levels[l].cost
	switch {
	case l == 0:
		return 0
	case it.solo == 0:
		return c * 0.25 // matches nothing even alone: the first suspect
	case it.solo > 0 && it.levels[l].relax.Operator == OpDrop:
		// A rare constraint says more about what the shopper wants than
		// a common one, so it costs more to drop.
		return c * (0.75 + 0.5*it.rarity)
	}
	return c
}

// count counts a state's plan, once per distinct plan.
func (s *search) count(state []int) (int, error) {
	label := "relaxed"
	if len(s.relaxationsOf(state)) == 0 {
		label = "the query as typed"
	}
	return s.countPlan(s.plan(state), state, label)
}

// maxVisits bounds the relaxation sets one rescue looks at, counted or
// already seen: sixteen for each count of the budget.
func maxVisits(budget int) int { return max(64, 16*budget) }

// errStop marks a count refused because the budget or deadline ran out.
var errStop = fmt.Errorf("stopped")

func (s *search) countPlan(p Plan, state []int, label string) (int, error) {
	key := p.Key()
	if n, ok := s.seen[key]; ok {
		return n, nil
	}
	if s.stopReason != "" {
		return 0, errStop
	}
	if err := s.ctx.Err(); err != nil {
		s.stopReason = "the deadline passed; showing the best plan found so far"
		return 0, errStop
	}
	if s.budget <= 0 {
		s.stopReason = fmt.Sprintf("the budget of %d engine counts ran out; showing the best plan found so far", s.rw.budget)
		return 0, errStop
	}
	s.budget--
	n, err := s.rw.engine.Count(s.ctx, p)
	if err != nil {
		if s.ctx.Err() != nil {
			s.stopReason = "the deadline passed; showing the best plan found so far"
			return 0, errStop
		}
		s.fail(err)
		return 0, err
	}
	s.seen[key] = n
	step := Step{Label: label, Count: n}
	if state != nil {
		step.Relaxations, step.Cost = s.relaxationsOf(state), s.cost(state)
	} else if s.fix != nil {
		step.Label += fmt.Sprintf(", reading %q", s.out.Corrected)
	}
	s.out.Steps = append(s.out.Steps, step)
	return n, nil
}

// picked is the reading of a typo a search goes on with: its search,
// its exact state and that state's count; search is nil when no reading
// is kept, and stopped then says why the search stopped, if it did.
type picked struct {
	search  *search
	reading *reading
	exact   []int
	n       int
	stopped string
}

// pickReading counts each reading's query as typed, in order of
// preference, and keeps the first that finds enough, else the one that
// finds most. A reading that finds nothing is kept only when the catalog
// bears it out (bornOut): "leather cantles womens 7" read as candles is
// dropped, since no candle has an audience; "extenssion cord 12 awg"
// read as an extension cord is kept, since cords have a gauge, if not
// that one, and the answer is that it is not carried. What the readings
// count is spent from s's budget, kept or not.
func (s *search) pickReading(typed *parser.Result, rds []*reading) (picked, error) {
	var p picked
	p.n = -1
	out := s.out
	defer func() { out.Corrected = "" }() // set for the steps' labels only
	// The first reading whose product type the shop does not carry at
	// all, kept for the answer when no reading is kept and the query as
	// typed names no product type: "memory foam matress queen" in a shop
	// of no mattresses is told so, not shown quilts in queen size.
	var uncarried picked
	for _, rd := range rds {
		out.Corrected = rd.corrected
		fixed := &search{rw: s.rw, ctx: s.ctx, out: out, seen: s.seen, budget: s.budget, fix: &rd.fix, items: s.rw.exactItems(rd.parsed), failed: s.failed}
		exact := make([]int, len(fixed.items))
		n, err := fixed.count(exact)
		s.budget = fixed.budget
		if err == errStop {
			if p.search == nil {
				p.stopped = fixed.stopReason
			}
			break
		}
		if err != nil {
			return picked{}, err
		}
		if n == 0 {
			// A reading that finds nothing is kept when the catalog
			// bears it out; a code read as the model it fits, when what
			// it holds hard finds something and the query as typed holds
			// hard finds nothing ("jx-12 phone case clear" in a shop of
			// cases for the jx-12, none clear, and no part JX-12).
			check := func() (bool, error) { return fixed.bornOut(typed) }
			if completesHead(typed, rd) {
				// "sofa tabel walnut": the typed head, sofa, was part of
				// the type meant, a sofa table; read so, the query is
				// rescued as if typed right, widened to tables if the shop
				// has no sofa tables, not shown sofas.
				check = func() (bool, error) { return true, nil }
			}
			if rd.found {
				check = func() (bool, error) { return fixed.hardFinds(s) }
			}
			ok, err := check()
			s.budget = fixed.budget
			if err == errStop {
				break
			}
			if err != nil {
				return picked{}, err
			}
			if !ok {
				if uncarried.search == nil && !rd.found && fixed.typeUncarried() {
					uncarried = picked{search: fixed, reading: rd, exact: exact, n: 0}
				}
				continue
			}
		}
		if n > p.n {
			p.search, p.reading, p.exact, p.n = fixed, rd, exact, n
		}
		if n >= rd.policy.MinResults {
			break
		}
	}
	if p.search == nil && uncarried.search != nil && headIndex(typed) < 0 {
		p = uncarried
	}
	if p.search != nil {
		p.search.budget = s.budget
	}
	return p, nil
}

// completesHead reports whether reading rd's head product type takes in
// the head of typed, the query as typed, and more: the typed head was a
// word of the type meant ("sofa" of "sofa table").
func completesHead(typed *parser.Result, rd *reading) bool {
	h := headIndex(typed)
	if h < 0 || rd.fix.Kind != parser.KindProductType {
		return false
	}
	was, now := typed.Constraints[h], rd.parsed.Constraints[rd.fix.Constraint]
	return now.Start <= was.Start && was.End <= now.End && now.End-now.Start > was.End-was.Start
}

// typeUncarried reports whether s, a reading, has a head product type
// the catalog carries none of, as bornOut counted it.
func (s *search) typeUncarried() bool {
	for _, it := range s.items {
		if it.c.IsHead() {
			n, ok := s.seen[Plan{Clauses: []Clause{*it.levels[0].clause}}.Key()]
			return ok && n == 0
		}
	}
	return false
}

// hardFinds reports whether the hard constraints and the head product
// type of s, a reading, find something while those of typed, the search
// of the query as typed, find nothing.
func (s *search) hardFinds(typed *search) (bool, error) {
	fix := s.fix
	s.fix = nil // for the step's label: this count is of the query as typed
	n, err := s.countPlan(hardAndHead(typed.items), nil, "the hard constraints alone, as typed")
	s.fix = fix
	if err != nil || n > 0 {
		return false, err
	}
	n, err = s.countPlan(hardAndHead(s.items), nil, "the hard constraints alone")
	return n > 0, err
}

// hardAndHead is the plan of the hard constraints among items and the
// head product type, each as typed.
func hardAndHead(items []*item) Plan {
	var p Plan
	for _, it := range items {
		if cl := it.levels[0].clause; cl != nil && (it.c.Strictness == parser.Hard || it.c.IsHead()) {
			p.Clauses = append(p.Clauses, *cl)
		}
	}
	return p
}

// bornOut reports whether the catalog bears out s, a query read again
// with a typo fixed: it carries s's head product type, and products of
// that type carry some value of each attribute that was hard in typed,
// the query as typed (an audience, a size, a gauge), where the catalog
// lists that attribute's values.
func (s *search) bornOut(typed *parser.Result) (bool, error) {
	var head *Clause
	for _, it := range s.items {
		if it.c.IsHead() {
			head = it.levels[0].clause
		}
	}
	if head == nil {
		return true, nil
	}
	kind := Plan{Clauses: []Clause{*head}}
	n, err := s.countPlan(kind, nil, "the product type alone")
	if err != nil || n == 0 {
		return false, err
	}
	cat, ok := s.rw.engine.(Catalog)
	if !ok {
		return true, nil
	}
	for _, it := range s.items {
		c, cl := it.c, it.levels[0].clause
		if cl == nil || cl == head || c.Excluded || !slices.Contains(ListedFields, cl.Field) {
			continue
		}
		if !slices.ContainsFunc(typed.Constraints, func(t parser.Constraint) bool {
			return t.Start == c.Start && t.End == c.End && t.Strictness == parser.Hard
		}) {
			continue
		}
		vals, err := cat.Values(s.ctx, cl.Field, cl.Dimension, kind)
		s.fail(err)
		if err != nil {
			return false, err
		}
		if len(vals) == 0 {
			return false, nil
		}
	}
	return true, nil
}

// withBound is the plan of item it as typed with the hard constraints and
// the head product type at its broadest (the head itself as typed), and
// its label.
func (s *search) withBound(it *item) (Plan, string) {
	p := s.hardOnly()
	head := s.broadestHead()
	if head != nil && it.levels[0].clause.From != head.From {
		p.Clauses = append(p.Clauses, *head)
	}
	if len(p.Clauses) == 0 {
		return Plan{Clauses: []Clause{*it.levels[0].clause}}, fmt.Sprintf("%q alone", it.c.Text)
	}
	p.Clauses = append(p.Clauses, *it.levels[0].clause)
	return p, fmt.Sprintf("%q with what every plan asks", it.c.Text)
}

// broadestHead is the clause of the head product type at its broadest
// level, when it has levels below its exact one (a parent to widen to);
// nil when it has none, as hardOnly holds it then, or there is no head.
func (s *search) broadestHead() *Clause {
	for _, it := range s.items {
		if it.c.IsHead() && !it.c.Excluded && len(it.levels) > 1 {
			return it.levels[len(it.levels)-1].clause
		}
	}
	return nil
}

// hardOnly is the plan of the constraints that are never relaxed.
func (s *search) hardOnly() Plan {
	var p Plan
	for _, it := range s.items {
		if len(it.levels) == 1 {
			p.Clauses = append(p.Clauses, *it.levels[0].clause)
		}
	}
	return p
}

// bestFirst searches relaxation sets cheapest first, after the evidence,
// and builds a plan up (buildUp) when the budget or the visits run short
// first. It returns whether a state reached want, and that state (or the
// best counted) with its count.
func (s *search) bestFirst(want int) (bool, []int, int) {
	s.evidence()
	short := s.shortOfEvidence(want)
	pq := &queue{}
	start := make([]int, len(s.items))
	visited := map[string]bool{stateKey(start): true}
	s.push(pq, start, visited)
	var best []int
	bestN := -1
	// The counts the last resort may need are kept back from this
	// search, unless they are most of the budget.
	reserve := min(s.reserve(), s.rw.budget/3)
	// Plans that match the same products are counted once, so states
	// whose plan was seen cost no budget; the visits are bounded too, or
	// a query of many alike constraints (64 exclusions of one colour)
	// would walk a lattice of 2^64 states.
	visits, most := 0, maxVisits(s.rw.budget)
	for pq.Len() > 0 {
		if visits++; visits > most {
			s.stopReason = fmt.Sprintf("%d relaxation sets were tried, the most one rescue looks at; showing the best plan found so far", most)
			break
		}
		if s.ctx.Err() != nil {
			s.stopReason = "the deadline passed; showing the best plan found so far"
			break
		}
		st := heap.Pop(pq).(entry).state
		// A state within one known to find too few (one counted, or one
		// the evidence stands for) cannot find more: it is not counted.
		if slices.ContainsFunc(short, func(z []int) bool { return s.within(st, z) }) {
			s.push(pq, st, visited)
			continue
		}
		if s.budget <= reserve {
			if _, seen := s.seen[s.plan(st).Key()]; !seen {
				break
			}
		}
		n, err := s.count(st)
		if err == errStop {
			break
		}
		if err != nil {
			return false, best, bestN
		}
		if n > bestN {
			best, bestN = st, n
		}
		if n >= want {
			return true, st, n
		}
		short = append(short, st)
		s.push(pq, st, visited)
	}
	if s.ctx.Err() != nil {
		return false, best, bestN
	}
	// The cheapest plan was not reached within the budget or the visits:
	// build one up instead, from the counts kept back.
	why := s.stopReason
	s.stopReason = ""
	if st, n, ok := s.buildUp(want, short); ok {
		s.stopReason = fmt.Sprintf("the search ran short of the cheapest plan within %d engine counts; this one was built up from what every plan asks, the costliest constraint to lose first", s.rw.budget)
		return true, st, n
	}
	if s.stopReason == "" {
		s.stopReason = why
	}
	return false, best, bestN
}

// evidence counts, while a third of the budget allows, each relaxable
// constraint with what every plan asks (the hard constraints and the
// head product type at its broadest), so that one the shop cannot meet
// for this kind of product is the first suspect, not one that is merely
// rare in the whole shop; and sets each one's rarity from the counts.
func (s *search) evidence() {
	most := 0
	for _, it := range s.items {
		if len(it.levels) > 1 && s.budget > s.rw.budget*2/3 {
			p, label := s.withBound(it)
			n, err := s.countPlan(p, nil, label)
			if err == nil {
				it.solo = n
				most = max(most, n)
			}
		}
	}
	for _, it := range s.items {
		if it.solo > 0 && most > 0 {
			it.rarity = 1 - float64(it.solo)/float64(most)
		}
	}
}

// shortOfEvidence are the states the evidence shows find fewer than
// want: for each constraint whose count with what every plan asks is
// fewer, the state that keeps it exact and drops or widens all else to
// what every plan asks. No state within one of them can find more.
func (s *search) shortOfEvidence(want int) [][]int {
	var short [][]int
	for i, it := range s.items {
		if it.solo >= 0 && it.solo < want {
			z := s.loosest()
			z[i] = 0
			short = append(short, z)
		}
	}
	return short
}

// loosest is the state of every constraint at the last level of its
// ladder: dropped, the head product type at its broadest, the hard
// constraints exact. Its plan is what every plan asks.
func (s *search) loosest() []int {
	st := make([]int, len(s.items))
	for i, it := range s.items {
		st[i] = len(it.levels) - 1
	}
	return st
}

// within reports whether every product state a matches, state b matches
// too: each constraint is at the same level in both, or b drops it, or a
// asks it exact and b widens it, as a widening keeps what it widens. (A
// typo's replacement keeps nothing of the typo, and one widening need
// not hold another, so neither is within the other.)
func (s *search) within(a, b []int) bool {
	for i, it := range s.items {
		if a[i] == b[i] {
			continue
		}
		lb := it.levels[b[i]]
		if lb.clause == nil || a[i] == 0 && lb.relax.Operator == OpWiden {
			continue
		}
		return false
	}
	return true
}

// reserve is the most counts buildUp may spend: two for each constraint
// that can be relaxed.
func (s *search) reserve() int {
	n := 0
	for _, it := range s.items {
		n += min(2, len(it.levels)-1)
	}
	return n
}

// buildUp is the last resort of a search that ran short of budget before
// any plan found min: it starts from what every plan asks, which finds
// min, and takes the constraints back one at a time, the head product
// type first, then the costliest to drop, each at the tightest of its
// exact state and its loosest widening that still finds min. Every state
// it holds finds min, so it has a rescue however soon the budget runs
// out; it reports false when what every plan asks finds too few, or
// nothing asked for is kept. States within one of short are not counted.
func (s *search) buildUp(want int, short [][]int) ([]int, int, bool) {
	cur := s.loosest()
	n, err := s.count(cur)
	if err != nil || n < want {
		return nil, 0, false
	}
	var order []int
	for i, it := range s.items {
		if len(it.levels) > 1 {
			order = append(order, i)
		}
	}
	importance := func(i int) float64 {
		it := s.items[i]
		if it.c.IsHead() {
			return math.Inf(1)
		}
		return it.scaled(len(it.levels) - 1)
	}
	slices.SortStableFunc(order, func(a, b int) int { return cmp.Compare(importance(b), importance(a)) })
	for _, i := range order {
		last := len(s.items[i].levels) - 1
		for _, l := range slices.Compact([]int{0, last - 1}) {
			if l >= last {
				continue
			}
			next := slices.Clone(cur)
			next[i] = l
			if slices.ContainsFunc(short, func(z []int) bool { return s.within(next, z) }) {
				continue
			}
			m, err := s.count(next)
			if err != nil {
				return cur, n, !s.keepsNothing(cur)
			}
			if m >= want {
				cur, n = next, m
				break
			}
		}
	}
	return cur, n, !s.keepsNothing(cur)
}

// push queues the states one step down from st.
func (s *search) push(pq *queue, st []int, visited map[string]bool) {
	for _, next := range s.looser(st) {
		k := stateKey(next)
		if visited[k] {
			continue
		}
		visited[k] = true
		heap.Push(pq, entry{state: next, cost: s.cost(next), order: pq.n})
		pq.n++
	}
}

// looser are the states one step down from st, one constraint one level
// further down its ladder, in the order of the constraints, less those
// that would keep nothing asked for. A ladder holds only the states the
// policy allows, so no state here relaxes a hard constraint or drops the
// head product type.
func (s *search) looser(st []int) [][]int {
	var out [][]int
	for i, it := range s.items {
		if st[i]+1 >= len(it.levels) {
			continue
		}
		next := slices.Clone(st)
		next[i]++
		if !s.keepsNothing(next) {
			out = append(out, next)
		}
	}
	return out
}

func stateKey(st []int) string { return fmt.Sprint(st) }

type entry struct {
	state []int
	cost  float64
	order int
}

// queue is a min-heap of states by cost, then by the order queued, so the
// search is deterministic.
type queue struct {
	es []entry
	n  int
}

func (q *queue) Len() int { return len(q.es) }
func (q *queue) Less(i, j int) bool {
	if q.es[i].cost != q.es[j].cost {
		return q.es[i].cost < q.es[j].cost
	}
	return q.es[i].order < q.es[j].order
}
func (q *queue) Swap(i, j int) { q.es[i], q.es[j] = q.es[j], q.es[i] }
func (q *queue) Push(x any)    { q.es = append(q.es, x.(entry)) }
func (q *queue) Pop() any {
	e := q.es[len(q.es)-1]
	q.es = q.es[:len(q.es)-1]
	return e
}

// explain writes the developer's account of the search.
func (s *search) explain(best []int) string {
	var b strings.Builder
	for i, st := range s.out.Steps {
		what := st.Label
		if len(st.Relaxations) > 0 {
			var parts []string
			for _, r := range st.Relaxations {
				parts = append(parts, fmt.Sprintf("%s %q %s", r.Operator, r.Text, r.Detail))
			}
			what = strings.Join(parts, "; ")
		}
		fmt.Fprintf(&b, "step %d: %s → %d\n", i+1, what, st.Count)
	}
	fmt.Fprintf(&b, "chosen: %d relaxation(s), %d results", len(s.relaxationsOf(best)), s.out.Count)
	if s.stopReason != "" {
		fmt.Fprintf(&b, "; %s", s.stopReason)
	}
	return b.String()
}

// missing finds the hard constraints that nothing matches alongside the
// others, and what the catalog carries instead.
func (rw *Rewriter) missing(ctx context.Context, s *search, hard Plan) {
	cat, _ := rw.engine.(Catalog)
	for i, cl := range hard.Clauses {
		if cl.Excluded {
			continue
		}
		rest := Plan{Clauses: append(append([]Clause(nil), hard.Clauses[:i]...), hard.Clauses[i+1:]...)}
		text := s.out.Parsed.AlternativesText(cl.From)
		n, err := s.countPlan(rest, nil, fmt.Sprintf("the hard constraints without %q", text))
		if err != nil || n == 0 {
			continue
		}
		m := Missing{Constraint: cl.From, Text: text}
		if cat != nil && slices.Contains(ListedFields, cl.Field) {
			// Among products of the kind asked for; when they carry no
			// value at all (the shop has no "cargo pants"), among those
			// of the type the head widens to, as the hard constraints
			// were counted with it, so the sizes of trousers are named.
			like, wide := rest, rest
			for _, it := range s.items {
				if it.c.Kind == parser.KindProductType && !it.c.Excluded {
					typ := it.levels[0].clause
					like.Clauses = append(slices.Clone(like.Clauses), *typ)
					if b := s.broadestHead(); b != nil && it.c.IsHead() {
						typ = b
					}
					wide.Clauses = append(slices.Clone(wide.Clauses), *typ)
				}
			}
			vals, err := cat.Values(ctx, cl.Field, cl.Dimension, like)
			if err == nil && len(vals) == 0 && wide.Key() != like.Key() {
				vals, err = cat.Values(ctx, cl.Field, cl.Dimension, wide)
			}
			s.fail(err)
			if err == nil {
				m.Carried = carried(vals)
				if c := s.out.Parsed.Constraints[cl.From]; c.Colour != nil && c.Colour.Lab != nil {
					m.Carried = rw.nearestFirst(ctx, m.Carried, colour.Lab{L: c.Colour.Lab[0], A: c.Colour.Lab[1], B: c.Colour.Lab[2]})
				}
				if cl.Field == string(parser.KindMeasure) && cl.Unit != "" {
					for j := range m.Carried {
						m.Carried[j] += " " + cl.Unit
					}
				}
			}
		}
		s.out.Missing = append(s.out.Missing, m)
	}
}

// nearestFirst orders names, the colours a catalog carries, by their
// CIEDE2000 difference from lab, nearest first, so that a colour not
// carried is answered with the colours nearest it ("duck egg blue is
// not carried in chalk paints; colours carried, nearest first: ...");
// names the catalog's palette lacks keep their order, after. The names
// are as they were when the palette cannot be read.
func (rw *Rewriter) nearestFirst(ctx context.Context, names []string, lab colour.Lab) []string {
	pal, err := rw.palette(ctx)
	if err != nil || pal == nil {
		return names
	}
	out := make([]string, 0, len(names))
	for _, m := range pal.Nearest(lab, pal.Len()) {
		if slices.Contains(names, m.Name) && !slices.Contains(out, m.Name) {
			out = append(out, m.Name)
		}
	}
	for _, n := range names {
		if !slices.Contains(out, n) {
			out = append(out, n)
		}
	}
	return out
}

// carried lists the values a catalog carries, numbers in order.
func carried(vals map[string]int) []string {
	out := make([]string, 0, len(vals))
	for v := range vals {
		out = append(out, v)
	}
	sort.Slice(out, func(i, j int) bool {
		a, errA := parseNum(out[i])
		b, errB := parseNum(out[j])
		if errA == nil && errB == nil && a != b {
			return a < b
		}
		return out[i] < out[j]
	})
	return out
}

func parseNum(s string) (float64, error) {
	var v float64
	_, err := fmt.Sscan(s, &v)
	if err == nil && (math.IsNaN(v) || math.IsInf(v, 0)) {
		err = fmt.Errorf("not finite")
	}
	return v, err
}

package signals

import (
	"cmp"
	"context"
	"errors"
	"fmt"
	"iter"
	"math"
	"slices"
	"sort"
	"time"
)

// JoinOptions set how events are grouped and joined. The zero value
// asks for the defaults.
type JoinOptions struct {
	// Window is how long after a search an interaction with a product it
	// showed is joined to it, and how long a session may sit idle before
	// its next event starts a new one: 30 minutes when 0, the idle time
	// after which web analytics commonly starts a new visit (common
	// practice).
	Window time.Duration
	// Lateness is how much older than the latest event seen an event may
	// be and still be joined as if it had come in order; Window when 0.
	Lateness time.Duration
	// MaxSearches and MaxInteractions bound what one session holds, so
	// that one robot cannot fill memory; past them its events are
	// counted in JoinStats and dropped. 1,000 and 10,000 when 0.
	MaxSearches, MaxInteractions int
	// SkipBad counts malformed lines (a *LineError) and goes on; without
	// it Join stops at the first.
	SkipBad bool
}

// JoinStats sums up a join. Every interaction read is joined, not
// joined for one reason or the other, or dropped past its session's
// limit: Interactions = Joined + NoSearch + NotShown + InteractionOverflow.
type JoinStats struct {
	// Events, Searches and Interactions count the events read, malformed
	// lines apart.
	Events       int `json:"events"`
	Searches     int `json:"searches"`
	Interactions int `json:"interactions"`
	// Joined counts the interactions joined to a search.
	Joined int `json:"joined"`
	// NoSearch counts the interactions with no search of their session
	// in the Window before them.
	NoSearch int `json:"no_search"`
	// NotShown counts the interactions whose product none of the
	// searches in the Window before them showed.
	NotShown int `json:"not_shown"`
	// Late counts events older than the latest event seen by more than
	// Lateness. Each is still joined as well as it can be: added to its
	// session when that is open, or else the start of a fresh session,
	// since the one it belonged to may have been emitted already.
	Late int `json:"late"`
	// Bad counts malformed lines, when SkipBad is set; BadSample keeps the
	// first few messages.
	Bad       int      `json:"bad"`
	BadSample []string `json:"bad_sample,omitempty"`
	// Sessions counts the sessions emitted.
	Sessions int `json:"sessions"`
	// SearchOverflow and InteractionOverflow count the events dropped past
	// a session's MaxSearches and MaxInteractions.
	SearchOverflow      int `json:"search_overflow"`
	InteractionOverflow int `json:"interaction_overflow"`
	// PeakOpen is the most sessions held open at once: the join's memory
	// is bounded by it (and by what each session holds), not by the
	// length of the log.
	PeakOpen int `json:"peak_open"`
}

// badSample is how many messages of malformed lines JoinStats keeps.
const badSample = 5

// Join groups events by session and joins each interaction to the
// search that showed its product, emitting each session once it has
// closed. An interaction is joined to the latest search of its session
// at or before it, and at most Window before it, whose Shown holds its
// product; Engagement.Rank is the product's place in Shown. Events may
// come in any order within Lateness: an interaction that comes before
// its search is held with its session and joined when the session
// closes.
//
// A session's events more than Window apart split it in two, as a
// shopper who comes back after a long pause starts a new visit. A
// session closes when the latest event time seen has passed its last
// event by more than Window + Lateness, or when the events run out; it
// is then emitted with its searches in time order (then by file and
// line), and forgotten. Sessions close in the order of their last event
// (then their id); those left at the end are emitted in the order of
// their first event (then their id). Thus the sessions emitted, and
// their order, do not depend on the order events came in, as long as
// none is late. A session with no search is not emitted; its
// interactions are counted in NoSearch.
//
// emit owns the session it is given. An error from emit, a malformed
// line without SkipBad, an error of the events' reader or the end of
// ctx stops the join; Join returns the stats so far with it.
func Join(ctx context.Context, events iter.Seq2[Event, error], opts JoinOptions, emit func(*Session) error) (JoinStats, error) {
	j, err := newJoiner(opts, emit)
	if err != nil {
		return JoinStats{}, err
	}
	if err := j.run(ctx, events); err != nil {
		return j.stats, err
	}
	return j.stats, j.flush(ctx)
}

// joiner is the state of one join.
type joiner struct {
	window, horizon time.Duration
	opts            JoinOptions
	emit            func(*Session) error
	open            map[string]*openSession
	queue           closeQueue
	// latest is the watermark: the latest event time seen.
	latest time.Time
	stats  JoinStats
	// spare are sessions closed, kept to be used again with the room
	// for events they had.
	spare []*openSession
}

// Sessions kept for use again: at most spareSessions, each with room for
// at most spareEvents events, so that a robot's session is not kept.
const (
	spareSessions = 4096
	spareEvents   = 64
)

// newSession returns an empty open session for id.
func (j *joiner) newSession(id string, key time.Time) *openSession {
	if n := len(j.spare); n > 0 {
		s := j.spare[n-1]
		j.spare = j.spare[:n-1]
		*s = openSession{id: id, key: key, evs: s.evs}
		return s
	}
	return &openSession{id: id, key: key, evs: make([]Event, 0, 8)}
}

// forget drops a session whose events have all been emitted.
func (j *joiner) forget(s *openSession) {
	delete(j.open, s.id)
	if len(j.spare) < spareSessions && cap(s.evs) <= spareEvents {
		j.spare = append(j.spare, s)
	}
}

func newJoiner(opts JoinOptions, emit func(*Session) error) (*joiner, error) {
	if opts.Window < 0 || opts.Lateness < 0 || opts.MaxSearches < 0 || opts.MaxInteractions < 0 {
		return nil, fmt.Errorf("signals: join options must not be negative: %+v", opts)
	}
	if opts.Window == 0 {
		opts.Window = 30 * time.Minute
	}
	if opts.Lateness == 0 {
		opts.Lateness = opts.Window
	}
	if opts.MaxSearches == 0 {
		opts.MaxSearches = 1000
	}
	if opts.MaxInteractions == 0 {
		opts.MaxInteractions = 10000
	}
	horizon := opts.Window + opts.Lateness
	if horizon < 0 {
		horizon = math.MaxInt64 // the sum overflowed
	}
	return &joiner{window: opts.Window, horizon: horizon, opts: opts, emit: emit, open: make(map[string]*openSession)}, nil
}

// ctxEvery is how many events go by between looks at the context.
const ctxEvery = 256

func (j *joiner) run(ctx context.Context, events iter.Seq2[Event, error]) error {
	if err := ctx.Err(); err != nil {
		return err
	}
	n := 0
	for e, err := range events {
		if n++; n%ctxEvery == 0 {
			if err := ctx.Err(); err != nil {
				return err
			}
		}
		if err != nil {
			if err := j.bad(err); err != nil {
				return err
			}
			continue
		}
		// The runs the event's time closes go first: the event cannot
		// join them (it would be late, or more than Window after them).
		j.count(&e)
		if err := j.sweep(); err != nil {
			return err
		}
		j.hold(&e)
	}
	return nil
}

// bad counts a malformed line when SkipBad allows, or returns the error.
func (j *joiner) bad(err error) error {
	var le *LineError
	if !j.opts.SkipBad || !errors.As(err, &le) {
		return err
	}
	j.stats.Bad++
	if len(j.stats.BadSample) < badSample {
		j.stats.BadSample = append(j.stats.BadSample, le.Error())
	}
	return nil
}

// count counts an event and moves the watermark.
func (j *joiner) count(e *Event) {
	j.stats.Events++
	search := e.Type == Search
	if search {
		j.stats.Searches++
	} else {
		j.stats.Interactions++
	}
	if e.Time.After(j.latest) {
		j.latest = e.Time
	} else if j.latest.Sub(e.Time) > j.opts.Lateness {
		j.stats.Late++
	}
}

// hold keeps an event in its session, opening one if none is.
func (j *joiner) hold(e *Event) {
	search := e.Type == Search
	s := j.open[e.Session]
	if s == nil {
		s = j.newSession(e.Session, e.Time)
		j.open[e.Session] = s
		j.queue.push(s)
		j.stats.PeakOpen = max(j.stats.PeakOpen, len(j.open))
	}
	switch {
	case search && s.searches >= j.opts.MaxSearches:
		j.stats.SearchOverflow++
		return
	case !search && s.interactions >= j.opts.MaxInteractions:
		j.stats.InteractionOverflow++
		return
	}
	if len(s.evs) > 0 && s.evs[0].Time.Sub(e.Time) > j.window {
		// A run of its own before the session's first: it closes first.
		s.key = e.Time
		j.queue.fix(s.index)
	}
	s.insert(e)
	if search {
		s.searches++
	} else {
		s.interactions++
	}
}

// sweep emits the runs of events that no event within Lateness can join
// any more, earliest first.
func (j *joiner) sweep() error {
	for len(j.queue) > 0 {
		s := j.queue[0]
		if j.latest.Sub(s.key) <= j.horizon {
			return nil
		}
		n, end := firstRun(s.evs, j.window)
		if end.After(s.key) {
			// The first run has grown since it was queued.
			s.key = end
			j.queue.fix(0)
			continue
		}
		if err := j.close(s.id, s.evs[:n]); err != nil {
			return err
		}
		s.drop(n)
		if len(s.evs) == 0 {
			j.queue.pop()
			j.forget(s)
			continue
		}
		s.key = s.evs[0].Time
		j.queue.fix(0)
	}
	return nil
}

// flush emits every run left, at the end of the events, by first event
// and id.
func (j *joiner) flush(ctx context.Context) error {
	type run struct {
		id  string
		evs []Event
	}
	var runs []run
	for _, s := range j.open {
		for evs := s.evs; len(evs) > 0; {
			n, _ := firstRun(evs, j.window)
			runs = append(runs, run{s.id, evs[:n]})
			evs = evs[n:]
		}
	}
	slices.SortFunc(runs, func(a, b run) int {
		return cmp.Or(a.evs[0].Time.Compare(b.evs[0].Time), cmp.Compare(a.id, b.id))
	})
	for _, r := range runs {
		if err := ctx.Err(); err != nil {
			return err
		}
		if err := j.close(r.id, r.evs); err != nil {
			return err
		}
	}
	clear(j.open)
	j.queue = nil
	return nil
}

// close joins one run of a session's events, in time order, and emits
// it when it holds a search.
func (j *joiner) close(id string, evs []Event) error {
	n := 0
	for i := range evs {
		if evs[i].Type == Search {
			n++
		}
	}
	sess := &Session{ID: id, Searches: make([]Joined, 0, n)}
	for i := range evs {
		if evs[i].Type == Search {
			sess.Searches = append(sess.Searches, Joined{Search: evs[i]})
		}
	}
	before := 0 // the searches at or before the interaction
	for i := range evs {
		e := &evs[i]
		if e.Type == Search {
			continue
		}
		for before < n && !sess.Searches[before].Search.Time.After(e.Time) {
			before++
		}
		j.joinOne(sess.Searches[:before], e)
	}
	if n == 0 {
		return nil
	}
	j.stats.Sessions++
	return j.emit(sess)
}

// joinOne joins interaction e to the latest of searches within the
// window that showed its product.
func (j *joiner) joinOne(searches []Joined, e *Event) {
	inWindow := false
	for k := len(searches) - 1; k >= 0 && e.Time.Sub(searches[k].Search.Time) <= j.window; k-- {
		inWindow = true
		if r := slices.Index(searches[k].Search.Shown, e.Product); r >= 0 {
			searches[k].Engagements = append(searches[k].Engagements, Engagement{Type: e.Type, Time: e.Time, Rank: r + 1})
			j.stats.Joined++
			return
		}
	}
	if inWindow {
		j.stats.NotShown++
	} else {
		j.stats.NoSearch++
	}
}

// openSession is a session whose events are still held.
type openSession struct {
	id string
	// evs are the events held, in time order, then by file and line.
	evs                    []Event
	searches, interactions int
	// key is when the session's first run of events ends, or earlier:
	// the sweep looks again before it closes the run.
	key   time.Time
	index int // in the close queue
}

// before orders events by time, then file and line.
func before(a, b *Event) bool {
	if c := a.Time.Compare(b.Time); c != 0 {
		return c < 0
	}
	if a.File != b.File {
		return a.File < b.File
	}
	return a.Line < b.Line
}

// insert adds e in order; events mostly come in order, so it looks from
// the end.
func (s *openSession) insert(e *Event) {
	n := len(s.evs)
	if n == 0 || !before(e, &s.evs[n-1]) {
		s.evs = append(s.evs, *e)
		return
	}
	i := sort.Search(n, func(i int) bool { return before(e, &s.evs[i]) })
	s.evs = slices.Insert(s.evs, i, *e)
}

// firstRun returns the length and end of the first run of evs: the
// events up to the first gap of more than window.
func firstRun(evs []Event, window time.Duration) (int, time.Time) {
	i := 1
	for i < len(evs) && evs[i].Time.Sub(evs[i-1].Time) <= window {
		i++
	}
	return i, evs[i-1].Time
}

// drop forgets the first n events held.
func (s *openSession) drop(n int) {
	for _, e := range s.evs[:n] {
		if e.Type == Search {
			s.searches--
		} else {
			s.interactions--
		}
	}
	k := copy(s.evs, s.evs[n:])
	clear(s.evs[k:])
	s.evs = s.evs[:k]
}

// closeQueue is a heap of the open sessions by key, then id. It is
// written out rather than through container/heap, whose calls through
// an interface cost a tenth of the join.
type closeQueue []*openSession

func (q closeQueue) less(i, j int) bool {
	if c := q[i].key.Compare(q[j].key); c != 0 {
		return c < 0
	}
	return q[i].id < q[j].id
}

func (q closeQueue) swap(i, j int) {
	q[i], q[j] = q[j], q[i]
	q[i].index, q[j].index = i, j
}

func (q *closeQueue) push(s *openSession) {
	s.index = len(*q)
	*q = append(*q, s)
	q.up(s.index)
}

// pop removes the first session.
func (q *closeQueue) pop() {
	n := len(*q) - 1
	q.swap(0, n)
	(*q)[n] = nil
	*q = (*q)[:n]
	q.down(0)
}

// fix restores the order after the key of the session at i changed.
func (q closeQueue) fix(i int) {
	if !q.down(i) {
		q.up(i)
	}
}

func (q closeQueue) up(i int) {
	for i > 0 {
		p := (i - 1) / 2
		if !q.less(i, p) {
			return
		}
		q.swap(i, p)
		i = p
	}
}

// down moves the session at i down to its place, and says whether it
// moved.
func (q closeQueue) down(i int) bool {
	start := i
	for {
		c := 2*i + 1
		if c >= len(q) {
			break
		}
		if r := c + 1; r < len(q) && q.less(r, c) {
			c = r
		}
		if !q.less(c, i) {
			break
		}
		q.swap(i, c)
		i = c
	}
	return i > start
}

package signals

import (
	"bytes"
	"fmt"
	"math/rand/v2"
	"slices"
	"strings"
	"testing"
	"time"
)

// simulated is a simulated shop's traffic with known ground truth, for
// the tests and benchmarks of the join; its ids and queries are
// invented. Sessions start every every; each has 1 to 5 searches that
// show a page of 10 products, and after each search up to 2
// interactions with products it showed, made before the session's next
// search and within seconds of their own. So each interaction belongs
// to the search it follows, at the rank it was given, and a visit's
// events lie within minutes of each other. With pauses, one session in
// four comes back for a second visit 31 to 55 minutes after its last
// event: more than the join's Window, less than Window + Lateness.
type simulated struct {
	sessions int
	every    time.Duration
	seed     uint64
	pauses   bool
}

var simStart = time.Date(2025, 3, 14, 9, 0, 0, 0, time.UTC)

var simQueries = []string{"red scarf", "mustard rain jacket", "trail running shoes size 9", "oak desk 120 cm", "linen shirt", "wool socks"}

// simEngagement is an interaction as the simulator made it: on the
// search it generated as number search.
type simEngagement struct {
	search int
	Engagement
}

// run returns the simulation's events in time order, with File and Line
// as if written in that order to sim.jsonl, and, when want is set, the
// visits a join must emit as sessions, in the order of byVisit, worked
// out from what the simulator made rather than by joining.
func (sim simulated) run(want bool) ([]Event, []*Session) {
	r := rand.New(rand.NewPCG(sim.seed, 1))
	var evs []Event
	var searches [][]int // each visit's searches, as generated
	var engaged []simEngagement
	for s := range sim.sessions {
		id := fmt.Sprintf("sess-%07d", s)
		t := simStart.Add(time.Duration(s) * sim.every)
		visits := 1
		if sim.pauses && r.IntN(4) == 0 {
			visits = 2
		}
		for v := range visits {
			if v > 0 {
				t = t.Add(time.Duration(31+r.IntN(25)) * time.Minute)
			}
			searches = append(searches, sim.visit(r, id, t, &evs, &engaged))
			t = evs[len(evs)-1].Time
		}
	}

	// Line holds the order of generation until the events are in time
	// order.
	slices.SortStableFunc(evs, func(a, b Event) int { return a.Time.Compare(b.Time) })
	at := make([]int, len(evs))
	for i := range evs {
		at[evs[i].Line] = i
		evs[i].File, evs[i].Line = "sim.jsonl", i+1
	}
	if !want {
		return evs, nil
	}
	var sessions []*Session
	joined := make(map[int]*Joined)
	for _, mine := range searches {
		sess := &Session{ID: evs[at[mine[0]]].Session}
		for _, g := range mine {
			sess.Searches = append(sess.Searches, Joined{Search: evs[at[g]]})
		}
		for i, g := range mine {
			joined[g] = &sess.Searches[i]
		}
		sessions = append(sessions, sess)
	}
	for _, e := range engaged {
		j := joined[e.search]
		j.Engagements = append(j.Engagements, e.Engagement)
	}
	return evs, byVisit(sessions)
}

// visit simulates one visit of session id from t: its searches and
// interactions are appended to evs, with their order of generation as
// Line, and the interactions to engaged. It returns the searches'
// places in evs.
func (simulated) visit(r *rand.Rand, id string, t time.Time, evs *[]Event, engaged *[]simEngagement) []int {
	var mine []int
	for range 1 + r.IntN(5) {
		t = t.Add(time.Duration(1+r.IntN(60)) * time.Second)
		shown := make([]string, 10)
		base := r.IntN(5000)
		for i := range shown {
			shown[i] = fmt.Sprintf("P-%05d", base+i*7)
		}
		mine = append(mine, len(*evs))
		*evs = append(*evs, Event{Type: Search, Session: id, Time: t, Query: simQueries[r.IntN(len(simQueries))], Shown: shown, Line: len(*evs)})
		for range r.IntN(3) {
			t = t.Add(time.Duration(1+r.IntN(20)) * time.Second)
			rank := 1 + r.IntN(len(shown))
			typ := interactions[r.IntN(len(interactions))]
			*engaged = append(*engaged, simEngagement{mine[len(mine)-1], Engagement{Type: typ, Time: t, Rank: rank}})
			*evs = append(*evs, Event{Type: typ, Session: id, Time: t, Product: shown[rank-1], Line: len(*evs)})
		}
	}
	return mine
}

// byVisit sorts sessions by id, then by their first search, so that the
// sessions of a join and of the simulator can be compared whatever
// order they were emitted in.
func byVisit(ss []*Session) []*Session {
	out := slices.Clone(ss)
	slices.SortFunc(out, func(a, b *Session) int {
		if c := strings.Compare(a.ID, b.ID); c != 0 {
			return c
		}
		return a.Searches[0].Search.Time.Compare(b.Searches[0].Search.Time)
	})
	return out
}

// events returns the simulation's events alone.
func (sim simulated) events() []Event {
	evs, _ := sim.run(false)
	return evs
}

// writeLog writes events as a signals log.
func writeLog(tb testing.TB, evs []Event) []byte {
	tb.Helper()
	var buf bytes.Buffer
	w := NewWriter(&buf)
	for _, e := range evs {
		if err := w.Write(e); err != nil {
			tb.Fatal(err)
		}
	}
	return buf.Bytes()
}

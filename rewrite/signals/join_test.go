package signals

import (
	"context"
	"encoding/json"
	"errors"
	"fmt"
	"iter"
	"math/rand/v2"
	"slices"
	"strings"
	"testing"
	"time"

	"github.com/google/go-cmp/cmp"
	"github.com/google/go-cmp/cmp/cmpopts"
)

// search is a search event in session s at hms showing shown.
func search(s, hms string, shown ...string) Event {
	return Event{Type: Search, Session: s, Time: at(hms), Query: "q", Shown: shown}
}

// act is an interaction of type typ in session s at hms on product p.
func act(typ Type, s, hms, p string) Event {
	return Event{Type: typ, Session: s, Time: at(hms), Product: p}
}

// numbered gives events the file t.jsonl and their places as lines.
func numbered(evs ...Event) []Event {
	for i := range evs {
		evs[i].File, evs[i].Line = "t.jsonl", i+1
	}
	return evs
}

// each yields events as a log would.
func each(evs []Event) iter.Seq2[Event, error] {
	return func(yield func(Event, error) bool) {
		for _, e := range evs {
			if !yield(e, nil) {
				return
			}
		}
	}
}

// joinAll joins events, keeping what is emitted in order.
func joinAll(ctx context.Context, events iter.Seq2[Event, error], opts JoinOptions) ([]*Session, JoinStats, error) {
	var got []*Session
	st, err := Join(ctx, events, opts, func(s *Session) error {
		got = append(got, s)
		return nil
	})
	return got, st, err
}

// joined is a search with its engagements.
func joined(e Event, eng ...Engagement) Joined { return Joined{Search: e, Engagements: eng} }

func eng(typ Type, hms string, rank int) Engagement {
	return Engagement{Type: typ, Time: at(hms), Rank: rank}
}

func TestJoin(t *testing.T) {
	for _, tc := range []struct {
		name   string
		events []Event
		opts   JoinOptions
		// want builds the sessions from the events, by place.
		want      func(evs []Event) []*Session
		wantStats JoinStats
		reason    string
	}{
		{
			name:   "click joins its search",
			events: numbered(search("s1", "09:00:00", "A", "B"), act(Click, "s1", "09:01:00", "B")),
			want: func(evs []Event) []*Session {
				return []*Session{{ID: "s1", Searches: []Joined{joined(evs[0], eng(Click, "09:01:00", 2))}}}
			},
			wantStats: JoinStats{Events: 2, Searches: 1, Interactions: 1, Joined: 1, Sessions: 1, PeakOpen: 1},
			reason:    "B is second of those shown",
		},
		{
			name:   "interaction before its search in the log",
			events: numbered(act(Click, "s1", "09:01:00", "B"), search("s1", "09:00:00", "A", "B")),
			want: func(evs []Event) []*Session {
				return []*Session{{ID: "s1", Searches: []Joined{joined(evs[1], eng(Click, "09:01:00", 2))}}}
			},
			wantStats: JoinStats{Events: 2, Searches: 1, Interactions: 1, Joined: 1, Sessions: 1, PeakOpen: 1},
			reason:    "the click is held until its session closes, so a search that arrives after it still takes it",
		},
		{
			name:   "at the same time",
			events: numbered(act(Click, "s1", "09:00:00", "A"), search("s1", "09:00:00", "A")),
			want: func(evs []Event) []*Session {
				return []*Session{{ID: "s1", Searches: []Joined{joined(evs[1], eng(Click, "09:00:00", 1))}}}
			},
			wantStats: JoinStats{Events: 2, Searches: 1, Interactions: 1, Joined: 1, Sessions: 1, PeakOpen: 1},
			reason:    "a search at the interaction's time is at or before it, whatever their lines",
		},
		{
			name:   "at the end of the window",
			events: numbered(search("s1", "09:00:00", "A"), act(Purchase, "s1", "09:30:00", "A")),
			want: func(evs []Event) []*Session {
				return []*Session{{ID: "s1", Searches: []Joined{joined(evs[0], eng(Purchase, "09:30:00", 1))}}}
			},
			wantStats: JoinStats{Events: 2, Searches: 1, Interactions: 1, Joined: 1, Sessions: 1, PeakOpen: 1},
			reason:    "30 minutes after is no older than the 30-minute window",
		},
		{
			name:   "past the window",
			events: numbered(search("s1", "09:00:00", "A"), act(Purchase, "s1", "09:30:01", "A")),
			want: func(evs []Event) []*Session {
				return []*Session{{ID: "s1", Searches: []Joined{joined(evs[0])}}}
			},
			wantStats: JoinStats{Events: 2, Searches: 1, Interactions: 1, NoSearch: 1, Sessions: 1, PeakOpen: 1},
			reason:    "a second past the window: no search to join, and the purchase alone is a session with no search, not emitted",
		},
		{
			name:   "a narrower window",
			events: numbered(search("s1", "09:00:00", "A"), act(Click, "s1", "09:10:01", "A")),
			opts:   JoinOptions{Window: 10 * time.Minute},
			want: func(evs []Event) []*Session {
				return []*Session{{ID: "s1", Searches: []Joined{joined(evs[0])}}}
			},
			wantStats: JoinStats{Events: 2, Searches: 1, Interactions: 1, NoSearch: 1, Sessions: 1, PeakOpen: 1},
			reason:    "Window sets the join's reach",
		},
		{
			name:   "product not shown",
			events: numbered(search("s1", "09:00:00", "A", "B"), act(Click, "s1", "09:01:00", "C")),
			want: func(evs []Event) []*Session {
				return []*Session{{ID: "s1", Searches: []Joined{joined(evs[0])}}}
			},
			wantStats: JoinStats{Events: 2, Searches: 1, Interactions: 1, NotShown: 1, Sessions: 1, PeakOpen: 1},
			reason:    "a search in the window, but C is not among what it showed",
		},
		{
			name: "the latest search that showed it",
			events: numbered(search("s1", "09:00:00", "A", "B"), search("s1", "09:05:00", "B", "C"), search("s1", "09:06:00", "D"),
				act(Click, "s1", "09:07:00", "B")),
			want: func(evs []Event) []*Session {
				return []*Session{{ID: "s1", Searches: []Joined{joined(evs[0]), joined(evs[1], eng(Click, "09:07:00", 1)), joined(evs[2])}}}
			},
			wantStats: JoinStats{Events: 4, Searches: 3, Interactions: 1, Joined: 1, Sessions: 1, PeakOpen: 1},
			reason:    "09:06 is later but did not show B; 09:05 did, at rank 1, and is later than 09:00",
		},
		{
			name:   "not a search after it",
			events: numbered(search("s1", "09:00:00", "B"), act(Click, "s1", "09:00:30", "A"), search("s1", "09:01:00", "A")),
			want: func(evs []Event) []*Session {
				return []*Session{{ID: "s1", Searches: []Joined{joined(evs[0]), joined(evs[2])}}}
			},
			wantStats: JoinStats{Events: 3, Searches: 2, Interactions: 1, NotShown: 1, Sessions: 1, PeakOpen: 1},
			reason:    "the search that showed A came 30 s after the click",
		},
		{
			name: "every interaction, in time order",
			events: numbered(search("s1", "09:00:00", "A", "B", "C"), act(Purchase, "s1", "09:09:00", "C"), act(Impression, "s1", "09:00:01", "C"),
				act(AddToCart, "s1", "09:05:00", "C"), act(Click, "s1", "09:02:00", "C")),
			want: func(evs []Event) []*Session {
				return []*Session{{ID: "s1", Searches: []Joined{joined(evs[0], eng(Impression, "09:00:01", 3), eng(Click, "09:02:00", 3),
					eng(AddToCart, "09:05:00", 3), eng(Purchase, "09:09:00", 3))}}}
			},
			wantStats: JoinStats{Events: 5, Searches: 1, Interactions: 4, Joined: 4, Sessions: 1, PeakOpen: 1},
			reason:    "engagements come in the order they happened, not the order of the log",
		},
		{
			name:   "sessions apart",
			events: numbered(search("s1", "09:00:00", "A"), search("s2", "09:00:10", "B"), act(Click, "s2", "09:00:20", "A"), act(Click, "s1", "09:00:30", "A")),
			want: func(evs []Event) []*Session {
				return []*Session{{ID: "s1", Searches: []Joined{joined(evs[0], eng(Click, "09:00:30", 1))}}, {ID: "s2", Searches: []Joined{joined(evs[1])}}}
			},
			wantStats: JoinStats{Events: 4, Searches: 2, Interactions: 2, Joined: 1, NotShown: 1, Sessions: 2, PeakOpen: 2},
			reason:    "s2 never saw A; s1's search did; the two are emitted at the end by first event",
		},
		{
			name:   "a long pause starts a new session",
			events: numbered(search("s1", "09:00:00", "A"), search("s1", "09:40:00", "A"), act(Click, "s1", "09:41:00", "A")),
			want: func(evs []Event) []*Session {
				return []*Session{{ID: "s1", Searches: []Joined{joined(evs[0])}}, {ID: "s1", Searches: []Joined{joined(evs[1], eng(Click, "09:41:00", 1))}}}
			},
			wantStats: JoinStats{Events: 3, Searches: 2, Interactions: 1, Joined: 1, Sessions: 2, PeakOpen: 1},
			reason:    "40 minutes apart is more than the window: two visits of one session id",
		},
		{
			name: "the first visit closes first",
			events: numbered(search("s1", "09:00:00", "A"), search("p", "09:30:00", "A"), search("s1", "09:40:00", "A"),
				search("o", "10:35:00", "A"), search("o", "10:45:00", "A")),
			want: func(evs []Event) []*Session {
				return []*Session{{ID: "s1", Searches: []Joined{joined(evs[0])}}, {ID: "p", Searches: []Joined{joined(evs[1])}},
					{ID: "s1", Searches: []Joined{joined(evs[2])}}, {ID: "o", Searches: []Joined{joined(evs[3]), joined(evs[4])}}}
			},
			wantStats: JoinStats{Events: 5, Searches: 5, Sessions: 4, PeakOpen: 2},
			reason: "s1's visit at 09:00 closes at 10:35, an hour and more after it, while its visit at 09:40 stays open; " +
				"p closes then too, after it; the 09:40 visit at 10:45; o at the end",
		},
		{
			name:   "an earlier visit that comes later",
			events: numbered(search("s1", "09:40:00", "A"), search("p", "09:20:00", "A"), search("s1", "09:00:00", "A"), search("o", "11:15:00", "A")),
			opts:   JoinOptions{Lateness: time.Hour},
			want: func(evs []Event) []*Session {
				return []*Session{{ID: "s1", Searches: []Joined{joined(evs[2])}}, {ID: "p", Searches: []Joined{joined(evs[1])}},
					{ID: "s1", Searches: []Joined{joined(evs[0])}}, {ID: "o", Searches: []Joined{joined(evs[3])}}}
			},
			wantStats: JoinStats{Events: 4, Searches: 4, Sessions: 4, PeakOpen: 2},
			reason: "with an hour's Lateness nothing is late; 11:15 closes all three visits before it, by their last event: " +
				"s1's at 09:00 first, though it came after s1's at 09:40",
		},
		{
			name:      "interactions alone",
			events:    numbered(act(Click, "s1", "09:00:00", "A"), act(Impression, "s1", "09:00:01", "B")),
			want:      func([]Event) []*Session { return nil },
			wantStats: JoinStats{Events: 2, Interactions: 2, NoSearch: 2, PeakOpen: 1},
			reason:    "a session with no search is not emitted; its interactions have no search in the window",
		},
		{
			name:      "empty",
			want:      func([]Event) []*Session { return nil },
			wantStats: JoinStats{},
			reason:    "no events, no sessions",
		},
	} {
		t.Run(tc.name, func(t *testing.T) {
			got, st, err := joinAll(context.Background(), each(tc.events), tc.opts)
			if err != nil {
				t.Fatal(err)
			}
			if diff := cmp.Diff(tc.want(tc.events), got); diff != "" {
				t.Errorf("sessions (-want +got) (%s):\n%s", tc.reason, diff)
			}
			if diff := cmp.Diff(tc.wantStats, st); diff != "" {
				t.Errorf("stats (-want +got) (%s):\n%s", tc.reason, diff)
			}
		})
	}
}

// ids lists the ids of sessions, in order.
func ids(ss []*Session) []string {
	var out []string
	for _, s := range ss {
		out = append(out, s.ID)
	}
	return out
}

func TestJoinOrder(t *testing.T) {
	evs := numbered(
		search("b", "09:00:00", "A"), search("c", "09:10:00", "A"), search("a", "09:10:00", "A"), search("b", "09:20:00", "A"),
		// 10:50:01 passes 09:20 by more than an hour: a, b and c close.
		search("y", "10:50:01", "A"), search("x", "10:51:00", "A"), search("y", "10:55:00", "A"),
	)
	got, st, err := joinAll(context.Background(), each(evs), JoinOptions{})
	if err != nil {
		t.Fatal(err)
	}
	// a and c close together, by id; then b, whose last search is at
	// 09:20. At the end y goes before x: it began first, though it ended
	// last.
	if diff := cmp.Diff([]string{"a", "c", "b", "y", "x"}, ids(got)); diff != "" {
		t.Errorf("order (-want +got):\n%s", diff)
	}
	if st.PeakOpen != 3 {
		t.Errorf("PeakOpen %d, want 3: a, b and c were open together", st.PeakOpen)
	}
}

func TestJoinLate(t *testing.T) {
	evs := numbered(
		search("L", "09:00:00", "A"),
		search("o", "09:10:00", "B"), search("o", "09:20:00", "B"), search("o", "09:30:00", "B"),
		// Within Lateness (30 minutes) of 09:30: not late.
		act(Click, "L", "09:01:00", "A"),
		search("o", "10:40:00", "B"),
		// 10:40 has passed L's last event (09:01) by more than an hour: L
		// has closed. These two come 99 and 98 minutes late.
		act(Click, "L", "09:01:00", "A"),
		search("L", "09:02:00", "A"),
	)
	got, st, err := joinAll(context.Background(), each(evs), JoinOptions{})
	if err != nil {
		t.Fatal(err)
	}
	want := []*Session{
		{ID: "L", Searches: []Joined{joined(evs[0], eng(Click, "09:01:00", 1))}},
		{ID: "o", Searches: []Joined{joined(evs[1]), joined(evs[2]), joined(evs[3])}},
		// The late click and search start a fresh session of L, closed at
		// the end: the click came before the search, so joins nothing.
		{ID: "L", Searches: []Joined{joined(evs[7])}},
		{ID: "o", Searches: []Joined{joined(evs[5])}},
	}
	if diff := cmp.Diff(want, got); diff != "" {
		t.Errorf("sessions (-want +got):\n%s", diff)
	}
	if st.Late != 2 || st.NoSearch != 1 || st.Joined != 1 {
		t.Errorf("Late %d NoSearch %d Joined %d; want 2 late events, the late click not joined and the timely one joined", st.Late, st.NoSearch, st.Joined)
	}
}

func TestJoinCaps(t *testing.T) {
	evs := numbered(search("s1", "09:00:00", "A"), search("s1", "09:01:00", "A"), search("s1", "09:02:00", "A"),
		act(Click, "s1", "09:03:00", "A"), act(Click, "s1", "09:04:00", "A"), act(Click, "s1", "09:05:00", "A"))
	got, st, err := joinAll(context.Background(), each(evs), JoinOptions{MaxSearches: 2, MaxInteractions: 2})
	if err != nil {
		t.Fatal(err)
	}
	want := []*Session{{ID: "s1", Searches: []Joined{joined(evs[0]), joined(evs[1], eng(Click, "09:03:00", 1), eng(Click, "09:04:00", 1))}}}
	if diff := cmp.Diff(want, got); diff != "" {
		t.Errorf("sessions (-want +got):\n%s", diff)
	}
	if st.SearchOverflow != 1 || st.InteractionOverflow != 1 {
		t.Errorf("overflow %d searches, %d interactions; want the third of each dropped", st.SearchOverflow, st.InteractionOverflow)
	}
	if st.Interactions != st.Joined+st.NoSearch+st.NotShown+st.InteractionOverflow {
		t.Errorf("stats %+v do not add up", st)
	}
}

func TestJoinBadLines(t *testing.T) {
	var lines []string
	lines = append(lines, goodSearch)
	for range 7 {
		lines = append(lines, `{"type":"click","session":"s1"}`)
	}
	lines = append(lines, goodClick)
	log := strings.Join(lines, "\n")

	_, st, err := joinAll(context.Background(), Read(strings.NewReader(log), "bad.jsonl"), JoinOptions{})
	var le *LineError
	if !errors.As(err, &le) || le.File != "bad.jsonl" || le.Line != 2 {
		t.Errorf("without SkipBad: error %v, want the first bad line, bad.jsonl line 2", err)
	}
	if st.Events != 1 {
		t.Errorf("stats so far %+v, want the one search before it", st)
	}

	got, st, err := joinAll(context.Background(), Read(strings.NewReader(log), "bad.jsonl"), JoinOptions{SkipBad: true})
	if err != nil {
		t.Fatal(err)
	}
	if st.Bad != 7 || len(st.BadSample) != 5 || st.BadSample[0] != "bad.jsonl: line 2: time: missing, or the zero time 0001-01-01T00:00:00Z; every event needs the time it happened" ||
		!strings.HasPrefix(st.BadSample[4], "bad.jsonl: line 6: ") {
		t.Errorf("with SkipBad: Bad %d, sample %q; want 7, and the first 5 messages", st.Bad, st.BadSample)
	}
	if len(got) != 1 || len(got[0].Searches[0].Engagements) != 1 {
		t.Errorf("with SkipBad: sessions %+v, want the search joined to the click after the bad lines", got)
	}
}

func TestJoinStops(t *testing.T) {
	disk := errors.New("disk gone")
	stop := errors.New("enough")
	cancelled, cancel := context.WithCancel(context.Background())
	cancel()
	evs := numbered(search("s1", "09:00:00", "A"), search("s2", "11:00:00", "A"))
	for _, tc := range []struct {
		name   string
		ctx    context.Context
		events iter.Seq2[Event, error]
		opts   JoinOptions
		emit   func(*Session) error
		want   error
		reason string
	}{
		{"reader error", context.Background(), Read(&failing{strings.NewReader(goodSearch + "\n"), disk}, "x"), JoinOptions{SkipBad: true},
			func(*Session) error { return nil }, disk, "SkipBad skips bad lines, not a failing reader"},
		{"emit error", context.Background(), each(evs), JoinOptions{}, func(*Session) error { return stop }, stop, "s1 is emitted when 11:00 arrives, and its error stops the join"},
		{"emit error at the end", context.Background(), each(evs[:1]), JoinOptions{}, func(*Session) error { return stop }, stop, "the sessions left at the end are emitted too"},
		{"cancelled", cancelled, each(evs), JoinOptions{}, func(*Session) error { return nil }, context.Canceled, "the context is honoured"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			_, err := Join(tc.ctx, tc.events, tc.opts, tc.emit)
			if !errors.Is(err, tc.want) {
				t.Errorf("error %v, want %v (%s)", err, tc.want, tc.reason)
			}
		})
	}
}

func TestJoinCancelledOnTheWay(t *testing.T) {
	ctx, cancel := context.WithCancel(context.Background())
	evs := simulated{sessions: 500, every: time.Minute, seed: 3}.events()
	n := 0
	_, err := Join(ctx, each(evs), JoinOptions{}, func(*Session) error {
		if n++; n == 10 {
			cancel()
		}
		return nil
	})
	if !errors.Is(err, context.Canceled) || n > 10+ctxEvery {
		t.Errorf("error %v after %d sessions, want context.Canceled soon after the 10th", err, n)
	}
}

func TestJoinBadOptions(t *testing.T) {
	for _, opts := range []JoinOptions{{Window: -1}, {Lateness: -time.Second}, {MaxSearches: -1}, {MaxInteractions: -1}} {
		if _, err := Join(context.Background(), each(nil), opts, func(*Session) error { return nil }); err == nil {
			t.Errorf("%+v: no error", opts)
		}
	}
}

func TestJoinSimulated(t *testing.T) {
	evs, want := simulated{sessions: 800, every: 30 * time.Second, seed: 11, pauses: true}.run(true)
	got, st, err := joinAll(context.Background(), each(evs), JoinOptions{})
	if err != nil {
		t.Fatal(err)
	}
	if diff := cmp.Diff(want, byVisit(got)); diff != "" {
		t.Errorf("sessions (-simulated +joined):\n%s", diff)
	}
	if len(want) < 900 || st.Sessions != len(want) || st.Joined != st.Interactions || st.Late != 0 {
		t.Errorf("stats %+v: want a session for each of the %d visits (about 1,000 for 800 sessions) and every interaction joined, as simulated", st, len(want))
	}
}

// shuffle returns evs in an order of arrival in which each event comes
// up to within late of its time: it arrives at its time plus a random
// delay under late.
func shuffle(evs []Event, late time.Duration, seed uint64) []Event {
	r := rand.New(rand.NewPCG(seed, 2))
	type arrival struct {
		at time.Time
		e  Event
	}
	as := make([]arrival, len(evs))
	for i, e := range evs {
		as[i] = arrival{e.Time.Add(time.Duration(r.Int64N(int64(late)))), e}
	}
	slices.SortStableFunc(as, func(a, b arrival) int { return a.at.Compare(b.at) })
	out := make([]Event, len(as))
	for i, a := range as {
		out[i] = a.e
	}
	return out
}

func TestJoinWhateverTheOrder(t *testing.T) {
	// Sessions every 20 s, some with a second visit after a pause of 31
	// to 56 minutes.
	evs, want := simulated{sessions: 400, every: 20 * time.Second, seed: 5, pauses: true}.run(true)
	for _, tc := range []struct {
		name     string
		lateness time.Duration
		reason   string
	}{
		{"default lateness", 0, "events come up to 30 minutes late, past the events of up to 90 other sessions"},
		{"two hours", 2 * time.Hour, "a second visit may come before the first"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			opts := JoinOptions{Lateness: tc.lateness}
			late := tc.lateness
			if late == 0 {
				late = 30 * time.Minute
			}
			inOrder, _, err := joinAll(context.Background(), each(evs), opts)
			if err != nil {
				t.Fatal(err)
			}
			if diff := cmp.Diff(want, byVisit(inOrder)); diff != "" {
				t.Fatalf("in order (-simulated +joined):\n%s", diff)
			}
			for seed := range uint64(2) {
				shuffled := shuffle(evs, late, seed)
				if slices.EqualFunc(shuffled, evs, func(a, b Event) bool { return a.Line == b.Line }) {
					t.Fatal("the shuffle left the events in order")
				}
				got, st, err := joinAll(context.Background(), each(shuffled), opts)
				if err != nil {
					t.Fatal(err)
				}
				if st.Late != 0 {
					t.Errorf("seed %d: %d late events; each came within Lateness", seed, st.Late)
				}
				if diff := cmp.Diff(inOrder, got); diff != "" {
					t.Errorf("seed %d: sessions, in the order emitted (-in order +shuffled) (%s):\n%s", seed, tc.reason, diff)
				}
			}
		})
	}
}

func TestJoinSeveralFiles(t *testing.T) {
	// The simulated log written to three files, each session to one of
	// them, each file's own order shuffled by up to 10 minutes.
	evs, want := simulated{sessions: 500, every: 30 * time.Second, seed: 9, pauses: true}.run(true)
	var files [3][]Event
	for _, e := range evs {
		var n int
		fmt.Sscanf(e.Session, "sess-%d", &n)
		files[n%3] = append(files[n%3], e)
	}
	var logs []iter.Seq2[Event, error]
	for i, f := range files {
		log := writeLog(t, shuffle(f, 10*time.Minute, uint64(i)))
		logs = append(logs, Read(strings.NewReader(string(log)), fmt.Sprintf("server%d.jsonl", i)))
	}
	got, st, err := joinAll(context.Background(), Merge(logs...), JoinOptions{})
	if err != nil {
		t.Fatal(err)
	}
	// The events read back have their new files and lines.
	if diff := cmp.Diff(want, byVisit(got), cmpopts.IgnoreFields(Event{}, "File", "Line")); diff != "" {
		t.Errorf("sessions (-simulated +joined):\n%s", diff)
	}
	if st.Late != 0 || st.Joined != st.Interactions {
		t.Errorf("stats %+v: want nothing late and every interaction joined", st)
	}
}

// streamed yields n sessions, one every 10 s, each a search and a click
// on its second product 5 s later, without holding them: the log of a
// long day.
func streamed(n int) iter.Seq2[Event, error] {
	return func(yield func(Event, error) bool) {
		shown := []string{"P-1", "P-2", "P-3"}
		for i := range n {
			id := fmt.Sprintf("s%d", i)
			t := simStart.Add(time.Duration(i) * 10 * time.Second)
			if !yield(Event{Type: Search, Session: id, Time: t, Query: "q", Shown: shown, File: "day.jsonl", Line: 2*i + 1}, nil) ||
				!yield(Event{Type: Click, Session: id, Time: t.Add(5 * time.Second), Product: "P-2", File: "day.jsonl", Line: 2*i + 2}, nil) {
				return
			}
		}
	}
}

func TestJoinMemoryBound(t *testing.T) {
	const n = 200_000
	emitted := 0
	st, err := Join(context.Background(), streamed(n), JoinOptions{}, func(s *Session) error {
		if len(s.Searches) != 1 || len(s.Searches[0].Engagements) != 1 {
			return fmt.Errorf("session %+v", s)
		}
		emitted++
		return nil
	})
	if err != nil {
		t.Fatal(err)
	}
	// A session closes once the latest event is more than Window +
	// Lateness (an hour) past its click: with a session every 10 s, 361
	// sessions are open at most (3,605 s / 10 s, less the one that closes
	// as the next begins), however long the log.
	if emitted != n || st.PeakOpen > 361 || st.PeakOpen < 300 {
		t.Errorf("emitted %d of %d, PeakOpen %d; want all emitted with at most 361 open at once", emitted, n, st.PeakOpen)
	}
}

// A join's figures are written in JSON with the snake_case names of the
// rest of tune's report (tune --json).
func TestJoinStatsJSON(t *testing.T) {
	b, err := json.Marshal(JoinStats{Events: 3, NoSearch: 1, PeakOpen: 2})
	if err != nil {
		t.Fatal(err)
	}
	var got map[string]int
	if err := json.Unmarshal(b, &got); err != nil {
		t.Fatal(err)
	}
	for key, want := range map[string]int{"events": 3, "no_search": 1, "peak_open": 2, "interaction_overflow": 0} {
		if v, ok := got[key]; !ok || v != want {
			t.Errorf("%s = %d (present %v), want %d, in %s", key, v, ok, want, b)
		}
	}
}

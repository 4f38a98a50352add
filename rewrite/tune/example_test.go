package tune_test

import (
	"context"
	"fmt"
	"strings"
	"time"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/signals"
	"github.com/whittle-search/whittle/rewrite/tune"
)

// exampleSessions are invented: exact matches for "rain jacket" that
// shoppers click, and searches that dropped the size, which they never
// click.
func exampleSessions() []*signals.Session {
	at := time.Date(2026, 11, 2, 9, 0, 0, 0, time.UTC)
	var out []*signals.Session
	for i := range 300 {
		id := fmt.Sprintf("s%03d", i)
		ev := signals.Event{Type: signals.Search, Session: id, Time: at.Add(time.Duration(i) * time.Minute),
			Query: "rain jacket size m", Category: "apparel", Shown: []string{"RJ-1", "RJ-2", "RJ-3"}}
		j := signals.Joined{Search: ev}
		if i%2 == 0 {
			j.Engagements = []signals.Engagement{{Type: signals.Click, Time: ev.Time, Rank: 1 + i%3}}
		} else {
			j.Search.Relaxations = []signals.Relaxed{{Op: "drop", Kind: parser.KindSize, Text: "size m"}}
		}
		out = append(out, &signals.Session{ID: id, Searches: []signals.Joined{j}})
	}
	return out
}

// exampleTuner has read exampleSessions under a policy that lets
// apparel drop the size.
func exampleTuner() *tune.Tuner {
	user, err := rewrite.ParsePolicy("shop.toml", "[category.apparel.strictness]\nsize = \"soft\"\n", lexicon.Default())
	if err != nil {
		panic(err)
	}
	t := tune.New(tune.Options{Policy: rewrite.DefaultPolicy().Overlay(user)})
	for _, s := range exampleSessions() {
		if err := t.Add(context.Background(), s); err != nil {
			panic(err)
		}
	}
	return t
}

func ExampleNew() {
	for _, c := range exampleTuner().Report().Changes {
		fmt.Println(c.Key, c.From, "→", c.To)
	}
	// Output: category.apparel.strictness.size soft → hard
}

func ExampleTuner_Report() {
	r := exampleTuner().Report()
	k := r.Categories[0].Kinds[0]
	fmt.Printf("%s %s: %d searches, %.0f%% of exact-match engagement\n", k.Kind, k.Ops[0].Op, k.Ops[0].Searches, 100*k.Ops[0].Ratio)
	// Output: size drop: 150 searches, 0% of exact-match engagement
}

func ExampleWriteText() {
	var b strings.Builder
	if err := tune.WriteText(&b, exampleTuner().Report()); err != nil {
		panic(err)
	}
	first, _, _ := strings.Cut(b.String(), "\n")
	fmt.Println(first)
	// Output: 300 sessions, 300 searches: 150 exact, 150 relaxed (0 relaxed more than one kind and are set aside), 0 found nothing.
}

func ExampleWriteHTML() {
	var b strings.Builder
	if err := tune.WriteHTML(&b, "Tune", exampleTuner().Report()); err != nil {
		panic(err)
	}
	fmt.Println(strings.Count(b.String(), "<svg"))
	// Output: 1
}

func ExampleWritePolicy() {
	var b strings.Builder
	if err := tune.WritePolicy(&b, exampleTuner().Report()); err != nil {
		panic(err)
	}
	// The proposal is a policy file like any other.
	p, err := rewrite.ParsePolicy("proposed.toml", b.String(), lexicon.Default())
	if err != nil {
		panic(err)
	}
	fmt.Println(p.For("apparel", "", lexicon.Default()).Strictness[parser.KindSize])
	// Output: hard
}

func ExampleDiff() {
	fmt.Print(tune.Diff([]tune.Change{{Key: "category.apparel.strictness.size", From: "soft", To: "hard"}}))
	// Output:
	// [category.apparel.strictness]
	// - size = "soft"
	// + size = "hard"
}

func ExampleTuner_Read() {
	log := `{"type": "search", "session": "s1", "time": "2026-11-02T09:00:00Z", "query": "rain jacket", "category": "apparel", "shown": ["RJ-1", "RJ-2"]}
{"type": "click", "session": "s1", "time": "2026-11-02T09:00:20Z", "product": "RJ-2"}
{"type": "purchase", "session": "s1", "time": "2026-11-02T09:03:00Z", "product": "RJ-2"}
`
	t := tune.New(tune.Options{})
	if err := t.Read(context.Background(), signals.Read(strings.NewReader(log), "signals.jsonl"), signals.JoinOptions{}); err != nil {
		panic(err)
	}
	j := t.Report().Join
	fmt.Println(j.Events, j.Searches, j.Joined)
	// Output: 3 1 2
}

// Add reads one closed session: here an invented shopper's three
// searches, an exact match with a click on the second product shown, a
// search relaxed by dropping the colour, and one that showed nothing.
func ExampleTuner_Add() {
	at := time.Date(2026, 11, 2, 9, 0, 0, 0, time.UTC)
	search := func(q string, shown ...string) signals.Event {
		return signals.Event{Type: signals.Search, Session: "s1", Time: at, Query: q, Category: "apparel", Shown: shown}
	}
	exact := signals.Joined{Search: search("rain jacket", "RJ-1", "RJ-2"),
		Engagements: []signals.Engagement{{Type: signals.Click, Time: at.Add(20 * time.Second), Rank: 2}}}
	relaxed := signals.Joined{Search: search("mustard rain jacket", "RJ-1", "RJ-2", "RJ-3")}
	relaxed.Search.Relaxations = []signals.Relaxed{{Op: rewrite.OpDrop, Kind: parser.KindColour, Text: "mustard"}}
	nothing := signals.Joined{Search: search("zorblax")}

	t := tune.New(tune.Options{})
	if err := t.Add(context.Background(), &signals.Session{ID: "s1", Searches: []signals.Joined{exact, relaxed, nothing}}); err != nil {
		fmt.Println(err)
		return
	}
	s := t.Report().Stats
	fmt.Println(s.Sessions, "session,", s.Searches, "searches:", s.Exact, "exact,", s.Relaxed, "relaxed,", s.FoundNothing, "found nothing;", s.Engagements, "engagement")
	// Output: 1 session, 3 searches: 1 exact, 1 relaxed, 1 found nothing; 1 engagement
}

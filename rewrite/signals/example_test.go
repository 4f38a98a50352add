package signals_test

import (
	"context"
	"fmt"
	"os"
	"strings"
	"time"

	"github.com/whittle-search/whittle/rewrite/signals"
)

// A day at an invented shop: one search for a scarf, a click on the
// second scarf shown, and a line that lost its time.
const day = `{"type":"search","session":"v-17","time":"2025-03-14T09:00:00Z","query":"red scarf","shown":["SC-1","SC-2","SC-3"]}
{"type":"click","session":"v-17","time":"2025-03-14T09:00:40Z","product":"SC-2"}
{"type":"click","session":"v-17","product":"SC-3"}
`

func ExampleRead() {
	for e, err := range signals.Read(strings.NewReader(day), "day.jsonl") {
		if err != nil {
			fmt.Println(err)
			continue
		}
		what := e.Query
		if e.Type != signals.Search {
			what = e.Product
		}
		fmt.Println(e.Line, e.Type, e.Session, e.Time.Format(time.TimeOnly), what)
	}
	// Output:
	// 1 search v-17 09:00:00 red scarf
	// 2 click v-17 09:00:40 SC-2
	// day.jsonl: line 3: time: missing, or the zero time 0001-01-01T00:00:00Z; every event needs the time it happened
}

func ExampleMerge() {
	shop1 := `{"type":"search","session":"a","time":"2025-03-14T09:00:00Z","query":"oak desk"}
{"type":"search","session":"a","time":"2025-03-14T09:02:00Z","query":"oak desk 120 cm"}
`
	shop2 := `{"type":"search","session":"b","time":"2025-03-14T09:01:00Z","query":"linen shirt"}
`
	for e, err := range signals.Merge(signals.Read(strings.NewReader(shop1), "web1.jsonl"), signals.Read(strings.NewReader(shop2), "web2.jsonl")) {
		if err != nil {
			fmt.Println(err)
			continue
		}
		fmt.Printf("%s %s:%d %s\n", e.Time.Format(time.TimeOnly), e.File, e.Line, e.Query)
	}
	// Output:
	// 09:00:00 web1.jsonl:1 oak desk
	// 09:01:00 web2.jsonl:1 linen shirt
	// 09:02:00 web1.jsonl:2 oak desk 120 cm
}

func ExampleJoin() {
	// The click is written before the search it followed: the join holds
	// it until the session closes.
	log := `{"type":"click","session":"v-17","time":"2025-03-14T09:00:40Z","product":"SC-2"}
{"type":"search","session":"v-17","time":"2025-03-14T09:00:00Z","query":"red scarf","shown":["SC-1","SC-2","SC-3"]}
{"type":"purchase","session":"v-17","time":"2025-03-14T09:03:00Z","product":"SC-9"}
`
	st, err := signals.Join(context.Background(), signals.Read(strings.NewReader(log), "day.jsonl"), signals.JoinOptions{}, func(s *signals.Session) error {
		for _, j := range s.Searches {
			fmt.Printf("%s %q:", s.ID, j.Search.Query)
			for _, e := range j.Engagements {
				fmt.Printf(" %s of rank %d;", e.Type, e.Rank)
			}
			fmt.Println()
		}
		return nil
	})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%d events, %d joined, %d of a product not shown\n", st.Events, st.Joined, st.NotShown)
	// Output:
	// v-17 "red scarf": click of rank 2;
	// 3 events, 1 joined, 1 of a product not shown
}

func ExampleNewWriter() {
	w := signals.NewWriter(os.Stdout)
	at := time.Date(2025, 3, 14, 9, 0, 0, 0, time.UTC)
	for _, e := range []signals.Event{
		{Type: signals.Search, Session: "v-17", Time: at, Query: "mustard rain jacket", Shown: []string{"RJ-1", "RJ-2"},
			Relaxations: []signals.Relaxed{{Op: "widen", Kind: "colour", Text: "mustard"}}},
		{Type: signals.Click, Session: "v-17", Time: at.Add(20 * time.Second), Product: "RJ-2"},
		{Type: signals.Click, Session: "v-17", Time: at.Add(30 * time.Second)},
	} {
		if err := w.Write(e); err != nil {
			fmt.Println(err)
		}
	}
	// Output:
	// {"type":"search","session":"v-17","time":"2025-03-14T09:00:00Z","query":"mustard rain jacket","relaxations":[{"op":"widen","kind":"colour","text":"mustard"}],"shown":["RJ-1","RJ-2"]}
	// {"type":"click","session":"v-17","time":"2025-03-14T09:00:20Z","product":"RJ-2"}
	// signals: event not written: product: missing or blank; every click needs the product's id
}

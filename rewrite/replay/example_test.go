package replay_test

import (
	"context"
	"errors"
	"fmt"
	"os"
	"slices"
	"strings"

	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/catalog"
	"github.com/whittle-search/whittle/rewrite/replay"
)

// kinds is a toy engine: a catalog of product types, and a count that
// reads only the product type clause.
type kinds []string

func (k kinds) Count(_ context.Context, p rewrite.Plan) (int, error) {
	n := 0
	for _, t := range k {
		ok := true
		for _, c := range p.Clauses {
			if c.Field != "product_type" || slices.Contains(c.Values, t) == c.Excluded {
				ok = false
			}
		}
		if ok {
			n++
		}
	}
	return n, nil
}

func (kinds) Search(context.Context, rewrite.Plan, int) ([]rewrite.Hit, error) { return nil, nil }

func ExampleRead() {
	log := "rain jacket\n{\"query\": \"red scarf\", \"count\": 12, \"category\": \"apparel\"}\n"
	for e, err := range replay.Read(strings.NewReader(log)) {
		fmt.Println(e.Line, e.Query, e.Count, e.Category, err)
	}
	// Output:
	// 1 rain jacket 1  <nil>
	// 2 red scarf 12 apparel <nil>
}

func ExampleRun() {
	rw := rewrite.New(kinds{"rain jacket", "scarf"}, nil)
	log := "rain jacket\n{\"query\": \"red scarf\", \"count\": 3}\n{\"query\": \"!!!\", \"count\": 5}\n"
	sum, err := replay.Run(context.Background(), rw, replay.Read(strings.NewReader(log)), replay.Options{}, func(r *replay.Result) error {
		if r.NothingToSearch != "" {
			fmt.Println(r.Query, "not searched:", r.NothingToSearch)
			return nil
		}
		fmt.Println(r.Query, r.ExactCount, r.FinalCount)
		return nil
	})
	if err != nil {
		fmt.Println(err)
		return
	}
	r := sum.Report()
	fmt.Println(r.ZeroBefore.Searches, "of", r.All.Searches, "searches find nothing as typed,", r.ZeroAfter.Searches, "after rescue;",
		r.NothingToSearch.Searches, "had nothing to search for")
	// Output:
	// rain jacket 1 1
	// red scarf 0 1
	// !!! not searched: no word or number to search for
	// 3 of 4 searches find nothing as typed, 0 after rescue; 5 had nothing to search for
}

func ExampleSummary_Report() {
	s := replay.NewSummary()
	s.Add(&replay.Result{Entry: replay.Entry{Query: "Size 15 Boots", Count: 30}, HardUnmet: []string{"size 15"}})
	s.Add(&replay.Result{Entry: replay.Entry{Query: "boots", Count: 70}, ExactCount: 9, FinalCount: 9})
	r := s.Report()
	fmt.Printf("%.0f%% of searches find nothing; %s: %d\n", 100*r.RateAfter.Searches, r.Alerts[0].Query, r.Alerts[0].Searches)
	// Output: 30% of searches find nothing; size 15 boots: 30
}

func ExampleWriteText() {
	s := replay.NewSummary()
	s.Add(&replay.Result{Entry: replay.Entry{Query: "boots", Count: 2}, ExactCount: 9, FinalCount: 9})
	replay.WriteText(os.Stdout, s.Report())
	// Output:
	// 1 query, 2 searches
	//
	// finding nothing            queries          searches
	//   as typed                  0    0.0%         0    0.0%
	//   after rescue              0    0.0%         0    0.0%
	//   rescued                   0                 0
	//
	// rescue time: p50 ≤ 50 µs, p99 ≤ 50 µs
}

func ExampleNewCSV() {
	c := replay.NewCSV(os.Stdout)
	c.Write(&replay.Result{Entry: replay.Entry{Line: 1, Query: "red scarf", Count: 1}, ExactCount: 0, Rescued: true, FinalCount: 4,
		Changes: []replay.Change{{Op: "widen", Kind: "colour", Text: "red"}}})
	c.Write(&replay.Result{Entry: replay.Entry{Line: 2, Query: "!!!", Count: 3}, NothingToSearch: "no word or number to search for"})
	c.Flush()
	// Output:
	// line,query,count,category,exact_count,rescued,final_count,relaxations,hard_unmet,elapsed_ms,nothing_to_search
	// 1,red scarf,1,,0,true,4,widen colour red,,0.000,
	// 2,!!!,3,,,,,,,0.000,no word or number to search for
}

func ExampleWriteHTML() {
	s := replay.NewSummary()
	s.Add(&replay.Result{Entry: replay.Entry{Query: "boots", Count: 1}, ExactCount: 2, FinalCount: 2})
	s.Add(&replay.Result{Entry: replay.Entry{Query: "red scarf", Count: 1}, Rescued: true, FinalCount: 4,
		Changes: []replay.Change{{Op: "drop", Kind: "colour", Text: "red"}}})
	var b strings.Builder
	replay.WriteHTML(&b, "Replay", s.Report())
	fmt.Println(strings.Count(b.String(), "<svg"), "charts")
	// Output: 3 charts
}

// NewSummary starts a summary with nothing counted, to which Run or a
// caller's own loop adds results.
func ExampleNewSummary() {
	r := replay.NewSummary().Report()
	fmt.Println(r.All, r.ZeroBefore, r.RateBefore, len(r.Changes), len(r.Alerts))
	// Output: {0 0} {0 0} {0 0} 0 0
}

// Add counts a result once as a query and as many times as it was
// searched: "red scarf", searched 4 times, found nothing as typed and
// was rescued by widening its colour; "boots", searched once, matched
// as typed.
func ExampleSummary_Add() {
	s := replay.NewSummary()
	s.Add(&replay.Result{Entry: replay.Entry{Line: 1, Query: "red scarf", Count: 4}, Rescued: true, FinalCount: 3,
		Changes: []replay.Change{{Op: "widen", Kind: "colour", Text: "red"}}})
	s.Add(&replay.Result{Entry: replay.Entry{Line: 2, Query: "boots", Count: 1}, ExactCount: 9, FinalCount: 9})
	r := s.Report()
	fmt.Println("all", r.All, "zero as typed", r.ZeroBefore, "rescued", r.Rescued, "after", r.ZeroAfter)
	fmt.Println(r.Changes[0].Op, r.Changes[0].Kind, r.Changes[0].Tally)
	// Output:
	// all {2 5} zero as typed {1 4} rescued {1 4} after {0 0}
	// widen colour {1 4}
}

// Skip counts a malformed line of the log passed over, as Run does with
// SkipBad: here the second line, searched no times, and the third,
// which has no query. The report lists the first SkippedShown.
func ExampleSummary_Skip() {
	log := "boots\n{\"query\": \"red scarf\", \"count\": 0}\n{\"count\": 2}\n"
	s := replay.NewSummary()
	for _, err := range replay.Read(strings.NewReader(log)) {
		var le *catalog.LineError
		if errors.As(err, &le) {
			s.Skip(le)
		}
	}
	r := s.Report()
	fmt.Println(r.SkippedLines, "skipped")
	for _, le := range r.Skipped {
		fmt.Println(le)
	}
	// Output:
	// 2 skipped
	// line 2: count: 0; a query is searched at least once
	// line 3: query: missing; every JSON line needs it
}

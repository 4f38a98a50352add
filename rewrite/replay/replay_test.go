package replay

import (
	"bytes"
	"context"
	"encoding/csv"
	"encoding/json"
	"encoding/xml"
	"errors"
	"io"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// shop opens an index of testdata/catalog/shop.jsonl, the invented
// shop of 13 products the engine's own tests work from by hand.
func shop(t testing.TB) *rewrite.Rewriter {
	t.Helper()
	f, err := os.Open(filepath.Join("..", "..", "testdata", "catalog", "shop.jsonl"))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	dir := filepath.Join(t.TempDir(), "idx")
	if _, err := bleveengine.Build(context.Background(), f, dir, bleveengine.BuildOptions{}); err != nil {
		t.Fatal(err)
	}
	e, err := bleveengine.Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	t.Cleanup(func() { e.Close() })
	return rewrite.New(e, nil)
}

// The log below, plain and JSON lines mixed. What each query does on
// shop.jsonl is worked out in rewrite/bleveengine's TestRescueOnTheIndex:
// "rain jacket" finds 3 as typed; "mustard rain jacket" finds none and
// widens the colour to harvest gold (RJ-1); "trail running shoes size
// 13" finds nothing, since size is hard and the shoes come in 7 to 12;
// "85 lens" finds nothing, focal length being hard; "striped rain
// jacket" drops the pattern and finds all 3.
const log = `rain jacket
{"query": "mustard rain jacket", "count": 5}

{"query": "trail running shoes size 13", "count": 40, "category": "footwear"}
85 lens
{"query": "striped rain jacket", "count": 2}
Mustard  Rain Jacket
`

func TestRunSummary(t *testing.T) {
	rw := shop(t)
	var got []*Result
	sum, err := Run(context.Background(), rw, Read(strings.NewReader(log)), Options{Workers: 3}, func(r *Result) error {
		got = append(got, r)
		return nil
	})
	if err != nil {
		t.Fatal(err)
	}
	r := sum.Report()
	checkTallies(t, []tallyCase{
		{"all", r.All, Tally{6, 50}, "6 lines; 1+5+40+1+2+1 searches (the blank line is skipped)"},
		{"zero before", r.ZeroBefore, Tally{5, 49}, "all but the plain rain jacket: 5+40+1+2+1"},
		{"zero after", r.ZeroAfter, Tally{2, 41}, "the size 13 shoes (40) and the 85 mm lens (1)"},
		{"rescued", r.Rescued, Tally{3, 8}, "mustard twice (5+1) and striped (2)"},
	})
	// 49/50 = 0.98 of searches find nothing as typed; 41/50 = 0.82 after.
	if r.RateBefore.Searches != 0.98 || r.RateAfter.Searches != 0.82 || r.RateAfter.Queries != 2.0/6 {
		t.Errorf("rates %+v %+v", r.RateBefore, r.RateAfter)
	}
	wantChanges := []ChangeTally{
		{Op: "widen", Kind: "colour", Tally: Tally{2, 6}},
		{Op: "drop", Kind: "pattern", Tally: Tally{1, 2}},
	}
	if !slices.Equal(r.Changes, wantChanges) {
		t.Errorf("changes %+v, want %+v", r.Changes, wantChanges)
	}
	if len(r.Unmet) != 2 || r.Unmet[0].Searches != 40 || !strings.HasSuffix(r.Unmet[0].Constraint, "(size)") ||
		r.Unmet[1].Searches != 1 || !strings.HasSuffix(r.Unmet[1].Constraint, "(measure)") {
		t.Errorf("unmet %+v: want the size (40 searches), then the focal length (1)", r.Unmet)
	}
	// Case and spacing aside, mustard rain jacket was searched 5+1 times.
	wantAlerts := []Alert{{"trail running shoes size 13", 40, 0}, {"mustard rain jacket", 6, 0}, {"striped rain jacket", 2, 0}, {"85 lens", 1, 0}}
	if !slices.Equal(r.Alerts, wantAlerts) {
		t.Errorf("alerts %+v, want %+v", r.Alerts, wantAlerts)
	}
	var lines []int
	for _, res := range got {
		lines = append(lines, res.Line)
	}
	if want := []int{1, 2, 4, 5, 6, 7}; !slices.Equal(lines, want) {
		t.Errorf("results for lines %v, want %v in order", lines, want)
	}
	if got[3].Category != "" || got[2].Category != "footwear" || got[1].Count != 5 {
		t.Errorf("entries not kept: %+v %+v", got[1].Entry, got[2].Entry)
	}
}

// tallyCase is one tally of a report beside the figure worked out by
// hand, and how.
type tallyCase struct {
	name      string
	got, want Tally
	reason    string
}

func checkTallies(t *testing.T, cases []tallyCase) {
	t.Helper()
	for _, tc := range cases {
		if tc.got != tc.want {
			t.Errorf("%s = %+v, want %+v (%s)", tc.name, tc.got, tc.want, tc.reason)
		}
	}
}

// Results come in the log's order and are the same, time taken aside,
// for 1 worker and for 8.
func TestRunOrderAndWorkers(t *testing.T) {
	rw := shop(t)
	var b strings.Builder
	qs := []string{"rain jacket", "mustard rain jacket", "85 lens", "striped rain jacket", "50mm lens for jx-10", "2x4 12 ft", "14 awg wire", "fn-3520", "oatmeal sweater", "!!!", "nice", "1/0"}
	for i := range 60 {
		b.WriteString(qs[i%len(qs)] + "\n")
	}
	runWith := func(workers int) []*Result {
		var out []*Result
		if _, err := Run(context.Background(), rw, Read(strings.NewReader(b.String())), Options{Workers: workers}, func(r *Result) error {
			r.Elapsed = 0
			out = append(out, r)
			return nil
		}); err != nil {
			t.Fatal(err)
		}
		return out
	}
	one, eight := runWith(1), runWith(8)
	if len(one) != 60 || len(eight) != 60 {
		t.Fatalf("%d and %d results, want 60", len(one), len(eight))
	}
	for i := range one {
		if one[i].Line != i+1 || !sameResult(one[i], eight[i]) {
			t.Fatalf("result %d: %+v with 1 worker, %+v with 8", i, one[i], eight[i])
		}
	}
}

func sameResult(a, b *Result) bool {
	return a.Entry == b.Entry && a.ExactCount == b.ExactCount && a.Rescued == b.Rescued && a.FinalCount == b.FinalCount &&
		slices.Equal(a.Changes, b.Changes) && slices.Equal(a.HardUnmet, b.HardUnmet) && a.Note == b.Note && a.NothingToSearch == b.NothingToSearch
}

// A line with nothing to search for is not searched: it is counted in
// NothingToSearch alone, out of All and of every rate, and each report
// shows the count. What the searched lines find on shop.jsonl is worked
// out by hand in rewrite/bleveengine's TestRescueOnTheIndex: "rain
// jacket" finds 3 as typed, "85 lens" nothing, focal length being hard;
// "1/0 rain jacket" is searched for the rain jackets. The summary is the
// same for 1 worker and for 4.
func TestRunNothingToSearch(t *testing.T) {
	rw := shop(t)
	const log = `rain jacket
!!!
{"query": "nice", "count": 7}
{"query": "85 lens", "count": 2}
1/0
{"query": "1/0 rain jacket", "count": 3}
{"query": "the", "count": 4, "category": "apparel"}
`
	run := func(workers int) (*Summary, []*Result, string) {
		var got []*Result
		var rows bytes.Buffer
		c := NewCSV(&rows)
		sum, err := Run(context.Background(), rw, Read(strings.NewReader(log)), Options{Workers: workers}, func(r *Result) error {
			got = append(got, r)
			return c.Write(r)
		})
		if err != nil {
			t.Fatal(err)
		}
		if err := c.Flush(); err != nil {
			t.Fatal(err)
		}
		return sum, got, rows.String()
	}
	sum, got, rows := run(1)
	r := sum.Report()
	checkTallies(t, []tallyCase{
		{"all", r.All, Tally{3, 6}, "rain jacket (1), 85 lens (2) and 1/0 rain jacket (3) are searched"},
		{"nothing to search", r.NothingToSearch, Tally{4, 13}, "!!! (1), nice (7), 1/0 (1) and the (4): punctuation, filler, a badly formed part, filler"},
		{"zero before", r.ZeroBefore, Tally{1, 2}, "85 lens alone; the lines not searched are no zero-result queries"},
		{"zero after", r.ZeroAfter, Tally{1, 2}, "85 lens: focal length is hard"},
	})
	// 2 of the 6 searches made find nothing, as typed and after: 1/3.
	if r.RateBefore.Searches != 2.0/6 || r.RateAfter.Queries != 1.0/3 {
		t.Errorf("rates %+v %+v, want shares of the searched lines only", r.RateBefore, r.RateAfter)
	}
	if len(r.Alerts) != 1 || r.Alerts[0].Query != "85 lens" {
		t.Errorf("alerts %+v: want 85 lens alone", r.Alerts)
	}
	wantWhy := []string{"", "no word or number to search for", `only filler words ("nice"), nothing to search for`, "",
		"1/0 divides by zero", "", `only filler words ("the"), nothing to search for`}
	if len(got) != len(wantWhy) {
		t.Fatalf("%d results, want %d", len(got), len(wantWhy))
	}
	for i, res := range got {
		if res.NothingToSearch != wantWhy[i] || res.NothingToSearch != "" && (res.ExactCount != 0 || res.FinalCount != 0) {
			t.Errorf("line %d %q: nothing to search %q, counts %d/%d; want %q", res.Line, res.Query, res.NothingToSearch, res.ExactCount, res.FinalCount, wantWhy[i])
		}
	}
	if got[5].FinalCount != 3 {
		t.Errorf("1/0 rain jacket: final count %d, want the 3 rain jackets", got[5].FinalCount)
	}
	recs, err := csv.NewReader(strings.NewReader(rows)).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	if want := []string{"2", "!!!", "1", "", "", "", "", "", ""}; len(recs) != 8 || !slices.Equal(recs[2][:9], want) || recs[2][10] != "no word or number to search for" || recs[1][10] != "" {
		t.Errorf("csv rows %q: want !!! with blank counts and its reason last", recs)
	}
	var text, page bytes.Buffer
	if err := WriteText(&text, r); err != nil {
		t.Fatal(err)
	}
	if want := "3 queries, 6 searches (4 queries, 13 searches with nothing to search for, not searched)\n"; !strings.HasPrefix(text.String(), want) {
		t.Errorf("text report begins %q, want %q", strings.SplitN(text.String(), "\n", 2)[0], want)
	}
	if err := WriteHTML(&page, "replay", r); err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(page.String(), "4 queries, 13 searches with nothing to search for, not searched") {
		t.Error("the page does not count the lines with nothing to search for")
	}
	if b, err := json.Marshal(r); err != nil || !strings.Contains(string(b), `"nothing_to_search":{"queries":4,"searches":13}`) {
		t.Errorf("JSON report %s, %v: want nothing_to_search", b, err)
	}
	sum4, got4, rows4 := run(4)
	r4 := sum4.Report()
	if r4.All != r.All || r4.NothingToSearch != r.NothingToSearch || r4.ZeroBefore != r.ZeroBefore || r4.ZeroAfter != r.ZeroAfter || r4.RateBefore != r.RateBefore {
		t.Errorf("4 workers: %+v, want as with 1: %+v", r4, r)
	}
	for i := range got {
		if !sameResult(got[i], got4[i]) {
			t.Errorf("result %d: %+v with 1 worker, %+v with 4", i, got[i], got4[i])
		}
	}
	recs4, err := csv.NewReader(strings.NewReader(rows4)).ReadAll()
	if err != nil || len(recs4) != len(recs) {
		t.Fatalf("csv with 4 workers: %d rows, %v; want %d", len(recs4), err, len(recs))
	}
	for i := range recs {
		recs[i][9], recs4[i][9] = "", "" // the time taken
		if !slices.Equal(recs[i], recs4[i]) {
			t.Errorf("csv row %d: %q with 4 workers, %q with 1", i, recs4[i], recs[i])
		}
	}
}

func TestReadErrors(t *testing.T) {
	for _, tc := range []struct {
		name, line, field, msg string
	}{
		{"not JSON", `{"query": "x"`, "", "not a JSON object"},
		{"query of the wrong type", `{"query": 5}`, "query", "want a string"},
		{"count of the wrong type", `{"query": "x", "count": "many"}`, "count", "whole number"},
		{"no query", `{"count": 3}`, "query", "missing"},
		{"empty query", `{"query": "  "}`, "query", "empty"},
		{"count below one", `{"query": "x", "count": 0}`, "count", "at least once"},
		{"unknown field", `{"query": "x", "shopper": "a"}`, "", "unknown field"},
		{"two values", `{"query": "x"} {"query": "y"}`, "", "more than one"},
		{"unknown category", `{"query": "x", "category": "aparel"}`, "category", `unknown category "aparel"; did you mean "apparel"?`},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var errs []error
			for _, err := range Read(strings.NewReader("ok query\n" + tc.line + "\n")) {
				if err != nil {
					errs = append(errs, err)
				}
			}
			var le *catalog.LineError
			if len(errs) != 1 || !errors.As(errs[0], &le) || le.Line != 2 || le.Field != tc.field || !strings.Contains(le.Msg, tc.msg) {
				t.Fatalf("errors %v, want one on line 2, field %q, saying %q", errs, tc.field, tc.msg)
			}
		})
	}
	// A line too long is an error of its own line, and reading goes on,
	// so that --skip-bad skips it; a byte order mark before the first
	// line (U+FEFF, as some spreadsheets write it) is no part of it.
	long := strings.Repeat("x", MaxLine+1)
	var queries []string
	var errs []error
	for e, err := range Read(strings.NewReader("\ufeffa\n" + long + "\n{\"query\": \"b\"}\n")) {
		if err != nil {
			errs = append(errs, err)
			continue
		}
		queries = append(queries, e.Query)
	}
	var le *catalog.LineError
	if len(errs) != 1 || !errors.As(errs[0], &le) || le.Line != 2 || !strings.Contains(le.Msg, "longer than") {
		t.Errorf("a long line gave %v", errs)
	}
	if !slices.Equal(queries, []string{"a", "b"}) {
		t.Errorf("queries around the long line = %q, want a and b", queries)
	}
}

func TestRunBadLines(t *testing.T) {
	rw := shop(t)
	text := "rain jacket\n{\"query\": 5}\nrug\n"
	_, err := Run(context.Background(), rw, Read(strings.NewReader(text)), Options{}, func(*Result) error { return nil })
	var le *catalog.LineError
	if !errors.As(err, &le) || le.Line != 2 {
		t.Fatalf("a bad line gave %v, want a line 2 error", err)
	}
	n := 0
	sum, err := Run(context.Background(), rw, Read(strings.NewReader(text)), Options{SkipBad: true}, func(*Result) error { n++; return nil })
	if err != nil {
		t.Fatal(err)
	}
	if r := sum.Report(); n != 2 || r.SkippedLines != 1 || r.Skipped[0].Line != 2 || r.All.Queries != 2 {
		t.Errorf("skipping: %d results, report %+v", n, r)
	}
	// An error from the caller stops the run and comes back.
	stop := errors.New("disk full")
	if _, err := Run(context.Background(), rw, Read(strings.NewReader(strings.Repeat("rug\n", 50))), Options{Workers: 4}, func(*Result) error { return stop }); !errors.Is(err, stop) {
		t.Errorf("emit's error gave %v", err)
	}
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	if _, err := Run(ctx, rw, Read(strings.NewReader(strings.Repeat("rug\n", 50))), Options{}, func(*Result) error { return nil }); !errors.Is(err, context.Canceled) {
		t.Errorf("a cancelled run gave %v", err)
	}
}

// The Space-Saving guarantees (Metwally, Agrawal and El Abbadi, 2005,
// Lemmas 3.3 and 3.4), checked against exact counts on a skewed stream:
// every count is at least the truth and at most the truth plus its
// error, and any item more frequent than total/slots is kept.
func TestSpaceSavingBounds(t *testing.T) {
	const slots = 8
	s := newSpaceSaving(slots)
	truth := map[string]int{}
	total := 0
	for i := range 2000 {
		// item k comes about 1/k as often as item 1 (a Zipf-like mix).
		k := 1
		for k < 40 && (i*7919)%(k*k+1) != 0 {
			k++
		}
		item := string(rune('a' + k%26))
		if k >= 26 {
			item += "z"
		}
		w := 1 + i%3
		s.add(item, w)
		truth[item] += w
		total += w
	}
	if len(truth) <= slots {
		t.Fatalf("%d distinct items: the stream must overflow the %d slots", len(truth), slots)
	}
	kept := map[string]bool{}
	for _, a := range s.top(slots) {
		kept[a.Query] = true
		if a.Searches < truth[a.Query] || a.Searches-a.Error > truth[a.Query] {
			t.Errorf("%s: count %d, error %d, truth %d", a.Query, a.Searches, a.Error, truth[a.Query])
		}
	}
	for item, n := range truth {
		if n > total/slots && !kept[item] {
			t.Errorf("%s was searched %d of %d times but is not kept", item, n, total)
		}
	}
	if len(s.h.c) > slots {
		t.Errorf("%d counters, want at most %d", len(s.h.c), slots)
	}
}

// However many distinct queries find nothing, the summary keeps at most
// AlertSlots counters and MaxDistinct unmet constraints.
func TestSummaryBounded(t *testing.T) {
	s := NewSummary()
	for i := range 3 * MaxDistinct {
		q := "query " + strings.Repeat("x", i%7) + string(rune(i))
		s.Add(&Result{Entry: Entry{Query: q, Count: 1}, HardUnmet: []string{q}})
	}
	r := s.Report()
	if len(s.alerts.h.c) > AlertSlots || len(s.unmet) > MaxDistinct || len(r.Alerts) > AlertsShown {
		t.Errorf("kept %d counters, %d unmet, %d alerts", len(s.alerts.h.c), len(s.unmet), len(r.Alerts))
	}
	if r.ZeroAfter.Queries != 3*MaxDistinct || r.UnmetOther.Queries != 2*MaxDistinct {
		t.Errorf("zero after %d, other %d", r.ZeroAfter.Queries, r.UnmetOther.Queries)
	}
}

func TestWriters(t *testing.T) {
	rw := shop(t)
	var rows bytes.Buffer
	c := NewCSV(&rows)
	sum, err := Run(context.Background(), rw, Read(strings.NewReader(log)), Options{}, c.Write)
	if err != nil {
		t.Fatal(err)
	}
	if err := c.Flush(); err != nil {
		t.Fatal(err)
	}
	recs, err := csv.NewReader(&rows).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	if len(recs) != 7 || !slices.Equal(recs[0], csvHeader) || recs[2][1] != "mustard rain jacket" || recs[2][5] != "true" || !strings.HasPrefix(recs[2][7], "widen colour mustard") {
		t.Errorf("csv rows %q", recs)
	}
	var text bytes.Buffer
	if err := WriteText(&text, sum.Report()); err != nil {
		t.Fatal(err)
	}
	for _, want := range []string{"6 queries, 50 searches", "after rescue", "widen", "trail running shoes size 13"} {
		if !strings.Contains(text.String(), want) {
			t.Errorf("text report lacks %q:\n%s", want, text.String())
		}
	}
	var page bytes.Buffer
	if err := WriteHTML(&page, "Replay of <shop> log", sum.Report()); err != nil {
		t.Fatal(err)
	}
	checkPage(t, page.String())
}

// checkPage: the page escapes what it shows, fetches nothing, and each
// chart is well-formed SVG.
func checkPage(t *testing.T, p string) {
	t.Helper()
	if !strings.Contains(p, "Replay of &lt;shop&gt; log") {
		t.Error("the title is not escaped")
	}
	for _, bad := range []string{"src=", "href=", "@import", "url("} {
		if strings.Contains(p, bad) {
			t.Errorf("the page holds %q: it must fetch nothing", bad)
		}
	}
	n := 0
	for rest := p; ; n++ {
		i := strings.Index(rest, "<svg")
		if i < 0 {
			break
		}
		j := strings.Index(rest[i:], "</svg>")
		if j < 0 {
			t.Fatal("an svg is not closed")
		}
		d := xml.NewDecoder(strings.NewReader(rest[i : i+j+len("</svg>")]))
		for {
			if _, err := d.Token(); err == io.EOF {
				break
			} else if err != nil {
				t.Fatalf("chart %d is not well-formed: %v", n+1, err)
			}
		}
		rest = rest[i+j:]
	}
	if n != 3 {
		t.Errorf("%d charts, want 3 (zero rates, relaxations, time)", n)
	}
}

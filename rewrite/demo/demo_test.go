package demo

import (
	"bytes"
	"context"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
	"time"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/catalog"
	"github.com/whittle-search/whittle/rewrite/signals"
)

func TestTourHasEveryStop(t *testing.T) {
	stops := Tour(catalog.Demo(3000, 1), lexicon.Default())
	if len(stops) < 9 {
		t.Fatalf("the tour has %d stops, want 9: %+v", len(stops), stops)
	}
	for _, s := range stops {
		if s.Query == "" || s.Shows == "" {
			t.Errorf("empty stop %+v", s)
		}
	}
}

// The whole demo, on a smaller catalog in a temporary directory: every
// stop shows what it says it shows.
func TestRun(t *testing.T) {
	var out bytes.Buffer
	log := filepath.Join(t.TempDir(), "signals.jsonl")
	if err := Run(context.Background(), &out, Options{Dir: t.TempDir(), Products: 3000, Events: 100000, Signals: log}); err != nil {
		t.Fatal(err)
	}
	text := out.String()
	// The log the last stop learned from is written, and reads back.
	f, err := os.Open(log)
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	n := 0
	for _, err := range signals.Read(f, log) {
		if err != nil {
			t.Fatalf("the written log: %v", err)
		}
		n++
	}
	if n < 100000 || !strings.Contains(text, "whittle tune --signals "+log) {
		t.Errorf("%d events in the written log, want 100,000 or a few more; the output names it: %v", n, strings.Contains(text, log))
	}
	for _, want := range []string{
		"exact matches",                     // the exact hit
		"· or colour",                       // colours offered as alternatives
		"in colours close to",               // the colour widened
		"in any pattern",                    // the pattern dropped
		"(inferred)",                        // the unit inferred
		"is not carried",                    // the hard size kept
		"in any colour",                     // the compatibility kept, colour dropped
		", reading “",                       // the typo replaced, the query read again
		"is unavailable. Showing available", // alternatives
		"blind partial match",
		"learning strictness from shoppers", // whittle tune
		"category.apparel.strictness.size: soft → hard", // what the invented shoppers show
	} {
		if !strings.Contains(text, want) {
			t.Errorf("the demo output lacks %q:\n%s", want, text)
		}
	}
}

// SignalsMinProducts is where the demo catalog first has a product type
// with ten products in a colour (Demo(m) is the first m of Demo(n)).
func TestSignalsMinProducts(t *testing.T) {
	for _, tc := range []struct {
		n    int
		want bool
	}{{SignalsMinProducts - 1, false}, {SignalsMinProducts, true}} {
		if got := newSignalGen(catalog.Demo(tc.n, 1), 1).searchable(); got != tc.want {
			t.Errorf("%d products: a signals log can be made: %v, want %v", tc.n, got, tc.want)
		}
	}
}

// The smallest demo catalog is too small for the signals log (no type
// has ten products in a colour below SignalsMinProducts): the tour still runs,
// and its last stop says it is skipped and why, instead of failing the
// demo after every other stop was shown.
func TestRunSmallestCatalog(t *testing.T) {
	var out bytes.Buffer
	if err := Run(context.Background(), &out, Options{Dir: t.TempDir(), Products: MinProducts, Events: 1000}); err != nil {
		t.Fatal(err)
	}
	text := out.String()
	for _, want := range []string{"blind partial match", "(whittle tune): skipped", "100 products are too few", "The tour took"} {
		if !strings.Contains(text, want) {
			t.Errorf("the demo output lacks %q:\n%s", want, text)
		}
	}
}

// The demo's own index, left by a whittle that laid its fields out
// otherwise, is built again rather than refused.
func TestRunRebuildsAnOlderIndex(t *testing.T) {
	dir := t.TempDir()
	opts := Options{Dir: dir, Products: MinProducts, Events: 1000}
	if err := Run(context.Background(), io.Discard, opts); err != nil {
		t.Fatal(err)
	}
	vocab := filepath.Join(dir, fmt.Sprintf("index-%s-%d", generation, MinProducts), "whittle-vocabulary.json")
	b, err := os.ReadFile(vocab)
	if err != nil {
		t.Fatal(err)
	}
	old := regexp.MustCompile(`,"layout":\d+`).ReplaceAllString(string(b), ``)
	if old == string(b) {
		t.Fatalf("the vocabulary names no layout: %s", b)
	}
	if err := os.WriteFile(vocab, []byte(old), 0o644); err != nil {
		t.Fatal(err)
	}
	var out bytes.Buffer
	if err := Run(context.Background(), &out, opts); err != nil {
		t.Fatalf("the demo refused its older index: %v", err)
	}
	if !strings.Contains(out.String(), "Indexing the demo catalog") {
		t.Errorf("the older index was not rebuilt:\n%s", out.String())
	}
}

func TestBench(t *testing.T) {
	var log bytes.Buffer
	r, err := Bench(context.Background(), &log, BenchOptions{Dir: t.TempDir(), Products: 1000, Replay: 400, Signals: 5000})
	if err != nil {
		t.Fatal(err)
	}
	if r.Products != 1000 || r.Queries == 0 || r.RescueP50 <= 0 || r.RescueP99 < r.RescueP50 || r.BaselineP50 <= 0 {
		t.Errorf("result %+v", r)
	}
	// Two replays: 400/10 lines, then 400.
	if len(r.Replays) != 2 || r.Replays[0].Queries != 40 || r.Replays[1].Queries != 400 || r.Replays[1].PerSecond <= 0 {
		t.Errorf("replays %+v", r.Replays)
	}
	// Two tunes: a tenth of 5,000 events, then 5,000; a log is written a
	// session at a time, so it may run a session over.
	if len(r.Tunes) != 2 || r.Tunes[0].Events < 500 || r.Tunes[0].Events > 520 || r.Tunes[1].Events < 5000 || r.Tunes[1].PerSecond <= 0 {
		t.Errorf("tunes %+v", r.Tunes)
	}
	// Every benchmark query finds nothing as typed; most are rescued.
	if r.RescuedShare < 0.5 {
		t.Errorf("only %.0f%% rescued", r.RescuedShare*100)
	}
}

func TestPercentile(t *testing.T) {
	ds := []time.Duration{5, 1, 4, 2, 3}
	if p := percentile(ds, 50); p != 3 {
		t.Errorf("p50 = %v, want 3 (the middle of 1..5)", p)
	}
	if p := percentile(ds, 99); p != 5 {
		t.Errorf("p99 = %v, want 5", p)
	}
}

// A hit without a colour (a skillet) or a price prints neither, rather
// than an empty field between commas.
func TestPrintHit(t *testing.T) {
	for _, tc := range []struct {
		hit  bleveengine.Shown
		want string
	}{
		{bleveengine.Shown{ID: "A", Title: "Lamp", Colour: "ivory", Price: "9.00 USD"}, "A  Lamp, ivory, 9.00 USD"},
		{bleveengine.Shown{ID: "B", Title: "Skillet", Price: "45.00 USD"}, "B  Skillet, 45.00 USD"},
		{bleveengine.Shown{ID: "C", Title: "Rope"}, "C  Rope"},
	} {
		var b bytes.Buffer
		printHit(&b, tc.hit)
		if got := strings.TrimSpace(b.String()); got != tc.want {
			t.Errorf("printHit = %q, want %q", got, tc.want)
		}
	}
}

package demo

import (
	"bytes"
	"context"
	"math"
	"path/filepath"
	"testing"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/catalog"
	"github.com/whittle-search/whittle/rewrite/signals"
	"github.com/whittle-search/whittle/rewrite/tune"
)

// The demo's signals log goes through the whole of whittle tune (the
// JSON Lines, the join, the index's facts) and its invented shoppers'
// habits, set by the generator, come back out: in apparel they never
// take another size and accept colours up to ΔE00 6 (within 2), and
// they look at rank r with chance (1/r)^0.8 (within 0.1).
func TestSignalsRecovered(t *testing.T) {
	ps := catalog.Demo(2000, 1)
	dir := filepath.Join(t.TempDir(), "idx")
	if _, err := bleveengine.BuildProducts(context.Background(), ps, dir, bleveengine.BuildOptions{}); err != nil {
		t.Fatal(err)
	}
	eng, err := bleveengine.Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	defer eng.Close()
	var log bytes.Buffer
	w := signals.NewWriter(&log)
	n, err := Signals(w.Write, ps, 300000, 1)
	if err != nil || n < 300000 {
		t.Fatalf("wrote %d events: %v", n, err)
	}
	// The same seed writes the same log.
	var again bytes.Buffer
	w2 := signals.NewWriter(&again)
	if _, err := Signals(w2.Write, ps, 20000, 1); err != nil || !bytes.HasPrefix(log.Bytes(), again.Bytes()) {
		t.Fatal("the same seed wrote another log")
	}
	lex := lexicon.Default()
	user, err := rewrite.ParsePolicy("loose.toml", loosePolicy, lex)
	if err != nil {
		t.Fatal(err)
	}
	tu := tune.New(tune.Options{Policy: rewrite.DefaultPolicy().Overlay(user), Lexicon: lex, Products: eng})
	if err := tu.Read(context.Background(), signals.Read(&log, "demo.jsonl"), signals.JoinOptions{}); err != nil {
		t.Fatal(err)
	}
	r := tu.Report()
	if r.Join.Events != n || r.Join.Late != 0 {
		t.Errorf("join %+v", r.Join)
	}
	if !r.Bias.Estimated || math.Abs(r.Bias.Eta-demoBias) > 0.1 {
		t.Errorf("η %+v, want %g ± 0.1", r.Bias, demoBias)
	}
	var apparel *tune.Category
	for i := range r.Categories {
		if r.Categories[i].Name == "apparel" {
			apparel = &r.Categories[i]
		}
	}
	if apparel == nil {
		t.Fatal("no apparel figures")
	}
	for _, k := range apparel.Kinds {
		if k.Kind == parser.KindSize && k.Recommended != parser.Hard {
			t.Errorf("apparel size: %s (%s), want hard", k.Recommended, k.Reason)
		}
	}
	if apparel.Colour == nil || math.Abs(apparel.Colour.Recommended-demoColourLimit) > 2 {
		t.Errorf("apparel colour tolerance %+v, want %g ± 2", apparel.Colour, demoColourLimit)
	}
}

// A catalog too small to show ten products of a type gets an error, not
// an endless search for a session to write.
func TestSignalsTooSmall(t *testing.T) {
	if _, err := Signals(func(signals.Event) error { return nil }, catalog.Demo(5, 1), 100, 1); err == nil {
		t.Error("five products made a log")
	}
}

package tune

import (
	"context"
	"encoding/json"
	"math"
	"strings"
	"testing"
	"time"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/signals"
)

// handPolicy fixes η at 1 and counts only clicks, so that the figures
// below can be worked out by hand.
const handPolicy = `
[signals]
position_bias = 1.0
estimate_position_bias = false
min_searches = 1

[signals.weights]
impression = 0.0
click = 1.0
add_to_cart = 1.0
purchase = 1.0
`

func handTuner(t *testing.T, extra string, products rewrite.Describer) *Tuner {
	t.Helper()
	lex := lexicon.Default()
	user, err := rewrite.ParsePolicy("hand.toml", handPolicy+extra, lex)
	if err != nil {
		t.Fatal(err)
	}
	return New(Options{Policy: rewrite.DefaultPolicy().Overlay(user), Lexicon: lex, Products: products})
}

var t0 = time.Date(2026, 11, 2, 9, 0, 0, 0, time.UTC)

// session makes a one-search session: n products shown, clicks at the
// given ranks.
func session(id, category string, n int, relax []signals.Relaxed, clicks ...int) *signals.Session {
	ev := signals.Event{Type: signals.Search, Session: id, Time: t0, Query: "rain jacket", Category: category, Relaxations: relax}
	for i := range n {
		ev.Shown = append(ev.Shown, id+"-"+string(rune('a'+i)))
	}
	j := signals.Joined{Search: ev}
	for _, r := range clicks {
		j.Engagements = append(j.Engagements, signals.Engagement{Type: signals.Click, Time: t0, Rank: r})
	}
	return &signals.Session{ID: id, Searches: []signals.Joined{j}}
}

func add(t *testing.T, tu *Tuner, ss ...*signals.Session) *Report {
	t.Helper()
	for _, s := range ss {
		if err := tu.Add(context.Background(), s); err != nil {
			t.Fatal(err)
		}
	}
	return tu.Report()
}

// Worked by hand with η = 1, so a click at rank r is worth r: exact
// search A shows 4 with a click at rank 2 (worth 2), B shows 2 with a
// click at rank 1 (worth 1): 3 over 6 products, 0.5 a product. The
// relaxed search C shows 3 with a click at rank 3: 3 over 3, 1.0 a
// product, twice the exact matches'. A click at rank 20 is clipped to
// rank 16's weight: 16 over 20 products, 0.8, 1.6 times exact.
func TestFiguresByHand(t *testing.T) {
	drop := []signals.Relaxed{{Op: "drop", Kind: parser.KindPattern, Text: "striped"}}
	widen := []signals.Relaxed{{Op: "widen", Kind: parser.KindMeasure, Text: "74 cm"}}
	rep := add(t, handTuner(t, "", nil),
		session("A", "apparel", 4, nil, 2), session("B", "apparel", 2, nil, 1),
		session("C", "apparel", 3, drop, 3), session("D", "apparel", 20, widen, 20))
	c := findCategory(rep, "apparel")
	if c == nil {
		t.Fatal("no apparel figures")
	}
	if c.Exact.Searches != 2 || c.Exact.Shown != 6 || math.Abs(c.Exact.Engagement-0.5) > 1e-12 {
		t.Errorf("exact = %+v, want 2 searches, 6 shown, 0.5", c.Exact)
	}
	if k := findKind(rep, "apparel", parser.KindPattern); k == nil || len(k.Ops) != 1 || math.Abs(k.Ops[0].Ratio-2) > 1e-12 || k.Ops[0].Op != "drop" {
		t.Errorf("pattern = %+v, want a drop at ratio 2", k)
	}
	if k := findKind(rep, "apparel", parser.KindMeasure); k == nil || math.Abs(k.Ops[0].Ratio-1.6) > 1e-12 {
		t.Errorf("measure = %+v, want a widen at ratio 1.6", k)
	}
	if rep.Stats.Exact != 2 || rep.Stats.Relaxed != 2 || rep.Bias.Estimated || rep.Bias.Eta != 1 {
		t.Errorf("stats %+v, bias %+v", rep.Stats, rep.Bias)
	}
}

// The same log read in any order gives the same report, intervals and
// all: each search's bootstrap weights come from the search itself.
func TestOrderDoesNotMatter(t *testing.T) {
	drop := []signals.Relaxed{{Op: "drop", Kind: parser.KindPattern}}
	var ss []*signals.Session
	for i := range 40 {
		var relax []signals.Relaxed
		if i%3 == 0 {
			relax = drop
		}
		ss = append(ss, session(string(rune('A'+i%26))+string(rune('a'+i/26)), "apparel", 5, relax, 1+i%5))
	}
	a := add(t, handTuner(t, "", nil), ss...)
	rev := make([]*signals.Session, len(ss))
	for i, s := range ss {
		rev[len(ss)-1-i] = s
	}
	b := add(t, handTuner(t, "", nil), rev...)
	ja, _ := json.Marshal(a)
	jb, _ := json.Marshal(b)
	if string(ja) != string(jb) {
		t.Errorf("reports differ by order:\n%s\n%s", ja, jb)
	}
}

func TestEdgeCases(t *testing.T) {
	drop := []signals.Relaxed{{Op: "drop", Kind: parser.KindSize, Text: "size m"}}
	for _, tc := range []struct {
		name, reason string
		extra        string // replaces the min_searches line
		sessions     []*signals.Session
		check        func(t *testing.T, r *Report)
	}{
		{"empty log", "nothing read: no figures, no changes, and the writers still work", "", nil, func(t *testing.T, r *Report) {
			if len(r.Categories) != 0 || len(r.Changes) != 0 || len(r.Aliases) != 0 {
				t.Errorf("report = %+v", r)
			}
		}},
		{"only exact matches", "no relaxation was ever made, so there is nothing to recommend", "",
			[]*signals.Session{session("A", "apparel", 3, nil, 1), session("B", "apparel", 3, nil)}, func(t *testing.T, r *Report) {
				if c := findCategory(r, "apparel"); c == nil || len(c.Kinds) != 0 || len(r.Changes) != 0 {
					t.Errorf("report = %+v", r)
				}
			}},
		{"too few searches", "below min_searches the current setting stays, and the reason says so", "min_searches = 50\n",
			[]*signals.Session{session("A", "apparel", 3, nil, 1), session("B", "apparel", 3, drop)}, func(t *testing.T, r *Report) {
				k := findKind(r, "apparel", parser.KindSize)
				if k == nil || k.Recommended != k.Current || !strings.Contains(k.Reason, "too few searches") || len(r.Changes) != 0 {
					t.Errorf("size = %+v, changes %+v", k, r.Changes)
				}
			}},
		{"found nothing", "a search that showed nothing counts, but adds no figure", "",
			[]*signals.Session{session("A", "apparel", 0, nil)}, func(t *testing.T, r *Report) {
				if r.Stats.FoundNothing != 1 || len(r.Categories) != 0 {
					t.Errorf("report = %+v", r)
				}
			}},
		{"two kinds relaxed", "a search that relaxed two kinds says nothing about either alone", "",
			[]*signals.Session{session("A", "apparel", 3, nil, 1), session("B", "apparel", 3, append(drop, signals.Relaxed{Op: "widen", Kind: parser.KindColour}), 1)},
			func(t *testing.T, r *Report) {
				if r.Stats.SetAside != 1 || findKind(r, "apparel", parser.KindSize) != nil {
					t.Errorf("report = %+v", r)
				}
			}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			text := handPolicy
			if tc.extra != "" {
				text = strings.Replace(handPolicy, "min_searches = 1\n", tc.extra, 1)
			}
			lex := lexicon.Default()
			user, err := rewrite.ParsePolicy("hand.toml", text, lex)
			if err != nil {
				t.Fatal(err)
			}
			tu := New(Options{Policy: rewrite.DefaultPolicy().Overlay(user), Lexicon: lex})
			r := add(t, tu, tc.sessions...)
			tc.check(t, r)
			var b strings.Builder
			if err := WriteText(&b, r); err != nil || !strings.Contains(b.String(), Caveat) {
				t.Errorf("text report: %v\n%s", err, b.String())
			}
			if _, err := json.Marshal(r); err != nil {
				t.Errorf("JSON: %v", err)
			}
			b.Reset()
			if err := WriteHTML(&b, "tune", r); err != nil {
				t.Errorf("HTML: %v", err)
			}
		})
	}
}

// A standard designation is never loosened, whatever shoppers do: wire
// gauges, tyre sizes and threads stay as the policy has them.
func TestNeverLoosensASpec(t *testing.T) {
	drop := []signals.Relaxed{{Op: "drop", Kind: parser.KindSpec, Text: "14 awg"}}
	tu := handTuner(t, "\n[category.electrical.strictness]\nspec = \"firm\"\n", nil)
	var ss []*signals.Session
	for i := range 20 {
		id := string(rune('A' + i))
		ss = append(ss, session(id+"x", "electrical", 4, nil, 1), session(id+"y", "electrical", 4, drop, 1))
	}
	r := add(t, tu, ss...)
	k := findKind(r, "electrical", parser.KindSpec)
	if k == nil || k.Recommended != parser.Firm || !strings.Contains(k.Reason, "never loosens a standard designation") {
		t.Errorf("spec = %+v, want firm kept", k)
	}
	for _, c := range r.Changes {
		if strings.Contains(c.Key, "spec") {
			t.Errorf("change %+v loosens a spec", c)
		}
	}
}

// A colour's band is its ΔE00 from the colour asked, by the pairs of
// Sharma, Wu and Dalal (2005), table 1: pair 1, (50, 2.6772, -79.7751)
// against (50, 0, -82.7485), is ΔE00 2.0425, band 2 to 3; pair 7,
// (50, 0, 0) against (50, -1, 2), is 2.3669, band 2 to 3 as well; and a
// measure of 80 cm asked as 74 cm is 8.1% off, band 8% to 10%.
func TestBands(t *testing.T) {
	for _, tc := range []struct {
		name string
		kind parser.Kind
		r    reading
		f    rewrite.Facts
		want int
	}{
		{"Sharma pair 1", parser.KindColour, reading{lab: &colour.Lab{L: 50, A: 2.6772, B: -79.7751}}, rewrite.Facts{Lab: &[3]float64{50, 0, -82.7485}}, 2},
		{"Sharma pair 7", parser.KindColour, reading{lab: &colour.Lab{L: 50, A: 0, B: 0}}, rewrite.Facts{Lab: &[3]float64{50, -1, 2}}, 2},
		{"measure 8.1% off", parser.KindMeasure, reading{dimension: "length", amount: 740}, rewrite.Facts{Measures: map[string]float64{"length": 800}}, 4},
		{"far colour", parser.KindColour, reading{lab: &colour.Lab{L: 90, A: 0, B: 0}}, rewrite.Facts{Lab: &[3]float64{10, 0, 0}}, colourBins - 1},
	} {
		t.Run(tc.name, func(t *testing.T) {
			got, ok := binOf(tc.kind, &tc.r, &tc.f)
			if !ok || got != tc.want {
				t.Errorf("band %d (%v), want %d", got, ok, tc.want)
			}
		})
	}
}

func TestSingle(t *testing.T) {
	for _, tc := range []struct {
		name   string
		rs     []signals.Relaxed
		kind   parser.Kind
		op     string
		n      int
		reason string
	}{
		{"none", nil, "", "", 0, "an exact match"},
		{"filler only", []signals.Relaxed{{Op: "drop", Kind: parser.KindFiller}}, "", "", 0, "dropping filler is no relaxation"},
		{"widen then drop", []signals.Relaxed{{Op: "widen", Kind: parser.KindColour}, {Op: "drop", Kind: parser.KindColour}}, parser.KindColour, "drop", 1, "the strongest operator counts"},
		{"two kinds", []signals.Relaxed{{Op: "widen", Kind: parser.KindColour}, {Op: "drop", Kind: parser.KindSize}}, "", "", 2, "two kinds are set aside"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			k, op, n := single(tc.rs)
			if k != tc.kind || op != tc.op || n != tc.n {
				t.Errorf("got %q %q %d, want %q %q %d (%s)", k, op, n, tc.kind, tc.op, tc.n, tc.reason)
			}
		})
	}
}

func TestDiff(t *testing.T) {
	got := Diff([]Change{
		{Key: "category.apparel.colour_tolerance", From: "14", To: "8"},
		{Key: "category.apparel.strictness.size", From: "soft", To: "hard"},
		{Key: "category.apparel.strictness.colour", From: "soft", To: "firm"},
	})
	want := "[category.apparel]\n- colour_tolerance = 14.0\n+ colour_tolerance = 8.0\n\n[category.apparel.strictness]\n- size = \"soft\"\n+ size = \"hard\"\n- colour = \"soft\"\n+ colour = \"firm\"\n"
	if got != want {
		t.Errorf("got\n%s\nwant\n%s", got, want)
	}
}

// A figure that cannot be worked out is null in JSON, not an error.
func TestFigureJSON(t *testing.T) {
	b, err := json.Marshal(Figure{Searches: 1, Engagement: math.NaN(), Ratio: math.NaN(), Low: math.NaN(), High: math.Inf(1)})
	if err != nil || string(b) != `{"searches":1,"shown":0,"engagement":null,"ratio":null,"low":null,"high":null}` {
		t.Errorf("got %s, %v", b, err)
	}
}

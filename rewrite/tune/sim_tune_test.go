package tune

import (
	"context"
	"math"
	"testing"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
)

// simPolicy is the policy the simulated shop runs: loose enough that
// its log holds every relaxation tune must judge (size soft in apparel,
// colour widened to ΔE00 14; measure soft in hardware, widened by 30%).
const simPolicy = `
[category.apparel]
colour_tolerance = 14.0

[category.apparel.strictness]
size = "soft"
colour = "firm"

[category.hardware]
colour_tolerance = 10.0
measure_tolerance = 0.30

[category.hardware.strictness]
colour = "firm"
measure = "soft"
`

// TestRecoversSimulatedShoppers checks that tune recovers the settings a
// simulator's shoppers follow (ground truth set by the simulator): in
// apparel they accept colours up to ΔE00 8 but never another size; in
// hardware any colour and a measure within 10%. Clicks follow position
// bias η = 0.7, which tune must fit from the shuffled tenth of the
// searches (the policy's own guess is 1.0). The goals: strictness
// exactly, tolerance within 2 ΔE00, η within 0.1.
func TestRecoversSimulatedShoppers(t *testing.T) {
	lex := lexicon.Default()
	user, err := rewrite.ParsePolicy("sim.toml", simPolicy, lex)
	if err != nil {
		t.Fatal(err)
	}
	pol := rewrite.DefaultPolicy().Overlay(user)
	for _, seed := range []uint64{1, 2, 3} {
		t.Run("seed "+string(rune('0'+seed)), func(t *testing.T) {
			s := newSimulator(seed, 0.7)
			apparel := truth{category: "apparel", query: "mustard rain jacket size m", colourLimit: 8, measureLimit: math.Inf(1)}
			s.run(apparel, []simSearch{
				{nil, 3000, 0},
				{relax("widen", parser.KindColour, "mustard"), 2000, 22},
				{relax("drop", parser.KindColour, "mustard"), 600, 40},
				{relax("drop", parser.KindSize, "size m"), 600, 0},
			})
			hardware := truth{category: "hardware", query: "black hinge 75 mm", colourLimit: math.Inf(1), sizeAccepted: true, measureLimit: 0.10}
			s.run(hardware, []simSearch{
				{nil, 3000, 0},
				{relax("widen", parser.KindColour, "black"), 800, 15},
				{relax("drop", parser.KindColour, "black"), 600, 40},
				{relax("widen", parser.KindMeasure, "75 mm"), 2000, 0.30},
				{relax("drop", parser.KindMeasure, "75 mm"), 600, 1.0},
			})
			tu := New(Options{Policy: pol, Lexicon: lex, Products: s.products})
			for _, sess := range s.sessions {
				if err := tu.Add(context.Background(), sess); err != nil {
					t.Fatal(err)
				}
			}
			rep := tu.Report()
			if !rep.Bias.Estimated || math.Abs(rep.Bias.Eta-0.7) > 0.1 {
				t.Errorf("η = %.3f (estimated %v), want 0.7 ± 0.1: %s", rep.Bias.Eta, rep.Bias.Estimated, rep.Bias.Note)
			}
			want := []struct {
				category string
				kind     parser.Kind
				want     parser.Strictness
			}{
				{"apparel", parser.KindSize, parser.Hard},
				{"apparel", parser.KindColour, parser.Firm},
				{"hardware", parser.KindColour, parser.Soft},
				{"hardware", parser.KindMeasure, parser.Firm},
			}
			for _, w := range want {
				k := findKind(rep, w.category, w.kind)
				if k == nil {
					t.Errorf("%s %s: no figures", w.category, w.kind)
					continue
				}
				if k.Recommended != w.want {
					t.Errorf("%s %s: recommended %s, want %s (%s)", w.category, w.kind, k.Recommended, w.want, k.Reason)
				}
				if got := rep.Proposed.For(w.category, "", lex).Strictness[w.kind]; got != w.want {
					t.Errorf("%s %s: proposed policy has %s, want %s", w.category, w.kind, got, w.want)
				}
			}
			if c := findCategory(rep, "apparel"); c == nil || c.Colour == nil || math.Abs(c.Colour.Recommended-8) > 2 {
				t.Errorf("apparel colour tolerance: %+v, want 8 ± 2", c.Colour)
			}
			if c := findCategory(rep, "hardware"); c == nil || c.Measure == nil || math.Abs(c.Measure.Recommended-0.10) > 0.021 {
				t.Errorf("hardware measure tolerance: %+v, want 0.10 ± 0.02", c.Measure)
			}
		})
	}
}

func findCategory(r *Report, name string) *Category {
	for i := range r.Categories {
		if r.Categories[i].Name == name {
			return &r.Categories[i]
		}
	}
	return nil
}

func findKind(r *Report, cat string, k parser.Kind) *Kind {
	c := findCategory(r, cat)
	if c == nil {
		return nil
	}
	for i := range c.Kinds {
		if c.Kinds[i].Kind == k {
			return &c.Kinds[i]
		}
	}
	return nil
}

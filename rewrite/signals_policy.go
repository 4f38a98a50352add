package rewrite

import (
	"encoding/json"
	"fmt"
	"math"
	"slices"
	"time"
)

// SignalSettings are the policy's [signals] table: how `whittle tune`
// weighs shoppers' signals. A nil pointer means "as the level below"
// (the built-in policy sets every one).
type SignalSettings struct {
	// Weights is what each interaction type is worth; a nil weight is
	// as the level below.
	Weights SignalWeightSettings
	// PositionBias is η in the examination propensity (1/rank)^η.
	PositionBias *float64
	// EstimateBias says to estimate η from searches whose results were
	// shuffled, when the log has enough of them.
	EstimateBias *bool
	// JoinWindow is how long after a search an interaction still counts
	// for it, and how long a session may be idle before it closes.
	JoinWindow *time.Duration
	// MinSearches is the fewest searches behind a figure before tune
	// recommends a change from it.
	MinSearches *int
	// KeepShare is the share of exact-match engagement at which a
	// relaxation counts as accepted by shoppers.
	KeepShare *float64
}

// SignalWeightSettings are the [signals.weights] table: what each
// interaction type of the signals log is worth, nil where the level below
// decides.
type SignalWeightSettings struct {
	Impression, Click, AddToCart, Purchase *float64
}

// SignalWeights are the weights settled, one for each interaction type of
// the signals log, cheapest first.
type SignalWeights struct {
	Impression float64 `json:"impression"`
	Click      float64 `json:"click"`
	AddToCart  float64 `json:"add_to_cart"`
	Purchase   float64 `json:"purchase"`
}

// weightField is one weight of SignalWeightSettings by its name in a
// policy file, which is its interaction type's name in the signals log.
type weightField struct {
	name string
	v    **float64
}

// fields are w's weights, cheapest first.
func (w *SignalWeightSettings) fields() []weightField {
	return []weightField{{"impression", &w.Impression}, {"click", &w.Click}, {"add_to_cart", &w.AddToCart}, {"purchase", &w.Purchase}}
}

// signalWeightNames are the interaction types a weight may be set for,
// cheapest first.
var signalWeightNames = func() []string {
	var names []string
	for _, f := range new(SignalWeightSettings).fields() {
		names = append(names, f.name)
	}
	return names
}()

// settle is w with every unset weight 0.
func (w SignalWeightSettings) settle() SignalWeights {
	v := func(p *float64) float64 {
		if p == nil {
			return 0
		}
		return *p
	}
	return SignalWeights{Impression: v(w.Impression), Click: v(w.Click), AddToCart: v(w.AddToCart), Purchase: v(w.Purchase)}
}

// inOrder returns the weights cheapest first, as signalWeightNames
// names them.
func (w SignalWeights) inOrder() []float64 {
	return []float64{w.Impression, w.Click, w.AddToCart, w.Purchase}
}

// Signals are the [signals] settings settled: every value set.
type Signals struct {
	Weights      SignalWeights `json:"weights"`
	PositionBias float64       `json:"position_bias"`
	EstimateBias bool          `json:"estimate_position_bias"`
	JoinWindow   time.Duration `json:"join_window"`
	MinSearches  int           `json:"min_searches"`
	KeepShare    float64       `json:"keep_share"`
}

// MarshalJSON writes the join window as a duration ("30m0s").
func (s Signals) MarshalJSON() ([]byte, error) {
	type plain Signals
	return json.Marshal(struct {
		plain
		JoinWindow string `json:"join_window"`
	}{plain(s), s.JoinWindow.String()})
}

// Signals returns the [signals] settings in force.
func (p *Policy) Signals() Signals {
	s := p.signals
	out := Signals{Weights: s.Weights.settle()}
	if s.PositionBias != nil {
		out.PositionBias = *s.PositionBias
	}
	if s.EstimateBias != nil {
		out.EstimateBias = *s.EstimateBias
	}
	if s.JoinWindow != nil {
		out.JoinWindow = *s.JoinWindow
	}
	if s.MinSearches != nil {
		out.MinSearches = *s.MinSearches
	}
	if s.KeepShare != nil {
		out.KeepShare = *s.KeepShare
	}
	return out
}

// signalsTOML is the [signals] table as read (policy_read.go), before
// it is checked.
type signalsTOML struct {
	Weights      map[string]float64
	PositionBias *float64
	EstimateBias *bool
	JoinWindow   *string
	MinSearches  *int
	KeepShare    *float64
}

var signalKeys = []string{"weights", "position_bias", "estimate_position_bias", "join_window", "min_searches", "keep_share"}

// signalSettings checks the [signals] table and converts it; at reports
// a problem at a key.
func (pol *Policy) signalSettings(s signalsTOML, at func([]string, string, ...any)) SignalSettings {
	key := func(k ...string) []string { return append([]string{"signals"}, k...) }
	out := SignalSettings{PositionBias: s.PositionBias, EstimateBias: s.EstimateBias, MinSearches: s.MinSearches, KeepShare: s.KeepShare}
	fields := out.Weights.fields()
	for _, k := range sortedKeys(s.Weights) {
		v := s.Weights[k]
		i := slices.IndexFunc(fields, func(f weightField) bool { return f.name == k })
		switch {
		case i < 0:
			at(key("weights", k), "unknown interaction %q%s", k, didYouMean(k, signalWeightNames))
		case math.IsNaN(v) || v < 0 || v > 1000:
			at(key("weights", k), "weight of %s %g: want 0 to 1000", k, v)
		default:
			*fields[i].v = &v
		}
	}
	if v := s.PositionBias; v != nil && (math.IsNaN(*v) || *v < 0 || *v > 5) {
		at(key("position_bias"), "position_bias %g: want 0 to 5", *v)
	}
	if v := s.MinSearches; v != nil && (*v < 1 || *v > 1e9) {
		at(key("min_searches"), "min_searches %d: want 1 or more", *v)
	}
	if v := s.KeepShare; v != nil && (math.IsNaN(*v) || *v <= 0 || *v > 1) {
		at(key("keep_share"), "keep_share %g: want more than 0, up to 1", *v)
	}
	if s.JoinWindow != nil {
		d, err := time.ParseDuration(*s.JoinWindow)
		switch {
		case err != nil:
			at(key("join_window"), "join_window %q: want a duration such as \"30m\" or \"2h\"", *s.JoinWindow)
		case d < time.Second || d > 7*24*time.Hour:
			at(key("join_window"), "join_window %s: want 1s to 168h", d)
		default:
			out.JoinWindow = &d
		}
	}
	return out
}

// checkWeightOrder warns when the settled weights do not rise from
// impression to purchase: a purchase should count for more than a click.
func (p *Policy) checkWeightOrder() {
	v := p.Signals().Weights.inOrder()
	for i := 1; i < len(v); i++ {
		if v[i] < v[i-1] {
			p.Warnings = append(p.Warnings, fmt.Sprintf("signals.weights: %s (%g) is worth less than %s (%g); tune then prizes the cheaper signal",
				signalWeightNames[i], v[i], signalWeightNames[i-1], v[i-1]))
		}
	}
}

// mergeSignals lays b over a.
func mergeSignals(a, b SignalSettings) SignalSettings {
	out := a
	over := b.Weights.fields()
	for i, f := range out.Weights.fields() {
		if v := *over[i].v; v != nil {
			*f.v = v
		}
	}
	if b.PositionBias != nil {
		out.PositionBias = b.PositionBias
	}
	if b.EstimateBias != nil {
		out.EstimateBias = b.EstimateBias
	}
	if b.JoinWindow != nil {
		out.JoinWindow = b.JoinWindow
	}
	if b.MinSearches != nil {
		out.MinSearches = b.MinSearches
	}
	if b.KeepShare != nil {
		out.KeepShare = b.KeepShare
	}
	return out
}

package eval

import (
	"encoding/json"
	"math"
)

// num is v for JSON: nil (null) when v is not a finite number.
func num(v float64) *float64 {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return nil
	}
	return &v
}

// MarshalJSON writes the counts and the rates computed from them; a rate
// that cannot be computed is null.
func (f Figures) MarshalJSON() ([]byte, error) {
	type counts Figures
	return json.Marshal(struct {
		counts
		RescueRate         *float64 `json:"rescue_rate"`
		HardPreservation   *float64 `json:"hard_preservation"`
		AttributePrecision *float64 `json:"attribute_precision"`
		FoundRate          *float64 `json:"found_rate"`
		MRR                *float64 `json:"mrr"`
		MeanKept           *float64 `json:"mean_kept"`
		MeanOf             *float64 `json:"mean_of"`
		SetPrecision       *float64 `json:"set_precision"`
		MeanSetPrecision   *float64 `json:"mean_set_precision"`
	}{counts(f), num(f.RescueRate()), num(f.HardPreservation()), num(f.AttributePrecision()),
		num(f.FoundRate()), num(f.MRR()), num(f.MeanKept()), num(f.MeanOf()),
		num(f.SetPrecision()), num(f.MeanSetPrecision())})
}

// MarshalJSON writes the goal with a value that is null when it is not a
// finite number.
func (g Goal) MarshalJSON() ([]byte, error) {
	return json.Marshal(struct {
		Name   string   `json:"name"`
		Target string   `json:"target"`
		Value  *float64 `json:"value"`
		Met    bool     `json:"met"`
	}{g.Name, g.Target, num(g.Value), g.Met})
}

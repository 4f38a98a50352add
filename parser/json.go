package parser

import (
	"encoding/json"
	"fmt"
)

// The JSON contract: one object per query, documented in the README.
// Field names and meanings are stable; new fields may be added.

type wireResult struct {
	Query        string       `json:"query"`
	Category     string       `json:"category"`
	Constraints  []Constraint `json:"constraints"`
	Unrecognised []string     `json:"unrecognised"`
	Errors       []wireError  `json:"errors"`
}

type wireError struct {
	Start   int    `json:"start"`
	End     int    `json:"end"`
	Message string `json:"message"`
}

type wireConstraint struct {
	Kind       Kind       `json:"kind"`
	Text       string     `json:"text"`
	Start      int        `json:"start"`
	End        int        `json:"end"`
	Strictness Strictness `json:"strictness"`
	Excluded   bool       `json:"excluded"`
	Inferred   bool       `json:"inferred"`
	Evidence   string     `json:"evidence"`
	OrGroup    int        `json:"or_group,omitempty"`

	Name     string `json:"name,omitempty"`
	Category string `json:"category,omitempty"`
	Parent   string `json:"parent,omitempty"`

	Dimension  string   `json:"dimension,omitempty"`
	Quantity   string   `json:"quantity,omitempty"`
	Amount     *float64 `json:"amount,omitempty"`
	Unit       *string  `json:"unit,omitempty"`
	BaseAmount *float64 `json:"base_amount,omitempty"`
	BaseUnit   *string  `json:"base_unit,omitempty"`
	MinAmount  *float64 `json:"min_amount,omitempty"`
	MaxAmount  *float64 `json:"max_amount,omitempty"`
	BaseMin    *float64 `json:"base_min,omitempty"`
	BaseMax    *float64 `json:"base_max,omitempty"`

	// Price bounds: both keys are present on a price, null when open.
	Min      json.RawMessage `json:"min,omitempty"`
	Max      json.RawMessage `json:"max,omitempty"`
	Currency string          `json:"currency,omitempty"`

	System       string             `json:"system,omitempty"`
	Value        string             `json:"value,omitempty"`
	Width        string             `json:"width,omitempty"`
	Designation  string             `json:"designation,omitempty"`
	DimensionsMM map[string]float64 `json:"dimensions_mm,omitempty"`
	Attributes   map[string]string  `json:"attributes,omitempty"`
	Standard     string             `json:"standard,omitempty"`
	Also         []string           `json:"also,omitempty"`

	Hex      string      `json:"hex,omitempty"`
	Lab      *[3]float64 `json:"lab,omitempty"`
	Families []string    `json:"families,omitempty"`

	Target string `json:"target,omitempty"`
	Code   string `json:"code,omitempty"`
}

// MarshalJSON writes the result in the stable JSON contract.
func (r *Result) MarshalJSON() ([]byte, error) {
	w := wireResult{Query: r.Query, Category: r.Category, Constraints: r.Constraints,
		Unrecognised: r.Unrecognised, Errors: []wireError{}}
	if w.Constraints == nil {
		w.Constraints = []Constraint{}
	}
	if w.Unrecognised == nil {
		w.Unrecognised = []string{}
	}
	for _, e := range r.Errors {
		w.Errors = append(w.Errors, wireError{Start: e.Start, End: e.End, Message: e.Msg})
	}
	return json.Marshal(w)
}

// UnmarshalJSON reads a result written by MarshalJSON.
func (r *Result) UnmarshalJSON(b []byte) error {
	var w wireResult
	if err := json.Unmarshal(b, &w); err != nil {
		return err
	}
	*r = Result{Query: w.Query, Category: w.Category, Constraints: w.Constraints, Unrecognised: w.Unrecognised}
	if len(r.Constraints) == 0 {
		r.Constraints = nil
	}
	if len(r.Unrecognised) == 0 {
		r.Unrecognised = nil
	}
	for _, e := range w.Errors {
		r.Errors = append(r.Errors, &Error{Start: e.Start, End: e.End, Msg: e.Message, Query: w.Query})
	}
	return nil
}

func rawString(s *string) json.RawMessage {
	if s == nil {
		return json.RawMessage("null")
	}
	b, _ := json.Marshal(*s)
	return b
}

// MarshalJSON writes one constraint as a flat object: the common fields,
// then the fields of its kind.
func (c Constraint) MarshalJSON() ([]byte, error) {
	w := wireConstraint{Kind: c.Kind, Text: c.Text, Start: c.Start, End: c.End, Strictness: c.Strictness,
		Excluded: c.Excluded, Inferred: c.Inferred, Evidence: c.Evidence, OrGroup: c.OrGroup,
		Name: c.Name, Category: c.Category, Parent: c.Parent, Target: c.Target, Code: c.Code}
	if m := c.Measure; m != nil {
		w.Dimension, w.Quantity = m.Dimension, m.Quantity
		w.Amount, w.BaseAmount = m.Amount, m.BaseAmount
		w.Unit, w.BaseUnit = &m.Unit, &m.BaseUnit
		w.MinAmount, w.MaxAmount, w.BaseMin, w.BaseMax = m.Min, m.Max, m.BaseMin, m.BaseMax
	}
	if p := c.Price; p != nil {
		w.Min, w.Max, w.Currency = rawString(p.Min), rawString(p.Max), p.Currency
	}
	if s := c.Size; s != nil {
		w.System, w.Value, w.Width = s.System, s.Value, s.Width
	}
	if s := c.Spec; s != nil {
		w.System, w.Designation, w.DimensionsMM, w.Attributes, w.Standard, w.Also = s.System, s.Designation, s.Dimensions, s.Attributes, s.Standard, s.Also
	}
	if col := c.Colour; col != nil {
		w.Hex, w.Lab, w.Families = col.Hex, col.Lab, col.Families
	}
	return json.Marshal(w)
}

// UnmarshalJSON reads one constraint written by MarshalJSON.
func (c *Constraint) UnmarshalJSON(b []byte) error {
	var w wireConstraint
	if err := json.Unmarshal(b, &w); err != nil {
		return err
	}
	*c = Constraint{Kind: w.Kind, Text: w.Text, Start: w.Start, End: w.End, Strictness: w.Strictness,
		Excluded: w.Excluded, Inferred: w.Inferred, Evidence: w.Evidence, OrGroup: w.OrGroup,
		Name: w.Name, Category: w.Category, Parent: w.Parent, Target: w.Target, Code: w.Code}
	switch w.Kind {
	case KindMeasure:
		m := &Measure{Dimension: w.Dimension, Quantity: w.Quantity, Amount: w.Amount, BaseAmount: w.BaseAmount,
			Min: w.MinAmount, Max: w.MaxAmount, BaseMin: w.BaseMin, BaseMax: w.BaseMax}
		if w.Unit != nil {
			m.Unit = *w.Unit
		}
		if w.BaseUnit != nil {
			m.BaseUnit = *w.BaseUnit
		}
		c.Measure = m
	case KindPrice:
		p := &Price{Currency: w.Currency}
		for _, f := range []struct {
			raw json.RawMessage
			dst **string
		}{{w.Min, &p.Min}, {w.Max, &p.Max}} {
			if len(f.raw) == 0 || string(f.raw) == "null" {
				continue
			}
			var s string
			if err := json.Unmarshal(f.raw, &s); err != nil {
				return fmt.Errorf("price bound: %w", err)
			}
			*f.dst = &s
		}
		c.Price = p
	case KindSize:
		c.Size = &Size{System: w.System, Value: w.Value, Width: w.Width}
	case KindSpec:
		c.Spec = &Spec{System: w.System, Designation: w.Designation, Dimensions: w.DimensionsMM, Attributes: w.Attributes, Standard: w.Standard, Also: w.Also}
	case KindColour:
		c.Colour = &Colour{Hex: w.Hex, Lab: w.Lab, Families: w.Families}
	}
	return nil
}

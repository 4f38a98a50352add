package rewrite

// Report is the JSON contract of `whittle search`: what was asked, every
// plan counted, what was chosen, the shopper's message and the hits.
type Report struct {
	Query string `json:"query"`
	// Corrected is the query with a misspelt product type fixed, when
	// the plans after the first come from reading it so.
	Corrected  string       `json:"corrected,omitempty"`
	ExactCount int          `json:"exact_count"`
	Steps      []ReportStep `json:"steps"`
	Chosen     ReportStep   `json:"chosen"`
	Message    string       `json:"message"`
	HardUnmet  []Missing    `json:"hard_unmet"`
	Note       string       `json:"note,omitempty"`
	Hits       []ReportHit  `json:"hits"`
}

// ReportStep is one plan counted.
type ReportStep struct {
	Label       string             `json:"label,omitempty"`
	Relaxations []ReportRelaxation `json:"relaxations"`
	Count       int                `json:"count"`
}

// ReportRelaxation is one change, as the contract names it.
type ReportRelaxation struct {
	Op     string `json:"op"`
	Kind   string `json:"kind"`
	Text   string `json:"text"`
	Detail string `json:"detail"`
}

// ReportHit is one product shown.
type ReportHit struct {
	ID      string  `json:"id"`
	Title   string  `json:"title"`
	Price   string  `json:"price,omitempty"`
	Colour  string  `json:"colour,omitempty"`
	InStock bool    `json:"in_stock"`
	Score   float64 `json:"score"`
}

// NewReport writes an outcome and its hits in the contract's form.
func NewReport(o *Outcome, hits []ReportHit) Report {
	conv := func(rs []Relaxation) []ReportRelaxation {
		out := []ReportRelaxation{}
		for _, r := range rs {
			out = append(out, ReportRelaxation{Op: r.Operator, Kind: string(r.Kind), Text: r.Text, Detail: r.Detail})
		}
		return out
	}
	rep := Report{Query: o.Query, Corrected: o.Corrected, Message: o.Message, HardUnmet: o.Missing, Note: o.Note, Hits: hits,
		Chosen: ReportStep{Relaxations: conv(o.Relaxations), Count: o.Count}, Steps: []ReportStep{}}
	if rep.HardUnmet == nil {
		rep.HardUnmet = []Missing{}
	}
	if rep.Hits == nil {
		rep.Hits = []ReportHit{}
	}
	for i, s := range o.Steps {
		if i == 0 {
			rep.ExactCount = s.Count
		}
		rep.Steps = append(rep.Steps, ReportStep{Label: s.Label, Relaxations: conv(s.Relaxations), Count: s.Count})
	}
	return rep
}

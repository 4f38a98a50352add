package rewrite

import "slices"

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
	// Message is the Outcome's: for the shopper, "" when the query as
	// typed found enough.
	Message   string      `json:"message"`
	HardUnmet []Missing   `json:"hard_unmet"`
	Note      string      `json:"note,omitempty"`
	Hits      []ReportHit `json:"hits"`
	// Problems are the badly formed parts of the query, which were not
	// searched for; the rest of the query was ("1/0 jacket" searches
	// for jackets). The service refuses such a query instead.
	Problems []ReportProblem `json:"problems,omitempty"`
	// Explored is set when one of Hits was put there to explore: a
	// product from a plan one step looser than Chosen, which Chosen's
	// own plan did not show.
	Explored *ReportExplored `json:"explored,omitempty"`
}

// ReportProblem is a badly formed part of the query, query[Start:End],
// as the service's error lists its problems.
type ReportProblem struct {
	Start   int    `json:"start"`
	End     int    `json:"end"`
	Message string `json:"message"`
}

// ReportExplored says which hit was shown to explore and how its plan
// was looser than the chosen one.
type ReportExplored struct {
	// Rank is the hit's position in Hits, from 1.
	Rank int `json:"rank"`
	// Relaxations are what the looser plan adds to Chosen's.
	Relaxations []ReportRelaxation `json:"relaxations"`
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
	// Explored marks the hit shown to explore (see Report.Explored).
	Explored bool `json:"explored,omitempty"`
}

// NewReport writes an outcome and its hits in the contract's form.
func NewReport(o *Outcome, hits []ReportHit) Report {
	rep := Report{Query: o.Query, Corrected: o.Corrected, Message: o.Message, HardUnmet: o.Missing, Note: o.Note, Hits: hits,
		Chosen: ReportStep{Relaxations: reportRelaxations(o.Relaxations), Count: o.Count}, Steps: []ReportStep{}}
	if rep.HardUnmet == nil {
		rep.HardUnmet = []Missing{}
	}
	if rep.Hits == nil {
		rep.Hits = []ReportHit{}
	}
	if o.Parsed != nil {
		for _, e := range o.Parsed.Errors {
			rep.Problems = append(rep.Problems, ReportProblem{Start: e.Start, End: e.End, Message: e.Msg})
		}
	}
	for i, s := range o.Steps {
		if i == 0 {
			rep.ExactCount = s.Count
		}
		rep.Steps = append(rep.Steps, ReportStep{Label: s.Label, Relaxations: reportRelaxations(s.Relaxations), Count: s.Count})
	}
	return rep
}

// reportRelaxations writes relaxations in the contract's form; never nil.
func reportRelaxations(rs []Relaxation) []ReportRelaxation {
	out := []ReportRelaxation{}
	for _, r := range rs {
		out = append(out, ReportRelaxation{Op: r.Operator, Kind: string(r.Kind), Text: r.Text, Detail: r.Detail})
	}
	return out
}

// AddExplored puts hit, found by a plan that adds the relaxations added
// to the chosen one, at rank (from 1) of the report's hits, marked as
// explored, and says so in Explored. At most k hits are shown (k below 1
// is taken as 1): when the hits are already k, the last drops off. A
// rank below 1 is taken as 1, and one past the last place as the last
// place (len(Hits)+1, or k).
// The report's hits are copied, not changed in place.
func (r *Report) AddExplored(hit ReportHit, rank, k int, added []Relaxation) {
	last := min(len(r.Hits)+1, max(k, 1))
	rank = min(max(rank, 1), last)
	hit.Explored = true
	hits := slices.Insert(slices.Clone(r.Hits), rank-1, hit)
	r.Hits = hits[:min(len(hits), last)]
	r.Explored = &ReportExplored{Rank: rank, Relaxations: reportRelaxations(added)}
}

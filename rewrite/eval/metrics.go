package eval

import (
	"math"
	"slices"

	"github.com/whittle-search/whittle/rewrite/catalog"
)

// Result is what one engine returned for one case.
type Result struct {
	// Hits are the ids of the products returned, best first.
	Hits []string `json:"hits"`
	// Kept is how many of the query's Of constraints (for whittle) or
	// words (for the baseline) the search that gave the hits kept.
	Kept int `json:"kept"`
	Of   int `json:"of"`
	// Exact is set when the query found something as typed.
	Exact bool `json:"exact,omitempty"`
	// Note says what the engine did, for the report of losses.
	Note string `json:"note,omitempty"`
	// Set is how the whole result set did, of which Hits are the top k:
	// what a count, a facet or a sort by price sees. It is scored as it
	// is read, since it can hold thousands of products.
	Set SetScore `json:"set"`
}

// SetScore is how one whole result set did.
type SetScore struct {
	// Matched is how many products the set holds; OnTarget how many of
	// them are of the intended product's type with every hard attribute.
	Matched  int `json:"matched"`
	OnTarget int `json:"on_target"`
}

// scoreSet checks every product of a whole result set against c.
func scoreSet(c Case, ids []string, byID map[string]*catalog.Product) SetScore {
	s := SetScore{Matched: len(ids)}
	for _, id := range ids {
		if p, ok := byID[id]; ok && p.ProductType == c.ProductType && SatisfiesAll(p, c.Hard) {
			s.OnTarget++
		}
	}
	return s
}

// Figures are one engine's counts over a set of cases; the methods turn
// them into rates.
type Figures struct {
	Queries int `json:"queries"`
	// Rescued is how many queries returned at least one hit; Exact how
	// many found something as typed.
	Rescued int `json:"rescued"`
	Exact   int `json:"exact"`
	// Hits is how many hits all queries returned; HardKept how many of
	// them have every hard attribute of their query; OnTarget how many
	// are also of the intended product's type.
	Hits     int `json:"hits"`
	HardKept int `json:"hard_kept"`
	OnTarget int `json:"on_target"`
	// Found is how many queries returned the intended product among their
	// hits; ReciprocalRank sums 1/rank over those.
	Found          int     `json:"found"`
	ReciprocalRank float64 `json:"reciprocal_rank"`
	// Kept and Of sum Result.Kept and Result.Of.
	Kept int `json:"kept"`
	Of   int `json:"of"`
	// Matched is how many products the queries' whole result sets held
	// (Hits counts only their top k) and MatchedOnTarget how many of them
	// are of the intended type with every hard attribute. SetQueries is
	// how many queries matched something, and SetShares sums the share
	// of each one's set that is on target.
	Matched         int     `json:"matched"`
	MatchedOnTarget int     `json:"matched_on_target"`
	SetQueries      int     `json:"set_queries"`
	SetShares       float64 `json:"set_shares"`
}

// RescueRate is the share of queries that returned a hit.
func (f Figures) RescueRate() float64 { return ratio(f.Rescued, f.Queries) }

// HardPreservation is the share of returned hits that have every hard
// attribute of their query; NaN when nothing was returned.
func (f Figures) HardPreservation() float64 { return ratio(f.HardKept, f.Hits) }

// AttributePrecision is the share of returned hits of the intended
// product's type that have every hard attribute of their query; NaN when
// nothing was returned.
func (f Figures) AttributePrecision() float64 { return ratio(f.OnTarget, f.Hits) }

// SetPrecision is AttributePrecision over the whole result sets: the
// share of every product matched, over all queries, that is of the
// intended type with every hard attribute; NaN when nothing matched. A
// query with many matches weighs as much as its matches.
func (f Figures) SetPrecision() float64 { return ratio(f.MatchedOnTarget, f.Matched) }

// MeanSetPrecision is the mean, over the queries that matched something,
// of the share of each one's whole result set that is on target: every
// query weighs the same.
func (f Figures) MeanSetPrecision() float64 {
	if f.SetQueries == 0 {
		return math.NaN()
	}
	return f.SetShares / float64(f.SetQueries)
}

// FoundRate is the share of queries whose hits hold the intended product.
func (f Figures) FoundRate() float64 { return ratio(f.Found, f.Queries) }

// MRR is the mean reciprocal rank of the intended product, 0 for a query
// whose hits do not hold it.
func (f Figures) MRR() float64 {
	if f.Queries == 0 {
		return math.NaN()
	}
	return f.ReciprocalRank / float64(f.Queries)
}

// MeanKept is the mean number of constraints (or words) kept a query,
// and MeanOf the mean number a query has.
func (f Figures) MeanKept() float64 { return ratio(f.Kept, f.Queries) }

// MeanOf is the mean number of constraints (or words) a query has.
func (f Figures) MeanOf() float64 { return ratio(f.Of, f.Queries) }

func ratio(a, b int) float64 {
	if b == 0 {
		return math.NaN()
	}
	return float64(a) / float64(b)
}

// caseScore is how one result did for its case.
type caseScore struct {
	hits, hardKept, onTarget int
	rank                     int // of the intended product, from 1; 0 when absent
}

// scoreCase checks each hit of res against the real attributes of the
// product it names (a hit no product has counts as meeting nothing).
func scoreCase(c Case, res Result, byID map[string]*catalog.Product) caseScore {
	s := caseScore{hits: len(res.Hits)}
	for i, id := range res.Hits {
		if id == c.Product && s.rank == 0 {
			s.rank = i + 1
		}
		p, ok := byID[id]
		if !ok || !SatisfiesAll(p, c.Hard) {
			continue
		}
		s.hardKept++
		if p.ProductType == c.ProductType {
			s.onTarget++
		}
	}
	return s
}

// add counts one case's result into f.
func (f *Figures) add(res Result, s caseScore) {
	f.Queries++
	if len(res.Hits) > 0 {
		f.Rescued++
	}
	if res.Exact {
		f.Exact++
	}
	f.Hits += s.hits
	f.HardKept += s.hardKept
	f.OnTarget += s.onTarget
	if s.rank > 0 {
		f.Found++
		f.ReciprocalRank += 1 / float64(s.rank)
	}
	f.Kept += res.Kept
	f.Of += res.Of
	if res.Set.Matched > 0 {
		f.Matched += res.Set.Matched
		f.MatchedOnTarget += res.Set.OnTarget
		f.SetQueries++
		f.SetShares += float64(res.Set.OnTarget) / float64(res.Set.Matched)
	}
}

// Score checks every result against its case (results[i] is for
// cases[i]) and the products' real attributes, and sums the figures.
func Score(cases []Case, results []Result, products []catalog.Product) Figures {
	byID := index(products)
	var f Figures
	for i, c := range cases {
		if i < len(results) {
			f.add(results[i], scoreCase(c, results[i], byID))
		}
	}
	return f
}

// index maps product ids to the products.
func index(ps []catalog.Product) map[string]*catalog.Product {
	m := make(map[string]*catalog.Product, len(ps))
	for i := range ps {
		m[ps[i].ID] = &ps[i]
	}
	return m
}

// loses says why whittle did worse than the baseline on one case, or "",
// worst first: it returned nothing where the baseline returned
// something, returned a smaller share of hits on target, or missed the
// intended product the baseline found.
func loses(w, b caseScore) string {
	switch {
	case w.hits == 0 && b.hits > 0:
		return LossNoHits
	case b.hits > 0 && w.onTarget*b.hits < b.onTarget*w.hits:
		return LossOffTarget
	case b.rank > 0 && w.rank == 0:
		return LossMissed
	}
	return ""
}

// The ways whittle loses a case to the baseline, worst first.
const (
	// LossNoHits: whittle returned nothing, the baseline something.
	LossNoHits = "no hits"
	// LossOffTarget: a smaller share of whittle's hits is on target.
	LossOffTarget = "fewer hits on target"
	// LossMissed: the baseline's hits hold the product meant, whittle's
	// do not.
	LossMissed = "missed the product the baseline found"
)

// failureOrder sorts failures as Failures lists them, others after.
func failureOrder(f Failure) int {
	if i := slices.Index(failures, f); i >= 0 {
		return i
	}
	return len(failures)
}

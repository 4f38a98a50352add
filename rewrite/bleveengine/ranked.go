package bleveengine

import (
	"cmp"
	"context"
	"math"
	"slices"

	"github.com/blevesearch/bleve/v2"
	"github.com/blevesearch/bleve/v2/search/query"
	index "github.com/blevesearch/bleve_index_api"
)

// scoreGrain is the step scores are rounded to before ties are broken.
// Bleve sums a match's score in an order that depends on how the index's
// segments fell, so two products that match a query alike can score a
// last bit apart, and differently from one build to the next; rounded,
// they tie, and the tie goes by id.
const scoreGrain = 1e-9

func roundScore(s float64) float64 { return math.Round(s/scoreGrain) * scoreGrain }

// tieReach is how many hits ranked fetches, at most, to hold every
// product tied with the k-th. Past it (a query whose words thousands of
// products match alike) the ties it holds are those bleve's exact scores
// put first.
const tieReach = 1024

// ranked returns the best k products q matches, by rounded score then
// id, with what a result list shows of them, and how many match in all.
// It fetches k + 16 hits and, when the last of them still ties with the
// k-th, fetches once more, up to tieReach, so that the k chosen do not
// depend on the scores' last bits.
func (e *Engine) ranked(ctx context.Context, q query.Query, k int) ([]Shown, int, error) {
	if k <= 0 {
		res, err := e.idx.SearchInContext(ctx, bleve.NewSearchRequestOptions(q, 0, 0, false))
		if err != nil {
			return nil, 0, err
		}
		return nil, int(res.Total), nil
	}
	for n := k + 16; ; n = max(tieReach, k+16) {
		req := bleve.NewSearchRequestOptions(q, n, 0, false)
		req.SortBy([]string{"-_score", "_id"})
		res, err := e.idx.SearchInContext(ctx, req)
		if err != nil {
			return nil, 0, err
		}
		hits := res.Hits
		if n < tieReach && len(hits) == n && uint64(n) < res.Total && roundScore(hits[n-1].Score) >= roundScore(hits[k-1].Score) {
			continue
		}
		type scored struct {
			id    string
			score float64
		}
		all := make([]scored, len(hits))
		for i, h := range hits {
			all[i] = scored{h.ID, roundScore(h.Score)}
		}
		slices.SortFunc(all, func(a, b scored) int {
			if c := cmp.Compare(b.score, a.score); c != 0 {
				return c
			}
			return cmp.Compare(a.id, b.id)
		})
		all = all[:min(k, len(all))]
		out := make([]Shown, 0, len(all))
		for _, h := range all {
			s, err := e.shown(h.id, h.score)
			if err != nil {
				return nil, 0, err
			}
			out = append(out, s)
		}
		return out, int(res.Total), nil
	}
}

// shown reads what a result list shows of the product with id from the
// held snapshot.
func (e *Engine) shown(id string, score float64) (Shown, error) {
	doc, err := e.sets.reader.Document(id)
	if err != nil {
		return Shown{}, err
	}
	var v string
	if doc != nil {
		doc.VisitFields(func(f index.Field) {
			if f.Name() == fStored {
				v = string(f.Value())
			}
		})
	}
	return shownOf(id, score, v), nil
}

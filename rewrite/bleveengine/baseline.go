package bleveengine

import (
	"context"
	"strings"

	"github.com/blevesearch/bleve/v2"
	"github.com/blevesearch/bleve/v2/search/query"
)

// Baseline is what a plain engine's blind partial match finds.
type Baseline struct {
	// Kept is how many of the query's words had to match; Words is how
	// many it has.
	Kept  int     `json:"kept"`
	Words int     `json:"words"`
	Count int     `json:"count"`
	Hits  []Shown `json:"hits"`
}

// Baseline runs the blind partial match a plain engine falls back to: a
// match over the query's words in the product's text, requiring all of
// them, then one fewer, and so on, until something matches. It knows
// nothing of what the words mean.
func (e *Engine) Baseline(ctx context.Context, q string, k int) (*Baseline, error) {
	words := strings.Fields(strings.ToLower(q))
	b := &Baseline{Words: len(words)}
	for n := len(words); n >= 1; n-- {
		var qs []query.Query
		for _, w := range words {
			m := bleve.NewMatchQuery(w)
			m.SetField(fWords)
			qs = append(qs, m)
		}
		dq := bleve.NewDisjunctionQuery(qs...)
		dq.SetMin(float64(n))
		req := bleve.NewSearchRequestOptions(dq, k, 0, false)
		req.Fields = []string{fStored}
		// Ties by id, as Show breaks them: otherwise equal scores come in
		// the order of the index's segments, which differs from build to
		// build.
		req.SortBy([]string{"-_score", "_id"})
		res, err := e.idx.SearchInContext(ctx, req)
		if err != nil {
			return nil, err
		}
		if res.Total == 0 {
			continue
		}
		b.Kept, b.Count = n, int(res.Total)
		for _, h := range res.Hits {
			v, _ := h.Fields[fStored].(string)
			b.Hits = append(b.Hits, shownOf(h.ID, h.Score, v))
		}
		return b, nil
	}
	return b, nil
}

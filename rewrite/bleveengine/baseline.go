package bleveengine

import (
	"context"
	"strings"

	"github.com/RoaringBitmap/roaring/v2"
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
	words := baselineWords(q)
	b := &Baseline{Words: len(words)}
	for n := len(words); n >= 1; n-- {
		var qs []query.Query
		for _, w := range words {
			qs = append(qs, baselineWord(w))
		}
		dq := bleve.NewDisjunctionQuery(qs...)
		dq.SetMin(float64(n))
		// Ranked as Show ranks: rounded scores, ties by id; otherwise
		// equal scores come in the order of the index's segments, which
		// differs from build to build.
		hits, total, err := e.ranked(ctx, dq, k)
		if err != nil {
			return nil, err
		}
		if total == 0 {
			continue
		}
		b.Kept, b.Count, b.Hits = n, total, hits
		return b, nil
	}
	return b, nil
}

// BaselineMatches returns the ids of every product the blind partial
// match finds for q when kept of its words must match, in id order: the
// whole result set of which Baseline, with the Kept it settled on,
// returns the best k. Kept below 1 is taken as 1, and above the number
// of words as all of them.
func (e *Engine) BaselineMatches(ctx context.Context, q string, kept int) ([]string, error) {
	words := baselineWords(q)
	if len(words) == 0 {
		return nil, nil
	}
	kept = min(max(kept, 1), len(words))
	s := e.sets
	if err := s.list.load(s.reader); err != nil {
		return nil, err
	}
	// Each word's matches, as a bitmap; a product is in the set when at
	// least kept of the words match it, a word typed twice counting
	// twice, as it does in the disjunction Baseline runs.
	each := make([]*roaring.Bitmap, len(words))
	union := roaring.New()
	for i, w := range words {
		b, err := s.query(ctx, "\x00baseline\x00"+w, baselineWord(w))
		if err != nil {
			return nil, err
		}
		each[i] = b
		union.Or(b)
	}
	if kept == 1 {
		return s.list.all(union), nil
	}
	in := roaring.New()
	it := union.Iterator()
	for it.HasNext() {
		d, n := it.Next(), 0
		for _, b := range each {
			if b.Contains(d) {
				n++
			}
		}
		if n >= kept {
			in.Add(d)
		}
	}
	return s.list.all(in), nil
}

// baselineWords are the words the blind partial match looks for.
func baselineWords(q string) []string { return strings.Fields(strings.ToLower(q)) }

// baselineWord is the match for one word anywhere in a product's text.
func baselineWord(w string) query.Query {
	m := bleve.NewMatchQuery(w)
	m.SetField(fWords)
	return m
}

package bleveengine

import (
	"context"
	"fmt"
	"slices"
	"sort"
	"sync"

	"github.com/RoaringBitmap/roaring/v2"
	"github.com/blevesearch/bleve/v2/mapping"
	"github.com/blevesearch/bleve/v2/search"
	"github.com/blevesearch/bleve/v2/search/query"
	index "github.com/blevesearch/bleve_index_api"

	"github.com/whittle-search/whittle/rewrite"
)

// sets holds, for one snapshot of the index, the products each clause
// matches, as bitmaps of the snapshot's document numbers. The planner
// counts many plans made of the same few clauses (the exact query, each
// clause alone, the query less one clause...). Bleve finds each clause's
// matches once, by its own searcher for the clause's query; after that a
// count is an intersection of bitmaps, with no posting list read again.
//
// The snapshot is held open for as long as the engine is, so that its
// document numbers stay the same; the index does not change while it is
// open.
type sets struct {
	reader  index.IndexReader
	mapping mapping.IndexMapping

	mu    sync.Mutex
	byKey map[string]*roaring.Bitmap
	bytes uint64

	list listing
}

// setCacheBytes bounds the memory the remembered clause bitmaps take;
// past it the cache starts over. A clause's bitmap takes at most one bit
// a product (12.5 kB at 100,000 products), most far less.
const setCacheBytes = 32 << 20

func newSets(r index.IndexReader, m mapping.IndexMapping) *sets {
	return &sets{reader: r, mapping: m, byKey: make(map[string]*roaring.Bitmap)}
}

func (s *sets) close() error { return s.reader.Close() }

// count returns how many products match every clause of p.
func (s *sets) count(ctx context.Context, p rewrite.Plan) (int, error) {
	m, err := s.match(ctx, p)
	if err != nil {
		return 0, err
	}
	return int(m.GetCardinality()), nil
}

// match returns the products that match every clause of p. The bitmap
// may be one the cache holds: the caller must not change it.
func (s *sets) match(ctx context.Context, p rewrite.Plan) (*roaring.Bitmap, error) {
	var must, not []*roaring.Bitmap
	for _, c := range p.Clauses {
		b, err := s.clause(ctx, c)
		if err != nil {
			return nil, err
		}
		if c.Excluded {
			not = append(not, b)
		} else {
			must = append(must, b)
		}
	}
	if len(must) == 0 {
		all, err := s.remember("*", func() (*roaring.Bitmap, error) {
			return s.postings(ctx, fInStock, productMarks)
		})
		if err != nil {
			return nil, err
		}
		must = append(must, all)
	}
	// Smallest first, so that each intersection is no larger than it.
	sort.Slice(must, func(i, j int) bool { return must[i].GetCardinality() < must[j].GetCardinality() })
	if len(must) == 1 && len(not) == 0 {
		return must[0], nil
	}
	acc := must[0].Clone()
	for _, b := range must[1:] {
		if acc.IsEmpty() {
			return acc, nil
		}
		acc.And(b)
	}
	for _, b := range not {
		acc.AndNot(b)
	}
	return acc, nil
}

// listedMatch is match with the listing loaded, for the caller to put
// the matches in id order.
func (s *sets) listedMatch(ctx context.Context, p rewrite.Plan) (*roaring.Bitmap, error) {
	if err := s.list.load(s.reader); err != nil {
		return nil, err
	}
	return s.match(ctx, p)
}

// preferences returns, for each clause of p that allows several values
// and is not excluded, the products each of its values matches, in the
// order of the values, and for each measure with the amount asked, the
// products in bands ever farther from it; and for each clause p prefers,
// the products it matches. In order: the product type p prefers (the
// type asked, widened to its parent), the product type's clauses, the
// other clauses p prefers in their order, then the plan's other clauses
// in its order.
func (s *sets) preferences(ctx context.Context, p rewrite.Plan) ([][]*roaring.Bitmap, error) {
	var asked, first, relaxed, rest [][]*roaring.Bitmap
	for _, c := range p.Prefer {
		b, err := s.clause(ctx, c)
		if err != nil {
			return nil, err
		}
		if c.Field == "product_type" {
			asked = append(asked, []*roaring.Bitmap{b})
		} else {
			relaxed = append(relaxed, []*roaring.Bitmap{b})
		}
	}
	for _, c := range p.Clauses {
		if !c.Excluded && c.Near != nil && c.Min != nil && c.Max != nil {
			bands, err := s.nearBands(ctx, c)
			if err != nil {
				return nil, err
			}
			rest = append(rest, bands)
			continue
		}
		if c.Excluded || len(c.Values) < 2 {
			continue
		}
		each := make([]*roaring.Bitmap, len(c.Values))
		for i, v := range c.Values {
			one := c
			one.Values = []string{v}
			b, err := s.clause(ctx, one)
			if err != nil {
				return nil, err
			}
			each[i] = b
		}
		if c.Field == "product_type" {
			first = append(first, each)
		} else {
			rest = append(rest, each)
		}
	}
	return slices.Concat(asked, first, relaxed, rest), nil
}

// nearBands are the products in ever wider ranges around c.Near, out to
// c's own: a quarter, a half, three quarters and all of the way from
// Near to each bound.
func (s *sets) nearBands(ctx context.Context, c rewrite.Clause) ([]*roaring.Bitmap, error) {
	near, lo, hi := *c.Near, *c.Min, *c.Max
	var out []*roaring.Bitmap
	for _, f := range []float64{0.25, 0.5, 0.75, 1} {
		band := c
		l, h := near-f*(near-lo), near+f*(hi-near)
		if f == 1 {
			l, h = lo, hi
		}
		band.Min, band.Max, band.Near = &l, &h, nil
		b, err := s.clause(ctx, band)
		if err != nil {
			return nil, err
		}
		out = append(out, b)
	}
	return out, nil
}

// clause returns the products c matches, excluded or not.
func (s *sets) clause(ctx context.Context, c rewrite.Clause) (*roaring.Bitmap, error) {
	c.Excluded, c.From = false, 0
	key := rewrite.Plan{Clauses: []rewrite.Clause{c}}.Key()
	if field, terms, ok := termsOf(c); ok {
		return s.remember(key, func() (*roaring.Bitmap, error) { return s.postings(ctx, field, terms) })
	}
	return s.query(ctx, key, clauseQuery(c))
}

// query returns the products q matches, remembered under key.
func (s *sets) query(ctx context.Context, key string, q query.Query) (*roaring.Bitmap, error) {
	return s.remember(key, func() (*roaring.Bitmap, error) { return s.find(ctx, q) })
}

// remember returns the bitmap kept under key, or makes and keeps it.
func (s *sets) remember(key string, build func() (*roaring.Bitmap, error)) (*roaring.Bitmap, error) {
	s.mu.Lock()
	b, ok := s.byKey[key]
	s.mu.Unlock()
	if ok {
		return b, nil
	}
	b, err := build()
	if err != nil {
		return nil, err
	}
	size := b.GetSizeInBytes()
	s.mu.Lock()
	if s.bytes+size > setCacheBytes {
		s.byKey = make(map[string]*roaring.Bitmap)
		s.bytes = 0
	}
	if _, ok := s.byKey[key]; !ok {
		s.byKey[key] = b
		s.bytes += size
	}
	s.mu.Unlock()
	return b, nil
}

// postings gathers the documents that hold any of terms in field,
// reading bleve's posting lists directly: a term needs no searcher, and
// nothing is scored.
func (s *sets) postings(ctx context.Context, field string, terms []string) (b *roaring.Bitmap, err error) {
	b = roaring.New()
	var tfd index.TermFieldDoc
	for _, t := range terms {
		if err := ctx.Err(); err != nil {
			return nil, err
		}
		r, err := s.reader.TermFieldReader(ctx, []byte(t), field, false, false, false)
		if err != nil {
			return nil, err
		}
		for {
			d, err := r.Next(&tfd)
			if err != nil {
				r.Close()
				return nil, err
			}
			if d == nil {
				break
			}
			v := d.ID.Value()
			if v > 1<<32-1 {
				r.Close()
				return nil, fmt.Errorf("bleveengine: document number %d is past what a clause set holds", v)
			}
			b.Add(uint32(v))
		}
		if err := r.Close(); err != nil {
			return nil, err
		}
	}
	b.RunOptimize()
	return b, nil
}

// find walks bleve's searcher for q over the held snapshot, unscored,
// and gathers the document numbers it yields.
func (s *sets) find(ctx context.Context, q query.Query) (b *roaring.Bitmap, err error) {
	sr, err := q.Searcher(ctx, s.reader, s.mapping, search.SearcherOptions{Score: "none"})
	if err != nil {
		return nil, err
	}
	defer func() {
		if cerr := sr.Close(); err == nil && cerr != nil {
			err = cerr
		}
	}()
	sctx := &search.SearchContext{
		DocumentMatchPool: search.NewDocumentMatchPool(sr.DocumentMatchPoolSize(), 0),
		IndexReader:       s.reader,
	}
	b = roaring.New()
	for n := 0; ; n++ {
		if n%4096 == 0 {
			if err := ctx.Err(); err != nil {
				return nil, err
			}
		}
		dm, err := sr.Next(sctx)
		if err != nil {
			return nil, err
		}
		if dm == nil {
			break
		}
		v := dm.IndexInternalID.Value()
		if v > 1<<32-1 {
			return nil, fmt.Errorf("bleveengine: document number %d is past what a clause set holds", v)
		}
		b.Add(uint32(v))
		sctx.DocumentMatchPool.Put(dm)
	}
	b.RunOptimize()
	return b, nil
}

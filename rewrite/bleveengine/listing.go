package bleveengine

import (
	"fmt"
	"slices"
	"sync"

	"github.com/RoaringBitmap/roaring/v2"
	index "github.com/blevesearch/bleve_index_api"

	"github.com/whittle-search/whittle/rewrite"
)

// listing puts the products a plan of attributes matches in a stable
// order. Such a plan has no words for bleve to score: every product that
// matches meets it equally, and bleve's scores would differ only by how
// many values a field happens to hold (a jacket in three sizes scores
// above one in six). So the list is in product id order, the same every
// time the catalog is indexed, and taking its first k is a walk over a
// bitmap instead of a scored search over every match.
type listing struct {
	once sync.Once
	err  error
	// ids holds each document's product id by document number; byID
	// the document numbers in id order, and rank each document's place
	// in it.
	ids  []string
	byID []uint32
	rank []uint32
}

// load reads every document's id, once: about 20 ms for 100,000
// products.
func (l *listing) load(r index.IndexReader) error {
	l.once.Do(func() {
		it, err := r.DocIDReaderAll()
		if err != nil {
			l.err = err
			return
		}
		defer it.Close()
		var ids []string
		var nums []uint32
		for {
			id, err := it.Next()
			if err != nil {
				l.err = err
				return
			}
			if id == nil {
				break
			}
			ext, err := r.ExternalID(id)
			if err != nil {
				l.err = err
				return
			}
			v := id.Value()
			if v > 1<<32-1 {
				l.err = fmt.Errorf("bleveengine: document number %d is past what a listing holds", v)
				return
			}
			for uint64(len(ids)) <= v {
				ids = append(ids, "")
			}
			ids[v] = ext
			nums = append(nums, uint32(v))
		}
		slices.SortFunc(nums, func(a, b uint32) int {
			switch {
			case ids[a] < ids[b]:
				return -1
			case ids[a] > ids[b]:
				return 1
			}
			return 0
		})
		rank := make([]uint32, len(ids))
		for i, n := range nums {
			rank[n] = uint32(i)
		}
		l.ids, l.byID, l.rank = ids, nums, rank
	})
	return l.err
}

// first returns the ids of the first k products of m, in id order.
func (l *listing) first(m *roaring.Bitmap, k int) []string {
	n := int(m.GetCardinality())
	if n == 0 || k <= 0 {
		return nil
	}
	k = min(k, n)
	out := make([]string, 0, k)
	// Walking the id order finds k matches after about k·N/n steps;
	// walking the matches takes n. Take the shorter.
	if k*len(l.byID)/n < n {
		for _, d := range l.byID {
			if m.Contains(d) {
				out = append(out, l.ids[d])
				if len(out) == k {
					break
				}
			}
		}
		return out
	}
	// The k matches of least rank, kept in order.
	best := make([]uint32, 0, k+1)
	it := m.Iterator()
	for it.HasNext() {
		d := it.Next()
		if int(d) >= len(l.rank) {
			continue
		}
		r := l.rank[d]
		if len(best) == k && r >= l.rank[best[k-1]] {
			continue
		}
		i, _ := slices.BinarySearchFunc(best, r, func(x, r uint32) int {
			return int(l.rank[x]) - int(r)
		})
		best = slices.Insert(best, i, d)
		if len(best) > k {
			best = best[:k]
		}
	}
	for _, d := range best {
		out = append(out, l.ids[d])
	}
	return out
}

// scoredOnly reports whether p needs bleve's scores to be listed well:
// it does when it keeps words to match in the text.
func scoredOnly(p rewrite.Plan) bool {
	for _, c := range p.Clauses {
		if c.Field == "keyword" && !c.Excluded {
			return true
		}
	}
	return false
}

// all returns the ids of every product of m, in id order.
func (l *listing) all(m *roaring.Bitmap) []string {
	docs := make([]uint32, 0, m.GetCardinality())
	it := m.Iterator()
	for it.HasNext() {
		if d := it.Next(); int(d) < len(l.rank) {
			docs = append(docs, d)
		}
	}
	slices.SortFunc(docs, func(a, b uint32) int { return int(l.rank[a]) - int(l.rank[b]) })
	out := make([]string, len(docs))
	for i, d := range docs {
		out[i] = l.ids[d]
	}
	return out
}

// preferred returns the ids of the first k products of m in the order
// prefs gives, then in id order. Each entry of prefs is a clause's values
// in order of preference, as the products each matches: a product comes
// before another when, at the first clause where they differ, the first
// value it matches comes earlier. A product that matches none of a
// clause's values comes after those that match one.
func (l *listing) preferred(m *roaring.Bitmap, prefs [][]*roaring.Bitmap, k int) []string {
	var out []string
	var walk func(j int, set *roaring.Bitmap)
	walk = func(j int, set *roaring.Bitmap) {
		if len(out) >= k || set.IsEmpty() {
			return
		}
		if j == len(prefs) {
			out = append(out, l.first(set, k-len(out))...)
			return
		}
		rest := set.Clone()
		for _, b := range prefs[j] {
			if rest.IsEmpty() || len(out) >= k {
				return
			}
			walk(j+1, roaring.And(rest, b))
			rest.AndNot(b)
		}
		walk(j+1, rest)
	}
	walk(0, m)
	return out
}

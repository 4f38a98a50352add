package replay

import (
	"cmp"
	"container/heap"
	"slices"
)

// spaceSaving is the Space-Saving sketch of frequent items: a fixed
// number of counters; an item not counted takes over the smallest
// counter, inheriting its count as its error.
type spaceSaving struct {
	slots int
	at    map[string]int // item → index in h
	h     counters
}

type counter struct {
	item         string
	count, error int
}

// counters is a min-heap by count that keeps at up to date.
type counters struct {
	c  []counter
	at map[string]int
}

func (h counters) Len() int           { return len(h.c) }
func (h counters) Less(i, j int) bool { return h.c[i].count < h.c[j].count }
func (h counters) Swap(i, j int) {
	h.c[i], h.c[j] = h.c[j], h.c[i]
	h.at[h.c[i].item], h.at[h.c[j].item] = i, j
}
func (h *counters) Push(x any) { h.at[x.(counter).item] = len(h.c); h.c = append(h.c, x.(counter)) }
func (h *counters) Pop() any {
	x := h.c[len(h.c)-1]
	h.c = h.c[:len(h.c)-1]
	delete(h.at, x.item)
	return x
}

func newSpaceSaving(slots int) *spaceSaving {
	at := map[string]int{}
	return &spaceSaving{slots: max(slots, 1), at: at, h: counters{at: at}}
}

func (s *spaceSaving) add(item string, n int) {
	if i, ok := s.at[item]; ok {
		s.h.c[i].count += n
		heap.Fix(&s.h, i)
		return
	}
	if len(s.h.c) < s.slots {
		heap.Push(&s.h, counter{item: item, count: n})
		return
	}
	least := s.h.c[0]
	delete(s.at, least.item)
	s.h.c[0] = counter{item: item, count: least.count + n, error: least.count}
	s.at[item] = 0
	heap.Fix(&s.h, 0)
}

// top returns the k items of largest count, ties by item.
func (s *spaceSaving) top(k int) []Alert {
	cs := slices.Clone(s.h.c)
	slices.SortFunc(cs, func(a, b counter) int { return cmp.Or(cmp.Compare(b.count, a.count), cmp.Compare(a.item, b.item)) })
	out := []Alert{}
	for _, c := range cs[:min(k, len(cs))] {
		out = append(out, Alert{Query: c.item, Searches: c.count, Error: c.error})
	}
	return out
}

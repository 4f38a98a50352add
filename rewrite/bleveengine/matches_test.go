package bleveengine

import (
	"context"
	"slices"
	"testing"

	"github.com/blevesearch/bleve/v2"
	"github.com/blevesearch/bleve/v2/search/query"
	"github.com/google/go-cmp/cmp"

	"github.com/whittle-search/whittle/rewrite"
)

// bleveIDs is every product bleve's own search finds for q, in id order:
// the reference the engine's sets are checked against.
func bleveIDs(t *testing.T, e *Engine, q query.Query) []string {
	t.Helper()
	req := bleve.NewSearchRequestOptions(q, 1000, 0, false)
	res, err := e.idx.SearchInContext(context.Background(), req)
	if err != nil {
		t.Fatal(err)
	}
	var ids []string
	for _, h := range res.Hits {
		ids = append(ids, h.ID)
	}
	slices.Sort(ids)
	return ids
}

// Matches is the whole set Count counts; it must hold the very products
// bleve's own search finds for the plan, and where shop.jsonl makes it
// plain, those worked out by hand.
func TestMatches(t *testing.T) {
	e := openShop(t)
	ctx := context.Background()
	typ := func(vs ...string) rewrite.Clause { return rewrite.Clause{Field: "product_type", Values: vs} }
	for _, tc := range []struct {
		name, reason string
		plan         rewrite.Plan
		want         []string // nil: bleve's search alone is the reference
	}{
		{name: "one type", plan: rewrite.Plan{Clauses: []rewrite.Clause{typ("rain jacket")}},
			want: []string{"RJ-1", "RJ-2", "RJ-3"}, reason: "the three rain jackets"},
		{name: "type and size", plan: rewrite.Plan{Clauses: []rewrite.Clause{typ("rain jacket"), {Field: "size", Values: []string{"s"}}}},
			want: []string{"RJ-1"}, reason: "only RJ-1 comes in s"},
		{name: "a word", plan: rewrite.Plan{Clauses: []rewrite.Clause{{Field: "keyword", Values: []string{"merino"}}}},
			reason: "a scored plan's set is its count's too"},
		{name: "exclusion alone", plan: rewrite.Plan{Clauses: []rewrite.Clause{{Field: "product_type", Values: []string{"rain jacket"}, Excluded: true}}},
			reason: "every product but the rain jackets"},
		{name: "none", plan: rewrite.Plan{Clauses: []rewrite.Clause{typ("zorblax")}}, want: []string{}, reason: "no such type"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			got, err := e.Matches(ctx, tc.plan)
			if err != nil {
				t.Fatal(err)
			}
			ref := bleveIDs(t, e, toQuery(tc.plan))
			if diff := cmp.Diff(ref, got, cmpEmpty); diff != "" {
				t.Errorf("%s: Matches against bleve's search (-bleve +got):\n%s", tc.reason, diff)
			}
			if tc.want != nil {
				if diff := cmp.Diff(tc.want, got, cmpEmpty); diff != "" {
					t.Errorf("%s (-want +got):\n%s", tc.reason, diff)
				}
			}
			if n, _ := e.Count(ctx, tc.plan); n != len(got) {
				t.Errorf("Count = %d, Matches holds %d", n, len(got))
			}
		})
	}
}

// cmpEmpty takes a nil and an empty list of ids as the same.
var cmpEmpty = cmp.Comparer(func(a, b []string) bool { return slices.Equal(a, b) })

// BaselineMatches is the whole set of Baseline's search for each
// fallback and number of words kept; it must hold what bleve finds for
// that search, and what shop.jsonl gives by hand.
func TestBaselineMatches(t *testing.T) {
	e := openShop(t)
	ctx := context.Background()
	for _, tc := range []struct {
		name, reason, q string
		fallback        Fallback
		kept            int
		want            []string // nil: bleve alone is the reference
	}{
		{name: "all words", q: "nylon rain jacket", kept: 3, want: []string{"RJ-1", "RJ-2"},
			reason: "RJ-1 and RJ-2 are nylon rain jackets; RJ-3 is polyester"},
		{name: "two of three", q: "nylon rain jacket", kept: 2, want: []string{"RJ-1", "RJ-2", "RJ-3"},
			reason: "RJ-3 has rain and jacket"},
		{name: "any word", q: "nylon rain jacket", kept: 1, want: []string{"RJ-1", "RJ-2", "RJ-3"},
			reason: "no other product has any of the words"},
		{name: "a word twice counts twice", q: "nylon nylon rain", kept: 2, want: []string{"RJ-1", "RJ-2"},
			reason: "in bleve's disjunction each typed word is a clause: RJ-3 has only rain, one of three"},
		{name: "kept past the words", q: "nylon rain jacket", kept: 9, want: []string{"RJ-1", "RJ-2"},
			reason: "taken as all three"},
		{name: "longer", q: "merino wool crew sweater size m", kept: 3, reason: "bleve is the reference"},
		{name: "longer, one word", q: "merino wool crew sweater size m", kept: 1, reason: "bleve is the reference"},
		{name: "no words", q: "  ", kept: 1, want: []string{}, reason: "nothing to match"},
		{name: "trailing: the first words", q: "jacket rain nylon", fallback: DropTrailing, kept: 2,
			want: []string{"RJ-1", "RJ-2", "RJ-3"}, reason: "jacket and rain, which all three have; nylon, dropped, is not asked"},
		{name: "trailing: not any two", q: "nylon polyester rain", fallback: DropTrailing, kept: 2, want: []string{},
			reason: "nylon and polyester, both, which no jacket is; most-words would take any two"},
		{name: "most words: any two", q: "nylon polyester rain", kept: 2, want: []string{"RJ-1", "RJ-2", "RJ-3"},
			reason: "nylon and rain (RJ-1, RJ-2) or polyester and rain (RJ-3)"},
		{name: "trailing: one word", q: "ember nylon", fallback: DropTrailing, kept: 1,
			want: []string{"RJ-3", "TR-2"}, reason: "the ember rain jacket and the ember trail shoe"},
		{name: "trailing: kept past the words", q: "rain jacket", fallback: DropTrailing, kept: 5,
			want: []string{"RJ-1", "RJ-2", "RJ-3"}, reason: "taken as both"},
		{name: "trailing, longer", q: "merino crew sweater size l", fallback: DropTrailing, kept: 3, reason: "bleve is the reference"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			got, err := e.BaselineMatches(ctx, tc.fallback, tc.q, tc.kept)
			if err != nil {
				t.Fatal(err)
			}
			if words := e.baselineWords(tc.q); len(words) > 0 {
				q := baselineQuery(tc.fallback, words, min(tc.kept, len(words)))
				if diff := cmp.Diff(bleveIDs(t, e, q), got, cmpEmpty); diff != "" {
					t.Errorf("%s: against bleve's search (-bleve +got):\n%s", tc.reason, diff)
				}
			}
			if tc.want != nil {
				if diff := cmp.Diff(tc.want, got, cmpEmpty); diff != "" {
					t.Errorf("%s (-want +got):\n%s", tc.reason, diff)
				}
			}
		})
	}
}

// The set of the words Baseline settled on holds its hits, and as many
// products as it counted.
func TestBaselineMatchesHoldTheHits(t *testing.T) {
	e := openShop(t)
	ctx := context.Background()
	for _, f := range Fallbacks() {
		for _, q := range []string{"trail running shoes size 13", "charcoal merino crew sweater size l under $90", "wool rug 5 ft"} {
			b, err := e.Baseline(ctx, f, q, 3)
			if err != nil {
				t.Fatal(err)
			}
			if b.Fallback != f {
				t.Errorf("%s %q: Baseline says it ran %s", f, q, b.Fallback)
			}
			got, err := e.BaselineMatches(ctx, f, q, b.Kept)
			if err != nil {
				t.Fatal(err)
			}
			if len(got) != b.Count {
				t.Errorf("%s %q: %d matched, Baseline counted %d", f, q, len(got), b.Count)
			}
			for _, h := range b.Hits {
				if !slices.Contains(got, h.ID) {
					t.Errorf("%s %q: hit %s is not in the set %v", f, q, h.ID, got)
				}
			}
		}
	}
}

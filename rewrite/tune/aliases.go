package tune

import (
	"cmp"
	"context"
	"slices"

	"github.com/whittle-search/whittle/rewrite/signals"
)

// alias is one candidate: unknown words of a query that found nothing,
// and a name the product bought after it carries.
type alias struct {
	words, kind, name string
}

// Alias is a candidate for a person to review: words that found
// nothing, then, in Support sessions, a purchase of a product with this
// product type, colour or brand.
type Alias struct {
	Words string `json:"words"`
	// Kind is product_type, colour or brand; Name the catalog's name.
	Kind string `json:"kind"`
	Name string `json:"name"`
	// Support is how many sessions back the candidate; Sessions, in how
	// many sessions the words found nothing at all.
	Support  int `json:"support"`
	Sessions int `json:"sessions"`
}

// mine looks in one session for searches that found nothing followed by
// a purchase from another search.
func (t *Tuner) mine(ctx context.Context, s *signals.Session) error {
	if t.opts.Products == nil {
		return nil
	}
	searches := s.Searches[:min(len(s.Searches), sessionLimit)]
	seen := map[alias]bool{}
	for i := range searches {
		ev := &searches[i].Search
		if len(ev.Shown) > 0 {
			continue
		}
		words := t.read(ev.Query).unrecognised
		if words == "" {
			continue
		}
		if k := (alias{words: words}); !seen[k] {
			seen[k] = true
			t.count(k)
		}
		for j := range searches {
			later := &searches[j]
			if j == i || later.Search.Time.Before(ev.Time) {
				continue
			}
			for _, e := range later.Engagements {
				if e.Type != signals.Purchase || e.Rank < 1 || e.Rank > len(later.Search.Shown) {
					continue
				}
				f, err := t.describe(ctx, later.Search.Shown[e.Rank-1])
				if err != nil {
					return err
				}
				if f == nil {
					continue
				}
				for _, c := range []alias{{words, "product_type", f.ProductType}, {words, "colour", f.Colour}, {words, "brand", f.Brand}} {
					if c.name != "" && !seen[c] {
						seen[c] = true
						t.count(c)
					}
				}
			}
		}
	}
	return nil
}

// count adds a session to a candidate (or, with kind "", to the words
// alone), unless the cap on distinct candidates is reached.
func (t *Tuner) count(a alias) {
	if _, ok := t.aliases[a]; !ok && len(t.aliases) >= aliasLimit {
		t.stats.AliasesDropped++
		return
	}
	t.aliases[a]++
}

// aliasList returns the candidates with enough support, best first.
func (t *Tuner) aliasList() []Alias {
	out := []Alias{}
	for a, n := range t.aliases {
		if a.kind == "" || n < t.opts.MinAliasSupport {
			continue
		}
		out = append(out, Alias{Words: a.words, Kind: a.kind, Name: a.name, Support: n, Sessions: t.aliases[alias{words: a.words}]})
	}
	slices.SortFunc(out, func(a, b Alias) int {
		return cmp.Or(b.Support-a.Support, cmp.Compare(a.Words, b.Words), cmp.Compare(a.Kind, b.Kind), cmp.Compare(a.Name, b.Name))
	})
	return out
}

package tune

import (
	"testing"
	"time"

	"github.com/google/go-cmp/cmp"

	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/signals"
)

// aliasSession is a session that searched q and found nothing, then
// searched again and bought the product at rank 1; before says the
// purchase came first instead.
func aliasSession(id, q string, before bool) *signals.Session {
	nothing := signals.Joined{Search: signals.Event{Type: signals.Search, Session: id, Time: t0, Query: q}}
	found := signals.Joined{Search: signals.Event{Type: signals.Search, Session: id, Time: t0.Add(time.Minute), Query: "rain jacket", Shown: []string{"RJ-9", "RJ-8"}},
		Engagements: []signals.Engagement{{Type: signals.Purchase, Time: t0.Add(2 * time.Minute), Rank: 1}}}
	if before {
		found.Search.Time = t0.Add(-time.Minute)
		return &signals.Session{ID: id, Searches: []signals.Joined{found, nothing}}
	}
	return &signals.Session{ID: id, Searches: []signals.Joined{nothing, found}}
}

func TestAliases(t *testing.T) {
	products := simProducts{"RJ-9": {ProductType: "rain jacket", Colour: "crimson", Brand: "korvane"}, "RJ-8": {ProductType: "rain jacket"}}
	tu := handTuner(t, "", products)
	r := add(t, tu,
		aliasSession("a", "crimsn jaket", false), aliasSession("b", "crimsn jaket", false),
		// A purchase before the search that found nothing suggests nothing.
		aliasSession("c", "crimsn jaket", true),
		// One session is too little support.
		aliasSession("d", "korvan shell", false))
	want := []Alias{
		{Words: "crimsn jaket", Kind: "brand", Name: "korvane", Support: 2, Sessions: 3},
		{Words: "crimsn jaket", Kind: "colour", Name: "crimson", Support: 2, Sessions: 3},
		{Words: "crimsn jaket", Kind: "product_type", Name: "rain jacket", Support: 2, Sessions: 3},
	}
	if diff := cmp.Diff(want, r.Aliases); diff != "" {
		t.Errorf("aliases (-want +got):\n%s", diff)
	}
	// Without an index there is nothing to name what was bought.
	if r := add(t, handTuner(t, "", nil), aliasSession("a", "crimsn jaket", false), aliasSession("b", "crimsn jaket", false)); len(r.Aliases) != 0 {
		t.Errorf("aliases without products: %+v", r.Aliases)
	}
}

var _ rewrite.Describer = simProducts{}

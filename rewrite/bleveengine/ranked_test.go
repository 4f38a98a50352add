package bleveengine

import (
	"context"
	"fmt"
	"path/filepath"
	"testing"

	"github.com/google/go-cmp/cmp"

	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// Sixty invented mugs alike but for their ids match a word alike: the
// best three are the first three ids, though they tie with 57 more, past
// the first fetch of k + 16.
func TestRankedTiesGoByID(t *testing.T) {
	var ps []catalog.Product
	for i := 60; i > 0; i-- {
		ps = append(ps, catalog.Product{ID: fmt.Sprintf("MG-%02d", i), Title: "Plain stoneware mug", ProductType: "mug", Category: "home"})
	}
	ctx := context.Background()
	dir := filepath.Join(t.TempDir(), "idx")
	if _, err := BuildProducts(ctx, ps, dir, BuildOptions{BatchSize: 7}); err != nil {
		t.Fatal(err)
	}
	e, err := Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	defer e.Close()
	want := []string{"MG-01", "MG-02", "MG-03"}
	shown, err := e.Show(ctx, rewrite.Plan{Clauses: []rewrite.Clause{{Field: "keyword", Values: []string{"stoneware"}}}}, 3)
	if err != nil {
		t.Fatal(err)
	}
	b, err := e.Baseline(ctx, MostWords, "plain stoneware mug", 3)
	if err != nil {
		t.Fatal(err)
	}
	for name, hits := range map[string][]Shown{"Show": shown, "Baseline": b.Hits} {
		var ids []string
		for _, h := range hits {
			ids = append(ids, h.ID)
		}
		if diff := cmp.Diff(want, ids); diff != "" {
			t.Errorf("%s, ties by id (-want +got):\n%s", name, diff)
		}
	}
	if b.Count != 60 {
		t.Errorf("baseline counted %d, want 60", b.Count)
	}
}

// The test shop built in one segment and in several ranks every scored
// search the same, scores and all.
func TestRankedSameWhateverTheSegments(t *testing.T) {
	ctx := context.Background()
	var engs []*Engine
	for _, batch := range []int{0, 3} {
		e, err := Open(shopDir(t, batch))
		if err != nil {
			t.Fatal(err)
		}
		defer e.Close()
		engs = append(engs, e)
	}
	for _, q := range []string{"trail running shoes size 13", "charcoal merino crew sweater size l under $90", "wool rug 5 ft", "black lens", "rain jacket"} {
		a, err := engs[0].Baseline(ctx, MostWords, q, 5)
		if err != nil {
			t.Fatal(err)
		}
		b, err := engs[1].Baseline(ctx, MostWords, q, 5)
		if err != nil {
			t.Fatal(err)
		}
		if diff := cmp.Diff(a, b); diff != "" {
			t.Errorf("%q: one segment against several (-one +several):\n%s", q, diff)
		}
	}
}

// What a plan prefers ranks the hits that meet it first and changes
// nothing of what matches: among six invented mugs, the two in stoneware
// come first when the plan prefers stoneware, whether the plan is listed
// (attributes alone) or scored (it keeps a word), and the count and the
// matches stay those of the plan without it.
func TestPreferRanksFirst(t *testing.T) {
	var ps []catalog.Product
	for i := 1; i <= 6; i++ {
		m := "porcelain"
		if i == 4 || i == 6 {
			m = "stoneware"
		}
		ps = append(ps, catalog.Product{ID: fmt.Sprintf("MG-%d", i), Title: "Speckled " + m + " mug", ProductType: "mug", Category: "home", Material: m})
	}
	ctx := context.Background()
	dir := filepath.Join(t.TempDir(), "idx")
	if _, err := BuildProducts(ctx, ps, dir, BuildOptions{}); err != nil {
		t.Fatal(err)
	}
	e, err := Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	defer e.Close()
	stoneware := rewrite.Clause{Field: "material", Values: []string{"stoneware"}}
	for name, clauses := range map[string][]rewrite.Clause{
		"listed": {{Field: "product_type", Values: []string{"mug"}}},
		"scored": {{Field: "keyword", Values: []string{"speckled"}}},
	} {
		p := rewrite.Plan{Clauses: clauses, Prefer: []rewrite.Clause{stoneware}}
		shown, err := e.Show(ctx, p, 3)
		if err != nil {
			t.Fatal(err)
		}
		var ids []string
		for _, h := range shown {
			ids = append(ids, h.ID)
		}
		if diff := cmp.Diff([]string{"MG-4", "MG-6", "MG-1"}, ids); diff != "" {
			t.Errorf("%s: stoneware first, then by id (-want +got):\n%s", name, diff)
		}
		n, err := e.Count(ctx, p)
		if err != nil {
			t.Fatal(err)
		}
		all, err := e.Matches(ctx, p)
		if err != nil {
			t.Fatal(err)
		}
		if n != 6 || len(all) != 6 {
			t.Errorf("%s: %d counted, %d matched, want all 6", name, n, len(all))
		}
	}
}

package bleveengine_test

import (
	"context"
	"fmt"
	"math/rand/v2"
	"os"
	"path/filepath"

	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
)

// Rescue with Explore 1 shows, among the hits, the best product of the
// plan one step looser than the rescue's that the rescue did not show:
// in the invented test shop, RJ-1 and RJ-2 are the nylon rain jackets,
// and dropping the soft material finds RJ-3, shown at a rank the seeded
// source draws from the three places open.
func ExampleEngine_Rescue() {
	e, done, err := openExampleShop()
	if err != nil {
		fmt.Println(err)
		return
	}
	defer done()
	rw := rewrite.New(e, nil)
	opts := bleveengine.RescueOptions{K: 10, Explore: 1, Rand: rand.New(rand.NewPCG(1, 0))}
	res, err := e.Rescue(context.Background(), rw, rw.Parse("nylon rain jacket"), opts)
	if err != nil {
		fmt.Println(err)
		return
	}
	r := res.Explored.Rank
	x := res.Explored.Relaxations[0]
	fmt.Println(len(res.Hits), "hits;", res.Hits[r-1].ID, "explored:", res.Hits[r-1].Explored, "at a rank from 1 to 3:", r >= 1 && r <= 3)
	fmt.Println(x.Op, x.Kind, x.Text)
	// Output:
	// 3 hits; RJ-3 explored: true at a rank from 1 to 3: true
	// drop material nylon
}

// Matches lists the whole result set of a plan, in id order: in the
// invented test shop, the rain jackets in size l.
func ExampleEngine_Matches() {
	e, done, err := openExampleShop()
	if err != nil {
		fmt.Println(err)
		return
	}
	defer done()
	p := rewrite.Plan{Clauses: []rewrite.Clause{
		{Field: "product_type", Values: []string{"rain jacket"}},
		{Field: "size", Values: []string{"l"}},
	}}
	ids, err := e.Matches(context.Background(), p)
	fmt.Println(ids, err)
	// Output: [RJ-1 RJ-2 RJ-3] <nil>
}

// BaselineMatches lists the whole result set of the blind partial match:
// no product has all of "nylon rain jacket size xl", and the most of its
// words any has is three; the set keeping three holds the two nylon rain
// jackets and RJ-3, which comes in xl but is polyester.
func ExampleEngine_BaselineMatches() {
	e, done, err := openExampleShop()
	if err != nil {
		fmt.Println(err)
		return
	}
	defer done()
	ctx := context.Background()
	q := "nylon rain jacket size xl"
	b, err := e.Baseline(ctx, q, 1)
	if err != nil {
		fmt.Println(err)
		return
	}
	ids, err := e.BaselineMatches(ctx, q, b.Kept)
	fmt.Println(b.Kept, "of", b.Words, "words:", ids, err)
	// Output: 3 of 5 words: [RJ-1 RJ-2 RJ-3] <nil>
}

// openExampleShop indexes the invented test shop in a temporary
// directory and opens it; done closes it and removes the directory.
func openExampleShop() (e *bleveengine.Engine, done func(), err error) {
	tmp, err := os.MkdirTemp("", "whittle-example")
	if err != nil {
		return nil, nil, err
	}
	f, err := os.Open(filepath.Join("..", "..", "testdata", "catalog", "shop.jsonl"))
	if err != nil {
		os.RemoveAll(tmp)
		return nil, nil, err
	}
	defer f.Close()
	dir := filepath.Join(tmp, "idx")
	if _, err := bleveengine.Build(context.Background(), f, dir, bleveengine.BuildOptions{}); err == nil {
		e, err = bleveengine.Open(dir)
	}
	if err != nil {
		os.RemoveAll(tmp)
		return nil, nil, err
	}
	return e, func() { e.Close(); os.RemoveAll(tmp) }, nil
}

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
	tmp, err := os.MkdirTemp("", "whittle-example")
	if err != nil {
		fmt.Println(err)
		return
	}
	defer os.RemoveAll(tmp)
	f, err := os.Open(filepath.Join("..", "..", "testdata", "catalog", "shop.jsonl"))
	if err != nil {
		fmt.Println(err)
		return
	}
	defer f.Close()
	dir := filepath.Join(tmp, "idx")
	if _, err := bleveengine.Build(context.Background(), f, dir, bleveengine.BuildOptions{}); err != nil {
		fmt.Println(err)
		return
	}
	e, err := bleveengine.Open(dir)
	if err != nil {
		fmt.Println(err)
		return
	}
	defer e.Close()
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

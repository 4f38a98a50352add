package bleveengine

import (
	"context"
	"encoding/json"
	"math"
	"math/rand/v2"
	"slices"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/rewrite"
)

// ids lists the ids of hits in order.
func ids(hits []Shown) []string {
	var out []string
	for _, h := range hits {
		out = append(out, h.ID)
	}
	return out
}

// seeded is a source of random numbers from one seed.
func seeded(seed uint64) *rand.Rand { return rand.New(rand.NewPCG(seed, 0)) }

// rescue runs Rescue on the test shop and fails the test on an error.
func rescue(t *testing.T, e *Engine, rw *rewrite.Rewriter, q string, opts RescueOptions) *Result {
	t.Helper()
	res, err := e.Rescue(context.Background(), rw, rw.Parse(q), opts)
	if err != nil {
		t.Fatal(err)
	}
	return res
}

// With a chance of 1, a rescue that has a looser plan finding a new
// product always shows it, at a rank from 1 to one past the last hit
// (within k). The expected ids are worked out by hand from
// testdata/catalog/shop.jsonl; plans of attributes alone list their
// matches in id order.
func TestExploreAlways(t *testing.T) {
	e := openShop(t)
	rw := rewrite.New(e, nil)
	for _, tc := range []struct {
		name, query, reason string
		k                   int
		plain               []string // the hits without exploring
		explored            string   // the product explored, or "" for none
		added               []string // op kind text of what the looser plan adds
	}{
		{name: "exact, a soft constraint dropped", query: "nylon rain jacket", k: 10,
			reason: "RJ-1 and RJ-2 are nylon; dropping the soft material is the cheapest step and finds RJ-3, polyester",
			plain:  []string{"RJ-1", "RJ-2"}, explored: "RJ-3", added: []string{"drop material nylon"}},
		{name: "exact and full", query: "rain jacket", k: 2,
			reason: "the three rain jackets fill k=2 with RJ-1 and RJ-2; widening to jacket finds RJ-3, and one of the two drops off",
			plain:  []string{"RJ-1", "RJ-2"}, explored: "RJ-3", added: []string{"widen product_type rain jacket"}},
		{name: "one further down a ladder", query: "mustard rain jacket", k: 10,
			reason: "the rescue widened mustard to harvest gold (RJ-1); dropping the colour is the next step and RJ-2 is the first new jacket by id",
			plain:  []string{"RJ-1"}, explored: "RJ-2", added: []string{"drop colour mustard"}},
		{name: "nothing new", query: "rain jacket", k: 10,
			reason: "widening to jacket finds the same three rain jackets the rescue shows: nothing to explore",
			plain:  []string{"RJ-1", "RJ-2", "RJ-3"}},
		{name: "only a hard constraint to relax", query: "12 awg wire", k: 10,
			reason: "the wire gauge is hard and wire has no parent type: there is no looser plan, so no wire of another gauge could ever be shown",
			plain:  []string{"WR-1"}},
		{name: "hard stop", query: "trail running shoes size 13", k: 10,
			reason: "the hard size alone finds nothing, and nothing is shown in its place"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			plain := rescue(t, e, rw, tc.query, RescueOptions{K: tc.k})
			if got := ids(plain.Hits); !slices.Equal(got, tc.plain) || plain.Explored != nil {
				t.Fatalf("%s: without exploring, hits %v (explored %+v), want %v", tc.reason, got, plain.Explored, tc.plain)
			}
			for seed := range uint64(20) {
				res := rescue(t, e, rw, tc.query, RescueOptions{K: tc.k, Explore: 1, Rand: seeded(seed)})
				if tc.explored == "" {
					if res.Explored != nil || !slices.Equal(ids(res.Hits), tc.plain) {
						t.Fatalf("%s: seed %d explored %+v, hits %v", tc.reason, seed, res.Explored, ids(res.Hits))
					}
					continue
				}
				checkExplored(t, res, tc.plain, tc.explored, tc.k)
				var got []string
				for _, r := range res.Explored.Relaxations {
					got = append(got, r.Op+" "+r.Kind+" "+r.Text)
				}
				if !slices.Equal(got, tc.added) {
					t.Fatalf("%s: added %v, want %v", tc.reason, got, tc.added)
				}
			}
		})
	}
}

// checkExplored checks that res shows want, marked, at its rank, among
// plain's hits in their order, within k, and that it is new.
func checkExplored(t *testing.T, res *Result, plain []string, want string, k int) {
	t.Helper()
	if res.Explored == nil {
		t.Fatalf("nothing explored; hits %v", ids(res.Hits))
	}
	r := res.Explored.Rank
	if r < 1 || r > min(len(plain)+1, k) || r > len(res.Hits) {
		t.Fatalf("rank %d out of 1..%d", r, min(len(plain)+1, k))
	}
	if slices.Contains(plain, want) {
		t.Fatalf("%s was already shown", want)
	}
	expect := slices.Insert(slices.Clone(plain), r-1, want)
	expect = expect[:min(len(expect), k)]
	if got := ids(res.Hits); !slices.Equal(got, expect) {
		t.Fatalf("hits %v, want %v", got, expect)
	}
	for i, h := range res.Hits {
		if h.Explored != (i == r-1) {
			t.Fatalf("hit %d (%s) explored=%v", i+1, h.ID, h.Explored)
		}
	}
}

// A chance of 0 never explores and never draws; the same seed gives the
// same result; a chance of one half explores about half the time.
func TestExploreChance(t *testing.T) {
	e := openShop(t)
	rw := rewrite.New(e, nil)
	const q = "nylon rain jacket"
	plain := rescue(t, e, rw, q, RescueOptions{K: 10})
	want, _ := json.Marshal(plain)
	for seed := range uint64(50) {
		src := seeded(seed)
		res := rescue(t, e, rw, q, RescueOptions{K: 10, Explore: 0, Rand: src})
		if got, _ := json.Marshal(res); string(got) != string(want) {
			t.Fatalf("seed %d, chance 0: %s, want %s", seed, got, want)
		}
		if src.Uint64() != seeded(seed).Uint64() {
			t.Fatalf("seed %d: a chance of 0 drew from the source", seed)
		}
	}
	for seed := range uint64(20) {
		a, _ := json.Marshal(rescue(t, e, rw, q, RescueOptions{K: 10, Explore: 0.5, Rand: seeded(seed)}))
		b, _ := json.Marshal(rescue(t, e, rw, q, RescueOptions{K: 10, Explore: 0.5, Rand: seeded(seed)}))
		if string(a) != string(b) {
			t.Fatalf("seed %d gave two results:\n%s\n%s", seed, a, b)
		}
	}
	// 400 draws of chance 1/2: the count explored is binomial, mean 200,
	// standard deviation 10; the seeds are fixed, so the bound of five
	// deviations either way cannot flake.
	n := 0
	for seed := range uint64(400) {
		if rescue(t, e, rw, q, RescueOptions{K: 10, Explore: 0.5, Rand: seeded(seed)}).Explored != nil {
			n++
		}
	}
	if n < 150 || n > 250 {
		t.Errorf("chance 0.5 explored %d of 400", n)
	}
}

// The rank is drawn uniformly from the places open: for "nylon rain
// jacket", two hits, ranks 1 to 3. Over 600 seeds every rank comes up,
// and the counts pass a chi-square test of uniformity at the 0.001
// level: 13.816 is the critical value for 2 degrees of freedom in the
// chi-square table of the NIST/SEMATECH e-Handbook of Statistical
// Methods, 1.3.6.7.4 (written from memory).
func TestExploreRankUniform(t *testing.T) {
	e := openShop(t)
	rw := rewrite.New(e, nil)
	plain := []string{"RJ-1", "RJ-2"}
	counts := make([]int, 3)
	const draws = 600
	for seed := range uint64(draws) {
		res := rescue(t, e, rw, "nylon rain jacket", RescueOptions{K: 10, Explore: 1, Rand: seeded(seed)})
		checkExplored(t, res, plain, "RJ-3", 10)
		counts[res.Explored.Rank-1]++
	}
	chi := 0.0
	for r, c := range counts {
		if c == 0 {
			t.Errorf("rank %d never drawn: %v", r+1, counts)
		}
		d := float64(c) - draws/3.0
		chi += d * d / (draws / 3.0)
	}
	if chi > 13.816 {
		t.Errorf("ranks %v: chi-square %.2f above 13.816", counts, chi)
	}
}

func TestRescueOptionsRefused(t *testing.T) {
	e := openShop(t)
	rw := rewrite.New(e, nil)
	for _, tc := range []struct {
		name, reason, err string
		opts              RescueOptions
	}{
		{"below 0", "a chance is at least 0", "explore -0.1", RescueOptions{K: 10, Explore: -0.1, Rand: seeded(1)}},
		{"above 1", "a chance is at most 1", "explore 1.5", RescueOptions{K: 10, Explore: 1.5, Rand: seeded(1)}},
		{"not a number", "NaN is no chance", "explore NaN", RescueOptions{K: 10, Explore: math.NaN(), Rand: seeded(1)}},
		{"no source", "a draw needs the caller's source", "needs a source", RescueOptions{K: 10, Explore: 0.5}},
		{"negative k", "k counts hits", "-1 hits", RescueOptions{K: -1}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			_, err := e.Rescue(context.Background(), rw, rw.Parse("rain jacket"), tc.opts)
			if err == nil || !strings.Contains(err.Error(), tc.err) {
				t.Errorf("%s: error %v, want one with %q", tc.reason, err, tc.err)
			}
		})
	}
}

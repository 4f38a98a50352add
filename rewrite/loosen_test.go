package rewrite

import (
	"context"
	"encoding/json"
	"errors"
	"math/rand"
	"slices"
	"strings"
	"sync"
	"testing"
	"testing/quick"

	"github.com/whittle-search/whittle/parser"
)

// added writes a loosening's added relaxations as "operator kind text".
func added(l *Loosening) []string {
	if l == nil {
		return nil
	}
	var out []string
	for _, r := range l.Added {
		out = append(out, r.Operator+" "+string(r.Kind)+" "+r.Text)
	}
	return out
}

// The expected steps follow from the invented shop in memengine_test.go
// and the built-in policy (policy.toml); that sizes, wire gauges and
// focal lengths are hard is common practice in those trades.
func TestLoosen(t *testing.T) {
	for _, tc := range []struct {
		name, query, reason string
		want                []string
	}{
		{name: "exact match", query: "rain jacket",
			reason: "four rain jackets match as typed; the one relaxation the head allows is widening to its parent, jacket",
			want:   []string{"widen product_type rain jacket"}},
		{name: "exact match with hard constraints", query: "womens rain jacket size m",
			reason: "audience and size are hard in apparel, so only the head can step: widened, never dropped",
			want:   []string{"widen product_type rain jacket"}},
		{name: "one further down a ladder already stepped", query: "mustard rain jacket",
			reason: "the rescue widened mustard to near colours; mustard alone matches nothing, so its steps cost a quarter: dropping it (4 × 0.25 = 1) costs less than widening the head (1.5)",
			want:   []string{"drop colour mustard"}},
		{name: "a second constraint relaxed", query: "merino crew sweater oatmeal",
			reason: "the rescue dropped merino; of crew, sweater and oatmeal, dropping the soft silhouette costs least",
			want:   []string{"drop silhouette crew"}},
		{name: "after a misspelt type is fixed", query: "sweter merino",
			reason: "the fix of sweter stays; dropping the soft material is the one step left, sweater having no parent",
			want:   []string{"drop material merino"}},
		{name: "only a hard constraint beside the head", query: "12 awg wire",
			reason: "the wire gauge is hard and wire has no parent in the lexicon: nothing may step, so there is no looser plan"},
		{name: "only a hard constraint", query: "size m",
			reason: "a size is hard: the query has nothing to relax"},
		{name: "hard stop", query: "trail running shoes size 13",
			reason: "the hard size alone finds nothing; that plan keeps only hard constraints"},
		{name: "available products like an unavailable one", query: "fn-3520",
			reason: "LN-2 is unavailable and the plan shown is not a step of the search"},
		{name: "nothing left to ask", query: "zorblax",
			reason: "dropping the one word would keep nothing asked for"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			rw := New(&memEngine{products: shop}, nil)
			o, err := rw.Rescue(context.Background(), tc.query)
			if err != nil {
				t.Fatal(err)
			}
			l, err := rw.Loosen(context.Background(), o)
			if err != nil {
				t.Fatal(err)
			}
			if got := added(l); !slices.Equal(got, tc.want) {
				t.Errorf("%s: added %v, want %v\n%s", tc.reason, got, tc.want, o.Explanation)
			}
		})
	}
}

// Properties over random queries: a looser plan adds exactly one
// relaxation, of a constraint that is not hard, not excluded and not a
// dropped head; it keeps every hard clause of the outcome's plan as it
// was; it keeps the outcome's other relaxations; and it differs from the
// outcome's plan. Enough of the random queries have a looser plan for
// the properties to say something.
func TestLoosenProperties(t *testing.T) {
	loosened := 0
	check := func(q queryGen) bool {
		rw := New(&memEngine{products: shop}, nil)
		o, err := rw.Rescue(context.Background(), string(q))
		if err != nil {
			t.Logf("%q: %v", q, err)
			return false
		}
		l, err := rw.Loosen(context.Background(), o)
		if err != nil {
			t.Logf("%q: %v", q, err)
			return false
		}
		if l == nil {
			return true
		}
		loosened++
		if len(l.Added) != 1 {
			t.Logf("%q: added %v", q, l.Added)
			return false
		}
		a := l.Added[0]
		c := o.Parsed.Constraints[a.Constraint]
		if c.Strictness == parser.Hard || c.Excluded {
			t.Logf("%q: relaxed %s %q (%s)", q, c.Strictness, c.Text, a.Operator)
			return false
		}
		if c.Kind == parser.KindProductType && strings.Contains(c.Evidence, "head product type") && a.Operator == OpDrop {
			t.Logf("%q: dropped the head %q", q, c.Text)
			return false
		}
		keys := make(map[string]bool)
		for _, cl := range l.Plan.Clauses {
			keys[cl.key()] = true
		}
		for _, cl := range o.Plan.Clauses {
			if pc := o.Parsed.Constraints[cl.From]; (pc.Strictness == parser.Hard || pc.Excluded) && !keys[cl.key()] {
				t.Logf("%q: the hard clause of %q changed or went", q, pc.Text)
				return false
			}
		}
		for _, r := range o.Relaxations {
			if r.Constraint != a.Constraint && !slices.Contains(l.Relaxations, r) {
				t.Logf("%q: lost the relaxation of %q", q, r.Text)
				return false
			}
		}
		if l.Plan.Key() == o.Plan.Key() {
			t.Logf("%q: the looser plan is the outcome's", q)
			return false
		}
		return true
	}
	if err := quick.Check(check, &quick.Config{MaxCount: 300, Rand: rand.New(rand.NewSource(11))}); err != nil {
		t.Error(err)
	}
	if loosened < 60 {
		t.Errorf("only %d of 300 random queries had a looser plan", loosened)
	}
}

// An outcome read back from JSON has no search to step from; a context
// that has ended while the ladders of an exact match are built is an
// error, not a shorter ladder; one outcome may be loosened from several
// goroutines (run with -race).
func TestLoosenEdges(t *testing.T) {
	rw := New(&memEngine{products: shop}, nil)
	o, err := rw.Rescue(context.Background(), "rain jacket")
	if err != nil {
		t.Fatal(err)
	}
	b, err := json.Marshal(o)
	if err != nil {
		t.Fatal(err)
	}
	var back Outcome
	if err := json.Unmarshal(b, &back); err != nil {
		t.Fatal(err)
	}
	if l, err := rw.Loosen(context.Background(), &back); l != nil || err != nil {
		t.Errorf("an outcome from JSON: %v, %v; want nil, nil", l, err)
	}
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	if _, err := rw.Loosen(ctx, o); !errors.Is(err, context.Canceled) {
		t.Errorf("a cancelled context gave %v, want context.Canceled", err)
	}
	var wg sync.WaitGroup
	got := make([][]string, 8)
	for i := range got {
		wg.Go(func() {
			l, _ := rw.Loosen(context.Background(), o)
			got[i] = added(l)
		})
	}
	wg.Wait()
	for i, g := range got {
		if !slices.Equal(g, []string{"widen product_type rain jacket"}) {
			t.Errorf("goroutine %d: %v", i, g)
		}
	}
}

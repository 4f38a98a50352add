package rewrite

import (
	"context"
	"errors"
	"sync"
	"testing"

	"github.com/whittle-search/whittle/lexicon/colour"
)

var errEngineDown = errors.New("engine down")

// failingEngine is the test shop's engine, one of whose calls fails with
// errEngineDown from its nth call on (n counts from 1), until healed.
type failingEngine struct {
	*memEngine
	method string
	n      int

	mu     sync.Mutex
	calls  int
	healed bool
}

func (f *failingEngine) fails(method string) bool {
	f.mu.Lock()
	defer f.mu.Unlock()
	if method != f.method || f.healed {
		return false
	}
	f.calls++
	return f.calls >= f.n
}

func (f *failingEngine) heal() {
	f.mu.Lock()
	f.healed = true
	f.mu.Unlock()
}

func (f *failingEngine) Count(ctx context.Context, p Plan) (int, error) {
	if f.fails("Count") {
		return 0, errEngineDown
	}
	return f.memEngine.Count(ctx, p)
}

func (f *failingEngine) Search(ctx context.Context, p Plan, k int) ([]Hit, error) {
	if f.fails("Search") {
		return nil, errEngineDown
	}
	return f.memEngine.Search(ctx, p, k)
}

func (f *failingEngine) Colours(ctx context.Context) ([]colour.PaletteColour, error) {
	if f.fails("Colours") {
		return nil, errEngineDown
	}
	return f.memEngine.Colours(ctx)
}

func (f *failingEngine) Values(ctx context.Context, field, dim string, within Plan) (map[string]int, error) {
	if f.fails("Values") {
		return nil, errEngineDown
	}
	return f.memEngine.Values(ctx, field, dim, within)
}

func (f *failingEngine) Describe(ctx context.Context, id string) (*Facts, error) {
	if f.fails("Describe") {
		return nil, errEngineDown
	}
	return f.memEngine.Describe(ctx, id)
}

// An engine call that fails on the way is the rescue's error: an
// outcome missing what that call would have found (a widening, a count,
// the values carried, an alternative) is no answer, and would be taken
// for one. Once the engine is well again, the same Rewriter rescues the
// query as if nothing had failed: nothing read in the failure is kept.
func TestEngineErrorsAreReturned(t *testing.T) {
	for _, tc := range []struct {
		name, query, method string
		n                   int
		reason              string
	}{
		{"colours", "mustard rain jacket", "Colours", 1, "the catalog's colours, for widening a colour"},
		{"words", "merino sweter l", "Values", 1, "the catalog's words, for reading a typo"},
		{"a count mid-search", "merino crew sweater oatmeal", "Count", 3, "a relaxation set's count, in the search"},
		{"the values carried", "trail running shoes size 13", "Values", 1, "the sizes carried, named when a hard constraint finds nothing"},
		{"an alternative", "fn-3520", "Search", 1, "the unavailable product, to show ones like it"},
		{"its facts", "fn-3520", "Describe", 1, "the unavailable product's facts"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			healthy, err := New(&memEngine{products: shop}, nil).Rescue(context.Background(), tc.query)
			if err != nil {
				t.Fatal(err)
			}
			eng := &failingEngine{memEngine: &memEngine{products: shop}, method: tc.method, n: tc.n}
			rw := New(eng, nil)
			o, err := rw.Rescue(context.Background(), tc.query)
			if !errors.Is(err, errEngineDown) {
				t.Fatalf("%s failed, and the rescue gave %v with %+v; want the engine's error", tc.reason, err, o)
			}
			if eng.calls < tc.n {
				t.Fatalf("%s was called %d times, fewer than the %d the case needs: the case tests nothing", tc.method, eng.calls, tc.n)
			}
			eng.heal()
			again, err := rw.Rescue(context.Background(), tc.query)
			if err != nil {
				t.Fatal(err)
			}
			if again.Message != healthy.Message || again.Count != healthy.Count {
				t.Errorf("after the failure: %q (%d); a healthy engine gives %q (%d)", again.Message, again.Count, healthy.Message, healthy.Count)
			}
		})
	}
}

package rewrite

import (
	"context"
	"testing"

	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/parser"
)

// stubEngine answers every count at once with nothing found, so a rescue
// spends its whole budget: what is timed is the planner alone.
type stubEngine struct{ colours []colour.PaletteColour }

func (stubEngine) Count(context.Context, Plan) (int, error)         { return 0, nil }
func (stubEngine) Search(context.Context, Plan, int) ([]Hit, error) { return nil, nil }
func (s stubEngine) Colours(context.Context) ([]colour.PaletteColour, error) {
	return s.colours, nil
}
func (stubEngine) Values(context.Context, string, string, Plan) (map[string]int, error) {
	return map[string]int{"8": 1, "10": 1}, nil
}

// BenchmarkRescue times the planner over a query of 8 constraints, with
// the engine's counts free, the budget spent in full.
func BenchmarkRescue(b *testing.B) {
	eng := stubEngine{}
	if cs, err := (&memEngine{products: shop}).Colours(context.Background()); err == nil {
		eng.colours = cs
	}
	rw := New(eng, nil)
	r := parser.Parse("womens striped merino crew sweater charcoal size m under $90")
	if n := len(r.Constraints); n != 8 {
		b.Fatalf("the query has %d constraints, want 8", n)
	}
	ctx := context.Background()
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		if _, err := rw.RescueParsed(ctx, r); err != nil {
			b.Fatal(err)
		}
	}
}

package eval

import (
	"context"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"slices"

	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// Engine is what Evaluate searches: the planner's engine, which also runs
// the blind partial match and lists whole result sets.
// *bleveengine.Engine is one.
type Engine interface {
	rewrite.Engine
	// Baseline runs the blind partial match f on the query as typed and
	// returns its top k.
	Baseline(ctx context.Context, f bleveengine.Fallback, q string, k int) (*bleveengine.Baseline, error)
	// Matches and BaselineMatches list every product a plan, or the
	// blind partial match f keeping kept of the query's words, matches.
	Matches(ctx context.Context, p rewrite.Plan) ([]string, error)
	BaselineMatches(ctx context.Context, f bleveengine.Fallback, q string, kept int) ([]string, error)
}

// DefaultK is how many hits a query asks for.
const DefaultK = 10

// EvaluateOptions tune Evaluate. The zero value is ready to use.
type EvaluateOptions struct {
	// K is how many hits each query asks for (default DefaultK).
	K int
	// Fallback is the blind partial match that is the baseline; the
	// zero value is bleveengine.MostWords.
	Fallback bleveengine.Fallback
}

// Evaluate runs every case through whittle (rw's rescue, then the top k
// of its plan) and through the baseline, the blind partial match
// opts.Fallback, on eng, and reports how each did against the products'
// real attributes, in its top k and in its whole result set.
func Evaluate(ctx context.Context, eng Engine, rw *rewrite.Rewriter, cases []Case, products []catalog.Product, opts EvaluateOptions) (Report, error) {
	k, f := opts.K, opts.Fallback
	if k <= 0 {
		k = DefaultK
	}
	if !f.Valid() {
		return Report{}, fmt.Errorf("eval: no fallback %d", int(f))
	}
	byID := index(products)
	whittle := make([]Result, 0, len(cases))
	baseline := make([]Result, 0, len(cases))
	for _, c := range cases {
		w, err := rescue(ctx, eng, rw, c, k, byID)
		if err != nil {
			return Report{}, fmt.Errorf("%q: %w", c.Query, err)
		}
		b, err := blind(ctx, eng, f, c, k, byID)
		if err != nil {
			return Report{}, fmt.Errorf("%q: the baseline: %w", c.Query, err)
		}
		whittle, baseline = append(whittle, w), append(baseline, b)
	}
	rep := NewReport(cases, whittle, baseline, products, k)
	rep.Fallback = f
	return rep, nil
}

// blind is the baseline's result for one case: the top k of the blind
// partial match f, and its whole result set scored.
func blind(ctx context.Context, eng Engine, f bleveengine.Fallback, c Case, k int, byID map[string]*catalog.Product) (Result, error) {
	b, err := eng.Baseline(ctx, f, c.Query, k)
	if err != nil {
		return Result{}, err
	}
	res := Result{Kept: b.Kept, Of: b.Words, Exact: b.Kept == b.Words && b.Count > 0}
	for _, h := range b.Hits {
		res.Hits = append(res.Hits, h.ID)
	}
	if b.Count == 0 {
		return res, nil
	}
	all, err := eng.BaselineMatches(ctx, f, c.Query, b.Kept)
	if err != nil {
		return Result{}, err
	}
	res.Set = scoreSet(c, all, byID)
	return res, nil
}

// rescue is whittle's result for one case: the top k of the plan its
// rescue settles on, that plan's whole result set scored, and how many
// of the query's constraints (filler aside) the plan keeps.
func rescue(ctx context.Context, eng Engine, rw *rewrite.Rewriter, c Case, k int, byID map[string]*catalog.Product) (Result, error) {
	o, err := rw.Rescue(ctx, c.Query)
	if err != nil {
		return Result{}, err
	}
	res := Result{Exact: o.Exact, Note: o.Message}
	if o.Message == "" {
		res.Note = fmt.Sprintf("%d found as typed", o.Count)
	}
	var kept []int
	for _, cl := range o.Plan.Clauses {
		if cl.From >= 0 && cl.From < len(o.Parsed.Constraints) && !slices.Contains(kept, cl.From) {
			kept = append(kept, cl.From)
		}
	}
	res.Kept = len(kept)
	for _, c := range o.Parsed.Constraints {
		if c.Kind != parser.KindFiller {
			res.Of++
		}
	}
	if o.Count == 0 {
		return res, nil
	}
	hits, err := eng.Search(ctx, o.Plan, k)
	if err != nil {
		return Result{}, err
	}
	for _, h := range hits {
		res.Hits = append(res.Hits, h.ID)
	}
	all, err := eng.Matches(ctx, o.Plan)
	if err != nil {
		return Result{}, err
	}
	res.Set = scoreSet(c, all, byID)
	return res, nil
}

// RunOptions tune Run. The zero value is ready to use.
type RunOptions struct {
	// Products is the size of the generated demo catalog (default
	// DefaultProducts).
	Products int
	// CatalogSeed seeds the demo catalog (default 1, the demo's own).
	CatalogSeed uint64
	// Generate tunes the labelled set.
	Generate Options
	// Fallback is the blind partial match whittle is measured against;
	// the zero value is bleveengine.MostWords.
	Fallback bleveengine.Fallback
	// K is how many hits each query asks for (default DefaultK).
	K int
	// Dir is where the temporary index is built ("" means the system's
	// temporary directory); it is removed afterwards.
	Dir string
	// Log, when set, is told what Run is doing.
	Log io.Writer
}

// DefaultProducts is the demo catalog size Run uses by default, the
// demo's own: every product type comes in many variants, and indexing and
// evaluating take seconds.
const DefaultProducts = 20000

func (o *RunOptions) defaults() {
	if o.Products <= 0 {
		o.Products = DefaultProducts
	}
	if o.CatalogSeed == 0 {
		o.CatalogSeed = 1
	}
}

// Cases returns the labelled set Run evaluates with the same options,
// without indexing or searching anything.
func Cases(opts RunOptions) []Case {
	opts.defaults()
	return Generate(catalog.Demo(opts.Products, opts.CatalogSeed), opts.Generate)
}

// Run generates the demo catalog, indexes it in a temporary directory,
// writes the labelled set from it in the style of opts.Generate and
// evaluates whittle and the baseline on it.
func Run(ctx context.Context, opts RunOptions) (Report, error) {
	reps, err := RunStyles(ctx, opts, []Style{opts.Generate.Style})
	if err != nil {
		return Report{}, err
	}
	return reps[0], nil
}

// RunStyles is Run for several styles on one index: a labelled set and a
// report for each style, in the order given, each set drawn with the
// same seed.
func RunStyles(ctx context.Context, opts RunOptions, styles []Style) ([]Report, error) {
	opts.defaults()
	if !opts.Fallback.Valid() {
		return nil, fmt.Errorf("eval: no fallback %d", int(opts.Fallback))
	}
	logf := func(format string, args ...any) {
		if opts.Log != nil {
			fmt.Fprintf(opts.Log, format, args...)
		}
	}
	products := catalog.Demo(opts.Products, opts.CatalogSeed)
	tmp, err := os.MkdirTemp(opts.Dir, "whittle-eval-")
	if err != nil {
		return nil, err
	}
	defer os.RemoveAll(tmp)
	logf("indexing %d products of the demo catalog...\n", len(products))
	idx := filepath.Join(tmp, "index")
	if _, err := bleveengine.BuildProducts(ctx, products, idx, bleveengine.BuildOptions{Lexicon: opts.Generate.Lexicon}); err != nil {
		return nil, err
	}
	eng, err := bleveengine.Open(idx)
	if err != nil {
		return nil, err
	}
	defer eng.Close()
	var ropts []rewrite.Option
	if opts.Generate.Lexicon != nil {
		ropts = append(ropts, rewrite.WithParseOptions(parser.Options{Lexicon: opts.Generate.Lexicon}))
	}
	rw := rewrite.New(eng, opts.Generate.Policy, ropts...)
	var reps []Report
	for _, style := range styles {
		if style == "" {
			style = StyleShort
		}
		gen := opts.Generate
		gen.Style = style
		cases := Generate(products, gen)
		logf("evaluating %d %s queries...\n", len(cases), style)
		rep, err := Evaluate(ctx, eng, rw, cases, products, EvaluateOptions{K: opts.K, Fallback: opts.Fallback})
		if err != nil {
			return nil, err
		}
		rep.Seed, rep.Style = gen.Seed, style
		reps = append(reps, rep)
	}
	return reps, nil
}

package bleveengine

import (
	"context"
	"encoding/json"
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"sync"
	"time"

	"github.com/blevesearch/bleve/v2"
	"github.com/blevesearch/bleve/v2/analysis"
	"github.com/blevesearch/bleve/v2/search/query"
	index "github.com/blevesearch/bleve_index_api"

	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/rewrite"
)

// Engine is an open index. It is safe for concurrent use.
type Engine struct {
	idx   bleve.Index
	vocab vocabulary
	sets  *sets
	// words is the analyzer of the products' words, which the blind
	// partial match reads its query's words with.
	words analysis.Analyzer

	// counts remembers recent counts by plan: the index does not change
	// while it is open, and the planner asks the same parts of queries
	// (a product type alone, a size alone) again and again.
	mu     sync.Mutex
	counts map[string]int
}

// countCache bounds the remembered counts; past it the cache starts over.
const countCache = 1 << 14

// lockWait is how long Open waits for the index's lock, held only by a
// process that opened it to write (no whittle does; Build writes a new
// directory), before it gives up with an error rather than hang.
const lockWait = 5 * time.Second

// openReadOnly opens the bleve index at path to read only: the engine
// never writes, and a read-only open shares the index's lock, so any
// number of processes (a server, a replay, a search) may have it open
// at once. The settings are scorch's, which bleve takes only as a map.
func openReadOnly(path string) (bleve.Index, error) {
	return bleve.OpenUsing(path, map[string]any{
		"read_only":    true,
		"bolt_timeout": lockWait.String(),
	})
}

// Open opens the index Build wrote at dir, to read only: several
// processes may open one index at once.
func Open(dir string) (*Engine, error) {
	st, err := os.Stat(dir)
	if err != nil {
		return nil, fmt.Errorf("no index at %s (build one with whittle index): %w", dir, err)
	}
	if !st.IsDir() {
		return nil, fmt.Errorf("%s is not an index directory", dir)
	}
	b, err := os.ReadFile(filepath.Join(dir, vocabFile))
	if err != nil {
		return nil, fmt.Errorf("%s is not a whittle index: %w", dir, err)
	}
	var v vocabulary
	if err := json.Unmarshal(b, &v); err != nil {
		return nil, fmt.Errorf("%s: the colour vocabulary is damaged: %w", dir, err)
	}
	if v.Layout < 2 {
		v.Layout = 1
	}
	if v.Layout != layout {
		return nil, fmt.Errorf("%s: %w (its layout is %d, this one reads %d): rebuild it with whittle index", dir, ErrOldLayout, v.Layout, layout)
	}
	idx, err := openReadOnly(filepath.Join(dir, "index"))
	if err != nil {
		return nil, fmt.Errorf("opening the index at %s: %w", dir, err)
	}
	if n, err := idx.DocCount(); err != nil || v.Documents > 0 && n != v.Documents {
		idx.Close()
		if err == nil {
			err = fmt.Errorf("it holds %d documents where the build wrote %d", n, v.Documents)
		}
		return nil, fmt.Errorf("the index at %s is damaged (rebuild it with whittle index): %w", dir, err)
	}
	adv, err := idx.Advanced()
	if err != nil {
		idx.Close()
		return nil, fmt.Errorf("opening the index at %s: %w", dir, err)
	}
	r, err := adv.Reader()
	if err != nil {
		idx.Close()
		return nil, fmt.Errorf("opening the index at %s: %w", dir, err)
	}
	m := idx.Mapping()
	return &Engine{idx: idx, vocab: v, sets: newSets(r, m), words: m.AnalyzerNamed(m.AnalyzerNameForPath(fWords)),
		counts: make(map[string]int)}, nil
}

// Close closes the index.
func (e *Engine) Close() error {
	err := e.sets.close()
	if cerr := e.idx.Close(); err == nil {
		err = cerr
	}
	return err
}

// Count returns how many products match every clause of p.
func (e *Engine) Count(ctx context.Context, p rewrite.Plan) (int, error) {
	key := p.Key()
	e.mu.Lock()
	n, ok := e.counts[key]
	e.mu.Unlock()
	if ok {
		return n, nil
	}
	n, err := e.sets.count(ctx, p)
	if err != nil {
		return 0, err
	}
	e.mu.Lock()
	if len(e.counts) >= countCache {
		e.counts = make(map[string]int)
	}
	e.counts[key] = n
	e.mu.Unlock()
	return n, nil
}

// unscored is a request for the number of matches alone. Without scores
// bleve can combine the clauses' posting lists as bitmaps instead of
// walking and scoring each match.
func unscored(q query.Query) *bleve.SearchRequest {
	req := bleve.NewSearchRequestOptions(q, 0, 0, false)
	req.Score = bleve.ScoreNone
	return req
}

// Search returns the k best products that match p.
func (e *Engine) Search(ctx context.Context, p rewrite.Plan, k int) ([]rewrite.Hit, error) {
	shown, err := e.Show(ctx, p, k)
	if err != nil {
		return nil, err
	}
	hits := make([]rewrite.Hit, len(shown))
	for i, s := range shown {
		hits[i] = rewrite.Hit{ID: s.ID, Score: s.Score}
	}
	return hits, nil
}

// Matches returns the ids of every product p matches, in id order: the
// whole result set that Count counts and of which Search returns the
// best k, as a facet or a sort by anything but relevance sees it.
func (e *Engine) Matches(ctx context.Context, p rewrite.Plan) ([]string, error) {
	m, err := e.sets.listedMatch(ctx, p)
	if err != nil {
		return nil, err
	}
	return e.sets.list.all(m), nil
}

// Shown is a product as a search shows it: the contract's hit.
type Shown = rewrite.ReportHit

// Show returns the k best products that match p, with what a result
// list shows of them. A plan that keeps words to match in the text is
// ranked by bleve's scores, rounded so that products matched alike tie,
// ties by id. One of attributes alone, which every match meets, lists
// its matches with score 1 in the order of preference its clauses give
// (see [rewrite.Clause.Values], [rewrite.Clause.Near] and
// [rewrite.Plan.Prefer]): the type asked before its subtypes, the
// products that meet what the plan relaxed before those that do not, the
// nearest colour before farther ones, the products nearest a widened
// measure's amount first, the product type's clause before the others;
// then in id order. A ranked plan scores what it relaxed as optional
// clauses.
func (e *Engine) Show(ctx context.Context, p rewrite.Plan, k int) ([]Shown, error) {
	if !scoredOnly(p) {
		return e.showListed(ctx, p, k)
	}
	out, _, err := e.ranked(ctx, rankedQuery(p), k)
	return out, err
}

// showListed shows the first k matches of p, in the order of its
// clauses' values, then of id.
func (e *Engine) showListed(ctx context.Context, p rewrite.Plan, k int) ([]Shown, error) {
	s := e.sets
	m, err := s.listedMatch(ctx, p)
	if err != nil {
		return nil, err
	}
	prefs, err := s.preferences(ctx, p)
	if err != nil {
		return nil, err
	}
	ids := s.list.preferred(m, prefs, k)
	out := make([]Shown, 0, len(ids))
	for _, id := range ids {
		sh, err := e.shown(id, 1)
		if err != nil {
			return nil, err
		}
		out = append(out, sh)
	}
	return out, nil
}

// shownOf reads a hit's stored display field.
func shownOf(id string, score float64, stored string) Shown {
	s := Shown{ID: id, Score: score}
	parts := strings.Split(stored, "\x1f")
	if len(parts) == 4 {
		s.Title, s.Price, s.Colour, s.InStock = parts[0], parts[1], parts[2], parts[3] == "true"
	}
	return s
}

// Colours returns the colours the catalog carries.
func (e *Engine) Colours(context.Context) ([]colour.PaletteColour, error) {
	return e.vocab.palette(), nil
}

// Values returns the values of a field that the products matching within
// carry, with their counts; measures give their amounts in base units.
func (e *Engine) Values(ctx context.Context, field, dimension string, within rewrite.Plan) (map[string]int, error) {
	f, ok := facetField(field, dimension)
	if !ok {
		return nil, fmt.Errorf("bleveengine: no values for field %q", field)
	}
	req := unscored(toQuery(within))
	req.AddFacet("v", bleve.NewFacetRequest(f, 1000))
	res, err := e.idx.SearchInContext(ctx, req)
	if err != nil {
		return nil, err
	}
	out := map[string]int{}
	if fr, ok := res.Facets["v"]; ok && fr.Terms != nil {
		for _, t := range fr.Terms.Terms() {
			out[t.Term] = t.Count
		}
	}
	return out, nil
}

// facetField is the index field whose terms list a field's values.
func facetField(field, dimension string) (string, bool) {
	switch field {
	case "measure":
		return measureValueField(dimension), dimension != ""
	case "spec":
		return specField(dimension), dimension != ""
	case "product_type", "colour", "pattern", "silhouette", "material", "audience", "brand", "size", "compatibility":
		return field, true
	}
	return "", false
}

// toQuery turns a plan into a bleve query: a conjunction of one query per
// clause, an excluded clause as a must-not.
func toQuery(p rewrite.Plan) query.Query {
	if len(p.Clauses) == 0 {
		return everyProduct()
	}
	b := bleve.NewBooleanQuery()
	must := 0
	for _, c := range p.Clauses {
		q := clauseQuery(c)
		if c.Excluded {
			b.AddMustNot(q)
			continue
		}
		b.AddMust(q)
		must++
	}
	if must == 0 {
		b.AddMust(everyProduct())
	}
	return b
}

// rankedQuery is toQuery with the clauses p prefers as optional ones,
// which raise the score of the products that meet them and match no
// product the plan does not. A plan ranked by score keeps words, so it
// has a clause to must-match.
func rankedQuery(p rewrite.Plan) query.Query {
	q := toQuery(p)
	b, ok := q.(*query.BooleanQuery)
	if !ok || len(p.Prefer) == 0 {
		return q
	}
	for _, c := range p.Prefer {
		b.AddShould(clauseQuery(c))
	}
	return b
}

// productMarks are the values of fInStock: every product has one of
// them, and no palette entry has either.
var productMarks = []string{"true", "false"}

// everyProduct matches every product and no palette entry.
func everyProduct() query.Query {
	return clauseQuery(rewrite.Clause{Field: fInStock, Values: productMarks})
}

func clauseQuery(c rewrite.Clause) query.Query {
	t := true
	switch c.Field {
	case "measure":
		q := bleve.NewNumericRangeInclusiveQuery(c.Min, c.Max, &t, &t)
		q.SetField(measureField(c.Dimension))
		if len(c.Also) == 0 {
			return q
		}
		qs := []query.Query{q}
		for _, a := range c.Also {
			r := bleve.NewNumericRangeInclusiveQuery(a.Min, a.Max, &t, &t)
			r.SetField(measureField(c.Dimension))
			qs = append(qs, r)
		}
		return bleve.NewDisjunctionQuery(qs...)
	case "price":
		q := bleve.NewNumericRangeInclusiveQuery(c.Min, c.Max, &t, &t)
		q.SetField(fPrice)
		cur := bleve.NewTermQuery(c.Unit)
		cur.SetField(fCurrency)
		return bleve.NewConjunctionQuery(q, cur)
	case "keyword":
		var qs []query.Query
		for _, v := range c.Values {
			m := bleve.NewMatchQuery(v)
			m.SetField(fWords)
			m.SetOperator(query.MatchQueryOperatorAnd)
			qs = append(qs, m)
		}
		return bleve.NewDisjunctionQuery(qs...)
	}
	field, terms, _ := termsOf(c)
	if len(terms) == 1 {
		q := bleve.NewTermQuery(terms[0])
		q.SetField(field)
		return q
	}
	qs := make([]query.Query, 0, len(terms))
	for _, v := range terms {
		q := bleve.NewTermQuery(v)
		q.SetField(field)
		qs = append(qs, q)
	}
	return bleve.NewDisjunctionQuery(qs...)
}

// termsOf returns the index field and terms of a clause that any one of
// several exact terms satisfies: every clause but measures, prices and
// words.
func termsOf(c rewrite.Clause) (string, []string, bool) {
	switch c.Field {
	case "measure", "price", "keyword":
		return "", nil, false
	}
	field := c.Field
	if c.Field == "spec" {
		field = specField(c.Dimension)
	}
	terms := make([]string, len(c.Values))
	for i, v := range c.Values {
		terms[i] = norm(v)
	}
	return field, terms, true
}

// Describe returns what the planner needs of one product to find
// available ones like it, and what tune needs of a product shown. It
// reads the stored facts from the snapshot the engine holds, by id,
// without a search.
func (e *Engine) Describe(ctx context.Context, id string) (*rewrite.Facts, error) {
	if err := ctx.Err(); err != nil {
		return nil, err
	}
	doc, err := e.sets.reader.Document(id)
	if err != nil {
		return nil, err
	}
	var stored []byte
	if doc != nil {
		doc.VisitFields(func(f index.Field) {
			if f.Name() == fFacts {
				stored = f.Value()
			}
		})
	}
	if stored == nil {
		return nil, fmt.Errorf("bleveengine: no product %q", id)
	}
	var f rewrite.Facts
	if err := json.Unmarshal(stored, &f); err != nil {
		return nil, fmt.Errorf("bleveengine: product %q: %w", id, err)
	}
	return &f, nil
}

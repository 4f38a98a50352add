package bleveengine_test

import (
	"context"
	"errors"
	"fmt"
	"io/fs"
	"maps"
	"math/rand/v2"
	"os"
	"path/filepath"
	"slices"
	"strings"

	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/catalog"
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
	b, err := e.Baseline(ctx, bleveengine.MostWords, q, 1)
	if err != nil {
		fmt.Println(err)
		return
	}
	ids, err := e.BaselineMatches(ctx, bleveengine.MostWords, q, b.Kept)
	fmt.Println(b.Kept, "of", b.Words, "words:", ids, err)
	// Output: 3 of 5 words: [RJ-1 RJ-2 RJ-3] <nil>
}

// exampleShop is the invented test shop: thirteen hand-made products
// of invented brands, from rain jackets to lumber.
var exampleShop = filepath.Join("..", "..", "testdata", "catalog", "shop.jsonl")

// buildExampleShop indexes the invented test shop at dir.
func buildExampleShop(dir string) error {
	f, err := os.Open(exampleShop)
	if err != nil {
		return err
	}
	defer f.Close()
	_, err = bleveengine.Build(context.Background(), f, dir, bleveengine.BuildOptions{})
	return err
}

// exampleIndexDir is a place for an index, not yet made, in a new
// temporary directory; cleanup removes the directory.
func exampleIndexDir() (dir string, cleanup func(), err error) {
	tmp, err := os.MkdirTemp("", "whittle-example")
	if err != nil {
		return "", nil, err
	}
	return filepath.Join(tmp, "idx"), func() { os.RemoveAll(tmp) }, nil
}

// openExampleShop indexes the invented test shop in a temporary
// directory and opens it; done closes it and removes the directory.
func openExampleShop() (e *bleveengine.Engine, done func(), err error) {
	dir, cleanup, err := exampleIndexDir()
	if err != nil {
		return nil, nil, err
	}
	if err = buildExampleShop(dir); err == nil {
		e, err = bleveengine.Open(dir)
	}
	if err != nil {
		cleanup()
		return nil, nil, err
	}
	return e, func() { e.Close(); cleanup() }, nil
}

// Build indexes a catalog file and reports what it read: the invented
// test shop's thirteen products, in seven named colours (black,
// charcoal and red placed by the lexicon, the rest by their hex values).
// Built again at the same place, from a catalog of two lines of which
// the second, without a title, is skipped, the new index of one product
// replaces the old.
func ExampleBuild() {
	ctx := context.Background()
	dir, cleanup, err := exampleIndexDir()
	if err != nil {
		fmt.Println(err)
		return
	}
	defer cleanup()
	f, err := os.Open(exampleShop)
	if err != nil {
		fmt.Println(err)
		return
	}
	defer f.Close()
	st, err := bleveengine.Build(ctx, f, dir, bleveengine.BuildOptions{})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(st.Products, "products,", st.Colours, "colours")

	lines := `{"id": "RJ-1", "title": "Ridgeline rain jacket", "product_type": "rain jacket", "colour": "harvest gold", "colour_hex": "#dfaa0a"}
{"id": "RJ-2", "product_type": "rain jacket"}
`
	st, err = bleveengine.Build(ctx, strings.NewReader(lines), dir, bleveengine.BuildOptions{SkipBad: true})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(st.Products, "product,", st.Colours, "colour; skipped", st.Skipped[0])
	e, err := bleveengine.Open(dir)
	if err != nil {
		fmt.Println(err)
		return
	}
	defer e.Close()
	n, err := e.Count(ctx, rewrite.Plan{})
	fmt.Println(n, "product in the index", err)
	// Output:
	// 13 products, 7 colours
	// 1 product, 1 colour; skipped line 2: title: missing; every line needs it
	// 1 product in the index <nil>
}

// BuildProducts indexes products a program holds in memory, here two of
// the invented test shop's rain jackets: both come in size l, only RJ-3
// in xl.
func ExampleBuildProducts() {
	ctx := context.Background()
	dir, cleanup, err := exampleIndexDir()
	if err != nil {
		fmt.Println(err)
		return
	}
	defer cleanup()
	ps := []catalog.Product{
		{ID: "RJ-1", Title: "Ridgeline rain jacket", ProductType: "rain jacket", Colour: "harvest gold", ColourHex: "#dfaa0a", Sizes: []string{"s", "m", "l"}},
		{ID: "RJ-3", Title: "Tarn shell rain jacket", ProductType: "rain jacket", Colour: "ember", ColourHex: "#c8553d", Sizes: []string{"l", "xl"}},
	}
	st, err := bleveengine.BuildProducts(ctx, ps, dir, bleveengine.BuildOptions{})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(st.Products, "products,", st.Colours, "colours")
	e, err := bleveengine.Open(dir)
	if err != nil {
		fmt.Println(err)
		return
	}
	defer e.Close()
	for _, size := range []string{"l", "xl"} {
		n, err := e.Count(ctx, rewrite.Plan{Clauses: []rewrite.Clause{{Field: "size", Values: []string{size}}}})
		fmt.Println("size", size+":", n, err)
	}
	// Output:
	// 2 products, 2 colours
	// size l: 2 <nil>
	// size xl: 1 <nil>
}

// Open opens the index Build wrote; where there is none, the error
// wraps fs.ErrNotExist. Close closes it once done.
func ExampleOpen() {
	dir, cleanup, err := exampleIndexDir()
	if err != nil {
		fmt.Println(err)
		return
	}
	defer cleanup()
	_, err = bleveengine.Open(dir)
	fmt.Println("before the build:", errors.Is(err, fs.ErrNotExist))
	if err := buildExampleShop(dir); err != nil {
		fmt.Println(err)
		return
	}
	e, err := bleveengine.Open(dir)
	if err != nil {
		fmt.Println(err)
		return
	}
	n, err := e.Count(context.Background(), rewrite.Plan{})
	fmt.Println(n, "products", err)
	fmt.Println(e.Close())
	// Output:
	// before the build: true
	// 13 products <nil>
	// <nil>
}

// Count counts the products a plan matches: the invented test shop has
// three rain jackets, one of them (RJ-3) in size xl, two not in ember,
// and two priced at most 60 USD (RJ-1 at 59, RJ-3 at 55).
func ExampleEngine_Count() {
	e, done, err := openExampleShop()
	if err != nil {
		fmt.Println(err)
		return
	}
	defer done()
	jacket := rewrite.Clause{Field: "product_type", Values: []string{"rain jacket"}}
	sixty := 60.0
	for _, p := range []rewrite.Plan{
		{Clauses: []rewrite.Clause{jacket}},
		{Clauses: []rewrite.Clause{jacket, {Field: "size", Values: []string{"xl"}}}},
		{Clauses: []rewrite.Clause{jacket, {Field: "colour", Values: []string{"ember"}, Excluded: true}}},
		{Clauses: []rewrite.Clause{jacket, {Field: "price", Max: &sixty, Unit: "USD"}}},
	} {
		n, err := e.Count(context.Background(), p)
		fmt.Println(n, err)
	}
	// Output:
	// 3 <nil>
	// 1 <nil>
	// 2 <nil>
	// 2 <nil>
}

// Search returns the best products of a plan, here the one a rescue
// settled on: no rain jacket in the invented test shop is nylon and
// comes in xl; the size is hard in apparel and the material soft, so
// the material goes, and RJ-3 is the rain jacket in xl. A plan of
// attributes alone, which every match meets alike, scores each 1.
func ExampleEngine_Search() {
	e, done, err := openExampleShop()
	if err != nil {
		fmt.Println(err)
		return
	}
	defer done()
	ctx := context.Background()
	out, err := rewrite.New(e, nil).Rescue(ctx, "nylon rain jacket size xl")
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, r := range out.Relaxations {
		fmt.Println(r.Operator, r.Kind, r.Text)
	}
	hits, err := e.Search(ctx, out.Plan, 10)
	fmt.Println(hits, err)
	// Output:
	// drop material nylon
	// [{RJ-3 1}] <nil>
}

// Show lists the best products of a plan with what a result list shows
// of them. A clause's values come in order of preference, so the ember
// rain jacket (RJ-3) comes before the harvest gold one (RJ-1), though
// its id is later.
func ExampleEngine_Show() {
	e, done, err := openExampleShop()
	if err != nil {
		fmt.Println(err)
		return
	}
	defer done()
	p := rewrite.Plan{Clauses: []rewrite.Clause{
		{Field: "product_type", Values: []string{"rain jacket"}},
		{Field: "colour", Values: []string{"ember", "harvest gold"}},
	}}
	shown, err := e.Show(context.Background(), p, 10)
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, s := range shown {
		fmt.Printf("%s %q %s %s in stock: %v\n", s.ID, s.Title, s.Price, s.Colour, s.InStock)
	}
	// Output:
	// RJ-3 "Tarn shell rain jacket" 55.00 USD ember in stock: true
	// RJ-1 "Ridgeline rain jacket" 59.00 USD harvest gold in stock: true
}

// Baseline is the blind partial match a plain engine falls back to. No
// product has all six words of "ember trail running shoe size 12"
// ("size" is in no product's text). Keeping the most words, any four:
// TR-1, the black shoe that comes in 12, and TR-2, the ember one, which
// does not. Dropping words from the end, "12" and "size" go first: TR-2
// alone, the wrong size. Rescued, the size stays, being hard for
// footwear: TR-1 alone.
func ExampleEngine_Baseline() {
	e, done, err := openExampleShop()
	if err != nil {
		fmt.Println(err)
		return
	}
	defer done()
	ctx := context.Background()
	q := "ember trail running shoe size 12"
	for _, f := range bleveengine.Fallbacks() {
		b, err := e.Baseline(ctx, f, q, 10)
		if err != nil {
			fmt.Println(err)
			return
		}
		var ids []string
		for _, h := range b.Hits {
			ids = append(ids, h.ID)
		}
		slices.Sort(ids) // the hits come by score; in id order here
		fmt.Printf("%s: kept %d of %d words, found %v\n", b.Fallback, b.Kept, b.Words, ids)
	}
	out, err := rewrite.New(e, nil).Rescue(ctx, q)
	if err != nil {
		fmt.Println(err)
		return
	}
	ids, err := e.Matches(ctx, out.Plan)
	fmt.Println("rescued:", ids, err)
	// Output:
	// most-words: kept 4 of 6 words, found [TR-1 TR-2]
	// drop-trailing: kept 4 of 6 words, found [TR-2]
	// rescued: [TR-1] <nil>
}

// Fallbacks lists the blind partial matches, each by the name String
// gives it, which ParseFallback, a flag and JSON read back, and what it
// gives up.
func ExampleFallbacks() {
	for _, f := range bleveengine.Fallbacks() {
		fmt.Printf("%s: %s\n", f, f.Describe())
	}
	// Output:
	// most-words: keeps the most of the query's words any product has, whichever they are
	// drop-trailing: drops words from the end of the query, as typed, until the rest match
}

// ParseFallback reads a blind partial match by the name a command-line
// flag or a request gives.
func ExampleParseFallback() {
	f, err := bleveengine.ParseFallback("drop-trailing")
	fmt.Println(f, err)
	_, err = bleveengine.ParseFallback("last")
	fmt.Println(err)
	// Output:
	// drop-trailing <nil>
	// unknown fallback "last": want most-words or drop-trailing
}

// Colours lists the colours the catalog carries, by name, with how many
// products carry each: in the invented test shop, three black products
// (a shoe and two lenses), two ember, two oatmeal, and one of each of
// the rest.
func ExampleEngine_Colours() {
	e, done, err := openExampleShop()
	if err != nil {
		fmt.Println(err)
		return
	}
	defer done()
	cs, err := e.Colours(context.Background())
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, c := range cs {
		fmt.Println(c.Name, c.Count)
	}
	// Output:
	// black 3
	// charcoal 1
	// ember 2
	// harvest gold 1
	// morning fog 1
	// oatmeal 2
	// red 1
}

// Values lists the values a field takes among the products a plan
// matches: the sizes of the invented test shop's three rain jackets,
// and the lengths of its two studs, 8 ft and 10 ft, in millimetres,
// the base unit of length.
func ExampleEngine_Values() {
	e, done, err := openExampleShop()
	if err != nil {
		fmt.Println(err)
		return
	}
	defer done()
	ctx := context.Background()
	of := func(field, dimension, productType string) {
		p := rewrite.Plan{Clauses: []rewrite.Clause{{Field: "product_type", Values: []string{productType}}}}
		vals, err := e.Values(ctx, field, dimension, p)
		if err != nil {
			fmt.Println(err)
			return
		}
		for _, v := range slices.Sorted(maps.Keys(vals)) {
			fmt.Printf(" %s:%d", v, vals[v])
		}
		fmt.Println()
	}
	of("size", "", "rain jacket")
	of("measure", "length", "stud")
	// Output:
	//  l:3 m:2 s:1 xl:1
	//  2438.4:1 3048:1
}

// Describe reads what the planner knows of one product by its id:
// LN-2, the invented test shop's 35 mm lens, is out of stock. An id
// the index does not hold is an error.
func ExampleEngine_Describe() {
	e, done, err := openExampleShop()
	if err != nil {
		fmt.Println(err)
		return
	}
	defer done()
	ctx := context.Background()
	f, err := e.Describe(ctx, "LN-2")
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(f.ProductType, f.Category, f.Brand, f.Colour, f.Measures["focal_length"], "mm", f.Compat, "in stock:", f.InStock)
	_, err = e.Describe(ctx, "LN-9")
	fmt.Println(err)
	// Output:
	// lens camera fennorac black 35 mm [jx-10] in stock: false
	// bleveengine: no product "LN-9"
}

// Build refuses a target that is neither new, nor an empty directory,
// nor an index it wrote, and leaves it alone: here a directory holding
// someone's notes, given as --index by mistake.
func ExampleTargetError() {
	dir, err := os.MkdirTemp("", "whittle-example-")
	if err != nil {
		fmt.Println(err)
		return
	}
	defer os.RemoveAll(dir)
	os.WriteFile(filepath.Join(dir, "notes.txt"), []byte("precious"), 0o644)

	_, err = bleveengine.Build(context.Background(), strings.NewReader(`{"id": "a", "title": "Tarn fleece"}`), dir, bleveengine.BuildOptions{})
	var te *bleveengine.TargetError
	fmt.Println(errors.Is(err, bleveengine.ErrNotIndex), errors.As(err, &te) && te.Dir == dir)
	fmt.Println(te.Reason)
	notes, _ := os.ReadFile(filepath.Join(dir, "notes.txt"))
	fmt.Println(string(notes))
	// Output:
	// true true
	// it is a directory holding notes.txt, which is not a whittle index
	// precious
}

// IsIndex tells an index Build wrote, which a build replaces, from
// anything else.
func ExampleIsIndex() {
	dir, err := os.MkdirTemp("", "whittle-example-")
	if err != nil {
		fmt.Println(err)
		return
	}
	defer os.RemoveAll(dir)
	idx := filepath.Join(dir, "idx")
	fmt.Println(bleveengine.IsIndex(idx))
	if _, err := bleveengine.Build(context.Background(), strings.NewReader(`{"id": "a", "title": "Tarn fleece"}`), idx, bleveengine.BuildOptions{}); err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(bleveengine.IsIndex(idx), bleveengine.IsIndex(dir))
	// Output:
	// false
	// true false
}

// A build notes the values whittle does not know: here an invented
// catalog whose second product has a product type the lexicon lacks and
// a category misspelt; its first, typed "Rain Jackets", is a rain jacket.
func ExampleUnknown() {
	dir, cleanup, err := exampleIndexDir()
	if err != nil {
		fmt.Println(err)
		return
	}
	defer cleanup()
	ps := []catalog.Product{
		{ID: "a", Title: "Tarn shell", ProductType: "Rain Jackets", Category: "apparel"},
		{ID: "b", Title: "Scree wrap", ProductType: "rainwear", Category: "aparel"},
	}
	st, err := bleveengine.BuildProducts(context.Background(), ps, dir, bleveengine.BuildOptions{})
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, u := range st.Unknown {
		fmt.Printf("line %d: %v\n", u.Line, u)
	}
	// Output:
	// line 2: category "aparel" (1 product) is no category whittle knows; did you mean "apparel"?
	// line 2: product type "rainwear" (1 product) is none whittle knows, so it is found by its words only
}

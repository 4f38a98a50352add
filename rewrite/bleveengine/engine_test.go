package bleveengine

import (
	"context"
	"encoding/json"
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"sync"
	"testing"

	"github.com/blevesearch/bleve/v2"

	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// testdata/catalog/shop.jsonl is an invented shop of 13 products; each
// expected value below is worked out by hand from it.
func openShop(t *testing.T) *Engine {
	t.Helper()
	e, err := Open(shopDir(t, 4))
	if err != nil {
		t.Fatal(err)
	}
	t.Cleanup(func() { e.Close() })
	return e
}

// shopDir builds the test shop's index in batches of the given size (4
// gives it several segments; 0, one) and returns its directory.
func shopDir(t *testing.T, batch int) string {
	t.Helper()
	f, err := os.Open(filepath.Join("..", "..", "testdata", "catalog", "shop.jsonl"))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	dir := filepath.Join(t.TempDir(), "idx")
	st, err := Build(context.Background(), f, dir, BuildOptions{BatchSize: batch})
	if err != nil {
		t.Fatal(err)
	}
	if st.Products != 13 {
		t.Errorf("indexed %d products, want 13", st.Products)
	}
	return dir
}

func TestRescueOnTheIndex(t *testing.T) {
	e := openShop(t)
	rw := rewrite.New(e, nil)
	for _, tc := range []struct {
		query, reason string
		exact         bool
		count         int
		ops           []string
		message       string
	}{
		{"womens rain jacket size m", "RJ-1 and RJ-2 are women's rain jackets in m", true, 2, nil, ""},
		{"rain jacket", "three rain jackets", true, 3, nil, ""},
		{"mustard rain jacket", "harvest gold (#dfaa0a) is within ΔE00 4 of mustard: RJ-1", false, 1, []string{"widen colour"}, "colours close to mustard"},
		{"striped rain jacket", "no striped rain jacket; pattern is soft: all three", false, 3, []string{"drop pattern"}, "in any pattern"},
		{"merino crew sweater oatmeal", "the oatmeal sweater is wool (SW-2): merino is dropped, not the colour", false, 1, []string{"drop material"}, "in any material"},
		{"trail running shoes size 13", "sizes 7 to 12 only; size is hard", false, 0, nil, "sizes carried: 7, 8, 9, 10, 11, 12"},
		{"85 lens", "focal length is hard in camera; 35 and 50 mm are carried", false, 0, nil, "focal lengths carried: 35 mm, 50 mm"},
		{"50mm lens for jx-10", "LN-1 fits jx-10 at 50 mm", true, 1, nil, ""},
		{"2x4 12 ft", "no 12 ft stud; lumber length widens to the standard sizes around it, 10 to 14 ft: LB-2", false, 1, []string{"widen measure"}, "standard lengths"},
		{"5x8 rug", "the rug is 5 by 7.5 ft: 8 ft ±10% holds 7.5", false, 1, []string{"widen measure"}, "about 8 ft"},
		{"rain jacket under $50", "the cheapest is 55.00; a 15% stretch reaches 57.50: RJ-3", false, 1, []string{"widen price"}, "up to 57.50 USD"},
		{"14 awg wire", "12 AWG only; a gauge is never substituted", false, 0, nil, "12 awg"},
		{"not black lens", "both lenses are black", false, 0, nil, ""},
		{"black or charcoal sweater", "either colour will do: SW-1 is charcoal", true, 1, nil, ""},
		{"trail running shoes size 13 or 12", "either size will do, and TR-1 comes in 12", true, 1, nil, ""},
		{"12 or 14 awg wire", "either gauge will do, and WR-1 is 12 awg", true, 1, nil, ""},
		{"50mm lens for jx-20 or jx-10", "either model will do, and LN-1 fits the jx-10", true, 1, nil, ""},
		{"35 or 50 mm lens", "either focal length will do: LN-2 is 35 mm, LN-1 50 mm", true, 2, nil, ""},
		{"2x4 7.5 or 11 ft", "each length ±10%: 6.75..8.25 ft holds LB-1's 8 ft, 9.9..12.1 ft LB-2's 10 ft", false, 2, []string{"widen measure"}, "about 7.5 ft or 11 ft"},
		{"sweater not charcoal or black", "neither colour: SW-2 is oatmeal", true, 1, nil, ""},
		{"merino sweter l", "sweter is read as sweater, so the query is apparel and l a hard letter size: SW-1 is merino in l", false, 1, []string{"replace product_type"}, "Showing sweaters, reading “sweter” as “sweater”."},
		{"trail runing shoes size 13", "runing is a word of \"trail running shoe\", read as running: the size stays hard and is not carried", false, 0, []string{"replace product_type"},
			"No results for “trail runing shoes size 13”, read as “trail running shoes size 13”. size 13 is not carried in trail running shoes; sizes carried: 7, 8, 9, 10, 11, 12."},
		{"fn-3520", "LN-2 is out of stock; LN-1 is an available black lens fitting jx-10", false, 1, nil, "“fn-3520” is unavailable. Showing available lenses like it: near its colour, fitting jx-10."},
	} {
		t.Run(tc.query, func(t *testing.T) {
			o, err := rw.Rescue(context.Background(), tc.query)
			if err != nil {
				t.Fatal(err)
			}
			var ops []string
			for _, r := range o.Relaxations {
				ops = append(ops, r.Operator+" "+string(r.Kind))
			}
			if o.Exact != tc.exact || o.Count != tc.count || !slices.Equal(ops, tc.ops) {
				t.Errorf("%s: exact=%v count=%d ops=%v; want %v %d %v\n%s", tc.reason, o.Exact, o.Count, ops, tc.exact, tc.count, tc.ops, o.Explanation)
			}
			if !strings.Contains(o.Message, tc.message) {
				t.Errorf("%s: message %q lacks %q", tc.reason, o.Message, tc.message)
			}
		})
	}
}

func TestShow(t *testing.T) {
	e := openShop(t)
	shown, err := e.Show(context.Background(), rewrite.Plan{Clauses: []rewrite.Clause{{Field: "product_type", Values: []string{"lens"}}}}, 10)
	if err != nil {
		t.Fatal(err)
	}
	if len(shown) != 2 || shown[0].Title == "" {
		t.Fatalf("shown = %+v", shown)
	}
	for _, s := range shown {
		// LN-2 is marked in_stock false in the catalog.
		if s.ID == "LN-2" && s.InStock || s.ID == "LN-1" && !s.InStock {
			t.Errorf("%s in stock = %v", s.ID, s.InStock)
		}
	}
}

func TestBuildErrors(t *testing.T) {
	for _, tc := range []struct {
		name, text string
		line       int
		field, msg string
	}{
		{"not json", "{\"id\": \"a\", \"title\": \"x\"}\nnot json\n", 2, "", "not a JSON object"},
		{"bad measure", `{"id": "a", "title": "x", "measures": {"length": "long"}}`, 1, "measures", "length"},
		{"duplicate id", "{\"id\": \"a\", \"title\": \"x\"}\n{\"id\": \"a\", \"title\": \"y\"}\n", 2, "id", "line 1"},
		{"wrong type", `{"id": "a", "title": "x", "sizes": "m"}`, 1, "sizes", "want"},
		{"a 10 MB line", "{\"id\": \"a\", \"title\": \"x\"}\n{\"id\": \"b\", \"title\": \"" + strings.Repeat("x", 10<<20) + "\"}\n", 2, "", "longer than"},
		{"control character in id", `{"id": "a\u001eb", "title": "x"}`, 1, "id", "control character"},
		{"bad spec", `{"id": "a", "title": "x", "spec": ["3x5"]}`, 1, "spec", "not a standard designation"},
		{"bad currency", `{"id": "a", "title": "x", "price": {"amount": "5", "currency": "XYZ"}}`, 1, "price", "ISO 4217"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			dir := filepath.Join(t.TempDir(), "idx")
			_, err := Build(context.Background(), strings.NewReader(tc.text), dir, BuildOptions{})
			var le *catalog.LineError
			if !errors.As(err, &le) || le.Line != tc.line || le.Field != tc.field || !strings.Contains(le.Msg, tc.msg) {
				t.Fatalf("got %v, want line %d field %q containing %q", err, tc.line, tc.field, tc.msg)
			}
			if _, err := os.Stat(dir); !os.IsNotExist(err) {
				t.Errorf("a failed build left %s behind", dir)
			}
		})
	}
	if _, err := Build(context.Background(), strings.NewReader("\n\n"), filepath.Join(t.TempDir(), "idx"), BuildOptions{}); err == nil || !strings.Contains(err.Error(), "no products") {
		t.Errorf("an empty catalog gave %v", err)
	}
}

func TestSkipBadAndAtomicReplace(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "idx")
	good := "{\"id\": \"a\", \"title\": \"Tarn fleece\", \"product_type\": \"fleece\"}\n"
	if _, err := Build(context.Background(), strings.NewReader(good), dir, BuildOptions{}); err != nil {
		t.Fatal(err)
	}
	// A failing rebuild leaves the old index as it was.
	if _, err := Build(context.Background(), strings.NewReader("not json\n"), dir, BuildOptions{}); err == nil {
		t.Fatal("a bad catalog built")
	}
	e, err := Open(dir)
	if err != nil {
		t.Fatalf("the old index was lost: %v", err)
	}
	if n, _ := e.Count(context.Background(), rewrite.Plan{}); n != 1 {
		t.Errorf("old index has %d products, want 1", n)
	}
	e.Close()
	st, err := Build(context.Background(), strings.NewReader(good+"not json\n{\"id\": \"b\", \"title\": \"Scree beanie\"}\n"), dir, BuildOptions{SkipBad: true})
	if err != nil {
		t.Fatal(err)
	}
	if st.Products != 2 || len(st.Skipped) != 1 || st.Skipped[0].Line != 2 {
		t.Errorf("stats = %+v", st)
	}
	// A line too long to read is skipped like any malformed line, and the
	// build goes on; a byte order mark before the first line is no part
	// of its JSON.
	long := "{\"id\": \"c\", \"title\": \"" + strings.Repeat("x", catalog.MaxLine) + "\"}\n"
	st, err = Build(context.Background(), strings.NewReader("\ufeff"+good+long+"{\"id\": \"b\", \"title\": \"Scree beanie\"}\n"), dir, BuildOptions{SkipBad: true})
	if err != nil {
		t.Fatal(err)
	}
	if st.Products != 2 || len(st.Skipped) != 1 || st.Skipped[0].Line != 2 || !strings.Contains(st.Skipped[0].Error(), "longer than") {
		t.Errorf("stats = %+v", st)
	}
	if _, err := Open(filepath.Join(t.TempDir(), "none")); err == nil {
		t.Error("opening a missing index gave no error")
	}
}

// The blind baseline drops words without knowing what they mean. Each
// want is worked out by hand from shop.jsonl, where "size" is in no
// product's text: TR-1 is a black trail running shoe in sizes 7 to 12,
// TR-2 an ember one in 8 to 10; SW-1 is a merino crew sweater, SW-2 a
// wool one, also crew.
func TestBaseline(t *testing.T) {
	e := openShop(t)
	for _, tc := range []struct {
		name, reason, q    string
		fallback           Fallback
		kept, words, count int
		hits               []string // in id order
	}{
		{name: "most words", q: "ember trail running shoe size 12", kept: 4, words: 6, count: 2, hits: []string{"TR-1", "TR-2"},
			reason: "any four words: TR-1 has trail running shoe 12, TR-2 ember trail running shoe"},
		{name: "drop trailing: the size goes", q: "ember trail running shoe size 12", fallback: DropTrailing, kept: 4, words: 6, count: 1, hits: []string{"TR-2"},
			reason: "12 and size dropped from the end leave the ember shoe, which has no size 12"},
		{name: "drop trailing: the size first", q: "size 12 ember trail running shoe", fallback: DropTrailing, words: 6,
			reason: "size leads the query and no product has it, so every word goes: nothing"},
		{name: "drop trailing: the typo stays", q: "sweaterr merino crew", fallback: DropTrailing, words: 3,
			reason: "the misspelt word comes first and matches nothing, so nothing is found"},
		{name: "most words: the typo goes", q: "sweaterr merino crew", kept: 2, words: 3, count: 1, hits: []string{"SW-1"},
			reason: "merino and crew: SW-1 alone is merino"},
		{name: "drop trailing: found as typed", q: "rain jacket", fallback: DropTrailing, kept: 2, words: 2, count: 3, hits: []string{"RJ-1", "RJ-2", "RJ-3"},
			reason: "every word matches: nothing is dropped"},
		{name: "drop trailing: a stop word is no word", q: "rain jacket for women", fallback: DropTrailing, kept: 3, words: 3, count: 2, hits: []string{"RJ-1", "RJ-2"},
			reason: "for is an English stop word, which the text analyzer drops: a plain engine ignores it rather than dropping women after it"},
		{name: "most words: a stop word is no word", q: "the rain jacket", kept: 2, words: 2, count: 3, hits: []string{"RJ-1", "RJ-2", "RJ-3"},
			reason: "the is left out, so rain jacket is the whole query, found as typed"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			b, err := e.Baseline(context.Background(), tc.fallback, tc.q, 10)
			if err != nil {
				t.Fatal(err)
			}
			var ids []string
			for _, h := range b.Hits {
				ids = append(ids, h.ID)
			}
			slices.Sort(ids)
			got := fmt.Sprintf("%s kept %d of %d, %d products %v", b.Fallback, b.Kept, b.Words, b.Count, ids)
			want := fmt.Sprintf("%s kept %d of %d, %d products %v", tc.fallback, tc.kept, tc.words, tc.count, tc.hits)
			if got != want {
				t.Errorf("%s:\n got %s\nwant %s", tc.reason, got, want)
			}
		})
	}
}

// Fallbacks are named by String and read back by ParseFallback, and in
// JSON by their names; anything else is refused.
func TestFallbackNames(t *testing.T) {
	for _, f := range Fallbacks() {
		g, err := ParseFallback(f.String())
		if err != nil || g != f {
			t.Errorf("ParseFallback(%q) = %v, %v", f, g, err)
		}
		b, err := json.Marshal(Baseline{Fallback: f})
		if err != nil || !strings.Contains(string(b), `"fallback":"`+f.String()+`"`) {
			t.Errorf("JSON of %s: %s, %v", f, b, err)
		}
	}
	if MostWords.String() != "most-words" || DropTrailing.String() != "drop-trailing" {
		t.Errorf("names: %s, %s", MostWords, DropTrailing)
	}
	if _, err := ParseFallback("trailing"); err == nil || !strings.Contains(err.Error(), "most-words or drop-trailing") {
		t.Errorf("ParseFallback(trailing) = %v, want an error naming the two", err)
	}
	if _, err := json.Marshal(Baseline{Fallback: 7}); err == nil {
		t.Error("a fallback out of range marshalled")
	}
	e := openShop(t)
	if _, err := e.Baseline(context.Background(), Fallback(-1), "rain jacket", 3); err == nil {
		t.Error("Baseline ran an unknown fallback")
	}
	if _, err := e.BaselineMatches(context.Background(), Fallback(2), "rain jacket", 1); err == nil {
		t.Error("BaselineMatches ran an unknown fallback")
	}
}

// Counts come from clause bitmaps the engine keeps; each must equal the
// total bleve's own search reports for the same query (bleve, the
// reference here), and where the catalog makes it plain, the count
// worked out by hand from shop.jsonl (whose prices are all in USD).
func TestCountsAgreeWithBleve(t *testing.T) {
	e := openShop(t)
	ctx := context.Background()
	lo, hi, p0, p100 := 0.0, 1e9, 0.0, 100.0
	typ := func(vs ...string) rewrite.Clause { return rewrite.Clause{Field: "product_type", Values: vs} }
	for _, tc := range []struct {
		name string
		plan rewrite.Plan
		want int // -1: bleve's count alone is the reference
	}{
		{"everything", rewrite.Plan{}, 13},
		{"one type", rewrite.Plan{Clauses: []rewrite.Clause{typ("rain jacket")}}, 3},
		{"either type", rewrite.Plan{Clauses: []rewrite.Clause{typ("lens", "rug")}}, 3},
		{"type and size", rewrite.Plan{Clauses: []rewrite.Clause{typ("rain jacket"), {Field: "size", Values: []string{"m"}}}}, -1},
		{"both lenses are black", rewrite.Plan{Clauses: []rewrite.Clause{typ("lens"), {Field: "colour", Values: []string{"black"}, Excluded: true}}}, 0},
		{"exclusion alone", rewrite.Plan{Clauses: []rewrite.Clause{{Field: "product_type", Values: []string{"lens"}, Excluded: true}}}, 11},
		{"any focal length", rewrite.Plan{Clauses: []rewrite.Clause{{Field: "measure", Dimension: "focal_length", Min: &lo, Max: &hi}}}, 2},
		{"price", rewrite.Plan{Clauses: []rewrite.Clause{{Field: "price", Min: &p0, Max: &p100, Unit: "USD"}}}, -1},
		// Right after the same bounds in dollars, so that a count kept
		// under a key blind to the currency would be given again.
		{"the same price in euros", rewrite.Plan{Clauses: []rewrite.Clause{{Field: "price", Min: &p0, Max: &p100, Unit: "EUR"}}}, 0},
		{"a word", rewrite.Plan{Clauses: []rewrite.Clause{{Field: "keyword", Values: []string{"merino"}}}}, -1},
		{"no such type", rewrite.Plan{Clauses: []rewrite.Clause{typ("zorblax")}}, 0},
		{"lens for jx-10 in stock", rewrite.Plan{Clauses: []rewrite.Clause{typ("lens"), {Field: "compatibility", Values: []string{"jx-10"}}, {Field: rewrite.FieldInStock, Values: []string{"true"}}}}, 1},
	} {
		t.Run(tc.name, func(t *testing.T) {
			got, err := e.Count(ctx, tc.plan)
			if err != nil {
				t.Fatal(err)
			}
			res, err := e.idx.SearchInContext(ctx, unscored(toQuery(tc.plan)))
			if err != nil {
				t.Fatal(err)
			}
			if got != int(res.Total) {
				t.Errorf("Count = %d, bleve's search finds %d", got, res.Total)
			}
			if tc.want >= 0 && got != tc.want {
				t.Errorf("Count = %d, want %d", got, tc.want)
			}
		})
	}
}

// A plan of attributes alone lists its matches by its clauses' values,
// earlier values first, then in product id order, the same however bleve
// numbered the documents (openShop builds in batches of 4, so there are
// several segments). Each list is worked out by hand from shop.jsonl.
func TestShowListsByPreference(t *testing.T) {
	e := openShop(t)
	ctx := context.Background()
	for _, tc := range []struct {
		name string
		plan rewrite.Plan
		k    int
		want []string
	}{
		// The first five of the thirteen ids in shop.jsonl, sorted.
		{"everything", rewrite.Plan{}, 5, []string{"LB-1", "LB-2", "LN-1", "LN-2", "RG-1"}},
		{"rain jackets", rewrite.Plan{Clauses: []rewrite.Clause{{Field: "product_type", Values: []string{"rain jacket"}}}}, 2, []string{"RJ-1", "RJ-2"}},
		// The lenses, asked first, before the studs (LB-1, LB-2).
		{"more than match", rewrite.Plan{Clauses: []rewrite.Clause{{Field: "product_type", Values: []string{"lens", "stud"}}}}, 10, []string{"LN-1", "LN-2", "LB-1", "LB-2"}},
		// RJ-2 is morning fog, RJ-1 harvest gold: the colour asked first
		// comes first, against the id order.
		{"nearest colour first", rewrite.Plan{Clauses: []rewrite.Clause{
			{Field: "product_type", Values: []string{"rain jacket"}},
			{Field: "colour", Values: []string{"morning fog", "harvest gold"}}}}, 10, []string{"RJ-2", "RJ-1"}},
		// The type's clause comes first, whatever the plan's order: the
		// rain jackets (RJ-3 ember before RJ-1 harvest gold), then the
		// sweater SW-2 in oatmeal, the first colour.
		{"type before colour", rewrite.Plan{Clauses: []rewrite.Clause{
			{Field: "colour", Values: []string{"oatmeal", "ember", "harvest gold"}},
			{Field: "product_type", Values: []string{"rain jacket", "sweater"}}}}, 10, []string{"RJ-3", "RJ-1", "SW-2"}},
		{"the first two of those", rewrite.Plan{Clauses: []rewrite.Clause{
			{Field: "colour", Values: []string{"oatmeal", "ember", "harvest gold"}},
			{Field: "product_type", Values: []string{"rain jacket", "sweater"}}}}, 2, []string{"RJ-3", "RJ-1"}},
		// A measure widened around 36 mm: LN-2's 35 mm lies within a
		// quarter of the way to the bounds (34.5..42), LN-1's 50 mm only
		// within three quarters (31.5..54), so LN-2 comes first.
		{"nearest measure first", rewrite.Plan{Clauses: []rewrite.Clause{
			{Field: "product_type", Values: []string{"lens"}},
			{Field: "measure", Dimension: "focal_length", Min: ptr(30.0), Max: ptr(60.0), Near: ptr(36.0)}}}, 10, []string{"LN-2", "LN-1"}},
		{"the same without near", rewrite.Plan{Clauses: []rewrite.Clause{
			{Field: "product_type", Values: []string{"lens"}},
			{Field: "measure", Dimension: "focal_length", Min: ptr(30.0), Max: ptr(60.0)}}}, 10, []string{"LN-1", "LN-2"}},
		// An excluded clause gives no order: all but the lenses, by id.
		{"excluded", rewrite.Plan{Clauses: []rewrite.Clause{{Field: "product_type", Values: []string{"lens", "sweater"}, Excluded: true}}}, 3, []string{"LB-1", "LB-2", "RG-1"}},
		{"none", rewrite.Plan{Clauses: []rewrite.Clause{{Field: "product_type", Values: []string{"zorblax"}}}}, 10, nil},
	} {
		t.Run(tc.name, func(t *testing.T) {
			shown, err := e.Show(ctx, tc.plan, tc.k)
			if err != nil {
				t.Fatal(err)
			}
			var ids []string
			for _, s := range shown {
				ids = append(ids, s.ID)
				if s.Score != 1 || s.Title == "" {
					t.Errorf("%s: score %v, title %q; want 1 and a title", s.ID, s.Score, s.Title)
				}
			}
			if !slices.Equal(ids, tc.want) {
				t.Errorf("shown %v, want %v", ids, tc.want)
			}
		})
	}
}

// Counts and lists asked from many goroutines at once, with the caches
// cold, agree with the same asked one at a time.
func TestConcurrentCountsAndLists(t *testing.T) {
	seq, par := openShop(t), openShop(t)
	ctx := context.Background()
	var plans []rewrite.Plan
	for _, ty := range []string{"rain jacket", "lens", "rug", "stud", "sweater", "zorblax"} {
		c := rewrite.Clause{Field: "product_type", Values: []string{ty}}
		plans = append(plans, rewrite.Plan{Clauses: []rewrite.Clause{c}},
			rewrite.Plan{Clauses: []rewrite.Clause{c, {Field: rewrite.FieldInStock, Values: []string{"true"}}}})
	}
	type result struct {
		n   int
		ids []string
	}
	ask := func(e *Engine, p rewrite.Plan) (result, error) {
		n, err := e.Count(ctx, p)
		if err != nil {
			return result{}, err
		}
		shown, err := e.Show(ctx, p, 3)
		var ids []string
		for _, s := range shown {
			ids = append(ids, s.ID)
		}
		return result{n, ids}, err
	}
	want := make([]result, len(plans))
	for i, p := range plans {
		r, err := ask(seq, p)
		if err != nil {
			t.Fatal(err)
		}
		want[i] = r
	}
	errs := make(chan error, 16*len(plans))
	var wg sync.WaitGroup
	for g := range 16 {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for j := range plans {
				i := (j + g) % len(plans)
				got, err := ask(par, plans[i])
				if err != nil {
					errs <- err
					continue
				}
				if got.n != want[i].n || !slices.Equal(got.ids, want[i].ids) {
					errs <- fmt.Errorf("plan %s: got %v, want %v", plans[i].Key(), got, want[i])
				}
			}
		}()
	}
	wg.Wait()
	close(errs)
	for err := range errs {
		t.Error(err)
	}
}

// The Lab components are numeric fields of the palette entries: a box
// around harvest gold's Lab (#dfaa0a, RJ-1's colour in shop.jsonl)
// finds its entry and nothing else, and no product query finds an
// entry (the counts and lists above would show one).
func TestPaletteEntries(t *testing.T) {
	e := openShop(t)
	rgb, err := colour.ParseHex("#dfaa0a")
	if err != nil {
		t.Fatal(err)
	}
	lab := rgb.Lab()
	box := bleve.NewConjunctionQuery()
	for f, v := range map[string]float64{fL: lab.L, fA: lab.A, fB: lab.B} {
		lo, hi, yes := v-0.5, v+0.5, true
		q := bleve.NewNumericRangeInclusiveQuery(&lo, &hi, &yes, &yes)
		q.SetField(f)
		box.AddQuery(q)
	}
	res, err := e.idx.Search(bleve.NewSearchRequest(box))
	if err != nil {
		t.Fatal(err)
	}
	if len(res.Hits) != 1 || res.Hits[0].ID != paletteIDPrefix+"harvest gold" {
		var ids []string
		for _, h := range res.Hits {
			ids = append(ids, h.ID)
		}
		t.Errorf("the box around harvest gold finds %q", ids)
	}
}

// Products in memory index as the same products read from a file do:
// two invented products give two, and a count over their product type
// finds the one of that type.
func TestBuildProducts(t *testing.T) {
	ps := []catalog.Product{
		{ID: "a", Title: "Scree beanie", ProductType: "beanie"},
		{ID: "b", Title: "Scree scarf", ProductType: "scarf"},
	}
	dir := filepath.Join(t.TempDir(), "idx")
	st, err := BuildProducts(context.Background(), ps, dir, BuildOptions{})
	if err != nil {
		t.Fatal(err)
	}
	if st.Products != 2 {
		t.Errorf("indexed %d products, want 2", st.Products)
	}
	e, err := Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	defer e.Close()
	n, err := e.Count(context.Background(), rewrite.Plan{Clauses: []rewrite.Clause{{Field: "product_type", Values: []string{"beanie"}}}})
	if err != nil {
		t.Fatal(err)
	}
	if n != 1 {
		t.Errorf("beanies = %d, want 1 (product a)", n)
	}
}

// Products the blind match scores alike come in id order, whatever
// order the index's segments hold them in: three identical invented
// products, indexed one a batch by two workers.
func TestBaselineTiesByID(t *testing.T) {
	var ps []catalog.Product
	for _, id := range []string{"c", "a", "d", "b"} {
		ps = append(ps, catalog.Product{ID: id, Title: "Scree beanie", ProductType: "beanie"})
	}
	dir := filepath.Join(t.TempDir(), "idx")
	if _, err := BuildProducts(context.Background(), ps, dir, BuildOptions{BatchSize: 1, Workers: 2}); err != nil {
		t.Fatal(err)
	}
	e, err := Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	defer e.Close()
	b, err := e.Baseline(context.Background(), MostWords, "scree beanie", 10)
	if err != nil {
		t.Fatal(err)
	}
	var got []string
	for _, h := range b.Hits {
		got = append(got, h.ID)
	}
	if !slices.Equal(got, []string{"a", "b", "c", "d"}) {
		t.Errorf("hits %v, want a b c d: equal scores, so id order", got)
	}
}

// Describe returns the facts stored for a product, read from the line of
// testdata/catalog/shop.jsonl for RJ-1 by hand, and an error naming an
// id the index lacks.
func TestDescribe(t *testing.T) {
	e := openShop(t)
	f, err := e.Describe(context.Background(), "RJ-1")
	if err != nil {
		t.Fatal(err)
	}
	if f.ProductType != "rain jacket" || f.Category != "apparel" || f.Colour != "harvest gold" || f.Brand != "korvane" ||
		!f.InStock || f.Lab == nil || f.Measures["length"] != 740 {
		t.Errorf("RJ-1 facts = %+v", f)
	}
	// WR-1's designation, by its system, as a query's spec clause names
	// it: an alternative to it must keep the gauge.
	if f, err := e.Describe(context.Background(), "WR-1"); err != nil || f.Spec["awg"] != "12 awg" {
		t.Errorf("WR-1 facts = %+v, %v; want spec awg 12 awg", f, err)
	}
	if _, err := e.Describe(context.Background(), "NO-SUCH"); err == nil || !strings.Contains(err.Error(), `"NO-SUCH"`) {
		t.Errorf("unknown id: err = %v", err)
	}
	// A palette entry is a document of the index but no product.
	if f, err := e.Describe(context.Background(), paletteIDPrefix+"harvest gold"); err == nil {
		t.Errorf("a palette entry described as %+v", f)
	}
}

func ptr[T any](v T) *T { return &v }

package rewrite

import (
	"context"
	"errors"
	"fmt"
	"math/rand"
	"reflect"
	"slices"
	"strings"
	"testing"
	"testing/quick"
	"time"

	"github.com/whittle-search/whittle/parser"
)

// ops writes an outcome's relaxations as "operator kind" pairs.
func ops(o *Outcome) []string {
	var out []string
	for _, r := range o.Relaxations {
		out = append(out, r.Operator+" "+string(r.Kind))
	}
	return out
}

// mustRescue rescues query on an in-memory engine over products.
func mustRescue(t *testing.T, products []product, query string) *Outcome {
	t.Helper()
	o, err := New(&memEngine{products: products}, nil).Rescue(context.Background(), query)
	if err != nil {
		t.Fatal(err)
	}
	return o
}

// The counts below follow from the invented shop in memengine_test.go.
func TestRescue(t *testing.T) {
	for _, tc := range []struct {
		name, query, reason string
		exact               bool
		count               int
		ops                 []string
		message             string
	}{
		{name: "exact", query: "womens rain jacket size m", reason: "two women's rain jackets come in m: nothing is relaxed",
			exact: true, count: 2},
		{name: "widen colour", query: "mustard rain jacket", reason: "harvest gold is within ΔE00 4 of mustard; no rain jacket is mustard by name",
			count: 1, ops: []string{"widen colour"}, message: "Showing rain jackets in colours close to mustard."},
		{name: "drop pattern", query: "striped rain jacket", reason: "no rain jacket is striped; pattern is soft in apparel",
			count: 4, ops: []string{"drop pattern"}, message: "Showing rain jackets in any pattern."},
		{name: "culprit is not the last word", query: "merino crew sweater oatmeal", reason: "the oatmeal sweater is wool: merino, the first word, goes, not the colour",
			count: 1, ops: []string{"drop material"}, message: "Showing sweaters in any material."},
		{name: "replace a typo", query: "sweter merino", reason: "sweter is one edit from sweater, a product type, so the query is read again as \"sweater merino\": SW-1 is the one merino sweater",
			count: 1, ops: []string{"replace product_type"}, message: "Showing sweaters, reading “sweter” as “sweater”."},
		{name: "replace a typo with the catalog's word", query: "glaciar rain jacket", reason: "glaciar is one edit from glacier, a colour only the catalog names",
			count: 1, ops: []string{"replace keyword"}, message: "rain jackets in glacier"},
		{name: "hard constraints at odds", query: "boys hiking boots size 15", reason: "no product is for boys, and nothing comes in 15: without any one of the three, the other two still find nothing",
			count: 0, message: "No results for “boys hiking boots size 15”. Nothing carried is all of boys, hiking boots and size 15."},
		{name: "type and its parent not carried", query: "mustard velvet cushion cover", reason: "a cushion cover widens to a cushion, and the shop has neither: no plan can find anything, so nothing is counted past that",
			count: 0, message: "No results for “mustard velvet cushion cover”. The shop carries no cushion covers."},
		{name: "type not carried", query: "coir doormat", reason: "the shop has no doormat, and a doormat has no broader type to widen to",
			count: 0, message: "No results for “coir doormat”. The shop carries no doormats."},
		{name: "widen product type", query: "chelsea boots", reason: "no chelsea boot; the hiking boot is a boot",
			count: 1, ops: []string{"widen product_type"}, message: "No exact match for “chelsea boots”. The shop carries no chelsea boots. Showing boots."},
		{name: "stretch price", query: "rain jacket under $50", reason: "the cheapest is 55.00; a 15% stretch reaches 57.50",
			count: 1, ops: []string{"widen price"}, message: "up to 57.50 USD"},
		{name: "widen measure", query: "5x8 rug", reason: "the rug is 5 by 7.5 ft: 8 ft widened by 10% holds 7.5",
			count: 1, ops: []string{"widen measure"}, message: "about 8 ft"},
		{name: "standard sizes", query: "2x4 12 ft", reason: "no 12 ft stud; lumber length widens to the standard sizes around it, 10 to 14 ft",
			count: 1, ops: []string{"widen measure"}, message: "nearest standard lengths"},
		{name: "hard stop on size", query: "trail running shoes size 13", reason: "size is hard: it is not relaxed, and the sizes carried are named",
			count: 0, message: "size 13 is not carried in trail running shoes; sizes carried: 7, 8, 9, 10, 11, 12."},
		{name: "hard stop in a type widened", query: "chelsea boots size 13", reason: "no chelsea boot is carried: the sizes named are of the boots the type widens to, HB-1's",
			count: 0, message: "size 13 is not carried in chelsea boots; sizes carried: 9, 10, 11."},
		{name: "hard stop on focal length", query: "85 lens", reason: "focal length is hard in camera",
			count: 0, message: "85 mm is not carried in lenses; focal lengths carried: 35 mm, 50 mm."},
		{name: "hard stop on wire gauge", query: "14 awg wire", reason: "a wire gauge is never substituted",
			count: 0, message: "14 awg is not carried in electrical wires; specs carried: 12 awg."},
		{name: "unavailable part number", query: "fn-3520", reason: "LN-2 is unavailable; LN-1 is an available lens, black like it and fitting jx-10",
			count: 1, message: "“fn-3520” is unavailable. Showing available lenses like it: near its colour, fitting jx-10."},
		{name: "nothing left to ask", query: "zorblax", reason: "dropping the only word would show the whole catalog, which rescues nothing",
			count: 0, message: "No results for “zorblax”."},
		{name: "colours offered as alternatives", query: "black or brown hiking boots", reason: "either colour will do: HB-1 is brown, an exact match, where asking for both found nothing",
			exact: true, count: 1},
		{name: "sizes offered as alternatives", query: "trail running shoes size 13 or 12", reason: "either size will do: TR-1 comes in 12; size is hard, yet no size is relaxed",
			exact: true, count: 1},
		{name: "gauges offered as alternatives", query: "12 or 14 awg wire", reason: "12 or 14 awg is either gauge, and WR-1 is 12 awg; read alone the 12 was a length",
			exact: true, count: 1},
		{name: "measures offered as alternatives", query: "50 or 85 mm lens", reason: "either focal length will do, and LN-1 is 50 mm; asked for both, none is both",
			exact: true, count: 1},
		{name: "alternative measures widened together", query: "2x4 7.5 or 11 ft", reason: "each length ±10%: 6.75..8.25 ft holds LB-1's 8 ft, 9.9..12.1 ft LB-2's 10 ft",
			count: 2, ops: []string{"widen measure"}, message: "about 7.5 ft or 11 ft"},
		{name: "hard stop on alternative measures", query: "85 or 135 mm lens", reason: "focal length is hard in camera, and neither is carried: the group is named as typed",
			count: 0, message: "85 or 135 mm is not carried in lenses; focal lengths carried: 35 mm, 50 mm."},
		{name: "models offered as alternatives", query: "lens for jx-20 or jx-10", reason: "either model will do: both lenses fit the jx-10, and LN-1 is available; jx-10 was a part number nothing has",
			exact: true, count: 2},
		{name: "alternative colours widened together", query: "mustard or saffron rain jacket", reason: "no rain jacket is either by name; harvest gold is within ΔE00 4 of mustard",
			count: 1, ops: []string{"widen colour"}, message: "Showing rain jackets in colours close to mustard or saffron."},
		{name: "alternative colours dropped together", query: "lavender or lilac rain jacket", reason: "no rain jacket is near either: the group is dropped as one colour",
			count: 4, ops: []string{"drop colour"}, message: "Showing rain jackets in any colour."},
		{name: "hard stop on alternative sizes", query: "trail running shoes size 13 or 14", reason: "neither size is carried: the group is named as typed",
			count: 0, message: "size 13 or 14 is not carried in trail running shoes; sizes carried: 7, 8, 9, 10, 11, 12."},
		{name: "one of two colours dropped", query: "black brown hiking boots", reason: "HB-1 is brown, not black too: black is dropped and brown kept, so the boots shown are in brown, not in any colour",
			count: 1, ops: []string{"drop colour"}, message: "Showing hiking boots in brown."},
		{name: "one of two styles dropped", query: "crew hooded sweater", reason: "both sweaters are crew, neither hooded: the style dropped is named, as \"in crew\" is no English",
			count: 2, ops: []string{"drop silhouette"}, message: "Showing sweaters without “hooded”."},
		{name: "two colours dropped", query: "navy lavender hiking boots", reason: "no hiking boot is near either colour: both are dropped, and the message says so once",
			count: 1, ops: []string{"drop colour", "drop colour"}, message: "Showing hiking boots in any colour."},
		{name: "drop an unknown word", query: "zorblax rain jacket", reason: "the unknown word is dropped; the product type stays: RJ-1 to RJ-4",
			count: 4, ops: []string{"drop keyword"}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			o := mustRescue(t, shop, tc.query)
			if o.Exact != tc.exact || o.Count != tc.count || !slices.Equal(ops(o), tc.ops) {
				t.Errorf("%s: exact=%v count=%d ops=%v; want exact=%v count=%d ops=%v\n%s", tc.reason, o.Exact, o.Count, ops(o), tc.exact, tc.count, tc.ops, o.Explanation)
			}
			if !strings.Contains(o.Message, tc.message) {
				t.Errorf("%s: message %q lacks %q", tc.reason, o.Message, tc.message)
			}
			if o.Exact && o.Message != "" {
				t.Errorf("an exact match needs no message, got %q", o.Message)
			}
		})
	}
}

// planIDs are the ids of the products the outcome's plan matches.
func planIDs(products []product, o *Outcome) []string {
	var ids []string
	for _, pr := range products {
		if matches(pr, o.Plan) {
			ids = append(ids, pr.ID)
		}
	}
	return ids
}

// A kids' product is made for boys and girls alike, and a product for
// one audience only: the products of this invented shop show which
// audiences a query finds.
func TestAudiences(t *testing.T) {
	pyjamas := []product{
		{ID: "PJ-1", Type: "pajamas", Audience: "kids"},
		{ID: "PJ-2", Type: "pajamas", Audience: "boys"},
		{ID: "PJ-3", Type: "pajamas", Audience: "girls"},
		{ID: "PJ-4", Type: "pajamas", Audience: "men"},
		{ID: "PJ-5", Type: "pajamas", Audience: "unisex"},
	}
	for _, tc := range []struct {
		query, reason string
		ids           []string
	}{
		{"boys pajamas", "kids' pajamas are for boys too", []string{"PJ-1", "PJ-2"}},
		{"girls pajamas", "and for girls", []string{"PJ-1", "PJ-3"}},
		{"kids pajamas", "boys' and girls' pajamas are kids' pajamas", []string{"PJ-1", "PJ-2", "PJ-3"}},
		{"mens pajamas", "a unisex product is filed apart on purpose, and is not a men's (lexicon.AudienceServes)", []string{"PJ-4"}},
		{"mens and girls pajamas", "two audiences are either: no product is made for both", []string{"PJ-1", "PJ-3", "PJ-4"}},
		{"-kids pajamas", "an exclusion is of the audience named only", []string{"PJ-2", "PJ-3", "PJ-4", "PJ-5"}},
		{"kids pajamas for men", "audiences apart are either too", []string{"PJ-1", "PJ-2", "PJ-3", "PJ-4"}},
	} {
		t.Run(tc.query, func(t *testing.T) {
			o := mustRescue(t, pyjamas, tc.query)
			if ids := planIDs(pyjamas, o); !o.Exact || !slices.Equal(ids, tc.ids) {
				t.Errorf("%s: exact=%v, the plan finds %v, want %v\n%s", tc.reason, o.Exact, ids, tc.ids, o.Explanation)
			}
		})
	}
}

// "fine thread" with a bare metric size asks for its fine pitches, any
// of them, never the coarse one the size alone means (ISO 261's pitches
// for M8: coarse 1.25, fine 0.75 and 1, threads_metric_iso261_262.tsv).
func TestFineThread(t *testing.T) {
	bolts := []product{
		{ID: "BT-1", Type: "bolt", Specs: map[string]string{"metric_thread": "m8x1.25"}},
		{ID: "BT-2", Type: "bolt", Specs: map[string]string{"metric_thread": "m8x1"}, Silhouette: "fine thread"},
		{ID: "BT-3", Type: "bolt", Specs: map[string]string{"metric_thread": "m8x0.75"}},
	}
	for _, tc := range []struct {
		query, reason string
		ids           []string
	}{
		{"m8 fine thread bolt", "BT-2 is fine and says so; BT-3 is fine too, found once the style is dropped", []string{"BT-2"}},
		{"m8 bolt", "a bare M8 is the coarse thread", []string{"BT-1"}},
		{"m8 bolt fine threads", "the fine pitches, whatever the words' order", []string{"BT-2"}},
		{"m8x1.25 fine thread bolt", "a pitch typed is kept as typed", []string{"BT-1"}},
	} {
		t.Run(tc.query, func(t *testing.T) {
			o := mustRescue(t, bolts, tc.query)
			if ids := planIDs(bolts, o); !slices.Equal(ids, tc.ids) {
				t.Errorf("%s: the plan finds %v, want %v\n%s", tc.reason, ids, tc.ids, o.Explanation)
			}
		})
	}
	// Without the style word in the catalog, the style is dropped and
	// both fine bolts are shown, the coarse one never.
	o := mustRescue(t, bolts[:1:1], "m8 fine thread bolt")
	if o.Count != 0 {
		t.Errorf("a shop of coarse M8 bolts only shows %d for a fine thread", o.Count)
	}
	// A diameter not carried is named as typed, with the unit inferred:
	// "3/8 in", not 0.375 in (a bolt's diameter is hard, policy.toml).
	if o := mustRescue(t, bolts, "bolt 3/8 x 2"); !strings.Contains(o.Message, "3/8 in is not carried in bolts") {
		t.Errorf("message %q\n%s", o.Message, o.Explanation)
	}
	some := []product{bolts[0], bolts[2]}
	o = mustRescue(t, some, "m8 fine thread bolt")
	if ids := planIDs(some, o); !slices.Equal(ids, []string{"BT-3"}) {
		t.Errorf("dropping the style shows %v, want BT-3\n%s", ids, o.Explanation)
	}
}

// The kind of product comes before an attribute: a colour the type
// lacks is dropped before the type is widened. A type the shop carries,
// widened because a hard size finds none of it, is not said to be
// missing; one it carries none of is.
func TestWidenedTypeMessage(t *testing.T) {
	ps := []product{{ID: "CB-1", Type: "chelsea boot", Colour: "black", Hex: "#000000", Sizes: []string{"9"}},
		{ID: "HB-1", Type: "hiking boot", Colour: "brown", Hex: "#a52a2a", Sizes: []string{"12"}}}
	for _, tc := range []struct {
		query, reason string
		products      []product
		ops           []string
		message       string
	}{
		{"brown chelsea boots", "CB-1 is a chelsea boot, black: the colour goes before the type", ps,
			[]string{"drop colour"}, "No exact match for “brown chelsea boots”. Showing chelsea boots in any colour."},
		{"chelsea boots size 12", "no chelsea boot comes in 12, and size is hard: the type widens, and the shop does carry chelsea boots", ps,
			[]string{"widen product_type"}, "No exact match for “chelsea boots size 12”. Showing boots."},
		{"brown chelsea boots", "a shop of no chelsea boots says so", ps[1:],
			[]string{"widen product_type"}, "No exact match for “brown chelsea boots”. The shop carries no chelsea boots. Showing boots."},
	} {
		o := mustRescue(t, tc.products, tc.query)
		if got := ops(o); !slices.Equal(got, tc.ops) || o.Message != tc.message {
			t.Errorf("%s: ops %v, message %q; want %v, %q\n%s", tc.reason, got, o.Message, tc.ops, tc.message, o.Explanation)
		}
	}
}

// A hard stop names what the type asked for carries, and only when it
// carries none, what the type it widens to carries: trail running shoes
// in 7 and 8 are named so, not the running shoes' 13 beside them.
func TestMissingNamesTheTypeAsked(t *testing.T) {
	ps := []product{{ID: "TR-1", Type: "trail running shoe", Sizes: []string{"7", "8"}}, {ID: "RS-1", Type: "running shoe", Sizes: []string{"13"}}}
	if o := mustRescue(t, ps, "trail running shoes size 14"); !strings.HasSuffix(o.Message, "sizes carried: 7, 8.") {
		t.Errorf("message %q\n%s", o.Message, o.Explanation)
	}
	if o := mustRescue(t, ps[1:], "trail running shoes size 14"); !strings.HasSuffix(o.Message, "sizes carried: 13.") {
		t.Errorf("with no trail running shoe: message %q\n%s", o.Message, o.Explanation)
	}
}

// A product type read as a modifier ("blanket" in "blanket sofa") is a
// word whittle knows, no typo: it is never "replaced" by the catalog's
// own "blanket", which would say "Showing sofas for “blanket”".
func TestModifierIsNoTypo(t *testing.T) {
	rw := New(&memEngine{products: []product{{ID: "BL-1", Type: "blanket"}, {ID: "SF-1", Type: "sofa"}}}, nil)
	r := parser.Parse("blanket sofa")
	for _, it := range rw.ladders(context.Background(), r, rw.policy.Apply(r, rw.lex)) {
		for _, l := range it.levels {
			if l.relax != nil && l.relax.Operator == OpReplace {
				t.Errorf("%q is replaced: %s", it.c.Text, l.relax.Detail)
			}
		}
	}
}

// A run of shoe sizes ("size 7-8") finds a product labelled with the run
// and one in any whole or half size in it; a size outside it is no
// answer, as size is hard.
func TestShoeSizeRun(t *testing.T) {
	ps := []product{{ID: "SL-1", Type: "slipper", Sizes: []string{"7-8"}}, {ID: "SL-2", Type: "slipper", Sizes: []string{"7.5"}},
		{ID: "SL-3", Type: "slipper", Sizes: []string{"9"}}}
	o := mustRescue(t, ps, "slippers size 7-8")
	if ids := planIDs(ps, o); !o.Exact || !slices.Equal(ids, []string{"SL-1", "SL-2"}) {
		t.Errorf("the plan finds %v, exact %v\n%s", ids, o.Exact, o.Explanation)
	}
}

// A flotation tyre size is a designation, hard, found by its size
// alone as a metric one is; a tyre of the next size is no answer.
func TestFlotationTyre(t *testing.T) {
	tyres := []product{
		{ID: "TY-1", Type: "all-terrain tyre", Specs: map[string]string{"tyre": "33x12.50r20 114q"}},
		{ID: "TY-2", Type: "all-terrain tyre", Specs: map[string]string{"tyre": "35x12.50r20 121q"}},
	}
	for _, tc := range []struct {
		query, reason string
		count         int
	}{
		{"33x12.50r20 all terrain tires", "TY-1 is that size, listed with its service description", 1},
		{"tire 34x12.50r20", "no tyre is 34 in across, and 33 or 35 is not swapped in", 0},
	} {
		o := mustRescue(t, tyres, tc.query)
		if ids := planIDs(tyres, o); o.Count != tc.count || len(ids) != tc.count {
			t.Errorf("%s: %q found %d (%v), want %d\n%s", tc.reason, tc.query, o.Count, ids, tc.count, o.Explanation)
		}
	}
}

func TestBudgetAndDeadline(t *testing.T) {
	// A budget of 2 counts: the exact query and the hard constraints
	// alone. Those are all the search can count, so what every plan
	// asks, which finds something, is the plan, and the note says why.
	o, err := New(&memEngine{products: shop}, nil, WithBudget(2)).Rescue(context.Background(), "merino crew sweater oatmeal")
	if err != nil {
		t.Fatal(err)
	}
	if len(o.Steps) != 2 || !strings.Contains(o.Note, "within 2 engine counts") || o.Count == 0 || o.Count != o.Steps[1].Count {
		t.Errorf("budget: %d steps, %d found, note %q\n%s", len(o.Steps), o.Count, o.Note, o.Explanation)
	}
	// A deadline that has passed stops the search; the best plan so far
	// (here the exact one) comes back with a note.
	slow := &memEngine{products: shop, delay: func(ctx context.Context) error {
		select {
		case <-ctx.Done():
			return ctx.Err()
		case <-time.After(time.Millisecond):
			return nil
		}
	}}
	ctx, cancel := context.WithCancel(context.Background())
	cancel()
	if _, err := New(slow, nil).Rescue(ctx, "merino crew sweater oatmeal"); !errors.Is(err, context.Canceled) {
		// Not even the exact query could be counted: there is nothing to show.
		t.Errorf("a cancelled context gave %v, want context.Canceled", err)
	}
	ctx2, cancel2 := context.WithCancel(context.Background())
	calls := 0
	slow.delay = func(context.Context) error {
		calls++
		if calls == 3 {
			cancel2()
		}
		return nil
	}
	o, err = New(slow, nil).Rescue(ctx2, "merino crew sweater oatmeal")
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(o.Note, "deadline") {
		t.Errorf("deadline: note %q", o.Note)
	}
	cancel2()
}

// countingEngine wraps memEngine to check the planner never counts a
// plan twice.
func TestNoPlanCountedTwice(t *testing.T) {
	for _, q := range []string{"merino crew sweater oatmeal", "striped mustard rain jacket size m", "zorblax sweter"} {
		eng := &memEngine{products: shop}
		if _, err := New(eng, nil).Rescue(context.Background(), q); err != nil {
			t.Fatal(err)
		}
		seen := map[string]bool{}
		for _, k := range eng.counted {
			if seen[k] {
				t.Errorf("%q: plan %s counted twice", q, k)
			}
			seen[k] = true
		}
	}
}

// queryGen makes random queries from the shop's vocabulary, hard and
// soft words alike.
type queryGen string

func (queryGen) Generate(r *rand.Rand, _ int) reflect.Value {
	words := []string{"rain jacket", "sweater", "trail running shoes", "lens", "rug", "mustard", "charcoal", "oatmeal",
		"striped", "merino", "wool", "crew", "size m", "size 13", "size l", "womens", "mens", "under $60", "85", "50",
		"zorblax", "sweter", "for jx-10", "not black", "chelsea boots"}
	n := 1 + r.Intn(5)
	var parts []string
	for i := 0; i < n; i++ {
		parts = append(parts, words[r.Intn(len(words))])
	}
	return reflect.ValueOf(queryGen(strings.Join(parts, " ")))
}

// Properties over random queries: a hard constraint is never relaxed and
// always stays in the final plan; the same input gives the same outcome;
// when the whole lattice of relaxations fits in the budget and some plan
// in it reaches the minimum, the planner's plan does too.
func TestRescueProperties(t *testing.T) {
	check := func(q queryGen) bool {
		eng := &memEngine{products: shop}
		rw := New(eng, nil)
		o, err := rw.Rescue(context.Background(), string(q))
		if err != nil {
			t.Logf("%q: %v", q, err)
			return false
		}
		for _, r := range o.Relaxations {
			if o.Parsed.Constraints[r.Constraint].Strictness == parser.Hard {
				t.Logf("%q: relaxed hard %s", q, r.Text)
				return false
			}
		}
		for i, c := range o.Parsed.Constraints {
			if c.Strictness != parser.Hard {
				continue
			}
			// An alternative is kept by its group's clause, which comes
			// from the first of the group.
			found := false
			for _, cl := range o.Plan.Clauses {
				found = found || cl.From == o.Parsed.Alternatives(i)[0]
			}
			if !found {
				t.Logf("%q: hard %s missing from the plan", q, c.Text)
				return false
			}
		}
		o2, _ := New(&memEngine{products: shop}, nil).Rescue(context.Background(), string(q))
		if o2.Message != o.Message || o2.Count != o.Count || fmt.Sprint(ops(o2)) != fmt.Sprint(ops(o)) {
			t.Logf("%q: not deterministic", q)
			return false
		}
		// Reading the query again with a misspelt product type fixed
		// keeps every hard constraint of the query as typed hard, at
		// the same span.
		typed := parser.Parse(string(q))
		rw.policy.Apply(typed, rw.lex)
		for _, c := range typed.Constraints {
			if c.Strictness == parser.Hard && !slices.ContainsFunc(o.Parsed.Constraints, func(d parser.Constraint) bool {
				return d.Start == c.Start && d.End == c.End && d.Strictness == parser.Hard && d.Excluded == c.Excluded
			}) {
				t.Logf("%q: read again as %q, hard %q was lost", q, o.Corrected, c.Text)
				return false
			}
		}
		// Brute force over the whole lattice of the reading the planner
		// planned from, when it is small.
		r := parser.Parse(string(q))
		counted := 2 // the query as typed, the hard constraints alone
		if o.Corrected != "" {
			r = &parser.Result{Query: o.Parsed.Query, Category: o.Parsed.Category, Constraints: slices.Clone(o.Parsed.Constraints)}
			counted++ // the query as read again
		}
		e := rw.policy.Apply(r, rw.lex)
		items := rw.ladders(context.Background(), r, e)
		total := 1
		for _, it := range items {
			total *= len(it.levels)
		}
		if total+len(items)+counted <= DefaultBudget && len(o.Missing) == 0 && o.Note == "" {
			s := &search{rw: rw, ctx: context.Background(), out: &Outcome{Parsed: r}, seen: map[string]int{}, budget: 1 << 20, items: items}
			any := false
			var walk func(i int, st []int)
			walk = func(i int, st []int) {
				if i == len(items) {
					// A plan that keeps nothing asked for is no rescue.
					if n, _ := s.count(st); n >= e.MinResults && !s.keepsNothing(st) {
						any = true
					}
					return
				}
				for l := range items[i].levels {
					walk(i+1, append(st, l))
				}
			}
			walk(0, nil)
			if any && o.Count < e.MinResults {
				t.Logf("%q: a plan reaches %d but the planner found %d", q, e.MinResults, o.Count)
				return false
			}
		}
		return true
	}
	if err := quick.Check(check, &quick.Config{MaxCount: 300, Rand: rand.New(rand.NewSource(7))}); err != nil {
		t.Error(err)
	}
}

// blind is the usual fallback: keep N of the M constraints, N stepping
// down, the first N in query order that find anything.
func blind(eng Engine, r *parser.Result) (kept []parser.Constraint, n int) {
	rw := New(eng, nil)
	var cs []parser.Constraint
	for _, c := range r.Constraints {
		if c.Kind != parser.KindFiller {
			cs = append(cs, c)
		}
	}
	for size := len(cs); size > 0; size-- {
		var best []parser.Constraint
		combos(len(cs), size, func(idx []int) bool {
			var p Plan
			var pick []parser.Constraint
			for _, i := range idx {
				p.Clauses = append(p.Clauses, rw.exactClause(i, cs[i]))
				pick = append(pick, cs[i])
			}
			if k, _ := eng.Count(context.Background(), p); k > 0 {
				best, n = pick, k
				return false
			}
			return true
		})
		if best != nil {
			return best, n
		}
	}
	return nil, 0
}

func combos(n, k int, f func([]int) bool) {
	idx := make([]int, k)
	var rec func(start, d int) bool
	rec = func(start, d int) bool {
		if d == k {
			return f(idx)
		}
		for i := start; i < n; i++ {
			idx[d] = i
			if !rec(i+1, d+1) {
				return false
			}
		}
		return true
	}
	rec(0, 0)
}

// whittle keeps every hard constraint where the blind fallback loses
// some: the blind fallback shows shoes of the wrong size, whittle says the
// size is not carried.
func TestAgainstBlindFallback(t *testing.T) {
	for _, q := range []string{"trail running shoes size 13 black", "85 lens for jx-10", "14 awg wire red"} {
		eng := &memEngine{products: shop}
		r := parser.Parse(q)
		DefaultPolicy().Apply(r, New(eng, nil).lex)
		kept, bn := blind(eng, r)
		o, err := New(eng, nil).Rescue(context.Background(), q)
		if err != nil {
			t.Fatal(err)
		}
		var lost []string
		for _, c := range r.Constraints {
			if c.Strictness == parser.Hard && !slices.ContainsFunc(kept, func(k parser.Constraint) bool { return k.Start == c.Start }) {
				lost = append(lost, c.Text)
			}
		}
		t.Logf("%q\n  blind fallback: keeps %d constraints, %d results, loses hard %q\n  whittle: %d results; %s", q, len(kept), bn, lost, o.Count, o.Message)
		if len(lost) == 0 {
			t.Errorf("%q: the blind fallback was expected to lose a hard constraint", q)
		}
		for _, rl := range o.Relaxations {
			if r.Constraints[rl.Constraint].Strictness == parser.Hard {
				t.Errorf("%q: whittle relaxed hard %q", q, rl.Text)
			}
		}
	}
}

// A Rewriter is safe for concurrent use: rescues from many goroutines give
// what one goroutine gets.
func TestRescueConcurrently(t *testing.T) {
	queries := []string{"mustard rain jacket", "striped rain jacket", "sweter merino", "85 lens", "chelsea boots", "2x4 12 ft", "zorblax"}
	rw := New(&memEngine{products: shop}, nil)
	want := make([]string, len(queries))
	for i, q := range queries {
		o, err := rw.Rescue(context.Background(), q)
		if err != nil {
			t.Fatal(err)
		}
		want[i] = o.Message
	}
	done := make(chan string, 16)
	for g := 0; g < 16; g++ {
		go func(g int) {
			for i := range queries {
				j := (i + g) % len(queries)
				o, err := rw.Rescue(context.Background(), queries[j])
				if err != nil || o.Message != want[j] {
					done <- fmt.Sprintf("%q: %v %q", queries[j], err, o.Message)
					return
				}
			}
			done <- ""
		}(g)
	}
	for g := 0; g < 16; g++ {
		if msg := <-done; msg != "" {
			t.Error(msg)
		}
	}
}

// When every match is unavailable, the alternatives keep the query's
// hard constraints: a size the shopper needs is not swapped for another
// that happens to be in stock.
func TestAlternativesKeepHardConstraints(t *testing.T) {
	skirts := []product{
		{ID: "SK-1", Type: "skirt", Colour: "black", Hex: "#000000", Pattern: "solid", Sizes: []string{"xl"}, Gone: true},
		{ID: "SK-2", Type: "skirt", Colour: "black", Hex: "#000000", Pattern: "solid", Sizes: []string{"s", "m"}},
		{ID: "SK-3", Type: "skirt", Colour: "black", Hex: "#000000", Pattern: "solid", Sizes: []string{"m", "xl"}},
	}
	for _, tc := range []struct {
		name, reason string
		products     []product
		want         []string
	}{
		{name: "no available product in the size", products: skirts[:2],
			reason: "SK-1, the one xl skirt, is gone; SK-2 is in stock but has no xl, so it is no alternative and SK-1 is shown as it is",
			want:   []string{"SK-1"}},
		{name: "an available product in the size", products: skirts,
			reason: "SK-3 has xl: dropping the pattern already finds SK-1 and SK-3, one of them available, so no alternative is needed",
			want:   []string{"SK-1", "SK-3"}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			eng := &memEngine{products: tc.products}
			o, err := New(eng, nil).Rescue(context.Background(), "striped skirt size xl")
			if err != nil {
				t.Fatal(err)
			}
			got := hitIDs(t, eng, o.Plan)
			if !slices.Equal(got, tc.want) {
				t.Errorf("%s: hits %v, want %v\n%s", tc.reason, got, tc.want, o.Explanation)
			}
		})
	}
}

// The alternatives to an unavailable product keep what a substitute for
// could hurt someone, exactly, even when the query named only the part:
// its rating (a breaker's current; common practice, and the reason
// electrical codes name the rating), its designation (a tyre's size,
// ISO 4000-1), its fit (a bolt's diameter). A neighbour of another
// rating or size is no alternative; a twin in stock is. The shop is
// invented.
func TestAlternativesKeepWhatCouldHurt(t *testing.T) {
	gone := []product{
		{ID: "CB-20", Type: "circuit breaker", Colour: "black", Hex: "#000000", Measures: map[string]float64{"current": 20}, Part: "cb-2020", Gone: true},
		{ID: "TY-A", Type: "tyre", Colour: "black", Hex: "#000000", Specs: map[string]string{"tyre": "205/55r16"}, Part: "ty-5516", Gone: true},
		{ID: "HB-8", Type: "hex bolt", Colour: "grey", Hex: "#808080", Measures: map[string]float64{"diameter": 8, "length": 40}, Part: "hb-0840", Gone: true},
	}
	neighbours := []product{
		{ID: "CB-15", Type: "circuit breaker", Colour: "black", Hex: "#000000", Measures: map[string]float64{"current": 15}},
		{ID: "CB-25", Type: "circuit breaker", Colour: "black", Hex: "#000000", Measures: map[string]float64{"current": 21}},
		{ID: "TY-B", Type: "tyre", Colour: "black", Hex: "#000000", Specs: map[string]string{"tyre": "215/55r16"}},
		{ID: "HB-9", Type: "hex bolt", Colour: "grey", Hex: "#808080", Measures: map[string]float64{"diameter": 8.5, "length": 40}},
	}
	twins := []product{
		{ID: "CB-20B", Type: "circuit breaker", Colour: "white", Hex: "#ffffff", Measures: map[string]float64{"current": 20}},
		{ID: "TY-C", Type: "tyre", Colour: "black", Hex: "#000000", Specs: map[string]string{"tyre": "205/55r16"}},
		{ID: "HB-8B", Type: "hex bolt", Colour: "grey", Hex: "#808080", Measures: map[string]float64{"diameter": 8, "length": 50}},
	}
	for _, tc := range []struct {
		part, reason string
		twin         string
	}{
		{"cb-2020", "a 15 A or a 21 A breaker for a 20 A one could fail to protect the circuit", "CB-20B"},
		{"ty-5516", "a 215/55R16 tyre is another size", "TY-C"},
		{"hb-0840", "an 8.5 mm bolt does not fit an M8 hole; a longer M8 bolt does", "HB-8B"},
	} {
		t.Run(tc.part, func(t *testing.T) {
			for _, shop := range []struct {
				name     string
				products []product
				want     string
			}{{"neighbours only", append(slices.Clone(gone), neighbours...), ""}, {"a twin in stock", append(append(slices.Clone(gone), neighbours...), twins...), tc.twin}} {
				eng := &memEngine{products: shop.products}
				o, err := New(eng, nil).Rescue(context.Background(), tc.part)
				if err != nil {
					t.Fatal(err)
				}
				got := hitIDs(t, eng, o.Plan)
				switch {
				case shop.want == "" && len(o.Unavailable) > 0:
					t.Errorf("%s, %s: shows %v as like it", shop.name, tc.reason, got)
				case shop.want != "" && !slices.Equal(got, []string{shop.want}):
					t.Errorf("%s: shows %v, want the twin %s\n%s", shop.name, got, shop.want, o.Explanation)
				}
			}
		})
	}
}

// The budget and the deadline hold for the heaviest queries the parser
// lets through: 64 constraints (its limit), 1,024 bytes (its limit),
// every constraint relaxable. However large the lattice, a rescue asks
// the engine for at most its budget of counts, and a deadline reached
// part way stops it with the best plan so far.
func TestLimitsUnderHeavyQueries(t *testing.T) {
	words := []string{"red", "striped", "merino", "crew", "sweater", "oatmeal", "charcoal", "wool", "nylon", "rain", "jacket", "zorblax"}
	var b strings.Builder
	for i := 0; b.Len() < parser.MaxQueryBytes-10; i++ {
		b.WriteString(words[i%len(words)] + " ")
	}
	heavy := []string{
		strings.TrimSpace(b.String()),
		strings.TrimSpace(strings.Repeat("-red ", 200)),
		strings.TrimSpace(strings.Repeat("q ", 500)),
	}
	for _, q := range heavy {
		r := parser.Parse(q)
		if len(r.Constraints) > parser.MaxConstraints {
			t.Fatalf("%.30q: %d constraints past the parser's limit", q, len(r.Constraints))
		}
		for _, budget := range []int{1, 5, DefaultBudget} {
			eng := &memEngine{products: shop}
			o, err := New(eng, nil, WithBudget(budget)).Rescue(context.Background(), q)
			if err != nil {
				t.Fatalf("%.30q, budget %d: %v", q, budget, err)
			}
			if n := len(eng.counted); n > budget {
				t.Errorf("%.30q: %d counts for a budget of %d", q, n, budget)
			}
			if len(o.Steps) > budget {
				t.Errorf("%.30q: %d steps for a budget of %d", q, len(o.Steps), budget)
			}
		}
		ctx, cancel := context.WithCancel(context.Background())
		calls := 0
		eng := &memEngine{products: shop, delay: func(context.Context) error {
			if calls++; calls == 2 {
				cancel()
			}
			return nil
		}}
		o, err := New(eng, nil).Rescue(ctx, q)
		cancel()
		if err != nil && !errors.Is(err, context.Canceled) {
			t.Fatalf("%.30q, deadline: %v", q, err)
		}
		if err == nil && !strings.Contains(o.Note, "deadline") && len(o.Steps) > 2 {
			t.Errorf("%.30q: %d steps after the deadline, note %q", q, len(o.Steps), o.Note)
		}
	}
}

// A measure widened to a range keeps the amount asked as Near, inside
// the range, for an engine to list the nearest first; it does not change
// what the plan matches.
func TestWidenedMeasureKeepsTheAmount(t *testing.T) {
	for _, tc := range []struct{ query, reason string }{
		{"5x8 rug", "8 ft widened by 10%"},
		{"2x4 12 ft", "12 ft widened to the standard lengths around it"},
	} {
		o := mustRescue(t, shop, tc.query)
		found := false
		for _, cl := range o.Plan.Clauses {
			if cl.Field != "measure" || cl.Min == nil || cl.Max == nil || *cl.Min == *cl.Max {
				continue
			}
			found = true
			asked := o.Parsed.Constraints[cl.From].Measure.BaseAmount
			if cl.Near == nil || asked == nil || *cl.Near != *asked || *cl.Near < *cl.Min || *cl.Near > *cl.Max {
				t.Errorf("%s (%q): clause %+v, near %v, want the amount asked %v within the range", tc.reason, tc.query, cl, cl.Near, asked)
			}
		}
		if !found {
			t.Errorf("%q: no widened measure in %+v", tc.query, o.Plan)
		}
	}
}

// A rating is never widened: a 15 A breaker is no answer to "20 amp
// breaker", a 10 A fuse none to "2 amp fuse" (a fuse rated above the
// circuit's current fails to protect it; common practice, and the
// reason electrical codes name the rating), and an 18 gauge sheet none
// to "16 gauge sheet metal" (a gauge number names a thickness that its
// trade's table fixes). The shop below carries only
// the neighbours of what each query asks for, so every rescue must keep
// the measure exactly as asked and find nothing.
func TestRatingsAreNeverWidened(t *testing.T) {
	lbToKg := 0.45359237 // the international pound, by definition (1959 agreement)
	ratings := []product{
		{ID: "CB-15", Type: "circuit breaker", Measures: map[string]float64{"current": 15}},
		{ID: "CB-30", Type: "circuit breaker", Measures: map[string]float64{"current": 30}},
		{ID: "FU-10", Type: "fuse", Measures: map[string]float64{"current": 10}},
		{ID: "BT-6", Type: "battery", Measures: map[string]float64{"voltage": 6}},
		{ID: "BT-24", Type: "battery", Measures: map[string]float64{"voltage": 24}},
		{ID: "LD-225", Type: "step ladder", Measures: map[string]float64{"load_rating": 225 * lbToKg * 1000, "height": 1828.8}},
		{ID: "RS-500", Type: "ratchet strap", Measures: map[string]float64{"load_rating": 500 * lbToKg * 1000}},
		{ID: "HB-5", Type: "hex bolt", Measures: map[string]float64{"diameter": 7.9375}},
		{ID: "LC-55", Type: "lens cap", Measures: map[string]float64{"diameter": 55}},
		{ID: "TY-17", Type: "tyre", Measures: map[string]float64{"rim_diameter": 431.8}},
		{ID: "BU-100", Type: "led bulb", Measures: map[string]float64{"power": 100}},
		{ID: "SM-18", Type: "sheet metal", Measures: map[string]float64{"gauge": 18}},
		{ID: "ER-18", Type: "earrings", Measures: map[string]float64{"gauge": 18}},
	}
	for _, tc := range []struct{ query, dimension string }{
		{"20 amp breaker", "current"},
		{"2 amp fuse", "current"},
		{"12v battery", "voltage"},
		{"step ladder 300 lb", "load_rating"},
		{"ratchet strap 1000 lb", "load_rating"},
		{"8mm hex bolt", "diameter"},
		{"52mm lens cap", "diameter"},
		{"16 inch tyre", "rim_diameter"},
		{"60w led bulb", "power"},
		{"16 gauge sheet metal", "gauge"},
		{"20 gauge earrings", "gauge"},
	} {
		t.Run(tc.query, func(t *testing.T) {
			o := mustRescue(t, ratings, tc.query)
			ms := o.Parsed.Of(parser.KindMeasure)
			if len(ms) != 1 || ms[0].Measure.Dimension != tc.dimension {
				t.Fatalf("read as %+v, want one %s measure", o.Parsed.Constraints, tc.dimension)
			}
			for _, r := range o.Relaxations {
				if r.Kind == parser.KindMeasure {
					t.Errorf("the rating was relaxed: %+v", r)
				}
			}
			if o.Count != 0 || len(o.Missing) == 0 {
				t.Errorf("found %d with missing %+v; want nothing, the rating named as missing\n%s", o.Count, o.Missing, o.Explanation)
			}
		})
	}
}

// With min_results above 1, a query can find some products as typed and
// still too few. The shopper is told how many it found, not that it
// found nothing, and the head product type stays in the plan: the hard
// constraints alone finding too few is no reason to show every product
// in size xl. The counts follow from the invented shop in
// memengine_test.go.
func TestFewerThanMinResults(t *testing.T) {
	three := 3
	rw := New(&memEngine{products: shop}, nil).Tuned(Tuning{MinResults: &three})
	for _, tc := range []struct {
		query, reason, message string
		count                  int
	}{
		{"rain jacket size xl", "RJ-3 and RJ-4 are the rain jackets in xl, and size is hard: nothing can be added",
			"Only 2 exact matches for “rain jacket size xl”.", 2},
		{"nylon rain jacket size m", "RJ-1 and RJ-2 are nylon in m; no other rain jacket comes in m",
			"Only 2 exact matches for “nylon rain jacket size m”.", 2},
	} {
		t.Run(tc.query, func(t *testing.T) {
			o, err := rw.Rescue(context.Background(), tc.query)
			if err != nil {
				t.Fatal(err)
			}
			if o.Exact || o.Count != tc.count || !strings.HasPrefix(o.Message, tc.message) {
				t.Errorf("%s: exact=%v count=%d message %q; want %d, a message beginning %q\n%s", tc.reason, o.Exact, o.Count, o.Message, tc.count, tc.message, o.Explanation)
			}
			hits, err := rw.engine.Search(context.Background(), o.Plan, 10)
			if err != nil {
				t.Fatal(err)
			}
			for _, h := range hits {
				if !strings.HasPrefix(h.ID, "RJ-") {
					t.Errorf("%s: shows %s, which is no rain jacket", tc.reason, h.ID)
				}
			}
		})
	}
}

// hitIDs are the ids of the first ten products eng finds for p.
func hitIDs(t *testing.T, eng Engine, p Plan) []string {
	t.Helper()
	hits, err := eng.Search(context.Background(), p, 10)
	if err != nil {
		t.Fatal(err)
	}
	var ids []string
	for _, h := range hits {
		ids = append(ids, h.ID)
	}
	return ids
}

// A colour misspelt is read as the colour and, when the catalog has
// none of that name, widened to the catalog colours near it, as a colour
// typed right is, or dropped as one: "burgandy" is one edit from
// burgundy (#800020 in the lexicon, from memory), and the shop's merlot
// (#82001f, invented) is within ΔE00 1 of it, far inside apparel's
// tolerance of 4; its navy is not. The shop is invented.
func TestColourTypoIsWidened(t *testing.T) {
	dresses := []product{
		{ID: "DR-1", Type: "dress", Colour: "merlot", Hex: "#82001f"},
		{ID: "DR-2", Type: "dress", Colour: "navy", Hex: "#000080"},
	}
	o := mustRescue(t, dresses, "burgandy dress")
	if got := hitIDs(t, &memEngine{products: dresses}, o.Plan); !slices.Equal(got, []string{"DR-1"}) {
		t.Errorf("hits %v, want DR-1 alone\n%s", got, o.Explanation)
	}
	if want := "Showing dresses in colours close to burgundy."; !strings.HasSuffix(o.Message, want) {
		t.Errorf("message %q, want it to end %q", o.Message, want)
	}
	// With no colour near burgundy, the misspelt colour is dropped, and
	// said to be dropped as a colour is.
	o = mustRescue(t, dresses[1:], "burgandy dress")
	if want := "Showing dresses in any colour."; o.Count != 1 || !strings.HasSuffix(o.Message, want) {
		t.Errorf("count %d, message %q, want 1 and a message ending %q\n%s", o.Count, o.Message, want, o.Explanation)
	}
}

// The evidence that orders the search is each constraint counted with
// what every plan asks, the hard constraints and the head product type
// at its broadest, not on its own in the whole shop: 30 in is common in
// the shop (seven rugs are 30 in long) but no table is, so it is the
// first suspect, and a tight budget is spent on it rather than on the
// rarer words around it: the first plan relaxed relaxes it. The shop is
// invented.
func TestEvidenceWithWhatEveryPlanAsks(t *testing.T) {
	shop := []product{{ID: "DT-1", Type: "dining table", Material: "oak", Silhouette: "extendable", Measures: map[string]float64{"length": 1828.8}}}
	for i := range 7 {
		shop = append(shop, product{ID: fmt.Sprintf("RG-%d", i), Type: "rug", Measures: map[string]float64{"length": 762}})
	}
	o, err := New(&memEngine{products: shop}, nil, WithBudget(12)).Rescue(context.Background(), "30 in extendable oak dining table")
	if err != nil {
		t.Fatal(err)
	}
	if got := hitIDs(t, &memEngine{products: shop}, o.Plan); !slices.Equal(got, []string{"DT-1"}) {
		t.Errorf("hits %v, want DT-1 within 12 counts\n%s", got, o.Explanation)
	}
	for _, st := range o.Steps {
		if len(st.Relaxations) == 0 {
			continue
		}
		if st.Relaxations[0].Text != "30 in" {
			t.Errorf("the first plan relaxed %q, want the suspect 30 in first\n%s", st.Relaxations[0].Text, o.Explanation)
		}
		break
	}
}

// A typo read as a colour puts a colour in the plan, so the colour
// dropped beside it is not announced as "in any colour": "olve" is one
// edit from olive (CSS Color 4), and the shop's one jacket is olive, not
// green. The shop is invented.
func TestColourTypoBesideADroppedColour(t *testing.T) {
	shop := []product{{ID: "JK-1", Type: "jacket", Colour: "olive", Hex: "#808000"}}
	o := mustRescue(t, shop, "olve green jacket")
	if want := "Showing jackets in olive."; !strings.HasSuffix(o.Message, want) {
		t.Errorf("message %q, want it to end %q\n%s", o.Message, want, o.Explanation)
	}
}

// A query whose constraints each find something among the products of
// its kind, but not together, can need more counts than the budget to
// reach its cheapest plan: the shop has no throw pillow covers, only
// cushions, six of them 18 by 18 in and not mustard, one mustard and 20
// by 20 in, none velvet. The search then builds a plan up from what
// every plan asks (cushions) rather than show nothing, and spends no
// count on a plan that keeps the cover exact, since the cover alone
// finds nothing. The shop is invented.
func TestBuildUpWhenTheBudgetRunsShort(t *testing.T) {
	in := func(x float64) float64 { return x * 25.4 }
	var shop []product
	for i, c := range []struct{ name, hex string }{{"navy", "#000080"}, {"ivory", "#fffff0"}, {"teal", "#008080"}, {"plum", "#8e4585"}, {"slate", "#708090"}, {"rose", "#ff007f"}} {
		shop = append(shop, product{ID: fmt.Sprintf("CU-%d", i), Type: "cushion", Colour: c.name, Hex: c.hex, Material: "linen",
			Measures: map[string]float64{"width": in(18), "height": in(18)}})
	}
	shop = append(shop, product{ID: "CU-M", Type: "cushion", Colour: "mustard", Hex: "#e1ad01", Material: "wool",
		Measures: map[string]float64{"width": in(20), "height": in(20)}})
	o, err := New(&memEngine{products: shop}, nil).Rescue(context.Background(), "velvet throw pillow cover 18x18 mustard")
	if err != nil {
		t.Fatal(err)
	}
	if o.Count == 0 || len(hitIDs(t, &memEngine{products: shop}, o.Plan)) == 0 {
		t.Errorf("found nothing within the default budget\n%s", o.Explanation)
	}
	for _, st := range o.Steps {
		if len(st.Relaxations) > 0 && !slices.ContainsFunc(st.Relaxations, func(r Relaxation) bool { return r.Kind == parser.KindProductType }) {
			t.Errorf("counted %q, which keeps the cover that finds nothing\n%s", st.Label, o.Explanation)
		}
	}
	// Every plan the search holds finds at least one product, so the
	// plan comes back whatever budget is left for building it up.
	for _, budget := range []int{2, 8, 12} {
		o, err := New(&memEngine{products: shop}, nil, WithBudget(budget)).Rescue(context.Background(), "velvet throw pillow cover 18x18 mustard")
		if err != nil {
			t.Fatal(err)
		}
		if o.Count == 0 {
			t.Errorf("budget %d: found nothing\n%s", budget, o.Explanation)
		}
	}
}

// A count is said as a count: "with the nearest number of seats
// carried", "with any number of drawers", not "in any seats". A count
// widened by a tolerance that holds no other whole number (5 seats ±
// 10%) would match what it matched, so it is not counted. The shop is
// invented.
func TestCountPhrases(t *testing.T) {
	shop := []product{
		{ID: "SF-4", Type: "sofa", Measures: map[string]float64{"seats": 4}},
		{ID: "SF-6", Type: "sofa", Measures: map[string]float64{"seats": 6}},
		{ID: "DR-1", Type: "dresser"},
	}
	for _, tc := range []struct{ query, want string }{
		{"sofa 5 seater", "Showing sofas with the nearest number of seats carried."},
		{"dresser 7 drawer", "Showing dressers with any number of drawers."},
	} {
		o := mustRescue(t, shop, tc.query)
		if !strings.HasSuffix(o.Message, tc.want) {
			t.Errorf("%q: message %q, want it to end %q\n%s", tc.query, o.Message, tc.want, o.Explanation)
		}
		for _, st := range o.Steps {
			for _, r := range st.Relaxations {
				if strings.HasPrefix(r.Detail, "to ±") {
					t.Errorf("%q: counted %q, a tolerance that holds no other count", tc.query, r.Detail)
				}
			}
		}
	}
	if got := countPhrase("pack_size", "about 24"); got != "in packs of about 24" {
		t.Errorf("pack size: %q", got)
	}
}

// A belt's size is firm in the built-in policy, since belts are often
// adjustable and many shops list no belt sizes (common practice): "leather
// belt 34" in a shop whose belts list none shows its belts "in any size",
// not nothing. The shop is invented.
func TestBeltSizeIsDropped(t *testing.T) {
	shop := []product{{ID: "BT-1", Type: "belt", Material: "leather"}}
	o := mustRescue(t, shop, "leather belt 34")
	if want := "Showing belts in any size."; !strings.HasSuffix(o.Message, want) || o.Count != 1 {
		t.Errorf("message %q (%d found), want it to end %q\n%s", o.Message, o.Count, want, o.Explanation)
	}
}

// Widening the product type to its parent costs a little more than
// widening an attribute: for "counter stool 28in" a counter stool of 26
// in (within the 10% tolerance) is nearer than a 28 in stool of any
// kind. The shop is invented.
func TestTypeWidensAfterAnAttribute(t *testing.T) {
	in := func(x float64) float64 { return x * 25.4 }
	shop := []product{
		{ID: "CS-26", Type: "counter stool", Measures: map[string]float64{"seat_height": in(26)}},
		{ID: "ST-28", Type: "stool", Measures: map[string]float64{"seat_height": in(28)}},
	}
	o := mustRescue(t, shop, "counter stool 28in")
	if got := hitIDs(t, &memEngine{products: shop}, o.Plan); !slices.Equal(got, []string{"CS-26"}) {
		t.Errorf("hits %v, want the counter stool of 26 in\n%s", got, o.Explanation)
	}
}

// The plan prefers what it relaxed, each constraint as typed, the head
// product type first and then the costliest to drop, so that an engine
// can rank the hits that meet them first; a replaced typo is not among
// them. The shops are invented.
func TestPlanPrefersWhatItRelaxed(t *testing.T) {
	in := func(x float64) float64 { return x * 25.4 }
	shop := []product{{ID: "CU-1", Type: "cushion", Colour: "mustard", Hex: "#e1ad01", Material: "linen", Measures: map[string]float64{"width": in(20), "height": in(20)}}}
	o := mustRescue(t, shop, "velvet throw pillow cover 18x18 mustard")
	var got []string
	for _, cl := range o.Plan.Prefer {
		got = append(got, cl.Field+":"+strings.Join(cl.Values, ","))
	}
	// The cover, widened to cushions; the two 18 in measures, firm,
	// dropped; velvet, soft, dropped last in importance.
	if len(got) != 4 || got[0] != "product_type:cushion cover" || got[3] != "material:velvet" {
		t.Errorf("prefer %v, want the cover, the measures, then velvet\n%s", got, o.Explanation)
	}
	for _, cl := range o.Plan.Prefer {
		if slices.ContainsFunc(o.Plan.Clauses, func(c Clause) bool { return c.key() == cl.key() }) {
			t.Errorf("prefers %s, which the plan already asks", cl.key())
		}
	}
	typo := mustRescue(t, []product{{ID: "SK-1", Type: "skillet"}}, "sklilet")
	if len(typo.Plan.Prefer) != 0 {
		t.Errorf("a typo read again prefers %v", typo.Plan.Prefer)
	}
}

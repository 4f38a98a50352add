package rewrite

import (
	"context"
	"slices"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/parser"
)

// typoShop is the invented test shop with camera filters and fans added.
// Thread diameters and blade spans are in millimetres: 52 in is 1320.8 mm,
// 12 in is 304.8 mm (25.4 mm to the inch).
var typoShop = append(slices.Clone(shop),
	product{ID: "UF-1", Type: "uv filter", Colour: "black", Hex: "#000000", Measures: map[string]float64{"thread_diameter": 52}, Price: 30},
	product{ID: "UF-2", Type: "uv filter", Colour: "black", Hex: "#000000", Measures: map[string]float64{"thread_diameter": 58}, Price: 34},
	product{ID: "CF-1", Type: "ceiling fan", Colour: "white", Hex: "#ffffff", Measures: map[string]float64{"blade_span": 1320.8}, Price: 150},
	product{ID: "DF-1", Type: "fan", Colour: "white", Hex: "#ffffff", Measures: map[string]float64{"diameter": 304.8}, Price: 25},
	product{ID: "CP-1", Type: "chalk paint", Colour: "cream", Hex: "#fffdd0", Measures: map[string]float64{"volume": 946.352946}, Price: 28},
	product{ID: "PT-1", Type: "paint", Colour: "cream", Hex: "#fffdd0", Measures: map[string]float64{"volume": 3785.411784}, Price: 40},
	product{ID: "WC-1", Type: "wall clock", Colour: "black", Hex: "#000000", Price: 22},
	product{ID: "CL-1", Type: "clog", Colour: "black", Hex: "#000000", Sizes: []string{"8", "9"}, Price: 45},
	product{ID: "EC-1", Type: "extension cord", Colour: "orange", Hex: "#ffa500", Specs: map[string]string{"awg": "14 awg"}, Measures: map[string]float64{"length": 15240}, Price: 30},
)

// span is a constraint's kind and byte offsets in the query as typed.
type span struct {
	kind       parser.Kind
	start, end int
	strictness parser.Strictness
}

// A misspelt product type is fixed and the query read again, so that its
// category's hard rules and measure slots apply. Offsets are counted by
// hand on the query as typed, not on the corrected text.
func TestRereadMisspeltProductType(t *testing.T) {
	for _, tc := range []struct {
		name, query, reason string
		corrected           string
		count               int
		ops                 []string
		message             string
		spans               []span
	}{
		{name: "a measure slot read as hard", query: "uv filtar 52 millimeter",
			reason:    "filtar is one edit from filter; \"uv filter\" is a camera type whose first slot is thread_diameter, hard in camera, so 52 mm is the thread: UF-1 alone",
			corrected: "uv filter 52 millimeter", count: 1, ops: []string{"replace product_type"},
			message: "No exact match for “uv filtar 52 millimeter”. Showing uv filters, reading “filtar” as “filter”.",
			// "uv filtar" is bytes 0..9, "52 millimeter" 10..23; the fix keeps the length.
			spans: []span{{parser.KindProductType, 0, 9, parser.Firm}, {parser.KindMeasure, 10, 23, parser.Hard}}},
		{name: "a hard thread is not widened", query: "uv filtar 55 millimeter",
			reason:    "no filter has a 55 mm thread; the thread is hard once the type is read, so nothing is relaxed and the threads carried are named",
			corrected: "uv filter 55 millimeter", count: 0, ops: []string{"replace product_type"},
			message: "No results for “uv filtar 55 millimeter”, read as “uv filter 55 millimeter”. 55 millimeter is not carried in uv filters; thread diameters carried: 52 mm, 58 mm.",
			spans:   []span{{parser.KindProductType, 0, 9, parser.Firm}, {parser.KindMeasure, 10, 23, parser.Hard}}},
		{name: "a size kept, the fix one byte longer", query: "merino sweter l",
			reason:    "with sweater read, the category is apparel, where l is a letter size (hard); SW-1 is merino in l",
			corrected: "merino sweater l", count: 1, ops: []string{"replace product_type"},
			message: "Showing sweaters, reading “sweter” as “sweater”.",
			// merino 0..6, sweter 7..13, l 14..15 as typed; in the corrected
			// text l is at 15..16 and maps back one byte earlier.
			spans: []span{{parser.KindMaterial, 0, 6, parser.Soft}, {parser.KindProductType, 7, 13, parser.Firm}, {parser.KindSize, 14, 15, parser.Hard}}},
		{name: "a word of a two-word type, the fix one byte shorter", query: "ceeiling fan",
			reason:    "ceeiling is one edit from ceiling, a word of \"ceiling fan\": CF-1, not the desk fan DF-1 that \"fan\" alone finds",
			corrected: "ceiling fan", count: 1, ops: []string{"replace product_type"},
			message: "Showing ceiling fans, reading “ceeiling” as “ceiling”.",
			// the head covers the misspelt word: 0..12 as typed (0..11 corrected).
			spans: []span{{parser.KindProductType, 0, 12, parser.Firm}}},
		{name: "a slot of the two-word type", query: "ceeiling fan 52",
			reason:    "52 takes the ceiling fan's blade_span slot (24..96 in) as 52 in = 1320.8 mm: CF-1",
			corrected: "ceiling fan 52", count: 1, ops: []string{"replace product_type"},
			message: "reading “ceeiling” as “ceiling”",
			// 52 is bytes 12..14 corrected, 13..15 as typed.
			spans: []span{{parser.KindProductType, 0, 12, parser.Firm}, {parser.KindMeasure, 13, 15, parser.Firm}}},
		{name: "a wire gauge stays hard, the fix one byte shorter", query: "extenssion cord 12 awg",
			reason:    "extenssion (10 letters, so two edits allowed) is one from extension; the one extension cord is 14 AWG and the gauge is never swapped, so nothing is shown (WR-1, the 12 AWG wire, is no extension cord) and the gauges carried are named",
			corrected: "extension cord 12 awg", count: 0, ops: []string{"replace product_type"},
			message: "No results for “extenssion cord 12 awg”, read as “extension cord 12 awg”. 12 awg is not carried in extension cords; specs carried: 14 awg.",
			// "extenssion cord" is 0..15 as typed (0..14 corrected); "12 awg" 16..22 (15..21 corrected).
			spans: []span{{parser.KindProductType, 0, 15, parser.Firm}, {parser.KindSpec, 16, 22, parser.Hard}}},
		{name: "a word of a type that is also another kind's word", query: "cream chak paint",
			reason:    "chak is one edit from chalk, a colour alias and a word of \"chalk paint\"; read so, the head is chalk paint (taking in the paint typed) and cream stays hard, as colour is in paint: CP-1, not PT-1",
			corrected: "cream chalk paint", count: 1, ops: []string{"replace product_type"},
			message: "Showing chalk paints, reading “chak” as “chalk”.",
			// "chak paint" is 6..16 as typed, "chalk paint" 6..17 corrected.
			spans: []span{{parser.KindColour, 0, 5, parser.Hard}, {parser.KindProductType, 6, 16, parser.Firm}}},
		{name: "the reading whose head takes in most wins", query: "wall clok",
			reason:    "clok is one edit from clog (a catalog type, first in the vocabulary) and from clock; \"wall clock\" takes in both words where \"clog\" takes one: WC-1",
			corrected: "wall clock", count: 1, ops: []string{"replace product_type"},
			message: "Showing wall clocks, reading “clok” as “clock”.",
			spans:   []span{{parser.KindProductType, 0, 9, parser.Firm}}},
		{name: "no reread where a hard constraint would soften", query: "2x4 sweter",
			reason: "with no product type 2x4 is a lumber size (hard); read with sweater it would be a plain dimension, so the query is not read again: the typo is replaced as a word, finds nothing with the studs, and is dropped",
			count:  2, ops: []string{"drop keyword"},
			spans: []span{{parser.KindSpec, 0, 3, parser.Hard}, {parser.KindKeyword, 4, 10, parser.Soft}}},
		{name: "no reread that changes the type asked for", query: "sweter rain jacket",
			reason: "sweater would only qualify the rain jacket, the head; the head stays and the misspelling is dropped: RJ-1 to RJ-4",
			count:  4, ops: []string{"drop keyword"},
			spans: []span{{parser.KindKeyword, 0, 6, parser.Soft}, {parser.KindProductType, 7, 18, parser.Firm}}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			o := mustRescue(t, typoShop, tc.query)
			if o.Corrected != tc.corrected || o.Count != tc.count || !slices.Equal(ops(o), tc.ops) {
				t.Errorf("%s: corrected %q count=%d ops=%v; want %q %d %v\n%s", tc.reason, o.Corrected, o.Count, ops(o), tc.corrected, tc.count, tc.ops, o.Explanation)
			}
			if !strings.Contains(o.Message, tc.message) {
				t.Errorf("%s: message %q lacks %q", tc.reason, o.Message, tc.message)
			}
			if tc.corrected != "" && !strings.Contains(o.Explanation, tc.corrected) {
				t.Errorf("the explanation does not say the query was read as %q:\n%s", tc.corrected, o.Explanation)
			}
			if o.Parsed.Query != tc.query {
				t.Errorf("the parse is of %q, want the query as typed", o.Parsed.Query)
			}
			var got []span
			for _, c := range o.Parsed.Constraints {
				got = append(got, span{c.Kind, c.Start, c.End, c.Strictness})
				if c.Text != tc.query[c.Start:c.End] {
					t.Errorf("%s: text %q is not the query's %q", c.Kind, c.Text, tc.query[c.Start:c.End])
				}
			}
			if !slices.Equal(got, tc.spans) {
				t.Errorf("%s: spans %v, want %v", tc.reason, got, tc.spans)
			}
		})
	}
}

// The query as typed is counted first, with no relaxation; every plan
// counted after it carries the fix first, so steps say what was counted.
func TestRereadSteps(t *testing.T) {
	o := mustRescue(t, typoShop, "striped sweter size m")
	// As typed: pattern, keyword, size m (hard) — no product has all
	// three. Read as "striped sweater size m": SW-1 and SW-2 come in m and
	// neither is striped, so the pattern is dropped: 2.
	if o.Count != 2 || !slices.Equal(ops(o), []string{"replace product_type", "drop pattern"}) {
		t.Fatalf("count %d ops %v\n%s", o.Count, ops(o), o.Explanation)
	}
	if s := o.Steps[0]; s.Label != "the query as typed" || len(s.Relaxations) != 0 || s.Count != 0 {
		t.Errorf("first step %+v, want the query as typed, unchanged, finding 0", s)
	}
	for _, s := range o.Steps[1:] {
		if s.Label == "relaxed" && (len(s.Relaxations) == 0 || s.Relaxations[0].Operator != OpReplace || s.Relaxations[0].Kind != parser.KindProductType) {
			t.Errorf("step %+v does not carry the fix", s)
		}
		if s.Label != "relaxed" && !strings.Contains(s.Label, `reading "striped sweater size m"`) {
			t.Errorf("step %q does not say it counts the reading", s.Label)
		}
	}
	if want := "No exact match for “striped sweter size m”. Showing sweaters in any pattern, reading “sweter” as “sweater”."; o.Message != want {
		t.Errorf("message %q, want %q", o.Message, want)
	}
}

// A typo as near to two product types is read as the one the catalog
// bears out. "blot" is one edit from boot and from bolt (Damerau-
// Levenshtein), and the boot comes first in the vocabulary; a shop of
// bolts and no boots is searched for bolts. A reading of which the shop
// carries nothing, not even the product type with the hard constraints,
// is not used at all: "cantles" is one edit from candles, but "womens
// leather cantles" is no query about candles. The shops are invented.
func TestRereadBorneOutByTheCatalog(t *testing.T) {
	bolts := []product{{ID: "HB-1", Type: "hex bolt", Specs: map[string]string{"metric_thread": "m8x1.25"}}}
	o := mustRescue(t, bolts, "blot")
	if o.Corrected != "bolt" || o.Count != 1 {
		t.Errorf("blot in a shop of bolts: corrected %q, count %d; want bolt, 1\n%s", o.Corrected, o.Count, o.Explanation)
	}
	shop := []product{
		{ID: "CN-1", Type: "candle", Colour: "ivory", Hex: "#fffff0"},
		{ID: "SN-1", Type: "sandal", Audience: "women", Material: "leather", Sizes: []string{"7"}},
	}
	o = mustRescue(t, shop, "womens leather cantles")
	if o.Corrected != "" || o.Count == 0 {
		t.Errorf("womens leather cantles: corrected %q, count %d; want no reading as candles and some results\n%s", o.Corrected, o.Count, o.Explanation)
	}
}

// A misspelling that gets only vowels wrong is read as the word it slips
// from before a word as near or nearer that changes a consonant:
// "sandles" is one edit from candles and two from sandals, and a shopper
// who types it wants sandals (a common misspelling; that vowels are the
// letters most often wrong is common knowledge of spelling correction).
// Read as sandals, a bare "size 7" becomes a shoe size, the same hard
// size. The shop is invented: SN-1 is a women's sandal in 7 and 8.
func TestRereadVowelSlip(t *testing.T) {
	shop := []product{
		{ID: "CN-1", Type: "candle", Colour: "ivory", Hex: "#fffff0"},
		{ID: "CN-2", Type: "candle", Colour: "red", Hex: "#ff0000"},
		{ID: "SN-1", Type: "sandal", Audience: "women", Material: "leather", Sizes: []string{"7", "8"}},
		{ID: "BT-1", Type: "boot", Audience: "women", Material: "leather", Sizes: []string{"7"}},
	}
	for _, tc := range []struct {
		query, corrected, reason string
		ids                      []string
	}{
		{"sandles", "sandals", "candles are one edit away and carried, but the slip is read first and found", []string{"SN-1"}},
		{"womens leather sandles", "womens leather sandals", "the audience and material are the sandal's", []string{"SN-1"}},
		{"sandles womens size 7", "sandals womens size 7", "size 7, read with no category as a plain number, is the sandal's shoe size; BT-1 is a boot", []string{"SN-1"}},
	} {
		o := mustRescue(t, shop, tc.query)
		got := hitIDs(t, &memEngine{products: shop}, o.Plan)
		if o.Corrected != tc.corrected || !slices.Equal(got, tc.ids) {
			t.Errorf("%q: corrected %q, hits %v; want %q, %v (%s)\n%s", tc.query, o.Corrected, got, tc.corrected, tc.ids, tc.reason, o.Explanation)
		}
	}
}

// The counts of readings tried and not kept are spent from the rescue's
// budget like any other: a rescue never asks the engine for more counts
// than its budget, whatever it reads. The shop is invented.
func TestReadingsSpendTheBudget(t *testing.T) {
	shop := []product{
		{ID: "CN-1", Type: "candle", Colour: "ivory", Hex: "#fffff0"},
		{ID: "SN-1", Type: "sandal", Audience: "women", Material: "leather", Sizes: []string{"7"}},
	}
	for budget := 1; budget <= 12; budget++ {
		eng := &memEngine{products: shop}
		if _, err := New(eng, nil, WithBudget(budget)).Rescue(context.Background(), "womens leather sandles"); err != nil {
			t.Fatal(err)
		}
		if n := len(eng.counted); n > budget {
			t.Errorf("budget %d: the engine counted %d plans: %q", budget, n, eng.counted)
		}
	}
}

// A code typed beside a product type, without "for", is most often the
// model the product fits (common practice): "jx-10 lens" in a shop whose
// lenses fit the jx-10 and none has the part number JX-10 shows them,
// and says how it read the code. A code that is a part number is found
// as typed; one that neither names nor fits anything still stops at the
// hard constraints. The shop is invented (memengine_test.go).
func TestCodeReadAsTheModelItFits(t *testing.T) {
	for _, tc := range []struct {
		name, query, want string
		count             int
		reason            string
	}{
		{"model", "jx-10 lens", "Showing lenses, reading “jx-10” as the model they fit.", 2, "both lenses fit the jx-10"},
		{"model and a colour", "jx-10 lens red", "Showing lenses in any colour, reading “jx-10” as the model they fit.", 2, "the colour is dropped on the reading, as on any query"},
		{"part number", "fn-5018 lens", "", 1, "fn-5018 is a lens's part number: found as typed"},
		{"neither", "zz-99 lens", "zz-99 is not carried in lenses.", 0, "nothing has or fits zz-99"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			o := mustRescue(t, shop, tc.query)
			if !strings.HasSuffix(o.Message, tc.want) || o.Count != tc.count {
				t.Errorf("%s: message %q, %d found; want it to end %q, %d found\n%s", tc.reason, o.Message, o.Count, tc.want, tc.count, o.Explanation)
			}
		})
	}
}

// A typo read as a product type the shop carries none of, in a query
// that names no other product type, is answered with that type rather
// than dropped: "memory foam matress queen" in a shop of queen quilts
// and no mattresses is told the shop carries no mattresses, not shown
// quilts (mattress is one edit from matress). The shop is invented.
func TestTypoOfATypeNotCarried(t *testing.T) {
	shop := []product{{ID: "QT-1", Type: "quilt", Sizes: []string{"queen"}}}
	o := mustRescue(t, shop, "memory foam matress queen")
	if want := "The shop carries no mattresses."; !strings.HasSuffix(o.Message, want) || o.Count != 0 {
		t.Errorf("message %q, %d found; want it to end %q and nothing found\n%s", o.Message, o.Count, want, o.Explanation)
	}
}

// A word that names the product, in a query of no product type, is not
// dropped when it is no typo of any word whittle knows: the shop
// carries none of it, and the other words would show something else. It
// is the last word before one that starts what qualifies it ("shampoo
// for dry hair"), or the last word (common knowledge of English noun
// phrases). A designation says what the product is, so a word after one
// is dropped as before. The shop is invented.
func TestUnknownHeadIsKept(t *testing.T) {
	shop := []product{
		{ID: "HD-1", Type: "hair dryer", Colour: "black", Hex: "#000000", Words: []string{"hair", "dryer", "dry"}},
		{ID: "CC-1", Type: "battery", Specs: map[string]string{"battery": "cr2032"}},
	}
	for _, tc := range []struct {
		query, reason string
		count         int
		message       string
	}{
		{"shampoo for dry hair", "shampoo names the product and is near no known word: HD-1 is no shampoo", 0, "shampoo is not carried"},
		{"zorblax", "a word alone is the query's noun", 0, "zorblax is not carried"},
		{"dry hair zorblax", "the last word names the product", 0, "zorblax is not carried"},
		{"cr2032 blister", "the designation names the product: blister is dropped", 1, "without “blister”"},
	} {
		o := mustRescue(t, shop, tc.query)
		if o.Count != tc.count || !strings.Contains(o.Message, tc.message) {
			t.Errorf("%q: count %d, message %q; want %d and %q (%s)\n%s", tc.query, o.Count, o.Message, tc.count, tc.message, tc.reason, o.Explanation)
		}
	}
}

// A typo fixed is rescued as if typed right, even where the shop lacks
// the type it names, when the type takes in the head typed: "sofa tabel
// walnut" is a sofa table (a console table, in the lexicon), and a shop
// of no console tables shows walnut tables, as "sofa table walnut"
// does, not the sofas that "sofa" alone names. The shop is invented.
func TestRereadCompletingTheHead(t *testing.T) {
	shop := []product{
		{ID: "SO-1", Type: "sofa", Material: "walnut"},
		{ID: "DT-1", Type: "dining table", Material: "walnut"},
	}
	for _, q := range []string{"sofa tabel walnut", "sofa table walnut"} {
		o := mustRescue(t, shop, q)
		if got := hitIDs(t, &memEngine{products: shop}, o.Plan); !slices.Equal(got, []string{"DT-1"}) {
			t.Errorf("%q: hits %v, want the walnut table DT-1\n%s", q, got, o.Explanation)
		}
	}
}

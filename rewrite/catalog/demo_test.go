package catalog

import (
	"fmt"
	"math"
	"math/rand/v2"
	"regexp"
	"slices"
	"strconv"
	"strings"
	"sync"
	"testing"

	"github.com/bojanz/currency"
	"github.com/google/go-cmp/cmp"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/lexicon/reference"
	"github.com/whittle-search/whittle/lexicon/units"
	"github.com/whittle-search/whittle/parser"
)

// demo5000 is the catalog most tests read, made once.
var demo5000 = sync.OnceValue(func() []Product { return Demo(5000, 1) })

func TestDemoDeterministic(t *testing.T) {
	a, b := Demo(800, 7), Demo(800, 7)
	if diff := cmp.Diff(a, b); diff != "" {
		t.Fatalf("Demo(800, 7) differs between calls (-first +second):\n%s", diff)
	}
	if cmp.Equal(a, Demo(800, 8)) {
		t.Error("Demo(800, 7) and Demo(800, 8) are identical; the seed is ignored")
	}
	// Products are drawn one after another, so a shorter catalog is a
	// prefix of a longer one with the same seed.
	if diff := cmp.Diff(a[:100], Demo(100, 7)); diff != "" {
		t.Errorf("Demo(100, 7) is not the first 100 of Demo(800, 7) (-want +got):\n%s", diff)
	}
	for _, n := range []int{0, -5} {
		if got := Demo(n, 1); len(got) != 0 {
			t.Errorf("Demo(%d, 1) has %d products, want none", n, len(got))
		}
	}
}

// The measures and designations a kind gained later come from their own
// stream: drawn from another, they change, and nothing else does,
// neither the other products nor the other attributes of those that
// have them. So adding
// one to the demo leaves the rest of the catalog, and every figure made
// from it, as it was.
func TestDemoLaterStream(t *testing.T) {
	later := map[string]bool{}          // measures
	laterSpecs := map[string][]string{} // designations, by product type
	for _, d := range demoDepts {
		for _, k := range d.kinds {
			for _, g := range k.later {
				for di, dim := range g.dims {
					if dim != "spec" {
						later[dim] = true
						continue
					}
					for _, o := range g.opts {
						laterSpecs[k.name] = append(laterSpecs[k.name], o[di])
					}
				}
			}
		}
	}
	if len(later) == 0 || len(laterSpecs) == 0 {
		t.Fatal("no kind has a measure and a designation added later")
	}
	strip := func(ps []Product) []Product {
		for i := range ps {
			for dim := range later {
				delete(ps[i].Measures, dim)
			}
			if vs := laterSpecs[ps[i].ProductType]; vs != nil {
				ps[i].Spec = slices.DeleteFunc(ps[i].Spec, func(s string) bool { return slices.Contains(vs, s) })
				if len(ps[i].Spec) == 0 {
					ps[i].Spec = nil
				}
			}
		}
		return ps
	}
	draw := func(laterSeed uint64) []Product {
		r := rand.New(rand.NewPCG(7, demoStream))
		l := rand.New(rand.NewPCG(laterSeed, demoLaterStream))
		out := make([]Product, 2000)
		for i := range out {
			out[i] = demoProduct(r, l, i+1)
		}
		return out
	}
	a, b := draw(7), draw(99)
	if diff := cmp.Diff(a, Demo(2000, 7)); diff != "" {
		t.Fatalf("draw(7) is not Demo(2000, 7):\n%s", diff)
	}
	if cmp.Equal(a, b) {
		t.Fatal("another later stream draws the same later measures; the test shows nothing")
	}
	if diff := cmp.Diff(strip(a), strip(b)); diff != "" {
		t.Errorf("the later stream changed more than the later measures:\n%s", diff)
	}
}

func TestDemoIDs(t *testing.T) {
	id := regexp.MustCompile(`^HG-[0-9]{6}$`)
	seen := make(map[string]bool)
	for _, p := range demo5000() {
		if !id.MatchString(p.ID) {
			t.Errorf("id %q is not HG- and six digits", p.ID)
		}
		if seen[p.ID] {
			t.Errorf("id %q is used twice", p.ID)
		}
		seen[p.ID] = true
		if p.Title == "" || p.Description == "" {
			t.Errorf("%s: title %q, description %q; both are needed", p.ID, p.Title, p.Description)
		}
	}
}

// TestDemoProductTypes checks every product type and category against the
// default lexicon (lexicon/data/product_types.wlx).
func TestDemoProductTypes(t *testing.T) {
	lex := lexicon.Default()
	cats := make(map[string]int)
	for _, p := range demo5000() {
		e, ok := lex.Lookup(lexicon.ProductType, p.ProductType)
		if !ok {
			t.Errorf("%s: product type %q is not a canonical product type of the lexicon", p.ID, p.ProductType)
			continue
		}
		if e.Category != p.Category {
			t.Errorf("%s: %q has category %q, the lexicon says %q", p.ID, p.ProductType, p.Category, e.Category)
		}
		cats[p.Category]++
	}
	for _, c := range lexicon.Categories() {
		if cats[c] == 0 {
			t.Errorf("no product in category %q among 5000", c)
		}
	}
}

// TestDemoVocabulary checks that brands, materials, patterns, silhouettes
// and audiences are canonical entries of the default lexicon.
func TestDemoVocabulary(t *testing.T) {
	lex := lexicon.Default()
	cases := []struct {
		name   string
		kind   lexicon.Kind
		field  func(Product) string
		reason string
	}{
		{"brand", lexicon.Brand, func(p Product) string { return strings.ToLower(p.Brand) }, "brands are the invented names of brands.wlx, written capitalised"},
		{"material", lexicon.Material, func(p Product) string { return p.Material }, "the parser must read the catalog's materials as materials"},
		{"pattern", lexicon.Pattern, func(p Product) string { return p.Pattern }, "the parser must read the catalog's patterns as patterns"},
		{"silhouette", lexicon.Silhouette, func(p Product) string { return p.Silhouette }, "the parser must read the catalog's silhouettes as silhouettes"},
		{"audience", lexicon.Audience, func(p Product) string { return p.Audience }, "audiences are canonical names of audiences.wlx"},
	}
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			used := 0
			for _, p := range demo5000() {
				v := tc.field(p)
				if v == "" {
					continue
				}
				used++
				if _, ok := lex.Lookup(tc.kind, v); !ok {
					t.Errorf("%s: %s %q is not a canonical %s of the lexicon (%s)", p.ID, tc.name, v, tc.kind, tc.reason)
				}
			}
			if used == 0 {
				t.Errorf("no product has a %s", tc.name)
			}
		})
	}
}

func TestDemoAudiences(t *testing.T) {
	want := []string{"women", "men", "kids", "unisex"}
	for _, p := range demo5000() {
		wears := p.Category == "apparel" || p.Category == "footwear"
		switch {
		case wears && !slices.Contains(want, p.Audience):
			t.Errorf("%s: %s has audience %q, want one of %v", p.ID, p.ProductType, p.Audience, want)
		case !wears && p.Audience != "":
			t.Errorf("%s: %s (%s) has audience %q; only apparel and footwear have one", p.ID, p.ProductType, p.Category, p.Audience)
		}
	}
}

// TestDemoColours checks the colour fields: a shop colour has a well formed
// hex, always the same for its name, and is the store's own name, not a
// colour word of the lexicon; a colour without a hex is a lexicon colour.
func TestDemoColours(t *testing.T) {
	lex := lexicon.Default()
	hexRE := regexp.MustCompile(`^#[0-9a-f]{6}$`)
	hexOf := make(map[string]string)
	plain := 0
	for _, p := range demo5000() {
		if p.Colour == "" {
			if p.ColourHex != "" {
				t.Errorf("%s: colour_hex %q without a colour name", p.ID, p.ColourHex)
			}
			continue
		}
		if p.ColourHex == "" {
			plain++
			if _, ok := lex.Lookup(lexicon.Colour, p.Colour); !ok {
				t.Errorf("%s: colour %q has no hex and is not a canonical lexicon colour", p.ID, p.Colour)
			}
			continue
		}
		if !hexRE.MatchString(p.ColourHex) {
			t.Errorf("%s: colour_hex %q is not #rrggbb in lower case", p.ID, p.ColourHex)
		}
		if _, err := colour.ParseHex(p.ColourHex); err != nil {
			t.Errorf("%s: colour_hex %q: %v", p.ID, p.ColourHex, err)
		}
		if h, ok := hexOf[p.Colour]; ok && h != p.ColourHex {
			t.Errorf("%s: %q is %s here and %s elsewhere", p.ID, p.Colour, p.ColourHex, h)
		}
		hexOf[p.Colour] = p.ColourHex
	}
	if len(hexOf) < 40 {
		t.Errorf("%d shop colour names in use, want at least 40", len(hexOf))
	}
	if plain == 0 {
		t.Error("no product uses a plain lexicon colour")
	}
	for name := range hexOf {
		if _, _, ok := lex.ColourNamed(name); ok {
			t.Errorf("shop colour %q is a colour word of the lexicon; the store's names must be its own", name)
		}
	}
}

// TestDemoShopColoursNearShopperWords checks that a shopper's colour word
// lands nearest the shop colour meant for it. Values for the words: CSS
// Color 4 named colours from testdata/reference/css_named_colours.tsv, or
// the lexicon's value written from memory (lexicon/data/colours.wlx,
// from=memory). Distance is CIEDE2000 (Sharma, Wu and Dalal 2005).
func TestDemoShopColoursNearShopperWords(t *testing.T) {
	css := make(map[string]string)
	for _, r := range reference.Rows(t, "css_named_colours.tsv") {
		css[r["name"]] = r["hex"]
	}
	var pcs []colour.PaletteColour
	for _, c := range demoShopColours {
		rgb, err := colour.ParseHex(c.hex)
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		pcs = append(pcs, colour.PaletteColour{Name: c.name, Lab: rgb.Lab()})
	}
	pal := colour.NewPalette(pcs)
	lex := lexicon.Default()
	cases := []struct {
		word    string
		cssName string // "" when the value is the lexicon's, from memory
		want    string
		reason  string
	}{
		{"mustard", "", "harvest gold", "harvest gold is the store's mustard"},
		{"sky blue", "skyblue", "glacier", "glacier is the store's light sky blue"},
		{"charcoal", "", "cinder", "cinder is the store's charcoal grey"},
		{"sage", "", "lichen", "lichen is the store's grey-green"},
		{"teal", "teal", "lagoon", "lagoon is the store's teal"},
		{"slate grey", "slategray", "storm cloud", "storm cloud is the store's blue-grey"},
		{"salmon", "salmon", "sorbet", "sorbet is the store's salmon pink"},
		{"steel blue", "steelblue", "fjord", "fjord is the store's steel blue"},
		{"pink", "pink", "petal", "petal is the store's light pink"},
		{"tan", "tan", "dune", "dune is the store's tan"},
		{"coral", "coral", "sunset", "sunset is the store's coral"},
		{"navy", "navy", "nightwatch", "nightwatch is the store's navy"},
		{"olive", "olive", "pesto", "pesto is the store's olive"},
		{"terracotta", "", "sunbaked", "sunbaked is the store's terracotta"},
		{"cream", "", "buttermilk", "buttermilk is the store's cream"},
		{"oatmeal", "", "oat milk", "oat milk is the store's oatmeal"},
		{"hunter green", "", "evergreen", "evergreen is the store's dark green"},
		{"cobalt", "", "high tide", "high tide is the store's cobalt"},
		{"mint", "", "spearmint", "spearmint is the store's mint"},
		{"mauve", "", "foxglove", "foxglove is the store's mauve"},
	}
	for _, tc := range cases {
		t.Run(tc.word, func(t *testing.T) {
			var q colour.Lab
			if tc.cssName != "" {
				rgb, err := colour.ParseHex(css[tc.cssName])
				if err != nil {
					t.Fatalf("css %q: %v", tc.cssName, err)
				}
				q = rgb.Lab()
			} else {
				e, l, ok := lex.ColourNamed(tc.word)
				if !ok || e.From != "memory" {
					t.Fatalf("%q is not a from=memory lexicon colour", tc.word)
				}
				q = l
			}
			got := pal.Nearest(q, 1)
			if len(got) == 0 || got[0].Name != tc.want {
				t.Fatalf("nearest shop colour to %q is %v, want %q (%s)", tc.word, got, tc.want, tc.reason)
			}
			// Within 10 CIEDE2000 units: a clearly related shade
			// (common practice for "near" in colour search, from memory).
			if got[0].DeltaE > 10 {
				t.Errorf("%q is %.1f from %q, want within 10 (%s)", tc.word, got[0].DeltaE, tc.want, tc.reason)
			}
		})
	}
}

// TestDemoMeasures checks that every measure reads, with whittle's own
// parser, as one measure with a unit, that it fills a slot of its product
// type (lexicon/data/product_types.wlx, inherited from a parent where the
// type has none) and lies in that slot's typical range.
func TestDemoMeasures(t *testing.T) {
	lex := lexicon.Default()
	seen := 0
	for _, p := range demo5000() {
		e, ok := lex.Lookup(lexicon.ProductType, p.ProductType)
		if !ok {
			continue // reported by TestDemoProductTypes
		}
		slots := lex.SlotsOf(e)
		for dim, s := range p.Measures {
			seen++
			i := slices.IndexFunc(slots, func(sl lexicon.Slot) bool { return sl.Dimension == dim })
			if i < 0 {
				t.Errorf("%s: %s has no slot %q (slots %v)", p.ID, p.ProductType, dim, slots)
				continue
			}
			slot := slots[i]
			r := parser.Parse(s)
			ms := r.Of(parser.KindMeasure)
			if len(ms) != 1 || len(r.Constraints) != 1 || len(r.Errors) != 0 {
				t.Errorf("%s: %s %q reads as %d measures among %d constraints, errors %v; want exactly one measure", p.ID, dim, s, len(ms), len(r.Constraints), r.Errors)
				continue
			}
			m := ms[0].Measure
			if m.Unit == "" {
				t.Errorf("%s: %s %q has no unit", p.ID, dim, s)
				continue
			}
			// m.Unit is the unit as written ("W", "K"): find it so.
			all := units.Units()
			j := slices.IndexFunc(all, func(u units.Unit) bool { return u.String() == m.Unit })
			if j < 0 {
				t.Errorf("%s: %s %q: unit %q unknown", p.ID, dim, s, m.Unit)
				continue
			}
			u := all[j]
			var amounts []float64
			switch {
			case m.Amount != nil:
				amounts = []float64{*m.Amount}
			case m.Min != nil && m.Max != nil:
				amounts = []float64{*m.Min, *m.Max}
			default:
				t.Errorf("%s: %s %q is an open range", p.ID, dim, s)
			}
			for _, a := range amounts {
				v, err := units.Convert(a, u, slot.Unit)
				if err != nil {
					t.Errorf("%s: %s %q: %v (slot %s)", p.ID, dim, s, err, slot)
					continue
				}
				// A relative margin of 1e-9 absorbs rounding in exact
				// conversions such as 1 qt = 0.25 gal.
				if v < slot.Min*(1-1e-9) || v > slot.Max*(1+1e-9) {
					t.Errorf("%s: %s %q is %g %s, outside the slot's range %s", p.ID, dim, s, v, slot.Unit.Symbol, slot)
				}
			}
		}
	}
	if seen == 0 {
		t.Fatal("no product has a measure")
	}
}

// TestDemoSpecs checks that every designation reads as one standard
// designation of the system its department sells, and that it is in the
// published table of its standard.
func TestDemoSpecs(t *testing.T) {
	lumber := column(t, "lumber_ps20_sizes.tsv", "nominal")
	gauges := column(t, "awg_wire_diameters.tsv", "gauge")
	paper := column(t, "iso216_paper_sizes.tsv", "size")
	var batteries []string
	for _, r := range reference.Rows(t, "iec60086_batteries.tsv") {
		// "9V (PP3)" is the 9V size.
		batteries = append(batteries, strings.Fields(r["common_name"])[0])
	}
	coarse := make(map[string]string)
	for _, r := range reference.Rows(t, "threads_metric_iso261_262.tsv") {
		coarse[r["designation"]] = r["coarse_pitch_mm"]
	}
	tyreDiameter := make(map[string]string)
	for _, r := range reference.Rows(t, "tyre_size_examples.tsv") {
		tyreDiameter[strings.ReplaceAll(r["designation"], " ", "")] = r["overall_diameter_mm"]
	}
	tyreRE := regexp.MustCompile(`^([0-9]{3})/([0-9]{2})R([0-9]{2})$`)

	type specCase struct {
		category string
		system   string
		inTable  func(t *testing.T, s string, sp *parser.Spec)
		reason   string
		// productType, when set, is the one type of the category the
		// case is for; the category's other case takes the others.
		productType string
	}
	cases := []specCase{
		{"lumber", "lumber", func(t *testing.T, s string, _ *parser.Spec) {
			if !slices.Contains(lumber, s) {
				t.Errorf("%q is not a PS 20 nominal size %v", s, lumber)
			}
		}, "nominal sizes of PS 20 (lumber_ps20_sizes.tsv)", ""},
		{"electrical", "awg", func(t *testing.T, s string, _ *parser.Spec) {
			g, ok := strings.CutSuffix(s, " awg")
			if !ok || !slices.Contains(gauges, g) {
				t.Errorf("%q is not an AWG gauge of ASTM B258 (awg_wire_diameters.tsv)", s)
			}
		}, "wire gauges (awg_wire_diameters.tsv)", ""},
		{"hardware", "metric_thread", func(t *testing.T, s string, _ *parser.Spec) {
			d, pitch, ok := strings.Cut(s, "x")
			want, found := coarse[d]
			if !ok || !found {
				t.Errorf("%q is not an ISO 261 thread (threads_metric_iso261_262.tsv)", s)
				return
			}
			// The store sells coarse pitch only (common practice).
			if !sameNumber(pitch, want) {
				t.Errorf("%q: pitch %s, ISO 261 coarse pitch of %s is %s", s, pitch, d, want)
			}
		}, "metric threads at ISO 261 coarse pitch", ""},
		{"hardware", "pipe_schedule", func(t *testing.T, s string, sp *parser.Spec) {
			// ASTM D1785 makes PVC pipe in schedules 40, 80 and 120
			// (from memory).
			if n := sp.Attributes["schedule"]; n != "40" && n != "80" && n != "120" {
				t.Errorf("%q: schedule %q is not one PVC pipe is made in", s, n)
			}
		}, "the schedules of PVC pipe", "pvc pipe"},
		{"office", "paper", func(t *testing.T, s string, _ *parser.Spec) {
			if !slices.Contains(paper, s) {
				t.Errorf("%q is not an ISO 216 size (iso216_paper_sizes.tsv)", s)
			}
		}, "ISO 216 paper sizes", ""},
		{"batteries", "battery", func(t *testing.T, s string, _ *parser.Spec) {
			if !slices.Contains(batteries, s) {
				t.Errorf("%q is not an IEC 60086 size %v (iec60086_batteries.tsv)", s, batteries)
			}
		}, "IEC 60086 battery sizes", ""},
		{"tyres", "tyre", func(t *testing.T, s string, sp *parser.Spec) {
			m := tyreRE.FindStringSubmatch(s)
			if m == nil {
				t.Errorf("%q is not an ISO metric size WWW/AARDD", s)
				return
			}
			// Passenger section widths end in 5 and aspect ratios are
			// multiples of 5 (from memory).
			w, _ := strconv.Atoi(m[1])
			a, _ := strconv.Atoi(m[2])
			if w%10 != 5 || a%5 != 0 {
				t.Errorf("%q: width %d or aspect %d is not a stocked step", s, w, a)
			}
			if want, ok := tyreDiameter[s]; ok && !sameNumber(strconv.FormatFloat(sp.Dimensions["overall_diameter"], 'f', 1, 64), want) {
				t.Errorf("%q: overall diameter %g mm, tyre_size_examples.tsv gives %s", s, sp.Dimensions["overall_diameter"], want)
			}
		}, "ISO metric tyre sizes (tyre_size_examples.tsv)", ""},
	}
	for _, tc := range cases {
		t.Run(tc.category, func(t *testing.T) {
			seen := 0
			for _, p := range demo5000() {
				if p.Category != tc.category || tc.productType != "" && p.ProductType != tc.productType ||
					tc.productType == "" && slices.ContainsFunc(cases, func(o specCase) bool { return o.category == tc.category && o.productType == p.ProductType }) {
					continue
				}
				for _, s := range p.Spec {
					seen++
					r := parser.Parse(s)
					sp := r.Of(parser.KindSpec)
					if len(sp) != 1 || len(r.Constraints) != 1 {
						t.Errorf("%s: spec %q reads as %d designations among %d constraints, want one", p.ID, s, len(sp), len(r.Constraints))
						continue
					}
					if got := sp[0].Spec.System; got != tc.system {
						t.Errorf("%s: spec %q reads as %s, want %s (%s)", p.ID, s, got, tc.system, tc.reason)
					}
					tc.inTable(t, s, sp[0].Spec)
				}
			}
			if seen == 0 {
				t.Errorf("no %s product has a designation", tc.category)
			}
		})
	}
	// Only those departments sell designated goods.
	var specCats []string
	for _, tc := range cases {
		specCats = append(specCats, tc.category)
	}
	for _, p := range demo5000() {
		if len(p.Spec) > 0 && !slices.Contains(specCats, p.Category) {
			t.Errorf("%s: %s (%s) has spec %v", p.ID, p.ProductType, p.Category, p.Spec)
		}
	}
}

// column returns one column of a reference table.
func column(t *testing.T, table, col string) []string {
	var out []string
	for _, r := range reference.Rows(t, table) {
		out = append(out, r[col])
	}
	return out
}

// sameNumber reports whether two decimal strings are the same number.
func sameNumber(a, b string) bool {
	x, err1 := strconv.ParseFloat(a, 64)
	y, err2 := strconv.ParseFloat(b, 64)
	return err1 == nil && err2 == nil && math.Abs(x-y) < 1e-9
}

// TestDemoSizes checks the size runs: letter sizes for apparel, US shoe
// sizes 5 to 13 for footwear, bed sizes for bedding and none elsewhere,
// each readable by the parser as a size.
func TestDemoSizes(t *testing.T) {
	letters := []string{"xs", "s", "m", "l", "xl", "xxl"} // letter size order, common practice
	beds := []string{"twin", "full", "queen", "king"}     // US bed sizes, common practice
	bedding := []string{"duvet cover", "sheet set", "quilt"}
	cases := []struct {
		name   string
		match  func(Product) bool
		order  func(s string) (float64, bool) // position of s, in ascending order
		query  func(s string) string          // how a shopper types the size
		reason string
	}{
		{"apparel", func(p Product) bool { return p.Category == "apparel" },
			func(s string) (float64, bool) { i := slices.Index(letters, s); return float64(i), i >= 0 },
			func(s string) string { return "size " + s }, "garments come in letter sizes xs..xxl"},
		{"footwear", func(p Product) bool { return p.Category == "footwear" },
			func(s string) (float64, bool) {
				v, err := strconv.ParseFloat(s, 64)
				return v, err == nil && v >= 5 && v <= 13 && v*2 == math.Trunc(v*2)
			},
			func(s string) string { return "size " + s }, "shoes come in whole and half US sizes 5..13"},
		{"bedding", func(p Product) bool { return slices.Contains(bedding, p.ProductType) },
			func(s string) (float64, bool) { i := slices.Index(beds, s); return float64(i), i >= 0 },
			func(s string) string { return s }, "bedding comes in bed sizes"},
	}
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			seen := 0
			for _, p := range demo5000() {
				if !tc.match(p) {
					continue
				}
				seen++
				if len(p.Sizes) == 0 {
					t.Errorf("%s: %s has no sizes (%s)", p.ID, p.ProductType, tc.reason)
				}
				last := -1.0
				for _, s := range p.Sizes {
					v, ok := tc.order(s)
					if !ok {
						t.Errorf("%s: size %q of %s is not allowed (%s)", p.ID, s, p.ProductType, tc.reason)
						continue
					}
					if v <= last {
						t.Errorf("%s: sizes %v are not in ascending order", p.ID, p.Sizes)
					}
					last = v
					r := parser.Parse(tc.query(s))
					if sz := r.Of(parser.KindSize); len(sz) != 1 || sz[0].Size.Value != s {
						t.Errorf("%s: %q does not read as size %q: %v", p.ID, tc.query(s), s, sz)
					}
				}
			}
			if seen == 0 {
				t.Errorf("no %s product", tc.name)
			}
		})
	}
	for _, p := range demo5000() {
		sized := p.Category == "apparel" || p.Category == "footwear" || slices.Contains(bedding, p.ProductType)
		if !sized && len(p.Sizes) > 0 {
			t.Errorf("%s: %s has sizes %v; only apparel, footwear and bedding do", p.ID, p.ProductType, p.Sizes)
		}
	}
}

// TestDemoStock checks that about 8% of the products are out of stock.
func TestDemoStock(t *testing.T) {
	out := 0
	ps := demo5000()
	for _, p := range ps {
		if p.InStock == nil {
			t.Fatalf("%s: in_stock not set", p.ID)
		}
		if !*p.InStock {
			out++
		}
	}
	// 8% of 5000 is 400 with a standard deviation near 19, so 4%..12%
	// (200..600) is far outside chance.
	if frac := float64(out) / float64(len(ps)); frac < 0.04 || frac > 0.12 {
		t.Errorf("%.1f%% out of stock, want about 8%% (4..12%%)", 100*frac)
	}
}

// TestDemoPrices checks that prices are positive decimals with two places
// in an ISO 4217 currency (bojanz/currency's CLDR list).
func TestDemoPrices(t *testing.T) {
	amount := regexp.MustCompile(`^[0-9]+\.[0-9]{2}$`)
	for _, p := range demo5000() {
		if p.Price == nil {
			t.Errorf("%s: no price", p.ID)
			continue
		}
		if !amount.MatchString(p.Price.Amount) {
			t.Errorf("%s: amount %q is not a decimal with two places", p.ID, p.Price.Amount)
		}
		if v, err := strconv.ParseFloat(p.Price.Amount, 64); err != nil || v <= 0 {
			t.Errorf("%s: amount %q is not positive", p.ID, p.Price.Amount)
		}
		if p.Price.Currency != "USD" || !currency.IsValid(p.Price.Currency) {
			t.Errorf("%s: currency %q, want USD", p.ID, p.Price.Currency)
		}
	}
}

// TestDemoCompatibility checks that only accessories that fit a device
// name models, and that each model code reads as a compatibility target.
func TestDemoCompatibility(t *testing.T) {
	fitters := []string{
		"phone case", "screen protector", "phone charger", "wireless charger", "laptop charger",
		"prime lens", "telephoto lens", "wide angle lens", "portrait lens", "macro lens", "zoom lens",
		"camera strap", "camera bag", "remote shutter", "battery grip", "camera battery",
		"vacuum filter", "water filter",
	}
	seen := 0
	for _, p := range demo5000() {
		fits := slices.Contains(fitters, p.ProductType)
		if fits != (len(p.CompatibleWith) > 0) {
			t.Errorf("%s: %s has compatible_with %v", p.ID, p.ProductType, p.CompatibleWith)
		}
		for i, c := range p.CompatibleWith {
			seen++
			if i > 0 && p.CompatibleWith[i-1] == c {
				t.Errorf("%s: model %q listed twice", p.ID, c)
			}
			r := parser.Parse("for " + c)
			if got := r.Of(parser.KindCompatibility); len(got) != 1 || got[0].Target != c {
				t.Errorf("%s: %q does not read as a target %q: %v", p.ID, "for "+c, c, got)
			}
		}
	}
	if seen == 0 {
		t.Fatal("no product names a compatible model")
	}
}

// TestDemoPartNumbers checks that hardware, electrical and camera goods
// carry part numbers the parser reads as such, and nothing else does.
func TestDemoPartNumbers(t *testing.T) {
	for _, p := range demo5000() {
		want := p.Category == "hardware" || p.Category == "electrical" || p.Category == "camera"
		if want != (p.PartNumber != "") {
			t.Errorf("%s: %s (%s) has part number %q", p.ID, p.ProductType, p.Category, p.PartNumber)
			continue
		}
		if p.PartNumber == "" {
			continue
		}
		r := parser.Parse(p.PartNumber)
		if got := r.Of(parser.KindPartNumber); len(got) != 1 || got[0].Code != p.PartNumber {
			t.Errorf("%s: part number %q reads as %v", p.ID, p.PartNumber, got)
		}
	}
}

// TestDemoTitles checks that the parser finds each product's brand and
// product type in its title, as it would in a shopper's query.
func TestDemoTitles(t *testing.T) {
	for _, p := range demo5000() {
		r := parser.Parse(p.Title)
		pt := r.Of(parser.KindProductType)
		if len(pt) != 1 || pt[0].Name != p.ProductType {
			var names []string
			for _, c := range pt {
				names = append(names, c.Name)
			}
			t.Errorf("%s: title %q reads as product types %q, want [%q]", p.ID, p.Title, names, p.ProductType)
		}
		br := r.Of(parser.KindBrand)
		if len(br) != 1 || br[0].Name != strings.ToLower(p.Brand) {
			t.Errorf("%s: title %q: brand %v, want %q", p.ID, p.Title, br, p.Brand)
		}
		if len(r.Errors) > 0 {
			t.Errorf("%s: title %q: %v", p.ID, p.Title, r.Errors)
		}
	}
}

func BenchmarkDemo(b *testing.B) {
	for b.Loop() {
		Demo(20000, 1)
	}
}

func ExampleDemo() {
	products := Demo(3, 1)
	for _, p := range products {
		fmt.Printf("%s %s (%s, %s) %s %s\n", p.ID, p.Title, p.ProductType, p.Category, p.Price.Amount, p.Price.Currency)
	}
	lens := products[0]
	fmt.Println(lens.Measures["focal_length"], lens.CompatibleWith, lens.PartNumber)
	// Output:
	// HG-000001 Bodrinske 35 mm prime lens (prime lens, camera) 654.49 USD
	// HG-000002 Frennowik 9V lithium battery (lithium battery, batteries) 27.00 USD
	// HG-000003 Yuvrel 8 in non stick skillet (skillet, kitchen) 45.00 USD
	// 35 mm [zk-3] KV-3191
}

// A product's Lab comes from colour_lab, else colour_hex, else the
// lexicon's value for its name. sRGB white (#ffffff) is L* 100, a* and
// b* 0 under D65 (IEC 61966-2-1 with the CIE 1976 formulas).
func TestProductLab(t *testing.T) {
	lex := lexicon.Default()
	_, navy, _ := lex.ColourNamed("navy")
	for _, tc := range []struct {
		name string
		p    Product
		want *colour.Lab
	}{
		{"lab first", Product{ColourLab: &[3]float64{50, 1, 2}, ColourHex: "#ffffff", Colour: "navy"}, &colour.Lab{L: 50, A: 1, B: 2}},
		{"then hex", Product{ColourHex: "#ffffff", Colour: "navy"}, &colour.Lab{L: 100}},
		{"then the name", Product{Colour: "navy"}, &navy},
		{"a name the lexicon lacks", Product{Colour: "morning fog"}, nil},
		{"no colour", Product{}, nil},
	} {
		t.Run(tc.name, func(t *testing.T) {
			got := tc.p.Lab(lex)
			if (got == nil) != (tc.want == nil) || got != nil && (math.Abs(got.L-tc.want.L) > 1e-3 || math.Abs(got.A-tc.want.A) > 1e-3 || math.Abs(got.B-tc.want.B) > 1e-3) {
				t.Errorf("got %v, want %v", got, tc.want)
			}
		})
	}
}

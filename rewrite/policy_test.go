package rewrite

import (
	"errors"
	"math"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"
	"time"

	"github.com/google/go-cmp/cmp"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/parser"
)

func TestDefaultPolicy(t *testing.T) {
	lex := lexicon.Default()
	p := DefaultPolicy()
	for _, tc := range []struct {
		name, category, productType string
		check                       func(Effective) bool
		reason                      string
	}{
		{"defaults", "", "", func(e Effective) bool {
			return e.MinResults == 1 && e.ColourTolerance == 5 && e.Strictness[parser.KindSpec] == parser.Hard
		},
			"one result is enough; ΔE00 5; designations are hard"},
		{"apparel", "apparel", "", func(e Effective) bool {
			return e.ColourTolerance == 4 && e.Strictness[parser.KindSize] == parser.Hard && e.Strictness[parser.KindPattern] == parser.Soft
		}, "in apparel size is hard and pattern soft; colours match closely"},
		{"camera", "camera", "lens", func(e Effective) bool {
			return e.Dimensions["focal_length"] == parser.Hard && e.Strictness[parser.KindCompatibility] == parser.Hard
		}, "focal length and mount compatibility are hard in camera"},
		{"paint", "paint", "", func(e Effective) bool { return e.Strictness[parser.KindColour] == parser.Hard }, "in paint the colour is hard"},
		{"lumber", "lumber", "", func(e Effective) bool {
			return e.Strictness[parser.KindSpec] == parser.Hard && e.Dimensions["length"] == parser.Firm && len(e.StandardSizes["length"]) > 0
		}, "in lumber the nominal size is hard and the length firm, widened to standard lengths"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			if e := p.For(tc.category, tc.productType, lex); !tc.check(e) {
				t.Errorf("%s: got %+v", tc.reason, e)
			}
		})
	}
}

func TestParsePolicyErrors(t *testing.T) {
	for _, tc := range []struct {
		name, text string
		line, col  int
		msg        string
	}{
		{"syntax", "[defaults\nmin_results = 1\n", 1, 10, ""},
		{"wrong type", "[defaults]\nmin_results = \"one\"\n", 2, 1, ""},
		{"bad strictness", "[defaults.strictness]\nsize = \"strict\"\n", 2, 0, "unknown strictness"},
		{"unknown key", "[defaults]\ncolour_tolerence = 4\n", 2, 1, `did you mean "colour_tolerance"`},
		{"unknown top table", "[default]\nmin_results = 2\n", 1, 1, `did you mean "defaults"`},
		{"unknown kind", "[defaults.strictness]\ncolor = \"hard\"\n", 2, 1, `did you mean "colour"`},
		{"unknown category", "[category.aparel]\nmin_results = 2\n", 1, 1, `did you mean "apparel"`},
		{"unknown product type", "[product_type.\"chelsea boots\"]\nmin_results = 2\n", 1, 1, `did you mean "chelsea boot"`},
		{"min results out of range", "[defaults]\nmin_results = 0\n", 2, 1, "want 1 to 10000"},
		{"tolerance out of range", "[category.apparel]\nmeasure_tolerance = 1.5\n", 2, 1, "want 0 to 1"},
		{"bad standard size", "[category.lumber.standard_sizes]\nlength = [\"8 ft\", \"ten\"]\n", 2, 1, `"ten"`},
		{"unknown signals key", "[signals]\nkeep_shares = 0.8\n", 2, 1, `did you mean "keep_share"`},
		{"unknown interaction", "[signals.weights]\npurchases = 10\n", 2, 1, `did you mean "purchase"`},
		{"negative weight", "[signals.weights]\nclick = -1\n", 2, 1, "want 0 to 1000"},
		{"bad window", "[signals]\njoin_window = \"half an hour\"\n", 2, 1, `want a duration`},
		{"window too short", "[signals]\njoin_window = \"10ms\"\n", 2, 1, "want 1s to 168h"},
		{"share out of range", "[signals]\nkeep_share = 1.5\n", 2, 1, "up to 1"},
		{"bias out of range", "[signals]\nposition_bias = 9\n", 2, 1, "want 0 to 5"},
		{"spec as filler", "[category.tyres.strictness]\nspec = \"filler\"\n", 2, 1, "spec may not be filler"},
		{"a rating as filler", "[defaults.dimensions]\ncurrent = \"filler\"\n", 2, 1, "current may not be filler"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			_, err := ParsePolicy("test.toml", tc.text, lexicon.Default())
			var pe *PolicyError
			if !errors.As(err, &pe) {
				t.Fatalf("got %v, want a *PolicyError", err)
			}
			if pe.Line != tc.line || (tc.col != 0 && pe.Column != tc.col) || !strings.Contains(pe.Msg, tc.msg) {
				t.Errorf("got %v, want line %d col %d containing %q", pe, tc.line, tc.col, tc.msg)
			}
			if r := pe.Render(); !strings.Contains(r, "^") || !strings.Contains(r, pe.Msg) {
				t.Errorf("render lacks the caret or the message: %q", r)
			}
		})
	}
}

// The [signals] table: the built-in values, a file overriding some of
// them, and a warning when a purchase is worth less than a click.
func TestSignalSettings(t *testing.T) {
	def := DefaultPolicy().Signals()
	// The built-in weights rise from impression to purchase (common
	// practice: the costlier the signal to the shopper, the more it says).
	want := Signals{Weights: SignalWeights{Impression: 0.05, Click: 1, AddToCart: 3, Purchase: 10},
		PositionBias: 1, EstimateBias: true, JoinWindow: 30 * time.Minute, MinSearches: 100, KeepShare: 0.8}
	if diff := cmp.Diff(want, def); diff != "" {
		t.Errorf("built-in signals (-want +got):\n%s", diff)
	}
	path := filepath.Join(t.TempDir(), "shop.toml")
	os.WriteFile(path, []byte("[signals]\njoin_window = \"2h\"\n\n[signals.weights]\nclick = 20\n"), 0o644)
	p, err := LoadPolicy(path, lexicon.Default())
	if err != nil {
		t.Fatal(err)
	}
	got := p.Signals()
	want.JoinWindow, want.Weights.Click = 2*time.Hour, 20
	if diff := cmp.Diff(want, got); diff != "" {
		t.Errorf("overlaid signals (-want +got):\n%s", diff)
	}
	if len(p.Warnings) != 1 || !strings.Contains(p.Warnings[0], "add_to_cart (3) is worth less than click (20)") {
		t.Errorf("warnings %q, want one about add_to_cart below click", p.Warnings)
	}
}

// A user file overrides only what it sets; the rest stays the default.
func TestLoadPolicyOverlays(t *testing.T) {
	path := filepath.Join(t.TempDir(), "shop.toml")
	os.WriteFile(path, []byte("[category.apparel]\ncolour_tolerance = 3\n\n[product_type.boot.strictness]\ncolour = \"soft\"\n"), 0o644)
	lex := lexicon.Default()
	p, err := LoadPolicy(path, lex)
	if err != nil {
		t.Fatal(err)
	}
	if e := p.For("apparel", "", lex); e.ColourTolerance != 3 || e.Strictness[parser.KindSize] != parser.Hard {
		t.Errorf("apparel: %+v", e)
	}
	if e := p.For("home", "", lex); e.ColourTolerance != 6 {
		t.Errorf("home kept the default 6? got %v", e.ColourTolerance)
	}
	// chelsea boot's parent is boot: the product type's setting is inherited.
	if e := p.For("footwear", "chelsea boot", lex); e.Strictness[parser.KindColour] != parser.Soft {
		t.Errorf("chelsea boot did not inherit boot's colour strictness: %v", e.Strictness[parser.KindColour])
	}
	if _, err := LoadPolicy(filepath.Join(t.TempDir(), "missing.toml"), lex); err == nil {
		t.Error("a missing file gave no error")
	}
}

// A policy that relaxes what a substitute for could hurt someone loads,
// with a warning that names the level and what may now be substituted.
func TestRelaxingASafetyConstraintWarns(t *testing.T) {
	for _, tc := range []struct{ name, text, want string }{
		{"spec", "[category.electrical.strictness]\nspec = \"soft\"\n", "category.electrical: spec is soft: wire gauges"},
		{"current", "[defaults.dimensions]\ncurrent = \"firm\"\n", "defaults: current is firm: ratings may then be substituted"},
		{"load rating", "[product_type.ladder.dimensions]\nload_rating = \"soft\"\n", "product_type.ladder: load_rating is soft"},
		{"gauge", "[defaults.dimensions]\ngauge = \"firm\"\n", "defaults: gauge is firm: gauge numbers"},
		{"poles", "[category.electrical.dimensions]\npoles = \"soft\"\n", "category.electrical: poles is soft: a breaker's or a switch's poles"},
		{"bolt diameter", "[product_type.\"hex bolt\".dimensions]\ndiameter = \"firm\"\n", "product_type.hex bolt: diameter is firm: fit dimensions"},
		{"rim", "[category.tyres.dimensions]\nrim_diameter = \"soft\"\n", "category.tyres: rim_diameter is soft: fit dimensions"},
		{"a pan's diameter stays quiet", "[product_type.skillet.dimensions]\ndiameter = \"soft\"\n", ""},
		{"hard stays quiet", "[defaults.dimensions]\nvoltage = \"hard\"\n", ""},
		{"other dimensions stay quiet", "[defaults.dimensions]\nlength = \"soft\"\n", ""},
	} {
		t.Run(tc.name, func(t *testing.T) {
			p, err := ParsePolicy("shop.toml", tc.text, lexicon.Default())
			if err != nil {
				t.Fatal(err)
			}
			if tc.want == "" {
				if len(p.Warnings) != 0 {
					t.Errorf("warnings = %q, want none", p.Warnings)
				}
				return
			}
			if len(p.Warnings) != 1 || !strings.Contains(p.Warnings[0], tc.want) || !strings.Contains(p.Warnings[0], "maker's specification") {
				t.Errorf("warnings = %q, want one containing %q", p.Warnings, tc.want)
			}
		})
	}
}

func TestApply(t *testing.T) {
	lex := lexicon.Default()
	for _, tc := range []struct {
		query, reason string
		want          []parser.Strictness
	}{
		{"85 lens", "focal length is hard in camera", []parser.Strictness{parser.Hard, parser.Firm}},
		{"sage paint", "colour is hard in paint", []parser.Strictness{parser.Hard, parser.Firm}},
		{`"sage" rug`, "a quoted phrase stays hard whatever the policy", []parser.Strictness{parser.Hard, parser.Firm}},
		{"sage rug", "colour is firm in home", []parser.Strictness{parser.Firm, parser.Firm}},
		{"20 amp breaker", "a current rating is hard everywhere", []parser.Strictness{parser.Hard, parser.Firm}},
		{"double pole breaker", "so is a breaker's count of poles", []parser.Strictness{parser.Hard, parser.Firm}},
		{"car battery 650 cca", "and a battery's cold cranking amps", []parser.Strictness{parser.Firm, parser.Hard}},
		{"office chair 300 lb capacity", "and a weight capacity, as a load rating", []parser.Strictness{parser.Firm, parser.Hard}},
		{"12v drill", "so is a voltage", []parser.Strictness{parser.Hard, parser.Firm}},
		{"extension ladder 300 lb", "and a load rating", []parser.Strictness{parser.Firm, parser.Hard}},
		{"5/16 carriage bolt 2 in", "a bolt's diameter is hard, inherited from bolt; its length firm", []parser.Strictness{parser.Hard, parser.Firm, parser.Firm}},
		{"10 inch skillet", "a pan's diameter stays firm", []parser.Strictness{parser.Firm, parser.Firm}},
		{"16 gauge sheet metal", "a gauge number outside wiring is hard too: a thinner sheet is no substitute", []parser.Strictness{parser.Hard, parser.Firm}},
		{"20 gauge earrings", "as is a gauge on jewellery", []parser.Strictness{parser.Hard, parser.Firm}},
		{"60w halogen bulb", "a bulb's wattage is hard: a fixture is rated for so many watts (common practice)", []parser.Strictness{parser.Hard, parser.Firm}},
		{"3/8 drive torque wrench", "a square drive is hard in hardware: the socket must go on it (ASME B107, from memory)", []parser.Strictness{parser.Hard, parser.Firm}},
		{"10mm socket 1/2 drive", "and a socket's size across flats: a 3/8 in socket is within 5% of 10 mm and rounds the nut", []parser.Strictness{parser.Hard, parser.Firm, parser.Hard}},
	} {
		r := parser.Parse(tc.query)
		DefaultPolicy().Apply(r, lex)
		var got []parser.Strictness
		for _, c := range r.Constraints {
			got = append(got, c.Strictness)
		}
		if diff := cmp.Diff(tc.want, got); diff != "" {
			t.Errorf("%q: %s (-want +got):\n%s", tc.query, tc.reason, diff)
		}
	}
}

func TestTuned(t *testing.T) {
	lex := lexicon.Default()
	p := DefaultPolicy()
	three, five := 3.0, 5
	tuned := p.Tuned(Tuning{ColourTolerance: &three, MinResults: &five})
	for _, tc := range []struct {
		name, category, productType string
		colour                      float64
		min                         int
		reason                      string
	}{
		{"apparel", "apparel", "sweater", 3, 5, "the tuning lies over the category's 4 (policy.toml) and the default minimum of 1"},
		{"paint", "paint", "", 3, 5, "the tuning lies over paint's 2 as well: every level"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			e := tuned.For(tc.category, tc.productType, lex)
			if e.ColourTolerance != tc.colour || e.MinResults != tc.min {
				t.Errorf("tolerance %g, min %d; want %g, %d (%s)", e.ColourTolerance, e.MinResults, tc.colour, tc.min, tc.reason)
			}
			if before := p.For(tc.category, tc.productType, lex); before.ColourTolerance == three || before.MinResults != 1 {
				t.Errorf("the policy tuned changed: %+v", before)
			}
			if e.Strictness[parser.KindSpec] != parser.Hard {
				t.Errorf("spec is %s under a tuning; want hard", e.Strictness[parser.KindSpec])
			}
		})
	}
}

func TestTuningCheck(t *testing.T) {
	zero, big, nan, fine := 0, 20000, math.NaN(), 1.5
	for _, tc := range []struct {
		name   string
		tuning Tuning
		field  string // "" when it is valid
	}{
		{"empty", Tuning{}, ""},
		{"in range", Tuning{ColourTolerance: &fine}, ""},
		{"no results wanted", Tuning{MinResults: &zero}, "min_results"},
		{"too many results", Tuning{MinResults: &big}, "min_results"},
		{"not a number", Tuning{ColourTolerance: &nan}, "colour_tolerance"},
		{"measure over 100%", Tuning{MeasureTolerance: &fine}, "measure_tolerance"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			err := tc.tuning.Check()
			var te *TuningError
			switch {
			case tc.field == "" && err != nil:
				t.Errorf("Check: %v; want nil", err)
			case tc.field != "" && (!errors.As(err, &te) || te.Field != tc.field):
				t.Errorf("Check: %v; want a TuningError of %s", err, tc.field)
			}
		})
	}
}

// A well formed file reports every problem in it, each at its line and
// column; a file that is not well formed TOML reports the first syntax
// error alone, since nothing after it can be trusted. Well formed means
// TOML v1.0.0 (toml.io/en/v1.0.0): an unterminated table header is a
// syntax error there, a string where this layout wants a number is not.
func TestParsePolicyReportsEveryProblem(t *testing.T) {
	type at struct {
		line, col int
		msg       string
	}
	for _, tc := range []struct {
		name, text string
		want       []at
		reason     string
	}{
		{"two wrong values", "[defaults]\nmeasure_tolerance = \"big\"\nprice_stretch = 0.2\n\n[defaults.strictness]\nsize = \"hardish\"\n",
			[]at{{2, 1, `measure_tolerance: want a number, not a string`}, {6, 1, `unknown strictness "hardish"`}},
			"a string for a number does not hide the bad strictness four lines on"},
		{"every bad strictness of a table", "[category.apparel.strictness]\nsize = \"hardish\"\ncolour = \"soft\"\npattern = 3\n",
			[]at{{2, 1, `unknown strictness "hardish"`}, {4, 1, "pattern: want a strictness: hard, firm, soft or filler, not an integer"}},
			"each value of a table is read alone: the good colour between the two bad ones is no problem"},
		{"misspelt dimensions", "[category.camera.dimensions]\nfocal_lenght = \"soft\"\n\n[category.lumber.standard_sizes]\nlenght = [\"8 ft\"]\n",
			[]at{{2, 1, `unknown dimension "focal_lenght"; did you mean "focal_length"?`}, {5, 1, `unknown dimension "lenght"; did you mean "length"?`}},
			"a lens's slot is focal_length and a board's length (lexicon/data/product_types.wlx); two swapped letters are one edit"},
		{"kind with a suggestion", "[defaults.strictness]\ncolr = \"soft\"\nsize = \"firm\"\n",
			[]at{{2, 1, `unknown constraint kind "colr"; did you mean "colour"?`}},
			"colr is two letters short of colour, near enough in a four-letter word"},
		{"a table where a value goes", "[defaults]\nstrictness = \"hard\"\nmin_results = \"two\"\n",
			[]at{{2, 1, "strictness: want a table, not a string"}, {3, 1, "min_results: want a whole number, not a string"}},
			"a scalar in place of a table is one problem, and the next key is still read"},
		{"signals too", "[signals]\nestimate_position_bias = \"yes\"\nmin_searches = 1.5\n\n[signals.weights]\nclick = \"lots\"\n",
			[]at{{2, 1, "estimate_position_bias: want true or false, not a string"}, {3, 1, "min_searches: want a whole number, not a decimal number"},
				{6, 1, "click: want a number, not a string"}},
			"the [signals] table is read value by value as well"},
		{"inline table", "[defaults]\nstrictness = { colour = \"hardd\", size = \"firm\" }\n",
			[]at{{2, 16, `unknown strictness "hardd"`}},
			"a key inside an inline table is shown where it is written, not at the top of the file"},
		{"inline table, second key", "[category.apparel]\nstrictness = { size = \"firm\", colr = \"soft\" }\n",
			[]at{{2, 31, `unknown constraint kind "colr"`}},
			"the comma starts the next key"},
		{"inline tables nested", "[category]\napparel = { strictness = { colour = \"x\" }, min_results = 0 }\n",
			[]at{{2, 28, `unknown strictness "x"`}, {2, 44, "min_results"}},
			"the key after a nested table's closing brace belongs to the outer table"},
		{"arrays in an inline table", "[category.lumber]\nstandard_sizes = { length = [\"8 ft\", \"ten\"], widht = [\"x,y\"] }\n",
			[]at{{2, 20, `"ten"`}, {2, 46, `unknown dimension "widht"`}},
			"a comma in an array, or in a string, starts no key"},
		{"an escaped quote in an inline table", "[defaults]\nstrictness = { colour = \"a\\\"}, x = {\", colr = \"hard\" }\n",
			[]at{{2, 16, `unknown strictness`}, {2, 40, `unknown constraint kind "colr"`}},
			"a backslash escapes the quote, so the brace and the = after it are still inside the string"},
		{"an = in a quoted key", "[category]\n\"app=arel\" = { min_results = 2 }\n",
			[]at{{2, 1, `unknown category "app=arel"`}},
			"the key is cut at the = outside its quotes"},
		{"a byte order mark", "\ufeff[defaults]\nmin_results = 0\n",
			[]at{{2, 1, "min_results 0"}},
			"a file saved with a byte order mark still has its first table header"},
		{"syntax stops", "[defaults]\nmin_results = \"one\"\n[defaults.strictness\n",
			[]at{{3, 21, ""}},
			"an unterminated table header is a syntax error; the wrong type before it is not reported, as the decoder stops at the syntax"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			_, err := ParsePolicy("shop.toml", tc.text, lexicon.Default())
			if err == nil {
				t.Fatalf("no error; want %d (%s)", len(tc.want), tc.reason)
			}
			errs := []error{err}
			if j, ok := err.(interface{ Unwrap() []error }); ok {
				errs = j.Unwrap()
			}
			if len(errs) != len(tc.want) {
				t.Fatalf("%d errors, want %d (%s):\n%v", len(errs), len(tc.want), tc.reason, err)
			}
			for i, w := range tc.want {
				var pe *PolicyError
				if !errors.As(errs[i], &pe) {
					t.Fatalf("error %d is %v, not a *PolicyError", i, errs[i])
				}
				if pe.Line != w.line || pe.Column != w.col || !strings.Contains(pe.Msg, w.msg) {
					t.Errorf("error %d: %v; want %d:%d containing %q (%s)", i, pe, w.line, w.col, w.msg, tc.reason)
				}
				if r := pe.Render(); !strings.Contains(r, "\n"+strings.Repeat(" ", w.col-1)+"^\n") {
					t.Errorf("error %d renders without a caret under column %d:\n%s", i, w.col, r)
				}
			}
		})
	}
}

// A caret goes under its column past tabs as well as spaces: a tab in
// the line is a tab in the padding, so the caret lines up however wide a
// terminal draws tabs.
func TestPolicyErrorRenderTabs(t *testing.T) {
	_, err := ParsePolicy("shop.toml", "[defaults]\n\tmin_results = 0\n", lexicon.Default())
	var pe *PolicyError
	if !errors.As(err, &pe) {
		t.Fatalf("got %v, want a *PolicyError", err)
	}
	want := "shop.toml:2:2:\n\tmin_results = 0\n\t^\nmin_results 0: want 1 to 10000"
	if got := pe.Render(); got != want {
		t.Errorf("render:\n%q\nwant:\n%q", got, want)
	}
}

// Every dimension a query is read with may be named in a policy, and a
// misspelt one is refused; the names are the lexicon's slots and the
// parser's own (parser.Dimensions).
func TestPolicyDimensionNames(t *testing.T) {
	for _, tc := range []struct {
		name, dim string
		ok        bool
		reason    string
	}{
		{"slot", "focal_length", true, "a lens's slot (lexicon/data/product_types.wlx)"},
		{"quantity", "mass", true, "a measure with no slot of its quantity is named by the quantity"},
		{"count", "pack_size", true, `"8 pack" is a count of pack_size`},
		{"part of a dimension", "depth", true, `"30x20x10 cm" reads width, height, depth`},
		{"misspelt", "diamter", false, "not a name any query is read with"},
		{"other word", "colour", false, "a kind, not a dimension"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			_, err := ParsePolicy("shop.toml", "[defaults.dimensions]\n"+tc.dim+" = \"soft\"\n", lexicon.Default())
			if (err == nil) != tc.ok {
				t.Errorf("%s: error %v; want ok %v (%s)", tc.dim, err, tc.ok, tc.reason)
			}
		})
	}
}

// Settle reads a product type as a query of it is read: in its own
// category (lexicon/data/product_types.wlx gives each type one).
func TestSettle(t *testing.T) {
	p := DefaultPolicy()
	for _, tc := range []struct {
		name, category, productType string
		wantCategory                string
		colour                      float64
		problem                     ScopeProblem
		reason                      string
	}{
		{"type brings its category", "", "rain jacket", "apparel", 4, 0, "a rain jacket is apparel, whose colour tolerance is 4 (policy.toml)"},
		{"category agrees", "apparel", "rain jacket", "apparel", 4, 0, "the same category twice is no contradiction"},
		{"a type with a parent", "", "chelsea boot", "footwear", 4, 0, "chelsea boot is footwear, tolerance 4"},
		{"category alone", "paint", "", "paint", 2, 0, "no product type: the category as given, paint's 2"},
		{"nothing", "", "", "", 5, 0, "the defaults' 5"},
		{"contradiction", "paint", "rain jacket", "", 0, ScopeCategoryMismatch, "a rain jacket is not paint"},
		{"unknown category", "toys", "", "", 0, ScopeUnknownCategory, "toys is not a lexicon category"},
		{"unknown type", "", "hoverboard", "", 0, ScopeUnknownProductType, "no such product type"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			e, err := p.Settle(tc.category, tc.productType, lexicon.Default())
			var se *ScopeError
			switch {
			case tc.problem == 0 && err != nil:
				t.Fatalf("%v (%s)", err, tc.reason)
			case tc.problem != 0 && (!errors.As(err, &se) || se.Problem != tc.problem):
				t.Fatalf("error %v; want problem %d (%s)", err, tc.problem, tc.reason)
			case tc.problem == 0 && (e.Category != tc.wantCategory || e.ColourTolerance != tc.colour):
				t.Errorf("category %q, tolerance %g; want %q, %g (%s)", e.Category, e.ColourTolerance, tc.wantCategory, tc.colour, tc.reason)
			}
		})
	}
}

// A query searched in a category is read in it only when it gives no
// category of its own: a page's category is a guess about the query,
// and a product type or a standard designation in it says more.
func TestParseIn(t *testing.T) {
	rw := New(&memEngine{products: shop}, nil)
	for _, tc := range []struct {
		query, category, reason string
		wantCategory            string
		want                    []string // kind and value of each constraint
	}{
		{"navy m", "apparel", "no category of its own: read in apparel, m is a letter size (common practice)", "apparel",
			[]string{"colour navy", "size m (letter)"}},
		{"navy m", "", "no category given: m is no size", "", []string{"colour navy", "keyword m"}},
		{"cr2032", "apparel", "a battery designation (IEC 60086) gives its own category", "batteries", []string{"spec CR2032 (battery)"}},
		{"m8", "home", "so does a metric thread (ISO 261)", "hardware", []string{"spec M8x1.25 (metric_thread)"}},
		{"85 lens", "apparel", "a product type gives its own category, and its unit", "camera", []string{"measure 85 mm", "product_type lens"}},
	} {
		t.Run(tc.query+" in "+tc.category, func(t *testing.T) {
			r := rw.ParseIn(tc.query, tc.category)
			var got []string
			for _, c := range r.Constraints {
				got = append(got, string(c.Kind)+" "+c.Value())
			}
			if r.Category != tc.wantCategory || !slices.Equal(got, tc.want) {
				t.Errorf("%s: category %q, %q; want %q, %q", tc.reason, r.Category, got, tc.wantCategory, tc.want)
			}
		})
	}
}

// A nil lexicon is the built-in one, as in parser.Options and
// rewrite.New, not a panic.
func TestPolicyWithNilLexicon(t *testing.T) {
	p, err := ParsePolicy("shop.toml", "[category.apparel]\ncolour_tolerance = 3.0\n\n[product_type.\"rain jacket\"]\nmin_results = 2\n", nil)
	if err != nil {
		t.Fatal(err)
	}
	if e := p.For("apparel", "rain jacket", nil); e.ColourTolerance != 3 || e.MinResults != 2 {
		t.Errorf("For = %+v, want tolerance 3 and min results 2", e)
	}
	if e, err := p.Settle("", "rain jacket", nil); err != nil || e.Category != "apparel" {
		t.Errorf("Settle = %+v, %v; want the rain jacket's category, apparel", e, err)
	}
	if _, err := ParsePolicy("shop.toml", "[product_type.zorblax]\nmin_results = 2\n", nil); err == nil {
		t.Error("an unknown product type was accepted with a nil lexicon")
	}
}

package units

import (
	"errors"
	"math"
	"sort"
	"strconv"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/lexicon/reference"
)

func relErr(got, want float64) float64 {
	if want == 0 {
		return math.Abs(got)
	}
	return math.Abs(got-want) / math.Abs(want)
}

// referenceSymbols maps the symbol column of
// testdata/reference/unit_conversions.tsv to whittle's canonical symbol for
// the rows whittle supports.
var referenceSymbols = map[string]string{
	"in": "in", "ft": "ft", "yd": "yd", "mi": "mi", "mil": "mil",
	"lb": "lb", "oz": "oz",
	"L": "l", "gal": "gal", "qt": "qt", "pt": "pt", "cup": "cup", "fl oz": "floz",
	"tbsp": "tbsp", "tsp": "tsp",
	"imp gal": "imp_gal", "imp pt": "imp_pt", "imp fl oz": "imp_floz",
	"psi": "psi",
}

// unsupportedReference lists the rows of unit_conversions.tsv whittle does
// not support, with the reason.
var unsupportedReference = map[string]string{
	"nmi":  "nautical mile: not a shopping unit",
	"gr":   "grain: shops also write gr for gram, so the spelling stays unknown",
	"st":   "stone: body weight, not a product measure",
	"ton":  "short ton: not a product measure in shop queries",
	"LT":   "long ton: not a product measure in shop queries",
	"oz t": "troy ounce: precious metals only",
	"ct":   "carat: gemstones only; ct also means count",
	"t":    "tonne: a bare t is too ambiguous in queries",
	"g_n":  "standard gravity: acceleration, not a whittle quantity",
	"lbf":  "pound-force: force, not a whittle quantity",
	"bar":  "bar: a pressure, but the word names products too (bar stool, towel bar), so the spelling stays unknown",
}

// siToBase is the factor from the SI unit named in unit_conversions.tsv to
// whittle's base unit of the same quantity (SI prefixes; 1 l = 1 dm³, so
// 1 m³ = 1e6 ml).
var siToBase = map[string]float64{"m": 1000, "kg": 1000, "m^3": 1e6, "Pa": 0.001}

// TestFactorsMatchReference checks every supported row of
// testdata/reference/unit_conversions.tsv (NIST SP 811 Appendix B and the
// 1959 international yard and pound agreement, factors derived exactly).
func TestFactorsMatchReference(t *testing.T) {
	rows := reference.Rows(t, "unit_conversions.tsv")
	for _, row := range rows {
		sym := row["symbol"]
		t.Run(sym, func(t *testing.T) {
			if reason, skip := unsupportedReference[sym]; skip {
				t.Skipf("%s (%s) not supported: %s", row["unit"], sym, reason)
			}
			want, ok := referenceSymbols[sym]
			if !ok {
				t.Fatalf("row %q (%s) is neither mapped nor listed as unsupported", row["unit"], sym)
			}
			// Source: NIST SP 811 via unit_conversions.tsv, row "<unit>".
			u, ok := BySymbol(want)
			if !ok {
				t.Fatalf("BySymbol(%q) not found", want)
			}
			scale, ok := siToBase[row["si_unit"]]
			if !ok {
				t.Fatalf("unexpected SI unit %q", row["si_unit"])
			}
			if q := map[string]Quantity{"m": Length, "kg": Mass, "m^3": Volume, "Pa": Pressure}[row["si_unit"]]; u.Quantity != q {
				t.Errorf("%s measures %s, reference row is in %s", want, u.Quantity, row["si_unit"])
			}
			si, err := strconv.ParseFloat(row["factor_to_si"], 64)
			if err != nil {
				t.Fatal(err)
			}
			if e := relErr(u.ToBase, si*scale); e > 1e-12 {
				t.Errorf("%s ToBase = %.17g, NIST SP 811 (%s) gives %.17g %s = %.17g %s; relative error %g",
					want, u.ToBase, row["unit"], si, row["si_unit"], si*scale, Base(u.Quantity), e)
			}
			// The reference's own symbol is a spelling shoppers use too.
			got, ok := Lookup(sym, USCustomary)
			if !ok || got.Symbol != want {
				t.Errorf("Lookup(%q) = %q, %v; want %q", sym, got.Symbol, ok, want)
			}
		})
	}
}

// derivedFactors holds units the reference table does not list, with the
// factor written out by hand and its source.
var derivedFactors = []struct {
	sym    string
	toBase float64
	source string
}{
	{"mm", 1, "base unit of length"},
	{"um", 0.001, "SI Brochure, prefix micro = 1e-6: a micron is a micrometre"},
	{"cm", 10, "SI Brochure, prefix centi = 1e-2"},
	{"m", 1000, "SI Brochure, prefix milli = 1e-3"},
	{"km", 1e6, "SI Brochure, prefix kilo = 1e3"},
	{"g", 1, "base unit of mass"},
	{"mg", 0.001, "SI Brochure, prefix milli"},
	{"kg", 1000, "SI Brochure, prefix kilo"},
	{"ml", 1, "base unit of volume"},
	{"cl", 10, "SI Brochure, prefix centi"},
	{"dl", 100, "SI Brochure, prefix deci"},
	{"imp_qt", 1136.5225, "imperial quart = imperial gallon / 4 (UK Weights and Measures Act 1985, from memory), from the 4.54609 l row of unit_conversions.tsv"},
	{"in3", 16.387064, "cubic inch = (25.4 mm)³, from the inch row of unit_conversions.tsv (0.0254 m, exact)"},
	{"ft3", 28316.846592, "cubic foot = (304.8 mm)³, from the foot row of unit_conversions.tsv (0.3048 m, exact)"},
	{"yd3", 764554.857984, "cubic yard = (914.4 mm)³, from the yard row of unit_conversions.tsv (0.9144 m, exact)"},
	{"hz", 1, "base unit of frequency"},
	{"gsm", 1, "base unit of grammage, g/m²"},
	{"kelvin", 1, "base unit of colour temperature, the kelvin (SI Brochure)"},
	{"kpa", 1, "base unit of pressure"},
	{"mpa", 1000, "SI Brochure, prefix mega: 1 MPa = 1000 kPa"},
	{"j", 1, "base unit of energy"},
	{"wh", 3600, "a watt for an hour: 1 W × 3600 s (SI Brochure: W = J/s; the hour of table 8, from memory)"},
	{"kwh", 3.6e6, "SI Brochure, prefix kilo: 1000 Wh"},
	{"khz", 1e3, "SI Brochure, prefix kilo"},
	{"mhz", 1e6, "SI Brochure, prefix mega = 1e6"},
	{"ghz", 1e9, "SI Brochure, prefix giga = 1e9"},
	{"imp_cup", 284.130625, "imperial cup = half an imperial pint = 10 imperial fl oz (from memory), from the imp pt row of unit_conversions.tsv"},
	{"w", 1, "base unit of power"},
	{"kw", 1000, "SI Brochure, prefix kilo"},
	{"v", 1, "base unit of voltage"},
	{"mv", 0.001, "SI Brochure, prefix milli"},
	{"kv", 1000, "SI Brochure, prefix kilo"},
	{"a", 1, "base unit of current"},
	{"ma", 0.001, "SI Brochure, prefix milli"},
	{"mah", 1, "base unit of charge"},
	{"ah", 1000, "SI Brochure, prefix milli: 1 Ah = 1000 mAh"},
	{"kb", 1e-6, "decimal prefixes for bytes (IEC 80000-13, from memory): 1 GB = 1e6 kB"},
	{"mb", 1e-3, "IEC 80000-13 decimal prefixes (from memory): 1 GB = 1000 MB"},
	{"gb", 1, "base unit of data"},
	{"tb", 1000, "IEC 80000-13 decimal prefixes (from memory): 1 TB = 1000 GB"},
	{"pb", 1e6, "IEC 80000-13 decimal prefixes (from memory): 1 PB = 1e6 GB"},
	{"s", 1, "base unit of time"},
	{"ms", 0.001, "SI Brochure, prefix milli"},
	{"min", 60, "SI Brochure table 8 (non-SI units accepted for use with the SI), from memory"},
	{"h", 3600, "SI Brochure table 8, from memory"},
	{"day", 86400, "SI Brochure table 8, from memory"},
}

func TestDerivedFactors(t *testing.T) {
	for _, tc := range derivedFactors {
		t.Run(tc.sym, func(t *testing.T) {
			// Source: tc.source.
			u, ok := BySymbol(tc.sym)
			if !ok {
				t.Fatalf("BySymbol(%q) not found", tc.sym)
			}
			if e := relErr(u.ToBase, tc.toBase); e > 1e-12 {
				t.Errorf("%s ToBase = %.17g, want %.17g (%s)", tc.sym, u.ToBase, tc.toBase, tc.source)
			}
		})
	}
}

// TestUSGallonIsCubicInches checks the US gallon against its definition,
// 231 cubic inches (NIST SP 811 Appendix B, via unit_conversions.tsv row
// "gallon (US liquid)"), using the inch factor.
func TestUSGallonIsCubicInches(t *testing.T) {
	in, _ := BySymbol("in")
	gal, _ := BySymbol("gal")
	// 1 ml = 1000 mm³.
	want := 231 * in.ToBase * in.ToBase * in.ToBase / 1000
	if e := relErr(gal.ToBase, want); e > 1e-12 {
		t.Errorf("gal = %.17g ml, 231 in³ = %.17g ml", gal.ToBase, want)
	}
}

// canonicalSymbols is whittle's unit set as specified for the package.
var canonicalSymbols = []string{
	"um", "mm", "cm", "m", "km", "in", "ft", "yd", "mi", "mil",
	"g", "kg", "mg", "lb", "oz",
	"ml", "cl", "dl", "l", "floz", "cup", "pt", "qt", "gal", "tsp", "tbsp",
	"imp_floz", "imp_cup", "imp_pt", "imp_qt", "imp_gal", "in3", "ft3", "yd3",
	"w", "kw", "v", "mv", "kv", "a", "ma", "mah", "ah",
	"kb", "mb", "gb", "tb", "pb",
	"s", "ms", "min", "h", "day",
	"hz", "khz", "mhz", "ghz", "gsm", "kelvin",
	"kpa", "mpa", "psi", "j", "wh", "kwh",
}

// TestUnitSetIsCheckedAndComplete makes sure every unit's factor is checked
// by one of the tests above and that the set is the specified one.
func TestUnitSetIsCheckedAndComplete(t *testing.T) {
	checked := map[string]bool{}
	for _, s := range referenceSymbols {
		checked[s] = true
	}
	for _, d := range derivedFactors {
		if checked[d.sym] {
			t.Errorf("%s is checked twice", d.sym)
		}
		checked[d.sym] = true
	}
	var got []string
	for _, u := range Units() {
		got = append(got, u.Symbol)
		if !checked[u.Symbol] {
			t.Errorf("unit %s has no factor check", u.Symbol)
		}
		if u.Name == "" || u.ToBase <= 0 {
			t.Errorf("unit %s: empty name or non-positive factor", u.Symbol)
		}
	}
	want := append([]string(nil), canonicalSymbols...)
	sort.Strings(got)
	sort.Strings(want)
	if strings.Join(got, " ") != strings.Join(want, " ") {
		t.Errorf("units:\n got %v\nwant %v", got, want)
	}
}

func TestUnitsOrderedAndFresh(t *testing.T) {
	us := Units()
	qi := map[Quantity]int{}
	for i, q := range Quantities() {
		qi[q] = i
	}
	for i := 1; i < len(us); i++ {
		a, b := us[i-1], us[i]
		if qi[a.Quantity] > qi[b.Quantity] || (a.Quantity == b.Quantity && a.ToBase > b.ToBase) {
			t.Errorf("Units() out of order at %s, %s", a.Symbol, b.Symbol)
		}
	}
	us[0].Symbol = "changed"
	if Units()[0].Symbol == "changed" {
		t.Error("Units() shares its backing array with the package table")
	}
}

func TestBase(t *testing.T) {
	tests := []struct {
		q      Quantity
		want   string
		reason string
	}{
		{Length, "mm", "shop lengths (lenses, screens, lumber) compare in millimetres"},
		{Mass, "g", "grams"},
		{Volume, "ml", "millilitres"},
		{Power, "w", "watts"},
		{Voltage, "v", "volts"},
		{Current, "a", "amperes"},
		{Charge, "mah", "battery capacity is sold in mAh"},
		{Data, "gb", "storage is sold in GB"},
		{Time, "s", "seconds"},
		{Quantity("temperature"), "", "unknown quantity has no base"},
	}
	for _, tc := range tests {
		t.Run(string(tc.q), func(t *testing.T) {
			if got := Base(tc.q); got != tc.want {
				t.Fatalf("Base(%s) = %q, want %q (%s)", tc.q, got, tc.want, tc.reason)
			}
			if tc.want == "" {
				return
			}
			u, ok := BySymbol(tc.want)
			if !ok || u.Quantity != tc.q || u.ToBase != 1 {
				t.Errorf("base unit %s = %+v, want quantity %s and factor 1", tc.want, u, tc.q)
			}
		})
	}
}

func TestBySymbol(t *testing.T) {
	tests := []struct {
		name, sym string
		ok        bool
		reason    string
	}{
		{"canonical", "imp_gal", true, "canonical symbols are found"},
		{"upper case", "MM", false, "BySymbol is exact; Lookup folds case"},
		{"alias", "inch", false, "names are for Lookup, not BySymbol"},
		{"empty", "", false, "empty symbol"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			u, ok := BySymbol(tc.sym)
			if ok != tc.ok || (ok && u.Symbol != tc.sym) {
				t.Errorf("BySymbol(%q) = %+v, %v; want ok=%v (%s)", tc.sym, u, ok, tc.ok, tc.reason)
			}
		})
	}
}

func TestLookup(t *testing.T) {
	tests := []struct {
		name, in string
		sys      VolumeSystem
		want     string // "" means unknown
		reason   string
	}{
		{"mm symbol", "mm", USCustomary, "mm", "canonical symbol"},
		{"mm upper", "MM", USCustomary, "mm", "case-insensitive"},
		{"mm padded", "  mm\t", USCustomary, "mm", "surrounding white space is trimmed"},
		{"millimetre", "millimetre", USCustomary, "mm", "British spelling"},
		{"millimeter", "millimeter", USCustomary, "mm", "American spelling"},
		{"millimeters", "Millimeters", USCustomary, "mm", "plural, capitalised"},
		{"centimetres", "centimetres", USCustomary, "cm", "British plural"},
		{"metre", "m", USCustomary, "m", "bare m is the metre; the parser decides when it is a size"},
		{"meters", "meters", USCustomary, "m", "American plural"},
		{"mtr", "mtr", USCustomary, "m", "shop abbreviation for metre"},
		{"km", "KM", USCustomary, "km", "kilometre symbol"},
		{"inch symbol", "in", USCustomary, "in", "inch symbol"},
		{"inch dot", "in.", USCustomary, "in", "abbreviation with full stop"},
		{"inch name", "inch", USCustomary, "in", "singular name"},
		{"inches", "INCHES", USCustomary, "in", "plural, upper case"},
		{"double quote", `"`, USCustomary, "in", `the " mark means inch`},
		{"double prime", "″", USCustomary, "in", "U+2033 double prime means inch"},
		{"two apostrophes", "''", USCustomary, "in", "two apostrophes typed for the inch mark"},
		{"right double quote", "”", USCustomary, "in", "phones turn \" into U+201D"},
		{"foot symbol", "ft", USCustomary, "ft", "foot symbol"},
		{"foot", "foot", USCustomary, "ft", "singular"},
		{"feet", "Feet", USCustomary, "ft", "irregular plural"},
		{"apostrophe", "'", USCustomary, "ft", "the ' mark means foot"},
		{"prime", "′", USCustomary, "ft", "U+2032 prime means foot"},
		{"right single quote", "’", USCustomary, "ft", "phones turn ' into U+2019"},
		{"yards", "yds", USCustomary, "yd", "plural abbreviation"},
		{"miles", "miles", USCustomary, "mi", "plural"},
		{"thou", "thou", USCustomary, "mil", "thou is the mil (inch/1000)"},
		{"grams", "grams", USCustomary, "g", "plural"},
		{"gm", "gm", USCustomary, "g", "shop abbreviation for gram"},
		{"kilos", "kilos", USCustomary, "kg", "colloquial kilogram"},
		{"kgs", "KGS", USCustomary, "kg", "plural abbreviation"},
		{"lbs", "lbs", USCustomary, "lb", "plural abbreviation"},
		{"lbs dot", "lbs.", USCustomary, "lb", "with full stop"},
		{"pound", "pound", USCustomary, "lb", "name"},
		{"pounds", "Pounds", USCustomary, "lb", "plural"},
		{"oz", "oz", USCustomary, "oz", "ounce (mass)"},
		{"ounces imperial", "ounces", Imperial, "oz", "a plain ounce is mass in both systems"},
		{"fl oz", "fl oz", USCustomary, "floz", "fluid ounce with a space"},
		{"floz", "floz", USCustomary, "floz", "fluid ounce joined"},
		{"fl. oz.", "fl. oz.", USCustomary, "floz", "full stops are dropped"},
		{"FL-OZ", "FL-OZ", USCustomary, "floz", "hyphen counts as a space"},
		{"fl  oz", "fl  oz", USCustomary, "floz", "runs of spaces collapse"},
		{"fl nbsp oz", "fl\u00a0oz", USCustomary, "floz", "no-break space counts as a space"},
		{"fluid ounces", "fluid ounces", USCustomary, "floz", "full name"},
		{"quart", "quart", USCustomary, "qt", "US quart by default"},
		{"gallon", "gallon", USCustomary, "gal", "US gallon by default"},
		{"gal", "gal", USCustomary, "gal", "US gallon symbol"},
		{"litre", "litre", USCustomary, "l", "British spelling"},
		{"liter", "liter", USCustomary, "l", "American spelling"},
		{"L", "L", USCustomary, "l", "capital L is the litre symbol"},
		{"ltr", "ltr", USCustomary, "l", "shop abbreviation"},
		{"script l", "ℓ", USCustomary, "l", "U+2113 script small l"},
		{"ml", "mL", USCustomary, "ml", "mixed case symbol"},
		{"cc", "cc", USCustomary, "ml", "cubic centimetre = 1 ml (SI Brochure: 1 l = 1 dm³)"},
		{"cm3", "cm³", USCustomary, "ml", "cubic centimetre with superscript"},
		{"tbsp", "Tbsp", USCustomary, "tbsp", "tablespoon abbreviation"},
		{"teaspoons", "teaspoons", USCustomary, "tsp", "plural"},
		{"w", "W", USCustomary, "w", "watt symbol"},
		{"watts", "watts", USCustomary, "w", "plural"},
		{"kw", "kW", USCustomary, "kw", "kilowatt"},
		{"volt", "V", USCustomary, "v", "volt symbol"},
		{"volts", "volts", USCustomary, "v", "plural"},
		{"amp", "amp", USCustomary, "a", "colloquial ampere"},
		{"amps", "AMPS", USCustomary, "a", "plural"},
		{"ampere", "ampere", USCustomary, "a", "full name"},
		{"milliamps", "mA", USCustomary, "ma", "milliampere symbol"},
		{"mah", "mAh", USCustomary, "mah", "battery capacity"},
		{"ah", "Ah", USCustomary, "ah", "ampere-hour"},
		{"amp-hour", "amp-hour", USCustomary, "ah", "hyphenated name"},
		{"gb", "GB", USCustomary, "gb", "gigabyte"},
		{"gig", "gig", USCustomary, "gb", "colloquial gigabyte"},
		{"gigs", "gigs", USCustomary, "", "not a listed spelling"},
		{"tb", "TB", USCustomary, "tb", "terabyte"},
		{"sec", "sec", USCustomary, "s", "abbreviation"},
		{"second", "seconds", USCustomary, "s", "plural"},
		{"min", "min", USCustomary, "min", "minute symbol"},
		{"minute", "minute", USCustomary, "min", "name"},
		{"hr", "hr", USCustomary, "h", "abbreviation"},
		{"hrs", "hrs", USCustomary, "h", "plural abbreviation"},
		{"hour", "hours", USCustomary, "h", "plural"},
		{"days", "days", USCustomary, "day", "plural"},
		{"canonical imp", "imp_gal", USCustomary, "imp_gal", "canonical symbols work in Lookup too"},
		{"gr", "gr", USCustomary, "", "gram or grain: ambiguous in shops"},
		{"lt", "LT", USCustomary, "", "litre or long ton: ambiguous"},
		{"unknown", "furlong", USCustomary, "", "not a whittle unit"},
		{"empty", "", USCustomary, "", "empty input"},
		{"only space", "   ", USCustomary, "", "white space only"},
		{"only dots", "..", USCustomary, "", "nothing left after dropping full stops"},
		{"too long", strings.Repeat("millimetre", 10), USCustomary, "", "longer than any spelling"},
		{"invalid utf8", "m\xffm", USCustomary, "", "invalid bytes match nothing"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			got, ok := Lookup(tc.in, tc.sys)
			if tc.want == "" {
				if ok {
					t.Errorf("Lookup(%q) = %s, want unknown (%s)", tc.in, got.Symbol, tc.reason)
				}
				return
			}
			if !ok || got.Symbol != tc.want {
				t.Errorf("Lookup(%q) = %q, %v; want %q (%s)", tc.in, got.Symbol, ok, tc.want, tc.reason)
			}
		})
	}
}

// TestVolumeSystem checks the names that differ between US customary and
// imperial measure. Millilitre values: unit_conversions.tsv (NIST SP 811;
// UK Weights and Measures Act 1985), imperial quart and cup from memory as
// in derivedFactors.
func TestVolumeSystem(t *testing.T) {
	tests := []struct {
		name, in string
		us, imp  float64
		reason   string
	}{
		{"gallon", "gallon", 3785.411784, 4546.09, "231 in³ vs 4.54609 l"},
		{"gal", "gal", 3785.411784, 4546.09, "symbol follows the system too"},
		{"quart", "qt", 946.352946, 1136.5225, "gallon / 4 in each system"},
		{"pint", "pints", 473.176473, 568.26125, "US pint is 16 US fl oz, imperial pint 20 imperial fl oz"},
		{"cup", "cup", 236.5882365, 284.130625, "US customary cup (not the 240 ml nutrition-label cup) vs imperial cup"},
		{"fl oz", "fl oz", 29.5735295625, 28.4130625, "US fl oz is larger than the imperial one"},
		{"fluid ounce", "Fluid Ounce", 29.5735295625, 28.4130625, "full name"},
		{"US gallon", "US gallon", 3785.411784, 3785.411784, "an explicit US name ignores the system"},
		{"U.S. gal", "U.S. gal", 3785.411784, 3785.411784, "full stops dropped in U.S."},
		{"imperial gallon", "imperial gallon", 4546.09, 4546.09, "an explicit imperial name ignores the system"},
		{"UK pint", "UK pint", 568.26125, 568.26125, "UK means imperial"},
		{"litre", "litre", 1000, 1000, "metric volumes are the same in both"},
		{"tbsp", "tbsp", 14.78676478125, 14.78676478125, "spoons are always US customary in whittle"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			for _, c := range []struct {
				sys  VolumeSystem
				want float64
			}{{USCustomary, tc.us}, {Imperial, tc.imp}} {
				u, ok := Lookup(tc.in, c.sys)
				if !ok || u.Quantity != Volume {
					t.Fatalf("Lookup(%q, %d) = %+v, %v", tc.in, c.sys, u, ok)
				}
				if e := relErr(u.ToBase, c.want); e > 1e-12 {
					t.Errorf("Lookup(%q, %d) = %s of %.12g ml, want %.12g ml (%s)", tc.in, c.sys, u.Symbol, u.ToBase, c.want, tc.reason)
				}
			}
		})
	}
}

func TestConvert(t *testing.T) {
	tests := []struct {
		name     string
		amount   float64
		from, to string
		want     float64
		exact    bool
		reason   string
	}{
		{"foot to inch", 1, "ft", "in", 12, true, "1 ft = 12 in exactly (yard/3 vs yard/36, NIST SP 811)"},
		{"mile to foot", 1, "mi", "ft", 5280, true, "1 mi = 5280 ft (unit_conversions.tsv)"},
		{"inch to mm", 2, "in", "mm", 50.8, true, "1 in = 25.4 mm exactly"},
		{"mm to inch", 100, "mm", "in", 100 / 25.4, false, "100 mm = 3.937007874 in"},
		{"gallon to quart", 1, "gal", "qt", 4, true, "1 gal = 4 qt (unit_conversions.tsv)"},
		{"imperial gallon to pint", 1, "imp_gal", "imp_pt", 8, true, "1 imp gal = 8 imp pt (unit_conversions.tsv)"},
		{"gallon to litre", 1, "gal", "l", 3.785411784, true, "231 in³ = 3.785411784 l (NIST SP 811)"},
		{"pound to ounce", 1, "lb", "oz", 16, true, "1 lb = 16 oz (unit_conversions.tsv)"},
		{"kg to lb", 1, "kg", "lb", 1 / 0.45359237, false, "1 kg = 2.2046226218 lb (1959 agreement)"},
		{"fl oz to tbsp", 1, "floz", "tbsp", 2, true, "1 fl oz = 2 tbsp (unit_conversions.tsv)"},
		{"tbsp to tsp", 1, "tbsp", "tsp", 3, true, "1 tbsp = 3 tsp (fl oz/2 vs fl oz/6)"},
		{"TB to GB", 2, "tb", "gb", 2000, true, "decimal data sizes"},
		{"mAh to Ah", 3000, "mah", "ah", 3, true, "1 Ah = 1000 mAh"},
		{"minutes to hours", 90, "min", "h", 1.5, true, "60 min = 1 h"},
		{"same unit", 7.25, "in", "in", 7.25, true, "identity"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			from, ok1 := BySymbol(tc.from)
			to, ok2 := BySymbol(tc.to)
			if !ok1 || !ok2 {
				t.Fatalf("unknown symbols %s, %s", tc.from, tc.to)
			}
			got, err := Convert(tc.amount, from, to)
			if err != nil {
				t.Fatal(err)
			}
			if tc.exact && got != tc.want {
				t.Errorf("Convert(%g %s to %s) = %.17g, want exactly %.17g (%s)", tc.amount, tc.from, tc.to, got, tc.want, tc.reason)
			}
			if e := relErr(got, tc.want); e > 1e-15 {
				t.Errorf("Convert(%g %s to %s) = %.17g, want %.17g (%s)", tc.amount, tc.from, tc.to, got, tc.want, tc.reason)
			}
		})
	}
}

func TestConvertErrors(t *testing.T) {
	mm, _ := BySymbol("mm")
	in, _ := BySymbol("in")
	g, _ := BySymbol("g")
	gal, _ := BySymbol("gal")
	lb, _ := BySymbol("lb")
	w, _ := BySymbol("w")
	v, _ := BySymbol("v")
	gb, _ := BySymbol("gb")
	s, _ := BySymbol("s")
	tests := []struct {
		name         string
		from, to     Unit
		incompatible bool
		reason       string
	}{
		{"length to mass", mm, g, true, "millimetres are not grams"},
		{"volume to mass", gal, lb, true, "no density is assumed"},
		{"power to voltage", w, v, true, "watts are not volts"},
		{"data to time", gb, s, true, "gigabytes are not seconds"},
		{"zero factor", Unit{Symbol: "x", Quantity: Length}, in, false, "a caller-made unit without a factor"},
		{"negative factor", in, Unit{Symbol: "y", Quantity: Length, ToBase: -1}, false, "a negative factor is meaningless"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			_, err := Convert(1, tc.from, tc.to)
			if err == nil {
				t.Fatalf("Convert(%s to %s) succeeded, want error (%s)", tc.from.Symbol, tc.to.Symbol, tc.reason)
			}
			if errors.Is(err, ErrIncompatible) != tc.incompatible {
				t.Errorf("errors.Is(%v, ErrIncompatible) = %v, want %v", err, !tc.incompatible, tc.incompatible)
			}
		})
	}
}

// TestConvertCallerUnit converts with a unit the caller made: the hand,
// 4 in (from memory; used for horse heights).
func TestConvertCallerUnit(t *testing.T) {
	hand := Unit{Symbol: "hand", Name: "hand", Quantity: Length, ToBase: 101.6}
	in, _ := BySymbol("in")
	got, err := Convert(3, hand, in)
	if err != nil {
		t.Fatal(err)
	}
	if relErr(got, 12) > 1e-15 {
		t.Errorf("3 hands = %.17g in, want 12", got)
	}
}

func TestLookupDoesNotAllocate(t *testing.T) {
	inputs := []string{"mm", "Millimetres", "  fl. oz. ", "FL-OZ", "mAh", "gallon", "furlong", `"`, "″", "’"}
	for _, in := range inputs {
		allocs := testing.AllocsPerRun(100, func() {
			Lookup(in, Imperial)
		})
		if allocs != 0 {
			t.Errorf("Lookup(%q) allocates %v times per call, want 0", in, allocs)
		}
	}
}

// TestConcurrentLookup exercises Lookup and Convert from many goroutines;
// run with -race to catch shared mutable state.
func TestConcurrentLookup(t *testing.T) {
	done := make(chan bool)
	for i := 0; i < 8; i++ {
		go func() {
			defer func() { done <- true }()
			for j := 0; j < 200; j++ {
				u, ok := Lookup("feet", USCustomary)
				in, _ := BySymbol("in")
				if got, err := Convert(1, u, in); !ok || err != nil || got != 12 {
					t.Errorf("1 foot = %v in, %v", got, err)
					return
				}
			}
		}()
	}
	for i := 0; i < 8; i++ {
		<-done
	}
}

func BenchmarkLookup(b *testing.B) {
	inputs := []string{"mm", "inches", "Lbs.", "fl oz", "mAh", "gallon", "GB", "wool"}
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		Lookup(inputs[i%len(inputs)], USCustomary)
	}
}

func BenchmarkConvert(b *testing.B) {
	ft, _ := BySymbol("ft")
	mm, _ := BySymbol("mm")
	b.ReportAllocs()
	for b.Loop() {
		if _, err := Convert(6, ft, mm); err != nil {
			b.Fatal(err)
		}
	}
}

// Every unit's written symbol is unique, so the output never confuses two
// units.
func TestWrittenSymbolsAreUnique(t *testing.T) {
	seen := make(map[string]string)
	for _, u := range Units() {
		w := u.String()
		if other, dup := seen[w]; dup {
			t.Errorf("%s and %s are both written %q", other, u.Symbol, w)
		}
		seen[w] = u.Symbol
	}
}

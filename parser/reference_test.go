package parser

// End-to-end checks of the parser against published tables. Each table is
// read from testdata/reference (see lexicon/reference); each test names
// the standard its numbers come from. The parser must read a query the way
// the standard defines the designation or unit.

import (
	"fmt"
	"math"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"github.com/bojanz/currency"

	"github.com/whittle-search/whittle/lexicon/reference"
)

func float(t *testing.T, r reference.Row, col string) float64 {
	t.Helper()
	v, err := r.Float(col)
	if err != nil {
		t.Fatal(err)
	}
	return v
}

// only returns the single constraint of kind k in r, failing otherwise.
func only(t *testing.T, r *Result, k Kind) Constraint {
	t.Helper()
	cs := r.Of(k)
	if len(cs) != 1 {
		t.Fatalf("%q: want one %s constraint, got %d in %s", r.Query, k, len(cs), summary(r))
	}
	return cs[0]
}

func summary(r *Result) string {
	var parts []string
	for _, c := range r.Constraints {
		parts = append(parts, fmt.Sprintf("%s[%s]=%s", c.Kind, c.Text, c.Value()))
	}
	for _, e := range r.Errors {
		parts = append(parts, "error: "+e.Error())
	}
	return strings.Join(parts, ", ")
}

func near(a, b, tol float64) bool { return math.Abs(a-b) <= tol }

// PS 20 (American Softwood Lumber Standard) dry dressed sizes:
// testdata/reference/lumber_ps20_sizes.tsv. "2x4 stud" must name the
// nominal size and carry its dressed millimetres.
func TestLumberSizesPS20(t *testing.T) {
	for _, row := range reference.Rows(t, "lumber_ps20_sizes.tsv") {
		q := row["nominal"] + " stud"
		r := Parse(q)
		c := only(t, r, KindSpec)
		if c.Spec.System != "lumber" || c.Spec.Designation != row["nominal"] {
			t.Errorf("%q: got %s %s, want lumber %s", q, c.Spec.System, c.Spec.Designation, row["nominal"])
			continue
		}
		if got, want := c.Spec.Dimensions["thickness"], float(t, row, "dry_thickness_mm"); got != want {
			t.Errorf("%q: thickness %v mm, PS 20 gives %v", q, got, want)
		}
		if got, want := c.Spec.Dimensions["width"], float(t, row, "dry_width_mm"); got != want {
			t.Errorf("%q: width %v mm, PS 20 gives %v", q, got, want)
		}
		if c.Strictness != Hard {
			t.Errorf("%q: a lumber size must be hard, got %s", q, c.Strictness)
		}
	}
}

// radialSize splits a radial designation of the reference table, "205/55
// R16", into its three numbers.
var radialSize = regexp.MustCompile(`^(\d{3})/(\d{2}) ?R(\d{2})$`)

// ISO metric tyre designations (ISO 4000-1 / ETRTO), worked examples in
// testdata/reference/tyre_size_examples.tsv, written "205/55 R16",
// "205/55r16" and, for radial sizes, as three numbers on tyres.
func TestTyreSizesISO(t *testing.T) {
	for _, row := range reference.Rows(t, "tyre_size_examples.tsv") {
		joined := strings.ToLower(strings.ReplaceAll(row["designation"], " ", ""))
		qs := []string{row["designation"] + " tyres", joined}
		// A radial size typed as three numbers on tyres: "tyres 205 55
		// 16" (common practice).
		if m := radialSize.FindStringSubmatch(row["designation"]); m != nil {
			qs = append(qs, "tyres "+m[1]+" "+m[2]+" "+m[3])
		}
		for _, q := range qs {
			c := only(t, Parse(q), KindSpec)
			if c.Spec.System != "tyre" {
				t.Errorf("%q: system %s, want tyre", q, c.Spec.System)
				continue
			}
			if got, want := c.Spec.Dimensions["overall_diameter"], float(t, row, "overall_diameter_mm"); !near(got, want, 0.05) {
				t.Errorf("%q: overall diameter %.2f mm, reference gives %.2f", q, got, want)
			}
			if got, want := c.Spec.Dimensions["sidewall_height"], float(t, row, "sidewall_height_mm"); !near(got, want, 0.05) {
				t.Errorf("%q: sidewall %.2f mm, reference gives %.2f", q, got, want)
			}
		}
	}
}

// ASTM B258 American Wire Gauge diameters:
// testdata/reference/awg_wire_diameters.tsv, for "N awg" and "N gauge",
// and the aught sizes as the table writes them ("00 awg") and as they are
// sold ("2/0 awg", "2/0 battery cable": N/0 is the N-zero size, common
// practice).
func TestWireGaugeASTMB258(t *testing.T) {
	for _, row := range reference.Rows(t, "awg_wire_diameters.tsv") {
		n, err := strconv.Atoi(row["n"])
		if err != nil {
			t.Fatalf("row %v: n is not a number", row)
		}
		qs := []string{row["gauge"] + " awg wire", row["gauge"] + " gauge wire", "awg " + row["gauge"] + " wire"}
		if n <= 0 {
			aught := strconv.Itoa(1-n) + "/0"
			qs = append(qs, aught+" awg", aught+" gauge wire", aught+" battery cable", aught+" wire")
		}
		for _, q := range qs {
			c := only(t, Parse(q), KindSpec)
			if got, want := c.Spec.Dimensions["diameter"], float(t, row, "d_formula_mm"); !near(got, want, 1e-4) {
				t.Errorf("%q: diameter %.5f mm, ASTM B258 formula gives %.5f", q, got, want)
			}
			if c.Strictness != Hard {
				t.Errorf("%q: a wire gauge must be hard, got %s", q, c.Strictness)
			}
		}
	}
}

// ISO 261 metric coarse threads: testdata/reference/threads_metric_iso261_262.tsv.
func TestMetricThreadsISO261(t *testing.T) {
	for _, row := range reference.Rows(t, "threads_metric_iso261_262.tsv") {
		q := strings.ToLower(row["designation"]) + " bolt"
		c := only(t, Parse(q), KindSpec)
		if c.Spec.System != "metric_thread" {
			t.Errorf("%q: system %s, want metric_thread", q, c.Spec.System)
			continue
		}
		if got, want := c.Spec.Dimensions["pitch"], float(t, row, "coarse_pitch_mm"); !near(got, want, 1e-9) {
			t.Errorf("%q: pitch %v mm, ISO 261 coarse pitch is %v", q, got, want)
		}
		if got, want := c.Spec.Dimensions["major_diameter"], float(t, row, "nominal_diameter_mm"); !near(got, want, 1e-9) {
			t.Errorf("%q: diameter %v mm, want %v", q, got, want)
		}
	}
}

// A metric fastener's length after its thread, for every ISO 261 size of
// testdata/reference/threads_metric_iso261_262.tsv: "M6 x 20" is the
// thread and 20 mm of length (common practice), spaced, joined and with
// the coarse pitch written out, since every pitch the table lists, coarse
// or fine, is at most maxPitch and 20 is above it.
func TestMetricFastenerLengthISO261(t *testing.T) {
	for _, row := range reference.Rows(t, "threads_metric_iso261_262.tsv") {
		pitches := append([]string{row["coarse_pitch_mm"]}, strings.Fields(row["fine_pitches_ct3d_mm"])...)
		for _, ps := range pitches {
			if v, err := strconv.ParseFloat(ps, 64); err != nil || v > maxPitch {
				t.Errorf("%s: pitch %s above maxPitch %v, which would read it as a length", row["designation"], ps, maxPitch)
			}
		}
		d := strings.ToLower(row["designation"])
		want := row["designation"] + "x" + row["coarse_pitch_mm"]
		for _, q := range []string{d + " x 20 bolt", d + "x20 bolt", d + "x" + row["coarse_pitch_mm"] + "x20 bolt", d + " x " + row["coarse_pitch_mm"] + " x 20 bolt"} {
			r := Parse(q)
			c := only(t, r, KindSpec)
			if c.Spec.Designation != want {
				t.Errorf("%q: thread %s, ISO 261 gives %s", q, c.Spec.Designation, want)
			}
			m := only(t, r, KindMeasure)
			if m.Measure.Dimension != "length" || m.Measure.BaseAmount == nil || *m.Measure.BaseAmount != 20 || m.Text != "20" {
				t.Errorf("%q: measure %q %s, want the length 20 mm", q, m.Text, m.Value())
			}
		}
	}
}

// ASME B1.1 unified coarse threads: testdata/reference/threads_unified_asme_b1_1.tsv,
// fractional sizes as "1/4-20" and numbered sizes as "#10-24".
func TestUnifiedThreadsASMEB11(t *testing.T) {
	for _, row := range reference.Rows(t, "threads_unified_asme_b1_1.tsv") {
		size := row["size"]
		if strings.HasPrefix(size, "No. ") {
			size = "#" + strings.TrimPrefix(size, "No. ")
		}
		if size == "1" {
			continue // "1-8" is a plain range; the standard writes it the same way
		}
		q := size + "-" + row["unc_tpi"] + " screws"
		c := only(t, Parse(q), KindSpec)
		if c.Spec.System != "unified_thread" {
			t.Errorf("%q: system %s, want unified_thread", q, c.Spec.System)
			continue
		}
		if got, want := c.Spec.Dimensions["major_diameter"], float(t, row, "major_diameter_mm"); !near(got, want, 1e-6) {
			t.Errorf("%q: major diameter %v mm, ASME B1.1 gives %v", q, got, want)
		}
	}
}

// ISO 216 A and B paper sizes: testdata/reference/iso216_paper_sizes.tsv.
func TestPaperSizesISO216(t *testing.T) {
	for _, row := range reference.Rows(t, "iso216_paper_sizes.tsv") {
		q := strings.ToLower(row["size"]) + " paper"
		c := only(t, Parse(q), KindSpec)
		if c.Spec.System != "paper" || c.Spec.Designation != row["size"] {
			t.Errorf("%q: got %s %s", q, c.Spec.System, c.Spec.Designation)
			continue
		}
		if c.Spec.Dimensions["width"] != float(t, row, "width_mm") || c.Spec.Dimensions["height"] != float(t, row, "height_mm") {
			t.Errorf("%q: %v x %v mm, ISO 216 gives %s x %s", q, c.Spec.Dimensions["width"], c.Spec.Dimensions["height"], row["width_mm"], row["height_mm"])
		}
	}
}

// IEC 60086 battery sizes: testdata/reference/iec60086_batteries.tsv.
func TestBatterySizesIEC60086(t *testing.T) {
	for _, row := range reference.Rows(t, "iec60086_batteries.tsv") {
		name := strings.ToLower(strings.Fields(row["common_name"])[0])
		q := name + " batteries"
		c := only(t, Parse(q), KindSpec)
		if c.Spec.System != "battery" {
			t.Errorf("%q: system %s, want battery", q, c.Spec.System)
			continue
		}
		for _, dim := range []string{"diameter", "height", "width", "depth"} {
			if row[dim+"_mm"] == "" {
				continue
			}
			if got, want := c.Spec.Dimensions[dim], float(t, row, dim+"_mm"); !near(got, want, 1e-9) {
				t.Errorf("%q: %s %v mm, IEC 60086 table gives %v", q, dim, got, want)
			}
		}
	}
}

// NIST SP 811 unit factors: testdata/reference/unit_conversions.tsv. "12
// <unit>" must report base_amount = 12 x factor, in whittle's base units
// (mm, g, ml).
func TestUnitFactorsNISTSP811(t *testing.T) {
	toBase := map[string]float64{"m": 1000, "kg": 1000, "m^3": 1e6}
	spell := map[string]string{"in": "in", "ft": "ft", "yd": "yd", "mi": "mi", "lb": "lb", "oz": "oz",
		"L": "l", "gal": "gal", "qt": "qt", "pt": "pt", "cup": "cups", "fl oz": "fl oz", "tbsp": "tbsp", "tsp": "tsp"}
	checked := 0
	for _, row := range reference.Rows(t, "unit_conversions.tsv") {
		word, ok := spell[row["symbol"]]
		if !ok {
			continue
		}
		mult, ok := toBase[row["si_unit"]]
		if !ok {
			continue
		}
		q := "12 " + word
		c := only(t, Parse(q), KindMeasure)
		want := 12 * float(t, row, "factor_to_si") * mult
		if c.Measure.BaseAmount == nil || !near(*c.Measure.BaseAmount, want, want*1e-12) {
			t.Errorf("%q: base amount %v, NIST SP 811 factor gives %v", q, c.Measure.BaseAmount, want)
		}
		checked++
	}
	if checked < 12 {
		t.Errorf("only %d units checked", checked)
	}
}

// ISO 4217 minor units, from bojanz/currency's CLDR data: a price is
// rounded to the currency's digits ("90" USD is "90.00", "3000" JPY is
// "3000").
func TestPriceMinorUnitsISO4217(t *testing.T) {
	for _, tc := range []struct{ q, code string }{
		{"under 40 usd", "USD"}, {"under 35 eur", "EUR"}, {"under £20", "GBP"},
		{"under ¥3000", "JPY"}, {"under 500 sek", "SEK"}, {"under 90 chf", "CHF"},
	} {
		c := only(t, Parse(tc.q), KindPrice)
		if c.Price.Currency != tc.code || c.Price.Max == nil {
			t.Errorf("%q: got %+v, want a ceiling in %s", tc.q, c.Price, tc.code)
			continue
		}
		digits, ok := currency.GetDigits(tc.code)
		if !ok {
			t.Fatalf("CLDR data lacks %s", tc.code)
		}
		_, frac, _ := strings.Cut(*c.Price.Max, ".")
		if len(frac) != int(digits) {
			t.Errorf("%q: %s has %d decimals, ISO 4217 gives %s %d", tc.q, *c.Price.Max, len(frac), tc.code, digits)
		}
	}
}

// CSS Color Module Level 4 named colours (testdata/reference/
// css_named_colours.tsv): a query naming one carries its hex and its
// CIELAB value, within 0.03 per component of the table.
func TestCSSColoursInQueries(t *testing.T) {
	for _, row := range reference.Rows(t, "css_named_colours.tsv") {
		name := row["name"]
		if name == "orangered" {
			name = "orange red" // see lexicon/data/colours.wlx
		}
		if name == "linen" {
			// In a query linen is the cloth (see kindOrder); as a colour
			// it is read by ReadColour, checked in TestReadColour.
			continue
		}
		q := name + " dress"
		c := only(t, Parse(q), KindColour)
		if c.Colour == nil || c.Colour.Hex != row["hex"] {
			t.Errorf("%q: colour %+v, CSS gives %s", q, c.Colour, row["hex"])
			continue
		}
		for i, col := range []string{"L_star", "a_star", "b_star"} {
			if want := float(t, row, col); !near(c.Colour.Lab[i], want, 0.03) {
				t.Errorf("%q: %s = %.4f, table gives %.4f", q, col, c.Colour.Lab[i], want)
			}
		}
	}
}

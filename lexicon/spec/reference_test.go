package spec

import (
	"math"
	"strconv"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/lexicon/reference"
)

func num(t testing.TB, s string) float64 {
	t.Helper()
	v, err := strconv.ParseFloat(s, 64)
	if err != nil {
		t.Fatalf("reference value %q: %v", s, err)
	}
	return v
}

func integer(t testing.TB, s string) int {
	t.Helper()
	v, err := strconv.Atoi(s)
	if err != nil {
		t.Fatalf("reference value %q: %v", s, err)
	}
	return v
}

func near(got, want, tol float64) bool { return math.Abs(got-want) <= tol }

// TestEmbeddedTablesMatchReferenceSize makes sure the embedded tables hold
// exactly as many sizes as the reference tables, so no size is missing and
// none was added without a source.
func TestEmbeddedTablesMatchReferenceSize(t *testing.T) {
	d := data()
	tests := []struct {
		file string
		got  int
	}{
		{"lumber_ps20_sizes.tsv", len(d.lumber)},          // PS 20
		{"threads_metric_iso261_262.tsv", len(d.metric)},  // ISO 261
		{"threads_unified_asme_b1_1.tsv", len(d.unified)}, // ASME B1.1
		{"iso216_paper_sizes.tsv", len(d.paper)},          // ISO 216
		{"iec60086_batteries.tsv", len(d.batteries)},      // IEC 60086
	}
	for _, tc := range tests {
		if want := len(reference.Rows(t, tc.file)); tc.got != want {
			t.Errorf("%s: embedded table has %d sizes, reference %d", tc.file, tc.got, want)
		}
	}
}

// TestLumberReference checks every row against the PS 20 dry dressed
// sizes, testdata/reference/lumber_ps20_sizes.tsv.
func TestLumberReference(t *testing.T) {
	for _, row := range reference.Rows(t, "lumber_ps20_sizes.tsv") {
		t.Run(row["nominal"], func(t *testing.T) {
			nt, nw := integer(t, row["nominal_thickness_in"]), integer(t, row["nominal_width_in"])
			d, ok := LumberNominal(nt, nw)
			if !ok {
				t.Fatalf("LumberNominal(%d, %d) not found", nt, nw)
			}
			if d.Code != row["nominal"] || d.System != Lumber || d.Source != "PS 20" {
				t.Errorf("code %q system %q source %q, want %q lumber PS 20", d.Code, d.System, d.Source, row["nominal"])
			}
			// PS 20 dressed dry sizes in mm (the standard's metric equivalents).
			if d.Dimensions["thickness"] != num(t, row["dry_thickness_mm"]) || d.Dimensions["width"] != num(t, row["dry_width_mm"]) {
				t.Errorf("dressed %v x %v mm, PS 20 gives %s x %s", d.Dimensions["thickness"], d.Dimensions["width"],
					row["dry_thickness_mm"], row["dry_width_mm"])
			}
			// PS 20 dressed dry sizes in inches, decimal and fraction.
			for _, c := range []struct{ attr, col string }{
				{"dressed_thickness_in", "dry_thickness_in"},
				{"dressed_width_in", "dry_width_in"},
			} {
				if got := num(t, d.Attributes[c.attr]); got != num(t, row[c.col]) {
					t.Errorf("%s = %v, PS 20 gives %s", c.attr, got, row[c.col])
				}
			}
			if d.Attributes["dressed_thickness_frac"] != row["dry_thickness_in_frac"] || d.Attributes["dressed_width_frac"] != row["dry_width_in_frac"] {
				t.Errorf("fractions %s x %s, PS 20 gives %s x %s", d.Attributes["dressed_thickness_frac"],
					d.Attributes["dressed_width_frac"], row["dry_thickness_in_frac"], row["dry_width_in_frac"])
			}
			if d.Attributes["nominal_thickness_in"] != row["nominal_thickness_in"] || d.Attributes["nominal_width_in"] != row["nominal_width_in"] {
				t.Errorf("nominal attributes %v", d.Attributes)
			}
			// The mm column is inch x 25.4 rounded to whole mm (header of
			// lumber_ps20_sizes.tsv).
			if math.Round(num(t, row["dry_width_in"])*25.4) != d.Dimensions["width"] {
				t.Errorf("width %v mm is not %s in x 25.4 rounded", d.Dimensions["width"], row["dry_width_in"])
			}
			// "4x2" (UK word order) is the same piece: common practice.
			if nt != nw {
				s, ok := LumberNominal(nw, nt)
				if !ok || s.Code != d.Code {
					t.Errorf("LumberNominal(%d, %d) = %q, %v; want %q", nw, nt, s.Code, ok, d.Code)
				}
			}
		})
	}
}

// TestTyreReference checks the seven worked sizes of
// testdata/reference/tyre_size_examples.tsv (ISO metric designation;
// D = rim x 25.4 + 2 x W x AR/100).
func TestTyreReference(t *testing.T) {
	for _, row := range reference.Rows(t, "tyre_size_examples.tsv") {
		t.Run(row["designation"], func(t *testing.T) {
			w, ar := integer(t, row["section_width_mm"]), integer(t, row["aspect_ratio_pct"])
			c := row["construction"][0]
			d, err := TyreSize(w, ar, c, num(t, row["rim_diameter_in"]))
			if err != nil {
				t.Fatal(err)
			}
			if want := strings.ReplaceAll(row["designation"], " ", ""); d.Code != want {
				t.Errorf("code %q, want %q", d.Code, want)
			}
			for _, k := range []struct{ dim, col string }{
				{"overall_diameter", "overall_diameter_mm"},
				{"sidewall_height", "sidewall_height_mm"},
				{"rim_diameter", "rim_diameter_mm"},
				{"section_width", "section_width_mm"},
			} {
				if got, want := d.Dimensions[k.dim], num(t, row[k.col]); !near(got, want, 0.05) {
					t.Errorf("%s = %.4f mm, reference %s gives %.4f", k.dim, got, row["designation"], want)
				}
			}
			if d.Attributes["construction"] != row["construction"] || d.Source != "ISO 4000-1" {
				t.Errorf("attributes %v source %q", d.Attributes, d.Source)
			}
		})
	}
}

// roundSig rounds v to n significant figures.
func roundSig(v float64, n int) float64 {
	s := strconv.FormatFloat(v, 'g', n, 64)
	r, _ := strconv.ParseFloat(s, 64)
	return r
}

// TestWireReference checks every gauge of
// testdata/reference/awg_wire_diameters.tsv (ASTM B258 formula; tabulated
// columns from Lessons in Electric Circuits and cocoaNEC awg.h).
func TestWireReference(t *testing.T) {
	for _, row := range reference.Rows(t, "awg_wire_diameters.tsv") {
		t.Run(row["gauge"], func(t *testing.T) {
			n := integer(t, row["n"])
			d, err := WireGauge(n, 0)
			if err != nil {
				t.Fatal(err)
			}
			dia := d.Dimensions["diameter"]
			// ASTM B258 defining formula, d_formula_mm column (5 decimals).
			if want := num(t, row["d_formula_mm"]); !near(dia, want, 1e-4) {
				t.Errorf("diameter %.6f mm, ASTM B258 formula gives %s", dia, row["d_formula_mm"])
			}
			// Tabulated inches, 4 significant figures (Lessons in Electric
			// Circuits copper wire table).
			in := dia / 25.4
			if got, want := roundSig(in, 4), num(t, row["d_tab_in_4sf"]); got != want {
				t.Errorf("diameter %.6f in rounds to %v at 4 s.f., table gives %s", in, got, row["d_tab_in_4sf"])
			}
			// Tabulated to 0.0001 in (cocoaNEC awg.h; B258 rounding rule from memory).
			if got, want := math.Round(in*1e4)/1e4, num(t, row["d_tab_in_1e-4"]); !near(got, want, 1e-9) {
				t.Errorf("diameter %.6f in rounds to %v at 0.0001 in, table gives %s (%s)", in, got, row["d_tab_in_1e-4"], row["d_tab_1e-4_from"])
			}
			// Area column, 4 decimals.
			if want := num(t, row["area_formula_mm2"]); !near(d.Dimensions["area_mm2"], want, 1e-4) {
				t.Errorf("area %.6f mm², reference gives %s", d.Dimensions["area_mm2"], row["area_formula_mm2"])
			}
			// Gauge label: 0000 is written 4/0 and so on (common practice).
			label := row["gauge"]
			if strings.Trim(label, "0") == "" {
				label = strconv.Itoa(len(label)) + "/0"
			}
			if d.Attributes["gauge"] != label || d.Code != label+" AWG" || d.Attributes["gauge_n"] != row["n"] {
				t.Errorf("code %q attributes %v, want gauge %s, n %s", d.Code, d.Attributes, label, row["n"])
			}
		})
	}
}

// splitPitches reads a space-separated list of pitches.
func splitPitches(t testing.TB, s string) []float64 {
	var out []float64
	for _, f := range strings.Fields(s) {
		out = append(out, num(t, f))
	}
	return out
}

// TestMetricThreadReference checks every size of
// testdata/reference/threads_metric_iso261_262.tsv (ISO 261 coarse pitch,
// and the fine pitches of both fetched sources).
func TestMetricThreadReference(t *testing.T) {
	for _, row := range reference.Rows(t, "threads_metric_iso261_262.tsv") {
		t.Run(row["designation"], func(t *testing.T) {
			dia := num(t, row["nominal_diameter_mm"])
			d, err := MetricThreadSize(dia, 0)
			if err != nil {
				t.Fatal(err)
			}
			// ISO 261 coarse pitch (BOSL2 and cosmeticthread3d agree).
			if d.Dimensions["pitch"] != num(t, row["coarse_pitch_mm"]) || d.Attributes["pitch_kind"] != "coarse" {
				t.Errorf("pitch %v (%s), ISO 261 coarse is %s", d.Dimensions["pitch"], d.Attributes["pitch_kind"], row["coarse_pitch_mm"])
			}
			if want := row["designation"] + "x" + row["coarse_pitch_mm"]; d.Code != want {
				t.Errorf("code %q, want %q", d.Code, want)
			}
			if d.Dimensions["major_diameter"] != dia || d.Attributes["choice"] != row["choice"] || d.Source != "ISO 261" {
				t.Errorf("dimensions %v attributes %v source %q", d.Dimensions, d.Attributes, d.Source)
			}
			// Giving the coarse pitch explicitly is the same thread.
			if e, err := MetricThreadSize(dia, num(t, row["coarse_pitch_mm"])); err != nil || e.Code != d.Code {
				t.Errorf("explicit coarse pitch: %q, %v", e.Code, err)
			}
			// ISO 261 fine pitches: BOSL2 column and cosmeticthread3d list.
			fine := append(splitPitches(t, row["fine_pitch_bosl2_mm"]), splitPitches(t, row["fine_pitches_ct3d_mm"])...)
			for _, p := range fine {
				f, err := MetricThreadSize(dia, p)
				if err != nil {
					t.Errorf("fine pitch %v: %v", p, err)
					continue
				}
				if f.Dimensions["pitch"] != p || f.Attributes["pitch_kind"] != "fine" {
					t.Errorf("fine pitch %v gave %v (%s)", p, f.Dimensions["pitch"], f.Attributes["pitch_kind"])
				}
				if want := row["designation"] + "x" + strconv.FormatFloat(p, 'f', -1, 64); f.Code != want {
					t.Errorf("code %q, want %q", f.Code, want)
				}
			}
			// MetricFineThreads lists each of them once, finest first.
			want := map[float64]bool{}
			for _, p := range fine {
				want[p] = true
			}
			all, err := MetricFineThreads(dia)
			if err != nil || len(all) != len(want) {
				t.Fatalf("MetricFineThreads: %d threads, %v; the table lists %d fine pitches", len(all), err, len(want))
			}
			for i, f := range all {
				if !want[f.Dimensions["pitch"]] || i > 0 && f.Dimensions["pitch"] <= all[i-1].Dimensions["pitch"] {
					t.Errorf("MetricFineThreads: %s is not a fine pitch of the table, or out of order", f.Code)
				}
			}
		})
	}
}

// TestUnifiedThreadReference checks every size of
// testdata/reference/threads_unified_asme_b1_1.tsv (ASME B1.1 UNC and UNF
// threads per inch and basic major diameter).
func TestUnifiedThreadReference(t *testing.T) {
	for _, row := range reference.Rows(t, "threads_unified_asme_b1_1.tsv") {
		t.Run(row["size"], func(t *testing.T) {
			// The reference writes numbered sizes "No. 4"; shoppers write #4.
			size := row["size"]
			if n, ok := strings.CutPrefix(size, "No. "); ok {
				size = "#" + n
			}
			unc, unf := integer(t, row["unc_tpi"]), integer(t, row["unf_tpi"])
			d, err := UnifiedThreadSize(size, 0)
			if err != nil {
				t.Fatal(err)
			}
			if d.Code != row["designation_unc"] || d.Attributes["series"] != "UNC" || d.Attributes["tpi"] != row["unc_tpi"] {
				t.Errorf("code %q attributes %v, want %q", d.Code, d.Attributes, row["designation_unc"])
			}
			if got, want := d.Dimensions["major_diameter"], num(t, row["major_diameter_mm"]); !near(got, want, 1e-9) {
				t.Errorf("major diameter %v mm, ASME B1.1 gives %v", got, want)
			}
			if got := d.Dimensions["pitch"]; !near(got, 25.4/float64(unc), 1e-12) {
				t.Errorf("pitch %v mm, want 25.4/%d", got, unc)
			}
			// The numbered-size rule 0.060 in + 0.013 in x n (BOSL2 screws.scad).
			if n, ok := strings.CutPrefix(size, "#"); ok {
				if want := (0.060 + 0.013*float64(integer(t, n))) * 25.4; !near(d.Dimensions["major_diameter"], want, 1e-9) {
					t.Errorf("major diameter %v mm, #n rule gives %v", d.Dimensions["major_diameter"], want)
				}
			}
			if e, err := UnifiedThreadSize(size, unc); err != nil || e.Code != d.Code {
				t.Errorf("explicit UNC: %q, %v", e.Code, err)
			}
			f, err := UnifiedThreadSize(size, unf)
			if err != nil {
				t.Fatal(err)
			}
			if want := size + "-" + row["unf_tpi"] + " UNF"; f.Code != want || f.Attributes["series"] != "UNF" || f.Attributes["pitch_kind"] != "fine" {
				t.Errorf("UNF code %q attributes %v, want %q", f.Code, f.Attributes, want)
			}
			if !near(f.Dimensions["pitch"], 25.4/float64(unf), 1e-12) {
				t.Errorf("UNF pitch %v", f.Dimensions["pitch"])
			}
		})
	}
}

// TestPaperReference checks every size of
// testdata/reference/iso216_paper_sizes.tsv (ISO 216).
func TestPaperReference(t *testing.T) {
	for _, row := range reference.Rows(t, "iso216_paper_sizes.tsv") {
		t.Run(row["size"], func(t *testing.T) {
			d, ok := PaperSize(row["size"])
			if !ok {
				t.Fatalf("PaperSize(%q) not found", row["size"])
			}
			if d.Dimensions["width"] != num(t, row["width_mm"]) || d.Dimensions["height"] != num(t, row["height_mm"]) {
				t.Errorf("%v x %v mm, ISO 216 gives %s x %s", d.Dimensions["width"], d.Dimensions["height"], row["width_mm"], row["height_mm"])
			}
			if d.Code != row["size"] || d.Attributes["series"] != row["series"] || d.Source != "ISO 216" {
				t.Errorf("code %q attributes %v source %q", d.Code, d.Attributes, d.Source)
			}
		})
	}
}

// TestPaperHalvingRule derives both series from A0 = 841 x 1189 mm and
// B0 = 1000 x 1414 mm by the ISO 216 rule (next size = previous long side
// halved, rounded down to whole mm), as described in the header of
// iso216_paper_sizes.tsv.
func TestPaperHalvingRule(t *testing.T) {
	for _, s := range []struct {
		series string
		w, h   int
	}{{"A", 841, 1189}, {"B", 1000, 1414}} {
		w, h := s.w, s.h
		for i := 0; i <= 10; i++ {
			code := s.series + strconv.Itoa(i)
			d, ok := PaperSize(code)
			if !ok || d.Dimensions["width"] != float64(w) || d.Dimensions["height"] != float64(h) {
				t.Errorf("%s = %v, %v; halving rule gives %d x %d", code, d.Dimensions, ok, w, h)
			}
			w, h = h/2, w
		}
	}
}

// TestBatteryReference checks every size of
// testdata/reference/iec60086_batteries.tsv (IEC 60086 designations and
// maximum dimensions; coin-cell 3 V and some designations are marked there
// as from memory).
func TestBatteryReference(t *testing.T) {
	for _, row := range reference.Rows(t, "iec60086_batteries.tsv") {
		t.Run(row["common_name"], func(t *testing.T) {
			// "9V (PP3)" is two names of one size.
			names := []string{row["common_name"], row["iec_designation"]}
			code := row["common_name"]
			if a, b, ok := strings.Cut(code, " ("); ok {
				code = a
				names = []string{a, strings.TrimSuffix(b, ")"), row["iec_designation"]}
			}
			for _, name := range names {
				d, ok := BatterySize(name)
				if !ok {
					t.Errorf("BatterySize(%q) not found", name)
					continue
				}
				if d.Code != code || d.Attributes["iec"] != row["iec_designation"] || d.Attributes["shape"] != row["shape"] || d.Source != "IEC 60086" {
					t.Errorf("BatterySize(%q) = %q %v %q", name, d.Code, d.Attributes, d.Source)
				}
				if num(t, d.Attributes["voltage_v"]) != num(t, row["nominal_voltage_V"]) {
					t.Errorf("%s voltage %s V, IEC 60086 gives %s", name, d.Attributes["voltage_v"], row["nominal_voltage_V"])
				}
				want := map[string]float64{}
				for _, k := range []string{"diameter", "height", "width", "depth"} {
					if v := row[k+"_mm"]; v != "" {
						want[k] = num(t, v)
					}
				}
				if len(d.Dimensions) != len(want) {
					t.Errorf("%s dimensions %v, want %v", name, d.Dimensions, want)
				}
				for k, v := range want {
					if d.Dimensions[k] != v {
						t.Errorf("%s %s = %v mm, IEC 60086 maximum %v", name, k, d.Dimensions[k], v)
					}
				}
			}
		})
	}
}

package colour

import (
	"math"
	"strconv"
	"testing"

	"github.com/whittle-search/whittle/lexicon/reference"
)

// cssRow is one row of testdata/reference/css_named_colours.tsv.
type cssRow struct {
	name string
	hex  string
	rgb  RGB
	lab  Lab
}

// cssColours reads testdata/reference/css_named_colours.tsv: the 148 CSS
// Color 4 named colours with their 8-bit values and their L*a*b* computed
// in the IEC 61966-2-1 / CIE 15 convention this package uses (see the
// table's header lines).
func cssColours(t testing.TB) []cssRow {
	t.Helper()
	rows := reference.Rows(t, "css_named_colours.tsv")
	out := make([]cssRow, 0, len(rows))
	for _, r := range rows {
		c := cssRow{name: r["name"], hex: r["hex"]}
		var ch [3]uint8
		for i, col := range []string{"r", "g", "b"} {
			v, err := strconv.ParseUint(r[col], 10, 8)
			if err != nil {
				t.Fatalf("%s: column %s: %v", c.name, col, err)
			}
			ch[i] = uint8(v)
		}
		c.rgb = RGB{ch[0], ch[1], ch[2]}
		var lab [3]float64
		for i, col := range []string{"L_star", "a_star", "b_star"} {
			v, err := r.Float(col)
			if err != nil {
				t.Fatalf("%s: %v", c.name, err)
			}
			lab[i] = v
		}
		c.lab = Lab{lab[0], lab[1], lab[2]}
		out = append(out, c)
	}
	if len(out) != 148 {
		t.Fatalf("css_named_colours.tsv has %d rows; want the 148 CSS Color 4 names", len(out))
	}
	return out
}

// TestRGBToLabCSS checks RGB.Lab against the L*a*b* of all 148 CSS named
// colours (source: testdata/reference/css_named_colours.tsv, CSS Color 4
// names and values; Lab computed there by the IEC 61966-2-1 and CIE 15
// formulas). The table gives four decimals, so agreement must be within
// rounding (0.00005) plus float noise, far inside the 0.03 that other
// conventions would need (see css_named_colours_lab_crosscheck.tsv).
func TestRGBToLabCSS(t *testing.T) {
	const tol = 0.0001
	worst := 0.0
	for _, c := range cssColours(t) {
		got := c.rgb.Lab()
		d := math.Max(math.Abs(got.L-c.lab.L), math.Max(math.Abs(got.A-c.lab.A), math.Abs(got.B-c.lab.B)))
		worst = math.Max(worst, d)
		if d > tol {
			t.Errorf("%s %s: Lab = %.4f %.4f %.4f; table has %.4f %.4f %.4f", c.name, c.hex, got.L, got.A, got.B, c.lab.L, c.lab.A, c.lab.B)
		}
	}
	t.Logf("largest component difference from the table: %.6f", worst)
}

// TestHexCSS checks RGB.Hex and ParseHex against the hex column of the
// CSS named colours (source: testdata/reference/css_named_colours.tsv,
// CSS Color 4).
func TestHexCSS(t *testing.T) {
	for _, c := range cssColours(t) {
		if got := c.rgb.Hex(); got != c.hex {
			t.Errorf("%s: Hex() = %q; table has %q", c.name, got, c.hex)
		}
		got, err := ParseHex(c.hex)
		if err != nil || got != c.rgb {
			t.Errorf("%s: ParseHex(%q) = %v, %v; table has %v", c.name, c.hex, got, err, c.rgb)
		}
	}
}

// TestLabToRGBCSS converts the table's L*a*b* (four decimals) back to
// sRGB: each must give the table's 8-bit values and lie in gamut (source:
// testdata/reference/css_named_colours.tsv). Rounding Lab to four
// decimals moves a channel by far less than half a step.
func TestLabToRGBCSS(t *testing.T) {
	for _, c := range cssColours(t) {
		got, ok := c.lab.RGB()
		if got != c.rgb || !ok {
			t.Errorf("%s: Lab%v.RGB() = %v, %v; want %v, true", c.name, c.lab, got, ok, c.rgb)
		}
	}
}

// TestRoundTrip checks sRGB -> Lab -> sRGB gives back the same 8-bit
// value, for the 148 CSS colours (source: css_named_colours.tsv) and for
// every 8-bit colour whose channels are multiples of 3 (0..255, so the
// gamut's corners and faces are included). The conversions are exact
// inverses in real arithmetic (IEC 61966-2-1 and CIE 15 define both
// directions), so any other result is a bug.
func TestRoundTrip(t *testing.T) {
	check := func(name string, c RGB) {
		got, ok := c.Lab().RGB()
		if got != c || !ok {
			t.Errorf("%s %v: round trip gives %v, %v", name, c, got, ok)
		}
	}
	for _, c := range cssColours(t) {
		check(c.name, c.rgb)
	}
	for r := 0; r < 256; r += 3 {
		for g := 0; g < 256; g += 3 {
			for b := 0; b < 256; b += 3 {
				check("grid", RGB{uint8(r), uint8(g), uint8(b)})
			}
		}
	}
}

// labFromEncoded converts sRGB channel values on the 0..255 scale, which
// may lie a little outside it, to L*a*b*, written out here from IEC
// 61966-2-1 and CIE 15 independently of the package's code (the transfer
// function is extended to negatives by symmetry).
func labFromEncoded(r, g, b float64) Lab {
	lin := func(v float64) float64 {
		v /= 255
		s := 1.0
		if v < 0 {
			s, v = -1, -v
		}
		if v <= 0.04045 {
			return s * v / 12.92
		}
		return s * math.Pow((v+0.055)/1.055, 2.4)
	}
	R, G, B := lin(r), lin(g), lin(b)
	x := (0.4124*R + 0.3576*G + 0.1805*B) / 0.9505
	y := 0.2126*R + 0.7152*G + 0.0722*B
	z := (0.0193*R + 0.1192*G + 0.9505*B) / 1.0890
	f := func(t float64) float64 {
		if t > 216.0/24389 { // (6/29)^3
			return math.Cbrt(t)
		}
		return t*841.0/108 + 4.0/29 // (29/6)^2 / 3
	}
	return Lab{116*f(y) - 16, 500 * (f(x) - f(y)), 200 * (f(y) - f(z))}
}

// TestLabToRGBGamut checks the ok result and the clamping of Lab.RGB.
func TestLabToRGBGamut(t *testing.T) {
	tests := []struct {
		name   string
		lab    Lab
		want   RGB
		wantOK bool
		anyRGB bool // only ok is checked
		reason string
	}{
		{"white", Lab{100, 0, 0}, RGB{255, 255, 255}, true, false,
			"L* = 100, a* = b* = 0 is the reference white (CIE 15)"},
		{"black", Lab{0, 0, 0}, RGB{0, 0, 0}, true, false, "L* = 0 is black (CIE 15)"},
		{"red channel at 255.4", labFromEncoded(255.4, 0, 0), RGB{255, 0, 0}, true, false,
			"0.4 of a step past the gamut edge is within half a step: clamped, still ok"},
		{"red channel at 255.6", labFromEncoded(255.6, 0, 0), RGB{255, 0, 0}, false, false,
			"0.6 of a step past the edge is more than half a step: clamped, not ok"},
		{"green channel at -0.4", labFromEncoded(128, -0.4, 128), RGB{128, 0, 128}, true, false,
			"0.4 of a step below zero is within half a step"},
		{"green channel at -0.6", labFromEncoded(128, -0.6, 128), RGB{128, 0, 128}, false, false,
			"0.6 of a step below zero is more than half a step"},
		{"yellowish at L* 100", Lab{100, 0, 50}, RGB{}, false, true,
			"by hand: Y = 0.2126 R + 0.7152 G + 0.0722 B reaches 1 in gamut only at linear (1, 1, 1), so a chromatic colour at L* = 100 needs a channel above 255"},
		{"reddish at L* 0", Lab{0, 40, 0}, RGB{}, false, true,
			"by hand: Y = 0 in gamut only at (0, 0, 0), whose X is 0 too, so a* > 0 at L* = 0 needs a negative channel"},
		{"NaN", Lab{math.NaN(), 0, 0}, RGB{}, false, false, "NaN is no colour: black, not ok"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got, ok := tt.lab.RGB()
			if (!tt.anyRGB && got != tt.want) || ok != tt.wantOK {
				t.Errorf("%v.RGB() = %v, %v; want %v, %v (%s)", tt.lab, got, ok, tt.want, tt.wantOK, tt.reason)
			}
		})
	}
}

// TestLChRoundTrip checks Lab -> LCh -> Lab on the CSS colours (source:
// css_named_colours.tsv) and the hue range [0, 360) with H = 0 for
// neutrals.
func TestLChRoundTrip(t *testing.T) {
	for _, c := range cssColours(t) {
		lch := c.lab.LCh()
		if lch.H < 0 || lch.H >= 360 {
			t.Errorf("%s: H = %v, outside [0, 360)", c.name, lch.H)
		}
		if want := math.Hypot(c.lab.A, c.lab.B); math.Abs(lch.C-want) > 1e-12 {
			t.Errorf("%s: C = %v; want sqrt(a² + b²) = %v", c.name, lch.C, want)
		}
		back := lch.Lab()
		if DeltaE76(back, c.lab) > 1e-9 {
			t.Errorf("%s: LCh round trip %v -> %v -> %v", c.name, c.lab, lch, back)
		}
	}
}

// TestLCh checks LCh on hand-computed colours (by hand: C = sqrt(a² + b²),
// h = atan2(b, a) in degrees).
func TestLCh(t *testing.T) {
	tests := []struct {
		name   string
		lab    Lab
		want   LCh
		reason string
	}{
		{"neutral", Lab{50, 0, 0}, LCh{50, 0, 0}, "C = 0; hue defined as 0"},
		{"negative zero a", Lab{50, math.Copysign(0, -1), 0}, LCh{50, 0, 0}, "atan2(0, -0) is 180, but a neutral's hue is 0"},
		{"+a axis", Lab{50, 20, 0}, LCh{50, 20, 0}, "h = 0 on +a"},
		{"+b axis", Lab{50, 0, 20}, LCh{50, 20, 90}, "h = 90 on +b"},
		{"-a axis", Lab{50, -20, 0}, LCh{50, 20, 180}, "h = 180 on -a"},
		{"-b axis", Lab{50, 0, -20}, LCh{50, 20, 270}, "h = 270 on -b, not -90"},
		{"3-4-5", Lab{60, 30, -40}, LCh{60, 50, 360 - math.Atan(4.0/3)*180/math.Pi}, "by hand: C = 50, h = 360 - atan(4/3)"},
		{"tiny negative hue", Lab{50, 1, -1e-18}, LCh{50, 1, 0}, "360 - 6e-17 rounds to 360, which must wrap to 0"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got := tt.lab.LCh()
			if math.Abs(got.L-tt.want.L) > 1e-12 || math.Abs(got.C-tt.want.C) > 1e-12 || math.Abs(got.H-tt.want.H) > 1e-9 {
				t.Errorf("%v.LCh() = %v; want %v (%s)", tt.lab, got, tt.want, tt.reason)
			}
		})
	}
}

// TestDeltaE76 checks the CIE 1976 difference on pairs computed by hand
// (the Euclidean distance; 3-4-5 and 5-12-13 triangles).
func TestDeltaE76(t *testing.T) {
	tests := []struct {
		name   string
		x, y   Lab
		want   float64
		reason string
	}{
		{"same", Lab{50, 10, 10}, Lab{50, 10, 10}, 0, "a colour is 0 from itself"},
		{"black to white", Lab{0, 0, 0}, Lab{100, 0, 0}, 100, "by hand: only L differs, by 100"},
		{"3-4-5 in a, b", Lab{10, -3, 4}, Lab{10, 0, 0}, 5, "by hand: sqrt(9 + 16)"},
		{"5-12-13 in L, b", Lab{40, 7, 2}, Lab{45, 7, 14}, 13, "by hand: sqrt(25 + 144)"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := DeltaE76(tt.x, tt.y); math.Abs(got-tt.want) > 1e-12 {
				t.Errorf("DeltaE76(%v, %v) = %v; want %v (%s)", tt.x, tt.y, got, tt.want, tt.reason)
			}
		})
	}
}

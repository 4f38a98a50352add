package colour

import (
	"math"
	"math/rand/v2"
	"testing"

	"github.com/whittle-search/whittle/lexicon/reference"
)

// sharmaPair is one row of testdata/reference/ciede2000_sharma2005.tsv.
type sharmaPair struct {
	pair string
	x, y Lab
	want float64
}

// sharmaPairs reads the 34 CIEDE2000 test pairs of Sharma, Wu and Dalal
// (2005), Table 1 (testdata/reference/ciede2000_sharma2005.tsv).
func sharmaPairs(t testing.TB) []sharmaPair {
	t.Helper()
	var out []sharmaPair
	for _, r := range reference.Rows(t, "ciede2000_sharma2005.tsv") {
		var v [7]float64
		for i, col := range []string{"L1", "a1", "b1", "L2", "a2", "b2", "dE00"} {
			f, err := r.Float(col)
			if err != nil {
				t.Fatalf("pair %s: %v", r["pair"], err)
			}
			v[i] = f
		}
		out = append(out, sharmaPair{r["pair"], Lab{v[0], v[1], v[2]}, Lab{v[3], v[4], v[5]}, v[6]})
	}
	if len(out) != 34 {
		t.Fatalf("ciede2000_sharma2005.tsv has %d pairs; Sharma et al. (2005) Table 1 has 34", len(out))
	}
	return out
}

// TestDeltaE2000Sharma checks all 34 pairs of Sharma, Wu and Dalal (2005),
// Table 1 (source: testdata/reference/ciede2000_sharma2005.tsv), both
// ways round, to the table's four decimals. Pairs 9 to 14 sit on the
// mean-hue rule at |h1' - h2'| = 180 (pairs 10 and 14 exactly on it).
func TestDeltaE2000Sharma(t *testing.T) {
	for _, p := range sharmaPairs(t) {
		for _, order := range [][2]Lab{{p.x, p.y}, {p.y, p.x}} {
			got := DeltaE2000(order[0], order[1])
			if math.Abs(got-p.want) > 1e-4 {
				t.Errorf("pair %s: DeltaE2000(%v, %v) = %.6f; table has %.4f", p.pair, order[0], order[1], got, p.want)
			}
			if k := DeltaE2000K(order[0], order[1], 1, 1, 1); k != got {
				t.Errorf("pair %s: DeltaE2000K(..., 1, 1, 1) = %v; DeltaE2000 = %v", p.pair, k, got)
			}
		}
	}
}

// TestDeltaE2000K checks the parametric factors against the definition
// (CIE 142-2001; Sharma et al. 2005, eq. 15): each of ΔL', ΔC', ΔH' is
// divided by its k, so for two colours that differ in lightness only the
// difference scales as 1/kL, and kC, kH have no effect; for two colours
// of equal L' and h' but different chroma it scales as 1/kC.
func TestDeltaE2000K(t *testing.T) {
	tests := []struct {
		name       string
		x, y       Lab
		kL, kC, kH float64
		scale      float64 // DeltaE2000K = scale * DeltaE2000
		reason     string
	}{
		{"lightness only, kL 2", Lab{40, 20, -10}, Lab{47, 20, -10}, 2, 1, 1, 0.5, "only the ΔL' term is non-zero; it is divided by kL"},
		{"lightness only, kC kH ignored", Lab{40, 20, -10}, Lab{47, 20, -10}, 1, 3, 5, 1, "ΔC' = ΔH' = 0"},
		{"chroma only, kC 2", Lab{50, 30, 40}, Lab{50, 36, 48}, 1, 2, 1, 0.5, "same L and hue (3-4-5 direction): only ΔC' is non-zero"},
		{"neutral vs neutral", Lab{20, 0, 0}, Lab{90, 0, 0}, 4, 1, 1, 0.25, "no chroma at all"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got := DeltaE2000K(tt.x, tt.y, tt.kL, tt.kC, tt.kH)
			want := tt.scale * DeltaE2000(tt.x, tt.y)
			if math.Abs(got-want) > 1e-12*want {
				t.Errorf("DeltaE2000K = %v; want %v (%s)", got, want, tt.reason)
			}
		})
	}
}

// randomLab returns a colour with L in 0..100 and a, b in -128..128, the
// range of 8-bit CIELAB encodings (common practice).
func randomLab(r *rand.Rand) Lab {
	return Lab{r.Float64() * 100, r.Float64()*256 - 128, r.Float64()*256 - 128}
}

// TestDeltaE2000Metric checks on 10,000 seeded random pairs that
// ΔE00(x, x) = 0 and ΔE00(x, y) = ΔE00(y, x) (both follow from the
// formula: every term is a difference that vanishes for equal colours,
// and swapping the colours flips the signs of ΔC' and ΔH' together), and
// that the result is finite and not negative.
func TestDeltaE2000Metric(t *testing.T) {
	r := rand.New(rand.NewPCG(2005, 1))
	for i := 0; i < 10000; i++ {
		x, y := randomLab(r), randomLab(r)
		if d := DeltaE2000(x, x); d != 0 {
			t.Fatalf("DeltaE2000(%v, itself) = %v; want 0", x, d)
		}
		dxy, dyx := DeltaE2000(x, y), DeltaE2000(y, x)
		if math.IsNaN(dxy) || dxy < 0 || math.Abs(dxy-dyx) > 1e-12*math.Max(1, dxy) {
			t.Fatalf("DeltaE2000(%v, %v) = %v, reversed %v", x, y, dxy, dyx)
		}
	}
}

// TestDeltaE2000ZeroChroma covers the case where a colour has C' = 0:
// then Δh' = 0 and the mean hue is the sum of the hues (Sharma et al.
// 2005, eqs. 10 and 14), so the difference of a neutral from a colour is
// the same whichever sign its zero a* has.
func TestDeltaE2000ZeroChroma(t *testing.T) {
	c := Lab{50, -1, 2}
	plain := DeltaE2000(Lab{50, 0, 0}, c)
	neg := DeltaE2000(Lab{50, math.Copysign(0, -1), 0}, c)
	// Sharma et al. (2005) Table 1, pair 7: (50, 0, 0) vs (50, -1, 2).
	if math.Abs(plain-2.3669) > 1e-4 || neg != plain {
		t.Errorf("DeltaE2000 of a neutral = %v, with -0 a* = %v; table pair 7 has 2.3669", plain, neg)
	}
}

// hueWeightDirect is T of Sharma et al. (2005), eq. 15 of the paper's
// implementation section, written term by term.
func hueWeightDirect(h float64) float64 {
	c := func(deg float64) float64 { return math.Cos(deg * math.Pi / 180) }
	return 1 - 0.17*c(h-30) + 0.24*c(2*h) + 0.32*c(3*h+6) - 0.20*c(4*h-63)
}

// TestHueWeight checks the one-sincos form of T against the paper's four
// cosines (Sharma et al. 2005).
func TestHueWeight(t *testing.T) {
	for h := 0.0; h < 720; h += 0.37 {
		if got, want := hueWeight(h), hueWeightDirect(h); math.Abs(got-want) > 1e-12 {
			t.Fatalf("hueWeight(%v) = %v; the paper's formula gives %v", h, got, want)
		}
	}
}

// TestTMaxBoundsT proves tMax >= T(h) for every hue: T's derivative is at
// most (0.17 + 2·0.24 + 3·0.32 + 4·0.20) = 2.41 per radian, so between
// samples s degrees apart T exceeds the larger sample by at most
// 2.41·(π/180)·s/2.
func TestTMaxBoundsT(t *testing.T) {
	const step = 0.001 // degrees
	maxT := math.Inf(-1)
	for i := 0; i <= 360/step; i++ {
		maxT = math.Max(maxT, hueWeightDirect(float64(i)*step))
	}
	bound := maxT + 2.41*(math.Pi/180)*step/2
	if bound > tMax {
		t.Errorf("T reaches %v (bound %v), above tMax = %v", maxT, bound, tMax)
	}
	t.Logf("max T = %.6f, proved bound %.6f, tMax %v", maxT, bound, tMax)
}

// TestDeltaE2000Bound checks the early exit of deltaE2000: whenever it
// stops, the bound it returns is at most the true ΔE00² (the proofs are
// on deltaE2000), and whenever it runs to the end it gives the full
// value. Pairs are drawn both at random and close together (within a few
// units), where the bounds are tight, with limits around the true value.
func TestDeltaE2000Bound(t *testing.T) {
	r := rand.New(rand.NewPCG(7, 11))
	stops := 0
	for i := 0; i < 200000; i++ {
		x := randomLab(r)
		y := randomLab(r)
		if i%2 == 0 {
			s := r.Float64() * 10
			y = Lab{x.L + (r.Float64()-0.5)*s, x.A + (r.Float64()-0.5)*s, x.B + (r.Float64()-0.5)*s}
		}
		full := DeltaE2000(x, y)
		lim2 := full * full * (0.25 + r.Float64())
		got, ok := deltaE2000(prepare(x), prepare(y), 1, 1, 1, lim2)
		if ok {
			if got != full {
				t.Fatalf("%v %v: full run gives %v; DeltaE2000 %v", x, y, got, full)
			}
			continue
		}
		stops++
		if got > full*full*(1+1e-12)+1e-12 {
			t.Fatalf("%v %v: bound %v exceeds ΔE00² = %v", x, y, got, full*full)
		}
		if got <= lim2 {
			t.Fatalf("%v %v: stopped with bound %v <= limit %v", x, y, got, lim2)
		}
	}
	if stops == 0 {
		t.Fatal("the bounds never stopped early")
	}
	t.Logf("stopped early on %d of 200000 pairs", stops)
}

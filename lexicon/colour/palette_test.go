package colour

import (
	"cmp"
	"fmt"
	"math"
	"math/rand/v2"
	"slices"
	"strings"
	"testing"

	gocmp "github.com/google/go-cmp/cmp"
)

// randomRGB returns a uniformly random 8-bit sRGB colour.
func randomRGB(r *rand.Rand) RGB {
	return RGB{uint8(r.IntN(256)), uint8(r.IntN(256)), uint8(r.IntN(256))}
}

// randomPalette returns n seeded random catalog colours: in-gamut ones
// from random sRGB values, and, when wild is set, every fourth one
// anywhere in L 0..100, a, b -128..128, and every fortieth with L in
// -50..150 (not a real colour, but a Lab a caller may pass). Some names repeat and a few
// colours are exact copies of another, so that ties occur.
func randomPalette(r *rand.Rand, n int, wild bool) []PaletteColour {
	cs := make([]PaletteColour, n)
	for i := range cs {
		lab := randomRGB(r).Lab()
		if wild && i%4 == 3 {
			lab = randomLab(r)
		}
		if wild && i%40 == 39 { // lightness outside 0..100, which S_L bounds must allow for
			lab.L = r.Float64()*200 - 50
		}
		cs[i] = PaletteColour{Name: fmt.Sprintf("c%04d", r.IntN(n+1)), Lab: lab, Count: r.IntN(100)}
		if i > 0 && r.IntN(20) == 0 {
			cs[i].Lab = cs[r.IntN(i)].Lab
		}
	}
	return cs
}

// bruteForce returns the colours of cs within tol of q, by computing
// DeltaE2000 for every one, sorted by difference, name and input
// position: the contract of Palette.Within.
func bruteForce(cs []PaletteColour, q Lab, tol float64) []Match {
	type pm struct {
		m   Match
		pos int
	}
	var all []pm
	for i, c := range cs {
		if d := DeltaE2000(q, c.Lab); d <= tol {
			all = append(all, pm{Match{c, d}, i})
		}
	}
	slices.SortFunc(all, func(a, b pm) int {
		if c := cmp.Compare(a.m.DeltaE, b.m.DeltaE); c != 0 {
			return c
		}
		if c := strings.Compare(a.m.Name, b.m.Name); c != 0 {
			return c
		}
		return cmp.Compare(a.pos, b.pos)
	})
	var out []Match
	for _, a := range all {
		out = append(out, a.m)
	}
	return out
}

// TestWithinBruteForce checks Palette.Within against a scan of every
// colour on seeded random palettes and queries, for tolerances from 0 to
// 30, so that neither the L* window nor the second bound ever drops a
// colour, and the order is the documented one.
func TestWithinBruteForce(t *testing.T) {
	r := rand.New(rand.NewPCG(42, 5000))
	found := 0
	for _, size := range []int{1, 2, 10, 300, 3000} {
		for _, wild := range []bool{false, true} {
			cs := randomPalette(r, size, wild)
			p := NewPalette(cs)
			if p.Len() != size {
				t.Fatalf("Len() = %d; want %d", p.Len(), size)
			}
			for qi := 0; qi < 60; qi++ {
				var q Lab
				switch qi % 3 {
				case 0:
					q = randomRGB(r).Lab()
				case 1:
					q = randomLab(r)
				default: // right on a palette colour
					q = cs[r.IntN(size)].Lab
				}
				for _, tol := range []float64{0, 0.5, 2, 5, 10, 30} {
					got := p.Within(q, tol)
					want := bruteForce(cs, q, tol)
					found += len(got)
					if diff := gocmp.Diff(want, got); diff != "" {
						t.Fatalf("size %d, q %v, tol %v: Within differs from brute force (-want +got):\n%s", size, q, tol, diff)
					}
				}
			}
		}
	}
	if found == 0 {
		t.Fatal("no query found anything; the test checks nothing")
	}
}

// TestQuickReject checks the multiplication-only bound of the palette
// scan directly: on seeded random pairs, near and far, with the tightest
// S_L it allows (the pair's own), and limits around the true difference,
// it must never reject a colour within the limit.
func TestQuickReject(t *testing.T) {
	r := rand.New(rand.NewPCG(99, 3))
	rejected := 0
	for i := 0; i < 200000; i++ {
		x, y := randomLab(r), randomLab(r)
		if i%2 == 0 {
			s := r.Float64() * 20
			y = Lab{x.L + (r.Float64()-0.5)*s, x.A + (r.Float64()-0.5)*s, x.B + (r.Float64()-0.5)*s}
		}
		d50 := ((x.L+y.L)/2 - 50) * ((x.L+y.L)/2 - 50)
		sL := 1 + 0.015*d50/math.Sqrt(20+d50) // Sharma et al. (2005), eq. for S_L
		full := DeltaE2000(x, y)
		lim2 := full * full * (0.25 + r.Float64())
		px, py := preparePalette(x), preparePalette(y)
		if quickReject(&px, &py, 1/(sL*sL), lim2) {
			rejected++
			if full*full <= lim2 {
				t.Fatalf("%v %v: rejected, yet ΔE00² = %v <= limit %v", x, y, full*full, lim2)
			}
		}
	}
	if rejected == 0 {
		t.Fatal("the quick bound never rejected anything")
	}
	t.Logf("rejected %d of 200000", rejected)
}

// TestNearestBruteForce checks Palette.Nearest against the first n of a
// full sort on seeded random palettes.
func TestNearestBruteForce(t *testing.T) {
	r := rand.New(rand.NewPCG(43, 17))
	for _, size := range []int{1, 5, 200, 2000} {
		cs := randomPalette(r, size, true)
		p := NewPalette(cs)
		for qi := 0; qi < 40; qi++ {
			q := randomLab(r)
			if qi%2 == 0 {
				q = cs[r.IntN(size)].Lab
			}
			all := bruteForce(cs, q, math.Inf(1))
			for _, n := range []int{1, 3, 10, size, size + 5} {
				want := all[:min(n, len(all))]
				if diff := gocmp.Diff(want, p.Nearest(q, n)); diff != "" {
					t.Fatalf("size %d, q %v, n %d: Nearest differs from brute force (-want +got):\n%s", size, q, n, diff)
				}
			}
		}
	}
}

// TestPaletteEdges checks the documented edge cases: ties ordered by
// name then input position, colours with NaN or infinite components left
// out, empty results as nil.
func TestPaletteEdges(t *testing.T) {
	grey := Lab{50, 0, 0}
	cs := []PaletteColour{
		{Name: "slate", Lab: grey, Count: 1},
		{Name: "ash", Lab: grey, Count: 2},
		{Name: "nan", Lab: Lab{math.NaN(), 0, 0}},
		{Name: "slate", Lab: grey, Count: 3},
		{Name: "inf", Lab: Lab{50, math.Inf(1), 0}},
		{Name: "darker", Lab: Lab{45, 0, 0}, Count: 4},
	}
	p := NewPalette(cs)
	if p.Len() != 4 {
		t.Errorf("Len() = %d; want 4 (NaN and infinite colours left out)", p.Len())
	}
	want := []Match{
		{PaletteColour{"ash", grey, 2}, 0},
		{PaletteColour{"slate", grey, 1}, 0},
		{PaletteColour{"slate", grey, 3}, 0},
	}
	if diff := gocmp.Diff(want, p.Within(grey, 1)); diff != "" {
		t.Errorf("Within: equal colours must come by name, then input order (-want +got):\n%s", diff)
	}
	if diff := gocmp.Diff(want[:2], p.Nearest(grey, 2)); diff != "" {
		t.Errorf("Nearest(2) (-want +got):\n%s", diff)
	}
	tests := []struct {
		name   string
		got    []Match
		reason string
	}{
		{"negative tolerance", p.Within(grey, -1), "nothing is closer than 0"},
		{"NaN tolerance", p.Within(grey, math.NaN()), "no tolerance"},
		{"NaN query", p.Within(Lab{math.NaN(), 0, 0}, 100), "no colour"},
		{"nothing near", p.Within(Lab{95, 0, 0}, 1), "no palette colour near white"},
		{"n zero", p.Nearest(grey, 0), "no colours asked for"},
		{"infinite query", p.Nearest(Lab{0, math.Inf(-1), 0}, 3), "no colour"},
		{"empty palette", NewPalette(nil).Within(grey, 100), "nothing to find"},
		{"empty palette nearest", NewPalette(nil).Nearest(grey, 3), "nothing to find"},
	}
	for _, tt := range tests {
		if tt.got != nil {
			t.Errorf("%s: got %v; want nil (%s)", tt.name, tt.got, tt.reason)
		}
	}
	var nilPalette *Palette
	if nilPalette.Len() != 0 {
		t.Error("a nil palette has length 0")
	}
}

// benchLabs returns n seeded random in-gamut colours.
func benchLabs(seed uint64, n int) []Lab {
	r := rand.New(rand.NewPCG(seed, 1))
	out := make([]Lab, n)
	for i := range out {
		out[i] = randomRGB(r).Lab()
	}
	return out
}

// BenchmarkDeltaE2000 times one CIEDE2000 difference of random in-gamut
// colours (goal: under 200 ns).
func BenchmarkDeltaE2000(b *testing.B) {
	xs := benchLabs(1, 1024)
	ys := benchLabs(2, 1024)
	var sink float64
	i := 0
	for b.Loop() {
		sink += DeltaE2000(xs[i&1023], ys[i&1023])
		i++
	}
	_ = sink
}

// BenchmarkPaletteWithin times one Within query with tolerance 5 over a
// palette of 5,000 random in-gamut colours (goal: under 100 µs).
func BenchmarkPaletteWithin(b *testing.B) {
	cols := benchLabs(3, 5000)
	cs := make([]PaletteColour, len(cols))
	for i, l := range cols {
		cs[i] = PaletteColour{Name: fmt.Sprintf("colour %d", i), Lab: l, Count: i % 50}
	}
	p := NewPalette(cs)
	qs := benchLabs(4, 256)
	n, i := 0, 0
	for b.Loop() {
		n += len(p.Within(qs[i&255], 5))
		i++
	}
	b.ReportMetric(float64(n)/float64(i), "matches/op")
}

// BenchmarkPaletteNearest times one Nearest query for 10 colours over the
// palette of BenchmarkPaletteWithin.
func BenchmarkPaletteNearest(b *testing.B) {
	cols := benchLabs(3, 5000)
	cs := make([]PaletteColour, len(cols))
	for i, l := range cols {
		cs[i] = PaletteColour{Name: fmt.Sprintf("colour %d", i), Lab: l}
	}
	p := NewPalette(cs)
	qs := benchLabs(4, 256)
	i := 0
	for b.Loop() {
		p.Nearest(qs[i&255], 10)
		i++
	}
}

// BenchmarkRGBToLab times one sRGB to L*a*b* conversion.
func BenchmarkRGBToLab(b *testing.B) {
	r := rand.New(rand.NewPCG(5, 1))
	cs := make([]RGB, 1024)
	for i := range cs {
		cs[i] = randomRGB(r)
	}
	var sink float64
	i := 0
	for b.Loop() {
		sink += cs[i&1023].Lab().L
		i++
	}
	_ = sink
}

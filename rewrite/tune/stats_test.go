package tune

import (
	"math"
	"testing"
)

// The table of Poisson(1) draws holds each k in proportion to its
// probability e⁻¹/k! (the Poisson distribution's mass function), to
// within one entry of 2¹⁶ for rounding at each boundary.
func TestPoissonTable(t *testing.T) {
	var count [8]int
	for _, k := range poisson {
		count[k]++
	}
	fact := 1.0
	for k := range 7 {
		if k > 0 {
			fact *= float64(k)
		}
		want := (1 << 16) * math.Exp(-1) / fact
		if math.Abs(float64(count[k])-want) > 1.5 {
			t.Errorf("k=%d: %d entries, want %.1f", k, count[k], want)
		}
	}
}

// The draws for a seed are the same every time, and their mean over
// many seeds is 1, as a Poisson(1) variable's is.
func TestDraws(t *testing.T) {
	var a, b [replicates]uint8
	draws(42, &a)
	draws(42, &b)
	if a != b {
		t.Error("the same seed drew differently")
	}
	sum, n := 0, 0
	for seed := range uint64(500) {
		draws(seed, &a)
		for _, k := range a {
			sum += int(k)
			n++
		}
	}
	if m := float64(sum) / float64(n); math.Abs(m-1) > 0.01 {
		t.Errorf("mean draw %.4f, want 1 ± 0.01 (%d draws)", m, n)
	}
}

package colour

import "math"

// pow25to7 is 25^7, the constant of the G and R_C terms of CIEDE2000.
const pow25to7 = 6103515625.0

// tMax is an upper bound of the CIEDE2000 hue weighting function
//
//	T(h) = 1 - 0.17 cos(h-30) + 0.24 cos(2h) + 0.32 cos(3h+6) - 0.20 cos(4h-63)
//
// over all hues. Its maximum is about 1.5725 (near h = 234.4 degrees);
// TestTMaxBoundsT proves the bound by sampling with a Lipschitz margin.
const tMax = 1.58

// upperRT bounds |R_T| when both colours have b* >= 0 (bound (3) on
// deltaE2000): their mean hue then lies in [0, 180], at least 95 degrees
// from 275, so Δθ <= 30 exp(-(95/25)²) and |R_T| <= 2 sin(2Δθ).
var upperRT = 2 * math.Sin(2*30*math.Exp(-(95.0/25)*(95.0/25))*rad)

// sin60 is sin(60 degrees) = |sin(2 Δθ)| at its largest, since Δθ <= 30.
var sin60 = math.Sqrt(3) / 2

// Constants of the angle-addition form of T.
var (
	cos30, sin30 = math.Cos(30 * rad), math.Sin(30 * rad)
	cos6, sin6   = math.Cos(6 * rad), math.Sin(6 * rad)
	cos63, sin63 = math.Cos(63 * rad), math.Sin(63 * rad)
)

const (
	rad = math.Pi / 180
	deg = 180 / math.Pi
)

// prepared is a colour with its CIE 1976 chroma C*ab, the one part of a
// CIEDE2000 computation that depends on a single colour only, and, for
// the palette's quick bound, whether b* >= 0 (as 1 or 0; set by
// preparePalette only).
type prepared struct{ L, A, B, C, up float64 }

func prepare(l Lab) prepared {
	return prepared{L: l.L, A: l.A, B: l.B, C: math.Sqrt(l.A*l.A + l.B*l.B)}
}

// preparePalette is prepare with the up field set.
func preparePalette(l Lab) prepared {
	p := prepare(l)
	if l.B >= 0 {
		p.up = 1
	}
	return p
}

// DeltaE2000 returns the CIEDE2000 colour difference of x and y with the
// parametric factors kL = kC = kH = 1 (CIE 142-2001), as written out by
// Sharma, Wu and Dalal (2005). The result is symmetric and zero for equal
// colours.
func DeltaE2000(x, y Lab) float64 {
	d, _ := deltaE2000(prepare(x), prepare(y), 1, 1, 1, math.Inf(1))
	return d
}

// DeltaE2000K returns the CIEDE2000 colour difference of x and y with the
// parametric factors kL, kC and kH (lightness, chroma, hue), which must be
// positive. kL = 2 is the usual choice for textiles; kL = kC = kH = 1 is
// [DeltaE2000].
func DeltaE2000K(x, y Lab, kL, kC, kH float64) float64 {
	d, _ := deltaE2000(prepare(x), prepare(y), kL, kC, kH, math.Inf(1))
	return d
}

func pow7(x float64) float64 {
	x2 := x * x
	return x2 * x2 * x2 * x
}

// deltaE2000 computes CIEDE2000 following the numbered steps of Sharma,
// Wu and Dalal (2005), section "Implementation". When lim2 is finite it
// may stop early: if a lower bound of ΔE00² already exceeds lim2 it
// returns that bound and false. Otherwise it returns ΔE00 and true.
//
// # Lower bounds
//
// Write ΔE00² = l² + x² + y² + R_T·x·y with l = ΔL'/(kL S_L),
// x = ΔC'/(kC S_C), y = ΔH'/(kH S_H).
//
// (1) l² alone is a lower bound: R_T = -2·sqrt(C̄'^7/(C̄'^7+25^7))·sin(2Δθ)
// has |R_T| <= 2, so x² + y² + R_T·x·y >= x² + y² - 2|x||y| =
// (|x| - |y|)² >= 0.
//
// (2) A tighter bound needs no trigonometry. Everything in x is known
// after step 2 (C1', C2', C̄'). For y: ΔH'² = 4 C1' C2' sin²(Δh'/2) =
// 2(C1' C2' - a1' a2' - b1 b2), because cos Δh' = (a1' a2' + b1 b2) /
// (C1' C2'); and S_H = 1 + 0.015 C̄' T <= 1 + 0.015 C̄' tMax, so
// |y| >= yLo = |ΔH'| / (kH (1 + 0.015 C̄' tMax)). Since 0 <= Δθ <= 30
// degrees, |sin 2Δθ| <= sin 60, so |R_T| <= r = R_C sin 60 with
// R_C = 2 sqrt(C̄'^7/(C̄'^7+25^7)) also known. Then x² + y² + R_T·x·y >=
// f(|y|) = x² + |y|² - r|x||y|, a parabola in |y| with its minimum
// x²(1 - r²/4) at |y| = r|x|/2 and increasing beyond it. So for all
// |y| >= yLo: f >= f(yLo) when yLo >= r|x|/2, else f >= x²(1 - r²/4).
// Also f >= (1 - r/2)(x² + |y|²) >= (1 - r/2)(x² + yLo²), since
// |x||y| <= (x² + |y|²)/2; the code takes the larger bound.
//
// (3) When b1 >= 0 and b2 >= 0 both hues h' lie in [0, 180] (b' = b*),
// and so does the mean hue: their difference is at most 180, so H̄' is
// their plain mean, or their sum when a chroma is zero (one hue is then
// 0). So |H̄' - 275| >= 95 and |R_T| <= upperRT (about 1e-6), which
// gives x² + y² + R_T·x·y >= (1 - upperRT/2)(x² + y²), since
// |x·y| <= (x² + y²)/2; and y² >= yLo² needs no square root.
func deltaE2000(p, q prepared, kL, kC, kH, lim2 float64) (float64, bool) {
	// Lightness term (step 3 for ΔL', L̄' and S_L).
	lbar := (p.L + q.L) / 2
	d50 := (lbar - 50) * (lbar - 50)
	sL := 1 + 0.015*d50/math.Sqrt(20+d50)
	tL := (q.L - p.L) / (kL * sL)
	sum := tL * tL
	if sum > lim2 {
		return sum, false
	}

	// Step 1: a' from the mean C*ab, then C'.
	c7 := pow7((p.C + q.C) / 2)
	g1 := 1 + 0.5*(1-math.Sqrt(c7/(c7+pow25to7)))
	a1, a2 := g1*p.A, g1*q.A
	b1, b2 := p.B, q.B
	c1 := math.Sqrt(a1*a1 + b1*b1)
	c2 := math.Sqrt(a2*a2 + b2*b2)

	// Chroma term and the rotation amplitude R_C (steps 2 and 4).
	cbar := (c1 + c2) / 2
	sC := 1 + 0.045*cbar
	tC := (c2 - c1) / (kC * sC)
	cp7 := pow7(cbar)
	rC := 2 * math.Sqrt(cp7/(cp7+pow25to7))

	if !math.IsInf(lim2, 1) {
		// Bound (2) of the doc comment.
		dH2 := 2 * (c1*c2 - a1*a2 - b1*b2)
		if dH2 < 0 {
			dH2 = 0
		}
		sHMax := kH * (1 + 0.015*cbar*tMax)
		var rest float64
		if b1 >= 0 && b2 >= 0 {
			// Bound (3).
			rest = (1 - upperRT/2) * (tC*tC + dH2/(sHMax*sHMax))
		} else {
			yLo := math.Sqrt(dH2) / sHMax
			r := rC * sin60
			ax := math.Abs(tC)
			if yLo >= r*ax/2 {
				rest = tC*tC + yLo*yLo - r*ax*yLo
			} else {
				rest = math.Max(tC*tC*(1-r*r/4), (1-r/2)*(tC*tC+yLo*yLo))
			}
		}
		if sum+rest > lim2 {
			return sum + rest, false
		}
	}

	// Step 1 (hue angles) and step 2 (Δh', mean hue H̄').
	var h1, h2 float64
	if c1 != 0 {
		h1 = hueDegrees(b1, a1)
	}
	if c2 != 0 {
		h2 = hueDegrees(b2, a2)
	}
	var dh, hbar float64
	if c1 == 0 || c2 == 0 {
		// Δh' = 0 and H̄' = h1' + h2' (one of them is zero).
		hbar = h1 + h2
	} else {
		dh = h2 - h1
		hsum := h1 + h2
		// The paper's rule keeps |h1' - h2'| = 180 exactly in the first
		// case. Opposite hues are recognised from the exact vectors
		// (zero cross product, negative dot product), since the two
		// atan2 results may put their difference a hair above 180.
		// The conversions keep each product rounded on its own (no
		// fused multiply-add), so exact negations compare equal.
		opposite := float64(a1*b2) == float64(b1*a2) && a1*a2+b1*b2 < 0
		if math.Abs(dh) <= 180 || opposite {
			hbar = hsum / 2
		} else {
			if dh > 180 {
				dh -= 360
			} else {
				dh += 360
			}
			if hsum < 360 {
				hbar = (hsum + 360) / 2
			} else {
				hbar = (hsum - 360) / 2
			}
		}
	}
	dH := 2 * math.Sqrt(c1*c2) * math.Sin(dh*rad/2)

	// Step 3: T, Δθ, R_T, S_H.
	t := hueWeight(hbar)
	e := (hbar - 275) / 25
	dTheta := 30 * math.Exp(-e*e)
	rT := -math.Sin(2*dTheta*rad) * rC
	sH := 1 + 0.015*cbar*t
	tH := dH / (kH * sH)

	return math.Sqrt(sum + tC*tC + tH*tH + rT*tC*tH), true
}

// hueWeight returns the CIEDE2000 weighting function of hue
//
//	T = 1 - 0.17 cos(h-30) + 0.24 cos(2h) + 0.32 cos(3h+6) - 0.20 cos(4h-63)
//
// for h in degrees, from one sincos by the multiple-angle and
// angle-addition formulas instead of four cosines.
func hueWeight(h float64) float64 {
	s, c := math.Sincos(h * rad)
	cos2, sin2 := 2*c*c-1, 2*s*c
	cos3, sin3 := c*(4*c*c-3), s*(3-4*s*s)
	cos4, sin4 := 2*cos2*cos2-1, 2*sin2*cos2
	return 1 -
		0.17*(c*cos30+s*sin30) +
		0.24*cos2 +
		0.32*(cos3*cos6-sin3*sin6) -
		0.20*(cos4*cos63+sin4*sin63)
}

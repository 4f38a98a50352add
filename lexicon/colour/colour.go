package colour

import (
	"fmt"
	"math"
)

// RGB is an 8-bit sRGB colour (IEC 61966-2-1), each channel 0..255 after
// the sRGB transfer function, as written in "#rrggbb".
type RGB struct{ R, G, B uint8 }

// Lab is a CIE 1976 L*a*b* colour relative to the D65 white of
// IEC 61966-2-1 (see the package comment). L runs from 0 (black) to 100
// (the white point); a is green (negative) to red (positive), b blue
// (negative) to yellow (positive).
type Lab struct{ L, A, B float64 }

// LCh is the cylindrical form of [Lab]: lightness L, chroma C (the
// distance from the neutral axis) and hue angle H in degrees, in [0, 360)
// when produced by [Lab.LCh], measured from the +a axis towards +b.
type LCh struct{ L, C, H float64 }

// rgbToXYZ is the linear-sRGB to CIE XYZ matrix of IEC 61966-2-1, with
// its four-decimal coefficients.
var rgbToXYZ = [3][3]float64{
	{0.4124, 0.3576, 0.1805},
	{0.2126, 0.7152, 0.0722},
	{0.0193, 0.1192, 0.9505},
}

// xyzToRGB is the inverse of rgbToXYZ, computed in float64 rather than
// taken from a rounded published table, so that RGB -> XYZ -> RGB is the
// identity up to rounding.
var xyzToRGB = invert3(rgbToXYZ)

// whiteX, whiteY, whiteZ are the reference white: rgbToXYZ applied to
// linear (1, 1, 1), i.e. the row sums 0.9505, 1.0000, 1.0890, so that
// sRGB white maps to L* = 100, a* = b* = 0.
var (
	whiteX = rgbToXYZ[0][0] + rgbToXYZ[0][1] + rgbToXYZ[0][2]
	whiteY = rgbToXYZ[1][0] + rgbToXYZ[1][1] + rgbToXYZ[1][2]
	whiteZ = rgbToXYZ[2][0] + rgbToXYZ[2][1] + rgbToXYZ[2][2]
)

// decode8 holds the linear value of each 8-bit sRGB channel value.
var decode8 = func() (t [256]float64) {
	for i := range t {
		t[i] = decode(float64(i) / 255)
	}
	return t
}()

// invert3 returns the inverse of the 3x3 matrix m by cofactors. m must be
// invertible (the sRGB matrix is).
func invert3(m [3][3]float64) [3][3]float64 {
	var c [3][3]float64 // cofactor matrix
	for i := 0; i < 3; i++ {
		for j := 0; j < 3; j++ {
			i1, i2 := (i+1)%3, (i+2)%3
			j1, j2 := (j+1)%3, (j+2)%3
			c[i][j] = m[i1][j1]*m[i2][j2] - m[i1][j2]*m[i2][j1]
		}
	}
	det := m[0][0]*c[0][0] + m[0][1]*c[0][1] + m[0][2]*c[0][2]
	var inv [3][3]float64
	for i := 0; i < 3; i++ {
		for j := 0; j < 3; j++ {
			inv[i][j] = c[j][i] / det
		}
	}
	return inv
}

// decode is the sRGB transfer function of IEC 61966-2-1: an encoded
// channel value v in 0..1 to linear light.
func decode(v float64) float64 {
	if v <= 0.04045 {
		return v / 12.92
	}
	return math.Pow((v+0.055)/1.055, 2.4)
}

// encode is the inverse of decode: linear light to an encoded value. It is
// extended to negative values by symmetry, so that a colour just outside
// the gamut stays just outside after encoding.
func encode(u float64) float64 {
	if u < 0 {
		return -encode(-u)
	}
	if u <= 0.0031308 {
		return 12.92 * u
	}
	return 1.055*math.Pow(u, 1/2.4) - 0.055
}

// Lab constants of CIE 15:2004: epsilon = (6/29)^3 is the threshold of the
// cube-root segment, kappa = (29/6)^2 / 3 the slope of the linear one.
const (
	labDelta   = 6.0 / 29
	labEpsilon = labDelta * labDelta * labDelta
	labSlope   = 1 / (3 * labDelta * labDelta)
	labOffset  = 4.0 / 29
)

// labF is the CIE 1976 f function.
func labF(t float64) float64 {
	if t > labEpsilon {
		return math.Cbrt(t)
	}
	return t*labSlope + labOffset
}

// labFInv is the inverse of labF.
func labFInv(f float64) float64 {
	if f > labDelta {
		return f * f * f
	}
	return (f - labOffset) / labSlope
}

// Hex returns the colour as "#rrggbb" in lower case.
func (c RGB) Hex() string {
	return fmt.Sprintf("#%02x%02x%02x", c.R, c.G, c.B)
}

// Lab converts the colour to CIE L*a*b*: sRGB decoding, the IEC 61966-2-1
// matrix to XYZ, then CIE 1976 L*a*b* relative to the matrix's white.
func (c RGB) Lab() Lab {
	r, g, b := decode8[c.R], decode8[c.G], decode8[c.B]
	x := rgbToXYZ[0][0]*r + rgbToXYZ[0][1]*g + rgbToXYZ[0][2]*b
	y := rgbToXYZ[1][0]*r + rgbToXYZ[1][1]*g + rgbToXYZ[1][2]*b
	z := rgbToXYZ[2][0]*r + rgbToXYZ[2][1]*g + rgbToXYZ[2][2]*b
	fx, fy, fz := labF(x/whiteX), labF(y/whiteY), labF(z/whiteZ)
	return Lab{L: 116*fy - 16, A: 500 * (fx - fy), B: 200 * (fy - fz)}
}

// RGB converts the colour to the nearest 8-bit sRGB colour, clamping each
// channel to 0..255. ok is false when the colour lies outside the sRGB
// gamut by more than half a step (0.5/255) on any channel before
// clamping, or has a NaN component; the returned colour is then the
// clamped approximation (black for NaN).
func (l Lab) RGB() (RGB, bool) {
	fy := (l.L + 16) / 116
	fx := fy + l.A/500
	fz := fy - l.B/200
	x, y, z := whiteX*labFInv(fx), whiteY*labFInv(fy), whiteZ*labFInv(fz)
	ok := true
	ch := func(row int) uint8 {
		m := xyzToRGB[row]
		v := 255 * encode(m[0]*x+m[1]*y+m[2]*z)
		switch {
		case math.IsNaN(v):
			ok = false
			return 0
		case v < -0.5 || v > 255.5:
			ok = false
		}
		return uint8(math.Round(math.Max(0, math.Min(255, v))))
	}
	return RGB{R: ch(0), G: ch(1), B: ch(2)}, ok
}

// LCh converts the colour to lightness, chroma and hue. H is in degrees
// in [0, 360); a neutral colour (C = 0) has H = 0.
func (l Lab) LCh() LCh {
	c := math.Hypot(l.A, l.B)
	if c == 0 {
		return LCh{L: l.L}
	}
	return LCh{L: l.L, C: c, H: hueDegrees(l.B, l.A)}
}

// hueDegrees returns atan2(b, a) in degrees in [0, 360).
func hueDegrees(b, a float64) float64 {
	h := math.Atan2(b, a) * deg
	if h < 0 {
		h += 360
		if h >= 360 { // h was a tiny negative angle
			h = 0
		}
	}
	return h
}

// Lab converts the colour back to L*a*b*. H may be any angle in degrees.
func (c LCh) Lab() Lab {
	s, k := math.Sincos(c.H * rad)
	return Lab{L: c.L, A: c.C * k, B: c.C * s}
}

// DeltaE76 returns the CIE 1976 colour difference: the Euclidean distance
// between x and y in L*a*b*.
func DeltaE76(x, y Lab) float64 {
	dl, da, db := x.L-y.L, x.A-y.A, x.B-y.B
	return math.Sqrt(dl*dl + da*da + db*db)
}

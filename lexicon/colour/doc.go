// Package colour is whittle's colour science: parsing colour values that
// shoppers and catalogs write, converting between sRGB, CIE L*a*b* and
// LCh, measuring colour difference (CIEDE2000 and CIE 1976), naming the
// colour families a colour belongs to, applying shade modifiers such as
// "light" or "muted", and finding the catalog colours near a query colour.
//
// # Conversions
//
// [RGB] is 8-bit sRGB. [RGB.Lab] decodes each channel with the sRGB
// transfer function of IEC 61966-2-1 (linear below 0.04045 with slope
// 1/12.92, else ((v+0.055)/1.055)^2.4), converts to CIE XYZ with the
// standard's four-decimal matrix
//
//	0.4124 0.3576 0.1805
//	0.2126 0.7152 0.0722
//	0.0193 0.1192 0.9505
//
// and then to CIE 1976 L*a*b* (CIE 15:2004: f(t) = cbrt(t) above
// (6/29)^3, else t·(29/6)²/3 + 4/29) relative to the white the matrix
// gives to linear (1, 1, 1), its row sums (0.9505, 1.0000, 1.0890), which
// is D65 at four decimals. [Lab.RGB] runs the same steps backwards with
// the inverse matrix computed in float64 and the inverse transfer function
// (12.92·u up to 0.0031308, else 1.055·u^(1/2.4) - 0.055). Every 8-bit
// colour survives the round trip sRGB → Lab → sRGB unchanged.
//
// # Colour difference
//
// [DeltaE2000] and [DeltaE2000K] implement CIEDE2000 (CIE 142-2001) as
// written out by Sharma, Wu and Dalal (2005), including their rules for
// the mean hue: when the hue angles differ by more than 180 degrees, 360
// is added to their sum if it is below 360 and subtracted otherwise; a
// difference of exactly 180 degrees takes the plain mean; and when either
// chroma is zero the mean hue is the sum of the two. [DeltaE76] is the
// Euclidean distance in L*a*b*.
//
// # Families
//
// [FamiliesOf] names the families a colour belongs to. These are
// whittle's own rules, chosen to agree with how the CSS named colours are
// commonly called; they are not a standard. They work in LCh (CIELAB
// hue h_ab in degrees; every range includes its start and excludes its
// end).
//
// Neutrals, C < 8: white when L >= 88, black when L <= 18, otherwise
// grey. A neutral with C >= 4, L >= 75 and a hue in [40, 112) (an
// off-white such as linen or ivory) is also beige.
//
// Other colours take the family of their hue:
//
//	pink    [340, 360) and [0, 5)
//	red     [5, 45)
//	orange  [45, 78)
//	yellow  [78, 112)
//	green   [112, 195)
//	blue    [195, 310)
//	purple  [310, 340)
//
// and also, in this order:
//
//   - pink, for red and purple hues with L >= 65 (pink, lightcoral,
//     plum);
//   - red, for pink hues with L < 40 (wines and dark raspberries);
//   - purple, for blue hues in [285, 310) with L >= 40 and C < 65 (in
//     CIELAB, desaturated blue-violets such as lavender share the hue of
//     pure blue);
//   - brown, when C < 75 and either the hue is in [20, 45) with L < 40
//     (maroon) or the hue is in [45, 90) with L < 60 (sienna,
//     chocolate); the colour keeps its hue family too;
//   - grey, when C < 13 and 18 < L < 88 (slate greys);
//   - beige, for hues in [40, 112) with L >= 70 and C < 32 (tan, wheat,
//     beige, cream).
//
// The bins are wider or shifted from the hue names one might expect
// because CIELAB hue is not evenly spread: sRGB red lies at h = 40,
// orange at 73, yellow at 103, blue and navy at 306 and magenta at 328.
// [Multi] is never computed; it is for words that name several colours.
//
// # Modifiers
//
// [Modify] applies a shade word in LCh, keeping the hue: light L+12,
// dark L-15, pale L+15 and C×0.6, deep L-8 and C×1.15, bright L+3 and
// C×1.25, muted C×0.55. Lightness never moves past 98 or below 5 (nor the
// wrong way for a colour already beyond), and C never below 0. These
// are whittle's own rules.
//
// # Palettes
//
// A [Palette] holds the colours a catalog carries. [Palette.Within]
// returns those within a CIEDE2000 tolerance of a query colour and
// [Palette.Nearest] the n nearest; both skip most of the palette with
// lower bounds of CIEDE2000 that are proved in the source.
package colour

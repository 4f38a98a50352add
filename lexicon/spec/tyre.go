package spec

import (
	"fmt"
	"math"
	"strconv"
)

// constructionNames names the construction codes of a tyre designation.
var constructionNames = map[byte]string{
	'R': "radial",
	'D': "diagonal",
	'B': "bias belted",
	'-': "diagonal",
}

// TyreSize returns the ISO metric tyre size "width/aspect construction rim",
// as in 225/45R17: section width in millimetres, aspect ratio (section
// height as a percentage of the width), construction ('R' radial, 'D'
// diagonal, 'B' bias belted, '-' diagonal written with a dash, as in
// 120/90-18; lower case is accepted) and rim diameter code in inches.
//
// Dimensions, in millimetres: "section_width", "sidewall_height"
// (width × aspect / 100), "rim_diameter" (rim × 25.4) and
// "overall_diameter" (rim diameter + 2 × sidewall height), the nominal
// design diameter of ISO 4000-1. Attributes: "construction" (the code
// letter), "construction_name", "aspect_ratio" and "rim_diameter_in".
//
// Values outside the range of road tyres give an error wrapping
// [ErrOutOfRange]: width 105..395 mm, aspect 20..95, rim 10..26 in. An
// unknown construction code or a rim that is not a whole or half inch
// gives an error wrapping [ErrNotStandard].
func TyreSize(width, aspect int, construction byte, rim float64) (Designation, error) {
	if width < 105 || width > 395 {
		return Designation{}, fmt.Errorf("%w: tyre section width %d mm (want 105..395)", ErrOutOfRange, width)
	}
	if aspect < 20 || aspect > 95 {
		return Designation{}, fmt.Errorf("%w: tyre aspect ratio %d (want 20..95)", ErrOutOfRange, aspect)
	}
	if !(rim >= 10 && rim <= 26) {
		return Designation{}, fmt.Errorf("%w: tyre rim diameter %g in (want 10..26)", ErrOutOfRange, rim)
	}
	if rim*2 != math.Trunc(rim*2) {
		return Designation{}, fmt.Errorf("%w: tyre rim diameter %g in is not a whole or half inch", ErrNotStandard, rim)
	}
	if 'a' <= construction && construction <= 'z' {
		construction -= 'a' - 'A'
	}
	name, ok := constructionNames[construction]
	if !ok {
		return Designation{}, fmt.Errorf("%w: tyre construction %q (want R, D, B or -)", ErrNotStandard, construction)
	}
	sidewall := float64(width) * float64(aspect) / 100
	rimMM := rim * 25.4
	rimCode := formatNumber(rim)
	return Designation{
		System: Tyre,
		Code:   strconv.Itoa(width) + "/" + strconv.Itoa(aspect) + string(construction) + rimCode,
		Dimensions: map[string]float64{
			"section_width":    float64(width),
			"sidewall_height":  sidewall,
			"rim_diameter":     rimMM,
			"overall_diameter": rimMM + 2*sidewall,
		},
		Attributes: map[string]string{
			"construction":      string(construction),
			"construction_name": name,
			"aspect_ratio":      strconv.Itoa(aspect),
			"rim_diameter_in":   rimCode,
		},
		Source: "ISO 4000-1",
	}, nil
}

// FlotationTyreSize returns the flotation (inch) tyre size "diameter x
// width construction rim", as in 33x12.50R20, the way light truck and
// off-road tyres are sized (common practice; the layout from memory):
// overall diameter and section width in inches, the construction code
// and the rim diameter in inches. The width keeps two decimals, as the
// sizes are written ("12.50").
//
// Code: "33X12.50R20". Dimensions, in millimetres: "overall_diameter",
// "section_width", "sidewall_height" ((overall - rim) / 2) and
// "rim_diameter". Attributes: "construction", "construction_name",
// "rim_diameter_in" and "sizing" ("flotation").
//
// Values outside the sizes sold give an error wrapping [ErrOutOfRange]:
// diameter 20..50 in, width 6..20 in and under the diameter, rim
// 10..26 in and under the diameter. A diameter, width or rim not in half
// inches (a width in hundredths of an inch for the .50s) gives an error
// wrapping [ErrNotStandard], as does an unknown construction.
func FlotationTyreSize(diameter, width float64, construction byte, rim float64) (Designation, error) {
	if !(diameter >= 20 && diameter <= 50) {
		return Designation{}, fmt.Errorf("%w: flotation tyre diameter %g in (want 20..50)", ErrOutOfRange, diameter)
	}
	if !(width >= 6 && width <= 20) || width >= diameter {
		return Designation{}, fmt.Errorf("%w: flotation tyre width %g in (want 6..20, under the diameter)", ErrOutOfRange, width)
	}
	if !(rim >= 10 && rim <= 26) || rim >= diameter {
		return Designation{}, fmt.Errorf("%w: flotation tyre rim %g in (want 10..26, under the diameter)", ErrOutOfRange, rim)
	}
	for _, v := range []float64{diameter, width, rim} {
		if v*2 != math.Trunc(v*2) {
			return Designation{}, fmt.Errorf("%w: flotation tyre size %g in is not a whole or half inch", ErrNotStandard, v)
		}
	}
	if 'a' <= construction && construction <= 'z' {
		construction -= 'a' - 'A'
	}
	name, ok := constructionNames[construction]
	if !ok || construction == '-' {
		return Designation{}, fmt.Errorf("%w: tyre construction %q (want R, D or B)", ErrNotStandard, construction)
	}
	rimCode := formatNumber(rim)
	return Designation{
		System: Tyre,
		Code:   formatNumber(diameter) + "X" + strconv.FormatFloat(width, 'f', 2, 64) + string(construction) + rimCode,
		Dimensions: map[string]float64{
			"overall_diameter": diameter * 25.4,
			"section_width":    width * 25.4,
			"sidewall_height":  (diameter - rim) * 25.4 / 2,
			"rim_diameter":     rim * 25.4,
		},
		Attributes: map[string]string{
			"construction":      string(construction),
			"construction_name": name,
			"rim_diameter_in":   rimCode,
			"sizing":            "flotation",
		},
		Source: "flotation sizes (common practice)",
	}, nil
}

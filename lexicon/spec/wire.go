package spec

import (
	"fmt"
	"math"
	"strconv"
)

// maxConductors bounds the conductor count of a multi-conductor cable.
const maxConductors = 50

// WireGauge returns American Wire Gauge size gauge, with conductors > 0 for
// a cable of that many insulated conductors ("14/2" is 14, 2) and 0 for a
// single wire. Gauges run from 0000 to 40; the aught sizes are passed as
// 0 (0 or 1/0), -1 (00, 2/0), -2 (000, 3/0) and -3 (0000, 4/0), the n of
// the ASTM B258 formula.
//
// Code: "14 AWG", "14/2 AWG" for a cable, "4/0 AWG" for aught sizes and
// "3/C 4/0 AWG" for a cable of aught conductors. Dimensions, in millimetres:
// "diameter" of one solid conductor by the ASTM B258 definition
// d = 0.127 mm × 92^((36-n)/39), and "area_mm2" (square millimetres, π/4 × d²). Attributes:
// "gauge" ("14", "4/0"), "gauge_n" ("-3") and "conductors" for cables.
//
// A gauge outside -3..40 or a conductor count outside 0..50 gives an error
// wrapping [ErrOutOfRange].
func WireGauge(gauge int, conductors int) (Designation, error) {
	if gauge < -3 || gauge > 40 {
		return Designation{}, fmt.Errorf("%w: AWG %d (want 0000..40, aught sizes as 0..-3)", ErrOutOfRange, gauge)
	}
	if conductors < 0 || conductors > maxConductors {
		return Designation{}, fmt.Errorf("%w: %d conductors (want 0..%d)", ErrOutOfRange, conductors, maxConductors)
	}
	d := 0.127 * math.Pow(92, float64(36-gauge)/39)
	label := strconv.Itoa(gauge)
	if gauge <= 0 {
		label = strconv.Itoa(1-gauge) + "/0"
	}
	code := label + " AWG"
	attrs := map[string]string{
		"gauge":   label,
		"gauge_n": strconv.Itoa(gauge),
	}
	if conductors > 0 {
		if gauge <= 0 {
			code = strconv.Itoa(conductors) + "/C " + label + " AWG"
		} else {
			code = label + "/" + strconv.Itoa(conductors) + " AWG"
		}
		attrs["conductors"] = strconv.Itoa(conductors)
	}
	return Designation{
		System: AWG,
		Code:   code,
		Dimensions: map[string]float64{
			"diameter": d,
			"area_mm2": math.Pi / 4 * d * d,
		},
		Attributes: attrs,
		Source:     "ASTM B258",
	}, nil
}

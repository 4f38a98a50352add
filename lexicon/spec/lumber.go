package spec

import (
	"fmt"
	"strconv"
	"strings"
)

// lumberRow is one PS 20 nominal size, surfaced dry.
type lumberRow struct {
	nomT, nomW   int
	fracT, fracW string  // dressed inches as written: "1-1/2"
	inT, inW     float64 // dressed inches
	mmT, mmW     float64 // dressed millimetres
}

func parseLumber() (map[[2]int]lumberRow, error) {
	const file = "lumber_ps20.tsv"
	rows, err := readRows(file, "nominal", "dressed_in", "dressed_mm")
	if err != nil {
		return nil, err
	}
	out := make(map[[2]int]lumberRow, len(rows))
	for _, r := range rows {
		var l lumberRow
		t, w, ok := strings.Cut(r[0], "x")
		var e1, e2 error
		l.nomT, e1 = strconv.Atoi(t)
		l.nomW, e2 = strconv.Atoi(w)
		if !ok || e1 != nil || e2 != nil || l.nomT > l.nomW {
			return nil, fmt.Errorf("spec: %s: bad nominal size %q", file, r[0])
		}
		if l.fracT, l.fracW, err = parsePair(r[1], func(s string) (string, error) { return s, nil }); err != nil {
			return nil, fmt.Errorf("spec: %s: %v", file, err)
		}
		if l.inT, l.inW, err = parsePair(r[1], parseInches); err != nil {
			return nil, fmt.Errorf("spec: %s: %v", file, err)
		}
		if l.mmT, l.mmW, err = parsePair(r[2], parseFloat); err != nil {
			return nil, fmt.Errorf("spec: %s: %v", file, err)
		}
		key := [2]int{l.nomT, l.nomW}
		if _, dup := out[key]; dup {
			return nil, fmt.Errorf("spec: %s: duplicate %s", file, r[0])
		}
		out[key] = l
	}
	return out, nil
}

// LumberNominal returns the PS 20 softwood lumber size with the nominal
// thickness and width in inches ("2x4" is 2, 4), surfaced dry. The order
// does not matter: 4, 2 (as "4x2" is said in the UK) is the same 2x4.
//
// Dimensions: "thickness" and "width", the minimum dressed dry sizes in
// millimetres as PS 20 gives them (whole mm: a 2x4 is 38 x 89).
// Attributes: "nominal_thickness_in", "nominal_width_in",
// "dressed_thickness_in", "dressed_width_in" (decimal inches: "1.5"),
// "dressed_thickness_frac", "dressed_width_frac" (as written: "1-1/2") and
// "condition" ("dry").
//
// It reports false for sizes not in the table (boards and dimension lumber
// 1x2 to 4x6).
func LumberNominal(thick, width int) (Designation, bool) {
	if thick > width {
		thick, width = width, thick
	}
	l, ok := data().lumber[[2]int{thick, width}]
	if !ok {
		return Designation{}, false
	}
	return Designation{
		System: Lumber,
		Code:   strconv.Itoa(l.nomT) + "x" + strconv.Itoa(l.nomW),
		Dimensions: map[string]float64{
			"thickness": l.mmT,
			"width":     l.mmW,
		},
		Attributes: map[string]string{
			"nominal_thickness_in":   strconv.Itoa(l.nomT),
			"nominal_width_in":       strconv.Itoa(l.nomW),
			"dressed_thickness_in":   formatNumber(l.inT),
			"dressed_width_in":       formatNumber(l.inW),
			"dressed_thickness_frac": l.fracT,
			"dressed_width_frac":     l.fracW,
			"condition":              "dry",
		},
		Source: "PS 20",
	}, true
}

// formatNumber writes v in the shortest form that reads back exactly.
func formatNumber(v float64) string { return strconv.FormatFloat(v, 'f', -1, 64) }

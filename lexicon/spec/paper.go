package spec

import (
	"fmt"
	"strings"
)

// paperRow is one ISO 216 trimmed size, portrait.
type paperRow struct {
	code          string
	width, height float64
}

func parsePaper() (map[string]paperRow, error) {
	const file = "iso216_paper.tsv"
	rows, err := readRows(file, "size", "mm")
	if err != nil {
		return nil, err
	}
	out := make(map[string]paperRow, len(rows))
	for _, r := range rows {
		p := paperRow{code: r[0]}
		if p.width, p.height, err = parsePair(r[1], parseFloat); err != nil {
			return nil, fmt.Errorf("spec: %s: %v", file, err)
		}
		if len(p.code) < 2 || (p.code[0] != 'A' && p.code[0] != 'B') || p.width <= 0 || p.width >= p.height {
			return nil, fmt.Errorf("spec: %s: bad row %q", file, r)
		}
		if _, dup := out[p.code]; dup {
			return nil, fmt.Errorf("spec: %s: duplicate %s", file, p.code)
		}
		out[p.code] = p
	}
	return out, nil
}

// PaperSize returns the ISO 216 paper size with the given code, A0 to A10
// or B0 to B10, ignoring case and surrounding space ("a4" is A4).
//
// Dimensions, in millimetres: "width" and "height" of the trimmed sheet,
// portrait (A4 is 210 x 297). Attributes: "series" ("A" or "B").
//
// It reports false for any other code (C envelope sizes, US Letter, ...).
func PaperSize(code string) (Designation, bool) {
	p, ok := data().paper[strings.ToUpper(strings.TrimSpace(code))]
	if !ok {
		return Designation{}, false
	}
	return Designation{
		System: Paper,
		Code:   p.code,
		Dimensions: map[string]float64{
			"width":  p.width,
			"height": p.height,
		},
		Attributes: map[string]string{
			"series": p.code[:1],
		},
		Source: "ISO 216",
	}, true
}

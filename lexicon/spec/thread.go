package spec

import (
	"fmt"
	"math"
	"strconv"
	"strings"
)

// metricRow is one ISO 261 diameter with its pitches; the strings keep the
// values as the data file writes them, for codes.
type metricRow struct {
	diameter  float64
	dStr      string
	coarse    float64
	coarseStr string
	fine      []float64
	fineStr   []string
	choice    string
}

func parseMetric() ([]metricRow, error) {
	const file = "iso261_metric_threads.tsv"
	rows, err := readRows(file, "diameter", "coarse", "fine", "choice")
	if err != nil {
		return nil, err
	}
	out := make([]metricRow, 0, len(rows))
	for _, r := range rows {
		m := metricRow{dStr: r[0], coarseStr: r[1], choice: r[3]}
		var e1, e2 error
		m.diameter, e1 = parseFloat(r[0])
		m.coarse, e2 = parseFloat(r[1])
		if e1 != nil || e2 != nil || m.diameter <= 0 || m.coarse <= 0 || (m.choice != "1" && m.choice != "2") {
			return nil, fmt.Errorf("spec: %s: bad row %q", file, r)
		}
		for _, f := range strings.Fields(r[2]) {
			p, err := parseFloat(f)
			if err != nil || p <= 0 || p >= m.coarse {
				return nil, fmt.Errorf("spec: %s: M%s: bad fine pitch %q", file, r[0], f)
			}
			m.fine = append(m.fine, p)
			m.fineStr = append(m.fineStr, f)
		}
		if n := len(out); n > 0 && out[n-1].diameter >= m.diameter {
			return nil, fmt.Errorf("spec: %s: M%s out of order", file, r[0])
		}
		out = append(out, m)
	}
	return out, nil
}

// sameMM compares two millimetre values typed by people: equal to a
// micrometre.
func sameMM(a, b float64) bool { return math.Abs(a-b) < 1e-6 }

// MetricThreadSize returns the ISO metric screw thread of the nominal
// diameter in millimetres (M2 to M24, the sizes of the ISO 261 table) and
// pitch in millimetres. Pitch 0 selects the coarse pitch, which is what a
// bare "M8" means. Any other pitch must be the coarse pitch or one of the
// fine pitches listed for that diameter; a nearby pitch is never accepted.
//
// Code: "M8x1.25", always with the pitch. Dimensions, in millimetres:
// "major_diameter" and "pitch". Attributes: "pitch_kind" ("coarse" or
// "fine") and "choice" (the ISO 261 preference, "1" or "2").
//
// An unlisted diameter or pitch gives an error wrapping [ErrNotStandard];
// a negative, zero or non-finite diameter, or a negative or non-finite
// pitch, an error wrapping [ErrOutOfRange].
func MetricThreadSize(diameter, pitch float64) (Designation, error) {
	if !(diameter > 0) || math.IsInf(diameter, 0) {
		return Designation{}, fmt.Errorf("%w: metric thread diameter %g mm", ErrOutOfRange, diameter)
	}
	if !(pitch >= 0) || math.IsInf(pitch, 0) {
		return Designation{}, fmt.Errorf("%w: metric thread pitch %g mm", ErrOutOfRange, pitch)
	}
	var row *metricRow
	rows := data().metric
	for i := range rows {
		if sameMM(rows[i].diameter, diameter) {
			row = &rows[i]
			break
		}
	}
	if row == nil {
		return Designation{}, fmt.Errorf("%w: M%g is not an ISO 261 size in M2..M24", ErrNotStandard, diameter)
	}
	p, pStr, kind := row.coarse, row.coarseStr, "coarse"
	if pitch != 0 && !sameMM(pitch, row.coarse) {
		found := false
		for i, f := range row.fine {
			if sameMM(pitch, f) {
				p, pStr, kind, found = f, row.fineStr[i], "fine", true
				break
			}
		}
		if !found {
			return Designation{}, fmt.Errorf("%w: M%sx%g: ISO 261 lists pitch %s (coarse) or %s (fine) for M%s",
				ErrNotStandard, row.dStr, pitch, row.coarseStr, strings.Join(row.fineStr, ", "), row.dStr)
		}
	}
	return Designation{
		System: MetricThread,
		Code:   "M" + row.dStr + "x" + pStr,
		Dimensions: map[string]float64{
			"major_diameter": row.diameter,
			"pitch":          p,
		},
		Attributes: map[string]string{
			"pitch_kind": kind,
			"choice":     row.choice,
		},
		Source: "ISO 261",
	}, nil
}

// MetricFineThreads returns the fine threads ISO 261 lists for the
// nominal diameter in millimetres, finest pitch first: for 8, M8x0.75
// and M8x1. It takes the errors of [MetricThreadSize] for a diameter
// not listed.
func MetricFineThreads(diameter float64) ([]Designation, error) {
	if _, err := MetricThreadSize(diameter, 0); err != nil {
		return nil, err
	}
	var out []Designation
	for _, r := range data().metric {
		if !sameMM(r.diameter, diameter) {
			continue
		}
		for _, f := range r.fine {
			d, err := MetricThreadSize(diameter, f)
			if err != nil {
				return nil, err
			}
			out = append(out, d)
		}
	}
	return out, nil
}

// unifiedRow is one ASME B1.1 size.
type unifiedRow struct {
	size     string // "#4" or "1/4"
	majorIn  float64
	majorStr string
	unc, unf int
}

func parseUnified() (map[string]unifiedRow, error) {
	const file = "asme_b1_1_unified_threads.tsv"
	rows, err := readRows(file, "kind", "size", "major_in", "unc", "unf")
	if err != nil {
		return nil, err
	}
	out := make(map[string]unifiedRow, len(rows))
	for _, r := range rows {
		u := unifiedRow{majorStr: r[2]}
		switch r[0] {
		case "number":
			if _, err := strconv.Atoi(r[1]); err != nil {
				return nil, fmt.Errorf("spec: %s: bad numbered size %q", file, r[1])
			}
			u.size = "#" + r[1]
		case "fraction":
			if _, err := parseInches(r[1]); err != nil {
				return nil, fmt.Errorf("spec: %s: %v", file, err)
			}
			u.size = r[1]
		default:
			return nil, fmt.Errorf("spec: %s: bad kind %q", file, r[0])
		}
		var e1, e2, e3 error
		u.majorIn, e1 = parseFloat(r[2])
		u.unc, e2 = strconv.Atoi(r[3])
		u.unf, e3 = strconv.Atoi(r[4])
		if e1 != nil || e2 != nil || e3 != nil || u.majorIn <= 0 || u.unc <= 0 || u.unf <= u.unc {
			return nil, fmt.Errorf("spec: %s: bad row %q", file, r)
		}
		if _, dup := out[u.size]; dup {
			return nil, fmt.Errorf("spec: %s: duplicate size %s", file, u.size)
		}
		out[u.size] = u
	}
	return out, nil
}

// unifiedKey normalises a unified thread size as typed: "#10", "# 10",
// "No. 10", "no10", `1/4`, `1/4"`, `1"`. It returns the table key.
func unifiedKey(size string) string {
	s := strings.ToLower(strings.TrimSpace(size))
	s = strings.TrimSuffix(s, `"`)
	s = strings.TrimSuffix(s, "″")
	switch {
	case strings.HasPrefix(s, "#"):
		s = s[1:]
	case strings.HasPrefix(s, "no"):
		s = strings.TrimPrefix(s[2:], ".")
	default:
		return strings.TrimSpace(s)
	}
	s = strings.TrimSpace(s)
	if s == "" || strings.ContainsAny(s, "/ ") {
		return ""
	}
	return "#" + s
}

// UnifiedThreadSize returns the ASME B1.1 unified inch screw thread of the
// given size and threads per inch. Size is a numbered size "#4" to "#12"
// ("No. 10" is accepted too) or a fractional size "1/4" to "1" in inches
// (a trailing inch mark is accepted). Tpi 0 selects UNC (coarse); any other
// count must be the UNC or UNF count for the size.
//
// Code: "1/4-20 UNC", "#10-32 UNF". Dimensions, in millimetres:
// "major_diameter" (the basic major diameter; #n is 0.060 in + 0.013 in × n)
// and "pitch" (25.4 / tpi). Attributes: "series" ("UNC" or "UNF"),
// "pitch_kind" ("coarse" or "fine"), "tpi" and "major_diameter_in".
//
// An unknown size or a tpi that is neither the UNC nor the UNF count gives
// an error wrapping [ErrNotStandard]; a negative tpi an error wrapping
// [ErrOutOfRange].
func UnifiedThreadSize(size string, tpi int) (Designation, error) {
	if tpi < 0 {
		return Designation{}, fmt.Errorf("%w: %d threads per inch", ErrOutOfRange, tpi)
	}
	u, ok := data().unified[unifiedKey(size)]
	if !ok {
		return Designation{}, fmt.Errorf("%w: unified thread size %q (want #4..#12 or 1/4..1)", ErrNotStandard, size)
	}
	series, kind := "UNC", "coarse"
	switch tpi {
	case 0, u.unc:
		tpi = u.unc
	case u.unf:
		series, kind = "UNF", "fine"
	default:
		return Designation{}, fmt.Errorf("%w: %s-%d: ASME B1.1 lists %d (UNC) or %d (UNF) threads per inch for %s",
			ErrNotStandard, u.size, tpi, u.unc, u.unf, u.size)
	}
	return Designation{
		System: UnifiedThread,
		Code:   u.size + "-" + strconv.Itoa(tpi) + " " + series,
		Dimensions: map[string]float64{
			"major_diameter": u.majorIn * 25.4,
			"pitch":          25.4 / float64(tpi),
		},
		Attributes: map[string]string{
			"series":            series,
			"pitch_kind":        kind,
			"tpi":               strconv.Itoa(tpi),
			"major_diameter_in": u.majorStr,
		},
		Source: "ASME B1.1",
	}, nil
}

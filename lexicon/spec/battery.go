package spec

import (
	"fmt"
	"maps"
	"strconv"
	"strings"
)

// batteryRow is one IEC 60086 battery size.
type batteryRow struct {
	code, iec, voltage, shape string
	also                      []string
	dims                      map[string]float64
}

// batteryDims lists the dimension keys each shape must have.
var batteryDims = map[string][]string{
	"cylindrical": {"diameter", "height"},
	"coin":        {"diameter", "height"},
	"rectangular": {"width", "depth", "height"},
}

func parseBatteries() ([]batteryRow, map[string]int, error) {
	const file = "iec60086_batteries.tsv"
	rows, err := readRows(file, "code", "iec", "also", "voltage_v", "shape", "dimensions_mm")
	if err != nil {
		return nil, nil, err
	}
	out := make([]batteryRow, 0, len(rows))
	names := make(map[string]int, 3*len(rows))
	for _, r := range rows {
		b := batteryRow{code: r[0], iec: r[1], voltage: r[3], shape: r[4], dims: map[string]float64{}}
		if v, err := strconv.ParseFloat(b.voltage, 64); err != nil || v <= 0 {
			return nil, nil, fmt.Errorf("spec: %s: %s: bad voltage %q", file, b.code, b.voltage)
		}
		if r[2] != "" {
			b.also = strings.Split(r[2], ",")
		}
		for _, kv := range strings.Fields(r[5]) {
			k, v, ok := strings.Cut(kv, "=")
			f, err := parseFloat(v)
			if !ok || err != nil || f <= 0 {
				return nil, nil, fmt.Errorf("spec: %s: %s: bad dimension %q", file, b.code, kv)
			}
			b.dims[k] = f
		}
		want, ok := batteryDims[b.shape]
		if !ok || len(want) != len(b.dims) {
			return nil, nil, fmt.Errorf("spec: %s: %s: shape %q with dimensions %v", file, b.code, b.shape, b.dims)
		}
		for _, k := range want {
			if _, ok := b.dims[k]; !ok {
				return nil, nil, fmt.Errorf("spec: %s: %s: missing %s", file, b.code, k)
			}
		}
		for _, n := range append([]string{b.code, b.iec}, b.also...) {
			key := batteryKey(n)
			if i, dup := names[key]; dup && i != len(out) {
				return nil, nil, fmt.Errorf("spec: %s: name %s is used twice", file, n)
			}
			names[key] = len(out)
		}
		out = append(out, b)
	}
	return out, names, nil
}

// batteryKey normalises a battery name as typed: upper case, without
// spaces, hyphens or underscores ("cr 2032" and "CR-2032" are CR2032,
// "9 V" is 9V).
func batteryKey(s string) string {
	return strings.Map(func(r rune) rune {
		switch r {
		case ' ', '\t', '-', '_':
			return -1
		}
		if 'a' <= r && r <= 'z' {
			return r - ('a' - 'A')
		}
		return r
	}, strings.TrimSpace(s))
}

// BatterySize returns the IEC 60086 battery size with the given common
// name (AAA, AA, C, D, N, 9V, PP3, CR1220, CR1616, CR2016, CR2025, CR2032,
// CR2450) or IEC designation (LR03, LR6, LR14, LR20, LR1, 6LR61), ignoring
// case, spaces and hyphens.
//
// Code: the common name ("AA", "9V", "CR2032"). Dimensions, in millimetres,
// the IEC maximum envelope: "diameter" and "height" for cylindrical and coin
// cells, "width", "depth" and "height" for the rectangular 9V. Attributes:
// "iec" (the IEC designation), "voltage_v" (nominal voltage), "shape"
// ("cylindrical", "coin" or "rectangular") and, where the size has another
// common name, "also" ("PP3").
//
// It reports false for any other name.
func BatterySize(code string) (Designation, bool) {
	t := data()
	i, ok := t.battery[batteryKey(code)]
	if !ok {
		return Designation{}, false
	}
	b := t.batteries[i]
	attrs := map[string]string{
		"iec":       b.iec,
		"voltage_v": b.voltage,
		"shape":     b.shape,
	}
	if len(b.also) > 0 {
		attrs["also"] = strings.Join(b.also, ",")
	}
	return Designation{
		System:     Battery,
		Code:       b.code,
		Dimensions: maps.Clone(b.dims),
		Attributes: attrs,
		Source:     "IEC 60086",
	}, true
}

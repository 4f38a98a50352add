package spec

import "errors"

// System names a family of standard designations.
type System string

// The families of standard designations whittle knows.
const (
	Lumber        System = "lumber"
	Tyre          System = "tyre"
	AWG           System = "awg"
	MetricThread  System = "metric_thread"
	UnifiedThread System = "unified_thread"
	Paper         System = "paper"
	Battery       System = "battery"
	// Schedule is the wall schedule of pipe ("SCH 40").
	Schedule System = "pipe_schedule"
)

// Systems returns every system whittle knows, in a fixed order, in a
// slice of the caller's own.
func Systems() []System {
	return []System{Lumber, Tyre, AWG, MetricThread, UnifiedThread, Paper, Battery, Schedule}
}

// Designation is one standard size.
type Designation struct {
	// System is the family the designation belongs to.
	System System
	// Code is the normalised designation: "2x4", "225/45R17", "14 AWG",
	// "14/2 AWG", "M8x1.25", "1/4-20 UNC", "A4", "AA", "CR2032", "SCH 40".
	Code string
	// Dimensions holds physical sizes in millimetres. The keys depend on
	// the system and are listed with each function.
	Dimensions map[string]float64
	// Attributes holds the other facts of the standard, such as "iec",
	// "voltage_v", "construction", "conductors", "series" or "pitch_kind".
	Attributes map[string]string
	// Source names the standard the designation comes from: "PS 20",
	// "ISO 4000-1", "ASTM B258", "ISO 261", "ASME B1.1", "ISO 216",
	// "IEC 60086", "ASME B36.10M".
	Source string
}

var (
	// ErrOutOfRange is wrapped by errors for values outside the range a
	// system covers at all, such as a tyre 500 mm wide or AWG 50.
	ErrOutOfRange = errors.New("spec: value out of range")
	// ErrNotStandard is wrapped by errors for values inside the range
	// that the standard does not list, such as an M9 thread or an
	// 8x1.5 metric pitch.
	ErrNotStandard = errors.New("spec: not a standard size")
)

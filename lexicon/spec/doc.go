// Package spec knows the standard designations shoppers type as sizes:
// nominal lumber (PS 20), ISO metric tyre sizes, American Wire Gauge
// (ASTM B258), ISO metric and ASME unified screw threads, ISO 216 paper and
// IEC 60086 battery sizes, and pipe schedules (ASME B36.10M and B36.19M).
//
// Each function turns the parts of a designation that the query parser has
// already split out ("2x4" is 2 and 4, "225/45R17" is 225, 45, 'R' and 17)
// into a [Designation]: a normalised code, the physical dimensions in
// millimetres and the other facts of the standard. Tables come from the
// package's embedded data files, each naming its source; tyre sizes and wire
// gauges follow their defining formulas.
//
// A wrong wire gauge, tyre, thread or pipe schedule can hurt someone, so these functions
// never round to a nearby size: a value that is not in the standard is an
// error (wrapping [ErrOutOfRange] or [ErrNotStandard]) or a false result,
// and callers should treat designations as hard constraints.
//
// All functions are safe for concurrent use. The tables are parsed once,
// on first use, and no I/O happens after that. Every returned Designation
// has fresh maps that the caller may change.
package spec

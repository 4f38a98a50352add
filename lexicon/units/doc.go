// Package units knows the units of measure that shoppers type in queries:
// lengths, masses, volumes (cubic inches, feet and yards among them),
// power, voltage, current, battery charge, data sizes, time, frequency,
// grammage (gsm), a lamp's colour temperature (kelvin), pressure (psi,
// kPa, MPa) and energy (joules, Wh, kWh).
//
// Every unit has a factor to the base unit of its quantity (see [Base]),
// derived at start-up with exact rational arithmetic from the legal
// definitions: the 1959 international yard and pound (1 in = 25.4 mm,
// 1 lb = 453.59237 g), the US gallon of 231 cubic inches, the imperial
// gallon of 4.54609 litres, the pound-force of standard gravity
// (9.80665 m/s²) for the psi, and SI prefixes. Data sizes are decimal
// (1 GB = 1000 MB), as storage is sold.
//
// [Lookup] maps any spelling a shopper types ("mm", "millimetres", "inch",
// `"`, "lbs", "fl. oz.", "mAh") to its unit without allocating, so the
// query parser can call it on every token. Names that mean
// different volumes in US customary and imperial measure ("gallon", "pint",
// "fl oz", ...) resolve by the [VolumeSystem] the caller passes.
// [Convert] converts between units of one quantity.
//
// All functions are safe for concurrent use; the tables are built once and
// never change.
package units

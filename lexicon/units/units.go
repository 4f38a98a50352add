package units

import (
	"errors"
	"fmt"
	"math/big"
	"slices"
	"strings"
	"sync"
)

// Quantity names a physical quantity.
type Quantity string

// The quantities whittle measures. Each has one base unit, given by [Base].
const (
	Length    Quantity = "length"
	Mass      Quantity = "mass"
	Volume    Quantity = "volume"
	Power     Quantity = "power"
	Voltage   Quantity = "voltage"
	Current   Quantity = "current"
	Charge    Quantity = "charge"
	Data      Quantity = "data"
	Time      Quantity = "time"
	Frequency Quantity = "frequency"
	// Grammage is mass per area, as paper and towels are sold.
	Grammage Quantity = "grammage"
	// ColourTemperature is the colour of a lamp's white light, in
	// kelvin: 2700 K is warm, 5000 K daylight.
	ColourTemperature Quantity = "colour_temperature"
	// Pressure, in kilopascals: a pressure washer's or a compressor's
	// output, a tyre's inflation.
	Pressure Quantity = "pressure"
	// Energy, in joules: a surge protector's rating, a power station's
	// capacity in watt-hours.
	Energy Quantity = "energy"
)

// quantities are the quantities in a fixed order.
var quantities = []Quantity{Length, Mass, Volume, Power, Voltage, Current, Charge, Data, Time, Frequency, Grammage, ColourTemperature, Pressure, Energy}

// Quantities returns every quantity in a fixed order, in a slice of the
// caller's own.
func Quantities() []Quantity { return slices.Clone(quantities) }

// Unit is one unit of measure.
type Unit struct {
	// Symbol is the canonical symbol as whittle prints it, lower case:
	// "mm", "in", "lb", "floz", "imp_gal", "mah", "gb".
	Symbol string
	// Name is the unit's name in British spelling: "millimetre", "inch".
	Name string
	// Quantity is what the unit measures.
	Quantity Quantity
	// ToBase is the factor that turns an amount in this unit into an
	// amount in the base unit of Quantity (see [Base]).
	ToBase float64
}

// written holds the symbols whose usual written form differs from the
// lower-case key: SI prefixes and unit symbols keep their case, so the
// watt is W and the gigabyte GB, and the litre takes L as NIST SP 811
// recommends for the US (both rules from memory of the SI Brochure and
// SP 811, not from a fetched copy).
var written = map[string]string{
	"ml": "mL", "cl": "cL", "dl": "dL", "l": "L", "floz": "fl oz", "imp_floz": "imp fl oz", "imp_cup": "imp cup",
	"imp_pt": "imp pt", "imp_qt": "imp qt", "imp_gal": "imp gal", "w": "W", "kw": "kW", "mv": "mV", "v": "V",
	"kv": "kV", "ma": "mA", "a": "A", "mah": "mAh", "ah": "Ah", "kb": "kB", "mb": "MB", "gb": "GB", "tb": "TB",
	"pb": "PB", "day": "d", "um": "µm", "hz": "Hz", "khz": "kHz", "mhz": "MHz", "ghz": "GHz",
	"kelvin": "K", "kpa": "kPa", "mpa": "MPa", "j": "J", "wh": "Wh", "kwh": "kWh",
}

// String returns the symbol as it is usually written: "mm", "in", "mL",
// "W", "mAh", "GB", "fl oz". Symbol stays the lower-case key that
// [BySymbol] and the lexicon files use.
func (u Unit) String() string {
	if w, ok := written[u.Symbol]; ok {
		return w
	}
	return u.Symbol
}

// Base returns the base unit symbol for q: "mm", "g", "ml", "w", "v", "a",
// "mah", "gb", "s", "hz", "gsm", "kelvin", "kpa" or "j". It returns "" for
// an unknown quantity.
func Base(q Quantity) string {
	switch q {
	case Length:
		return "mm"
	case Mass:
		return "g"
	case Volume:
		return "ml"
	case Power:
		return "w"
	case Voltage:
		return "v"
	case Current:
		return "a"
	case Charge:
		return "mah"
	case Data:
		return "gb"
	case Time:
		return "s"
	case Frequency:
		return "hz"
	case Grammage:
		return "gsm"
	case ColourTemperature:
		return "kelvin"
	case Pressure:
		return "kpa"
	case Energy:
		return "j"
	}
	return ""
}

// VolumeSystem selects US customary or imperial volume for names that mean
// different amounts in the two systems: gallon, quart, pint, cup and
// fluid ounce.
type VolumeSystem int

// The two volume systems.
const (
	// USCustomary reads "gallon" as 231 cubic inches (3.785411784 l).
	USCustomary VolumeSystem = iota
	// Imperial reads "gallon" as 4.54609 l, as in the UK.
	Imperial
)

// ErrIncompatible is returned (wrapped) by [Convert] when the two units
// measure different quantities.
var ErrIncompatible = errors.New("units: incompatible quantities")

// BySymbol returns the unit with that canonical symbol, exactly as written
// in [Unit.Symbol] (no case folding, no aliases; use [Lookup] for what
// shoppers type).
func BySymbol(sym string) (Unit, bool) {
	i, ok := bySymbol[sym]
	if !ok {
		return Unit{}, false
	}
	return table[i], true
}

// Units returns every unit whittle knows, grouped by quantity in the order
// of [Quantities], smallest first within a quantity. The slice is a fresh
// copy.
func Units() []Unit {
	out := make([]Unit, len(table))
	copy(out, table)
	return out
}

// Convert converts amount from one unit to another of the same quantity.
// For units of the table the factor between them is computed exactly and
// rounded once, so 1 ft converts to exactly 12 in and 1 gal to exactly 4 qt.
// It returns an error wrapping [ErrIncompatible] when the quantities differ,
// and an error when a unit has no usable factor.
func Convert(amount float64, from, to Unit) (float64, error) {
	if from.Quantity != to.Quantity {
		return 0, fmt.Errorf("%w: cannot convert %s (%s) to %s (%s)",
			ErrIncompatible, from.Symbol, from.Quantity, to.Symbol, to.Quantity)
	}
	if fi, ok := bySymbol[from.Symbol]; ok && table[fi] == from {
		if ti, ok := bySymbol[to.Symbol]; ok && table[ti] == to {
			ratioOnce.Do(buildRatios)
			return amount * ratio[fi*len(table)+ti], nil
		}
	}
	if !(from.ToBase > 0) || !(to.ToBase > 0) {
		return 0, fmt.Errorf("units: cannot convert %q to %q: factor to base must be positive", from.Symbol, to.Symbol)
	}
	return amount * from.ToBase / to.ToBase, nil
}

// def defines one unit: factor (an exact decimal or fraction, as read by
// big.Rat.SetString) times the unit named by of, or times the base unit
// when of is empty.
type def struct {
	sym, name string
	q         Quantity
	factor    string
	of        string
	spellings []string
}

// defs holds whittle's units, grouped by quantity, smallest first. Sources:
// NIST SP 811 (2008) Appendix B and the 1959 international yard and pound
// agreement for inch, foot, yard, mile, mil, pound, ounce and the US and
// imperial volumes (the same chain as testdata/reference/unit_conversions.tsv);
// the SI Brochure for the metric prefixes and for minute, hour and day; UK
// Weights and Measures Act 1985 for the imperial gallon. Spellings are common
// usage.
var defs = []def{
	// Length; base millimetre.
	{"um", "micrometre", Length, "1/1000", "mm", []string{"um", "µm", "μm", "micron", "microns", "micrometre", "micrometres", "micrometer", "micrometers"}},
	{"mil", "mil", Length, "1/1000", "in", []string{"mil", "mils", "thou"}},
	{"mm", "millimetre", Length, "1", "", []string{"mm", "mms", "millimetre", "millimetres", "millimeter", "millimeters"}},
	{"cm", "centimetre", Length, "10", "mm", []string{"cm", "cms", "centimetre", "centimetres", "centimeter", "centimeters"}},
	{"in", "inch", Length, "25.4", "mm", []string{"in", "ins", "inch", "inches", `"`, "″", "''", "”", "’’", "′′"}},
	{"ft", "foot", Length, "12", "in", []string{"ft", "foot", "feet", "'", "′", "’"}},
	{"yd", "yard", Length, "3", "ft", []string{"yd", "yds", "yard", "yards"}},
	{"m", "metre", Length, "1000", "mm", []string{"m", "metre", "metres", "meter", "meters", "mtr", "mtrs"}},
	{"km", "kilometre", Length, "1000", "m", []string{"km", "kms", "kilometre", "kilometres", "kilometer", "kilometers"}},
	{"mi", "mile", Length, "1760", "yd", []string{"mi", "mile", "miles"}},

	// Mass; base gram.
	{"mg", "milligram", Mass, "1/1000", "g", []string{"mg", "milligram", "milligrams", "milligramme", "milligrammes"}},
	{"g", "gram", Mass, "1", "", []string{"g", "gm", "gms", "gram", "grams", "gramme", "grammes"}},
	{"oz", "ounce", Mass, "1/16", "lb", []string{"oz", "ozs", "ounce", "ounces"}},
	{"lb", "pound", Mass, "453.59237", "g", []string{"lb", "lbs", "pound", "pounds"}},
	{"kg", "kilogram", Mass, "1000", "g", []string{"kg", "kgs", "kilo", "kilos", "kilogram", "kilograms", "kilogramme", "kilogrammes"}},

	// Volume; base millilitre. The US gallon is 231 in³ = 231 × 25.4³ mm³
	// = 3785.411784 ml exactly.
	{"ml", "millilitre", Volume, "1", "", []string{"ml", "mls", "millilitre", "millilitres", "milliliter", "milliliters", "cc", "cm3", "cm³"}},
	{"tsp", "teaspoon", Volume, "1/6", "floz", []string{"tsp", "tsps", "teaspoon", "teaspoons"}},
	{"cl", "centilitre", Volume, "10", "ml", []string{"cl", "centilitre", "centilitres", "centiliter", "centiliters"}},
	{"tbsp", "tablespoon", Volume, "1/2", "floz", []string{"tbsp", "tbsps", "tbs", "tablespoon", "tablespoons"}},
	// Cubic inch, foot and yard: (25.4 mm)³ = 16.387064 ml exactly, a
	// foot 12 inches, a yard 3 feet. Soil, mulch, wheelbarrows and
	// freezers are sold by them.
	{"in3", "cubic inch", Volume, "16.387064", "ml", []string{"in3", "in³", "cu in", "cubic inch", "cubic inches"}},
	{"imp_floz", "imperial fluid ounce", Volume, "1/20", "imp_pt", []string{"imp_floz", "imp fl oz", "imperial fl oz", "imperial fluid ounce", "imperial fluid ounces", "uk fl oz", "uk fluid ounce", "uk fluid ounces"}},
	{"floz", "US fluid ounce", Volume, "1/16", "pt", []string{"us fl oz", "us floz", "us fluid ounce", "us fluid ounces"}},
	{"dl", "decilitre", Volume, "100", "ml", []string{"dl", "decilitre", "decilitres", "deciliter", "deciliters"}},
	{"cup", "US cup", Volume, "1/2", "pt", []string{"us cup", "us cups"}},
	{"imp_cup", "imperial cup", Volume, "1/2", "imp_pt", []string{"imp_cup", "imp cup", "imperial cup", "imperial cups", "uk cup", "uk cups"}},
	{"pt", "US pint", Volume, "1/2", "qt", []string{"us pt", "us pint", "us pints"}},
	{"imp_pt", "imperial pint", Volume, "1/8", "imp_gal", []string{"imp_pt", "imp pt", "imperial pint", "imperial pints", "uk pint", "uk pints"}},
	{"qt", "US quart", Volume, "1/4", "gal", []string{"us qt", "us quart", "us quarts"}},
	{"l", "litre", Volume, "1000", "ml", []string{"l", "ltr", "ltrs", "litre", "litres", "liter", "liters", "ℓ"}},
	{"imp_qt", "imperial quart", Volume, "1/4", "imp_gal", []string{"imp_qt", "imp qt", "imperial quart", "imperial quarts", "uk quart", "uk quarts"}},
	{"gal", "US gallon", Volume, "3785.411784", "ml", []string{"us gal", "us gallon", "us gallons"}},
	{"imp_gal", "imperial gallon", Volume, "4546.09", "ml", []string{"imp_gal", "imp gal", "imperial gallon", "imperial gallons", "uk gal", "uk gallon", "uk gallons"}},
	{"ft3", "cubic foot", Volume, "1728", "in3", []string{"ft3", "ft³", "cu ft", "cuft", "cubic foot", "cubic feet", "cubic ft"}},
	{"yd3", "cubic yard", Volume, "27", "ft3", []string{"yd3", "yd³", "cu yd", "cubic yard", "cubic yards", "cubic yd"}},

	// Power; base watt.
	{"w", "watt", Power, "1", "", []string{"w", "watt", "watts"}},
	{"kw", "kilowatt", Power, "1000", "w", []string{"kw", "kilowatt", "kilowatts"}},

	// Voltage; base volt.
	{"mv", "millivolt", Voltage, "1/1000", "v", []string{"mv", "millivolt", "millivolts"}},
	{"v", "volt", Voltage, "1", "", []string{"v", "volt", "volts"}},
	{"kv", "kilovolt", Voltage, "1000", "v", []string{"kv", "kilovolt", "kilovolts"}},

	// Current; base ampere.
	{"ma", "milliampere", Current, "1/1000", "a", []string{"ma", "milliamp", "milliamps", "milliampere", "milliamperes"}},
	{"a", "ampere", Current, "1", "", []string{"a", "amp", "amps", "ampere", "amperes"}},

	// Charge; base milliampere-hour.
	{"mah", "milliampere-hour", Charge, "1", "", []string{"mah", "milliamp hour", "milliamp hours", "milliampere hour", "milliampere hours"}},
	{"ah", "ampere-hour", Charge, "1000", "mah", []string{"ah", "amp hour", "amp hours", "ampere hour", "ampere hours"}},

	// Data; base gigabyte, decimal prefixes.
	{"kb", "kilobyte", Data, "1/1000", "mb", []string{"kb", "kilobyte", "kilobytes"}},
	{"mb", "megabyte", Data, "1/1000", "gb", []string{"mb", "meg", "megabyte", "megabytes"}},
	{"gb", "gigabyte", Data, "1", "", []string{"gb", "gig", "gigabyte", "gigabytes"}},
	{"tb", "terabyte", Data, "1000", "gb", []string{"tb", "terabyte", "terabytes"}},
	{"pb", "petabyte", Data, "1000", "tb", []string{"pb", "petabyte", "petabytes"}},

	// Time; base second.
	{"ms", "millisecond", Time, "1/1000", "s", []string{"ms", "msec", "millisecond", "milliseconds"}},
	{"s", "second", Time, "1", "", []string{"s", "sec", "secs", "second", "seconds"}},
	{"min", "minute", Time, "60", "s", []string{"min", "mins", "minute", "minutes"}},
	{"h", "hour", Time, "60", "min", []string{"h", "hr", "hrs", "hour", "hours"}},
	{"day", "day", Time, "24", "h", []string{"day", "days"}},

	// Frequency; base hertz. A monitor's refresh rate, a radio's band.
	{"hz", "hertz", Frequency, "1", "", []string{"hz", "hertz"}},
	{"khz", "kilohertz", Frequency, "1000", "hz", []string{"khz", "kilohertz"}},
	{"mhz", "megahertz", Frequency, "1000", "khz", []string{"mhz", "megahertz"}},
	{"ghz", "gigahertz", Frequency, "1000", "mhz", []string{"ghz", "gigahertz"}},

	// Grammage; base gram per square metre, written gsm as the paper and
	// textile trades write it.
	{"gsm", "gram per square metre", Grammage, "1", "", []string{"gsm"}},

	// Colour temperature; base kelvin, the SI unit of thermodynamic
	// temperature, in which lamps are sold, written K. Its key is its
	// name, as K alone is no spelling here: shoppers write "4k" for a
	// screen's resolution and "14k" for gold, and the parser reads
	// "2700k" itself.
	{"kelvin", "kelvin", ColourTemperature, "1", "", []string{"kelvins"}},

	// Pressure; base kilopascal. A psi is a pound-force per square inch:
	// 9.80665 m/s² × 0.45359237 kg / (0.0254 m)² = 44482216152605 /
	// 6451600000000 kPa exactly. "bar" is no spelling here, as it names
	// products too ("3 bar stools", "24 in towel bar").
	{"kpa", "kilopascal", Pressure, "1", "", []string{"kpa", "kilopascal", "kilopascals"}},
	{"psi", "pound per square inch", Pressure, "44482216152605/6451600000000", "kpa", []string{"psi", "lb/in2", "pounds per square inch"}},
	{"mpa", "megapascal", Pressure, "1000", "kpa", []string{"mpa", "megapascal", "megapascals"}},

	// Energy; base joule. A watt-hour is a watt for 3600 seconds. J alone
	// is no spelling, as a letter j may be anything; "joules" is.
	{"j", "joule", Energy, "1", "", []string{"joule", "joules"}},
	{"wh", "watt-hour", Energy, "3600", "j", []string{"wh", "watt hour", "watt hours", "watt-hour", "watt-hours"}},
	{"kwh", "kilowatt-hour", Energy, "1000", "wh", []string{"kwh", "kilowatt hour", "kilowatt hours", "kilowatt-hour", "kilowatt-hours"}},
}

// splitVolume lists the spellings whose meaning depends on the
// [VolumeSystem]: the US customary symbol, then the imperial one.
var splitVolume = []struct {
	us, imp   string
	spellings []string
}{
	{"floz", "imp_floz", []string{"floz", "fl oz", "fl ozs", "fluid oz", "fluid ounce", "fluid ounces", "fl ounce", "fl ounces"}},
	{"cup", "imp_cup", []string{"cup", "cups"}},
	{"pt", "imp_pt", []string{"pt", "pts", "pint", "pints"}},
	{"qt", "imp_qt", []string{"qt", "qts", "quart", "quarts"}},
	{"gal", "imp_gal", []string{"gal", "gals", "gallon", "gallons"}},
}

// spelling is what a normalised spelling resolves to: an index into table
// for each volume system.
type spelling struct{ us, imp uint8 }

var (
	table    []Unit
	bySymbol map[string]int
	spelled  map[string]spelling
	// openers holds the first word of every spelling of several words.
	openers map[string]bool
	// exactToBase[i] is table[i]'s factor to its base unit as an exact
	// rational; read only after build.
	exactToBase []*big.Rat

	// ratio[i*len(table)+j] is the exact factor from table[i] to table[j],
	// rounded once; zero across quantities. Built on first use.
	ratio     []float64
	ratioOnce sync.Once
)

// buildRatios fills ratio from exactToBase.
func buildRatios() {
	n := len(table)
	ratio = make([]float64, n*n)
	r := new(big.Rat)
	for i := range table {
		for j := range table {
			if table[i].Quantity != table[j].Quantity {
				continue
			}
			r.Quo(exactToBase[i], exactToBase[j])
			ratio[i*n+j], _ = r.Float64()
		}
	}
}

func init() {
	build()
}

// build fills the tables from defs. A broken definition is a programming
// error, so it panics; the package tests load every definition.
func build() {
	n := len(defs)
	table = make([]Unit, n)
	bySymbol = make(map[string]int, n)
	exact := make([]*big.Rat, n)
	for i, d := range defs {
		if _, dup := bySymbol[d.sym]; dup {
			panic("units: duplicate symbol " + d.sym)
		}
		f, ok := new(big.Rat).SetString(d.factor)
		if !ok || f.Sign() <= 0 {
			panic("units: bad factor for " + d.sym)
		}
		if d.of == "" {
			if d.sym != Base(d.q) || d.factor != "1" {
				panic("units: " + d.sym + " is defined as a base unit but is not the base of " + string(d.q))
			}
		}
		bySymbol[d.sym] = i
		exact[i] = f
	}
	// Resolve "factor × of" chains; defs may refer forwards, so loop
	// until every unit is resolved.
	resolved := make([]bool, n)
	for left := n; left > 0; {
		progress := false
		for i, d := range defs {
			if resolved[i] {
				continue
			}
			if d.of == "" {
				resolved[i] = true
			} else {
				j, ok := bySymbol[d.of]
				if !ok || defs[j].q != d.q {
					panic("units: " + d.sym + " refers to unknown or foreign unit " + d.of)
				}
				if !resolved[j] {
					continue
				}
				exact[i].Mul(exact[i], exact[j])
				resolved[i] = true
			}
			left--
			progress = true
		}
		if !progress {
			panic("units: circular unit definitions")
		}
	}
	for i, d := range defs {
		f, _ := exact[i].Float64()
		table[i] = Unit{Symbol: d.sym, Name: d.name, Quantity: d.q, ToBase: f}
	}
	exactToBase = exact

	spelled = make(map[string]spelling, 8*n)
	openers = make(map[string]bool)
	add := func(s string, us, imp int) {
		var buf [maxKey]byte
		k, ok := normalise(s, &buf)
		if !ok || k == 0 {
			panic("units: spelling " + s + " does not normalise")
		}
		key := string(buf[:k])
		if old, dup := spelled[key]; dup && (int(old.us) != us || int(old.imp) != imp) {
			panic("units: spelling " + s + " is claimed twice")
		}
		spelled[key] = spelling{us: uint8(us), imp: uint8(imp)}
		if first, _, several := strings.Cut(key, " "); several {
			openers[first] = true
		}
	}
	// The US symbols of split volumes ("gal", "floz", ...) are also the
	// everyday spellings, so they follow the volume system like the rest.
	split := make(map[string]bool, len(splitVolume))
	for _, v := range splitVolume {
		us, ok1 := bySymbol[v.us]
		imp, ok2 := bySymbol[v.imp]
		if !ok1 || !ok2 || defs[us].q != Volume || defs[imp].q != Volume {
			panic("units: split volume " + v.us + "/" + v.imp + " is not a pair of volumes")
		}
		split[v.us] = true
		for _, s := range v.spellings {
			add(s, us, imp)
		}
	}
	for i, d := range defs {
		if !split[d.sym] {
			add(d.sym, i, i)
		}
		for _, s := range d.spellings {
			add(s, i, i)
		}
	}
}

package parser

import "strings"

// Constraint is one tagged span of a query.
type Constraint struct {
	Kind Kind
	// Start and End are byte offsets into the raw query: Text is
	// query[Start:End].
	Start, End int
	Text       string
	Strictness Strictness
	// Excluded means the shopper asked for this NOT to be there
	// ("-leather", "not white", "without hood").
	Excluded bool
	// Inferred means a value or unit was filled in by inference, not typed.
	Inferred bool
	// Evidence is a short reason for the reading, e.g. "unit from product
	// type lens".
	Evidence string
	// OrGroup, when not 0, joins this constraint to the others of the
	// same OrGroup as alternatives the shopper offered, any one of which
	// will do: "navy or black", "size 8 or 9", "full/queen". They are of
	// one kind, and the planner makes them one requirement. Groups are
	// numbered from 1 in query order; see [Result.Alternatives].
	OrGroup int

	// Name is the canonical lexicon name, for product types, colours,
	// patterns, silhouettes, materials, audiences and brands.
	Name string
	// Category and Parent describe a product type: its category, and
	// the broader type a rescue may widen it to. Parent is "" when the
	// lexicon gives none, or when the query rules it out: in "cat6
	// cable" the grade names an ethernet cable, and a cable of another
	// kind is no answer.
	Category, Parent string
	// Measure, Price, Size, Spec and Colour hold the value of a
	// constraint of that kind; they are nil for other kinds.
	Measure *Measure
	Price   *Price
	Size    *Size
	Spec    *Spec
	Colour  *Colour
	// Target is what a compatibility constraint must fit ("jx-10").
	Target string
	// Code is a part number, upper-cased ("XR-2200").
	Code string
}

// Span returns the constraint's byte offsets.
func (c Constraint) Span() (start, end int) { return c.Start, c.End }

// Measure is a quantity with a unit: a point value, or a range where Min
// or Max (or both) is set. Amounts are in Unit; Base amounts in BaseUnit.
type Measure struct {
	// Dimension names what is measured ("focal_length", "diagonal",
	// "width"); it comes from the product type's slot where one fits, else
	// it is the quantity's name.
	Dimension string
	// Quantity is the physical quantity: length, mass, volume, power,
	// voltage, current, charge, data or time. Empty for a unitless number.
	Quantity string
	// Unit and BaseUnit are unit symbols ("in", "mm"). Unit is empty when
	// no unit could be typed or inferred.
	Unit, BaseUnit string
	// Amount and BaseAmount are set for a point value.
	Amount, BaseAmount *float64
	// Min and Max bound a range (either may be nil), in Unit; BaseMin and
	// BaseMax are the same bounds in BaseUnit.
	Min, Max, BaseMin, BaseMax *float64
}

// Price is a bound on price. A bare price ("$40") is read as a ceiling.
// Amounts are decimal strings rounded to the currency's minor unit
// ("90.00"), never floats.
type Price struct {
	Min, Max *string
	// Currency is the ISO 4217 code.
	Currency string
}

// Size is a garment or shoe size.
type Size struct {
	// System is one of: letter (xs..5xl, 1x..5x), numeric (8, 4t), shoe,
	// waist_inseam, waist, inseam, fit (petite, tall, plus, big and
	// tall), bed (queen, king), number (#8, #10), bra (34b), suit (42r:
	// chest and length), age (months: 6-12m), a region (eu, uk, us, fr,
	// it, jp, au, mx, cn), or named (os, regular, tall... after "size").
	System string
	// Value is the normalised size: "l", "8", "32x30", "9.5", "petite".
	Value string
	// Width is a shoe width ("wide", "narrow"), if given.
	Width string
}

// Spec is a standard designation: a nominal lumber size, a tyre code, a
// wire gauge, a screw thread, a paper size or a battery size.
type Spec struct {
	// System is one of: lumber, tyre, awg, metric_thread, unified_thread,
	// paper, battery, pipe_schedule.
	System string
	// Designation is the normalised code ("2x4", "225/45R17", "M8x1.25").
	Designation string
	// Dimensions are the standard's sizes in millimetres ("thickness",
	// "width" for lumber; "overall_diameter" for tyres).
	Dimensions map[string]float64
	// Attributes are other facts the standard gives (voltage, pitch kind).
	Attributes map[string]string
	// Standard names the standard the values come from ("PS 20").
	Standard string
	// Also are other designations of the system, any of which will do
	// in Designation's place: the fine threads of a metric size asked
	// for with "fine thread" and no pitch ("m8 fine thread" is M8x0.75
	// or M8x1). Dimensions and Attributes are Designation's.
	Also []string
}

// TyreSize is the key under which [Spec.Keys] files a tyre's size alone,
// without its service description.
const TyreSize = "tyre_size"

// Keys returns where a product that carries s is filed, key to
// lower-cased designation: under its system, and a tyre also under
// [TyreSize] by its size alone ("205/55r16" for "205/55R16 91V"), so that
// a query naming only the size finds a tyre listed with its load index
// and speed symbol.
func (s *Spec) Keys() map[string]string {
	keys := map[string]string{s.System: strings.ToLower(s.Designation)}
	if s.System == "tyre" {
		size, _, _ := strings.Cut(keys[s.System], " ")
		keys[TyreSize] = size
	}
	return keys
}

// Key returns where a query's s looks, one of [Spec.Keys]: a tyre with
// no service description looks under [TyreSize], so it finds the size
// however the catalog lists it; a tyre with one ("205/55R16 91V") wants
// that load index and speed symbol, and looks under its system, as every
// other designation does.
func (s *Spec) Key() (key, designation string) {
	d := strings.ToLower(s.Designation)
	if s.System == "tyre" && !strings.Contains(d, " ") {
		return TyreSize, d
	}
	return s.System, d
}

// Colour places a colour constraint in CIELAB, so that a query colour can
// be compared with a catalog's own colour names.
type Colour struct {
	// Hex is the sRGB value, "#rrggbb"; empty for a word that names
	// several colours ("multicolour").
	Hex string `json:"hex,omitempty"`
	// Lab is CIE 1976 L*, a*, b* (D65), rounded to 4 decimals; nil when
	// Hex is empty.
	Lab *[3]float64 `json:"lab,omitempty"`
	// Families are the colour families computed from the Lab value ("red",
	// "brown"), or "multi".
	Families []string `json:"families,omitempty"`
}

// Result is what [Parse] understood of one query.
type Result struct {
	Query string
	// Category is the product category the query is about, from its product
	// type or its standard designations, or "" when nothing says.
	Category    string
	Constraints []Constraint
	// Unrecognised lists the words that no lexicon entry or rule tagged;
	// they are kept as keyword constraints too. Unknown is not an error.
	Unrecognised []string
	// Errors are the parts of the query that are badly formed.
	Errors ErrorList
}

// Of returns the constraints of kind k, in query order.
func (r *Result) Of(k Kind) []Constraint {
	var out []Constraint
	for _, c := range r.Constraints {
		if c.Kind == k {
			out = append(out, c)
		}
	}
	return out
}

// headEvidence marks, in its evidence, the product type that heads a
// query: the product asked for.
const headEvidence = "head product type"

// IsHead reports whether c is the query's head product type, the product
// asked for ("rain jacket" in "waterproof rain jacket for hiking"), which
// a rescue widens but never drops.
func (c Constraint) IsHead() bool {
	return c.Kind == KindProductType && strings.Contains(c.Evidence, headEvidence)
}

package colour

// DefaultTolerance is the ΔE00 within which a catalog colour counts as a
// near match for a query colour when the category sets none. About 5 is
// where most shoppers, comparing two swatches side by side, start to call
// them different colours rather than shades of one (common practice in
// retail colour matching; not a standard).
const DefaultTolerance = 5.0

// categoryTolerance holds the tolerance of categories that differ from
// the default: fashion shoppers notice small shifts; for hardware and
// electronics, colour is a minor attribute. Paint is tight: paint colour is
// hard by default and is not widened, but a lookup still needs a value.
// These are whittle's defaults; a shop's policy overrides them.
var categoryTolerance = map[string]float64{
	"apparel": 4, "footwear": 4, "accessories": 5, "home": 6, "furniture": 6,
	"paint": 2, "kitchen": 7, "office": 8, "electronics": 10, "electrical": 10,
	"hardware": 10, "lumber": 10, "camera": 10, "tyres": 10, "batteries": 10,
}

// ToleranceFor returns the default ΔE00 tolerance of a category, or
// DefaultTolerance for an unknown or empty one.
func ToleranceFor(category string) float64 {
	if t, ok := categoryTolerance[category]; ok {
		return t
	}
	return DefaultTolerance
}

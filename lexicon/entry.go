package lexicon

import (
	"fmt"
	"slices"
	"strconv"
	"strings"

	"github.com/whittle-search/whittle/lexicon/units"
)

// Kind names what a lexicon entry describes. Each kind has its own file.
type Kind string

// The kinds of lexicon entry, each stored in the file named by [Kind.File].
const (
	ProductType Kind = "product_type"
	Colour      Kind = "colour"
	Pattern     Kind = "pattern"
	Silhouette  Kind = "silhouette"
	Material    Kind = "material"
	Audience    Kind = "audience"
	Brand       Kind = "brand"
	Filler      Kind = "filler"
)

// kinds are the kinds in the order their files are loaded.
var kinds = []Kind{ProductType, Colour, Pattern, Silhouette, Material, Audience, Brand, Filler}

// Kinds returns every kind in the order its file is loaded, in a slice
// of the caller's own.
func Kinds() []Kind { return slices.Clone(kinds) }

// File returns the name of the file that holds entries of kind k.
func (k Kind) File() string {
	switch k {
	case ProductType:
		return "product_types.wlx"
	case Colour:
		return "colours.wlx"
	case Pattern:
		return "patterns.wlx"
	case Silhouette:
		return "silhouettes.wlx"
	case Material:
		return "materials.wlx"
	case Audience:
		return "audiences.wlx"
	case Brand:
		return "brands.wlx"
	case Filler:
		return "fillers.wlx"
	}
	return string(k) + ".wlx"
}

// categories are the product categories a product type may belong to.
var categories = []string{
	"apparel", "footwear", "accessories", "home", "furniture", "lumber",
	"hardware", "electrical", "camera", "tyres", "office", "batteries",
	"electronics", "paint", "kitchen",
}

// Categories returns the product categories a product type may belong
// to, in a slice of the caller's own.
func Categories() []string { return slices.Clone(categories) }

// CheckCategory returns nil for "" and for a category of Categories, and
// otherwise an error that names the category, the nearest known one
// when one is near, and the known ones.
func CheckCategory(c string) error {
	if c == "" || slices.Contains(categories, c) {
		return nil
	}
	return fmt.Errorf("unknown category %q%s (known: %s)", c, DidYouMean(c, categories), strings.Join(categories, ", "))
}

// Entry is one word or phrase of the lexicon, with everything its kind
// records about it.
type Entry struct {
	Kind Kind
	// Name is the canonical name, as written first on the entry's line.
	Name string
	// Aliases are the other spellings that mean the same: synonyms,
	// abbreviations, British and American spellings, irregular plurals.
	Aliases []string
	// Category is the product category (product types only).
	Category string
	// Parent is the canonical name of a broader product type, or "".
	Parent string
	// Slots are the measures a product type takes, in the order a bare
	// number or a dimension fills them (product types only).
	Slots []Slot
	// Hex is a colour's sRGB value, "#rrggbb", or "multi" for a word that
	// names several colours; From says where the value comes from: "css4"
	// (CSS Color Module Level 4) or "memory" (common usage, from memory).
	// Colours only; both may be empty.
	Hex, From string
	// File and Line say where the entry was defined.
	File string
	Line int
}

// Slot is a measure a product type takes: "a lens has a focal length in
// millimetres, typically 8 to 1200".
type Slot struct {
	Dimension string
	Quantity  units.Quantity
	Unit      units.Unit
	Min, Max  float64
}

// Holds reports whether amount, in the slot's unit, lies in its typical range.
func (s Slot) Holds(amount float64) bool { return amount >= s.Min && amount <= s.Max }

// String renders the slot as it is written in a lexicon file.
func (s Slot) String() string {
	return fmt.Sprintf("%s:%s:%s:%s..%s", s.Dimension, s.Quantity, s.Unit.Symbol,
		strconv.FormatFloat(s.Min, 'f', -1, 64), strconv.FormatFloat(s.Max, 'f', -1, 64))
}

// parseSlot reads "dimension:quantity:unit:min..max".
func parseSlot(v string) (Slot, error) {
	parts := strings.Split(v, ":")
	if len(parts) != 4 {
		return Slot{}, fmt.Errorf("slot %q: want dimension:quantity:unit:min..max", v)
	}
	dim, q, u, rng := parts[0], units.Quantity(parts[1]), parts[2], parts[3]
	if dim == "" {
		return Slot{}, fmt.Errorf("slot %q: empty dimension", v)
	}
	unit, ok := units.BySymbol(u)
	if !ok {
		return Slot{}, fmt.Errorf("slot %q: unknown unit %q", v, u)
	}
	if unit.Quantity != q {
		return Slot{}, fmt.Errorf("slot %q: unit %s measures %s, not %s", v, u, unit.Quantity, q)
	}
	lo, hi, found := strings.Cut(rng, "..")
	if !found {
		return Slot{}, fmt.Errorf("slot %q: range %q: want min..max", v, rng)
	}
	min, err1 := strconv.ParseFloat(lo, 64)
	max, err2 := strconv.ParseFloat(hi, 64)
	if err1 != nil || err2 != nil || !(min < max) {
		return Slot{}, fmt.Errorf("slot %q: range %q: want two numbers, min below max", v, rng)
	}
	return Slot{Dimension: dim, Quantity: q, Unit: unit, Min: min, Max: max}, nil
}

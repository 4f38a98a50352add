package rewrite

import (
	"context"
	"fmt"
	"sort"
	"strings"

	"github.com/whittle-search/whittle/lexicon/colour"
)

// Clause is one kept constraint in engine-neutral form: the field it
// constrains and the values it allows.
type Clause struct {
	// Field is the constraint kind ("product_type", "colour", "size",
	// "measure", "price", ...).
	Field string `json:"field"`
	// Dimension names the measure ("focal_length") or the standard
	// system ("lumber") where the field has several.
	Dimension string `json:"dimension,omitempty"`
	// Values are the allowed values, any of which matches, lower case:
	// product type names, colour names, sizes, designations, codes, words.
	// They are in order of preference, the value asked first: a type
	// before its subtypes, a colour before the catalog's colours nearest
	// it. An engine with nothing else to rank by can list the products
	// that match an earlier value first.
	Values []string `json:"values,omitempty"`
	// Min and Max bound a measure (in its base unit) or a price (in
	// Unit, a currency code); either may be nil.
	Min  *float64 `json:"min,omitempty"`
	Max  *float64 `json:"max,omitempty"`
	Unit string   `json:"unit,omitempty"`
	// Near, on a measure widened to a range, is the amount asked, in the
	// same unit: an engine with nothing else to rank by can list the
	// products nearest it first. It does not change what matches.
	Near *float64 `json:"near,omitempty"`
	// Also, on a measure, are more ranges in the same unit, any of which
	// matches as Min and Max do: the alternatives of "50 or 55 inch tv"
	// are 50 in here and 55 in in Also. A measure matches the clause if
	// it lies in Min..Max or in any of them.
	Also []Bounds `json:"also,omitempty"`
	// Excluded means a product must NOT match the clause.
	Excluded bool `json:"excluded,omitempty"`
	// From is the index, in the parsed query, of the constraint the
	// clause comes from.
	From int `json:"from"`
}

// Bounds is a range of a measure, in its clause's unit; either end may
// be nil.
type Bounds struct {
	Min *float64 `json:"min,omitempty"`
	Max *float64 `json:"max,omitempty"`
}

// key is the clause written out, for telling plans apart.
func (c Clause) key() string {
	var b strings.Builder
	fmt.Fprintf(&b, "%s/%s/%v/%s", c.Field, c.Dimension, c.Excluded, strings.Join(c.Values, ","))
	if c.Min != nil {
		fmt.Fprintf(&b, ">=%g", *c.Min)
	}
	if c.Max != nil {
		fmt.Fprintf(&b, "<=%g", *c.Max)
	}
	for _, a := range c.Also {
		b.WriteString("|")
		if a.Min != nil {
			fmt.Fprintf(&b, ">=%g", *a.Min)
		}
		if a.Max != nil {
			fmt.Fprintf(&b, "<=%g", *a.Max)
		}
	}
	// A price's bounds mean nothing without their currency: 60 USD and
	// 60 EUR match different products. Near is left out, as it orders
	// the matches without changing them.
	if c.Unit != "" {
		fmt.Fprintf(&b, " %s", c.Unit)
	}
	return b.String()
}

// Plan is an engine-neutral query: every clause must hold.
type Plan struct {
	Clauses []Clause `json:"clauses"`
	// Prefer are clauses the shopper asked for that the plan relaxed,
	// each as typed, the most important first: a hit need not meet
	// them, and an engine can rank the hits that meet them first (the
	// products in the material dropped, the type asked before the
	// broader type it was widened to). They do not change what matches.
	Prefer []Clause `json:"prefer,omitempty"`
}

// Key identifies the plan: two plans with the same key match the same
// products. Prefer is not part of it.
func (p Plan) Key() string {
	ks := make([]string, len(p.Clauses))
	for i, c := range p.Clauses {
		ks[i] = c.key()
	}
	sort.Strings(ks)
	return strings.Join(ks, " & ")
}

// Hit is one product a search returns.
type Hit struct {
	ID    string  `json:"id"`
	Score float64 `json:"score"`
}

// Engine is the search engine the planner asks. Implementations must be
// safe for concurrent use.
type Engine interface {
	// Count returns how many products match every clause of p.
	Count(ctx context.Context, p Plan) (int, error)
	// Search returns the k best products that match p.
	Search(ctx context.Context, p Plan, k int) ([]Hit, error)
}

// Catalog is what an engine may also tell about the products it holds,
// so that the planner can widen to values that exist and name them when
// nothing matches.
type Catalog interface {
	// Colours returns the colours the catalog carries, with their counts.
	Colours(ctx context.Context) ([]colour.PaletteColour, error)
	// Values returns the values of field (with dimension, for measures:
	// amounts in base units, written with %g) that the products matching
	// within carry, with how many products carry each. The planner asks
	// it only of the fields ListedFields names.
	Values(ctx context.Context, field, dimension string, within Plan) (map[string]int, error)
}

// ListedFields are the clause fields whose values a Catalog lists: the
// attributes a product carries one value or a few of. Part numbers,
// keywords and prices are not among them: a list of the part numbers
// carried says nothing about what to search for instead.
var ListedFields = []string{"product_type", "colour", "pattern", "silhouette", "material", "audience", "brand", "size", "compatibility", "spec", "measure"}

// FieldInStock is the clause field that keeps available products
// (Values "true") or unavailable ones ("false").
const FieldInStock = "in_stock"

// Facts are what the planner needs to know of one product to find
// available ones like it.
type Facts struct {
	ProductType string             `json:"product_type"`
	Lab         *[3]float64        `json:"lab,omitempty"`
	Measures    map[string]float64 `json:"measures,omitempty"`
	Compat      []string           `json:"compatible_with,omitempty"`
	// Spec holds the product's standard designations, by system, as a
	// query's spec clause names them ("tyre": "205/55r16 91v").
	Spec    map[string]string `json:"spec,omitempty"`
	InStock bool              `json:"in_stock"`
	// Category, Colour and Brand are the catalog's names for the
	// product's category, colour and brand, or "".
	Category string `json:"category,omitempty"`
	Colour   string `json:"colour,omitempty"`
	Brand    string `json:"brand,omitempty"`
}

// Describer is what an engine may also do: describe one product, so that
// the planner can offer alternatives to one that is unavailable.
type Describer interface {
	Describe(ctx context.Context, id string) (*Facts, error)
}

package bleveengine

import (
	"cmp"
	"fmt"
	"slices"
	"strings"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// Unknown is a catalog value of a field the lexicon names (a product
// type, material, pattern, silhouette or audience), a category or a
// measure's dimension, that whittle does not know. The products that
// have it are indexed and found by their words, but no constraint of
// that kind matches them: a product typed "rain jackets" is a rain
// jacket to whittle, but one typed "rainwear" is no product type it
// knows, so "rain jacket size l" does not find it.
type Unknown struct {
	// Field is the catalog field: "product_type", "material",
	// "pattern", "silhouette", "audience", "category" or
	// "measures.DIMENSION" for a dimension no product type or reading
	// names.
	Field string `json:"field"`
	// Value is the value as the catalog writes it (for a dimension, the
	// dimension's name).
	Value string `json:"value"`
	// Products is how many products have it, and Line the catalog line
	// of the first.
	Products int `json:"products"`
	Line     int `json:"line"`
	// Suggest is the known value nearest it by spelling, or "".
	Suggest string `json:"suggest,omitempty"`
}

// unknownCap bounds the distinct unknown values a build remembers a
// field; past it they are counted in one entry whose Value is "…".
const unknownCap = 1000

// tally gathers the unknown values of a build.
type tally struct {
	byKey  map[[2]string]*Unknown
	fields map[string]int
}

func newTally() *tally {
	return &tally{byKey: make(map[[2]string]*Unknown), fields: make(map[string]int)}
}

// note records that the product on line has value in field, unknown.
// The cap counts every measures.DIMENSION field as one, "measures", so
// that a catalog of made-up dimension names is bounded too.
func (t *tally) note(field, value string, line int) {
	key := [2]string{field, value}
	if u := t.byKey[key]; u != nil {
		u.Products++
		return
	}
	family, _, _ := strings.Cut(field, ".")
	if t.fields[family] >= unknownCap {
		key = [2]string{family, "…"}
		if u := t.byKey[key]; u != nil {
			u.Products++
			return
		}
	}
	t.fields[family]++
	t.byKey[key] = &Unknown{Field: key[0], Value: key[1], Products: 1, Line: line}
}

// list returns the unknown values, by field, the most common first,
// with a suggestion for each where a known value is near it.
func (t *tally) list(known func(field string) []string) []Unknown {
	out := make([]Unknown, 0, len(t.byKey))
	for _, u := range t.byKey {
		if u.Value != "…" {
			u.Suggest = lexicon.Closest(u.Value, known(u.Field))
		}
		out = append(out, *u)
	}
	slices.SortFunc(out, func(a, b Unknown) int {
		return cmp.Or(cmp.Compare(a.Field, b.Field), cmp.Compare(b.Products, a.Products), cmp.Compare(a.Line, b.Line))
	})
	return out
}

// canonical returns the lexicon's name for v, a catalog value of kind
// k, already normalised: v itself when it is a name of that kind, else
// the name of the entry of kind k that the whole of v spells (an alias,
// a plural: "jumpers" is a sweater), and whether the lexicon knows it.
func canonical(lex *lexicon.Lexicon, k lexicon.Kind, v string) (string, bool) {
	if _, ok := lex.Lookup(k, v); ok {
		return v, true
	}
	ws := lexicon.Words(v)
	keys := make([]string, len(ws))
	for i, w := range ws {
		keys[i] = lex.Key(w)
	}
	if n, es := lex.Match(keys); n == len(keys) && n > 0 {
		for _, e := range es {
			if e.Kind == k {
				return e.Name, true
			}
		}
	}
	return v, false
}

// knownValues returns, for a field of Unknown, the values whittle knows
// there, to suggest the nearest from.
func knownValues(lex *lexicon.Lexicon) func(field string) []string {
	known := map[string][]string{fCategory: lexicon.Categories()}
	for _, n := range namedFields {
		known[n.field] = lex.Names(n.kind)
	}
	var dims []string
	return func(field string) []string {
		if names, ok := known[field]; ok {
			return names
		}
		if dims == nil {
			dims = dimensions(lex)
		}
		return dims
	}
}

// namedFields are the catalog fields whose values the lexicon names,
// with the kind that names each.
var namedFields = []struct {
	field string
	kind  lexicon.Kind
	value func(*catalog.Product) string
}{
	{fType, lexicon.ProductType, func(p *catalog.Product) string { return p.ProductType }},
	{fPattern, lexicon.Pattern, func(p *catalog.Product) string { return p.Pattern }},
	{fSilhouette, lexicon.Silhouette, func(p *catalog.Product) string { return p.Silhouette }},
	{fMaterial, lexicon.Material, func(p *catalog.Product) string { return p.Material }},
	{fAudience, lexicon.Audience, func(p *catalog.Product) string { return p.Audience }},
}

// String says what u is and what it means for search, in a line.
func (u Unknown) String() string {
	var b strings.Builder
	n := "1 product"
	if u.Products != 1 {
		n = fmt.Sprintf("%d products", u.Products)
	}
	switch {
	case u.Value == "…":
		fmt.Fprintf(&b, "%s: %s more with values whittle does not know", u.Field, n)
	case strings.HasPrefix(u.Field, "measures."):
		fmt.Fprintf(&b, "measures: no query names the dimension %q (%s), so none matches it", u.Value, n)
	case u.Field == fCategory:
		fmt.Fprintf(&b, "category %q (%s) is no category whittle knows", u.Value, n)
	default:
		found := "they are found by their words"
		if u.Products == 1 {
			found = "it is found by its words"
		}
		fmt.Fprintf(&b, "%s %q (%s) is none whittle knows, so %s only", strings.ReplaceAll(u.Field, "_", " "), u.Value, n, found)
	}
	if u.Suggest != "" {
		fmt.Fprintf(&b, "; did you mean %q?", u.Suggest)
	}
	return b.String()
}

package rewrite

import (
	"context"
	"fmt"
	"slices"
	"strings"
	"sync"

	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/parser"
)

// product is one item of the invented test shop. Its fields hold what a
// catalog would: measures in base units, prices in currency units.
type product struct {
	ID, Type, Colour, Hex, Pattern, Material, Silhouette, Audience, Brand, Part string
	Sizes                                                                       []string
	Measures                                                                    map[string]float64
	Price                                                                       float64
	Specs                                                                       map[string]string
	Compat, Words                                                               []string
	// Gone marks a product that is not available.
	Gone bool
}

// memEngine evaluates plans over a slice of products, written apart from
// the planner so that every expected count is computed independently of
// it. It records every plan it counts.
type memEngine struct {
	products []product
	mu       sync.Mutex
	counted  []string
	delay    func(context.Context) error
}

func (m *memEngine) Count(ctx context.Context, p Plan) (int, error) {
	if m.delay != nil {
		if err := m.delay(ctx); err != nil {
			return 0, err
		}
	}
	m.mu.Lock()
	m.counted = append(m.counted, p.Key())
	m.mu.Unlock()
	n := 0
	for _, pr := range m.products {
		if matches(pr, p) {
			n++
		}
	}
	return n, nil
}

func (m *memEngine) Search(ctx context.Context, p Plan, k int) ([]Hit, error) {
	var hits []Hit
	for _, pr := range m.products {
		if matches(pr, p) && len(hits) < k {
			hits = append(hits, Hit{ID: pr.ID, Score: 1})
		}
	}
	return hits, nil
}

func (m *memEngine) Colours(ctx context.Context) ([]colour.PaletteColour, error) {
	counts := map[string]int{}
	hex := map[string]string{}
	for _, pr := range m.products {
		if pr.Colour != "" {
			counts[pr.Colour]++
			hex[pr.Colour] = pr.Hex
		}
	}
	var out []colour.PaletteColour
	for name, n := range counts {
		rgb, err := colour.ParseHex(hex[name])
		if err != nil {
			return nil, err
		}
		out = append(out, colour.PaletteColour{Name: name, Lab: rgb.Lab(), Count: n})
	}
	return out, nil
}

func (m *memEngine) Values(ctx context.Context, field, dim string, within Plan) (map[string]int, error) {
	out := map[string]int{}
	for _, pr := range m.products {
		if !matches(pr, within) {
			continue
		}
		switch field {
		case "size":
			for _, s := range pr.Sizes {
				out[s]++
			}
		case "measure":
			if v, ok := pr.Measures[dim]; ok {
				out[fmt.Sprintf("%g", v)]++
			}
		case "spec":
			if v := specOf(pr, dim); v != "" {
				out[v]++
			}
		default:
			if v := attr(pr, field); v != "" {
				out[v]++
			}
		}
	}
	return out, nil
}

func attr(pr product, field string) string {
	switch field {
	case "product_type":
		return pr.Type
	case "colour":
		return pr.Colour
	case "pattern":
		return pr.Pattern
	case "material":
		return pr.Material
	case "silhouette":
		return pr.Silhouette
	case "audience":
		return pr.Audience
	case "brand":
		return pr.Brand
	case "part_number":
		return pr.Part
	case FieldInStock:
		return fmt.Sprint(!pr.Gone)
	}
	return ""
}

// Describe tells the planner about one product.
func (m *memEngine) Describe(ctx context.Context, id string) (*Facts, error) {
	for _, pr := range m.products {
		if pr.ID != id {
			continue
		}
		f := &Facts{ProductType: pr.Type, Measures: pr.Measures, Compat: pr.Compat, InStock: !pr.Gone, Spec: pr.Specs}
		if rgb, err := colour.ParseHex(pr.Hex); err == nil {
			l := rgb.Lab()
			f.Lab = &[3]float64{l.L, l.A, l.B}
		}
		return f, nil
	}
	return nil, fmt.Errorf("no product %s", id)
}

func matches(pr product, p Plan) bool {
	for _, c := range p.Clauses {
		if clauseMatches(pr, c) == c.Excluded {
			return false
		}
	}
	return true
}

func clauseMatches(pr product, c Clause) bool {
	within := func(v float64) bool {
		const eps = 1e-9
		return (c.Min == nil || v >= *c.Min-eps) && (c.Max == nil || v <= *c.Max+eps)
	}
	switch c.Field {
	case "size":
		for _, s := range pr.Sizes {
			if slices.Contains(c.Values, s) {
				return true
			}
		}
		return false
	case "measure":
		v, ok := pr.Measures[c.Dimension]
		return ok && (within(v) || slices.ContainsFunc(c.Also, func(a Bounds) bool {
			const eps = 1e-9
			return (a.Min == nil || v >= *a.Min-eps) && (a.Max == nil || v <= *a.Max+eps)
		}))
	case "price":
		return c.Unit == "USD" && within(pr.Price)
	case "spec":
		v := specOf(pr, c.Dimension)
		return v != "" && slices.Contains(c.Values, v)
	case "compatibility":
		return slices.ContainsFunc(c.Values, func(v string) bool { return slices.Contains(pr.Compat, v) })
	case "keyword":
		return slices.ContainsFunc(c.Values, func(v string) bool { return slices.Contains(pr.Words, v) })
	}
	return slices.Contains(c.Values, attr(pr, c.Field))
}

// shop is the invented test catalog: an outdoor and home shop of our own.
var shop = []product{
	{ID: "RJ-1", Type: "rain jacket", Colour: "harvest gold", Hex: "#dfaa0a", Pattern: "solid", Material: "nylon", Audience: "women", Sizes: []string{"s", "m", "l"}, Price: 59, Words: []string{"ridgeline"}},
	{ID: "RJ-2", Type: "rain jacket", Colour: "morning fog", Hex: "#8fa6b2", Pattern: "solid", Material: "nylon", Audience: "women", Sizes: []string{"m", "l"}, Price: 74},
	{ID: "RJ-3", Type: "rain jacket", Colour: "ember", Hex: "#c8553d", Pattern: "solid", Material: "polyester", Audience: "men", Sizes: []string{"l", "xl"}, Price: 55},
	{ID: "RJ-4", Type: "rain jacket", Colour: "glacier", Hex: "#8ecae6", Pattern: "solid", Material: "nylon", Audience: "men", Sizes: []string{"xl"}, Price: 80},
	{ID: "SW-1", Type: "sweater", Colour: "charcoal", Hex: "#36454f", Pattern: "solid", Material: "merino", Silhouette: "crew", Sizes: []string{"s", "m", "l"}, Price: 88},
	{ID: "SW-2", Type: "sweater", Colour: "oatmeal", Hex: "#d8cbb1", Pattern: "cable knit", Material: "wool", Silhouette: "crew", Sizes: []string{"m", "l"}, Price: 95},
	{ID: "TR-1", Type: "trail running shoe", Colour: "black", Hex: "#000000", Material: "mesh", Sizes: []string{"7", "8", "9", "10", "11", "12"}, Price: 120},
	{ID: "TR-2", Type: "trail running shoe", Colour: "ember", Hex: "#c8553d", Material: "mesh", Sizes: []string{"8", "9", "10"}, Price: 110},
	{ID: "HB-1", Type: "hiking boot", Colour: "brown", Hex: "#a52a2a", Material: "leather", Sizes: []string{"9", "10", "11"}, Price: 160},
	{ID: "LN-1", Type: "lens", Colour: "black", Hex: "#000000", Measures: map[string]float64{"focal_length": 50}, Price: 210, Compat: []string{"jx-10"}, Part: "fn-5018"},
	{ID: "LN-2", Type: "lens", Colour: "black", Hex: "#000000", Measures: map[string]float64{"focal_length": 35}, Price: 260, Compat: []string{"jx-10"}, Part: "fn-3520", Gone: true},
	{ID: "RG-1", Type: "rug", Colour: "oatmeal", Hex: "#d8cbb1", Pattern: "geometric", Material: "wool", Measures: map[string]float64{"width": 1524, "length": 2286}, Price: 240},
	{ID: "LB-1", Type: "stud", Specs: map[string]string{"lumber": "2x4"}, Measures: map[string]float64{"length": 2438.4}, Price: 5},
	{ID: "LB-2", Type: "stud", Specs: map[string]string{"lumber": "2x4"}, Measures: map[string]float64{"length": 3048}, Price: 7},
	{ID: "WR-1", Type: "electrical wire", Colour: "red", Hex: "#ff0000", Specs: map[string]string{"awg": "12 awg"}, Measures: map[string]float64{"length": 15240}, Price: 40},
}

// specOf is the designation pr is filed under at key, as the bleve
// adapter files it (parser.Spec.Keys): a tyre also by its size alone.
func specOf(pr product, key string) string {
	if key == parser.TyreSize {
		size, _, _ := strings.Cut(pr.Specs["tyre"], " ")
		return size
	}
	return pr.Specs[key]
}

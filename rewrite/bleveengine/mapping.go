package bleveengine

import (
	"encoding/json"
	"fmt"
	"strconv"
	"strings"

	"github.com/blevesearch/bleve/v2/analysis/analyzer/keyword"
	"github.com/blevesearch/bleve/v2/analysis/lang/en"
	"github.com/blevesearch/bleve/v2/mapping"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/lexicon/spec"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// Field names in the index. Measures and designations get one field per
// dimension or system: "m.focal_length" (numeric, base unit),
// "mv.focal_length" (the same value as a keyword, for listing the values
// carried) and "spec.lumber".
const (
	fID         = "id"
	fType       = "product_type"
	fCategory   = "category"
	fBrand      = "brand"
	fColour     = "colour"
	fPattern    = "pattern"
	fSilhouette = "silhouette"
	fMaterial   = "material"
	fAudience   = "audience"
	fSizes      = "size"
	fPrice      = "price"
	fCurrency   = "currency"
	fCompat     = "compatibility"
	fPart       = "part_number"
	fInStock    = "in_stock"
	fL, fA, fB  = "lab_l", "lab_a", "lab_b"
	// fPalette names the catalog colour of a palette entry.
	fPalette = "palette"
	fStored  = "show"
	// fWords holds all the product's words, for the blind baseline.
	fWords = "words"
	// fFacts is stored JSON of rewrite.Facts, for alternatives.
	fFacts = "facts"
)

func measureField(dim string) string      { return "m." + dim }
func measureValueField(dim string) string { return "mv." + dim }
func specField(system string) string      { return "spec." + system }

// indexMapping is whittle's mapping: keyword fields for attributes,
// numeric fields for measures, prices and Lab, text with the en analyzer
// for title and description, and one stored field for display.
func indexMapping(lex *lexicon.Lexicon) *mapping.IndexMappingImpl {
	// Nothing goes into bleve's catch-all "_all" field: whittle always
	// names the field it asks, and "_all" costs a sixth of the build.
	kw := mapping.NewKeywordFieldMapping()
	kw.Store = false
	kw.IncludeInAll = false
	// No query whittle makes asks where in a field a term is (no phrases,
	// no highlights), so no field keeps term positions.
	kw.IncludeTermVectors = false
	text := mapping.NewTextFieldMapping()
	text.Analyzer = en.AnalyzerName
	text.Store = false
	text.IncludeInAll = false
	text.DocValues = false
	text.IncludeTermVectors = false
	num := mapping.NewNumericFieldMapping()
	num.Store = false
	num.IncludeInAll = false
	num.DocValues = false // ranges need no doc values; nothing sorts on them
	// Keywords that are asked but never listed need no doc values either.
	plain := mapping.NewKeywordFieldMapping()
	plain.Store = false
	plain.IncludeInAll = false
	plain.DocValues = false
	plain.IncludeTermVectors = false
	stored := mapping.NewTextFieldMapping()
	stored.Index = false
	stored.Store = true
	stored.IncludeInAll = false
	stored.DocValues = false
	stored.IncludeTermVectors = false

	doc := mapping.NewDocumentMapping()
	for _, f := range []string{fType, fBrand, fColour, fPattern, fSilhouette, fMaterial, fAudience, fSizes, fCompat} {
		doc.AddFieldMappingsAt(f, kw)
	}
	for _, f := range []string{fID, fCategory, fPart, fCurrency, fInStock, fPalette} {
		doc.AddFieldMappingsAt(f, plain)
	}
	// One text field holds title, description and attributes: the
	// planner's keywords and the blind baseline both search it, and one
	// analysed field costs half of three.
	doc.AddFieldMappingsAt(fWords, text)
	for _, f := range []string{fPrice, fL, fA, fB} {
		doc.AddFieldMappingsAt(f, num)
	}
	doc.AddFieldMappingsAt(fStored, stored)
	doc.AddFieldMappingsAt(fFacts, stored)
	// Measures and designations: one field per dimension the lexicon's
	// slots name and per standard system, so nothing is mapped on the fly.
	m, mv, designations := mapping.NewDocumentMapping(), mapping.NewDocumentMapping(), mapping.NewDocumentMapping()
	for _, dim := range dimensions(lex) {
		m.AddFieldMappingsAt(dim, num)
		mv.AddFieldMappingsAt(dim, kw)
	}
	designations.AddFieldMappingsAt(parser.TyreSize, kw)
	for _, sys := range spec.Systems() {
		designations.AddFieldMappingsAt(string(sys), kw)
	}
	doc.AddSubDocumentMapping("m", m)
	doc.AddSubDocumentMapping("mv", mv)
	doc.AddSubDocumentMapping("spec", designations)
	// Without a disabled mapping at "_all", bleve still adds the empty
	// catch-all field to every document, and composing it costs an
	// eighth of the build.
	doc.AddSubDocumentMapping("_all", mapping.NewDocumentDisabledMapping())
	doc.Dynamic = false

	im := mapping.NewIndexMapping()
	im.DefaultMapping = doc
	im.DefaultAnalyzer = keyword.Name
	im.StoreDynamic = false
	im.IndexDynamic = false
	im.DocValuesDynamic = false
	return im
}

// dimensions lists every measure dimension a query read with lex may
// name: the lexicon's slots, and the parser's own names (a quantity's,
// "pack_size"...), so that each has a field to match.
func dimensions(lex *lexicon.Lexicon) []string { return parser.Dimensions(lex) }

// dimensionSet is dimensions as a set.
func dimensionSet(lex *lexicon.Lexicon) map[string]bool {
	set := map[string]bool{}
	for _, d := range dimensions(lex) {
		set[d] = true
	}
	return set
}

// Palette entries. The index holds, beside the products, one entry per
// catalog colour: its name (fPalette) and its three Lab components as
// numeric fields, so a range over L, a and b finds the catalog's colours
// in a region of colour space, and their names find the products. A
// colour's Lab is the same for every product of that colour, and bleve
// indexes each number as 16 terms for its range queries: once a colour
// instead of once a product took a quarter off the build of 100,000
// products. An entry has no product field, so no product query finds it;
// its id begins with a control character, which no product id holds.
const paletteIDPrefix = "\x1epalette\x1e"

func paletteDocument(c *vocabColour) map[string]any {
	return map[string]any{fPalette: c.Name, fL: c.Lab[0], fA: c.Lab[1], fB: c.Lab[2]}
}

// norm is how attribute values are stored and asked for.
func norm(s string) string { return strings.Join(strings.Fields(lexicon.Normalise(s)), " ") }

// document turns a product into what the index stores, with its Lab
// value (from the line, else the lexicon) when it has a colour.
// note, when not nil, is told of each value of p that whittle does not
// know (see Unknown): its field and the value; dims holds the measure
// dimensions it knows.
func document(p *catalog.Product, r *catalog.Reader, lex *lexicon.Lexicon, dims map[string]bool, note func(field, value string)) (map[string]any, *colour.Lab, error) {
	if note == nil {
		note = func(string, string) {}
	}
	// Only fields with a value go in: every field costs the indexer a
	// visit, empty or not.
	d := map[string]any{fID: p.ID}
	for f, v := range map[string]string{fBrand: p.Brand, fColour: p.Colour, fPart: p.PartNumber} {
		if v := norm(v); v != "" {
			d[f] = v
		}
	}
	named := addNamed(d, p, lex, note)
	in := p.InStock == nil || *p.InStock
	d[fInStock] = strconv.FormatBool(in)
	var sizes []string
	for _, s := range p.Sizes {
		sizes = append(sizes, norm(s))
	}
	if len(sizes) > 0 {
		d[fSizes] = sizes
	}
	var compat []string
	for _, c := range p.CompatibleWith {
		compat = append(compat, norm(c))
	}
	if len(compat) > 0 {
		d[fCompat] = compat
	}
	ms, err := addMeasures(d, p, r, dims, note)
	if err != nil {
		return nil, nil, err
	}
	specs := map[string]any{}
	own := map[string]string{} // for the facts: each system's designation
	for _, s := range p.Spec {
		sp, err := r.Spec(s)
		if err != nil {
			return nil, nil, fmt.Errorf("spec %q: %w", s, err)
		}
		for key, d := range sp.Keys() {
			specs[key] = d
		}
		own[sp.System] = strings.ToLower(sp.Designation)
	}
	if len(specs) > 0 {
		d["spec"] = specs
	}
	if p.Price != nil {
		v, err := strconv.ParseFloat(p.Price.Amount, 64)
		if err == nil {
			d[fPrice] = v
			d[fCurrency] = p.Price.Currency
		}
	}
	lab := p.Lab(lex)
	price := ""
	if p.Price != nil {
		price = p.Price.Amount + " " + p.Price.Currency
	}
	d[fStored] = strings.Join([]string{p.Title, price, p.Colour, strconv.FormatBool(in)}, "\x1f")
	words := []string{p.Title, p.Description, p.ProductType, p.Brand, p.Colour, p.Pattern, p.Silhouette, p.Material, p.Audience, p.PartNumber}
	words = append(words, p.Sizes...)
	words = append(words, p.Spec...)
	words = append(words, p.CompatibleWith...)
	for _, m := range p.Measures {
		words = append(words, m)
	}
	d[fWords] = strings.Join(words, " ")
	facts := rewrite.Facts{ProductType: named[fType], Compat: compat, InStock: in, Measures: map[string]float64{},
		Category: norm(p.Category), Colour: norm(p.Colour), Brand: norm(p.Brand)}
	if len(own) > 0 {
		facts.Spec = own
	}
	for dim, v := range ms {
		switch x := v.(type) {
		case float64:
			facts.Measures[dim] = x
		case []float64:
			facts.Measures[dim] = x[0]
		}
	}
	if lab != nil {
		facts.Lab = &[3]float64{lab.L, lab.A, lab.B}
	}
	fb, err := json.Marshal(facts)
	if err != nil {
		return nil, nil, err
	}
	d[fFacts] = string(fb)
	return d, lab, nil
}

// addNamed stores the fields the lexicon names by the lexicon's name for
// the value, so that a catalog's "rain jackets" or "jumper" is found as a
// query's rain jacket or sweater, and the category as written; it notes
// the values the lexicon does not know, and returns the names it stored
// by field.
func addNamed(d map[string]any, p *catalog.Product, lex *lexicon.Lexicon, note func(field, value string)) map[string]string {
	named := map[string]string{}
	for _, n := range namedFields {
		raw := n.value(p)
		v := norm(raw)
		if v == "" {
			continue
		}
		name, ok := canonical(lex, n.kind, v)
		if !ok {
			note(n.field, raw)
		}
		d[n.field], named[n.field] = name, name
	}
	if v := norm(p.Category); v != "" {
		if lexicon.CheckCategory(v) != nil {
			note(fCategory, p.Category)
		}
		d[fCategory] = v
	}
	return named
}

// addMeasures stores p's measures in base units, by dimension, and
// returns them; it notes a dimension no query names (dims holds those
// that one may), which no field of the index holds.
func addMeasures(d map[string]any, p *catalog.Product, r *catalog.Reader, dims map[string]bool, note func(field, value string)) (map[string]any, error) {
	ms, mvs := map[string]any{}, map[string]any{}
	for dim, text := range p.Measures {
		if !dims[dim] {
			note("measures."+dim, dim)
		}
		m, err := r.Measure(text)
		if err != nil {
			return nil, fmt.Errorf("measure %s: %w", dim, err)
		}
		if m.BaseAmount != nil {
			ms[dim] = *m.BaseAmount
			mvs[dim] = strconv.FormatFloat(*m.BaseAmount, 'g', -1, 64)
			continue
		}
		// A range (a zoom lens's 18-55 mm) is indexed at both ends.
		ms[dim] = []float64{*m.BaseMin, *m.BaseMax}
		mvs[dim] = []string{strconv.FormatFloat(*m.BaseMin, 'g', -1, 64), strconv.FormatFloat(*m.BaseMax, 'g', -1, 64)}
	}
	if len(ms) > 0 {
		d["m"], d["mv"] = ms, mvs
	}
	return ms, nil
}

package catalog

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"reflect"
	"strings"
	"unicode"

	"github.com/bojanz/currency"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite/internal/lines"
)

// Reader reads a catalog product by product, checking each line.
type Reader struct {
	lr   *lines.Reader
	lex  *lexicon.Lexicon
	line int
	ids  map[string]int
	// Catalogs repeat their measures and designations ("8 ft", "2x4"):
	// each distinct text is parsed once.
	measures map[string]measureRead
	specs    map[string]specRead
}

type measureRead struct {
	m   *parser.Measure
	err error
}

type specRead struct {
	s   *parser.Spec
	err error
}

// readCache bounds each cache; past it the cache starts over.
const readCache = 1 << 12

// NewReader reads the catalog in r.
func NewReader(r io.Reader, lex *lexicon.Lexicon) *Reader {
	if lex == nil {
		lex = lexicon.Default()
	}
	return &Reader{lr: lines.NewReader(r, MaxLine), lex: lex, ids: make(map[string]int), measures: make(map[string]measureRead), specs: make(map[string]specRead)}
}

// Line is the number of the line last read.
func (r *Reader) Line() int { return r.line }

// Next returns the next product, or io.EOF at the end. A malformed line
// returns a *LineError naming the line and field; reading may go on
// after it with the next line.
func (r *Reader) Next() (*Product, error) {
	for {
		b, long, err := r.lr.Next()
		if err != nil {
			return nil, err
		}
		r.line = r.lr.Line()
		if long {
			return nil, &LineError{Line: r.line, Msg: fmt.Sprintf("longer than %d bytes", MaxLine)}
		}
		text := bytes.TrimSpace(b)
		if len(text) == 0 {
			continue
		}
		return r.decode(text)
	}
}

func (r *Reader) decode(text []byte) (*Product, error) {
	fail := func(field, format string, args ...any) error {
		return &LineError{Line: r.line, Field: field, Msg: fmt.Sprintf(format, args...)}
	}
	var p Product
	// The whole line at once, when it decodes; field by field otherwise,
	// to name the field at fault, for the American spellings of the
	// colour fields, and for colour_lab, whose count of numbers the whole
	// line's decoding would not check.
	if bytes.Contains(text, []byte(`"color`)) || bytes.Contains(text, []byte(`"colour_lab"`)) || json.Unmarshal(text, &p) != nil {
		p = Product{}
		var fields map[string]json.RawMessage
		if err := json.Unmarshal(text, &fields); err != nil {
			return nil, fail("", "%s", notAnObject(err))
		}
		for name, raw := range fields {
			if err := decodeField(&p, name, raw); err != nil {
				return nil, fail(name, "%v", err)
			}
		}
	}
	if strings.TrimSpace(p.ID) == "" {
		return nil, fail("id", "missing; every line needs it")
	}
	if strings.IndexFunc(p.ID, unicode.IsControl) >= 0 {
		return nil, fail("id", "%q holds a control character", p.ID)
	}
	if strings.TrimSpace(p.Title) == "" {
		return nil, fail("title", "missing; every line needs it")
	}
	if first, dup := r.ids[p.ID]; dup {
		return nil, fail("id", "%q is already the id of line %d", p.ID, first)
	}
	r.ids[p.ID] = r.line
	if p.ColourHex != "" {
		if _, err := colour.ParseHex(p.ColourHex); err != nil {
			return nil, fail("colour_hex", "%v", err)
		}
	}
	if l := p.ColourLab; l != nil && (l[0] < 0 || l[0] > 100 || l[1] < -200 || l[1] > 200 || l[2] < -200 || l[2] > 200) {
		return nil, fail("colour_lab", "L must be 0..100 and a, b within -200..200")
	}
	for dim, m := range p.Measures {
		if _, err := r.Measure(m); err != nil {
			return nil, fail("measures", "%s %q: %v", dim, m, err)
		}
	}
	for _, s := range p.Spec {
		if _, err := r.Spec(s); err != nil {
			return nil, fail("spec", "%q: %v", s, err)
		}
	}
	if p.Price != nil {
		if !currency.IsValid(p.Price.Currency) {
			return nil, fail("price", "currency %q is not an ISO 4217 code", p.Price.Currency)
		}
		if _, err := currency.NewAmount(p.Price.Amount, p.Price.Currency); err != nil {
			return nil, fail("price", "amount %q is not a decimal amount", p.Price.Amount)
		}
	}
	if p.ProductType != "" {
		p.ProductType = strings.ToLower(strings.TrimSpace(p.ProductType))
	}
	return &p, nil
}

// decodeField decodes one field, so that a type error names its field.
func decodeField(p *Product, name string, raw json.RawMessage) error {
	var dst any
	switch name {
	case "id":
		dst = &p.ID
	case "title":
		dst = &p.Title
	case "description":
		dst = &p.Description
	case "product_type":
		dst = &p.ProductType
	case "category":
		dst = &p.Category
	case "brand":
		dst = &p.Brand
	case "colour", "color":
		dst = &p.Colour
	case "colour_hex", "color_hex":
		dst = &p.ColourHex
	case "colour_lab", "color_lab":
		return decodeLab(p, name, raw)
	case "pattern":
		dst = &p.Pattern
	case "silhouette":
		dst = &p.Silhouette
	case "material":
		dst = &p.Material
	case "audience":
		dst = &p.Audience
	case "sizes":
		dst = &p.Sizes
	case "measures":
		dst = &p.Measures
	case "price":
		dst = &p.Price
	case "spec":
		dst = &p.Spec
	case "compatible_with":
		dst = &p.CompatibleWith
	case "part_number":
		dst = &p.PartNumber
	case "in_stock":
		dst = &p.InStock
	default:
		return nil // fields whittle does not read are kept out of its way
	}
	if err := json.Unmarshal(raw, dst); err != nil {
		var te *json.UnmarshalTypeError
		if errors.As(err, &te) {
			return wrongType(name, te, reflect.TypeOf(dst))
		}
		return err
	}
	return nil
}

// decodeLab decodes colour_lab, which must hold exactly three numbers:
// decoded straight into an array of three, two numbers would get a third
// of 0 and four would lose the last, without a word.
func decodeLab(p *Product, name string, raw json.RawMessage) error {
	var xs []float64
	if err := json.Unmarshal(raw, &xs); err != nil {
		var te *json.UnmarshalTypeError
		if errors.As(err, &te) {
			return wrongType(name, te, reflect.TypeOf(&xs))
		}
		return err
	}
	if xs == nil {
		return nil // null
	}
	if len(xs) != 3 {
		return fmt.Errorf("want %s, not %d numbers", fieldShapes["colour_lab"].want, len(xs))
	}
	p.ColourLab = &[3]float64{xs[0], xs[1], xs[2]}
	return nil
}

// fieldShape is what a catalog author should write for a field that is
// not a string: the value, described with an example, and whether it is
// an array or an object of other values.
type fieldShape struct {
	want      string
	container string // "array" or "object" when the field holds other values
}

var fieldShapes = map[string]fieldShape{
	"colour_lab":      {"an array of three numbers [L, a, b], like [53.2, 80.1, 67.2]", "array"},
	"color_lab":       {"an array of three numbers [L, a, b], like [53.2, 80.1, 67.2]", "array"},
	"colour_hex":      {`a string like "#1f3a5f"`, ""},
	"color_hex":       {`a string like "#1f3a5f"`, ""},
	"sizes":           {`an array of strings, like ["S", "M", "10"]`, "array"},
	"spec":            {`an array of strings, like ["2x4", "14 awg"]`, "array"},
	"compatible_with": {`an array of strings, like ["JX-10"]`, "array"},
	"measures":        {`an object of measures written with their units, like {"width": "74 cm"}`, "object"},
	"price":           {`an object like {"amount": "59.00", "currency": "USD"}`, "object"},
	"in_stock":        {"true or false", ""},
}

// wrongType says what field name should hold, in the words of the
// catalog's JSON rather than of Go's types: te is the type error of
// decoding the field into dst.
func wrongType(name string, te *json.UnmarshalTypeError, dst reflect.Type) error {
	shape, ok := fieldShapes[name]
	if !ok {
		shape = fieldShape{want: "a string"}
	}
	got := jsonKind(te.Value)
	for dst.Kind() == reflect.Pointer {
		dst = dst.Elem()
	}
	inner := te.Type
	for inner.Kind() == reflect.Pointer {
		inner = inner.Elem()
	}
	if inner != dst && shape.container != "" {
		// The field is an array or object, but a value in it is wrong.
		if te.Field != "" {
			return fmt.Errorf("want %s, not an object whose %s is %s", shape.want, te.Field, got)
		}
		return fmt.Errorf("want %s, not an %s holding %s", shape.want, shape.container, got)
	}
	return fmt.Errorf("want %s, not %s", shape.want, got)
}

// jsonKind names a kind of JSON value, as encoding/json reports it in a
// type error ("number", "array"), with its article: "a number".
func jsonKind(v string) string {
	switch {
	case v == "array", v == "object":
		return "an " + v
	case v == "bool":
		return "true or false"
	case strings.HasPrefix(v, "number"):
		return "a number"
	case v == "":
		return "something else"
	}
	return "a " + v
}

// notAnObject says why a line did not decode as a JSON object: it is
// another JSON value, or not JSON at all.
func notAnObject(err error) string {
	var te *json.UnmarshalTypeError
	if errors.As(err, &te) {
		return "want a JSON object for a product, like {\"id\": \"SKU-1\", \"title\": \"Linen shirt\"}, not " + jsonKind(te.Value)
	}
	return "not a JSON object: " + err.Error()
}

// Measure reads a catalog measure ("74 cm", or a range such as a zoom
// lens's "18-55 mm") with whittle's parser.
func (r *Reader) Measure(s string) (*parser.Measure, error) {
	if m, ok := r.measures[s]; ok {
		return m.m, m.err
	}
	m, err := r.measure(s)
	if len(r.measures) >= readCache {
		r.measures = make(map[string]measureRead)
	}
	r.measures[s] = measureRead{m, err}
	return m, err
}

func (r *Reader) measure(s string) (*parser.Measure, error) {
	res := parser.ParseWith(s, parser.Options{Lexicon: r.lex})
	ms := res.Of(parser.KindMeasure)
	if len(res.Errors) > 0 {
		return nil, res.Errors[0]
	}
	if len(ms) != 1 || ms[0].Measure.Unit == "" {
		return nil, errors.New("want one amount with its unit, such as \"74 cm\", or a range, such as \"18-55 mm\"")
	}
	m := ms[0].Measure
	if m.BaseAmount == nil && (m.BaseMin == nil || m.BaseMax == nil) {
		return nil, errors.New("a range needs both ends, such as \"18-55 mm\"")
	}
	return m, nil
}

// Spec reads a catalog designation ("2x6", "14 awg") with whittle's
// parser.
func (r *Reader) Spec(s string) (*parser.Spec, error) {
	if sp, ok := r.specs[s]; ok {
		return sp.s, sp.err
	}
	sp, err := r.spec(s)
	if len(r.specs) >= readCache {
		r.specs = make(map[string]specRead)
	}
	r.specs[s] = specRead{sp, err}
	return sp, err
}

func (r *Reader) spec(s string) (*parser.Spec, error) {
	res := parser.ParseWith(s, parser.Options{Lexicon: r.lex})
	ss := res.Of(parser.KindSpec)
	if len(ss) != 1 {
		return nil, errors.New("not a standard designation whittle knows (lumber, tyre, wire gauge, thread, paper, battery, pipe schedule)")
	}
	return ss[0].Spec, nil
}

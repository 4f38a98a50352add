package rewrite

import (
	_ "embed"
	"errors"
	"fmt"
	"maps"
	"math"
	"os"
	"regexp"
	"slices"
	"sort"
	"strconv"
	"strings"

	"github.com/BurntSushi/toml"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/parser"
)

//go:embed policy.toml
var defaultPolicy string

// Settings are the parts of a policy that one level (the defaults, a
// category, a product type) may set. A nil pointer or a missing map key
// means "as the level above".
type Settings struct {
	// MinResults is the fewest results a query should find before it is
	// relaxed.
	MinResults *int
	// ColourTolerance is the ΔE00 within which a colour may be widened.
	ColourTolerance *float64
	// MeasureTolerance is the fraction by which a measure may be widened.
	MeasureTolerance *float64
	// PriceStretch is the fraction by which a price ceiling may be raised.
	PriceStretch *float64
	// Strictness by constraint kind.
	Strictness map[parser.Kind]parser.Strictness
	// Dimensions gives the strictness of measures by dimension.
	Dimensions map[string]parser.Strictness
	// StandardSizes lists, by dimension, the sizes a measure may be
	// widened to ("8 ft", "10 ft").
	StandardSizes map[string][]string
}

// Policy is a strictness policy: defaults, then per category, then per
// product type.
type Policy struct {
	Defaults     Settings
	Categories   map[string]Settings
	ProductTypes map[string]Settings
	// Warnings are things a valid policy does that deserve a second look,
	// such as relaxing a standard designation.
	Warnings []string
	// tuning is laid over every level (Tuned).
	tuning Settings
	// signals is the [signals] table, for whittle tune.
	signals SignalSettings
}

// Tuning is a change of a policy's numbers for a single request: each
// set field holds at every level, over the defaults, categories and
// product types. It holds no strictness, so it cannot make a hard
// constraint (a wire gauge, a tyre size, a thread) soft.
type Tuning struct {
	MinResults       *int     `json:"min_results,omitempty"`
	ColourTolerance  *float64 `json:"colour_tolerance,omitempty"`
	MeasureTolerance *float64 `json:"measure_tolerance,omitempty"`
	PriceStretch     *float64 `json:"price_stretch,omitempty"`
}

// TuningError is a value of a Tuning out of its range; Field is its JSON
// and policy-file name.
type TuningError struct {
	Field   string
	Message string
}

// Error returns the message, which names the field and its range.
func (e *TuningError) Error() string { return e.Message }

// Check returns the first value of t out of the range a policy file
// allows, as a *TuningError, or nil.
func (t Tuning) Check() error {
	if ps := t.problems(); len(ps) > 0 {
		return &ps[0]
	}
	return nil
}

// problems are the values of t out of range, in field order.
func (t Tuning) problems() []TuningError {
	var out []TuningError
	if v := t.MinResults; v != nil && (*v < 1 || *v > 10000) {
		out = append(out, TuningError{"min_results", fmt.Sprintf("min_results %d: want 1 to 10000", *v)})
	}
	for _, f := range []struct {
		name     string
		v        *float64
		min, max float64
	}{
		{"colour_tolerance", t.ColourTolerance, 0, 100},
		{"measure_tolerance", t.MeasureTolerance, 0, 1},
		{"price_stretch", t.PriceStretch, 0, 10},
	} {
		if f.v != nil && (math.IsNaN(*f.v) || *f.v < f.min || *f.v > f.max) {
			out = append(out, TuningError{f.name, fmt.Sprintf("%s %g: want %g to %g", f.name, *f.v, f.min, f.max)})
		}
	}
	return out
}

// Tuned returns p with t laid over every level; p is unchanged.
func (p *Policy) Tuned(t Tuning) *Policy {
	out := *p
	out.tuning = merge(p.tuning, Settings{MinResults: t.MinResults, ColourTolerance: t.ColourTolerance, MeasureTolerance: t.MeasureTolerance, PriceStretch: t.PriceStretch})
	return &out
}

// Read parses query with opts and applies p to it: the reading `whittle
// explain` shows. The lexicon is opts.Lexicon, or the default.
func (p *Policy) Read(query string, opts parser.Options) *parser.Result {
	lex := opts.Lexicon
	if lex == nil {
		lex = lexicon.Default()
	}
	r := parser.ParseWith(query, opts)
	p.Apply(r, lex)
	return r
}

// settingsTOML is one level of a policy file as read (policy_read.go),
// before it is checked.
type settingsTOML struct {
	MinResults       *int
	ColourTolerance  *float64
	MeasureTolerance *float64
	PriceStretch     *float64
	Strictness       map[string]parser.Strictness
	Dimensions       map[string]parser.Strictness
	StandardSizes    map[string][]string
}

// PolicyError is a problem in a policy file, with its line and column.
type PolicyError struct {
	File         string
	Line, Column int
	Msg          string
	// Source is the line of the file at fault, for Render.
	Source string
}

// Error renders "file:line:column: message".
func (e *PolicyError) Error() string {
	return fmt.Sprintf("%s:%d:%d: %s", e.File, e.Line, e.Column, e.Msg)
}

// Render shows the line at fault with a caret under the column, then the
// message. The column counts bytes; the caret is placed under that byte,
// past a tab by a tab and past any other character by one space.
func (e *PolicyError) Render() string {
	if e.Source == "" {
		return e.Error()
	}
	var pad strings.Builder
	before := e.Source[:min(max(e.Column, 1)-1, len(e.Source))]
	for _, r := range before {
		if r == '\t' {
			pad.WriteByte('\t')
		} else {
			pad.WriteByte(' ')
		}
	}
	return fmt.Sprintf("%s:%d:%d:\n%s\n%s^\n%s", e.File, e.Line, e.Column, e.Source, pad.String(), e.Msg)
}

// DefaultPolicy returns the policy embedded in whittle.
func DefaultPolicy() *Policy {
	p, err := parsePolicy("default policy", defaultPolicy, lexicon.Default())
	if err != nil {
		panic("whittle: embedded policy: " + err.Error())
	}
	return p
}

// LoadPolicy reads a policy file and lays it over the default policy: a
// setting the file leaves out keeps its default. A nil lex means
// lexicon.Default().
func LoadPolicy(path string, lex *lexicon.Lexicon) (*Policy, error) {
	b, err := os.ReadFile(path)
	if err != nil {
		return nil, err
	}
	user, err := ParsePolicy(path, string(b), lex)
	if err != nil {
		return nil, err
	}
	out := DefaultPolicy().Overlay(user)
	out.checkWeightOrder()
	return out, nil
}

// ParsePolicy reads a policy in whittle's TOML layout (see policy.toml).
// Badly formed TOML (a syntax error) is one *PolicyError, at the first
// fault. In well formed TOML every problem is reported, each a
// *PolicyError with a line and column, joined: a value of the wrong type
// or out of range, an unknown key, kind, dimension, category or product
// type (with the nearest known name). A nil lex means
// lexicon.Default().
//
// A policy that relaxes below hard a fit dimension the built-in policy
// makes hard where it applies (a bolt's diameter, a tyre's rim, a bulb's
// wattage) loads with a warning, as one that relaxes a rating does.
func ParsePolicy(name, text string, lex *lexicon.Lexicon) (*Policy, error) {
	if lex == nil {
		lex = lexicon.Default()
	}
	pol, err := parsePolicy(name, text, lex)
	if err != nil {
		return nil, err
	}
	pol.checkFits(lex)
	return pol, nil
}

// checkFits warns of each fit dimension p makes less than hard where the
// built-in policy makes it hard.
func (p *Policy) checkFits(lex *lexicon.Lexicon) {
	builtin := DefaultPolicy()
	check := func(scope string, s Settings, in Effective) {
		for _, d := range fitDimensions {
			if v, ok := s.Dimensions[d]; ok && v < parser.Hard && in.Dimensions[d] == parser.Hard {
				p.Warnings = append(p.Warnings, fmt.Sprintf("%s: %s is %s: fit dimensions (a bolt's or a blade's diameter, a rim's, a bulb's wattage) may then be substituted; defer to local codes and the maker's specification", scope, d, v))
			}
		}
	}
	check("defaults", p.Defaults, builtin.For("", "", lex))
	for _, n := range sortedKeys(p.Categories) {
		check("category."+n, p.Categories[n], builtin.For(n, "", lex))
	}
	for _, n := range sortedKeys(p.ProductTypes) {
		e, err := builtin.Settle("", n, lex)
		if err == nil {
			check("product_type."+n, p.ProductTypes[n], e)
		}
	}
}

// parsePolicy is ParsePolicy without the checks against the built-in
// policy, which it reads itself.
func parsePolicy(name, text string, lex *lexicon.Lexicon) (*Policy, error) {
	lines := strings.Split(text, "\n")
	var top map[string]toml.Primitive
	md, err := toml.Decode(text, &top)
	if err != nil {
		return nil, decodeError(name, text, lines, err)
	}
	pos := keyPositions(lines)
	var errs []error
	at := func(key []string, format string, args ...any) {
		// A key the file does not write out (one the decoder made
		// up, or one in a line keyPositions cannot read) stands where
		// the nearest key around it does.
		p := pos[strings.Join(key, "\x00")]
		for k := key; p.line == 0 && len(k) > 1; {
			k = k[:len(k)-1]
			p = pos[strings.Join(k, "\x00")]
		}
		if p.line == 0 {
			p = position{1, 1}
		}
		errs = append(errs, &PolicyError{File: name, Line: p.line, Column: p.col, Msg: fmt.Sprintf(format, args...), Source: lineAt(lines, p.line)})
	}
	r := &policyReader{md: md, at: at, dims: parser.Dimensions(lex)}
	pol := &Policy{Categories: make(map[string]Settings), ProductTypes: make(map[string]Settings)}
	types := lex.Names(lexicon.ProductType)
	for _, k := range sortedKeys(top) {
		key := []string{k}
		switch k {
		case "defaults":
			if t, ok := r.table(key, top[k]); ok {
				pol.Defaults = pol.settings(key, r.settings(key, t), at, lex, r.dims)
			}
		case "signals":
			if t, ok := r.table(key, top[k]); ok {
				pol.signals = pol.signalSettings(r.signals(t), at)
			}
		case "category", "product_type":
			levels, ok := r.table(key, top[k])
			if !ok {
				continue
			}
			for _, n := range sortedKeys(levels) {
				key := []string{k, n}
				switch {
				case k == "category" && !slices.Contains(lexicon.Categories(), n):
					at(key, "unknown category %q%s", n, didYouMean(n, lexicon.Categories()))
				case k == "product_type" && !isProductType(lex, n):
					at(key, "unknown product type %q%s", n, didYouMean(n, types))
				default:
					t, ok := r.table(key, levels[n])
					if !ok {
						continue
					}
					s := pol.settings(key, r.settings(key, t), at, lex, r.dims)
					if k == "category" {
						pol.Categories[n] = s
					} else {
						pol.ProductTypes[n] = s
					}
				}
			}
		default:
			r.unknown(key)
		}
	}
	if len(errs) > 0 {
		sort.SliceStable(errs, func(i, j int) bool {
			a, b := errs[i].(*PolicyError), errs[j].(*PolicyError)
			return a.Line < b.Line || a.Line == b.Line && a.Column < b.Column
		})
		return nil, errors.Join(errs...)
	}
	return pol, nil
}

func isProductType(lex *lexicon.Lexicon, name string) bool {
	_, ok := lex.Lookup(lexicon.ProductType, name)
	return ok
}

// settings checks one level of the policy and converts it.
// dims are the dimensions a query may name.
func (pol *Policy) settings(key []string, s settingsTOML, at func([]string, string, ...any), lex *lexicon.Lexicon, dims []string) Settings {
	out := Settings{MinResults: s.MinResults, ColourTolerance: s.ColourTolerance, MeasureTolerance: s.MeasureTolerance,
		PriceStretch: s.PriceStretch, Dimensions: s.Dimensions, StandardSizes: s.StandardSizes}
	sub := func(k ...string) []string { return append(slices.Clone(key), k...) }
	for _, p := range (Tuning{MinResults: s.MinResults, ColourTolerance: s.ColourTolerance, MeasureTolerance: s.MeasureTolerance, PriceStretch: s.PriceStretch}).problems() {
		at(sub(p.Field), "%s", p.Message)
	}
	if len(s.Strictness) > 0 {
		out.Strictness = make(map[parser.Kind]parser.Strictness, len(s.Strictness))
		var kinds []string
		for _, k := range parser.AllKinds() {
			kinds = append(kinds, string(k))
		}
		for _, k := range sortedKeys(s.Strictness) {
			if !slices.Contains(kinds, k) {
				at(sub("strictness", k), "unknown constraint kind %q%s", k, didYouMean(k, kinds))
				continue
			}
			out.Strictness[parser.Kind(k)] = s.Strictness[k]
			if parser.Kind(k) == parser.KindSpec {
				pol.checkSafety(sub("strictness", k), "spec", "wire gauges, tyre sizes and threads", s.Strictness[k], at)
			}
		}
	}
	out.Dimensions = knownDimensions(sub("dimensions"), s.Dimensions, dims, at)
	for _, d := range sortedKeys(out.Dimensions) {
		if slices.Contains(safetyDimensions, d) {
			what := "ratings"
			switch d {
			case "gauge":
				what = "gauge numbers"
			case "poles":
				what = "a breaker's or a switch's poles"
			}
			pol.checkSafety(sub("dimensions", d), d, what, out.Dimensions[d], at)
		}
	}
	out.StandardSizes = knownDimensions(sub("standard_sizes"), s.StandardSizes, dims, at)
	for dim, sizes := range out.StandardSizes {
		for _, sz := range sizes {
			r := parser.ParseWith(sz, parser.Options{Lexicon: lex})
			if ms := r.Of(parser.KindMeasure); len(ms) != 1 || ms[0].Measure.Unit == "" || len(r.Constraints) != 1 {
				at(sub("standard_sizes", dim), "standard size %q of %s: want a number with its unit, such as \"8 ft\"", sz, dim)
			}
		}
	}
	return out
}

// safetyDimensions are the measure dimensions a substitute for could
// hurt someone: ratings (a breaker's or a fuse's current, a battery's or
// a tool's voltage, what a ladder or a strap is rated to carry), a
// breaker's or a switch's poles, and gauge numbers outside wiring (a
// shotgun's, a needle's, sheet metal's).
var safetyDimensions = []string{"cold_cranking_amps", "current", "gauge", "load_rating", "peak_current", "poles", "voltage"}

// fitDimensions are the measure dimensions the built-in policy makes
// hard for some product types because a part must have them to fit or
// run safely: a bolt's, a wall anchor's or a lens cap's diameter, a saw
// blade's or a grinder disc's, a tyre's rim, a bulb's wattage.
var fitDimensions = []string{"blade_diameter", "diameter", "disc_diameter", "power", "rim_diameter"}

// substituteHurts reports whether a substitute for dimension dim could
// hurt someone where e makes it hard: a rating, a gauge number or a fit
// dimension. A dimension hard by the shop's choice alone (a lens's
// focal length) is not one.
func (e Effective) substituteHurts(dim string) bool {
	return e.Dimensions[dim] == parser.Hard && (slices.Contains(safetyDimensions, dim) || slices.Contains(fitDimensions, dim))
}

// checkSafety reports a policy that relaxes what a substitute for could
// hurt someone (name, at key; what says what it covers): filler, which
// would drop it unseen, is an error; anything else below hard is a
// warning.
func (pol *Policy) checkSafety(key []string, name, what string, s parser.Strictness, at func([]string, string, ...any)) {
	switch {
	case s == parser.Filler:
		at(key, "%s may not be filler: it would be dropped without the shopper being told; make it soft at the least", name)
	case s < parser.Hard:
		pol.Warnings = append(pol.Warnings, fmt.Sprintf("%s: %s is %s: %s may then be substituted; defer to local codes and the maker's specification", strings.Join(key[:len(key)-2], "."), name, s, what))
	}
}

// knownDimensions is m without the dimensions no query is read with
// (dims are those it is), each reported at its key with the nearest
// known name.
func knownDimensions[V any](key []string, m map[string]V, dims []string, at func([]string, string, ...any)) map[string]V {
	if m == nil {
		return nil
	}
	out := make(map[string]V, len(m))
	for _, d := range sortedKeys(m) {
		if !slices.Contains(dims, d) {
			at(append(slices.Clone(key), d), "unknown dimension %q%s", d, didYouMean(d, dims))
			continue
		}
		out[d] = m[d]
	}
	return out
}

// Overlay returns p with q's settings laid over it, level by level.
func (p *Policy) Overlay(q *Policy) *Policy {
	out := &Policy{Defaults: merge(p.Defaults, q.Defaults), Categories: make(map[string]Settings), ProductTypes: make(map[string]Settings),
		Warnings: append(slices.Clone(p.Warnings), q.Warnings...), tuning: merge(p.tuning, q.tuning), signals: mergeSignals(p.signals, q.signals)}
	for _, m := range []struct{ dst, a, b map[string]Settings }{{out.Categories, p.Categories, q.Categories}, {out.ProductTypes, p.ProductTypes, q.ProductTypes}} {
		for k, v := range m.a {
			m.dst[k] = v
		}
		for k, v := range m.b {
			m.dst[k] = merge(m.dst[k], v)
		}
	}
	return out
}

// merge lays b over a.
func merge(a, b Settings) Settings {
	out := a
	if b.MinResults != nil {
		out.MinResults = b.MinResults
	}
	if b.ColourTolerance != nil {
		out.ColourTolerance = b.ColourTolerance
	}
	if b.MeasureTolerance != nil {
		out.MeasureTolerance = b.MeasureTolerance
	}
	if b.PriceStretch != nil {
		out.PriceStretch = b.PriceStretch
	}
	out.Strictness = mergeMap(a.Strictness, b.Strictness)
	out.Dimensions = mergeMap(a.Dimensions, b.Dimensions)
	out.StandardSizes = mergeMap(a.StandardSizes, b.StandardSizes)
	return out
}

func mergeMap[K comparable, V any](a, b map[K]V) map[K]V {
	if len(a) == 0 && len(b) == 0 {
		return nil
	}
	out := make(map[K]V, len(a)+len(b))
	for k, v := range a {
		out[k] = v
	}
	for k, v := range b {
		out[k] = v
	}
	return out
}

// Effective is the policy in force for one category and product type,
// with every value settled.
type Effective struct {
	Category         string                            `json:"category"`
	ProductType      string                            `json:"product_type"`
	MinResults       int                               `json:"min_results"`
	ColourTolerance  float64                           `json:"colour_tolerance"`
	MeasureTolerance float64                           `json:"measure_tolerance"`
	PriceStretch     float64                           `json:"price_stretch"`
	Strictness       map[parser.Kind]parser.Strictness `json:"strictness"`
	Dimensions       map[string]parser.Strictness      `json:"dimensions"`
	StandardSizes    map[string][]string               `json:"standard_sizes"`
}

// For returns the policy in force for a category and a product type
// (either may be ""): the defaults, then the category's settings, then
// the product type's and its ancestors', broadest first. A nil lex
// means lexicon.Default().
func (p *Policy) For(category, productType string, lex *lexicon.Lexicon) Effective {
	if lex == nil {
		lex = lexicon.Default()
	}
	s := p.Defaults
	if c, ok := p.Categories[category]; ok {
		s = merge(s, c)
	}
	if e, ok := lex.Lookup(lexicon.ProductType, productType); ok {
		line := lex.Lineage(e)
		for i := len(line) - 1; i >= 0; i-- {
			if t, ok := p.ProductTypes[line[i].Name]; ok {
				s = merge(s, t)
			}
		}
	}
	s = merge(s, p.tuning)
	e := Effective{Category: category, ProductType: productType, MinResults: 1, Strictness: make(map[parser.Kind]parser.Strictness),
		Dimensions: s.Dimensions, StandardSizes: s.StandardSizes}
	for _, k := range parser.AllKinds() {
		e.Strictness[k] = parser.DefaultStrictness(k)
	}
	for k, v := range s.Strictness {
		e.Strictness[k] = v
	}
	if s.MinResults != nil {
		e.MinResults = *s.MinResults
	}
	for _, f := range []struct {
		dst *float64
		v   *float64
	}{{&e.ColourTolerance, s.ColourTolerance}, {&e.MeasureTolerance, s.MeasureTolerance}, {&e.PriceStretch, s.PriceStretch}} {
		if f.v != nil {
			*f.dst = *f.v
		}
	}
	return e
}

// StrictnessOf is the strictness the policy gives constraint c: by its
// measure dimension where the policy names one, else by its kind. A
// constraint the parser made stricter than its kind's default (a quoted
// phrase) stays at least that strict.
func (e Effective) StrictnessOf(c parser.Constraint) parser.Strictness {
	s, ok := e.Strictness[c.Kind]
	if !ok {
		s = parser.DefaultStrictness(c.Kind)
	}
	if c.Measure != nil {
		if d, ok := e.Dimensions[c.Measure.Dimension]; ok {
			s = d
		}
	}
	if c.Strictness > parser.DefaultStrictness(c.Kind) && c.Strictness > s {
		s = c.Strictness
	}
	return s
}

// Apply sets the strictness of every constraint of r by the policy in
// force for its category and head product type.
func (p *Policy) Apply(r *parser.Result, lex *lexicon.Lexicon) Effective {
	head := ""
	for _, c := range r.Of(parser.KindProductType) {
		if c.IsHead() {
			head = c.Name
		}
	}
	e := p.For(r.Category, head, lex)
	for i := range r.Constraints {
		r.Constraints[i].Strictness = e.StrictnessOf(r.Constraints[i])
	}
	return e
}

func sortedKeys[V any](m map[string]V) []string { return slices.Sorted(maps.Keys(m)) }

func lineAt(lines []string, n int) string {
	if n < 1 || n > len(lines) {
		return ""
	}
	return strings.TrimRight(lines[n-1], "\r")
}

// typeError matches the decoder's message for a value of the wrong type.
var typeError = regexp.MustCompile(`^toml: line (\d+) \(last key "([^"]*)"\): (.*)$`)

// decodeError turns a TOML decoding error into a *PolicyError with the
// line and column of the problem.
func decodeError(name, text string, lines []string, err error) error {
	var pe toml.ParseError
	if errors.As(err, &pe) {
		line, col := pe.Position.Line, pe.Position.Col
		if start := pe.Position.Start; start > 0 && start <= len(text) {
			// The byte offset is exact; count lines and columns from it.
			line = strings.Count(text[:start], "\n") + 1
			col = start - strings.LastIndexByte(text[:start], '\n')
		}
		return &PolicyError{File: name, Line: line, Column: col, Msg: pe.Message, Source: lineAt(lines, line)}
	}
	if m := typeError.FindStringSubmatch(err.Error()); m != nil {
		line, _ := strconv.Atoi(m[1])
		src := lineAt(lines, line)
		col := len(src) - len(strings.TrimLeft(src, " \t")) + 1
		key := m[2]
		if i := strings.LastIndexByte(key, '.'); i >= 0 {
			key = key[i+1:]
		}
		return &PolicyError{File: name, Line: line, Column: col, Msg: key + ": " + m[3], Source: src}
	}
	return &PolicyError{File: name, Line: 1, Column: 1, Msg: err.Error(), Source: lineAt(lines, 1)}
}

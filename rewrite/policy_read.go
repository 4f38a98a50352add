package rewrite

import (
	"slices"
	"strings"

	"github.com/BurntSushi/toml"

	"github.com/whittle-search/whittle/parser"
)

// policyReader decodes a well formed policy file value by value, so that
// one value of the wrong type does not hide the problems after it.
type policyReader struct {
	md toml.MetaData
	// at reports a problem at a key.
	at func(key []string, format string, args ...any)
	// dims are the dimensions a query may name.
	dims []string
}

// tomlTypes name the decoder's TOML types as a message says them.
var tomlTypes = map[string]string{"String": "a string", "Integer": "an integer", "Float": "a decimal number", "Bool": "true or false",
	"Datetime": "a date", "Array": "an array", "Hash": "a table", "ArrayHash": "an array of tables"}

// got names the TOML type of the value at key.
func (r *policyReader) got(key []string) string {
	t := r.md.Type(key...)
	if s, ok := tomlTypes[t]; ok {
		return s
	}
	return strings.ToLower(t)
}

// table decodes the table at key, or reports that the value is not one.
func (r *policyReader) table(key []string, p toml.Primitive) (map[string]toml.Primitive, bool) {
	// A table made only by the headers of its subtables ([category.x]
	// makes category) has no type of its own.
	if t := r.md.Type(key...); t != "Hash" && t != "" {
		r.at(key, "%s: want a table, not %s", key[len(key)-1], r.got(key))
		return nil, false
	}
	var t map[string]toml.Primitive
	if err := r.md.PrimitiveDecode(p, &t); err != nil {
		r.at(key, "%s: want a table, not %s", key[len(key)-1], r.got(key))
		return nil, false
	}
	return t, true
}

// unknown reports a key the layout has no place for, with the nearest
// key allowed where it stands.
func (r *policyReader) unknown(key []string) {
	r.at(key, "unknown key %q%s", strings.Join(key, "."), didYouMean(key[len(key)-1], knownKeys(key)))
}

// value decodes the value at key as a T (want says what a T is, for the
// message), or reports that it is not one and returns nil.
func value[T any](r *policyReader, key []string, p toml.Primitive, want string) *T {
	var v T
	if err := r.md.PrimitiveDecode(p, &v); err != nil {
		r.at(key, "%s: want %s, not %s", key[len(key)-1], want, r.got(key))
		return nil
	}
	return &v
}

// values decodes every value of the table at key as a T, reporting each
// that is not one; nil when there is no table.
func values[T any](r *policyReader, key []string, p toml.Primitive, want string) map[string]T {
	t, ok := r.table(key, p)
	if !ok {
		return nil
	}
	out := make(map[string]T, len(t))
	for _, k := range sortedKeys(t) {
		if v := value[T](r, append(slices.Clone(key), k), t[k], want); v != nil {
			out[k] = *v
		}
	}
	return out
}

// strictnesses decodes a table of strictness names at key.
func (r *policyReader) strictnesses(key []string, p toml.Primitive) map[string]parser.Strictness {
	names := values[string](r, key, p, "a strictness: hard, firm, soft or filler")
	if names == nil {
		return nil
	}
	out := make(map[string]parser.Strictness, len(names))
	for _, k := range sortedKeys(names) {
		s, err := parser.ParseStrictness(names[k])
		if err != nil {
			r.at(append(slices.Clone(key), k), "%s: %v", k, err)
			continue
		}
		out[k] = s
	}
	return out
}

// settings decodes one level of the policy (the defaults, a category or
// a product type) at key.
func (r *policyReader) settings(key []string, t map[string]toml.Primitive) settingsTOML {
	var s settingsTOML
	for _, k := range sortedKeys(t) {
		sub := append(slices.Clone(key), k)
		p := t[k]
		switch k {
		case "min_results":
			s.MinResults = value[int](r, sub, p, "a whole number")
		case "colour_tolerance":
			s.ColourTolerance = value[float64](r, sub, p, "a number")
		case "measure_tolerance":
			s.MeasureTolerance = value[float64](r, sub, p, "a number")
		case "price_stretch":
			s.PriceStretch = value[float64](r, sub, p, "a number")
		case "strictness":
			s.Strictness = r.strictnesses(sub, p)
		case "dimensions":
			s.Dimensions = r.strictnesses(sub, p)
		case "standard_sizes":
			s.StandardSizes = values[[]string](r, sub, p, `an array of sizes such as ["8 ft", "10 ft"]`)
		default:
			r.unknown(sub)
		}
	}
	return s
}

// signals decodes the [signals] table.
func (r *policyReader) signals(t map[string]toml.Primitive) signalsTOML {
	var s signalsTOML
	for _, k := range sortedKeys(t) {
		sub := []string{"signals", k}
		p := t[k]
		switch k {
		case "weights":
			s.Weights = values[float64](r, sub, p, "a number")
		case "position_bias":
			s.PositionBias = value[float64](r, sub, p, "a number")
		case "estimate_position_bias":
			s.EstimateBias = value[bool](r, sub, p, "true or false")
		case "join_window":
			s.JoinWindow = value[string](r, sub, p, `a duration such as "30m"`)
		case "min_searches":
			s.MinSearches = value[int](r, sub, p, "a whole number")
		case "keep_share":
			s.KeepShare = value[float64](r, sub, p, "a number")
		default:
			r.unknown(sub)
		}
	}
	return s
}

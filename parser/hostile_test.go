package parser

import (
	"strings"
	"testing"
)

// Each hostile query has a clear outcome: what is read, and the error
// that says why the rest is not. Every result also keeps the
// invariants (spans in bounds and apart, errors that render).
func TestHostileQueries(t *testing.T) {
	for _, tc := range []struct {
		name, query string
		kinds       []Kind // the constraints read, in order (nil: none)
		err         string // a word of the one error expected, or ""
		reason      string
	}{
		{"10,000 spaces", strings.Repeat(" ", 10000), nil, "the limit is 1024", "longer than MaxQueryBytes: refused whole, before any reading"},
		{"a 1 MB line", strings.Repeat("x", 1<<20), nil, "the limit is 1024", "refused whole, in constant time"},
		{"1,000 tokens", strings.TrimSpace(strings.Repeat("q ", 500)), repeat(KindKeyword, 64), "the limit is 64", "500 unknown one-letter words fit in 1,000 bytes; only the first 64 constraints are kept"},
		{"200 exclusions", strings.TrimSpace(strings.Repeat("-red ", 200)), repeat(KindColour, 64), "the limit is 64", "each -red is an excluded colour; the rest past 64 are not read"},
		{"invalid UTF-8", "red \xff\xfe lamp", []Kind{KindColour, KindProductType}, "invalid UTF-8", "the bad bytes are reported at their offset and read as a space"},
		{"NUL and a bell", "red\x00lamp\x07", []Kind{KindColour, KindProductType}, "", "control characters separate words, like spaces"},
		{"right-to-left text", "مصباح أحمر", []Kind{KindKeyword, KindKeyword}, "", "words the lexicon does not know are keywords, not errors"},
		{"right-to-left override", "\u202eevil\u202c dress", []Kind{KindKeyword, KindProductType}, "", "the override marks are part of an unknown word; the type is still read"},
		{"combining marks", "red lamp\u0301\u0301", []Kind{KindColour, KindKeyword}, "", "lamp with two acute accents is not the lexicon's lamp"},
		{"emoji", "🔴 lamp 💡", []Kind{KindProductType}, "", "symbols are not words"},
		{"full-width digits", "１２ ft rope", []Kind{KindMeasure, KindProductType}, "", "full-width digits are read as digits (NFKC)"},
		{"1e309", "1e309 mm", []Kind{KindPartNumber, KindKeyword}, "", "an exponent is not how shoppers write numbers: it is read as a code"},
		{"20 digits", "99999999999999999999 mm", nil, "15 significant digits", "past float64's exact digits: a positioned error, not a wrong number"},
		{"minus zero", "-0 mm bolt", []Kind{KindMeasure, KindProductType}, "", "-0 is read as 0"},
		{"0/0", "0/0", nil, "zero divided by zero", "a fraction with no value"},
		{"1/0", "1/0", nil, "divides by zero", "a fraction with no value"},
		{"unbalanced quote", `"red lamp`, []Kind{KindKeyword}, "never closed", "the phrase runs to the end, and the error says so"},
		{"$$$", "$$$", nil, "", "currency signs without an amount say nothing"},
		{"size size size", "size size size", []Kind{KindKeyword, KindKeyword, KindKeyword}, "", "size is no named size, so no size word takes the next as its value: each is a word"},
		{"only filler", "the of and with for", repeat(KindFiller, 5), "", "filler is tagged as filler, for the planner to drop"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			r := Parse(tc.query)
			checkInvariants(t, tc.query, r)
			var kinds []Kind
			for _, c := range r.Constraints {
				kinds = append(kinds, c.Kind)
			}
			if !equalKinds(kinds, tc.kinds) {
				t.Errorf("read %v, want %v (%s)", kinds, tc.kinds, tc.reason)
			}
			switch {
			case tc.err == "" && len(r.Errors) > 0:
				t.Errorf("errors %v, want none (%s)", r.Errors, tc.reason)
			case tc.err != "" && (len(r.Errors) != 1 || !strings.Contains(r.Errors[0].Msg, tc.err)):
				t.Errorf("errors %v, want one saying %q (%s)", r.Errors, tc.err, tc.reason)
			}
		})
	}
}

func repeat(k Kind, n int) []Kind {
	out := make([]Kind, n)
	for i := range out {
		out[i] = k
	}
	return out
}

func equalKinds(a, b []Kind) bool {
	if len(a) != len(b) {
		return false
	}
	for i := range a {
		if a[i] != b[i] {
			return false
		}
	}
	return true
}

// MaxConstraints in Options raises the limit.
func TestMaxConstraintsOption(t *testing.T) {
	q := strings.TrimSpace(strings.Repeat("-red ", 100))
	if r := ParseWith(q, Options{MaxConstraints: 200}); len(r.Constraints) != 100 || len(r.Errors) != 0 {
		t.Errorf("with a limit of 200: %d constraints, errors %v", len(r.Constraints), r.Errors)
	}
	r := Parse(q)
	if len(r.Constraints) != MaxConstraints || len(r.Errors) != 1 || r.Errors[0].Start != r.Constraints[MaxConstraints-1].End+1 {
		t.Errorf("default: %d constraints, errors %v", len(r.Constraints), r.Errors)
	}
}

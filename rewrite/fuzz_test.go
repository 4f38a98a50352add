package rewrite

import (
	"errors"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/lexicon"
)

// FuzzParsePolicy reads generated policy files. Its seed corpus is the
// embedded policy and the error cases of the tests. A file either reads,
// and then gives an effective policy in range for every category, or
// fails with errors that name a line of the file (or none, for the
// file as a whole) and render with the message.
func FuzzParsePolicy(f *testing.F) {
	f.Add(defaultPolicy)
	for _, s := range []string{"[defaults\nmin_results = 1\n", "[defaults]\nmin_results = \"one\"\n", "[defaults.strictness]\nsize = \"strict\"\n",
		"[category.aparel]\nmin_results = 2\n", "[category.lumber.standard_sizes]\nlength = [\"8 ft\", \"ten\"]\n",
		"[product_type.\"chelsea boot\"]\ncolour_tolerance = 3\n[product_type.\"chelsea boot\".dimensions]\nlength = \"soft\"\n"} {
		f.Add(s)
	}
	lex := lexicon.Default()
	f.Fuzz(func(t *testing.T, text string) {
		p, err := ParsePolicy("f.toml", text, lex)
		lines := strings.Count(text, "\n") + 1
		if err != nil {
			errs := []error{err}
			if j, ok := err.(interface{ Unwrap() []error }); ok {
				errs = j.Unwrap()
			}
			for _, e := range errs {
				var pe *PolicyError
				if !errors.As(e, &pe) {
					t.Fatalf("%q: error %v (%T) is not a *PolicyError", text, e, e)
				}
				if pe.Line < 0 || pe.Line > lines || pe.Column < 0 || pe.Msg == "" {
					t.Fatalf("%q: error at line %d column %d of %d lines: %q", text, pe.Line, pe.Column, lines, pe.Msg)
				}
				if r := pe.Render(); !strings.Contains(r, pe.Msg) {
					t.Fatalf("%q: %q renders as %q", text, pe.Msg, r)
				}
			}
			return
		}
		for _, c := range append([]string{""}, lexicon.Categories()...) {
			e := p.For(c, "", lex)
			if e.MinResults < 1 || e.ColourTolerance < 0 || e.MeasureTolerance < 0 || e.MeasureTolerance > 1 || e.PriceStretch < 0 {
				t.Fatalf("%q: category %q gives %+v", text, c, e)
			}
		}
	})
}

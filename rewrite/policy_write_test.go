package rewrite

import (
	"strings"
	"testing"

	"github.com/google/go-cmp/cmp"
	"github.com/google/go-cmp/cmp/cmpopts"

	"github.com/whittle-search/whittle/lexicon"
)

// Writing a policy and reading it back gives the same settings: the
// built-in policy (every key the layout has) and a small file with a
// quoted product type.
func TestWriteTOMLRoundTrip(t *testing.T) {
	lex := lexicon.Default()
	small, err := ParsePolicy("small.toml", "[product_type.\"rain jacket\".strictness]\ncolour = \"soft\"\n\n[signals.weights]\npurchase = 12.5\n", lex)
	if err != nil {
		t.Fatal(err)
	}
	for _, tc := range []struct {
		name string
		p    *Policy
	}{{"built-in", DefaultPolicy()}, {"small", small}} {
		t.Run(tc.name, func(t *testing.T) {
			var b strings.Builder
			if err := tc.p.WriteTOML(&b); err != nil {
				t.Fatal(err)
			}
			back, err := ParsePolicy("written.toml", b.String(), lex)
			if err != nil {
				t.Fatalf("the written policy does not read back: %v\n%s", err, b.String())
			}
			opts := cmp.Options{cmp.AllowUnexported(Policy{}), cmpopts.IgnoreFields(Policy{}, "Warnings"), cmpopts.EquateEmpty()}
			if diff := cmp.Diff(tc.p, back, opts); diff != "" {
				t.Errorf("read back differs (-written +read):\n%s\n%s", diff, b.String())
			}
		})
	}
}

// A float keeps a decimal point, so TOML reads it as a float, and a
// table appears only when something in it is set.
func TestWriteTOMLLayout(t *testing.T) {
	v := 4.0
	p := &Policy{Categories: map[string]Settings{"apparel": {ColourTolerance: &v}}}
	var b strings.Builder
	if err := p.WriteTOML(&b); err != nil {
		t.Fatal(err)
	}
	if got, want := b.String(), "[category.apparel]\ncolour_tolerance = 4.0\n"; got != want {
		t.Errorf("got %q, want %q", got, want)
	}
}

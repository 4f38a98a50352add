package bleveengine

import (
	"context"
	"fmt"
	"path/filepath"
	"strings"
	"testing"

	"github.com/google/go-cmp/cmp"

	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// A catalog's values are stored by the lexicon's names for them, so a
// plural or an alias the lexicon lists is found as the name a query
// reads; a value the lexicon does not know is indexed as it is and
// reported, with the nearest known value. The products are invented.
func TestCatalogValuesByTheLexiconsNames(t *testing.T) {
	ps := []catalog.Product{
		{ID: "a", Title: "Tarn shell", ProductType: "Rain Jackets", Category: "apparel", Audience: "womens"},
		{ID: "b", Title: "Scree knit", ProductType: "jumper", Material: "merino wool", Category: "apparel"},
		{ID: "c", Title: "Scree wrap", ProductType: "rainwear", Category: "aparel", Measures: map[string]string{"lenght": "30 in"}},
		{ID: "d", Title: "Scree wrap 2", ProductType: "rainwear", Category: "apparel"},
	}
	dir := filepath.Join(t.TempDir(), "idx")
	st, err := BuildProducts(context.Background(), ps, dir, BuildOptions{})
	if err != nil {
		t.Fatal(err)
	}
	want := []Unknown{
		{Field: "category", Value: "aparel", Products: 1, Line: 3, Suggest: "apparel"},
		{Field: "measures.lenght", Value: "lenght", Products: 1, Line: 3, Suggest: "length"},
		{Field: "product_type", Value: "rainwear", Products: 2, Line: 3},
	}
	if diff := cmp.Diff(want, st.Unknown); diff != "" {
		t.Errorf("unknown values (-want +got):\n%s", diff)
	}
	e, err := Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	defer e.Close()
	for _, tc := range []struct {
		name   string
		clause rewrite.Clause
		want   int
		reason string
	}{
		{"plural type", rewrite.Clause{Field: "product_type", Values: []string{"rain jacket"}}, 1, `"Rain Jackets" is the lexicon's rain jacket`},
		{"alias type", rewrite.Clause{Field: "product_type", Values: []string{"sweater"}}, 1, `"jumper" is an alias of sweater`},
		{"alias material", rewrite.Clause{Field: "material", Values: []string{"merino"}}, 1, `"merino wool" is an alias of merino`},
		{"alias audience", rewrite.Clause{Field: "audience", Values: []string{"women"}}, 1, `"womens" is an alias of women`},
		{"unknown type as it is", rewrite.Clause{Field: "product_type", Values: []string{"rainwear"}}, 2, "an unknown value is kept as written"},
	} {
		n, err := e.Count(context.Background(), rewrite.Plan{Clauses: []rewrite.Clause{tc.clause}})
		if err != nil {
			t.Fatal(err)
		}
		if n != tc.want {
			t.Errorf("%s: %d products, want %d (%s)", tc.name, n, tc.want, tc.reason)
		}
	}
}

// The demo catalog uses only values whittle knows.
func TestDemoCatalogIsKnown(t *testing.T) {
	st, err := BuildProducts(context.Background(), catalog.Demo(3000, 1), filepath.Join(t.TempDir(), "idx"), BuildOptions{})
	if err != nil {
		t.Fatal(err)
	}
	if len(st.Unknown) > 0 {
		t.Errorf("the demo catalog has values whittle does not know: %+v", st.Unknown)
	}
}

// However many unknown values a catalog has, a build keeps at most
// unknownCap of a field, and of all measure dimensions together, then
// counts the rest in one entry.
func TestUnknownValuesAreBounded(t *testing.T) {
	tl := newTally()
	for i := range 3 * unknownCap {
		tl.note("product_type", fmt.Sprintf("made-up type %d", i), i+1)
		tl.note(fmt.Sprintf("measures.dim%d", i), fmt.Sprintf("dim%d", i), i+1)
	}
	byField := map[string]int{}
	rest := map[string]int{}
	for _, u := range tl.byKey {
		f, _, _ := strings.Cut(u.Field, ".")
		byField[f]++
		if u.Value == "…" {
			rest[u.Field] = u.Products
		}
	}
	// unknownCap values kept a family, and one entry for the rest.
	if want := map[string]int{"product_type": unknownCap + 1, "measures": unknownCap + 1}; !cmp.Equal(byField, want) {
		t.Errorf("entries by field = %v, want %v", byField, want)
	}
	if want := map[string]int{"product_type": 2 * unknownCap, "measures": 2 * unknownCap}; !cmp.Equal(rest, want) {
		t.Errorf("products in the rest = %v, want %v", rest, want)
	}
}

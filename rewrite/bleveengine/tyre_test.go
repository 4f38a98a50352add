package bleveengine

import (
	"context"
	"path/filepath"
	"slices"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// A tyre's size is the first part of its designation; its service
// description (load index and speed symbol, ISO 4000-1) and a load
// version such as XL say what load and speed it is built for. A query for
// the size alone finds the size however the shop lists it; a query that
// names a service description or a load version wants it, since a lower
// load index, a lower speed symbol or a standard-load tyre is no
// substitute (common practice: fit at least what the vehicle's maker
// specifies). The shop is invented.
func TestTyreServiceDescription(t *testing.T) {
	ps := []catalog.Product{
		{ID: "TY-1", Title: "Orvanta touring tyre 205/55R16 91V", ProductType: "tyre", Spec: []string{"205/55R16 91V"}},
		{ID: "TY-2", Title: "Orvanta touring tyre 205/55R16 94V XL", ProductType: "tyre", Spec: []string{"205/55R16 94V"}},
		{ID: "TY-3", Title: "Kessendry all season tyre 205/55R16", ProductType: "tyre", Spec: []string{"205/55R16"}},
		{ID: "TY-4", Title: "Kessendry sport tyre 225/45R17 94W", ProductType: "tyre", Spec: []string{"225/45R17 94W"}},
		{ID: "JK-1", Title: "Ardlow rain jacket xl", ProductType: "rain jacket", Sizes: []string{"xl"}},
	}
	e := openProducts(t, ps)
	rw := rewrite.New(e, nil)
	for _, tc := range []struct {
		query, reason string
		want          []string
		carried       string
	}{
		{"205/55r16 tyres", "the size alone finds every 205/55R16, with a service description or without", []string{"TY-1", "TY-2", "TY-3"}, ""},
		{"205/55r16 91v", "the service description asked for: only TY-1 has 91V", []string{"TY-1"}, ""},
		{"205/55r16 87h", "a lower load index and speed symbol than any carried: nothing, and what is carried is named", nil, "205/55r16 91v"},
		{"225/45r17", "the size alone", []string{"TY-4"}, ""},
		{"205/55r16 xl", "XL is the tyre's load version, in its words, not a clothing size; it is never dropped", []string{"TY-2"}, ""},
		{"tyres 94w", "a service description written apart from the size is no voltage", []string{"TY-4"}, ""},
	} {
		t.Run(tc.query, func(t *testing.T) {
			o, got := rescuedIDs(t, e, rw, tc.query)
			if !slices.Equal(got, tc.want) {
				t.Errorf("%s: found %v, want %v\n%s", tc.reason, got, tc.want, o.Explanation)
			}
			for _, r := range o.Relaxations {
				if r.Kind == "spec" || strings.EqualFold(r.Text, "xl") {
					t.Errorf("relaxed %+v: a tyre's size, service description and load version are hard", r)
				}
			}
			if tc.carried != "" {
				var carried []string
				for _, m := range o.Missing {
					carried = append(carried, m.Carried...)
				}
				if !slices.Contains(carried, tc.carried) {
					t.Errorf("carried = %v, want it to name %q", carried, tc.carried)
				}
			}
		})
	}
}

// "60 watt equivalent" asks for an LED bulb as bright as a 60 W
// incandescent one, which draws about 9 W (common practice); a bulb's
// power is hard, so read as a power it would find no LED bulb. It is
// matched in the words a shop writes. The shop is invented.
func TestEquivalentWattage(t *testing.T) {
	ps := []catalog.Product{
		{ID: "LB-1", Title: "Brenvale LED bulb 60W equivalent, 9 W", ProductType: "led bulb", Measures: map[string]string{"power": "9 W"}},
		{ID: "LB-2", Title: "Brenvale LED bulb 100W equivalent, 14 W", ProductType: "led bulb", Measures: map[string]string{"power": "14 W"}},
		{ID: "LB-3", Title: "Brenvale incandescent bulb 60 W", ProductType: "light bulb", Measures: map[string]string{"power": "60 W"}},
	}
	e := openProducts(t, ps)
	o, err := rewrite.New(e, nil).Rescue(context.Background(), "led bulb 60 watt equivalent")
	if err != nil {
		t.Fatal(err)
	}
	hits, err := e.Search(context.Background(), o.Plan, 10)
	if err != nil {
		t.Fatal(err)
	}
	if !o.Exact || len(hits) != 1 || hits[0].ID != "LB-1" {
		t.Errorf("exact %v, hits %+v; want LB-1 as typed\n%s", o.Exact, hits, o.Explanation)
	}
}

// openProducts indexes ps in a temporary directory and opens the index,
// closed when the test ends.
// rescuedIDs rescues query and returns the outcome and the ids of the
// first ten products its plan finds, sorted; none when it counts none.
func rescuedIDs(t *testing.T, e *Engine, rw *rewrite.Rewriter, query string) (*rewrite.Outcome, []string) {
	t.Helper()
	o, err := rw.Rescue(context.Background(), query)
	if err != nil {
		t.Fatal(err)
	}
	var got []string
	if o.Count > 0 {
		hits, err := e.Search(context.Background(), o.Plan, 10)
		if err != nil {
			t.Fatal(err)
		}
		for _, h := range hits {
			got = append(got, h.ID)
		}
		slices.Sort(got)
	}
	return o, got
}

// openProducts indexes ps in a temporary directory and opens it.
func openProducts(t *testing.T, ps []catalog.Product) *Engine {
	t.Helper()
	dir := filepath.Join(t.TempDir(), "idx")
	if _, err := BuildProducts(context.Background(), ps, dir, BuildOptions{}); err != nil {
		t.Fatal(err)
	}
	e, err := Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	t.Cleanup(func() { e.Close() })
	return e
}

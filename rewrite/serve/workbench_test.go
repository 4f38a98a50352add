package serve

import (
	"net/http"
	"net/url"
	"strings"
	"testing"
)

// The workbench page, drawn on the server for a GET: on the test shop
// (testdata/catalog/shop.jsonl, worked out in rewrite/bleveengine's
// tests) "mustard rain jacket" widens mustard to harvest gold and shows
// RJ-1; with the tolerance tried at 0 the colour is dropped and the
// three rain jackets show.
func TestWorkbench(t *testing.T) {
	s := newServer(t, openShop(t), Limits{}, nil, false)
	for _, tc := range []struct {
		name   string
		form   url.Values
		want   []string
		absent []string
		reason string
	}{
		{"empty form", nil, []string{`<form method="get"`, `name="q"`, `<option value="apparel"`}, []string{`id="spans"`, `id="steps"`},
			"no query: the form alone"},
		{"a rescue", url.Values{"q": {"mustard rain jacket"}}, []string{
			`data-kind="colour"><span>mustard</span><small>colour · firm</small>`,
			`data-kind="product_type"><span>rain jacket</span>`,
			`id="steps"`, "the query as typed", "widen colour “mustard”",
			"Showing rain jackets in colours close to mustard", "<td>RJ-1</td>", `id="baseline"`, "blind partial match (2 of 3 words, 3)",
			`name="colour_tolerance" min="0" max="20" step="0.5" value="4"`,
		}, nil, "apparel's colour tolerance, 4, is what the slider shows"},
		{"a setting tried", url.Values{"q": {"mustard rain jacket"}, "tune": {"1"}, "colour_tolerance": {"0"}, "min_results": {"1"}}, []string{
			"Showing rain jackets in any colour", "<td>RJ-2</td>", "<td>RJ-3</td>", `id="tune" name="tune" value="1" checked`,
		}, []string{"colours close to mustard"}, "at ΔE00 0 no shop colour is near mustard, so the colour is dropped"},
		{"a setting not ticked", url.Values{"q": {"mustard rain jacket"}, "colour_tolerance": {"0"}}, []string{"colours close to mustard"}, nil,
			"the sliders apply only when the box is ticked"},
		{"a query too long", url.Values{"q": {strings.Repeat("x", 2000)}}, []string{`id="problem"`, "at most 1024"}, []string{`id="steps"`},
			"the query limit holds on the page too"},
		{"nothing to search for", url.Values{"q": {"!!!"}}, []string{`id="problem"`, "no word or number to search for"}, []string{`id="steps"`, "<td>RJ-1</td>"},
			"punctuation alone is refused, not answered with the whole shop"},
		{"an unknown category", url.Values{"q": {"lens"}, "category": {"kameras"}}, []string{`id="problem"`}, []string{`id="steps"`},
			"an unknown category is named, not used"},
		{"markup in the query", url.Values{"q": {"<b>lamp</b>"}}, []string{"&lt;b&gt;"}, []string{"<b>lamp"}, "the query is escaped"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			w := do(s.Handler(), http.MethodGet, Prefix+"workbench?"+tc.form.Encode(), "")
			body := w.Body.String()
			if w.Code != http.StatusOK || !strings.HasPrefix(w.Header().Get("Content-Type"), "text/html") {
				t.Fatalf("status %d, type %q", w.Code, w.Header().Get("Content-Type"))
			}
			for _, s := range tc.want {
				if !strings.Contains(body, s) {
					t.Errorf("%s: the page lacks %q", tc.reason, s)
				}
			}
			for _, s := range tc.absent {
				if strings.Contains(body, s) {
					t.Errorf("%s: the page holds %q", tc.reason, s)
				}
			}
			for _, bad := range []string{"<script", "src=", "href=", "@import", "url("} {
				if strings.Contains(body, bad) {
					t.Errorf("the page holds %q: it must need nothing from the network, nor JavaScript", bad)
				}
			}
		})
	}
}

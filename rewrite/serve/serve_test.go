package serve

import (
	"bytes"
	"fmt"
	"net/http"
	"slices"
	"strings"
	"testing"
	"time"

	"github.com/whittle-search/whittle/rewrite/bleveengine"
)

func TestParse(t *testing.T) {
	s := newServer(t, openShop(t), Limits{}, nil, false)
	// The README's own reading of this query: six constraints, apparel,
	// the size hard and the colour, type and price firm.
	w := do(s.Handler(), http.MethodPost, Prefix+"parse", `{"query": "charcoal merino crew sweater size l under $90"}`)
	if w.Code != http.StatusOK {
		t.Fatalf("status %d: %s", w.Code, w.Body)
	}
	var got struct {
		Category    string
		Constraints []struct{ Kind, Text, Strictness string }
		Errors      []any
	}
	decodeBody(t, w, &got)
	want := [][3]string{{"colour", "charcoal", "firm"}, {"material", "merino", "soft"}, {"silhouette", "crew", "soft"},
		{"product_type", "sweater", "firm"}, {"size", "size l", "hard"}, {"price", "under $90", "firm"}}
	var seen [][3]string
	for _, c := range got.Constraints {
		seen = append(seen, [3]string{c.Kind, c.Text, c.Strictness})
	}
	if got.Category != "apparel" || !slices.Equal(seen, want) || len(got.Errors) != 0 {
		t.Errorf("reading %+v; want apparel and %v", got, want)
	}
}

func TestParseCategoryAndErrorSpans(t *testing.T) {
	s := newServer(t, openShop(t), Limits{}, nil, false)
	// The category asked for is kept (lens is camera too), and the bad
	// part keeps its span in the reading, as in whittle explain --json.
	w := do(s.Handler(), http.MethodPost, Prefix+"parse", `{"query": "1/0 lens", "category": "camera"}`)
	var got struct {
		Category string
		Errors   []struct{ Start, End int }
	}
	decodeBody(t, w, &got)
	// "1/0" is bytes 0 to 3 of the query, and divides by zero (README).
	if w.Code != http.StatusOK || got.Category != "camera" || len(got.Errors) != 1 || got.Errors[0].Start != 0 || got.Errors[0].End != 3 {
		t.Errorf("status %d, %+v; want camera and one error at 0-3", w.Code, got)
	}
}

// rescued is the part of the search contract the tests check.
type rescued struct {
	ExactCount int `json:"exact_count"`
	Chosen     struct {
		Relaxations []struct{ Op, Kind string }
		Count       int
	}
	Hits     []struct{ ID string }
	Baseline *bleveengine.Baseline
}

func TestRescue(t *testing.T) {
	s := newServer(t, openShop(t), Limits{}, nil, false)
	for _, tc := range []struct {
		name, body string
		exact      int
		ops        []string
		ids        []string
		reason     string
	}{
		{"widen colour", `{"query": "mustard rain jacket"}`, 0, []string{"widen colour"}, []string{"RJ-1"},
			"harvest gold (RJ-1, #dfaa0a) is the one catalog colour within apparel's ΔE00 4 of mustard"},
		{"tuned tolerance", `{"query": "mustard rain jacket", "tuning": {"colour_tolerance": 0}}`, 0, []string{"drop colour"}, []string{"RJ-1", "RJ-2", "RJ-3"},
			"with a tolerance of 0 no other colour is close enough, so the firm colour is dropped after widening fails: the three rain jackets"},
		{"spec stays hard", `{"query": "14 awg wire", "tuning": {"measure_tolerance": 1, "colour_tolerance": 100, "price_stretch": 10}}`, 0, nil, nil,
			"WR-1 is 12 awg; a gauge is never widened, whatever the tuning"},
		{"exact", `{"query": "womens rain jacket size m", "hits": 1}`, 2, nil, []string{"RJ-1"},
			"RJ-1 and RJ-2 are women's rain jackets in m; one hit asked for, the first by id"},
		{"category of the search", `{"query": "korvane", "category": "apparel", "hits": 0}`, 2, nil, nil,
			"korvane makes RJ-1 and RJ-2; no hits asked for"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			w := do(s.Handler(), http.MethodPost, Prefix+"rescue", tc.body)
			if w.Code != http.StatusOK {
				t.Fatalf("status %d: %s", w.Code, w.Body)
			}
			var got rescued
			decodeBody(t, w, &got)
			var ops, ids []string
			for _, r := range got.Chosen.Relaxations {
				ops = append(ops, r.Op+" "+r.Kind)
			}
			for _, h := range got.Hits {
				ids = append(ids, h.ID)
			}
			if got.ExactCount != tc.exact || !slices.Equal(ops, tc.ops) || !slices.Equal(ids, tc.ids) || got.Baseline != nil {
				t.Errorf("%s: exact %d, ops %v, hits %v; want %d, %v, %v", tc.reason, got.ExactCount, ops, ids, tc.exact, tc.ops, tc.ids)
			}
		})
	}
}

func TestRescueBaseline(t *testing.T) {
	s := newServer(t, openShop(t), Limits{}, nil, false)
	w := do(s.Handler(), http.MethodPost, Prefix+"rescue", `{"query": "trail running shoes size 13", "baseline": true}`)
	var got rescued
	decodeBody(t, w, &got)
	// Sizes 7 to 12 only and size is hard: whittle finds nothing, while
	// the blind match drops words of the five until something matches.
	if got.Chosen.Count != 0 || got.Baseline == nil || got.Baseline.Words != 5 || got.Baseline.Count == 0 || got.Baseline.Fallback != bleveengine.MostWords {
		t.Errorf("count %d, baseline %+v; want 0 beside a most-words baseline of 5 words that finds something", got.Chosen.Count, got.Baseline)
	}
	// Dropping words from the end of "ember trail running shoe size 12"
	// loses 12 and size (no product's text has "size") and finds TR-2,
	// the ember shoe in 8 to 10 (shop.jsonl).
	w = do(s.Handler(), http.MethodPost, Prefix+"rescue", `{"query": "ember trail running shoe size 12", "baseline": true, "fallback": "drop-trailing"}`)
	got = rescued{}
	decodeBody(t, w, &got)
	if b := got.Baseline; b == nil || b.Fallback != bleveengine.DropTrailing || b.Kept != 4 || b.Count != 1 || len(b.Hits) != 1 || b.Hits[0].ID != "TR-2" {
		t.Errorf("drop-trailing baseline %+v, want 4 of 6 words kept and TR-2 alone", b)
	}
}

// The statuses follow RFC 9110 (HTTP Semantics): 400 for a request the
// server will not process (15.5.1), 404 (15.5.5), 405 with an Allow
// header listing the methods the endpoint takes (15.5.6, 10.2.1), 413
// for content larger than the server will take (15.5.14). The codes and
// messages are whittle's own.
func TestErrors(t *testing.T) {
	s := newServer(t, openShop(t), Limits{MaxBodyBytes: 200, MaxQueryBytes: 40}, nil, false)
	long := strings.Repeat("a", 45)
	for _, tc := range []struct {
		name, method, path, body string
		code                     Code
		status                   int
		span                     *Span
		reason                   string
	}{
		{"bad json", "POST", "parse", `{"query": `, CodeBadJSON, 400, nil, "the object is cut short"},
		{"unknown field", "POST", "rescue", `{"query": "rug", "strictness": {"spec": "soft"}}`, CodeBadJSON, 400, nil, "a request cannot set strictness"},
		{"strictness in tuning", "POST", "rescue", `{"query": "rug", "tuning": {"strictness": {"spec": "soft"}}}`, CodeBadJSON, 400, nil, "nor in the tuning"},
		{"two values", "POST", "parse", `{"query": "rug"} {}`, CodeBadJSON, 400, nil, "one object only"},
		{"body too large", "POST", "parse", `{"query": "` + strings.Repeat("x", 300) + `"}`, CodeBodyTooLarge, 413, nil, "over the 200 bytes allowed"},
		{"query too long", "POST", "rescue", `{"query": "` + long + `"}`, CodeQueryTooLong, 400, &Span{40, 45}, "45 bytes, 40 allowed: the span is what lies past the limit"},
		{"query empty", "POST", "parse", `{"query": "  "}`, CodeQueryEmpty, 400, nil, "blank"},
		{"unreadable", "POST", "rescue", `{"query": "1/0 rug"}`, CodeQueryUnreadable, 400, &Span{0, 3}, "1/0 divides by zero at bytes 0-3"},
		{"punctuation only", "POST", "rescue", `{"query": "!!!"}`, CodeQueryUnreadable, 400, &Span{0, 3}, "nothing to search for: a plan of no clause would answer the whole shop"},
		{"filler only", "POST", "rescue", `{"query": " nice "}`, CodeQueryUnreadable, 400, &Span{1, 5}, "a filler word asks for nothing; the span leaves the outer blanks out"},
		{"blank in other blanks", "POST", "rescue", `{"query": "\u3000\u200b"}`, CodeQueryEmpty, 400, nil, "a zero-width space is no space to strings.TrimSpace, so the service's own check lets it by: the library finds the query empty"},
		{"unknown category", "POST", "parse", `{"query": "rug", "category": "garden"}`, CodeUnknownCategory, 400, nil, "not a lexicon category"},
		{"unknown category of policy", "GET", "policy?category=garden", "", CodeUnknownCategory, 400, nil, "not a lexicon category"},
		{"unknown product type", "GET", "policy?product_type=zorblax", "", CodeUnknownProductType, 400, nil, "not in the lexicon"},
		{"category contradicts product type", "GET", "policy?category=paint&product_type=rain%20jacket", "", CodeCategoryMismatch, 400, nil,
			"a rain jacket is apparel (lexicon/data/product_types.wlx), not paint"},
		{"bad tuning", "POST", "rescue", `{"query": "rug", "tuning": {"min_results": 0}}`, CodeBadTuning, 400, nil, "min_results runs from 1"},
		{"bad hits", "POST", "rescue", `{"query": "rug", "hits": 101}`, CodeBadHits, 400, nil, "100 at most by default"},
		{"unknown fallback", "POST", "rescue", `{"query": "rug", "baseline": true, "fallback": "last"}`, CodeBadFallback, 400, nil, "most-words and drop-trailing are the names"},
		{"fallback without baseline", "POST", "rescue", `{"query": "rug", "fallback": "drop-trailing"}`, CodeBadFallback, 400, nil, "a fallback runs only beside the rescue"},
		{"method not allowed", "GET", "rescue", "", CodeMethodNotAllowed, 405, nil, "rescue takes POST"},
		{"method not allowed on policy", "DELETE", "policy", "", CodeMethodNotAllowed, 405, nil, "the policy is read-only"},
		{"not found", "GET", "explain", "", CodeNoEndpoint, 404, nil, "no such endpoint"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			w := do(s.Handler(), tc.method, Prefix+tc.path, tc.body)
			e := errorOf(t, w)
			if w.Code != tc.status || e.Code != tc.code || e.Message == "" || fmt.Sprint(e.Span) != fmt.Sprint(tc.span) {
				t.Errorf("%s: status %d, %+v; want %d, %s, span %v", tc.reason, w.Code, e, tc.status, tc.code, tc.span)
			}
			if ct := w.Header().Get("Content-Type"); ct != "application/json" {
				t.Errorf("content type %q", ct)
			}
			if tc.status == 405 && w.Header().Get("Allow") == "" {
				t.Error("405 without Allow")
			}
		})
	}
}

// 504 is the status of a gateway that did not get an answer in time
// (RFC 9110, 15.6.5): here the index, behind the service.
func TestDeadlinePassed(t *testing.T) {
	// A deadline of a nanosecond has passed before the first count, so
	// the planner has no plan at all to give back.
	s := newServer(t, openShop(t), Limits{Deadline: time.Nanosecond}, nil, false)
	w := do(s.Handler(), http.MethodPost, Prefix+"rescue", `{"query": "mustard rain jacket"}`)
	if e := errorOf(t, w); w.Code != http.StatusGatewayTimeout || e.Code != CodeDeadlinePassed {
		t.Errorf("status %d, %+v; want 504 %s", w.Code, e, CodeDeadlinePassed)
	}
}

func TestDeadlineStopsThePlanner(t *testing.T) {
	for _, tc := range []struct {
		name   string
		counts int32
		status int
		code   Code
		reason string
	}{
		{"at the hard constraints", 1, 200, "",
			"mustard rain jacket finds nothing as typed (count 1); the deadline passes while the hard constraints alone are counted, so the query as typed, the best plan counted, is answered with a note"},
		{"in the search", 4, 200, "",
			"the query as typed, the hard constraints alone, mustard alone and rain jacket alone are counted; the deadline passes at the first widening, and the best plan so far is answered with a note"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			g := &gated{Engine: openShop(t), stallAfter: tc.counts}
			s := newServer(t, g, Limits{Deadline: 20 * time.Millisecond}, nil, false)
			w := do(s.Handler(), http.MethodPost, Prefix+"rescue", `{"query": "mustard rain jacket"}`)
			if w.Code != tc.status {
				t.Fatalf("%s: status %d, %s", tc.reason, w.Code, w.Body)
			}
			if tc.code != "" {
				if e := errorOf(t, w); e.Code != tc.code {
					t.Errorf("%s: %+v", tc.reason, e)
				}
				return
			}
			var got struct{ Note string }
			decodeBody(t, w, &got)
			if !strings.Contains(got.Note, "deadline") {
				t.Errorf("%s: note %q", tc.reason, got.Note)
			}
		})
	}
}

// RFC 9110: 503 means the server is overloaded for now (15.6.4), and
// Retry-After may be a whole number of seconds to wait (10.2.3).
func TestInFlightCap(t *testing.T) {
	g := &gated{Engine: openShop(t), entered: make(chan struct{}, 1), release: make(chan struct{})}
	s := newServer(t, g, Limits{MaxInFlight: 1, RetryAfter: 3 * time.Second}, nil, false)
	first := make(chan int)
	go func() {
		first <- do(s.Handler(), http.MethodPost, Prefix+"rescue", `{"query": "rug"}`).Code
	}()
	<-g.entered // the first request holds the only slot
	w := do(s.Handler(), http.MethodPost, Prefix+"parse", `{"query": "rug"}`)
	if e := errorOf(t, w); w.Code != 503 || e.Code != CodeBusy || w.Header().Get("Retry-After") != "3" {
		t.Errorf("status %d, %+v, Retry-After %q; want 503 busy, 3", w.Code, e, w.Header().Get("Retry-After"))
	}
	if h := do(s.Handler(), http.MethodGet, Prefix+"health", ""); h.Code != 200 {
		t.Errorf("health under load: %d; probes are not capped", h.Code)
	}
	g.entered = nil
	close(g.release)
	if code := <-first; code != 200 {
		t.Errorf("the first request: %d", code)
	}
	if w := do(s.Handler(), http.MethodPost, Prefix+"parse", `{"query": "rug"}`); w.Code != 200 {
		t.Errorf("after the slot is freed: %d", w.Code)
	}
}

func TestPanicRecovered(t *testing.T) {
	var log bytes.Buffer
	s := newServer(t, &gated{Engine: openShop(t), panics: true}, Limits{}, &log, false)
	w := do(s.Handler(), http.MethodPost, Prefix+"rescue", `{"query": "rug"}`)
	if e := errorOf(t, w); w.Code != 500 || e.Code != CodeServerFault || strings.Contains(w.Body.String(), "goroutine") {
		t.Errorf("status %d, %q; want 500 server_fault without a stack", w.Code, w.Body)
	}
	if !strings.Contains(log.String(), "a failing engine") {
		t.Errorf("the panic is not logged: %s", log.String())
	}
}

func TestPolicy(t *testing.T) {
	s := newServer(t, openShop(t), Limits{}, nil, false)
	for _, tc := range []struct {
		query  string
		colour string
		tol    float64
		spec   string
		reason string
	}{
		{"category=paint", "hard", 2, "hard", "paint colour is hard at ΔE00 2 (README, the built-in policy)"},
		{"category=apparel&product_type=sweater", "firm", 4, "hard", "apparel's tolerance is 4; colour keeps its firm default"},
		{"", "firm", 5, "hard", "the defaults: [defaults] colour_tolerance = 5.0 (README)"},
		{"product_type=rain%20jacket", "firm", 4, "hard", "a rain jacket brings its category, apparel (lexicon/data/product_types.wlx), and apparel's 4"},
	} {
		t.Run(tc.query, func(t *testing.T) {
			w := do(s.Handler(), http.MethodGet, Prefix+"policy?"+tc.query, "")
			var got struct {
				ColourTolerance float64           `json:"colour_tolerance"`
				Strictness      map[string]string `json:"strictness"`
			}
			decodeBody(t, w, &got)
			if got.Strictness["colour"] != tc.colour || got.ColourTolerance != tc.tol || got.Strictness["spec"] != tc.spec {
				t.Errorf("%s: %+v", tc.reason, got)
			}
		})
	}
}

func TestHealthReadyMetrics(t *testing.T) {
	s := newServer(t, openShop(t), Limits{}, nil, false)
	h := s.Handler()
	for _, p := range []string{"health", "ready"} {
		if w := do(h, "GET", Prefix+p, ""); w.Code != 200 {
			t.Errorf("%s: %d", p, w.Code)
		}
	}
	do(h, "POST", Prefix+"rescue", `{"query": "mustard rain jacket"}`) // widened: found nothing as typed
	do(h, "POST", Prefix+"rescue", `{"query": "14 awg wire"}`)         // nothing even after rescue
	do(h, "POST", Prefix+"rescue", `{"query": "rug"}`)                 // RG-1, as typed
	do(h, "GET", Prefix+"rescue", "")                                  // an error
	w := do(h, "GET", Prefix+"metrics", "")
	body := w.Body.String()
	for _, line := range []string{
		`whittle_requests_total{endpoint="rescue",status="200"} 3`,
		`whittle_errors_total{code="method_not_allowed",endpoint="rescue"} 1`,
		`whittle_request_duration_seconds_count{endpoint="rescue"} 4`,
		`whittle_rescue_relaxations_total{operator="widen"} 1`,
		`whittle_rescue_queries_total 3`,
		`whittle_rescue_zero_as_typed_total 2`,
		`whittle_rescue_zero_results_total 1`,
		`whittle_rescue_zero_result_ratio 0.3333333333333333`, // 1 of 3
	} {
		if !strings.Contains(body, line+"\n") {
			t.Errorf("metrics lack %q", line)
		}
	}
	// Prometheus's text-based exposition format is served as text/plain
	// (version=0.0.4), per its "Exposition formats" documentation.
	if !strings.HasPrefix(w.Header().Get("Content-Type"), "text/plain") {
		t.Errorf("metrics content type %q; want the text format", w.Header().Get("Content-Type"))
	}
}

// Keeping search text out of request logs unless allowed is common
// practice, since shoppers paste names, addresses and order numbers into
// search boxes.
func TestLogPrivacy(t *testing.T) {
	for _, tc := range []struct {
		name  string
		allow bool
	}{{"queries kept out", false}, {"queries allowed", true}} {
		t.Run(tc.name, func(t *testing.T) {
			var log bytes.Buffer
			s := newServer(t, openShop(t), Limits{}, &log, tc.allow)
			do(s.Handler(), "POST", Prefix+"parse", `{"query": "mustard rain jacket"}`)
			lines := strings.Split(strings.TrimSpace(log.String()), "\n")
			if len(lines) != 1 || !strings.Contains(lines[0], `"endpoint":"parse"`) || !strings.Contains(lines[0], `"status":200`) {
				t.Errorf("log %q; want one line for the request", log.String())
			}
			if got := strings.Contains(log.String(), "mustard"); got != tc.allow {
				t.Errorf("query in the log: %v; want %v", got, tc.allow)
			}
		})
	}
}

// A field of the wrong type is named in the body's terms, not in the
// server's Go types.
func TestWrongTypeNamesTheField(t *testing.T) {
	s := newServer(t, openShop(t), Limits{}, nil, false)
	w := do(s.Handler(), http.MethodPost, Prefix+"rescue", `{"query": 5}`)
	e := errorOf(t, w)
	if w.Code != http.StatusBadRequest || e.Code != CodeBadJSON || !strings.Contains(e.Message, `"query" is a JSON number`) || strings.Contains(e.Message, "Go") {
		t.Errorf("status %d, %+v", w.Code, e)
	}
}

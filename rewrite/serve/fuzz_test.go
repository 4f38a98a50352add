package serve

import (
	"encoding/json"
	"net/http"
	"testing"
)

// FuzzEndpointBodies posts generated bodies to the parse and rescue
// endpoints. Whatever the body, the answer is 200 with a JSON object, or
// a 4xx or 5xx whose body is an error object with a code and a message,
// and a span, when there is one, that lies within the query; never a
// panic, never a server fault.
func FuzzEndpointBodies(f *testing.F) {
	for _, b := range []string{`{"query": "mustard rain jacket"}`, `{"query": "85 lens", "category": "camera"}`,
		`{"query": "rain jacket", "tuning": {"colour_tolerance": 8, "min_results": 2}, "baseline": true}`,
		`{"query": "0/0 lens"}`, `{"query": ""}`, `{"query": 5}`, `{`, `[]`, `{"query": "x", "extra": 1}`,
		`{"query": "14 awg wire", "tuning": {"measure_tolerance": 1}}`} {
		f.Add(b, true)
		f.Add(b, false)
	}
	s := newServer(f, openShop(f), Limits{}, nil, false)
	h := s.Handler()
	f.Fuzz(func(t *testing.T, body string, rescue bool) {
		path := Prefix + "parse"
		if rescue {
			path = Prefix + "rescue"
		}
		w := do(h, http.MethodPost, path, body)
		var any map[string]json.RawMessage
		if err := json.Unmarshal(w.Body.Bytes(), &any); err != nil {
			t.Fatalf("%s %q: status %d, body %q is not a JSON object", path, body, w.Code, w.Body)
		}
		if w.Code == http.StatusOK {
			return
		}
		var e struct {
			Error Error `json:"error"`
		}
		json.Unmarshal(w.Body.Bytes(), &e)
		if e.Error.Code == "" || e.Error.Message == "" || e.Error.Code == CodeServerFault || w.Code >= 500 && w.Code != http.StatusServiceUnavailable && w.Code != http.StatusGatewayTimeout {
			t.Fatalf("%s %q: status %d, error %+v", path, body, w.Code, e.Error)
		}
		var req struct{ Query string }
		json.Unmarshal([]byte(body), &req)
		if sp := e.Error.Span; sp != nil && (sp.Start < 0 || sp.End < sp.Start || sp.End > len(req.Query)) {
			t.Fatalf("%s %q: span %+v outside the query of %d bytes", path, body, *sp, len(req.Query))
		}
	})
}

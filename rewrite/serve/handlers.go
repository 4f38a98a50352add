package serve

import (
	"context"
	"encoding/json"
	"errors"
	"fmt"
	"net/http"
	"strings"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
)

// ParseRequest is the body of POST /whittle/v1/parse.
type ParseRequest struct {
	Query string `json:"query"`
	// Category, when set, reads the query as being in that category, as
	// `whittle explain --category` does.
	Category string `json:"category,omitempty"`
}

// RescueRequest is the body of POST /whittle/v1/rescue.
type RescueRequest struct {
	Query string `json:"query"`
	// Category is the category the shopper searched in, used when the
	// query names no product type of its own.
	Category string `json:"category,omitempty"`
	// Hits is how many hits to show (10 when absent; 0 to 100 by
	// default).
	Hits *int `json:"hits,omitempty"`
	// Baseline also runs the blind partial match, for comparison.
	Baseline bool `json:"baseline,omitempty"`
	// Fallback names the blind partial match Baseline runs, one of
	// bleveengine.Fallback's names ("most-words" when absent).
	Fallback string `json:"fallback,omitempty"`
	// Tuning changes the policy's numbers for this request only; it can
	// set no strictness.
	Tuning rewrite.Tuning `json:"tuning"`
}

// decode reads the body into v: one JSON object of known fields.
func decode(r *http.Request, v any) *Error {
	dec := json.NewDecoder(r.Body)
	dec.DisallowUnknownFields()
	err := dec.Decode(v)
	if err == nil && dec.More() {
		err = errors.New("more than one JSON value")
	}
	var tooBig *http.MaxBytesError
	var wrongType *json.UnmarshalTypeError
	switch {
	case errors.As(err, &tooBig):
		return errorf(CodeBodyTooLarge, fmt.Sprintf("the body is over %d bytes", tooBig.Limit))
	case errors.As(err, &wrongType) && wrongType.Field != "":
		// Said in the body's own terms, not the decoder's Go types.
		return errorf(CodeBadJSON, fmt.Sprintf("the body's %q is a JSON %s, which that field cannot hold", wrongType.Field, wrongType.Value))
	case err != nil:
		return errorf(CodeBadJSON, "the body is not a JSON object of this endpoint's fields: "+err.Error())
	}
	return nil
}

// checkQuery refuses a query that is blank or too long.
func (s *Server) checkQuery(r *http.Request, q string) *Error {
	if in := infoOf(r); in != nil {
		in.query = q
	}
	if n := len(q); n > s.limits.MaxQueryBytes {
		return tooLong(n, s.limits.MaxQueryBytes)
	}
	if strings.TrimSpace(q) == "" {
		return errorf(CodeQueryEmpty, "the query is empty")
	}
	return nil
}

// tooLong is the error for a query of n bytes over a limit.
func tooLong(n, limit int) *Error {
	e := errorf(CodeQueryTooLong, fmt.Sprintf("the query is %d bytes; at most %d are read", n, limit))
	e.Span = &Span{Start: limit, End: n}
	return e
}

// RefusalError is the service's error for a query the library refused
// as having nothing to search for: query_empty, query_too_long (its
// span what lies past the limit), or query_unreadable with the span of
// the first problem and every problem listed ("!!!" at 0-3). `whittle
// search --json` writes it too, under "error".
func RefusalError(re *rewrite.RefusedError) *Error {
	switch re.Reason {
	case rewrite.RefusedEmpty:
		return errorf(CodeQueryEmpty, "the query is empty")
	case rewrite.RefusedTooLong:
		// The parser's span of a query too long runs from the limit to
		// its end.
		return tooLong(re.Problem.End, re.Problem.Start)
	}
	return problemsError(re.Problems)
}

// checkCategory refuses a category the lexicon does not have.
func checkCategory(c string) *Error {
	if err := lexicon.CheckCategory(c); err != nil {
		return errorf(CodeUnknownCategory, err.Error())
	}
	return nil
}

// handleParse answers the reading of a query, the contract of `whittle
// explain --json`; badly formed parts are in its "errors", with spans.
func (s *Server) handleParse(w http.ResponseWriter, r *http.Request) {
	var req ParseRequest
	if e := firstOf(func() *Error { return decode(r, &req) }, func() *Error { return s.checkQuery(r, req.Query) },
		func() *Error { return checkCategory(req.Category) }); e != nil {
		writeError(w, r, e)
		return
	}
	opts := s.parse
	opts.Category = req.Category
	writeJSON(w, http.StatusOK, s.policy.Read(req.Query, opts))
}

// firstOf runs checks in order and returns the first failure.
func firstOf(checks ...func() *Error) *Error {
	for _, c := range checks {
		if e := c(); e != nil {
			return e
		}
	}
	return nil
}

// handleRescue rescues a query against the server's index and answers
// the contract of `whittle search --json`.
func (s *Server) handleRescue(w http.ResponseWriter, r *http.Request) {
	var req RescueRequest
	if e := firstOf(func() *Error { return decode(r, &req) }, func() *Error { return s.checkQuery(r, req.Query) },
		func() *Error { return checkCategory(req.Category) }, func() *Error { return s.checkHits(req.Hits) },
		func() *Error { return checkTuning(req.Tuning) }); e != nil {
		writeError(w, r, e)
		return
	}
	fallback, e := checkFallback(req)
	if e != nil {
		writeError(w, r, e)
		return
	}
	rw := s.rw
	if req.Tuning != (rewrite.Tuning{}) {
		rw = rw.Tuned(req.Tuning)
	}
	parsed := rw.ParseIn(req.Query, req.Category)
	if e := unsearchable(rw, parsed); e != nil {
		writeError(w, r, e)
		return
	}
	k := 10
	if req.Hits != nil {
		k = *req.Hits
	}
	res, err := s.engine.Rescue(r.Context(), rw, parsed, bleveengine.RescueOptions{K: k, Baseline: req.Baseline, Fallback: fallback})
	if err != nil {
		writeError(w, r, s.engineError(r, err))
		return
	}
	s.metrics.rescued(res.Outcome)
	writeJSON(w, http.StatusOK, res)
}

// checkFallback reads the fallback a rescue asks for, refusing a name
// there is none of, and one asked for without the baseline.
func checkFallback(req RescueRequest) (bleveengine.Fallback, *Error) {
	if req.Fallback == "" {
		return bleveengine.MostWords, nil
	}
	f, err := bleveengine.ParseFallback(req.Fallback)
	switch {
	case err != nil:
		return 0, errorf(CodeBadFallback, err.Error())
	case !req.Baseline:
		return 0, errorf(CodeBadFallback, fmt.Sprintf("fallback %q runs only with \"baseline\": true", req.Fallback))
	}
	return f, nil
}

// checkHits refuses a number of hits out of range.
func (s *Server) checkHits(h *int) *Error {
	if h != nil && (*h < 0 || *h > s.limits.MaxHits) {
		return errorf(CodeBadHits, fmt.Sprintf("hits %d: want 0 to %d", *h, s.limits.MaxHits))
	}
	return nil
}

// checkTuning refuses a tuning out of the ranges a policy file allows.
func checkTuning(t rewrite.Tuning) *Error {
	var te *rewrite.TuningError
	if err := t.Check(); errors.As(err, &te) {
		return errorf(CodeBadTuning, "tuning."+te.Message)
	}
	return nil
}

// unsearchable is the error for a reading that is not rescued, or nil:
// one the library refuses as having nothing to search for, then one
// with badly formed parts beside what was read, which the service
// refuses too.
func unsearchable(rw *rewrite.Rewriter, r *parser.Result) *Error {
	var re *rewrite.RefusedError
	if errors.As(rw.Refusal(r), &re) {
		return RefusalError(re)
	}
	return unreadable(r)
}

// unreadable is the error for a reading with badly formed parts, or nil.
func unreadable(r *parser.Result) *Error {
	if len(r.Errors) == 0 {
		return nil
	}
	return problemsError(r.Errors)
}

// problemsError is query_unreadable for problems, at least one: the
// first one's message and span, and every one listed.
func problemsError(ps parser.ErrorList) *Error {
	first := ps[0]
	e := &Error{Code: CodeQueryUnreadable, Message: first.Msg, Span: &Span{Start: first.Start, End: first.End}}
	for _, pe := range ps {
		e.Problems = append(e.Problems, Problem{Span: Span{Start: pe.Start, End: pe.End}, Message: pe.Msg})
	}
	return e
}

// engineError is the answer to a failed rescue: a query with nothing to
// search for, the deadline, or an internal failure, logged.
func (s *Server) engineError(r *http.Request, err error) *Error {
	var re *rewrite.RefusedError
	if errors.As(err, &re) {
		return RefusalError(re)
	}
	if errors.Is(err, context.DeadlineExceeded) || errors.Is(r.Context().Err(), context.DeadlineExceeded) {
		return errorf(CodeDeadlinePassed, fmt.Sprintf("the deadline of %s passed before the index answered", s.limits.Deadline))
	}
	s.log.Error("rescue failed", "endpoint", "rescue", "err", err.Error())
	return errorf(CodeServerFault, "the search failed; the server's log says why")
}

// handlePolicy answers the effective policy for ?category= and
// ?product_type= (either may be absent); a product type brings its
// category, and a category that contradicts it is refused.
func (s *Server) handlePolicy(w http.ResponseWriter, r *http.Request) {
	c, t := r.URL.Query().Get("category"), r.URL.Query().Get("product_type")
	if e := checkCategory(c); e != nil {
		writeError(w, r, e)
		return
	}
	eff, err := s.policy.Settle(c, t, s.lex)
	var se *rewrite.ScopeError
	switch {
	case errors.As(err, &se) && se.Problem == rewrite.ScopeUnknownProductType:
		writeError(w, r, errorf(CodeUnknownProductType, fmt.Sprintf("unknown product type %q", t)))
	case errors.As(err, &se) && se.Problem == rewrite.ScopeCategoryMismatch:
		writeError(w, r, errorf(CodeCategoryMismatch, se.Msg))
	case err != nil:
		writeError(w, r, errorf(CodeUnknownCategory, err.Error()))
	default:
		writeJSON(w, http.StatusOK, eff)
	}
}

// handleHealth says the process is up.
func (s *Server) handleHealth(w http.ResponseWriter, r *http.Request) {
	writeJSON(w, http.StatusOK, map[string]string{"status": "up"})
}

// handleReady says whether the server takes requests: not once it is
// shutting down.
func (s *Server) handleReady(w http.ResponseWriter, r *http.Request) {
	if s.draining.Load() {
		writeError(w, r, errorf(CodeDraining, "the server is shutting down"))
		return
	}
	writeJSON(w, http.StatusOK, map[string]string{"status": "ready"})
}

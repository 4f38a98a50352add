package serve

import (
	"encoding/json"
	"net/http"
	"strconv"
)

// Code is a stable error code of the service; codes are only ever added.
type Code string

// The error codes, with the HTTP status each is answered with.
const (
	// CodeBadJSON: the body is not one JSON object of the request's
	// fields (400).
	CodeBadJSON Code = "bad_json"
	// CodeBodyTooLarge: the body is over Limits.MaxBodyBytes (413).
	CodeBodyTooLarge Code = "body_too_large"
	// CodeQueryTooLong: the query is over Limits.MaxQueryBytes; the span
	// is the part past the limit (400).
	CodeQueryTooLong Code = "query_too_long"
	// CodeQueryEmpty: the query is missing or blank (400).
	CodeQueryEmpty Code = "query_empty"
	// CodeQueryUnreadable: a part of the query is badly formed, at the
	// span given, or the query has nothing to search for (only
	// punctuation, symbols or filler words: rewrite.RefusedUnreadable),
	// so it is not rescued (400).
	CodeQueryUnreadable Code = "query_unreadable"
	// CodeUnknownCategory: the category is not one of the lexicon's (400).
	CodeUnknownCategory Code = "unknown_category"
	// CodeUnknownProductType: the product type is not in the lexicon (400).
	CodeUnknownProductType Code = "unknown_product_type"
	// CodeCategoryMismatch: the product type asked for belongs to
	// another category than the one asked for (400).
	CodeCategoryMismatch Code = "category_mismatch"
	// CodeBadTuning: a policy tuning is out of its range (400).
	CodeBadTuning Code = "bad_tuning"
	// CodeBadHits: the number of hits asked for is out of range (400).
	CodeBadHits Code = "bad_hits"
	// CodeBadFallback: the blind partial match asked for has no such
	// name, or was asked for without the baseline (400).
	CodeBadFallback Code = "bad_fallback"
	// CodeMethodNotAllowed: the endpoint takes another method (405).
	CodeMethodNotAllowed Code = "method_not_allowed"
	// CodeNoEndpoint: no endpoint has that path (404).
	CodeNoEndpoint Code = "no_endpoint"
	// CodeBusy: too many requests are in flight; retry after the
	// Retry-After header's seconds (503).
	CodeBusy Code = "busy"
	// CodeDraining: the server is shutting down (503, from ready).
	CodeDraining Code = "draining"
	// CodeDeadlinePassed: the request's deadline passed before the
	// engine answered anything (504).
	CodeDeadlinePassed Code = "deadline_passed"
	// CodeServerFault: the server failed; the log says why (500).
	CodeServerFault Code = "server_fault"
)

// Status is the HTTP status c is answered with.
func (c Code) Status() int {
	switch c {
	case CodeBodyTooLarge:
		return http.StatusRequestEntityTooLarge
	case CodeMethodNotAllowed:
		return http.StatusMethodNotAllowed
	case CodeNoEndpoint:
		return http.StatusNotFound
	case CodeBusy, CodeDraining:
		return http.StatusServiceUnavailable
	case CodeDeadlinePassed:
		return http.StatusGatewayTimeout
	case CodeServerFault:
		return http.StatusInternalServerError
	}
	return http.StatusBadRequest
}

// Span is a byte range of the query: query[Start:End].
type Span struct {
	Start int `json:"start"`
	End   int `json:"end"`
}

// Error is the body of every error answer, under "error".
type Error struct {
	Code    Code   `json:"code"`
	Message string `json:"message"`
	// Span is where in the query the problem is, when it is in the query.
	Span *Span `json:"span,omitempty"`
	// Problems are every badly formed part of the query, for
	// CodeQueryUnreadable.
	Problems []Problem `json:"problems,omitempty"`
}

// Problem is one badly formed part of a query.
type Problem struct {
	Span
	Message string `json:"message"`
}

// Error returns the code and the message.
func (e *Error) Error() string { return string(e.Code) + ": " + e.Message }

// errorf makes an Error without a span.
func errorf(code Code, msg string) *Error { return &Error{Code: code, Message: msg} }

// writeJSON writes v with status st.
func writeJSON(w http.ResponseWriter, st int, v any) {
	b, err := json.Marshal(v)
	if err != nil {
		st, b = http.StatusInternalServerError, []byte(`{"error":{"code":"server_fault","message":"the answer could not be written"}}`)
	}
	w.Header().Set("Content-Type", "application/json")
	w.Header().Set("Content-Length", strconv.Itoa(len(b)+1))
	w.WriteHeader(st)
	w.Write(append(b, '\n'))
}

// writeError answers with e and notes its code for the log and metrics.
func writeError(w http.ResponseWriter, r *http.Request, e *Error) {
	if in := infoOf(r); in != nil {
		in.code = e.Code
	}
	writeJSON(w, e.Code.Status(), struct {
		Error *Error `json:"error"`
	}{e})
}

package rewrite

import (
	"errors"
	"fmt"
	"strings"
	"unicode"
	"unicode/utf8"

	"github.com/whittle-search/whittle/parser"
)

// ErrNothingToSearch is matched, with errors.Is, by the error a rescue
// returns for a query that has nothing to search for (a *RefusedError).
var ErrNothingToSearch = errors.New("nothing to search for")

// RefusalReason says why a query was not searched. Its values are the
// codes the service answers with (see rewrite/serve).
type RefusalReason string

// The reasons a query is not searched.
const (
	// RefusedEmpty: the query is empty, or only blanks and control
	// characters.
	RefusedEmpty RefusalReason = "query_empty"
	// RefusedTooLong: the query is over the parser's length limit
	// (parser.MaxQueryBytes, or the rewriter's parse options' MaxBytes),
	// so nothing of it was read.
	RefusedTooLong RefusalReason = "query_too_long"
	// RefusedUnreadable: what was read leaves nothing to search for:
	// only badly formed parts ("1/0"), only punctuation and symbols
	// ("!!!"), or only filler words ("nice", "the").
	RefusedUnreadable RefusalReason = "query_unreadable"
)

// RefusedError is the error Rescue and RescueParsed return, instead of
// an outcome, for a query that has nothing to search for. Such a plan
// would have no clause and match the whole catalog, which rescues
// nothing. It matches ErrNothingToSearch with errors.Is, and unwraps to
// Problem, so errors.As finds the *parser.Error with its span.
type RefusedError struct {
	Reason RefusalReason
	// Problem is where and why, its span in the query: the parser's
	// first error, or, for a query read without error but with nothing
	// to search for, the query less its outer blanks.
	Problem *parser.Error
	// Problems are every problem found in the query, Problem first.
	Problems parser.ErrorList
}

// Error returns one line: "query not searched: " and Problem's message.
func (e *RefusedError) Error() string {
	msg := "query not searched: " + e.Problem.Msg
	if n := len(e.Problems) - 1; n > 0 {
		msg += fmt.Sprintf(" (and %d more problems)", n)
	}
	return msg
}

// Is reports whether target is ErrNothingToSearch.
func (e *RefusedError) Is(target error) bool { return target == ErrNothingToSearch }

// Unwrap returns Problem.
func (e *RefusedError) Unwrap() error { return e.Problem }

// Render shows each problem under the query with carets, as
// parser.Error.Render does, blank lines between them.
func (e *RefusedError) Render() string {
	parts := make([]string, len(e.Problems))
	for i, p := range e.Problems {
		parts[i] = p.Render()
	}
	return strings.Join(parts, "\n\n")
}

// Refusal returns the *RefusedError RescueParsed would return for r, or
// nil when r has something to search for, counting nothing: a caller
// that answers a refusal apart from other problems of the query checks
// it first. Like RescueParsed, it applies the rewriter's policy to r.
func (rw *Rewriter) Refusal(r *parser.Result) error {
	rw.policy.Apply(r, rw.lex)
	return refusal(r, rw.exactItems(r), rw.maxBytes())
}

// refusal is the error for a query with nothing to search for, or nil.
// items are the constraints the rescue would plan with: a query has
// something to search for when one is left, asked for or excluded, once
// the policy has made its filler (a query of one exclusion, "not red",
// is searched: everything but red). maxBytes is the parser's limit.
func refusal(r *parser.Result, items []*item, maxBytes int) error {
	if len(items) > 0 {
		return nil
	}
	q := r.Query
	e := &RefusedError{Reason: RefusedUnreadable, Problems: r.Errors}
	switch {
	case len(q) > maxBytes:
		e.Reason = RefusedTooLong
	case utf8.ValidString(q) && strings.TrimFunc(q, blank) == "":
		// Bytes that are not UTF-8 make a query unreadable, not empty,
		// as the parser says.
		e.Reason = RefusedEmpty
	}
	if len(e.Problems) == 0 {
		start := len(q) - len(strings.TrimLeftFunc(q, blank))
		end := len(strings.TrimRightFunc(q, blank))
		msg := "query is empty"
		if e.Reason != RefusedEmpty {
			msg = "no word or number to search for"
			if f := fillers(r); len(f) > 0 {
				msg = "only filler words (" + strings.Join(f, ", ") + "), nothing to search for"
			}
		}
		e.Problems = parser.ErrorList{{Start: start, End: max(start, end), Msg: msg, Query: q}}
	}
	e.Problem = e.Problems[0]
	return e
}

// fillers quotes the first three filler words of r, and "…" after them
// when there are more.
func fillers(r *parser.Result) []string {
	var out []string
	for _, c := range r.Constraints {
		if c.Kind != parser.KindFiller && c.Strictness != parser.Filler {
			continue
		}
		if len(out) == 3 {
			return append(out, "…")
		}
		out = append(out, fmt.Sprintf("%q", c.Text))
	}
	return out
}

// blank reports a rune that holds nothing to read: a space, a control or
// format character, or a byte that is not UTF-8.
func blank(r rune) bool { return unicode.IsSpace(r) || !unicode.IsPrint(r) || r == utf8.RuneError }

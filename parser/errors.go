package parser

import (
	"fmt"
	"strings"
	"unicode/utf8"
)

// Error is a badly formed part of a query, with the byte offsets of the
// problem. Words that are well formed but unknown are not errors: they are
// listed in Result.Unrecognised.
type Error struct {
	Start, End int
	Msg        string
	// Query is the raw query the offsets point into.
	Query string
}

// Error returns "start-end: message", the byte offsets of the problem
// in the query: "5-8: 1/0 divides by zero".
func (e *Error) Error() string {
	return fmt.Sprintf("%d-%d: %s", e.Start, e.End, e.Msg)
}

// Render shows the query with carets under the problem, then the message:
//
//	lens 1/0 mm
//	     ^^^
//	1/0 divides by zero
//
// Invalid UTF-8 and control characters in the query are shown as U+FFFD so
// that the carets line up; a long query is cut to a window around the
// problem.
func (e *Error) Render() string {
	q := e.Query
	start, end := clamp(e.Start, len(q)), clamp(e.End, len(q))
	if end < start {
		end = start
	}
	const window = 60
	lo, hi := 0, len(q)
	prefix, suffix := "", ""
	if start-lo > window {
		lo = start - window
		for lo < start && !utf8.RuneStart(q[lo]) {
			lo++
		}
		prefix = "…"
	}
	if hi-end > window {
		hi = end + window
		for hi > end && hi < len(q) && !utf8.RuneStart(q[hi]) {
			hi--
		}
		suffix = "…"
	}
	var line, marks strings.Builder
	line.WriteString(prefix)
	marks.WriteString(strings.Repeat(" ", utf8.RuneCountInString(prefix)))
	for i := lo; i < hi; {
		r, n := utf8.DecodeRuneInString(q[i:])
		if r < ' ' || r == 0x7f || (r >= 0x80 && r < 0xa0) {
			r = utf8.RuneError
		}
		line.WriteRune(r)
		switch {
		case i >= start && i < end:
			marks.WriteByte('^')
		case i < start:
			marks.WriteByte(' ')
		}
		i += n
	}
	if start == end {
		marks.WriteByte('^')
	}
	line.WriteString(suffix)
	return line.String() + "\n" + strings.TrimRight(marks.String(), " ") + "\n" + e.Msg
}

func clamp(i, n int) int {
	if i < 0 {
		return 0
	}
	if i > n {
		return n
	}
	return i
}

// ErrorList is the list of problems found in one query, in query order.
type ErrorList []*Error

// Error joins the messages, one per line.
func (l ErrorList) Error() string {
	msgs := make([]string, len(l))
	for i, e := range l {
		msgs[i] = e.Error()
	}
	return strings.Join(msgs, "\n")
}

// Err returns l as an error, or nil when l is empty.
func (l ErrorList) Err() error {
	if len(l) == 0 {
		return nil
	}
	return l
}

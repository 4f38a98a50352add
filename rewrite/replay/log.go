package replay

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"iter"
	"strings"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/rewrite/catalog"
	"github.com/whittle-search/whittle/rewrite/internal/lines"
)

// MaxLine is the longest log line read, in bytes.
const MaxLine = 64 << 10

// Entry is one line of a query log.
type Entry struct {
	// Line is the entry's line number in the log, from 1.
	Line int `json:"line"`
	// Query is what the shopper typed.
	Query string `json:"query"`
	// Count is how often it was searched (1 when the log does not say).
	Count int `json:"count"`
	// Category is the shop's category for the search, or "".
	Category string `json:"category,omitempty"`
}

// logLine is a JSON Lines entry as written.
type logLine struct {
	Query    *string `json:"query"`
	Count    *int    `json:"count"`
	Category string  `json:"category"`
}

// Read yields the entries of a log: plain text, one query a line, or
// JSON Lines with "query" and optional "count" and "category"; each line
// is read as JSON when it begins with "{". Blank lines are skipped. A
// malformed line yields a *catalog.LineError and reading goes on with
// the next line; an error of the reader itself ends the sequence.
func Read(r io.Reader) iter.Seq2[Entry, error] {
	return func(yield func(Entry, error) bool) {
		lr := lines.NewReader(r, MaxLine)
		for {
			b, long, err := lr.Next()
			if err != nil {
				if err != io.EOF {
					yield(Entry{}, err)
				}
				return
			}
			var e Entry
			if long {
				err = &catalog.LineError{Line: lr.Line(), Msg: fmt.Sprintf("longer than %d bytes", MaxLine)}
			} else if e, err = parseLine(lr.Line(), b); err == errBlank {
				continue
			}
			if !yield(e, err) {
				return
			}
		}
	}
}

var errBlank = errors.New("blank line")

func parseLine(line int, b []byte) (Entry, error) {
	t := bytes.TrimSpace(b)
	if len(t) == 0 {
		return Entry{}, errBlank
	}
	if t[0] != '{' {
		return Entry{Line: line, Query: string(t), Count: 1}, nil
	}
	var l logLine
	dec := json.NewDecoder(bytes.NewReader(t))
	dec.DisallowUnknownFields()
	if err := dec.Decode(&l); err != nil {
		var te *json.UnmarshalTypeError
		if errors.As(err, &te) {
			return Entry{}, &catalog.LineError{Line: line, Field: te.Field, Msg: fmt.Sprintf("want a %s, not a JSON %s", kindOf(te.Field), te.Value)}
		}
		if strings.HasPrefix(err.Error(), "json: unknown field") {
			return Entry{}, &catalog.LineError{Line: line, Msg: strings.TrimPrefix(err.Error(), "json: ") + " (a log line has query, count and category)"}
		}
		return Entry{}, &catalog.LineError{Line: line, Msg: "not a JSON object: " + err.Error()}
	}
	if dec.More() {
		return Entry{}, &catalog.LineError{Line: line, Msg: "more than one JSON value on the line"}
	}
	switch {
	case l.Query == nil:
		return Entry{}, &catalog.LineError{Line: line, Field: "query", Msg: "missing; every JSON line needs it"}
	case strings.TrimSpace(*l.Query) == "":
		return Entry{}, &catalog.LineError{Line: line, Field: "query", Msg: "empty"}
	case l.Count != nil && *l.Count < 1:
		return Entry{}, &catalog.LineError{Line: line, Field: "count", Msg: fmt.Sprintf("%d; a query is searched at least once", *l.Count)}
	}
	if err := lexicon.CheckCategory(l.Category); err != nil {
		return Entry{}, &catalog.LineError{Line: line, Field: "category", Msg: err.Error()}
	}
	e := Entry{Line: line, Query: *l.Query, Count: 1, Category: l.Category}
	if l.Count != nil {
		e.Count = *l.Count
	}
	return e, nil
}

func kindOf(field string) string {
	if field == "count" {
		return "whole number"
	}
	return "string"
}

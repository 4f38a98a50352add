package signals

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"iter"
	"time"

	"github.com/go-json-experiment/json/jsontext"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/rewrite/catalog"
	"github.com/whittle-search/whittle/rewrite/internal/lines"
)

// MaxLine is the longest line read, in bytes: 1 MiB, far past any
// search's line, so that a log that lost its line breaks costs one
// error a MiB instead of being read whole into memory.
const MaxLine = 1 << 20

// LineError is a malformed line of a signals log: a catalog.LineError
// with the file it is in. errors.As finds the catalog.LineError in it
// too, so code that handles malformed lines of a catalog or query log
// handles these the same way.
type LineError struct {
	// File is the name given to Read, or "" when none was.
	File string
	catalog.LineError
}

// Error renders "file: line N: field: message".
func (e *LineError) Error() string {
	if e.File == "" {
		return e.LineError.Error()
	}
	return e.File + ": " + e.LineError.Error()
}

// Unwrap returns the catalog.LineError, for errors.As.
func (e *LineError) Unwrap() error { return &e.LineError }

// Read yields the events of one signals log, a file of JSON Lines with
// one event a line, each with File set to file and Line to its line
// number (from 1). Blank lines are skipped. A malformed line yields a
// *LineError naming the file, the line and the field at fault, and
// reading goes on with the next line; an error of the reader itself
// ends the sequence.
//
// Reading is strict: a field of no event, a field that belongs to
// another type of event, a type, operator or kind whittle does not know
// and a time that is not RFC 3339 are all refused (see the package
// documentation for the layout).
func Read(r io.Reader, file string) iter.Seq2[Event, error] {
	return func(yield func(Event, error) bool) {
		lr := lines.NewReader(r, MaxLine)
		var d decoder
		for {
			b, long, err := lr.Next()
			if err != nil {
				if err != io.EOF {
					yield(Event{}, err)
				}
				return
			}
			if long {
				if !yield(Event{}, lineError(file, lr.Line(), "", fmt.Sprintf("longer than %d bytes", MaxLine))) {
					return
				}
				continue
			}
			b = bytes.TrimSpace(b)
			if len(b) == 0 {
				continue
			}
			e, ferr := d.decode(b)
			if ferr != nil {
				if !yield(Event{}, lineError(file, lr.Line(), ferr.field, ferr.msg)) {
					return
				}
				continue
			}
			e.File, e.Line = file, lr.Line()
			if !yield(e, nil) {
				return
			}
		}
	}
}

func lineError(file string, line int, field, msg string) *LineError {
	return &LineError{File: file, LineError: catalog.LineError{Line: line, Field: field, Msg: msg}}
}

// fieldError is what is wrong with a line, before it has a file and a
// line number.
type fieldError struct {
	field, msg string
}

func fieldErr(field, format string, args ...any) *fieldError {
	return &fieldError{field, fmt.Sprintf(format, args...)}
}

// decoder reads lines into events, keeping its buffers from line to
// line.
type decoder struct {
	w   wire
	rd  bytes.Reader
	dec *jsontext.Decoder
}

// unmarshal reads the JSON object on a line into d.w. The decoder is
// made once and keeps its buffer. (Given a bytes.Buffer it would read
// from it in place, but take it over, so that the next line's had to be
// made again.)
func (d *decoder) unmarshal(b []byte) error {
	d.rd.Reset(b)
	if d.dec == nil {
		d.dec = jsontext.NewDecoder(&d.rd, jsontext.AllowDuplicateNames(true))
	} else {
		d.dec.Reset(&d.rd, jsontext.AllowDuplicateNames(true))
	}
	d.w.reset()
	if err := d.w.UnmarshalJSONFrom(d.dec); err != nil {
		return err
	}
	if _, err := d.dec.ReadToken(); err != io.EOF {
		return &jsontext.SyntacticError{Err: errors.New("text after the end of the object")}
	}
	return nil
}

// decode reads one event from a line that is not blank.
func (d *decoder) decode(b []byte) (Event, *fieldError) {
	if b[0] != '{' {
		return Event{}, fieldErr("", "not a JSON object")
	}
	// Strict: an unknown field is refused, as are a field given twice,
	// text that is not UTF-8 and anything after the object.
	if err := d.unmarshal(b); err != nil {
		return Event{}, jsonError(err)
	}
	w := &d.w
	e := Event{Type: w.Type, Session: w.Session}
	if !isType(e.Type) {
		return Event{}, check(&e)
	}
	if e.Type != Search {
		if f := searchField(w); f != "" {
			return Event{}, searchOnly(f, e.Type)
		}
		e.Product = w.Product
	} else {
		if w.given[fProduct] {
			return Event{}, productOnSearch()
		}
		if err := lexicon.CheckCategory(w.Category); err != nil {
			return Event{}, fieldErr("category", "%v", err)
		}
		e.Query, e.Category, e.Shuffled, e.Explored = w.Query, w.Category, w.Shuffled, w.Explored
		// Empty lists read as none, as the writer leaves them out.
		if len(w.Relaxations) > 0 {
			e.Relaxations = w.Relaxations
		}
		if len(w.Shown) > 0 {
			e.Shown = w.Shown
		}
	}
	if w.given[fTime] {
		if ferr := readTime(&e.Time, w.Time); ferr != nil {
			return Event{}, ferr
		}
	}
	if ferr := check(&e); ferr != nil {
		return Event{}, ferr
	}
	return e, nil
}

// readTime reads an RFC 3339 time. Its offset from UTC must be less
// than a day, as RFC 3339 has it, so that the writer can write it back.
func readTime(t *time.Time, s []byte) *fieldError {
	if err := t.UnmarshalText(s); err != nil {
		return fieldErr("time", "%q is not an RFC 3339 time, such as 2025-03-14T09:26:53Z", s)
	}
	if _, off := t.Zone(); off <= -24*60*60 || off >= 24*60*60 {
		return fieldErr("time", "%q is offset from UTC by a day or more", s)
	}
	return nil
}

// searchField names the first field of w that belongs to search events,
// or "".
func searchField(w *wire) string {
	for _, f := range []struct {
		i    int
		name string
	}{{fQuery, "query"}, {fCategory, "category"}, {fRelaxations, "relaxations"}, {fShown, "shown"}, {fExplored, "explored"}, {fShuffled, "shuffled"}} {
		if w.given[f.i] {
			return f.name
		}
	}
	return ""
}

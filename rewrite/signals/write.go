package signals

import (
	"bytes"
	"encoding/json"
	"fmt"
	"io"
	"unicode/utf8"
)

// Writer writes events to a signals log, one JSON line each.
type Writer struct {
	w   io.Writer
	buf bytes.Buffer
	enc *json.Encoder
}

// NewWriter returns a Writer that writes to w. Each event is one Write
// call to w, so that lines from several writers appending to one file
// stay whole; a Writer itself is not safe for concurrent use.
func NewWriter(w io.Writer) *Writer {
	wr := &Writer{w: w}
	wr.enc = json.NewEncoder(&wr.buf)
	wr.enc.SetEscapeHTML(false)
	return wr
}

// Write writes one event. An event that Read would refuse is not
// written: the error names the field at fault. File and Line are not
// written.
func (w *Writer) Write(e Event) error {
	if ferr := check(&e); ferr != nil {
		return fmt.Errorf("signals: event not written: %s: %s", ferr.field, ferr.msg)
	}
	if field := invalidText(&e); field != "" {
		return fmt.Errorf("signals: event not written: %s: not valid UTF-8", field)
	}
	w.buf.Reset()
	if err := w.enc.Encode(&e); err != nil {
		return fmt.Errorf("signals: event not written: %w", err)
	}
	_, err := w.w.Write(w.buf.Bytes())
	return err
}

// invalidText names the first text field of e that is not valid UTF-8
// (JSON would write it back changed), or "".
func invalidText(e *Event) string {
	for _, f := range []struct {
		name string
		s    string
	}{{"session", e.Session}, {"query", e.Query}, {"category", e.Category}, {"product", e.Product}, {"type", string(e.Type)}} {
		if !utf8.ValidString(f.s) {
			return f.name
		}
	}
	for _, id := range e.Shown {
		if !utf8.ValidString(id) {
			return "shown"
		}
	}
	if !validRelaxed(e.Relaxations) {
		return "relaxations"
	}
	if e.Explored != nil && !validRelaxed(e.Explored.Relaxations) {
		return "explored.relaxations"
	}
	return ""
}

func validRelaxed(rs []Relaxed) bool {
	for _, r := range rs {
		if !utf8.ValidString(r.Text) {
			return false
		}
	}
	return true
}

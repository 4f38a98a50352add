package signals

import (
	"bytes"
	"errors"
	"reflect"
	"strconv"
	"strings"

	"github.com/go-json-experiment/json"
	"github.com/go-json-experiment/json/jsontext"
)

// wire is an event line as written. A flag or a pointer tells a field
// given from one left out, so that a field of search events on an
// interaction is refused even when it is empty; JSON null counts as left
// out.
type wire struct {
	Type    Type
	Session string
	// Time is the time as written; the reader parses it.
	Time                    []byte
	Query, Category         string
	Product                 string
	Relaxations             []Relaxed
	Shown                   []string
	Explored                *Explored
	Shuffled                bool
	given, seen             [fieldCount]bool
	timeBuf, scratch, quote []byte
}

// reset clears w for the next line, keeping its buffers.
func (w *wire) reset() {
	*w = wire{timeBuf: w.timeBuf[:0], scratch: w.scratch[:0], quote: w.quote[:0]}
}

// The fields of a line, as indexes of wire.given.
const (
	fType = iota
	fSession
	fTime
	fQuery
	fCategory
	fRelaxations
	fShown
	fExplored
	fShuffled
	fProduct
	fieldCount
)

// UnmarshalJSONFrom reads an event line's object member by member.
//
// The reflective decoding of the JSON library took two thirds of the
// time of reading and joining a log: this reads the same object with the
// library's own tokenizer, which keeps checking the syntax, the UTF-8,
// and that no name is given twice, and leaves the library the rare
// nested objects (relaxations and explored).
func (w *wire) UnmarshalJSONFrom(dec *jsontext.Decoder) error {
	if k := dec.PeekKind(); k != '{' {
		if k == 0 {
			_, err := dec.ReadToken()
			return err
		}
		return &json.SemanticError{JSONKind: k, GoType: reflect.TypeFor[wire]()}
	}
	if _, err := dec.ReadToken(); err != nil {
		return err
	}
	for dec.PeekKind() != '}' {
		name, err := dec.ReadValue()
		if err != nil {
			return err
		}
		w.scratch = unquote(w.scratch[:0], name)
		if err := w.member(dec, w.scratch); err != nil {
			return err
		}
	}
	_, err := dec.ReadToken()
	return err
}

// fieldNames are the names of a line's fields, in the order of their
// indexes in wire.given.
const fieldNames = "type session time query category relaxations shown explored shuffled product"

// fieldOf returns the index of the field name, or -1.
func fieldOf(name []byte) int {
	switch string(name) {
	case "type":
		return fType
	case "session":
		return fSession
	case "time":
		return fTime
	case "query":
		return fQuery
	case "category":
		return fCategory
	case "relaxations":
		return fRelaxations
	case "shown":
		return fShown
	case "explored":
		return fExplored
	case "shuffled":
		return fShuffled
	case "product":
		return fProduct
	}
	return -1
}

// fieldName returns the name of field f, for messages.
func fieldName(f int) string { return strings.Fields(fieldNames)[f] }

// member reads the value of the member name. The decoder does not look
// for names given twice, which cost a twentieth of reading a line; this
// does, for the line's own fields, and the nested objects are read by
// the library, which does.
func (w *wire) member(dec *jsontext.Decoder, name []byte) error {
	f := fieldOf(name)
	switch {
	case f < 0:
		return &json.SemanticError{Err: json.ErrUnknownName, JSONPointer: jsontext.Pointer("").AppendToken(string(name))}
	case w.seen[f]:
		return &jsontext.SyntacticError{Err: jsontext.ErrDuplicateName, JSONPointer: jsontext.Pointer("").AppendToken(string(name))}
	}
	w.seen[f] = true
	var err error
	switch f {
	case fType:
		var v jsontext.Value
		if v, err = w.value(dec, fType, '"'); v != nil {
			w.quote = unquote(w.quote[:0], v)
			w.Type = typeOf(w.quote)
		}
	case fSession:
		w.Session, err = w.text(dec, fSession)
	case fTime:
		var v jsontext.Value
		if v, err = w.value(dec, fTime, '"'); v != nil {
			w.timeBuf = unquote(w.timeBuf[:0], v)
			w.Time = w.timeBuf
		}
	case fQuery:
		w.Query, err = w.text(dec, fQuery)
	case fCategory:
		w.Category, err = w.text(dec, fCategory)
	case fProduct:
		w.Product, err = w.text(dec, fProduct)
	case fShuffled:
		var v jsontext.Value
		if v, err = w.value(dec, fShuffled, 't'); v != nil {
			w.Shuffled = v.Kind() == 't'
		}
	case fShown:
		w.given[fShown] = dec.PeekKind() != 'n'
		w.Shown, err = w.shown(dec)
	case fRelaxations:
		err = w.nested(dec, fRelaxations, &w.Relaxations)
	case fExplored:
		err = w.nested(dec, fExplored, &w.Explored)
	}
	return err
}

// nested reads the value of field f into v with the library's
// Unmarshal, strict as the line is; its errors point into the line.
func (w *wire) nested(dec *jsontext.Decoder, f int, v any) error {
	w.given[f] = dec.PeekKind() != 'n'
	raw, err := dec.ReadValue()
	if err != nil {
		return err
	}
	err = json.Unmarshal(raw, v, json.RejectUnknownMembers(true))
	if err == nil {
		return nil
	}
	at := jsontext.Pointer("").AppendToken(fieldName(f))
	var se *json.SemanticError
	var te *jsontext.SyntacticError
	switch {
	case errors.As(err, &se):
		se.JSONPointer = at + se.JSONPointer
	case errors.As(err, &te):
		te.JSONPointer = at + te.JSONPointer
	}
	return err
}

// value reads the value of a member that holds a string (kind '"') or
// true or false (kind 't'), or null for none: it returns nil then.
func (w *wire) value(dec *jsontext.Decoder, field int, kind jsontext.Kind) (jsontext.Value, error) {
	v, err := dec.ReadValue()
	if err != nil {
		return nil, err
	}
	switch k := v.Kind(); {
	case k == 'n':
		return nil, nil
	case k == kind, kind == 't' && k == 'f':
	default:
		t := reflect.TypeFor[string]()
		if kind == 't' {
			t = reflect.TypeFor[bool]()
		}
		return nil, &json.SemanticError{JSONKind: k, GoType: t, JSONPointer: jsontext.Pointer("").AppendToken(fieldName(field))}
	}
	w.given[field] = true
	return v, nil
}

// text reads the value of a member that holds a string.
func (w *wire) text(dec *jsontext.Decoder, field int) (string, error) {
	v, err := w.value(dec, field, '"')
	if v == nil {
		return "", err
	}
	w.quote = unquote(w.quote[:0], v)
	return string(w.quote), nil
}

// unquote appends the text of a JSON string that the decoder has
// checked.
func unquote(dst []byte, v jsontext.Value) []byte {
	raw := v[1 : len(v)-1]
	if bytes.IndexByte(raw, '\\') < 0 {
		return append(dst, raw...)
	}
	dst, _ = jsontext.AppendUnquote(dst, v)
	return dst
}

// typeOf returns the event type written b, without a copy when it is
// one of the five.
func typeOf(b []byte) Type {
	switch string(b) {
	case "search":
		return Search
	case "impression":
		return Impression
	case "click":
		return Click
	case "add_to_cart":
		return AddToCart
	case "purchase":
		return Purchase
	}
	return Type(b)
}

// shown reads a list of product ids, or null for none. A search shows a
// page of products: the list is made once at a page's size.
func (w *wire) shown(dec *jsontext.Decoder) ([]string, error) {
	switch k := dec.PeekKind(); k {
	case 'n':
		_, err := dec.ReadToken()
		return nil, err
	case '[':
	default:
		if k == 0 {
			_, err := dec.ReadToken()
			return nil, err
		}
		return nil, &json.SemanticError{JSONKind: k, GoType: reflect.TypeFor[[]string](), JSONPointer: "/shown"}
	}
	if _, err := dec.ReadToken(); err != nil {
		return nil, err
	}
	ids := make([]string, 0, 16)
	for dec.PeekKind() != ']' {
		v, err := dec.ReadValue()
		if err != nil {
			return nil, err
		}
		if v.Kind() != '"' {
			return nil, &json.SemanticError{JSONKind: v.Kind(), GoType: reflect.TypeFor[string](), JSONPointer: jsontext.Pointer("/shown").AppendToken(strconv.Itoa(len(ids)))}
		}
		w.quote = unquote(w.quote[:0], v)
		ids = append(ids, string(w.quote))
	}
	_, err := dec.ReadToken()
	return ids, err
}

// The fields of each object of a line, for the message that refuses an
// unknown one.
const (
	eventFields    = "type, session, time, query, category, relaxations, shown, explored, shuffled and product"
	relaxedFields  = "op, kind and text"
	exploredFields = "rank and relaxations"
)

// jsonError says what the JSON library found wrong, in the terms of a
// signals line: the field at fault, and the relaxation or product by
// its place from 1.
func jsonError(err error) *fieldError {
	var se *json.SemanticError
	if errors.As(err, &se) {
		if se.Err == json.ErrUnknownName {
			field, item, in := place(se.JSONPointer.Parent())
			return fieldErr(field, "%sunknown field %q; %s has %s", item, se.JSONPointer.LastToken(), in.name, in.fields)
		}
		field, item, _ := place(se.JSONPointer)
		switch {
		case se.JSONValue != nil:
			return fieldErr(field, "%swant %s, not %s", item, want(se.GoType), se.JSONValue)
		case se.JSONKind != 0:
			return fieldErr(field, "%swant %s, not a JSON %s", item, want(se.GoType), kindName(se.JSONKind))
		}
		return fieldErr(field, "%s%v", item, se.Err)
	}
	var te *jsontext.SyntacticError
	if errors.As(err, &te) {
		field, item, _ := place(te.JSONPointer)
		msg := strings.TrimPrefix(te.Err.Error(), "jsontext: ")
		switch {
		case errors.Is(te.Err, jsontext.ErrDuplicateName):
			msg = "given twice"
		case field == "":
			msg = "not a JSON object: " + msg
		}
		return fieldErr(field, "%s%s", item, msg)
	}
	return fieldErr("", "not a JSON object: %v", err)
}

// object names a kind of object in a line and its fields.
type object struct{ name, fields string }

// place reads a JSON pointer within a line: the field at fault
// ("explored.relaxations"), the item of a list it is in ("relaxation 2:
// ", with the relaxation's own field after it), and the object it
// points to, or into.
func place(p jsontext.Pointer) (field, item string, in object) {
	in = object{"an event", eventFields}
	var names []string
	prev := ""
	for tok := range p.Tokens() {
		switch {
		case prev == "relaxations" && item == "":
			item = "relaxation " + ordinal(tok) + ": "
			in = object{"a relaxation", relaxedFields}
		case prev == "shown" && item == "":
			item = "product " + ordinal(tok) + ": "
		case item != "":
			item += tok + ": " // a field of a relaxation
		default:
			if tok == "explored" && len(names) == 0 {
				in = object{"explored", exploredFields}
			}
			names = append(names, tok)
		}
		prev = tok
	}
	return strings.Join(names, "."), item, in
}

// ordinal turns a list index from a pointer into a place from 1.
func ordinal(tok string) string {
	n, err := strconv.Atoi(tok)
	if err != nil {
		return tok
	}
	return strconv.Itoa(n + 1)
}

// want says what a Go type holds, for the message that refuses a value
// of the wrong JSON type.
func want(t reflect.Type) string {
	if t == nil {
		return "another value"
	}
	switch t.Kind() {
	case reflect.Pointer:
		return want(t.Elem())
	case reflect.String:
		return "a string"
	case reflect.Bool:
		return "true or false"
	case reflect.Int:
		return "a whole number"
	case reflect.Slice:
		return "a list"
	}
	return "an object"
}

func kindName(k jsontext.Kind) string {
	switch k {
	case 'n':
		return "null"
	case 'f', 't':
		return "boolean"
	case '"':
		return "string"
	case '0':
		return "number"
	case '{':
		return "object"
	case '[':
		return "list"
	}
	return k.String()
}

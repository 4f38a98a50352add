package lexicon

import (
	"bufio"
	"fmt"
	"io"
	"slices"
	"strings"
	"unicode/utf8"
)

// FileError is a problem in a lexicon file, with the line and column
// (1-based, columns in bytes) where it was found.
type FileError struct {
	File   string
	Line   int
	Column int
	Msg    string
}

// Error renders the problem as "file:line:column: message".
func (e *FileError) Error() string {
	return fmt.Sprintf("%s:%d:%d: %s", e.File, e.Line, e.Column, e.Msg)
}

// keysFor lists the field keys each kind accepts besides "also".
func keysFor(k Kind) []string {
	switch k {
	case ProductType:
		return []string{"also", "category", "parent", "slot"}
	case Colour:
		return []string{"also", "hex", "from"}
	}
	return []string{"also"}
}

// colourSources are the values a colour's from= field may take.
var colourSources = []string{"css4", "memory"}

const fieldSep = " | "

// ParseFile reads entries of kind k from r, in whittle's lexicon line
// format:
//
//	# a comment
//	canonical name | key=value | key=value
//
// Fields are separated by " | ". The key "also" takes a comma-separated
// list of aliases; product types also take "category", "parent" and
// repeated "slot" fields (dimension:quantity:unit:min..max); colours take
// "hex" (#rrggbb, or multi) and "from" (css4 or memory). Names are
// normalised as [Normalise] does. Every problem is a *FileError naming
// the line and column.
func ParseFile(name string, k Kind, r io.Reader) ([]*Entry, error) {
	sc := bufio.NewScanner(r)
	sc.Buffer(make([]byte, 64*1024), 1024*1024)
	var out []*Entry
	allowed := keysFor(k)
	lineNo := 0
	for sc.Scan() {
		lineNo++
		line := sc.Text()
		errAt := func(col int, format string, args ...any) error {
			return &FileError{File: name, Line: lineNo, Column: col, Msg: fmt.Sprintf(format, args...)}
		}
		if !utf8.ValidString(line) {
			return nil, errAt(1, "line is not valid UTF-8")
		}
		trimmed := strings.TrimSpace(line)
		if trimmed == "" || strings.HasPrefix(trimmed, "#") {
			continue
		}
		e := &Entry{Kind: k, File: name, Line: lineNo}
		col := 1 + strings.Index(line, trimmed)
		fields := strings.Split(trimmed, fieldSep)
		for i, f := range fields {
			fcol := col
			col += len(f) + len(fieldSep)
			f = strings.TrimSpace(f)
			if i == 0 {
				if strings.Contains(f, "=") {
					return nil, errAt(fcol, "entry starts with a field %q; the canonical name comes first", f)
				}
				e.Name = normaliseName(f)
				if e.Name == "" {
					return nil, errAt(fcol, "empty name")
				}
				continue
			}
			key, val, ok := strings.Cut(f, "=")
			if !ok {
				return nil, errAt(fcol, "field %q is not key=value", f)
			}
			key, val = strings.TrimSpace(key), strings.TrimSpace(val)
			if !slices.Contains(allowed, key) {
				return nil, errAt(fcol, "unknown key %q in %s (allowed: %s)", key, k.File(), strings.Join(allowed, ", "))
			}
			switch key {
			case "also":
				for _, a := range strings.Split(val, ",") {
					if a = normaliseName(a); a != "" {
						e.Aliases = append(e.Aliases, a)
					}
				}
			case "category":
				if !slices.Contains(categories, val) {
					return nil, errAt(fcol, "unknown category %q (known: %s)", val, strings.Join(categories, ", "))
				}
				e.Category = val
			case "parent":
				e.Parent = normaliseName(val)
			case "hex":
				if val != "multi" && !isHexColour(val) {
					return nil, errAt(fcol, "hex %q: want #rrggbb, or multi for a word that names several colours", val)
				}
				e.Hex = strings.ToLower(val)
			case "from":
				if !slices.Contains(colourSources, val) {
					return nil, errAt(fcol, "from %q: want one of %s", val, strings.Join(colourSources, ", "))
				}
				e.From = val
			case "slot":
				s, err := parseSlot(val)
				if err != nil {
					return nil, errAt(fcol, "%v", err)
				}
				e.Slots = append(e.Slots, s)
			}
		}
		if k == ProductType && e.Category == "" {
			return nil, errAt(1, "product type %q has no category", e.Name)
		}
		if k == Colour && (e.Hex == "") != (e.From == "") && e.Hex != "multi" {
			return nil, errAt(1, "colour %q: give hex= and from= together (from= says where the value comes from)", e.Name)
		}
		out = append(out, e)
	}
	if err := sc.Err(); err != nil {
		return nil, &FileError{File: name, Line: lineNo + 1, Column: 1, Msg: err.Error()}
	}
	return out, nil
}

// normaliseName lower-cases a name and folds runs of white space to one.
func normaliseName(s string) string {
	return strings.Join(strings.Fields(Normalise(s)), " ")
}

func isHexColour(s string) bool {
	if len(s) != 7 || s[0] != '#' {
		return false
	}
	for _, c := range s[1:] {
		if !('0' <= c && c <= '9' || 'a' <= c && c <= 'f' || 'A' <= c && c <= 'F') {
			return false
		}
	}
	return true
}

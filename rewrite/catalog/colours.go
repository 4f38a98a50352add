package catalog

import (
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"math"
	"sort"
	"strings"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/rewrite/internal/lines"
)

// MaxLine is the longest catalog line read, in bytes: 1 MiB, far past
// any product's line, so that a feed that lost its line breaks is
// stopped at its first line instead of read whole into memory.
const MaxLine = 1 << 20

// LineError is a malformed catalog line.
type LineError struct {
	Line  int
	Field string // "" when the line as a whole is at fault
	Msg   string
}

// Error renders "line N: field: message".
func (e *LineError) Error() string {
	if e.Field == "" {
		return fmt.Sprintf("line %d: %s", e.Line, e.Msg)
	}
	return fmt.Sprintf("line %d: %s: %s", e.Line, e.Field, e.Msg)
}

// colourLine holds the fields of a product line that the colour
// vocabulary reads; json.RawMessage keeps type errors per field.
type colourLine struct {
	ID        json.RawMessage `json:"id"`
	Title     json.RawMessage `json:"title"`
	Colour    json.RawMessage `json:"colour"`
	ColourHex json.RawMessage `json:"colour_hex"`
	ColourLab json.RawMessage `json:"colour_lab"`
}

// Vocabulary is the set of colours a catalog carries.
type Vocabulary struct {
	// Colours are the catalog's colour names with their value and number
	// of products, most products first.
	Colours []colour.PaletteColour
	// Unplaced are colour names with no value in the line and none in the
	// lexicon, with their number of products.
	Unplaced map[string]int
	// Products is the number of product lines read.
	Products int
}

// Palette returns the colours as a palette for nearest-colour search.
func (v *Vocabulary) Palette() *colour.Palette { return colour.NewPalette(v.Colours) }

// ReadColours reads a catalog and gathers its colour vocabulary. A
// colour name is placed by its line's colour_lab, else colour_hex, else
// the lexicon's value for that name; when lines disagree on a name's
// value, the value most lines give wins. Blank lines are skipped. A
// malformed line stops the read with a *LineError.
func ReadColours(r io.Reader, lex *lexicon.Lexicon) (*Vocabulary, error) {
	type tally struct {
		count  int
		values map[colour.Lab]int
	}
	names := make(map[string]*tally)
	ids := make(map[string]int)
	v := &Vocabulary{Unplaced: make(map[string]int)}
	lr := lines.NewReader(r, MaxLine)
	for {
		b, long, err := lr.Next()
		if err == io.EOF {
			break
		}
		if err != nil {
			return nil, err
		}
		line := lr.Line()
		if long {
			return nil, &LineError{Line: line, Msg: fmt.Sprintf("longer than %d bytes", MaxLine)}
		}
		text := strings.TrimSpace(string(b))
		if text == "" {
			continue
		}
		var cl colourLine
		if err := json.Unmarshal([]byte(text), &cl); err != nil {
			return nil, &LineError{Line: line, Msg: notAnObject(err)}
		}
		id, err := requiredString(cl.ID)
		if err != nil {
			return nil, &LineError{Line: line, Field: "id", Msg: err.Error()}
		}
		if _, err := requiredString(cl.Title); err != nil {
			return nil, &LineError{Line: line, Field: "title", Msg: err.Error()}
		}
		if first, dup := ids[id]; dup {
			return nil, &LineError{Line: line, Field: "id", Msg: fmt.Sprintf("%q is already the id of line %d", id, first)}
		}
		ids[id] = line
		v.Products++
		name, err := optionalString(cl.Colour)
		if err != nil {
			return nil, &LineError{Line: line, Field: "colour", Msg: err.Error()}
		}
		name = strings.Join(strings.Fields(lexicon.Normalise(name)), " ")
		lab, has, ferr := lineLab(cl)
		if ferr != nil {
			return nil, &LineError{Line: line, Field: ferr.field, Msg: ferr.msg}
		}
		if name == "" {
			continue
		}
		if !has {
			_, lab, has = lex.ColourNamed(name)
		}
		if !has {
			v.Unplaced[name]++
			continue
		}
		t := names[name]
		if t == nil {
			t = &tally{values: make(map[colour.Lab]int)}
			names[name] = t
		}
		t.count++
		t.values[lab]++
	}
	for name, t := range names {
		var best colour.Lab
		bestN := -1
		for lab, n := range t.values {
			if n > bestN || n == bestN && lessLab(lab, best) {
				best, bestN = lab, n
			}
		}
		v.Colours = append(v.Colours, colour.PaletteColour{Name: name, Lab: best, Count: t.count})
	}
	sort.Slice(v.Colours, func(i, j int) bool {
		a, b := v.Colours[i], v.Colours[j]
		if a.Count != b.Count {
			return a.Count > b.Count
		}
		return a.Name < b.Name
	})
	return v, nil
}

func lessLab(a, b colour.Lab) bool {
	if a.L != b.L {
		return a.L < b.L
	}
	if a.A != b.A {
		return a.A < b.A
	}
	return a.B < b.B
}

type fieldErr struct{ field, msg string }

// lineLab reads colour_lab, else colour_hex.
func lineLab(cl colourLine) (colour.Lab, bool, *fieldErr) {
	if len(cl.ColourLab) > 0 && string(cl.ColourLab) != "null" {
		var lab []float64
		if err := json.Unmarshal(cl.ColourLab, &lab); err != nil || len(lab) != 3 {
			return colour.Lab{}, false, &fieldErr{"colour_lab", "want " + fieldShapes["colour_lab"].want}
		}
		for _, x := range lab {
			if math.IsNaN(x) || math.IsInf(x, 0) {
				return colour.Lab{}, false, &fieldErr{"colour_lab", "want finite numbers"}
			}
		}
		if lab[0] < 0 || lab[0] > 100 || math.Abs(lab[1]) > 200 || math.Abs(lab[2]) > 200 {
			return colour.Lab{}, false, &fieldErr{"colour_lab", "L must be 0..100 and a, b within -200..200"}
		}
		return colour.Lab{L: lab[0], A: lab[1], B: lab[2]}, true, nil
	}
	hex, err := optionalString(cl.ColourHex)
	if err != nil {
		return colour.Lab{}, false, &fieldErr{"colour_hex", err.Error()}
	}
	if hex == "" {
		return colour.Lab{}, false, nil
	}
	rgb, err := colour.ParseHex(hex)
	if err != nil {
		return colour.Lab{}, false, &fieldErr{"colour_hex", err.Error()}
	}
	return rgb.Lab(), true, nil
}

func requiredString(raw json.RawMessage) (string, error) {
	if len(raw) == 0 || string(raw) == "null" {
		return "", errors.New("missing; every line needs it")
	}
	s, err := optionalString(raw)
	if err == nil && strings.TrimSpace(s) == "" {
		return "", errors.New("empty")
	}
	return s, err
}

func optionalString(raw json.RawMessage) (string, error) {
	if len(raw) == 0 || string(raw) == "null" {
		return "", nil
	}
	var s string
	if err := json.Unmarshal(raw, &s); err != nil {
		var te *json.UnmarshalTypeError
		if errors.As(err, &te) {
			return "", errors.New("want a string, not " + jsonKind(te.Value))
		}
		return "", errors.New("want a string")
	}
	return s, nil
}

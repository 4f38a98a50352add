package parser

import (
	"errors"
	"fmt"
	"math"
	"strconv"
	"strings"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/colour"
)

// colourOf places a colour entry in CIELAB from its hex value.
func colourOf(e *lexicon.Entry) *Colour {
	if e.Hex == "multi" {
		return &Colour{Families: []string{string(colour.Multi)}}
	}
	rgb, err := colour.ParseHex(e.Hex)
	if err != nil {
		return &Colour{}
	}
	return colourValue(rgb.Lab())
}

// colourValue rounds a Lab value for the output and adds its hex and
// families.
func colourValue(l colour.Lab) *Colour {
	round := func(x float64) float64 { return math.Round(x*1e4) / 1e4 }
	c := &Colour{Lab: &[3]float64{round(l.L), round(l.A), round(l.B)}}
	rgb, _ := l.RGB() // out of gamut: the nearest sRGB value
	c.Hex = rgb.Hex()
	for _, f := range colour.FamiliesOf(l) {
		c.Families = append(c.Families, string(f))
	}
	return c
}

// colourModifiers are the words that shift the colour after them.
var colourModifiers = map[string]bool{"light": true, "dark": true, "pale": true, "deep": true, "bright": true, "muted": true}

// modifiedColour reads "light sage", "dark teal": a modifier word right
// before a colour that is not itself a lexicon phrase. The value is the
// colour moved by the modifier's rule (colour.Modify), so it is inferred.
func (p *tagger) modifiedColour(k int) int {
	u := &p.units[k]
	if !colourModifiers[u.text] || k+1 >= len(p.units) {
		return 0
	}
	v := &p.units[k+1]
	if v.kind != uWord || v.chosen == nil || v.chosen.Kind != lexicon.Colour || v.chosen.Hex == "" || v.chosen.Hex == "multi" {
		return 0
	}
	rgb, err := colour.ParseHex(v.chosen.Hex)
	if err != nil {
		return 0
	}
	lab, ok := colour.Modify(rgb.Lab(), u.text)
	if !ok {
		return 0
	}
	p.add(Constraint{Kind: KindColour, Start: u.start, End: v.end, Name: u.text + " " + v.chosen.Name, Inferred: true,
		Colour: colourValue(lab), Evidence: fmt.Sprintf("colour lexicon; %q shifts %s (whittle's modifier rule)", u.text, v.chosen.Name)})
	return 1
}

// ColourReading is one colour given by name ("dusty rose", "light
// sage"), hex ("#c0a0a0"), rgb() or L,a,b, placed in CIELAB.
type ColourReading struct {
	// Input is what was given.
	Input string `json:"input"`
	// Name is the lexicon's name for it, or "" when a value was given.
	Name string `json:"name,omitempty"`
	// Inferred is set when a modifier moved a lexicon colour.
	Inferred bool `json:"inferred"`
	Colour
	// LCh is lightness, chroma and hue angle (degrees).
	LCh [3]float64 `json:"lch"`
	lab colour.Lab
}

// LabValue returns the reading's CIELAB value, unrounded.
func (c *ColourReading) LabValue() colour.Lab { return c.lab }

// UnknownColourError is ReadColour's error for words that are well
// formed but read as no single colour of the lexicon, with or without a
// modifier: an unknown name ("burgandy"), or words that say more than a
// colour ("navy dress", "not navy").
type UnknownColourError struct {
	// Name is the name as given, trimmed.
	Name string
	// Suggest is the lexicon's colour name nearest to it in spelling, or
	// "".
	Suggest string
}

// Error says the name is unknown, and suggests the nearest known one.
func (e *UnknownColourError) Error() string {
	msg := fmt.Sprintf("%q is not a colour whittle knows", e.Name)
	if e.Suggest != "" {
		msg += fmt.Sprintf("; did you mean %q?", e.Suggest)
	}
	return msg
}

// ReadColour places s in CIELAB. s may be a colour name of the lexicon,
// with a modifier or not; a hex value ("#rrggbb", "#rgb"); "rgb(r, g, b)";
// or "L,a,b". A name the lexicon does not know is an *UnknownColourError,
// which suggests the closest name it does; a value that is badly formed
// (a hex of the wrong length, an rgb() or L,a,b out of range or with the
// wrong count of numbers), or none at all, is any other error.
func ReadColour(s string, opts Options) (*ColourReading, error) {
	t := strings.TrimSpace(s)
	lex := opts.lexicon()
	var lab colour.Lab
	out := &ColourReading{Input: s}
	lower := strings.ToLower(t)
	switch {
	case t == "":
		return nil, errors.New("no colour given")
	case strings.HasPrefix(t, "#") || isHexDigits(t):
		rgb, err := colour.ParseHex(t)
		if err != nil {
			if sug := lex.Suggest(strings.TrimPrefix(t, "#"), lexicon.Colour); sug != "" {
				err = fmt.Errorf("%v; or did you mean the colour %q?", err, sug)
			}
			return nil, err
		}
		lab = rgb.Lab()
	case strings.HasPrefix(lower, "rgb("):
		rgb, err := colour.ParseRGBFunc(t)
		if err != nil {
			return nil, err
		}
		lab = rgb.Lab()
	case strings.HasPrefix(lower, "lab(") || strings.ContainsAny(t[:1], "0123456789-+."):
		l, err := colour.ParseLab(t)
		if err != nil {
			if near := nearestClamped(t, lex); near != "" {
				err = fmt.Errorf("%v; the nearest named colour within range is %q", err, near)
			}
			return nil, err
		}
		lab = l
	default:
		// A name: the query must read as one colour and nothing else.
		if e, l, ok := lex.ColourNamed(t); ok {
			// The whole phrase names a colour, even where a query would
			// read it as something else ("linen").
			lab, out.Name = l, e.Name
			break
		}
		r := ParseWith(t, opts)
		cs := r.Of(KindColour)
		if len(cs) != 1 || len(r.Constraints) != 1+len(r.Of(KindFiller)) || cs[0].Excluded || cs[0].Colour.Lab == nil {
			return nil, &UnknownColourError{Name: t, Suggest: lex.Suggest(t, lexicon.Colour)}
		}
		c := cs[0]
		lab = colour.Lab{L: c.Colour.Lab[0], A: c.Colour.Lab[1], B: c.Colour.Lab[2]}
		out.Name, out.Inferred = c.Name, c.Inferred
	}
	out.lab = lab
	out.Colour = *colourValue(lab)
	lch := lab.LCh()
	round := func(x float64) float64 { return math.Round(x*1e4) / 1e4 }
	out.LCh = [3]float64{round(lch.L), round(lch.C), round(lch.H)}
	return out, nil
}

func isHexDigits(s string) bool {
	if len(s) != 3 && len(s) != 6 {
		return false
	}
	for _, c := range s {
		if !('0' <= c && c <= '9' || 'a' <= c && c <= 'f' || 'A' <= c && c <= 'F') {
			return false
		}
	}
	// Six letters a-f alone ("facade") could be a word; a hex has a digit.
	return strings.ContainsAny(s, "0123456789")
}

// nearestClamped reads three numbers from an L,a,b text that is out of
// range, moves them into range, and names the nearest lexicon colour; ""
// when the text does not hold three numbers.
func nearestClamped(t string, lex *lexicon.Lexicon) string {
	t = strings.TrimSuffix(strings.TrimPrefix(strings.ToLower(t), "lab("), ")")
	fields := strings.FieldsFunc(t, func(r rune) bool { return r == ',' || r == ' ' })
	if len(fields) != 3 {
		return ""
	}
	var v [3]float64
	for i, f := range fields {
		x, err := strconv.ParseFloat(f, 64)
		if err != nil || math.IsNaN(x) || math.IsInf(x, 0) {
			return ""
		}
		v[i] = x
	}
	lab := colour.Lab{L: math.Max(0, math.Min(100, v[0])), A: math.Max(-200, math.Min(200, v[1])), B: math.Max(-200, math.Min(200, v[2]))}
	if m := lex.ColourPalette().Nearest(lab, 1); len(m) == 1 {
		return m[0].Name
	}
	return ""
}

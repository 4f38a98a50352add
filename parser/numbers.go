package parser

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"github.com/whittle-search/whittle/parser/internal/grammar"
)

// maxDigits is the most significant digits a number may have: past it a
// float64 no longer holds the number exactly, so whittle reports it.
const maxDigits = 15

// number is a parsed numeric value with the decimal text it came from.
type number struct {
	value float64
	// decimal is the amount as a plain decimal string ("3.5"), or "" for a
	// fraction that has no finite decimal form.
	decimal string
	// integer is set when the number is whole and was written without a
	// fraction or a decimal point.
	integer bool
	// fraction is set when it was written as a fraction or mixed number.
	fraction bool
	start    int
	end      int
}

// decimalText rewrites a lexed number ("1,299", "2,5", "3.50") as a plain
// decimal string, by this rule: a comma followed by exactly three digits
// (and no other comma after a point) groups thousands; any other comma is
// a decimal comma ("2,5 mm", "35,99 €"). A point is always a decimal
// point unless the number has several points ("1.299.000"), which group.
func decimalText(s string) (string, error) {
	commas, points := strings.Count(s, ","), strings.Count(s, ".")
	switch {
	case commas == 0 && points <= 1:
		return s, nil
	case commas == 0:
		// 1.299.000: points group thousands.
		return groups(s, ".")
	case points == 0 && commas == 1:
		i := strings.IndexByte(s, ',')
		if len(s)-i-1 == 3 {
			return s[:i] + s[i+1:], nil
		}
		return s[:i] + "." + s[i+1:], nil
	case points == 0:
		return groups(s, ",")
	}
	// Both: the later one is the decimal mark.
	ci, pi := strings.LastIndexByte(s, ','), strings.LastIndexByte(s, '.')
	if pi > ci {
		if strings.Count(s[ci:], ".") > 1 {
			return "", fmt.Errorf("cannot read %q as a number", s)
		}
		return groupsThen(s[:pi], ",", s[pi:])
	}
	return groupsThen(s[:ci], ".", "."+s[ci+1:])
}

func groups(s, sep string) (string, error) { return groupsThen(s, sep, "") }

// groupsThen removes sep from s where every group after the first has
// three digits, and appends tail.
func groupsThen(s, sep, tail string) (string, error) {
	parts := strings.Split(s, sep)
	for i, p := range parts {
		if p == "" || (i > 0 && len(p) != 3) || strings.ContainsAny(p, ".,") {
			return "", fmt.Errorf("cannot read %q as a number", s+tail)
		}
	}
	return strings.Join(parts, "") + tail, nil
}

func significantDigits(dec string) int {
	n := 0
	lead := true
	for i := 0; i < len(dec); i++ {
		c := dec[i]
		if c < '0' || c > '9' {
			continue
		}
		if lead && c == '0' {
			continue
		}
		lead = false
		n++
	}
	return n
}

// parseWhole reads a lexed decimal number.
func parseWhole(s string) (float64, string, error) {
	dec, err := decimalText(s)
	if err != nil {
		return 0, "", err
	}
	if significantDigits(dec) > maxDigits {
		return 0, "", fmt.Errorf("number %s has more than %d significant digits", s, maxDigits)
	}
	v, err := strconv.ParseFloat(dec, 64)
	if err != nil || math.IsInf(v, 0) || math.IsNaN(v) {
		return 0, "", fmt.Errorf("number %s is out of range", s)
	}
	return v, dec, nil
}

// parseFrac reads "n/d" or a vulgar fraction.
func parseFrac(f *grammar.Frac) (float64, error) {
	text := f.Vulgar
	if text == "" {
		text = f.Num + "/" + f.Den
	}
	n, d, _ := strings.Cut(text, "/")
	nv, _, err := parseWhole(n)
	if err != nil {
		return 0, err
	}
	dv, _, err := parseWhole(d)
	if err != nil {
		return 0, err
	}
	if dv == 0 {
		if nv == 0 {
			return 0, fmt.Errorf("%s is not a number (zero divided by zero)", text)
		}
		return 0, fmt.Errorf("%s divides by zero", text)
	}
	return nv / dv, nil
}

// parseNum reads a grammar number. Errors carry the span of the number.
func parseNum(n *grammar.Num) (number, *Error) {
	out := number{start: n.Pos.Offset, end: n.EndPos.Offset}
	fail := func(err error) (number, *Error) {
		return out, &Error{Start: out.start, End: out.end, Msg: err.Error()}
	}
	switch {
	case n.Only != nil:
		v, err := parseFrac(n.Only)
		if err != nil {
			return fail(err)
		}
		out.value, out.fraction = v, true
	default:
		w, dec, err := parseWhole(n.Whole)
		if err != nil {
			return fail(err)
		}
		out.value, out.decimal = w, dec
		out.integer = !strings.ContainsAny(dec, ".")
		if n.Frac != nil {
			f, err := parseFrac(n.Frac)
			if err != nil {
				return fail(err)
			}
			if !out.integer {
				return fail(fmt.Errorf("a mixed number needs a whole part, not %s", n.Whole))
			}
			out.value += f
			out.fraction, out.integer = true, false
		}
	}
	if out.decimal == "" || out.fraction {
		out.decimal = strconv.FormatFloat(out.value, 'f', -1, 64)
	}
	return out, nil
}

package colour

import (
	"fmt"
	"math"
	"strconv"
	"strings"
)

// ParseHex parses a hex colour: "#rrggbb", "rrggbb" or "#rgb" (each digit
// doubled, so "#f80" is "#ff8800"), in either case, with surrounding
// spaces ignored. Three digits need the "#", since bare words such as
// "bad" or "fed" are not colours. Errors quote the input and say what is
// wrong with it.
func ParseHex(s string) (RGB, error) {
	t := strings.TrimSpace(s)
	digits, hash := strings.CutPrefix(t, "#")
	if digits == "" {
		return RGB{}, fmt.Errorf("hex colour %q has no digits", s)
	}
	for _, r := range digits {
		if !isHexDigit(r) {
			return RGB{}, fmt.Errorf("hex colour %q: %q is not a hex digit", s, r)
		}
	}
	n := len(digits)
	switch {
	case n == 6:
		return RGB{hexByte(digits[0], digits[1]), hexByte(digits[2], digits[3]), hexByte(digits[4], digits[5])}, nil
	case n == 3 && hash:
		return RGB{hexByte(digits[0], digits[0]), hexByte(digits[1], digits[1]), hexByte(digits[2], digits[2])}, nil
	case n == 3:
		return RGB{}, fmt.Errorf("hex colour %q has 3 digits but no leading #; want #rgb or 6 digits", s)
	case hash:
		return RGB{}, fmt.Errorf("hex colour %q has %d digits; want 3 or 6", s, n)
	default:
		return RGB{}, fmt.Errorf("hex colour %q has %d digits; want 6", s, n)
	}
}

func isHexDigit(r rune) bool {
	return r >= '0' && r <= '9' || r >= 'a' && r <= 'f' || r >= 'A' && r <= 'F'
}

func hexNibble(c byte) uint8 {
	switch {
	case c >= '0' && c <= '9':
		return c - '0'
	case c >= 'a' && c <= 'f':
		return c - 'a' + 10
	default:
		return c - 'A' + 10
	}
}

func hexByte(hi, lo byte) uint8 { return hexNibble(hi)<<4 | hexNibble(lo) }

// rgbChannelNames name the channels in errors.
var rgbChannelNames = [3]string{"red", "green", "blue"}

// ParseRGBFunc parses a CSS-style rgb() colour: "rgb(12, 34, 56)" (comma
// separated), "rgb(12 34 56)" (space separated) or percentages
// "rgb(10%, 20%, 30%)". The function name is case-insensitive and spaces
// around the parts are ignored. Each channel is a decimal number 0..255
// or a percentage 0%..100% (100% = 255); fractions are rounded to the
// nearest integer, halves away from zero. An alpha part ("rgba(...)",
// "/ 0.5" or a fourth channel) is refused, since a catalog colour has no
// transparency. Errors name the channel or the part that is wrong.
func ParseRGBFunc(s string) (RGB, error) {
	inner, err := funcArgs(s, "rgb", "rgb colour")
	if err != nil {
		return RGB{}, err
	}
	if strings.Contains(inner, "/") {
		return RGB{}, fmt.Errorf("rgb colour %q has an alpha part; only opaque rgb(r, g, b) is supported", s)
	}
	parts, err := splitArgs(inner)
	if err != nil {
		return RGB{}, fmt.Errorf("rgb colour %q: %v", s, err)
	}
	if len(parts) != 3 {
		return RGB{}, fmt.Errorf("rgb colour %q has %d channels; want 3", s, len(parts))
	}
	var ch [3]uint8
	for i, p := range parts {
		name := rgbChannelNames[i]
		num, pct := strings.CutSuffix(p, "%")
		v, ok := parseDecimal(num)
		if !ok {
			return RGB{}, fmt.Errorf("rgb colour %q: %s %q is not a number or percentage", s, name, p)
		}
		if pct {
			if v < 0 || v > 100 {
				return RGB{}, fmt.Errorf("rgb colour %q: %s %q is out of range 0%%..100%%", s, name, p)
			}
			v = v * 255 / 100
		} else if v < 0 || v > 255 {
			return RGB{}, fmt.Errorf("rgb colour %q: %s %q is out of range 0..255", s, name, p)
		}
		ch[i] = uint8(math.Round(v))
	}
	return RGB{R: ch[0], G: ch[1], B: ch[2]}, nil
}

// ParseLab parses a CIE L*a*b* colour written as three numbers separated
// by commas ("53.2,80.1,67.2", spaces allowed after the commas) or by
// spaces ("53.2 80.1 67.2"), optionally inside "lab(...)" (the name
// case-insensitive). L must lie in 0..100 and a and b in -200..200; an
// error names the component that is out of range or not a number.
func ParseLab(s string) (Lab, error) {
	inner := strings.TrimSpace(s)
	if len(inner) >= 4 && strings.EqualFold(inner[:4], "lab(") {
		var err error
		if inner, err = funcArgs(s, "lab", "lab colour"); err != nil {
			return Lab{}, err
		}
	}
	parts, err := splitArgs(inner)
	if err != nil {
		return Lab{}, fmt.Errorf("lab colour %q: %v", s, err)
	}
	if len(parts) != 3 {
		return Lab{}, fmt.Errorf("lab colour %q has %d components; want 3 (L, a, b)", s, len(parts))
	}
	names := [3]string{"L", "a", "b"}
	lims := [3][2]float64{{0, 100}, {-200, 200}, {-200, 200}}
	var v [3]float64
	for i, p := range parts {
		x, ok := parseDecimal(p)
		if !ok {
			return Lab{}, fmt.Errorf("lab colour %q: %s %q is not a number", s, names[i], p)
		}
		if x < lims[i][0] || x > lims[i][1] {
			return Lab{}, fmt.Errorf("lab colour %q: %s %s is out of range %g..%g", s, names[i], p, lims[i][0], lims[i][1])
		}
		v[i] = x
	}
	return Lab{L: v[0], A: v[1], B: v[2]}, nil
}

// funcArgs returns the text between "name(" and the final ")" of s, the
// name matched case-insensitively. what names the value in errors.
func funcArgs(s, name, what string) (string, error) {
	t := strings.TrimSpace(s)
	open := name + "("
	if len(t) < len(open) || !strings.EqualFold(t[:len(open)], open) {
		if i := strings.IndexByte(t, '('); i > 0 && strings.EqualFold(t[:i], name+"a") {
			return "", fmt.Errorf("%s %q has an alpha part; only opaque %s(...) is supported", what, s, name)
		}
		return "", fmt.Errorf("%s %q does not start with %q", what, s, open)
	}
	rest := t[len(open):]
	inner, ok := strings.CutSuffix(rest, ")")
	if !ok {
		return "", fmt.Errorf("%s %q has no closing parenthesis", what, s)
	}
	if strings.ContainsAny(inner, "()") {
		return "", fmt.Errorf("%s %q has a stray parenthesis", what, s)
	}
	return inner, nil
}

// splitArgs splits the arguments of a colour function: by commas when
// there is one (each part trimmed), else by runs of spaces. A part that
// is empty, or that holds a space when commas separate, is an error.
func splitArgs(inner string) ([]string, error) {
	if !strings.Contains(inner, ",") {
		parts := strings.Fields(inner)
		if len(parts) == 0 {
			return nil, fmt.Errorf("no values")
		}
		return parts, nil
	}
	parts := strings.Split(inner, ",")
	for i, p := range parts {
		p = strings.TrimSpace(p)
		switch {
		case p == "":
			return nil, fmt.Errorf("value %d is empty", i+1)
		case strings.ContainsAny(p, " \t\n\r\f\v"):
			return nil, fmt.Errorf("value %d %q mixes spaces and commas as separators", i+1, p)
		}
		parts[i] = p
	}
	return parts, nil
}

// parseDecimal parses a plain decimal number: an optional sign, digits
// with at most one decimal point and at least one digit. It refuses what
// strconv.ParseFloat would also take (exponents, "inf", "nan", hex), as
// no one writes a colour that way.
func parseDecimal(s string) (float64, bool) {
	body := strings.TrimLeft(s, "+-")
	if len(s)-len(body) > 1 {
		return 0, false
	}
	digits, dots := 0, 0
	for i := 0; i < len(body); i++ {
		switch c := body[i]; {
		case c >= '0' && c <= '9':
			digits++
		case c == '.':
			dots++
		default:
			return 0, false
		}
	}
	if digits == 0 || dots > 1 {
		return 0, false
	}
	v, err := strconv.ParseFloat(s, 64)
	return v, err == nil
}

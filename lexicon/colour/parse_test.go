package colour

import (
	"strings"
	"testing"
)

// TestParseHex checks hex colour parsing. Valid forms follow the CSS Color
// 4 hex notation (#rrggbb, #rgb with each digit doubled; from memory of
// the spec, section "The RGB hexadecimal notations"); the bare six-digit
// form is common practice in catalogs.
func TestParseHex(t *testing.T) {
	tests := []struct {
		name    string
		in      string
		want    RGB
		wantErr string // substring of the error; "" for success
		reason  string
	}{
		{"six digits", "#1e90ff", RGB{0x1e, 0x90, 0xff}, "", "dodgerblue in css_named_colours.tsv"},
		{"upper case", "#1E90FF", RGB{0x1e, 0x90, 0xff}, "", "hex digits are case-insensitive (CSS Color 4)"},
		{"mixed case", "#1e90Ff", RGB{0x1e, 0x90, 0xff}, "", "hex digits are case-insensitive"},
		{"no hash", "ff8c00", RGB{0xff, 0x8c, 0x00}, "", "catalogs often drop the # (common practice)"},
		{"three digits", "#f80", RGB{0xff, 0x88, 0x00}, "", "#rgb doubles each digit (CSS Color 4)"},
		{"three digits upper", "#ABC", RGB{0xaa, 0xbb, 0xcc}, "", "#rgb doubles each digit"},
		{"spaces around", "  #000000 ", RGB{}, "", "surrounding spaces are not part of the colour"},
		{"two digits", "#12", RGB{}, `hex colour "#12" has 2 digits; want 3 or 6`, "neither form"},
		{"four digits", "#1234", RGB{}, "has 4 digits; want 3 or 6", "#rgba has alpha, which a catalog colour has not"},
		{"eight digits", "#11223344", RGB{}, "has 8 digits; want 3 or 6", "#rrggbbaa has alpha"},
		{"five bare digits", "12345", RGB{}, "has 5 digits; want 6", "without # only six digits"},
		{"three bare digits", "bad", RGB{}, "3 digits but no leading #", "a bare word such as bad is not a colour"},
		{"not hex", "#12g456", RGB{}, `'g' is not a hex digit`, "g is no hex digit"},
		{"double hash", "##123456", RGB{}, `'#' is not a hex digit`, "one # at most"},
		{"inner space", "#12 456", RGB{}, `' ' is not a hex digit`, "no spaces inside"},
		{"empty", "", RGB{}, "has no digits", "nothing to parse"},
		{"hash only", "#", RGB{}, "has no digits", "nothing after the #"},
		{"non-ASCII", "#12345é", RGB{}, `'é' is not a hex digit`, "the error names the character, not a byte of it"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got, err := ParseHex(tt.in)
			checkParse(t, tt.in, got, tt.want, err, tt.wantErr, tt.reason)
		})
	}
}

// checkParse compares a parse result with the expectation of a table
// case.
func checkParse[T comparable](t *testing.T, in string, got, want T, err error, wantErr, reason string) {
	t.Helper()
	switch {
	case wantErr == "" && err != nil:
		t.Errorf("parse %q: %v; want %v (%s)", in, err, want, reason)
	case wantErr == "" && got != want:
		t.Errorf("parse %q = %v; want %v (%s)", in, got, want, reason)
	case wantErr != "" && err == nil:
		t.Errorf("parse %q = %v; want an error containing %q (%s)", in, got, wantErr, reason)
	case wantErr != "" && !strings.Contains(err.Error(), wantErr):
		t.Errorf("parse %q: error %q; want it to contain %q (%s)", in, err, wantErr, reason)
	}
}

// TestParseRGBFunc checks rgb() parsing. The comma and space forms and
// percentages follow CSS Color 4, section "The RGB functions" (from
// memory); 100% = 255 there.
func TestParseRGBFunc(t *testing.T) {
	tests := []struct {
		name    string
		in      string
		want    RGB
		wantErr string
		reason  string
	}{
		{"commas", "rgb(12, 34, 56)", RGB{12, 34, 56}, "", "the legacy comma form"},
		{"commas tight", "rgb(12,34,56)", RGB{12, 34, 56}, "", "spaces after commas are optional"},
		{"spaces", "rgb(12 34 56)", RGB{12, 34, 56}, "", "the modern space form"},
		{"many spaces", "  RGB(  12   34  56 )  ", RGB{12, 34, 56}, "", "name case-insensitive, spaces free"},
		{"percent", "rgb(10%, 20%, 30%)", RGB{26, 51, 77}, "", "by hand: 25.5, 51, 76.5 rounded half away from zero"},
		{"percent ends", "rgb(0% 100% 50%)", RGB{0, 255, 128}, "", "100% is 255; 50% is 127.5, rounded up"},
		{"fractions", "rgb(12.4, 12.5, 254.6)", RGB{12, 13, 255}, "", "fractions round to nearest"},
		{"mixed forms", "rgb(255, 50%, 0)", RGB{255, 128, 0}, "", "each channel may be a number or a percentage"},
		{"ends of range", "rgb(0, 255, 0)", RGB{0, 255, 0}, "", "0 and 255 are in range"},
		{"red out of range", "rgb(256, 0, 0)", RGB{}, `red "256" is out of range 0..255`, "a channel has 8 bits"},
		{"green negative", "rgb(0, -1, 0)", RGB{}, `green "-1" is out of range 0..255`, "channels are not negative"},
		{"blue percent over", "rgb(0%, 0%, 101%)", RGB{}, `blue "101%" is out of range 0%..100%`, "percentages stop at 100"},
		{"not a number", "rgb(12, x, 56)", RGB{}, `green "x" is not a number`, "the bad part is named"},
		{"exponent", "rgb(1e2, 0, 0)", RGB{}, `red "1e2" is not a number`, "no one writes channels with exponents"},
		{"nan", "rgb(nan, 0, 0)", RGB{}, `red "nan" is not a number`, "not a number"},
		{"two channels", "rgb(12, 34)", RGB{}, "has 2 channels; want 3", "three channels"},
		{"four channels", "rgb(1, 2, 3, 0.5)", RGB{}, "has 4 channels; want 3", "the legacy alpha form"},
		{"slash alpha", "rgb(1 2 3 / 50%)", RGB{}, "has an alpha part", "the modern alpha form"},
		{"rgba", "rgba(1, 2, 3, 0.5)", RGB{}, "has an alpha part", "rgba names an alpha"},
		{"empty part", "rgb(1, , 3)", RGB{}, "value 2 is empty", "an empty channel"},
		{"mixed separators", "rgb(1, 2 3)", RGB{}, "mixes spaces and commas", "one separator or the other"},
		{"no close", "rgb(1, 2, 3", RGB{}, "no closing parenthesis", "unbalanced"},
		{"stray paren", "rgb((1, 2, 3)", RGB{}, "stray parenthesis", "unbalanced"},
		{"empty", "rgb()", RGB{}, "no values", "nothing inside"},
		{"wrong function", "hsl(1, 2%, 3%)", RGB{}, `does not start with "rgb("`, "only rgb()"},
		{"bare numbers", "12, 34, 56", RGB{}, `does not start with "rgb("`, "rgb() needs its name"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got, err := ParseRGBFunc(tt.in)
			checkParse(t, tt.in, got, tt.want, err, tt.wantErr, tt.reason)
		})
	}
}

// TestParseLab checks L*a*b* parsing. The ranges are whittle's:
// L* 0..100 as CIE 15 defines it, a* and b* within -200..200, wider than
// any real surface colour (common practice).
func TestParseLab(t *testing.T) {
	tests := []struct {
		name    string
		in      string
		want    Lab
		wantErr string
		reason  string
	}{
		{"commas", "53.2,80.1,67.2", Lab{53.2, 80.1, 67.2}, "", "comma separated"},
		{"commas spaced", "53.2, 80.1, 67.2", Lab{53.2, 80.1, 67.2}, "", "spaces after commas"},
		{"spaces", "53.2 80.1 67.2", Lab{53.2, 80.1, 67.2}, "", "space separated"},
		{"function", "lab(53.2 80.1 67.2)", Lab{53.2, 80.1, 67.2}, "", "CSS-style lab()"},
		{"function commas upper", "LAB(53.2, -80.1, -67.2)", Lab{53.2, -80.1, -67.2}, "", "name case-insensitive, negatives"},
		{"integers", "0 0 0", Lab{0, 0, 0}, "", "black"},
		{"ends of range", "100,-200,200", Lab{100, -200, 200}, "", "the limits themselves are allowed"},
		{"plus sign", "+50 +1 -1", Lab{50, 1, -1}, "", "explicit signs"},
		{"L over", "100.5 0 0", Lab{}, "L 100.5 is out of range 0..100", "L* above the white point"},
		{"L negative", "-1 0 0", Lab{}, "L -1 is out of range 0..100", "L* below black"},
		{"a out", "50 -201 0", Lab{}, "a -201 is out of range -200..200", "a* far outside any colour"},
		{"b out", "lab(50 0 250)", Lab{}, "b 250 is out of range -200..200", "b* far outside any colour"},
		{"not a number", "50 x 0", Lab{}, `a "x" is not a number`, "the bad part is named"},
		{"percent", "lab(50% 0 0)", Lab{}, `L "50%" is not a number`, "percentages are not supported"},
		{"double sign", "--5 0 0", Lab{}, `L "--5" is not a number`, "one sign at most"},
		{"two dots", "5.0.1 0 0", Lab{}, `L "5.0.1" is not a number`, "one decimal point"},
		{"two values", "50 0", Lab{}, "has 2 components; want 3", "L, a and b"},
		{"four values", "50 0 0 1", Lab{}, "has 4 components; want 3", "no alpha"},
		{"empty", "", Lab{}, "no values", "nothing to parse"},
		{"no close", "lab(50 0 0", Lab{}, "no closing parenthesis", "unbalanced"},
		{"mixed separators", "50, 0 0", Lab{}, "mixes spaces and commas", "one separator or the other"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got, err := ParseLab(tt.in)
			checkParse(t, tt.in, got, tt.want, err, tt.wantErr, tt.reason)
		})
	}
}

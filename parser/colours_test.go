package parser

import (
	"errors"
	"strings"
	"testing"
)

func TestReadColour(t *testing.T) {
	for _, tc := range []struct {
		name, in, hex, reason string
		inferred              bool
		err                   string
		unknown               bool // the error is an *UnknownColourError: well formed, not known
	}{
		// CSS values from testdata/reference/css_named_colours.tsv.
		{name: "css name", in: "rebeccapurple", hex: "#663399", reason: "a CSS name"},
		{name: "css name spaced", in: "light blue", hex: "#add8e6", reason: "CSS lightblue as shoppers type it"},
		{name: "a colour that is also a material", in: "linen", hex: "#faf0e6", reason: "asked for a colour, linen is CSS linen"},
		{name: "hex", in: "#663399", hex: "#663399", reason: "a hex value"},
		{name: "short hex", in: "#639", hex: "#663399", reason: "#rgb doubles each digit (CSS Color 4)"},
		{name: "bare hex", in: "663399", hex: "#663399", reason: "six hex digits without #"},
		{name: "rgb", in: "rgb(102, 51, 153)", hex: "#663399", reason: "rgb() with commas"},
		{name: "modified", in: "light sage", hex: "#bdd0a8", inferred: true, reason: "see TestModifiedColourValue"},
		{name: "with filler", in: "the navy", hex: "#000080", reason: "filler words are ignored"},
		{name: "unknown", in: "burgandy", unknown: true, err: `did you mean "burgundy"`, reason: "a near miss suggests the name"},
		{name: "not only a colour", in: "navy dress", unknown: true, err: "is not a colour", reason: "a query is not a colour"},
		{name: "excluded", in: "not navy", unknown: true, err: "is not a colour", reason: "an exclusion is not a colour"},
		{name: "multi", in: "multicolour", unknown: true, err: "is not a colour", reason: "a word for several colours has no single value"},
		{name: "bad hex", in: "#12345", err: "5 digits", reason: "a malformed hex"},
		{name: "hash before a name", in: "#navvy", err: `did you mean the colour "navy"`, reason: "a name typed after # is suggested"},
		{name: "lab out of range", in: "50,300,0", err: "out of range", reason: "a* beyond 200"},
		{name: "lab out of range suggests", in: "120,0,0", err: `nearest named colour within range is "white"`, reason: "L* 120 moved to 100 is white"},
		{name: "empty", in: "  ", err: "no colour", reason: "nothing given"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			r, err := ReadColour(tc.in, Options{})
			if tc.err != "" {
				if err == nil || !strings.Contains(err.Error(), tc.err) {
					t.Errorf("%s: got %v, want an error containing %q", tc.reason, err, tc.err)
				}
				var u *UnknownColourError
				if errors.As(err, &u) != tc.unknown {
					t.Errorf("%s: %v is an *UnknownColourError: %v, want %v (badly formed is another error)", tc.reason, err, !tc.unknown, tc.unknown)
				}
				return
			}
			if err != nil {
				t.Fatalf("%s: %v", tc.reason, err)
			}
			if r.Hex != tc.hex || r.Inferred != tc.inferred {
				t.Errorf("%s: got %s inferred=%v, want %s inferred=%v", tc.reason, r.Hex, r.Inferred, tc.hex, tc.inferred)
			}
		})
	}
}

// FuzzReadColour: any input either reads as a colour with a well-formed
// hex and a Lab inside the CIELAB ranges, or gives an error with a message.
func FuzzReadColour(f *testing.F) {
	for _, s := range []string{"navy", "light sage", "#663399", "#639", "rgb(1, 2, 3)", "rgb(10%, 20%, 30%)",
		"50,20,-10", "lab(50 20 -10)", "120,0,0", "burgandy", "", "#", "rgb(", "1,2", "not navy", "\xff"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		r, err := ReadColour(s, Options{})
		if err != nil {
			if err.Error() == "" {
				t.Fatalf("%q: empty error", s)
			}
			return
		}
		if len(r.Hex) != 7 || r.Hex[0] != '#' || r.Colour.Lab == nil {
			t.Fatalf("%q: bad reading %+v", s, r)
		}
		if l := r.Colour.Lab; l[0] < 0 || l[0] > 100 || l[1] < -200 || l[1] > 200 || l[2] < -200 || l[2] > 200 {
			t.Fatalf("%q: Lab %v out of range", s, *l)
		}
	})
}

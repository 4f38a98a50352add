package colour_test

import (
	"fmt"

	"github.com/whittle-search/whittle/lexicon/colour"
)

func ExampleParseHex() {
	c, err := colour.ParseHex("#1E90FF") // dodgerblue in CSS Color 4
	fmt.Println(c, err)
	c, err = colour.ParseHex("#f80")
	fmt.Println(c.Hex(), err)
	_, err = colour.ParseHex("#12")
	fmt.Println(err)
	// Output:
	// {30 144 255} <nil>
	// #ff8800 <nil>
	// hex colour "#12" has 2 digits; want 3 or 6
}

func ExampleParseRGBFunc() {
	c, err := colour.ParseRGBFunc("rgb(30, 144, 255)")
	fmt.Println(c.Hex(), err)
	c, err = colour.ParseRGBFunc("rgb(10% 20% 30%)")
	fmt.Println(c, err)
	_, err = colour.ParseRGBFunc("rgb(30, 300, 255)")
	fmt.Println(err)
	// Output:
	// #1e90ff <nil>
	// {26 51 77} <nil>
	// rgb colour "rgb(30, 300, 255)": green "300" is out of range 0..255
}

func ExampleParseLab() {
	l, err := colour.ParseLab("lab(53.24 80.09 67.2)")
	fmt.Println(l, err)
	l, err = colour.ParseLab("32.3, 79.19, -107.85")
	fmt.Println(l, err)
	_, err = colour.ParseLab("120 0 0")
	fmt.Println(err)
	// Output:
	// {53.24 80.09 67.2} <nil>
	// {32.3 79.19 -107.85} <nil>
	// lab colour "120 0 0": L 120 is out of range 0..100
}

func ExampleRGB_Hex() {
	fmt.Println(colour.RGB{R: 255, G: 140, B: 0}.Hex()) // darkorange
	// Output: #ff8c00
}

func ExampleRGB_Lab() {
	// CSS red; testdata/reference/css_named_colours.tsv gives
	// 53.2329 80.1053 67.2228.
	l := colour.RGB{R: 255}.Lab()
	fmt.Printf("%.4f %.4f %.4f\n", l.L, l.A, l.B)
	// Output: 53.2329 80.1053 67.2228
}

func ExampleLab_RGB() {
	// CSS red's L*a*b* from testdata/reference/css_named_colours.tsv.
	c, ok := colour.Lab{L: 53.2329, A: 80.1053, B: 67.2228}.RGB()
	fmt.Println(c.Hex(), ok)
	// No sRGB colour is that yellow at L* = 50.
	_, ok = colour.Lab{L: 50, A: 0, B: 120}.RGB()
	fmt.Println(ok)
	// Output:
	// #ff0000 true
	// false
}

func ExampleLab_LCh() {
	c := colour.Lab{L: 60, A: 30, B: -40}.LCh()
	fmt.Printf("L %.0f C %.0f h %.2f\n", c.L, c.C, c.H)
	// Output: L 60 C 50 h 306.87
}

func ExampleLCh_Lab() {
	l := colour.LCh{L: 60, C: 50, H: 90}.Lab()
	fmt.Printf("%.0f %.0f %.0f\n", l.L, l.A, l.B)
	// Output: 60 0 50
}

func ExampleDeltaE2000() {
	// Sharma, Wu and Dalal (2005), Table 1, pair 1: 2.0425.
	d := colour.DeltaE2000(colour.Lab{L: 50, A: 2.6772, B: -79.7751}, colour.Lab{L: 50, A: 0, B: -82.7485})
	fmt.Printf("%.4f\n", d)
	// Output: 2.0425
}

func ExampleDeltaE2000K() {
	x, y := colour.Lab{L: 50, A: 10, B: 10}, colour.Lab{L: 60, A: 10, B: 10}
	// kL = 2, common for textiles, halves a pure lightness difference.
	fmt.Printf("%.4f %.4f\n", colour.DeltaE2000K(x, y, 1, 1, 1), colour.DeltaE2000K(x, y, 2, 1, 1))
	// Output: 9.4706 4.7353
}

func ExampleDeltaE76() {
	fmt.Println(colour.DeltaE76(colour.Lab{L: 50, A: 0, B: 0}, colour.Lab{L: 50, A: 3, B: 4}))
	// Output: 5
}

func ExampleFamiliesOf() {
	for _, hex := range []string{"#000080", "#d2691e", "#d2b48c"} { // navy, chocolate, tan
		c, _ := colour.ParseHex(hex)
		fmt.Println(hex, colour.FamiliesOf(c.Lab()))
	}
	// Output:
	// #000080 [blue]
	// #d2691e [orange brown]
	// #d2b48c [yellow beige]
}

func ExampleModify() {
	l, ok := colour.Modify(colour.Lab{L: 50, A: 30, B: 40}, "pale")
	fmt.Printf("%.0f %.0f %.0f %v\n", l.L, l.A, l.B, ok)
	_, ok = colour.Modify(colour.Lab{L: 50, A: 30, B: 40}, "sparkly")
	fmt.Println(ok)
	// Output:
	// 65 18 24 true
	// false
}

// catalog is an invented catalog's colours.
func catalog() []colour.PaletteColour {
	var cs []colour.PaletteColour
	for _, c := range []struct {
		name, hex string
		count     int
	}{
		{"harbour blue", "#1e90ff", 120},
		{"lagoon", "#2491f5", 35},
		{"deep tarn", "#000080", 64},
		{"ember", "#ff4500", 18},
		{"sandbar", "#d2b48c", 77},
	} {
		rgb, _ := colour.ParseHex(c.hex)
		cs = append(cs, colour.PaletteColour{Name: c.name, Lab: rgb.Lab(), Count: c.count})
	}
	return cs
}

func ExampleNewPalette() {
	p := colour.NewPalette(catalog())
	fmt.Println(p.Len())
	// Output: 5
}

func ExamplePalette_Within() {
	p := colour.NewPalette(catalog())
	q, _ := colour.ParseHex("#1c8cf8")
	for _, m := range p.Within(q.Lab(), 5) {
		fmt.Printf("%s (%d products) ΔE00 %.2f\n", m.Name, m.Count, m.DeltaE)
	}
	// Output:
	// harbour blue (120 products) ΔE00 1.43
	// lagoon (35 products) ΔE00 1.77
}

func ExamplePalette_Nearest() {
	p := colour.NewPalette(catalog())
	q, _ := colour.ParseHex("#ff6347") // CSS tomato
	for _, m := range p.Nearest(q.Lab(), 2) {
		fmt.Printf("%s ΔE00 %.1f\n", m.Name, m.DeltaE)
	}
	// Output:
	// ember ΔE00 8.1
	// sandbar ΔE00 27.1
}

func ExamplePalette_Len() {
	fmt.Println(colour.NewPalette(nil).Len(), colour.NewPalette(catalog()).Len())
	// Output: 0 5
}

package colour

import "math"

// Family is a colour name at the level shoppers filter by ("red",
// "beige"), as opposed to an exact shade.
type Family string

// The colour families. [FamiliesOf] computes all but Multi from a colour;
// Multi is for words that name several colours at once ("multicoloured",
// "rainbow").
const (
	Red    Family = "red"
	Orange Family = "orange"
	Yellow Family = "yellow"
	Green  Family = "green"
	Blue   Family = "blue"
	Purple Family = "purple"
	Pink   Family = "pink"
	Brown  Family = "brown"
	Grey   Family = "grey"
	Black  Family = "black"
	White  Family = "white"
	Beige  Family = "beige"
	Multi  Family = "multi"
)

// Thresholds of the family rules, which the package comment states. Hues
// are CIELAB h_ab in degrees; ranges include their start and exclude
// their end.
const (
	neutralC = 8  // below this chroma a colour is a neutral
	whiteL   = 88 // a neutral at or above this lightness is white
	blackL   = 18 // a neutral at or below this lightness is black

	neutralBeigeC = 4  // a warm neutral with at least this chroma
	neutralBeigeL = 75 // and at least this lightness is also beige

	lightPinkL = 65 // red and purple hues at or above: also pink
	darkPinkL  = 40 // pink hues below: also red

	violetHueFrom = 285 // blue hues from here to the purple bin,
	violetL       = 40  // at or above this lightness
	violetC       = 65  // and below this chroma, are also purple

	brownRedHueFrom, brownRedHueTo = 20, 45 // red hues in this range
	brownRedL                      = 40     // below this lightness are also brown
	brownHueFrom, brownHueTo       = 45, 90 // orange and yellow hues in this range
	brownL                         = 60     // below this lightness are also brown,
	brownC                         = 75     // both only below this chroma

	// Chromatic colours below this chroma with blackL < L < whiteL are
	// also grey.
	greyishC = 13

	beigeHueFrom, beigeHueTo = 40, 112 // warm hues in this range
	beigeL                   = 70      // at or above this lightness
	beigeC                   = 32      // and below this chroma are also beige
)

// hueBins gives the family of each hue: a bin runs from its start to the
// next bin's start, and the last one wraps round through 360.
var hueBins = [...]struct {
	from float64
	fam  Family
}{
	{5, Red}, {45, Orange}, {78, Yellow}, {112, Green}, {195, Blue},
	{310, Purple}, {340, Pink},
}

// hueFamily returns the family of hue h in [0, 360).
func hueFamily(h float64) Family {
	f := hueBins[len(hueBins)-1].fam // [340, 360) and [0, 5)
	for _, b := range hueBins {
		if h < b.from {
			break
		}
		f = b.fam
	}
	return f
}

func inHue(h, from, to float64) bool { return h >= from && h < to }

// FamiliesOf returns the families a shopper would accept for the colour
// l, by the rules of the package comment: first the family of its hue
// (or black, grey or white for a neutral), then any others that also
// apply, in the order pink, red, purple, brown, grey, beige. It never returns
// Multi, and returns nil for a colour with a NaN component.
func FamiliesOf(l Lab) []Family {
	c := l.LCh()
	if math.IsNaN(c.L) || math.IsNaN(c.C) || math.IsNaN(c.H) {
		return nil
	}
	if c.C < neutralC {
		f := Grey
		switch {
		case c.L >= whiteL:
			f = White
		case c.L <= blackL:
			f = Black
		}
		fs := []Family{f}
		if c.C >= neutralBeigeC && c.L >= neutralBeigeL && inHue(c.H, beigeHueFrom, beigeHueTo) {
			fs = append(fs, Beige)
		}
		return fs
	}
	f := hueFamily(c.H)
	fs := []Family{f}
	if (f == Red || f == Purple) && c.L >= lightPinkL {
		fs = append(fs, Pink)
	}
	if f == Pink && c.L < darkPinkL {
		fs = append(fs, Red)
	}
	if f == Blue && c.H >= violetHueFrom && c.L >= violetL && c.C < violetC {
		fs = append(fs, Purple)
	}
	if c.C < brownC && ((inHue(c.H, brownRedHueFrom, brownRedHueTo) && c.L < brownRedL) ||
		(inHue(c.H, brownHueFrom, brownHueTo) && c.L < brownL)) {
		fs = append(fs, Brown)
	}
	if c.C < greyishC && c.L > blackL && c.L < whiteL {
		fs = append(fs, Grey)
	}
	if inHue(c.H, beigeHueFrom, beigeHueTo) && c.L >= beigeL && c.C < beigeC {
		fs = append(fs, Beige)
	}
	return fs
}

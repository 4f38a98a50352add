package lexicon

import (
	"fmt"
	"strings"
	"sync"
	"unicode/utf8"

	"github.com/whittle-search/whittle/lexicon/colour"
)

// ColourPalette returns the named colours of the lexicon that have a
// value, as a palette: every canonical name with its Lab. It is built on
// first use and shared.
func (l *Lexicon) ColourPalette() *colour.Palette {
	l.paletteOnce.Do(func() {
		var cs []colour.PaletteColour
		for _, e := range l.Entries(Colour) {
			if lab, ok := e.ColourLab(); ok {
				cs = append(cs, colour.PaletteColour{Name: e.Name, Lab: lab})
			}
		}
		l.palette = colour.NewPalette(cs)
	})
	return l.palette
}

// ColourLab returns a colour entry's value in CIELAB, or false when it
// has none (a word that names several colours, or a non-colour entry).
func (e *Entry) ColourLab() (colour.Lab, bool) {
	if e.Kind != Colour || e.Hex == "" || e.Hex == "multi" {
		return colour.Lab{}, false
	}
	rgb, err := colour.ParseHex(e.Hex)
	if err != nil {
		return colour.Lab{}, false
	}
	return rgb.Lab(), true
}

// ColourNamed returns the colour entry with a value that phrase names
// whole ("dusty rose", "navy blue"), with its Lab, or false.
func (l *Lexicon) ColourNamed(phrase string) (*Entry, colour.Lab, bool) {
	var keys []string
	for _, w := range Words(phrase) {
		keys = append(keys, l.Key(Normalise(w)))
	}
	n, es := l.Match(keys)
	if n == 0 || n != len(keys) {
		return nil, colour.Lab{}, false
	}
	for _, e := range es {
		if lab, ok := e.ColourLab(); ok {
			return e, lab, true
		}
	}
	return nil, colour.Lab{}, false
}

// Suggest returns the name or alias of kind k closest to word in edit
// distance (letters inserted, deleted, replaced or swapped), for "did you
// mean" messages; "" when nothing is within a third of the word's length.
func (l *Lexicon) Suggest(word string, k Kind) string {
	var names []string
	for _, e := range l.Entries(k) {
		names = append(names, e.Name)
		names = append(names, e.Aliases...)
	}
	return Closest(Normalise(word), names)
}

// Closest returns the option closest to word in edit distance (letters
// inserted, deleted, replaced or swapped), or "" when none is within a
// third of the word's length; the first of equally close options wins.
func Closest(word string, options []string) string {
	word = strings.Join(strings.Fields(word), " ")
	best, bestD := "", len(word)/3+1
	for _, s := range options {
		if d := editDistance(word, s, bestD); d < bestD {
			best, bestD = s, d
		}
	}
	return best
}

// DidYouMean is `; did you mean "x"?` for x, the option Closest finds
// for word, or "" when none is close: the tail of an error message that
// names what was meant.
func DidYouMean(word string, options []string) string {
	if s := Closest(word, options); s != "" {
		return fmt.Sprintf("; did you mean %q?", s)
	}
	return ""
}

// EditDistance is the optimal string alignment distance between a and b
// (Damerau–Levenshtein where no substring is edited twice), over runes.
func EditDistance(a, b string) int {
	return editDistance(a, b, len([]rune(a))+len([]rune(b))+1)
}

// EditDistanceWithin is EditDistance when that is at most limit, and
// limit+1 otherwise. It gives up as soon as the distance must exceed
// limit, so it is much cheaper than EditDistance for scanning a
// vocabulary for near spellings.
func EditDistanceWithin(a, b string, limit int) int {
	return editDistance(a, b, limit+1)
}

// editDistance is the optimal string alignment distance between a and b
// over runes, or limit when it is limit or more.
func editDistance(a, b string, limit int) int {
	if isASCII(a) && isASCII(b) {
		return osa([]byte(a), []byte(b), limit)
	}
	return osa([]rune(a), []rune(b), limit)
}

func isASCII(s string) bool {
	for i := 0; i < len(s); i++ {
		if s[i] >= utf8.RuneSelf {
			return false
		}
	}
	return true
}

// osa is editDistance over letters: bytes when both words are ASCII, so
// that scanning a vocabulary neither decodes nor allocates for the words
// of a shopping query.
func osa[T byte | rune](x, y []T, limit int) int {
	if d := len(x) - len(y); d >= limit || -d >= limit {
		return limit
	}
	// Three rows of the table; on the stack for words of up to 31 letters.
	var stack [3 * 32]int
	n := len(y) + 1
	rows := stack[:]
	if 3*n > len(stack) {
		rows = make([]int, 3*n)
	}
	prev2, prev, cur := rows[:n], rows[n:2*n], rows[2*n:3*n]
	for j := range prev {
		prev[j] = j
	}
	for i := 1; i <= len(x); i++ {
		cur[0] = i
		rowMin := cur[0]
		for j := 1; j <= len(y); j++ {
			cost := 1
			if x[i-1] == y[j-1] {
				cost = 0
			}
			cur[j] = min(prev[j]+1, cur[j-1]+1, prev[j-1]+cost)
			if i > 1 && j > 1 && x[i-1] == y[j-2] && x[i-2] == y[j-1] {
				cur[j] = min(cur[j], prev2[j-2]+1)
			}
			rowMin = min(rowMin, cur[j])
		}
		if rowMin >= limit {
			return limit
		}
		prev2, prev, cur = prev, cur, prev2
	}
	return min(prev[len(y)], limit)
}

// paletteState is embedded in Lexicon for ColourPalette.
type paletteState struct {
	paletteOnce sync.Once
	palette     *colour.Palette
}

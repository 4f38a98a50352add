package units

import (
	"unicode"
	"unicode/utf8"
)

// maxKey bounds the length in bytes of a normalised spelling; no unit
// spelling comes close, so longer input is simply unknown.
const maxKey = 48

// Lookup finds a unit by any spelling a shopper types: symbols and names,
// singular and plural, British and American spellings ("mm", "millimetre",
// "millimeters", "in", "inch", `"`, "ft", "feet", "'", "lbs", "fl. oz.",
// "litre", "ltr", "cc", "watts", "amps", "mAh", "gig", "hrs", ...).
//
// Matching ignores case and surrounding white space; inside the spelling,
// full stops are dropped and runs of spaces, hyphens and underscores count
// as one space, so "Fl. Oz.", "fl oz" and "FL-OZ" are the same. The marks
// `"`, ″ and ” mean inch; ', ′ and ’ mean foot, and a doubled foot mark
// (two apostrophes, ′′ or ’’) means inch. "m" is the metre: whether a bare
// "m" is a clothing size is the parser's decision. Gallon, quart, pint, cup
// and fluid ounce resolve by sys; "US gal" and "imperial gallon" name their
// system whatever sys is.
// Names that are ambiguous in shops, such as "gr" (gram or grain), are not
// known. Lookup returns false for unknown spellings.
//
// Lookup does not allocate.
func Lookup(s string, sys VolumeSystem) (Unit, bool) {
	var buf [maxKey]byte
	n, ok := normalise(s, &buf)
	if !ok || n == 0 {
		return Unit{}, false
	}
	e, ok := spelled[string(buf[:n])]
	if !ok {
		return Unit{}, false
	}
	if sys == Imperial {
		return table[e.imp], true
	}
	return table[e.us], true
}

// normalise writes the comparison form of s into buf and returns its
// length: lower case, full stops dropped, separators (white space, hyphens,
// underscores) collapsed to single inner spaces. It reports false when the
// result does not fit in buf.
func normalise(s string, buf *[maxKey]byte) (int, bool) {
	n := 0
	pending := false // a separator was seen since the last kept character
	for i := 0; i < len(s); {
		c := s[i]
		var r rune
		if c < utf8.RuneSelf {
			r = rune(c)
			i++
		} else {
			var size int
			r, size = utf8.DecodeRuneInString(s[i:])
			i += size
		}
		switch {
		case r == '.':
			continue
		case isSeparator(r):
			pending = n > 0
			continue
		}
		if pending {
			if n >= maxKey {
				return 0, false
			}
			buf[n] = ' '
			n++
			pending = false
		}
		if r < utf8.RuneSelf {
			if 'A' <= r && r <= 'Z' {
				r += 'a' - 'A'
			}
			if n >= maxKey {
				return 0, false
			}
			buf[n] = byte(r)
			n++
			continue
		}
		r = unicode.ToLower(r)
		if n+utf8.RuneLen(r) > maxKey {
			return 0, false
		}
		n += utf8.EncodeRune(buf[n:], r)
	}
	return n, true
}

// isSeparator reports whether r separates words of a unit spelling.
func isSeparator(r rune) bool {
	switch r {
	case ' ', '\t', '\n', '\r', '\v', '\f', '-', '_',
		'\u00a0', // no-break space
		'\u2009', // thin space
		'\u202f', // narrow no-break space
		'\u2010', // hyphen
		'\u2011': // non-breaking hyphen
		return true
	}
	return false
}

// OpensPhrase reports whether word (lower case, no full stops) is the
// first word of a unit spelled in several words, such as "fl" in "fl oz"
// or "imperial" in "imperial gallon". A tokenizer uses it to try a longer
// spelling only where one can start.
func OpensPhrase(word string) bool { return openers[word] }

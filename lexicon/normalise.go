package lexicon

import (
	"strings"
	"sync"
	"unicode"
	"unicode/utf8"

	porterstemmer "github.com/blevesearch/go-porterstemmer"
	"golang.org/x/text/cases"
	"golang.org/x/text/unicode/norm"
)

// Normalise returns s in the form whittle compares words in: Unicode NFKC,
// then case folded. ASCII input takes a fast path that only lower-cases.
func Normalise(s string) string {
	ascii := true
	upper := false
	for i := 0; i < len(s); i++ {
		c := s[i]
		if c >= utf8.RuneSelf {
			ascii = false
			break
		}
		if 'A' <= c && c <= 'Z' {
			upper = true
		}
	}
	if ascii {
		if !upper {
			return s
		}
		return strings.ToLower(s)
	}
	return folder().String(norm.NFKC.String(s))
}

var (
	foldOnce sync.Once
	foldPool sync.Pool
)

// caser is not safe for concurrent use, so each call takes one from a pool.
type pooledCaser struct{ c cases.Caser }

func (p *pooledCaser) String(s string) string {
	out := p.c.String(s)
	foldPool.Put(p)
	return out
}

func folder() *pooledCaser {
	foldOnce.Do(func() {
		foldPool.New = func() any { return &pooledCaser{c: cases.Fold()} }
	})
	return foldPool.Get().(*pooledCaser)
}

// Stem returns the English stem of one normalised word, using the same
// Porter stemmer as bleve's "en" analyzer, so that query words and indexed
// words meet on the same form. Words with digits or of one or two letters
// are returned unchanged.
func Stem(word string) string {
	if len(word) <= 2 {
		return word
	}
	for _, r := range word {
		if !unicode.IsLetter(r) {
			return word
		}
	}
	return porterstemmer.StemString(word)
}

// Key returns the form a single word is stored and looked up under:
// normalised, with a possessive "'s" removed, then stemmed.
func Key(word string) string {
	w := Normalise(word)
	w = strings.TrimSuffix(w, "'s")
	w = strings.TrimSuffix(w, "’s")
	w = strings.TrimSuffix(w, "'")
	return Stem(w)
}

// Words splits a phrase into the words the matcher compares: it splits on
// spaces and hyphens and drops empty parts. "V-Neck  top" gives
// ["V", "Neck", "top"].
func Words(phrase string) []string {
	return strings.FieldsFunc(phrase, func(r rune) bool {
		return r == ' ' || r == '-' || r == '\t' || r == '‐' || r == '–'
	})
}

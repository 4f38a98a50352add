package lexicon

import (
	"slices"
	"strings"
	"unicode/utf8"
)

// NearWords finds, among a fixed list of words, the one nearest to a
// misspelt word in edit distance, without comparing it with every word.
//
// For a lookup within one edit it keeps, for each word, the word itself
// and every string made by deleting one of its letters. Two words one
// edit apart (a letter inserted, deleted or replaced, or two swapped)
// share such a string, so only the words that share one with the
// misspelling are compared with it: the symmetric deletion method. A
// wider lookup compares the words whose length is within the limit of
// the misspelling's, since no word further in length can be nearer. In
// both, EditDistanceWithin decides.
//
// A NearWords is safe for concurrent use once made.
type NearWords struct {
	words        []string
	byDel        map[string][]int32
	byLength     map[int][]int32
	byConsonants map[string][]int32
}

// NewNearWords indexes words; it takes a few milliseconds for a
// thousand words.
func NewNearWords(words []string) *NearWords {
	n := &NearWords{words: words, byDel: make(map[string][]int32, 8*len(words)), byLength: make(map[int][]int32),
		byConsonants: make(map[string][]int32, len(words))}
	for i, w := range words {
		k := consonants(w)
		n.byConsonants[k] = append(n.byConsonants[k], int32(i))
		for _, d := range deletions(w) {
			n.byDel[d] = append(n.byDel[d], int32(i))
		}
		l := utf8.RuneCountInString(w)
		n.byLength[l] = append(n.byLength[l], int32(i))
	}
	return n
}

// Nearest returns the index of the first word, in the list's order, at
// the least edit distance from w, and that distance, if it is at most
// limit; else -1 and limit+1.
func (n *NearWords) Nearest(w string, limit int) (int, int) {
	limit = max(limit, 0)
	best, bestD := -1, limit+1
	n.candidates(w, limit, func(j int) {
		if j == best {
			return
		}
		d := EditDistanceWithin(w, n.words[j], min(bestD, limit))
		if d <= limit && (d < bestD || d == bestD && j < best) {
			best, bestD = j, d
		}
	})
	return best, bestD
}

// AllNearest returns the indexes, in the list's order, of every word at
// the least edit distance from w, and that distance, if it is at most
// limit; else nil and limit+1. Its first index is Nearest's.
func (n *NearWords) AllNearest(w string, limit int) ([]int, int) {
	limit = max(limit, 0)
	var all []int
	bestD := limit + 1
	n.candidates(w, limit, func(j int) {
		d := EditDistanceWithin(w, n.words[j], min(bestD, limit))
		switch {
		case d > limit || d > bestD:
		case d < bestD:
			all, bestD = []int{j}, d
		default:
			all = append(all, j)
		}
	})
	slices.Sort(all)
	return slices.Compact(all), bestD
}

// VowelSlips returns the indexes, in the list's order, of the words
// that differ from w only in their vowels (a, e, i, o and u put in, left
// out or put for another), that begin with w's letter and are within two
// edits of it: "sandles" slips to "sandals", two edits away, and not to
// "candles", one away. Getting a vowel wrong is the commonest way a word
// is misspelt, and the first letter the least often wrong (common
// knowledge of spelling correction), so a slip is a likelier reading
// than a word as near or nearer that changes a consonant. It returns nil
// for w of fewer than three consonants, which too many words share.
func (n *NearWords) VowelSlips(w string) []int {
	k := consonants(w)
	first, _ := utf8.DecodeRuneInString(w)
	if utf8.RuneCountInString(k) < 3 {
		return nil
	}
	var out []int
	for _, j := range n.byConsonants[k] {
		c := n.words[j]
		if f, _ := utf8.DecodeRuneInString(c); f != first || c == w {
			continue
		}
		if EditDistanceWithin(w, c, 2) <= 2 {
			out = append(out, int(j))
		}
	}
	return out
}

// consonants is w less its vowels a, e, i, o and u, in either case.
func consonants(w string) string {
	var b strings.Builder
	for _, r := range w {
		switch r {
		case 'a', 'e', 'i', 'o', 'u', 'A', 'E', 'I', 'O', 'U':
			continue
		}
		b.WriteRune(r)
	}
	return b.String()
}

// candidates calls f with the index of every word that may be within
// limit of w, some more than once: for a limit of 1, the words that
// share a deletion with w; else those whose length is within the limit.
func (n *NearWords) candidates(w string, limit int, f func(j int)) {
	if limit <= 1 {
		for _, d := range deletions(w) {
			for _, j := range n.byDel[d] {
				f(int(j))
			}
		}
		return
	}
	l := utf8.RuneCountInString(w)
	for k := l - limit; k <= l+limit; k++ {
		for _, j := range n.byLength[k] {
			f(int(j))
		}
	}
}

// deletions lists w and every distinct string made by deleting one of
// its letters. Deleting either of two equal letters side by side gives
// the same string, so only the first of a run is deleted.
func deletions(w string) []string {
	rs := []rune(w)
	out := make([]string, 0, len(rs)+1)
	out = append(out, w)
	for i := range rs {
		if i > 0 && rs[i] == rs[i-1] {
			continue
		}
		out = append(out, string(rs[:i])+string(rs[i+1:]))
	}
	return out
}

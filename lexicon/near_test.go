package lexicon

import (
	"slices"
	"strings"
	"testing"
)

// singleWords are the words of one word the default lexicon knows.
func singleWords(t *testing.T) []string {
	var words []string
	for _, k := range []Kind{ProductType, Colour, Material, Pattern, Silhouette, Brand} {
		for _, e := range Default().Entries(k) {
			for _, w := range append([]string{e.Name}, e.Aliases...) {
				if !strings.ContainsAny(w, " -") {
					words = append(words, w)
				}
			}
		}
	}
	if len(words) < 100 {
		t.Fatalf("only %d words", len(words))
	}
	return words
}

// scanNearest is the plain scan NearWords stands in for: every word
// compared, the first of least distance kept.
func scanNearest(words []string, w string, limit int) (int, int) {
	best, bestD := -1, limit+1
	for j, v := range words {
		if d := EditDistanceWithin(w, v, bestD-1); d < bestD {
			best, bestD = j, d
		}
	}
	return best, bestD
}

// NearWords finds what the plain scan finds, for misspellings of each
// kind (a letter dropped, added, replaced, two swapped, two edits at
// once) of every third single word the default lexicon knows.
func TestNearWordsAgreesWithScan(t *testing.T) {
	words := singleWords(t)
	nw := NewNearWords(words)
	misspell := func(w string, i int) []string {
		r := []rune(w)
		if len(r) < 3 {
			return nil
		}
		i %= len(r) - 1
		out := []string{
			string(r[:i]) + string(r[i+1:]),                                 // dropped
			string(r[:i]) + "q" + string(r[i:]),                             // added
			string(r[:i]) + "z" + string(r[i+1:]),                           // replaced
			string(r[:i]) + string(r[i+1]) + string(r[i]) + string(r[i+2:]), // swapped
		}
		return append(out, out[1][:len(out[1])-1]+"x") // two edits
	}
	checked := 0
	for i, w := range words {
		if i%3 != 0 {
			continue // a third of the words is plenty, and keeps -race quick
		}
		for _, m := range misspell(w, i) {
			for limit := 0; limit <= 2; limit++ {
				gj, gd := nw.Nearest(m, limit)
				wj, wd := scanNearest(words, m, limit)
				if gj != wj || gd != wd {
					t.Fatalf("Nearest(%q, %d) = %d (%q), %d; the scan finds %d, %d", m, limit, gj, at(words, gj), gd, wj, wd)
				}
				if all, ad := nw.AllNearest(m, limit); !slices.Equal(all, scanAll(words, m, limit)) || ad != wd {
					t.Fatalf("AllNearest(%q, %d) = %v, %d; the scan finds %v, %d", m, limit, all, ad, scanAll(words, m, limit), wd)
				}
				checked++
			}
		}
	}
	t.Logf("%d lookups agree over %d words", checked, len(words))
}

// scanAll is the plain scan AllNearest stands in for: every word of the
// least distance, within limit, in the list's order.
func scanAll(words []string, w string, limit int) []int {
	var all []int
	best := limit + 1
	for j, v := range words {
		d := EditDistanceWithin(w, v, limit)
		if d < best {
			all, best = nil, d
		}
		if d == best && d <= limit {
			all = append(all, j)
		}
	}
	return all
}

func at(words []string, i int) string {
	if i < 0 {
		return ""
	}
	return words[i]
}

func TestNearWordsEdges(t *testing.T) {
	nw := NewNearWords([]string{"sweater", "sweeter", "jacket", "café"})
	for _, tc := range []struct {
		w      string
		limit  int
		want   int
		wantD  int
		reason string
	}{
		{"sweter", 1, 0, 1, "one letter from both sweater and sweeter: the first wins"},
		{"jakcet", 1, 2, 1, "two letters swapped is one edit"},
		{"cafe", 1, 3, 1, "a rune replaced, not two bytes"},
		{"xxxxxx", 2, -1, 3, "nothing within two"},
		{"jackets", 9, 2, 1, "a wide limit still finds the nearest"},
		{"swaeters", 2, 0, 2, "two edits: a swap and an added letter"},
	} {
		j, d := nw.Nearest(tc.w, tc.limit)
		if j != tc.want || d != tc.wantD {
			t.Errorf("Nearest(%q, %d) = %d, %d; want %d, %d (%s)", tc.w, tc.limit, j, d, tc.want, tc.wantD, tc.reason)
		}
	}
}

// The vowel slips of a word, case by case. The misspellings are of the
// common kind spelling checkers are built for (common practice); each
// distance is worked out by hand.
func TestVowelSlips(t *testing.T) {
	nw := NewNearWords([]string{"candles", "sandals", "sandal", "saddles", "pajamas", "sundial", "sndls", "tote", "café"})
	for _, tc := range []struct {
		w      string
		want   []int
		reason string
	}{
		{"sandles", []int{1, 6}, "sandals: e for a and a put in, two edits, consonants s-n-d-l-s kept; sndls: both vowels left out; candles changes the first letter, saddles a consonant"},
		{"sandels", []int{1, 6}, "sandals, one edit; sndls, two"},
		{"sandle", []int{2}, "sandal: two edits, consonants s-n-d-l"},
		{"sandals", []int{6}, "the word itself is no slip of itself; sndls is two vowels left out"},
		{"sundels", []int{1, 6}, "sandals: u for a and e for a, two edits; sndls, two; sundial is three"},
		{"sondeles", nil, "sandals three edits away: o for a, e put in, e for a"},
		{"pyjamas", nil, "y is a consonant here: p-y-j-m-s is not p-j-m-s"},
		{"tote", nil, "t-t: too few consonants to say"},
		{"toet", nil, "too few consonants"},
		{"cafi", nil, "c-f: too few consonants"},
		{"Sandles", nil, "case is kept: the vocabulary is lower case"},
	} {
		if got := nw.VowelSlips(tc.w); !slices.Equal(got, tc.want) {
			t.Errorf("VowelSlips(%q) = %v, want %v (%s)", tc.w, got, tc.want, tc.reason)
		}
	}
}

// VowelSlips finds what a plain scan finds: every word of the same
// first letter and the same consonants within two edits, in the list's
// order, for vowel slips made in every word the default lexicon knows.
func TestVowelSlipsAgreesWithScan(t *testing.T) {
	words := singleWords(t)
	nw := NewNearWords(words)
	strip := func(w string) string {
		return strings.Map(func(r rune) rune {
			if strings.ContainsRune("aeiouAEIOU", r) {
				return -1
			}
			return r
		}, w)
	}
	scan := func(w string) []int {
		var out []int
		for j, v := range words {
			if len([]rune(strip(w))) >= 3 && v != w && strip(v) == strip(w) && []rune(v)[0] == []rune(w)[0] && EditDistance(w, v) <= 2 {
				out = append(out, j)
			}
		}
		return out
	}
	checked := 0
	for i, w := range words {
		if i%3 != 0 {
			continue
		}
		for _, m := range []string{
			strings.Replace(w, "a", "e", 1),
			strings.Replace(w, "e", "", 1),
			strings.Replace(strings.Replace(w, "o", "u", 1), "i", "ee", 1),
		} {
			if got, want := nw.VowelSlips(m), scan(m); !slices.Equal(got, want) {
				t.Fatalf("VowelSlips(%q) = %v, the scan finds %v", m, got, want)
			}
			checked++
		}
	}
	t.Logf("%d lookups agree over %d words", checked, len(words))
}

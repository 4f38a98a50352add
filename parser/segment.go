package parser

import (
	"slices"
	"strings"
	"unicode/utf8"

	"github.com/alecthomas/participle/v2/lexer"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/parser/internal/grammar"
)

type unitKind uint8

const (
	uWord unitKind = iota // a lexicon phrase, or one plain word
	uItem                 // a structured item from the grammar
	uSym                  // a punctuation token
	uNeg                  // an exclusion mark stuck to the next span ("-")
)

// unit is one piece of the query as the tagger walks it.
type unit struct {
	kind       unitKind
	start, end int
	// text is the normalised text of a word unit, words joined by spaces.
	text    string
	entries []*lexicon.Entry
	item    *grammar.Item
	tok     lexer.Token
	// spaceBefore is false when nothing separates the unit from the one
	// before it ("3xl", "8w").
	spaceBefore bool
	// chosen is the entry the unit is read as, when it has several.
	chosen *lexicon.Entry
	// modifier marks a product type that qualifies the one after it
	// ("saucepan lid"); feature marks one that describes a part ("with
	// lid", "marble top"). Neither can be the head.
	modifier, feature bool
	// partTyped marks a feature that keeps its typed words, not the
	// lexicon's name for them: a keyboard's "brown switches" are no
	// light switch.
	partTyped bool
}

// word is one matchable word: a lexer word, or one part of a hyphenated
// word.
type word struct {
	start, end  int
	norm, key   string
	piece       int // index of the lexer word it came from
	first       bool
	spaceBefore bool
}

// segment walks the tokens, hands every place where a structure may start
// to the grammar, and matches runs of words against the lexicon.
func (p *tagger) segment() []unit {
	var (
		out   []unit
		words []word
		space = true
		piece = 0
	)
	flush := func() {
		out = append(out, p.match(words)...)
		words = words[:0]
	}
	toks := p.toks
	for i := 0; i < len(toks) && toks[i].Type != lexer.EOF; {
		t := toks[i]
		if t.Type == grammar.Type(grammar.TSpace) {
			space = true
			i++
			continue
		}
		if t.Type == grammar.Type(grammar.TDash) && space && i+1 < len(toks) && marksExclusion(toks[i+1].Type) {
			// A minus stuck to a word or a number excludes what it
			// starts: the word ("-leather"), the code or size it runs
			// into ("-cr2032", "-m8", "-12awg", "-2x4"), a price
			// ("-$50"), read from there on as if no mark were there.
			flush()
			out = append(out, unit{kind: uNeg, start: t.Pos.Offset, end: t.Pos.Offset + 1, spaceBefore: space})
			space = false
			i++
			continue
		}
		if grammar.Starts(toks[i:]) {
			it, n := grammar.ParseItem(toks[i:])
			if it != nil && it.Exclude != nil && !space {
				it = nil // "3-ply": a hyphen, not an exclusion
			}
			if it != nil {
				flush()
				start, end := t.Pos.Offset, p.tokEnd(i+n-1)
				if ex := it.Exclude; ex != nil {
					out = append(out, unit{kind: uNeg, start: start, end: start + 1, spaceBefore: space})
					out = append(out, unit{kind: uItem, start: ex.Quoted.Pos.Offset, end: end, item: &grammar.Item{Quoted: ex.Quoted}})
				} else {
					out = append(out, unit{kind: uItem, start: start, end: end, item: it, spaceBefore: space})
				}
				i += n
				space = false
				continue
			}
		}
		if isWordType(t.Type) {
			words = p.addWord(words, i, piece, space)
			piece++
		} else {
			flush()
			out = append(out, unit{kind: uSym, start: t.Pos.Offset, end: p.tokEnd(i), tok: t, spaceBefore: space})
		}
		space = false
		i++
	}
	flush()
	return out
}

// marksExclusion reports whether a minus before a token of type t is an
// exclusion mark: before a word, a number, a vulgar fraction or a
// currency sign. (Before a bare number the tagger takes it back: see
// add.)
func marksExclusion(t lexer.TokenType) bool {
	return isWordType(t) || t == grammar.Type(grammar.TNumber) || t == grammar.Type(grammar.TVulgar) || t == grammar.Type(grammar.TCur)
}

func isWordType(t lexer.TokenType) bool {
	return t == grammar.Type(grammar.TWord) || t == grammar.Type(grammar.TUnit) || t == grammar.Type(grammar.TCurWord)
}

// addWord splits lexer word i at its hyphens into matchable words.
func (p *tagger) addWord(words []word, i, piece int, space bool) []word {
	start, end := p.toks[i].Pos.Offset, p.tokEnd(i)
	raw := p.q[start:end]
	first := true
	for off := 0; off < len(raw); {
		j := off
		for j < len(raw) {
			r, n := utf8.DecodeRuneInString(raw[j:])
			if r == '-' || r == '‐' {
				break
			}
			j += n
		}
		if j > off {
			n := lexicon.Normalise(raw[off:j])
			words = append(words, word{start: start + off, end: start + j, norm: n, key: p.lex.Key(n), piece: piece, first: first, spaceBefore: space && first})
			first = false
		}
		_, n := utf8.DecodeRuneInString(raw[j:])
		off = j + n
	}
	return words
}

// match finds lexicon phrases in a run of words, longest first, left to
// right. A hyphenated word none of whose parts starts a phrase stays one
// plain word. A phrase whose entries the words reach only through an
// over-stemmed word (see overStemmed) is no match, and a shorter one is
// tried: "on earrings" is not the headphone fit "on ear".
func (p *tagger) match(ws []word) []unit {
	if len(ws) == 0 {
		return nil
	}
	keys := make([]string, len(ws))
	for i, w := range ws {
		keys[i] = w.key
	}
	var out []unit
	for j := 0; j < len(ws); {
		n, entries := p.lex.Match(keys[j:])
		text, textN := "", 0 // the text of the first textN words
		for n > 0 {
			text, textN = unitText(ws[j:j+n]), n
			if kept := readable(entries, text); len(kept) > 0 {
				entries = kept
				break
			}
			n, entries = p.lex.Match(keys[j : j+n-1])
		}
		if n == 0 && ws[j].first {
			// Try the hyphenated word joined up: "t-shirt" as "tshirt".
			k := j
			for k+1 < len(ws) && ws[k+1].piece == ws[j].piece {
				k++
			}
			if k > j {
				var b strings.Builder
				for _, w := range ws[j : k+1] {
					b.WriteString(w.norm)
				}
				if m, es := p.lex.Match([]string{p.lex.Key(b.String())}); m == 1 {
					n, entries = k-j+1, es
				} else if !p.anyMatch(keys[j+1 : k+1]) {
					n = k - j + 1 // keep "ultra-soft" whole
				}
			}
		}
		if n == 0 {
			n = 1
		}
		if textN != n {
			text = unitText(ws[j : j+n])
		}
		last := ws[j+n-1]
		out = append(out, unit{kind: uWord, start: ws[j].start, end: last.end, text: text, entries: entries, spaceBefore: ws[j].spaceBefore})
		j += n
	}
	return out
}

// unitText is the normalised text of a run of words: the parts of one
// hyphenated word joined by "-", words by " ".
func unitText(ws []word) string {
	var b strings.Builder
	for x, w := range ws {
		if x > 0 {
			if w.piece == ws[x-1].piece {
				b.WriteByte('-')
			} else {
				b.WriteByte(' ')
			}
		}
		b.WriteString(w.norm)
	}
	return b.String()
}

// readable returns the entries text may be read as: all of them when it
// spells one exactly, else those it does not reach only through an
// over-stemmed word.
func readable(es []*lexicon.Entry, text string) []*lexicon.Entry {
	if slices.ContainsFunc(es, func(e *lexicon.Entry) bool { return spells(e, text) }) {
		return es
	}
	var out []*lexicon.Entry
	for _, e := range es {
		if !overStemmed(e, text) {
			out = append(out, e)
		}
	}
	return out
}

func (p *tagger) anyMatch(keys []string) bool {
	for i := range keys {
		if n, _ := p.lex.Match(keys[i:]); n > 0 {
			return true
		}
	}
	return false
}

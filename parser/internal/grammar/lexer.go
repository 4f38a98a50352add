package grammar

import (
	"io"
	"strings"
	"unicode"
	"unicode/utf8"

	"github.com/alecthomas/participle/v2/lexer"
	"golang.org/x/text/unicode/norm"

	"github.com/whittle-search/whittle/lexicon/units"
)

// Token type names, as the grammar refers to them.
const (
	TSpace   = "Space"   // white space, control characters, invalid bytes
	TNumber  = "Number"  // 12, 3.5, 1,299, full-width digits
	TVulgar  = "Vulgar"  // ½ and the other vulgar fraction characters
	TWord    = "Word"    // letters, with inner hyphens and apostrophes
	TUnit    = "Unit"    // a word that names a unit of measure
	TCurWord = "CurWord" // usd, eur, euros, dollars, ...
	TCur     = "Cur"     // a currency symbol: $ € £ ¥ ...
	TMark    = "Mark"    // an inch or foot mark right after a number
	TQuote   = "Quote"   // a quotation mark opening or closing a phrase
	TOp      = "Op"      // < > <= >=
	TDash    = "Dash"    // - and the dashes
	TSlash   = "Slash"   // / and the fraction slash
	TTimes   = "Times"   // ×
	THash    = "Hash"    // #
	TPlus    = "Plus"    // +
	TPunct   = "Punct"   // anything else
)

var symbolNames = []string{TSpace, TNumber, TVulgar, TWord, TUnit, TCurWord, TCur,
	TMark, TQuote, TOp, TDash, TSlash, TTimes, THash, TPlus, TPunct}

var symbols = func() map[string]lexer.TokenType {
	m := map[string]lexer.TokenType{"EOF": lexer.EOF}
	for i, n := range symbolNames {
		m[n] = lexer.TokenType(-(i + 2))
	}
	return m
}()

// Type returns the token type with the given name.
func Type(name string) lexer.TokenType { return symbols[name] }

var (
	tySpace   = symbols[TSpace]
	tyNumber  = symbols[TNumber]
	tyVulgar  = symbols[TVulgar]
	tyWord    = symbols[TWord]
	tyUnit    = symbols[TUnit]
	tyCurWord = symbols[TCurWord]
	tyCur     = symbols[TCur]
	tyMark    = symbols[TMark]
	tyQuote   = symbols[TQuote]
	tyOp      = symbols[TOp]
	tyDash    = symbols[TDash]
	tySlash   = symbols[TSlash]
	tyTimes   = symbols[TTimes]
	tyHash    = symbols[THash]
	tyPlus    = symbols[TPlus]
	tyPunct   = symbols[TPunct]
)

// currencyWords maps the currency words the lexer knows to ISO 4217 codes.
// "" means the option's default dollar currency.
var currencyWords = map[string]string{
	"usd": "USD", "eur": "EUR", "gbp": "GBP", "jpy": "JPY", "cad": "CAD",
	"aud": "AUD", "nzd": "NZD", "chf": "CHF", "sek": "SEK", "nok": "NOK",
	"dkk": "DKK", "pln": "PLN", "czk": "CZK", "inr": "INR", "cny": "CNY",
	"mxn": "MXN", "brl": "BRL", "zar": "ZAR", "sgd": "SGD", "hkd": "HKD",
	"euro": "EUR", "euros": "EUR", "dollar": "", "dollars": "", "bucks": "",
	"yen": "JPY", "quid": "GBP", "rupees": "INR", "rupee": "INR",
}

// CurrencyWord returns the ISO code for a normalised currency word; the
// empty code stands for the default dollar currency.
func CurrencyWord(w string) (code string, ok bool) {
	code, ok = currencyWords[w]
	return code, ok
}

// vulgar maps the Unicode vulgar fraction characters to "n/d".
var vulgar = map[rune]string{
	'½': "1/2", '⅓': "1/3", '⅔': "2/3", '¼': "1/4", '¾': "3/4", '⅕': "1/5",
	'⅖': "2/5", '⅗': "3/5", '⅘': "4/5", '⅙': "1/6", '⅚': "5/6", '⅐': "1/7",
	'⅛': "1/8", '⅜': "3/8", '⅝': "5/8", '⅞': "7/8", '⅑': "1/9", '⅒': "1/10",
}

// Definition is the lexer definition for participle.
type Definition struct{}

// Symbols returns the token types.
func (Definition) Symbols() map[string]lexer.TokenType { return symbols }

// Lex lexes a whole reader.
func (d Definition) Lex(filename string, r io.Reader) (lexer.Lexer, error) {
	b, err := io.ReadAll(r)
	if err != nil {
		return nil, err
	}
	return d.LexString(filename, string(b))
}

// LexString lexes a string without copying it.
func (Definition) LexString(_ string, s string) (lexer.Lexer, error) {
	return &Lexer{toks: Tokens(s)}, nil
}

// Lexer returns the tokens made by [Tokens], then EOF.
type Lexer struct {
	toks []lexer.Token
	i    int
}

// Next returns the next token.
func (l *Lexer) Next() (lexer.Token, error) {
	if l.i >= len(l.toks) {
		return lexer.Token{Type: lexer.EOF}, nil
	}
	t := l.toks[l.i]
	l.i++
	return t, nil
}

// Tokens splits s into tokens. Every byte of s belongs to exactly one
// token; a token's Pos.Offset is its byte offset in s, and its Value is
// the normalised text (NFKC, lower case) that the grammar matches on:
// the amount of "$1.5k" is the number token "1500", and "C$" one
// currency sign, "c$". The last token is EOF, at len(s).
func Tokens(s string) []lexer.Token {
	toks := make([]lexer.Token, 0, len(s)/3+2)
	emit := func(ty lexer.TokenType, start int, val string) {
		toks = append(toks, lexer.Token{Type: ty, Value: val, Pos: lexer.Position{Offset: start, Line: 1, Column: start + 1}})
	}
	prevType := func() lexer.TokenType {
		if len(toks) == 0 {
			return tySpace
		}
		return toks[len(toks)-1].Type
	}
	i := 0
	kAt := -1 // the index of the last number token that took a k
	for i < len(s) {
		r, n := utf8.DecodeRuneInString(s[i:])
		start := i
		switch {
		case r == utf8.RuneError && n <= 1, isSpace(r):
			for i < len(s) {
				r, n = utf8.DecodeRuneInString(s[i:])
				if !(r == utf8.RuneError && n <= 1) && !isSpace(r) {
					break
				}
				i += n
			}
			emit(tySpace, start, " ")
		case unicode.IsDigit(r):
			i = scanNumber(s, i)
			digits := asciiDigits(s[start:i])
			tookK := false
			if (afterCur(toks) || afterKDash(toks, kAt)) && i < len(s) && (s[i] == 'k' || s[i] == 'K') && (i+1 == len(s) || !isWordStart(rune(s[i+1]))) {
				// "$1.5k", "$2k-3k": k after an amount is a thousand
				// (common practice); the token takes the k in.
				if v, ok := thousands(digits); ok {
					i, digits, tookK = i+1, v, true
				}
			}
			if tookK {
				kAt = len(toks)
			}
			emit(tyNumber, start, digits)
		case vulgar[r] != "":
			i += n
			emit(tyVulgar, start, vulgar[r])
		case isWordStart(r):
			i = scanWord(s, i)
			w := normWord(s[start:i])
			ty := tyWord
			if sign, ok := dollarPrefixes[w]; ok && i < len(s) && s[i] == '$' {
				// "C$50", "A$40": a dollar named by its country, one sign.
				i++
				emit(tyCur, start, sign)
				continue
			}
			if (w == "w" || w == "W") && i < len(s) && s[i] == '/' {
				// "w/" is with, "w/o" without.
				if i+1 < len(s) && (s[i+1] == 'o' || s[i+1] == 'O') && (i+2 == len(s) || !isWordStart(rune(s[i+2]))) {
					i, w = i+2, "w/o"
				} else {
					i, w = i+1, "w/"
				}
				emit(ty, start, w)
				continue
			}
			if end, unit := multiWordUnit(s, i, w); end > i {
				i, w, ty = end, unit, tyUnit
			} else if _, ok := currencyWords[w]; ok {
				ty = tyCurWord
			} else if _, ok := units.Lookup(w, units.USCustomary); ok {
				ty = tyUnit
			}
			emit(ty, start, w)
		case r == '"' || r == '\'' || r == '′' || r == '″' || r == '’' || r == '”':
			pt := prevType()
			afterNum := pt == tyNumber || pt == tyVulgar
			switch {
			case r == '″':
				i += n
				emit(tyMark, start, `"`)
			case r == '′':
				i += n
				emit(tyMark, start, "'")
			case afterNum && (r == '\'' || r == '’') && strings.HasPrefix(s[i+n:], string(r)):
				i += 2 * n
				emit(tyMark, start, `"`)
			case afterNum && (r == '"' || r == '”'):
				i += n
				emit(tyMark, start, `"`)
			case afterNum:
				i += n
				emit(tyMark, start, "'")
			case r == '"' || r == '”':
				i += n
				emit(tyQuote, start, `"`)
			default:
				i += n
				emit(tyPunct, start, string(r))
			}
		case r == '“' || r == '„' || r == '«' || r == '»':
			i += n
			emit(tyQuote, start, `"`)
		case r == '<' || r == '>' || r == '≤' || r == '≥':
			i += n
			op := string(r)
			switch {
			case r == '≤':
				op = "<="
			case r == '≥':
				op = ">="
			case strings.HasPrefix(s[i:], "="):
				i++
				op += "="
			}
			emit(tyOp, start, op)
		case r == '-' || r == '–' || r == '—' || r == '−' || r == '‐':
			i += n
			emit(tyDash, start, "-")
		case r == '/' || r == '⁄':
			i += n
			emit(tySlash, start, "/")
		case r == '×':
			i += n
			emit(tyTimes, start, "x")
		case r == '#':
			i += n
			emit(tyHash, start, "#")
		case r == '+':
			i += n
			emit(tyPlus, start, "+")
		case unicode.Is(unicode.Sc, r):
			i += n
			emit(tyCur, start, string(r))
		default:
			i += n
			emit(tyPunct, start, norm.NFKC.String(string(r)))
		}
	}
	emit(lexer.EOF, len(s), "")
	return toks
}

// dollarPrefixes are the words written right before "$" to say which
// dollar it is (common practice), and the sign each makes with it; the
// tagger maps the sign to its ISO 4217 code.
var dollarPrefixes = map[string]string{
	"us": "us$", "c": "c$", "ca": "c$", "can": "c$", "a": "a$", "au": "a$", "nz": "nz$",
	"hk": "hk$", "s": "s$", "sg": "s$", "mx": "mx$",
}

// afterCur reports whether the token before the next is a currency
// sign, with or without a space between.
func afterCur(toks []lexer.Token) bool {
	n := len(toks)
	if n > 0 && toks[n-1].Type == tySpace {
		n--
	}
	return n > 0 && toks[n-1].Type == tyCur
}

// afterKDash reports whether the next token follows a dash after the
// number token at kAt, one that took a k: the "3" of "$2k-3k".
func afterKDash(toks []lexer.Token, kAt int) bool {
	n := len(toks) - 1
	skip := func() {
		for n >= 0 && toks[n].Type == tySpace {
			n--
		}
	}
	skip()
	if kAt < 0 || n < 0 || toks[n].Type != tyDash {
		return false
	}
	n--
	skip()
	return n == kAt
}

// thousands multiplies a number written with digits and at most one
// decimal point by 1000, as text: "1.5" is "1500", "2" "2000". A number
// with a comma is left alone (false): the comma may group thousands or
// be a decimal comma, which the tagger decides.
func thousands(digits string) (string, bool) {
	if strings.Contains(digits, ",") || strings.Count(digits, ".") > 1 {
		return "", false
	}
	whole, frac, _ := strings.Cut(digits, ".")
	frac += "000"
	out := strings.TrimLeft(whole+frac[:3], "0")
	if rest := strings.TrimRight(frac[3:], "0"); rest != "" {
		out += "." + rest
	}
	if out == "" || out[0] == '.' {
		out = "0" + out
	}
	return out, true
}

// isSpace treats white space and control characters alike.
func isSpace(r rune) bool {
	return unicode.IsSpace(r) || unicode.IsControl(r) || r == '\u200b' || r == '\ufeff' || r == '\u200e' || r == '\u200f'
}

func isWordStart(r rune) bool { return unicode.IsLetter(r) }

// scanNumber reads digits with inner '.' or ',' separators.
func scanNumber(s string, i int) int {
	for i < len(s) {
		r, n := utf8.DecodeRuneInString(s[i:])
		if unicode.IsDigit(r) {
			i += n
			continue
		}
		if (r == '.' || r == ',') && i+1 < len(s) {
			r2, _ := utf8.DecodeRuneInString(s[i+1:])
			if unicode.IsDigit(r2) {
				i += n
				continue
			}
		}
		break
	}
	return i
}

// scanWord reads letters and combining marks, with inner apostrophes and
// hyphens that sit between two letters ("t-shirt", "women's").
func scanWord(s string, i int) int {
	for i < len(s) {
		r, n := utf8.DecodeRuneInString(s[i:])
		if unicode.IsLetter(r) || unicode.Is(unicode.Mn, r) || unicode.Is(unicode.Me, r) || r == '\u200d' {
			i += n
			continue
		}
		if (r == '-' || r == '\'' || r == '’' || r == '‐') && i+n < len(s) {
			r2, _ := utf8.DecodeRuneInString(s[i+n:])
			if unicode.IsLetter(r2) {
				i += n
				continue
			}
		}
		break
	}
	return i
}

// asciiDigits rewrites any Unicode decimal digits as ASCII.
func asciiDigits(s string) string {
	if isASCII(s) {
		return s
	}
	var b strings.Builder
	for _, r := range s {
		if unicode.IsDigit(r) && r > '9' {
			// Every range of the Nd table starts at a zero.
			b.WriteRune('0' + digitValue(r))
			continue
		}
		b.WriteRune(r)
	}
	return b.String()
}

func digitValue(r rune) rune {
	for _, rg := range unicode.Nd.R16 {
		if r >= rune(rg.Lo) && r <= rune(rg.Hi) {
			return (r - rune(rg.Lo)) % 10
		}
	}
	for _, rg := range unicode.Nd.R32 {
		if r >= rune(rg.Lo) && r <= rune(rg.Hi) {
			return (r - rune(rg.Lo)) % 10
		}
	}
	return 0
}

// normWord normalises a word for matching: NFKC, lower case, curly
// apostrophes made straight.
func normWord(w string) string {
	if isASCII(w) {
		for i := 0; i < len(w); i++ {
			if 'A' <= w[i] && w[i] <= 'Z' {
				return strings.ToLower(w)
			}
		}
		return w
	}
	w = strings.ToLower(norm.NFKC.String(w))
	return strings.ReplaceAll(w, "’", "'")
}

// itemWords are the words that can open a structured item.
var itemWords = map[string]bool{
	"between": true, "under": true, "below": true, "over": true, "above": true,
	"max": true, "min": true, "maximum": true, "minimum": true, "upto": true,
	"within": true, "less": true, "more": true, "fewer": true, "greater": true,
	"at": true, "up": true, "no": true,
}

// Starts reports whether a structured item may start at toks[0], so that
// the caller need only hand those places to [ParseItem].
func Starts(toks []lexer.Token) bool {
	if len(toks) == 0 {
		return false
	}
	t := toks[0]
	switch t.Type {
	case tyNumber, tyVulgar, tyCur, tyQuote, tyOp, tyDash:
		return true
	case tyWord, tyUnit, tyCurWord:
		if itemWords[t.Value] {
			return true
		}
		// A word stuck to a number opens a code: "xr-2200", "cr2032".
		if len(toks) > 1 && (toks[1].Type == tyNumber || toks[1].Type == tyDash || toks[1].Value == ".") {
			return true
		}
	}
	return false
}

// multiWordUnit looks for a unit of two or three words that starts with
// the word w ending at i ("fl oz", "fl. oz.", "imperial fluid ounces").
// It returns where the longest such unit ends and its normalised name, or
// i when there is none.
func multiWordUnit(s string, i int, w string) (int, string) {
	if !units.OpensPhrase(strings.TrimSuffix(w, ".")) {
		return i, ""
	}
	end, name := i, ""
	cur := w
	j := i
	for n := 0; n < 2; n++ {
		k := j
		for k < len(s) && s[k] == '.' {
			k++
		}
		sp := k
		for k < len(s) && s[k] == ' ' {
			k++
		}
		if k == sp || k >= len(s) {
			break
		}
		r, _ := utf8.DecodeRuneInString(s[k:])
		if !isWordStart(r) {
			break
		}
		k2 := scanWord(s, k)
		cur = cur + " " + normWord(s[k:k2])
		j = k2
		if _, ok := units.Lookup(cur, units.USCustomary); ok {
			end, name = k2, cur
		}
	}
	if end > i && end < len(s) && s[end] == '.' {
		end++ // "fl. oz."
	}
	return end, name
}

func isASCII(s string) bool {
	for i := 0; i < len(s); i++ {
		if s[i] >= utf8.RuneSelf {
			return false
		}
	}
	return true
}

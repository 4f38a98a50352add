package grammar

import (
	"fmt"
	"strings"

	"github.com/alecthomas/participle/v2"
	"github.com/alecthomas/participle/v2/lexer"
)

// Item is one structured piece of a query; exactly one field is set. A
// query is a sequence of items and plain tokens: plain words never reach
// the grammar (see [Starts]). Space is a token of its own, so the grammar
// can tell "50mm" and "xr-2200" (no space inside) from a number and a word
// that merely follow each other.
type Item struct {
	Quoted  *Quoted
	Between *Between
	Compare *Compare
	Tyre    *Tyre
	Value   *Value
	Code    *Code
	Exclude *Exclude
}

// numeric is what may start with a number: a tyre size or a value.
type numeric struct {
	Tyre  *Tyre  `parser:"  @@"`
	Value *Value `parser:"| @@"`
}

// Quoted is a phrase in quotation marks. Closed is false when the query
// ends before the closing mark.
type Quoted struct {
	Pos    lexer.Position
	EndPos lexer.Position

	Open   string   `parser:"@Quote"`
	Inner  []string `parser:"@~Quote*"`
	Closed bool     `parser:"@Quote?"`
}

// Exclude is a minus sign stuck to a quoted phrase: -"machine washable".
// A minus stuck to a word ("-leather", "-cr2032") the tagger reads as a
// mark before whatever the word starts, so it needs no rule here.
type Exclude struct {
	Pos    lexer.Position
	EndPos lexer.Position

	Dash   string  `parser:"@Dash"`
	Quoted *Quoted `parser:"@@"`
}

// Between is "between A and B".
type Between struct {
	Pos    lexer.Position
	EndPos lexer.Position

	From *Single `parser:"'between' Space @@"`
	To   *Single `parser:"Space 'and' Space @@"`
}

// Compare is a comparison word or sign before a value: "under $90",
// "at least 2 tb", "<= 30".
type Compare struct {
	Pos    lexer.Position
	EndPos lexer.Position

	Op  string  `parser:"@( 'under' | 'below' | 'over' | 'above' | 'max' | 'min' | 'maximum' | 'minimum' | 'upto' | 'within' | Op | 'less' Space 'than' | 'more' Space 'than' | 'fewer' Space 'than' | 'greater' Space 'than' | 'at' Space ('least' | 'most') | 'up' Space 'to' | 'no' Space ('more' | 'less') Space 'than')"`
	Val *Single `parser:"Space? @@"`
}

// Tyre is an ISO metric tyre size: "225/45R17", "225/45 r17", with an
// optional service description (load index and speed symbol, "91V").
type Tyre struct {
	Pos    lexer.Position
	EndPos lexer.Position

	Width        string `parser:"@Number Slash"`
	Aspect       string `parser:"@Number Space?"`
	Construction string `parser:"@('r' | 'zr' | 'd' | 'b' | 'rf')"`
	Rim          string `parser:"Space? @Number"`
	Load         string `parser:"( Space @Number"`
	Speed        string `parser:"  @('l' | 'm' | 'n' | 'p' | 'q' | 'r' | 's' | 't' | 'u' | 'h' | 'v' | 'w' | 'y' | 'z') )?"`
}

// Value is a single value, or a range of two, with an optional trailing
// bound word: "20-30 mm", "$20 to $30", "$90 max", "2 tb or more". A
// bound word with a value right after it bounds that value instead: in
// "size 12 max $60" the ceiling is on the price, not on the 12, and in
// "size 12 or less $60" the 12 is no bound at all.
type Value struct {
	Pos    lexer.Position
	EndPos lexer.Position

	From *Single `parser:"@@"`
	To   *Single `parser:"( Space? (Dash | 'to') Space? @@ )?"`
	Post string  `parser:"( Space? @('max' | 'min' | 'maximum' | 'minimum' | 'or' Space ('less' | 'more' | 'under' | 'over' | 'fewer' | 'lower' | 'higher' | 'below' | 'above' | 'cheaper') | 'and' Space ('under' | 'up' | 'over' | 'below' | 'above')) (?! Space? (Number | Cur | Vulgar)) | @Plus )?"`
}

// priceValue is a Value opened by a currency symbol, as the currency
// parser reads it. A bound word that only ever follows what it bounds
// ("or less", "or more", "and up") bounds the price whatever comes next:
// "$120 or less 1.9 litre rice cooker". One that may also come before a
// value ("max", "or under") does so only with no value right after it,
// as in Value. The fields are Value's, so one converts to the other.
type priceValue struct {
	Pos    lexer.Position
	EndPos lexer.Position

	From *Single `parser:"@@"`
	To   *Single `parser:"( Space? (Dash | 'to') Space? @@ )?"`
	Post string  `parser:"( Space? ( @('max' | 'min' | 'maximum' | 'minimum' | 'or' Space ('under' | 'over' | 'below' | 'above') | 'and' Space ('under' | 'over' | 'below' | 'above')) (?! Space? (Number | Cur | Vulgar)) | @('or' Space ('less' | 'more' | 'fewer' | 'lower' | 'higher' | 'cheaper') | 'and' Space 'up') ) | @Plus )?"`
}

// Single is a price or a quantity (possibly a dimension of several).
type Single struct {
	Pos    lexer.Position
	EndPos lexer.Position

	Money *Money `parser:"  @@"`
	Dims  *Dims  `parser:"| @@"`
}

// Money is an amount after a currency symbol: "$90", "€ 35". An amount
// with the currency after it ("35 eur", "35€") is a [Quant] with Currency
// set.
type Money struct {
	Pos    lexer.Position
	EndPos lexer.Position

	Symbol string  `parser:"@Cur Space?"`
	Amount *Amount `parser:"@@"`
}

// Amount is the number of a price: a whole or decimal number, never a
// fraction, so that "$160 225/65r17" is $160 and a tyre size, not
// $163.46.
type Amount struct {
	Pos    lexer.Position
	EndPos lexer.Position

	Number string `parser:"@Number"`
}

// Dims is one quantity or several joined by "x": "18x18", "2x4x8",
// `24"w x 36"h`, "10' x 12'".
type Dims struct {
	Pos    lexer.Position
	EndPos lexer.Position

	Parts []*Quant `parser:"@@ ( Space? ('x' | Times | 'by') Space? @@ )*"`
}

// Quant is a number with an optional unit, mark or currency after it, and
// an optional one-letter label after a mark or unit (`24"w`).
type Quant struct {
	Pos    lexer.Position
	EndPos lexer.Position

	Num      *Num   `parser:"@@"`
	Mark     string `parser:"( @Mark"`
	Unit     string `parser:"| (Space | Dash)? @Unit"`
	Currency string `parser:"| Space? @CurWord | @Cur | Space @Cur (?! Space? (Number | Vulgar)) )?"`
	Label    string `parser:"@('w' | 'h' | 'd' | 'l')?"`
}

// Num is a number: whole or decimal, a fraction ("3/4", "½"), or a mixed
// number ("3 1/2", "3-1/2", "3½").
type Num struct {
	Pos    lexer.Position
	EndPos lexer.Position

	Only  *Frac  `parser:"(  @@"`
	Whole string `parser:"| @Number"`
	Frac  *Frac  `parser:"   ( (Space | Dash)? @@ )? )"`
}

// Frac is a fraction: "n/d" or a vulgar fraction character.
type Frac struct {
	Pos    lexer.Position
	EndPos lexer.Position

	Num    string `parser:"(  @Number Slash"`
	Den    string `parser:"   @Number"`
	Vulgar string `parser:"| @Vulgar )"`
}

// Code is a run of letters and digits with no space inside, that starts
// with letters and holds a digit: "xr-2200", "cr2032", "m8x1.25", "a4".
type Code struct {
	Pos    lexer.Position
	EndPos lexer.Position

	Parts []string `parser:"@(Word | Unit | CurWord) @(Dash | '.')? @Number ( @(Dash | '.' | Slash)? @(Number | Word | Unit | CurWord) )*"`
}

func build[T any]() *participle.Parser[T] {
	return participle.MustBuild[T](
		participle.Lexer(newDefinition()),
		participle.UseLookahead(12),
	)
}

// One parser per kind of opening token, built once: dispatching on the
// first token spares the grammar from trying alternatives that cannot
// match, which is most of participle's cost.
var (
	numericParser = build[numeric]()
	valueParser   = build[priceValue]()
	quotedParser  = build[Quoted]()
	excludeParser = build[Exclude]()
	compareParser = build[Compare]()
	betweenParser = build[Between]()
	codeParser    = build[Code]()
)

// String returns the grammar in EBNF, one parser after another, for the
// golden test.
func String() string {
	var b strings.Builder
	for _, p := range []struct {
		name string
		s    fmt.Stringer
	}{
		{"number", numericParser}, {"currency", valueParser}, {"quote", quotedParser},
		{"dash", excludeParser}, {"comparison", compareParser}, {"between", betweenParser},
		{"code", codeParser},
	} {
		fmt.Fprintf(&b, "# item opened by a %s\n%s\n\n", p.name, p.s)
	}
	return b.String()
}

// window bounds how many tokens one item may span; a longer run is parsed
// as several items.
const window = 24

// ParseItem parses the structured item that starts at toks[0] and returns
// it with the number of tokens it covers. toks is a tail of what [Tokens]
// returned, so it ends with the EOF token. It returns nil and 0 when no
// structure starts there (the caller then treats toks[0] as a plain
// token).
func ParseItem(toks []lexer.Token) (*Item, int) {
	if len(toks) < 2 {
		return nil, 0
	}
	if len(toks) > window+1 {
		cut := make([]lexer.Token, window+1)
		copy(cut, toks[:window])
		cut[window] = lexer.Token{Type: lexer.EOF, Pos: toks[window].Pos}
		toks = cut
	}
	var (
		it  Item
		end int
		ok  bool
	)
	t := toks[0]
	if v, n := quickQuant(toks); n > 0 {
		return &Item{Value: v}, n
	}
	switch {
	case t.Type == tyNumber || t.Type == tyVulgar:
		var n *numeric
		if n, end, ok = run(numericParser, toks); ok {
			it.Tyre, it.Value = n.Tyre, n.Value
		}
	case t.Type == tyCur:
		if v, n := quickPrice(toks); n > 0 {
			return &Item{Value: v}, n
		}
		var v *priceValue
		if v, end, ok = run(valueParser, toks); ok {
			it.Value = (*Value)(v)
		}
	case t.Type == tyQuote:
		it.Quoted, end, ok = run(quotedParser, toks)
	case t.Type == tyDash:
		it.Exclude, end, ok = run(excludeParser, toks)
	case t.Value == "between":
		it.Between, end, ok = run(betweenParser, toks)
	case t.Type == tyOp || itemWords[t.Value]:
		if c, n := quickCompare(toks); n > 0 {
			return &Item{Compare: c}, n
		}
		if it.Compare, end, ok = run(compareParser, toks); !ok {
			it.Code, end, ok = run(codeParser, toks)
		}
	default:
		it.Code, end, ok = run(codeParser, toks)
	}
	if !ok {
		return nil, 0
	}
	n := 0
	for n < len(toks) && toks[n].Pos.Offset < end {
		n++
	}
	if n == 0 {
		return nil, 0
	}
	return &it, n
}

// run parses one T from the front of toks (which ends with EOF), and
// returns it with the byte offset where it ends.
func run[T any](p *participle.Parser[T], toks []lexer.Token) (*T, int, bool) {
	peek, err := lexer.Upgrade(&Lexer{toks: toks})
	if err != nil {
		return nil, 0, false
	}
	v, err := p.ParseFromLexer(peek, participle.AllowTrailing(true))
	if err != nil || v == nil {
		return nil, 0, false
	}
	return v, peek.Peek().Pos.Offset, true
}

// newDefinition makes the lexer definition; calling it (rather than naming
// Definition{}) makes the token table initialise before Parser.
func newDefinition() Definition {
	_ = symbols
	return Definition{}
}

// quickQuant builds, without the grammar, the tree the grammar gives for
// the commonest numeric items: a whole or decimal number with an optional
// unit or inch or foot mark ("85", "50mm", "12 ft", "60-inch", `36"`), a
// fraction with them ("3/4", "1/2 in"), or whole numbers joined by x
// with no space ("2x4", "18x18", "2x4x8"), when nothing after the item
// extends it. TestQuickQuantAgreesWithGrammar checks that it agrees with
// the grammar wherever it answers.
func quickQuant(toks []lexer.Token) (*Value, int) {
	if toks[0].Type != tyNumber {
		return nil, 0
	}
	at := func(i int) lexer.Token {
		if i < len(toks) {
			return toks[i]
		}
		return toks[len(toks)-1]
	}
	pos := func(i int) lexer.Position { return at(i).Pos }
	var parts []*Quant
	n := 0
	for {
		start := n
		n++
		var frac *Frac
		if len(parts) == 0 && at(n).Type == tySlash && at(n+1).Type == tyNumber {
			// "3/4", "1/2 in": a fraction, the first part only.
			frac = &Frac{Pos: pos(start), EndPos: pos(start + 3), Num: at(start).Value, Den: at(start + 2).Value}
			n += 2
		}
		unit, mark := "", ""
		if u := at(n); u.Type == tyUnit {
			unit, n = u.Value, n+1
		} else if u.Type == tyMark {
			mark, n = u.Value, n+1 // 36", 8'
		} else if (u.Type == tySpace || u.Type == tyDash) && at(n+1).Type == tyUnit {
			unit, n = at(n+1).Value, n+2
		}
		num := &Num{Pos: pos(start), EndPos: pos(start + 1), Whole: at(start).Value}
		if frac != nil {
			num = &Num{Pos: pos(start), EndPos: pos(start + 3), Only: frac}
		}
		parts = append(parts, &Quant{Pos: pos(start), EndPos: pos(n), Num: num, Unit: unit, Mark: mark})
		// Another part: "x" stuck between two numbers, no units.
		if frac == nil && unit == "" && mark == "" && at(n).Value == "x" && at(n+1).Type == tyNumber && len(parts) < 3 {
			n++
			continue
		}
		break
	}
	if last := parts[len(parts)-1]; len(parts) > 1 && (last.Unit != "" || last.Mark != "") {
		return nil, 0
	}
	if !endsHere(at(n), at(n+1), true, extenders) {
		return nil, 0
	}
	end := pos(n)
	d := &Dims{Pos: pos(0), EndPos: end, Parts: parts}
	return &Value{Pos: pos(0), EndPos: end, From: &Single{Pos: pos(0), EndPos: end, Dims: d}}, n
}

// quickPrice is a fast path past participle for the commonest price, a
// currency sign and a number ("$90", "€ 35"), when nothing after it
// extends it (a range, a bound word, a unit). It builds the tree
// valueParser would; TestQuickPriceAgreesWithGrammar checks it.
func quickPrice(toks []lexer.Token) (*Value, int) {
	at := func(i int) lexer.Token {
		if i < len(toks) {
			return toks[i]
		}
		return toks[len(toks)-1]
	}
	if at(0).Type != tyCur {
		return nil, 0
	}
	n := 1
	if at(n).Type == tySpace {
		n++
	}
	if at(n).Type != tyNumber {
		return nil, 0
	}
	num := n
	n++
	if !endsHere(at(n), at(n+1), false, extenders) || at(n).Type == tySpace && priceBounds[at(n+1).Value] {
		return nil, 0
	}
	pos := func(i int) lexer.Position { return at(i).Pos }
	end := pos(n)
	m := &Money{Pos: pos(0), EndPos: end, Symbol: at(0).Value, Amount: &Amount{Pos: pos(num), EndPos: end, Number: at(num).Value}}
	return &Value{Pos: pos(0), EndPos: end, From: &Single{Pos: pos(0), EndPos: end, Money: m}}, n
}

// quickOps are the comparison words of one word that quickCompare reads.
var quickOps = map[string]bool{"under": true, "below": true, "over": true, "above": true, "upto": true, "within": true}

// quickCompare is a fast path past participle for a comparison word of
// one word and a space before a price or a quantity the fast paths read
// ("under $90", "over 50"). It builds the tree compareParser would;
// TestQuickCompareAgreesWithGrammar checks it.
func quickCompare(toks []lexer.Token) (*Compare, int) {
	if len(toks) < 3 || toks[0].Type != tyWord || !quickOps[toks[0].Value] || toks[1].Type != tySpace {
		return nil, 0
	}
	rest := toks[2:]
	v, n := quickPrice(rest)
	if n == 0 {
		v, n = quickQuant(rest)
	}
	if n == 0 || v.To != nil || v.Post != "" {
		return nil, 0
	}
	return &Compare{Pos: toks[0].Pos, EndPos: v.EndPos, Op: toks[0].Value, Val: v.From}, n + 2
}

// endsHere reports whether an item the fast paths read ends before next
// (and after, the token after it): at the end, or before a space and
// then the end, a punctuation mark, a quote when quote is set, or a word
// that is none of extend, the words that may continue it.
func endsHere(next, after lexer.Token, quote bool, extend map[string]bool) bool {
	switch next.Type {
	case lexer.EOF:
		return true
	case tySpace:
		switch after.Type {
		case lexer.EOF, tyPunct:
			return true
		case tyQuote:
			return quote
		case tyWord:
			return !extend[after.Value]
		}
	}
	return false
}

// priceBounds are the words that may bound a price after it.
var priceBounds = map[string]bool{"or": true, "and": true, "max": true, "min": true, "maximum": true, "minimum": true, "to": true}

// extenders are words that may continue a numeric item after a space.
var extenders = map[string]bool{
	"x": true, "by": true, "to": true, "and": true, "or": true, "max": true,
	"min": true, "maximum": true, "minimum": true, "w": true, "h": true,
	"d": true, "l": true, "r": true, "zr": true, "rf": true, "b": true,
}

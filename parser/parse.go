package parser

import (
	"fmt"
	"sort"
	"strings"
	"unicode/utf8"

	"github.com/alecthomas/participle/v2/lexer"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/parser/internal/grammar"
)

// Parse reads one query with the default options. See [ParseWith].
func Parse(query string) *Result {
	return ParseWith(query, Options{})
}

// ParseWith reads one query and returns everything it understood, with
// the problems it found in Result.Errors. It never panics and never
// returns nil.
//
// The rules that settle competing readings, each named in the
// constraint's Evidence:
//
//   - When one phrase is several lexicon entries, the one the surface
//     spells exactly wins over one reached only by stemming; a product
//     type yields to another kind when the query names another product
//     type; then product type, material, colour, pattern, silhouette,
//     audience, brand and filler rank in that order (so "linen" is the
//     material, though CSS names a colour linen).
//   - Product types next to each other merge when the second adds nothing
//     ("variable nd filter"), else the first is a modifier ("saucepan
//     lid"); a product type after "with", or after "in" or a material once
//     a product type was named, is a feature ("with lid", "marble top").
//     Modifiers and features are keywords.
//   - The head is the last product type, not a modifier or feature, before
//     the first compatibility phrase, else the last one in the query; its
//     category (or Options.Category) is the query's category.
//   - AxB of whole numbers with no unit is a nominal lumber size when PS 20
//     lists it and the category is lumber or hardware, or there is no
//     product type; on trousers, jeans and shorts it is waist by inseam;
//     otherwise it is a dimension.
//   - A bare number takes the unit of the head product type's first
//     measure slot whose typical range holds it (inferred). In apparel and
//     footwear a bare number that no slot holds is a size. Otherwise it
//     stays unitless and the evidence says so.
//   - A measure whose dimension only its range chose takes no dimension
//     the query already gives, by a designation or an earlier measure,
//     when another slot holds it: in "m8 bolt 30 mm" M8 gives the
//     diameter, so 30 mm is the length.
//   - A number stuck to a word that is no unit ("1080p", "4k") is one
//     keyword.
//   - "m", "s" and "l" are letter sizes only in apparel, footwear and
//     accessories, and "m" right after a number is metres; on an
//     accessory of no letter sizes (a bag), no size word is a size.
//   - A fraction written like cable, an even gauge 6 to 18 over 2 to 4
//     ("12/2"), is a wire gauge with its conductors; another fraction is
//     never a gauge.
//   - A code like "m8" is a metric thread, "a4" a paper size, "cr2032" a
//     battery, when the standard lists it and the category does not say
//     otherwise; else it is a part number.
//   - A bare price ("$40") is a ceiling.
//   - The target of "for", "fits", "compatible with", "works with" or
//     "replacement for" runs to the next tagged span or the end.
//   - "-", "not", "no", "without", "except" and "excluding" exclude the
//     next span; a minus stuck to a word, a number or a currency sign
//     excludes what it starts ("-cr2032", "-12awg", "-$50"), but before
//     a bare number it is neither a sign nor an exclusion ("-20").
//   - A quoted phrase is hard, whatever its kind.
//   - Values of one kind joined by "or", or sizes of one system joined
//     by a slash, are alternatives, one OrGroup ("navy or black",
//     "full/queen"); colours joined by a slash are one two-tone colour.
//     A number with no unit before "or" takes the unit after it ("12 or
//     14 awg"), and an exclusion before "or" covers what follows it.
func ParseWith(query string, opts Options) *Result {
	r := &Result{Query: query}
	if len(query) > opts.maxBytes() {
		r.Errors = append(r.Errors, &Error{Start: opts.maxBytes(), End: len(query), Query: query,
			Msg: fmt.Sprintf("query is %d bytes; the limit is %d", len(query), opts.maxBytes())})
		return r
	}
	// Bytes that are not UTF-8 read as spaces, but a query of nothing
	// else is not empty: its error says where they are.
	if utf8.ValidString(query) && strings.TrimFunc(query, isBlank) == "" {
		r.Errors = append(r.Errors, &Error{Start: 0, End: len(query), Query: query, Msg: "query is empty"})
		return r
	}
	p := &tagger{q: query, opts: &opts, lex: opts.lexicon(), res: r}
	p.checkUTF8()
	p.run()
	if max := opts.maxConstraints(); len(r.Constraints) > max {
		c := r.Constraints[max]
		r.Errors = append(r.Errors, &Error{Start: c.Start, End: len(query),
			Msg: fmt.Sprintf("query has %d constraints; the limit is %d, so the rest from here are not read", len(r.Constraints), max)})
		r.Constraints = r.Constraints[:max]
		// An alternative whose others were cut stands alone.
		r.renumber()
	}
	if len(r.Constraints) == 0 {
		r.Constraints = nil // none read, as a result with none always says
	}
	sort.SliceStable(r.Errors, func(i, j int) bool { return r.Errors[i].Start < r.Errors[j].Start })
	for _, e := range r.Errors {
		e.Query = query
	}
	return r
}

func isBlank(r rune) bool {
	return r == utf8.RuneError || r <= ' ' || r == 0x7f || (r >= 0x80 && r < 0xa0) || r == ' ' || r == '\u3000' || r == '\u200b' || r == '\ufeff'
}

// tagger holds the state of one parse.
type tagger struct {
	q    string
	opts *Options
	lex  *lexicon.Lexicon
	res  *Result

	toks  []lexer.Token
	units []unit

	head *lexicon.Entry // the head product type
	// narrowedBy is the grade code that narrowed the head to a type
	// below the one typed ("cat6" in "cat6 cable"), or "".
	narrowedBy string
	category   string

	// neg is the start of a pending exclusion mark ("not", "-"), or -1;
	// negEnd its end, negIdx the number of constraints when it was seen.
	neg, negEnd, negIdx int
	negText             string

	// barePitch holds the start offsets of the metric threads typed with
	// no pitch ("m8"), read as coarse, for finePitch to reconsider.
	barePitch map[int]bool

	// byRange holds the end offsets of the measures whose dimension was
	// chosen only because the amount lies in a slot's typical range, for
	// settleDimensions to reconsider.
	byRange map[int]bool
}

func (p *tagger) errorf(start, end int, format string, args ...any) {
	p.res.Errors = append(p.res.Errors, &Error{Start: start, End: end, Msg: fmt.Sprintf(format, args...)})
}

func (p *tagger) checkUTF8() {
	for i := 0; i < len(p.q); {
		r, n := utf8.DecodeRuneInString(p.q[i:])
		if r == utf8.RuneError && n <= 1 {
			j := i + 1
			for j < len(p.q) {
				r2, n2 := utf8.DecodeRuneInString(p.q[j:])
				if !(r2 == utf8.RuneError && n2 <= 1) {
					break
				}
				j++
			}
			p.errorf(i, j, "invalid UTF-8 at byte %d", i)
			i = j
			continue
		}
		i += n
	}
}

// tokEnd returns the raw end offset of token i: where token i+1 starts.
func (p *tagger) tokEnd(i int) int {
	if i+1 < len(p.toks) {
		return p.toks[i+1].Pos.Offset
	}
	return len(p.q)
}

func (p *tagger) run() {
	p.toks = grammar.Tokens(p.q)
	p.units = p.segment()
	// Most units give one constraint; room for them all saves the
	// copies of growing the slice, the tagger's largest allocation.
	p.res.Constraints = make([]Constraint, 0, len(p.units)+1)
	p.choose()
	p.compounds()
	p.findHead()
	p.tag()
	p.settleDimensions()
	p.finePitch()
	p.alternatives()
	p.finish()
}

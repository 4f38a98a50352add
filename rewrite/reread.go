package rewrite

import (
	"context"
	"fmt"
	"slices"
	"strings"
	"unicode"

	"github.com/whittle-search/whittle/parser"
)

// reading is a query read again with a misspelt product type fixed:
// the parse of the corrected text with its spans mapped back onto the
// query as typed, the policy in force for it, and the fix as a
// relaxation.
type reading struct {
	parsed    *parser.Result
	policy    Effective
	corrected string
	fix       Relaxation
	// found is set when the reading is kept only if its query as typed
	// finds something: the catalog bearing out its product type is not
	// enough.
	found bool
}

// reread reads r's query again when an unknown word in it is a typo of a
// product type, or of a word of one, that then becomes the head product
// type: "uv filtar 52 millimeter" is read as "uv filter 52 millimeter",
// so the filter's category and its thread slot apply, and "ceeiling
// fan" as "ceiling fan" rather than "fan". It returns nil when no word
// qualifies, when the fix would not make the head (or would only change
// a head the query already had into another), or when a constraint hard
// in r's reading would not stay hard at the same span.
//
// When the word is as near to several words of product types ("clok" to
// "clock" and "clog", "sandles" to "sandals" and "candles"), it returns
// each reading, the one whose head product type takes in most of the
// query first ("wall clok" is a wall clock), then in the vocabulary's
// order; the rescue counts them and keeps the one the catalog bears out.
func (rw *Rewriter) reread(ctx context.Context, r *parser.Result) ([]*reading, error) {
	for _, c := range r.Constraints {
		if !unknownWord(r, c) {
			continue
		}
		near, err := rw.nearestWords(ctx, c.Name)
		if err != nil {
			return nil, err
		}
		var out []*reading
		for _, w := range near {
			if !w.typeWord {
				continue
			}
			if rd := rw.readFixed(r, c, w.word); rd != nil && !slices.ContainsFunc(out, func(o *reading) bool { return o.corrected == rd.corrected }) {
				out = append(out, rd)
			}
		}
		if len(out) > 0 {
			slices.SortStableFunc(out, func(a, b *reading) int { return b.headLen() - a.headLen() })
			return out, nil
		}
	}
	if rd := rw.readAsModel(r); rd != nil {
		return []*reading{rd}, nil
	}
	return nil, nil
}

// readAsModel reads a part number typed beside a product type as the
// model the product fits: "jx-12 phone case" is most often a case for
// the jx-12, typed without "for", not a case whose part number is
// JX-12. The query is read again with "for" before the code, so the
// code is a compatibility target, hard like the part number, at the same
// span. The reading is kept only if it finds something. It is nil when
// the query has no head product type, no hard part number that is not
// excluded, or the reading would loosen another hard constraint.
func (rw *Rewriter) readAsModel(r *parser.Result) *reading {
	if headIndex(r) < 0 {
		return nil
	}
	for _, c := range r.Constraints {
		if c.Kind != parser.KindPartNumber || c.Excluded || c.Strictness < parser.Hard {
			continue
		}
		text, p := rw.parseReplaced(r, c, "for "+c.Text)
		if p == nil {
			return nil
		}
		e := rw.policy.Apply(p, rw.lex)
		at := slices.IndexFunc(p.Constraints, func(d parser.Constraint) bool {
			return d.Start == c.Start && d.End == c.End && d.Kind == parser.KindCompatibility && d.Strictness == parser.Hard &&
				strings.EqualFold(d.Target, c.Code)
		})
		if at < 0 || headIndex(p) < 0 || !keepsHard(without1(r, c), p) {
			return nil
		}
		return &reading{parsed: p, policy: e, corrected: text, found: true, fix: Relaxation{
			Constraint: at, Text: c.Text, Kind: parser.KindCompatibility, Operator: OpReplace,
			Detail: fmt.Sprintf("%q read as the model the product fits, not its part number; the query read again as %q", c.Text, text),
			Phrase: fmt.Sprintf("reading “%s” as the model they fit", c.Text),
		}}
	}
	return nil
}

// without1 is r less constraint c.
func without1(r *parser.Result, c parser.Constraint) *parser.Result {
	out := *r
	out.Constraints = slices.DeleteFunc(slices.Clone(r.Constraints), func(d parser.Constraint) bool { return d.Start == c.Start && d.End == c.End })
	return &out
}

// headLen is how many bytes of the query the reading's head takes in.
func (rd *reading) headLen() int {
	h := rd.parsed.Constraints[rd.fix.Constraint]
	return h.End - h.Start
}

// unknownWord reports whether c is a word no lexicon entry or rule
// tagged, that the shopper neither quoted nor excluded.
func unknownWord(r *parser.Result, c parser.Constraint) bool {
	if c.Kind != parser.KindKeyword || c.Excluded || c.Strictness >= parser.Hard || !slices.Contains(r.Unrecognised, c.Name) {
		return false
	}
	for _, ch := range c.Text {
		if !unicode.IsLetter(ch) {
			return false
		}
	}
	return c.Text != ""
}

// readFixed parses r's query with c's word replaced by fixed, and keeps
// that reading if the fix is part of its head product type.
func (rw *Rewriter) readFixed(r *parser.Result, c parser.Constraint, fixed string) *reading {
	text, p := rw.parseReplaced(r, c, fixed)
	if p == nil {
		return nil
	}
	h := headIndex(p)
	if h < 0 || p.Constraints[h].Start > c.Start || p.Constraints[h].End < c.End {
		return nil
	}
	if old := headIndex(r); old >= 0 && (r.Constraints[old].Start < p.Constraints[h].Start || r.Constraints[old].End > p.Constraints[h].End) {
		return nil // the fix would change the type asked for, not complete it
	}
	e := rw.policy.Apply(p, rw.lex)
	if !keepsHard(r, p) {
		return nil
	}
	p.Constraints[h].Evidence += fmt.Sprintf("; %q read as %q", c.Name, fixed)
	head := p.Constraints[h]
	return &reading{parsed: p, policy: e, corrected: text, fix: Relaxation{
		Constraint: h, Text: head.Text, Kind: parser.KindProductType, Operator: OpReplace,
		Detail: fmt.Sprintf("%q read as %q; the query read again as %q", c.Name, fixed, text),
		Phrase: fmt.Sprintf("reading “%s” as “%s”", c.Text, fixed),
	}}
}

// parseReplaced parses r's query with c's span replaced by with, and
// returns the new text and its parse with every span mapped back onto
// the query as typed, in r's category when the new text names none; nil
// when two spans would then overlap.
func (rw *Rewriter) parseReplaced(r *parser.Result, c parser.Constraint, with string) (string, *parser.Result) {
	text := r.Query[:c.Start] + with + r.Query[c.End:]
	m := fixSpan{start: c.Start, end: c.End, n: len(with)}
	p, ok := m.back(parser.ParseWith(text, rw.parse), r.Query)
	if !ok {
		return text, nil
	}
	if p.Category == "" {
		p.Category = r.Category
	}
	return text, p
}

// headIndex is the index of r's head product type, or -1.
func headIndex(r *parser.Result) int {
	h := -1
	for i, c := range r.Constraints {
		if c.IsHead() {
			h = i
		}
	}
	return h
}

// keepsHard reports whether every constraint hard in was is hard in now,
// at the same span, of the same kind and value and with the same
// exclusion, or is a size given its system (sizeSystemFound): reading a
// query again never loosens or changes what was never to be relaxed
// ("m8 blot" read as "m8 boot" would make the thread M8 a part number;
// as "m8 bolt" it stays the thread).
func keepsHard(was, now *parser.Result) bool {
	for _, c := range was.Constraints {
		if c.Strictness < parser.Hard {
			continue
		}
		if !slices.ContainsFunc(now.Constraints, func(d parser.Constraint) bool {
			return d.Start == c.Start && d.End == c.End && d.Excluded == c.Excluded && d.Strictness == parser.Hard &&
				d.Kind == c.Kind && (d.Value() == c.Value() || sizeSystemFound(c, d))
		}) {
			return false
		}
	}
	return true
}

// sizeSystemFound reports whether now is size was, a number read with
// no system ("size 8" in a query of no category), read in the system
// the fixed product type gives it: "sandles womens size 8" read as
// sandals makes the 8 a shoe size, the same size of the same product.
func sizeSystemFound(was, now parser.Constraint) bool {
	return was.Size != nil && now.Size != nil && was.Size.System == "numeric" && now.Size.System != "numeric" &&
		was.Size.Value == now.Size.Value && was.Size.Width == now.Size.Width
}

// fixSpan is a word of the raw query, [start, end), replaced by n bytes
// in the corrected text.
type fixSpan struct{ start, end, n int }

// from maps an offset at the start of a span of the corrected text onto
// the raw query: before the fix unchanged, inside it the start of the
// misspelt word, after it shifted by the difference in length.
func (m fixSpan) from(a int) int {
	switch {
	case a < m.start:
		return a
	case a < m.start+m.n:
		return m.start
	}
	return a - m.n + (m.end - m.start)
}

// to maps an offset at the end of a span: before the fix unchanged,
// inside it the end of the misspelt word, after it shifted.
func (m fixSpan) to(b int) int {
	switch {
	case b <= m.start:
		return b
	case b < m.start+m.n:
		return m.end
	}
	return b - m.n + (m.end - m.start)
}

// back maps the parse of the corrected text onto raw, the query as
// typed: every span (and every error's) points into raw, and each
// constraint's Text is raw[Start:End]. It reports false if two spans
// would then overlap.
func (m fixSpan) back(p *parser.Result, raw string) (*parser.Result, bool) {
	out := &parser.Result{Query: raw, Category: p.Category, Unrecognised: p.Unrecognised}
	last := 0
	for _, c := range p.Constraints {
		c.Start, c.End = m.from(c.Start), m.to(c.End)
		if c.Start < last || c.End <= c.Start || c.End > len(raw) {
			return nil, false
		}
		c.Text, last = raw[c.Start:c.End], c.End
		out.Constraints = append(out.Constraints, c)
	}
	for _, e := range p.Errors {
		out.Errors = append(out.Errors, &parser.Error{Start: m.from(e.Start), End: max(m.from(e.Start), m.to(e.End)), Msg: e.Msg, Query: raw})
	}
	return out, true
}

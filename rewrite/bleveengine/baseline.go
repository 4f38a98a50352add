package bleveengine

import (
	"context"
	"fmt"
	"strings"

	"github.com/RoaringBitmap/roaring/v2"
	"github.com/blevesearch/bleve/v2"
	"github.com/blevesearch/bleve/v2/search/query"
)

// Fallback is a blind partial match: the way a plain engine, knowing
// nothing of what a query's words mean, gives some of them up when all
// of them together match nothing. Both kinds look for the words anywhere
// in a product's text and rank what they find by bleve's score, ties by
// id. The zero value is MostWords.
type Fallback int

const (
	// MostWords requires all of the query's words, then any all but
	// one, then any all but two, and so on, until something matches: it
	// keeps the most words some product has, whichever they are.
	MostWords Fallback = iota
	// DropTrailing requires all of the query's words, then all but the
	// last, then all but the last two, and so on, until the words left
	// match something: it gives up words from the end of the query, as
	// typed.
	DropTrailing
)

// fallbackNames are the names of the fallbacks, in the order of their
// values.
var fallbackNames = [...]string{MostWords: "most-words", DropTrailing: "drop-trailing"}

// String returns the fallback's name: "most-words" or "drop-trailing".
func (f Fallback) String() string {
	if f.Valid() {
		return fallbackNames[f]
	}
	return fmt.Sprintf("Fallback(%d)", int(f))
}

// Fallbacks returns every fallback, in order.
func Fallbacks() []Fallback {
	out := make([]Fallback, len(fallbackNames))
	for i := range out {
		out[i] = Fallback(i)
	}
	return out
}

// Valid reports whether f is one of Fallbacks.
func (f Fallback) Valid() bool { return f >= 0 && int(f) < len(fallbackNames) }

// check refuses a value that is none of Fallbacks.
func (f Fallback) check() error {
	if !f.Valid() {
		return fmt.Errorf("bleveengine: no fallback %d", int(f))
	}
	return nil
}

// Describe says in a few words which words the fallback gives up.
func (f Fallback) Describe() string {
	switch f {
	case MostWords:
		return "keeps the most of the query's words any product has, whichever they are"
	case DropTrailing:
		return "drops words from the end of the query, as typed, until the rest match"
	}
	return f.String()
}

// ParseFallback returns the fallback named s, one of the names String
// gives.
func ParseFallback(s string) (Fallback, error) {
	for f, name := range fallbackNames {
		if s == name {
			return Fallback(f), nil
		}
	}
	return 0, fmt.Errorf("unknown fallback %q: want %s", s, strings.Join(fallbackNames[:], " or "))
}

// MarshalText writes the fallback's name.
func (f Fallback) MarshalText() ([]byte, error) {
	if err := f.check(); err != nil {
		return nil, err
	}
	return []byte(f.String()), nil
}

// UnmarshalText reads a fallback's name.
func (f *Fallback) UnmarshalText(b []byte) error {
	v, err := ParseFallback(string(b))
	if err != nil {
		return err
	}
	*f = v
	return nil
}

// Baseline is what a plain engine's blind partial match finds.
type Baseline struct {
	// Fallback is the blind partial match that ran.
	Fallback Fallback `json:"fallback"`
	// Kept is how many of the query's words had to match (for
	// DropTrailing, the first Kept of them); Words is how many it has,
	// leaving out those no product's text can hold (see Baseline).
	Kept  int     `json:"kept"`
	Words int     `json:"words"`
	Count int     `json:"count"`
	Hits  []Shown `json:"hits"`
}

// Baseline runs the blind partial match f, the way a plain engine falls
// back when a query matches nothing as typed: a match of the query's
// words in the product's text, requiring all of them, then one fewer,
// and so on, until something matches. It knows nothing of what the
// words mean. Which words it gives up first is what f says. A word the
// text's analyzer takes nothing from, an English stop word such as
// "for", "the" or "under", is left out, as a plain engine leaves it out
// of its match: no product's text holds it.
func (e *Engine) Baseline(ctx context.Context, f Fallback, q string, k int) (*Baseline, error) {
	if err := f.check(); err != nil {
		return nil, err
	}
	words := e.baselineWords(q)
	b := &Baseline{Fallback: f, Words: len(words)}
	for n := len(words); n >= 1; n-- {
		// Ranked as Show ranks: rounded scores, ties by id; otherwise
		// equal scores come in the order of the index's segments, which
		// differs from build to build.
		hits, total, err := e.ranked(ctx, baselineQuery(f, words, n), k)
		if err != nil {
			return nil, err
		}
		if total == 0 {
			continue
		}
		b.Kept, b.Count, b.Hits = n, total, hits
		return b, nil
	}
	return b, nil
}

// baselineQuery is the search the fallback f runs keeping n of words.
func baselineQuery(f Fallback, words []string, n int) query.Query {
	if f == DropTrailing {
		qs := make([]query.Query, 0, n)
		for _, w := range words[:n] {
			qs = append(qs, baselineWord(w))
		}
		return bleve.NewConjunctionQuery(qs...)
	}
	qs := make([]query.Query, 0, len(words))
	for _, w := range words {
		qs = append(qs, baselineWord(w))
	}
	dq := bleve.NewDisjunctionQuery(qs...)
	dq.SetMin(float64(n))
	return dq
}

// BaselineMatches returns the ids of every product the blind partial
// match f finds for q when kept of its words must match, in id order:
// the whole result set of which Baseline, with the Kept it settled on,
// returns the best k: for DropTrailing, the products that have every one
// of the first kept words. Kept below 1 is taken as 1, and above the
// number of words as all of them.
func (e *Engine) BaselineMatches(ctx context.Context, f Fallback, q string, kept int) ([]string, error) {
	if err := f.check(); err != nil {
		return nil, err
	}
	words := e.baselineWords(q)
	if len(words) == 0 {
		return nil, nil
	}
	kept = min(max(kept, 1), len(words))
	s := e.sets
	if err := s.list.load(s.reader); err != nil {
		return nil, err
	}
	if f == DropTrailing {
		// The first kept words, every one of them.
		words = words[:kept]
	}
	// Each word's matches, as a bitmap; a product is in the set when at
	// least kept of the words match it, a word typed twice counting
	// twice, as it does in the disjunction Baseline runs.
	each := make([]*roaring.Bitmap, len(words))
	union := roaring.New()
	for i, w := range words {
		b, err := s.query(ctx, "\x00baseline\x00"+w, baselineWord(w))
		if err != nil {
			return nil, err
		}
		each[i] = b
		union.Or(b)
	}
	if kept == 1 {
		return s.list.all(union), nil
	}
	in := roaring.New()
	it := union.Iterator()
	for it.HasNext() {
		d, n := it.Next(), 0
		for _, b := range each {
			if b.Contains(d) {
				n++
			}
		}
		if n >= kept {
			in.Add(d)
		}
	}
	return s.list.all(in), nil
}

// baselineWords are the words the blind partial match looks for: the
// query's, lower-cased, but for those the analyzer of the products'
// words takes nothing from.
func (e *Engine) baselineWords(q string) []string {
	var out []string
	for _, w := range strings.Fields(strings.ToLower(q)) {
		if e.words == nil || len(e.words.Analyze([]byte(w))) > 0 {
			out = append(out, w)
		}
	}
	return out
}

// baselineWord is the match for one word anywhere in a product's text.
func baselineWord(w string) query.Query {
	m := bleve.NewMatchQuery(w)
	m.SetField(fWords)
	return m
}

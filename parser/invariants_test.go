package parser

import (
	"bufio"
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"sync"
	"testing"
	"unicode/utf8"

	"github.com/google/go-cmp/cmp"
)

// checkInvariants holds for every result, whatever the query: spans are in
// bounds, in order and do not overlap; each constraint carries the value
// of its kind; every error lies in the query and renders; the JSON form
// reads back to the same result.
func checkInvariants(t *testing.T, q string, r *Result) {
	t.Helper()
	if r == nil {
		t.Fatalf("%q: nil result", q)
	}
	if r.Query != q {
		t.Fatalf("%q: result holds query %q", q, r.Query)
	}
	prevEnd := 0
	known := make(map[Kind]bool)
	for _, k := range AllKinds() {
		known[k] = true
	}
	for i, c := range r.Constraints {
		if c.Start < 0 || c.End > len(q) || c.Start >= c.End {
			t.Fatalf("%q: constraint %d span %d-%d out of bounds", q, i, c.Start, c.End)
		}
		if c.Start < prevEnd {
			t.Fatalf("%q: constraint %d (%d-%d) overlaps the one before (ends %d)", q, i, c.Start, c.End, prevEnd)
		}
		prevEnd = c.End
		if c.Text != q[c.Start:c.End] {
			t.Fatalf("%q: constraint %d text %q is not query[%d:%d]", q, i, c.Text, c.Start, c.End)
		}
		if !known[c.Kind] {
			t.Fatalf("%q: unknown kind %q", q, c.Kind)
		}
		if _, err := c.Strictness.MarshalText(); err != nil {
			t.Fatalf("%q: %v", q, err)
		}
		has := map[Kind]bool{KindMeasure: c.Measure != nil, KindPrice: c.Price != nil, KindSize: c.Size != nil, KindSpec: c.Spec != nil, KindColour: c.Colour != nil}
		for k, ok := range has {
			if (c.Kind == k) != ok {
				t.Fatalf("%q: constraint %d of kind %s: value of kind %s present=%v", q, i, c.Kind, k, ok)
			}
		}
	}
	// Alternatives are two or more, of one kind, excluded alike, and
	// numbered from 1 in query order.
	groups := 0
	for i, c := range r.Constraints {
		if c.OrGroup == 0 {
			continue
		}
		alts := r.Alternatives(i)
		if len(alts) < 2 {
			t.Fatalf("%q: constraint %d is alone in or-group %d", q, i, c.OrGroup)
		}
		for _, j := range alts {
			if o := r.Constraints[j]; o.Kind != c.Kind || o.Excluded != c.Excluded || o.Strictness != c.Strictness {
				t.Fatalf("%q: or-group %d joins %s %q with %s %q", q, c.OrGroup, c.Kind, c.Text, o.Kind, o.Text)
			}
		}
		if alts[0] == i {
			if groups++; c.OrGroup != groups {
				t.Fatalf("%q: or-group %d is the %d-th in query order", q, c.OrGroup, groups)
			}
		}
	}
	for _, e := range r.Errors {
		if e.Start < 0 || e.End > len(q) || e.Start > e.End {
			t.Fatalf("%q: error span %d-%d out of bounds", q, e.Start, e.End)
		}
		if e.Query != q {
			t.Fatalf("%q: error holds query %q", q, e.Query)
		}
		if out := e.Render(); !strings.Contains(out, e.Msg) || !strings.Contains(out, "^") {
			t.Fatalf("%q: error renders as %q", q, out)
		}
	}
	b, err := json.Marshal(r)
	if err != nil {
		t.Fatalf("%q: marshal: %v", q, err)
	}
	var back Result
	if err := json.Unmarshal(b, &back); err != nil {
		t.Fatalf("%q: unmarshal: %v", q, err)
	}
	// JSON holds text, so invalid UTF-8 comes back as U+FFFD; the offsets
	// still point into the raw bytes. Only valid text must round-trip.
	if diff := cmp.Diff(r, &back); diff != "" && utf8.ValidString(q) {
		t.Fatalf("%q: JSON round trip differs (-want +got):\n%s", q, diff)
	}
}

// corpus returns the hand-written queries of testdata/queries.txt.
func corpus(t testing.TB) []string {
	t.Helper()
	f, err := os.Open(filepath.Join("..", "testdata", "queries.txt"))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	var qs []string
	sc := bufio.NewScanner(f)
	for sc.Scan() {
		if line := sc.Text(); line != "" && !strings.HasPrefix(line, "#") {
			qs = append(qs, line)
		}
	}
	if err := sc.Err(); err != nil {
		t.Fatal(err)
	}
	return qs
}

// hostile are queries chosen to break a parser.
var hostile = []string{
	"", " ", "\t\n", strings.Repeat(" ", 10000), strings.Repeat("a ", 600), "\xff\xfe lens", "red\x00dress",
	"\u202eevil\u202c dress", "e\u0301\u0301\u0301 coat", "👗 dress 👠", "１２ｖ battery", "1e309", "99999999999999999999 mm",
	"-0", "0/0", "1/0", `"unbalanced quote`, `""`, "$$$", "size size size", strings.Repeat("-x ", 200),
	"the a an of", "1/4-", "-", "--", "x", "2x", "x2", "2xx4", "#", "#-1", "$", "€€35", "3 1/", "1/2/3",
	"between", "between 2", "between 2 and", "under", "under under 5", "at least", "1,2,3,4", "1.2.3",
	"1..2", "5..", "12345678901234567890123", "0.000000000000000001", "m", "size", "for", "for for for",
	"not", "not not white", "no no", "-\"x\"", "\"-\"", "'", "''", "2''", "5'5\"", "″″", "½½", "3½½",
	"225/45r", "225/45r17r", "/45r17", "m8x", "m8x1.25x", "cr", "a0", "a11", "b", "#10-", "#10-24-", "9v9v",
	"24\"w x", "x 36\"h", "10' x", "≤≥<>", "<=", ">= $", "$-5", "-$5", "$5-", "5$", "5 usd usd",
}

func TestInvariantsOnCorpus(t *testing.T) {
	for _, q := range append(corpus(t), hostile...) {
		checkInvariants(t, q, Parse(q))
	}
}

// FuzzParse checks the invariants on generated queries. Its seed corpus
// holds every query of the tests and of testdata/queries.txt.
func FuzzParse(f *testing.F) {
	for _, q := range corpus(f) {
		f.Add(q)
	}
	for _, q := range hostile {
		f.Add(q)
	}
	for _, tc := range parseCases {
		f.Add(tc.query)
	}
	f.Fuzz(func(t *testing.T, q string) {
		checkInvariants(t, q, Parse(q))
	})
}

// Parse is safe for concurrent use: goroutines parsing the corpus at once
// get exactly what one goroutine gets.
func TestParseConcurrently(t *testing.T) {
	qs := corpus(t)
	want := make([]*Result, len(qs))
	for i, q := range qs {
		want[i] = Parse(q)
	}
	var wg sync.WaitGroup
	errs := make(chan string, 8)
	for g := 0; g < 8; g++ {
		wg.Add(1)
		go func(g int) {
			defer wg.Done()
			for i := range qs {
				j := (i + g*31) % len(qs)
				if diff := cmp.Diff(want[j], Parse(qs[j])); diff != "" {
					errs <- qs[j] + ": " + diff
					return
				}
			}
		}(g)
	}
	wg.Wait()
	close(errs)
	for e := range errs {
		t.Error(e)
	}
}

package rewrite

import (
	"context"
	"errors"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/parser"
)

// A plan with no clause matches the whole catalog; showing a shopper
// every product for "!!!" rescues nothing (common practice: a search box
// answers a blank search with a prompt, not the catalog). These queries
// must be refused before anything is counted.
func TestRefusal(t *testing.T) {
	long := strings.Repeat("red ", 300) // 4 bytes × 300 = 1,200 bytes, counted by hand
	fillerColour, err := ParsePolicy("shop.toml", "[defaults.strictness]\ncolour = \"filler\"\n", lexicon.Default())
	if err != nil {
		t.Fatal(err)
	}
	for _, tc := range []struct {
		name, query, reason string
		opts                []Option
		policy              *Policy
		want                RefusalReason
		start, end          int
		msg                 string
		problems            int
	}{
		{name: "empty", query: "", reason: "no byte at all: the parser's own \"query is empty\", at 0",
			want: RefusedEmpty, start: 0, end: 0, msg: "query is empty", problems: 1},
		{name: "blank", query: "   ", reason: "three spaces: the parser's error spans them, bytes 0-3",
			want: RefusedEmpty, start: 0, end: 3, msg: "query is empty", problems: 1},
		{name: "wide blanks", query: "\t\u3000\u200b", reason: "a tab (1 byte), an ideographic space (3) and a zero-width space (3): 7 bytes of nothing",
			want: RefusedEmpty, start: 0, end: 7, msg: "query is empty", problems: 1},
		{name: "bytes that are not UTF-8", query: " \xff\xfe", reason: "unreadable, not empty: the parser's error is at the two bad bytes, 1-3 (RFC 3629 leaves 0xFF and 0xFE unused)",
			want: RefusedUnreadable, start: 1, end: 3, msg: "invalid UTF-8 at byte 1", problems: 1},
		{name: "punctuation", query: "!!!", reason: "the parser reads no constraint and no error; the span is the three marks",
			want: RefusedUnreadable, start: 0, end: 3, msg: "no word or number to search for", problems: 1},
		{name: "punctuation among blanks", query: "  ?! ", reason: "the span leaves the outer blanks out: bytes 2-4",
			want: RefusedUnreadable, start: 2, end: 4, msg: "no word or number to search for", problems: 1},
		{name: "filler only", query: "nice", reason: "\"nice\" is in the filler lexicon; filler is dropped before counting, leaving no clause",
			want: RefusedUnreadable, start: 0, end: 4, msg: `only filler words ("nice"), nothing to search for`, problems: 1},
		{name: "many fillers", query: "the nice cheap one", reason: "four filler words: three are quoted, then an ellipsis",
			want: RefusedUnreadable, start: 0, end: 18, msg: `only filler words ("the", "nice", "cheap", …), nothing to search for`, problems: 1},
		{name: "made filler by the policy", query: "red", policy: fillerColour, reason: "a policy that makes colour filler leaves \"red\" nothing to ask",
			want: RefusedUnreadable, start: 0, end: 3, msg: `only filler words ("red"), nothing to search for`, problems: 1},
		{name: "badly formed only", query: "1/0", reason: "the parser's positioned error is the problem: 1/0 at bytes 0-3",
			want: RefusedUnreadable, start: 0, end: 3, msg: "1/0 divides by zero", problems: 1},
		{name: "badly formed and filler", query: "1/0 nice", reason: "the error leaves only filler; the error, not the filler, is the problem",
			want: RefusedUnreadable, start: 0, end: 3, msg: "1/0 divides by zero", problems: 1},
		{name: "over the limit", query: long, reason: "1,200 bytes over parser.MaxQueryBytes (1,024): the span is what lies past it",
			want: RefusedTooLong, start: 1024, end: 1200, msg: "query is 1200 bytes; the limit is 1024", problems: 1},
		{name: "over the rewriter's limit", query: "red rain jacket", opts: []Option{WithParseOptions(parser.Options{MaxBytes: 8})},
			reason: "15 bytes over a limit of 8 set in the parse options", want: RefusedTooLong, start: 8, end: 15,
			msg: "query is 15 bytes; the limit is 8", problems: 1},
	} {
		t.Run(tc.name, func(t *testing.T) {
			eng := &memEngine{products: shop}
			rw := New(eng, tc.policy, tc.opts...)
			if err := rw.Refusal(rw.Parse(tc.query)); !errors.Is(err, ErrNothingToSearch) {
				t.Errorf("%s: Refusal = %v, want the refusal Rescue gives", tc.reason, err)
			}
			o, err := rw.Rescue(context.Background(), tc.query)
			if o != nil {
				t.Fatalf("%s: got an outcome counting %d, want a refusal", tc.reason, o.Count)
			}
			if !errors.Is(err, ErrNothingToSearch) {
				t.Fatalf("%s: err = %v, want one matching ErrNothingToSearch", tc.reason, err)
			}
			var re *RefusedError
			if !errors.As(err, &re) || re.Reason != tc.want {
				t.Fatalf("%s: err = %#v, want a *RefusedError for %s", tc.reason, err, tc.want)
			}
			var pe *parser.Error
			if !errors.As(err, &pe) || pe != re.Problem {
				t.Errorf("%s: errors.As finds %v, want the problem %v", tc.reason, pe, re.Problem)
			}
			if pe.Start != tc.start || pe.End != tc.end || pe.Msg != tc.msg || pe.Query != tc.query {
				t.Errorf("%s: problem %d-%d %q in %q, want %d-%d %q", tc.reason, pe.Start, pe.End, pe.Msg, pe.Query, tc.start, tc.end, tc.msg)
			}
			if len(re.Problems) != tc.problems {
				t.Errorf("%s: %d problems, want %d", tc.reason, len(re.Problems), tc.problems)
			}
			if want := "query not searched: " + tc.msg; err.Error() != want {
				t.Errorf("%s: Error() = %q, want %q", tc.reason, err.Error(), want)
			}
			if len(eng.counted) != 0 {
				t.Errorf("%s: the engine counted %v; a refused query counts nothing", tc.reason, eng.counted)
			}
		})
	}
}

// The queries at the edge of the rule are searched: something is left to
// ask for or to exclude.
func TestRefusalSearches(t *testing.T) {
	for _, tc := range []struct {
		name, query, reason string
		count               int
		errors              int
	}{
		{name: "exclusion only", query: "not red", reason: "everything but red is something to search for: WR-1 is the shop's one red product, so 14 of its 15 are left",
			count: 14},
		{name: "unknown word", query: "zorblax", reason: "an unknown word is a keyword: searched, it finds nothing and says so",
			count: 0},
		{name: "badly formed beside a product type", query: "1/0 rain jacket", reason: "the parser keeps what it read: the shop's four rain jackets; the error stays in Parsed.Errors",
			count: 4, errors: 1},
		{name: "filler beside a product type", query: "nice rug", reason: "the filler is dropped and the rug is searched: RG-1",
			count: 1},
	} {
		t.Run(tc.name, func(t *testing.T) {
			rw := New(&memEngine{products: shop}, nil)
			if err := rw.Refusal(rw.Parse(tc.query)); err != nil {
				t.Errorf("%s: Refusal = %v, want nil", tc.reason, err)
			}
			o, err := rw.Rescue(context.Background(), tc.query)
			if err != nil {
				t.Fatalf("%s: %v", tc.reason, err)
			}
			if o.Count != tc.count || len(o.Parsed.Errors) != tc.errors {
				t.Errorf("%s: count %d with %d errors, want %d with %d", tc.reason, o.Count, len(o.Parsed.Errors), tc.count, tc.errors)
			}
		})
	}
}

func TestRefusedErrorRender(t *testing.T) {
	for _, tc := range []struct {
		name, query, reason, want string
	}{
		{name: "punctuation", query: "!!!", reason: "carets under the three marks, as parser.Error.Render draws them",
			want: "!!!\n^^^\nno word or number to search for"},
		{name: "two problems", query: "1/0 2/0", reason: "each badly formed part is drawn, a blank line between them",
			want: "1/0 2/0\n^^^\n1/0 divides by zero\n\n1/0 2/0\n    ^^^\n2/0 divides by zero"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			_, err := New(&memEngine{products: shop}, nil).Rescue(context.Background(), tc.query)
			var re *RefusedError
			if !errors.As(err, &re) {
				t.Fatalf("%s: err = %v, want a *RefusedError", tc.reason, err)
			}
			if got := re.Render(); got != tc.want {
				t.Errorf("%s: Render() =\n%s\nwant\n%s", tc.reason, got, tc.want)
			}
		})
	}
}

package grammar

import (
	"flag"
	"os"
	"path/filepath"
	"testing"

	"github.com/alecthomas/participle/v2/lexer"
	"github.com/google/go-cmp/cmp"
)

var update = flag.Bool("update", false, "rewrite the golden files")

// The printed grammar is pinned: a change to it must be deliberate, and
// shows up in review as a change to testdata/grammar.ebnf.
func TestGrammarGolden(t *testing.T) {
	path := filepath.Join("..", "..", "..", "testdata", "grammar.ebnf")
	got := String()
	if *update {
		if err := os.WriteFile(path, []byte(got), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatalf("%v (run go test ./parser/internal/grammar -update)", err)
	}
	if diff := cmp.Diff(string(want), got); diff != "" {
		t.Errorf("grammar changed (-golden +now):\n%s", diff)
	}
}

func TestTokensCoverEveryByte(t *testing.T) {
	for _, q := range []string{"", "a", "  2x4  ", "€35,99", "3½\"", "１２ｖ", "\xff\x00a", "t-shirt's", "a–b", "C$50", "$1.5k", "$2k - 3k"} {
		toks := Tokens(q)
		if len(toks) == 0 || toks[len(toks)-1].Type != lexer.EOF || toks[len(toks)-1].Pos.Offset != len(q) {
			t.Fatalf("%q: tokens do not end with EOF at %d", q, len(q))
		}
		prev := 0
		for i, tk := range toks {
			if tk.Pos.Offset != prev && i > 0 || tk.Pos.Offset < prev {
				t.Fatalf("%q: token %d at %d, want %d", q, i, tk.Pos.Offset, prev)
			}
			if i+1 < len(toks) {
				prev = toks[i+1].Pos.Offset
				if prev <= tk.Pos.Offset {
					t.Fatalf("%q: token %d is empty", q, i)
				}
			}
		}
	}
}

func TestTokenKinds(t *testing.T) {
	for _, tc := range []struct {
		name, in string
		want     []string
		reason   string
	}{
		{"unit attached", "50mm", []string{TNumber, TUnit}, "letters after digits split off"},
		{"inch mark", `36"`, []string{TNumber, TMark}, `" after a number is the inch mark`},
		{"quote", `"red"`, []string{TQuote, TWord, TQuote}, `" elsewhere opens or closes a phrase`},
		{"foot mark", "8'", []string{TNumber, TMark}, "' after a number is the foot mark"},
		{"hyphenated word", "t-shirt", []string{TWord}, "a hyphen between letters stays in the word"},
		{"code", "xr-2200", []string{TWord, TDash, TNumber}, "a hyphen before digits splits"},
		{"decimal comma", "35,99", []string{TNumber}, "comma between digits stays in the number"},
		{"full width digits", "１２", []string{TNumber}, "unicode digits are digits"},
		{"currency", "€35", []string{TCur, TNumber}, "currency symbols"},
		{"vulgar", "3½", []string{TNumber, TVulgar}, "vulgar fractions"},
		{"ops", "<=5", []string{TOp, TNumber}, "two-character comparison"},
		{"named dollar", "C$50", []string{TCur, TNumber}, "a country's letters right before $ make one sign with it"},
		{"letters and a space", "hk $40", []string{TWord, TSpace, TCur, TNumber}, "with a space between, the word is a word"},
		{"thousands", "$1.5k", []string{TCur, TNumber}, "k right after an amount is part of it"},
		{"k without a sign", "1.5k", []string{TNumber, TWord}, "without a currency sign k is a word (1.5k lumens)"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var got []string
			names := lexer.SymbolsByRune(Definition{})
			for _, tk := range Tokens(tc.in) {
				if tk.Type != lexer.EOF {
					got = append(got, names[tk.Type])
				}
			}
			if diff := cmp.Diff(tc.want, got); diff != "" {
				t.Errorf("%s (-want +got):\n%s", tc.reason, diff)
			}
		})
	}
}

// agrees checks a fast path against the grammar it stands in for: on
// every case it answers, the grammar must give the same tree and end at
// the same token. It fails too when the fast path answers fewer than
// least of the cases, as the check would then check little.
func agrees(t *testing.T, cases []string, least int, quick func([]lexer.Token) (any, int), full func([]lexer.Token) (any, int, bool)) {
	t.Helper()
	answered := 0
	for _, q := range cases {
		toks := Tokens(q)
		got, n := quick(toks)
		if n == 0 {
			continue
		}
		answered++
		want, end, ok := full(toks)
		if !ok {
			t.Errorf("%q: quick path answered, grammar did not", q)
			continue
		}
		if diff := cmp.Diff(want, got); diff != "" {
			t.Errorf("%q: quick path differs from grammar (-grammar +quick):\n%s", q, diff)
		}
		if qn := toks[n].Pos.Offset; qn != end {
			t.Errorf("%q: quick path ends at %d, grammar at %d", q, qn, end)
		}
	}
	if answered < least {
		t.Errorf("the quick path answered %d of the cases; the check checks little", answered)
	}
}

// quickQuant answers only where the grammar gives the same tree.
func TestQuickQuantAgreesWithGrammar(t *testing.T) {
	agrees(t, []string{"85", "85 lens", "50mm", "50 mm", "60-inch tv", "12 ft long", "3 1/2", "2 x 4", "20 to 30",
		"5 usd", "5 max", "5$", "5\"", "8w", "12v battery", "3.5 l", "12 r17", "7qt pot", "64gb card", "5 m",
		"2x4", "2x4x8", "18x18 pillow", "2x4x8x10", "2x4 ft", "2x4mm", "2 x 4", "2x4-6", "32x30 jeans", "2x4\"", "2x4 x 6", "1.5x2", "2x4,", "2x4 x",
		"36\"", "36\" rug", "8' ladder", "24\"w", "24\"x36\"", "3\" candles", "10' x 12'", "5'x8'", "36\" x 48", "2.5\"",
		"3/4", "1/2 in", "3/4\"", "1/2 x 10", "3/4x10", "12/2 wire", "1/0", "1 1/2", "3/4-10", "1/2/3", "5/8 inch hose", "1/2-13"}, 20,
		func(toks []lexer.Token) (any, int) { v, n := quickQuant(toks); return v, n },
		func(toks []lexer.Token) (any, int, bool) {
			full, end, ok := run(numericParser, toks)
			if !ok || full.Value == nil {
				return nil, 0, false
			}
			return full.Value, end, true
		})
}

// quickPrice answers only where the grammar gives the same tree.
func TestQuickPriceAgreesWithGrammar(t *testing.T) {
	agrees(t, []string{"$90", "$90 dress", "€ 35", "$1,299", "$19.99 lens", "$90 max", "$20-$30", "$20 to $30", "$90 or less",
		"$5 usd", "$90,", "£60 shoes", "$ 40", "$90 and up", "$90+", "$90 x", "$90 off"}, 6,
		func(toks []lexer.Token) (any, int) { v, n := quickPrice(toks); return v, n },
		func(toks []lexer.Token) (any, int, bool) {
			full, end, ok := run(valueParser, toks)
			return (*Value)(full), end, ok
		})
}

// quickCompare answers only where the grammar gives the same tree.
func TestQuickCompareAgreesWithGrammar(t *testing.T) {
	agrees(t, []string{"under $90", "under $90 dress", "over 50", "below 20 lbs", "under 1k", "under $20-$30", "under £60 shoes",
		"above 3 ft", "within 5 miles", "under 2x4", "under 90 or less", "upto $40", "over $1,299 tv", "under $5 usd", "under 1/2"}, 6,
		func(toks []lexer.Token) (any, int) { c, n := quickCompare(toks); return c, n },
		func(toks []lexer.Token) (any, int, bool) { return run(compareParser, toks) })
}

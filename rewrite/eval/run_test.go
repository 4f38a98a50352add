package eval

import (
	"context"
	"math"
	"path/filepath"
	"testing"

	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// Three hand-written cases on the tiny catalog, through whittle and each
// baseline on a real index; every figure is worked out by hand below.
// No product has "striped", "size" or "5.3" (no description).
func TestEvaluateTiny(t *testing.T) {
	ps := tiny(t)
	ctx := context.Background()
	eng := tinyIndex(t, ctx, ps)
	defer eng.Close()
	size := func(s string) []Attr { return []Attr{{Kind: parser.KindSize, Value: s}} }
	cases := []Case{
		// whittle: no skirt is striped; the size alone finds SK-2; the
		// pattern, soft and matching nothing, is dropped: [SK-2], 2 of 3
		// constraints kept. most-words: 2 of the 4 words, skirt and xl:
		// [SK-2]. drop-trailing: dropping xl, size and skirt leaves
		// striped, which matches nothing: no hits, 0 of 4.
		{Query: "striped skirt size xl", Product: "SK-2", ProductType: "skirt", Failure: FailPattern, Hard: size("xl")},
		// whittle: no rug is 5.3 ft wide; widened by 10% (4.77..5.83 ft)
		// it holds RG-1's 5 ft: [RG-1], 3 of 3 kept. most-words: wool,
		// rug and ft are RG-1's: [RG-1], 3 of 4. drop-trailing: dropping
		// ft and 5.3 leaves wool rug: [RG-1], 2 of 4.
		{Query: "wool rug 5.3 ft", Product: "RG-1", ProductType: "rug", Failure: FailMeasure},
		// whittle: no skirt is cable knit; size m holds SK-1 and SW-1; the
		// pattern is dropped: [SK-1], 2 of 3 kept. most-words: SW-1 has
		// cable, knit and m, SK-1 only skirt and m: 3 of 5 words, [SW-1],
		// in size m but a sweater. drop-trailing: no product has cable,
		// knit and skirt; dropping m, size and skirt leaves cable knit:
		// [SW-1] again, 2 of 5.
		{Query: "cable knit skirt size m", Product: "SK-1", ProductType: "skirt", Failure: FailPattern, Hard: size("m")},
	}
	whittle := Figures{Queries: 3, Rescued: 3, Hits: 3, HardKept: 3, OnTarget: 3, Found: 3, ReciprocalRank: 3, Kept: 7, Of: 9,
		Matched: 3, MatchedOnTarget: 3, SetQueries: 3, SetShares: 3}
	for _, tc := range []struct {
		fallback bleveengine.Fallback
		baseline Figures
	}{
		// Each set is no larger than the top 10, so it is the hits: in
		// case 1 the 2 words hold only SK-2 (SK-1 has skirt, not xl), in
		// case 2 the 3 only RG-1 (SW-1 has wool alone), in case 3 the 3
		// only SW-1 (SK-1 has skirt and m).
		{bleveengine.MostWords, Figures{Queries: 3, Rescued: 3, Hits: 3, HardKept: 3, OnTarget: 2, Found: 2, ReciprocalRank: 2, Kept: 8, Of: 13,
			Matched: 3, MatchedOnTarget: 2, SetQueries: 3, SetShares: 2}},
		// Two queries rescued, one hit each; SW-1 keeps the hard size but
		// is no skirt. Each set is its hits: shares 1 + 0.
		{bleveengine.DropTrailing, Figures{Queries: 3, Rescued: 2, Hits: 2, HardKept: 2, OnTarget: 1, Found: 1, ReciprocalRank: 1, Kept: 4, Of: 13,
			Matched: 2, MatchedOnTarget: 1, SetQueries: 2, SetShares: 1}},
	} {
		t.Run(tc.fallback.String(), func(t *testing.T) {
			checkFigures(t, ctx, eng, tc.fallback, cases, ps, whittle, tc.baseline)
		})
	}
}

// With one hit a query, the whole result sets hold more than the hits;
// their figures do not depend on which match ranks first, so only they
// are checked, worked out by hand from the tiny catalog.
func TestEvaluateSetsTiny(t *testing.T) {
	ps := tiny(t)
	ctx := context.Background()
	eng := tinyIndex(t, ctx, ps)
	defer eng.Close()
	xl := []Attr{{Kind: parser.KindSize, Value: "xl"}}
	cases := []Case{
		// whittle: no rug is ember; widened or dropped, the colour
		// leaves the wool rug: {RG-1}. Baseline: no product has all
		// three words; RG-1 has wool and rug, SW-1 ember and wool:
		// {RG-1, SW-1}, the sweater off target.
		{Query: "ember wool rug", Product: "RG-1", ProductType: "rug", Failure: FailColour},
		// whittle: "snazzy" dropped, both black prime lenses match:
		// {LN-1, LN-2}. Baseline: the lenses have black, prime and
		// lens, 3 of 4 words: {LN-1, LN-2}. All on target.
		{Query: "snazzy black prime lens", Product: "LN-1", ProductType: "prime lens", Failure: FailKeyword},
		// whittle: no skirt in xl is black; the colour goes, size xl
		// holds: {SK-2}. Baseline: SK-1 has black and skirt, SK-2
		// skirt and xl, the lenses black alone: {SK-1, SK-2}, SK-1
		// without the hard xl.
		{Query: "black skirt size xl", Product: "SK-2", ProductType: "skirt", Failure: FailColour, Hard: xl},
	}
	rep, err := Evaluate(ctx, eng, rewrite.New(eng, nil), cases, ps, EvaluateOptions{K: 1})
	if err != nil {
		t.Fatal(err)
	}
	type sets struct {
		Matched, OnTarget, Queries int
		Shares                     float64
	}
	for _, tc := range []struct {
		name      string
		got, want sets
	}{
		// 1 + 2 + 1 matched, all on target.
		{"whittle", sets{rep.Whittle.Matched, rep.Whittle.MatchedOnTarget, rep.Whittle.SetQueries, rep.Whittle.SetShares}, sets{4, 4, 3, 3}},
		// 2 + 2 + 2 matched, 1 + 2 + 1 on target: shares ½ + 1 + ½.
		{"baseline", sets{rep.Baseline.Matched, rep.Baseline.MatchedOnTarget, rep.Baseline.SetQueries, rep.Baseline.SetShares}, sets{6, 4, 3, 2}},
	} {
		if tc.got != tc.want {
			t.Errorf("%s: whole sets %+v, worked by hand %+v", tc.name, tc.got, tc.want)
		}
		if rep.Whittle.Hits != 3 || rep.Baseline.Hits != 3 {
			t.Errorf("hits %d and %d, want one a query", rep.Whittle.Hits, rep.Baseline.Hits)
		}
	}
	if got := rep.Baseline.SetPrecision(); math.Abs(got-4.0/6) > 1e-12 {
		t.Errorf("baseline set precision %v, want 4/6", got)
	}
}

// Three long cases on the tiny catalog, written as the long style writes
// them (brand, price ceiling and four to seven constraints), through
// whittle and the baseline on a real index; worked out by hand below.
// No brand of the tiny catalog is a lexicon word, so whittle reads each
// as a keyword, which the product's title holds. The baseline matches
// each word in the product's text (title, type, brand, colour, pattern,
// material, audience, sizes, models, measures; no description): no
// product has "size", a price's number, "5.3", "50mm" (one token) or
// the extra words; "for" and "under" are English stop words, which the
// text analyzer drops, so the baseline leaves them out of the words.
func TestEvaluateLongTiny(t *testing.T) {
	ps := tiny(t)
	ctx := context.Background()
	eng := tinyIndex(t, ctx, ps)
	defer eng.Close()
	cases := []Case{
		// whittle reads 7 constraints; "snazzy" finds nothing even
		// alone, and dropping it leaves brellow, black, cotton, skirt,
		// size m and at most $40: SK-1 ($39.95) alone. [SK-1], 6 of 7
		// kept. Baseline, 8 words: SK-1 has brellow, black, cotton,
		// skirt and m (5); SK-2 brellow and skirt; SW-1 m; the lenses
		// black. [SK-1], 5 of 8.
		{Query: "brellow black cotton skirt size m under $40 snazzy", Style: StyleLong, Product: "SK-1", ProductType: "skirt",
			Failure: FailKeyword, Hard: []Attr{{Kind: parser.KindSize, Value: "m"}}},
		// whittle: no rug is 5.3 ft wide; widened by 10% (4.77..5.83
		// ft) it holds RG-1's 5 ft, which has mossel in its title, is
		// persian, wool and $189.99: [RG-1], 6 of 6 kept. Baseline, 7
		// words: RG-1 has mossel, persian, wool, rug and ft (5); SW-1
		// wool. [RG-1], 5 of 7.
		{Query: "mossel persian wool rug 5.3 ft under $200", Style: StyleLong, Product: "RG-1", ProductType: "rug", Failure: FailMeasure},
		// whittle: "handy" finds nothing; dropped, tarrow, black, 50 mm,
		// prime lens, fits zk-3 and at most $250 hold LN-1 ($249):
		// [LN-1], 6 of 7 kept. Baseline, 8 words: "zk-3" is analysed
		// into zk and 3, either of which matches; LN-1 has tarrow,
		// black, prime, lens and zk-3 (5), and so has LN-2 by its zk-5
		// (zk). LN-1, which also has the 3, scores higher: [LN-1, LN-2],
		// 5 of 8; LN-2, an 85 mm lens for zk-5, lacks the hard model
		// and focal length.
		{Query: "tarrow black 50mm prime lens for zk-3 under $250 handy", Style: StyleLong, Product: "LN-1", ProductType: "prime lens",
			Failure: FailKeyword, Hard: []Attr{{Kind: parser.KindMeasure, Dimension: "focal_length", Value: "50 mm"}, {Kind: parser.KindCompatibility, Value: "zk-3"}}},
	}
	checkFigures(t, ctx, eng, bleveengine.MostWords, cases, ps,
		// One hit a case, each the product meant, at rank 1; 18 of 20.
		// Each set is its hits.
		Figures{Queries: 3, Rescued: 3, Hits: 3, HardKept: 3, OnTarget: 3, Found: 3, ReciprocalRank: 3, Kept: 18, Of: 20,
			Matched: 3, MatchedOnTarget: 3, SetQueries: 3, SetShares: 3},
		// 1 + 1 + 2 hits; LN-2 keeps no hard attribute; 15 of 23 words.
		// Each set is its hits: shares 1 + 1 + ½.
		Figures{Queries: 3, Rescued: 3, Hits: 4, HardKept: 3, OnTarget: 3, Found: 3, ReciprocalRank: 3, Kept: 15, Of: 23,
			Matched: 4, MatchedOnTarget: 3, SetQueries: 3, SetShares: 2.5})
}

// tinyIndex indexes ps in a temporary directory and opens it.
func tinyIndex(t *testing.T, ctx context.Context, ps []catalog.Product) *bleveengine.Engine {
	t.Helper()
	dir := filepath.Join(t.TempDir(), "index")
	if _, err := bleveengine.BuildProducts(ctx, ps, dir, bleveengine.BuildOptions{}); err != nil {
		t.Fatal(err)
	}
	eng, err := bleveengine.Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	return eng
}

// checkFigures evaluates cases on eng and compares whittle's and the
// baseline's figures with those worked out by hand.
func checkFigures(t *testing.T, ctx context.Context, eng *bleveengine.Engine, f bleveengine.Fallback, cases []Case, ps []catalog.Product, whittle, baseline Figures) {
	t.Helper()
	rep, err := Evaluate(ctx, eng, rewrite.New(eng, nil), cases, ps, EvaluateOptions{K: 10, Fallback: f})
	if err != nil {
		t.Fatal(err)
	}
	if rep.Fallback != f {
		t.Errorf("the report says its baseline is %s, want %s", rep.Fallback, f)
	}
	for _, tc := range []struct {
		name      string
		got, want Figures
	}{{"whittle", rep.Whittle, whittle}, {"baseline", rep.Baseline, baseline}} {
		if tc.got != tc.want {
			t.Errorf("%s, against the working beside the cases:\ngot  %+v\nwant %+v", tc.name, tc.got, tc.want)
		}
	}
}

package eval

import (
	"math"
	"testing"

	"github.com/whittle-search/whittle/parser"
)

// handCases are three labelled queries on the tiny catalog, written by
// hand, with what whittle and the baseline are taken to have returned.
func handCases() (cases []Case, whittle, baseline []Result) {
	xl := Attr{Kind: parser.KindSize, Value: "xl", Text: "size xl"}
	m := Attr{Kind: parser.KindSize, Value: "m", Text: "size m"}
	cases = []Case{
		{Query: "dusty blue skirt size xl", Product: "SK-2", ProductType: "skirt", Failure: FailColour,
			Injected: "dusty blue (the shop's morning fog)", Hard: []Attr{xl}},
		{Query: "striped sweater size m", Product: "SW-1", ProductType: "sweater", Failure: FailPattern,
			Injected: "striped (no sweater has it)", Hard: []Attr{m}},
		{Query: "wool rgu", Product: "RG-1", ProductType: "rug", Failure: FailTypo, Injected: "rgu (for rug)"},
	}
	// Each set is what its hits are drawn from, scored as Evaluate
	// scores it: here each is just the hits.
	whittle = []Result{
		{Hits: []string{"SK-2"}, Kept: 3, Of: 3, Set: SetScore{Matched: 1, OnTarget: 1}},
		{Hits: []string{"SW-1", "SK-1"}, Kept: 2, Of: 3, Set: SetScore{Matched: 2, OnTarget: 1}},
		{Kept: 0, Of: 2, Note: "No results for “wool rgu”."},
	}
	baseline = []Result{
		{Hits: []string{"SK-1", "SK-2"}, Kept: 3, Of: 5, Set: SetScore{Matched: 2, OnTarget: 1}},
		{Hits: []string{"SK-1"}, Kept: 2, Of: 4, Set: SetScore{Matched: 1, OnTarget: 0}},
		{Hits: []string{"RG-1", "SW-1"}, Kept: 1, Of: 2, Set: SetScore{Matched: 2, OnTarget: 1}},
	}
	return cases, whittle, baseline
}

func TestScore(t *testing.T) {
	ps := tiny(t)
	cases, whittle, baseline := handCases()
	for _, tc := range []struct {
		name, reason string
		results      []Result
		want         Figures
	}{
		{name: "whittle", results: whittle,
			reason: "case 1: SK-2 has xl and is a skirt, at rank 1; case 2: SW-1 and SK-1 both come in m, " +
				"SW-1 alone is a sweater, at rank 1; case 3: no hits",
			want: Figures{
				Queries: 3, Rescued: 2, // cases 1 and 2
				Hits: 3, HardKept: 3, OnTarget: 2, // 1 + 2 hits; all in the size; SK-2 and SW-1 of the type
				Found: 2, ReciprocalRank: 2, // 1/1 + 1/1
				Kept: 5, Of: 8, // 3+2+0, 3+3+2
				Matched: 3, MatchedOnTarget: 2, SetQueries: 2, SetShares: 1.5, // 1+2 matched; 1/1 + 1/2
			}},
		{name: "baseline", results: baseline,
			reason: "case 1: SK-1 (s, m) lacks xl, SK-2 has it, at rank 2; case 2: SK-1 comes in m but is a skirt, " +
				"SW-1 is not returned; case 3: nothing is hard, so RG-1 and SW-1 both keep it, RG-1 is the rug, at rank 1",
			want: Figures{
				Queries: 3, Rescued: 3,
				Hits: 5, HardKept: 4, OnTarget: 2, // 2+1+2; SK-2, SK-1, RG-1, SW-1; SK-2 and RG-1
				Found: 2, ReciprocalRank: 1.5, // 1/2 + 1/1
				Kept: 6, Of: 11,
				Matched: 5, MatchedOnTarget: 2, SetQueries: 3, SetShares: 1, // 2+1+2; 1/2 + 0 + 1/2
			}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			if got := Score(cases, tc.results, ps); got != tc.want {
				t.Errorf("%s:\ngot  %+v\nwant %+v", tc.reason, got, tc.want)
			}
		})
	}
}

func TestRates(t *testing.T) {
	w := Figures{Queries: 3, Rescued: 2, Hits: 3, HardKept: 3, OnTarget: 2, Found: 2, ReciprocalRank: 2, Kept: 5, Of: 8,
		Matched: 30, MatchedOnTarget: 12, SetQueries: 2, SetShares: 1.2}
	for _, tc := range []struct {
		name, reason string
		got, want    float64
	}{
		{name: "rescue rate", got: w.RescueRate(), want: 2.0 / 3, reason: "2 of 3 queries have hits"},
		{name: "hard preservation", got: w.HardPreservation(), want: 1, reason: "3 of 3 hits have the hard size"},
		{name: "attribute precision", got: w.AttributePrecision(), want: 2.0 / 3, reason: "2 of 3 hits are of the type too"},
		{name: "found", got: w.FoundRate(), want: 2.0 / 3, reason: "2 of 3 queries return their product"},
		{name: "mrr", got: w.MRR(), want: 2.0 / 3, reason: "(1 + 1 + 0) / 3"},
		{name: "kept", got: w.MeanKept(), want: 5.0 / 3, reason: "5 constraints kept over 3 queries"},
		{name: "of", got: w.MeanOf(), want: 8.0 / 3, reason: "8 constraints over 3 queries"},
		{name: "set precision", got: w.SetPrecision(), want: 12.0 / 30, reason: "12 of the 30 products matched are on target"},
		{name: "mean set precision", got: w.MeanSetPrecision(), want: 0.6, reason: "shares summing to 1.2 over 2 queries that matched"},
		{name: "no set", got: Figures{Queries: 1}.MeanSetPrecision(), want: math.NaN(), reason: "no query matched anything"},
		{name: "no hits", got: Figures{Queries: 1}.HardPreservation(), want: math.NaN(), reason: "a share of no hits is no number"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			if !(math.Abs(tc.got-tc.want) < 1e-12 || math.IsNaN(tc.got) && math.IsNaN(tc.want)) {
				t.Errorf("%s: got %v, want %v", tc.reason, tc.got, tc.want)
			}
		})
	}
}

func TestLoses(t *testing.T) {
	for _, tc := range []struct {
		name, reason string
		w, b         caseScore
		want         string
	}{
		{name: "no hits", w: caseScore{}, b: caseScore{hits: 2, onTarget: 1}, want: LossNoHits,
			reason: "whittle returned nothing, the baseline two"},
		{name: "both empty", w: caseScore{}, b: caseScore{}, want: "",
			reason: "neither returned anything: no loss"},
		{name: "off target", w: caseScore{hits: 4, onTarget: 1, rank: 1}, b: caseScore{hits: 2, onTarget: 1, rank: 2}, want: LossOffTarget,
			reason: "1 of 4 on target is less than 1 of 2, even though whittle ranks the product higher"},
		{name: "missed", w: caseScore{hits: 10, onTarget: 10}, b: caseScore{hits: 10, onTarget: 10, rank: 3}, want: LossMissed,
			reason: "as precise, but the baseline found the product and whittle did not"},
		{name: "better", w: caseScore{hits: 1, onTarget: 1, rank: 1}, b: caseScore{hits: 2, onTarget: 1, rank: 2}, want: "",
			reason: "1 of 1 on target beats 1 of 2, and the product is found"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			if got := loses(tc.w, tc.b); got != tc.want {
				t.Errorf("%s: loses = %q, want %q", tc.reason, got, tc.want)
			}
		})
	}
}

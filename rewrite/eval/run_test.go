package eval

import (
	"context"
	"path/filepath"
	"testing"

	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
)

// Three hand-written cases on the tiny catalog, through whittle and the
// baseline on a real index; every figure is worked out by hand below.
func TestEvaluateTiny(t *testing.T) {
	ps := tiny(t)
	ctx := context.Background()
	dir := filepath.Join(t.TempDir(), "index")
	if _, err := bleveengine.BuildProducts(ctx, ps, dir, bleveengine.BuildOptions{}); err != nil {
		t.Fatal(err)
	}
	eng, err := bleveengine.Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	defer eng.Close()
	size := func(s string) []Attr { return []Attr{{Kind: parser.KindSize, Value: s}} }
	cases := []Case{
		// whittle: no skirt is striped; the size alone finds SK-2; the
		// pattern, soft and matching nothing, is dropped: [SK-2], 2 of 3
		// constraints kept. Baseline: no product has "striped" or "size"
		// (no description), so 2 of the 4 words, skirt and xl: [SK-2].
		{Query: "striped skirt size xl", Product: "SK-2", ProductType: "skirt", Failure: FailPattern, Hard: size("xl")},
		// whittle: no rug is 5.3 ft wide; widened by 10% (4.77..5.83 ft)
		// it holds RG-1's 5 ft: [RG-1], 3 of 3 kept. Baseline: "5.3" is no
		// word of any product; wool, rug and ft are RG-1's: [RG-1], 3 of 4.
		{Query: "wool rug 5.3 ft", Product: "RG-1", ProductType: "rug", Failure: FailMeasure},
		// whittle: no skirt is cable knit; size m holds SK-1 and SW-1; the
		// pattern is dropped: [SK-1], 2 of 3 kept. Baseline: SW-1 has
		// cable, knit and m, SK-1 only skirt and m: 3 of 5 words, [SW-1],
		// in size m but a sweater.
		{Query: "cable knit skirt size m", Product: "SK-1", ProductType: "skirt", Failure: FailPattern, Hard: size("m")},
	}
	rep, err := Evaluate(ctx, eng, rewrite.New(eng, nil), cases, ps, 10)
	if err != nil {
		t.Fatal(err)
	}
	for _, tc := range []struct {
		name, reason string
		got, want    Figures
	}{
		{name: "whittle", got: rep.Whittle, reason: "one hit a case, each the product meant, at rank 1",
			want: Figures{Queries: 3, Rescued: 3, Hits: 3, HardKept: 3, OnTarget: 3, Found: 3, ReciprocalRank: 3, Kept: 7, Of: 9}},
		{name: "baseline", got: rep.Baseline, reason: "SW-1 for the skirt is in size m but off target, and not the product meant",
			want: Figures{Queries: 3, Rescued: 3, Hits: 3, HardKept: 3, OnTarget: 2, Found: 2, ReciprocalRank: 2, Kept: 8, Of: 13}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			if tc.got != tc.want {
				t.Errorf("%s:\ngot  %+v\nwant %+v", tc.reason, tc.got, tc.want)
			}
		})
	}
}

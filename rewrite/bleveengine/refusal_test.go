package bleveengine

import (
	"context"
	"errors"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/rewrite"
)

// Rescue on the index refuses a query with nothing to search for rather
// than list the whole shop (13 products), and searches one with a badly
// formed part beside what it read, keeping the problem in the report.
func TestRescueRefusesNothingToSearch(t *testing.T) {
	e := openShop(t)
	rw := rewrite.New(e, nil)
	for _, tc := range []struct {
		name, query, reason string
		want                rewrite.RefusalReason
	}{
		{name: "empty", query: "", reason: "no query at all", want: rewrite.RefusedEmpty},
		{name: "blank", query: "   ", reason: "only spaces", want: rewrite.RefusedEmpty},
		{name: "punctuation", query: "!!!", reason: "no word or number", want: rewrite.RefusedUnreadable},
		{name: "filler", query: "nice", reason: "a filler word asks for nothing", want: rewrite.RefusedUnreadable},
		{name: "badly formed", query: "1/0", reason: "the only part divides by zero", want: rewrite.RefusedUnreadable},
		{name: "too long", query: strings.Repeat("red ", 300), reason: "1,200 bytes, over parser.MaxQueryBytes (1,024)", want: rewrite.RefusedTooLong},
	} {
		t.Run(tc.name, func(t *testing.T) {
			res, err := e.Rescue(context.Background(), rw, rw.Parse(tc.query), RescueOptions{K: 20, Baseline: true})
			var re *rewrite.RefusedError
			if res != nil || !errors.Is(err, rewrite.ErrNothingToSearch) || !errors.As(err, &re) || re.Reason != tc.want {
				t.Fatalf("%s: got %v, %v; want no result and a refusal for %s", tc.reason, res, err, tc.want)
			}
		})
	}
	// 1/0 divides by zero at bytes 0-3; shop.jsonl has three rain jackets
	// (RJ-1 to RJ-3), counted by hand.
	res, err := e.Rescue(context.Background(), rw, rw.Parse("1/0 rain jacket"), RescueOptions{K: 20})
	if err != nil {
		t.Fatal(err)
	}
	if len(res.Hits) != 3 || len(res.Problems) != 1 || res.Problems[0] != (rewrite.ReportProblem{Start: 0, End: 3, Message: "1/0 divides by zero"}) {
		t.Errorf("1/0 rain jacket: %d hits, problems %+v; want the 3 rain jackets and the one problem at 0-3", len(res.Hits), res.Problems)
	}
}

package eval

import (
	"bytes"
	"encoding/json"
	"flag"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/rewrite/bleveengine"
)

var update = flag.Bool("update", false, "rewrite the golden report in testdata/eval")

func TestNewReport(t *testing.T) {
	cases, whittle, baseline := handCases()
	rep := NewReport(cases, whittle, baseline, tiny(t), 10)
	// The goals, from the figures worked out in TestScore.
	for i, tc := range []struct {
		name, reason string
		value        float64
		met          bool
	}{
		{name: "rescue rate", value: 2.0 / 3, met: false, reason: "2 of 3 queries rescued is under 95%"},
		{name: "hard-constraint preservation", value: 1, met: true, reason: "all 3 of whittle's hits have the hard size"},
		{name: "attribute precision vs baseline, top k", value: (2.0 / 3) / (2.0 / 5), met: false,
			reason: "whittle 2 of 3 hits on target, the baseline 2 of 5: 1.67 times, under 2"},
		{name: "attribute precision vs baseline, all matches", value: (2.0 / 3) / (2.0 / 5), met: false,
			reason: "whittle 2 of 3 products matched on target, the baseline 2 of 5"},
	} {
		g := rep.Goals[i]
		if g.Name != tc.name || math.Abs(g.Value-tc.value) > 1e-12 || g.Met != tc.met {
			t.Errorf("%s: goal %+v, want %s %v met=%v", tc.reason, g, tc.name, tc.value, tc.met)
		}
	}
	if rep.Met() {
		t.Error("Met() with three goals not met")
	}
	// One case a failure, in the order of Failures; whittle lost the typo
	// only (no hits where the baseline had two).
	var order []Failure
	for _, row := range rep.ByFailure {
		order = append(order, row.Failure)
		if row.Whittle.Queries != 1 || row.Baseline.Queries != 1 {
			t.Errorf("%s: %d and %d queries, want 1", row.Failure, row.Whittle.Queries, row.Baseline.Queries)
		}
		want := 0
		if row.Failure == FailTypo {
			want = 1
		}
		if row.Lost != want {
			t.Errorf("%s: lost %d, want %d", row.Failure, row.Lost, want)
		}
	}
	if got := strings.Join([]string{string(order[0]), string(order[1]), string(order[2])}, " "); len(order) != 3 || got != "colour pattern typo" {
		t.Errorf("failures in order %v, want colour pattern typo", order)
	}
	if len(rep.Losses) != 1 || rep.Losses[0].Query != "wool rgu" || rep.Losses[0].Why != LossNoHits {
		t.Errorf("losses %+v, want the typo case, with no hits", rep.Losses)
	}
}

// At most ExamplesPerFailure losses are listed for a failure, the worst
// first: a case with no hits before one with fewer hits on target.
func TestLossExamples(t *testing.T) {
	ps := tiny(t)
	var cases []Case
	var whittle, baseline []Result
	for i := range 5 {
		cases = append(cases, Case{Query: "q" + string(rune('0'+i)), Product: "RG-1", ProductType: "rug", Failure: FailKeyword})
		baseline = append(baseline, Result{Hits: []string{"RG-1"}})
		// Cases 0..3: whittle returns the sweater, off target; case 4:
		// nothing at all, the worst.
		if i < 4 {
			whittle = append(whittle, Result{Hits: []string{"SW-1"}})
		} else {
			whittle = append(whittle, Result{})
		}
	}
	rep := NewReport(cases, whittle, baseline, ps, 10)
	var got []string
	for _, l := range rep.Losses {
		got = append(got, l.Query+" "+l.Why)
	}
	want := []string{"q4 " + LossNoHits, "q0 " + LossOffTarget, "q1 " + LossOffTarget}
	if strings.Join(got, "|") != strings.Join(want, "|") {
		t.Errorf("examples %q, want %q", got, want)
	}
	if rep.ByFailure[0].Lost != 5 {
		t.Errorf("lost %d, want all 5", rep.ByFailure[0].Lost)
	}
}

// The text report of the hand cases. Checked by hand against TestScore:
// whittle 66.7% rescued (2/3), 100% preserved (3/3), 66.7% precise
// (2/3), 66.7% found, MRR 0.667, 1.67 of 2.67 constraints kept;
// baseline 100% rescued, 80% preserved (4/5), 40% precise (2/5), 66.7%
// found, MRR 0.500 (1.5/3), 2.00 of 3.67 words; precision ratio 1.67×.
func TestWriteTextGolden(t *testing.T) {
	cases, whittle, baseline := handCases()
	rep := NewReport(cases, whittle, baseline, tiny(t), 10)
	rep.Seed = 7
	var buf bytes.Buffer
	if err := rep.WriteText(&buf); err != nil {
		t.Fatal(err)
	}
	golden := filepath.Join("..", "..", "testdata", "eval", "report.txt")
	if *update {
		if err := os.WriteFile(golden, buf.Bytes(), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	want, err := os.ReadFile(golden)
	if err != nil {
		t.Fatal(err)
	}
	if buf.String() != string(want) {
		t.Errorf("report differs from %s (go test ./rewrite/eval -run Golden -update, then read the diff):\n%s", golden, buf.String())
	}
}

// A rate of no hits is null in JSON, not a failure to encode; the
// baseline is named.
func TestReportJSON(t *testing.T) {
	rep := NewReport([]Case{{Query: "q", Product: "RG-1", ProductType: "rug", Failure: FailTypo}}, []Result{{}}, []Result{{}}, tiny(t), 10)
	rep.Fallback = bleveengine.DropTrailing
	b, err := json.Marshal(rep)
	if err != nil {
		t.Fatal(err)
	}
	var back struct {
		Fallback string `json:"fallback"`
		Whittle  struct {
			RescueRate       *float64 `json:"rescue_rate"`
			HardPreservation *float64 `json:"hard_preservation"`
		} `json:"whittle"`
		Goals []struct {
			Value *float64 `json:"value"`
			Met   bool     `json:"met"`
		} `json:"goals"`
	}
	if err := json.Unmarshal(b, &back); err != nil {
		t.Fatal(err)
	}
	if back.Fallback != "drop-trailing" {
		t.Errorf("fallback %q, want drop-trailing", back.Fallback)
	}
	if back.Whittle.RescueRate == nil || *back.Whittle.RescueRate != 0 {
		t.Errorf("rescue rate %v, want 0 (no query had hits)", back.Whittle.RescueRate)
	}
	if back.Whittle.HardPreservation != nil {
		t.Errorf("hard preservation %v, want null (no hits to share)", *back.Whittle.HardPreservation)
	}
	if len(back.Goals) != 4 || back.Goals[1].Value != nil || back.Goals[1].Met {
		t.Errorf("goals %s, want preservation null and not met", b)
	}
}

package eval

import (
	"fmt"
	"io"
	"math"
	"slices"
	"strings"
	"text/tabwriter"

	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/catalog"
	"github.com/whittle-search/whittle/rewrite/internal/textout"
)

// Goals whittle is held to.
const (
	// GoalRescueRate is the least share of queries whittle should return
	// hits for.
	GoalRescueRate = 0.95
	// GoalHardPreservation is the share of whittle's hits that should
	// have every hard attribute of their query: all of them.
	GoalHardPreservation = 1.0
	// GoalPrecisionRatio is how many times the baseline's attribute
	// precision whittle's should be at least.
	GoalPrecisionRatio = 2.0
)

// ExamplesPerFailure bounds the losses a report lists for one failure.
const ExamplesPerFailure = 3

// Report holds the figures of whittle and of the baseline on one set of
// cases, by failure too, the goals, and examples of where whittle loses.
type Report struct {
	// Style is how the set's queries were written; "" when not said.
	Style    Style  `json:"style,omitempty"`
	Products int    `json:"products"`
	Seed     uint64 `json:"seed"`
	// K is how many hits each query asked for.
	K int `json:"k"`
	// Fallback is the blind partial match that is the baseline.
	Fallback  bleveengine.Fallback `json:"fallback"`
	Whittle   Figures              `json:"whittle"`
	Baseline  Figures              `json:"baseline"`
	ByFailure []FailureRow         `json:"by_failure"`
	Goals     []Goal               `json:"goals"`
	Losses    []Loss               `json:"losses"`
}

// FailureRow holds the figures of the cases of one failure, and how many
// of them whittle lost.
type FailureRow struct {
	Failure  Failure `json:"failure"`
	Whittle  Figures `json:"whittle"`
	Baseline Figures `json:"baseline"`
	Lost     int     `json:"lost"`
}

// Goal is one goal with the figure it is checked against.
type Goal struct {
	Name   string  `json:"name"`
	Target string  `json:"target"`
	Value  float64 `json:"value"`
	Met    bool    `json:"met"`
}

// Loss is a case whittle did worse on than the baseline.
type Loss struct {
	Failure  Failure `json:"failure"`
	Query    string  `json:"query"`
	Injected string  `json:"injected"`
	Product  string  `json:"product"`
	// Why says how whittle did worse; Whittle says what it did.
	Why     string `json:"why"`
	Whittle string `json:"whittle"`
}

// NewReport scores whittle's and the baseline's results (both in the
// order of cases) against the products, and checks the goals. For each
// failure it keeps up to ExamplesPerFailure losses, worst first (no
// hits, then fewer hits on target, then the intended product missed),
// in the order of the cases.
func NewReport(cases []Case, whittle, baseline []Result, products []catalog.Product, k int) Report {
	byID := index(products)
	rep := Report{Products: len(products), K: k}
	rows := map[Failure]*FailureRow{}
	lost := map[Failure][]Loss{}
	for i, c := range cases {
		if i >= len(whittle) || i >= len(baseline) {
			break
		}
		ws, bs := scoreCase(c, whittle[i], byID), scoreCase(c, baseline[i], byID)
		rep.Whittle.add(whittle[i], ws)
		rep.Baseline.add(baseline[i], bs)
		row := rows[c.Failure]
		if row == nil {
			row = &FailureRow{Failure: c.Failure}
			rows[c.Failure] = row
		}
		row.Whittle.add(whittle[i], ws)
		row.Baseline.add(baseline[i], bs)
		if why := loses(ws, bs); why != "" {
			row.Lost++
			lost[c.Failure] = append(lost[c.Failure], Loss{Failure: c.Failure, Query: c.Query, Injected: c.Injected,
				Product: c.Product, Why: why, Whittle: whittle[i].Note})
		}
	}
	for _, row := range rows {
		rep.ByFailure = append(rep.ByFailure, *row)
	}
	slices.SortFunc(rep.ByFailure, func(a, b FailureRow) int { return failureOrder(a.Failure) - failureOrder(b.Failure) })
	for _, row := range rep.ByFailure {
		ls := lost[row.Failure]
		slices.SortStableFunc(ls, func(a, b Loss) int { return lossOrder(a.Why) - lossOrder(b.Why) })
		rep.Losses = append(rep.Losses, ls[:min(len(ls), ExamplesPerFailure)]...)
	}
	rep.Goals = goals(rep.Whittle, rep.Baseline)
	return rep
}

// lossOrder sorts the ways of losing worst first.
func lossOrder(why string) int {
	return slices.Index([]string{LossNoHits, LossOffTarget, LossMissed}, why)
}

// goals checks whittle's figures against the goals. A figure that cannot
// be computed (no hits at all) does not meet its goal.
//
// The precision goal is checked twice: on the top k, what a first page
// ranked by relevance shows, and on the whole result sets, what the
// count, the facets and a sort by price see.
func goals(w, b Figures) []Goal {
	target := fmt.Sprintf("≥ %.0f×", GoalPrecisionRatio)
	top := precisionRatio(w.AttributePrecision(), b.AttributePrecision())
	all := precisionRatio(w.SetPrecision(), b.SetPrecision())
	return []Goal{
		{Name: "rescue rate", Target: fmt.Sprintf("≥ %.0f%%", GoalRescueRate*100), Value: w.RescueRate(), Met: w.RescueRate() >= GoalRescueRate},
		{Name: "hard-constraint preservation", Target: fmt.Sprintf("%.0f%%", GoalHardPreservation*100), Value: w.HardPreservation(), Met: w.HardPreservation() >= GoalHardPreservation},
		{Name: "attribute precision vs baseline, top k", Target: target, Value: top, Met: top >= GoalPrecisionRatio},
		{Name: "attribute precision vs baseline, all matches", Target: target, Value: all, Met: all >= GoalPrecisionRatio},
	}
}

// precisionRatio is whittle's precision over the baseline's: infinite
// when only the baseline's is 0, NaN when either cannot be computed.
func precisionRatio(w, b float64) float64 {
	if b == 0 && w > 0 {
		return math.Inf(1)
	}
	return w / b
}

// Met reports whether every goal is met.
func (r Report) Met() bool {
	for _, g := range r.Goals {
		if !g.Met {
			return false
		}
	}
	return len(r.Goals) > 0
}

// WriteText writes the report as tables: the figures of whittle and the
// baseline, the goals, the figures by failure, and examples of losses.
func (r Report) WriteText(w io.Writer) error {
	tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', 0)
	fmt.Fprintf(tw, "%d %squeries on %d products (seed %d), top %d hits each\n", r.Whittle.Queries, styleWord(r.Style), r.Products, r.Seed, r.K)
	fmt.Fprintf(tw, "baseline: %s, a blind partial match that %s\n\n", r.Fallback, r.Fallback.Describe())
	fmt.Fprintln(tw, "measure\twhittle\tbaseline")
	for _, row := range figureRows(r.Whittle, r.Baseline, r.K) {
		fmt.Fprintf(tw, "%s\t%s\t%s\n", row[0], row[1], row[2])
	}
	fmt.Fprintln(tw, "\ngoal\ttarget\tmeasured\tresult")
	for _, g := range r.Goals {
		fmt.Fprintf(tw, "%s\t%s\t%s\t%s\n", g.Name, g.Target, goalValue(g), metText(g.Met))
	}
	fmt.Fprintln(tw, "\nfailure\tqueries\trescued (w / b)\tprecision (w / b)\tall matches (w / b)\tfound (w / b)\twhittle lost")
	for _, row := range r.ByFailure {
		fmt.Fprintf(tw, "%s\t%d\t%s / %s\t%s / %s\t%s / %s\t%s / %s\t%d\n", row.Failure, row.Whittle.Queries,
			percent(row.Whittle.RescueRate()), percent(row.Baseline.RescueRate()),
			percent(row.Whittle.AttributePrecision()), percent(row.Baseline.AttributePrecision()),
			percent(row.Whittle.SetPrecision()), percent(row.Baseline.SetPrecision()),
			percent(row.Whittle.FoundRate()), percent(row.Baseline.FoundRate()), row.Lost)
	}
	if err := tw.Flush(); err != nil {
		return err
	}
	if len(r.Losses) == 0 {
		_, err := fmt.Fprintln(w, "\nwhittle did no worse than the baseline on any query.")
		return err
	}
	fmt.Fprintln(w, "\nwhere whittle loses (examples):")
	for _, l := range r.Losses {
		fmt.Fprintf(w, "  [%s] %q (%s; meant %s): %s\n      whittle: %s\n", l.Failure, l.Query, l.Injected, l.Product, l.Why, l.Whittle)
	}
	return nil
}

// WriteGoals writes the goals of several reports side by side, a column
// a report headed by its style: what each measured, and whether it met
// the goal.
func WriteGoals(w io.Writer, reps []Report) error {
	tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', 0)
	fmt.Fprint(tw, "goal\ttarget")
	for _, r := range reps {
		fmt.Fprintf(tw, "\t%s (%s)", styleName(r.Style), textout.Count(r.Whittle.Queries, "query", "queries"))
	}
	fmt.Fprintln(tw)
	if len(reps) > 0 {
		for i, g := range reps[0].Goals {
			fmt.Fprintf(tw, "%s\t%s", g.Name, g.Target)
			for _, r := range reps {
				if i < len(r.Goals) {
					fmt.Fprintf(tw, "\t%s %s", goalValue(r.Goals[i]), metText(r.Goals[i].Met))
				}
			}
			fmt.Fprintln(tw)
		}
	}
	return tw.Flush()
}

// styleName is a report's style as a column heading.
func styleName(s Style) string {
	if s == "" {
		return "set"
	}
	return string(s)
}

// styleWord is a style followed by a space, or "" for none.
func styleWord(s Style) string {
	if s == "" {
		return ""
	}
	return string(s) + " "
}

// goalValue writes a goal's measured value: a ratio for a "×" target,
// else a percentage.
func goalValue(g Goal) string {
	if strings.HasSuffix(g.Target, "×") {
		return times(g.Value)
	}
	return percent(g.Value)
}

// figureRows are the lines of the main table.
func figureRows(w, b Figures, k int) [][3]string {
	return [][3]string{
		{"rescue rate (some hits)", percent(w.RescueRate()), percent(b.RescueRate())},
		{"hard-constraint preservation", percent(w.HardPreservation()), percent(b.HardPreservation())},
		{fmt.Sprintf("attribute precision, top %d", k), percent(w.AttributePrecision()), percent(b.AttributePrecision())},
		{"attribute precision, all matches", percent(w.SetPrecision()), percent(b.SetPrecision())},
		{"  mean over queries", percent(w.MeanSetPrecision()), percent(b.MeanSetPrecision())},
		{fmt.Sprintf("intended product in top %d", k), percent(w.FoundRate()), percent(b.FoundRate())},
		{"mean reciprocal rank", fmt.Sprintf("%.3f", w.MRR()), fmt.Sprintf("%.3f", b.MRR())},
		{"kept a query", fmt.Sprintf("%.2f of %.2f constraints", w.MeanKept(), w.MeanOf()), fmt.Sprintf("%.2f of %.2f words", b.MeanKept(), b.MeanOf())},
		{"hits returned", fmt.Sprint(w.Hits), fmt.Sprint(b.Hits)},
		{"products matched", fmt.Sprint(w.Matched), fmt.Sprint(b.Matched)},
		{"queries found as typed", fmt.Sprint(w.Exact), fmt.Sprint(b.Exact)},
	}
}

func percent(v float64) string {
	if math.IsNaN(v) {
		return "n/a"
	}
	return fmt.Sprintf("%.1f%%", v*100)
}

func times(v float64) string {
	if math.IsNaN(v) {
		return "n/a"
	}
	if math.IsInf(v, 1) {
		return "∞"
	}
	return fmt.Sprintf("%.2f×", v)
}

func metText(met bool) string {
	if met {
		return "met"
	}
	return "not met"
}

package replay

import (
	"encoding/csv"
	"fmt"
	"io"
	"strconv"
	"strings"
	"time"

	"github.com/whittle-search/whittle/rewrite/internal/textout"
)

// WriteText writes a report for a person at a terminal.
func WriteText(w io.Writer, r Report) error {
	p := &textout.Printer{W: w}
	p.F("%s, %s", textout.Count(int(r.All.Queries), "query", "queries"), textout.Count(int(r.All.Searches), "search", "searches"))
	var apart []string
	if r.NothingToSearch.Queries > 0 {
		apart = append(apart, fmt.Sprintf("%s, %s with nothing to search for, not searched",
			textout.Count(int(r.NothingToSearch.Queries), "query", "queries"), textout.Count(int(r.NothingToSearch.Searches), "search", "searches")))
	}
	if r.SkippedLines > 0 {
		apart = append(apart, fmt.Sprintf("%d malformed lines skipped", r.SkippedLines))
	}
	if len(apart) > 0 {
		p.F(" (%s)", strings.Join(apart, "; "))
	}
	p.F("\n\n")
	p.F("finding nothing            queries          searches\n")
	p.F("  as typed            %7d %6.1f%%  %8d %6.1f%%\n", r.ZeroBefore.Queries, 100*r.RateBefore.Queries, r.ZeroBefore.Searches, 100*r.RateBefore.Searches)
	p.F("  after rescue        %7d %6.1f%%  %8d %6.1f%%\n", r.ZeroAfter.Queries, 100*r.RateAfter.Queries, r.ZeroAfter.Searches, 100*r.RateAfter.Searches)
	p.F("  rescued             %7d          %8d\n", r.Rescued.Queries, r.Rescued.Searches)
	if len(r.Changes) > 0 {
		p.F("\nrelaxations used (queries, searches)\n")
		for _, c := range r.Changes {
			p.F("  %-8s %-16s %7d %8d\n", c.Op, c.Kind, c.Queries, c.Searches)
		}
	}
	if len(r.Unmet) > 0 || r.UnmetOther.Queries > 0 {
		p.F("\nleft with nothing, by the hard constraint nothing carries (queries, searches)\n")
		for _, u := range r.Unmet[:min(len(r.Unmet), 15)] {
			p.F("  %-32s %7d %8d\n", u.Constraint, u.Queries, u.Searches)
		}
		if n := len(r.Unmet) - 15; n > 0 {
			p.F("  ... and %d more constraints\n", n)
		}
		if r.UnmetOther.Queries > 0 {
			p.F("  %-32s %7d %8d\n", "(no single hard constraint)", r.UnmetOther.Queries, r.UnmetOther.Searches)
		}
	}
	if len(r.Alerts) > 0 {
		p.F("\nfrequent queries that find nothing as typed (a head query going empty is\nusually a catalog or publishing fault)\n")
		for _, a := range r.Alerts {
			bound := ""
			if a.Error > 0 {
				bound = fmt.Sprintf(" (at most %d over)", a.Error)
			}
			p.F("  %8d  %s%s\n", a.Searches, a.Query, bound)
		}
	}
	p.F("\nrescue time: p50 ≤ %s, p99 ≤ %s\n", fmtDur(r.P50), fmtDur(r.P99))
	for _, le := range r.Skipped {
		p.F("skipped %v\n", le)
	}
	return p.Err
}

func fmtDur(d time.Duration) string {
	switch {
	case d >= time.Second:
		return fmt.Sprintf("%.1f s", d.Seconds())
	case d >= time.Millisecond:
		return fmt.Sprintf("%g ms", float64(d)/float64(time.Millisecond))
	}
	return fmt.Sprintf("%g µs", float64(d)/float64(time.Microsecond))
}

// CSV writes results as rows for a spreadsheet, one a query, after a
// header row. A query with nothing to search for has its reason in the
// last column, nothing_to_search, and its counts left blank.
type CSV struct {
	w      *csv.Writer
	header bool
}

// NewCSV returns a CSV writer on w.
func NewCSV(w io.Writer) *CSV { return &CSV{w: csv.NewWriter(w)} }

var csvHeader = []string{"line", "query", "count", "category", "exact_count", "rescued", "final_count", "relaxations", "hard_unmet", "elapsed_ms", "nothing_to_search"}

// Write writes one result's row (and the header before the first).
func (c *CSV) Write(res *Result) error {
	if !c.header {
		c.header = true
		if err := c.w.Write(csvHeader); err != nil {
			return err
		}
	}
	var ch []string
	for _, x := range res.Changes {
		ch = append(ch, x.Op+" "+x.Kind+" "+x.Text)
	}
	exact, rescued, final := strconv.Itoa(res.ExactCount), strconv.FormatBool(res.Rescued), strconv.Itoa(res.FinalCount)
	if res.NothingToSearch != "" {
		exact, rescued, final = "", "", ""
	}
	return c.w.Write([]string{strconv.Itoa(res.Line), cell(res.Query), strconv.Itoa(res.Count), res.Category,
		exact, rescued, final, cell(strings.Join(ch, "; ")), cell(strings.Join(res.HardUnmet, "; ")),
		strconv.FormatFloat(float64(res.Elapsed)/float64(time.Millisecond), 'f', 3, 64), res.NothingToSearch})
}

// cell makes text a shopper typed safe to open in a spreadsheet, which
// runs a cell that begins with =, +, -, @, a tab or a carriage return as
// a formula ("=HYPERLINK(...)" in a query log): such a cell gets a single
// quote before it, which spreadsheets read as "this is text" (the OWASP
// advice on CSV injection).
func cell(s string) string {
	if s != "" && strings.ContainsRune("=+-@\t\r", rune(s[0])) {
		return "'" + s
	}
	return s
}

// Flush writes what is buffered and reports any error so far.
func (c *CSV) Flush() error {
	if !c.header {
		c.header = true
		c.w.Write(csvHeader)
	}
	c.w.Flush()
	return c.w.Error()
}

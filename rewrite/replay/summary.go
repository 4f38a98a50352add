package replay

import (
	"cmp"
	"slices"
	"strings"
	"time"

	"github.com/whittle-search/whittle/rewrite/catalog"
)

// Tally counts log entries two ways: Queries counts each line once,
// Searches weighs it by how often it was searched.
type Tally struct {
	Queries  int `json:"queries"`
	Searches int `json:"searches"`
}

func (t *Tally) add(n int) { t.Queries++; t.Searches += n }

// Rate is part's share of the whole, unweighted and weighted.
type Rate struct {
	Queries  float64 `json:"queries"`
	Searches float64 `json:"searches"`
}

func rate(part, whole Tally) Rate {
	var r Rate
	if whole.Queries > 0 {
		r.Queries = float64(part.Queries) / float64(whole.Queries)
	}
	if whole.Searches > 0 {
		r.Searches = float64(part.Searches) / float64(whole.Searches)
	}
	return r
}

// ChangeTally counts the entries whose rescue used a kind of relaxation.
type ChangeTally struct {
	Op   string `json:"op"`
	Kind string `json:"kind"`
	Tally
}

// UnmetTally counts the entries left with nothing because nothing
// carries one hard constraint ("size 15").
type UnmetTally struct {
	Constraint string `json:"constraint"`
	Tally
}

// Alert is a frequent query that finds nothing as typed. Searches is an
// upper bound on how often it was searched, and at most Error above the
// true figure (see Summary).
type Alert struct {
	Query    string `json:"query"`
	Searches int    `json:"searches"`
	Error    int    `json:"error"`
}

// Bucket is one bar of the latency histogram: the rescues that took
// longer than the bucket before's bound and at most UpTo.
type Bucket struct {
	UpTo  time.Duration `json:"up_to_ns"`
	Count int           `json:"count"`
}

// Report is a summary as written out. All counts the entries searched,
// and the rates are shares of it; the entries with nothing to search
// for ("!!!", "nice") are counted in NothingToSearch alone, as skipped
// lines are in SkippedLines.
type Report struct {
	All Tally `json:"all"`
	// NothingToSearch counts the entries not searched because they have
	// nothing to search for (Result.NothingToSearch).
	NothingToSearch Tally         `json:"nothing_to_search"`
	ZeroBefore      Tally         `json:"zero_before"`
	ZeroAfter       Tally         `json:"zero_after"`
	Rescued         Tally         `json:"rescued"`
	RateBefore      Rate          `json:"zero_rate_before"`
	RateAfter       Rate          `json:"zero_rate_after"`
	Changes         []ChangeTally `json:"relaxations"`
	Unmet           []UnmetTally  `json:"left_with_nothing"`
	// UnmetOther counts the entries left with nothing for a hard
	// constraint past the distinct ones kept, or for no hard
	// constraint at all (the rescue ran out of budget, say).
	UnmetOther Tally    `json:"left_with_nothing_other"`
	Alerts     []Alert  `json:"alerts"`
	Latency    []Bucket `json:"latency"`
	// P50 and P99 are read off the histogram: the bound of the bucket
	// the percentile falls in.
	P50     time.Duration        `json:"p50_ns"`
	P99     time.Duration        `json:"p99_ns"`
	Skipped []*catalog.LineError `json:"skipped,omitempty"`
	// SkippedLines counts every skipped line; Skipped lists the first.
	SkippedLines int `json:"skipped_lines"`
}

// Summary gathers results in memory that does not grow with the log:
// fixed-size histograms, at most MaxDistinct distinct unmet
// constraints, and the Space-Saving sketch for frequent queries that
// find nothing (Metwally, Agrawal and El Abbadi, 2005, "Efficient
// Computation of Frequent and Top-k Elements in Data Streams"): it keeps
// AlertSlots counters, and any query searched more than
// (all zero-result searches)/AlertSlots times is among them, its count
// over the truth by at most its Error.
type Summary struct {
	r       Report
	changes map[[2]string]*Tally
	unmet   map[string]*Tally
	alerts  *spaceSaving
	latency []int
}

// Bounds of the summary's tallies.
const (
	MaxDistinct = 10000
	AlertSlots  = 1024
	// AlertsShown is how many alerts a report lists.
	AlertsShown = 20
	// SkippedShown is how many skipped lines a report lists.
	SkippedShown = 100
)

// latencyBounds are the histogram's upper bounds; the last bucket holds
// everything slower.
var latencyBounds = []time.Duration{
	50 * time.Microsecond, 100 * time.Microsecond, 200 * time.Microsecond, 500 * time.Microsecond,
	time.Millisecond, 2 * time.Millisecond, 5 * time.Millisecond, 10 * time.Millisecond,
	20 * time.Millisecond, 50 * time.Millisecond, 100 * time.Millisecond, time.Second, time.Hour,
}

// NewSummary returns an empty summary.
func NewSummary() *Summary {
	return &Summary{changes: map[[2]string]*Tally{}, unmet: map[string]*Tally{}, alerts: newSpaceSaving(AlertSlots),
		latency: make([]int, len(latencyBounds))}
}

// Add counts one result: a result with nothing to search for in
// NothingToSearch only.
func (s *Summary) Add(res *Result) {
	n := res.Count
	if res.NothingToSearch != "" {
		s.r.NothingToSearch.add(n)
		return
	}
	s.r.All.add(n)
	if res.ExactCount == 0 {
		s.r.ZeroBefore.add(n)
		s.alerts.add(normQuery(res.Query), n)
	}
	if res.FinalCount == 0 {
		s.r.ZeroAfter.add(n)
		counted := false
		for _, u := range res.HardUnmet {
			t := s.unmet[u]
			if t == nil && len(s.unmet) < MaxDistinct {
				t = &Tally{}
				s.unmet[u] = t
			}
			if t != nil {
				t.add(n)
				counted = true
			}
		}
		if !counted {
			s.r.UnmetOther.add(n)
		}
	}
	if res.Rescued {
		s.r.Rescued.add(n)
	}
	seen := map[[2]string]bool{}
	for _, c := range res.Changes {
		k := [2]string{c.Op, c.Kind}
		if seen[k] {
			continue
		}
		seen[k] = true
		t := s.changes[k]
		if t == nil {
			t = &Tally{}
			s.changes[k] = t
		}
		t.add(n)
	}
	i, _ := slices.BinarySearch(latencyBounds, res.Elapsed)
	s.latency[min(i, len(s.latency)-1)]++
}

// Skip counts a malformed line passed over.
func (s *Summary) Skip(le *catalog.LineError) {
	s.r.SkippedLines++
	if len(s.r.Skipped) < SkippedShown {
		s.r.Skipped = append(s.r.Skipped, le)
	}
}

// Report returns the summary's figures, sorted: relaxations and unmet
// constraints by searches, most first; alerts likewise.
func (s *Summary) Report() Report {
	r := s.r
	r.RateBefore, r.RateAfter = rate(r.ZeroBefore, r.All), rate(r.ZeroAfter, r.All)
	r.Changes = []ChangeTally{}
	for k, t := range s.changes {
		r.Changes = append(r.Changes, ChangeTally{Op: k[0], Kind: k[1], Tally: *t})
	}
	slices.SortFunc(r.Changes, func(a, b ChangeTally) int {
		return cmp.Or(cmp.Compare(b.Searches, a.Searches), cmp.Compare(b.Queries, a.Queries), cmp.Compare(a.Kind, b.Kind), cmp.Compare(a.Op, b.Op))
	})
	r.Unmet = []UnmetTally{}
	for k, t := range s.unmet {
		r.Unmet = append(r.Unmet, UnmetTally{Constraint: k, Tally: *t})
	}
	slices.SortFunc(r.Unmet, func(a, b UnmetTally) int {
		return cmp.Or(cmp.Compare(b.Searches, a.Searches), cmp.Compare(b.Queries, a.Queries), cmp.Compare(a.Constraint, b.Constraint))
	})
	r.Alerts = s.alerts.top(AlertsShown)
	r.Latency = make([]Bucket, len(latencyBounds))
	total := 0
	for i, b := range latencyBounds {
		r.Latency[i] = Bucket{UpTo: b, Count: s.latency[i]}
		total += s.latency[i]
	}
	r.P50, r.P99 = percentile(r.Latency, total, 50), percentile(r.Latency, total, 99)
	return r
}

func percentile(bs []Bucket, total, p int) time.Duration {
	if total == 0 {
		return 0
	}
	want := (total*p + 99) / 100
	seen := 0
	for _, b := range bs {
		seen += b.Count
		if seen >= want {
			return b.UpTo
		}
	}
	return bs[len(bs)-1].UpTo
}

// normQuery is how alerts tell queries apart: case and spacing aside.
func normQuery(q string) string { return strings.Join(strings.Fields(strings.ToLower(q)), " ") }

package rewrite

import (
	"slices"
	"testing"
)

func TestAddExplored(t *testing.T) {
	hits := func(ids ...string) []ReportHit {
		var out []ReportHit
		for _, id := range ids {
			out = append(out, ReportHit{ID: id})
		}
		return out
	}
	drop := []Relaxation{{Constraint: 0, Text: "mustard", Kind: "colour", Operator: OpDrop, Detail: "dropped"}}
	for _, tc := range []struct {
		name, reason string
		hits         []ReportHit
		rank, k      int
		want         []string
		wantRank     int
	}{
		{name: "none shown", hits: nil, rank: 1, k: 10, want: []string{"X"}, wantRank: 1,
			reason: "with nothing shown the explored product is the one hit"},
		{name: "in the middle", hits: hits("A", "B", "C"), rank: 2, k: 10, want: []string{"A", "X", "B", "C"}, wantRank: 2,
			reason: "rank 2 goes after the first hit; the rest move down one"},
		{name: "after the last", hits: hits("A", "B"), rank: 3, k: 10, want: []string{"A", "B", "X"}, wantRank: 3,
			reason: "one past the last hit is a place while fewer than k are shown"},
		{name: "full", hits: hits("A", "B", "C"), rank: 1, k: 3, want: []string{"X", "A", "B"}, wantRank: 1,
			reason: "k hits already shown: the last drops off"},
		{name: "full, at the last place", hits: hits("A", "B", "C"), rank: 3, k: 3, want: []string{"A", "B", "X"}, wantRank: 3,
			reason: "the explored product takes the last place and C drops off"},
		{name: "rank past the end", hits: hits("A", "B"), rank: 9, k: 10, want: []string{"A", "B", "X"}, wantRank: 3,
			reason: "a rank past the end is the last place"},
		{name: "rank below 1", hits: hits("A"), rank: 0, k: 10, want: []string{"X", "A"}, wantRank: 1,
			reason: "ranks count from 1"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			orig := slices.Clone(tc.hits)
			r := Report{Hits: tc.hits}
			r.AddExplored(ReportHit{ID: "X"}, tc.rank, tc.k, drop)
			var got []string
			for _, h := range r.Hits {
				got = append(got, h.ID)
				if h.Explored != (h.ID == "X") {
					t.Errorf("%s: hit %s explored=%v", tc.reason, h.ID, h.Explored)
				}
			}
			if !slices.Equal(got, tc.want) || r.Explored == nil || r.Explored.Rank != tc.wantRank {
				t.Errorf("%s: hits %v, explored %+v; want %v at %d", tc.reason, got, r.Explored, tc.want, tc.wantRank)
			}
			if r.Explored != nil && !slices.Equal(r.Explored.Relaxations, []ReportRelaxation{{Op: "drop", Kind: "colour", Text: "mustard", Detail: "dropped"}}) {
				t.Errorf("relaxations %+v", r.Explored.Relaxations)
			}
			if !slices.Equal(tc.hits, orig) {
				t.Errorf("the caller's hits changed: %v", tc.hits)
			}
		})
	}
}

package colour

import (
	"cmp"
	"math"
	"slices"
	"sort"
	"strings"
)

// PaletteColour is a colour a catalog carries: its name in the catalog,
// its L*a*b* value and the number of products in it.
type PaletteColour struct {
	Name  string
	Lab   Lab
	Count int
}

// Match is a palette colour found by a search, with its CIEDE2000
// difference from the query colour.
type Match struct {
	PaletteColour
	DeltaE float64
}

// Palette is a set of catalog colours searchable by CIEDE2000 difference.
// It is immutable once built and safe for concurrent use.
//
// The colours are kept sorted by L*. A search scans only the L* window
// where a colour can be close enough, by the bound ΔE00 >= |ΔL*| / S_L,
// and rejects most colours inside the window by two more lower bounds of
// CIEDE2000, one that needs only multiplications and one that needs no
// trigonometry, before the full formula runs. The bounds are proved in
// the source.
type Palette struct {
	cols []PaletteColour // sorted by L, then by input position
	pre  []prepared      // pre[i] is cols[i] prepared for CIEDE2000
	pos  []int           // pos[i] is the input position of cols[i]
}

// NewPalette builds a palette of the colours cs, which it copies. Colours
// with a NaN or infinite component are left out, as they have no
// difference from anything. Names need not be unique.
func NewPalette(cs []PaletteColour) *Palette {
	p := &Palette{}
	idx := make([]int, 0, len(cs))
	for i, c := range cs {
		if finite(c.Lab) {
			idx = append(idx, i)
		}
	}
	slices.SortStableFunc(idx, func(i, j int) int { return cmp.Compare(cs[i].Lab.L, cs[j].Lab.L) })
	p.cols = make([]PaletteColour, len(idx))
	p.pre = make([]prepared, len(idx))
	p.pos = idx
	for k, i := range idx {
		p.cols[k] = cs[i]
		p.pre[k] = preparePalette(cs[i].Lab)
	}
	return p
}

// finite reports whether no component of l is NaN or infinite.
func finite(l Lab) bool {
	for _, v := range [3]float64{l.L, l.A, l.B} {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			return false
		}
	}
	return true
}

// Len returns the number of colours in the palette.
func (p *Palette) Len() int {
	if p == nil {
		return 0
	}
	return len(p.cols)
}

// Rounding slack of the search bounds: a bound rejects a colour only when
// it exceeds the limit by more than float64 rounding could explain, so
// the bounds never drop a colour the full formula would keep.
const (
	slackRel = 1e-9
	slackAbs = 1e-9
)

// maxSL returns an upper bound of the CIEDE2000 lightness weight S_L
// over all pairs of a colour of lightness l with a palette colour.
//
// S_L = 1 + 0.015 d² / sqrt(20 + d²) with d = L̄ - 50 grows with d², and
// for a palette colour of lightness Li, L̄ = (l + Li)/2 lies between
// (l + minL)/2 and (l + maxL)/2, so S_L <= S_L(dMax) with dMax the larger
// of |(l + minL)/2 - 50| and |(l + maxL)/2 - 50|. For lightnesses within
// 0..100, dMax <= 50 and S_L <= 1 + 0.015·2500/sqrt(2520) ≈ 1.747.
func (p *Palette) maxSL(l float64) float64 {
	minL, maxL := p.pre[0].L, p.pre[len(p.pre)-1].L
	d := math.Max(math.Abs((l+minL)/2-50), math.Abs((l+maxL)/2-50))
	return 1 + 0.015*d*d/math.Sqrt(20+d*d)
}

// window returns the half-width of the L* window outside which no
// palette colour is within tol of a colour of lightness l.
//
// Proof: ΔE00 >= |ΔL'| / S_L (bound (1) on deltaE2000: the chroma, hue
// and rotation terms together are never negative, since
// x² + y² + R_T·x·y >= (|x| - |y|)² when |R_T| <= 2), with ΔL' = ΔL*,
// and S_L <= maxSL(l). Hence a colour with |ΔL*| > tol·maxSL(l) has
// ΔE00 > tol.
func (p *Palette) window(l, tol float64) float64 {
	return tol*p.maxSL(l)*(1+slackRel) + slackAbs
}

// limit2 returns the squared limit the early-exit bounds of deltaE2000
// compare with, for a tolerance tol.
func limit2(tol float64) float64 { return tol*tol*(1+slackRel) + slackAbs }

// Factors of the quick bound: 1 - |R_T|max/2 in general (|R_T| <=
// 2 sin 60, see deltaE2000) and when both colours have b* >= 0 (|R_T| <=
// upperRT, bound (3) on deltaE2000).
var (
	quickKAny   = 1 - sin60
	quickKUpper = 1 - upperRT/2
)

// quickReject reports whether palette colour e is surely further than
// sqrt(lim2) from q by CIEDE2000 (kL = kC = kH = 1), using only
// multiplications; invSL2 is 1/maxSL(q.L)².
//
// Proof that ΔE00² >= ΔL*²·invSL2 + k·D² / (1 + 0.0675 C̄*)², with
// D² = Δa*² + Δb*², C̄* the mean C*ab and k = quickKUpper when both b*
// are >= 0, else quickKAny: with x, y, R_T as on deltaE2000,
// x² + y² + R_T·x·y >= (1 - |R_T|/2)(x² + y²) >= k (x² + y²), as
// |x·y| <= (x² + y²)/2. S_H <= S_C because T <= tMax < 3, so
// x² + y² >= (ΔC'² + ΔH'²) / S_C². ΔC'² + ΔH'² = C1'² + C2'² -
// 2 C1' C2' cos Δh' is the squared distance of (a1', b1) and (a2', b2)
// (Δh' may be shifted by 360, which changes no cosine; with a zero chroma
// Δh' = 0 and the identity still holds), that is (1+G)²Δa*² + Δb*² >= D²
// since G >= 0. Finally C' <= (1+G) C* <= 1.5 C*, so
// S_C = 1 + 0.045 C̄' <= 1 + 0.0675 C̄*.
//
// The code has no branch, for speed: the test compares k·D² with
// (lim2 - ΔL*²·invSL2)·(1 + 0.0675 C̄*)², true also when the lightness
// term alone exceeds lim2 (the right side is then negative).
func quickReject(q, e *prepared, invSL2, lim2 float64) bool {
	dl, da, db := e.L-q.L, e.A-q.A, e.B-q.B
	k := quickKAny + (quickKUpper-quickKAny)*(e.up*q.up)
	den := 1 + 0.03375*(e.C+q.C)
	return k*(da*da+db*db) > (lim2-dl*dl*invSL2)*(den*den)
}

// Within returns every colour of the palette whose CIEDE2000 difference
// from q is at most tol, nearest first; equal differences are ordered by
// name, then by position in the slice given to [NewPalette]. It returns
// nil when none is, when tol is negative or NaN, or when q has a NaN or
// infinite component.
func (p *Palette) Within(q Lab, tol float64) []Match {
	if p.Len() == 0 || !(tol >= 0) || !finite(q) {
		return nil
	}
	pq := preparePalette(q)
	w := p.window(q.L, tol)
	lo, hi := q.L-w, q.L+w
	lim2 := limit2(tol)
	var out []cand
	sL := p.maxSL(q.L)
	invSL2 := 1 / (sL * sL)
	for i := sort.Search(len(p.pre), func(i int) bool { return p.pre[i].L >= lo }); i < len(p.pre) && p.pre[i].L <= hi; i++ {
		if quickReject(&pq, &p.pre[i], invSL2, lim2) {
			continue
		}
		d, ok := deltaE2000(pq, p.pre[i], 1, 1, 1, lim2)
		if ok && d <= tol {
			out = append(out, cand{Match{p.cols[i], d}, p.pos[i]})
		}
	}
	return sortedMatches(out)
}

// cand is a match with the input position of its colour, for ordering.
type cand struct {
	m   Match
	pos int
}

// compareCand orders matches by difference, name, then input position.
func compareCand(a, b cand) int {
	if c := cmp.Compare(a.m.DeltaE, b.m.DeltaE); c != 0 {
		return c
	}
	if c := strings.Compare(a.m.Name, b.m.Name); c != 0 {
		return c
	}
	return cmp.Compare(a.pos, b.pos)
}

func sortedMatches(cs []cand) []Match {
	if len(cs) == 0 {
		return nil
	}
	slices.SortFunc(cs, compareCand)
	out := make([]Match, len(cs))
	for i, c := range cs {
		out[i] = c.m
	}
	return out
}

// Nearest returns the n colours of the palette nearest to q by CIEDE2000,
// nearest first, ordered as in [Palette.Within]; all of them when the
// palette has fewer than n. It returns nil when n <= 0 or q has a NaN or
// infinite component.
//
// It scans outwards from q's lightness, nearest L* first, and stops once
// the L* difference alone (by the bound of [Palette.Within]) puts every
// remaining colour beyond the n-th best found so far.
func (p *Palette) Nearest(q Lab, n int) []Match {
	if p.Len() == 0 || n <= 0 || !finite(q) {
		return nil
	}
	n = min(n, p.Len())
	pq := preparePalette(q)
	// best is a max-heap on compareCand: best[0] is the worst kept.
	best := make([]cand, 0, n)
	// sLMax bounds S_L over the whole palette (see maxSL).
	sLMax := p.maxSL(q.L)
	invSL2 := 1 / (sLMax * sLMax)
	right := sort.Search(len(p.pre), func(i int) bool { return p.pre[i].L >= q.L })
	left := right - 1
	for left >= 0 || right < len(p.pre) {
		var i int
		if right >= len(p.pre) || (left >= 0 && q.L-p.pre[left].L <= p.pre[right].L-q.L) {
			i, left = left, left-1
		} else {
			i, right = right, right+1
		}
		lim2 := math.Inf(1)
		if len(best) == n {
			worst := best[0].m.DeltaE
			if math.Abs(p.pre[i].L-q.L) > worst*sLMax*(1+slackRel)+slackAbs {
				break // every colour left is further out in L*
			}
			lim2 = limit2(worst)
			if quickReject(&pq, &p.pre[i], invSL2, lim2) {
				continue
			}
		}
		d, ok := deltaE2000(pq, p.pre[i], 1, 1, 1, lim2)
		if !ok || math.IsNaN(d) { // NaN only for components so huge that C^7 overflows
			continue
		}
		c := cand{Match{p.cols[i], d}, p.pos[i]}
		switch {
		case len(best) < n:
			best = append(best, c)
			heapUp(best, len(best)-1)
		case compareCand(c, best[0]) < 0:
			best[0] = c
			heapDown(best, 0)
		}
	}
	return sortedMatches(best)
}

// heapUp and heapDown keep h a max-heap under compareCand.
func heapUp(h []cand, i int) {
	for i > 0 {
		parent := (i - 1) / 2
		if compareCand(h[i], h[parent]) <= 0 {
			return
		}
		h[i], h[parent] = h[parent], h[i]
		i = parent
	}
}

func heapDown(h []cand, i int) {
	for {
		l, r, top := 2*i+1, 2*i+2, i
		if l < len(h) && compareCand(h[l], h[top]) > 0 {
			top = l
		}
		if r < len(h) && compareCand(h[r], h[top]) > 0 {
			top = r
		}
		if top == i {
			return
		}
		h[i], h[top] = h[top], h[i]
		i = top
	}
}

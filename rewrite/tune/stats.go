package tune

import (
	"math"
	"slices"
)

// Ranks are tallied one by one up to maxRank; a product shown lower is
// counted at maxRank, so that its propensity weight is clipped at
// maxRank^η. Clipping bounds the variance a rare click far down the
// list would add (common practice with inverse propensity weights).
const maxRank = 16

// replicates is the number of bootstrap replicates behind each interval.
const replicates = 200

// tally is the engagement of the products shown in one group of
// searches: how many were shown, and the raw worth of the interactions
// with them by rank, so that the propensity weights can be applied once
// η is known. Each replicate holds the same sums with every search
// counted a Poisson(1) number of times: a bootstrap that streams (Oza
// and Russell, "Online Bagging and Boosting", 2001; Chamandy et al.,
// "Estimating Uncertainty for Massive Data Streams", 2012).
type tally struct {
	searches int
	shown    float64
	worth    [maxRank]float64
	// repShown and repWorth are the replicates' sums; repWorth is made
	// only once something is worth anything, as most bands earn little.
	repShown []float64
	repWorth [][maxRank]float64
}

// slot is one product shown: its rank (from 1) and the raw worth of the
// interactions joined to it.
type slot struct {
	rank  int
	worth float64
}

// add counts one search's shown products in t, each replicate weighted
// by w (one Poisson(1) draw per replicate for the search).
func (t *tally) add(slots []slot, w *[replicates]uint8) {
	if len(slots) == 0 {
		return
	}
	if t.repShown == nil {
		t.repShown = make([]float64, replicates)
	}
	t.searches++
	n := float64(len(slots))
	t.shown += n
	// Most products shown earn nothing: gather those that did once.
	var nz [maxRank]float64
	var at [maxRank]int
	m := 0
	for _, s := range slots {
		if s.worth == 0 {
			continue
		}
		i := min(s.rank, maxRank) - 1
		t.worth[i] += s.worth
		j := 0
		for j < m && at[j] != i {
			j++
		}
		if j == m {
			at[m], nz[m] = i, 0
			m++
		}
		nz[j] += s.worth
	}
	for b, k := range w {
		t.repShown[b] += float64(k) * n
	}
	if m == 0 {
		return
	}
	if t.repWorth == nil {
		t.repWorth = make([][maxRank]float64, replicates)
	}
	for b, k := range w {
		if k == 0 {
			continue
		}
		r := &t.repWorth[b]
		for j := range m {
			r[at[j]] += float64(k) * nz[j]
		}
	}
}

// merge adds o's sums to t, to judge two bands as one. A search in both
// counts twice in searches; the products shown and their worth are
// exact.
func (t *tally) merge(o *tally) {
	t.searches += o.searches
	t.shown += o.shown
	for i := range t.worth {
		t.worth[i] += o.worth[i]
	}
	if o.repShown != nil {
		if t.repShown == nil {
			t.repShown = make([]float64, replicates)
		}
		for b, v := range o.repShown {
			t.repShown[b] += v
		}
	}
	if o.repWorth != nil {
		if t.repWorth == nil {
			t.repWorth = make([][maxRank]float64, replicates)
		}
		for b := range o.repWorth {
			for i, v := range o.repWorth[b] {
				t.repWorth[b][i] += v
			}
		}
	}
}

// propensities returns rank^η for ranks 1 to maxRank: the inverse of the
// chance (1/rank)^η that a shopper looks at a product at that rank
// (Joachims, Swaminathan and Schnabel, "Unbiased Learning-to-Rank with
// Biased Feedback", WSDM 2017).
func propensities(eta float64) [maxRank]float64 {
	var p [maxRank]float64
	for i := range p {
		p[i] = math.Pow(float64(i+1), eta)
	}
	return p
}

// mean is the propensity-weighted worth per product shown.
func mean(shown float64, worth *[maxRank]float64, inv *[maxRank]float64) float64 {
	if shown == 0 {
		return math.NaN()
	}
	s := 0.0
	for i, w := range worth {
		s += w * inv[i]
	}
	return s / shown
}

// Figure is the engagement of one group of searches: the products they
// showed, and their propensity-weighted worth relative to exact matches
// in the same category, with a 95% bootstrap interval.
type Figure struct {
	// Searches is how many searches the figure rests on; Shown, how many
	// products they showed.
	Searches int `json:"searches"`
	Shown    int `json:"shown"`
	// Engagement is the weighted worth per product shown.
	Engagement float64 `json:"engagement"`
	// Ratio is Engagement over that of exact matches in the category;
	// Low and High bound its 95% interval. All three are NaN (null in
	// JSON) when either side showed nothing.
	Ratio float64 `json:"ratio"`
	Low   float64 `json:"low"`
	High  float64 `json:"high"`
}

// figure compares t with the exact matches' tally.
func figure(t, exact *tally, inv *[maxRank]float64) Figure {
	f := Figure{Searches: t.searches, Shown: int(t.shown), Engagement: mean(t.shown, &t.worth, inv), Ratio: math.NaN(), Low: math.NaN(), High: math.NaN()}
	if exact == nil || t.repShown == nil || exact.repShown == nil {
		return f
	}
	if e := mean(exact.shown, &exact.worth, inv); e > 0 && !math.IsNaN(f.Engagement) {
		f.Ratio = f.Engagement / e
	}
	rs := make([]float64, 0, replicates)
	for b := range replicates {
		g, e := repMean(t, b, inv), repMean(exact, b, inv)
		if e > 0 && !math.IsNaN(g) {
			rs = append(rs, g/e)
		}
	}
	if len(rs) >= replicates/2 {
		slices.Sort(rs)
		f.Low, f.High = quantile(rs, 0.025), quantile(rs, 0.975)
	}
	return f
}

// repMean is replicate b's mean worth a product shown.
func repMean(t *tally, b int, inv *[maxRank]float64) float64 {
	var zero [maxRank]float64
	worth := &zero
	if t.repWorth != nil {
		worth = &t.repWorth[b]
	}
	return mean(t.repShown[b], worth, inv)
}

// quantile is the q-quantile of sorted xs, interpolated between ranks.
func quantile(xs []float64, q float64) float64 {
	pos := q * float64(len(xs)-1)
	i := int(pos)
	if i+1 >= len(xs) {
		return xs[len(xs)-1]
	}
	return xs[i] + (pos-float64(i))*(xs[i+1]-xs[i])
}

// poisson maps 16 random bits to a Poisson(1) draw by inversion of its
// distribution function, P(X ≤ k) = e⁻¹ Σ 1/i! for i ≤ k: the draw for u
// is the least k with u < 2¹⁶ P(X ≤ k).
var poisson = func() *[1 << 16]uint8 {
	var cdf [8]float64
	p, c := math.Exp(-1), 0.0
	for k := range cdf {
		c += p
		cdf[k] = c * (1 << 16)
		p /= float64(k + 1)
	}
	var t [1 << 16]uint8
	k := 0
	for u := range t {
		for k < 7 && float64(u) >= cdf[k] {
			k++
		}
		t[u] = uint8(k)
	}
	return &t
}()

// draws fills w with Poisson(1) draws from a splitmix64 stream seeded by
// seed: the same search always gets the same weights, whatever order
// the log is read in.
func draws(seed uint64, w *[replicates]uint8) {
	x := seed
	for i := 0; i < replicates; i += 4 {
		x += 0x9e3779b97f4a7c15
		z := x
		z = (z ^ (z >> 30)) * 0xbf58476d1ce4e5b9
		z = (z ^ (z >> 27)) * 0x94d049bb133111eb
		z ^= z >> 31
		for j := 0; j < 4 && i+j < replicates; j++ {
			w[i+j] = poisson[uint16(z>>(16*j))]
		}
	}
}

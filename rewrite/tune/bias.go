package tune

import (
	"math"

	"github.com/whittle-search/whittle/rewrite/signals"
)

// biasTally counts, over searches whose results were shuffled, the
// products shown at each rank and those clicked or more. With the order
// random, what is shown at a rank does not depend on the rank, so the
// click rate at rank r falls only as the chance of being looked at,
// (1/r)^η.
type biasTally struct {
	shown, clicked [maxRank]float64
}

// add counts one shuffled search's products; the caller leaves out an
// explored product, placed at a rank of its own choosing.
func (b *biasTally) add(slots []slot, es []signals.Engagement) {
	var hit [maxRank + 1]bool
	for _, e := range es {
		if e.Type != signals.Impression && e.Rank >= 1 && e.Rank <= maxRank {
			hit[e.Rank] = true
		}
	}
	for _, s := range slots {
		if s.rank > maxRank {
			continue
		}
		b.shown[s.rank-1]++
		if hit[s.rank] {
			b.clicked[s.rank-1]++
		}
	}
}

// Bias is the position-bias exponent η used to weigh the signals.
type Bias struct {
	// Eta is the exponent used.
	Eta float64 `json:"eta"`
	// Estimated says Eta was fitted from shuffled searches; otherwise it
	// is the policy's position_bias.
	Estimated bool `json:"estimated"`
	// Fitted is the fit from shuffled searches, NaN (null) without one;
	// Ranks and Clicks are what it rests on.
	Fitted float64 `json:"fitted"`
	Ranks  int     `json:"ranks"`
	Clicks int     `json:"clicks"`
	// Note says why no fit was made or used, or "".
	Note string `json:"note,omitempty"`
}

// Minimums for a fit of η: clicks in all, and clicks at a rank for the
// rank to count.
const (
	minBiasClicks = 200
	minRankClicks = 5
)

// fit estimates η by weighted least squares of log(click rate) on
// log(rank), each rank weighted by its clicks (the inverse of the
// variance of a log rate, approximately): the slope is -η.
func (b *biasTally) fit() (eta float64, ranks, clicks int) {
	var sw, sx, sy, sxx, sxy float64
	for i := range b.shown {
		c := b.clicked[i]
		clicks += int(c)
		if c < minRankClicks {
			continue
		}
		ranks++
		x, y := math.Log(float64(i+1)), math.Log(c/b.shown[i])
		sw += c
		sx += c * x
		sy += c * y
		sxx += c * x * x
		sxy += c * x * y
	}
	d := sw*sxx - sx*sx
	if ranks < 3 || clicks < minBiasClicks || d == 0 {
		return math.NaN(), ranks, clicks
	}
	return -(sw*sxy - sx*sy) / d, ranks, clicks
}

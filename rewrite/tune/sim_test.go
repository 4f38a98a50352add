package tune

import (
	"context"
	"fmt"
	"math"
	"math/rand/v2"
	"slices"
	"time"

	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/signals"
)

// The simulator generates sessions from a known ground truth, so that a
// test can check that tune recovers it. Everything in it is invented:
// the shoppers, the products and the rates are made up for the test,
// and the truth is whatever the simulator says it is.
//
// Each simulated search shows ten products. A shopper looks at the
// product at rank r with probability (1/r)^eta (the examination model of
// Joachims, Swaminathan and Schnabel, 2017), and, having looked, clicks
// it with probability click when the product is acceptable to them and
// noise when not; a click leads to add_to_cart with probability 0.4, and
// that to a purchase with probability 0.5.

// simProducts is an in-memory Describer.
type simProducts map[string]*rewrite.Facts

func (p simProducts) Describe(_ context.Context, id string) (*rewrite.Facts, error) {
	if f, ok := p[id]; ok {
		return f, nil
	}
	return nil, fmt.Errorf("no product %q", id)
}

// truth is one category's simulated shoppers.
type truth struct {
	category, query string
	// colourLimit is the largest ΔE00 a shopper accepts (Inf: any).
	colourLimit float64
	// sizeAccepted says whether another size is acceptable.
	sizeAccepted bool
	// measureLimit is the largest share a measure may be off (Inf: any).
	measureLimit float64
}

// simSearch is one kind of search the simulated system makes, with how
// many of it: relax is what the system relaxed (nil for exact), and
// spread how far its products stray, uniformly from 0.
type simSearch struct {
	relax  []signals.Relaxed
	n      int
	spread float64
}

type simulator struct {
	rng      *rand.Rand
	eta      float64
	click    float64
	noise    float64
	shuffled float64
	products simProducts
	sessions []*signals.Session
	clock    time.Time
	next     int
}

func newSimulator(seed uint64, eta float64) *simulator {
	return &simulator{rng: rand.New(rand.NewPCG(seed, seed^0x5eed)), eta: eta, click: 0.5, noise: 0.02, shuffled: 0.1,
		products: simProducts{}, clock: time.Date(2026, 11, 2, 9, 0, 0, 0, time.UTC)}
}

// product makes a product for query q of truth tr that strays by d along
// the relaxed kind, and says whether a shopper would accept it.
func (s *simulator) product(tr truth, q *parser.Result, kind parser.Kind, d float64) (string, bool) {
	s.next++
	id := fmt.Sprintf("SIM-%06d", s.next)
	f := &rewrite.Facts{ProductType: "item", Category: tr.category, Measures: map[string]float64{}, InStock: true}
	ok := true
	for _, c := range q.Constraints {
		switch {
		case c.Kind == parser.KindColour && c.Colour != nil && c.Colour.Lab != nil:
			l := colour.Lab{L: c.Colour.Lab[0], A: c.Colour.Lab[1], B: c.Colour.Lab[2]}
			if kind == parser.KindColour {
				// A random direction in Lab, scaled by d; the shopper judges
				// the ΔE00 that results.
				x, y, z := s.rng.NormFloat64(), s.rng.NormFloat64(), s.rng.NormFloat64()
				n := math.Sqrt(x*x + y*y + z*z)
				l = colour.Lab{L: l.L + d*x/n, A: l.A + d*y/n, B: l.B + d*z/n}
				ok = ok && colour.DeltaE2000(*lab(c.Colour.Lab), l) <= tr.colourLimit
			}
			f.Lab = &[3]float64{l.L, l.A, l.B}
		case c.Kind == parser.KindMeasure && c.Measure != nil && c.Measure.BaseAmount != nil:
			v := *c.Measure.BaseAmount
			if kind == parser.KindMeasure {
				sign := 1.0
				if s.rng.IntN(2) == 0 {
					sign = -1
				}
				v *= 1 + sign*d
				ok = ok && d <= tr.measureLimit
			}
			f.Measures[c.Measure.Dimension] = v
		case c.Kind == parser.KindSize && kind == parser.KindSize:
			ok = ok && tr.sizeAccepted
		}
	}
	s.products[id] = f
	return id, ok
}

func lab(v *[3]float64) *colour.Lab { return &colour.Lab{L: v[0], A: v[1], B: v[2]} }

// run simulates the searches of one category, one session each.
func (s *simulator) run(tr truth, searches []simSearch) {
	q := parser.Parse(tr.query)
	for _, ss := range searches {
		kind := parser.Kind("")
		if len(ss.relax) > 0 {
			kind = ss.relax[0].Kind
		}
		for range ss.n {
			s.clock = s.clock.Add(time.Minute)
			ev := signals.Event{Type: signals.Search, Session: fmt.Sprintf("s%07d", len(s.sessions)), Time: s.clock,
				Query: tr.query, Category: tr.category, Relaxations: ss.relax}
			type shown struct {
				id     string
				d      float64
				accept bool
			}
			var list []shown
			for range 10 {
				d := 0.0
				if kind != "" {
					d = s.rng.Float64() * ss.spread
				}
				id, ok := s.product(tr, q, kind, d)
				list = append(list, shown{id, d, ok})
			}
			if s.rng.Float64() < s.shuffled {
				ev.Shuffled = true
				s.rng.Shuffle(len(list), func(i, j int) { list[i], list[j] = list[j], list[i] })
			} else {
				// The system shows the nearest first.
				slices.SortStableFunc(list, func(a, b shown) int { return cmpFloat(a.d, b.d) })
			}
			j := signals.Joined{Search: ev}
			for i, p := range list {
				j.Search.Shown = append(j.Search.Shown, p.id)
				rank := i + 1
				if s.rng.Float64() >= math.Pow(1/float64(rank), s.eta) {
					continue
				}
				at := s.clock.Add(time.Duration(rank) * time.Second)
				j.Engagements = append(j.Engagements, signals.Engagement{Type: signals.Impression, Time: at, Rank: rank})
				p1 := s.noise
				if p.accept {
					p1 = s.click
				}
				if s.rng.Float64() >= p1 {
					continue
				}
				j.Engagements = append(j.Engagements, signals.Engagement{Type: signals.Click, Time: at, Rank: rank})
				if s.rng.Float64() < 0.4 {
					j.Engagements = append(j.Engagements, signals.Engagement{Type: signals.AddToCart, Time: at, Rank: rank})
					if s.rng.Float64() < 0.5 {
						j.Engagements = append(j.Engagements, signals.Engagement{Type: signals.Purchase, Time: at, Rank: rank})
					}
				}
			}
			s.sessions = append(s.sessions, &signals.Session{ID: ev.Session, Searches: []signals.Joined{j}})
		}
	}
}

func cmpFloat(a, b float64) int {
	switch {
	case a < b:
		return -1
	case a > b:
		return 1
	}
	return 0
}

func relax(op string, kind parser.Kind, text string) []signals.Relaxed {
	return []signals.Relaxed{{Op: op, Kind: kind, Text: text}}
}

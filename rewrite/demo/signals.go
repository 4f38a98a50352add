package demo

import (
	"bufio"
	"cmp"
	"errors"
	"fmt"
	"io"
	"math"
	"math/rand/v2"
	"os"
	"slices"
	"strings"
	"time"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite/catalog"
	"github.com/whittle-search/whittle/rewrite/signals"
)

// ErrSmallCatalog is Signals' error for a catalog with no product type
// of ten products, one of them with a colour: no search could be made.
var ErrSmallCatalog = errors.New("demo: no product type has ten products with a colour: too small a catalog for a signals log")

// The demo shop's invented shoppers, whose habits a signals log made by
// Signals follows and whittle tune should find again: they accept a
// colour up to demoColourLimit ΔE00 from the one they asked for, but
// never another size; they look at rank r with chance (1/r)^demoBias.
const (
	demoColourLimit = 6.0
	demoBias        = 0.8
	demoShown       = 10
	// demoWidened is how far the loose policy the log is made under
	// widens a colour, in ΔE00.
	demoWidened = 14.0
)

// Signals writes an invented signals log of about n events for the
// demo catalog ps, seeded: sessions of one to three searches for a
// product's colour and type (some with a size), each showing ten
// products of that type, some with the colour widened or the size
// dropped as a loose policy would, a twentieth of them shuffled; then
// the impressions, clicks, add-to-carts and purchases of shoppers with
// the habits above. A session's events are written together, so the log
// is in time order only to within a session's length, as logs flushed
// per session are. It returns the number of events written.
func Signals(emit func(signals.Event) error, ps []catalog.Product, n int, seed uint64) (int, error) {
	g := newSignalGen(ps, seed)
	if !g.searchable() {
		return 0, ErrSmallCatalog
	}
	written := 0
	for s := 0; written < n; s++ {
		evs := g.session(s)
		for _, ev := range evs {
			if err := emit(ev); err != nil {
				return written, err
			}
		}
		written += len(evs)
	}
	return written, nil
}

type signalGen struct {
	rng    *rand.Rand
	ps     []catalog.Product
	labs   []*colour.Lab
	byType map[string][]int
	lex    *lexicon.Lexicon
	clock  time.Time
	// asked caches the colour each query asks for, as whittle reads it.
	asked map[string]*colour.Lab
}

func newSignalGen(ps []catalog.Product, seed uint64) *signalGen {
	g := &signalGen{rng: rand.New(rand.NewPCG(seed, seed^0xd1ce)), ps: ps, labs: make([]*colour.Lab, len(ps)),
		byType: map[string][]int{}, lex: lexicon.Default(), asked: map[string]*colour.Lab{}, clock: time.Date(2026, 11, 2, 8, 0, 0, 0, time.UTC)}
	for i := range ps {
		p := &ps[i]
		if p.ProductType != "" {
			g.byType[p.ProductType] = append(g.byType[p.ProductType], i)
		}
		g.labs[i] = p.Lab(g.lex)
	}
	return g
}

// session makes one session's events.
func (g *signalGen) session(n int) []signals.Event {
	id := fmt.Sprintf("demo-%07d", n)
	g.clock = g.clock.Add(time.Duration(1+g.rng.IntN(3)) * time.Second)
	at := g.clock
	var out []signals.Event
	for range 1 + g.rng.IntN(3) {
		want := g.rng.IntN(len(g.ps))
		p := &g.ps[want]
		same := g.byType[p.ProductType]
		if len(same) < demoShown || g.labs[want] == nil {
			continue
		}
		size := ""
		if len(p.Sizes) > 0 {
			size = p.Sizes[g.rng.IntN(len(p.Sizes))]
		}
		q := strings.TrimSpace(p.Colour + " " + p.ProductType)
		if size != "" {
			q += " size " + size
		}
		ev := signals.Event{Type: signals.Search, Session: id, Time: at, Query: q, Category: p.Category}
		// The loose policy's relaxations: a fifth widen the colour (when
		// the query names one whittle knows), a tenth of those with a
		// size drop it.
		asked := g.colourAsked(q)
		kind := parser.Kind("")
		switch r := g.rng.Float64(); {
		case r < 0.2 && asked != nil:
			kind = parser.KindColour
			ev.Relaxations = []signals.Relaxed{{Op: "widen", Kind: kind, Text: p.Colour}}
		case r < 0.3 && size != "":
			kind = parser.KindSize
			ev.Relaxations = []signals.Relaxed{{Op: "drop", Kind: kind, Text: "size " + size}}
		}
		type shown struct {
			i      int
			accept bool
		}
		picked := g.pick(same, want)
		if kind == parser.KindColour {
			picked = g.near(same, asked)
		}
		var list []shown
		for _, j := range picked {
			ok := true
			switch kind {
			case parser.KindColour:
				// The shopper judges the product against the colour asked.
				ok = g.labs[j] != nil && colour.DeltaE2000(*asked, *g.labs[j]) <= demoColourLimit
			case parser.KindSize:
				ok = false
			}
			list = append(list, shown{j, ok})
		}
		if g.rng.IntN(20) == 0 {
			ev.Shuffled = true
			g.rng.Shuffle(len(list), func(a, b int) { list[a], list[b] = list[b], list[a] })
		}
		for _, s := range list {
			ev.Shown = append(ev.Shown, g.ps[s.i].ID)
		}
		out = append(out, ev)
		for r, s := range list {
			rank := r + 1
			if g.rng.Float64() >= math.Pow(1/float64(rank), demoBias) {
				continue
			}
			t := at.Add(time.Duration(rank) * 2 * time.Second)
			out = append(out, signals.Event{Type: signals.Impression, Session: id, Time: t, Product: ev.Shown[r]})
			click := 0.02
			if s.accept {
				click = 0.35
			}
			if g.rng.Float64() >= click {
				continue
			}
			out = append(out, signals.Event{Type: signals.Click, Session: id, Time: t.Add(time.Second), Product: ev.Shown[r]})
			if g.rng.Float64() < 0.3 {
				out = append(out, signals.Event{Type: signals.AddToCart, Session: id, Time: t.Add(20 * time.Second), Product: ev.Shown[r]})
				if g.rng.Float64() < 0.5 {
					out = append(out, signals.Event{Type: signals.Purchase, Session: id, Time: t.Add(time.Minute), Product: ev.Shown[r]})
				}
			}
		}
		at = at.Add(time.Duration(30+g.rng.IntN(90)) * time.Second)
	}
	return out
}

// searchable says whether some search can be made: some product type
// has enough products to show, one of them with a colour.
func (g *signalGen) searchable() bool {
	for _, is := range g.byType {
		if len(is) < demoShown {
			continue
		}
		for _, i := range is {
			if g.labs[i] != nil {
				return true
			}
		}
	}
	return false
}

// colourAsked is the colour query q asks for, as whittle reads it, or
// nil.
func (g *signalGen) colourAsked(q string) *colour.Lab {
	if l, ok := g.asked[q]; ok {
		return l
	}
	var out *colour.Lab
	for _, c := range parser.ParseWith(q, parser.Options{Lexicon: g.lex}).Of(parser.KindColour) {
		if c.Colour != nil && c.Colour.Lab != nil && !c.Excluded {
			out = &colour.Lab{L: c.Colour.Lab[0], A: c.Colour.Lab[1], B: c.Colour.Lab[2]}
			break
		}
	}
	g.asked[q] = out
	return out
}

// near returns up to demoShown products of the same type within the
// loose policy's ΔE00 demoWidened of the colour asked, nearest first, as
// a widened colour shows them.
func (g *signalGen) near(same []int, asked *colour.Lab) []int {
	type cand struct {
		i int
		d float64
	}
	var cs []cand
	for _, j := range same {
		if g.labs[j] == nil {
			continue
		}
		if d := colour.DeltaE2000(*asked, *g.labs[j]); d <= demoWidened {
			cs = append(cs, cand{j, d})
		}
	}
	g.rng.Shuffle(len(cs), func(a, b int) { cs[a], cs[b] = cs[b], cs[a] })
	cs = cs[:min(len(cs), demoShown)]
	slices.SortStableFunc(cs, func(a, b cand) int { return cmp.Compare(a.d, b.d) })
	out := make([]int, len(cs))
	for k, c := range cs {
		out[k] = c.i
	}
	return out
}

// pick returns demoShown products of the same type, the one wanted
// among them, in the engine's order: the wanted one first, then by id.
func (g *signalGen) pick(same []int, want int) []int {
	out := []int{want}
	start := g.rng.IntN(len(same))
	for k := 0; len(out) < demoShown && k < len(same); k++ {
		if j := same[(start+k)%len(same)]; j != want {
			out = append(out, j)
		}
	}
	return out
}

// writeSignalLogs writes, to each file, an invented signals log of the
// given number of events for the demo catalog of n products.
func writeSignalLogs(files []string, n int, events []int) error {
	ps := catalog.Demo(n, 1)
	for i, file := range files {
		if err := writeFile(file, func(w io.Writer) error {
			sw := signals.NewWriter(w)
			_, err := Signals(sw.Write, ps, events[i], uint64(i+1))
			return err
		}); err != nil {
			return err
		}
	}
	return nil
}

// writeFile creates file and writes it, buffered, with write.
func writeFile(file string, write func(io.Writer) error) error {
	f, err := os.Create(file)
	if err != nil {
		return err
	}
	bw := bufio.NewWriter(f)
	if err := write(bw); err != nil {
		f.Close()
		return err
	}
	if err := bw.Flush(); err != nil {
		f.Close()
		return err
	}
	return f.Close()
}

package demo

import (
	"bufio"
	"context"
	"errors"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"
	"time"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/catalog"
	"github.com/whittle-search/whittle/rewrite/signals"
	"github.com/whittle-search/whittle/rewrite/tune"
)

// Options tune the demo. The zero value is ready to use.
type Options struct {
	// Dir is where the demo index lives; "" means the user's cache
	// directory.
	Dir string
	// Products is the size of the generated catalog (default 20,000).
	Products int
	// Rebuild builds the index even when one is there.
	Rebuild bool
	// Hits is how many hits each stop shows (default 3).
	Hits int
	// Events is the length of the invented signals log the last stop
	// learns from (default 1,000,000).
	Events int
	// Signals, when set, names a file the invented signals log is also
	// written to, to try whittle tune on.
	Signals string
}

// MinProducts is the smallest generated catalog the demo and the
// benchmark are run on.
const MinProducts = 100

// SignalsMinProducts is the smallest demo catalog the last stop of the
// tour, whittle tune on an invented signals log, runs on: below it no
// product type has ten products with a colour to show a search, and the
// stop is skipped.
const SignalsMinProducts = 578

// generation names the generator's output; an index built by another
// generation is rebuilt.
const generation = "4"

func (o *Options) defaults() {
	if o.Products <= 0 {
		o.Products = 20000
	}
	if o.Hits <= 0 {
		o.Hits = 3
	}
	if o.Events <= 0 {
		o.Events = 1000000
	}
	if o.Dir == "" {
		dir, err := os.UserCacheDir()
		if err != nil {
			dir = os.TempDir()
		}
		o.Dir = filepath.Join(dir, "whittle", "demo")
	}
}

// Run generates the demo catalog, indexes it unless an index of the same
// catalog is there, and runs the tour, writing it to w.
func Run(ctx context.Context, w io.Writer, opts Options) error {
	opts.defaults()
	lex := lexicon.Default()
	start := time.Now()
	products := catalog.Demo(opts.Products, 1)
	idxDir := filepath.Join(opts.Dir, fmt.Sprintf("index-%s-%d", generation, opts.Products))
	build := func() error {
		fmt.Fprintf(w, "Indexing the demo catalog: %d products of an invented general store...\n", len(products))
		if _, err := bleveengine.BuildProducts(ctx, products, idxDir, bleveengine.BuildOptions{BatchSize: 5000}); err != nil {
			return err
		}
		fmt.Fprintf(w, "indexed in %.1fs\n\n", time.Since(start).Seconds())
		return nil
	}
	if _, err := os.Stat(idxDir); err != nil || opts.Rebuild {
		if err := build(); err != nil {
			return err
		}
	}
	eng, err := bleveengine.Open(idxDir)
	if errors.Is(err, bleveengine.ErrOldLayout) {
		// The demo's own index, built by an older whittle: build it again.
		if err = build(); err == nil {
			eng, err = bleveengine.Open(idxDir)
		}
	}
	if err != nil {
		return err
	}
	defer eng.Close()
	rw := rewrite.New(eng, nil)
	stops := Tour(products, lex)
	for i, s := range stops {
		if err := stop(ctx, w, i+1, s, rw, eng, opts.Hits); err != nil {
			return err
		}
	}
	if err := learn(ctx, w, len(stops)+1, products, eng, idxDir, opts); err != nil {
		return err
	}
	fmt.Fprintf(w, "The tour took %.1fs. Try your own: whittle search --index %s QUERY\n", time.Since(start).Seconds(), idxDir)
	return nil
}

func stop(ctx context.Context, w io.Writer, n int, s Stop, rw *rewrite.Rewriter, eng *bleveengine.Engine, k int) error {
	o, err := rw.Rescue(ctx, s.Query)
	if err != nil {
		return err
	}
	fmt.Fprintf(w, "%d. %s\n   query:   %s\n", n, s.Shows, s.Query)
	var read []string
	for i, c := range o.Parsed.Constraints {
		if c.Kind == parser.KindFiller {
			continue
		}
		v := c.Value()
		if c.Inferred {
			v += " (inferred)"
		}
		or := ""
		if c.OrGroup != 0 && c.Start > o.Parsed.Constraints[o.Parsed.Alternatives(i)[0]].Start {
			or = "or " // one of alternatives, after the first
		}
		read = append(read, fmt.Sprintf("%s%s %s [%s]", or, c.Kind, v, c.Strictness))
	}
	fmt.Fprintf(w, "   read as: %s\n", strings.Join(read, " · "))
	msg := o.Message
	if msg == "" {
		msg = rewrite.ExactMessage(o.Count)
	}
	fmt.Fprintf(w, "   whittle: %s\n", msg)
	if o.Count > 0 {
		shown, err := eng.Show(ctx, o.Plan, k)
		if err != nil {
			return err
		}
		for _, h := range shown {
			printHit(w, h)
		}
	}
	b, err := eng.Baseline(ctx, bleveengine.MostWords, s.Query, k)
	if err != nil {
		return err
	}
	results := "results"
	if b.Count == 1 {
		results = "result"
	}
	fmt.Fprintf(w, "   blind partial match: %d of %d words kept, %d %s\n", b.Kept, b.Words, b.Count, results)
	for _, h := range b.Hits {
		printHit(w, h)
	}
	fmt.Fprintln(w)
	return nil
}

// learn is the tour's last stop: whittle tune on an invented signals
// log of the demo shop, made by a loose policy (sizes dropped, colours
// widened to ΔE00 14), whose shoppers never take another size and accept
// a colour within ΔE00 6. The policy in force is the built-in one with
// apparel's size soft and its colour tolerance 14.
func learn(ctx context.Context, w io.Writer, n int, ps []catalog.Product, eng *bleveengine.Engine, idxDir string, opts Options) error {
	user, err := rewrite.ParsePolicy("loose.toml", loosePolicy, lexicon.Default())
	if err != nil {
		return err
	}
	if !newSignalGen(ps, 1).searchable() {
		fmt.Fprintf(w, "%d. learning strictness from shoppers (whittle tune): skipped\n", n)
		fmt.Fprintf(w, "   %d products are too few for an invented signals log: no product type has ten products\n", len(ps))
		fmt.Fprintf(w, "   with a colour to show a search; the demo at --products %d or more has one\n\n", SignalsMinProducts)
		return nil
	}
	t := tune.New(tune.Options{Policy: rewrite.DefaultPolicy().Overlay(user), Products: eng})
	save := func(signals.Event) error { return nil }
	var file *os.File
	var buf *bufio.Writer
	if opts.Signals != "" {
		if file, err = os.Create(opts.Signals); err != nil {
			return err
		}
		defer file.Close()
		buf = bufio.NewWriter(file)
		save = signals.NewWriter(buf).Write
	}
	var read error
	log := func(yield func(signals.Event, error) bool) {
		stop := errors.New("stop")
		if _, err := Signals(func(e signals.Event) error {
			if err := save(e); err != nil {
				return err
			}
			if !yield(e, nil) {
				return stop
			}
			return nil
		}, ps, opts.Events, 1); err != nil && err != stop {
			read = err
		}
	}
	if err := t.Read(ctx, log, signals.JoinOptions{}); err != nil {
		return err
	}
	if read != nil {
		return read
	}
	if buf != nil {
		if err := buf.Flush(); err != nil {
			return err
		}
		if err := file.Close(); err != nil {
			return err
		}
	}
	r := t.Report()
	fmt.Fprintf(w, "%d. learning strictness from shoppers (whittle tune)\n", n)
	fmt.Fprintf(w, "   an invented log of %d events: %d searches in %d sessions, made by a loose policy\n", r.Join.Events, r.Stats.Searches, r.Stats.Sessions)
	fmt.Fprintf(w, "   (sizes dropped and colours widened to ΔE00 14 everywhere; a twentieth of the searches shuffled)\n")
	fmt.Fprintf(w, "   its invented shoppers never take another size and accept a colour within ΔE00 %g\n", demoColourLimit)
	if r.Bias.Estimated {
		fmt.Fprintf(w, "   position bias fitted from the shuffled searches: η = %.2f\n", r.Bias.Eta)
	}
	fmt.Fprintf(w, "   changes it proposes, not applied (review them, then lay them over the policy with --policy):\n")
	for _, c := range r.Changes {
		fmt.Fprintf(w, "     %s: %s → %s\n", c.Key, c.From, c.To)
	}
	if len(r.Changes) == 0 {
		fmt.Fprintf(w, "     none\n")
	}
	if opts.Signals != "" {
		fmt.Fprintf(w, "   the log is in %s; tune it against the built-in policy with:\n     whittle tune --signals %s --index %s\n", opts.Signals, opts.Signals, idxDir)
	}
	fmt.Fprintln(w)
	return nil
}

// loosePolicy is the policy the demo's signals log is made under.
const loosePolicy = `
[category.apparel]
colour_tolerance = 14.0

[category.apparel.strictness]
size = "soft"
`

// printHit writes one hit of the tour: its id and title, then its colour
// and price where it has them.
func printHit(w io.Writer, h bleveengine.Shown) {
	line := h.ID + "  " + h.Title
	for _, v := range []string{h.Colour, h.Price} {
		if v != "" {
			line += ", " + v
		}
	}
	fmt.Fprintf(w, "            %s\n", line)
}

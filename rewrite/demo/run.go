package demo

import (
	"context"
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
}

// MinProducts is the smallest generated catalog the demo and the
// benchmark are run on.
const MinProducts = 100

// generation names the generator's output; an index built by another
// generation is rebuilt.
const generation = "1"

func (o *Options) defaults() {
	if o.Products <= 0 {
		o.Products = 20000
	}
	if o.Hits <= 0 {
		o.Hits = 3
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
	if _, err := os.Stat(idxDir); err != nil || opts.Rebuild {
		fmt.Fprintf(w, "Indexing the demo catalog: %d products of an invented general store...\n", len(products))
		if _, err := bleveengine.BuildProducts(ctx, products, idxDir, bleveengine.BuildOptions{BatchSize: 5000}); err != nil {
			return err
		}
		fmt.Fprintf(w, "indexed in %.1fs\n\n", time.Since(start).Seconds())
	}
	eng, err := bleveengine.Open(idxDir)
	if err != nil {
		return err
	}
	defer eng.Close()
	rw := rewrite.New(eng, nil)
	for i, s := range Tour(products, lex) {
		if err := stop(ctx, w, i+1, s, rw, eng, opts.Hits); err != nil {
			return err
		}
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
	for _, c := range o.Parsed.Constraints {
		if c.Kind == parser.KindFiller {
			continue
		}
		v := c.Value()
		if c.Inferred {
			v += " (inferred)"
		}
		read = append(read, fmt.Sprintf("%s %s [%s]", c.Kind, v, c.Strictness))
	}
	fmt.Fprintf(w, "   read as: %s\n", strings.Join(read, " · "))
	msg := o.Message
	if msg == "" {
		msg = fmt.Sprintf("%d exact matches.", o.Count)
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
	b, err := eng.Baseline(ctx, s.Query, k)
	if err != nil {
		return err
	}
	fmt.Fprintf(w, "   blind partial match: %d of %d words kept, %d results\n", b.Kept, b.Words, b.Count)
	for _, h := range b.Hits {
		printHit(w, h)
	}
	fmt.Fprintln(w)
	return nil
}

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

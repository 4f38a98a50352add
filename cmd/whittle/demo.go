package main

import (
	"flag"
	"fmt"
	"io"
	"os"
	"time"

	"github.com/whittle-search/whittle/rewrite/demo"
)

func demoCmd(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("demo", flag.ContinueOnError)
	fs.SetOutput(stderr)
	dir := fs.String("dir", "", "where the demo index lives (default: the user's cache directory)")
	n := fs.Int("products", 20000, fmt.Sprintf("size of the generated demo catalog, at least %d (below %d the last stop, tune, is skipped)", demo.MinProducts, demo.SignalsMinProducts))
	rebuild := fs.Bool("rebuild", false, "build the demo index again even if one is there")
	signalsFile := fs.String("signals", "", "also write the invented signals log the last stop learns from to `FILE`, to try whittle tune on")
	fs.Usage = func() {
		fmt.Fprint(stderr, "usage: whittle demo [--dir DIR] [--products N] [--rebuild] [--signals FILE]\n\nGenerates an invented general store's catalog, indexes it once, tours what whittle does,\nand ends with whittle tune on an invented log of shoppers' signals.\n\nflags:\n")
		fs.PrintDefaults()
	}
	if _, code, ok := parseFlags(fs, args, 0); !ok {
		return code
	}
	if !checkNeeds(fs, products(*n)) {
		return 2
	}
	ctx, stop := interruptible()
	defer stop()
	if err := demo.Run(ctx, stdout, demo.Options{Dir: *dir, Products: *n, Rebuild: *rebuild, Signals: *signalsFile}); err != nil {
		if interrupted(ctx, err) {
			fmt.Fprintln(stderr, "whittle demo: interrupted")
			return 1
		}
		fmt.Fprintf(stderr, "whittle demo: %v\n", err)
		return 1
	}
	return 0
}

func benchCmd(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("bench", flag.ContinueOnError)
	fs.SetOutput(stderr)
	n := fs.Int("products", 100000, "size of the generated catalog")
	dir := fs.String("dir", os.TempDir(), "where to build the temporary index")
	replayN := fs.Int("replay", demo.ReplayQueries, "length of the longer query log replayed (the shorter is a tenth of it)")
	signalsN := fs.Int("signals", demo.SignalEvents, "events in the longer signals log tuned on (the shorter has a tenth of them)")
	fs.Usage = func() {
		fmt.Fprint(stderr, "usage: whittle bench [--products N] [--replay N] [--signals N] [--dir DIR]\n\nBuilds an index of a generated catalog and times rescues of queries that find nothing, beside the blind partial match; then replays query logs of a tenth of --replay and of --replay lines on it, and runs whittle tune on one core over invented signals logs of a tenth of --signals and of --signals events.\n\nflags:\n")
		fs.PrintDefaults()
	}
	if _, code, ok := parseFlags(fs, args, 0); !ok {
		return code
	}
	if !checkNeeds(fs, products(*n), atLeast("replay", *replayN, 1), atLeast("signals", *signalsN, 1)) {
		return 2
	}
	ctx, stop := interruptible()
	defer stop()
	r, err := demo.Bench(ctx, stderr, demo.BenchOptions{Dir: *dir, Products: *n, Replay: *replayN, Signals: *signalsN})
	if interrupted(ctx, err) {
		fmt.Fprintln(stderr, "whittle bench: interrupted")
		return 1
	}
	if err != nil {
		fmt.Fprintf(stderr, "whittle bench: %v\n", err)
		return 1
	}
	fmt.Fprintf(stdout, "products        %d\n", r.Products)
	fmt.Fprintf(stdout, "index build     %.1f s\n", r.Build.Seconds())
	fmt.Fprintf(stdout, "peak memory     %.0f MB during the build\n", r.PeakMemoryMB)
	fmt.Fprintf(stdout, "queries         %d that find nothing as typed (%.0f%% rescued)\n", r.Queries, r.RescuedShare*100)
	fmt.Fprintf(stdout, "rescue          p50 %.2f ms, p99 %.2f ms\n", ms(r.RescueP50), ms(r.RescueP99))
	fmt.Fprintf(stdout, "blind baseline  p50 %.2f ms, p99 %.2f ms\n", ms(r.BaselineP50), ms(r.BaselineP99))
	for _, rp := range r.Replays {
		fmt.Fprintf(stdout, "replay          %d queries, %.0f a second, peak memory %.0f MB\n", rp.Queries, rp.PerSecond, rp.PeakMemoryMB)
	}
	for _, tf := range r.Tunes {
		fmt.Fprintf(stdout, "tune            %d events, %.0f a second on one core, peak memory %.0f MB\n", tf.Events, tf.PerSecond, tf.PeakMemoryMB)
	}
	return 0
}

// products is the need of --products n to be a catalog size the demo
// generator accepts.
func products(n int) need { return atLeast("products", n, demo.MinProducts) }

func ms(d time.Duration) float64 { return float64(d.Microseconds()) / 1000 }

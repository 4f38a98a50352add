package demo

import (
	"bufio"
	"cmp"
	"context"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"runtime"
	"runtime/debug"
	"sort"
	"strings"
	"time"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/catalog"
	"github.com/whittle-search/whittle/rewrite/replay"
	"github.com/whittle-search/whittle/rewrite/signals"
	"github.com/whittle-search/whittle/rewrite/tune"
)

// BenchResult holds the figures of one benchmark run.
type BenchResult struct {
	Products     int           `json:"products"`
	Build        time.Duration `json:"build"`
	PeakMemoryMB float64       `json:"peak_memory_mb"`
	Queries      int           `json:"queries"`
	RescueP50    time.Duration `json:"rescue_p50"`
	RescueP99    time.Duration `json:"rescue_p99"`
	BaselineP50  time.Duration `json:"baseline_p50"`
	BaselineP99  time.Duration `json:"baseline_p99"`
	RescuedShare float64       `json:"rescued_share"`
	// Replays: a log of a tenth of the replay length, then one of the
	// whole, run through whittle replay on the same index.
	Replays []ReplayFigures `json:"replays"`
	// Tunes: a signals log of a tenth of the signals length, then one of
	// the whole, run through whittle tune on the same index on one core.
	Tunes []TuneFigures `json:"tunes"`
}

// TuneFigures are one tune's: events read, their rate on one core, and
// the process's peak resident memory during the run.
type TuneFigures struct {
	Events       int     `json:"events"`
	PerSecond    float64 `json:"per_second"`
	PeakMemoryMB float64 `json:"peak_memory_mb"`
}

// BenchOptions size a benchmark run. Zero values take the defaults.
type BenchOptions struct {
	// Dir is where the temporary files go (default the system's).
	Dir string
	// Products is the size of the generated catalog (default 100,000).
	Products int
	// Replay is the length of the longer query log (ReplayQueries).
	Replay int
	// Signals is the length of the longer signals log (SignalEvents).
	Signals int
}

// SignalEvents is the usual length of the benchmark's longer signals log.
const SignalEvents = 1000000

// ReplayFigures are one replay's: queries, their rate over all workers,
// and the process's peak resident memory during the replay.
type ReplayFigures struct {
	Queries      int     `json:"queries"`
	PerSecond    float64 `json:"per_second"`
	PeakMemoryMB float64 `json:"peak_memory_mb"`
}

// ReplayQueries is the usual length of the benchmark's longer query log.
const ReplayQueries = 100000

// Bench writes a catalog of n generated products to a temporary
// directory under dir and indexes it as whittle index does, measuring
// the build's time and peak memory; then it times the rescue of queries
// that find nothing as typed, beside the blind partial match on the same
// queries; then the replay and tune throughputs.
//
// Bench measures the whole process, and changes it while it does: it
// runs the garbage collector and returns memory to the system before
// each measure, resets the system's peak memory count (Linux), and runs
// tune with GOMAXPROCS at 1, restoring it afterwards. Run it alone in a
// process of its own, as whittle bench does, not beside other work.
func Bench(ctx context.Context, w io.Writer, opts BenchOptions) (*BenchResult, error) {
	n, replayN := cmp.Or(opts.Products, 100000), cmp.Or(opts.Replay, ReplayQueries)
	signalsN := cmp.Or(opts.Signals, SignalEvents)
	tmp, err := os.MkdirTemp(cmp.Or(opts.Dir, os.TempDir()), "whittle-bench-")
	if err != nil {
		return nil, err
	}
	defer os.RemoveAll(tmp)
	// The catalog goes to a file, as a shop's would, and the generated
	// products are let go before the build, so that the memory measured
	// is the build's.
	file := filepath.Join(tmp, "catalog.jsonl")
	logs := []string{filepath.Join(tmp, "log-short.txt"), filepath.Join(tmp, "log.txt")}
	queries, err := writeCatalog(file, n, map[string]int{logs[0]: max(replayN/10, 1), logs[1]: max(replayN, 1)})
	if err != nil {
		return nil, err
	}
	sigLogs := []string{filepath.Join(tmp, "signals-short.jsonl"), filepath.Join(tmp, "signals.jsonl")}
	switch err := writeSignalLogs(sigLogs, n, []int{max(signalsN/10, 1), signalsN}); {
	case errors.Is(err, ErrSmallCatalog):
		fmt.Fprintf(w, "%d products are too few for a signals log; tune is not timed\n", n)
		sigLogs = nil
	case err != nil:
		return nil, err
	}
	runtime.GC()
	debug.FreeOSMemory()
	resetPeak()
	idx := filepath.Join(tmp, "index")
	fmt.Fprintf(w, "building an index of %d products...\n", n)
	start := time.Now()
	f, err := os.Open(file)
	if err != nil {
		return nil, err
	}
	_, err = bleveengine.Build(ctx, f, idx, bleveengine.BuildOptions{})
	f.Close()
	if err != nil {
		return nil, err
	}
	res := &BenchResult{Products: n, Build: time.Since(start), PeakMemoryMB: peakMB()}
	eng, err := bleveengine.Open(idx)
	if err != nil {
		return nil, err
	}
	defer eng.Close()
	rw := rewrite.New(eng, nil)
	var rescue, base []time.Duration
	rescued := 0
	for _, q := range queries {
		t := time.Now()
		o, err := rw.Rescue(ctx, q)
		if err != nil {
			return nil, err
		}
		if _, err := eng.Show(ctx, o.Plan, 10); err != nil {
			return nil, err
		}
		rescue = append(rescue, time.Since(t))
		if !o.Exact && o.Count > 0 {
			rescued++
		}
		t = time.Now()
		if _, err := eng.Baseline(ctx, bleveengine.MostWords, q, 10); err != nil {
			return nil, err
		}
		base = append(base, time.Since(t))
	}
	res.Queries = len(queries)
	res.RescueP50, res.RescueP99 = percentile(rescue, 50), percentile(rescue, 99)
	res.BaselineP50, res.BaselineP99 = percentile(base, 50), percentile(base, 99)
	if len(queries) > 0 {
		res.RescuedShare = float64(rescued) / float64(len(queries))
	}
	for _, log := range logs {
		fmt.Fprintf(w, "replaying %s...\n", filepath.Base(log))
		f, err := replayFigures(ctx, eng, log)
		if err != nil {
			return nil, err
		}
		res.Replays = append(res.Replays, *f)
	}
	for _, log := range sigLogs {
		fmt.Fprintf(w, "tuning on %s...\n", filepath.Base(log))
		f, err := tuneFigures(ctx, eng, log)
		if err != nil {
			return nil, err
		}
		res.Tunes = append(res.Tunes, *f)
	}
	return res, nil
}

// tuneFigures runs whittle tune over a signals log on the engine with
// one core, and measures its rate and peak memory.
func tuneFigures(ctx context.Context, eng *bleveengine.Engine, log string) (*TuneFigures, error) {
	f, err := os.Open(log)
	if err != nil {
		return nil, err
	}
	defer f.Close()
	defer runtime.GOMAXPROCS(runtime.GOMAXPROCS(1))
	runtime.GC()
	debug.FreeOSMemory()
	resetPeak()
	start := time.Now()
	t := tune.New(tune.Options{Products: eng})
	if err := t.Read(ctx, signals.Read(f, log), signals.JoinOptions{}); err != nil {
		return nil, err
	}
	r := t.Report()
	el := time.Since(start)
	return &TuneFigures{Events: r.Join.Events, PerSecond: float64(r.Join.Events) / el.Seconds(), PeakMemoryMB: peakMB()}, nil
}

// replayFigures replays a log on the engine with a worker a CPU, as
// whittle replay does, and measures its rate and peak memory.
func replayFigures(ctx context.Context, eng *bleveengine.Engine, log string) (*ReplayFigures, error) {
	f, err := os.Open(log)
	if err != nil {
		return nil, err
	}
	defer f.Close()
	runtime.GC()
	debug.FreeOSMemory()
	resetPeak()
	start := time.Now()
	sum, err := replay.Run(ctx, rewrite.New(eng, nil), replay.Read(bufio.NewReader(f)), replay.Options{}, func(*replay.Result) error { return nil })
	if err != nil {
		return nil, err
	}
	el := time.Since(start)
	n := sum.Report().All.Queries
	return &ReplayFigures{Queries: n, PerSecond: float64(n) / el.Seconds(), PeakMemoryMB: peakMB()}, nil
}

func percentile(ds []time.Duration, p int) time.Duration {
	if len(ds) == 0 {
		return 0
	}
	s := append([]time.Duration(nil), ds...)
	sort.Slice(s, func(i, j int) bool { return s[i] < s[j] })
	i := (len(s)*p + 99) / 100
	return s[min(max(i-1, 0), len(s)-1)]
}

// writeCatalog writes n generated products to file as a catalog, and
// to each of logs a query log of the given length drawn from them, and
// returns the rescue benchmark's queries.
func writeCatalog(file string, n int, logs map[string]int) ([]string, error) {
	products := catalog.Demo(n, 1)
	queries := zeroQueries(products, lexicon.Default(), 200)
	for log, lines := range logs {
		if err := writeLog(log, logQueries(products, lexicon.Default(), lines)); err != nil {
			return nil, err
		}
	}
	f, err := os.Create(file)
	if err != nil {
		return nil, err
	}
	bw := bufio.NewWriter(f)
	enc := json.NewEncoder(bw)
	for i := range products {
		if err := enc.Encode(&products[i]); err != nil {
			f.Close()
			return nil, err
		}
	}
	if err := bw.Flush(); err != nil {
		f.Close()
		return nil, err
	}
	return queries, f.Close()
}

// logQueries writes n queries as a shop's log holds them: a mix of
// queries that find something as typed (a product type, a colour and a
// type, a brand and a type) and queries that find nothing as typed
// (those of zeroQueries), cycling through the catalog.
func logQueries(ps []catalog.Product, lex *lexicon.Lexicon, n int) []string {
	zero := zeroQueries(ps, lex, max(n/4, 1))
	out := make([]string, 0, n)
	for i := 0; len(out) < n; i++ {
		p := ps[(i*7919)%len(ps)]
		switch {
		case i%4 == 0 && len(zero) > 0:
			out = append(out, zero[(i/4)%len(zero)])
		case i%4 <= 1:
			out = append(out, p.ProductType)
		case i%4 == 2:
			out = append(out, strings.TrimSpace(p.Colour+" "+p.ProductType))
		default:
			out = append(out, strings.TrimSpace(p.Brand+" "+p.ProductType))
		}
	}
	return out
}

// writeLog writes queries one a line; every tenth as a JSON line with a
// count, as a log that aggregates searches would.
func writeLog(file string, queries []string) error {
	f, err := os.Create(file)
	if err != nil {
		return err
	}
	bw := bufio.NewWriter(f)
	for i, q := range queries {
		if strings.TrimSpace(q) == "" {
			q = "lamp"
		}
		if i%10 == 9 {
			b, _ := json.Marshal(map[string]any{"query": q, "count": 1 + i%17})
			bw.Write(append(b, '\n'))
			continue
		}
		bw.WriteString(q + "\n")
	}
	if err := bw.Flush(); err != nil {
		f.Close()
		return err
	}
	return f.Close()
}

// resetPeak starts the peak resident memory count afresh, where the
// system allows it (Linux: writing 5 to /proc/self/clear_refs resets the
// high-water mark).
func resetPeak() { os.WriteFile("/proc/self/clear_refs", []byte("5"), 0) }

// peakMB is the peak resident memory since resetPeak, in MB: the
// high-water mark of /proc/self/status where there is one, else the
// process's peak.
func peakMB() float64 {
	if b, err := os.ReadFile("/proc/self/status"); err == nil {
		for _, line := range strings.Split(string(b), "\n") {
			if rest, ok := strings.CutPrefix(line, "VmHWM:"); ok {
				var kb float64
				if _, err := fmt.Sscan(strings.TrimSuffix(strings.TrimSpace(rest), " kB"), &kb); err == nil {
					return kb / 1024
				}
			}
		}
	}
	if mb, ok := rusagePeakMB(); ok {
		return mb
	}
	var ms runtime.MemStats
	runtime.ReadMemStats(&ms)
	return float64(ms.Sys) / (1 << 20)
}

// zeroQueries writes queries that find nothing as typed: a shopper's
// colour word for a shop colour name, in that product's type; a pattern
// and size the type does not have together. They come from the catalog,
// one product in every few.
func zeroQueries(ps []catalog.Product, lex *lexicon.Lexicon, n int) []string {
	pal := lex.ColourPalette()
	var qs []string
	step := max(len(ps)/n, 1)
	for i := 0; i < len(ps) && len(qs) < n; i += step {
		p := ps[i]
		if p.ColourHex != "" && p.ProductType != "" {
			if rgb, err := colour.ParseHex(p.ColourHex); err == nil {
				if near := pal.Nearest(rgb.Lab(), 1); len(near) == 1 {
					q := near[0].Name + " " + p.ProductType
					if len(p.Sizes) > 0 {
						q += " size " + p.Sizes[0]
					}
					qs = append(qs, "striped "+q)
					continue
				}
			}
		}
		if p.ProductType != "" {
			qs = append(qs, "zorblax "+p.ProductType)
		}
	}
	return qs
}

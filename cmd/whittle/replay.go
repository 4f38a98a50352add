package main

import (
	"bufio"
	"encoding/json"
	"flag"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"runtime"
	"time"

	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/replay"
)

func replayCmd(args []string, stdin io.Reader, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("replay", flag.ContinueOnError)
	fs.SetOutput(stderr)
	dir := fs.String("index", defaultIndex(), "index directory (built with whittle index)")
	logFile := fs.String("log", "", "query log: one query a line, or JSON Lines with query, count and category; - for standard input (required)")
	asJSON := fs.Bool("json", false, "write the summary as JSON instead of text")
	asCSV := fs.Bool("csv", false, "write one row a query as CSV, for a spreadsheet, instead of the summary")
	htmlFile := fs.String("html", "", "also write a one-page report with charts to this file")
	workers := fs.Int("workers", runtime.GOMAXPROCS(0), "queries run at once; the results do not depend on it")
	policyFile := fs.String("policy", "", "policy file laid over the built-in policy")
	budget := fs.Int("budget", rewrite.DefaultBudget, "most engine counts one rescue may spend")
	skipBad := fs.Bool("skip-bad", false, "skip malformed lines and report them, instead of stopping at the first")
	fs.Usage = func() {
		fmt.Fprint(stderr, "usage: whittle replay --log FILE [--index DIR] [--json | --csv] [--html FILE] [--workers N]\n"+
			"                      [--policy FILE] [--budget N] [--skip-bad]\n\n"+
			"Runs every query of a log through whittle on the index and sums up what would change:\n"+
			"searches finding nothing before and after rescue, the relaxations used, what is left\n"+
			"with nothing and why, and frequent queries that find nothing as typed.\n\nflags:\n")
		fs.PrintDefaults()
	}
	if _, code, ok := parseFlags(fs, args, 0); !ok {
		return code
	}
	if *logFile == "" {
		return usageError(fs, "--log FILE is required (- reads the log from standard input)")
	}
	if !checkNeeds(fs, atLeast("workers", *workers, 1), atLeast("budget", *budget, 1)) || !apart(fs, "json", "csv") {
		return 2
	}
	lex, _ := loadLexicon("replay", "", stderr)
	pol, ok := loadPolicy("replay", *policyFile, lex, stderr)
	if !ok {
		return 2
	}
	in, size := stdin, int64(0)
	if *logFile != "-" {
		f, err := os.Open(*logFile)
		if err != nil {
			fmt.Fprintf(stderr, "whittle replay: %v\n", err)
			return 1
		}
		defer f.Close()
		if st, err := f.Stat(); err == nil {
			size = st.Size()
		}
		in = f
	}
	cr := &countingReader{r: in}
	eng, err := bleveengine.Open(*dir)
	if err != nil {
		fmt.Fprintf(stderr, "whittle replay: %v\n", err)
		return 1
	}
	defer eng.Close()
	ctx, stop := interruptible()
	defer stop()

	out := bufio.NewWriter(stdout)
	defer out.Flush() // for the early returns; the end checks it
	emit := func(*replay.Result) error { return nil }
	var rows *replay.CSV
	if *asCSV {
		rows = replay.NewCSV(out)
		emit = rows.Write
	}
	tty := isTerminal(stderr)
	start := time.Now()
	opts := replay.Options{Workers: *workers, SkipBad: *skipBad}
	if tty {
		opts.Progress = func(n int) {
			if n%100 != 0 {
				return
			}
			showProgress(stderr, cr.n.Load(), size, start, n, "queries")
		}
	}
	sum, err := replay.Run(ctx, rewrite.New(eng, pol, rewrite.WithBudget(*budget)), replay.Read(cr), opts, emit)
	if tty {
		fmt.Fprint(stderr, "\r\033[K")
	}
	if interrupted(ctx, err) {
		if *asCSV {
			fmt.Fprintln(stderr, "whittle replay: interrupted; the CSV stops short of the end of the log")
		} else {
			fmt.Fprintln(stderr, "whittle replay: interrupted; no summary was written")
		}
		return 1
	}
	if err != nil {
		fmt.Fprintf(stderr, "whittle replay: %s: %v\n", *logFile, err)
		return 1
	}
	rep := sum.Report()
	switch {
	case *asCSV:
		err = rows.Flush()
	case *asJSON:
		enc := json.NewEncoder(out)
		enc.SetIndent("", "  ")
		err = enc.Encode(rep)
	default:
		err = replay.WriteText(out, rep)
	}
	if err == nil && *htmlFile != "" {
		err = writeFile(*htmlFile, func(w io.Writer) error { return replay.WriteHTML(w, "whittle replay of "+filepath.Base(*logFile), rep) })
	}
	if err != nil {
		fmt.Fprintf(stderr, "whittle replay: %v\n", err)
		return 1
	}
	if !*asJSON && !*asCSV {
		noun := "queries"
		if rep.All.Queries == 1 {
			noun = "query"
		}
		fmt.Fprintf(stderr, "replayed %d %s in %.1fs\n", rep.All.Queries, noun, time.Since(start).Seconds())
	}
	return finish(out, stderr, "replay", 0)
}

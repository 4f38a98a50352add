package main

import (
	"bufio"
	"encoding/json"
	"errors"
	"flag"
	"fmt"
	"io"
	"iter"
	"os"
	"strings"
	"sync/atomic"
	"time"

	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/signals"
	"github.com/whittle-search/whittle/rewrite/tune"
)

// fileList is a flag naming files, repeated or comma-separated.
type fileList []string

func (f *fileList) String() string { return strings.Join(*f, ",") }

func (f *fileList) Set(s string) error {
	for _, p := range strings.Split(s, ",") {
		if p = strings.TrimSpace(p); p != "" {
			*f = append(*f, p)
		}
	}
	return nil
}

func tuneCmd(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("tune", flag.ContinueOnError)
	fs.SetOutput(stderr)
	var files fileList
	fs.Var(&files, "signals", "signals log, JSON Lines; repeat the flag or separate files with commas (required)")
	dir := fs.String("index", defaultIndex(), "index directory the products shown are described from")
	policyFile := fs.String("policy", "", "the policy in force, laid over the built-in policy; it is only read")
	asJSON := fs.Bool("json", false, "write the report, the diff and the proposed policy as JSON instead of text")
	htmlFile := fs.String("html", "", "also write a one-page report with charts to this file")
	propose := fs.String("propose", "", "write the proposed policy file here; nothing is written without it")
	skipBad := fs.Bool("skip-bad", false, "skip malformed lines and count them, instead of stopping at the first")
	minAlias := fs.Int("min-alias", 2, "fewest sessions behind an alias candidate")
	fs.Usage = func() {
		fmt.Fprint(stderr, "usage: whittle tune --signals FILE[,FILE...] [--index DIR] [--policy FILE] [--json] [--html FILE]\n"+
			"                    [--propose FILE] [--skip-bad] [--min-alias N]\n\n"+
			"Learns strictness and tolerances per category from shoppers' signals: joins interactions\n"+
			"to the searches that showed the products, weighs them for position bias, compares\n"+
			"relaxed searches with exact matches, and recommends changes to the policy as a diff.\n"+
			"It applies nothing: --propose writes the proposed policy to a file of your choosing.\n\nflags:\n")
		fs.PrintDefaults()
	}
	if _, code, ok := parseFlags(fs, args, 0); !ok {
		return code
	}
	if len(files) == 0 {
		return usageError(fs, "--signals FILE is required")
	}
	if !checkNeeds(fs, atLeast("min-alias", *minAlias, 1)) {
		return 2
	}
	lex, _ := loadLexicon("tune", "", stderr)
	pol, ok := loadPolicy("tune", *policyFile, lex, stderr)
	if !ok {
		return 2
	}
	var logs []iter.Seq2[signals.Event, error]
	var read atomic.Int64
	size := int64(0)
	for _, name := range files {
		f, err := os.Open(name)
		if err != nil {
			fmt.Fprintf(stderr, "whittle tune: %v\n", err)
			return 1
		}
		defer f.Close()
		if st, err := f.Stat(); err == nil {
			size += st.Size()
		}
		logs = append(logs, signals.Read(&sharedCounter{r: f, n: &read}, name))
	}
	eng, err := bleveengine.Open(*dir)
	if err != nil {
		fmt.Fprintf(stderr, "whittle tune: %v\n", err)
		return 1
	}
	defer eng.Close()
	ctx, stop := interruptible()
	defer stop()

	t := tune.New(tune.Options{Policy: pol, Lexicon: lex, Products: eng, MinAliasSupport: *minAlias})
	events := signals.Merge(logs...)
	tty := isTerminal(stderr)
	start := time.Now()
	if tty {
		events = counted(events, func(n int) {
			if n%10000 == 0 {
				showProgress(stderr, read.Load(), size, start, n, "events")
			}
		})
	}
	err = t.Read(ctx, events, signals.JoinOptions{SkipBad: *skipBad})
	if tty {
		fmt.Fprint(stderr, "\r\033[K")
	}
	if interrupted(ctx, err) {
		fmt.Fprintln(stderr, "whittle tune: interrupted; no report or policy was written")
		return 1
	}
	if err != nil {
		var le *signals.LineError
		if errors.As(err, &le) {
			fmt.Fprintf(stderr, "whittle tune: %v\n(use --skip-bad to skip malformed lines)\n", err)
			return 1
		}
		fmt.Fprintf(stderr, "whittle tune: %v\n", err)
		return 1
	}
	rep := t.Report()
	if err := writeTune(stdout, rep, *asJSON); err != nil {
		fmt.Fprintf(stderr, "whittle tune: %v\n", err)
		return 1
	}
	for _, out := range []struct {
		file  string
		write func(io.Writer) error
	}{
		{*htmlFile, func(w io.Writer) error { return tune.WriteHTML(w, "whittle tune", rep) }},
		{*propose, func(w io.Writer) error { return tune.WritePolicy(w, rep) }},
	} {
		if out.file == "" {
			continue
		}
		if err := writeFile(out.file, out.write); err != nil {
			fmt.Fprintf(stderr, "whittle tune: %v\n", err)
			return 1
		}
	}
	if !*asJSON {
		fmt.Fprintf(stderr, "read %d events in %.1fs\n", rep.Join.Events, time.Since(start).Seconds())
	}
	return 0
}

// writeTune writes the report as text, or as JSON with the diff and the
// proposed policy file beside it.
func writeTune(stdout io.Writer, rep *tune.Report, asJSON bool) error {
	out := bufio.NewWriter(stdout)
	var err error
	if asJSON {
		var pol strings.Builder
		if err = tune.WritePolicy(&pol, rep); err != nil {
			return err
		}
		enc := json.NewEncoder(out)
		enc.SetIndent("", "  ")
		err = enc.Encode(struct {
			*tune.Report
			Diff     string `json:"diff"`
			Proposed string `json:"proposed_policy"`
			Caveat   string `json:"caveat"`
		}{rep, tune.Diff(rep.Changes), pol.String(), tune.Caveat})
	} else {
		err = tune.WriteText(out, rep)
	}
	if err != nil {
		return err
	}
	return out.Flush()
}

// counted calls f with the number of events yielded so far.
func counted(events iter.Seq2[signals.Event, error], f func(int)) iter.Seq2[signals.Event, error] {
	return func(yield func(signals.Event, error) bool) {
		n := 0
		for e, err := range events {
			n++
			f(n)
			if !yield(e, err) {
				return
			}
		}
	}
}

// sharedCounter adds the bytes read from one of several files to one
// count, for progress over all of them.
type sharedCounter struct {
	r io.Reader
	n *atomic.Int64
}

func (c *sharedCounter) Read(p []byte) (int, error) {
	n, err := c.r.Read(p)
	c.n.Add(int64(n))
	return n, err
}

package main

import (
	"context"
	crand "crypto/rand"
	"encoding/json"
	"errors"
	"flag"
	"fmt"
	"io"
	"math/rand/v2"
	"os"
	"strings"
	"text/tabwriter"
	"time"

	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/serve"
	"github.com/whittle-search/whittle/rewrite/signals"
)

func searchCmd(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("search", flag.ContinueOnError)
	fs.SetOutput(stderr)
	dir := fs.String("index", defaultIndex(), "index directory (built with whittle index)")
	asJSON := fs.Bool("json", false, "write the JSON contract instead of text")
	k := fs.Int("k", 10, "how many hits to show")
	policyFile := fs.String("policy", "", "policy file laid over the built-in policy")
	budget := fs.Int("budget", rewrite.DefaultBudget, "most engine counts one rescue may spend")
	baseline := fs.Bool("baseline", false, "also run the blind partial match a plain engine would, and show both")
	var fallback bleveengine.Fallback
	fs.TextVar(&fallback, "fallback", bleveengine.MostWords, "the blind partial match `NAME` --baseline runs: "+fallbackChoices())
	explore := fs.Float64("explore", 0, "chance `P`, from 0 to 1, that one hit shown is the best new product of the plan one step looser than the rescue's, marked as explored")
	seed := fs.Uint64("seed", 0, "seed `N` of the explore draw (default: from the clock, so each run draws anew)")
	signalsFile := fs.String("signals", "", "append the search event, one JSON line, to `FILE`")
	session := fs.String("session", "", "session `ID` of the search event (default: a new random id each run)")
	category := fs.String("category", "", "the shop's category the search is made in, used when the query names none")
	fs.Usage = func() {
		fmt.Fprint(stderr, "usage: whittle search [--index DIR] [--json] [-k N] [--policy FILE] [--budget N] [--baseline [--fallback NAME]]\n"+
			"                      [--category NAME] [--explore P [--seed N]] [--signals FILE [--session ID]] QUERY\n\nflags:\n")
		fs.PrintDefaults()
	}
	rest, code, ok := parseFlags(fs, args, -1)
	if !ok {
		return code
	}
	switch {
	case len(rest) == 0:
		return usageError(fs, "give the QUERY to search for")
	case len(rest) > 1:
		return usageError(fs, "takes one query; quote a query of several words: whittle search %q", strings.Join(rest, " "))
	}
	if !checkNeeds(fs, need{"k", *k >= 0, "0 or more"}, atLeast("budget", *budget, 1),
		need{"explore", *explore >= 0 && *explore <= 1, "a chance from 0 to 1"}) ||
		!onlyWith(fs, "seed", "explore") || !onlyWith(fs, "session", "signals") || !onlyWith(fs, "fallback", "baseline") {
		return 2
	}
	if !checkCategory("search", *category, stderr) {
		return 2
	}
	lex, _ := loadLexicon("search", "", stderr)
	pol, ok := loadPolicy("search", *policyFile, lex, stderr)
	if !ok {
		return 2
	}
	eng, err := bleveengine.Open(*dir)
	if err != nil {
		fmt.Fprintf(stderr, "whittle search: %v\n", err)
		return 1
	}
	defer eng.Close()
	rw := rewrite.New(eng, pol, rewrite.WithBudget(*budget))
	opts := bleveengine.RescueOptions{K: *k, Baseline: *baseline, Fallback: fallback, Explore: *explore, Rand: exploreSource(fs, *seed)}
	res, err := eng.Rescue(context.Background(), rw, rw.ParseIn(rest[0], *category), opts)
	var refused *rewrite.RefusedError
	if errors.As(err, &refused) {
		return writeRefusal(refused, *asJSON, stdout, stderr)
	}
	if err != nil {
		fmt.Fprintf(stderr, "whittle search: %v\n", err)
		return 1
	}
	if *signalsFile != "" {
		if err := appendSearchEvent(*signalsFile, *session, res.Outcome.Parsed.Category, res.Report); err != nil {
			fmt.Fprintf(stderr, "whittle search: %v\n", err)
			return 1
		}
	}
	o, rep, hits, base := res.Outcome, res.Report, res.Hits, res.Baseline
	if *asJSON {
		b, err := json.Marshal(res)
		if err != nil {
			fmt.Fprintf(stderr, "whittle search: %v\n", err)
			return 1
		}
		fmt.Fprintf(stdout, "%s\n", b)
		return 0
	}
	o.Parsed.WriteText(stdout, parser.TextStyle{})
	fmt.Fprintln(stdout)
	for i, s := range rep.Steps {
		var what []string
		for _, r := range s.Relaxations {
			what = append(what, fmt.Sprintf("%s %s %q", r.Op, r.Kind, r.Text))
		}
		if len(what) == 0 {
			what = []string{s.Label}
		}
		fmt.Fprintf(stdout, "step %d  %-50s %d\n", i+1, strings.Join(what, ", "), s.Count)
	}
	msg := o.Message
	if o.Exact {
		msg = rewrite.ExactMessage(o.Count)
	}
	fmt.Fprintf(stdout, "\n%s\n", msg)
	if o.Note != "" {
		fmt.Fprintf(stdout, "(%s)\n", o.Note)
	}
	if len(hits) > 0 {
		fmt.Fprintln(stdout)
		tw := tabwriter.NewWriter(stdout, 0, 0, 2, ' ', 0)
		for _, h := range hits {
			stock := ""
			if !h.InStock {
				stock = "unavailable"
			}
			fmt.Fprintf(tw, "%s\t%s\t%s\t%s\t%s%s\n", h.ID, h.Title, h.Colour, h.Price, stock, exploredMark(h, rep.Explored))
		}
		tw.Flush()
	}
	if base != nil {
		results := "results"
		if base.Count == 1 {
			results = "result"
		}
		fmt.Fprintf(stdout, "\nblind partial match (%s): %d of %d words kept, %d %s\n", base.Fallback, base.Kept, base.Words, base.Count, results)
		tw := tabwriter.NewWriter(stdout, 0, 0, 2, ' ', 0)
		for _, h := range base.Hits {
			fmt.Fprintf(tw, "%s\t%s\t%s\t%s\n", h.ID, h.Title, h.Colour, h.Price)
		}
		tw.Flush()
	}
	return 0
}

// writeRefusal reports a query with nothing to search for and returns
// the exit status, 1: as the service's error object under "error" with
// --json, else one line on stderr and each problem drawn with carets.
func writeRefusal(re *rewrite.RefusedError, asJSON bool, stdout, stderr io.Writer) int {
	if asJSON {
		b, err := json.Marshal(map[string]*serve.Error{"error": serve.RefusalError(re)})
		if err != nil {
			fmt.Fprintf(stderr, "whittle search: %v\n", err)
			return 1
		}
		fmt.Fprintf(stdout, "%s\n", b)
		return 1
	}
	fmt.Fprintf(stderr, "whittle search: %v\n", re)
	for _, l := range strings.Split(re.Render(), "\n") {
		fmt.Fprintln(stderr, strings.TrimRight("  "+l, " "))
	}
	return 1
}

// exploreSource is the source of the explore draw: seeded by --seed when
// it is given, else by the clock.
func exploreSource(fs *flag.FlagSet, seed uint64) *rand.Rand {
	given := false
	fs.Visit(func(f *flag.Flag) { given = given || f.Name == "seed" })
	if !given {
		seed = uint64(time.Now().UnixNano())
	}
	return rand.New(rand.NewPCG(seed, 0))
}

// appendSearchEvent appends the search event of rep, in session (a new
// random id when ""), as one JSON line to file.
func appendSearchEvent(file, session, category string, rep rewrite.Report) error {
	if session == "" {
		session = crand.Text()
	}
	b, err := json.Marshal(signals.SearchEvent(session, time.Now().UTC(), category, rep))
	if err != nil {
		return err
	}
	f, err := os.OpenFile(file, os.O_APPEND|os.O_CREATE|os.O_WRONLY, 0o644)
	if err != nil {
		return err
	}
	if _, err := f.Write(append(b, '\n')); err != nil {
		f.Close()
		return err
	}
	return f.Close()
}

// exploredMark says, after a hit shown to explore, how its plan was
// looser than the rescue's.
func exploredMark(h rewrite.ReportHit, x *rewrite.ReportExplored) string {
	if !h.Explored || x == nil {
		return ""
	}
	var what []string
	for _, r := range x.Relaxations {
		what = append(what, fmt.Sprintf("%s %s %q", r.Op, r.Kind, r.Text))
	}
	return "  (explored, one step looser: " + strings.Join(what, ", ") + ")"
}

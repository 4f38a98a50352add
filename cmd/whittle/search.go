package main

import (
	"context"
	"encoding/json"
	"flag"
	"fmt"
	"io"
	"strings"
	"text/tabwriter"

	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
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
	fs.Usage = func() {
		fmt.Fprint(stderr, "usage: whittle search [--index DIR] [--json] [-k 10] QUERY\n\nflags:\n")
		fs.PrintDefaults()
	}
	rest, code, ok := parseFlags(fs, args, 1)
	if !ok {
		return code
	}
	if *k < 0 || *budget < 1 {
		fs.Usage()
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
	res, err := eng.Rescue(context.Background(), rw, rw.Parse(rest[0]), bleveengine.RescueOptions{K: *k, Baseline: *baseline})
	if err != nil {
		fmt.Fprintf(stderr, "whittle search: %v\n", err)
		return 1
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
		msg = fmt.Sprintf("%d exact matches.", o.Count)
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
			fmt.Fprintf(tw, "%s\t%s\t%s\t%s\t%s\n", h.ID, h.Title, h.Colour, h.Price, stock)
		}
		tw.Flush()
	}
	if base != nil {
		fmt.Fprintf(stdout, "\nblind partial match: %d of %d words kept, %d results\n", base.Kept, base.Words, base.Count)
		tw := tabwriter.NewWriter(stdout, 0, 0, 2, ' ', 0)
		for _, h := range base.Hits {
			fmt.Fprintf(tw, "%s\t%s\t%s\t%s\n", h.ID, h.Title, h.Colour, h.Price)
		}
		tw.Flush()
	}
	return 0
}

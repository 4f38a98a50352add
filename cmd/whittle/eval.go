package main

import (
	"encoding/json"
	"flag"
	"fmt"
	"io"
	"os"
	"strings"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/eval"
)

func evalCmd(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("eval", flag.ContinueOnError)
	fs.SetOutput(stderr)
	n := fs.Int("products", eval.DefaultProducts, "size of the generated demo catalog")
	queries := fs.Int("queries", eval.DefaultQueries, "how many labelled queries to write in each style")
	seed := fs.Uint64("seed", 1, "seed of the labelled set: the same seed gives the same queries")
	hits := fs.Int("hits", eval.DefaultK, "how many hits each query asks for (the k of top k)")
	policy := fs.String("policy", "", "a strictness policy laid over the built-in one")
	dir := fs.String("dir", os.TempDir(), "where to build the temporary index")
	asJSON := fs.Bool("json", false, "write each style's report as one JSON object, one a line")
	cases := fs.Bool("cases", false, "write the labelled set of each style, one JSON object a line, and evaluate nothing")
	style := fs.String("style", "both", "how the queries are written: short (about 3 constraints), long (4 to 7) or both, one set each")
	var fallback bleveengine.Fallback
	fs.TextVar(&fallback, "fallback", bleveengine.MostWords, "the blind partial match `NAME` whittle is measured against: "+fallbackChoices())
	fs.Usage = func() {
		fmt.Fprint(stderr, `usage: whittle eval [--products N] [--queries N] [--seed S] [--style short|long|both] [--hits K] [--policy FILE]
                   [--fallback most-words|drop-trailing] [--dir DIR] [--json | --cases]

Generates the demo catalog, writes from it a labelled set of queries that
each miss their exact match in one known way (a colour the shop does not
name, a pattern the type lacks, a misspelt type, an extra word, a measure
slightly off), indexes the catalog in a temporary directory, and runs
every query through whittle and through a blind partial match, the
baseline. It prints, for both, the rescue rate, the share of hits that
keep every hard constraint, the share also of the type meant (in the top
K, and in all the products the search matched, which its count, its
facets and a sort by price see), where the product meant ranks and how
much of each query was kept; the goals beside them; the figures by kind
of failure; and examples of where whittle does worse.

The queries come in two styles: short (the product type and a few of its
attributes, about three constraints) and long (four to seven constraints
drawn from more of its attributes, among them its brand, silhouette and a
price ceiling it meets). --style both, the default, writes a set of
--queries queries in each style, reports on each in turn and ends with
the goals of both side by side; --json then writes one object a style,
one a line, and --cases both sets.

The baseline is the way a plain engine falls back when all of a query's
words together match nothing, knowing nothing of what they mean:
--fallback most-words, the default, or --fallback drop-trailing (below).

exit status: 0 evaluated (whether or not the goals are met), 1 the run
failed, 2 bad usage.

flags:
`)
		fs.PrintDefaults()
	}
	if _, code, ok := parseFlags(fs, args, 0); !ok {
		return code
	}
	if !checkNeeds(fs, products(*n), atLeast("queries", *queries, 1), atLeast("hits", *hits, 1)) || !apart(fs, "json", "cases") {
		return 2
	}
	styles, ok := evalStyles(*style, stderr)
	if !ok {
		return 2
	}
	pol, ok := loadPolicy("eval", *policy, lexicon.Default(), stderr)
	if !ok {
		return 2
	}
	opts := eval.RunOptions{Products: *n, Generate: eval.Options{Queries: *queries, Seed: *seed, Policy: pol}, Fallback: fallback, K: *hits, Dir: *dir, Log: stderr}
	if *cases {
		var all []eval.Case
		for _, s := range styles {
			opts.Generate.Style = s
			all = append(all, eval.Cases(opts)...)
		}
		return writeCases(stdout, stderr, all)
	}
	ctx, stop := interruptible()
	defer stop()
	reps, err := eval.RunStyles(ctx, opts, styles)
	if interrupted(ctx, err) {
		fmt.Fprintln(stderr, "whittle eval: interrupted")
		return 1
	}
	if err == nil {
		err = writeReports(stdout, reps, *asJSON)
	}
	if err != nil {
		fmt.Fprintf(stderr, "whittle eval: %v\n", err)
		return 1
	}
	return 0
}

// fallbackChoices names and describes every fallback, for a flag's help.
func fallbackChoices() string {
	var out []string
	for _, f := range bleveengine.Fallbacks() {
		out = append(out, fmt.Sprintf("%s (%s)", f, f.Describe()))
	}
	return strings.Join(out, " or ")
}

// evalStyles reads --style.
func evalStyles(s string, stderr io.Writer) ([]eval.Style, bool) {
	switch s {
	case "both":
		return eval.Styles(), true
	case string(eval.StyleShort), string(eval.StyleLong):
		return []eval.Style{eval.Style(s)}, true
	}
	fmt.Fprintf(stderr, "whittle eval: --style is short, long or both, not %q\n", s)
	return nil, false
}

// writeReports writes each report, as JSON one a line or as text one
// after the other, then, for more than one, their goals side by side.
func writeReports(w io.Writer, reps []eval.Report, asJSON bool) error {
	if asJSON {
		enc := json.NewEncoder(w)
		for _, r := range reps {
			if err := enc.Encode(r); err != nil {
				return err
			}
		}
		return nil
	}
	for i, r := range reps {
		if i > 0 {
			fmt.Fprintln(w)
		}
		if err := r.WriteText(w); err != nil {
			return err
		}
	}
	if len(reps) < 2 {
		return nil
	}
	fmt.Fprintf(w, "\ngoals by style, against %s:\n", reps[0].Fallback)
	return eval.WriteGoals(w, reps)
}

// writeCases writes the labelled set as JSON Lines.
func writeCases(stdout, stderr io.Writer, cases []eval.Case) int {
	enc := json.NewEncoder(stdout)
	for _, c := range cases {
		if err := enc.Encode(c); err != nil {
			fmt.Fprintf(stderr, "whittle eval: %v\n", err)
			return 1
		}
	}
	return 0
}

package main

import (
	"encoding/json"
	"flag"
	"fmt"
	"io"
	"os"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/rewrite/eval"
)

func evalCmd(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("eval", flag.ContinueOnError)
	fs.SetOutput(stderr)
	n := fs.Int("products", eval.DefaultProducts, "size of the generated demo catalog")
	queries := fs.Int("queries", eval.DefaultQueries, "how many labelled queries to write")
	seed := fs.Uint64("seed", 1, "seed of the labelled set: the same seed gives the same queries")
	hits := fs.Int("hits", eval.DefaultK, "how many hits each query asks for (the k of top k)")
	policy := fs.String("policy", "", "a strictness policy laid over the built-in one")
	dir := fs.String("dir", os.TempDir(), "where to build the temporary index")
	asJSON := fs.Bool("json", false, "write the report as one JSON object")
	cases := fs.Bool("cases", false, "write the labelled set, one JSON object a line, and evaluate nothing")
	fs.Usage = func() {
		fmt.Fprint(stderr, `usage: whittle eval [--products N] [--queries N] [--seed S] [--hits K] [--policy FILE] [--dir DIR] [--json | --cases]

Generates the demo catalog, writes from it a labelled set of queries that
each miss their exact match in one known way (a colour the shop does not
name, a pattern the type lacks, a misspelt type, an extra word, a measure
slightly off), indexes the catalog in a temporary directory, and runs
every query through whittle and through the blind partial match. It
prints, for both, the rescue rate, the share of hits that keep every hard
constraint, the share also of the type meant, where the product meant
ranks and how much of each query was kept; the goals beside them; the
figures by kind of failure; and examples of where whittle does worse.

exit status: 0 evaluated (whether or not the goals are met), 1 the run
failed, 2 bad usage.

flags:
`)
		fs.PrintDefaults()
	}
	if _, code, ok := parseFlags(fs, args, 0); !ok {
		return code
	}
	if !productsOK(*n, stderr) {
		return 2
	}
	for _, f := range []struct {
		name string
		v    int
	}{{"queries", *queries}, {"hits", *hits}} {
		if f.v < 1 {
			fmt.Fprintf(stderr, "whittle eval: --%s must be at least 1\n", f.name)
			return 2
		}
	}
	pol, ok := loadPolicy("eval", *policy, lexicon.Default(), stderr)
	if !ok {
		return 2
	}
	opts := eval.RunOptions{Products: *n, Generate: eval.Options{Queries: *queries, Seed: *seed, Policy: pol}, K: *hits, Dir: *dir, Log: stderr}
	if *cases {
		return writeCases(stdout, stderr, eval.Cases(opts))
	}
	ctx, stop := interruptible()
	defer stop()
	rep, err := eval.Run(ctx, opts)
	if err != nil {
		fmt.Fprintf(stderr, "whittle eval: %v\n", err)
		return 1
	}
	if *asJSON {
		err = json.NewEncoder(stdout).Encode(rep)
	} else {
		err = rep.WriteText(stdout)
	}
	if err != nil {
		fmt.Fprintf(stderr, "whittle eval: %v\n", err)
		return 1
	}
	return 0
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

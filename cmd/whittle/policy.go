package main

import (
	"encoding/json"
	"flag"
	"fmt"
	"io"
	"maps"
	"os"
	"slices"
	"strings"
	"text/tabwriter"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
)

const policyUsage = `usage:
  whittle policy show [--category C] [--product-type T] [--policy FILE] [--json] [--lexicon DIR]
                               print the policy in force (built in, or with --policy laid over it)
  whittle policy check [--lexicon DIR] FILE
                               check a policy file: every problem with its line and column
`

// showOptions are the flags of policy show.
type showOptions struct {
	category, productType, file, lexDir *string
	asJSON                              *bool
}

// showFlags defines the flags of policy show on a new flag set.
func showFlags(stderr io.Writer) (*flag.FlagSet, showOptions) {
	fs := flag.NewFlagSet("policy show", flag.ContinueOnError)
	fs.SetOutput(stderr)
	o := showOptions{
		category:    fs.String("category", "", "category: "+strings.Join(lexicon.Categories(), ", ")+" (default: the product type's)"),
		productType: fs.String("product-type", "", "product type, by its lexicon name (\"rain jacket\"); it brings its category"),
		file:        fs.String("policy", "", "policy file laid over the built-in policy"),
		asJSON:      fs.Bool("json", false, "write JSON"),
		lexDir:      fs.String("lexicon", "", "directory of .wlx files replacing the built-in ones"),
	}
	return fs, o
}

// writePolicyUsage writes the usage of policy and the flags of show.
func writePolicyUsage(w io.Writer) {
	fmt.Fprint(w, policyUsage+"\nflags of show:\n")
	fs, _ := showFlags(w)
	fs.PrintDefaults()
}

func policyCmd(args []string, stdout, stderr io.Writer) int {
	if len(args) == 0 {
		writePolicyUsage(stderr)
		return 2
	}
	switch args[0] {
	case "show":
		return policyShow(args[1:], stdout, stderr)
	case "check":
		return policyCheck(args[1:], stdout, stderr)
	case "-h", "-help", "--help", "help":
		writePolicyUsage(stdout)
		return 0
	}
	fmt.Fprintf(stderr, "whittle policy: unknown subcommand %q%s (show or check; run \"whittle policy -h\")\n", args[0], lexicon.DidYouMean(args[0], []string{"show", "check"}))
	return 2
}

func policyShow(args []string, stdout, stderr io.Writer) int {
	fs, o := showFlags(stderr)
	fs.Usage = func() { writePolicyUsage(stderr) }
	if _, code, ok := parseFlags(fs, args, 0); !ok {
		return code
	}
	if !checkCategory("policy", *o.category, stderr) {
		return 2
	}
	lex, ok := loadLexicon("policy", *o.lexDir, stderr)
	if !ok {
		return 2
	}
	pol, ok := loadPolicy("policy", *o.file, lex, stderr)
	if !ok {
		return 1
	}
	e, err := pol.Settle(*o.category, *o.productType, lex)
	if err != nil {
		fmt.Fprintf(stderr, "whittle policy: %v\n", err)
		return 2
	}
	if *o.asJSON {
		b, err := json.MarshalIndent(e, "", "  ")
		if err != nil {
			fmt.Fprintf(stderr, "whittle policy: %v\n", err)
			return 1
		}
		fmt.Fprintf(stdout, "%s\n", b)
		return 0
	}
	writePolicy(stdout, e)
	return 0
}

func writePolicy(w io.Writer, e rewrite.Effective) {
	or := func(s, none string) string {
		if s == "" {
			return none
		}
		return s
	}
	tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', 0)
	fmt.Fprintf(tw, "policy for\tcategory %s, product type %s\n", or(e.Category, "(any)"), or(e.ProductType, "(any)"))
	fmt.Fprintf(tw, "min_results\t%d\n", e.MinResults)
	fmt.Fprintf(tw, "colour_tolerance\t%g (ΔE00)\n", e.ColourTolerance)
	fmt.Fprintf(tw, "measure_tolerance\t%g (±%g%%)\n", e.MeasureTolerance, e.MeasureTolerance*100)
	fmt.Fprintf(tw, "price_stretch\t%g (+%g%%)\n", e.PriceStretch, e.PriceStretch*100)
	fmt.Fprintf(tw, "\nstrictness\t\n")
	for _, k := range parser.AllKinds() {
		fmt.Fprintf(tw, "  %s\t%s\n", k, e.Strictness[k])
	}
	if len(e.Dimensions) > 0 {
		fmt.Fprintf(tw, "\ndimensions\t\n")
		for _, d := range slices.Sorted(maps.Keys(e.Dimensions)) {
			fmt.Fprintf(tw, "  %s\t%s\n", d, e.Dimensions[d])
		}
	}
	if len(e.StandardSizes) > 0 {
		fmt.Fprintf(tw, "\nstandard_sizes\t\n")
		for _, d := range slices.Sorted(maps.Keys(e.StandardSizes)) {
			fmt.Fprintf(tw, "  %s\t%s\n", d, strings.Join(e.StandardSizes[d], ", "))
		}
	}
	tw.Flush()
}

func policyCheck(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("policy check", flag.ContinueOnError)
	fs.SetOutput(stderr)
	lexDir := fs.String("lexicon", "", "directory of .wlx files replacing the built-in ones: the product types and dimensions the file may name")
	fs.Usage = func() {
		fmt.Fprint(stderr, "usage: whittle policy check [--lexicon DIR] FILE\n\nChecks a policy file as it would be laid over the built-in policy,\n"+
			"and prints every problem with its line and column, or its warnings and ok.\n\nflags:\n")
		fs.PrintDefaults()
	}
	rest, code, ok := parseFlags(fs, args, -1)
	if !ok {
		return code
	}
	if len(rest) != 1 {
		return usageError(fs, "takes one policy FILE, not %d arguments", len(rest))
	}
	file := rest[0]
	if _, err := os.Stat(file); err != nil {
		fmt.Fprintf(stderr, "whittle policy: %v\n", err)
		return 1
	}
	// Read as it is used, laid over the built-in policy, so that a
	// warning about the settled values (the weights' order) shows too.
	lex, ok := loadLexicon("policy", *lexDir, stderr)
	if !ok {
		return 2
	}
	pol, err := rewrite.LoadPolicy(file, lex)
	if err != nil {
		fmt.Fprintf(stderr, "%s\n", renderPolicyError(err))
		return 1
	}
	for _, w := range pol.Warnings {
		fmt.Fprintf(stdout, "warning: %s\n", w)
	}
	fmt.Fprintf(stdout, "%s: ok\n", file)
	return 0
}

package main

import (
	"bufio"
	"encoding/json"
	"flag"
	"fmt"
	"io"
	"os"
	"slices"
	"strings"

	"golang.org/x/term"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/units"
	"github.com/whittle-search/whittle/parser"
)

// maxLine bounds one line of standard input.
const maxLine = 16 << 20

func explain(args []string, stdin io.Reader, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("explain", flag.ContinueOnError)
	fs.SetOutput(stderr)
	asJSON := fs.Bool("json", false, "write the JSON contract (one object a line) instead of the table")
	category := fs.String("category", "", "read every query as being in this category: "+strings.Join(lexicon.Categories(), ", "))
	cur := fs.String("currency", "USD", `ISO 4217 code a bare "$" or "dollars" means: `+strings.Join(parser.DollarCurrencies(), ", ")+" (either case)")
	imperial := fs.Bool("imperial", false, "read gallons, quarts, pints, cups and fluid ounces as imperial")
	lexDir := fs.String("lexicon", "", "directory of .wlx files replacing the built-in ones (missing files fall back)")
	policyFile := fs.String("policy", "", "policy file laid over the built-in strictness policy")
	colour := fs.String("colour", "auto", "colour the table: auto (on a terminal), always or never")
	fs.Usage = func() {
		fmt.Fprint(stderr, "usage: whittle explain [--json] [--category C] [--currency CODE] [--imperial] [--lexicon DIR]\n"+
			"                       [--policy FILE] [--colour auto|always|never] QUERY...\n"+
			"       whittle explain [flags] -   (one query a line from standard input)\n\n"+
			"Flags come before the queries; put a query that starts with a dash after --:\n  whittle explain --json -- \"-leather boots\"\n\nflags:\n")
		fs.PrintDefaults()
	}
	if _, code, ok := parseWith(fs, func() ([]string, error) { return nil, fs.Parse(args) }); !ok {
		return code
	}
	if fs.NArg() == 0 {
		return usageError(fs, "give a query, or - to read queries from standard input")
	}
	if fs.NArg() > 1 && slices.Contains(fs.Args(), "-") {
		return usageError(fs, `"-" reads the queries from standard input and must be the only argument, after any flags`)
	}
	code, err := parser.DollarCurrency(*cur)
	if err != nil {
		return usageError(fs, "%v", err)
	}
	opts := parser.Options{Category: *category, Currency: code}
	if *imperial {
		opts.Volume = units.Imperial
	}
	if !checkCategory("explain", *category, stderr) {
		return 2
	}
	lx, ok := loadLexicon("explain", *lexDir, stderr)
	if !ok {
		return 2
	}
	opts.Lexicon = lx
	pol, ok := loadPolicy("explain", *policyFile, lx, stderr)
	if !ok {
		return 2
	}
	var style parser.TextStyle
	switch *colour {
	case "always":
		style.Colour = true
	case "never":
	case "auto":
		if f, ok := stdout.(*os.File); ok && term.IsTerminal(int(f.Fd())) && os.Getenv("NO_COLOR") == "" {
			style.Colour = true
		}
	default:
		return usageError(fs, "--colour must be auto, always or never, not %q", *colour)
	}

	out := bufio.NewWriter(stdout)
	status := 0
	emit := func(q string, first bool) {
		r := pol.Read(q, opts)
		if len(r.Errors) > 0 {
			status = 1
		}
		if *asJSON {
			b, err := json.Marshal(r)
			if err != nil {
				fmt.Fprintf(stderr, "whittle explain: %v\n", err)
				status = 1
				return
			}
			out.Write(b)
			out.WriteByte('\n')
			return
		}
		if !first {
			out.WriteString("\n")
		}
		r.WriteText(out, style)
	}
	if fs.NArg() == 1 && fs.Arg(0) == "-" {
		sc := bufio.NewScanner(stdin)
		sc.Buffer(make([]byte, 64<<10), maxLine)
		first := true
		for sc.Scan() {
			line := strings.TrimSuffix(sc.Text(), "\r")
			if first {
				line = strings.TrimPrefix(line, "\ufeff") // a byte order mark
			}
			emit(line, first)
			first = false
		}
		if err := sc.Err(); err != nil {
			out.Flush()
			fmt.Fprintf(stderr, "whittle explain: reading standard input: %v\n", err)
			return 1
		}
		return finish(out, stderr, "explain", status)
	}
	for i, q := range fs.Args() {
		emit(q, i == 0)
	}
	return finish(out, stderr, "explain", status)
}

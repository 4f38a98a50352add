package main

import (
	"fmt"
	"io"
	"os"

	"github.com/whittle-search/whittle/lexicon"
)

const usage = `whittle reads long shopping queries into typed constraints.

usage:
  whittle demo [flags]                   tour what whittle does, on an invented store's catalog
  whittle explain [flags] QUERY...       show how each query is read
  whittle explain [flags] -              read one query a line from standard input
  whittle colour [flags] COLOUR...       describe a colour, compare two, or search a catalog's colours
  whittle policy show|check ...          print the strictness policy in force, or check a policy file
  whittle index --catalog FILE [flags]   build the search index of a catalog (JSON Lines)
  whittle search [flags] QUERY           search the index, rescuing a query that finds too little
  whittle replay --log FILE [flags]      run a query log through whittle and sum up what would change
  whittle tune --signals FILE [flags]    learn strictness and tolerances from shoppers' signals
  whittle serve [flags]                  answer parse and rescue as a JSON service on 127.0.0.1
  whittle bench [flags]                  time index building and rescues on a generated catalog
  whittle eval [flags]                   measure rescue quality against the blind partial match
  whittle help                           show this text

Run "whittle COMMAND -h" or "whittle help COMMAND" for a command's flags.

exit status: 0 done, 1 the command failed (explain: a query had an error
in it), 2 bad usage.
`

func main() {
	os.Exit(run(os.Args[1:], os.Stdin, os.Stdout, os.Stderr))
}

// commandNames are the commands run knows, for suggesting one.
var commandNames = []string{"explain", "colour", "policy", "index", "demo", "bench", "eval", "search", "replay", "tune", "serve", "help"}

// helpWords ask for the usage text.
var helpWords = map[string]bool{"help": true, "-h": true, "-help": true, "--help": true}

// run is main without the process: it returns the exit status.
func run(args []string, stdin io.Reader, stdout, stderr io.Writer) int {
	if len(args) == 0 {
		fmt.Fprint(stderr, usage)
		return 2
	}
	switch args[0] {
	case "explain":
		return explain(args[1:], stdin, stdout, stderr)
	case "colour", "color":
		return colourCmd(args[1:], stdout, stderr)
	case "policy":
		return policyCmd(args[1:], stdout, stderr)
	case "index":
		return indexCmd(args[1:], stdout, stderr)
	case "demo":
		return demoCmd(args[1:], stdout, stderr)
	case "bench":
		return benchCmd(args[1:], stdout, stderr)
	case "eval":
		return evalCmd(args[1:], stdout, stderr)
	case "search":
		return searchCmd(args[1:], stdout, stderr)
	case "replay":
		return replayCmd(args[1:], stdin, stdout, stderr)
	case "tune":
		return tuneCmd(args[1:], stdout, stderr)
	case "serve":
		return serveCmd(args[1:], stdout, stderr)
	case "help", "-h", "-help", "--help":
		if len(args) > 1 && !helpWords[args[1]] {
			// "whittle help search" is "whittle search -h"; an
			// unknown command is refused as it is without help.
			return run([]string{args[1], "-h"}, stdin, stdout, stderr)
		}
		fmt.Fprint(stdout, usage)
		return 0
	}
	fmt.Fprintf(stderr, "whittle: unknown command %q%s (run \"whittle help\" for the commands)\n", args[0], lexicon.DidYouMean(args[0], commandNames))
	return 2
}

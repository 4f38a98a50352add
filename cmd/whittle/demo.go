package main

import (
	"context"
	"flag"
	"fmt"
	"io"
	"os"
	"os/signal"

	"github.com/whittle-search/whittle/rewrite/demo"
)

func demoCmd(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("demo", flag.ContinueOnError)
	fs.SetOutput(stderr)
	dir := fs.String("dir", "", "where the demo index lives (default: the user's cache directory)")
	n := fs.Int("products", 20000, "size of the generated demo catalog")
	rebuild := fs.Bool("rebuild", false, "build the demo index again even if one is there")
	fs.Usage = func() {
		fmt.Fprint(stderr, "usage: whittle demo [--dir DIR] [--products N] [--rebuild]\n\nGenerates an invented general store's catalog, indexes it once, and tours what whittle does.\n\nflags:\n")
		fs.PrintDefaults()
	}
	if rest, err := parseInterspersed(fs, args); err != nil || len(rest) != 0 || *n < 100 {
		if err == flag.ErrHelp {
			return 0
		}
		fs.Usage()
		return 2
	}
	ctx, stop := signal.NotifyContext(context.Background(), os.Interrupt)
	defer stop()
	if err := demo.Run(ctx, stdout, demo.Options{Dir: *dir, Products: *n, Rebuild: *rebuild}); err != nil {
		fmt.Fprintf(stderr, "whittle demo: %v\n", err)
		return 1
	}
	return 0
}

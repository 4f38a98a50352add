package main

import (
	"bufio"
	"context"
	"errors"
	"flag"
	"fmt"
	"io"
	"os"
	"os/signal"
	"strings"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/rewrite"
)

// loadLexicon returns the lexicon a --lexicon flag names, or the default
// when dir is empty; on an error it reports it for command cmd.
func loadLexicon(cmd, dir string, stderr io.Writer) (*lexicon.Lexicon, bool) {
	if dir == "" {
		return lexicon.Default(), true
	}
	lx, err := lexicon.LoadDir(dir)
	if err != nil {
		fmt.Fprintf(stderr, "whittle %s: %v\n", cmd, err)
		return nil, false
	}
	return lx, true
}

// checkCategory reports an unknown --category value for command cmd.
func checkCategory(cmd, category string, stderr io.Writer) bool {
	if err := lexicon.CheckCategory(category); err != nil {
		fmt.Fprintf(stderr, "whittle %s: %v\n", cmd, err)
		return false
	}
	return true
}

// loadPolicy returns the built-in policy, with the file a --policy flag
// names laid over it, and prints the policy's warnings (a standard
// designation made less than hard) on stderr; on an error it reports
// it, rendered, for command cmd.
func loadPolicy(cmd, file string, lex *lexicon.Lexicon, stderr io.Writer) (*rewrite.Policy, bool) {
	p, ok := readPolicy(cmd, file, lex, stderr)
	if ok {
		for _, w := range p.Warnings {
			fmt.Fprintf(stderr, "whittle %s: warning: %s\n", cmd, w)
		}
	}
	return p, ok
}

// readPolicy is loadPolicy without printing the warnings, for a command
// that logs them.
func readPolicy(cmd, file string, lex *lexicon.Lexicon, stderr io.Writer) (*rewrite.Policy, bool) {
	if file == "" {
		return rewrite.DefaultPolicy(), true
	}
	p, err := rewrite.LoadPolicy(file, lex)
	if err != nil {
		fmt.Fprintf(stderr, "whittle %s: %s\n", cmd, renderPolicyError(err))
		return nil, false
	}
	return p, true
}

// renderPolicyError shows each policy error with its line and a caret.
func renderPolicyError(err error) string {
	var parts []string
	errs := []error{err}
	if j, ok := err.(interface{ Unwrap() []error }); ok {
		errs = j.Unwrap()
	}
	for _, e := range errs {
		var pe *rewrite.PolicyError
		if errors.As(e, &pe) {
			parts = append(parts, pe.Render())
		} else {
			parts = append(parts, e.Error())
		}
	}
	return strings.Join(parts, "\n\n")
}

// interruptible is the context of a long command: cancelled when the
// user interrupts it, so that it stops cleanly.
func interruptible() (context.Context, context.CancelFunc) {
	return signal.NotifyContext(context.Background(), os.Interrupt)
}

// interrupted reports whether err, the failure of a command run with
// ctx from interruptible, is the user's interrupt: the command reports
// it as "interrupted", not as Go's "context canceled".
func interrupted(ctx context.Context, err error) bool {
	return err != nil && (ctx.Err() != nil || errors.Is(err, context.Canceled))
}

// parseFlags parses a command's flags (anywhere among its arguments) and
// returns the other arguments. When the command should stop, ok is false
// and code is its exit status: 0 after -h, 2 for bad usage (want says how
// many other arguments the command takes, or -1 for any number).
func parseFlags(fs *flag.FlagSet, args []string, want int) (rest []string, code int, ok bool) {
	rest, err := parseInterspersed(fs, args)
	if err == flag.ErrHelp {
		return nil, 0, false
	}
	if err != nil || want >= 0 && len(rest) != want {
		if err == nil {
			fs.Usage()
		}
		return nil, 2, false
	}
	return rest, 0, true
}

// writeFile creates file and writes it with write, buffered; a failed
// write or close is returned.
func writeFile(file string, write func(io.Writer) error) error {
	f, err := os.Create(file)
	if err != nil {
		return err
	}
	w := bufio.NewWriter(f)
	if err := write(w); err != nil {
		f.Close()
		return err
	}
	if err := w.Flush(); err != nil {
		f.Close()
		return err
	}
	return f.Close()
}

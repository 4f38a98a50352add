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
// many other arguments the command takes, or -1 for any number, for a
// command that checks them itself to say what they are).
func parseFlags(fs *flag.FlagSet, args []string, want int) (rest []string, code int, ok bool) {
	rest, code, ok = parseWith(fs, func() ([]string, error) { return parseInterspersed(fs, args) })
	if !ok || want < 0 || len(rest) == want {
		return rest, code, ok
	}
	if want == 0 {
		return nil, usageError(fs, "takes no arguments, only flags; %q is not one", rest[0]), false
	}
	return nil, usageError(fs, "takes %d arguments, not %d", want, len(rest)), false
}

// parseWith runs parse, which parses fs's flags and returns the other
// arguments. On -h it writes the usage, the one time the whole of it is
// shown, and code is 0; on a bad flag it reports the flag package's
// error on one line with a hint, instead of the usage, and code is 2.
func parseWith(fs *flag.FlagSet, parse func() ([]string, error)) (rest []string, code int, ok bool) {
	usage, out := fs.Usage, fs.Output()
	fs.Usage = func() {}
	fs.SetOutput(io.Discard)
	rest, err := parse()
	fs.Usage = usage
	fs.SetOutput(out)
	switch {
	case err == flag.ErrHelp:
		fs.Usage()
		return nil, 0, false
	case err != nil:
		return nil, usageError(fs, "%v (run \"whittle %s -h\" for the flags)", err, fs.Name()), false
	}
	return rest, 0, true
}

// usageError reports bad usage of fs's command on one line of its
// output, and returns the exit status of bad usage, 2.
func usageError(fs *flag.FlagSet, format string, a ...any) int {
	fmt.Fprintf(fs.Output(), "whittle %s: %s\n", fs.Name(), fmt.Sprintf(format, a...))
	return 2
}

// need is what a flag's value must be: ok says whether it is, want what
// it must be ("at least 1").
type need struct {
	flag string
	ok   bool
	want string
}

// checkNeeds reports the first flag of fs whose value is not what it
// must be, naming the flag, what it must be and the value given, and
// returns false; it returns true when every value is as it must be.
func checkNeeds(fs *flag.FlagSet, needs ...need) bool {
	for _, n := range needs {
		if !n.ok {
			usageError(fs, "%s must be %s, not %s", flagName(n.flag), n.want, fs.Lookup(n.flag).Value)
			return false
		}
	}
	return true
}

// atLeast is the need of an integer flag's value v to be at least min.
func atLeast(flag string, v, min int) need {
	return need{flag, v >= min, fmt.Sprintf("at least %d", min)}
}

// flagName is how a flag is written: -k, --budget.
func flagName(name string) string {
	if len(name) == 1 {
		return "-" + name
	}
	return "--" + name
}

// given reports whether a flag of fs was given on the command line, and,
// for a switch, given true.
func given(fs *flag.FlagSet, name string) bool {
	set := false
	fs.Visit(func(f *flag.Flag) {
		if f.Name == name {
			b, isBool := f.Value.(interface{ IsBoolFlag() bool })
			set = !isBool || !b.IsBoolFlag() || f.Value.String() == "true"
		}
	})
	return set
}

// apart reports, and returns false, when both flags a and b of fs are
// given, which the command cannot do at once.
func apart(fs *flag.FlagSet, a, b string) bool {
	if given(fs, a) && given(fs, b) {
		usageError(fs, "%s and %s cannot be used together", flagName(a), flagName(b))
		return false
	}
	return true
}

// onlyWith reports, and returns false, when flag name is given without
// the flag with, the one it only applies with, or with it set to false.
func onlyWith(fs *flag.FlagSet, name, with string) bool {
	if given(fs, name) && (!given(fs, with) || isFalse(fs, with)) {
		usageError(fs, "%s only applies with %s", flagName(name), flagName(with))
		return false
	}
	return true
}

// isFalse reports whether name is a boolean flag set to false, as
// --baseline=false is: given, but asking for nothing.
func isFalse(fs *flag.FlagSet, name string) bool {
	f := fs.Lookup(name)
	b, ok := f.Value.(interface{ IsBoolFlag() bool })
	return ok && b.IsBoolFlag() && f.Value.String() == "false"
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

// finish flushes out and returns status, or 1 with the error on stderr
// when the output could not be written (a full disk, a closed pipe): a
// command's exit status says whether its output is all there.
func finish(out *bufio.Writer, stderr io.Writer, cmd string, status int) int {
	if err := out.Flush(); err != nil {
		fmt.Fprintf(stderr, "whittle %s: writing the output: %v\n", cmd, err)
		return 1
	}
	return status
}

package main

import (
	"bufio"
	"bytes"
	"encoding/json"
	"errors"
	"os"
	"path/filepath"
	"regexp"
	"slices"
	"strings"
	"testing"
)

func runCLI(stdin string, args ...string) (int, string, string) {
	var out, errOut bytes.Buffer
	code := run(args, strings.NewReader(stdin), &out, &errOut)
	return code, out.String(), errOut.String()
}

func TestExitCodes(t *testing.T) {
	for _, tc := range []struct {
		name   string
		args   []string
		stdin  string
		want   int
		err    string // what stderr must say; with exit 2, on one line and without the usage
		reason string
	}{
		{"parsed", []string{"explain", "85 lens"}, "", 0, "", "a query that parses exits 0"},
		{"error in input", []string{"explain", "1/0 lens"}, "", 1, "", "a positioned error exits 1"},
		{"empty query", []string{"explain", ""}, "", 1, "", "an empty query is an error in input"},
		{"no command", nil, "", 2, "", "usage"},
		{"unknown command", []string{"frobnicate"}, "", 2, `unknown command "frobnicate"`, "one line, not the whole usage"},
		{"misspelt command", []string{"serch"}, "", 2, `did you mean "search"?`, "the nearest command by spelling"},
		{"misspelt subcommand", []string{"policy", "shwo"}, "", 2, `did you mean "show"?`, "the same for policy's subcommands"},
		{"no query", []string{"explain"}, "", 2, "whittle explain: give a query", "explain needs a query"},
		{"bad flag", []string{"explain", "--nope", "x"}, "", 2, "flag provided but not defined: -nope", "unknown flag"},
		{"bad category", []string{"explain", "--category", "toys", "x"}, "", 2, "unknown category \"toys\"", "category must be known"},
		{"bad colour", []string{"explain", "--colour", "pink", "x"}, "", 2, "--colour must be auto, always or never, not \"pink\"", "colour must be auto, always or never"},
		{"currency not in ISO 4217", []string{"explain", "--currency", "XYZ", "$5 shoe"}, "", 2, "", "ISO 4217 assigns no XYZ (from memory): a usage error, not USD silently"},
		{"currency not a dollar", []string{"explain", "--currency", "EUR", "$5 shoe"}, "", 2, "", "ISO 4217's EUR is the euro, which no bare \"$\" means"},
		{"currency in lower case", []string{"explain", "--currency", "usd", "$5 shoe"}, "", 0, "", "lower case is accepted, as README says"},
		{"bad lexicon dir", []string{"explain", "--lexicon", "/no/such/dir", "x"}, "", 2, "", "lexicon directory must exist"},
		{"demo too small", []string{"demo", "--products", "5"}, "", 2, "whittle demo: --products must be at least 100, not 5", "the demo catalog has a smallest size"},
		{"bench too small", []string{"bench", "--products", "5"}, "", 2, "whittle bench: --products must be at least 100, not 5", "the benchmark catalog has a smallest size"},
		{"help", []string{"help"}, "", 0, "", "help is not an error"},
		{"explain help", []string{"explain", "-h"}, "", 0, "", "help is not an error"},
		{"help on a command", []string{"help", "search"}, "", 0, "", "help COMMAND is COMMAND -h"},
		{"serve with no deadline", []string{"serve", "--deadline", "0s"}, "", 2, "whittle serve: --deadline must be more than 0, not 0s", "a request must have some time; 0 is not the default in disguise"},
		{"serve with a negative body limit", []string{"serve", "--max-body", "-1"}, "", 2, "whittle serve: --max-body must be more than 0, not -1", "a body limit below 1 byte is refused"},
		{"serve with a negative write timeout", []string{"serve", "--write-timeout", "-1s"}, "", 2, "whittle serve: --write-timeout must be 0 or more, not -1s", "0 means the deadline and 5 s; below it is refused"},
		{"search with a negative k", []string{"search", "-k", "-1", "x"}, "", 2, "whittle search: -k must be 0 or more, not -1", "0 hits shows the counts alone, as the service's hits 0; below it is nothing"},
		{"search with no budget", []string{"search", "--budget", "0", "x"}, "", 2, "whittle search: --budget must be at least 1, not 0", "a rescue of no engine count cannot even count the query"},
		{"search with a chance over 1", []string{"search", "--explore", "1.5", "x"}, "", 2, "whittle search: --explore must be a chance from 0 to 1, not 1.5", "a chance is from 0 to 1"},
		{"search with a query unquoted", []string{"search", "red", "jacket"}, "", 2, `takes one query; quote a query of several words: whittle search "red jacket"`, "two words are two queries to the shell; searching only the first would be silently wrong"},
		{"search with no query", []string{"search"}, "", 2, "whittle search: give the QUERY", "there is nothing to search for"},
		{"search with a seed and no exploring", []string{"search", "--seed", "3", "x"}, "", 2, "whittle search: --seed only applies with --explore", "the seed seeds the explore draw alone: ignoring it would hide a forgotten --explore"},
		{"search with a session and no log", []string{"search", "--session", "s1", "x"}, "", 2, "whittle search: --session only applies with --signals", "the session is written to the signals log alone"},
		{"search with a bad k", []string{"search", "-k", "ten", "x"}, "", 2, `invalid value "ten" for flag -k`, "a value that is no number names the flag, with a hint, not the usage"},
		{"replay with no workers", []string{"replay", "--log", "x", "--workers", "0"}, "", 2, "whittle replay: --workers must be at least 1, not 0", "no worker replays nothing"},
		{"replay with no budget", []string{"replay", "--log", "x", "--budget", "0"}, "", 2, "whittle replay: --budget must be at least 1, not 0", "as search"},
		{"replay as JSON and CSV", []string{"replay", "--log", "x", "--json", "--csv"}, "", 2, "whittle replay: --json and --csv cannot be used together", "both write to standard output, one format at a time"},
		{"replay with no log", []string{"replay"}, "", 2, "whittle replay: --log FILE is required", "there is nothing to replay"},
		{"replay with an argument", []string{"replay", "--log", "x", "rain jacket"}, "", 2, `whittle replay: takes no arguments, only flags; "rain jacket" is not one`, "the queries come from the log"},
		{"tune with a negative alias support", []string{"tune", "--signals", "x", "--min-alias", "-1"}, "", 2, "whittle tune: --min-alias must be at least 1, not -1", "an alias no session backs is no evidence"},
		{"tune with no log", []string{"tune"}, "", 2, "whittle tune: --signals FILE is required", "there is nothing to learn from"},
		{"bench with no replay", []string{"bench", "--replay", "0"}, "", 2, "whittle bench: --replay must be at least 1, not 0", "a log of no lines times nothing"},
		{"bench with no signals", []string{"bench", "--signals", "0"}, "", 2, "whittle bench: --signals must be at least 1, not 0", "a log of no events times nothing"},
		{"serve with no budget", []string{"serve", "--budget", "0"}, "", 2, "whittle serve: --budget must be at least 1, not 0", "as search"},
		{"serve with no hits", []string{"serve", "--max-hits", "0"}, "", 2, "whittle serve: --max-hits must be more than 0, not 0", "a rescue that may show nothing is no service"},
		{"demo with an argument", []string{"demo", "lens"}, "", 2, `whittle demo: takes no arguments, only flags; "lens" is not one`, "the tour has its own queries"},
		{"explain with a bad flag value", []string{"explain", "--imperial=maybe", "x"}, "", 2, `invalid boolean value "maybe" for -imperial`, "the flag package's error, on one line with a hint"},
		{"help on help", []string{"help", "help"}, "", 0, "", "the usage, not a loop"},
		{"help on no command", []string{"help", "frobnicate"}, "", 2, "", "an unknown command is refused, help or not"},
		{"stdin ok", []string{"explain", "-"}, "85 lens\n2x6 12 ft\n", 0, "", "every line parses"},
		{"stdin with an error", []string{"explain", "-"}, "85 lens\n\n", 1, "", "an empty line is an empty query"},
		{"stdin among queries", []string{"explain", "red shoe", "-"}, "85 lens\n", 2, "", "- means standard input only as the one argument"},
		{"flag after stdin", []string{"explain", "-", "--json"}, "85 lens\n", 2, "", "flags come before -; after it they would be read as queries"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			code, _, stderr := runCLI(tc.stdin, tc.args...)
			if code != tc.want {
				t.Errorf("exit %d, want %d (%s); stderr: %s", code, tc.want, tc.reason, stderr)
			}
			if tc.err == "" {
				return
			}
			if !strings.Contains(stderr, tc.err) {
				t.Errorf("stderr %q lacks %q (%s)", stderr, tc.err, tc.reason)
			}
			if code == 2 && (strings.Count(stderr, "\n") != 1 || strings.Contains(stderr, "usage:")) {
				t.Errorf("stderr %q: want one line, without the usage (%s)", stderr, tc.reason)
			}
		})
	}
}

// With --json and "-", each input line gives one JSON object, in order,
// with the keys of the documented contract.
func TestJSONLines(t *testing.T) {
	code, out, _ := runCLI("85 lens\nunder €35\n\n", "explain", "--json", "-")
	if code != 1 {
		t.Errorf("exit %d, want 1 for the empty line", code)
	}
	sc := bufio.NewScanner(strings.NewReader(out))
	var queries []string
	for sc.Scan() {
		var obj map[string]json.RawMessage
		if err := json.Unmarshal(sc.Bytes(), &obj); err != nil {
			t.Fatalf("line %q is not JSON: %v", sc.Text(), err)
		}
		for _, k := range []string{"query", "category", "constraints", "unrecognised", "errors"} {
			if _, ok := obj[k]; !ok {
				t.Errorf("line %q lacks %q", sc.Text(), k)
			}
		}
		var q string
		json.Unmarshal(obj["query"], &q)
		queries = append(queries, q)
	}
	if strings.Join(queries, "|") != "85 lens|under €35|" {
		t.Errorf("queries out of order or missing: %q", queries)
	}
}

func TestTableOutput(t *testing.T) {
	code, out, _ := runCLI("", "explain", "--colour", "never", "85 lens")
	if code != 0 {
		t.Fatalf("exit %d", code)
	}
	for _, want := range []string{"query     85 lens", "spans     1─ 2───", "category  camera", "85 mm (inferred)", "focal_length"} {
		if !strings.Contains(out, want) {
			t.Errorf("output lacks %q:\n%s", want, out)
		}
	}
	if strings.Contains(out, "\x1b[") {
		t.Error("colour codes with --colour never")
	}
	_, out, _ = runCLI("", "explain", "--colour", "always", "85 lens")
	if !strings.Contains(out, "\x1b[") {
		t.Error("no colour codes with --colour always")
	}
}

func TestFlagsReachTheParser(t *testing.T) {
	_, out, _ := runCLI("", "explain", "--json", "--currency", "cad", "under $50")
	if !strings.Contains(out, `"currency":"CAD"`) {
		t.Errorf("--currency cad not applied: %s", out)
	}
	// A code outside the dollar currencies is refused in one line that
	// lists the accepted ISO 4217 codes.
	if code, out, stderr := runCLI("", "explain", "--json", "--currency", "EUR", "$5 shoe"); code != 2 || out != "" ||
		strings.Count(stderr, "\n") != 1 || !strings.Contains(stderr, "AUD, CAD, HKD, MXN, NZD, SGD, USD") {
		t.Errorf("--currency EUR: exit %d, stdout %q, stderr %q; want 2, nothing, one line listing the codes", code, out, stderr)
	}
	_, out, _ = runCLI("", "explain", "--json", "--imperial", "5 gal")
	if !strings.Contains(out, `"base_amount":22730.45`) {
		t.Errorf("--imperial not applied (5 imperial gallons = 22730.45 ml): %s", out)
	}
	_, out, _ = runCLI("", "explain", "--json", "--category", "apparel", "85 lens")
	if !strings.Contains(out, `"category":"apparel"`) {
		t.Errorf("--category not applied: %s", out)
	}
}

// commands are the commands with flags, as their -h is asked for.
var commands = [][]string{
	{"explain"}, {"colour"}, {"policy", "show"}, {"policy", "check"}, {"index"}, {"search"},
	{"replay"}, {"tune"}, {"serve"}, {"bench"}, {"eval"}, {"demo"},
}

// synopsis is the usage of args -h up to its first blank line, one
// line a line with the spaces collapsed, and the names of the flags it
// lists below.
func synopsis(t *testing.T, args []string) (lines, flags []string) {
	t.Helper()
	code, out, stderr := runCLI("", append(args, "-h")...)
	if code != 0 {
		t.Fatalf("%s -h: exit %d", strings.Join(args, " "), code)
	}
	help := out + stderr
	head, _, _ := strings.Cut(help, "\n\n")
	for _, l := range strings.Split(strings.TrimPrefix(head, "usage:"), "\n") {
		if l = strings.Join(strings.Fields(l), " "); l != "" {
			lines = append(lines, l)
		}
	}
	for _, m := range regexp.MustCompile(`(?m)^  -(\S+)`).FindAllStringSubmatch(help, -1) {
		flags = append(flags, m[1])
	}
	return lines, flags
}

// Each command's usage lines name every flag it has, so that a flag
// added below is not left out of the line above.
func TestUsageNamesEveryFlag(t *testing.T) {
	for _, args := range commands {
		lines, flags := synopsis(t, args)
		text := strings.Join(lines, "\n")
		for _, f := range flags {
			if !regexp.MustCompile(`(^|[ \[])--?` + regexp.QuoteMeta(f) + `([ \]=]|$)`).MatchString(text) {
				t.Errorf("%s -h: the usage lines do not name -%s:\n%s", strings.Join(args, " "), f, text)
			}
		}
	}
}

// README's synopsis of a command is its -h's usage lines, spaces aside.
func TestReadmeSynopses(t *testing.T) {
	b, err := os.ReadFile(filepath.Join("..", "..", "README.md"))
	if err != nil {
		t.Fatal(err)
	}
	var fenced []string
	in := false
	for _, l := range strings.Split(string(b), "\n") {
		if strings.HasPrefix(l, "```") {
			in = !in
			continue
		}
		if in {
			fenced = append(fenced, strings.Join(strings.Fields(l), " "))
		}
	}
	for _, args := range commands {
		if args[0] == "demo" || args[0] == "bench" || slices.Equal(args, []string{"policy", "check"}) {
			continue // README gives them no synopsis; policy's is that of policy show -h, of both subcommands
		}
		lines, _ := synopsis(t, args)
		found := false
		for i := range fenced {
			if len(fenced)-i >= len(lines) && slices.Equal(fenced[i:i+len(lines)], lines) {
				found = true
				break
			}
		}
		if !found {
			t.Errorf("README has no synopsis of %s that is its -h's:\n%s", strings.Join(args, " "), strings.Join(lines, "\n"))
		}
	}
}

// A byte order mark before the first line of standard input (U+FEFF, as
// some editors and spreadsheets save text) is no part of the query.
func TestStdinByteOrderMark(t *testing.T) {
	code, out, stderr := runCLI("\ufeff85 lens\n", "explain", "--json", "-")
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	var got struct {
		Query string `json:"query"`
	}
	if err := json.Unmarshal([]byte(out), &got); err != nil || got.Query != "85 lens" {
		t.Errorf("query = %q (%v), want \"85 lens\"", got.Query, err)
	}
}

// fullDisk is a standard output that takes nothing.
type fullDisk struct{}

func (fullDisk) Write([]byte) (int, error) { return 0, errors.New("no space left on device") }

// A command whose output could not be written does not exit 0: its exit
// status says whether the output is all there.
func TestOutputThatCannotBeWritten(t *testing.T) {
	var stderr bytes.Buffer
	code := run([]string{"explain", "85 lens"}, strings.NewReader(""), fullDisk{}, &stderr)
	if code != 1 || !strings.Contains(stderr.String(), "whittle explain: writing the output: no space left on device") {
		t.Errorf("exit %d, stderr %q; want 1 and the write error", code, stderr.String())
	}
}

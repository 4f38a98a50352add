package main

import (
	"bufio"
	"bytes"
	"encoding/json"
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
		reason string
	}{
		{"parsed", []string{"explain", "85 lens"}, "", 0, "a query that parses exits 0"},
		{"error in input", []string{"explain", "1/0 lens"}, "", 1, "a positioned error exits 1"},
		{"empty query", []string{"explain", ""}, "", 1, "an empty query is an error in input"},
		{"no command", nil, "", 2, "usage"},
		{"unknown command", []string{"frobnicate"}, "", 2, "usage"},
		{"no query", []string{"explain"}, "", 2, "explain needs a query"},
		{"bad flag", []string{"explain", "--nope", "x"}, "", 2, "unknown flag"},
		{"bad category", []string{"explain", "--category", "toys", "x"}, "", 2, "category must be known"},
		{"bad colour", []string{"explain", "--colour", "pink", "x"}, "", 2, "colour must be auto, always or never"},
		{"currency not in ISO 4217", []string{"explain", "--currency", "XYZ", "$5 shoe"}, "", 2, "ISO 4217 assigns no XYZ (from memory): a usage error, not USD silently"},
		{"currency not a dollar", []string{"explain", "--currency", "EUR", "$5 shoe"}, "", 2, "ISO 4217's EUR is the euro, which no bare \"$\" means"},
		{"currency in lower case", []string{"explain", "--currency", "usd", "$5 shoe"}, "", 0, "lower case is accepted, as README says"},
		{"bad lexicon dir", []string{"explain", "--lexicon", "/no/such/dir", "x"}, "", 2, "lexicon directory must exist"},
		{"demo too small", []string{"demo", "--products", "5"}, "", 2, "the demo catalog has a smallest size"},
		{"bench too small", []string{"bench", "--products", "5"}, "", 2, "the benchmark catalog has a smallest size"},
		{"help", []string{"help"}, "", 0, "help is not an error"},
		{"explain help", []string{"explain", "-h"}, "", 0, "help is not an error"},
		{"help on a command", []string{"help", "search"}, "", 0, "help COMMAND is COMMAND -h"},
		{"serve with no deadline", []string{"serve", "--deadline", "0s"}, "", 2, "a request must have some time; 0 is not the default in disguise"},
		{"serve with a negative body limit", []string{"serve", "--max-body", "-1"}, "", 2, "a body limit below 1 byte is refused"},
		{"serve with a negative write timeout", []string{"serve", "--write-timeout", "-1s"}, "", 2, "0 means the deadline and 5 s; below it is refused"},
		{"help on help", []string{"help", "help"}, "", 0, "the usage, not a loop"},
		{"help on no command", []string{"help", "frobnicate"}, "", 2, "an unknown command is refused, help or not"},
		{"stdin ok", []string{"explain", "-"}, "85 lens\n2x6 12 ft\n", 0, "every line parses"},
		{"stdin with an error", []string{"explain", "-"}, "85 lens\n\n", 1, "an empty line is an empty query"},
		{"stdin among queries", []string{"explain", "red shoe", "-"}, "85 lens\n", 2, "- means standard input only as the one argument"},
		{"flag after stdin", []string{"explain", "-", "--json"}, "85 lens\n", 2, "flags come before -; after it they would be read as queries"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			if code, _, stderr := runCLI(tc.stdin, tc.args...); code != tc.want {
				t.Errorf("exit %d, want %d (%s); stderr: %s", code, tc.want, tc.reason, stderr)
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

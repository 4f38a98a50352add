package main

import (
	"bufio"
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

func TestEvalUsage(t *testing.T) {
	bad := filepath.Join(t.TempDir(), "bad.toml")
	if err := os.WriteFile(bad, []byte("[defaults]\nmin_result = 1\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	for _, tc := range []struct {
		name   string
		args   []string
		want   int
		stderr string
		reason string
	}{
		{"help", []string{"eval", "-h"}, 0, "--queries", "help is not an error, and lists the flags"},
		{"too few products", []string{"eval", "--products", "5"}, 2, "--products must be at least", "the demo catalog has a smallest size"},
		{"no queries", []string{"eval", "--queries", "0"}, 2, "--queries must be at least 1", "a set of no queries measures nothing"},
		{"no hits", []string{"eval", "--hits", "0"}, 2, "--hits must be at least 1", "a top 0 holds nothing"},
		{"bad seed", []string{"eval", "--seed", "-1"}, 2, "invalid value", "a seed is a whole number from 0"},
		{"bad policy", []string{"eval", "--policy", bad}, 2, "did you mean", "a policy with an unknown key is refused, with the nearest key"},
		{"bad style", []string{"eval", "--style", "medium"}, 2, "--style is short, long or both", "there are two styles, and both"},
		{"help names the styles", []string{"eval", "-h"}, 0, "--style short|long|both", "the usage line lists the style flag"},
		{"stray argument", []string{"eval", "lens"}, 2, `whittle eval: takes no arguments, only flags; "lens" is not one`, "eval takes no query"},
		{"json and cases", []string{"eval", "--json", "--cases"}, 2, "whittle eval: --json and --cases cannot be used together",
			"the usage shows them apart: --cases evaluates nothing, so there is no report to write as JSON"},
		{"cases alone", []string{"eval", "--cases", "--json=false", "--products", "300", "--queries", "1", "--style", "short"}, 0, "",
			"--json=false is not --json, so --cases stands alone"},
		{"bad fallback", []string{"eval", "--fallback", "trailing"}, 2, `unknown fallback "trailing": want most-words or drop-trailing`, "there are two fallbacks, named in full"},
		{"help names the fallbacks", []string{"eval", "-h"}, 0, "--fallback most-words|drop-trailing", "the usage line lists the fallback flag"},
		{"unknown flag", []string{"eval", "--nope"}, 2, `flag provided but not defined: -nope (run "whittle eval -h" for the flags)`, "unknown flags are refused, with a hint, not the usage"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			code, _, stderr := runCLI("", tc.args...)
			if code != tc.want || !strings.Contains(stderr, tc.stderr) {
				t.Errorf("%s: exit %d, want %d; stderr lacks %q:\n%s", tc.reason, code, tc.want, tc.stderr, stderr)
			}
		})
	}
}

// A small run prints both engines' figures and the goals with a verdict,
// for each style by default, and the goals of both side by side.
func TestEvalText(t *testing.T) {
	code, out, stderr := runCLI("", "eval", "--products", "300", "--queries", "20", "--dir", t.TempDir())
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	for _, want := range []string{"20 short queries on 300 products (seed 1)", "20 long queries on 300 products (seed 1)",
		"rescue rate (some hits)", "attribute precision vs baseline", "failure", "goals by style, against most-words:", "short (20 queries)  long (20 queries)"} {
		if !strings.Contains(out, want) {
			t.Errorf("output lacks %q:\n%s", want, out)
		}
	}
	if !strings.Contains(out, " met") {
		t.Errorf("no goal says met or not met:\n%s", out)
	}
	if !strings.Contains(out, "baseline: most-words, a blind partial match that keeps the most") {
		t.Errorf("the report does not name its baseline:\n%s", out)
	}
	code, out, stderr = runCLI("", "eval", "--products", "300", "--queries", "20", "--style", "short", "--fallback", "drop-trailing", "--dir", t.TempDir())
	if code != 0 || !strings.Contains(out, "baseline: drop-trailing, a blind partial match that drops words from the end") {
		t.Errorf("--fallback drop-trailing: exit %d, %s\n%s", code, stderr, out)
	}
}

// --json writes one object a style, one a line, each with both engines'
// figures and the goals.
func TestEvalJSON(t *testing.T) {
	for _, tc := range []struct {
		name, style, reason string
		want                []string
	}{
		{name: "both", style: "both", want: []string{"short", "long"}, reason: "both styles, short first"},
		{name: "long", style: "long", want: []string{"long"}, reason: "one style, one object"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			code, out, stderr := runCLI("", "eval", "--products", "300", "--queries", "10", "--json", "--style", tc.style, "--dir", t.TempDir())
			if code != 0 {
				t.Fatalf("exit %d: %s", code, stderr)
			}
			var styles []string
			for _, line := range strings.Split(strings.TrimSpace(out), "\n") {
				var rep map[string]json.RawMessage
				if err := json.Unmarshal([]byte(line), &rep); err != nil {
					t.Fatalf("not JSON: %v\n%s", err, line)
				}
				for _, k := range []string{"whittle", "baseline", "by_failure", "goals", "losses"} {
					if _, ok := rep[k]; !ok {
						t.Errorf("the report lacks %q", k)
					}
				}
				var s string
				json.Unmarshal(rep["style"], &s)
				styles = append(styles, s)
			}
			if strings.Join(styles, " ") != strings.Join(tc.want, " ") {
				t.Errorf("%s: styles %v, want %v", tc.reason, styles, tc.want)
			}
		})
	}
}

// --cases writes the labelled sets, one case a line, and the same seed
// writes the same sets: 10 short cases, then 10 long ones.
func TestEvalCases(t *testing.T) {
	_, a, _ := runCLI("", "eval", "--products", "300", "--queries", "10", "--cases")
	_, b, _ := runCLI("", "eval", "--products", "300", "--queries", "10", "--cases")
	if a != b {
		t.Error("the same seed wrote two sets")
	}
	sc := bufio.NewScanner(strings.NewReader(a))
	n := 0
	for sc.Scan() {
		var c struct {
			Query, Product, Failure, Style string
		}
		if err := json.Unmarshal(sc.Bytes(), &c); err != nil || c.Query == "" || c.Product == "" || c.Failure == "" {
			t.Errorf("line %q: %v", sc.Text(), err)
		}
		if want := map[bool]string{true: "short", false: "long"}[n < 10]; c.Style != want {
			t.Errorf("case %d is %q, want %q: the short set comes first", n, c.Style, want)
		}
		n++
	}
	if n != 20 {
		t.Errorf("%d cases, want 20", n)
	}
}

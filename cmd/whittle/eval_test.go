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
		{"stray argument", []string{"eval", "lens"}, 2, "usage: whittle eval", "eval takes no query"},
		{"unknown flag", []string{"eval", "--nope"}, 2, "flag provided but not defined", "unknown flags are refused"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			code, _, stderr := runCLI("", tc.args...)
			if code != tc.want || !strings.Contains(stderr, tc.stderr) {
				t.Errorf("%s: exit %d, want %d; stderr lacks %q:\n%s", tc.reason, code, tc.want, tc.stderr, stderr)
			}
		})
	}
}

// A small run prints both engines' figures and the goals with a verdict.
func TestEvalText(t *testing.T) {
	code, out, stderr := runCLI("", "eval", "--products", "300", "--queries", "20", "--dir", t.TempDir())
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	for _, want := range []string{"20 queries on 300 products (seed 1)", "rescue rate (some hits)", "attribute precision vs baseline", "failure"} {
		if !strings.Contains(out, want) {
			t.Errorf("output lacks %q:\n%s", want, out)
		}
	}
	if !strings.Contains(out, " met") {
		t.Errorf("no goal says met or not met:\n%s", out)
	}
}

// --json writes one object with both engines' figures and the goals.
func TestEvalJSON(t *testing.T) {
	code, out, stderr := runCLI("", "eval", "--products", "300", "--queries", "10", "--json", "--dir", t.TempDir())
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	var rep map[string]json.RawMessage
	if err := json.Unmarshal([]byte(out), &rep); err != nil {
		t.Fatalf("not JSON: %v\n%s", err, out)
	}
	for _, k := range []string{"whittle", "baseline", "by_failure", "goals", "losses"} {
		if _, ok := rep[k]; !ok {
			t.Errorf("the report lacks %q", k)
		}
	}
}

// --cases writes the labelled set, one case a line, and the same seed
// writes the same set.
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
			Query, Product, Failure string
		}
		if err := json.Unmarshal(sc.Bytes(), &c); err != nil || c.Query == "" || c.Product == "" || c.Failure == "" {
			t.Errorf("line %q: %v", sc.Text(), err)
		}
		n++
	}
	if n != 10 {
		t.Errorf("%d cases, want 10", n)
	}
}

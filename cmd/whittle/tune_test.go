package main

import (
	"encoding/json"
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
)

// tuneLog writes an invented signals log for the test shop: 30 exact
// searches for "rain jacket size m" whose first product is clicked,
// and 30 that dropped the size, where nothing is.
func tuneLog(t *testing.T, extra string) string {
	t.Helper()
	at := time.Date(2026, 11, 2, 9, 0, 0, 0, time.UTC)
	var b strings.Builder
	for i := range 60 {
		s := fmt.Sprintf("s%02d", i)
		when := at.Add(time.Duration(i) * time.Hour).Format(time.RFC3339)
		relax := ""
		if i%2 == 1 {
			relax = `, "relaxations": [{"op": "drop", "kind": "size", "text": "size m"}]`
		}
		fmt.Fprintf(&b, `{"type": "search", "session": %q, "time": %q, "query": "rain jacket size m", "category": "apparel"%s, "shown": ["RJ-1", "RJ-2", "RJ-3"]}`+"\n", s, when, relax)
		if i%2 == 0 {
			fmt.Fprintf(&b, `{"type": "click", "session": %q, "time": %q, "product": "RJ-1"}`+"\n", s, when)
		}
	}
	b.WriteString(extra)
	file := filepath.Join(t.TempDir(), "signals.jsonl")
	if err := os.WriteFile(file, []byte(b.String()), 0o644); err != nil {
		t.Fatal(err)
	}
	return file
}

// tunePolicy is the policy in force for the test: apparel's size soft,
// and few searches needed.
const tunePolicy = "[category.apparel.strictness]\nsize = \"soft\"\n\n[signals]\nmin_searches = 10\n"

func TestTune(t *testing.T) {
	idx := filepath.Join(t.TempDir(), "idx")
	if code, _, stderr := runCLI("", "index", "--catalog", shopCatalog, "--index", idx); code != 0 {
		t.Fatal(stderr)
	}
	dir := t.TempDir()
	pol := filepath.Join(dir, "shop.toml")
	os.WriteFile(pol, []byte(tunePolicy), 0o644)
	log := tuneLog(t, "")
	proposed, page := filepath.Join(dir, "proposed.toml"), filepath.Join(dir, "tune.html")

	code, out, stderr := runCLI("", "tune", "--signals", log, "--index", idx, "--policy", pol, "--propose", proposed, "--html", page)
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	for _, want := range []string{"[category.apparel.strictness]\n  - size = \"soft\"\n  + size = \"hard\"", "60 searches", "Signals cover only what whittle showed"} {
		if !strings.Contains(out, want) {
			t.Errorf("report lacks %q:\n%s", want, out)
		}
	}
	// The proposal is a policy file that reads back; the policy in force
	// is left as it was.
	p, err := rewrite.LoadPolicy(proposed, lexicon.Default())
	if err != nil {
		t.Fatal(err)
	}
	if got := p.For("apparel", "", lexicon.Default()).Strictness[parser.KindSize]; got != parser.Hard {
		t.Errorf("proposed apparel size %s, want hard", got)
	}
	if b, _ := os.ReadFile(pol); string(b) != tunePolicy {
		t.Errorf("the policy in force was changed:\n%s", b)
	}
	if b, err := os.ReadFile(page); err != nil || !strings.Contains(string(b), "<svg") || strings.Contains(string(b), "src=") {
		t.Errorf("HTML report: %v", err)
	}

	code, out, _ = runCLI("", "tune", "--signals", log, "--index", idx, "--policy", pol, "--json")
	var rep struct {
		Changes []struct{ Key, From, To string }
		Diff    string
		Policy  string `json:"proposed_policy"`
	}
	if err := json.Unmarshal([]byte(out), &rep); code != 0 || err != nil {
		t.Fatalf("--json: exit %d, %v\n%s", code, err, out)
	}
	if len(rep.Changes) != 1 || rep.Changes[0].Key != "category.apparel.strictness.size" || !strings.Contains(rep.Policy, `size = "hard"`) {
		t.Errorf("--json: %+v", rep)
	}
}

func TestTuneErrors(t *testing.T) {
	idx := filepath.Join(t.TempDir(), "idx")
	if code, _, stderr := runCLI("", "index", "--catalog", shopCatalog, "--index", idx); code != 0 {
		t.Fatal(stderr)
	}
	bad := tuneLog(t, "{\"type\": \"search\", \"session\": \"x\"}\nnot json\n")
	for _, tc := range []struct {
		name   string
		args   []string
		code   int
		want   string
		reason string
	}{
		{"no signals", []string{"tune", "--index", idx}, 2, "whittle tune: --signals FILE is required", "--signals is required"},
		{"missing file", []string{"tune", "--signals", "no-such.jsonl", "--index", idx}, 1, "no-such.jsonl", "the file is named"},
		{"bad line", []string{"tune", "--signals", bad, "--index", idx}, 1, "line 91", "a malformed line stops the run with its line number"},
		{"skip bad", []string{"tune", "--signals", bad, "--index", idx, "--skip-bad"}, 0, "2 malformed lines were skipped", "--skip-bad skips and counts them"},
		{"no index", []string{"tune", "--signals", bad, "--index", filepath.Join(idx, "none")}, 1, "whittle tune:", "a missing index is an error, not a panic"},
		{"bad policy", []string{"tune", "--signals", bad, "--index", idx, "--policy", shopCatalog}, 2, "whittle tune", "a policy that is not TOML is refused"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			code, out, stderr := runCLI("", tc.args...)
			if code != tc.code || !strings.Contains(out+stderr, tc.want) {
				t.Errorf("exit %d, want %d with %q (%s)\nstdout %s\nstderr %s", code, tc.code, tc.want, tc.reason, out, stderr)
			}
		})
	}
}

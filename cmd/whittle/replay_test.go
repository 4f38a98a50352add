package main

import (
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

func TestReplay(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "idx")
	if code, out, stderr := runCLI("", "index", "--catalog", shopCatalog, "--index", dir); code != 0 {
		t.Fatalf("index: exit %d\n%s%s", code, out, stderr)
	}
	// On shop.jsonl (see rewrite/bleveengine's tests): the rain jacket
	// query finds 3; mustard widens to RJ-1; size 13 shoes find nothing.
	log := "rain jacket\n{\"query\": \"mustard rain jacket\", \"count\": 5}\ntrail running shoes size 13\n"
	code, out, stderr := runCLI(log, "replay", "--index", dir, "--log", "-", "--json")
	if code != 0 {
		t.Fatalf("replay: exit %d\n%s", code, stderr)
	}
	var rep struct {
		All       struct{ Queries, Searches int } `json:"all"`
		ZeroAfter struct{ Queries, Searches int } `json:"zero_after"`
		Rescued   struct{ Queries, Searches int } `json:"rescued"`
	}
	if err := json.Unmarshal([]byte(out), &rep); err != nil {
		t.Fatalf("%v\n%s", err, out)
	}
	if rep.All.Queries != 3 || rep.All.Searches != 7 || rep.ZeroAfter.Queries != 1 || rep.Rescued.Searches != 5 {
		t.Errorf("report %+v", rep)
	}
	html := filepath.Join(t.TempDir(), "r.html")
	logFile := filepath.Join(t.TempDir(), "log.txt")
	if err := os.WriteFile(logFile, []byte(log), 0o644); err != nil {
		t.Fatal(err)
	}
	code, out, _ = runCLI("", "replay", "--index", dir, "--log", logFile, "--csv", "--html", html, "--workers", "3")
	if code != 0 || strings.Count(out, "\n") != 4 || !strings.Contains(out, "widen colour mustard") {
		t.Errorf("csv: exit %d\n%s", code, out)
	}
	if b, err := os.ReadFile(html); err != nil || !strings.Contains(string(b), "<svg") {
		t.Errorf("html report: %v", err)
	}
	for _, tc := range []struct {
		name   string
		args   []string
		code   int
		want   string
		reason string
	}{
		{"no log", []string{"replay", "--index", dir}, 2, "whittle replay: --log FILE is required", "there is nothing to replay"},
		{"json and csv", []string{"replay", "--index", dir, "--log", logFile, "--json", "--csv"}, 2, "whittle replay: --json and --csv cannot be used together", "one format on standard output at a time"},
		{"no workers", []string{"replay", "--index", dir, "--log", logFile, "--workers", "0"}, 2, "whittle replay: --workers must be at least 1, not 0", "no worker replays nothing"},
		{"csv alone", []string{"replay", "--index", dir, "--log", logFile, "--json=false", "--csv"}, 0, "", "--json=false is not --json, so --csv stands alone"},
		{"missing log", []string{"replay", "--index", dir, "--log", filepath.Join(dir, "none")}, 1, "no such file", "the log must exist"},
		{"missing index", []string{"replay", "--index", filepath.Join(dir, "none"), "--log", logFile}, 1, "no index", "the index must exist"},
	} {
		code, _, stderr := runCLI("", tc.args...)
		if code != tc.code || !strings.Contains(stderr, tc.want) || code == 2 && strings.Count(stderr, "\n") != 1 {
			t.Errorf("%s (%s): exit %d, stderr %q; want %d and %q, on one line when 2", tc.name, tc.reason, code, stderr, tc.code, tc.want)
		}
	}
	if code, _, stderr := runCLI("{\"query\": 5}\n", "replay", "--index", dir, "--log", "-"); code != 1 || !strings.Contains(stderr, "line 1: query") {
		t.Errorf("a bad line: exit %d, %q", code, stderr)
	}
}

// A line with nothing to search for does not stop the replay: it is
// counted apart and left out of the rates. On shop.jsonl the rain jacket
// query finds 3 (rewrite/bleveengine's tests).
func TestReplayNothingToSearch(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "idx")
	if code, out, stderr := runCLI("", "index", "--catalog", shopCatalog, "--index", dir); code != 0 {
		t.Fatalf("index: exit %d\n%s%s", code, out, stderr)
	}
	log := "rain jacket\n!!!\n{\"query\": \"nice\", \"count\": 4}\n"
	for _, tc := range []struct {
		name, format, want, reason string
	}{
		{"text", "", "1 query, 1 search (2 queries, 5 searches with nothing to search for, not searched)", "!!! once and nice 4 times, apart from the one search made"},
		{"json", "--json", `"nothing_to_search": {`, "the report's tally"},
		{"csv", "--csv", "2,!!!,1,,,,,,,", "the row of !!! has its counts blank"},
	} {
		args := []string{"replay", "--index", dir, "--log", "-"}
		if tc.format != "" {
			args = append(args, tc.format)
		}
		code, out, stderr := runCLI(log, args...)
		if code != 0 || !strings.Contains(out, tc.want) {
			t.Errorf("%s (%s): exit %d, want %q in\n%s%s", tc.name, tc.reason, code, tc.want, out, stderr)
		}
	}
}

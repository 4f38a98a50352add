package main

import (
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

var shopCatalog = filepath.Join("..", "..", "testdata", "catalog", "shop.jsonl")

func TestIndexAndSearch(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "idx")
	code, out, stderr := runCLI("", "index", "--catalog", shopCatalog, "--index", dir)
	if code != 0 || !strings.Contains(out, "indexed 13 products") {
		t.Fatalf("index: exit %d\n%s%s", code, out, stderr)
	}
	// testdata/catalog/shop.jsonl: only RJ-1 (harvest gold) is near mustard.
	code, out, _ = runCLI("", "search", "--index", dir, "--json", "mustard rain jacket")
	if code != 0 {
		t.Fatalf("search: exit %d", code)
	}
	var rep struct {
		ExactCount int `json:"exact_count"`
		Chosen     struct {
			Relaxations []struct{ Op, Kind, Text string } `json:"relaxations"`
			Count       int                               `json:"count"`
		} `json:"chosen"`
		Message   string            `json:"message"`
		HardUnmet []json.RawMessage `json:"hard_unmet"`
		Hits      []struct{ ID, Title string }
	}
	if err := json.Unmarshal([]byte(out), &rep); err != nil {
		t.Fatalf("%v in %s", err, out)
	}
	if rep.ExactCount != 0 || rep.Chosen.Count != 1 || len(rep.Chosen.Relaxations) != 1 || rep.Chosen.Relaxations[0].Op != "widen" ||
		len(rep.Hits) != 1 || rep.Hits[0].ID != "RJ-1" || rep.HardUnmet == nil {
		t.Errorf("unexpected report %+v", rep)
	}
	// sweter is read as sweater: apparel, where l is a size; SW-1 is the
	// merino sweater in l (shop.jsonl).
	code, out, _ = runCLI("", "search", "--index", dir, "--json", "merino sweter l")
	var fixed struct {
		Corrected string `json:"corrected"`
		Chosen    struct {
			Relaxations []struct{ Op, Kind, Text string } `json:"relaxations"`
		} `json:"chosen"`
		Hits []struct{ ID string }
	}
	if err := json.Unmarshal([]byte(out), &fixed); code != 0 || err != nil {
		t.Fatalf("search: exit %d, %v in %s", code, err, out)
	}
	if fixed.Corrected != "merino sweater l" || len(fixed.Chosen.Relaxations) != 1 || fixed.Chosen.Relaxations[0].Op != "replace" ||
		fixed.Chosen.Relaxations[0].Text != "sweter" || len(fixed.Hits) != 1 || fixed.Hits[0].ID != "SW-1" {
		t.Errorf("a misspelt type: unexpected report %+v", fixed)
	}
	code, out, _ = runCLI("", "search", "--index", dir, "trail running shoes size 13")
	if code != 0 || !strings.Contains(out, "sizes carried: 7, 8, 9, 10, 11, 12") {
		t.Errorf("hard stop: exit %d\n%s", code, out)
	}
	code, out, _ = runCLI("", "search", "--index", dir, "rain jacket", "-k", "2")
	if code != 0 || !strings.Contains(out, "3 exact matches") || strings.Count(out, "RJ-") != 2 {
		t.Errorf("exact: exit %d\n%s", code, out)
	}
}

func TestIndexAndSearchErrors(t *testing.T) {
	dir := t.TempDir()
	bad := filepath.Join(dir, "bad.jsonl")
	os.WriteFile(bad, []byte("{\"id\": \"a\", \"title\": \"x\"}\n{\"id\": \"a\", \"title\": \"y\"}\n"), 0o644)
	for _, tc := range []struct {
		name   string
		args   []string
		want   int
		err    string
		reason string
	}{
		{"no catalog flag", []string{"index"}, 2, "usage", "the catalog is required"},
		{"missing catalog", []string{"index", "--catalog", filepath.Join(dir, "none.jsonl"), "--index", filepath.Join(dir, "i")}, 1, "no such file", "the file must exist"},
		{"duplicate id", []string{"index", "--catalog", bad, "--index", filepath.Join(dir, "i")}, 1, "line 2: id", "a duplicate id stops the run"},
		{"skip bad", []string{"index", "--catalog", bad, "--index", filepath.Join(dir, "i"), "--skip-bad"}, 0, "skipped", "--skip-bad reports and goes on"},
		{"no index", []string{"search", "--index", filepath.Join(dir, "missing"), "rug"}, 1, "no index", "search needs an index"},
		{"no query", []string{"search", "--index", dir}, 2, "usage", "a query is needed"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			code, _, stderr := runCLI("", tc.args...)
			if code != tc.want || !strings.Contains(stderr, tc.err) {
				t.Errorf("%s: exit %d (want %d), stderr %q", tc.reason, code, tc.want, stderr)
			}
		})
	}
}

func TestSearchBaseline(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "idx")
	if code, _, stderr := runCLI("", "index", "--catalog", shopCatalog, "--index", dir); code != 0 {
		t.Fatal(stderr)
	}
	// The blind match keeps "trail running shoes" and shows both shoes,
	// neither of which comes in 13 (shop.jsonl); whittle shows none.
	code, out, _ := runCLI("", "search", "--index", dir, "--json", "--baseline", "trail running shoes size 13")
	var rep struct {
		Hits     []json.RawMessage `json:"hits"`
		Baseline struct {
			Kept, Words, Count int
		} `json:"baseline"`
	}
	if err := json.Unmarshal([]byte(out), &rep); err != nil || code != 0 {
		t.Fatalf("%v %d %s", err, code, out)
	}
	if len(rep.Hits) != 0 || rep.Baseline.Count != 2 || rep.Baseline.Kept >= rep.Baseline.Words {
		t.Errorf("report %+v", rep)
	}
}

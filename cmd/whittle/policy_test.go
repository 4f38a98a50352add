package main

import (
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

func TestPolicyCommands(t *testing.T) {
	dir := t.TempDir()
	good := filepath.Join(dir, "good.toml")
	bad := filepath.Join(dir, "bad.toml")
	risky := filepath.Join(dir, "risky.toml")
	os.WriteFile(good, []byte("[category.apparel]\ncolour_tolerance = 3\n"), 0o644)
	os.WriteFile(bad, []byte("[category.aparel]\ncolour_tolerence = 3\n"), 0o644)
	os.WriteFile(risky, []byte("[category.electrical.strictness]\nspec = \"soft\"\n"), 0o644)
	// A shop's own lexicon with a product type and a dimension the
	// built-in one lacks (invented), and a policy that names both.
	lexDir := filepath.Join(dir, "lex")
	os.Mkdir(lexDir, 0o755)
	builtIn, _ := os.ReadFile(filepath.Join("..", "..", "lexicon", "data", "product_types.wlx"))
	os.WriteFile(filepath.Join(lexDir, "product_types.wlx"), append(builtIn, []byte("\ngrubbing hoe | category=hardware | slot=blade_length:length:in:4..12\n")...), 0o644)
	own := filepath.Join(dir, "own.toml")
	os.WriteFile(own, []byte("[product_type.\"grubbing hoe\".dimensions]\nblade_length = \"hard\"\n"), 0o644)
	cheap := filepath.Join(dir, "cheap.toml")
	os.WriteFile(cheap, []byte("[signals.weights]\npurchase = 0.5\n"), 0o644)
	for _, tc := range []struct {
		name     string
		args     []string
		want     int
		out, err string
		reason   string
	}{
		{"show", []string{"policy", "show"}, 0, "colour_tolerance   5", "", "the built-in defaults"},
		{"show category", []string{"policy", "show", "--category", "apparel"}, 0, "colour_tolerance   4", "", "apparel's tolerance"},
		{"show with a file", []string{"policy", "show", "--policy", good, "--category", "apparel"}, 0, "colour_tolerance   3", "", "the file overrides"},
		{"show product type", []string{"policy", "show", "--category", "camera", "--product-type", "lens"}, 0, "focal_length", "", "camera's dimensions"},
		{"show bad file", []string{"policy", "show", "--policy", bad}, 1, "", `did you mean "apparel"`, "errors are rendered"},
		{"show unknown category", []string{"policy", "show", "--category", "toys"}, 2, "", "unknown category", "usage"},
		{"show unknown product type", []string{"policy", "show", "--product-type", "hoverboard"}, 2, "", "unknown product type", "usage"},
		{"product type brings its category", []string{"policy", "show", "--product-type", "rain jacket"}, 0, "category apparel, product type rain jacket", "",
			"a rain jacket is apparel (lexicon/data/product_types.wlx), as a query of it is read"},
		{"product type's tolerance", []string{"policy", "show", "--product-type", "rain jacket"}, 0, "colour_tolerance   4", "", "apparel's 4, not the defaults' 5"},
		{"category contradicts product type", []string{"policy", "show", "--category", "paint", "--product-type", "rain jacket"}, 2, "",
			`product type "rain jacket" is in category apparel, not paint`, "a usage error: no query reads a rain jacket in paint"},
		{"check with the shop's lexicon", []string{"policy", "check", "--lexicon", lexDir, own}, 0, "own.toml: ok", "",
			"the product type and dimension are the shop's lexicon's, which the other commands read the file with"},
		{"check without it", []string{"policy", "check", own}, 1, "", `unknown product type "grubbing hoe"`, "the built-in lexicon has no grubbing hoe"},
		{"help lists show's flags", []string{"policy", "-h"}, 0, "-product-type", "", "the usage ends with the flags of show, not an empty list"},
		{"show help", []string{"policy", "show", "-h"}, 0, "", "-product-type", "help is not an error"},
		{"check help", []string{"policy", "check", "-h"}, 0, "", "usage: whittle policy check [--lexicon DIR] FILE", "help is not an error, as for every other -h"},
		{"check two files", []string{"policy", "check", good, bad}, 2, "", "whittle policy check: takes one policy FILE, not 2 arguments", "one file at a time"},
		{"check good", []string{"policy", "check", good}, 0, "ok", "", "a valid file"},
		{"check bad", []string{"policy", "check", bad}, 1, "", "bad.toml:1:1", "positions are given"},
		{"check risky", []string{"policy", "check", risky}, 0, "warning: category.electrical", "", "relaxing a designation warns"},
		{"check weights", []string{"policy", "check", cheap}, 0, "warning: signals.weights: purchase (0.5) is worth less than add_to_cart (3)", "", "the weights are checked as laid over the built-in ones"},
		{"check missing", []string{"policy", "check", filepath.Join(dir, "none.toml")}, 1, "", "no such file", "the file must exist"},
		{"check usage", []string{"policy", "check"}, 2, "", "whittle policy check: takes one policy FILE, not 0 arguments", "a file is needed"},
		{"no subcommand", []string{"policy"}, 2, "", "usage", "usage"},
		{"unknown subcommand", []string{"policy", "edit"}, 2, "", "unknown subcommand", "usage"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			code, out, stderr := runCLI("", tc.args...)
			if code != tc.want || !strings.Contains(out, tc.out) || !strings.Contains(stderr, tc.err) {
				t.Errorf("%s: exit %d (want %d)\nstdout: %s\nstderr: %s", tc.reason, code, tc.want, out, stderr)
			}
		})
	}
	_, out, _ := runCLI("", "policy", "show", "--json", "--category", "paint")
	var e struct {
		Strictness map[string]string `json:"strictness"`
	}
	if err := json.Unmarshal([]byte(out), &e); err != nil || e.Strictness["colour"] != "hard" {
		t.Errorf("json: %v %+v", err, e)
	}
}

// explain applies the policy: colour is hard in paint, and --policy can
// change it.
func TestExplainAppliesPolicy(t *testing.T) {
	_, out, _ := runCLI("", "explain", "--json", "sage paint")
	if !strings.Contains(out, `"kind":"colour","text":"sage","start":0,"end":4,"strictness":"hard"`) {
		t.Errorf("colour not hard in paint: %s", out)
	}
	file := filepath.Join(t.TempDir(), "p.toml")
	os.WriteFile(file, []byte("[category.paint.strictness]\ncolour = \"firm\"\n"), 0o644)
	_, out, _ = runCLI("", "explain", "--json", "--policy", file, "sage paint")
	if !strings.Contains(out, `"kind":"colour","text":"sage","start":0,"end":4,"strictness":"firm"`) {
		t.Errorf("--policy not applied: %s", out)
	}
}

// Every command that loads a policy warns, once, on standard error, when
// the policy makes a standard designation less than hard: a 14 AWG wire
// shown for a 12 AWG query is rated for less current (NFPA 70, the
// ampacity table 310.16; from memory), so the operator must know.
func TestLoadingARiskyPolicyWarns(t *testing.T) {
	dir := t.TempDir()
	risky := filepath.Join(dir, "risky.toml")
	os.WriteFile(risky, []byte("[category.electrical.strictness]\nspec = \"soft\"\n"), 0o644)
	idx := filepath.Join(dir, "idx")
	if code, out, stderr := runCLI("", "index", "--catalog", shopCatalog, "--index", idx); code != 0 {
		t.Fatalf("index: exit %d\n%s%s", code, out, stderr)
	}
	const warning = "warning: category.electrical: spec is soft"
	for _, tc := range []struct {
		name, stdin string
		args        []string
		reason      string
	}{
		{"explain", "", []string{"explain", "--policy", risky, "12/2 awg wire"}, "explain reads with the policy"},
		{"search", "", []string{"search", "--index", idx, "--policy", risky, "-k", "1", "12/2 awg wire"}, "search rescues with it"},
		{"replay", "12/2 awg wire\n", []string{"replay", "--index", idx, "--policy", risky, "--log", "-"}, "replay rescues a whole log with it"},
		{"policy show", "", []string{"policy", "show", "--policy", risky, "--category", "electrical"}, "show prints the settled policy"},
		{"colour", "", []string{"colour", "--catalog", shopCatalog, "--policy", risky, "mustard"}, "colour takes its tolerance from it"},
		{"tune", "", []string{"tune", "--signals", tuneLog(t, ""), "--index", idx, "--policy", risky}, "tune reads it as the policy in force"},
		{"eval", "", []string{"eval", "--policy", risky, "--products", "300", "--queries", "2", "--style", "short", "--dir", t.TempDir()}, "eval rescues with it"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			code, out, stderr := runCLI(tc.stdin, tc.args...)
			if code != 0 {
				t.Fatalf("exit %d\n%s%s", code, out, stderr)
			}
			if n := strings.Count(stderr, warning); n != 1 {
				t.Errorf("%s: the warning is on stderr %d times, want once:\n%s", tc.reason, n, stderr)
			}
			if !strings.Contains(stderr, "whittle "+strings.Fields(tc.name)[0]+": "+warning) {
				t.Errorf("the warning does not name the command:\n%s", stderr)
			}
			if strings.Contains(out, warning) {
				t.Errorf("the warning is in the output, where it would mix with the results:\n%s", out)
			}
		})
	}
	// Without the file, or with a policy that keeps spec hard, nothing.
	if _, _, stderr := runCLI("", "explain", "12/2 awg wire"); strings.Contains(stderr, "warning") {
		t.Errorf("the built-in policy warns: %s", stderr)
	}
}

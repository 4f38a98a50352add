package main

import (
	"encoding/json"
	"path/filepath"
	"strings"
	"testing"
)

var demoCatalog = filepath.Join("..", "..", "testdata", "catalog", "colours.jsonl")

func TestColourExitCodes(t *testing.T) {
	for _, tc := range []struct {
		name   string
		args   []string
		want   int
		err    string // what stderr must say; with exit 2, on one line and without the usage
		reason string
	}{
		{"name", []string{"colour", "dusty rose"}, 0, "", "a known name"},
		{"hex", []string{"colour", "#c9a3a0"}, 0, "", "a hex value"},
		{"rgb", []string{"colour", "rgb(201, 163, 160)"}, 0, "", "an rgb() value"},
		{"lab", []string{"colour", "70.3,13.5,6.9"}, 0, "", "an L,a,b value"},
		{"pair", []string{"colour", "sky blue", "#8ecae6"}, 0, "", "two colours"},
		{"catalog", []string{"colour", "--catalog", demoCatalog, "sky blue"}, 0, "", "a catalog search"},
		{"flags after", []string{"colour", "sky blue", "--catalog", demoCatalog, "--within", "3"}, 0, "", "flags may follow the colour"},
		{"unknown name", []string{"colour", "burgandy"}, 1, "", "an unknown name is an error in input"},
		{"bad hex", []string{"colour", "#12"}, 1, "", "a malformed hex"},
		{"lab out of range", []string{"colour", "120,0,0"}, 1, "", "L above 100"},
		{"missing catalog", []string{"colour", "--catalog", "/no/such/file", "red"}, 1, "", "the catalog cannot be read"},
		{"no colour", []string{"colour"}, 2, "whittle colour: give a COLOUR to describe, or two to compare", "a colour is needed"},
		{"three colours", []string{"colour", "red", "green", "blue"}, 2, `whittle colour: takes one colour or two, not 3; quote a name of several words: whittle colour "dusty rose"`, "three words unquoted are three colours to the shell"},
		{"catalog with two", []string{"colour", "--catalog", demoCatalog, "red", "blue"}, 2, "whittle colour: --catalog takes one colour, not 2", "a catalog search takes one colour"},
		{"negative tolerance", []string{"colour", "--within", "-1", "--catalog", demoCatalog, "red"}, 2, "whittle colour: --within must be 0 or more, not -1", "a tolerance is not negative"},
		{"tolerance without a catalog", []string{"colour", "--within", "5", "red"}, 2, "whittle colour: --within only applies with --catalog", "--within has nothing to search without --catalog, so it is refused, not ignored"},
		{"category without a catalog", []string{"colour", "--category", "paint", "red"}, 2, "whittle colour: --category only applies with --catalog", "the same for --category"},
		{"unknown category", []string{"colour", "--catalog", demoCatalog, "--category", "toys", "red"}, 2, "whittle colour: unknown category \"toys\"", "the category must be known"},
		{"negative nearest", []string{"colour", "--nearest", "-1", "red"}, 2, "whittle colour: --nearest must be 0 or more, not -1", "no count of names is below none"},
		{"nearest with a catalog", []string{"colour", "--catalog", demoCatalog, "--nearest", "3", "red"}, 2, "whittle colour: --nearest and --catalog cannot be used together",
			"a catalog search lists the colours within a tolerance, not the nearest named ones: ignoring --nearest would hide it"},
		{"policy without a catalog", []string{"colour", "--policy", "p.toml", "red"}, 2, "whittle colour: --policy only applies with --catalog", "the policy gives only the catalog search's tolerance"},
		{"unknown flag", []string{"colour", "--near", "3", "red"}, 2, `flag provided but not defined: -near (run "whittle colour -h" for the flags)`, "a mistyped flag is named, with a hint, not the usage"},
		{"help", []string{"colour", "-h"}, 0, "", "help is not an error"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			code, _, stderr := runCLI("", tc.args...)
			if code != tc.want || !strings.Contains(stderr, tc.err) {
				t.Errorf("exit %d, want %d; stderr %q, want %q (%s)", code, tc.want, stderr, tc.err, tc.reason)
			}
			if code == 2 && tc.err != "" && (strings.Count(stderr, "\n") != 1 || strings.Contains(stderr, "usage:")) {
				t.Errorf("stderr %q: want one line, without the usage (%s)", stderr, tc.reason)
			}
		})
	}
}

func TestColourSuggestsANearName(t *testing.T) {
	_, _, stderr := runCLI("", "colour", "burgandy")
	if !strings.Contains(stderr, `did you mean "burgundy"`) {
		t.Errorf("stderr %q lacks the suggestion", stderr)
	}
}

func TestColourJSON(t *testing.T) {
	_, out, _ := runCLI("", "colour", "--json", "navy")
	var one struct {
		Name     string     `json:"name"`
		Hex      string     `json:"hex"`
		Lab      [3]float64 `json:"lab"`
		Families []string   `json:"families"`
		Nearest  []struct {
			Name   string  `json:"name"`
			DeltaE float64 `json:"delta_e00"`
		} `json:"nearest"`
	}
	if err := json.Unmarshal([]byte(out), &one); err != nil {
		t.Fatalf("%v in %s", err, out)
	}
	// CSS navy is #000080 (testdata/reference/css_named_colours.tsv).
	if one.Name != "navy" || one.Hex != "#000080" || len(one.Nearest) != 5 || one.Nearest[0].Name != "navy" || one.Nearest[0].DeltaE != 0 {
		t.Errorf("unexpected %+v", one)
	}
	_, out, _ = runCLI("", "colour", "--json", "sky blue", "#8ecae6")
	var pair struct {
		DE00 float64 `json:"delta_e00"`
		DE76 float64 `json:"delta_e76"`
	}
	if err := json.Unmarshal([]byte(out), &pair); err != nil || pair.DE00 <= 0 || pair.DE76 <= pair.DE00 {
		t.Errorf("pair: %v %+v", err, pair)
	}
	_, out, _ = runCLI("", "colour", "--json", "--catalog", demoCatalog, "--within", "10", "sky blue")
	var cat struct {
		Within  float64 `json:"within"`
		Colours []struct {
			Name     string `json:"name"`
			Products int    `json:"products"`
		} `json:"colours"`
		Unplaced map[string]int `json:"unplaced"`
	}
	if err := json.Unmarshal([]byte(out), &cat); err != nil {
		t.Fatalf("%v in %s", err, out)
	}
	// The demo catalog's glacier (#8ecae6) is about 1.8 from CSS skyblue
	// (#87ceeb); its other colours are far.
	if cat.Within != 10 || len(cat.Colours) != 1 || cat.Colours[0].Name != "glacier" || cat.Colours[0].Products != 3 || cat.Unplaced["zorblax"] != 1 {
		t.Errorf("unexpected %+v", cat)
	}
}

package main

import (
	"encoding/json"
	"fmt"
	"os"
	"path/filepath"
	"regexp"
	"slices"
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
		{"no catalog flag", []string{"index"}, 2, "--catalog FILE is required", "the catalog is required, and the one line says so"},
		{"missing catalog", []string{"index", "--catalog", filepath.Join(dir, "none.jsonl"), "--index", filepath.Join(dir, "i")}, 1, "no such file", "the file must exist"},
		{"duplicate id", []string{"index", "--catalog", bad, "--index", filepath.Join(dir, "i")}, 1, "line 2: id", "a duplicate id stops the run"},
		{"skip bad", []string{"index", "--catalog", bad, "--index", filepath.Join(dir, "i"), "--skip-bad"}, 0, "skipped", "--skip-bad reports and goes on"},
		{"no index", []string{"search", "--index", filepath.Join(dir, "missing"), "rug"}, 1, "no index", "search needs an index"},
		{"no query", []string{"search", "--index", dir}, 2, "whittle search: give the QUERY to search for", "a query is needed"},
		{"explore below 0", []string{"search", "--index", dir, "--explore", "-0.5", "rug"}, 2, "--explore must be a chance from 0 to 1, not -0.5", "a chance is at least 0"},
		{"explore above 1", []string{"search", "--index", dir, "--explore", "1.5", "rug"}, 2, "--explore must be a chance from 0 to 1, not 1.5", "a chance is at most 1"},
		{"explore not a number", []string{"search", "--index", dir, "--explore", "NaN", "rug"}, 2, "--explore must be a chance from 0 to 1, not NaN", "NaN is no chance"},
		{"explore not a float", []string{"search", "--index", dir, "--explore", "often", "rug"}, 2, `invalid value "often" for flag -explore`, "the flag package refuses it"},
		{"bad seed", []string{"search", "--index", dir, "--seed", "-1", "rug"}, 2, `invalid value "-1" for flag -seed`, "a seed is a whole number from 0"},
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
	// Dropping words from the end of "ember trail running shoe size 12"
	// loses 12 and size ("size" is in no product's text) and shows TR-2,
	// the ember shoe, which comes in 8 to 10 (shop.jsonl); whittle keeps
	// the size and shows TR-1, the black one in 7 to 12.
	code, out, stderr := runCLI("", "search", "--index", dir, "--baseline", "--fallback", "drop-trailing", "ember trail running shoe size 12")
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	for _, want := range []string{"blind partial match (drop-trailing): 4 of 6 words kept, 1 result\n", "TR-2  Scree trail running shoe", "TR-1  Scree trail running shoe"} {
		if !strings.Contains(out, want) {
			t.Errorf("output lacks %q:\n%s", want, out)
		}
	}
	for _, tc := range []struct {
		args           []string
		stderr, reason string
	}{
		{[]string{"--fallback", "drop-trailing", "rain jacket"}, "--fallback only applies with --baseline", "a fallback runs only beside the rescue"},
		{[]string{"--baseline=false", "--fallback", "drop-trailing", "rain jacket"}, "--fallback only applies with --baseline", "--baseline=false asks for no baseline, as the service's \"baseline\": false does"},
		{[]string{"--baseline", "--fallback", "last", "rain jacket"}, `unknown fallback "last": want most-words or drop-trailing`, "the two names are given"},
	} {
		code, _, stderr := runCLI("", append([]string{"search", "--index", dir}, tc.args...)...)
		if code != 2 || !strings.Contains(stderr, tc.stderr) {
			t.Errorf("%s: exit %d, stderr %q, want 2 and %q", tc.reason, code, stderr, tc.stderr)
		}
	}
}

// exploredReport is what the explore tests read of a --json report.
type exploredReport struct {
	Hits []struct {
		ID       string `json:"id"`
		Explored bool   `json:"explored"`
	} `json:"hits"`
	Explored *struct {
		Rank        int `json:"rank"`
		Relaxations []struct{ Op, Kind, Text string }
	} `json:"explored"`
}

// signalLine is what the explore tests read of a search event.
type signalLine struct {
	Type, Session, Query, Category string
	Shown                          []string
	Explored                       *struct{ Rank int }
}

// readSignals reads every line of a signals file.
func readSignals(t *testing.T, file string) []signalLine {
	t.Helper()
	b, err := os.ReadFile(file)
	if err != nil {
		t.Fatal(err)
	}
	var out []signalLine
	for _, l := range strings.Split(strings.TrimSuffix(string(b), "\n"), "\n") {
		var s signalLine
		if err := json.Unmarshal([]byte(l), &s); err != nil {
			t.Fatalf("%v in %q", err, l)
		}
		out = append(out, s)
	}
	return out
}

// testdata/catalog/shop.jsonl: RJ-1 and RJ-2 are the nylon rain jackets;
// dropping the soft material, the cheapest step looser, finds RJ-3.
func TestSearchExploreAndSignals(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "idx")
	if code, _, stderr := runCLI("", "index", "--catalog", shopCatalog, "--index", dir); code != 0 {
		t.Fatal(stderr)
	}
	log := filepath.Join(t.TempDir(), "signals.jsonl")
	args := []string{"search", "--index", dir, "--json", "--explore", "1", "--seed", "5", "--signals", log, "--session", "s1", "nylon rain jacket"}
	code, out, stderr := runCLI("", args...)
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	var rep exploredReport
	if err := json.Unmarshal([]byte(out), &rep); err != nil {
		t.Fatalf("%v in %s", err, out)
	}
	if rep.Explored == nil || len(rep.Hits) != 3 || rep.Explored.Rank < 1 || rep.Explored.Rank > 3 ||
		rep.Hits[rep.Explored.Rank-1].ID != "RJ-3" || !rep.Hits[rep.Explored.Rank-1].Explored ||
		len(rep.Explored.Relaxations) != 1 || rep.Explored.Relaxations[0].Op != "drop" || rep.Explored.Relaxations[0].Text != "nylon" {
		t.Fatalf("--explore 1: RJ-3 should be explored among three hits: %s", out)
	}
	// The same seed draws the same rank; the line is appended, not
	// written over.
	if code, again, _ := runCLI("", args...); code != 0 || again != out {
		t.Errorf("--seed 5 twice gave\n%s\n%s", out, again)
	}
	lines := readSignals(t, log)
	if len(lines) != 2 {
		t.Fatalf("%d lines in the signals file, want 2", len(lines))
	}
	l := lines[0]
	var shown []string
	for _, h := range rep.Hits {
		shown = append(shown, h.ID)
	}
	if l.Type != "search" || l.Session != "s1" || l.Query != "nylon rain jacket" || l.Category != "apparel" || !slices.Equal(l.Shown, shown) ||
		l.Explored == nil || l.Explored.Rank != rep.Explored.Rank {
		t.Errorf("the line %+v does not match the report %s", l, out)
	}
	// No --session: a new id each run.
	runCLI("", "search", "--index", dir, "--signals", log, "rain jacket")
	runCLI("", "search", "--index", dir, "--signals", log, "rain jacket")
	lines = readSignals(t, log)
	if len(lines) != 4 || lines[2].Session == "" || lines[2].Session == lines[3].Session || lines[2].Explored != nil {
		t.Errorf("sessions of runs without --session: %+v", lines[2:])
	}
	// Without --explore nothing is explored; as text, the explored hit
	// is marked.
	code, out, _ = runCLI("", "search", "--index", dir, "--json", "nylon rain jacket")
	if code != 0 || strings.Contains(out, "explored") {
		t.Errorf("no --explore: exit %d\n%s", code, out)
	}
	code, out, _ = runCLI("", "search", "--index", dir, "--explore", "1", "nylon rain jacket")
	if code != 0 || !regexp.MustCompile(`RJ-3 .*\(explored, one step looser: drop material "nylon"\)`).MatchString(out) {
		t.Errorf("text: exit %d\n%s", code, out)
	}
	// A wire gauge is hard and wire has no parent type: nothing to explore.
	code, out, _ = runCLI("", "search", "--index", dir, "--json", "--explore", "1", "12 awg wire")
	if code != 0 || strings.Contains(out, "explored") || !strings.Contains(out, `"WR-1"`) {
		t.Errorf("hard only: exit %d\n%s", code, out)
	}
}

// --category is the category of a query that names none, logged with
// the search; an unknown one is refused.
func TestSearchCategory(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "idx")
	if code, _, stderr := runCLI("", "index", "--catalog", shopCatalog, "--index", dir); code != 0 {
		t.Fatal(stderr)
	}
	log := filepath.Join(t.TempDir(), "signals.jsonl")
	if code, _, stderr := runCLI("", "search", "--index", dir, "--category", "camera", "--signals", log, "nylon"); code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	if ls := readSignals(t, log); len(ls) != 1 || ls[0].Category != "camera" {
		t.Errorf("logged %+v, want category camera", ls)
	}
	if code, _, stderr := runCLI("", "search", "--index", dir, "--category", "cameras", "nylon"); code != 2 || !strings.Contains(stderr, "camera") {
		t.Errorf("unknown category: exit %d, %q", code, stderr)
	}
}

// A signals file is appended to, its folder not made; --help tells the
// truth about the defaults.
func TestSearchExploreFlags(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "idx")
	if code, _, stderr := runCLI("", "index", "--catalog", shopCatalog, "--index", dir); code != 0 {
		t.Fatal(stderr)
	}
	code, _, stderr := runCLI("", "search", "--index", dir, "--signals", filepath.Join(dir, "no", "such", "file"), "rain jacket")
	if code != 1 || !strings.Contains(stderr, "no such file") {
		t.Errorf("signals in a missing folder: exit %d, stderr %q", code, stderr)
	}
	_, _, help := runCLI("", "search", "-h")
	for _, want := range []string{"--explore P", "default: from the clock", "--signals FILE", "default: a new random id"} {
		if !strings.Contains(help, want) {
			t.Errorf("--help lacks %q:\n%s", want, help)
		}
	}
}

// A query with nothing to search for is refused, with exit 1 (README,
// "Index a catalog and search it"), not answered with the shop's 13
// products; the JSON is the service's error object. A query with a badly
// formed part beside a product type is searched, exit 0, the part shown.
func TestSearchNothingToSearch(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "idx")
	if code, _, stderr := runCLI("", "index", "--catalog", shopCatalog, "--index", dir); code != 0 {
		t.Fatal(stderr)
	}
	for _, tc := range []struct {
		name, query, reason string
		text                []string // lines of stderr, in order
		code                string
		span                *struct{ Start, End int }
	}{
		{name: "empty", query: "", reason: "no query at all", code: "query_empty",
			text: []string{"whittle search: query not searched: query is empty", "", "  ^", "  query is empty"}},
		{name: "blank", query: "   ", reason: "three spaces: the carets run under them",
			text: []string{"whittle search: query not searched: query is empty", "", "  ^^^", "  query is empty"}, code: "query_empty"},
		{name: "punctuation", query: "!!!", reason: "no word or number; the span is the three marks",
			text: []string{"whittle search: query not searched: no word or number to search for", "  !!!", "  ^^^", "  no word or number to search for"},
			code: "query_unreadable", span: &struct{ Start, End int }{0, 3}},
		{name: "filler", query: "nice", reason: "a filler word asks for nothing",
			text: []string{`whittle search: query not searched: only filler words ("nice"), nothing to search for`, "  nice", "  ^^^^"},
			code: "query_unreadable", span: &struct{ Start, End int }{0, 4}},
		{name: "badly formed", query: "1/0", reason: "the only part divides by zero, at bytes 0-3",
			text: []string{"whittle search: query not searched: 1/0 divides by zero", "  1/0", "  ^^^", "  1/0 divides by zero"},
			code: "query_unreadable", span: &struct{ Start, End int }{0, 3}},
		{name: "too long", query: strings.Repeat("red ", 300), reason: "1,200 bytes over the 1,024 the parser reads (parser.MaxQueryBytes)",
			text: []string{"whittle search: query not searched: query is 1200 bytes; the limit is 1024"},
			code: "query_too_long", span: &struct{ Start, End int }{1024, 1200}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			log := filepath.Join(t.TempDir(), "signals.jsonl")
			code, out, stderr := runCLI("", "search", "--index", dir, "--signals", log, "--", tc.query)
			if code != 1 || out != "" || !strings.HasPrefix(stderr, strings.Join(tc.text, "\n")+"\n") {
				t.Errorf("%s: exit %d, stdout %q, stderr\n%s\nwant exit 1 and\n%s", tc.reason, code, out, stderr, strings.Join(tc.text, "\n"))
			}
			if _, err := os.Stat(log); !os.IsNotExist(err) {
				t.Errorf("%s: a refused query logged a search event (%v)", tc.reason, err)
			}
			code, out, stderr = runCLI("", "search", "--index", dir, "--json", "--", tc.query)
			var got struct {
				Error struct {
					Code     string
					Message  string
					Span     *struct{ Start, End int }
					Problems []json.RawMessage
				}
			}
			if err := json.Unmarshal([]byte(out), &got); err != nil || code != 1 || stderr != "" {
				t.Fatalf("%s: --json exit %d, %v in %q, stderr %q", tc.reason, code, err, out, stderr)
			}
			if got.Error.Code != tc.code || got.Error.Message == "" || fmt.Sprint(got.Error.Span) != fmt.Sprint(tc.span) {
				t.Errorf("%s: --json error %+v, want code %s, span %v", tc.reason, got.Error, tc.code, tc.span)
			}
		})
	}
	// shop.jsonl has three rain jackets, RJ-1 to RJ-3.
	code, out, stderr := runCLI("", "search", "--index", dir, "1/0 rain jacket")
	if code != 0 || !strings.Contains(out, "error at 0-3:\n  1/0 rain jacket\n  ^^^\n  1/0 divides by zero") || strings.Count(out, "RJ-") != 3 {
		t.Errorf("badly formed beside a product type: exit %d\n%s%s", code, out, stderr)
	}
	code, out, _ = runCLI("", "search", "--index", dir, "--json", "1/0 rain jacket")
	var rep struct {
		Problems []struct {
			Start, End int
			Message    string
		}
		Hits []json.RawMessage
	}
	if err := json.Unmarshal([]byte(out), &rep); err != nil || code != 0 || len(rep.Hits) != 3 || len(rep.Problems) != 1 ||
		rep.Problems[0].Start != 0 || rep.Problems[0].End != 3 || rep.Problems[0].Message != "1/0 divides by zero" {
		t.Errorf("badly formed beside a product type, --json: exit %d, %v, %+v", code, err, rep)
	}
}

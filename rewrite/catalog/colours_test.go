package catalog

import (
	"errors"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/google/go-cmp/cmp"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/colour"
)

// testdata/catalog/colours.jsonl is an invented demo catalog (a made-up
// outdoor shop); its values are for the demo only.
func TestReadColours(t *testing.T) {
	f, err := os.Open(filepath.Join("..", "..", "testdata", "catalog", "colours.jsonl"))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	v, err := ReadColours(f, lexicon.Default())
	if err != nil {
		t.Fatal(err)
	}
	if v.Products != 9 {
		t.Errorf("read %d products, want 9 (the blank line is skipped)", v.Products)
	}
	var got []string
	for _, c := range v.Colours {
		got = append(got, c.Name)
	}
	// Most products first, then by name.
	if diff := cmp.Diff([]string{"glacier", "ember", "morning fog", "navy", "peat"}, got); diff != "" {
		t.Errorf("colours (-want +got):\n%s", diff)
	}
	if v.Colours[0].Count != 3 {
		t.Errorf("glacier has %d products, want 3", v.Colours[0].Count)
	}
	// Two glacier lines say #8ecae6, one #8ecae7: the majority wins.
	if want := mustHex(t, "#8ecae6").Lab(); v.Colours[0].Lab != want {
		t.Errorf("glacier placed at %v, want the majority value %v", v.Colours[0].Lab, want)
	}
	// navy has no value in the line: the lexicon's CSS navy (#000080) places it.
	for _, c := range v.Colours {
		if c.Name == "navy" && c.Lab != mustHex(t, "#000080").Lab() {
			t.Errorf("navy placed at %v, want CSS navy", c.Lab)
		}
		if c.Name == "peat" && c.Lab != (colour.Lab{L: 32.5, A: 8.1, B: 17.9}) {
			t.Errorf("peat placed at %v, want its colour_lab", c.Lab)
		}
	}
	if diff := cmp.Diff(map[string]int{"zorblax": 1}, v.Unplaced); diff != "" {
		t.Errorf("unplaced (-want +got):\n%s", diff)
	}
}

func mustHex(t *testing.T, s string) colour.RGB {
	t.Helper()
	c, err := colour.ParseHex(s)
	if err != nil {
		t.Fatal(err)
	}
	return c
}

func TestReadColoursErrors(t *testing.T) {
	for _, tc := range []struct {
		name, text string
		line       int
		field, msg string
	}{
		{"not json", `{"id": "a", "title": "x"}` + "\nnot json\n", 2, "", "not a JSON object"},
		{"missing id", `{"title": "x"}`, 1, "id", "missing"},
		{"empty title", `{"id": "a", "title": " "}`, 1, "title", "empty"},
		{"title of the wrong type", `{"id": "a", "title": 7}`, 1, "title", "want a string"},
		{"bad hex", `{"id": "a", "title": "x", "colour": "red", "colour_hex": "#12"}`, 1, "colour_hex", "#12"},
		{"short lab", `{"id": "a", "title": "x", "colour": "red", "colour_lab": [50, 1]}`, 1, "colour_lab", "three numbers"},
		{"lab out of range", `{"id": "a", "title": "x", "colour": "red", "colour_lab": [150, 1, 1]}`, 1, "colour_lab", "0..100"},
		{"colour of the wrong type", `{"id": "a", "title": "x", "colour": ["red"]}`, 1, "colour", "want a string"},
		{"duplicate id", `{"id": "a", "title": "x"}` + "\n" + `{"id": "a", "title": "y"}`, 2, "id", "line 1"},
		{"line too long", `{"id": "a", "title": "` + strings.Repeat("x", MaxLine) + `"}`, 1, "", "longer than"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			_, err := ReadColours(strings.NewReader(tc.text), lexicon.Default())
			var le *LineError
			if !errors.As(err, &le) {
				t.Fatalf("got %v, want a *LineError", err)
			}
			if le.Line != tc.line || le.Field != tc.field || !strings.Contains(le.Msg, tc.msg) {
				t.Errorf("got %v, want line %d field %q containing %q", le, tc.line, tc.field, tc.msg)
			}
		})
	}
}

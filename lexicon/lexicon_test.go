package lexicon

import (
	"errors"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/blevesearch/bleve/v2/analysis/lang/en"
	"github.com/blevesearch/bleve/v2/registry"
	"github.com/google/go-cmp/cmp"

	"github.com/whittle-search/whittle/lexicon/reference"
)

// The default vocabulary must cover what the parser promises.
func TestDefaultCoverage(t *testing.T) {
	l := Default()
	min := map[Kind]int{ProductType: 300, Pattern: 40, Silhouette: 40, Material: 40, Colour: 150, Brand: 20, Filler: 40}
	for k, n := range min {
		if got := len(l.Entries(k)); got < n {
			t.Errorf("%s: %d entries, want at least %d", k, got, n)
		}
	}
	var auds []string
	for _, e := range l.Entries(Audience) {
		auds = append(auds, e.Name)
	}
	if diff := cmp.Diff([]string{"women", "men", "kids", "girls", "boys", "baby", "unisex"}, auds); diff != "" {
		t.Errorf("audiences (-want +got):\n%s", diff)
	}
	perCat := make(map[string]int)
	for _, e := range l.Entries(ProductType) {
		perCat[e.Category]++
	}
	for _, c := range Categories() {
		if perCat[c] < 10 {
			t.Errorf("category %s has %d product types, want at least 10", c, perCat[c])
		}
	}
}

// Key must stem as bleve's "en" analyzer does, so the query side and the
// index side meet. The oracle is bleve v2's own analyzer, run on each word.
func TestKeyAgreesWithBleveEnglishAnalyzer(t *testing.T) {
	cache := registry.NewCache()
	an, err := cache.AnalyzerNamed(en.AnalyzerName)
	if err != nil {
		t.Fatal(err)
	}
	words := []string{"dresses", "boots", "running", "shoes", "jeans", "trousers", "leggings", "batteries",
		"Sweaters", "cushions", "knives", "glasses", "women's", "lenses", "tyres", "studs", "bolts", "grey"}
	for _, e := range Default().Entries(ProductType) {
		if !strings.ContainsAny(e.Name, " -'") {
			words = append(words, e.Name)
		}
	}
	for _, w := range words {
		toks := an.Analyze([]byte(w))
		if len(toks) != 1 {
			continue // a stop word, or split by the tokenizer
		}
		if got, want := Key(w), string(toks[0].Term); got != want {
			t.Errorf("Key(%q) = %q, bleve en analyzer gives %q", w, got, want)
		}
	}
}

func TestNormalise(t *testing.T) {
	for _, tc := range []struct{ in, want, reason string }{
		{"TEE", "tee", "ASCII lower-cased"},
		{"ＴＥＥ", "tee", "full-width letters fold by NFKC (Unicode UAX 15)"},
		{"Straße", "strasse", "case folding maps ß to ss (Unicode CaseFolding.txt)"},
		{"ﬁt", "fit", "the fi ligature decomposes by NFKC"},
		{"plain", "plain", "unchanged"},
	} {
		if got := Normalise(tc.in); got != tc.want {
			t.Errorf("Normalise(%q) = %q, want %q: %s", tc.in, got, tc.want, tc.reason)
		}
	}
}

func TestMatchLongest(t *testing.T) {
	l := Default()
	for _, tc := range []struct {
		phrase string
		n      int
		name   string
		reason string
	}{
		{"navy blue chinos", 2, "navy", "two-word colour beats the one-word colour"},
		{"bunk bed frame", 2, "bunk bed", "multi-word product type"},
		{"off the shoulder top", 3, "off the shoulder", "three-word silhouette"},
		{"v-neck", 2, "v-neck", "hyphenated phrase matched as its words"},
		{"vneck", 1, "v-neck", "hyphenated phrase matched joined"},
		{"dresses", 1, "dress", "plural stems to the singular"},
	} {
		var keys []string
		for _, w := range Words(tc.phrase) {
			keys = append(keys, Key(w))
		}
		n, es := l.Match(keys)
		if n != tc.n || len(es) == 0 || es[0].Name != tc.name {
			var names []string
			for _, e := range es {
				names = append(names, e.Name)
			}
			t.Errorf("Match(%q) = %d %v, want %d %q: %s", tc.phrase, n, names, tc.n, tc.name, tc.reason)
		}
	}
	if n, _ := l.Match([]string{"zorblax"}); n != 0 {
		t.Errorf("an unknown word matched %d words", n)
	}
}

func TestParseFileErrors(t *testing.T) {
	for _, tc := range []struct {
		name, kind, text string
		line, col        int
		msg              string
	}{
		{"field first", "pattern", "also=x\n", 1, 1, "canonical name comes first"},
		{"not key=value", "pattern", "# c\nstripe | dotted\n", 2, 10, "not key=value"},
		{"unknown key", "colour", "red | shade=dark\n", 1, 7, `unknown key "shade"`},
		{"short hex", "colour", "red | hex=#f00 | from=css4\n", 1, 7, "want #rrggbb"},
		{"hex without source", "colour", "red | hex=#ff0000\n", 1, 1, "give hex= and from= together"},
		{"unknown source", "colour", "red | hex=#ff0000 | from=paint chart\n", 1, 21, `from "paint chart"`},
		{"unknown category", "product_type", "sock | category=socks\n", 1, 8, `unknown category "socks"`},
		{"no category", "product_type", "sock\n", 1, 1, "no category"},
		{"bad slot unit", "product_type", "lens | category=camera | slot=focal_length:length:furlong:8..1200\n", 1, 26, `unknown unit "furlong"`},
		{"slot unit of another quantity", "product_type", "lens | category=camera | slot=focal_length:mass:mm:8..1200\n", 1, 26, "measures length, not mass"},
		{"slot range reversed", "product_type", "lens | category=camera | slot=focal_length:length:mm:90..8\n", 1, 26, "min below max"},
		{"empty name", "pattern", "  | also=x\n", 1, 3, "canonical name comes first"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			_, err := ParseFile("test.wlx", Kind(tc.kind), strings.NewReader(tc.text))
			var fe *FileError
			if !errors.As(err, &fe) {
				t.Fatalf("got %v, want a *FileError", err)
			}
			if fe.Line != tc.line || fe.Column != tc.col || !strings.Contains(fe.Msg, tc.msg) {
				t.Errorf("got %v, want test.wlx:%d:%d: ...%s...", fe, tc.line, tc.col, tc.msg)
			}
		})
	}
}

func TestLoadRefusesDuplicates(t *testing.T) {
	dir := t.TempDir()
	os.WriteFile(filepath.Join(dir, "patterns.wlx"), []byte("stripe | also=striped\nstriped\n"), 0o644)
	_, err := LoadDir(dir)
	// The error names the shop's file by its path, not the built-in one
	// of the same name.
	if want := filepath.Join(dir, "patterns.wlx") + ":2:1"; err == nil || !strings.Contains(err.Error(), want) {
		t.Errorf("got %v, want an error at %s", err, want)
	}
}

func TestLoadRefusesParentLoops(t *testing.T) {
	dir := t.TempDir()
	os.WriteFile(filepath.Join(dir, "product_types.wlx"), []byte("boot | category=footwear | parent=shoe\nshoe | category=footwear | parent=boot\n"), 0o644)
	_, err := LoadDir(dir)
	if err == nil || !strings.Contains(err.Error(), "loop") {
		t.Errorf("got %v, want an error about a loop", err)
	}
}

func TestLoadDirOverlaysDefault(t *testing.T) {
	dir := t.TempDir()
	os.WriteFile(filepath.Join(dir, "brands.wlx"), []byte("# our brands\nquillmoor | also=quill moor\n"), 0o644)
	l, err := LoadDir(dir)
	if err != nil {
		t.Fatal(err)
	}
	if got := l.Entries(Brand); len(got) != 1 || got[0].Name != "quillmoor" {
		t.Errorf("brands = %v, want only quillmoor", got)
	}
	if len(l.Entries(ProductType)) != len(Default().Entries(ProductType)) {
		t.Error("product types did not fall back to the default file")
	}
	if _, err := LoadDir(filepath.Join(dir, "missing")); err == nil {
		t.Error("a missing directory gave no error")
	}
}

func TestSlotsInherit(t *testing.T) {
	l := Default()
	for _, e := range l.Entries(ProductType) {
		if e.Parent == "" || len(e.Slots) > 0 {
			continue
		}
		parent, _ := l.Lookup(ProductType, e.Parent)
		if got := l.SlotsOf(e); len(got) != len(l.SlotsOf(parent)) {
			t.Errorf("%s does not inherit the slots of %s", e.Name, parent.Name)
		}
	}
}

// Every CSS Color Module Level 4 named colour is in the colour lexicon
// with its CSS value (testdata/reference/css_named_colours.tsv), and every
// other colour says where its value comes from.
func TestColoursCSS4(t *testing.T) {
	l := Default()
	for _, row := range reference.Rows(t, "css_named_colours.tsv") {
		name := row["name"]
		if name == "orangered" {
			name = "orange red" // one word, it stems like "orange" (see colours.wlx)
		}
		var keys []string
		for _, w := range Words(name) {
			keys = append(keys, Key(w))
		}
		n, es := l.Match(keys)
		var found *Entry
		for _, e := range es {
			if e.Kind == Colour {
				found = e
			}
		}
		if n != len(keys) || found == nil {
			t.Errorf("CSS colour %s is not in the colour lexicon", row["name"])
			continue
		}
		if found.Hex != row["hex"] || found.From != "css4" {
			t.Errorf("CSS colour %s: lexicon entry %q has %s from %s, CSS gives %s", row["name"], found.Name, found.Hex, found.From, row["hex"])
		}
	}
	memory := 0
	for _, e := range l.Entries(Colour) {
		switch {
		case e.Hex == "multi", e.Hex == "" && e.Name == "clear":
		case e.From == "memory":
			memory++
		case e.From != "css4":
			t.Errorf("colour %s has no source for its value", e.Name)
		}
	}
	if memory < 150 {
		t.Errorf("%d colours beyond CSS, want at least 150", memory)
	}
}

func TestSuggest(t *testing.T) {
	l := Default()
	for _, tc := range []struct{ in, want, reason string }{
		{"burgandy", "burgundy", "one letter replaced"},
		{"chacoal", "charcoal", "one letter missing"},
		{"naavy", "navy", "one letter added"},
		{"zzzzzzzz", "", "nothing close"},
	} {
		if got := l.Suggest(tc.in, Colour); got != tc.want {
			t.Errorf("Suggest(%q) = %q, want %q (%s)", tc.in, got, tc.want, tc.reason)
		}
	}
}

// The optimal string alignment distance of a few textbook pairs.
func TestEditDistance(t *testing.T) {
	for _, tc := range []struct {
		a, b string
		want int
	}{
		{"kitten", "sitting", 3}, // the classic Levenshtein example
		{"ca", "ac", 1},          // one transposition
		{"", "abc", 3},
		{"same", "same", 0},
		{"café", "cafe", 1}, // one rune replaced, not two bytes
		// Words past the 31 letters the table keeps on the stack: two
		// letters swapped and one added.
		{"abcdefghijklmnopqrstuvwxyzabcdefghij", "abcdefghijklmnopqrstuvwxyzabcdefgihjk", 2},
	} {
		if got := editDistance(tc.a, tc.b, 99); got != tc.want {
			t.Errorf("editDistance(%q, %q) = %d, want %d", tc.a, tc.b, got, tc.want)
		}
	}
}

// EditDistanceWithin agrees with EditDistance up to its limit and says
// limit+1 past it, whatever the lengths (the pairs above, plus a
// multi-byte one).
func TestEditDistanceWithin(t *testing.T) {
	pairs := [][2]string{{"kitten", "sitting"}, {"ca", "ac"}, {"", "abc"}, {"same", "same"}, {"beige", "béige"}, {"sweter", "sweater"}}
	for _, p := range pairs {
		full := EditDistance(p[0], p[1])
		for limit := 0; limit <= 4; limit++ {
			want := min(full, limit+1)
			if got := EditDistanceWithin(p[0], p[1], limit); got != want {
				t.Errorf("EditDistanceWithin(%q, %q, %d) = %d, want %d (full distance %d)", p[0], p[1], limit, got, want, full)
			}
		}
	}
}

// Scanning a vocabulary for a typo must not allocate for each word
// compared: the planner compares a query's unknown word with every word
// the catalog and the lexicon know.
func TestEditDistanceWithinAllocs(t *testing.T) {
	if n := testing.AllocsPerRun(100, func() { EditDistanceWithin("sweter", "sweaters", 2) }); n != 0 {
		t.Errorf("EditDistanceWithin allocates %v times a call, want 0", n)
	}
}

func TestColourPalette(t *testing.T) {
	p := Default().ColourPalette()
	if p.Len() < 300 {
		t.Errorf("palette has %d colours, want every colour with a value", p.Len())
	}
	// CSS navy is #000080 (css_named_colours.tsv): its nearest named colour is itself.
	e, _ := Default().Lookup(Colour, "navy")
	lab, _ := e.ColourLab()
	if m := p.Nearest(lab, 1); len(m) != 1 || m[0].Name != "navy" || m[0].DeltaE != 0 {
		t.Errorf("nearest to navy: %+v", m)
	}
}

// The lists a caller gets are its own: changing one changes nothing the
// lexicon checks against.
func TestListsAreTheCallers(t *testing.T) {
	c := Categories()
	c[0] = "zzz"
	if err := CheckCategory("apparel"); err != nil || Categories()[0] != "apparel" {
		t.Errorf("after changing a returned list: CheckCategory(apparel) = %v, Categories()[0] = %q", err, Categories()[0])
	}
	k := Kinds()
	k[0] = "zzz"
	if Kinds()[0] != ProductType {
		t.Errorf("Kinds()[0] = %q after changing a returned list", Kinds()[0])
	}
}

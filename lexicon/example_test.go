package lexicon_test

import (
	"fmt"
	"os"
	"path/filepath"
	"strings"

	"github.com/whittle-search/whittle/lexicon"
)

func ExampleDefault() {
	l := lexicon.Default()
	e, _ := l.Lookup(lexicon.ProductType, "lens")
	fmt.Println(e.Name, e.Category, e.Slots[0])
	// Output: lens camera focal_length:length:mm:4..1200
}

func ExampleLexicon_Match() {
	l := lexicon.Default()
	var keys []string
	for _, w := range lexicon.Words("Navy Blue chinos") {
		keys = append(keys, lexicon.Key(w))
	}
	n, entries := l.Match(keys)
	fmt.Println(n, entries[0].Kind, entries[0].Name)
	// Output: 2 colour navy
}

func ExampleKey() {
	fmt.Println(lexicon.Key("Dresses"), lexicon.Key("women's"))
	// Output: dress women
}

func ExampleNormalise() {
	fmt.Println(lexicon.Normalise("ＴＥＥ Straße"))
	// Output: tee strasse
}

func ExampleWords() {
	fmt.Println(lexicon.Words("v-neck  top"))
	// Output: [v neck top]
}

func ExampleParseFile() {
	src := "# patterns of our own\nmoire | also=moiré, watered\n"
	entries, err := lexicon.ParseFile("patterns.wlx", lexicon.Pattern, strings.NewReader(src))
	fmt.Println(len(entries), entries[0].Name, entries[0].Aliases, err)
	// Output: 1 moire [moiré watered] <nil>
}

func ExampleLoadDir() {
	dir, _ := os.MkdirTemp("", "lexicon")
	defer os.RemoveAll(dir)
	os.WriteFile(filepath.Join(dir, "brands.wlx"), []byte("quillmoor\n"), 0o644)
	l, err := lexicon.LoadDir(dir)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(len(l.Entries(lexicon.Brand)), l.Entries(lexicon.Brand)[0].Name)
	// Output: 1 quillmoor
}

func ExampleLoad() {
	_, err := lexicon.Load(os.DirFS(os.TempDir()))
	fmt.Println(err != nil)
	// Output: true
}

func ExampleLexicon_Key() {
	l := lexicon.Default()
	fmt.Println(l.Key("dresses"), l.Key("sweater"))
	// Output: dress sweater
}

func ExampleStem() {
	fmt.Println(lexicon.Stem("batteries"), lexicon.Stem("running"), lexicon.Stem("m8"))
	// Output: batteri run m8
}

func ExampleLexicon_SlotsOf() {
	l := lexicon.Default()
	cover, _ := l.Lookup(lexicon.ProductType, "cushion cover")
	for _, s := range l.SlotsOf(cover) {
		fmt.Println(s)
	}
	// Output:
	// width:length:in:10..36
	// height:length:in:10..36
}

func ExampleLexicon_Lineage() {
	l := lexicon.Default()
	e, _ := l.Lookup(lexicon.ProductType, "chelsea boot")
	for _, a := range l.Lineage(e) {
		fmt.Println(a.Name)
	}
	// Output:
	// chelsea boot
	// boot
}

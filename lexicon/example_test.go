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

func ExampleLexicon_Suggest() {
	fmt.Println(lexicon.Default().Suggest("burgandy", lexicon.Colour))
	// Output: burgundy
}

func ExampleEntry_ColourLab() {
	e, _ := lexicon.Default().Lookup(lexicon.Colour, "navy")
	lab, _ := e.ColourLab()
	fmt.Printf("%s %.2f %.2f %.2f\n", e.Hex, lab.L, lab.A, lab.B)
	// Output: #000080 12.98 47.51 -64.70
}

func ExampleLexicon_ColourPalette() {
	l := lexicon.Default()
	e, _ := l.Lookup(lexicon.Colour, "teal")
	lab, _ := e.ColourLab()
	for _, m := range l.ColourPalette().Nearest(lab, 1) {
		fmt.Printf("%s %.1f\n", m.Name, m.DeltaE)
	}
	// Output: teal 0.0
}

func ExampleLexicon_ColourNamed() {
	e, lab, ok := lexicon.Default().ColourNamed("Navy Blue")
	fmt.Printf("%s %s %.1f %v\n", e.Name, e.Hex, lab.L, ok)
	// Output: navy #000080 13.0 true
}

func ExampleClosest() {
	fmt.Println(lexicon.Closest("colour_tolerence", []string{"min_results", "colour_tolerance", "price_stretch"}))
	// Output: colour_tolerance
}

func ExampleEditDistance() {
	fmt.Println(lexicon.EditDistance("sweter", "sweater"), lexicon.EditDistance("jakcet", "jacket"))
	// Output: 1 1
}

func ExampleEditDistanceWithin() {
	// "kitten" is 3 edits from "sitting": within 3, but past a limit of 1.
	fmt.Println(lexicon.EditDistanceWithin("kitten", "sitting", 3), lexicon.EditDistanceWithin("kitten", "sitting", 1))
	// Output: 3 2
}

func ExampleLexicon_Descendants() {
	l := lexicon.Default()
	boot, _ := l.Lookup(lexicon.ProductType, "boot")
	for _, d := range l.Descendants(boot) {
		if d.Name == "chelsea boot" {
			fmt.Println(d.Name, "is a", d.Parent)
		}
	}
	// Output: chelsea boot is a boot
}

func ExampleNearWords() {
	nw := lexicon.NewNearWords([]string{"sweater", "jacket", "trousers"})
	i, d := nw.Nearest("jakcet", 1)
	fmt.Println(i, d)
	// Output: 1 1
}

func ExampleNearWords_AllNearest() {
	// "clok" is one edit from both "clock" and "clog".
	nw := lexicon.NewNearWords([]string{"clog", "coat", "clock"})
	all, d := nw.AllNearest("clok", 1)
	fmt.Println(all, d)
	// Output: [0 2] 1
}

func ExampleCheckCategory() {
	fmt.Println(lexicon.CheckCategory("apparel"))
	fmt.Println(lexicon.CheckCategory("aparel"))
	// Output:
	// <nil>
	// unknown category "aparel"; did you mean "apparel"? (known: apparel, footwear, accessories, home, furniture, lumber, hardware, electrical, camera, tyres, office, batteries, electronics, paint, kitchen)
}

// Names lists a kind's canonical names in the order of its file,
// lexicon/data/audiences.wlx here.
func ExampleLexicon_Names() {
	fmt.Println(lexicon.Default().Names(lexicon.Audience))
	// Output: [women men kids girls boys baby unisex]
}

// DidYouMean ends a message about an unknown name with the nearest
// known one, when one is near.
func ExampleDidYouMean() {
	fmt.Printf("unknown command %q%s\n", "serch", lexicon.DidYouMean("serch", []string{"search", "serve"}))
	fmt.Printf("unknown command %q%s\n", "zzz", lexicon.DidYouMean("zzz", []string{"search", "serve"}))
	// Output:
	// unknown command "serch"; did you mean "search"?
	// unknown command "zzz"
}

func ExampleNearWords_VowelSlips() {
	// "sandles" is one edit from "candles" but only its vowels are
	// wrong for "sandals".
	nw := lexicon.NewNearWords([]string{"candles", "sandals"})
	fmt.Println(nw.VowelSlips("sandles"))
	// Output: [1]
}

// A shopper after boys' clothes is served by kids' clothes too.
func ExampleAudienceServes() {
	fmt.Println(lexicon.AudienceServes("boys"), lexicon.AudienceServes("kids"), lexicon.AudienceServes("men"))
	// Output: [boys kids] [kids boys girls] [men]
}

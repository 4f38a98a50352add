package parser_test

import (
	"encoding/json"
	"errors"
	"fmt"
	"os"

	"github.com/whittle-search/whittle/parser"
)

func ExampleParse() {
	r := parser.Parse("charcoal merino crew sweater size l under $90")
	fmt.Println("category:", r.Category)
	for _, c := range r.Constraints {
		fmt.Printf("%-12s %-10q %-12s %s\n", c.Kind, c.Text, c.Value(), c.Strictness)
	}
	// Output:
	// category: apparel
	// colour       "charcoal" charcoal     firm
	// material     "merino"   merino       soft
	// silhouette   "crew"     crew         soft
	// product_type "sweater"  sweater      firm
	// size         "size l"   l (letter)   hard
	// price        "under $90" ≤ 90.00 USD  firm
}

func ExampleParse_inferredUnit() {
	r := parser.Parse("85 lens")
	m := r.Of(parser.KindMeasure)[0]
	fmt.Println(m.Value(), m.Measure.Dimension, m.Inferred)
	fmt.Println(m.Evidence)
	// Output:
	// 85 mm focal_length true
	// unit mm from product type lens (focal_length 4..1200)
}

func ExampleParse_errors() {
	r := parser.Parse("1/0 lens")
	fmt.Println(r.Errors[0].Render())
	fmt.Println(r.Of(parser.KindProductType)[0].Name)
	// Output:
	// 1/0 lens
	// ^^^
	// 1/0 divides by zero
	// lens
}

func ExampleParseWith() {
	r := parser.ParseWith("under $50 rain jacket", parser.Options{Currency: "CAD"})
	p := r.Of(parser.KindPrice)[0].Price
	fmt.Println(*p.Max, p.Currency)
	// Output: 50.00 CAD
}

func ExampleDefaultStrictness() {
	fmt.Println(parser.DefaultStrictness(parser.KindSize), parser.DefaultStrictness(parser.KindColour), parser.DefaultStrictness(parser.KindPattern))
	// Output: hard firm soft
}

func ExampleStrictness_Down() {
	for s := parser.Hard; ; s = s.Down() {
		fmt.Print(s, " ")
		if s == parser.Filler {
			break
		}
	}
	fmt.Println()
	// Output: hard firm soft filler
}

func ExampleParseStrictness() {
	s, err := parser.ParseStrictness("firm")
	fmt.Println(s, s > parser.Soft, err)
	_, err = parser.ParseStrictness("strict")
	fmt.Println(err)
	// Output:
	// firm true <nil>
	// unknown strictness "strict" (want filler, soft, firm or hard)
}

func ExampleResult_Of() {
	r := parser.Parse("2x6 12 ft")
	s := r.Of(parser.KindSpec)[0].Spec
	fmt.Println(s.System, s.Designation, s.Dimensions["thickness"], s.Dimensions["width"], "mm")
	// Output: lumber 2x6 38 140 mm
}

func ExampleResult_WriteText() {
	parser.Parse("not white -leather sneakers").WriteText(os.Stdout, parser.TextStyle{})
	// Output:
	// query     not white -leather sneakers
	// spans     1──────── 2─────── 3───────
	// category  footwear
	//
	// #  span       kind          value              strictness  evidence
	// 1  not white  colour        not white #ffffff  firm        colour lexicon; excluded by "not"
	// 2  -leather   material      not leather        soft        material lexicon; excluded by "-"
	// 3  sneakers   product_type  sneaker            firm        product_type lexicon; head product type
}

func ExampleResult_MarshalJSON() {
	b, _ := json.Marshal(parser.Parse("under €35"))
	fmt.Println(string(b))
	// Output:
	// {"query":"under €35","category":"","constraints":[{"kind":"price","text":"under €35","start":0,"end":11,"strictness":"firm","excluded":false,"inferred":false,"evidence":"\"under\" sets a ceiling","min":null,"max":"35.00","currency":"EUR"}],"unrecognised":[],"errors":[]}
}

func ExampleConstraint_Value() {
	for _, c := range parser.Parse("225/45r17 tyres for korvane jx-10").Constraints {
		fmt.Println(c.Kind, "→", c.Value())
	}
	// Output:
	// spec → 225/45R17 (tyre)
	// product_type → tyre
	// compatibility → fits korvane jx-10
}

func ExampleError_Render() {
	r := parser.Parse("under 99999999999999999999 usd")
	fmt.Println(r.Errors[0].Render())
	// Output:
	// under 99999999999999999999 usd
	//       ^^^^^^^^^^^^^^^^^^^^
	// number 99999999999999999999 has more than 15 significant digits
}

func ExampleParse_colour() {
	r := parser.Parse("light sage linen shirt")
	c := r.Of(parser.KindColour)[0]
	fmt.Println(c.Name, c.Colour.Hex, c.Colour.Families, c.Inferred)
	// Output: light sage #bdd0a8 [green] true
}

func ExampleReadColour() {
	r, err := parser.ReadColour("dusty rose", parser.Options{})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(r.Name, r.Hex, r.Families)
	_, err = parser.ReadColour("burgandy", parser.Options{})
	fmt.Println(err)
	// Output:
	// dusty rose #c9a3a0 [red pink]
	// "burgandy" is not a colour whittle knows; did you mean "burgundy"?
}

// A name the lexicon does not know is an *UnknownColourError, apart from
// a value that is badly formed.
func ExampleUnknownColourError() {
	_, err := parser.ReadColour("burgandy", parser.Options{})
	var u *parser.UnknownColourError
	fmt.Println(errors.As(err, &u), u.Suggest)
	_, err = parser.ReadColour("#12345", parser.Options{})
	fmt.Println(errors.As(err, &u), err)
	// Output:
	// true burgundy
	// false hex colour "#12345" has 5 digits; want 3 or 6
}

// A tyre listed with its service description is filed under its size
// alone too, so that a query for the size finds it; a query that names
// a service description looks for that one.
func ExampleSpec_Keys() {
	listed := parser.Parse("205/55R16 91V").Of(parser.KindSpec)[0].Spec
	keys := listed.Keys()
	fmt.Println(keys["tyre"], "|", keys[parser.TyreSize])
	for _, q := range []string{"205/55r16", "205/55r16 91v"} {
		key, d := parser.Parse(q).Of(parser.KindSpec)[0].Spec.Key()
		fmt.Printf("%s looks under %s for %s\n", q, key, d)
	}
	// Output:
	// 205/55r16 91v | 205/55r16
	// 205/55r16 looks under tyre_size for 205/55r16
	// 205/55r16 91v looks under tyre for 205/55r16 91v
}

// The head product type is the product asked for; the others qualify it
// or name what it fits.
func ExampleConstraint_IsHead() {
	for _, c := range parser.Parse("saucepan lid").Constraints {
		fmt.Println(c.Text, c.IsHead())
	}
	// Output:
	// saucepan false
	// lid true
}

func ExampleOptions_Check() {
	fmt.Println(parser.Options{Currency: "cad", Category: "apparel"}.Check())
	fmt.Println(parser.Options{Currency: "EUR", Category: "garden"}.Check())
	// Output:
	// <nil>
	// currency "EUR" is not a dollar currency; a bare "$" may mean AUD, CAD, HKD, MXN, NZD, SGD, USD (ISO 4217)
	// unknown category "garden" (known: apparel, footwear, accessories, home, furniture, lumber, hardware, electrical, camera, tyres, office, batteries, electronics, paint, kitchen)
}

func ExampleResult_Alternatives() {
	r := parser.Parse("navy or black shirt size s/m")
	for _, i := range []int{0, 3, 4} {
		var texts []string
		for _, j := range r.Alternatives(i) {
			texts = append(texts, r.Constraints[j].Text)
		}
		fmt.Printf("%q: any of %q\n", r.Constraints[i].Text, texts)
	}
	// Output:
	// "navy": any of ["navy" "black"]
	// "shirt": any of ["shirt"]
	// "size s": any of ["size s" "m"]
}

func ExampleResult_AlternativesText() {
	r := parser.Parse("kids rain boots yellow toddler")
	fmt.Println(r.AlternativesText(0))
	// Output: kids or toddler
}

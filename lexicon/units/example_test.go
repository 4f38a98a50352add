package units_test

import (
	"errors"
	"fmt"

	"github.com/whittle-search/whittle/lexicon/units"
)

func ExampleLookup() {
	for _, s := range []string{"Inches", `"`, "fl. oz.", "mAh", "gallon"} {
		u, ok := units.Lookup(s, units.USCustomary)
		fmt.Println(s, "->", u.Symbol, u.Quantity, ok)
	}
	imp, _ := units.Lookup("gallon", units.Imperial)
	fmt.Println("imperial gallon ->", imp.Symbol, imp.ToBase, "ml")
	_, ok := units.Lookup("furlong", units.USCustomary)
	fmt.Println("furlong known:", ok)
	// Output:
	// Inches -> in length true
	// " -> in length true
	// fl. oz. -> floz volume true
	// mAh -> mah charge true
	// gallon -> gal volume true
	// imperial gallon -> imp_gal 4546.09 ml
	// furlong known: false
}

func ExampleConvert() {
	ft, _ := units.BySymbol("ft")
	in, _ := units.BySymbol("in")
	mm, _ := units.BySymbol("mm")
	g, _ := units.BySymbol("g")
	n, _ := units.Convert(6, ft, in)
	fmt.Println("6 ft =", n, "in")
	n, _ = units.Convert(85, mm, in)
	fmt.Printf("85 mm = %.3f in\n", n)
	_, err := units.Convert(1, mm, g)
	fmt.Println(errors.Is(err, units.ErrIncompatible))
	// Output:
	// 6 ft = 72 in
	// 85 mm = 3.346 in
	// true
}

func ExampleBySymbol() {
	u, ok := units.BySymbol("imp_pt")
	fmt.Println(u.Name, u.Quantity, u.ToBase, ok)
	// Output: imperial pint volume 568.26125 true
}

func ExampleBase() {
	fmt.Println(units.Base(units.Length), units.Base(units.Charge), units.Base(units.Data))
	// Output: mm mah gb
}

func ExampleUnits() {
	for _, u := range units.Units() {
		if u.Quantity == units.Data {
			fmt.Println(u.Symbol, u.ToBase)
		}
	}
	// Output:
	// kb 1e-06
	// mb 0.001
	// gb 1
	// tb 1000
	// pb 1e+06
}

func ExampleOpensPhrase() {
	fmt.Println(units.OpensPhrase("fl"), units.OpensPhrase("imperial"), units.OpensPhrase("mm"))
	// Output: true true false
}

func ExampleUnit_String() {
	for _, sym := range []string{"mm", "ml", "w", "mah", "gb", "floz"} {
		u, _ := units.BySymbol(sym)
		fmt.Print(u, " ")
	}
	fmt.Println()
	// Output: mm mL W mAh GB fl oz
}

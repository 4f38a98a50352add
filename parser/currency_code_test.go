package parser_test

import (
	"fmt"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/parser"
)

// The codes a bare "$" may stand for are ISO 4217's dollar currencies
// (and the Mexican peso, whose sign is "$" too: common practice).
func TestDollarCurrency(t *testing.T) {
	for _, tc := range []struct {
		name, code, want, err, reason string
	}{
		{"upper", "CAD", "CAD", "", "ISO 4217: CAD is the Canadian dollar"},
		{"lower", "nzd", "NZD", "", "lower case is taken and written upper, as ISO 4217 writes codes"},
		{"peso", "MXN", "MXN", "", "ISO 4217: MXN, written with \"$\" in Mexico (common practice)"},
		{"not a dollar", "EUR", "", "not a dollar currency", "ISO 4217: EUR is the euro, whose sign is not \"$\""},
		{"not a code", "XYZ", "", "not an ISO 4217 code", "ISO 4217 assigns no XYZ (from memory; bojanz/currency's CLDR data agrees)"},
		{"empty", "", "", "not an ISO 4217 code", "no code at all"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			got, err := parser.DollarCurrency(tc.code)
			switch {
			case tc.err == "" && (err != nil || got != tc.want):
				t.Errorf("DollarCurrency(%q) = %q, %v; want %q (%s)", tc.code, got, err, tc.want, tc.reason)
			case tc.err != "" && (err == nil || !strings.Contains(err.Error(), tc.err) || !strings.Contains(err.Error(), "AUD, CAD, HKD, MXN, NZD, SGD, USD")):
				t.Errorf("DollarCurrency(%q): error %v; want one containing %q and listing the codes (%s)", tc.code, err, tc.err, tc.reason)
			}
		})
	}
}

func ExampleDollarCurrency() {
	fmt.Println(parser.DollarCurrency("cad"))
	_, err := parser.DollarCurrency("EUR")
	fmt.Println(err)
	// Output:
	// CAD <nil>
	// currency "EUR" is not a dollar currency; a bare "$" may mean AUD, CAD, HKD, MXN, NZD, SGD, USD (ISO 4217)
}

func ExampleDollarCurrencies() {
	fmt.Println(parser.DollarCurrencies())
	// Output: [AUD CAD HKD MXN NZD SGD USD]
}

// Options.Currency is read in any case, and a code Parse cannot use is
// reported by Check rather than lost: before, "cad" silently meant USD.
// ISO 4217 gives CAD as the Canadian dollar's code and EUR as the euro's.
func TestOptionsCurrency(t *testing.T) {
	cases := []struct {
		name, currency, want string
		bad                  bool
		reason               string
	}{
		{"upper", "CAD", "CAD", false, "the code as ISO 4217 writes it"},
		{"lower", "cad", "CAD", false, "the same code typed in lower case"},
		{"empty", "", "USD", false, "no currency means US dollars"},
		{"not a dollar", "EUR", "USD", true, "a bare $ cannot mean euros"},
		{"not a code", "dollars", "USD", true, "not an ISO 4217 code"},
	}
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			o := parser.Options{Currency: tc.currency}
			if p := parser.ParseWith("lamp under $40", o).Of(parser.KindPrice); len(p) != 1 || p[0].Price.Currency != tc.want {
				t.Errorf("%s: price %v, want one in %s", tc.reason, p, tc.want)
			}
			if err := o.Check(); (err != nil) != tc.bad {
				t.Errorf("%s: Check() = %v, want an error: %v", tc.reason, err, tc.bad)
			}
		})
	}
	if err := (parser.Options{Volume: 7}).Check(); err == nil {
		t.Error("Check passed volume system 7")
	}
}

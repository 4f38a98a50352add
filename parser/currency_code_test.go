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

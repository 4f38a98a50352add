package parser

import (
	"fmt"
	"slices"
	"strings"

	"github.com/bojanz/currency"
)

// DollarCurrencies lists, sorted, the ISO 4217 codes Options.Currency
// may name: the currencies a bare "$" or "dollars" may stand for.
func DollarCurrencies() []string {
	out := make([]string, 0, len(dollarCurrencies))
	for c := range dollarCurrencies {
		out = append(out, c)
	}
	slices.Sort(out)
	return out
}

// DollarCurrency returns code as Options.Currency takes it: an ISO 4217
// code of a dollar currency, in upper case ("cad" is "CAD"). Any other
// code is an error that lists the accepted ones.
func DollarCurrency(code string) (string, error) {
	c := strings.ToUpper(strings.TrimSpace(code))
	if dollarCurrencies[c] {
		return c, nil
	}
	accepted := strings.Join(DollarCurrencies(), ", ")
	if c != "" && currency.IsValid(c) {
		return "", fmt.Errorf("currency %q is not a dollar currency; a bare \"$\" may mean %s (ISO 4217)", code, accepted)
	}
	return "", fmt.Errorf("currency %q is not an ISO 4217 code of a dollar currency: want one of %s", code, accepted)
}

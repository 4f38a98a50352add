package parser

import (
	"errors"
	"fmt"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/units"
)

// MaxQueryBytes is the longest query Parse accepts by default.
const MaxQueryBytes = 1024

// MaxConstraints is how many constraints Parse keeps of a query by
// default; a shopping query has a handful, and each one kept costs the
// planner a rung on every relaxation ladder.
const MaxConstraints = 64

// Options change how a query is read. The zero value is ready to use:
// default lexicon, US dollars, US customary volume, no category forced.
type Options struct {
	// Lexicon is the vocabulary; nil means lexicon.Default().
	Lexicon *lexicon.Lexicon
	// Currency is the ISO 4217 code a bare "$" or "dollars" means when it
	// is a dollar currency (USD, CAD, AUD, NZD, SGD, HKD, MXN), in any
	// case; default USD. A bare number next to a price word takes this
	// currency too. Any other code means USD: Check reports it.
	Currency string
	// Volume selects US customary (default) or imperial gallons, quarts,
	// pints, cups and fluid ounces.
	Volume units.VolumeSystem
	// Category, when set, is used instead of the category found in the
	// query: the caller knows the shopper is on, say, the apparel pages.
	Category string
	// MaxBytes overrides MaxQueryBytes when positive.
	MaxBytes int
	// MaxConstraints overrides the package's MaxConstraints when
	// positive.
	MaxConstraints int
}

func (o *Options) lexicon() *lexicon.Lexicon {
	if o.Lexicon != nil {
		return o.Lexicon
	}
	return lexicon.Default()
}

func (o *Options) maxBytes() int {
	if o.MaxBytes > 0 {
		return o.MaxBytes
	}
	return MaxQueryBytes
}

func (o *Options) maxConstraints() int {
	if o.MaxConstraints > 0 {
		return o.MaxConstraints
	}
	return MaxConstraints
}

// dollarCurrencies are the currencies a "$" may stand for.
var dollarCurrencies = map[string]bool{
	"USD": true, "CAD": true, "AUD": true, "NZD": true, "SGD": true, "HKD": true, "MXN": true,
}

func (o *Options) dollar() string {
	if c, err := DollarCurrency(o.Currency); err == nil {
		return c
	}
	return "USD"
}

// Check reports the options Parse would not use as given, all at once:
// a Currency that is not a dollar currency's ISO 4217 code (Parse reads
// "$" as USD then), a Category that is not one of lexicon.Categories
// (Parse would file the query under it anyway), and a Volume that is
// neither system (Parse reads US customary then). The zero Options pass.
func (o Options) Check() error {
	var errs []error
	if o.Currency != "" {
		if _, err := DollarCurrency(o.Currency); err != nil {
			errs = append(errs, err)
		}
	}
	if err := lexicon.CheckCategory(o.Category); err != nil {
		errs = append(errs, err)
	}
	if o.Volume != units.USCustomary && o.Volume != units.Imperial {
		errs = append(errs, fmt.Errorf("volume system %d is neither units.USCustomary nor units.Imperial", o.Volume))
	}
	return errors.Join(errs...)
}

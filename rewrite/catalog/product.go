package catalog

import (
	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/colour"
)

// Product is one line of a catalog. Only ID and Title are required.
type Product struct {
	ID          string `json:"id"`
	Title       string `json:"title"`
	Description string `json:"description,omitempty"`
	ProductType string `json:"product_type,omitempty"`
	Category    string `json:"category,omitempty"`
	Brand       string `json:"brand,omitempty"`
	// Colour is the shop's own colour name; ColourHex or ColourLab place
	// it in the colour space (else the lexicon's value for the name does).
	Colour     string      `json:"colour,omitempty"`
	ColourHex  string      `json:"colour_hex,omitempty"`
	ColourLab  *[3]float64 `json:"colour_lab,omitempty"`
	Pattern    string      `json:"pattern,omitempty"`
	Silhouette string      `json:"silhouette,omitempty"`
	Material   string      `json:"material,omitempty"`
	Audience   string      `json:"audience,omitempty"`
	Sizes      []string    `json:"sizes,omitempty"`
	// Measures are written as a shopper would, with units ("74 cm"), and
	// read by whittle's own parser, so catalog and queries agree on units.
	Measures map[string]string `json:"measures,omitempty"`
	Price    *Price            `json:"price,omitempty"`
	// Spec lists standard designations: "2x6", "14 awg", "225/45R17".
	Spec           []string `json:"spec,omitempty"`
	CompatibleWith []string `json:"compatible_with,omitempty"`
	PartNumber     string   `json:"part_number,omitempty"`
	// InStock is nil when the line does not say; such a product counts as
	// available.
	InStock *bool `json:"in_stock,omitempty"`
}

// Price is an amount, as a decimal string, in an ISO 4217 currency.
type Price struct {
	Amount   string `json:"amount"`
	Currency string `json:"currency"`
}

// Lab is the product's colour in CIELAB: its colour_lab, else its
// colour_hex, else the lexicon's value for its colour name; nil when it
// has none of them.
func (p *Product) Lab(lex *lexicon.Lexicon) *colour.Lab {
	switch {
	case p.ColourLab != nil:
		return &colour.Lab{L: p.ColourLab[0], A: p.ColourLab[1], B: p.ColourLab[2]}
	case p.ColourHex != "":
		if rgb, err := colour.ParseHex(p.ColourHex); err == nil {
			l := rgb.Lab()
			return &l
		}
	case p.Colour != "":
		if _, l, ok := lex.ColourNamed(p.Colour); ok {
			return &l
		}
	}
	return nil
}

package demo

import (
	"fmt"
	"slices"
	"sort"
	"strconv"
	"strings"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/lexicon/colour"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// Stop is one query of the tour and what it shows.
type Stop struct {
	Shows string `json:"shows"`
	Query string `json:"query"`
}

// Tour picks, from the catalog itself, one query for each thing the
// demo shows, so the tour holds whatever the generator makes. A thing the
// catalog gives no example of is left out.
func Tour(ps []catalog.Product, lex *lexicon.Lexicon) []Stop {
	var stops []Stop
	add := func(shows, q string) {
		if q != "" {
			stops = append(stops, Stop{Shows: shows, Query: q})
		}
	}
	add("an exact hit", exactHit(ps, lex))
	add("two colours offered as alternatives: either will do", alternativeColours(ps, lex))
	add("a colour the shop does not name, widened to its nearest colour names", widenedColour(ps, lex))
	add("a pattern dropped while the size stays", droppedPattern(ps, lex))
	add("a unit inferred from the product", inferredUnit(ps))
	add("a hard size kept, with the sizes carried", missingSize(ps))
	add("a compatibility target kept while the colour is dropped", keptCompat(ps, lex))
	add("a typo replaced", typo(ps))
	add("an unavailable part number answered with alternatives", unavailable(ps))
	return stops
}

// byType groups products by product type, in a stable order.
func byType(ps []catalog.Product) ([]string, map[string][]catalog.Product) {
	m := map[string][]catalog.Product{}
	for _, p := range ps {
		m[p.ProductType] = append(m[p.ProductType], p)
	}
	var types []string
	for t := range m {
		types = append(types, t)
	}
	sort.Strings(types)
	return types, m
}

func isLexiconColour(lex *lexicon.Lexicon, name string) bool {
	_, _, ok := lex.ColourNamed(name)
	return ok
}

func exactHit(ps []catalog.Product, lex *lexicon.Lexicon) string {
	for _, p := range ps {
		if p.Colour != "" && isLexiconColour(lex, p.Colour) && p.ProductType != "" && (p.InStock == nil || *p.InStock) {
			return p.Colour + " " + p.ProductType
		}
	}
	return ""
}

// alternativeColours asks for a product type in either of two colours:
// one the shop sells it in, and one it sells other types in but not
// this one. Asked for both, a plain engine finds nothing.
func alternativeColours(ps []catalog.Product, lex *lexicon.Lexicon) string {
	sold := map[string]bool{}
	for _, p := range ps {
		if isLexiconColour(lex, p.Colour) {
			sold[strings.ToLower(p.Colour)] = true
		}
	}
	var colours []string
	for c := range sold {
		colours = append(colours, c)
	}
	sort.Strings(colours)
	types, m := byType(ps)
	for _, t := range types {
		in, has := "", map[string]bool{}
		for _, p := range m[t] {
			c := strings.ToLower(p.Colour)
			has[c] = true
			if in == "" && sold[c] && (p.InStock == nil || *p.InStock) {
				in = c
			}
		}
		if in == "" {
			continue
		}
		for _, c := range colours {
			if !has[c] && !strings.Contains(c, " ") {
				return c + " or " + in + " " + t
			}
		}
	}
	return ""
}

// widenedColour finds a shop colour name the lexicon does not know, and
// the lexicon colour nearest it, and asks for that colour in a type the
// shop sells in that colour only.
func widenedColour(ps []catalog.Product, lex *lexicon.Lexicon) string {
	pal := lex.ColourPalette()
	types, m := byType(ps)
	for _, t := range types {
		names := map[string]bool{}
		for _, p := range m[t] {
			names[strings.ToLower(p.Colour)] = true
		}
		for _, p := range m[t] {
			if p.ColourHex == "" || isLexiconColour(lex, p.Colour) {
				continue
			}
			rgb, err := colour.ParseHex(p.ColourHex)
			if err != nil {
				continue
			}
			for _, near := range pal.Nearest(rgb.Lab(), 3) {
				if near.DeltaE > 0.5 && near.DeltaE < 3.5 && !names[near.Name] && !strings.Contains(near.Name, " ") {
					return near.Name + " " + t
				}
			}
		}
	}
	return ""
}

// droppedPattern asks for a pattern a sized product type never has, in a
// size it does come in.
func droppedPattern(ps []catalog.Product, lex *lexicon.Lexicon) string {
	types, m := byType(ps)
	for _, t := range types {
		items := m[t]
		if len(items[0].Sizes) == 0 || items[0].Category != "apparel" {
			continue
		}
		has := map[string]bool{}
		for _, p := range items {
			has[p.Pattern] = true
		}
		for _, pat := range []string{"striped", "plaid", "floral", "polka dot", "paisley", "camouflage"} {
			if !has[pat] {
				return fmt.Sprintf("%s %s size %s", pat, t, items[0].Sizes[0])
			}
		}
	}
	return ""
}

// inferredUnit writes a carried measure as a bare number: "50 lens".
func inferredUnit(ps []catalog.Product) string {
	for _, want := range []string{"focal_length", "diagonal"} {
		for _, p := range ps {
			if v, ok := p.Measures[want]; ok {
				if n, _, ok := strings.Cut(v, " "); ok {
					return n + " " + p.ProductType
				}
			}
		}
	}
	return ""
}

// missingSize asks for a numeric shoe size above every size carried.
func missingSize(ps []catalog.Product) string {
	types, m := byType(ps)
	for _, t := range types {
		items := m[t]
		if items[0].Category != "footwear" {
			continue
		}
		top := 0.0
		for _, p := range items {
			for _, s := range p.Sizes {
				if v, err := strconv.ParseFloat(s, 64); err == nil && v > top {
					top = v
				}
			}
		}
		if top > 0 {
			return fmt.Sprintf("%s size %g", t, top+2)
		}
	}
	return ""
}

// keptCompat asks for a compatible product in a colour no such product
// comes in.
func keptCompat(ps []catalog.Product, lex *lexicon.Lexicon) string {
	for _, p := range ps {
		if len(p.CompatibleWith) == 0 || p.ProductType == "" {
			continue
		}
		target := p.CompatibleWith[0]
		colours := map[string]bool{}
		for _, q := range ps {
			if q.ProductType == p.ProductType && slices.Contains(q.CompatibleWith, target) {
				colours[strings.ToLower(q.Colour)] = true
			}
		}
		for _, c := range []string{"pink", "orange", "purple", "yellow", "teal", "lime"} {
			if !colours[c] {
				return fmt.Sprintf("%s %s for %s", c, p.ProductType, target)
			}
		}
	}
	return ""
}

// typo swaps two inner letters of a one-word product type of 5 to 7
// letters.
func typo(ps []catalog.Product) string {
	for _, p := range ps {
		t := p.ProductType
		if len(t) < 5 || len(t) > 7 || strings.ContainsAny(t, " -") {
			continue
		}
		b := []byte(t)
		b[2], b[3] = b[3], b[2]
		if string(b) != t {
			return string(b)
		}
	}
	return ""
}

// unavailable asks for the part number of a product out of stock whose
// type has available products too.
func unavailable(ps []catalog.Product) string {
	avail := map[string]bool{}
	for _, p := range ps {
		if p.InStock == nil || *p.InStock {
			avail[p.ProductType] = true
		}
	}
	for _, p := range ps {
		if p.PartNumber != "" && p.InStock != nil && !*p.InStock && avail[p.ProductType] {
			return strings.ToLower(p.PartNumber)
		}
	}
	return ""
}

package rewrite

import (
	"fmt"

	"github.com/whittle-search/whittle/lexicon"
)

// ScopeProblem says why a policy cannot be settled for a category and
// a product type.
type ScopeProblem int

const (
	// ScopeUnknownCategory: the category is not one of lexicon.Categories().
	ScopeUnknownCategory ScopeProblem = iota + 1
	// ScopeUnknownProductType: the product type is not in the lexicon.
	ScopeUnknownProductType
	// ScopeCategoryMismatch: the product type belongs to another
	// category than the one given.
	ScopeCategoryMismatch
)

// ScopeError is a category or product type a policy cannot be settled
// for; Msg is one line naming the problem.
type ScopeError struct {
	Problem ScopeProblem
	Msg     string
}

// Error returns the message.
func (e *ScopeError) Error() string { return e.Msg }

// Settle is the policy in force for a category and a product type,
// either of which may be "", as a query of that product type is read: a
// product type brings its category (the lexicon's), so an empty category
// is the product type's own, and a category that contradicts it is an
// error. Every error is a *ScopeError. A nil lex means
// lexicon.Default().
func (p *Policy) Settle(category, productType string, lex *lexicon.Lexicon) (Effective, error) {
	if lex == nil {
		lex = lexicon.Default()
	}
	if err := lexicon.CheckCategory(category); err != nil {
		return Effective{}, &ScopeError{ScopeUnknownCategory, err.Error()}
	}
	if productType != "" {
		e, ok := lex.Lookup(lexicon.ProductType, productType)
		if !ok {
			names := lex.Names(lexicon.ProductType)
			return Effective{}, &ScopeError{ScopeUnknownProductType, fmt.Sprintf("unknown product type %q%s", productType, didYouMean(productType, names))}
		}
		own := typeCategory(lex, e)
		switch {
		case category == "":
			category = own
		case own != "" && own != category:
			return Effective{}, &ScopeError{ScopeCategoryMismatch, fmt.Sprintf("product type %q is in category %s, not %s", productType, own, category)}
		}
	}
	return p.For(category, productType, lex), nil
}

// typeCategory is the category of product type e: its own, else its
// nearest ancestor's.
func typeCategory(lex *lexicon.Lexicon, e *lexicon.Entry) string {
	for _, a := range lex.Lineage(e) {
		if a.Category != "" {
			return a.Category
		}
	}
	return ""
}

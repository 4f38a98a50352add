// Package rewrite decides what to give up when a parsed query finds
// nothing, and says so.
//
// A [Policy] (whittle's TOML layout; the built-in one is policy.toml)
// sets each constraint's strictness by kind, measure dimension, category
// and product type, with the tolerances used to widen colours, measures
// and prices. A [Rewriter] asks an [Engine] how many products a [Plan]
// matches, and relaxes the query least important first: filler goes
// before anything is counted; a firm constraint is widened (a colour to
// the catalog colours near it, a measure by its tolerance or to the sizes
// around it, a product type to its parent, a price ceiling by its
// stretch) before it is dropped; an unknown word may be read as the word
// it is a typo of, and a misspelt product type is fixed and the query
// read again, so that the type's category and measure slots apply (when
// the word is as near to several, the reading the catalog bears out);
// soft constraints are dropped; hard constraints and exclusions are
// never touched. The search is best-first over sets of relaxations,
// within a budget of engine counts and the context's deadline. When the
// hard constraints alone, with the product type at its broadest, find
// nothing, nothing is relaxed and the [Outcome] names what the catalog
// carries instead. An engine call that fails is the rescue's error.
//
// [RelaxOrder] lists what may be given up, least important first, for
// callers that relax by themselves.
package rewrite

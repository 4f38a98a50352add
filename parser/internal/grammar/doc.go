// Package grammar is whittle's query grammar: a hand-written lexer that
// keeps every byte offset of the raw query, and a participle grammar over
// its tokens that finds the structure of a shopping query (numbers,
// fractions, quantities with units, dimensions, ranges, comparisons,
// prices, tyre codes, alphanumeric codes, quoted phrases and exclusion
// marks). It knows no vocabulary beyond units and currency words; the
// parser package turns its tree into the public constraint model.
//
// The package is internal so that participle's types never reach
// whittle's API.
package grammar

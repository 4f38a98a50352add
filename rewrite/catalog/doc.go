// Package catalog reads a shop's catalog: JSON Lines, one product a line,
// in the layout the README documents. Only "id" and "title" are required.
//
// For now it gathers the shop's colour vocabulary: every colour name the
// catalog uses, placed in CIELAB from "colour_hex", "colour_lab" or, when
// the line gives neither, the lexicon, with the number of products of
// each. A malformed line is an error naming its line number and field.
package catalog

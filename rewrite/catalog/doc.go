// Package catalog reads a shop's catalog: JSON Lines, one product a line,
// in the layout the README documents. Only "id" and "title" are required.
//
// [Reader] reads products one by one, checking every field; a malformed
// line is a *LineError naming its line number and field. Measures and
// standard designations are read by whittle's own parser, so the catalog
// and the queries agree on units. [ReadColours] gathers the colour
// vocabulary alone: every colour name the catalog uses, placed in CIELAB
// from "colour_hex", "colour_lab" or, when the line gives neither, the
// lexicon, with the number of products of each.
//
// [Demo] generates the catalog of an invented general store, the same
// for the same size and seed, for the demo and the benchmarks.
package catalog

// Package lexicon holds whittle's domain vocabulary: product types with their
// categories, parents and measure slots, colour words, patterns, silhouettes,
// materials, audiences, brands and filler words.
//
// The vocabulary lives in plain text files of whittle's own line format
// (".wlx", described in DEVELOPERS.md and in [ParseFile]), one file per kind.
// The default files are embedded in the binary; a shop can bring its own
// directory with [LoadDir]. Entries are matched by [Lexicon.Match] with a
// longest-match trie over normalised, stemmed words, so "Dresses" finds
// "dress" and "navy blue" matches as one span.
//
// Sub-packages hold the rest of the domain knowledge: units of measure
// (lexicon/units) and standard designations such as lumber, tyre, wire,
// thread, paper and battery sizes (lexicon/spec).
//
// Package lexicon imports no other whittle package.
package lexicon

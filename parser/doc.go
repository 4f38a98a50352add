// Package parser turns a raw shopping query into typed constraints.
//
// [Parse] tags each span of a query with its kind (product type, colour,
// pattern, silhouette, material, size, audience, measure, standard
// designation, price, compatibility target, brand, part number, keyword
// or filler), its normalised value and its strictness, and returns what
// it understood together with a list of positioned errors: one badly
// formed number never throws away the rest of the query.
//
// Every constraint carries byte offsets (Start, End) into the raw query.
// Spans never overlap and always lie inside the query.
//
// The structure of numbers, units, dimensions, ranges, prices and codes is
// found by a participle grammar kept in parser/internal/grammar; words are
// matched against a [lexicon.Lexicon]. Where two readings compete, the
// rules documented on [Parse] decide, and the constraint's Evidence says
// which rule did.
package parser

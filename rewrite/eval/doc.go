// Package eval measures how well whittle rescues queries that find
// nothing, beside the blind partial match a plain engine falls back to.
//
// [Generate] writes a labelled set of queries from a catalog held in
// memory, by a seeded procedure: it takes a real product, writes the query
// a shopper would type for it from its attributes, in varied word orders
// and phrasings, then makes the query miss its exact match in one known
// way (a [Failure]). Each [Case] keeps the truth: the product meant, the
// attributes typed, which of them the policy makes hard, and what was
// injected. A set is written in one [Style]: short queries of about three
// constraints, or long ones of four to seven, from more of the product's
// attributes (brand, silhouette and a price ceiling too).
//
// [Evaluate] runs every case through whittle and through the baseline on
// the same engine: one of the blind partial matches of
// [bleveengine.Fallback], keeping the most words any product has or
// dropping words from the end of the query. [Score] checks each hit against the real
// attributes of the product it names: the top k each search returns,
// and every product it matched, which its count, its facets and a sort
// by anything but relevance see ([SetScore]). [Run] does it all on the demo
// catalog, in a temporary index, and [RunStyles] does it for several
// styles on one index. A [Report] holds the figures of both,
// the goals they are held to, and the cases where whittle does worse.
package eval

// Package demo runs whittle's demonstration: it generates the invented
// demo catalog (an invented general store), indexes it once, picks from
// the catalog itself a tour of queries that each show one thing whittle
// does, and runs each against the index beside the blind partial match a
// plain engine would fall back to.
package demo

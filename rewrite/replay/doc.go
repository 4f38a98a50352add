// Package replay runs a shop's query log through whittle and sums up
// what would change: how many searches find nothing before and after
// rescue, which relaxations did it, which queries still find nothing and
// which hard constraint stopped them, and which frequent queries find
// nothing as typed (a head query going empty usually means a catalog or
// publishing fault, not a long-tail query).
//
// A log streams through in bounded memory: Read yields one entry at a
// time, Run keeps only a fixed number of queries in flight, and a
// Summary keeps fixed-size tallies, however long the log.
package replay

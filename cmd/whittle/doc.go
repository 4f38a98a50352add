// Command whittle reads shopping queries into typed constraints, and
// rescues those that find nothing by relaxing them in order of least
// importance, against an embedded bleve index of a catalog.
//
//	whittle demo                     a tour on an invented store's catalog
//	whittle explain [flags] QUERY... how each query is read
//	whittle colour [flags] COLOUR... describe, compare or search colours
//	whittle policy show|check ...    the strictness policy in force
//	whittle index --catalog FILE     build the search index of a catalog
//	whittle search [flags] QUERY     search the index, rescuing a miss
//	whittle replay --log FILE        what whittle would change in a query log
//	whittle tune --signals FILE      learn strictness from shoppers' signals
//	whittle serve [--index DIR]      parse and rescue as a JSON service
//	whittle bench [--products N]     time index building and rescues
//	whittle eval [flags]             rescue quality against the blind match
//
// The command is flags and printing only; everything it does is in the
// packages parser, lexicon and rewrite. Run "whittle help" for the
// commands and "whittle COMMAND -h" for each one's flags.
package main

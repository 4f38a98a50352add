// Package reference reads the tab-separated reference tables kept in the
// module's testdata/reference directory: published standards, handbook
// tables and open data (NIST SP 811 unit factors, PS 20 lumber sizes,
// ASTM B258 wire gauges, ISO 216 paper sizes, IEC 60086 batteries, ISO 261
// and ASME B1.1 threads, ISO metric tyre codes, CSS colours, the
// CIEDE2000 test pairs). Each table opens with "# source:" lines that
// name where its numbers come from.
//
// whittle's tests use it to check the parser and the lexicon against
// those sources. The tables are data, never code under test: nothing in
// whittle derives its expected values from its own output.
package reference

// Package textout writes the reports' text: a printer that keeps the
// first write error, so that a report is written line by line and its
// error checked once, and counts with their nouns in the singular or
// the plural.
package textout

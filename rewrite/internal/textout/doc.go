// Package textout writes the reports' text: a printer that keeps the
// first write error, so that a report is written line by line and its
// error checked once.
package textout

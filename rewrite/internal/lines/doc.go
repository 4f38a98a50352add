// Package lines splits a file into lines, as bufio.Scanner does, but
// goes on past a line too long to keep, which it reports and skips, so
// that a reader that skips bad lines can skip that one too; and it drops
// a UTF-8 byte order mark at the start of the file, which some
// spreadsheet programs and editors write.
package lines

package replay

import (
	"bytes"
	"encoding/csv"
	"testing"
)

// A query log holds what shoppers typed, and a spreadsheet runs a cell
// that begins with =, +, -, @, a tab or a carriage return as a formula
// (OWASP, "CSV Injection"). Such cells get a single quote before them,
// which spreadsheets read as text; a cell of whittle's own numbers and
// names is written as it is.
func TestCSVCellsAreNoFormulas(t *testing.T) {
	for _, tc := range []struct {
		query, want, reason string
	}{
		{`=HYPERLINK("http://example.invalid","x")`, `'=HYPERLINK("http://example.invalid","x")`, "a formula a shopper typed"},
		{"+1 red dress", "'+1 red dress", "a plus begins a formula"},
		{"-leather jacket", "'-leather jacket", "so does a minus, the mark of an exclusion too"},
		{"@sum", "'@sum", "and an at sign"},
		{"\tred", "'\tred", "and a tab"},
		{"red dress", "red dress", "a plain query is written as typed"},
	} {
		var b bytes.Buffer
		c := NewCSV(&b)
		res := &Result{Entry: Entry{Line: 1, Query: tc.query, Count: 1}, Changes: []Change{{Op: "drop", Kind: "keyword", Text: "x"}}, HardUnmet: []string{tc.query}}
		if err := c.Write(res); err != nil {
			t.Fatal(err)
		}
		if err := c.Flush(); err != nil {
			t.Fatal(err)
		}
		rows, err := csv.NewReader(&b).ReadAll()
		if err != nil {
			t.Fatal(err)
		}
		if len(rows) != 2 || rows[1][1] != tc.want || rows[1][8] != tc.want || rows[1][7] != "drop keyword x" {
			t.Errorf("%s: row %q; want query and hard_unmet %q", tc.reason, rows[len(rows)-1], tc.want)
		}
	}
}

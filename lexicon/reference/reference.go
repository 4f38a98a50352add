package reference

import (
	"bufio"
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
)

// Row is one data row of a table, keyed by column name.
type Row map[string]string

// Float returns the cell of column col as a number.
func (r Row) Float(col string) (float64, error) {
	v, err := strconv.ParseFloat(r[col], 64)
	if err != nil {
		return 0, fmt.Errorf("column %s: %q is not a number", col, r[col])
	}
	return v, nil
}

// Table is a reference table: its source lines and its rows.
type Table struct {
	Name string
	// Source holds the "# source:" and "# note:" lines, without "# ".
	Source []string
	Header []string
	Rows   []Row
}

// Dir returns the reference directory: $WHITTLE_REFERENCE when set, else
// testdata/reference beside the go.mod found by walking up from the
// working directory.
func Dir() (string, error) {
	if d := os.Getenv("WHITTLE_REFERENCE"); d != "" {
		return d, nil
	}
	dir, err := os.Getwd()
	if err != nil {
		return "", err
	}
	for {
		if _, err := os.Stat(filepath.Join(dir, "go.mod")); err == nil {
			return filepath.Join(dir, "testdata", "reference"), nil
		}
		parent := filepath.Dir(dir)
		if parent == dir {
			return "", errors.New("reference: no go.mod above the working directory")
		}
		dir = parent
	}
}

// Read reads the named table from [Dir]. Lines starting with '#' are
// comments; the first other line is the header; every row must have as
// many cells as the header.
func Read(name string) (*Table, error) {
	dir, err := Dir()
	if err != nil {
		return nil, err
	}
	f, err := os.Open(filepath.Join(dir, name))
	if err != nil {
		return nil, err
	}
	defer f.Close()
	t := &Table{Name: name}
	sc := bufio.NewScanner(f)
	sc.Buffer(make([]byte, 64<<10), 1<<20)
	line := 0
	for sc.Scan() {
		line++
		text := sc.Text()
		if text == "" {
			continue
		}
		if strings.HasPrefix(text, "#") {
			t.Source = append(t.Source, strings.TrimSpace(strings.TrimPrefix(text, "#")))
			continue
		}
		cells := strings.Split(text, "\t")
		if t.Header == nil {
			t.Header = cells
			continue
		}
		if len(cells) != len(t.Header) {
			return nil, fmt.Errorf("%s:%d: %d cells, header has %d", name, line, len(cells), len(t.Header))
		}
		row := make(Row, len(cells))
		for i, c := range cells {
			row[t.Header[i]] = c
		}
		t.Rows = append(t.Rows, row)
	}
	if err := sc.Err(); err != nil {
		return nil, fmt.Errorf("%s: %w", name, err)
	}
	if len(t.Rows) == 0 {
		return nil, fmt.Errorf("%s: no data rows", name)
	}
	return t, nil
}

// Rows reads the named table for a test, failing the test when it cannot.
func Rows(tb testing.TB, name string) []Row {
	tb.Helper()
	t, err := Read(name)
	if err != nil {
		tb.Fatal(err)
	}
	return t.Rows
}

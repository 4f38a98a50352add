package spec

import (
	"embed"
	"fmt"
	"strconv"
	"strings"
	"sync"
)

//go:embed data/*.tsv
var dataFS embed.FS

// tables holds every parsed data file; it is read-only once built.
type tables struct {
	lumber    map[[2]int]lumberRow
	metric    []metricRow
	unified   map[string]unifiedRow // key "#4" or "1/4"
	paper     map[string]paperRow   // key "A4"
	batteries []batteryRow
	battery   map[string]int // every accepted name, upper case, to index
}

var (
	loadOnce sync.Once
	loaded   *tables
)

// data returns the parsed tables, parsing them on first use. The files are
// embedded, so a parse failure is a programming error and panics; the
// package tests parse every file.
func data() *tables {
	loadOnce.Do(func() {
		t, err := parseAll()
		if err != nil {
			panic(err)
		}
		loaded = t
	})
	return loaded
}

func parseAll() (*tables, error) {
	t := &tables{}
	var err error
	if t.lumber, err = parseLumber(); err != nil {
		return nil, err
	}
	if t.metric, err = parseMetric(); err != nil {
		return nil, err
	}
	if t.unified, err = parseUnified(); err != nil {
		return nil, err
	}
	if t.paper, err = parsePaper(); err != nil {
		return nil, err
	}
	if t.batteries, t.battery, err = parseBatteries(); err != nil {
		return nil, err
	}
	return t, nil
}

// readRows reads one embedded file: '#' lines are comments, the first
// other line must be the header want, and every row must have as many
// tab-separated cells.
func readRows(name string, want ...string) ([][]string, error) {
	b, err := dataFS.ReadFile("data/" + name)
	if err != nil {
		return nil, err
	}
	var rows [][]string
	header := false
	for i, line := range strings.Split(string(b), "\n") {
		line = strings.TrimRight(line, "\r")
		if line == "" || strings.HasPrefix(line, "#") {
			continue
		}
		cells := strings.Split(line, "\t")
		if !header {
			if strings.Join(cells, "\t") != strings.Join(want, "\t") {
				return nil, fmt.Errorf("spec: %s: header %q, want %q", name, cells, want)
			}
			header = true
			continue
		}
		if len(cells) != len(want) {
			return nil, fmt.Errorf("spec: %s line %d: %d cells, want %d", name, i+1, len(cells), len(want))
		}
		rows = append(rows, cells)
	}
	if len(rows) == 0 {
		return nil, fmt.Errorf("spec: %s: no rows", name)
	}
	return rows, nil
}

// parsePair reads "A x B" with a parser for each side.
func parsePair[T any](s string, parse func(string) (T, error)) (T, T, error) {
	var zero T
	a, b, ok := strings.Cut(s, " x ")
	if !ok {
		return zero, zero, fmt.Errorf("%q: want \"A x B\"", s)
	}
	x, err := parse(a)
	if err != nil {
		return zero, zero, err
	}
	y, err := parse(b)
	if err != nil {
		return zero, zero, err
	}
	return x, y, nil
}

func parseFloat(s string) (float64, error) { return strconv.ParseFloat(s, 64) }

// parseInches reads a whole-and-fraction inch value: "3/4", "1-1/2", "2".
func parseInches(s string) (float64, error) {
	whole, frac := "", s
	if w, f, ok := strings.Cut(s, "-"); ok {
		whole, frac = w, f
	} else if !strings.Contains(s, "/") {
		whole, frac = s, ""
	}
	v := 0.0
	if whole != "" {
		n, err := strconv.Atoi(whole)
		if err != nil {
			return 0, fmt.Errorf("inch value %q: %v", s, err)
		}
		v = float64(n)
	}
	if frac != "" {
		num, den, ok := strings.Cut(frac, "/")
		n, err1 := strconv.Atoi(num)
		d, err2 := strconv.Atoi(den)
		if !ok || err1 != nil || err2 != nil || d <= 0 || n <= 0 || n >= d {
			return 0, fmt.Errorf("inch value %q: bad fraction", s)
		}
		v += float64(n) / float64(d)
	}
	return v, nil
}

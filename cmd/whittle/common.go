package main

import (
	"fmt"
	"io"
	"slices"
	"strings"

	"github.com/whittle-search/whittle/lexicon"
)

// loadLexicon returns the lexicon a --lexicon flag names, or the default
// when dir is empty; on an error it reports it for command cmd.
func loadLexicon(cmd, dir string, stderr io.Writer) (*lexicon.Lexicon, bool) {
	if dir == "" {
		return lexicon.Default(), true
	}
	lx, err := lexicon.LoadDir(dir)
	if err != nil {
		fmt.Fprintf(stderr, "whittle %s: %v\n", cmd, err)
		return nil, false
	}
	return lx, true
}

// checkCategory reports an unknown --category value for command cmd.
func checkCategory(cmd, category string, stderr io.Writer) bool {
	if category == "" || slices.Contains(lexicon.Categories, category) {
		return true
	}
	fmt.Fprintf(stderr, "whittle %s: unknown category %q (known: %s)\n", cmd, category, strings.Join(lexicon.Categories, ", "))
	return false
}

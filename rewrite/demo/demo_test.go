package demo

import (
	"bytes"
	"context"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

func TestTourHasEveryStop(t *testing.T) {
	stops := Tour(catalog.Demo(3000, 1), lexicon.Default())
	if len(stops) < 8 {
		t.Fatalf("the tour has %d stops, want 8: %+v", len(stops), stops)
	}
	for _, s := range stops {
		if s.Query == "" || s.Shows == "" {
			t.Errorf("empty stop %+v", s)
		}
	}
}

// The whole demo, on a smaller catalog in a temporary directory: every
// stop shows what it says it shows.
func TestRun(t *testing.T) {
	var out bytes.Buffer
	if err := Run(context.Background(), &out, Options{Dir: t.TempDir(), Products: 3000}); err != nil {
		t.Fatal(err)
	}
	text := out.String()
	for _, want := range []string{
		"exact matches",                     // the exact hit
		"in colours close to",               // the colour widened
		"in any pattern",                    // the pattern dropped
		"(inferred)",                        // the unit inferred
		"is not carried",                    // the hard size kept
		"in any colour",                     // the compatibility kept, colour dropped
		"Showing results for",               // the typo replaced
		"is unavailable. Showing available", // alternatives
		"blind partial match",
	} {
		if !strings.Contains(text, want) {
			t.Errorf("the demo output lacks %q:\n%s", want, text)
		}
	}
}

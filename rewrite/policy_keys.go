package rewrite

import (
	"fmt"
	"strings"
	"unicode/utf8"

	"github.com/whittle-search/whittle/lexicon"
)

// position is a line and column in a policy file, 1-based.
type position struct{ line, col int }

// keyPositions finds where each key of a TOML file is written: table
// headers and key = value lines, keyed by the key's full path joined
// with NUL. It reads only as much TOML as whittle's policy layout uses.
func keyPositions(lines []string) map[string]position {
	out := make(map[string]position)
	var table []string
	for i, line := range lines {
		t := strings.TrimSpace(line)
		col := strings.Index(line, t) + 1
		switch {
		case t == "" || strings.HasPrefix(t, "#"):
		case strings.HasPrefix(t, "["):
			inner := strings.Trim(t, "[]")
			if j := strings.Index(inner, "]"); j >= 0 {
				inner = inner[:j]
			}
			table = splitKey(inner)
			out[strings.Join(table, "\x00")] = position{i + 1, col}
		default:
			k, _, ok := strings.Cut(t, "=")
			if !ok {
				continue
			}
			full := append(append([]string(nil), table...), splitKey(k)...)
			out[strings.Join(full, "\x00")] = position{i + 1, col}
		}
	}
	return out
}

// splitKey splits a dotted TOML key, honouring quotes.
func splitKey(s string) []string {
	var parts []string
	var b strings.Builder
	quote := rune(0)
	for _, r := range s {
		switch {
		case quote != 0 && r == quote:
			quote = 0
		case quote != 0:
			b.WriteRune(r)
		case r == '"' || r == '\'':
			quote = r
		case r == '.':
			parts = append(parts, strings.TrimSpace(b.String()))
			b.Reset()
		default:
			b.WriteRune(r)
		}
	}
	return append(parts, strings.TrimSpace(b.String()))
}

var settingKeys = []string{"min_results", "colour_tolerance", "measure_tolerance", "price_stretch", "strictness", "dimensions", "standard_sizes"}

// knownKeys lists the keys allowed where the unknown key k stands.
func knownKeys(k []string) []string {
	switch {
	case len(k) == 1:
		return []string{"defaults", "category", "product_type", "signals"}
	case k[0] == "signals" && len(k) == 2:
		return signalKeys
	case k[0] == "defaults" && len(k) == 2, (k[0] == "category" || k[0] == "product_type") && len(k) == 3:
		return settingKeys
	}
	return nil
}

// nearest returns the known name closest to an unknown one, or "":
// lexicon.Closest, which allows a third of the word's letters to be
// wrong, and for a word of four or five letters two ("colr" is
// "colour"), the first of equally close names winning.
func nearest(word string, known []string) string {
	if s := lexicon.Closest(word, known); s != "" || utf8.RuneCountInString(word) < 4 {
		return s
	}
	best, bestD := "", 3
	for _, k := range known {
		if d := lexicon.EditDistanceWithin(word, k, 2); d < bestD {
			best, bestD = k, d
		}
	}
	return best
}

// didYouMean is `; did you mean "x"?`, or "" when nothing is close.
func didYouMean(word string, known []string) string {
	if s := nearest(word, known); s != "" {
		return fmt.Sprintf("; did you mean %q?", s)
	}
	return ""
}

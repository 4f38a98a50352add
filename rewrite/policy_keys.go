package rewrite

import (
	"fmt"
	"slices"
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
		if i == 0 {
			// A byte order mark is no part of the first line's key.
			line = strings.TrimPrefix(line, "\ufeff")
		}
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
			eq := unquoted(t, '=')
			if eq < 0 {
				continue
			}
			full := append(append([]string(nil), table...), splitKey(t[:eq])...)
			out[strings.Join(full, "\x00")] = position{i + 1, col}
			inlineKeys(out, full, line, i+1)
		}
	}
	return out
}

// inlineKeys records where the keys of an inline table stand when line,
// the number n, sets the key full to one: "strictness = { colour =
// "hard", size = "firm" }" puts strictness.colour and strictness.size
// at their own columns. Nested inline tables, and tables in arrays, are
// looked into too; a quoted string is skipped whole, so an "=" or "{" in
// one is no key.
func inlineKeys(out map[string]position, full []string, line string, n int) {
	v := line[unquoted(line, '=')+1:]
	// open holds the inline tables and arrays the value is in, innermost
	// last: a table by its key, an array as nil.
	var open [][]string
	inTable := func() bool { return len(open) > 0 && open[len(open)-1] != nil }
	last := full // the key whose value is being read
	inKey, keyAt := false, -1
	for i := len(line) - len(v); i < len(line); i++ {
		switch c := line[i]; {
		case c == '"' || c == '\'':
			if inKey && keyAt < 0 {
				keyAt = i
			}
			i = stringEnd(line, i)
		case inKey && c == '=' && keyAt >= 0:
			last = append(slices.Clone(open[len(open)-1]), splitKey(line[keyAt:i])...)
			out[strings.Join(last, "\x00")] = position{n, keyAt + 1}
			inKey, keyAt = false, -1
		case inKey && c == '}':
			// An empty table, or a comma before the brace.
			open, inKey, keyAt = open[:len(open)-1], false, -1
		case inKey:
			if keyAt < 0 && c != ' ' && c != '\t' {
				keyAt = i
			}
		case c == '{':
			open, inKey = append(open, slices.Clone(last)), true
		case c == '[':
			open = append(open, nil)
		case (c == '}' || c == ']') && len(open) > 0:
			open = open[:len(open)-1]
		case c == ',' && inTable():
			inKey = true
		case c == '#':
			return
		}
	}
}

// stringEnd returns the index of the quote that closes the TOML string
// opening at line[i], or the line's last index when none does. A basic
// string ("...") takes backslash escapes; a literal one ('...') none.
func stringEnd(line string, i int) int {
	q := line[i]
	for j := i + 1; j < len(line); j++ {
		switch {
		case q == '"' && line[j] == '\\':
			j++
		case line[j] == q:
			return j
		}
	}
	return len(line) - 1
}

// unquoted returns the index of the first c in line outside quoted
// strings, or -1.
func unquoted(line string, c byte) int {
	for i := 0; i < len(line); i++ {
		switch line[i] {
		case '"', '\'':
			i = stringEnd(line, i)
		case c:
			return i
		}
	}
	return -1
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

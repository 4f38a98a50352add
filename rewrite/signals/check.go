package signals

import (
	"slices"
	"strings"
	"unicode/utf8"

	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
)

// types lists every event type, for messages.
const types = "search, impression, click, add_to_cart or purchase"

func isType(t Type) bool {
	return t == Search || slices.Contains(interactions, t)
}

// check says what is wrong with an event, field by field; both the
// reader and the writer hold events to it, so that what one writes the
// other reads.
func check(e *Event) *fieldError {
	switch {
	case e.Type == "":
		return fieldErr("type", "missing; every event needs it (%s)", types)
	case !isType(e.Type):
		return fieldErr("type", "%q is not an event type (%s)", e.Type, types)
	case blank(e.Session):
		return fieldErr("session", "missing or blank; every event needs it")
	case e.Time.IsZero():
		return fieldErr("time", "missing, or the zero time 0001-01-01T00:00:00Z; every event needs the time it happened")
	case e.Time.Year() > 9999:
		return fieldErr("time", "year %d is past RFC 3339's 9999", e.Time.Year())
	}
	if e.Type == Search {
		return checkSearch(e)
	}
	return checkInteraction(e)
}

func checkSearch(e *Event) *fieldError {
	if blank(e.Query) {
		return fieldErr("query", "missing or blank; every search needs it")
	}
	if e.Product != "" {
		return productOnSearch()
	}
	if ferr := checkRelaxed("relaxations", e.Relaxations); ferr != nil {
		return ferr
	}
	if ferr := checkShown(e.Shown); ferr != nil {
		return ferr
	}
	if x := e.Explored; x != nil {
		if x.Rank < 1 || x.Rank > len(e.Shown) {
			return fieldErr("explored.rank", "%d is not a rank among the %d products shown (1..%[2]d)", x.Rank, len(e.Shown))
		}
		if len(x.Relaxations) == 0 {
			return fieldErr("explored.relaxations", "missing or empty; an explored product comes from at least one relaxation")
		}
		if ferr := checkRelaxed("explored.relaxations", x.Relaxations); ferr != nil {
			return ferr
		}
	}
	return nil
}

func checkRelaxed(field string, rs []Relaxed) *fieldError {
	for i, r := range rs {
		switch r.Op {
		case rewrite.OpWiden, rewrite.OpReplace, rewrite.OpDrop:
		default:
			return fieldErr(field, "relaxation %d: op %q is not widen, replace or drop", i+1, r.Op)
		}
		if !slices.Contains(parser.AllKinds(), r.Kind) {
			return fieldErr(field, "relaxation %d: kind %q is not a kind whittle reads (%s)", i+1, r.Kind, kinds())
		}
	}
	return nil
}

func kinds() string {
	var b strings.Builder
	for i, k := range parser.AllKinds() {
		if i > 0 {
			b.WriteString(", ")
		}
		b.WriteString(string(k))
	}
	return b.String()
}

// checkShown refuses a blank product id and one shown twice. A search
// shows a page of products: up to a few dozen, ids are told apart by a
// fingerprint of their length and last bytes first, which is cheaper than
// a map; past that a map is used.
func checkShown(shown []string) *fieldError {
	for i, id := range shown {
		if blank(id) {
			return fieldErr("shown", "product %d is a blank id", i+1)
		}
	}
	if len(shown) <= 32 {
		var fps [32]uint64
		for i, id := range shown {
			fp := fingerprint(id)
			for j := range i {
				if fps[j] == fp && shown[j] == id {
					return dupShown(id, j, i)
				}
			}
			fps[i] = fp
		}
		return nil
	}
	at := make(map[string]int, len(shown))
	for i, id := range shown {
		if j, dup := at[id]; dup {
			return dupShown(id, j, i)
		}
		at[id] = i
	}
	return nil
}

// fingerprint packs a string's length and its last seven bytes, where
// product ids of one shop mostly differ.
func fingerprint(s string) uint64 {
	fp := uint64(len(s))
	for i := max(0, len(s)-7); i < len(s); i++ {
		fp = fp<<8 | uint64(s[i])
	}
	return fp
}

func dupShown(id string, first, again int) *fieldError {
	return fieldErr("shown", "%q is shown twice, at %d and %d", id, first+1, again+1)
}

func checkInteraction(e *Event) *fieldError {
	if blank(e.Product) {
		return fieldErr("product", "missing or blank; every %s needs the product's id", e.Type)
	}
	field := ""
	switch {
	case e.Query != "":
		field = "query"
	case e.Category != "":
		field = "category"
	case e.Relaxations != nil:
		field = "relaxations"
	case e.Shown != nil:
		field = "shown"
	case e.Explored != nil:
		field = "explored"
	case e.Shuffled:
		field = "shuffled"
	}
	if field != "" {
		return searchOnly(field, e.Type)
	}
	return nil
}

func searchOnly(field string, t Type) *fieldError {
	return fieldErr(field, "belongs to search events, not to %s", t)
}

func productOnSearch() *fieldError {
	return fieldErr("product", "belongs to interactions, not to searches; a search lists what it showed in shown")
}

// blank says whether s is empty or all white space. Ids and queries
// mostly begin with a letter or digit, which it looks at first.
func blank(s string) bool {
	if len(s) > 0 && s[0] > ' ' && s[0] < utf8.RuneSelf {
		return false
	}
	return strings.TrimSpace(s) == ""
}

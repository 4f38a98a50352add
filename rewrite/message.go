package rewrite

import (
	"fmt"
	"slices"
	"strings"
	"unicode"

	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite/internal/textout"
)

// ExactMessage is what a shopper reads when the query matched n products
// as typed.
func ExactMessage(n int) string {
	if n == 1 {
		return "1 exact match."
	}
	return fmt.Sprintf("%d exact matches.", n)
}

// message writes what a shopper reads: what was not found, and what is
// shown instead, in plain words.
//
// A query that found some products as typed, fewer than the policy's
// min_results, is told so ("Only 2 exact matches for …"), not that it
// found nothing. When the shop carries none of the type asked for
// (uncarried) and the type was widened, the message says so first:
// "The shop carries no blazers. Showing jackets."
func (rw *Rewriter) message(out *Outcome, items []*item, state []int, uncarried bool) string {
	q := strings.TrimSpace(out.Query)
	lead := fmt.Sprintf("No exact match for “%s”.", q)
	if len(out.Steps) > 0 && out.Steps[0].Count > 0 {
		lead = fmt.Sprintf("Only %s for “%s”.", textout.Count(out.Steps[0].Count, "exact match", "exact matches"), q)
	} else if len(out.Relaxations) == 0 {
		return fmt.Sprintf("No results for “%s”.", q)
	}
	if len(out.Relaxations) == 0 {
		return lead
	}
	noun := "results"
	var phrases []string
	fix := ""
	// A typo read as a colour ("olve" as olive) puts a colour in the
	// plan, so a colour dropped beside it is not "in any colour".
	typoColour := slices.ContainsFunc(out.Plan.Clauses, func(cl Clause) bool {
		return cl.Field == string(parser.KindColour) && cl.From >= 0 && cl.From < len(out.Parsed.Constraints) &&
			out.Parsed.Constraints[cl.From].Kind == parser.KindKeyword
	})
	for _, r := range out.Relaxations {
		switch {
		case typoColour && r.Kind == parser.KindColour && r.Operator == OpDrop:
		case r.Operator == OpReplace && (r.Kind == parser.KindProductType || r.Kind == parser.KindCompatibility):
			fix = ", " + r.Phrase
		case r.Kind == parser.KindProductType && r.Operator == OpWiden:
			noun = strings.TrimPrefix(r.Phrase, "other ")
		case r.Kind == parser.KindProductType && r.Operator == OpDrop:
		default:
			p := r.Phrase
			if r.Operator == OpDrop {
				p = keptBeside(items, state, r)
			}
			if p != "" && !slices.Contains(phrases, p) {
				phrases = append(phrases, p)
			}
		}
	}
	for i, it := range items {
		if it.c.IsHead() && !it.c.Excluded && state[i] == 0 {
			noun = it.nameList(plural)
		}
	}
	for i, it := range items {
		if uncarried && it.c.IsHead() && !it.c.Excluded && i < len(state) && state[i] > 0 && it.levels[state[i]].relax.Operator == OpWiden {
			lead += fmt.Sprintf(" The shop carries no %s.", it.nameList(plural))
		}
	}
	msg := lead + " Showing " + noun
	if len(phrases) > 0 {
		msg += " " + strings.Join(phrases, ", ")
	}
	msg += fix
	if out.Count < out.Policy.MinResults {
		msg += fmt.Sprintf(" (still only %d)", out.Count)
	}
	return msg + "."
}

// keptBeside is what a shopper reads of r, a drop, when the plan keeps
// another constraint of its kind: "black brown boots" with black dropped
// shows boots "in brown", not "in any colour", and a style dropped beside
// one kept is named ("without “pockets”"), not "in any style". It is ""
// when that one was relaxed too, as its own phrase says what is shown
// ("in colours close to brown"), and r's own phrase when none is kept.
func keptBeside(items []*item, state []int, r Relaxation) string {
	lead, ok := map[parser.Kind]string{parser.KindColour: "in ", parser.KindMaterial: "in ", parser.KindPattern: "in ",
		parser.KindSilhouette: "", parser.KindBrand: "from "}[r.Kind]
	if !ok {
		return r.Phrase
	}
	var kept []string
	for i, it := range items {
		if it.index == r.Constraint || it.c.Kind != r.Kind || it.c.Excluded || i >= len(state) || it.levels[state[i]].clause == nil {
			continue
		}
		if state[i] > 0 {
			return ""
		}
		kept = append(kept, it.nameList(nil))
	}
	if len(kept) == 0 {
		return r.Phrase
	}
	if r.Kind == parser.KindSilhouette {
		// A style is no "in round": the one dropped is named instead.
		return fmt.Sprintf("without “%s”", strings.ToLower(r.Text))
	}
	return lead + strings.Join(kept, " and ")
}

// hardStopMessage explains that the constraints that are never relaxed
// find nothing, and names what the catalog carries instead.
func (rw *Rewriter) hardStopMessage(out *Outcome) (string, string) {
	in := ""
	for _, c := range out.Parsed.Of(parser.KindProductType) {
		if c.IsHead() {
			in = " in " + plural(c.Name)
		}
	}
	var parts []string
	for _, m := range out.Missing {
		c := out.Parsed.Constraints[m.Constraint]
		if c.Kind == parser.KindProductType && in != "" && len(out.Missing) > 1 {
			continue // "in lenses" already names it; the rest say what is missing
		}
		if c.IsHead() {
			// The type asked for is what is missing: "the shop carries no
			// doormats", not "doormat is not carried in doormats".
			s := fmt.Sprintf("The shop carries no %s", plural(c.Name))
			if len(m.Carried) > 0 {
				s += fmt.Sprintf("; %s carried: %s", plural(fieldName(c)), summarise(m.Carried))
			}
			parts = append(parts, s)
			continue
		}
		what := m.Text
		if c.Measure != nil && c.Inferred && c.OrGroup == 0 && c.Measure.Unit != "" {
			// "85 mm", not "85"; "3/8 in", not "0.375 in"; "72 in" for
			// "72 tall", whose word names the dimension.
			what = c.Value()
			if !strings.ContainsFunc(c.Text, unicode.IsLetter) {
				what = strings.TrimSpace(c.Text) + " " + c.Measure.Unit
			}
		}
		s := fmt.Sprintf("%s is not carried%s", what, in)
		if len(m.Carried) > 0 {
			order := ""
			if c.Colour != nil && c.Colour.Lab != nil {
				order = ", nearest first"
			}
			s += fmt.Sprintf("; %s carried%s: %s", plural(fieldName(c)), order, summarise(m.Carried))
		}
		parts = append(parts, s)
	}
	msg := fmt.Sprintf("No results for “%s”.", strings.TrimSpace(out.Query))
	if out.Corrected != "" {
		msg = fmt.Sprintf("No results for “%s”, read as “%s”.", strings.TrimSpace(out.Query), strings.TrimSpace(out.Corrected))
	}
	if len(parts) == 0 && len(out.Plan.Clauses) > 1 {
		// No one of them is to blame: nothing carried is all of them.
		var from []int
		for _, cl := range out.Plan.Clauses {
			if cl.From >= 0 && cl.From < len(out.Parsed.Constraints) && !cl.Excluded {
				from = append(from, cl.From)
			}
		}
		slices.Sort(from) // in the query's order
		var all []string
		for _, i := range from {
			all = append(all, out.Parsed.AlternativesText(i))
		}
		if len(all) > 1 {
			parts = append(parts, "Nothing carried is all of "+strings.Join(all[:len(all)-1], ", ")+" and "+all[len(all)-1])
		}
	}
	if len(parts) > 0 {
		msg += " " + strings.Join(parts, ". ") + "."
	}
	why := "the hard constraints alone find nothing, so none is relaxed; "
	if out.Corrected != "" {
		why = fmt.Sprintf("read again as %q; %s", out.Corrected, why)
	}
	return msg, why + strings.Join(parts, "; ")
}

// summarise writes a list of carried values, a range when they are many
// numbers.
func summarise(vals []string) string {
	if len(vals) > 6 {
		if _, err1 := parseNum(vals[0]); err1 == nil {
			if _, err2 := parseNum(vals[len(vals)-1]); err2 == nil {
				return vals[0] + " to " + vals[len(vals)-1]
			}
		}
		return strings.Join(vals[:6], ", ") + ", …"
	}
	return strings.Join(vals, ", ")
}

// fieldName names what a constraint constrains, for messages.
func fieldName(c parser.Constraint) string {
	if c.Measure != nil && c.Measure.Dimension != "" {
		return strings.ReplaceAll(c.Measure.Dimension, "_", " ")
	}
	return strings.ReplaceAll(string(c.Kind), "_", " ")
}

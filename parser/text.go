package parser

import (
	"fmt"
	"io"
	"sort"
	"strconv"
	"strings"
	"text/tabwriter"
	"unicode/utf8"
)

// Value returns the constraint's normalised value in a few readable words:
// "85 mm", "≤ 90.00 USD", "l (letter)", "2x4 (lumber)".
func (c Constraint) Value() string {
	var s string
	switch {
	case c.Measure != nil:
		s = c.Measure.String()
	case c.Price != nil:
		s = c.Price.String()
	case c.Size != nil:
		s = c.Size.Value + " (" + c.Size.System
		if c.Size.Width != "" {
			s += ", " + c.Size.Width
		}
		s += ")"
	case c.Spec != nil:
		s = strings.Join(append([]string{c.Spec.Designation}, c.Spec.Also...), " or ") + " (" + c.Spec.System + ")"
	case c.Kind == KindCompatibility:
		s = "fits " + c.Target
	case c.Kind == KindPartNumber:
		s = c.Code
	case c.Name != "":
		s = c.Name
	default:
		s = strings.ToLower(c.Text)
	}
	if c.Excluded {
		s = "not " + s
	}
	return s
}

func num(v float64) string { return strconv.FormatFloat(v, 'f', -1, 64) }

// String renders a measure: "85 mm", "20..30 mm", "≥ 2 tb".
func (m *Measure) String() string {
	u := m.Unit
	if u != "" {
		u = " " + u
	}
	switch {
	case m.Amount != nil:
		return num(*m.Amount) + u
	case m.Min != nil && m.Max != nil:
		return num(*m.Min) + ".." + num(*m.Max) + u
	case m.Min != nil:
		return "≥ " + num(*m.Min) + u
	case m.Max != nil:
		return "≤ " + num(*m.Max) + u
	}
	return "?"
}

// String renders a price bound: "≤ 90.00 USD", "20.00..30.00 EUR".
func (p *Price) String() string {
	switch {
	case p.Min != nil && p.Max != nil:
		return *p.Min + ".." + *p.Max + " " + p.Currency
	case p.Min != nil:
		return "≥ " + *p.Min + " " + p.Currency
	case p.Max != nil:
		return "≤ " + *p.Max + " " + p.Currency
	}
	return p.Currency
}

// TextStyle chooses how [Result.WriteText] decorates its output.
type TextStyle struct {
	// Colour adds ANSI colours, one per kind; for terminals only.
	Colour bool
}

var kindColours = map[Kind]string{
	KindProductType: "1;34", KindColour: "35", KindPattern: "36", KindSilhouette: "36",
	KindMaterial: "33", KindSize: "1;32", KindAudience: "32", KindMeasure: "1;33",
	KindSpec: "1;31", KindPrice: "1;32", KindCompatibility: "34", KindBrand: "35",
	KindPartNumber: "1;31", KindKeyword: "0", KindFiller: "2",
}

func marker(i int) string {
	const digits = "123456789abcdefghijklmnopqrstuvwxyz"
	if i < len(digits) {
		return digits[i : i+1]
	}
	return "*"
}

// WriteText writes the human explanation of r: the query with each span
// marked under it, a table of the constraints, the unrecognised words and
// the errors with carets under them.
func (r *Result) WriteText(w io.Writer, st TextStyle) error {
	paint := func(k Kind, s string) string {
		if !st.Colour {
			return s
		}
		return "\x1b[" + kindColours[k] + "m" + s + "\x1b[0m"
	}
	shown := displayQuery(r.Query)
	var b strings.Builder
	fmt.Fprintf(&b, "query     %s\n", shown)
	if len(r.Constraints) > 0 {
		cs := append([]Constraint(nil), r.Constraints...)
		sort.SliceStable(cs, func(i, j int) bool { return cs[i].Start < cs[j].Start })
		var marks strings.Builder
		col := 0
		for i, c := range cs {
			from := utf8.RuneCountInString(displayQuery(r.Query[:c.Start]))
			width := utf8.RuneCountInString(displayQuery(r.Query[c.Start:c.End]))
			if from < col {
				continue
			}
			marks.WriteString(strings.Repeat(" ", from-col))
			m := marker(i)
			if width > 1 {
				m += strings.Repeat("─", width-1)
			}
			marks.WriteString(paint(c.Kind, m))
			col = from + max(width, 1)
		}
		fmt.Fprintf(&b, "spans     %s\n", marks.String())
	}
	cat := r.Category
	if cat == "" {
		cat = "(none found)"
	}
	fmt.Fprintf(&b, "category  %s\n\n", cat)
	if len(r.Constraints) > 0 {
		tw := tabwriter.NewWriter(&b, 0, 0, 2, ' ', 0)
		fmt.Fprintln(tw, "#\tspan\tkind\tvalue\tstrictness\tevidence")
		cs := append([]Constraint(nil), r.Constraints...)
		sort.SliceStable(cs, func(i, j int) bool { return cs[i].Start < cs[j].Start })
		for i, c := range cs {
			val := c.Value()
			if c.Colour != nil && c.Colour.Hex != "" {
				val += " " + c.Colour.Hex
			}
			if c.Inferred {
				val += " (inferred)"
			}
			fmt.Fprintf(tw, "%s\t%s\t%s\t%s\t%s\t%s\n", marker(i), displayQuery(c.Text), c.Kind, val, c.Strictness, c.Evidence)
		}
		tw.Flush()
	}
	if len(r.Unrecognised) > 0 {
		fmt.Fprintf(&b, "\nunrecognised: %s\n", strings.Join(r.Unrecognised, ", "))
	}
	for _, e := range r.Errors {
		fmt.Fprintf(&b, "\nerror at %d-%d:\n%s\n", e.Start, e.End, indent(e.Render(), "  "))
	}
	_, err := io.WriteString(w, b.String())
	return err
}

// displayQuery replaces invalid bytes and control characters so that one
// rune stands for each shown character.
func displayQuery(s string) string {
	var b strings.Builder
	for i := 0; i < len(s); {
		r, n := utf8.DecodeRuneInString(s[i:])
		if r < ' ' || r == 0x7f || (r >= 0x80 && r < 0xa0) {
			r = utf8.RuneError
		}
		b.WriteRune(r)
		i += n
	}
	return b.String()
}

func indent(s, pre string) string {
	return pre + strings.ReplaceAll(s, "\n", "\n"+pre)
}

package tune

import (
	"fmt"
	"io"
	"math"
	"strconv"
	"strings"
	"text/tabwriter"

	"github.com/whittle-search/whittle/rewrite/internal/textout"
)

// WriteText writes the report for a terminal: what was read, η, each
// category's figures and recommendations, the changes as a diff against
// the policy in force, and the alias candidates.
func WriteText(w io.Writer, r *Report) error {
	p := &textout.Printer{W: w}
	if j := r.Join; j.Events > 0 {
		p.F("%s read: %s, %s, %d of them joined to the search that showed the product (%d with no search in the window, %d of a product not shown).\n",
			textout.Count(int(j.Events), "event", "events"), textout.Count(int(j.Searches), "search", "searches"), textout.Count(int(j.Interactions), "interaction", "interactions"), j.Joined, j.NoSearch, j.NotShown)
		if j.Late > 0 || j.Bad > 0 || j.SearchOverflow+j.InteractionOverflow > 0 {
			p.F("%d events came later than the join allows; %d malformed lines were skipped; %d events past a session's limits were dropped.\n",
				j.Late, j.Bad, j.SearchOverflow+j.InteractionOverflow)
		}
	}
	st := r.Stats
	p.F("%s, %s: %d exact, %d relaxed (%d relaxed more than one kind and are set aside), %d found nothing.\n",
		textout.Count(int(st.Sessions), "session", "sessions"), textout.Count(int(st.Searches), "search", "searches"), st.Exact, st.Relaxed, st.SetAside, st.FoundNothing)
	if st.Explored > 0 || st.Shuffled > 0 {
		p.F("%d searches showed an explored alternative; %d were shuffled.\n", st.Explored, st.Shuffled)
	}
	if st.Undescribed > 0 {
		p.F("%d shown products are not in the index and were left out of the bands.\n", st.Undescribed)
	}
	b := r.Bias
	if b.Estimated {
		p.F("Position bias: η = %.2f, fitted from shuffled searches (%d clicks at %d ranks).\n", b.Eta, b.Clicks, b.Ranks)
	} else {
		p.F("Position bias: η = %.2f; %s.\n", b.Eta, b.Note)
	}
	for _, c := range r.Categories {
		category(p, c)
	}
	p.F("\nChanges to the policy in force (not applied):\n")
	if len(r.Changes) == 0 {
		p.F("  none\n")
	} else {
		p.F("%s", indent(Diff(r.Changes), "  "))
	}
	p.F("\nAlias candidates, for a person to review (never added to the lexicon):\n")
	if len(r.Aliases) == 0 {
		p.F("  none\n")
	}
	for _, a := range r.Aliases {
		p.F("  %q → %s %q: %d of the %d sessions where it found nothing\n", a.Words, a.Kind, a.Name, a.Support, a.Sessions)
	}
	p.F("\n%s\n", Caveat)
	return p.Err
}

func category(p *textout.Printer, c Category) {
	name := c.Name
	if name == "" {
		name = "(no category)"
	}
	p.F("\n%s: %d exact searches, engagement %s a product shown\n", name, c.Exact.Searches, num(c.Exact.Engagement))
	if len(c.Kinds) > 0 {
		var b strings.Builder
		tw := tabwriter.NewWriter(&b, 0, 0, 2, ' ', 0)
		fmt.Fprintf(tw, "  kind\top\tsearches\tkept\t95%% interval\tnow\trecommended\n")
		for _, k := range c.Kinds {
			for i, o := range k.Ops {
				now, rec := "", ""
				if i == 0 {
					now, rec = k.Current.String(), k.Recommended.String()
					if k.Recommended != k.Current {
						rec = "→ " + rec
					}
				}
				fmt.Fprintf(tw, "  %s\t%s\t%d\t%s\t%s\t%s\t%s\n", k.Kind, o.Op, o.Searches, pct(o.Ratio), band(o.Figure), now, rec)
			}
		}
		tw.Flush()
		p.F("%s", b.String())
		for _, k := range c.Kinds {
			p.F("  %s: %s\n", k.Kind, k.Reason)
		}
	}
	for _, t := range []struct {
		name string
		tol  *Tolerance
		unit func(float64) string
	}{{"colour tolerance (ΔE00)", c.Colour, num}, {"measure tolerance", c.Measure, share}} {
		if t.tol == nil {
			continue
		}
		p.F("  %s: now %s, recommended %s\n", t.name, t.unit(t.tol.Current), t.unit(t.tol.Recommended))
		for _, bin := range t.tol.Bins {
			to := t.unit(bin.To)
			if math.IsInf(bin.To, 1) {
				to = "…"
			}
			p.F("    %6s–%-6s %5s  %-22s %s\n", t.unit(bin.From), to, pct(bin.Ratio), bar(bin.Ratio), textout.Count(int(bin.Searches), "search", "searches"))
		}
		p.F("    %s\n", t.tol.Reason)
	}
}

// bar draws a ratio as up to 20 blocks, 1.0 being 10.
func bar(x float64) string {
	if math.IsNaN(x) {
		return ""
	}
	return strings.Repeat("█", min(20, int(math.Round(x*10))))
}

func band(f Figure) string {
	if math.IsNaN(f.Low) {
		return "–"
	}
	return pct(f.Low) + "–" + pct(f.High)
}

func num(x float64) string {
	if math.IsNaN(x) {
		return "?"
	}
	return strconv.FormatFloat(x, 'g', 3, 64)
}

func share(x float64) string {
	if math.IsInf(x, 1) {
		return "…"
	}
	return strconv.FormatFloat(math.Round(x*1000)/10, 'f', -1, 64) + "%"
}

func indent(s, by string) string {
	lines := strings.SplitAfter(s, "\n")
	var b strings.Builder
	for _, l := range lines {
		if l != "" {
			b.WriteString(by + l)
		}
	}
	return b.String()
}

// Diff writes changes as the lines of the policy file they alter: each
// table's header, then "-" for the setting in force and "+" for the one
// recommended.
func Diff(changes []Change) string {
	var b strings.Builder
	table := ""
	for _, c := range changes {
		i := strings.LastIndexByte(c.Key, '.')
		t, k := c.Key[:i], c.Key[i+1:]
		if t != table {
			if table != "" {
				b.WriteString("\n")
			}
			fmt.Fprintf(&b, "[%s]\n", t)
			table = t
		}
		fmt.Fprintf(&b, "- %s = %s\n+ %s = %s\n", k, value(c.From), k, value(c.To))
	}
	return b.String()
}

// value writes a setting as TOML: numbers as they are, names quoted.
func value(s string) string {
	if _, err := strconv.ParseFloat(s, 64); err == nil {
		if !strings.ContainsAny(s, ".eE") {
			s += ".0"
		}
		return s
	}
	return strconv.Quote(s)
}

// WritePolicy writes the proposed policy file, with a header saying
// where it came from and that it is a proposal.
func WritePolicy(w io.Writer, r *Report) error {
	p := &textout.Printer{W: w}
	p.F("# A policy proposed by whittle tune from %s in %s.\n", textout.Count(int(r.Stats.Searches), "search", "searches"), textout.Count(int(r.Stats.Sessions), "session", "sessions"))
	p.F("# It is the policy in force with %s; review it before use.\n", textout.Count(len(r.Changes), "change", "changes"))
	for _, c := range r.Changes {
		p.F("#   %s: %s → %s (%s)\n", c.Key, c.From, c.To, c.Reason)
	}
	p.F("\n")
	if p.Err != nil {
		return p.Err
	}
	return r.Proposed.WriteTOML(w)
}

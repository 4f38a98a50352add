package serve

import (
	_ "embed"
	"html/template"
	"net/http"
	"sort"
	"strconv"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
)

//go:embed workbench.html
var workbenchHTML string

var workbench = template.Must(template.New("workbench").Funcs(template.FuncMap{"inc": func(i int) int { return i + 1 }}).Parse(workbenchHTML))

// segment is a stretch of the query as the workbench shows it: a
// constraint's span with its kind and strictness, or the text between.
type segment struct {
	Text, Kind, Strictness string
}

// workbenchPage is what the page shows.
type workbenchPage struct {
	Query, Category string
	Categories      []string
	Tuned           bool
	Tolerance       float64
	MinResults      int
	ToleranceText   string
	MinResultsText  string
	Problem         string
	Read            *parser.Result
	Segments        []segment
	Result          *bleveengine.Result
}

// handleWorkbench serves the workbench page: a form, and for a query the
// reading of each span, the plans counted, the shopper's message and the
// hits beside the blind match's. It is plain HTML, and works without
// JavaScript: the form is sent as a GET and the answer drawn here.
func (s *Server) handleWorkbench(w http.ResponseWriter, r *http.Request) {
	p := workbenchPage{Query: r.FormValue("q"), Category: r.FormValue("category"), Categories: lexicon.Categories(),
		Tuned: r.FormValue("tune") != ""}
	eff := s.policy.For(p.Category, "", s.lex)
	p.Tolerance, p.MinResults = eff.ColourTolerance, eff.MinResults
	if p.Query != "" {
		s.workbenchAnswer(r, &p)
	}
	p.ToleranceText = strconv.FormatFloat(p.Tolerance, 'g', -1, 64)
	p.MinResultsText = strconv.Itoa(p.MinResults)
	w.Header().Set("Content-Type", "text/html; charset=utf-8")
	w.Header().Set("Content-Security-Policy", "default-src 'none'; style-src 'unsafe-inline'; form-action 'self'")
	if err := workbench.Execute(w, p); err != nil {
		s.log.Error("workbench page", "err", err)
	}
}

// workbenchAnswer reads and rescues the page's query into p.
func (s *Server) workbenchAnswer(r *http.Request, p *workbenchPage) {
	if e := firstOf(func() *Error { return s.checkQuery(r, p.Query) }, func() *Error { return checkCategory(p.Category) }); e != nil {
		p.Problem = e.Message
		return
	}
	rw := s.rw
	if p.Tuned {
		var t rewrite.Tuning
		if v, err := strconv.ParseFloat(r.FormValue("colour_tolerance"), 64); err == nil {
			t.ColourTolerance = &v
		}
		if v, err := strconv.Atoi(r.FormValue("min_results")); err == nil {
			t.MinResults = &v
		}
		if e := checkTuning(t); e != nil {
			p.Problem = e.Message
			return
		}
		rw = rw.Tuned(t)
	}
	parsed := rw.ParseIn(p.Query, p.Category)
	p.Read, p.Segments = parsed, segments(parsed)
	if e := unsearchable(rw, parsed); e != nil {
		p.Problem = e.Message
		return
	}
	res, err := s.engine.Rescue(r.Context(), rw, parsed, bleveengine.RescueOptions{K: 10, Baseline: true})
	if err != nil {
		p.Problem = s.engineError(r, err).Message
		return
	}
	s.metrics.rescued(res.Outcome)
	p.Result = res
	p.Tolerance, p.MinResults = res.Outcome.Policy.ColourTolerance, res.Outcome.Policy.MinResults
}

// segments cuts the query into its constraints' spans and the text
// between them.
func segments(r *parser.Result) []segment {
	cs := append([]parser.Constraint(nil), r.Constraints...)
	sort.Slice(cs, func(i, j int) bool { return cs[i].Start < cs[j].Start })
	var out []segment
	at := 0
	for _, c := range cs {
		if c.Start < at || c.End > len(r.Query) {
			continue
		}
		if c.Start > at {
			out = append(out, segment{Text: r.Query[at:c.Start]})
		}
		out = append(out, segment{Text: r.Query[c.Start:c.End], Kind: string(c.Kind), Strictness: c.Strictness.String()})
		at = c.End
	}
	if at < len(r.Query) {
		out = append(out, segment{Text: r.Query[at:]})
	}
	return out
}

package tune

import (
	"fmt"
	"html/template"
	"io"
	"math"

	"github.com/whittle-search/whittle/rewrite/internal/svgchart"
	"github.com/whittle-search/whittle/rewrite/internal/textout"
)

var page = template.Must(template.New("tune").Parse(`<!doctype html>
<html lang="en"><head><meta charset="utf-8">
<title>{{.Title}}</title>
<style>
body{font:15px/1.45 system-ui,sans-serif;max-width:760px;margin:2em auto;padding:0 1em;color:#1d2327}
h1{font-size:1.4em}h2{font-size:1.15em;margin-top:2em}h3{font-size:1em}
table{border-collapse:collapse}td,th{padding:2px 10px 2px 0;text-align:left}td.n{text-align:right}
pre{background:#f4f4f2;padding:.6em}.note{color:#555}
{{.Style}}
</style></head><body>
<h1>{{.Title}}</h1>
<p>{{.R.Stats.Sessions}} sessions, {{.R.Stats.Searches}} searches: {{.R.Stats.Exact}} exact, {{.R.Stats.Relaxed}} relaxed ({{.R.Stats.SetAside}} set aside for relaxing more than one kind), {{.R.Stats.FoundNothing}} found nothing.</p>
<p>Position bias η = {{printf "%.2f" .R.Bias.Eta}}{{if .R.Bias.Estimated}}, fitted from shuffled searches ({{.R.Bias.Clicks}} clicks at {{.R.Bias.Ranks}} ranks){{else}}: {{.R.Bias.Note}}{{end}}.</p>
<p class="note">{{.Caveat}}</p>
<h2>Changes to the policy in force (not applied)</h2>
{{if .R.Changes}}<pre>{{.Diff}}</pre>
<table><tr><th>setting</th><th>why</th></tr>{{range .R.Changes}}<tr><td>{{.Key}}</td><td>{{.Reason}}</td></tr>{{end}}</table>{{else}}<p>None.</p>{{end}}
{{range .Cats}}<h2>{{.Name}}</h2>
<p>{{.C.Exact.Searches}} exact searches.</p>
{{if .C.Kinds}}{{.Kinds}}
<table><tr><th>kind</th><th>now</th><th>recommended</th><th>why</th></tr>{{range .C.Kinds}}<tr><td>{{.Kind}}</td><td>{{.Current}}</td><td>{{.Recommended}}</td><td>{{.Reason}}</td></tr>{{end}}</table>{{end}}
{{if .C.Colour}}<h3>Colour tolerance: now {{.C.Colour.Current}}, recommended {{.C.Colour.Recommended}}</h3>{{.Colour}}<p>{{.C.Colour.Reason}}</p>{{end}}
{{if .C.Measure}}<h3>Measure tolerance: now {{.C.Measure.Current}}, recommended {{.C.Measure.Recommended}}</h3>{{.Measure}}<p>{{.C.Measure.Reason}}</p>{{end}}
{{end}}
<h2>Alias candidates</h2>
<p>For a person to review; tune never adds them to the lexicon.</p>
{{if .R.Aliases}}<table><tr><th>words that found nothing</th><th>then bought</th><th>sessions</th></tr>
{{range .R.Aliases}}<tr><td>{{.Words}}</td><td>{{.Kind}} {{.Name}}</td><td class="n">{{.Support}} of {{.Sessions}}</td></tr>{{end}}</table>{{else}}<p>None.</p>{{end}}
</body></html>
`))

type htmlCategory struct {
	Name                   string
	C                      Category
	Kinds, Colour, Measure template.HTML
}

// WriteHTML writes a one-page report with its charts (engagement by
// ΔE00 band and by measure band per category, engagement by kind
// relaxed) drawn as inline SVG: it needs nothing from the network.
func WriteHTML(w io.Writer, title string, r *Report) error {
	var cats []htmlCategory
	for _, c := range r.Categories {
		hc := htmlCategory{Name: c.Name, C: c}
		if hc.Name == "" {
			hc.Name = "(no category)"
		}
		var bars []svgchart.Bar
		for _, k := range c.Kinds {
			for _, o := range k.Ops {
				v := o.Ratio
				if math.IsNaN(v) {
					v = 0
				}
				bars = append(bars, svgchart.Bar{Label: fmt.Sprintf("%s %s", o.Op, k.Kind), Value: v,
					Text: fmt.Sprintf("%s (%s), %s", pct(o.Ratio), band(o.Figure), textout.Count(int(o.Searches), "search", "searches"))})
			}
		}
		hc.Kinds = svgchart.HBars("Engagement by kind relaxed, as a share of exact matches", bars)
		hc.Colour = columns("Engagement by ΔE00 from the colour asked", "ΔE00", c.Colour, num, r.Signals.KeepShare)
		hc.Measure = columns("Engagement by how far the measure strayed", "share off", c.Measure, share, r.Signals.KeepShare)
		cats = append(cats, hc)
	}
	return page.Execute(w, map[string]any{
		"Title": title, "R": r, "Cats": cats, "Diff": Diff(r.Changes), "Caveat": Caveat,
		"Style": template.CSS(svgchart.Style),
	})
}

func columns(title, axis string, t *Tolerance, unit func(float64) string, keep float64) template.HTML {
	if t == nil {
		return ""
	}
	var ps []svgchart.Point
	for _, b := range t.Bins {
		ps = append(ps, svgchart.Point{Label: unit(b.From), Value: b.Ratio, Low: b.Low, High: b.High})
	}
	return svgchart.Columns(title, axis+" (bars: share of exact-match engagement, lines: 95% interval)", ps, keep, "keep share "+pct(keep))
}

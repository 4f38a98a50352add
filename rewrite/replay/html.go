package replay

import (
	"fmt"
	"html/template"
	"io"

	"github.com/whittle-search/whittle/rewrite/internal/svgchart"
	"github.com/whittle-search/whittle/rewrite/internal/textout"
)

var page = template.Must(template.New("replay").Parse(`<!doctype html>
<html lang="en"><head><meta charset="utf-8">
<title>{{.Title}}</title>
<style>
body{font:15px/1.45 system-ui,sans-serif;max-width:720px;margin:2em auto;padding:0 1em;color:#1d2327}
h1{font-size:1.4em}h2{font-size:1.1em;margin-top:2em}
table{border-collapse:collapse}td,th{padding:2px 10px 2px 0;text-align:left}td.n{text-align:right}
{{.Style}}
</style></head><body>
<h1>{{.Title}}</h1>
<p>{{.R.All.Queries}} queries, {{.R.All.Searches}} searches{{if .R.NothingToSearch.Queries}}; {{.R.NothingToSearch.Queries}} queries, {{.R.NothingToSearch.Searches}} searches with nothing to search for, not searched{{end}}{{if .R.SkippedLines}}; {{.R.SkippedLines}} malformed lines skipped{{end}}.</p>
{{.ZeroChart}}
<h2>Relaxations used</h2>
{{if .R.Changes}}{{.ChangeChart}}{{else}}<p>None: every query found enough as typed, or nothing could be relaxed.</p>{{end}}
<h2>Left with nothing</h2>
{{if or .R.Unmet .R.UnmetOther.Queries}}<table><tr><th>hard constraint nothing carries</th><th>queries</th><th>searches</th></tr>
{{range .R.Unmet}}<tr><td>{{.Constraint}}</td><td class="n">{{.Queries}}</td><td class="n">{{.Searches}}</td></tr>
{{end}}{{if .R.UnmetOther.Queries}}<tr><td>(no single hard constraint)</td><td class="n">{{.R.UnmetOther.Queries}}</td><td class="n">{{.R.UnmetOther.Searches}}</td></tr>{{end}}</table>
{{else}}<p>No query is left with nothing.</p>{{end}}
<h2>Frequent queries that find nothing as typed</h2>
<p>A head query going empty usually means a catalog or publishing fault rather than a long-tail query.</p>
{{if .R.Alerts}}<table><tr><th>searches</th><th>query</th></tr>
{{range .R.Alerts}}<tr><td class="n">{{.Searches}}{{if .Error}} (at most {{.Error}} over){{end}}</td><td>{{.Query}}</td></tr>
{{end}}</table>{{else}}<p>None.</p>{{end}}
<h2>Rescue time</h2>
{{.LatencyChart}}
<p>p50 ≤ {{.P50}}, p99 ≤ {{.P99}}.</p>
</body></html>
`))

// WriteHTML writes a one-page report with its charts drawn as inline
// SVG: it needs nothing from the network and reads offline.
func WriteHTML(w io.Writer, title string, r Report) error {
	pct := func(x float64) string { return fmt.Sprintf("%.1f%%", 100*x) }
	zero := svgchart.HBars("Share finding nothing", []svgchart.Bar{
		{Label: "queries, as typed", Value: r.RateBefore.Queries, Text: pct(r.RateBefore.Queries)},
		{Label: "queries, after rescue", Value: r.RateAfter.Queries, Text: pct(r.RateAfter.Queries)},
		{Label: "searches, as typed", Value: r.RateBefore.Searches, Text: pct(r.RateBefore.Searches)},
		{Label: "searches, after rescue", Value: r.RateAfter.Searches, Text: pct(r.RateAfter.Searches)},
	})
	var ch []svgchart.Bar
	for _, c := range r.Changes {
		ch = append(ch, svgchart.Bar{Label: c.Op + " " + c.Kind, Value: float64(c.Searches), Text: textout.Count(int(c.Searches), "search", "searches")})
	}
	// The histogram from its first bucket with a rescue to its last.
	var lat []svgchart.Bar
	first, last := -1, -1
	for i, b := range r.Latency {
		if b.Count > 0 {
			last = max(last, i)
			if first < 0 {
				first = i
			}
		}
	}
	for i := max(first, 0); i <= last; i++ {
		label := "up to " + fmtDur(r.Latency[i].UpTo)
		if i > 0 {
			label = fmtDur(r.Latency[i-1].UpTo) + " – " + fmtDur(r.Latency[i].UpTo)
		}
		if i == len(r.Latency)-1 && i > 0 {
			label = "over " + fmtDur(r.Latency[i-1].UpTo)
		}
		lat = append(lat, svgchart.Bar{Label: label, Value: float64(r.Latency[i].Count), Text: fmt.Sprint(r.Latency[i].Count)})
	}
	return page.Execute(w, map[string]any{
		"Title": title, "R": r, "Style": template.CSS(svgchart.Style), "ZeroChart": zero, "ChangeChart": svgchart.HBars("Searches rescued, by relaxation", ch),
		"LatencyChart": svgchart.HBars("Rescues by time taken", lat), "P50": fmtDur(r.P50), "P99": fmtDur(r.P99),
	})
}

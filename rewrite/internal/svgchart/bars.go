package svgchart

import (
	"fmt"
	"html/template"
	"math"
	"strings"
	"unicode/utf8"
)

// Bar is one bar of a chart: a label, a value and how it is written.
type Bar struct {
	Label string
	Value float64
	Text  string
}

// HBars draws a horizontal bar chart, bars scaled to the largest value.
func HBars(title string, bars []Bar) template.HTML {
	const (
		width, labelW, row, top = 640, 220, 24, 28
	)
	h := top + row*len(bars) + 8
	var b strings.Builder
	open(&b, title, width, h)
	// Room after the longest bar for its text, at about 7 px a
	// character of the 12 px font.
	most, room := 0.0, 90
	for _, x := range bars {
		most = max(most, x.Value)
		room = max(room, 7*utf8.RuneCountInString(x.Text)+12)
	}
	room = min(room, width-labelW-60)
	for i, x := range bars {
		yy := top + row*i
		w := 0.0
		if most > 0 {
			w = float64(width-labelW-room) * x.Value / most
		}
		fmt.Fprintf(&b, `<text x="0" y="%d" class="l">%s</text>`, yy+16, esc(x.Label))
		fmt.Fprintf(&b, `<rect x="%d" y="%d" width="%.1f" height="%d" class="b"/>`, labelW, yy+3, w, row-8)
		fmt.Fprintf(&b, `<text x="%.1f" y="%d" class="v">%s</text>`, float64(labelW)+w+6, yy+16, esc(x.Text))
	}
	b.WriteString(`</svg>`)
	return template.HTML(b.String())
}

// Point is one column of a Columns chart: a value with an interval
// (Low and High; NaN for none) over a label on the x axis.
type Point struct {
	Label            string
	Value, Low, High float64
}

// Columns draws vertical bars with interval whiskers on a scale from 0
// to the largest high (at least line), and a dashed horizontal rule at
// line (NaN for none), labelled lineText. A NaN value draws no bar.
func Columns(title, yText string, ps []Point, line float64, lineText string) template.HTML {
	const (
		height, left, top, bottom, page = 220, 48, 28, 40, 640
	)
	// Columns share the width, 12 to 40 px each; many make the chart
	// wider than the page rather than too thin to read.
	colW := min(40, max(12, (page-left-16)/max(len(ps), 1)))
	width := max(page, left+colW*len(ps)+16)
	var b strings.Builder
	open(&b, title, width, height)
	most := 0.0
	if !math.IsNaN(line) {
		most = line
	}
	for _, p := range ps {
		for _, v := range []float64{p.Value, p.High} {
			if !math.IsNaN(v) && !math.IsInf(v, 0) {
				most = max(most, v)
			}
		}
	}
	if most <= 0 {
		most = 1
	}
	plotH := float64(height - top - bottom)
	y := func(v float64) float64 { return float64(top) + plotH*(1-math.Min(v, most)/most) }
	fmt.Fprintf(&b, `<line x1="%d" y1="%d" x2="%d" y2="%d" class="ax"/>`, left, height-bottom, width-8, height-bottom)
	fmt.Fprintf(&b, `<text x="0" y="%d" class="l">0</text><text x="0" y="%d" class="l">%s</text>`, height-bottom, top+10, esc(trim(most)))
	fmt.Fprintf(&b, `<text x="%d" y="%d" class="l">%s</text>`, left, height-6, esc(yText))
	for i, p := range ps {
		x := left + colW*i
		if !math.IsNaN(p.Value) {
			fmt.Fprintf(&b, `<rect x="%d" y="%.1f" width="%d" height="%.1f" class="b"><title>%s: %s</title></rect>`,
				x+3, y(p.Value), colW-6, y(0)-y(p.Value), esc(p.Label), esc(trim(p.Value)))
		}
		if !math.IsNaN(p.Low) && !math.IsNaN(p.High) {
			cx := x + colW/2
			fmt.Fprintf(&b, `<line x1="%d" y1="%.1f" x2="%d" y2="%.1f" class="w"/>`, cx, y(p.Low), cx, y(p.High))
		}
		if colW >= 22 || i%2 == 0 {
			fmt.Fprintf(&b, `<text x="%d" y="%d" class="l">%s</text>`, x+2, height-bottom+14, esc(p.Label))
		}
	}
	if !math.IsNaN(line) {
		fmt.Fprintf(&b, `<line x1="%d" y1="%.1f" x2="%d" y2="%.1f" class="r"/>`, left, y(line), width-8, y(line))
		fmt.Fprintf(&b, `<text x="%d" y="%.1f" class="l">%s</text>`, width-150, y(line)-4, esc(lineText))
	}
	b.WriteString(`</svg>`)
	return template.HTML(b.String())
}

// Style is the CSS the charts' classes need, for a page's <style>.
const Style = `svg .t{font-weight:600;font-size:14px}svg .l,svg .v{font-size:12px}svg .b{fill:#5b7f95}svg .w{stroke:#1d2327;stroke-width:1.5}svg .ax{stroke:#888}svg .r{stroke:#b5523b;stroke-dasharray:4 3}`

func open(b *strings.Builder, title string, w, h int) {
	fmt.Fprintf(b, `<svg xmlns="http://www.w3.org/2000/svg" role="img" aria-label="%s" width="%d" height="%d" viewBox="0 0 %d %d">`,
		esc(title), w, h, w, h)
	fmt.Fprintf(b, `<text x="0" y="18" class="t">%s</text>`, esc(title))
}

func esc(s string) string { return template.HTMLEscapeString(s) }

func trim(v float64) string {
	return strings.TrimSuffix(strings.TrimRight(fmt.Sprintf("%.2f", v), "0"), ".")
}

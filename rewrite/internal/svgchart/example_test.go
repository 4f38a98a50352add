package svgchart_test

import (
	"fmt"
	"strings"

	"github.com/whittle-search/whittle/rewrite/internal/svgchart"
)

func ExampleHBars() {
	svg := svgchart.HBars("Searches", []svgchart.Bar{{Label: "exact", Value: 3, Text: "3"}})
	fmt.Println(strings.HasPrefix(string(svg), "<svg"), strings.Count(string(svg), "<rect"))
	// Output: true 1
}

func ExampleColumns() {
	svg := svgchart.Columns("Engagement by ΔE00", "ΔE00", []svgchart.Point{{Label: "0", Value: 1, Low: 0.9, High: 1.1}}, 0.8, "keep share")
	fmt.Println(strings.Count(string(svg), "<rect"), strings.Contains(string(svg), "keep share"))
	// Output: 1 true
}

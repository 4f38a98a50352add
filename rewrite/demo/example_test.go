package demo_test

import (
	"fmt"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/rewrite/catalog"
	"github.com/whittle-search/whittle/rewrite/demo"
	"github.com/whittle-search/whittle/rewrite/signals"
)

func ExampleSignals() {
	n := map[signals.Type]int{}
	written, err := demo.Signals(func(e signals.Event) error { n[e.Type]++; return nil }, catalog.Demo(2000, 1), 1000, 1)
	if err != nil {
		panic(err)
	}
	fmt.Println(written >= 1000, n[signals.Search] > 0, n[signals.Click] > 0, n[signals.Impression] > n[signals.Click])
	// Output: true true true true
}

func ExampleTour() {
	stops := demo.Tour(catalog.Demo(3000, 1), lexicon.Default())
	fmt.Println(len(stops) >= 8, stops[0].Query != "")
	// Output: true true
}

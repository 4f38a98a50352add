package bleveengine

import (
	"slices"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// A pipe's schedule and a lamp's colour temperature are indexed and
// found: schedules are designations (ASME B36.10M numbers, which ASTM
// D1785 uses for PVC pipe; from memory), held hard, and colour
// temperatures measures in kelvin, "warm white" read as 2700 to 3000 K
// on a lamp (the trade's names, from memory). The shop is invented, and
// writes its schedules and kelvins in more than one way.
func TestSchedulesAndColourTemperatures(t *testing.T) {
	pipe := func(id, schedule string) catalog.Product {
		return catalog.Product{ID: id, Title: "Ostrel PVC pipe", ProductType: "pvc pipe", Category: "hardware",
			Measures: map[string]string{"diameter": "1 in", "length": "10 ft"}, Spec: []string{schedule}}
	}
	bulb := func(id, kelvin string) catalog.Product {
		return catalog.Product{ID: id, Title: "Pellow LED bulb", ProductType: "led bulb", Category: "electrical",
			Measures: map[string]string{"power": "9 W", "colour_temperature": kelvin}}
	}
	e := openProducts(t, []catalog.Product{pipe("PP-1", "sch 40"), pipe("PP-2", "Schedule 80"), bulb("LB-1", "2700 K"), bulb("LB-2", "5000 kelvin")})
	rw := rewrite.New(e, nil)
	for _, tc := range []struct {
		query   string
		ids     []string
		message string
		reason  string
	}{
		{"sch 80 pvc pipe", []string{"PP-2"}, "", "the catalog's \"Schedule 80\" is the designation SCH 80"},
		{"1 in pvc pipe sch40", []string{"PP-1"}, "", "sch40 written as one code"},
		{"pvc pipe sch 120", nil, "specs carried: sch 40, sch 80", "no schedule 120 is carried, and a schedule is never swapped for another"},
		{"warm white led bulb", []string{"LB-1"}, "", "2700 K lies in warm white's 2700 to 3000 K"},
		{"led bulb 5000k", []string{"LB-2"}, "", "5000k on a bulb is kelvin"},
		{"daylight led bulb", []string{"LB-2"}, "", "5000 K lies in daylight's 5000 to 6500 K"},
	} {
		o, got := rescuedIDs(t, e, rw, tc.query)
		if !slices.Equal(got, tc.ids) || !strings.Contains(o.Message, tc.message) {
			t.Errorf("%q: hits %v, message %q; want %v and %q (%s)\n%s", tc.query, got, o.Message, tc.ids, tc.message, tc.reason, o.Explanation)
		}
	}
}

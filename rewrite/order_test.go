package rewrite

import (
	"testing"

	"github.com/google/go-cmp/cmp"

	"github.com/whittle-search/whittle/parser"
)

func TestRelaxOrder(t *testing.T) {
	for _, tc := range []struct {
		name, query, reason string
		want                []string
	}{
		{
			name: "size and price stay", query: "nice charcoal merino crew sweater size l under $90",
			reason: "the size is hard; filler goes first, then soft words from the end, then firm ones from the end",
			want:   []string{"nice", "crew", "merino", "under $90", "sweater", "charcoal"},
		},
		{
			name: "wire gauge is never relaxed", query: "14 awg wire 50 ft",
			reason: "a wire gauge is hard: substituting it could hurt someone",
			want:   []string{"50 ft", "wire"},
		},
		{
			name: "exclusions are kept", query: "sweater without hood",
			reason: "an exclusion only narrows; dropping it would show what the shopper refused",
			want:   []string{"sweater"},
		},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var got []string
			for _, c := range RelaxOrder(parser.Parse(tc.query)) {
				got = append(got, c.Text)
			}
			if diff := cmp.Diff(tc.want, got); diff != "" {
				t.Errorf("%s (-want +got):\n%s", tc.reason, diff)
			}
		})
	}
}

// Product types in messages: regular plurals, and words a shop leaves as
// they are (common usage).
func TestPlural(t *testing.T) {
	for _, tc := range []struct{ in, want string }{
		{"rain jacket", "rain jackets"}, {"lens", "lenses"}, {"battery", "batteries"}, {"box", "boxes"},
		{"bench", "benches"}, {"brush", "brushes"}, {"tray", "trays"}, {"headphones", "headphones"},
		{"jeans", "jeans"}, {"lumber", "lumber"}, {"dress shoes", "dress shoes"}, {"shoe", "shoes"},
		{"glass", "glasses"}, {"bus", "buses"}, {"vase", "vases"},
		// Plural in form: the lexicon's product types that end in an s.
		{"socks", "socks"}, {"swim trunks", "swim trunks"}, {"boxer briefs", "boxer briefs"}, {"stud earrings", "stud earrings"},
		{"measuring spoons", "measuring spoons"}, {"mittens", "mittens"}, {"cleats", "cleats"}, {"scissors", "scissors"},
		{"prime lens", "prime lenses"}, {"french press", "french presses"},
		// Measure dimensions, as "in the nearest masses carried" names them.
		{"mass", "masses"}, {"focal length", "focal lengths"}, {"capacity", "capacities"}, {"load rating", "load ratings"},
		// -ife, -elf, -alf and -arf take -ves (but safe is safes); an irregular plural; mass nouns.
		{"chef's knife", "chef's knives"}, {"floating shelf", "floating shelves"}, {"scarf", "scarves"},
		{"mouse", "mice"}, {"thermal underwear", "thermal underwear"}, {"jewelry", "jewelry"}, {"cutlery", "cutlery"},
		{"wall art", "wall art"}, {"polyurethane", "polyurethane"}, {"hex key", "hex keys"}, {"derby", "derbies"},
		{"pajamas", "pajamas"}, {"printer paper", "printer paper"}, {"duct tape", "duct tape"}, {"wood glue", "wood glue"},
		{"safe", "safes"}, {"golf bag", "golf bags"}, {"peak current", "peak current"}, {"memory", "memory"}, {"storage", "storage"}, {"diagonal", "diagonals"},
	} {
		if got := plural(tc.in); got != tc.want {
			t.Errorf("plural(%q) = %q, want %q", tc.in, got, tc.want)
		}
	}
}

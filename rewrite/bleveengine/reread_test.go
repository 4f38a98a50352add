package bleveengine

import (
	"context"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// Two readings on a real index, each once a fault: a misspelt type one
// edit from two product types ("blot": bolt and boot), only one of which
// keeps the thread M8 a thread (ISO 261); and a part number nothing
// carries, whose carried values no catalog lists. The shop is invented.
func TestReadingsOnTheIndex(t *testing.T) {
	ps := []catalog.Product{
		{ID: "HB-1", Title: "Tarnel hex bolt M8 x 40", ProductType: "hex bolt", Spec: []string{"M8"}, Measures: map[string]string{"length": "40 mm"}},
		{ID: "BO-1", Title: "Ardlow hiking boot", ProductType: "boot", Sizes: []string{"9", "10"}},
	}
	e := openProducts(t, ps)
	rw := rewrite.New(e, nil)
	for _, tc := range []struct {
		query, reason, corrected, message string
		count                             int
	}{
		{"m8 blot", "blot is one edit from bolt and from boot; in m8 boot the thread would become a part number, so bolt is read", "m8 bolt", "reading “blot” as “bolt”", 1},
		{"zz-9999 boots", "the part number is carried by nothing, and said so, with no list of the part numbers carried", "", "zz-9999 is not carried in boots", 0},
	} {
		t.Run(tc.query, func(t *testing.T) {
			o, err := rw.Rescue(context.Background(), tc.query)
			if err != nil {
				t.Fatalf("%s: %v", tc.reason, err)
			}
			if o.Corrected != tc.corrected || o.Count != tc.count || !strings.Contains(o.Message, tc.message) {
				t.Errorf("%s: corrected %q, count %d, message %q; want %q, %d, %q", tc.reason, o.Corrected, o.Count, o.Message, tc.corrected, tc.count, tc.message)
			}
		})
	}
}

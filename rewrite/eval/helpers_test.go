package eval

import (
	"errors"
	"io"
	"os"
	"path/filepath"
	"testing"

	"github.com/whittle-search/whittle/rewrite/catalog"
)

// tiny reads testdata/eval/tiny.jsonl, six invented products: two
// women's skirts (SK-1 black cotton in s and m, $39.95; SK-2 "morning
// fog" floral linen in l and xl, $54.00), both by Brellow; a cable knit
// wool sweater SW-1 by Quillet in "ember" (m, l), $89.00; two black prime
// lenses by Tarrow (LN-1 50 mm for zk-3, $249.00; LN-2 85 mm for zk-5,
// $449.00, out of stock) and a persian wool rug RG-1 by Mossel, 5 by 8
// ft, in "dune", $189.99. No brand is a lexicon word.
func tiny(t *testing.T) []catalog.Product {
	t.Helper()
	f, err := os.Open(filepath.Join("..", "..", "testdata", "eval", "tiny.jsonl"))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	r := catalog.NewReader(f, nil)
	var ps []catalog.Product
	for {
		p, err := r.Next()
		if errors.Is(err, io.EOF) {
			break
		}
		if err != nil {
			t.Fatal(err)
		}
		ps = append(ps, *p)
	}
	if len(ps) != 6 {
		t.Fatalf("read %d products, want 6", len(ps))
	}
	return ps
}

// product returns the product of ps with id.
func product(t *testing.T, ps []catalog.Product, id string) *catalog.Product {
	t.Helper()
	for i := range ps {
		if ps[i].ID == id {
			return &ps[i]
		}
	}
	t.Fatalf("no product %s", id)
	return nil
}

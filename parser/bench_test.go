package parser

import (
	"sort"
	"testing"
	"time"

	"github.com/blevesearch/bleve/v2/search/query"

	"github.com/whittle-search/whittle/lexicon"
)

// BenchmarkParse parses the queries of testdata/queries.txt, one query an
// operation, with the full default lexicon.
func BenchmarkParse(b *testing.B) {
	qs := corpus(b)
	lexicon.Default()
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		Parse(qs[i%len(qs)])
	}
}

// BenchmarkBleveQueryString parses the same queries with bleve's own
// query-string parser, for comparison: it does far less (no units, no
// lexicon), so it bounds what a query parser costs.
func BenchmarkBleveQueryString(b *testing.B) {
	qs := corpus(b)
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		q := query.NewQueryStringQuery(qs[i%len(qs)])
		_, _ = q.Parse()
	}
}

// BenchmarkParseMedian reports the median time per query over the corpus
// for whittle and for bleve's query-string parser, and the median of the
// per-query ratios. Each query is timed over many runs, whittle and bleve
// back to back, so one slow query does not hide in a mean and a busy
// machine slows both alike.
func BenchmarkParseMedian(b *testing.B) {
	qs := corpus(b)
	lexicon.Default()
	const reps = 64
	timeIt := func(f func()) float64 {
		start := time.Now()
		for r := 0; r < reps; r++ {
			f()
		}
		return float64(time.Since(start).Nanoseconds()) / reps
	}
	median := func(xs []float64) float64 {
		sort.Float64s(xs)
		return xs[len(xs)/2]
	}
	var ours, theirs, ratio float64
	for i := 0; i < b.N; i++ {
		w := make([]float64, len(qs))
		bl := make([]float64, len(qs))
		rs := make([]float64, len(qs))
		for j, q := range qs {
			w[j] = timeIt(func() { Parse(q) })
			bl[j] = timeIt(func() { _, _ = query.NewQueryStringQuery(q).Parse() })
			rs[j] = w[j] / bl[j]
		}
		ours, theirs, ratio = median(w), median(bl), median(rs)
	}
	b.ReportMetric(ours, "whittle-ns/query")
	b.ReportMetric(theirs, "bleve-ns/query")
	b.ReportMetric(ratio, "ratio")
	b.ReportMetric(0, "ns/op")
}

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
// for whittle and for bleve's query-string parser, and their ratio. Each
// query is timed over many runs, so one slow query does not hide in a mean.
func BenchmarkParseMedian(b *testing.B) {
	qs := corpus(b)
	lexicon.Default()
	const reps = 50
	per := func(f func(string)) float64 {
		times := make([]float64, len(qs))
		for i, q := range qs {
			start := time.Now()
			for r := 0; r < reps; r++ {
				f(q)
			}
			times[i] = float64(time.Since(start).Nanoseconds()) / reps
		}
		sort.Float64s(times)
		return times[len(times)/2]
	}
	var ours, theirs float64
	for i := 0; i < b.N; i++ {
		ours = per(func(q string) { Parse(q) })
		theirs = per(func(q string) { _, _ = query.NewQueryStringQuery(q).Parse() })
	}
	b.ReportMetric(ours, "whittle-ns/query")
	b.ReportMetric(theirs, "bleve-ns/query")
	b.ReportMetric(ours/theirs, "ratio")
	b.ReportMetric(0, "ns/op")
}

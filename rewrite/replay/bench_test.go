package replay

import (
	"context"
	"strings"
	"testing"
)

// BenchmarkReplay replays a 900-line log on the test shop's index with
// a worker a CPU and reports queries a second. The figure for a
// 100,000-line log on 100,000 products comes from whittle bench (see
// the README).
func BenchmarkReplay(b *testing.B) {
	rw := shop(b)
	qs := []string{"rain jacket", "mustard rain jacket", "85 lens", "striped rain jacket", "50mm lens for jx-10", "2x4 12 ft", "14 awg wire", "fn-3520", "oatmeal sweater"}
	log := strings.Repeat(strings.Join(qs, "\n")+"\n", 100)
	n := 0
	for b.Loop() {
		sum, err := Run(context.Background(), rw, Read(strings.NewReader(log)), Options{}, func(*Result) error { return nil })
		if err != nil {
			b.Fatal(err)
		}
		n += sum.Report().All.Queries
	}
	b.ReportMetric(float64(n)/b.Elapsed().Seconds(), "queries/s")
}

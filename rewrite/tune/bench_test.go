package tune_test

import (
	"bytes"
	"context"
	"path/filepath"
	"testing"

	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/catalog"
	"github.com/whittle-search/whittle/rewrite/demo"
	"github.com/whittle-search/whittle/rewrite/signals"
	"github.com/whittle-search/whittle/rewrite/tune"
)

// BenchmarkTune runs the whole of whittle tune (reading JSON Lines,
// joining, tuning, describing products from a bleve index) over an
// invented log of 1,000,000 events for a demo catalog of 5,000
// products, and reports events a second. The goal, 200,000 events a
// second on one core, is for `go test -bench Tune -cpu 1`; whittle
// bench measures the same on the 100,000-product catalog.
func BenchmarkTune(b *testing.B) {
	ps := catalog.Demo(5000, 1)
	dir := filepath.Join(b.TempDir(), "idx")
	if _, err := bleveengine.BuildProducts(context.Background(), ps, dir, bleveengine.BuildOptions{}); err != nil {
		b.Fatal(err)
	}
	eng, err := bleveengine.Open(dir)
	if err != nil {
		b.Fatal(err)
	}
	defer eng.Close()
	var log bytes.Buffer
	w := signals.NewWriter(&log)
	n, err := demo.Signals(w.Write, ps, 1000000, 1)
	if err != nil {
		b.Fatal(err)
	}
	b.SetBytes(int64(log.Len()))
	events := 0
	for b.Loop() {
		t := tune.New(tune.Options{Products: eng})
		if err := t.Read(context.Background(), signals.Read(bytes.NewReader(log.Bytes()), "bench.jsonl"), signals.JoinOptions{}); err != nil {
			b.Fatal(err)
		}
		t.Report()
		events += n
	}
	b.ReportMetric(float64(events)/b.Elapsed().Seconds(), "events/s")
}

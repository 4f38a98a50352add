package signals

import (
	"bytes"
	"context"
	"testing"
	"time"
)

// benchLog is the simulated log of the benchmarks: 200,000 sessions,
// about 1.2 million events.
func benchLog(b *testing.B) ([]Event, []byte) {
	evs := simulated{sessions: 200_000, every: 2 * time.Second, seed: 7}.events()
	log := writeLog(b, evs)
	b.SetBytes(int64(len(log)))
	b.ResetTimer()
	return evs, log
}

// BenchmarkJoin reads and joins a simulated log of about a million
// events, reporting events a second, of the clock and of the processor
// time used: on a machine shared with other work the second varies less.
func BenchmarkJoin(b *testing.B) {
	evs, log := benchLog(b)
	cpu := cpuTime()
	for b.Loop() {
		st, err := Join(context.Background(), Read(bytes.NewReader(log), "sim.jsonl"), JoinOptions{}, func(*Session) error { return nil })
		if err != nil || st.Events != len(evs) {
			b.Fatal(st, err)
		}
	}
	reportRate(b, len(evs), cpu)
}

// reportRate reports events a second, of the clock and of processor
// time since cpu.
func reportRate(b *testing.B, events int, cpu time.Duration) {
	n := float64(events) * float64(b.N)
	b.ReportMetric(n/b.Elapsed().Seconds(), "events/s")
	if used := cpuTime() - cpu; cpu > 0 && used > 0 {
		b.ReportMetric(n/used.Seconds(), "events/cpu-s")
	}
}

// BenchmarkRead reads the same log without joining it.
func BenchmarkRead(b *testing.B) {
	evs, log := benchLog(b)
	cpu := cpuTime()
	for b.Loop() {
		n := 0
		for _, err := range Read(bytes.NewReader(log), "sim.jsonl") {
			if err != nil {
				b.Fatal(err)
			}
			n++
		}
		if n != len(evs) {
			b.Fatal(n)
		}
	}
	reportRate(b, len(evs), cpu)
}

// BenchmarkJoinOnly joins events already read, to show the join's own
// share of BenchmarkJoin.
func BenchmarkJoinOnly(b *testing.B) {
	evs := simulated{sessions: 200_000, every: 2 * time.Second, seed: 7}.events()
	seq := func(yield func(Event, error) bool) {
		for _, e := range evs {
			if !yield(e, nil) {
				return
			}
		}
	}
	cpu := cpuTime()
	for b.Loop() {
		st, err := Join(context.Background(), seq, JoinOptions{}, func(*Session) error { return nil })
		if err != nil || st.Events != len(evs) {
			b.Fatal(st, err)
		}
	}
	reportRate(b, len(evs), cpu)
}

// The lines BenchmarkDecode reads: a search with a page of ten products,
// and a click.
var (
	benchSearch = []byte(`{"type":"search","session":"sess-0000123","time":"2025-03-14T09:26:53Z","query":"mustard rain jacket","shown":["P-00001","P-00008","P-00015","P-00022","P-00029","P-00036","P-00043","P-00050","P-00057","P-00064"]}`)
	benchClick  = []byte(`{"type":"click","session":"sess-0000123","time":"2025-03-14T09:27:53Z","product":"P-00022"}`)
)

// BenchmarkDecode decodes one line, checks and all.
func BenchmarkDecode(b *testing.B) {
	for _, bc := range []struct {
		name string
		line []byte
	}{{"search", benchSearch}, {"click", benchClick}} {
		b.Run(bc.name, func(b *testing.B) {
			var d decoder
			for b.Loop() {
				if _, err := d.decode(bc.line); err != nil {
					b.Fatal(err)
				}
			}
		})
	}
}

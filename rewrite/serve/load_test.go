package serve

import (
	"context"
	"fmt"
	"net/http"
	"os"
	"path/filepath"
	"runtime"
	"sort"
	"strings"
	"sync"
	"testing"
	"time"

	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// loadProducts is the demo catalog's size for the load test: the demo's
// own 20,000 with WHITTLE_LOAD_PRODUCTS=20000, else a quicker 3,000.
func loadProducts() int {
	if n := os.Getenv("WHITTLE_LOAD_PRODUCTS"); n != "" {
		var v int
		if _, err := fmt.Sscan(n, &v); err == nil && v >= 100 {
			return v
		}
	}
	return 3000
}

// loadQueries are rescue bodies drawn from the catalog: a type alone, a
// colour and a type, and the type with a pattern and a size that most
// products of it lack.
func loadQueries(ps []catalog.Product) []string {
	var out []string
	for i := 0; i < len(ps) && len(out) < 300; i += 7 {
		p := ps[i]
		if p.ProductType == "" {
			continue
		}
		qs := []string{p.ProductType, strings.TrimSpace(p.Colour + " " + p.ProductType), "striped " + p.ProductType + " size m"}
		out = append(out, fmt.Sprintf(`{"query": %q}`, qs[i%3]))
	}
	return out
}

type loadResult struct {
	statuses  map[int]int
	latencies []time.Duration
	retry     bool // every 503 said Retry-After
	elapsed   time.Duration
}

// held holds every count until its gate is closed, so that requests
// pile up in flight.
type held struct {
	*bleveengine.Engine
	gate chan struct{}
}

func (h *held) Count(ctx context.Context, p rewrite.Plan) (int, error) {
	select {
	case <-h.gate:
	case <-ctx.Done():
		return 0, ctx.Err()
	}
	return h.Engine.Count(ctx, p)
}

// loadTimeBound bounds a load run in time as well as in count: past it
// the clients send no more.
const loadTimeBound = 25 * time.Second

// runLoad sends n rescues from clients goroutines at once to url; busy,
// if set, is called at each 503.
func runLoad(t *testing.T, url string, bodies []string, clients, n int, busy func()) loadResult {
	t.Helper()
	client := &http.Client{Transport: &http.Transport{MaxIdleConnsPerHost: clients}}
	defer client.CloseIdleConnections()
	res := loadResult{statuses: map[int]int{}, retry: true}
	var mu sync.Mutex
	var wg sync.WaitGroup
	start := time.Now()
	for c := range clients {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for i := c; i < n && time.Since(start) < loadTimeBound; i += clients {
				t0 := time.Now()
				resp, err := client.Post(url, "application/json", strings.NewReader(bodies[i%len(bodies)]))
				d := time.Since(t0)
				if err != nil {
					mu.Lock()
					res.statuses[-1]++
					mu.Unlock()
					continue
				}
				resp.Body.Close()
				mu.Lock()
				res.statuses[resp.StatusCode]++
				if resp.StatusCode == http.StatusOK {
					res.latencies = append(res.latencies, d)
				}
				if resp.StatusCode == http.StatusServiceUnavailable && resp.Header.Get("Retry-After") == "" {
					res.retry = false
				}
				mu.Unlock()
				if resp.StatusCode == http.StatusServiceUnavailable && busy != nil {
					busy()
				}
			}
		}()
	}
	wg.Wait()
	res.elapsed = time.Since(start)
	return res
}

func pct(ds []time.Duration, p int) time.Duration {
	if len(ds) == 0 {
		return 0
	}
	s := append([]time.Duration(nil), ds...)
	sort.Slice(s, func(i, j int) bool { return s[i] < s[j] })
	return s[min(len(s)-1, (len(s)*p+99)/100-1)]
}

// TestLoad sends rescues from 32 clients at once over loopback, bounded
// in count and in time (loadTimeBound): below the in-flight cap every answer is
// 200; with the cap at 4, the rest are clean 503s with Retry-After, and
// nothing else; after shutdown no goroutine is left. It logs the
// throughput and the latencies, which it does not judge: the figures
// for the README come from WHITTLE_LOAD_PRODUCTS=20000 and
// WHITTLE_LOAD_REQUESTS=20000 on the demo catalog.
func TestLoad(t *testing.T) {
	before := runtime.NumGoroutine()
	ps := catalog.Demo(loadProducts(), 1)
	dir := filepath.Join(t.TempDir(), "idx")
	if _, err := bleveengine.BuildProducts(context.Background(), ps, dir, bleveengine.BuildOptions{}); err != nil {
		t.Fatal(err)
	}
	e, err := bleveengine.Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	bodies := loadQueries(ps)
	requests := 2000
	if n := os.Getenv("WHITTLE_LOAD_REQUESTS"); n != "" {
		fmt.Sscan(n, &requests)
	}
	for _, tc := range []struct {
		name   string
		cap    int
		hold   bool
		reason string
	}{
		{"below the cap", 64, false, "32 clients never have more than 32 requests in flight"},
		// The first four requests are held inside until a client has been
		// turned away, so the cap is surely reached; then all run free.
		{"above the cap", 4, true, "32 clients against a cap of 4: the rest must be told to come back"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var eng Engine = e
			var busy func()
			if tc.hold {
				h := &held{Engine: e, gate: make(chan struct{})}
				var once sync.Once
				eng, busy = h, func() { once.Do(func() { close(h.gate) }) }
			}
			s := newServer(t, eng, Limits{MaxInFlight: tc.cap}, nil, false)
			base, stop := running(t, s)
			r := runLoad(t, base+Prefix+"rescue", bodies, 32, requests, busy)
			if err := stop(); err != nil {
				t.Errorf("Serve: %v", err)
			}
			ok, turned := r.statuses[http.StatusOK], r.statuses[http.StatusServiceUnavailable]
			sent := 0
			for _, n := range r.statuses {
				sent += n
			}
			if ok+turned != sent || sent == 0 || !r.retry {
				t.Errorf("%s: statuses %v (503s with Retry-After: %v)", tc.reason, r.statuses, r.retry)
			}
			if tc.cap >= 32 && turned > 0 {
				t.Errorf("%s: %d answers 503", tc.reason, turned)
			}
			if tc.cap < 32 && (turned == 0 || ok == 0) {
				t.Errorf("%s: %d answered, %d told to come back", tc.reason, ok, turned)
			}
			t.Logf("%s: %d products, %d requests in %v: %.0f rescues/s answered, p50 %v, p99 %v, %d turned away",
				tc.name, len(ps), requests, r.elapsed, float64(ok)/r.elapsed.Seconds(), pct(r.latencies, 50), pct(r.latencies, 99), turned)
		})
	}
	if err := e.Close(); err != nil {
		t.Fatal(err)
	}
	checkGoroutines(t, before)
}

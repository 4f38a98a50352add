package bleveengine

import (
	"context"
	"fmt"
	"os"
	"path/filepath"
	"runtime"
	"strings"
	"sync"
	"testing"
	"time"

	"github.com/whittle-search/whittle/rewrite"
)

// A damaged or missing index gives a clear error from Open or from the
// first query, never a panic.
func TestDamagedIndex(t *testing.T) {
	garbage := []byte(strings.Repeat("not an index\n", 100))
	for _, tc := range []struct {
		name   string
		damage func(t *testing.T, dir string)
		want   string
	}{
		{"no directory", func(t *testing.T, dir string) { os.RemoveAll(dir) }, "no index at"},
		{"a file, not a directory", func(t *testing.T, dir string) {
			os.RemoveAll(dir)
			os.WriteFile(dir, garbage, 0o644)
		}, "not an index directory"},
		{"no vocabulary", func(t *testing.T, dir string) { os.Remove(filepath.Join(dir, vocabFile)) }, "not a whittle index"},
		{"damaged vocabulary", func(t *testing.T, dir string) { os.WriteFile(filepath.Join(dir, vocabFile), garbage, 0o644) }, "vocabulary is damaged"},
		{"no bleve index", func(t *testing.T, dir string) { os.RemoveAll(filepath.Join(dir, "index")) }, "opening the index"},
		{"damaged root", func(t *testing.T, dir string) {
			overwrite(t, filepath.Join(dir, "index", "store"), "root.bolt", garbage)
		}, ""},
		{"damaged segment", func(t *testing.T, dir string) { overwrite(t, filepath.Join(dir, "index", "store"), ".zap", garbage) }, ""},
		// bleve opens an index whose segment is unreadable either as an
		// error or as an empty index, depending on where the damage falls.
		{"truncated segment", func(t *testing.T, dir string) { overwrite(t, filepath.Join(dir, "index", "store"), ".zap", nil) }, ""},
		// The document count the build wrote down tells an index that lost
		// documents apart from an empty catalog.
		{"fewer documents than built", func(t *testing.T, dir string) {
			b, err := os.ReadFile(filepath.Join(dir, vocabFile))
			if err != nil {
				t.Fatal(err)
			}
			b = []byte(strings.Replace(string(b), `"documents":20`, `"documents":21`, 1))
			os.WriteFile(filepath.Join(dir, vocabFile), b, 0o644)
		}, "holds 20 documents where the build wrote 21"},
		// An index an older whittle built lacks fields queries now look
		// in (each tyre's size alone, a lamp's colour temperature, a
		// pipe's schedule); it is refused, not searched.
		{"first layout", func(t *testing.T, dir string) {
			setLayout(t, dir, "")
		}, fmt.Sprintf("built by another version of whittle (its layout is 1, this one reads %d): rebuild it", layout)},
		{"the layout before", func(t *testing.T, dir string) {
			setLayout(t, dir, fmt.Sprintf(`,"layout":%d`, layout-1))
		}, fmt.Sprintf("built by another version of whittle (its layout is %d, this one reads %d): rebuild it", layout-1, layout)},
		{"damaged metadata", func(t *testing.T, dir string) { overwrite(t, filepath.Join(dir, "index"), "index_meta.json", garbage) }, ""},
	} {
		t.Run(tc.name, func(t *testing.T) {
			dir := shopDir(t, 0) // one segment, so that damage to it is damage to the index
			tc.damage(t, dir)
			err := openAndAsk(dir)
			if err == nil {
				t.Fatal("a damaged index gave no error")
			}
			if tc.want != "" && !strings.Contains(err.Error(), tc.want) {
				t.Errorf("error %q, want one saying %q", err, tc.want)
			}
			t.Logf("%s: %v", tc.name, err)
		})
	}
}

// overwrite replaces the first file in dir whose name ends in suffix.
func overwrite(t *testing.T, dir, suffix string, b []byte) {
	t.Helper()
	es, err := os.ReadDir(dir)
	if err != nil {
		t.Fatal(err)
	}
	for _, e := range es {
		if strings.HasSuffix(e.Name(), suffix) {
			if err := os.WriteFile(filepath.Join(dir, e.Name()), b, 0o644); err != nil {
				t.Fatal(err)
			}
			return
		}
	}
	t.Fatalf("no file ending in %s in %s", suffix, dir)
}

// openAndAsk opens the index and asks it a count, a list and a facet.
func openAndAsk(dir string) (err error) {
	e, err := Open(dir)
	if err != nil {
		return err
	}
	defer e.Close()
	ctx := context.Background()
	p := rewrite.Plan{Clauses: []rewrite.Clause{{Field: "product_type", Values: []string{"rain jacket"}}}}
	if _, err := e.Count(ctx, p); err != nil {
		return err
	}
	if _, err := e.Show(ctx, p, 3); err != nil {
		return err
	}
	_, err = e.Values(ctx, "size", "", p)
	return err
}

// Opening, using and closing an index leaves no goroutine and no file
// descriptor behind.
func TestCloseLeaksNothing(t *testing.T) {
	dir := shopDir(t, 4)
	if err := openAndAsk(dir); err != nil { // warm up: lexicon, caches
		t.Fatal(err)
	}
	fds := func() int {
		es, err := os.ReadDir("/proc/self/fd")
		if err != nil {
			t.Skip("no /proc/self/fd here to count file descriptors")
		}
		return len(es)
	}
	settle := func(want int, now func() int) int {
		// Goroutines bleve starts end shortly after Close returns.
		n := now()
		for i := 0; i < 200 && n > want; i++ {
			time.Sleep(10 * time.Millisecond)
			n = now()
		}
		return n
	}
	g0, f0 := runtime.NumGoroutine(), fds()
	for range 20 {
		if err := openAndAsk(dir); err != nil {
			t.Fatal(err)
		}
	}
	if g := settle(g0, runtime.NumGoroutine); g > g0 {
		t.Errorf("%d goroutines after 20 opens and closes, %d before", g, g0)
	}
	if f := settle(f0, fds); f > f0 {
		t.Errorf("%d file descriptors after 20 opens and closes, %d before", f, f0)
	}
}

// 64 goroutines parse, rescue and list queries on one engine at once,
// with its caches cold; each result equals the one a single goroutine
// gets on an engine of its own.
func TestMixedCallsFrom64Goroutines(t *testing.T) {
	queries := []string{"rain jacket", "mustard rain jacket", "striped rain jacket", "merino crew sweater oatmeal",
		"trail running shoes size 13", "85 lens", "50mm lens for jx-10", "2x4 12 ft", "5x8 rug", "rain jacket under $50",
		"14 awg wire", "not black lens", "fn-3520", "zorblax", "womens rain jacket size m"}
	type result struct {
		parsed  string
		message string
		count   int
		ids     string
	}
	ask := func(e *Engine, rw *rewrite.Rewriter, q string) (result, error) {
		r := rw.Parse(q)
		var kinds []string
		for _, c := range r.Constraints {
			kinds = append(kinds, fmt.Sprintf("%s:%d-%d", c.Kind, c.Start, c.End))
		}
		o, err := rw.RescueParsed(context.Background(), r)
		if err != nil {
			return result{}, err
		}
		shown, err := e.Show(context.Background(), o.Plan, 5)
		var ids []string
		for _, s := range shown {
			ids = append(ids, s.ID)
		}
		return result{strings.Join(kinds, " "), o.Message, o.Count, strings.Join(ids, ",")}, err
	}
	seqDir, parDir := shopDir(t, 4), shopDir(t, 4)
	seq, err := Open(seqDir)
	if err != nil {
		t.Fatal(err)
	}
	defer seq.Close()
	want := map[string]result{}
	for _, q := range queries {
		r, err := ask(seq, rewrite.New(seq, nil), q)
		if err != nil {
			t.Fatal(err)
		}
		want[q] = r
	}
	par, err := Open(parDir)
	if err != nil {
		t.Fatal(err)
	}
	defer par.Close()
	rw := rewrite.New(par, nil)
	var wg sync.WaitGroup
	errs := make(chan error, 64*len(queries))
	for g := range 64 {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for j := range queries {
				q := queries[(j+g)%len(queries)]
				got, err := ask(par, rw, q)
				if err != nil {
					errs <- err
					continue
				}
				if got != want[q] {
					errs <- fmt.Errorf("%q: got %+v, want %+v", q, got, want[q])
				}
			}
		}()
	}
	wg.Wait()
	close(errs)
	for err := range errs {
		t.Error(err)
	}
}

// Several processes may have one index open at once (a server, a replay,
// a search from the command line): it is opened to read only, which
// shares its lock. Two opens in one process take the lock as two
// processes would (flock locks an open file, not a process). The
// watchdog only turns a hang into a failure.
func TestOpenTwice(t *testing.T) {
	dir := shopDir(t, 0)
	first, err := Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	defer first.Close()
	type opened struct {
		e   *Engine
		err error
	}
	done := make(chan opened, 1)
	go func() {
		e, err := Open(dir)
		done <- opened{e, err}
	}()
	var second *Engine
	select {
	case o := <-done:
		if o.err != nil {
			t.Fatalf("the second open failed: %v", o.err)
		}
		second = o.e
	case <-time.After(time.Minute):
		t.Fatal("the second open is still waiting for the index's lock")
	}
	defer second.Close()
	for _, e := range []*Engine{first, second} {
		n, err := e.Count(context.Background(), rewrite.Plan{Clauses: []rewrite.Clause{{Field: "product_type", Values: []string{"rain jacket"}}}})
		if err != nil || n != 3 {
			t.Errorf("rain jackets = %d, %v; want 3 (testdata/catalog/shop.jsonl)", n, err)
		}
	}
}

// setLayout writes the layout field of the index at dir as field: ""
// for none, as the first layout wrote.
func setLayout(t *testing.T, dir, field string) {
	t.Helper()
	b, err := os.ReadFile(filepath.Join(dir, vocabFile))
	if err != nil {
		t.Fatal(err)
	}
	now := fmt.Sprintf(`,"layout":%d`, layout)
	if !strings.Contains(string(b), now) {
		t.Fatalf("the vocabulary does not hold %s: %s", now, b)
	}
	if err := os.WriteFile(filepath.Join(dir, vocabFile), []byte(strings.Replace(string(b), now, field, 1)), 0o644); err != nil {
		t.Fatal(err)
	}
}

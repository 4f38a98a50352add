package main

import (
	"bufio"
	"bytes"
	"context"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"math"
	"os"
	"os/exec"
	"path/filepath"
	"runtime"
	"strings"
	"sync/atomic"
	"testing"
	"time"

	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/catalog"
	"github.com/whittle-search/whittle/rewrite/demo"
	"github.com/whittle-search/whittle/rewrite/signals"
)

// The test binary runs as the whittle command when asked to, so that a
// test can start whittle as a process of its own and kill it.
func TestMain(m *testing.M) {
	if os.Getenv("WHITTLE_TEST_AS_COMMAND") == "1" {
		os.Exit(run(os.Args[1:], os.Stdin, os.Stdout, os.Stderr))
	}
	os.Exit(m.Run())
}

// A whittle index killed part way through leaves the index it was
// replacing intact and usable, and the next build still succeeds.
func TestKilledIndexKeepsTheOldOne(t *testing.T) {
	if testing.Short() {
		t.Skip("builds a catalog of 20,000 products")
	}
	tmp := t.TempDir()
	dir := filepath.Join(tmp, "idx")
	if code, out, stderr := runCLI("", "index", "--catalog", shopCatalog, "--index", dir); code != 0 {
		t.Fatalf("index: exit %d\n%s%s", code, out, stderr)
	}
	big := filepath.Join(tmp, "big.jsonl")
	writeDemoCatalog(t, big, 20000)

	cmd := exec.Command(os.Args[0], "index", "--catalog", big, "--index", dir)
	cmd.Env = append(os.Environ(), "WHITTLE_TEST_AS_COMMAND=1")
	if err := cmd.Start(); err != nil {
		t.Fatal(err)
	}
	// Kill it once it has written a segment into its build directory.
	deadline := time.Now().Add(60 * time.Second)
	for !building(tmp) {
		if time.Now().After(deadline) {
			cmd.Process.Kill()
			t.Fatal("the build never started writing")
		}
		time.Sleep(5 * time.Millisecond)
	}
	if err := cmd.Process.Kill(); err != nil {
		t.Fatal(err)
	}
	cmd.Wait()

	e, err := bleveengine.Open(dir)
	if err != nil {
		t.Fatalf("the old index was lost: %v", err)
	}
	n, err := e.Count(context.Background(), rewrite.Plan{})
	e.Close()
	if err != nil || n != 13 {
		t.Errorf("the old index holds %d products (%v), want shop.jsonl's 13", n, err)
	}
	if code, out, stderr := runCLI("", "index", "--catalog", shopCatalog, "--index", dir); code != 0 {
		t.Fatalf("a build after the killed one: exit %d\n%s%s", code, out, stderr)
	}
}

// building reports whether a build directory under dir holds a segment.
func building(dir string) bool { return buildingAs(dir, "idx") }

// buildingAs reports whether a build of dir/name has written a segment.
func buildingAs(dir, name string) bool {
	ms, _ := filepath.Glob(filepath.Join(dir, "."+name+".building-*", "index", "store", "*.zap"))
	return len(ms) > 0
}

// whittleProcess starts whittle with args as a process of its own, its
// standard input fed by feed (when not nil) and its standard error kept.
func whittleProcess(t *testing.T, feed func(io.Writer) error, args ...string) (*exec.Cmd, *bytes.Buffer) {
	t.Helper()
	if runtime.GOOS == "windows" {
		t.Skip("no SIGINT to send")
	}
	cmd := exec.Command(os.Args[0], args...)
	cmd.Env = append(os.Environ(), "WHITTLE_TEST_AS_COMMAND=1")
	var stderr bytes.Buffer
	cmd.Stderr = &stderr
	if feed != nil {
		in, err := cmd.StdinPipe()
		if err != nil {
			t.Fatal(err)
		}
		go func() {
			feed(in) // until the process is gone and the pipe breaks
			in.Close()
		}()
	}
	if err := cmd.Start(); err != nil {
		t.Fatal(err)
	}
	return cmd, &stderr
}

// interrupt sends whittle SIGINT, as ^C on a terminal does, and returns
// its exit status and what it wrote to standard error.
func interrupt(t *testing.T, cmd *exec.Cmd, stderr *bytes.Buffer) (int, string) {
	t.Helper()
	if err := cmd.Process.Signal(os.Interrupt); err != nil {
		t.Fatal(err)
	}
	done := make(chan struct{})
	go func() { cmd.Wait(); close(done) }()
	select {
	case <-done:
	case <-time.After(60 * time.Second):
		cmd.Process.Kill()
		t.Fatal("whittle did not stop on SIGINT")
	}
	return cmd.ProcessState.ExitCode(), stderr.String()
}

// waitFor polls cond until it holds, for a minute at most.
func waitFor(t *testing.T, cmd *exec.Cmd, what string, cond func() bool) {
	t.Helper()
	deadline := time.Now().Add(60 * time.Second)
	for !cond() {
		if time.Now().After(deadline) {
			cmd.Process.Kill()
			cmd.Wait()
			t.Fatalf("%s never happened", what)
		}
		time.Sleep(5 * time.Millisecond)
	}
}

// An interrupted whittle index says it was interrupted, in words, and
// what is at --index: the old index, as it was, or no index at all.
func TestInterruptedIndexSaysSo(t *testing.T) {
	if testing.Short() {
		t.Skip("builds a catalog of 20,000 products")
	}
	tmp := t.TempDir()
	big := filepath.Join(tmp, "big.jsonl")
	writeDemoCatalog(t, big, 20000)
	old := filepath.Join(tmp, "old")
	if code, out, stderr := runCLI("", "index", "--catalog", shopCatalog, "--index", old); code != 0 {
		t.Fatalf("index: exit %d\n%s%s", code, out, stderr)
	}
	for _, tc := range []struct{ name, want string }{
		{"old", "whittle index: interrupted; the index at " + old + " is unchanged\n"},
		{"new", "whittle index: interrupted; no index was written at " + filepath.Join(tmp, "new") + "\n"},
	} {
		cmd, stderr := whittleProcess(t, nil, "index", "--catalog", big, "--index", filepath.Join(tmp, tc.name))
		waitFor(t, cmd, "a segment of the build", func() bool { return buildingAs(tmp, tc.name) })
		code, msg := interrupt(t, cmd, stderr)
		if code != 1 || msg != tc.want {
			t.Errorf("interrupted index at %s: exit %d, stderr %q; want 1 and %q", tc.name, code, msg, tc.want)
		}
	}
	if _, err := os.Stat(filepath.Join(tmp, "new")); !os.IsNotExist(err) {
		t.Errorf("the interrupted build left %s/new behind (%v)", tmp, err)
	}
	e, err := bleveengine.Open(old)
	if err != nil {
		t.Fatalf("the old index was lost: %v", err)
	}
	e.Close()
}

// countWriter counts the bytes written through it.
type countWriter struct {
	w io.Writer
	n atomic.Int64
}

func (c *countWriter) Write(p []byte) (int, error) {
	n, err := c.w.Write(p)
	c.n.Add(int64(n))
	return n, err
}

// An interrupted replay says it was interrupted, not "context canceled".
func TestInterruptedReplaySaysSo(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "idx")
	if code, out, stderr := runCLI("", "index", "--catalog", shopCatalog, "--index", dir); code != 0 {
		t.Fatalf("index: exit %d\n%s%s", code, out, stderr)
	}
	var fed *countWriter
	started := make(chan struct{})
	cmd, stderr := whittleProcess(t, func(w io.Writer) error {
		fed = &countWriter{w: w}
		close(started)
		for {
			if _, err := io.WriteString(fed, "red trail shoes size 13\nblue fleece\nnavy beanie under $20\n"); err != nil {
				return err
			}
		}
	}, "replay", "--log", "-", "--index", dir)
	<-started
	// Past a pipe's buffer, the lines written have been read.
	waitFor(t, cmd, "reading the log", func() bool { return fed.n.Load() > 256<<10 })
	code, msg := interrupt(t, cmd, stderr)
	if want := "whittle replay: interrupted; no summary was written\n"; code != 1 || msg != want {
		t.Errorf("interrupted replay: exit %d, stderr %q; want 1 and %q", code, msg, want)
	}
}

// An interrupted tune says it was interrupted, not "context canceled".
func TestInterruptedTuneSaysSo(t *testing.T) {
	if runtime.GOOS != "linux" {
		t.Skip("reads its log from /dev/stdin")
	}
	dir := filepath.Join(t.TempDir(), "idx")
	ps := catalog.Demo(2000, 1)
	if _, err := bleveengine.BuildProducts(context.Background(), ps, dir, bleveengine.BuildOptions{}); err != nil {
		t.Fatal(err)
	}
	var fed *countWriter
	started := make(chan struct{})
	propose := filepath.Join(t.TempDir(), "proposed.toml")
	cmd, stderr := whittleProcess(t, func(w io.Writer) error {
		fed = &countWriter{w: w}
		close(started)
		sw := signals.NewWriter(fed)
		_, err := demo.Signals(sw.Write, ps, math.MaxInt, 1)
		return err
	}, "tune", "--signals", "/dev/stdin", "--index", dir, "--propose", propose)
	<-started
	waitFor(t, cmd, "reading the log", func() bool { return fed.n.Load() > 256<<10 })
	code, msg := interrupt(t, cmd, stderr)
	if want := "whittle tune: interrupted; no report or policy was written\n"; code != 1 || msg != want {
		t.Errorf("interrupted tune: exit %d, stderr %q; want 1 and %q", code, msg, want)
	}
	if _, err := os.Stat(propose); !os.IsNotExist(err) {
		t.Errorf("the interrupted tune wrote %s", propose)
	}
}

// indexFailure tells an interrupt from other failures, and what is left.
func TestIndexFailure(t *testing.T) {
	live, cancelled := context.Background(), func() context.Context {
		ctx, cancel := context.WithCancel(context.Background())
		cancel()
		return ctx
	}()
	refused := &bleveengine.TargetError{Dir: "notidx", Reason: "it is a directory holding file.txt"}
	for _, tc := range []struct {
		ctx  context.Context
		err  error
		had  bool
		want string
	}{
		{cancelled, fmt.Errorf("reading: %w", context.Canceled), true, "interrupted; the index at idx is unchanged"},
		{cancelled, context.Canceled, false, "interrupted; no index was written at idx"},
		{live, errors.New("line 2: id: missing"), true, "shop.jsonl: line 2: id: missing (the index at idx is unchanged)"},
		{live, errors.New("line 2: id: missing"), false, "shop.jsonl: line 2: id: missing (no index was written at idx)"},
		{live, refused, false, refused.Error()},
	} {
		if got := indexFailure(tc.ctx, tc.err, "shop.jsonl", "idx", tc.had); got != tc.want {
			t.Errorf("indexFailure(%v, had %v) = %q, want %q", tc.err, tc.had, got, tc.want)
		}
	}
}

// whittle index refuses a --index that is not an index, on one line,
// and leaves it as it was.
func TestIndexRefusesWhatIsNotAnIndex(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "notidx")
	if err := os.Mkdir(dir, 0o755); err != nil {
		t.Fatal(err)
	}
	file := filepath.Join(dir, "file.txt")
	if err := os.WriteFile(file, []byte("precious\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	code, out, stderr := runCLI("", "index", "--catalog", shopCatalog, "--index", dir)
	if code != 1 || out != "" || strings.Count(stderr, "\n") != 1 ||
		!strings.HasPrefix(stderr, "whittle index: refusing to write an index at "+dir+": it is a directory holding file.txt") {
		t.Errorf("index over a directory of files: exit %d, stdout %q, stderr %q", code, out, stderr)
	}
	if b, err := os.ReadFile(file); err != nil || string(b) != "precious\n" {
		t.Errorf("file.txt after the refused build: %q, %v", b, err)
	}
	code, _, stderr = runCLI("", "index", "--catalog", shopCatalog, "--index", file)
	if code != 1 || !strings.Contains(stderr, "it is a file, not a directory") {
		t.Errorf("index over a file: exit %d, stderr %q", code, stderr)
	}
	if b, err := os.ReadFile(file); err != nil || string(b) != "precious\n" {
		t.Errorf("file.txt after the refused build: %q, %v", b, err)
	}
}

func writeDemoCatalog(t *testing.T, file string, n int) {
	t.Helper()
	f, err := os.Create(file)
	if err != nil {
		t.Fatal(err)
	}
	w := bufio.NewWriter(f)
	enc := json.NewEncoder(w)
	for _, p := range catalog.Demo(n, 1) {
		if err := enc.Encode(p); err != nil {
			t.Fatal(err)
		}
	}
	if err := w.Flush(); err != nil {
		t.Fatal(err)
	}
	if err := f.Close(); err != nil {
		t.Fatal(err)
	}
}

package main

import (
	"bufio"
	"context"
	"encoding/json"
	"os"
	"os/exec"
	"path/filepath"
	"testing"
	"time"

	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/catalog"
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
func building(dir string) bool {
	ms, _ := filepath.Glob(filepath.Join(dir, ".idx.building-*", "index", "store", "*.zap"))
	return len(ms) > 0
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

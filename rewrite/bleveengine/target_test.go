package bleveengine

import (
	"context"
	"errors"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"

	"github.com/whittle-search/whittle/rewrite"
)

const twoProducts = "{\"id\": \"a\", \"title\": \"Tarn fleece\", \"colour\": \"navy\"}\n{\"id\": \"b\", \"title\": \"Scree beanie\", \"colour\": \"red\"}\n"

// Build writes only where nothing is, or an empty directory, or an index
// it wrote: anything else at the path is refused, with an error naming
// the path and saying why, and left exactly as it was.
func TestBuildRefusesWhatIsNotAnIndex(t *testing.T) {
	for _, tc := range []struct {
		name   string
		make   func(t *testing.T, dir string) // puts something at dir
		reason string
	}{
		{"a directory with a stray file", func(t *testing.T, dir string) {
			mkdir(t, dir)
			write(t, filepath.Join(dir, "file.txt"), "precious")
		}, "holding file.txt"},
		{"a regular file", func(t *testing.T, dir string) {
			write(t, dir, "precious")
		}, "is a file"},
		{"a symbolic link to a directory", func(t *testing.T, dir string) {
			to := dir + "-target"
			mkdir(t, to)
			write(t, filepath.Join(to, "file.txt"), "precious")
			if err := os.Symlink(to, dir); err != nil {
				t.Skip(err)
			}
		}, "symbolic link"},
		{"a whittle index with a stray file", func(t *testing.T, dir string) {
			build(t, dir)
			write(t, filepath.Join(dir, "notes.txt"), "precious")
		}, "notes.txt, which whittle did not write"},
		{"a directory with a vocabulary file alone", func(t *testing.T, dir string) {
			mkdir(t, dir)
			write(t, filepath.Join(dir, vocabFile), "{}")
		}, "only part of a whittle index"},
		{"a directory named index alone", func(t *testing.T, dir string) {
			mkdir(t, filepath.Join(dir, "index"))
			write(t, filepath.Join(dir, "index", "file.txt"), "precious")
		}, "only part of a whittle index"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			parent := t.TempDir()
			dir := filepath.Join(parent, "target")
			tc.make(t, dir)
			before := snapshot(t, parent)
			if IsIndex(dir) {
				t.Errorf("IsIndex(%s) = true", dir)
			}
			_, err := Build(context.Background(), strings.NewReader(twoProducts), dir, BuildOptions{})
			if !errors.Is(err, ErrNotIndex) {
				t.Fatalf("Build gave %v, want ErrNotIndex", err)
			}
			var te *TargetError
			if !errors.As(err, &te) || te.Dir != dir || !strings.Contains(te.Reason, tc.reason) {
				t.Fatalf("Build gave %#v, want a *TargetError for %s saying %q", err, dir, tc.reason)
			}
			if msg := err.Error(); !strings.Contains(msg, dir) || !strings.Contains(msg, tc.reason) || strings.Contains(msg, "\n") {
				t.Errorf("the error %q does not name %s and say %q on one line", msg, dir, tc.reason)
			}
			if after := snapshot(t, parent); after != before {
				t.Errorf("the refused build changed what was there:\nbefore %s\nafter  %s", before, after)
			}
			// BuildProducts, for products in memory, refuses alike.
			if _, err := BuildProducts(context.Background(), nil, dir, BuildOptions{}); !errors.Is(err, ErrNotIndex) {
				t.Errorf("BuildProducts gave %v, want ErrNotIndex", err)
			}
			if after := snapshot(t, parent); after != before {
				t.Errorf("the refused BuildProducts changed what was there")
			}
		})
	}
}

// An empty directory, or one given with a trailing slash, takes an index.
func TestBuildIntoAnEmptyDirectory(t *testing.T) {
	for _, suffix := range []string{"", "/"} {
		parent := t.TempDir()
		dir := filepath.Join(parent, "empty")
		mkdir(t, dir)
		if IsIndex(dir) {
			t.Errorf("IsIndex of an empty directory = true")
		}
		if _, err := Build(context.Background(), strings.NewReader(twoProducts), dir+suffix, BuildOptions{}); err != nil {
			t.Fatalf("building into an empty directory %q: %v", dir+suffix, err)
		}
		if n := count(t, dir); n != 2 {
			t.Errorf("the index holds %d products, want 2", n)
		}
		if !IsIndex(dir) {
			t.Errorf("IsIndex of a built index = false")
		}
		if got := snapshot(t, parent); got != "empty/ empty/index/ empty/whittle-vocabulary.json" {
			t.Errorf("left beside the index: %s", got)
		}
	}
}

// A rebuild replaces an index whittle wrote, and touches nothing beside
// it: not even a directory named like the one the old index is moved to.
func TestRebuildReplacesOnlyTheIndex(t *testing.T) {
	parent := t.TempDir()
	dir := filepath.Join(parent, "idx")
	build(t, dir)
	mkdir(t, dir+".old")
	write(t, filepath.Join(dir+".old", "mine.txt"), "precious")
	if _, err := Build(context.Background(), strings.NewReader("{\"id\": \"c\", \"title\": \"Fell socks\"}\n"), dir, BuildOptions{}); err != nil {
		t.Fatal(err)
	}
	if n := count(t, dir); n != 1 {
		t.Errorf("the rebuilt index holds %d products, want the new catalog's 1", n)
	}
	if b, err := os.ReadFile(filepath.Join(dir+".old", "mine.txt")); err != nil || string(b) != "precious" {
		t.Errorf("idx.old/mine.txt after the rebuild: %q, %v", b, err)
	}
	if got := snapshot(t, parent); got != "idx.old/ idx.old/mine.txt=precious idx/ idx/index/ idx/whittle-vocabulary.json" {
		t.Errorf("left beside the index: %s", got)
	}
}

// Progress counts products, not the palette entries written with them.
func TestProgressCountsProducts(t *testing.T) {
	last := 0
	st, err := Build(context.Background(), strings.NewReader(twoProducts), filepath.Join(t.TempDir(), "idx"),
		BuildOptions{BatchSize: 1, Progress: func(n int) { last = max(last, n) }})
	if err != nil {
		t.Fatal(err)
	}
	if st.Colours != 2 || last != 2 {
		t.Errorf("progress ended at %d with %d colours, want 2, the products", last, st.Colours)
	}
}

func build(t *testing.T, dir string) {
	t.Helper()
	if _, err := Build(context.Background(), strings.NewReader(twoProducts), dir, BuildOptions{}); err != nil {
		t.Fatal(err)
	}
}

func count(t *testing.T, dir string) int {
	t.Helper()
	e, err := Open(dir)
	if err != nil {
		t.Fatal(err)
	}
	defer e.Close()
	n, err := e.Count(context.Background(), rewrite.Plan{})
	if err != nil {
		t.Fatal(err)
	}
	return n
}

func mkdir(t *testing.T, dir string) {
	t.Helper()
	if err := os.MkdirAll(dir, 0o755); err != nil {
		t.Fatal(err)
	}
}

func write(t *testing.T, file, text string) {
	t.Helper()
	if err := os.WriteFile(file, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
}

// snapshot lists what is under dir, two levels deep, with the contents
// of its files that are not part of an index.
func snapshot(t *testing.T, dir string) string {
	t.Helper()
	var out []string
	for _, pat := range []string{"*", "*/*"} {
		ms, err := filepath.Glob(filepath.Join(dir, pat))
		if err != nil {
			t.Fatal(err)
		}
		for _, m := range ms {
			rel, _ := filepath.Rel(dir, m)
			st, err := os.Lstat(m)
			if err != nil {
				t.Fatal(err)
			}
			switch {
			case st.Mode()&os.ModeSymlink != 0:
				to, _ := os.Readlink(m)
				rel += " -> " + to
			case st.IsDir():
				rel += "/"
			case strings.HasSuffix(rel, ".txt") || !strings.Contains(rel, "/"):
				b, _ := os.ReadFile(m)
				rel += "=" + string(b)
			}
			out = append(out, rel)
		}
	}
	slices.Sort(out)
	return strings.Join(out, " ")
}

package main

import (
	"context"
	"errors"
	"flag"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"sync/atomic"
	"time"

	"golang.org/x/term"

	"github.com/whittle-search/whittle/rewrite/bleveengine"
)

// defaultIndex is where the index lives when --index is not given.
func defaultIndex() string {
	dir, err := os.UserCacheDir()
	if err != nil {
		dir = os.TempDir()
	}
	return filepath.Join(dir, "whittle", "index")
}

// countingReader counts the bytes read, for progress.
type countingReader struct {
	r io.Reader
	n atomic.Int64
}

func (c *countingReader) Read(p []byte) (int, error) {
	n, err := c.r.Read(p)
	c.n.Add(int64(n))
	return n, err
}

func indexCmd(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("index", flag.ContinueOnError)
	fs.SetOutput(stderr)
	file := fs.String("catalog", "", "catalog file, JSON Lines, one product a line (required)")
	dir := fs.String("index", defaultIndex(), "index directory to write")
	skipBad := fs.Bool("skip-bad", false, "skip malformed lines and report them, instead of stopping at the first")
	fs.Usage = func() {
		fmt.Fprint(stderr, "usage: whittle index --catalog FILE [--index DIR] [--skip-bad]\n\nflags:\n")
		fs.PrintDefaults()
	}
	if _, code, ok := parseFlags(fs, args, 0); !ok {
		return code
	}
	if *file == "" {
		return usageError(fs, "--catalog FILE is required")
	}
	f, err := os.Open(*file)
	if err != nil {
		fmt.Fprintf(stderr, "whittle index: %v\n", err)
		return 1
	}
	defer f.Close()
	size := int64(0)
	if st, err := f.Stat(); err == nil {
		size = st.Size()
	}
	cr := &countingReader{r: f}
	ctx, stop := interruptible()
	defer stop()
	tty := isTerminal(stderr)
	start := time.Now()
	progress := func(n int) {
		if !tty {
			return
		}
		showProgress(stderr, cr.n.Load(), size, start, n, "products")
	}
	had := bleveengine.IsIndex(*dir)
	st, err := bleveengine.Build(ctx, cr, *dir, bleveengine.BuildOptions{SkipBad: *skipBad, Progress: progress})
	if tty {
		fmt.Fprint(stderr, "\r\033[K")
	}
	if err != nil {
		fmt.Fprintf(stderr, "whittle index: %s\n", indexFailure(ctx, err, *file, *dir, had))
		return 1
	}
	for _, le := range st.Skipped {
		fmt.Fprintf(stderr, "skipped %s: %v\n", *file, le)
	}
	for _, u := range st.Unknown {
		fmt.Fprintf(stderr, "note: %s:%d: %v\n", *file, u.Line, u)
	}
	fmt.Fprintf(stdout, "indexed %d products (%d colour names, %d lines skipped) into %s in %.1fs\n",
		st.Products, st.Colours, len(st.Skipped), *dir, time.Since(start).Seconds())
	return 0
}

// indexFailure says why a build of catalog file at dir failed, and what
// is at dir now: the index that was there before (had), or none.
func indexFailure(ctx context.Context, err error, file, dir string, had bool) string {
	if errors.Is(err, bleveengine.ErrNotIndex) {
		return err.Error() // it says that nothing at dir was touched
	}
	left := "no index was written at " + dir
	if had {
		left = "the index at " + dir + " is unchanged"
	}
	if interrupted(ctx, err) {
		return "interrupted; " + left
	}
	return fmt.Sprintf("%s: %v (%s)", file, err, left)
}

// showProgress redraws the progress line of a long command on a
// terminal: a bar of the bytes read of size, n things done so far, their
// rate, and the time left at the rate the bytes are read.
func showProgress(w io.Writer, done, size int64, start time.Time, n int, things string) {
	el := time.Since(start).Seconds()
	eta := ""
	if size > 0 && done > 0 {
		eta = fmt.Sprintf(", about %.0fs left", el*float64(size-done)/float64(done))
	}
	fmt.Fprintf(w, "\r%s  %d %s, %.0f/s%s   ", bar(done, size), n, things, float64(n)/max(el, 1e-9), eta)
}

// isTerminal reports whether w is a terminal, where progress is shown.
func isTerminal(w io.Writer) bool {
	f, ok := w.(*os.File)
	return ok && term.IsTerminal(int(f.Fd()))
}

// bar draws a 24-character progress bar for done of total bytes.
func bar(done, total int64) string {
	const width = 24
	if total <= 0 {
		return ""
	}
	n := int(float64(width) * float64(done) / float64(total))
	n = min(max(n, 0), width)
	b := make([]rune, width)
	for i := range b {
		if i < n {
			b[i] = '█'
		} else {
			b[i] = '·'
		}
	}
	return "[" + string(b) + "]"
}

package serve

import (
	"context"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"
	"time"

	"github.com/chromedp/chromedp"
)

// chromium finds a headless browser: Debian's chromium package, which
// .ci/run installs.
func chromium() string {
	for _, name := range []string{"chromium", "chromium-browser", "google-chrome"} {
		if p, err := exec.LookPath(name); err == nil {
			return p
		}
	}
	return ""
}

// A real browser loads the workbench from a server on 127.0.0.1, types
// a query, sends the form with the keyboard, and finds the spans, the
// plans counted and the hits. It saves a screenshot (PNG): in
// $WHITTLE_ARTEFACTS when set, else in the test's temporary directory.
func TestWorkbenchInABrowser(t *testing.T) {
	bin := chromium()
	if bin == "" {
		t.Skip("no Chromium here (install Debian's chromium package; .ci/run does): the browser test is skipped")
	}
	s := newServer(t, openShop(t), Limits{}, nil, false)
	base, stop := running(t, s)
	defer stop()

	opts := append(chromedp.DefaultExecAllocatorOptions[:], chromedp.ExecPath(bin), chromedp.NoSandbox, chromedp.Headless)
	actx, cancelA := chromedp.NewExecAllocator(context.Background(), opts...)
	defer cancelA()
	bctx, cancelB := chromedp.NewContext(actx)
	defer cancelB()
	bctx, cancelT := context.WithTimeout(bctx, 60*time.Second)
	defer cancelT()

	err := chromedp.Do(bctx,
		chromedp.Navigate(base+Prefix+"workbench"),
		chromedp.WaitVisible(`#q`),
		chromedp.SendKeys(`#q`, "mustard rain jacket\n"),
		chromedp.WaitVisible(`#hits`),
	)
	if err != nil {
		t.Fatalf("the browser: %v", err)
	}
	text := func(sel string) string {
		t.Helper()
		s, err := chromedp.Run(bctx, chromedp.Text(sel))
		if err != nil {
			t.Fatalf("the browser, reading %s: %v", sel, err)
		}
		return s
	}
	spans, steps, hits, message := text(`#spans`), text(`#steps`), text(`#hits`), text(`#message`)
	shot, err := chromedp.Run(bctx, chromedp.FullScreenshot(100))
	if err != nil {
		t.Fatalf("the browser, a screenshot: %v", err)
	}
	// shop.jsonl: mustard widens to harvest gold, RJ-1's colour.
	for _, c := range []struct{ got, want, where string }{
		{spans, "colour · firm", "spans"}, {spans, "product_type · firm", "spans"},
		{steps, "the query as typed", "steps"}, {steps, "widen colour", "steps"},
		{hits, "RJ-1", "hits"}, {message, "colours close to mustard", "message"},
	} {
		if !strings.Contains(c.got, c.want) {
			t.Errorf("the %s show %q, want %q in them", c.where, c.got, c.want)
		}
	}
	dir := os.Getenv("WHITTLE_ARTEFACTS")
	if dir == "" {
		dir = t.TempDir()
	}
	if err := os.MkdirAll(dir, 0o755); err != nil {
		t.Fatal(err)
	}
	file := filepath.Join(dir, "workbench.png")
	if err := os.WriteFile(file, shot, 0o644); err != nil {
		t.Fatal(err)
	}
	t.Logf("screenshot: %s", file)
}

package main

import (
	"bufio"
	"net/http"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"syscall"
	"testing"
)

// whittle serve answers on loopback until SIGTERM, then exits 0; its log
// has one line a request and no query text.
func TestServeUntilTerminated(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "idx")
	if code, out, stderr := runCLI("", "index", "--catalog", shopCatalog, "--index", dir); code != 0 {
		t.Fatalf("index: exit %d\n%s%s", code, out, stderr)
	}
	cmd := exec.Command(os.Args[0], "serve", "--index", dir, "--addr", "127.0.0.1:0")
	cmd.Env = append(os.Environ(), "WHITTLE_TEST_AS_COMMAND=1")
	var logs strings.Builder
	cmd.Stderr = &logs
	out, err := cmd.StdoutPipe()
	if err != nil {
		t.Fatal(err)
	}
	if err := cmd.Start(); err != nil {
		t.Fatal(err)
	}
	line, err := bufio.NewReader(out).ReadString('\n')
	if err != nil {
		cmd.Process.Kill()
		t.Fatalf("no address printed: %v\n%s", err, logs.String())
	}
	base := strings.TrimSuffix(strings.TrimSpace(line[strings.Index(line, "http://"):]), "/whittle/v1/")
	if !strings.HasPrefix(base, "http://127.0.0.1:") {
		t.Errorf("listening on %q; want loopback by default", base)
	}
	resp, err := http.Post(base+"/whittle/v1/rescue", "application/json", strings.NewReader(`{"query": "mustard rain jacket"}`))
	if err != nil || resp.StatusCode != 200 {
		t.Errorf("rescue: %v %v", resp, err)
	}
	if resp != nil {
		resp.Body.Close()
	}
	if err := cmd.Process.Signal(syscall.SIGTERM); err != nil {
		t.Fatal(err)
	}
	if err := cmd.Wait(); err != nil {
		t.Errorf("after SIGTERM: %v\n%s", err, logs.String())
	}
	if !strings.Contains(logs.String(), `"endpoint":"rescue"`) || strings.Contains(logs.String(), "mustard") {
		t.Errorf("log %q: want the rescue's line without its query", logs.String())
	}
}

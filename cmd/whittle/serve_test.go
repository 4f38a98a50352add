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
	cmd, line, logs := startServe(t, "--index", dir, "--addr", "127.0.0.1:0")
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

// whittle serve logs a policy's warning once, at start, as one line of
// its JSON log: a policy making wire gauges soft is loaded knowingly.
func TestServeLogsPolicyWarning(t *testing.T) {
	dir := t.TempDir()
	idx := filepath.Join(dir, "idx")
	if code, out, stderr := runCLI("", "index", "--catalog", shopCatalog, "--index", idx); code != 0 {
		t.Fatalf("index: exit %d\n%s%s", code, out, stderr)
	}
	risky := filepath.Join(dir, "risky.toml")
	os.WriteFile(risky, []byte("[category.electrical.strictness]\nspec = \"soft\"\n"), 0o644)
	cmd, _, logs := startServe(t, "--index", idx, "--addr", "127.0.0.1:0", "--policy", risky)
	cmd.Process.Signal(syscall.SIGTERM)
	if err := cmd.Wait(); err != nil {
		t.Errorf("after SIGTERM: %v", err)
	}
	var lines []string
	for _, l := range strings.Split(logs.String(), "\n") {
		if strings.Contains(l, "spec is soft") {
			lines = append(lines, l)
		}
	}
	if len(lines) != 1 || !strings.Contains(lines[0], `"level":"WARN"`) || !strings.Contains(lines[0], `"msg":"policy warning"`) {
		t.Errorf("want one WARN line of the log with the warning; log:\n%s", logs.String())
	}
}

// startServe runs whittle serve with args as a process and returns it
// with the line it printed once listening, and its log as it grows.
func startServe(t *testing.T, args ...string) (*exec.Cmd, string, *strings.Builder) {
	t.Helper()
	cmd := exec.Command(os.Args[0], append([]string{"serve"}, args...)...)
	cmd.Env = append(os.Environ(), "WHITTLE_TEST_AS_COMMAND=1")
	logs := new(strings.Builder)
	cmd.Stderr = logs
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
		cmd.Wait()
		t.Fatalf("no address printed: %v\n%s", err, logs.String())
	}
	return cmd, line, logs
}

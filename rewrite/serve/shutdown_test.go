package serve

import (
	"context"
	"io"
	"net"
	"net/http"
	"runtime"
	"strings"
	"testing"
	"time"
)

// running serves s on a free loopback port; it returns the base URL and
// a stop that ends Serve and returns what it returned.
func running(t *testing.T, s *Server) (string, func() error) {
	t.Helper()
	l, err := net.Listen("tcp", "127.0.0.1:0")
	if err != nil {
		t.Fatal(err)
	}
	ctx, stop := context.WithCancel(context.Background())
	served := make(chan error, 1)
	go func() { served <- s.Serve(ctx, l) }()
	return "http://" + l.Addr().String(), func() error { stop(); return <-served }
}

func TestShutdownLetsRequestsFinish(t *testing.T) {
	g := &gated{Engine: openShop(t), entered: make(chan struct{}, 1), release: make(chan struct{})}
	before := runtime.NumGoroutine() // the engine's own are the caller's, closed after the test
	s := newServer(t, g, Limits{}, nil, false)
	base, stop := running(t, s)
	served := make(chan error, 1)

	client := &http.Client{Transport: &http.Transport{}}
	answer := make(chan int, 1)
	go func() {
		resp, err := client.Post(base+Prefix+"rescue", "application/json", strings.NewReader(`{"query": "rug"}`))
		if err != nil {
			answer <- -1
			return
		}
		resp.Body.Close()
		answer <- resp.StatusCode
	}()
	<-g.entered // the rescue is in flight
	go func() { served <- stop() }()
	for !s.draining.Load() {
		runtime.Gosched()
	}
	if w := do(s.Handler(), "GET", Prefix+"ready", ""); w.Code != 503 || errorOf(t, w).Code != CodeDraining {
		t.Errorf("ready while shutting down: %d", w.Code)
	}
	g.entered = nil
	close(g.release)
	if code := <-answer; code != 200 {
		t.Errorf("the request in flight got %d; want 200", code)
	}
	if err := <-served; err != nil {
		t.Errorf("Serve: %v", err)
	}
	client.CloseIdleConnections()
	checkGoroutines(t, before)
}

// checkGoroutines fails if more goroutines run than before, once those
// that are ending have had their turn; it waits by yielding, up to a
// bound of attempts, never by timing anything.
func checkGoroutines(t *testing.T, before int) {
	t.Helper()
	for i := 0; i < 1000 && runtime.NumGoroutine() > before; i++ {
		runtime.Gosched()
		time.Sleep(time.Millisecond)
	}
	if n := runtime.NumGoroutine(); n > before {
		buf := make([]byte, 1<<16)
		t.Errorf("%d goroutines after shutdown, %d before:\n%s", n, before, buf[:runtime.Stack(buf, true)])
	}
}

func TestServeStopsWithNothingLeft(t *testing.T) {
	e := openShop(t)
	before := runtime.NumGoroutine()
	s := newServer(t, e, Limits{}, nil, false)
	base, stop := running(t, s)
	client := &http.Client{Transport: &http.Transport{}}
	resp, err := client.Get(base + Prefix + "health")
	if err != nil {
		t.Fatal(err)
	}
	resp.Body.Close()
	if err := stop(); err != nil {
		t.Errorf("Serve: %v", err)
	}
	client.CloseIdleConnections()
	checkGoroutines(t, before)
}

func TestReadTimeoutClosesASlowClient(t *testing.T) {
	s := newServer(t, openShop(t), Limits{ReadTimeout: 20 * time.Millisecond}, nil, false)
	base, stop := running(t, s)
	conn, err := net.Dial("tcp", strings.TrimPrefix(base, "http://"))
	if err != nil {
		t.Fatal(err)
	}
	defer conn.Close()
	// Half a request, then nothing: the server must give up on it rather
	// than hold the connection; a read then ends (EOF, or the 408 Go's
	// server may write first), and does not wait for ever.
	if _, err := conn.Write([]byte("POST " + Prefix + "parse HTTP/1.1\r\nHost: x\r\n")); err != nil {
		t.Fatal(err)
	}
	conn.SetReadDeadline(time.Now().Add(time.Minute)) // a guard against hanging the suite, not a measure
	buf := make([]byte, 512)
	for {
		if _, err := conn.Read(buf); err != nil {
			if ne, ok := err.(net.Error); ok && ne.Timeout() {
				t.Fatal("the server kept a half-sent request open")
			}
			break
		}
	}
	if err := stop(); err != nil {
		t.Errorf("Serve: %v", err)
	}
}

func TestWriteTimeoutCutsALateAnswer(t *testing.T) {
	// The engine stalls until the request's deadline, which comes well
	// after the write timeout: the answer is then too late to be sent,
	// and the client sees the connection end instead of an answer.
	g := &gated{Engine: openShop(t), stallAfter: 1}
	s := newServer(t, g, Limits{Deadline: 300 * time.Millisecond, WriteTimeout: 10 * time.Millisecond}, nil, false)
	base, stop := running(t, s)
	client := &http.Client{Transport: &http.Transport{}}
	resp, err := client.Post(base+Prefix+"rescue", "application/json", strings.NewReader(`{"query": "mustard rain jacket"}`))
	if err == nil {
		_, err = io.ReadAll(resp.Body)
		resp.Body.Close()
		t.Errorf("an answer came after the write timeout: %d (read: %v)", resp.StatusCode, err)
	}
	client.CloseIdleConnections()
	if err := stop(); err != nil {
		t.Errorf("Serve: %v", err)
	}
}

package serve

import (
	"bytes"
	"context"
	"encoding/json"
	"io"
	"log/slog"
	"net/http"
	"net/http/httptest"
	"os"
	"path/filepath"
	"strings"
	"sync"
	"sync/atomic"
	"testing"

	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
)

// shop is the index of testdata/catalog/shop.jsonl, an invented shop of
// 13 products, built once in a temporary directory for the package's
// tests. Expected values in the tests are worked out by hand from it.
var shop struct {
	once sync.Once
	dir  string
	err  error
}

// openShop opens a fresh engine on the shop's index.
func openShop(t testing.TB) *bleveengine.Engine {
	t.Helper()
	shop.once.Do(func() {
		f, err := os.Open(filepath.Join("..", "..", "testdata", "catalog", "shop.jsonl"))
		if err != nil {
			shop.err = err
			return
		}
		defer f.Close()
		tmp, err := os.MkdirTemp("", "whittle-serve-test")
		if err != nil {
			shop.err = err
			return
		}
		shop.dir = filepath.Join(tmp, "idx")
		_, shop.err = bleveengine.Build(context.Background(), f, shop.dir, bleveengine.BuildOptions{BatchSize: 4})
	})
	if shop.err != nil {
		t.Fatal(shop.err)
	}
	e, err := bleveengine.Open(shop.dir)
	if err != nil {
		t.Fatal(err)
	}
	t.Cleanup(func() { e.Close() })
	return e
}

func TestMain(m *testing.M) {
	code := m.Run()
	if shop.dir != "" {
		os.RemoveAll(filepath.Dir(shop.dir))
	}
	os.Exit(code)
}

// gated is the shop's engine with a hold on Count, so that a test can
// keep a rescue in flight, or make it panic.
type gated struct {
	*bleveengine.Engine
	entered chan struct{} // gets a value when a Count starts, if not nil
	release chan struct{} // Count waits on it, if not nil
	panics  bool
	// stallAfter, when above 0, makes every Count after that many wait
	// for the request's deadline.
	stallAfter int32
	counts     atomic.Int32
}

func (g *gated) Count(ctx context.Context, p rewrite.Plan) (int, error) {
	if g.panics {
		panic("a failing engine")
	}
	if n := g.counts.Add(1); g.stallAfter > 0 && n > g.stallAfter {
		<-ctx.Done()
		return 0, ctx.Err()
	}
	if g.entered != nil {
		g.entered <- struct{}{}
	}
	if g.release != nil {
		<-g.release
	}
	return g.Engine.Count(ctx, p)
}

// newServer is a server on engine e with limits l, logging to log.
func newServer(t testing.TB, e Engine, l Limits, log io.Writer, logQueries bool) *Server {
	t.Helper()
	if log == nil {
		log = io.Discard
	}
	s, err := New(Config{Engine: e, Limits: l, Logger: slog.New(slog.NewJSONHandler(log, nil)), LogQueries: logQueries})
	if err != nil {
		t.Fatal(err)
	}
	return s
}

// do sends a request to h and returns the recorded answer.
func do(h http.Handler, method, path, body string) *httptest.ResponseRecorder {
	var rd io.Reader
	if body != "" {
		rd = strings.NewReader(body)
	}
	req := httptest.NewRequest(method, path, rd)
	w := httptest.NewRecorder()
	h.ServeHTTP(w, req)
	return w
}

// errorOf reads the error of an answer.
func errorOf(t *testing.T, w *httptest.ResponseRecorder) Error {
	t.Helper()
	var body struct {
		Error Error `json:"error"`
	}
	if err := json.Unmarshal(w.Body.Bytes(), &body); err != nil {
		t.Fatalf("answer %q is not an error object: %v", w.Body.String(), err)
	}
	return body.Error
}

// decodeBody reads a JSON answer into v.
func decodeBody(t *testing.T, w *httptest.ResponseRecorder, v any) {
	t.Helper()
	if err := json.NewDecoder(bytes.NewReader(w.Body.Bytes())).Decode(v); err != nil {
		t.Fatalf("answer %q: %v", w.Body.String(), err)
	}
}

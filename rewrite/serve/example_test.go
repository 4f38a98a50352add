package serve_test

import (
	"context"
	"encoding/json"
	"errors"
	"fmt"
	"log"
	"net"
	"net/http"
	"net/http/httptest"
	"os"
	"path/filepath"
	"strings"

	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/serve"
)

// index builds the invented shop of testdata/catalog/shop.jsonl in a
// temporary directory and opens it.
func index() (*bleveengine.Engine, func()) {
	f, err := os.Open(filepath.Join("..", "..", "testdata", "catalog", "shop.jsonl"))
	if err != nil {
		log.Fatal(err)
	}
	defer f.Close()
	tmp, err := os.MkdirTemp("", "whittle-example")
	if err != nil {
		log.Fatal(err)
	}
	dir := filepath.Join(tmp, "idx")
	if _, err := bleveengine.Build(context.Background(), f, dir, bleveengine.BuildOptions{}); err != nil {
		log.Fatal(err)
	}
	e, err := bleveengine.Open(dir)
	if err != nil {
		log.Fatal(err)
	}
	return e, func() { e.Close(); os.RemoveAll(tmp) }
}

// A server's handler answers a rescue with the contract of `whittle
// search --json`: no mustard rain jacket, so the colour is widened to
// the shop's harvest gold.
func ExampleNew() {
	eng, done := index()
	defer done()
	s, err := serve.New(serve.Config{Engine: eng})
	if err != nil {
		log.Fatal(err)
	}
	req := httptest.NewRequest("POST", serve.Prefix+"rescue", strings.NewReader(`{"query": "mustard rain jacket", "hits": 1}`))
	w := httptest.NewRecorder()
	s.Handler().ServeHTTP(w, req)
	var rep struct {
		Message string
		Hits    []struct{ ID, Colour string }
	}
	json.NewDecoder(w.Body).Decode(&rep)
	fmt.Println(w.Code, rep.Hits[0].ID, rep.Hits[0].Colour)
	// Output: 200 RJ-1 harvest gold
}

// Serve answers on a listener until its context ends, then lets the
// requests in flight finish.
func ExampleServer_Serve() {
	eng, done := index()
	defer done()
	s, err := serve.New(serve.Config{Engine: eng})
	if err != nil {
		log.Fatal(err)
	}
	l, err := net.Listen("tcp", "127.0.0.1:0")
	if err != nil {
		log.Fatal(err)
	}
	ctx, stop := context.WithCancel(context.Background())
	served := make(chan error, 1)
	go func() { served <- s.Serve(ctx, l) }()
	client := &http.Client{Transport: &http.Transport{}}
	resp, err := client.Get("http://" + l.Addr().String() + serve.Prefix + "policy?category=paint")
	if err != nil {
		log.Fatal(err)
	}
	var pol struct {
		ColourTolerance float64           `json:"colour_tolerance"`
		Strictness      map[string]string `json:"strictness"`
	}
	json.NewDecoder(resp.Body).Decode(&pol)
	resp.Body.Close()
	client.CloseIdleConnections()
	stop()
	fmt.Println(pol.ColourTolerance, pol.Strictness["colour"], <-served)
	// Output: 2 hard <nil>
}

// Handler can be mounted in a server of the caller's own.
func ExampleServer_Handler() {
	eng, done := index()
	defer done()
	s, _ := serve.New(serve.Config{Engine: eng})
	mux := http.NewServeMux()
	mux.Handle(serve.Prefix, s.Handler())
	w := httptest.NewRecorder()
	mux.ServeHTTP(w, httptest.NewRequest("GET", serve.Prefix+"ready", nil))
	fmt.Print(w.Code, " ", w.Body.String())
	// Output: 200 {"status":"ready"}
}

// Each error code has one HTTP status.
func ExampleCode_Status() {
	fmt.Println(serve.CodeBusy.Status(), serve.CodeQueryTooLong.Status(), serve.CodeDeadlinePassed.Status())
	// Output: 503 400 504
}

// A query with nothing to search for is refused by the library; the
// service answers it as query_unreadable, with the span of the problem.
func ExampleRefusalError() {
	eng, done := index()
	defer done()
	rw := rewrite.New(eng, nil)
	_, err := eng.Rescue(context.Background(), rw, rw.Parse("!!!"), bleveengine.RescueOptions{K: 10})
	var re *rewrite.RefusedError
	if errors.As(err, &re) {
		e := serve.RefusalError(re)
		fmt.Println(e.Code, e.Code.Status(), *e.Span, e.Message)
	}
	// Output: query_unreadable 400 {0 3} no word or number to search for
}

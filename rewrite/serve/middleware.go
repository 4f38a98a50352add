package serve

import (
	"context"
	"fmt"
	"log/slog"
	"net/http"
	"runtime/debug"
	"strconv"
	"time"
)

// info is what the log line and the metrics of one request need; the
// handlers fill in what only they know.
type info struct {
	endpoint string
	code     Code
	query    string
}

type infoKey struct{}

// infoOf is the request's info, or nil outside the middleware.
func infoOf(r *http.Request) *info {
	in, _ := r.Context().Value(infoKey{}).(*info)
	return in
}

// recorder keeps the status written.
type recorder struct {
	http.ResponseWriter
	status int
	bytes  int
}

func (w *recorder) WriteHeader(st int) {
	if w.status == 0 {
		w.status = st
	}
	w.ResponseWriter.WriteHeader(st)
}

func (w *recorder) Write(b []byte) (int, error) {
	if w.status == 0 {
		w.status = http.StatusOK
	}
	n, err := w.ResponseWriter.Write(b)
	w.bytes += n
	return n, err
}

// observe wraps every request: it recovers a panic (logged with its
// stack, answered 500 with CodeServerFault), writes the request's log line
// and counts it.
func (s *Server) observe(endpoint string, next http.Handler) http.Handler {
	return http.HandlerFunc(func(w http.ResponseWriter, r *http.Request) {
		start := time.Now()
		in := &info{endpoint: endpoint}
		rec := &recorder{ResponseWriter: w}
		r = r.WithContext(context.WithValue(r.Context(), infoKey{}, in))
		defer func() {
			if v := recover(); v != nil {
				s.log.Error("panic", "endpoint", endpoint, "panic", fmt.Sprint(v), "stack", string(debug.Stack()))
				if rec.status == 0 {
					writeError(rec, r, errorf(CodeServerFault, "the server failed; its log says why"))
				}
			}
			s.finish(r, in, rec, time.Since(start))
		}()
		next.ServeHTTP(rec, r)
	})
}

// finish logs and counts a request.
func (s *Server) finish(r *http.Request, in *info, rec *recorder, took time.Duration) {
	s.metrics.request(in.endpoint, rec.status, in.code, took)
	attrs := []slog.Attr{slog.String("method", r.Method), slog.String("endpoint", in.endpoint), slog.Int("status", rec.status),
		slog.Int("bytes", rec.bytes), slog.Float64("ms", float64(took.Microseconds())/1000)}
	if in.code != "" {
		attrs = append(attrs, slog.String("code", string(in.code)))
	}
	if s.logQuery && in.query != "" {
		attrs = append(attrs, slog.String("query", in.query))
	}
	s.log.LogAttrs(r.Context(), slog.LevelInfo, "request", attrs...)
}

// only answers 405 with CodeMethodNotAllowed to any method but method
// (GET allows HEAD too).
func only(method string, next http.HandlerFunc) http.Handler {
	return http.HandlerFunc(func(w http.ResponseWriter, r *http.Request) {
		if r.Method != method && !(method == http.MethodGet && r.Method == http.MethodHead) {
			w.Header().Set("Allow", method)
			writeError(w, r, errorf(CodeMethodNotAllowed, fmt.Sprintf("%s takes %s, not %s", r.URL.Path, method, r.Method)))
			return
		}
		next(w, r)
	})
}

// limit caps the requests in flight, answering the rest 503 with
// Retry-After, and gives each admitted request the deadline.
func (s *Server) limit(next http.Handler) http.Handler {
	return http.HandlerFunc(func(w http.ResponseWriter, r *http.Request) {
		select {
		case s.slots <- struct{}{}:
		default:
			secs := int((s.limits.RetryAfter + time.Second - 1) / time.Second)
			w.Header().Set("Retry-After", strconv.Itoa(secs))
			writeError(w, r, errorf(CodeBusy, fmt.Sprintf("%d requests are in flight, the most this server takes; retry after %d s", cap(s.slots), secs)))
			return
		}
		defer func() { <-s.slots }()
		ctx, cancel := context.WithTimeout(r.Context(), s.limits.Deadline)
		defer cancel()
		r.Body = http.MaxBytesReader(w, r.Body, s.limits.MaxBodyBytes)
		next.ServeHTTP(w, r.WithContext(ctx))
	})
}

// routes is every endpoint behind its middleware.
func (s *Server) routes() http.Handler {
	mux := http.NewServeMux()
	for _, e := range []struct {
		name, method string
		h            http.HandlerFunc
		limited      bool
	}{
		{"parse", http.MethodPost, s.handleParse, true},
		{"rescue", http.MethodPost, s.handleRescue, true},
		{"policy", http.MethodGet, s.handlePolicy, true},
		{"health", http.MethodGet, s.handleHealth, false},
		{"ready", http.MethodGet, s.handleReady, false},
		{"workbench", http.MethodGet, s.handleWorkbench, true},
		{"metrics", http.MethodGet, s.metrics.serve, false},
	} {
		h := only(e.method, e.h)
		if e.limited {
			h = s.limit(h)
		}
		mux.Handle(Prefix+e.name, s.observe(e.name, h))
	}
	mux.Handle("/", s.observe("other", http.HandlerFunc(func(w http.ResponseWriter, r *http.Request) {
		writeError(w, r, errorf(CodeNoEndpoint, fmt.Sprintf("no endpoint at %s; they lie under %s", r.URL.Path, Prefix)))
	})))
	return mux
}

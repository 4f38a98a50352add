package serve

import (
	"context"
	"errors"
	"io"
	"log/slog"
	"net"
	"net/http"
	"sync/atomic"
	"time"

	"github.com/whittle-search/whittle/lexicon"
	"github.com/whittle-search/whittle/parser"
	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
)

// Prefix is the path every endpoint lies under; a new version of the
// contracts would get a new prefix.
const Prefix = "/whittle/v1/"

// DefaultAddr is where `whittle serve` listens unless told otherwise:
// loopback only.
const DefaultAddr = "127.0.0.1:7391"

// Engine is what the service searches: a rewrite engine that can rescue
// a parsed query and show its hits. *bleveengine.Engine is one.
type Engine interface {
	rewrite.Engine
	Rescue(ctx context.Context, rw *rewrite.Rewriter, r *parser.Result, opts bleveengine.RescueOptions) (*bleveengine.Result, error)
}

// Limits bound what one request may cost. A zero field takes the default
// named on it.
type Limits struct {
	// MaxBodyBytes is the largest request body (16 KiB).
	MaxBodyBytes int64
	// MaxQueryBytes is the longest query (parser.MaxQueryBytes, 1,024).
	MaxQueryBytes int
	// MaxHits is the most hits a rescue may ask for (100).
	MaxHits int
	// Deadline is how long one request may take; the planner stops at
	// it and returns the best plan found so far (2 s).
	Deadline time.Duration
	// MaxInFlight is how many parse, rescue and policy requests may run
	// at once; past it they are answered 503 (64).
	MaxInFlight int
	// RetryAfter is what a 503 asks the client to wait (1 s; whole
	// seconds).
	RetryAfter time.Duration
	// ReadTimeout and WriteTimeout bound reading a request and writing
	// its answer (5 s; the deadline and 5 s).
	ReadTimeout, WriteTimeout time.Duration
	// ShutdownGrace is how long shutting down waits for requests in
	// flight before closing their connections (30 s).
	ShutdownGrace time.Duration
}

// withDefaults fills the zero fields of l.
func (l Limits) withDefaults() Limits {
	set := func(v *time.Duration, d time.Duration) {
		if *v <= 0 {
			*v = d
		}
	}
	if l.MaxBodyBytes <= 0 {
		l.MaxBodyBytes = 16 << 10
	}
	if l.MaxQueryBytes <= 0 {
		l.MaxQueryBytes = parser.MaxQueryBytes
	}
	if l.MaxHits <= 0 {
		l.MaxHits = 100
	}
	if l.MaxInFlight <= 0 {
		l.MaxInFlight = 64
	}
	set(&l.Deadline, 2*time.Second)
	set(&l.RetryAfter, time.Second)
	set(&l.ReadTimeout, 5*time.Second)
	set(&l.WriteTimeout, l.Deadline+5*time.Second)
	set(&l.ShutdownGrace, 30*time.Second)
	return l
}

// Config is what a Server is made from.
type Config struct {
	// Engine is the index the server searches; it stays the caller's
	// to close.
	Engine Engine
	// Policy is the strictness policy (nil: the built-in one).
	Policy *rewrite.Policy
	// Parse holds how queries are read (lexicon, currency, volume); its
	// Category and MaxBytes are set per request.
	Parse parser.Options
	// Budget is the most engine counts one rescue may spend
	// (rewrite.DefaultBudget).
	Budget int
	Limits Limits
	// Logger gets one line a request (nil: nothing is logged).
	Logger *slog.Logger
	// LogQueries puts the query text in the log lines; off by default,
	// since queries can carry personal data.
	LogQueries bool
}

// Server is the service. It is safe for concurrent use; all its state
// belongs to it (its metrics registry too), so several may run in one
// process.
type Server struct {
	rw       *rewrite.Rewriter
	engine   Engine
	policy   *rewrite.Policy
	lex      *lexicon.Lexicon
	parse    parser.Options
	limits   Limits
	log      *slog.Logger
	logQuery bool
	slots    chan struct{}
	draining atomic.Bool
	metrics  *metrics
	handler  http.Handler
}

// New returns a server for cfg.
func New(cfg Config) (*Server, error) {
	if cfg.Engine == nil {
		return nil, errors.New("serve: no engine")
	}
	s := &Server{engine: cfg.Engine, policy: cfg.Policy, parse: cfg.Parse, limits: cfg.Limits.withDefaults(), log: cfg.Logger, logQuery: cfg.LogQueries}
	if s.policy == nil {
		s.policy = rewrite.DefaultPolicy()
	}
	s.lex = s.parse.Lexicon
	if s.lex == nil {
		s.lex = lexicon.Default()
	}
	if s.log == nil {
		s.log = slog.New(slog.NewTextHandler(io.Discard, nil))
	}
	s.parse.Category = ""
	s.parse.MaxBytes = s.limits.MaxQueryBytes
	budget := cfg.Budget
	if budget <= 0 {
		budget = rewrite.DefaultBudget
	}
	s.rw = rewrite.New(cfg.Engine, s.policy, rewrite.WithBudget(budget), rewrite.WithParseOptions(s.parse))
	s.slots = make(chan struct{}, s.limits.MaxInFlight)
	s.metrics = newMetrics()
	s.handler = s.routes()
	return s, nil
}

// Handler is the server's HTTP handler, every endpoint and middleware
// included, for tests or for mounting in another server.
func (s *Server) Handler() http.Handler { return s.handler }

// Serve answers requests on l until ctx ends, then shuts down
// gracefully: readiness turns to 503, no new connection is taken, and
// requests in flight finish (for at most Limits.ShutdownGrace). It
// returns nil after a clean shutdown.
func (s *Server) Serve(ctx context.Context, l net.Listener) error {
	srv := &http.Server{
		Handler:           s.handler,
		ReadTimeout:       s.limits.ReadTimeout,
		ReadHeaderTimeout: s.limits.ReadTimeout,
		WriteTimeout:      s.limits.WriteTimeout,
		IdleTimeout:       2 * s.limits.ReadTimeout,
		ErrorLog:          slog.NewLogLogger(s.log.Handler(), slog.LevelWarn),
		BaseContext:       func(net.Listener) context.Context { return context.WithoutCancel(ctx) },
	}
	done := make(chan error, 1)
	go func() { done <- srv.Serve(l) }()
	select {
	case err := <-done:
		return err
	case <-ctx.Done():
	}
	s.draining.Store(true)
	s.log.Info("shutting down", "in_flight", len(s.slots))
	sctx, cancel := context.WithTimeout(context.Background(), s.limits.ShutdownGrace)
	defer cancel()
	err := srv.Shutdown(sctx)
	if errors.Is(err, context.DeadlineExceeded) {
		srv.Close()
	}
	if serr := <-done; !errors.Is(serr, http.ErrServerClosed) && err == nil {
		err = serr
	}
	return err
}

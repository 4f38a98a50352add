package main

import (
	"context"
	"flag"
	"fmt"
	"io"
	"log/slog"
	"net"
	"os"
	"os/signal"
	"syscall"
	"time"

	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/bleveengine"
	"github.com/whittle-search/whittle/rewrite/serve"
)

func serveCmd(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("serve", flag.ContinueOnError)
	fs.SetOutput(stderr)
	dir := fs.String("index", defaultIndex(), "index directory (built with whittle index)")
	addr := fs.String("addr", serve.DefaultAddr, "address to listen on; loopback unless another is given")
	policyFile := fs.String("policy", "", "policy file laid over the built-in policy")
	budget := fs.Int("budget", rewrite.DefaultBudget, "most engine counts one rescue may spend")
	var l serve.Limits
	fs.Int64Var(&l.MaxBodyBytes, "max-body", 16<<10, "largest request body, in bytes")
	fs.IntVar(&l.MaxQueryBytes, "max-query", 1024, "longest query, in bytes")
	fs.IntVar(&l.MaxHits, "max-hits", 100, "most hits a rescue may ask for")
	fs.DurationVar(&l.Deadline, "deadline", 2*time.Second, "how long one request may take; the planner stops at it")
	fs.IntVar(&l.MaxInFlight, "max-in-flight", 64, "requests handled at once; past it, 503 with Retry-After")
	fs.DurationVar(&l.RetryAfter, "retry-after", time.Second, "the wait a 503 asks for")
	fs.DurationVar(&l.ReadTimeout, "read-timeout", 5*time.Second, "longest time to read a request")
	fs.DurationVar(&l.WriteTimeout, "write-timeout", 0, "longest time to write an answer (0: the deadline and 5s)")
	fs.DurationVar(&l.ShutdownGrace, "shutdown-grace", 30*time.Second, "how long shutting down waits for requests in flight")
	logQueries := fs.Bool("log-queries", false, "put query text in the request log (queries can carry personal data)")
	fs.Usage = func() {
		fmt.Fprint(stderr, "usage: whittle serve [--index DIR] [--addr ADDR] [--policy FILE] [--budget N] [--max-body N] [--max-query N]\n"+
			"                     [--max-hits N] [--deadline D] [--max-in-flight N] [--retry-after D] [--read-timeout D]\n"+
			"                     [--write-timeout D] [--shutdown-grace D] [--log-queries]\n\n"+
			"Answers parse, rescue, policy, health, ready and metrics as JSON under "+serve.Prefix+",\n"+
			"and serves the workbench page at "+serve.Prefix+"workbench,\n"+
			"until interrupted (SIGINT or SIGTERM), then lets requests in flight finish.\n"+
			"One log line a request goes to standard error.\n\nflags:\n")
		fs.PrintDefaults()
	}
	if _, code, ok := parseFlags(fs, args, 0); !ok {
		return code
	}
	if !checkNeeds(fs, append([]need{atLeast("budget", *budget, 1)}, limitNeeds(l)...)...) {
		return 2
	}
	lex, _ := loadLexicon("serve", "", stderr)
	pol, ok := readPolicy("serve", *policyFile, lex, stderr)
	if !ok {
		return 2
	}
	eng, err := bleveengine.Open(*dir)
	if err != nil {
		fmt.Fprintf(stderr, "whittle serve: %v\n", err)
		return 1
	}
	defer eng.Close()
	log := slog.New(slog.NewJSONHandler(stderr, nil))
	for _, w := range pol.Warnings {
		log.Warn("policy warning", "policy", *policyFile, "warning", w)
	}
	srv, err := serve.New(serve.Config{Engine: eng, Policy: pol, Budget: *budget, Limits: l, Logger: log, LogQueries: *logQueries})
	if err != nil {
		fmt.Fprintf(stderr, "whittle serve: %v\n", err)
		return 1
	}
	ln, err := net.Listen("tcp", *addr)
	if err != nil {
		fmt.Fprintf(stderr, "whittle serve: %v\n", err)
		return 1
	}
	ctx, stop := signal.NotifyContext(context.Background(), os.Interrupt, syscall.SIGTERM)
	defer stop()
	fmt.Fprintf(stdout, "whittle serve: listening on http://%s%s\n", ln.Addr(), serve.Prefix)
	if err := srv.Serve(ctx, ln); err != nil {
		fmt.Fprintf(stderr, "whittle serve: %v\n", err)
		return 1
	}
	return 0
}

// limitNeeds are what the limit flags must be. A write timeout of 0 has
// a meaning of its own; every other limit must be more than 0.
func limitNeeds(l serve.Limits) []need {
	more := func(name string, ok bool) need { return need{name, ok, "more than 0"} }
	return []need{
		more("max-body", l.MaxBodyBytes > 0), more("max-query", l.MaxQueryBytes > 0), more("max-hits", l.MaxHits > 0),
		more("deadline", l.Deadline > 0), more("max-in-flight", l.MaxInFlight > 0), more("retry-after", l.RetryAfter > 0),
		more("read-timeout", l.ReadTimeout > 0), need{"write-timeout", l.WriteTimeout >= 0, "0 or more"}, more("shutdown-grace", l.ShutdownGrace > 0),
	}
}

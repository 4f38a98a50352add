// Package serve is whittle as a small JSON service beside a shop's search
// engine, for front ends that are not written in Go.
//
// A [Server] answers versioned endpoints under [Prefix]:
//
//	POST /whittle/v1/parse    a query in; the reading `whittle explain --json` writes out
//	POST /whittle/v1/rescue   a query in; the report `whittle search --json` writes out
//	GET  /whittle/v1/policy   the effective policy for a category and product type
//	GET  /whittle/v1/health   the process is up
//	GET  /whittle/v1/ready    the server takes requests (not while shutting down)
//	GET  /whittle/v1/metrics  counters and a latency histogram, Prometheus text format
//
// Every error is a JSON object with a stable code of whittle's own (the
// Code constants), a message, and the byte span of the problem in the
// query where there is one. A panic in a handler is recovered, logged and
// answered with [CodeServerFault]; no stack trace leaves the server.
//
// Limits hold for every request: the size of the body and of the query, a
// deadline that the planner's search honours, a cap on requests in flight
// (past it, 503 with Retry-After), and the server's read and write
// timeouts. [Server.Serve] shuts down gracefully when its context ends,
// letting requests in flight finish.
//
// Each request is logged as one structured line with log/slog. Query
// text is left out unless [Config.LogQueries] is set, since shoppers'
// queries can carry personal data.
package serve

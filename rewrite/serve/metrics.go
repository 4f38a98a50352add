package serve

import (
	"net/http"
	"strconv"
	"sync/atomic"
	"time"

	"github.com/prometheus/client_golang/prometheus"
	"github.com/prometheus/client_golang/prometheus/promhttp"

	"github.com/whittle-search/whittle/rewrite"
)

// metrics are the server's counters, in a registry of its own.
type metrics struct {
	reg         *prometheus.Registry
	requests    *prometheus.CounterVec
	errors      *prometheus.CounterVec
	latency     *prometheus.HistogramVec
	relaxations *prometheus.CounterVec
	rescues     prometheus.Counter
	zeroAsTyped prometheus.Counter
	zeroRescued prometheus.Counter
	promHandler http.Handler
	// asked and empty count rescues and those left with nothing, for the
	// zero-result ratio.
	asked, empty atomic.Int64
}

// newMetrics registers the service's metrics.
func newMetrics() *metrics {
	m := &metrics{reg: prometheus.NewRegistry()}
	m.requests = prometheus.NewCounterVec(prometheus.CounterOpts{Name: "whittle_requests_total",
		Help: "Requests answered, by endpoint and HTTP status."}, []string{"endpoint", "status"})
	m.errors = prometheus.NewCounterVec(prometheus.CounterOpts{Name: "whittle_errors_total",
		Help: "Error answers, by endpoint and whittle error code."}, []string{"endpoint", "code"})
	m.latency = prometheus.NewHistogramVec(prometheus.HistogramOpts{Name: "whittle_request_duration_seconds",
		Help:    "Time to answer a request, by endpoint.",
		Buckets: []float64{.0005, .001, .0025, .005, .01, .025, .05, .1, .25, .5, 1, 2.5}}, []string{"endpoint"})
	m.relaxations = prometheus.NewCounterVec(prometheus.CounterOpts{Name: "whittle_rescue_relaxations_total",
		Help: "Relaxations in the plans rescues settled on, by operator (widen, replace, drop)."}, []string{"operator"})
	m.rescues = prometheus.NewCounter(prometheus.CounterOpts{Name: "whittle_rescue_queries_total", Help: "Queries rescued or passed through."})
	m.zeroAsTyped = prometheus.NewCounter(prometheus.CounterOpts{Name: "whittle_rescue_zero_as_typed_total",
		Help: "Queries that found nothing as typed."})
	m.zeroRescued = prometheus.NewCounter(prometheus.CounterOpts{Name: "whittle_rescue_zero_results_total",
		Help: "Queries that found nothing even after rescue."})
	ratio := prometheus.NewGaugeFunc(prometheus.GaugeOpts{Name: "whittle_rescue_zero_result_ratio",
		Help: "Share of the queries since the server started that found nothing even after rescue (0 before any)."}, m.zeroRatio)
	m.reg.MustRegister(m.requests, m.errors, m.latency, m.relaxations, m.rescues, m.zeroAsTyped, m.zeroRescued, ratio)
	m.promHandler = promhttp.HandlerFor(m.reg, promhttp.HandlerOpts{})
	return m
}

// request counts an answered request.
func (m *metrics) request(endpoint string, status int, code Code, took time.Duration) {
	m.requests.WithLabelValues(endpoint, strconv.Itoa(status)).Inc()
	if code != "" {
		m.errors.WithLabelValues(endpoint, string(code)).Inc()
	}
	m.latency.WithLabelValues(endpoint).Observe(took.Seconds())
}

// rescued counts a rescue's outcome.
func (m *metrics) rescued(o *rewrite.Outcome) {
	m.rescues.Inc()
	m.asked.Add(1)
	if len(o.Steps) > 0 && o.Steps[0].Count == 0 {
		m.zeroAsTyped.Inc()
	}
	if o.Count == 0 {
		m.zeroRescued.Inc()
		m.empty.Add(1)
	}
	for _, r := range o.Relaxations {
		m.relaxations.WithLabelValues(r.Operator).Inc()
	}
}

// zeroRatio is the share of rescues left with nothing.
func (m *metrics) zeroRatio() float64 {
	n := m.asked.Load()
	if n == 0 {
		return 0
	}
	return float64(m.empty.Load()) / float64(n)
}

// serve writes the metrics in the Prometheus text format.
func (m *metrics) serve(w http.ResponseWriter, r *http.Request) { m.promHandler.ServeHTTP(w, r) }

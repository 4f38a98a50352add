package replay

import (
	"context"
	"errors"
	"iter"
	"runtime"
	"time"

	"github.com/whittle-search/whittle/rewrite"
	"github.com/whittle-search/whittle/rewrite/catalog"
)

// Change is one relaxation a rescue used, in brief.
type Change struct {
	Op   string `json:"op"`
	Kind string `json:"kind"`
	Text string `json:"text"`
}

// Result is what whittle does with one log entry.
type Result struct {
	Entry
	// ExactCount is how many products the query finds as typed.
	ExactCount int `json:"exact_count"`
	// Rescued is set when the query found too few as typed and the
	// rescue found some.
	Rescued bool `json:"rescued"`
	// FinalCount is how many the chosen plan finds.
	FinalCount int      `json:"final_count"`
	Changes    []Change `json:"relaxations"`
	// HardUnmet names, when the hard constraints alone find nothing,
	// each one that nothing matches, with its kind ("size 15 (size)").
	HardUnmet []string `json:"hard_unmet,omitempty"`
	// Note says why a rescue stopped early (budget or deadline).
	Note string `json:"note,omitempty"`
	// NothingToSearch, when set, says why the query was not searched:
	// it has nothing to search for ("no word or number to search for";
	// see rewrite.RefusedError). Its counts are then zero, and no rate
	// of the summary counts it.
	NothingToSearch string        `json:"nothing_to_search,omitempty"`
	Elapsed         time.Duration `json:"elapsed_ns"`
}

// Options tune Run. The zero value is ready to use.
type Options struct {
	// Workers is how many queries run at once (default: one a CPU).
	// Results come in the log's order whatever the number.
	Workers int
	// SkipBad skips malformed lines, counting them in the summary,
	// instead of stopping at the first.
	SkipBad bool
	// Progress, when set, is called after each result with the number
	// of entries done so far.
	Progress func(done int)
}

// Run rescues each entry of a log with rw, hands each result to emit in
// the log's order, and returns the summary. It stops at the first
// malformed line (unless SkipBad), error of emit, or error of the
// engine, and when ctx is done.
func Run(ctx context.Context, rw *rewrite.Rewriter, entries iter.Seq2[Entry, error], opts Options, emit func(*Result) error) (*Summary, error) {
	workers := opts.Workers
	if workers <= 0 {
		workers = runtime.GOMAXPROCS(0)
	}
	ctx, cancel := context.WithCancel(ctx)
	defer cancel()

	type job struct {
		seq   int
		entry Entry
		err   error
	}
	type done struct {
		seq int
		res *Result
		err error
	}
	// window bounds the entries read but not yet emitted, so that memory
	// does not grow with the log even when one query is slow.
	window := make(chan struct{}, 4*workers)
	jobs := make(chan job)
	results := make(chan done, workers)
	readErr := make(chan error, 1)
	go func() {
		var rerr error
		defer func() { readErr <- rerr }()
		defer close(jobs)
		seq := 0
		for e, err := range entries {
			var le *catalog.LineError
			if err != nil && !errors.As(err, &le) {
				rerr = err
				return
			}
			select {
			case window <- struct{}{}:
			case <-ctx.Done():
				return
			}
			select {
			case jobs <- job{seq, e, err}:
			case <-ctx.Done():
				return
			}
			seq++
		}
	}()
	finished := make(chan struct{})
	for range workers {
		go func() {
			defer func() { finished <- struct{}{} }()
			for j := range jobs {
				d := done{seq: j.seq, err: j.err}
				if j.err == nil {
					d.res, d.err = rescue(ctx, rw, j.entry)
				}
				select {
				case results <- d:
				case <-ctx.Done():
				}
			}
		}()
	}
	go func() {
		for range workers {
			<-finished
		}
		close(results)
	}()

	sum := NewSummary()
	pending := map[int]done{}
	next := 0
	var firstErr error
	for d := range results {
		if firstErr != nil {
			continue // drain, so that the workers can finish
		}
		pending[d.seq] = d
		for {
			d, ok := pending[next]
			if !ok {
				break
			}
			delete(pending, next)
			next++
			<-window
			var le *catalog.LineError
			switch {
			case d.err != nil && errors.As(d.err, &le) && opts.SkipBad:
				sum.Skip(le)
			case d.err != nil:
				firstErr = d.err
			default:
				sum.Add(d.res)
				if err := emit(d.res); err != nil {
					firstErr = err
				}
			}
			if firstErr != nil {
				cancel()
				break
			}
			if opts.Progress != nil {
				opts.Progress(next)
			}
		}
	}
	if firstErr != nil {
		return sum, firstErr
	}
	if err := <-readErr; err != nil {
		return sum, err
	}
	if err := ctx.Err(); err != nil {
		return sum, err
	}
	return sum, nil
}

// rescue runs one entry: the log's category stands for the query's own
// when the query names no product type that gives one.
func rescue(ctx context.Context, rw *rewrite.Rewriter, e Entry) (*Result, error) {
	start := time.Now()
	r := rw.ParseIn(e.Query, e.Category)
	o, err := rw.RescueParsed(ctx, r)
	var refused *rewrite.RefusedError
	if errors.As(err, &refused) {
		return &Result{Entry: e, NothingToSearch: refused.Problem.Msg, Changes: []Change{}, Elapsed: time.Since(start)}, nil
	}
	if err != nil {
		return nil, err
	}
	res := &Result{Entry: e, FinalCount: o.Count, Note: o.Note, Changes: []Change{}, Elapsed: time.Since(start)}
	if o.Exact {
		res.ExactCount = o.Count
	} else if len(o.Steps) > 0 {
		res.ExactCount = o.Steps[0].Count
	}
	res.Rescued = !o.Exact && o.Count > 0
	for _, rl := range o.Relaxations {
		res.Changes = append(res.Changes, Change{Op: rl.Operator, Kind: string(rl.Kind), Text: rl.Text})
	}
	for _, m := range o.Missing {
		u := m.Text
		if m.Constraint >= 0 && m.Constraint < len(r.Constraints) {
			u += " (" + string(r.Constraints[m.Constraint].Kind) + ")"
		}
		res.HardUnmet = append(res.HardUnmet, u)
	}
	return res, nil
}

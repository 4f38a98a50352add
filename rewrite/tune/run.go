package tune

import (
	"context"
	"iter"

	"github.com/whittle-search/whittle/rewrite/signals"
)

// Read joins a signals log (see signals.Join) and adds every session to
// t. The join window is the policy's join_window unless opts sets one.
// The join's figures go into the report; a malformed line stops the
// read unless opts.SkipBad is set.
func (t *Tuner) Read(ctx context.Context, events iter.Seq2[signals.Event, error], opts signals.JoinOptions) error {
	if opts.Window == 0 {
		opts.Window = t.sig.JoinWindow
	}
	st, err := signals.Join(ctx, events, opts, func(s *signals.Session) error { return t.Add(ctx, s) })
	t.join = st
	return err
}

package signals

import (
	"container/heap"
	"errors"
	"iter"
)

// Merge yields the events of several logs, each read with Read, in
// time order as far as each log is: it takes the next event from the
// log whose next event is the earliest, the first log given first when
// two are as early. A log whose own events are out of order by a little
// comes out out of order by as much; Join copes with that. Errors are
// yielded as they are met; one that is not a *LineError ends the log it
// came from, and the others go on.
func Merge(logs ...iter.Seq2[Event, error]) iter.Seq2[Event, error] {
	return func(yield func(Event, error) bool) {
		h := heads{}
		defer func() {
			for _, s := range h.all {
				s.stop()
			}
		}()
		for i, log := range logs {
			next, stop := iter.Pull2(log)
			s := &source{i: i, next: next, stop: stop}
			h.all = append(h.all, s)
			ok, more := s.advance(yield)
			if !more {
				return
			}
			if ok {
				h.open = append(h.open, s)
			}
		}
		heap.Init(&h)
		for h.Len() > 0 {
			s := h.open[0]
			if !yield(s.head, nil) {
				return
			}
			ok, more := s.advance(yield)
			if !more {
				return
			}
			if ok {
				heap.Fix(&h, 0)
			} else {
				heap.Pop(&h)
			}
		}
	}
}

// source is one log being merged, with its next event.
type source struct {
	i    int
	next func() (Event, error, bool)
	stop func()
	head Event
}

// advance reads the source's next event into head, yielding the errors
// it meets on the way. It reports whether there was an event, and
// whether the consumer wants more.
func (s *source) advance(yield func(Event, error) bool) (ok, more bool) {
	for {
		e, err, ok := s.next()
		if !ok {
			return false, true
		}
		if err == nil {
			s.head = e
			return true, true
		}
		if !yield(Event{}, err) {
			return false, false
		}
		var le *LineError
		if !errors.As(err, &le) {
			return false, true
		}
	}
}

// heads orders the sources by their next event: its time, then the
// source's place among the logs.
type heads struct {
	open []*source
	all  []*source
}

func (h *heads) Len() int { return len(h.open) }

func (h *heads) Less(i, j int) bool {
	a, b := h.open[i], h.open[j]
	if !a.head.Time.Equal(b.head.Time) {
		return a.head.Time.Before(b.head.Time)
	}
	return a.i < b.i
}

func (h *heads) Swap(i, j int) { h.open[i], h.open[j] = h.open[j], h.open[i] }

func (h *heads) Push(x any) { h.open = append(h.open, x.(*source)) }

func (h *heads) Pop() any {
	s := h.open[len(h.open)-1]
	h.open = h.open[:len(h.open)-1]
	return s
}

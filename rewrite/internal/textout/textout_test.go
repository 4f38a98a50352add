package textout

import (
	"errors"
	"strings"
	"testing"
)

type failing struct{ after int }

func (f *failing) Write(b []byte) (int, error) {
	if f.after == 0 {
		return 0, errors.New("disk full")
	}
	f.after--
	return len(b), nil
}

// The first error is kept and nothing more is written after it.
func TestPrinter(t *testing.T) {
	var b strings.Builder
	p := &Printer{W: &b}
	p.F("%d %s\n", 1, "a")
	if b.String() != "1 a\n" || p.Err != nil {
		t.Errorf("wrote %q, err %v", b.String(), p.Err)
	}
	f := &failing{after: 1}
	p = &Printer{W: f}
	p.F("one")
	p.F("two")
	p.F("three")
	if p.Err == nil || p.Err.Error() != "disk full" || f.after != 0 {
		t.Errorf("err %v", p.Err)
	}
}

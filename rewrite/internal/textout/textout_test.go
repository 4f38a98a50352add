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

// English takes the singular for one only: "1 search", "0 searches",
// "2 searches" (common practice).
func TestCount(t *testing.T) {
	for _, tc := range []struct {
		n    int
		want string
	}{{0, "0 searches"}, {1, "1 search"}, {2, "2 searches"}, {21, "21 searches"}} {
		if got := Count(tc.n, "search", "searches"); got != tc.want {
			t.Errorf("Count(%d) = %q, want %q", tc.n, got, tc.want)
		}
	}
}

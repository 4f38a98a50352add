package textout

import (
	"fmt"
	"io"
)

// Printer writes to W until a write fails; Err is the first failure.
type Printer struct {
	W   io.Writer
	Err error
}

// F writes a formatted string, unless an earlier write failed.
func (p *Printer) F(format string, args ...any) {
	if p.Err == nil {
		_, p.Err = fmt.Fprintf(p.W, format, args...)
	}
}

// Count writes n and the noun for it: one for 1, many otherwise
// ("1 search", "0 searches", "3 searches").
func Count(n int, one, many string) string {
	if n == 1 {
		return "1 " + one
	}
	return fmt.Sprintf("%d %s", n, many)
}

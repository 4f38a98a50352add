//go:build !unix

package signals

import "time"

// cpuTime is the processor time the process has used, or 0 where it
// cannot be told, as here.
func cpuTime() time.Duration { return 0 }

//go:build unix

package demo

import (
	"runtime"
	"syscall"
)

// rusagePeakMB is the process's peak resident memory by getrusage(2), in
// MB: ru_maxrss counts kilobytes on Linux and the BSDs, bytes on macOS
// and iOS.
func rusagePeakMB() (float64, bool) {
	var ru syscall.Rusage
	if err := syscall.Getrusage(syscall.RUSAGE_SELF, &ru); err != nil || ru.Maxrss <= 0 {
		return 0, false
	}
	if runtime.GOOS == "darwin" || runtime.GOOS == "ios" {
		return float64(ru.Maxrss) / (1 << 20), true
	}
	return float64(ru.Maxrss) / 1024, true
}

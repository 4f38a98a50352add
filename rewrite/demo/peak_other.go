//go:build !unix

package demo

// rusagePeakMB has no getrusage(2) to ask here; peakMB falls back on the
// Go runtime's own figure.
func rusagePeakMB() (float64, bool) { return 0, false }

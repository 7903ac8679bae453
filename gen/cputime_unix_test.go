//go:build unix

package gen

import (
	"syscall"
	"testing"
	"time"
)

// processCPU returns the CPU time this process has used, user and system.
func processCPU() time.Duration {
	var ru syscall.Rusage
	if err := syscall.Getrusage(syscall.RUSAGE_SELF, &ru); err != nil {
		return 0
	}
	return time.Duration(ru.Utime.Nano() + ru.Stime.Nano())
}

// reportCPU adds a cpu-ns/op figure to a benchmark: the CPU time the process
// used per op, summed over threads. On a machine shared with other work it
// moves far less than ns/op, which counts time spent waiting for a core.
func reportCPU(b *testing.B) func() {
	start := processCPU()
	return func() {
		b.ReportMetric(float64((processCPU()-start).Nanoseconds())/float64(b.N), "cpu-ns/op")
	}
}

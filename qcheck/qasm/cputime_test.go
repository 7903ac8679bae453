//go:build unix

package qasm

import (
	"syscall"
	"testing"
)

// reportCPU runs the benchmark loop body and reports the process's CPU time per op beside the
// wall time: the machines these run on are shared, and CPU time moves much less with the load.
func reportCPU(b *testing.B, body func()) {
	var before, after syscall.Rusage
	syscall.Getrusage(syscall.RUSAGE_SELF, &before)
	n := 0
	for b.Loop() {
		body()
		n++
	}
	syscall.Getrusage(syscall.RUSAGE_SELF, &after)
	cpu := float64(after.Utime.Nano()+after.Stime.Nano()-before.Utime.Nano()-before.Stime.Nano()) / float64(n)
	b.ReportMetric(cpu, "cpu-ns/op")
}

//go:build unix

package zx

import "syscall"

// processCPU returns the user plus system CPU time the process has used, in seconds: benchmarks
// report it beside wall time because the machine is shared.
func processCPU() float64 {
	var ru syscall.Rusage
	if err := syscall.Getrusage(syscall.RUSAGE_SELF, &ru); err != nil {
		return 0
	}
	return float64(ru.Utime.Nano()+ru.Stime.Nano()) / 1e9
}

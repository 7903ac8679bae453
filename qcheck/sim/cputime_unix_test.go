//go:build unix

package sim

import "syscall"

// processCPU returns the user plus system CPU time the process has used, in seconds. Benchmarks
// report it beside wall time because the machines they run on are often shared: CPU time per op
// moves much less with the load than wall time does.
func processCPU() float64 {
	var ru syscall.Rusage
	if err := syscall.Getrusage(syscall.RUSAGE_SELF, &ru); err != nil {
		return 0
	}
	return float64(ru.Utime.Nano()+ru.Stime.Nano()) / 1e9
}

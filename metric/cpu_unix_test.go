//go:build unix

package metric

import "syscall"

// processCPU returns the user and system CPU seconds used so far by this
// process, all threads together; benchmarks report it because the machine
// they run on may be shared.
func processCPU() float64 {
	var r syscall.Rusage
	if err := syscall.Getrusage(syscall.RUSAGE_SELF, &r); err != nil {
		return 0
	}
	return float64(r.Utime.Sec+r.Stime.Sec) + float64(r.Utime.Usec+r.Stime.Usec)/1e6
}

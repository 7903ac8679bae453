//go:build !unix

package zx

// processCPU is not measured on this system; benchmarks then report 0 CPU seconds.
func processCPU() float64 { return 0 }

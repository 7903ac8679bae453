//go:build !unix

package metric

// processCPU is not measured off Unix; benchmarks then report 0 CPU seconds.
func processCPU() float64 { return 0 }

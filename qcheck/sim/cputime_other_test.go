//go:build !unix

package sim

// processCPU is not measured on this platform; the benchmarks then report zero CPU time.
func processCPU() float64 { return 0 }

package qcheck

import (
	"flag"
	"strconv"
	"syscall"
	"testing"
	"time"

	"pgregory.net/rapid"
	"qcheck.dev/gen"
	"qcheck.dev/qcheck/circuit"
)

// BenchmarkPreserves measures the campaign of the speed target: Preserves over 3-qubit,
// 30-op circuits, reported as checks per second (each rapid.Check runs -rapid.checks circuits).
// checks/cpu-s divides by the CPU time the process used (all its threads, the garbage collector
// included), which stays meaningful on a shared machine where wall time does not; run with
// -cpu 1 for the one-core figure.
//
//	go test ./qcheck -run '^$' -bench Preserves -benchtime 20x -cpu 1
//
// Two passes: cancelPairs, a peephole pass that changes a few ops of each circuit, so that only
// the differing window is simulated (see differingWindows); and padPairs, which changes both
// ends of every circuit and so costs two full 30-op unitaries per check, the worst case.
func BenchmarkPreserves(b *testing.B) {
	b.Run("peephole", func(b *testing.B) { benchmarkPreserves(b, cancelPairs) })
	b.Run("whole", func(b *testing.B) { benchmarkPreserves(b, padPairs) })
}

// padPairs puts H·H (the identity) on qubit 0 at both ends of the circuit.
func padPairs(c *circuit.Circuit) (*circuit.Circuit, error) {
	out := circuit.New(c.Qubits()).H(0).H(0)
	return out.Compose(c).H(0).H(0), nil
}

func benchmarkPreserves(b *testing.B, pass Pass) {
	checks, _ := strconv.Atoi(flag.Lookup("rapid.checks").Value.String())
	prop := Property(pass, thirtyOps)
	h := &recordTB{name: "BenchmarkPreserves"}
	b.ReportAllocs()
	b.ResetTimer()
	start, cpu := time.Now(), cpuTime()
	for i := 0; i < b.N; i++ {
		rapid.Check(h, prop)
	}
	b.ReportMetric(float64(checks*b.N)/time.Since(start).Seconds(), "checks/s")
	b.ReportMetric(float64(checks*b.N)/(cpuTime()-cpu).Seconds(), "checks/cpu-s")
	if h.failed {
		b.Fatal(h.errors)
	}
}

// BenchmarkCompare3Qubits30Ops is the comparison alone on the same circuits, on the whole of
// both: two 8×8 unitaries of 30 and 34 ops and the phase-free distance.
func BenchmarkCompare3Qubits30Ops(b *testing.B) {
	want := thirtyOps.Example(1)
	got, _ := padPairs(want)
	cfg, _ := newConfig(nil)
	b.ReportAllocs()
	b.ResetTimer()
	cpu := cpuTime()
	for i := 0; i < b.N; i++ {
		if r, err := compare(cfg, want, got, false); err != nil || !r.Equivalent {
			b.Fatal(err, r.Distance)
		}
	}
	b.ReportMetric(float64((cpuTime()-cpu).Nanoseconds())/float64(b.N), "cpu-ns/op")
}

// BenchmarkGenerate3Qubits30Ops is rapid drawing the circuits alone, for comparison.
func BenchmarkGenerate3Qubits30Ops(b *testing.B) {
	g := thirtyOps
	checks, _ := strconv.Atoi(flag.Lookup("rapid.checks").Value.String())
	h := &recordTB{name: "BenchmarkGenerate"}
	b.ResetTimer()
	start, cpu := time.Now(), cpuTime()
	for i := 0; i < b.N; i++ {
		rapid.Check(h, func(t *rapid.T) { g.Draw(t, "circuit") })
	}
	b.ReportMetric(float64(checks*b.N)/time.Since(start).Seconds(), "draws/s")
	b.ReportMetric(float64(checks*b.N)/(cpuTime()-cpu).Seconds(), "draws/cpu-s")
}

// thirtyOps draws the benchmark's circuits: 3 qubits, exactly 30 ops, gen's default gate set
// and motifs.
var thirtyOps = gen.Circuit(gen.Options{Qubits: 3, MinOps: 30, MaxOps: 30})

// cpuTime is the user and system CPU time the process has used.
func cpuTime() time.Duration {
	var u syscall.Rusage
	if err := syscall.Getrusage(syscall.RUSAGE_SELF, &u); err != nil {
		return 0
	}
	return time.Duration(u.Utime.Nano() + u.Stime.Nano())
}

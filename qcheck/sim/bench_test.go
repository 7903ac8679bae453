package sim

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// The benchmark circuits are random one- and two-qubit gates of the library, fixed in
// testdata/sim/bench.json so that testdata/sim/bench_numpy.py times NumPy on the same circuits.
func benchCircuits(b testing.TB) map[string]*circuit.Circuit {
	var file struct {
		Circuits []jsonCircuit `json:"circuits"`
	}
	readJSON(b, "bench.json", &file)
	out := map[string]*circuit.Circuit{}
	for _, jc := range file.Circuits {
		out[jc.Name] = jc.build(b)
	}
	return out
}

// reportCPU adds the process CPU time per op since start (all goroutines together) as "cpu-s/op".
func reportCPU(b *testing.B, start float64) {
	b.ReportMetric((processCPU()-start)/float64(b.N), "cpu-s/op")
}

// BenchmarkUnitary builds the dense unitary of 10 qubits × 1000 gates, 12 qubits × 200 gates,
// and the sweep of 200 gates from 6 to 12 qubits.
func BenchmarkUnitary(b *testing.B) {
	circuits := benchCircuits(b)
	names := []string{"10q-1000g", "12q-200g"}
	for n := 6; n <= 12; n++ {
		names = append(names, fmt.Sprintf("sweep-%dq-200g", n))
	}
	for _, name := range names {
		c := circuits[name]
		b.Run(name, func(b *testing.B) {
			cpu := processCPU()
			for b.Loop() {
				if _, err := Unitary(c); err != nil {
					b.Fatal(err)
				}
			}
			reportCPU(b, cpu)
		})
	}
}

// BenchmarkApply runs the 300-gate circuit on a 24-qubit statevector (256 MiB).
func BenchmarkApply(b *testing.B) {
	c := benchCircuits(b)["24q-300g"]
	p, err := Compile(c)
	if err != nil {
		b.Fatal(err)
	}
	state := make([]complex128, 1<<c.Qubits())
	state[0] = 1
	cpu := processCPU()
	for b.Loop() {
		if err := p.Apply(state); err != nil {
			b.Fatal(err)
		}
	}
	reportCPU(b, cpu)
	b.ReportMetric(float64(len(p.kernels)), "fused-gates")
}

// BenchmarkSweep applies single gates to a 24-qubit statevector and, in the same run, a plain
// copy of the same buffer: one read and one write of every amplitude, the memory-bandwidth bound
// that a gate sweep (which also reads and writes every amplitude once) cannot beat. SetBytes
// counts the bytes read plus written, so the MB/s figures compare directly.
func BenchmarkSweep(b *testing.B) {
	const n = 24
	state := make([]complex128, 1<<n)
	for i := range state {
		state[i] = complex(1/math.Sqrt(float64(len(state))), 0)
	}
	bytes := int64(len(state)) * 32
	other := make([]complex128, len(state))
	copy(other, state) // fault the pages in before timing
	b.Run("copy", func(b *testing.B) {
		b.SetBytes(bytes)
		cpu := processCPU()
		for b.Loop() {
			copy(other, state)
		}
		reportCPU(b, cpu)
	})
	gates := []struct {
		name string
		c    *circuit.Circuit
	}{
		{"h-q0", circuit.New(n).H(0)},
		{"h-q12", circuit.New(n).H(12)},
		{"h-q23", circuit.New(n).H(23)},
		{"rz-q5", circuit.New(n).RZ(0.3, 5)},
		{"cx-q3-q17", circuit.New(n).CX(3, 17)},
		{"rxx-q2-q20", circuit.New(n).RXX(0.4, 2, 20)},
		{"crx-q15-q0", circuit.New(n).CRX(0.6, 15, 0)},
		{"rxx-q0-q1", circuit.New(n).RXX(0.4, 0, 1)},
		{"fused-u-cx-q1-q9", circuit.New(n).U(0.1, 0.2, 0.3, 1).RY(0.5, 9).CX(1, 9).RZ(0.7, 9)},
	}
	for _, g := range gates {
		p, err := Compile(g.c)
		if err != nil {
			b.Fatal(err)
		}
		b.Run(strings.ReplaceAll(g.name, " ", ""), func(b *testing.B) {
			b.SetBytes(bytes)
			cpu := processCPU()
			for b.Loop() {
				if err := p.Apply(state); err != nil {
					b.Fatal(err)
				}
			}
			reportCPU(b, cpu)
		})
	}
}

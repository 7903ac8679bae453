package metric

import (
	"encoding/binary"
	"fmt"
	"math"
	"math/cmplx"
	"os"
	"testing"

	"gonum.org/v1/gonum/mat"
)

// BenchmarkPhaseDistance times PhaseDistance of two Haar-random unitaries.
// Issue 3 asks that 10 qubits (1024×1024) not be slower than NumPy's eigvals
// of the same product on the same machine; see testdata/metric/README.md for
// the NumPy command and the figures.
func BenchmarkPhaseDistance(b *testing.B) {
	for _, q := range []int{1, 2, 3, 4, 6, 8, 10} {
		n := 1 << q
		b.Run(fmt.Sprintf("qubits=%d", q), func(b *testing.B) {
			rng := newRand(uint64(q))
			u, v := haar(rng, n), haar(rng, n)
			timePhaseDistance(b, u, v)
		})
	}
}

// rephased returns u times eight global phases spread over the circle. The
// distance does not change, but the eigenphases of v†u turn, and with them
// their distance from the solver's first pole, which decides whether a
// second transform is needed (for a Haar pair at 10 qubits, about half the
// time): cycling through them times the average case rather than one draw.
func rephased(u *mat.CDense) []*mat.CDense {
	out := make([]*mat.CDense, 8)
	for k := range out {
		out[k] = scale(cmplx.Exp(complex(0, 2*math.Pi*float64(k)/8+0.1)), u)
	}
	return out
}

// BenchmarkWitness times Witness on the small sizes a property test checks
// thousands of times, and on larger ones.
func BenchmarkWitness(b *testing.B) {
	benchPairs(b, []int{1, 2, 3, 4, 6, 8, 10}, func(u, v *mat.CDense) { Witness(u, v) })
}

// BenchmarkDistance times the operator norm of a difference.
func BenchmarkDistance(b *testing.B) {
	benchPairs(b, []int{1, 3, 4, 6, 10}, func(u, v *mat.CDense) { Distance(u, v) })
}

// benchPairs runs f on a Haar-random pair for each number of qubits.
func benchPairs(b *testing.B, qubits []int, f func(u, v *mat.CDense)) {
	for _, q := range qubits {
		b.Run(fmt.Sprintf("qubits=%d", q), func(b *testing.B) {
			rng := newRand(uint64(q))
			u, v := haar(rng, 1<<q), haar(rng, 1<<q)
			b.ReportAllocs()
			for b.Loop() {
				f(u, v)
			}
		})
	}
}

// BenchmarkPhaseDistanceFile times PhaseDistance on the pair that
// testdata/metric/bench_numpy.py wrote to the file named by the environment
// variable METRIC_BENCH_PAIR (raw little-endian complex128, U then V,
// row-major, 1024×1024 each), so that NumPy and this package time the very
// same matrices. Without the variable it is skipped.
func BenchmarkPhaseDistanceFile(b *testing.B) {
	path := os.Getenv("METRIC_BENCH_PAIR")
	if path == "" {
		b.Skip("METRIC_BENCH_PAIR not set")
	}
	raw, err := os.ReadFile(path)
	if err != nil {
		b.Fatal(err)
	}
	const n = 1024
	if len(raw) != 2*n*n*16 {
		b.Fatalf("%s holds %d bytes, want %d", path, len(raw), 2*n*n*16)
	}
	read := func(off int) *mat.CDense {
		data := make([]complex128, n*n)
		for i := range data {
			re := math.Float64frombits(binary.LittleEndian.Uint64(raw[off+16*i:]))
			im := math.Float64frombits(binary.LittleEndian.Uint64(raw[off+16*i+8:]))
			data[i] = complex(re, im)
		}
		return mat.NewCDense(n, n, data)
	}
	timePhaseDistance(b, read(0), read(n*n*16))
}

// timePhaseDistance is the timing loop of the PhaseDistance benchmarks: it
// cycles through the rephased copies of u and reports, besides wall time,
// the CPU seconds per call summed over threads, which are steadier than wall
// time when other work shares the machine.
func timePhaseDistance(b *testing.B, u, v *mat.CDense) {
	us := rephased(u)
	b.ReportAllocs()
	cpu := processCPU()
	i := 0
	for b.Loop() {
		PhaseDistance(us[i%len(us)], v)
		i++
	}
	b.ReportMetric((processCPU()-cpu)/float64(b.N), "cpu-s/op")
}

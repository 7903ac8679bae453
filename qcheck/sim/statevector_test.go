package sim

import (
	"math"
	"math/cmplx"
	"math/rand/v2"
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// randomCircuit draws a circuit of the given width and length over every library gate that fits,
// with angles from a mix of special values and uniform ones. It uses its own small generator
// (package gen belongs to another part of the project and depends on circuit, not sim).
func randomCircuit(rng *rand.Rand, n, ops int) *circuit.Circuit {
	var specs []circuit.Spec
	for _, s := range circuit.Standard() {
		if s.Qubits >= 1 && s.Qubits <= n && s.Name != "measure" && s.Name != "reset" {
			specs = append(specs, s)
		}
	}
	special := []float64{0, math.Pi / 2, math.Pi, -math.Pi / 4, 2 * math.Pi}
	c := circuit.New(n)
	for range ops {
		s := specs[rng.IntN(len(specs))]
		params := make([]float64, s.Params)
		for i := range params {
			if rng.IntN(4) == 0 {
				params[i] = special[rng.IntN(len(special))]
			} else {
				params[i] = (rng.Float64()*2 - 1) * 2 * math.Pi
			}
		}
		g, err := circuit.NewGate(s.Name, params...)
		if err != nil {
			panic(err)
		}
		c.Append(g, rng.Perm(n)[:s.Qubits]...)
	}
	return c
}

// The statevector engine and the dense engine agree column by column: Apply(c, e_j) is column j
// of Unitary(c) (the definition of a matrix acting on basis vectors), on random circuits of 1 to 8
// qubits over the whole library. Both engines share the kernels but not the driver: the dense
// engine runs them over blocks of columns with every qubit shifted, the statevector over the bare
// state, with a different fusion cost model. The test also makes sure that the circuits reach
// every kernel kind, so that no inner loop goes unchecked.
func TestStatevectorAgreesWithUnitary(t *testing.T) {
	rng := rand.New(rand.NewPCG(8, 2026))
	seen := map[kernelKind]bool{}
	for n := 1; n <= 8; n++ {
		for trial := 0; trial < 4; trial++ {
			c := randomCircuit(rng, n, 10+rng.IntN(20*n))
			u := unitaryOf(t, c)
			p, err := Compile(c)
			if err != nil {
				t.Fatal(err)
			}
			for _, kn := range p.kernels {
				seen[kn.kind] = true
			}
			dim := 1 << n
			worst := 0.0
			state := make([]complex128, dim)
			for j := 0; j < dim; j++ {
				clear(state)
				state[j] = 1
				if err := p.Apply(state); err != nil {
					t.Fatal(err)
				}
				for i, a := range state {
					worst = math.Max(worst, cmplx.Abs(a-u.At(i, j)))
				}
			}
			if worst > 1e-12 {
				t.Errorf("%d qubits, %d ops: statevector and unitary columns differ by %.3g\n%v", n, len(c.Ops), worst, c)
			}
		}
	}
	for k := pairKind; k <= sparseKind; k++ {
		if !seen[k] {
			t.Errorf("kernel kind %d never chosen by the statevector engine", k)
		}
	}
}

// Large states run on all cores, with chunked runs of low-qubit gates: at 16 qubits a random
// state run through c and then through c.Inverse() comes back to itself (U†U = I), and Apply on
// one goroutine gives the same amplitudes as on several.
func TestStatevectorParallelAndInverse(t *testing.T) {
	rng := rand.New(rand.NewPCG(16, 2026))
	const n = 16
	c := randomCircuit(rng, n, 200)
	state := make([]complex128, 1<<n)
	for i := range state {
		state[i] = complex(rng.NormFloat64(), rng.NormFloat64())
	}
	orig := append([]complex128(nil), state...)
	p, err := Compile(c)
	if err != nil {
		t.Fatal(err)
	}
	serial := append([]complex128(nil), state...)
	runKernels(serial, p.kernels, 1)
	runKernels(state, p.kernels, 4)
	worst := 0.0
	for i := range state {
		worst = math.Max(worst, cmplx.Abs(state[i]-serial[i]))
	}
	if worst != 0 {
		t.Errorf("parallel and serial runs differ by %.3g; they should do the same arithmetic", worst)
	}
	if err := Apply(c.Inverse(), state); err != nil {
		t.Fatal(err)
	}
	worst = 0
	for i := range state {
		worst = math.Max(worst, cmplx.Abs(state[i]-orig[i]))
	}
	if worst > 1e-11 {
		t.Errorf("Apply(c.Inverse()) after Apply(c) is off the input by %.3g", worst)
	}
}

// Edge widths and sizes: the empty register has the 1×1 unitary [1]; a wrong state length and a
// matrix over the memory limit are errors that give the sizes (2^14 × 2^14 entries of 16 bytes
// are 4 GiB, worked out by hand).
func TestSizes(t *testing.T) {
	u := unitaryOf(t, circuit.New(0))
	if r, c := u.Dims(); r != 1 || c != 1 || u.At(0, 0) != 1 {
		t.Errorf("0-qubit unitary is %d×%d %v, want [1]", r, c, u.At(0, 0))
	}
	state := []complex128{0.5}
	if err := Apply(circuit.New(0), state); err != nil || state[0] != 0.5 {
		t.Errorf("0-qubit Apply: %v, state %v", err, state)
	}
	err := Apply(circuit.New(3).H(0), make([]complex128, 4))
	if err == nil || !strings.Contains(err.Error(), "4 entries") || !strings.Contains(err.Error(), "= 8") {
		t.Errorf("wrong state length: got %v", err)
	}
	_, err = UnitaryWithin(circuit.New(14).H(3), 1<<30)
	if err == nil || !strings.Contains(err.Error(), "4.0 GiB") || !strings.Contains(err.Error(), "1.0 GiB") {
		t.Errorf("over the limit: got %v", err)
	}
	if _, err := Compile(circuit.New(2).H(0).Reset(1)); err == nil || !strings.Contains(err.Error(), "op 1 (reset)") {
		t.Errorf("reset: got %v", err)
	}
}

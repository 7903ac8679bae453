package sim

import (
	"encoding/json"
	"math"
	"math/cmplx"
	"os"
	"path/filepath"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// jsonOp and jsonCircuit are the circuit format of testdata/sim: a gate name of the standard
// library, its angles, and its operands.
type jsonOp struct {
	Gate   string    `json:"gate"`
	Params []float64 `json:"params"`
	Qubits []int     `json:"qubits"`
}

type jsonCircuit struct {
	Name   string   `json:"name"`
	Qubits int      `json:"qubits"`
	Ops    []jsonOp `json:"ops"`
}

func (jc jsonCircuit) build(tb testing.TB) *circuit.Circuit {
	tb.Helper()
	c := circuit.New(jc.Qubits)
	for i, op := range jc.Ops {
		g, err := circuit.NewGate(op.Gate, op.Params...)
		if err != nil {
			tb.Fatalf("op %d: %v", i, err)
		}
		c.Append(g, op.Qubits...)
	}
	return c
}

type pair [2]float64

func (p pair) complex() complex128 { return complex(p[0], p[1]) }

type referenceFile struct {
	Numpy string `json:"numpy"`
	Cases []struct {
		jsonCircuit
		Unitary []pair `json:"unitary"`
	} `json:"cases"`
	Statevector struct {
		jsonCircuit
		Indices    []int     `json:"indices"`
		Amplitudes []pair    `json:"amplitudes"`
		Marginals  []float64 `json:"marginals_one"`
		Overlaps   []pair    `json:"overlaps"`
		Norm       float64   `json:"norm"`
	} `json:"statevector"`
}

func readJSON(tb testing.TB, name string, v any) {
	tb.Helper()
	data, err := os.ReadFile(filepath.Join("..", "..", "testdata", "sim", name))
	if err != nil {
		tb.Fatal(err)
	}
	if err := json.Unmarshal(data, v); err != nil {
		tb.Fatalf("%s: %v", name, err)
	}
}

// The full matrices of small random circuits over every library gate, in both operand orders,
// agree to 1e-12 with an independent NumPy computation: textbook matrices contracted with
// numpy.tensordot (testdata/sim/reference.py; NumPy version recorded in reference.json).
func TestUnitaryAgreesWithNumPy(t *testing.T) {
	var ref referenceFile
	readJSON(t, "reference.json", &ref)
	if len(ref.Cases) < 100 {
		t.Fatalf("reference.json holds %d cases; regenerate it with testdata/sim/reference.py", len(ref.Cases))
	}
	seen := map[string]bool{}
	for i, tc := range ref.Cases {
		c := tc.build(t)
		for _, op := range tc.Ops {
			seen[op.Gate] = true
		}
		u := unitaryOf(t, c)
		// The same circuit on a register with idle qubits above it runs through gate fusion and
		// the parallel column blocks (registers of up to smallUnitary qubits do not); its matrix
		// is I ⊗ U, block diagonal with copies of NumPy's U.
		wide := circuit.New(smallUnitary + 2).Compose(c)
		uw := unitaryOf(t, wide)
		dim := 1 << tc.Qubits
		worst := 0.0
		for r := 0; r < dim; r++ {
			for col := 0; col < dim; col++ {
				want := tc.Unitary[r*dim+col].complex()
				worst = math.Max(worst, cmplx.Abs(u.At(r, col)-want))
				for blk := 0; blk < 1<<(wide.Qubits()-tc.Qubits); blk++ {
					worst = math.Max(worst, cmplx.Abs(uw.At(blk*dim+r, blk*dim+col)-want))
				}
			}
		}
		if worst > 1e-12 {
			t.Errorf("case %d (%d qubits, NumPy %s): entries differ by %.3g\n%v", i, tc.Qubits, ref.Numpy, worst, c)
		}
	}
	for _, s := range circuit.Standard() {
		if !seen[s.Name] && s.Name != "barrier" && s.Name != "measure" && s.Name != "reset" {
			t.Errorf("gate %s is not covered by reference.json", s.Name)
		}
	}
}

// The statevector of a fixed 300-gate, 16-qubit circuit (issue 8) agrees with NumPy's tensordot
// loop (testdata/sim/reference.py) on 128 sampled amplitudes, the probability of each qubit being
// 1, four overlaps with fixed plane waves that weigh every amplitude, and the norm, all to 1e-12.
func TestStatevectorAgreesWithNumPy(t *testing.T) {
	var ref referenceFile
	readJSON(t, "reference.json", &ref)
	sv := ref.Statevector
	c := sv.build(t)
	n := sv.Qubits
	psi := make([]complex128, 1<<n)
	norm := 0.0
	for i := range psi {
		// The input state of reference.py: ψ_i ∝ cos(0.37 i) + i sin(0.11 i + 0.5).
		psi[i] = complex(math.Cos(0.37*float64(i)), math.Sin(0.11*float64(i)+0.5))
		norm += real(psi[i])*real(psi[i]) + imag(psi[i])*imag(psi[i])
	}
	for i := range psi {
		psi[i] /= complex(math.Sqrt(norm), 0)
	}
	if err := Apply(c, psi); err != nil {
		t.Fatal(err)
	}
	const tol = 1e-12
	for k, i := range sv.Indices {
		if d := cmplx.Abs(psi[i] - sv.Amplitudes[k].complex()); d > tol {
			t.Errorf("amplitude %d: got %v, NumPy %v (|Δ| = %.3g)", i, psi[i], sv.Amplitudes[k].complex(), d)
		}
	}
	marg := make([]float64, n)
	total := 0.0
	overlaps := make([]complex128, len(sv.Overlaps))
	for i, a := range psi {
		p := real(a)*real(a) + imag(a)*imag(a)
		total += p
		for q := 0; q < n; q++ {
			if i>>q&1 == 1 {
				marg[q] += p
			}
		}
		for k := range overlaps {
			overlaps[k] += cmplx.Exp(complex(0, -0.001*float64(k+1)*float64(i))) * a
		}
	}
	for q, m := range marg {
		if d := math.Abs(m - sv.Marginals[q]); d > tol {
			t.Errorf("P(q%d = 1): got %.15f, NumPy %.15f", q, m, sv.Marginals[q])
		}
	}
	for k, z := range overlaps {
		// A sum of 65536 terms of size ~1/256: rounding stays near 1e-14.
		if d := cmplx.Abs(z - sv.Overlaps[k].complex()); d > 1e-11 {
			t.Errorf("overlap %d: got %v, NumPy %v", k, z, sv.Overlaps[k].complex())
		}
	}
	if d := math.Abs(math.Sqrt(total) - sv.Norm); d > tol {
		t.Errorf("norm: got %.15f, NumPy %.15f", math.Sqrt(total), sv.Norm)
	}
}

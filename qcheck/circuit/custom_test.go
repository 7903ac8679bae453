package circuit

import (
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"
)

func matrixOf(m []complex128) *mat.CDense {
	d := int(math.Sqrt(float64(len(m))))
	return mat.NewCDense(d, d, append([]complex128(nil), m...))
}

// Custom accepts unitaries and refuses everything else with the reason and, for a non-unitary
// matrix, the measured deviation ‖M†M − I‖ (here the largest absolute row sum of M†M − I,
// worked out by hand beside each case).
func TestCustomRefusesBadMatrices(t *testing.T) {
	cases := []struct {
		name string
		m    *mat.CDense
		want string
	}{
		// M = diag(1, 2): M†M − I = diag(0, 3).
		{"scaled", matrixOf([]complex128{1, 0, 0, 2}), "= 3 >"},
		// M = [[1, 0.1], [0, 1]]: M†M − I = [[0, 0.1], [0.1, 0.01]], row sums 0.1 and 0.11.
		{"sheared", matrixOf([]complex128{1, 0.1, 0, 1}), "= 0.11 >"},
		// Zero matrix: M†M − I = −I, row sums 1.
		{"zero", matrixOf([]complex128{0, 0, 0, 0}), "= 1 >"},
		{"not square", mat.NewCDense(2, 4, make([]complex128, 8)), "not square"},
		{"not a power of two", mat.NewCDense(3, 3, []complex128{1, 0, 0, 0, 1, 0, 0, 0, 1}), "not 2^k"},
		{"NaN entry", matrixOf([]complex128{1, 0, 0, complex(math.NaN(), 0)}), "entry (1,1)"},
		{"one by one", mat.NewCDense(1, 1, []complex128{1}), "not 2^k"},
	}
	for _, tc := range cases {
		_, err := Custom("mine", tc.m)
		if err == nil {
			t.Errorf("%s: accepted", tc.name)
			continue
		}
		if !strings.Contains(err.Error(), tc.want) || !strings.Contains(err.Error(), "mine") {
			t.Errorf("%s: error %q should name the gate and contain %q", tc.name, err, tc.want)
		}
	}
	if _, err := Custom("h", matrixOf([]complex128{1, 0, 0, 1})); err == nil {
		t.Error("Custom accepted the name of a library gate")
	}
	if _, err := Custom("", matrixOf([]complex128{1, 0, 0, 1})); err == nil {
		t.Error("Custom accepted an empty name")
	}
	// A unitary within the tolerance is accepted: the Hadamard matrix, N&C §4.2.
	h := complex(1/math.Sqrt2, 0)
	g, err := Custom("myh", matrixOf([]complex128{h, h, h, -h}))
	if err != nil {
		t.Fatalf("Custom refused the Hadamard matrix: %v", err)
	}
	if g.Qubits() != 1 || !g.IsCustom() || !g.Unitary() {
		t.Errorf("custom Hadamard: qubits %d, custom %v, unitary %v", g.Qubits(), g.IsCustom(), g.Unitary())
	}
	// The matrix is copied: changing the caller's matrix afterwards does not change the gate.
	m := matrixOf([]complex128{0, 1, 1, 0})
	g, err = Custom("myx", m)
	if err != nil {
		t.Fatal(err)
	}
	m.Set(0, 0, 7)
	if g.Elements()[0] != 0 {
		t.Error("Custom kept a reference to the caller's matrix")
	}
}

// A custom gate's inverse is named by adding or removing "dg", so Custom refuses every name whose
// inverse would be a library gate's name: the inverse of a custom "xdg" used to be a custom gate
// called "x", indistinguishable by name from the Pauli X. The check runs over the whole library.
func TestCustomNameCannotInvertIntoLibrary(t *testing.T) {
	id := matrixOf([]complex128{1, 0, 0, 1})
	for _, spec := range Standard() {
		if _, err := Custom(spec.Name+"dg", id); err == nil {
			t.Errorf("Custom accepted %q, whose inverse would be the library gate %q", spec.Name+"dg", spec.Name)
		} else if err != nil && !strings.Contains(err.Error(), spec.Name+"dg") {
			t.Errorf("Custom(%q): error %q does not name the gate", spec.Name+"dg", err)
		}
		if stem, ok := strings.CutSuffix(spec.Name, "dg"); ok {
			if _, err := Custom(stem, id); err == nil {
				t.Errorf("Custom accepted %q, whose inverse would be the library gate %q", stem, spec.Name)
			}
		}
	}
	for _, name := range []string{"xdg", "hdg", "rzdg", "sdgdg", "ccxdg"} {
		_, err := Custom(name, id)
		if err == nil || !strings.Contains(err.Error(), "inverse would be named") {
			t.Errorf("Custom(%q): got %v, want a refusal naming the inverse", name, err)
		}
	}
	// Names that stay clear of the library are accepted, and so are their inverses' names.
	for _, name := range []string{"mine", "minedg", "dg", "xx", "hadamard"} {
		g, err := Custom(name, id)
		if err != nil {
			t.Errorf("Custom(%q) refused: %v", name, err)
			continue
		}
		if _, ok := Lookup(g.Inverse().Name); ok {
			t.Errorf("inverse of custom %q is named %q, a library gate", name, g.Inverse().Name)
		}
	}
}

// Issue 17, reproducer 12: the unitarity check now runs on metric's blocked product (the figure is
// BenchmarkUnitarityDeviation in package metric) and still refuses, with ‖M†M − I‖ bounded by
// its largest row sum: for the 6-qubit identity with column 0 doubled, M†M − I = diag(3, 0, …),
// so the bound is 3 (by hand).
func TestCustomRefusesNonUnitaryWithTheBound(t *testing.T) {
	d := 64
	data := make([]complex128, d*d)
	for i := 0; i < d; i++ {
		data[i*d+i] = 1
	}
	data[0] = 2
	_, err := Custom("wide", mat.NewCDense(d, d, data))
	if err == nil || !strings.Contains(err.Error(), "‖M†M − I‖ = 3 > 1e-10") {
		t.Errorf("error %v, want a refusal giving ‖M†M − I‖ = 3", err)
	}
	data[0] = 1
	if _, err := Custom("wide", mat.NewCDense(d, d, data)); err != nil {
		t.Errorf("the 6-qubit identity: %v", err)
	}
}

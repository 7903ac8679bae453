package circuit

import (
	"fmt"
	"math/cmplx"
	"strings"

	"gonum.org/v1/gonum/mat"
	"qcheck.dev/metric"
)

// UnitaryTolerance is how far ‖M†M − I‖ (the largest absolute row sum, an upper bound on the
// operator norm) may be from zero for Custom to accept M as unitary.
const UnitaryTolerance = 1e-10

type customGate struct {
	qubits int
	data   []complex128 // row-major, textbook operand order
}

// Custom returns a gate with the user's own 2^k × 2^k matrix, k ≥ 1, given in the textbook order
// of its operands (the first operand is the most significant bit). The matrix is copied. It fails
// when the matrix is not square, its size is not a power of two, an entry is not finite, or it is
// not unitary within UnitaryTolerance (the error gives the measured deviation ‖M†M − I‖), or the
// name or its inverse's name (see Gate.Inverse) is the name of a standard library gate.
func Custom(name string, m mat.CMatrix) (Gate, error) {
	if name == "" {
		return Gate{}, fmt.Errorf("circuit: custom gate needs a name")
	}
	if _, ok := library[name]; ok {
		return Gate{}, fmt.Errorf("circuit: custom gate name %q is taken by the standard library", name)
	}
	// The inverse of a custom gate is named by adding or removing "dg" (see inverseName); a name
	// whose inverse would be a library gate's name is refused, so that no custom gate or inverse
	// can be mistaken for a library gate.
	if inv := inverseName(name); library[inv].spec.Name != "" {
		return Gate{}, fmt.Errorf("circuit: custom gate name %q is refused: its inverse would be named %q, a gate of the standard library", name, inv)
	}
	if m == nil {
		return Gate{}, fmt.Errorf("circuit: custom gate %s: nil matrix", name)
	}
	r, c := m.Dims()
	if r != c {
		return Gate{}, fmt.Errorf("circuit: custom gate %s: matrix is %d×%d, not square", name, r, c)
	}
	k := 0
	for 1<<k < r {
		k++
	}
	if r < 2 || 1<<k != r {
		return Gate{}, fmt.Errorf("circuit: custom gate %s: size %d is not 2^k for k ≥ 1", name, r)
	}
	data := make([]complex128, r*r)
	for i := 0; i < r; i++ {
		for j := 0; j < r; j++ {
			v := m.At(i, j)
			if cmplx.IsNaN(v) || cmplx.IsInf(v) {
				return Gate{}, fmt.Errorf("circuit: custom gate %s: entry (%d,%d) is %v", name, i, j, v)
			}
			data[i*r+j] = v
		}
	}
	if dev := metric.UnitarityDeviation(mat.NewCDense(r, r, data)); !(dev <= UnitaryTolerance) {
		return Gate{}, fmt.Errorf("circuit: custom gate %s is not unitary: ‖M†M − I‖ = %.3g > %g", name, dev, UnitaryTolerance)
	}
	return Gate{Name: name, custom: &customGate{qubits: k, data: data}}, nil
}

func (c *customGate) inverse(name string) Gate {
	d := 1 << c.qubits
	data := make([]complex128, d*d)
	for i := 0; i < d; i++ {
		for j := 0; j < d; j++ {
			data[j*d+i] = cmplx.Conj(c.data[i*d+j])
		}
	}
	return Gate{Name: inverseName(name), custom: &customGate{qubits: c.qubits, data: data}}
}

// inverseName is the name of a custom gate's inverse: the name without a trailing "dg", or with
// "dg" added when it has none ("mine" and "minedg" are each other's inverses).
func inverseName(name string) string {
	if stem, ok := strings.CutSuffix(name, "dg"); ok && stem != "" {
		return stem
	}
	return name + "dg"
}

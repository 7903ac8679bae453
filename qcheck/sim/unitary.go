package sim

import (
	"fmt"

	"gonum.org/v1/gonum/mat"
	"qcheck.dev/qcheck/circuit"
)

// DefaultMemoryLimit is the memory Unitary may use for its matrix: 4 GiB, enough for 14 qubits
// (a 2^14 × 2^14 complex128 matrix takes exactly 4 GiB).
const DefaultMemoryLimit int64 = 4 << 30

// Unitary returns the 2^n × 2^n matrix of the circuit, with basis index Σ_q b_q·2^q. It refuses a
// circuit whose matrix needs more than DefaultMemoryLimit, saying how much it would need.
func Unitary(c *circuit.Circuit) (*mat.CDense, error) {
	return UnitaryWithin(c, DefaultMemoryLimit)
}

// UnitaryWithin is Unitary with an explicit memory limit in bytes.
func UnitaryWithin(c *circuit.Circuit, limit int64) (*mat.CDense, error) {
	if err := checkUnitary(c); err != nil {
		return nil, err
	}
	n := c.Qubits()
	if n > 31 {
		return nil, fmt.Errorf("sim: a dense unitary of %d qubits cannot be held (2^%d × 2^%d entries)", n, n, n)
	}
	need := int64(16) << (2 * n)
	if n > 30 || need > limit {
		return nil, fmt.Errorf("sim: a dense unitary of %d qubits needs %s, over the limit of %s; use a statevector or tableau engine", n, bytesString(need), bytesString(limit))
	}
	dim := 1 << n
	data := make([]complex128, dim*dim)
	for i := 0; i < dim; i++ {
		data[i*dim+i] = 1
	}
	for _, op := range c.Ops {
		if op.Gate.Name == "barrier" {
			continue
		}
		applyRows(data, n, dim, op.Gate.Elements(), op.Qubits)
	}
	return mat.NewCDense(dim, dim, data), nil
}

// checkUnitary validates c and refuses ops that have no unitary matrix.
func checkUnitary(c *circuit.Circuit) error {
	if err := c.Validate(); err != nil {
		return err
	}
	for i, op := range c.Ops {
		if !op.Gate.Unitary() && op.Gate.Name != "barrier" {
			return &circuit.OpError{Index: i, Gate: op.Gate.Name, Err: "not a unitary operation; remove it or compare measured distributions"}
		}
	}
	return nil
}

func bytesString(b int64) string {
	const unit = 1024
	if b < unit {
		return fmt.Sprintf("%d B", b)
	}
	div, exp := int64(unit), 0
	for n := b / unit; n >= unit; n /= unit {
		div *= unit
		exp++
	}
	return fmt.Sprintf("%.1f %ciB", float64(b)/float64(div), "KMGTPE"[exp])
}

package sim

import (
	"fmt"
	"math"
	"runtime"

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

// UnitaryWithin is Unitary with an explicit memory limit in bytes for the matrix (16·4^n bytes);
// besides the matrix the engine uses one cache-sized buffer (256 KiB, more above 14 qubits) per
// core.
func UnitaryWithin(c *circuit.Circuit, limit int64) (*mat.CDense, error) {
	if err := checkUnitary(c); err != nil {
		return nil, err
	}
	n := c.Qubits()
	if need := complexBytes(2 * n); need > float64(limit) || need > addressable {
		return nil, fmt.Errorf("sim: a dense unitary of %d qubits needs %s, over the limit of %s; use a statevector or tableau engine", n, bytesString(need), bytesString(float64(limit)))
	}
	dim := 1 << n
	data := make([]complex128, dim*dim)
	buildUnitary(data, c, n, runtime.GOMAXPROCS(0))
	return mat.NewCDense(dim, dim, data), nil
}

// unitaryBlockBytes is the size of the working block of columns each goroutine builds at a time:
// small enough to stay in a core's L2 cache while every gate of the circuit runs over it.
const unitaryBlockBytes = 256 << 10

// smallUnitary is the widest register whose matrix is built without fusion and on one goroutine:
// at 16 × 16 and below, planning merges and starting goroutines costs more than running the gates,
// and property tests build such matrices thousands of times a second.
const smallUnitary = 4

// unitarySweepCost weighs a pass over a block in cache against one complex multiply per amplitude.
const unitarySweepCost = 1

// buildUnitary writes the row-major 2^n × 2^n matrix of the valid unitary circuit c into data.
// Columns are independent (column j is U|j⟩), so it builds B = 2^b of them at a time in a small
// row-major buffer, where qubit q sits at bit q + b, starting from the identity columns and
// running every fused gate over the buffer before copying it out. Blocks go to workers goroutines.
func buildUnitary(data []complex128, c *circuit.Circuit, n, workers int) {
	dim := 1 << n
	var gates []*block
	if n <= smallUnitary {
		gates, workers = unfused(c), 1
	} else {
		gates = fuse(c, unitarySweepCost)
	}
	b := uint(0)
	for b < uint(n) && dim<<(b+1)*16 <= unitaryBlockBytes {
		b++
	}
	for workers > 1 && b > 0 && dim>>b < 4*workers { // enough blocks to keep every worker busy
		b--
	}
	width := 1 << b
	kernels := kernelsOf(gates, b)
	blocks := dim / width
	parallel(blocks, workers, func(lo, hi int) {
		buf := make([]complex128, dim*width) // one per goroutine
		for blk := lo; blk < hi; blk++ {
			clear(buf)
			j0 := blk * width
			for col := 0; col < width; col++ {
				buf[(j0+col)*width+col] = 1
			}
			for _, kn := range kernels {
				kn.apply(buf, 0, kn.groups(len(buf)))
			}
			for row := 0; row < dim; row++ {
				copy(data[row*dim+j0:row*dim+j0+width], buf[row*width:row*width+width])
			}
		}
	})
}

// checkUnitary validates c and refuses ops that have no unitary matrix.
func checkUnitary(c *circuit.Circuit) error {
	if err := c.Validate(); err != nil {
		return err
	}
	for i, op := range c.Ops {
		if !op.Unitary() && op.Gate.Name != "barrier" {
			return &circuit.OpError{Index: i, Gate: op.Gate.Name, Err: "not a unitary operation; remove it or compare measured distributions"}
		}
	}
	return nil
}

// addressable is the most memory a Go program can allocate on the 64-bit platforms it supports
// (a 48-bit address space): larger requests are refused whatever limit the caller sets.
const addressable = 1 << 48

// bytesString writes a size in bytes briefly: "512 B", "4.0 GiB", "16.0 EiB".
func bytesString(b float64) string {
	const unit = 1024
	if b < unit {
		return fmt.Sprintf("%.0f B", b)
	}
	exp := 0
	for b >= unit && exp < len(bytesUnits) {
		b /= unit
		exp++
	}
	if b >= unit {
		return fmt.Sprintf("2^%d B", int(math.Log2(b))+10*exp)
	}
	return fmt.Sprintf("%.1f %ciB", b, bytesUnits[exp-1])
}

const bytesUnits = "KMGTPEZY"

// complexBytes returns the bytes of 2^k complex128 values, 16·2^k, as a float64: exact for every
// k (a power of two), and free of the overflow an int64 meets at k = 59.
func complexBytes(k int) float64 { return math.Ldexp(16, k) }

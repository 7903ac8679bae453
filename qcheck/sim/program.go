package sim

import (
	"fmt"
	"runtime"
	"sync"

	"qcheck.dev/qcheck/circuit"
)

// Program is a circuit compiled for the statevector engine: validated once, its gates fused and
// their inner loops chosen, ready to run on many states. Iterative methods that apply the same
// circuit again and again (a Lanczos iteration applies U and the inverse of V to dozens of
// vectors) should compile both once: Compile(u) and Compile(v.Inverse()).
type Program struct {
	qubits  int
	kernels []*kernel
}

// statevectorSweepCost weighs a pass over a large statevector, which streams from memory, against
// one complex multiply per amplitude; it makes fusion eager.
const statevectorSweepCost = 8

// Compile validates the circuit, refuses ops with no unitary matrix, and fuses its gates for
// repeated application to statevectors.
func Compile(c *circuit.Circuit) (*Program, error) {
	if err := checkUnitary(c); err != nil {
		return nil, err
	}
	if c.Qubits() > maxStateQubits {
		return nil, fmt.Errorf("sim: a statevector of %d qubits cannot be addressed (at most %d)", c.Qubits(), maxStateQubits)
	}
	return &Program{qubits: c.Qubits(), kernels: kernelsOf(fuse(c, statevectorSweepCost), 0)}, nil
}

// maxStateQubits is the widest statevector whose indices fit in an int on every platform Go
// supports with 64-bit ints; memory runs out long before.
const maxStateQubits = 40

// Qubits returns the width of the compiled circuit.
func (p *Program) Qubits() int { return p.qubits }

// Apply runs the compiled circuit on a statevector of 2^n entries in place, using all cores for
// large states.
func (p *Program) Apply(state []complex128) error {
	if len(state) != 1<<p.qubits {
		return fmt.Errorf("sim: state has %d entries, a %d-qubit circuit needs 2^%d = %d", len(state), p.qubits, p.qubits, 1<<p.qubits)
	}
	runKernels(state, p.kernels, runtime.GOMAXPROCS(0))
	return nil
}

// kernelsOf fixes fused blocks to bit positions: qubit q at bit q + shift.
func kernelsOf(blocks []*block, shift uint) []*kernel {
	out := make([]*kernel, len(blocks))
	for i, b := range blocks {
		bits := make([]uint, len(b.qubits))
		for j, q := range b.qubits {
			bits[j] = uint(q) + shift
		}
		out[i] = newKernel(b.m, bits)
	}
	return out
}

// Tuning of the run: arrays below parallelMin amplitudes run on one goroutine; above, kernels
// whose bits all lie below chunkBits run back to back on chunks of 2^chunkBits amplitudes (256 KiB,
// at home in a core's L2 cache), one chunk per goroutine at a time; other kernels are split over
// goroutines one at a time.
const (
	parallelMin = 1 << 14
	chunkBits   = 14
)

// runKernels applies the kernels in order to data, a flat array of 2^m amplitudes, on up to
// workers goroutines.
func runKernels(data []complex128, kernels []*kernel, workers int) {
	if len(data) < parallelMin || workers <= 1 {
		for _, kn := range kernels {
			kn.apply(data, 0, kn.groups(len(data)))
		}
		return
	}
	for i := 0; i < len(kernels); {
		j := i
		for j < len(kernels) && kernels[j].sorted[kernels[j].qubits-1] < chunkBits {
			j++
		}
		if j > i {
			run := kernels[i:j]
			chunks := len(data) >> chunkBits
			parallel(chunks, workers, func(c0, c1 int) {
				for c := c0; c < c1; c++ {
					for _, kn := range run {
						per := 1 << (chunkBits - kn.qubits)
						kn.apply(data, c*per, (c+1)*per)
					}
				}
			})
			i = j
			continue
		}
		kn := kernels[i]
		parallel(kn.groups(len(data)), workers, func(g0, g1 int) { kn.apply(data, g0, g1) })
		i++
	}
}

// parallel splits [0, n) into one contiguous range per worker and waits for all of them.
func parallel(n, workers int, f func(lo, hi int)) {
	workers = min(workers, n)
	if workers <= 1 {
		f(0, n)
		return
	}
	var wg sync.WaitGroup
	for w := 0; w < workers; w++ {
		lo, hi := n*w/workers, n*(w+1)/workers
		wg.Add(1)
		go func() {
			defer wg.Done()
			f(lo, hi)
		}()
	}
	wg.Wait()
}

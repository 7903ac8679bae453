package sim

import (
	"fmt"
	"math"
	"math/cmplx"

	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
)

// ComparePrograms compares two programs by their meaning as OpenQASM 2.0 defines it: the
// distribution of the classical bits at the end, every qubit and bit starting at 0. It returns
// the exact total-variation distance and the outcome whose probability differs most. The
// classical bits are the interface: the programs may have different widths (a routed program on
// more physical qubits), and a bit only one of them has is 0 in the other.
//
// Each distribution is computed by ProgramOutcomes; what it drops as impossible is below
// PruneBelow per branch, and half the total dropped is the gap's Rounding. An error says which
// program was refused and why.
func ComparePrograms(want, got *circuit.Circuit, opts ProgramOptions) (OutcomeGap, error) {
	ow, og, err := runPair(want, got, opts, ProgramOutcomes)
	if err != nil {
		return OutcomeGap{}, err
	}
	g := TotalVariation(ow, og)
	g.Rounding = (ow.Dropped + og.Dropped) / 2
	return g, nil
}

// runPair runs two programs concurrently, naming the one that fails, and keeps the bits
// opts.Bits lists.
func runPair[T interface{ Marginal([]int) (T, error) }](a, b *circuit.Circuit, opts ProgramOptions, run func(*circuit.Circuit, ProgramOptions) (T, error)) (ta, tb T, err error) {
	if a == nil || b == nil {
		return ta, tb, fmt.Errorf("sim: nil circuit")
	}
	var errB error
	done := make(chan struct{})
	go func() {
		defer close(done)
		tb, errB = run(b, opts)
	}()
	ta, err = run(a, opts)
	<-done
	if err != nil {
		return ta, tb, fmt.Errorf("sim: want program: %w", err)
	}
	if errB != nil {
		return ta, tb, fmt.Errorf("sim: got program: %w", errB)
	}
	if opts.Bits != nil {
		if ta, err = ta.Marginal(opts.Bits); err != nil {
			return ta, tb, err
		}
		tb, _ = tb.Marginal(opts.Bits) // the same list: it cannot fail twice
	}
	return ta, tb, nil
}

// StateGap compares the states two circuits prepare from |0…0⟩.
type StateGap struct {
	// Distance is min over φ of ‖U|0⟩ − e^{iφ}V|0⟩‖, between 0 and √2, computed from the
	// aligned difference itself (not from the overlap, which loses half the digits near 0).
	Distance float64
	// Overlap is ⟨0|U†V|0⟩; its squared modulus is the fidelity of the two states.
	Overlap complex128
}

// Fidelity returns |⟨0|U†V|0⟩|², the probability that the state V|0⟩ passes a test for U|0⟩.
func (g StateGap) Fidelity() float64 { a := cmplx.Abs(g.Overlap); return a * a }

// fromZeroMaxQubits is the widest comparison from |0…0⟩: two statevectors of 1 GiB.
const fromZeroMaxQubits = 26

// CompareFromZero compares two unitary circuits of the same width on the one input |0…0⟩, the
// promise a pass makes when it relies on qubits starting at 0: equal up to a global phase when
// Distance is 0. It refuses circuits with measurements, resets or conditions (compare those as
// programs) and widths over 26 qubits.
func CompareFromZero(want, got *circuit.Circuit) (StateGap, error) {
	u, v, err := buildPair(want, got, "want", "got", func(c *circuit.Circuit) ([]complex128, error) {
		if c.Qubits() > fromZeroMaxQubits {
			return nil, fmt.Errorf("a %d-qubit statevector needs %s; this comparison holds two of at most %d qubits (1 GiB each)", c.Qubits(), bytesString(math.Ldexp(16, c.Qubits())), fromZeroMaxQubits)
		}
		s := make([]complex128, 1<<c.Qubits())
		s[0] = 1
		return s, Apply(c, s)
	})
	if err != nil {
		return StateGap{}, err
	}
	g := StateGap{Overlap: dot(u, v)}
	g.Distance = math.Min(metric.AlignedDistance(u, v), math.Sqrt2)
	return g, nil
}

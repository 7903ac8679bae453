package sim

import (
	"fmt"

	"qcheck.dev/qcheck/circuit"
)

// Marginal returns the distribution of the listed classical bits alone: bit j of an outcome of
// the result is bit bits[j] of an outcome of o. It is how a comparison reads only some bits, or
// reads them in another order. A bit beyond the program's register reads 0, the value a bit no
// op writes keeps. It fails for a negative bit or one listed twice.
func (o *Outcomes) Marginal(bits []int) (*Outcomes, error) {
	if err := checkBitList(bits); err != nil {
		return nil, err
	}
	out := newOutcomes(len(bits), len(bits))
	key := make([]byte, (len(bits)+7)/8)
	for k, p := range o.sparse(o.bits) {
		clear(key)
		for j, b := range bits {
			if b < o.bits && k[b/8]>>(b%8)&1 == 1 {
				key[j/8] |= 1 << (j % 8)
			}
		}
		out.add(key, p)
	}
	out.Dropped = o.Dropped
	return out, nil
}

// Marginal returns the distribution of the listed classical bits alone, as Outcomes.Marginal
// does. The image of an affine set under a choice of coordinates is an affine set, so a uniform
// distribution stays uniform.
func (s *StabilizerOutcomes) Marginal(bits []int) (*StabilizerOutcomes, error) {
	if err := checkBitList(bits); err != nil {
		return nil, err
	}
	words := (len(bits) + 63) / 64
	pick := func(v []uint64) []uint64 {
		out := make([]uint64, words)
		for j, b := range bits {
			if b < s.bits {
				out[j/64] |= (v[b/64] >> (b % 64) & 1) << (j % 64)
			}
		}
		return out
	}
	out := &StabilizerOutcomes{bits: len(bits), Deviation: s.Deviation}
	for _, p := range s.parts {
		gens := make([][]uint64, len(p.set.basis))
		for i, v := range p.set.basis {
			gens[i] = pick(v)
		}
		out.addPart(newAffineSet(len(bits), pick(p.set.offset), gens), p.weight)
	}
	return out, nil
}

func checkBitList(bits []int) error {
	seen := map[int]bool{}
	for _, b := range bits {
		if b < 0 {
			return fmt.Errorf("sim: negative classical bit %d", b)
		}
		if seen[b] {
			return fmt.Errorf("sim: classical bit %d listed twice", b)
		}
		seen[b] = true
	}
	return nil
}

// MeasureAtEnd returns a copy of the circuit that measures the listed qubits at its end, qubit
// qubits[j] into a new classical bit Bits()+j. Comparing two unitary circuits this way as
// programs is the meaning "from |0…0⟩, only these qubits are measured": the unmeasured qubits
// are ignored, and so is every phase the measurement cannot see.
func MeasureAtEnd(c *circuit.Circuit, qubits ...int) *circuit.Circuit {
	out := c.Clone()
	first := c.Bits()
	for j, q := range qubits {
		out.Measure(q, first+j)
	}
	return out
}

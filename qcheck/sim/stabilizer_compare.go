package sim

import (
	"fmt"

	"qcheck.dev/qcheck/circuit"
)

// enumerateLimit is the most outcomes the stabilizer engine lists one by one, when a program's
// distribution is a mixture of several affine sets and the two mixtures are not the same list.
const enumerateLimit = 1 << 20

// CompareCliffordPrograms compares two Clifford programs by the distribution of their classical
// bits, as ComparePrograms does, on the stabilizer tableau at any width (see
// StabilizerProgramOutcomes). When each program's distribution is uniform over one affine set A
// or B, the total-variation distance is exact from the sets alone,
//
//	TV = 1 − |A ∩ B| / max(|A|, |B|),
//
// with a worst outcome found by linear algebra over GF(2). When feed-forward made a mixture of
// sets, two identical mixtures are at distance 0; others are listed outcome by outcome up to
// 2^20 outcomes and refused beyond. The distance is that of the programs with every gate at its
// exact Clifford angle; Rounding says how far the programs' own may be.
func CompareCliffordPrograms(want, got *circuit.Circuit, opts ProgramOptions) (OutcomeGap, error) {
	ow, og, err := runPair(want, got, opts, StabilizerProgramOutcomes)
	if err != nil {
		return OutcomeGap{}, err
	}
	g, err := ow.gap(og)
	g.Rounding = ow.Deviation + og.Deviation
	return g, err
}

func (s *StabilizerOutcomes) gap(o *StabilizerOutcomes) (OutcomeGap, error) {
	bits := max(s.bits, o.bits)
	s, o = s.widen(bits), o.widen(bits)
	if len(s.parts) == 1 && len(o.parts) == 1 {
		return uniformGap(s.parts[0].set, o.parts[0].set), nil
	}
	if s.sameParts(o) {
		return OutcomeGap{}, nil
	}
	a, errA := s.Outcomes(enumerateLimit)
	b, errB := o.Outcomes(enumerateLimit)
	if errA != nil || errB != nil {
		return OutcomeGap{}, fmt.Errorf("sim: the programs' feed-forward makes their distributions mixtures of %d and %d affine sets with more than %d outcomes; the stabilizer engine cannot compare them exactly", len(s.parts), len(o.parts), enumerateLimit)
	}
	return TotalVariation(a, b), nil
}

// widen returns the distribution with outcomes of the given number of bits, the new high bits 0.
func (s *StabilizerOutcomes) widen(bits int) *StabilizerOutcomes {
	words := (bits + 63) / 64
	out := &StabilizerOutcomes{bits: bits, Deviation: s.Deviation}
	for _, p := range s.parts {
		grow := func(v []uint64) []uint64 { return append(append([]uint64(nil), v...), make([]uint64, words-len(v))...) }
		gens := make([][]uint64, len(p.set.basis))
		for i, b := range p.set.basis {
			gens[i] = grow(b)
		}
		out.parts = append(out.parts, affinePart{set: newAffineSet(bits, grow(p.set.offset), gens), weight: p.weight})
	}
	return out
}

// sameParts reports whether two mixtures list the same sets with the same weights.
func (s *StabilizerOutcomes) sameParts(o *StabilizerOutcomes) bool {
	if len(s.parts) != len(o.parts) {
		return false
	}
	used := make([]bool, len(o.parts))
	for _, p := range s.parts {
		found := false
		for j, q := range o.parts {
			if !used[j] && p.weight == q.weight && p.set.equal(q.set) {
				used[j], found = true, true
				break
			}
		}
		if !found {
			return false
		}
	}
	return true
}

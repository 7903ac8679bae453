package qcheck

import (
	"fmt"
	"slices"

	"qcheck.dev/qcheck/circuit"
)

// finalMeasureEngine proves two programs agree when their only non-unitary ops are final
// measurements, at widths the program engines cannot hold: it strips the measurements, lines up
// the qubits each classical bit reads, and hands the two unitaries to the unitary engines (the
// ZX engine at such widths). If U and V·P (P the qubit permutation that brings got's measured
// qubits onto want's) are within d up to global phase, then
//
//	‖U|0…0⟩ − e^{iφ}·V·P|0…0⟩‖ ≤ d   for some φ,
//
// and measuring the same qubits of two pure states that close gives outcome distributions within
// d in total variation (total variation is at most the trace distance √(1 − |⟨ψ|χ⟩|²), which is
// at most ‖ψ − e^{iφ}χ‖; Nielsen & Chuang §9.2). So d bounds the programs' distance above, and
// the verdict is "equivalent" when d is within the tolerance. The converse fails (a gate just
// before a measurement may change the unitary and not the distribution), so unitaries that
// differ leave the programs undecided. It comes last in the table, after the engines that decide
// programs exactly.
type finalMeasureEngine struct{}

var _ engine = finalMeasureEngine{}

func (finalMeasureEngine) name() Engine { return "final-measure" }

// work: the unitary engines estimate and limit their own work when compare calls them; this is
// the ZX engine's rewriting budget, the one that answers at these widths.
func (finalMeasureEngine) work(f *frame) float64 { return zxEngine{}.work(f) }

func (finalMeasureEngine) refuses(cfg *config, f *frame, auto bool) error {
	if f.meaning != meaningProgram {
		return fmt.Errorf("the final-measure engine compares programs only")
	}
	_, _, _, err := measuredLayout(f.want, f.got)
	return err
}

func (finalMeasureEngine) certifies(cfg *config, f *frame) string {
	return "the unitaries before the final measurements, with got's measured qubits lined up with want's, are equal within the distance given (an upper bound on the total-variation distance of the classical bits); unitaries that differ leave the programs undecided"
}

// measuredLayout returns want and got with their final measurements removed, and the output
// permutation that lines up the qubit each classical bit reads in got with the one it reads in
// want; or why the programs are not of that form.
func measuredLayout(want, got *circuit.Circuit) (u, v *circuit.Circuit, perm []int, err error) {
	if want.Qubits() != got.Qubits() {
		return nil, nil, nil, fmt.Errorf("the final-measure engine needs registers of one width, got %d and %d qubits", want.Qubits(), got.Qubits())
	}
	strip := func(c *circuit.Circuit, role string) (*circuit.Circuit, map[int]int, error) {
		final := finalMeasurements(c)
		d := circuit.New(c.Qubits())
		for i, op := range c.Ops {
			switch {
			case final != nil && final[i]:
			case op.Unitary() || op.Gate.Name == "barrier":
				d.Ops = append(d.Ops, op)
			default:
				return nil, nil, fmt.Errorf("%s's op %d (%s) is not a final measurement; the final-measure engine takes programs that only apply gates and then measure", role, i, op)
			}
		}
		return d, finalWrites(c), nil
	}
	u, wantReads, err := strip(want, "want")
	if err != nil {
		return nil, nil, nil, err
	}
	v, gotReads, err := strip(got, "got")
	if err != nil {
		return nil, nil, nil, err
	}
	n := want.Qubits()
	perm = slices.Repeat([]int{-1}, n)
	taken := make([]bool, n)
	for b, q := range wantReads {
		p, ok := gotReads[b]
		if !ok || perm[q] >= 0 && perm[q] != p || perm[q] < 0 && taken[p] {
			return nil, nil, nil, fmt.Errorf("the final-measure engine needs both programs to read each classical bit from one qubit each, consistently; bit %d is read differently", b)
		}
		perm[q], taken[p] = p, true
	}
	if len(gotReads) != len(wantReads) {
		return nil, nil, nil, fmt.Errorf("the final-measure engine needs both programs to write the same classical bits")
	}
	next := 0 // unmeasured qubits of want go to got's unmeasured qubits in order
	for q := range perm {
		if perm[q] >= 0 {
			continue
		}
		for taken[next] {
			next++
		}
		perm[q], taken[next] = next, true
	}
	return u, v, perm, nil
}

func (finalMeasureEngine) compare(cfg *config, f *frame, r *Result, full bool) error {
	u, v, perm, err := measuredLayout(f.want, f.got)
	if err != nil {
		return err
	}
	sub := *cfg
	sub.meaning, sub.perm, sub.engine = meaningUnitary, perm, Auto
	ur, err := compare(&sub, u, v, full)
	if err != nil {
		return fmt.Errorf("the unitaries before the final measurements: %v", err)
	}
	r.Measure = Distribution
	r.Certifies = fmt.Sprintf("%s; the unitaries compared by the %s engine (%s)", finalMeasureEngine{}.certifies(cfg, f), ur.Engine, ur.Certifies)
	if ur.Equivalent {
		r.Equivalent, r.Distance, r.UpperBound = true, ur.Distance, true
		return nil
	}
	r.Undecided = fmt.Sprintf("the unitaries before the final measurements are not shown equal (%s %s, %s engine), and equal distributions need not come from equal unitaries; no engine decides non-Clifford programs this wide exactly", ur.Measure, distanceWords(ur), ur.Engine)
	r.Certifies = "unsettled, so not counted as equivalent: " + r.Undecided
	return nil
}

// distanceWords writes a result's distance with its kind: "1.414", "at least 1", "at most 2e-13".
func distanceWords(r Result) string {
	switch {
	case r.LowerBound:
		return fmt.Sprintf("at least %.4g", r.Distance)
	case r.UpperBound:
		return fmt.Sprintf("at most %.4g", r.Distance)
	}
	return fmt.Sprintf("%.4g", r.Distance)
}

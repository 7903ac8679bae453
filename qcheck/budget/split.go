package budget

import (
	"fmt"
	"math"
	"strings"
)

// EvenSplit returns ε/n, the share of a total error budget ε that each of n approximated pieces
// may use so that their errors add up to at most ε (Nielsen & Chuang §4.5.3: for unitaries the
// errors add at most linearly).
func EvenSplit(eps float64, n int) (float64, error) {
	if err := checkBudget(eps); err != nil {
		return 0, err
	}
	if n <= 0 {
		return 0, fmt.Errorf("budget: cannot split among %d pieces", n)
	}
	return eps / float64(n), nil
}

// WeightedSplit divides a total budget ε among pieces in proportion to their costs:
// share_k = ε·cost_k/Σ cost. A pass gives a larger share where precision is dearer (a rotation
// whose synthesis costs more gates, a wide block); the shares still add up to ε, up to rounding. Costs must be
// finite and non-negative with a positive sum.
func WeightedSplit(eps float64, costs []float64) ([]float64, error) {
	if err := checkBudget(eps); err != nil {
		return nil, err
	}
	total := 0.0
	for k, c := range costs {
		if !(c >= 0) || math.IsInf(c, 1) {
			return nil, fmt.Errorf("budget: cost %d is %v; costs are finite and non-negative", k, c)
		}
		total += c
	}
	if !(total > 0) || math.IsInf(total, 1) {
		return nil, fmt.Errorf("budget: the %d costs add up to %v; need a finite positive total", len(costs), total)
	}
	shares := make([]float64, len(costs))
	for k, c := range costs {
		shares[k] = eps * (c / total)
	}
	return shares, nil
}

func checkBudget(eps float64) error {
	if !(eps > 0) || math.IsInf(eps, 1) {
		return fmt.Errorf("budget: ε = %v; a budget is a finite positive number", eps)
	}
	return nil
}

// OverShare returns the entries whose δ exceeds the share their pass allotted them, in recording
// order. Entries recorded with no share (zero) are not checked.
func (l *Ledger) OverShare() []Entry {
	var over []Entry
	for _, e := range l.Entries() {
		if e.Share > 0 && e.Delta > e.Share {
			over = append(over, e)
		}
	}
	return over
}

// CheckShares returns an error naming every entry whose δ exceeds its share, or nil if each entry
// stayed within the share its pass allotted it.
func (l *Ledger) CheckShares() error {
	over := l.OverShare()
	if len(over) == 0 {
		return nil
	}
	var b strings.Builder
	fmt.Fprintf(&b, "budget: %d of %d entries exceed their share:", len(over), l.Len())
	for i, e := range over {
		if i == 10 {
			fmt.Fprintf(&b, "\n  ... and %d more", len(over)-i)
			break
		}
		fmt.Fprintf(&b, "\n  entry %d at %s: δ = %.3g > share %.3g", e.Seq, e.Window, e.Delta, e.Share)
	}
	return fmt.Errorf("%s", b.String())
}

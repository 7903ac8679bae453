package budget_test

import (
	"fmt"
	"math"

	"qcheck.dev/qcheck/budget"
	"qcheck.dev/qcheck/circuit"
)

func ExampleLedger() {
	// A pass replaced rz(0.01) on qubit 4 (op 12 of the circuit before) by nothing, and p(π/4)
	// on qubit 1 (op 30) by the equal t gate (op 29 of the circuit after).
	var l budget.Ledger
	_ = l.Record(budget.Rewrite{
		Window:      budget.Window{Before: circuit.Span{Start: 12, End: 13}, After: circuit.Span{Start: 12, End: 12}, Qubits: []int{4}},
		Piece:       circuit.New(1).RZ(0.01, 0),
		Replacement: circuit.New(1),
	})
	_ = l.Record(budget.Rewrite{
		Window:      budget.Window{Before: circuit.Span{Start: 30, End: 31}, After: circuit.Span{Start: 29, End: 30}, Qubits: []int{1}},
		Piece:       circuit.New(1).P(math.Pi/4, 0),
		Replacement: circuit.New(1).T(0),
	})
	fmt.Printf("%d rewrites, certified distance ≤ %.6f\n", l.Len(), l.Bound())
	fmt.Printf("any outcome probability changes by ≤ %.6f\n", 2*l.Bound())
	// Output:
	// 2 rewrites, certified distance ≤ 0.005000
	// any outcome probability changes by ≤ 0.010000
}

// logTB stands in for a test's *testing.T in this example: it prints what Within reports.
type logTB struct{ failed bool }

func (t *logTB) Helper()                        {}
func (t *logTB) Logf(format string, a ...any)   { fmt.Printf(format+"\n", a...) }
func (t *logTB) Errorf(format string, a ...any) { t.failed = true; fmt.Printf(format+"\n", a...) }
func (t *logTB) Fatalf(format string, a ...any) { t.Errorf(format, a...) }
func (t *logTB) Failed() bool                   { return t.failed }

func ExampleWithin() {
	// In a test, t is the test's *testing.T: a pass approximated a rotation, and Within fails
	// the test (with a table of the largest contributions) if the errors add up to more than ε.
	// Here it passes silently.
	t := &logTB{}
	var l budget.Ledger
	_ = l.Record(budget.Rewrite{
		Window:      budget.Window{Before: circuit.Span{Start: 0, End: 1}, After: circuit.Span{Start: 0, End: 1}, Qubits: []int{0}},
		Piece:       circuit.New(1).RZ(0.79, 0),
		Replacement: circuit.New(1).T(0), // rz(π/4) up to phase: δ = 2 sin(|0.79 − π/4|/4)
	})
	budget.Within(t, &l, 1e-2)
	fmt.Printf("failed: %v, bound %.2e\n", t.Failed(), l.Bound())
	// Output:
	// failed: false, bound 2.30e-03
}

func ExampleWeightedSplit() {
	// Three pieces whose synthesis costs 1, 1 and 2 units: the dearer one gets twice the share.
	shares, _ := budget.WeightedSplit(1e-3, []float64{1, 1, 2})
	fmt.Printf("%.2e %.2e %.2e\n", shares[0], shares[1], shares[2])
	// Output:
	// 2.50e-04 2.50e-04 5.00e-04
}

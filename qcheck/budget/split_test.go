package budget

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

func TestEvenSplit(t *testing.T) {
	got, err := EvenSplit(1e-3, 400)
	if err != nil || got != 1e-3/400 {
		t.Errorf("EvenSplit(1e-3, 400) = %v, %v; want ε/N = %v", got, err, 1e-3/400)
	}
	for _, c := range []struct {
		eps  float64
		n    int
		want string
	}{
		{0, 3, "ε = 0"}, {math.NaN(), 3, "ε = NaN"}, {math.Inf(1), 3, "ε = +Inf"}, {1, 0, "among 0 pieces"},
	} {
		if _, err := EvenSplit(c.eps, c.n); err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("EvenSplit(%v, %d) = %v, want an error containing %q", c.eps, c.n, err, c.want)
		}
	}
}

func TestWeightedSplit(t *testing.T) {
	shares, err := WeightedSplit(0.01, []float64{1, 3, 0, 6})
	if err != nil {
		t.Fatal(err)
	}
	// ε·w_k/Σw with Σw = 10, worked by hand.
	want := []float64{0.001, 0.003, 0, 0.006}
	sum := 0.0
	for k := range want {
		if math.Abs(shares[k]-want[k]) > 1e-18 {
			t.Errorf("share %d = %v, want %v", k, shares[k], want[k])
		}
		sum += shares[k]
	}
	if math.Abs(sum-0.01) > 1e-17 {
		t.Errorf("shares add up to %v, want ε = 0.01", sum)
	}
	for _, c := range []struct {
		costs []float64
		want  string
	}{
		{[]float64{1, -1}, "cost 1 is -1"},
		{[]float64{1, math.NaN()}, "cost 1 is NaN"},
		{[]float64{0, 0}, "add up to 0"},
		{nil, "add up to 0"},
	} {
		if _, err := WeightedSplit(1, c.costs); err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("WeightedSplit(1, %v) = %v, want an error containing %q", c.costs, err, c.want)
		}
	}
}

// recordRZ records rz(θ) on qubit q replaced by nothing: δ = 2 sin(|θ|/4) (phase-free distance of
// rz(θ) from the identity, eigenphases ∓θ/2; package metric's documentation).
func recordRZ(t *testing.T, l *Ledger, op, q int, theta, share float64) {
	t.Helper()
	err := l.Record(Rewrite{Window: Window{Before: circuit.Span{Start: op, End: op + 1}, After: circuit.Span{Start: 0, End: 0}, Qubits: []int{q}},
		Piece: circuit.New(1).RZ(theta, 0), Replacement: circuit.New(1), Share: share})
	if err != nil {
		t.Fatal(err)
	}
}

func TestCheckShares(t *testing.T) {
	var l Ledger
	recordRZ(t, &l, 0, 0, 0.004, 0.01) // δ ≈ 0.002 within its share
	recordRZ(t, &l, 1, 1, 0.08, 0.01)  // δ ≈ 0.04 over
	recordRZ(t, &l, 2, 2, 0.4, 0)      // no share: not checked
	if over := l.OverShare(); len(over) != 1 || over[0].Seq != 1 {
		t.Fatalf("OverShare = %v, want entry 1 only", over)
	}
	err := l.CheckShares()
	if err == nil || !strings.Contains(err.Error(), "entry 1 at op 1 → removed (at op 0) on q1") {
		t.Errorf("CheckShares = %v, want entry 1 named with its place", err)
	}
}

// fakeTB records what a helper reports.
type fakeTB struct {
	errors, fatals []string
}

func (f *fakeTB) Helper()                   {}
func (f *fakeTB) Logf(string, ...any)       {}
func (f *fakeTB) Errorf(s string, a ...any) { f.errors = append(f.errors, fmt.Sprintf(s, a...)) }
func (f *fakeTB) Fatalf(s string, a ...any) { f.fatals = append(f.fatals, fmt.Sprintf(s, a...)) }
func (f *fakeTB) Failed() bool              { return len(f.errors)+len(f.fatals) > 0 }

func TestWithin(t *testing.T) {
	var l Ledger
	for k := 0; k < 20; k++ {
		recordRZ(t, &l, 3*k, k%5, 0.001*float64(k+1), 0)
	}
	// Σ 2 sin(0.001(k+1)/4) for k < 20 ≈ 0.0005·210 = 0.105 (small-angle sum, by hand).
	var pass fakeTB
	Within(&pass, &l, 0.2)
	if pass.Failed() {
		t.Errorf("Within failed on a kept budget: %v %v", pass.errors, pass.fatals)
	}
	var fail fakeTB
	Within(&fail, &l, 0.05)
	if len(fail.errors) != 1 {
		t.Fatalf("Within on an exceeded budget reported %v", fail.errors)
	}
	msg := fail.errors[0]
	for _, want := range []string{
		"certified bound Σδ = 0.105 is over ε = 0.05",
		"from 20 rewrites",
		"largest contributions",
		"(10 more entries)",
		"2·Σδ = 0.21",
		"Nielsen & Chuang §4.5.3",
	} {
		if !strings.Contains(msg, want) {
			t.Errorf("report lacks %q:\n%s", want, msg)
		}
	}
	// The largest first: entry 19, rz(0.02) with δ = 2 sin(0.005) ≈ 0.01, 20% of ε.
	if !strings.Contains(strings.Join(strings.Fields(msg), " "), "19 0.01 20.00% - op 57 → removed (at op 0) on q4 rz(0.02) q4 → (nothing) 18 0.0095") {
		t.Errorf("report does not start its table with entry 19:\n%s", msg)
	}
	var over fakeTB
	recordRZ(t, &l, 100, 0, 0.01, 1e-6)
	Within(&over, &l, 1)
	if len(over.errors) != 1 || !strings.Contains(over.errors[0], "1 entries exceed the share") || !strings.Contains(over.errors[0], "(over)") {
		t.Errorf("entry over its share not reported: %v", over.errors)
	}
	var bad fakeTB
	Within(&bad, &l, -1)
	if len(bad.fatals) != 1 || !strings.Contains(bad.fatals[0], "ε = -1") {
		t.Errorf("a negative budget was not refused: %v", bad.fatals)
	}
}

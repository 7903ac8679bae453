package qcheck

import (
	"math"
	"testing"

	"pgregory.net/rapid"
	"qcheck.dev/gen"
	"qcheck.dev/qcheck/circuit"
)

// measureAll measures qubit q into bit bitOf[q] at the end.
func measureAll(c *circuit.Circuit, bitOf []int) *circuit.Circuit {
	d := c.Clone()
	for q, b := range bitOf {
		d.Measure(q, b)
	}
	return d
}

// A 30-qubit program, wider than the program engines take, against its routed form: the same
// gates followed by a SWAP of qubits 4 and 9 whose results are read from each other's qubit
// (a SWAP before measurement is a relabelling of the results; common practice of routers). The
// final-measure engine proves them equivalent; the same program with a CX dropped is never
// called equivalent.
func TestFinalMeasureEngineAtWidth(t *testing.T) {
	const n = 30
	base := circuit.New(n).H(0)
	for q := 0; q+1 < n; q++ {
		base.CX(q, q+1).T(q + 1)
	}
	bits := make([]int, n)
	for q := range bits {
		bits[q] = q
	}
	want := measureAll(base, bits)
	routed := base.Clone().SWAP(4, 9)
	rbits := append([]int(nil), bits...)
	rbits[4], rbits[9] = 9, 4
	got := measureAll(routed, rbits)
	r, err := Compare(want, got)
	if err != nil {
		t.Fatal(err)
	}
	if r.Engine != "final-measure" || !r.Equivalent || !r.UpperBound {
		t.Fatalf("engine %v, equivalent %v, upper bound %v, undecided %q", r.Engine, r.Equivalent, r.UpperBound, r.Undecided)
	}
	bad := circuit.New(n)
	bad.Ops = append(bad.Ops, want.Ops[:5]...)
	bad.Ops = append(bad.Ops, want.Ops[6:]...) // the CX(2, 3) dropped
	r, err = Compare(want, bad)
	if err != nil {
		t.Fatal(err)
	}
	if r.Equivalent {
		t.Fatalf("a dropped CX was called equivalent: %s", r.Report())
	}
	// A diagonal gate just before a measurement changes the unitary but not the distribution: the
	// engine cannot tell, and says undecided rather than "differs".
	diag := measureAll(base.Clone().RZ(0.7, 5), bits)
	r, err = Compare(want, diag)
	if err != nil {
		t.Fatal(err)
	}
	if r.Equivalent || r.Undecided == "" {
		t.Fatalf("rz before measurement: equivalent %v, undecided %q; want undecided", r.Equivalent, r.Undecided)
	}
}

// Soundness against the exact program engine on small registers: whenever the final-measure
// engine calls two measured programs equivalent, the exact distributions agree, and its bound
// is at least their total-variation distance.
func TestFinalMeasureAgreesWithExactEngine(t *testing.T) {
	rapid.Check(t, func(rt *rapid.T) {
		g := gen.Circuit(gen.Options{Qubits: 3, MaxOps: 12, GateSet: []string{"h", "t", "s", "cx", "rz", "swap"}})
		a, b := g.Draw(rt, "a"), g.Draw(rt, "b")
		perm := rapid.Permutation([]int{0, 1, 2}).Draw(rt, "bits")
		want, got := measureAll(a, []int{0, 1, 2}), measureAll(b, perm)
		fm, err := Compare(want, got, UseEngine("final-measure"))
		if err != nil {
			rt.Fatal(err)
		}
		exact, err := Compare(want, got, UseEngine("program"))
		if err != nil {
			rt.Fatal(err)
		}
		if fm.Equivalent && !exact.Equivalent {
			rt.Fatalf("final-measure says equivalent (bound %g), the exact distance is %g", fm.Distance, exact.Distance)
		}
		if fm.Equivalent && exact.Distance > fm.Distance+1e-9 || math.IsNaN(fm.Distance) {
			rt.Fatalf("bound %g below the exact distance %g", fm.Distance, exact.Distance)
		}
	})
}

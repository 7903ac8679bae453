package qcheck

import (
	"math"
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

func TestProgramsByDefault(t *testing.T) {
	// Issue 12's case: the same program with its measurements written into swapped bits. X on
	// qubit 0 then reads 01 (bit 0 set) against 10: total variation 1.
	a := circuit.New(2).X(0).Measure(0, 0).Measure(1, 1)
	b := circuit.New(2).X(0).Measure(0, 1).Measure(1, 0)
	r, err := Compare(a, b)
	if err != nil {
		t.Fatal(err)
	}
	if r.Equivalent || r.Distance != 1 || r.Meaning != "program" || r.Outcome == "" {
		t.Fatalf("swapped bits: %+v", r)
	}
	if !strings.Contains(r.Report(), "programs: the distributions of their classical bits") {
		t.Errorf("the report does not say programs were compared:\n%s", r.Report())
	}
	// The routed program on three qubits measures the moved qubit into the same bit.
	routed := circuit.New(3).X(2).Measure(2, 0).Measure(1, 1)
	if r, err := Compare(a, routed); err != nil || !r.Equivalent {
		t.Errorf("routed program: %+v, %v", r, err)
	}
	if _, err := Compare(a, routed, AsProgram(), OutputPermutation([]int{0, 1, 2})); err == nil {
		t.Error("AsProgram with OutputPermutation accepted")
	}
	// A unitary circuit stays unitary by default.
	if r, err := Compare(circuit.New(1).H(0), circuit.New(1).H(0)); err != nil || r.Meaning != "unitary" {
		t.Errorf("unitary default: %+v, %v", r, err)
	}
}

func TestFromZero(t *testing.T) {
	// cz after h on qubit 0 alone acts on |00⟩ and |01⟩ only, where it is the identity (N&C
	// §4.3): invisible from |00⟩, visible on every input.
	a, b := circuit.New(2).H(0), circuit.New(2).H(0).CZ(0, 1)
	if r, err := Compare(a, b, FromZero()); err != nil || !r.Equivalent || r.Engine != "zero-state" {
		t.Errorf("from zero: %+v, %v", r, err)
	}
	if r, err := Compare(a, b); err != nil || r.Equivalent {
		t.Errorf("every input: %+v, %v", r, err)
	}
	// rx(θ) against nothing: distance √(2 − 2cos(θ/2)) from |0⟩ (N&C §4.2).
	r, err := Compare(circuit.New(1), circuit.New(1).RX(0.5, 0), FromZero())
	if err != nil || math.Abs(r.Distance-math.Sqrt(2-2*math.Cos(0.25))) > 1e-12 || r.Equivalent {
		t.Errorf("rx: %+v, %v", r, err)
	}
	// Measuring only qubit 1 of a Bell pair and of |0⟩|+⟩: both fair coins.
	bell, plus := circuit.New(2).H(0).CX(0, 1), circuit.New(2).H(1)
	if r, err := Compare(bell, plus, FromZero(), Measured(1)); err != nil || !r.Equivalent {
		t.Errorf("measured subset: %+v, %v", r, err)
	}
	if r, err := Compare(bell, plus, FromZero(), Measured(0, 1)); err != nil || math.Abs(r.Distance-0.5) > 1e-12 {
		t.Errorf("both measured: %+v, %v; want TV ½", r, err)
	}
}

func TestCliffordProgramsAtWidth(t *testing.T) {
	c := circuit.New(300)
	for q := 0; q < 300; q++ {
		c.H(q).Measure(q, q)
	}
	d := c.Clone()
	d.Ops = d.Ops[1:] // qubit 0 reads 0 always
	r, err := Compare(c, d)
	if err != nil {
		t.Fatal(err)
	}
	if r.Engine != "stabilizer-program" || r.Distance != 0.5 || r.Equivalent {
		t.Errorf("%+v; want the stabilizer-program engine at distance ½", r)
	}
}

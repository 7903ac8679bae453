package shrink_test

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/shrink"
)

// hThenCXTarget fails when an h on some qubit is followed, later, by a cx whose target is that
// qubit, with the cx's control above it: Minimize must reach h q1; cx q0,q1 whatever noise and
// qubits it starts from (a property whose minimal cases are known by hand).
func hThenCXTarget(c *circuit.Circuit) bool {
	for i, op := range c.Ops {
		if op.Gate.Name != "h" {
			continue
		}
		for _, later := range c.Ops[i+1:] {
			if later.Gate.Name == "cx" && later.Qubits[1] == op.Qubits[0] && later.Qubits[0] < later.Qubits[1] {
				return true
			}
		}
	}
	return false
}

func TestMinimizeReachesTheKnownMinimum(t *testing.T) {
	c := circuit.New(6).X(0).H(4).T(2).RZ(0.3, 4).CX(5, 1).CX(2, 4).H(3).CZ(0, 5)
	got := shrink.Minimize(c, hThenCXTarget)
	if want := circuit.New(6).H(1).CX(0, 1); !got.Equal(want) {
		t.Errorf("Minimize = %#v, want %#v", got, want)
	}
	if err := shrink.Check(got, hThenCXTarget); err != nil {
		t.Error(err)
	}
	if c.Len() != 8 {
		t.Error("Minimize modified its input")
	}
}

func TestMinimizeSimplifiesAngles(t *testing.T) {
	// Fails when some rz angle, reduced to (−π, π], exceeds π/3 in size: the simplest special
	// angle that does is π/2 (π/4 < π/3 does not), after 0 and ±π/4.
	big := func(c *circuit.Circuit) bool {
		for _, op := range c.Ops {
			if op.Gate.Name == "rz" && math.Abs(math.Remainder(op.Gate.Params[0], 2*math.Pi)) > math.Pi/3 {
				return true
			}
		}
		return false
	}
	got := shrink.Minimize(circuit.New(2).RZ(0.1, 1).RZ(2.9, 1), big)
	if want := circuit.New(2).RZ(math.Pi/2, 0); !got.Equal(want) {
		t.Errorf("Minimize = %#v, want %#v", got, want)
	}
}

func TestCheckNamesTheEditThatKeepsTheFailure(t *testing.T) {
	err := shrink.Check(circuit.New(3).T(0).H(2).CX(1, 2), hThenCXTarget)
	if err == nil || !strings.Contains(err.Error(), "remove op 0") {
		t.Errorf("Check = %v, want an error naming the removal of op 0", err)
	}
	err = shrink.Check(circuit.New(3).H(2).CX(1, 2), hThenCXTarget)
	if err == nil || !strings.Contains(err.Error(), "qubit") {
		t.Errorf("Check = %v, want an error naming a qubit move", err)
	}
	if err := shrink.Check(circuit.New(3).H(0), hThenCXTarget); err == nil {
		t.Error("Check of a circuit that does not fail: no error")
	}
}

func TestSimpler(t *testing.T) {
	if s := shrink.Simpler(0); len(s) != 0 {
		t.Errorf("Simpler(0) = %v, want none", s)
	}
	if s := shrink.Simpler(-math.Pi / 2); len(s) != 4 || s[3] != math.Pi/2 {
		t.Errorf("Simpler(−π/2) = %v, want 0, π/4, −π/4, π/2", s)
	}
	if s := shrink.Simpler(2*math.Pi + 1e-9); len(s) != 13 {
		t.Errorf("Simpler(2π + 1e-9) = %v, want all 13 special angles", s)
	}
}

// A failure found on a long circuit is brought back to the ops that matter.
func ExampleMinimize() {
	c := circuit.New(4).T(0).H(3).X(1).CX(2, 3).RZ(0.5, 2)
	fmt.Printf("%#v\n", shrink.Minimize(c, hThenCXTarget))
	// Output:
	// circuit.New(4).H(1).CX(0, 1)
}

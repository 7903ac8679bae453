package gen

import (
	"strings"
	"testing"

	"pgregory.net/rapid"
	"qcheck.dev/qcheck/circuit"
)

func count(c *circuit.Circuit, name string) int {
	n := 0
	for _, op := range c.Ops {
		if op.Gate.Name == name {
			n++
		}
	}
	return n
}

func conditioned(c *circuit.Circuit) int {
	n := 0
	for _, op := range c.Ops {
		if op.If != nil {
			n++
		}
	}
	return n
}

func TestProgramDrawsValidPrograms(t *testing.T) {
	g := Program(ProgramOptions{Options: Options{Qubits: 4, MaxOps: 20}, Bits: 3, Measure: 3, Reset: 2, If: 5})
	seen := map[string]int{}
	rapid.Check(t, func(t *rapid.T) {
		c := g.Draw(t, "program")
		if err := c.Validate(); err != nil {
			t.Fatal(err)
		}
		if c.Qubits() != 4 || c.Bits() != 3 {
			t.Fatalf("%d qubits and %d bits, want 4 and 3", c.Qubits(), c.Bits())
		}
		// The last three ops measure qubits 0, 1, 2 into bits 0, 1, 2.
		n := len(c.Ops)
		for q := 0; q < 3; q++ {
			op := c.Ops[n-3+q]
			if op.Gate.Name != "measure" || op.Qubits[0] != q || op.Bits[0] != q || op.If != nil {
				t.Fatalf("op %d is %v, want measure q%d -> c%d", n-3+q, op, q, q)
			}
		}
		seen["measure"] += count(c, "measure") - 3
		seen["reset"] += count(c, "reset")
		seen["if"] += conditioned(c)
	})
	for _, k := range []string{"measure", "reset", "if"} {
		if seen[k] == 0 {
			t.Errorf("no %s in 100 programs", k)
		}
	}
}

func TestProgramWeights(t *testing.T) {
	// A negative weight means never; Unmeasured leaves out the final measurements.
	g := Program(ProgramOptions{Options: Options{Qubits: 2, MaxOps: 10}, Measure: -1, Reset: -1, If: -1, Unmeasured: true})
	rapid.Check(t, func(t *rapid.T) {
		c := g.Draw(t, "program")
		if !c.Unitary() {
			t.Fatalf("a measurement, reset or condition with every weight negative: %v", c.Ops)
		}
	})
}

func TestProgramShrinks(t *testing.T) {
	// A property that fails on any conditioned op shrinks to a program with a single
	// conditioned op on one bit and nothing else but the final measurements.
	g := Program(ProgramOptions{Options: Options{Qubits: 3, MaxOps: 20}, Measure: 2, Reset: 2, If: 2})
	c := shrunk(t, g, func(c *circuit.Circuit) bool { return conditioned(c) > 0 })
	if len(c.Ops) != 4 || conditioned(c) != 1 || len(c.Ops[0].If.Bits) != 1 || c.Ops[0].If.Bits[0] != 0 {
		t.Errorf("shrunk to %v, want one conditioned gate reading c0 and three measurements", c.Ops)
	}
	// One that fails on a reset after a measurement shrinks to just those two.
	c = shrunk(t, g, func(c *circuit.Circuit) bool {
		m := false
		for _, op := range c.Ops {
			m = m || op.Gate.Name == "measure"
			if m && op.Gate.Name == "reset" {
				return true
			}
		}
		return false
	})
	if len(c.Ops) != 5 || c.Ops[0].Gate.Name != "measure" || c.Ops[1].Gate.Name != "reset" {
		t.Errorf("shrunk to %v, want a measurement, a reset and three measurements", c.Ops)
	}
}

func TestProgramOptionErrors(t *testing.T) {
	for _, tc := range []struct {
		opts ProgramOptions
		want string
	}{
		{ProgramOptions{Bits: -1}, "Bits = -1"},
		{ProgramOptions{Options: Options{Qubits: -2}}, "Qubits = -2"},
	} {
		if _, err := tc.opts.resolve(); err == nil || !strings.Contains(err.Error(), tc.want) {
			t.Errorf("%+v: error %v, want one naming %q", tc.opts, err, tc.want)
		}
	}
}

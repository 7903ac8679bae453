package qcheck

import (
	"errors"
	"flag"
	"strconv"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// Small passes for the tests, correct and deliberately wrong.

// selfInverse lists gates equal to their own inverse (textbook: H² = X² = Z² = CX² = CZ² = SWAP² = I).
var selfInverse = map[string]bool{"h": true, "x": true, "z": true, "cx": true, "cz": true, "swap": true}

// cancelPairs removes adjacent equal self-inverse ops, repeatedly (a correct pass).
func cancelPairs(c *circuit.Circuit) (*circuit.Circuit, error) {
	out := circuit.New(c.Qubits())
	for _, op := range c.Ops {
		if n := len(out.Ops); n > 0 && selfInverse[op.Gate.Name] && out.Ops[n-1].Equal(op) {
			out.Ops = out.Ops[:n-1]
			continue
		}
		out.AppendOp(op)
	}
	return out, nil
}

// phaseToRZ replaces every p(θ) by rz(θ): each differs by the global phase e^{iθ/2}, so the
// circuit keeps its meaning up to global phase (a correct pass, except under ExactPhase).
func phaseToRZ(c *circuit.Circuit) (*circuit.Circuit, error) {
	out := c.Clone()
	for i, op := range out.Ops {
		if op.Gate.Name == "p" {
			out.Ops[i].Gate.Name = "rz"
		}
	}
	return out, nil
}

// dropT forgets every t gate (wrong).
func dropT(c *circuit.Circuit) (*circuit.Circuit, error) {
	out := circuit.New(c.Qubits())
	for _, op := range c.Ops {
		if op.Gate.Name != "t" {
			out.AppendOp(op)
		}
	}
	return out, nil
}

// rzThroughTarget moves rz past a following cx on the cx's target, as if they commuted (wrong:
// Z-rotations commute with a CX's control, not its target).
func rzThroughTarget(c *circuit.Circuit) (*circuit.Circuit, error) {
	out := c.Clone()
	for i := 0; i+1 < len(out.Ops); i++ {
		a, b := out.Ops[i], out.Ops[i+1]
		if a.Gate.Name == "rz" && b.Gate.Name == "cx" && (a.Qubits[0] == b.Qubits[0] || a.Qubits[0] == b.Qubits[1]) {
			out.Ops[i], out.Ops[i+1] = b, a
			i++
		}
	}
	return out, nil
}

// mutating cancels pairs but edits its input first (wrong).
func mutating(c *circuit.Circuit) (*circuit.Circuit, error) {
	for i := range c.Ops {
		if c.Ops[i].Gate.Name == "s" {
			c.Ops[i].Gate.Name = "z"
		}
	}
	return cancelPairs(c)
}

// panicking fails on any swap (wrong).
func panicking(c *circuit.Circuit) (*circuit.Circuit, error) {
	for _, op := range c.Ops {
		if op.Gate.Name == "swap" {
			var ops []circuit.Op
			_ = ops[len(c.Ops)] // index out of range
		}
	}
	return c, nil
}

// refusing returns an error for circuits with a cz (wrong for a generator that makes them).
func refusing(c *circuit.Circuit) (*circuit.Circuit, error) {
	for i, op := range c.Ops {
		if op.Gate.Name == "cz" {
			return nil, errors.New("op " + strconv.Itoa(i) + ": cz is not supported")
		}
	}
	return c, nil
}

// widening returns its input on a register one qubit wider (wrong without Ancillas).
func widening(c *circuit.Circuit) (*circuit.Circuit, error) {
	out := circuit.New(c.Qubits() + 1)
	out.Compose(c)
	return out, nil
}

// withSeed fixes rapid's seed for the rest of the test, so that statistical outcomes are
// reproducible.
func withSeed(t *testing.T, seed uint64) {
	t.Helper()
	f := flag.Lookup("rapid.seed")
	old := f.Value.String()
	if err := f.Value.Set(strconv.FormatUint(seed, 10)); err != nil {
		t.Fatal(err)
	}
	t.Cleanup(func() { _ = f.Value.Set(old) })
}

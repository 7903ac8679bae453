package qcheck

import (
	"math"
	"strings"
	"testing"

	"pgregory.net/rapid"
	"qcheck.dev/qcheck/circuit"
)

// mergeRZ is the rule rz(a)·rz(b) = rz(a+b) on one qubit (rotations about one axis add).
func mergeRZ(t *rapid.T) (left, right *circuit.Circuit) {
	a := rapid.Float64Range(-math.Pi, math.Pi).Draw(t, "a")
	b := rapid.Float64Range(-math.Pi, math.Pi).Draw(t, "b")
	return circuit.New(1).RZ(a, 0).RZ(b, 0), circuit.New(1).RZ(a+b, 0)
}

// mergeRZPass applies mergeRZ to neighbouring ops with a correct matcher: both rz, same qubit.
func mergeRZPass(c *circuit.Circuit) (*circuit.Circuit, error) {
	return mergeWith(c, func(a, b circuit.Op) bool { return a.Qubits[0] == b.Qubits[0] })
}

// mergeRZAnyQubit has a matcher bug: it merges neighbouring rz ops on different qubits too.
func mergeRZAnyQubit(c *circuit.Circuit) (*circuit.Circuit, error) {
	return mergeWith(c, func(a, b circuit.Op) bool { return true })
}

func mergeWith(c *circuit.Circuit, match func(a, b circuit.Op) bool) (*circuit.Circuit, error) {
	out := circuit.New(c.Qubits())
	for _, op := range c.Ops {
		n := len(out.Ops)
		if n > 0 && op.Gate.Name == "rz" && out.Ops[n-1].Gate.Name == "rz" && match(out.Ops[n-1], op) {
			out.Ops[n-1].Gate.Params[0] += op.Gate.Params[0]
			continue
		}
		out.AppendOp(op)
	}
	return out, nil
}

func TestCheckRuleAcceptsACorrectRuleAndPass(t *testing.T) {
	CheckRule(t, mergeRZ, mergeRZPass)
	CheckRule(t, mergeRZ, nil)
}

func TestCheckRuleCatchesAWrongRule(t *testing.T) {
	withSeed(t, 6)
	wrong := func(t *rapid.T) (*circuit.Circuit, *circuit.Circuit) {
		a := rapid.Float64Range(-math.Pi, math.Pi).Draw(t, "a")
		b := rapid.Float64Range(-math.Pi, math.Pi).Draw(t, "b")
		return circuit.New(1).RZ(a, 0).RZ(b, 0), circuit.New(1).RZ(a-b, 0)
	}
	h := &recordTB{name: "wrong rule"}
	CheckRule(h, wrong, nil)
	if !h.failed || !strings.Contains(strings.Join(h.errors, "\n"), "the rule itself is wrong") {
		t.Errorf("a wrong rule passed: %q", h.errors)
	}
}

// The rule is right, but the pass's matcher ignores qubits: only the embedding on a wider
// register with other rz ops nearby exposes it.
func TestCheckRuleCatchesAMatcherBug(t *testing.T) {
	withSeed(t, 7)
	h := &recordTB{name: "matcher bug"}
	CheckRule(h, mergeRZ, mergeRZAnyQubit)
	if !h.failed {
		t.Fatal("a matcher that ignores qubits passed")
	}
	all := strings.Join(append(h.errors, h.logs...), "\n")
	for _, s := range []string{"the pass changes a", "the rule's left side was placed at ops"} {
		if !strings.Contains(all, s) {
			t.Errorf("output lacks %q:\n%s", s, all)
		}
	}
}

func TestCheckRuleRefuses(t *testing.T) {
	h := &recordTB{name: "bad options"}
	CheckRule(h, mergeRZ, nil, OutputPermutation([]int{0}))
	if !h.failed || !strings.Contains(strings.Join(h.errors, ""), "rule checks take no OutputPermutation") {
		t.Errorf("got %q", h.errors)
	}
	h = &recordTB{name: "uneven sides"}
	CheckRule(h, func(t *rapid.T) (*circuit.Circuit, *circuit.Circuit) {
		return circuit.New(1).X(0), circuit.New(2).X(0)
	}, nil)
	if !h.failed || !strings.Contains(strings.Join(h.errors, ""), "left has 1 qubit(s) and right 2") {
		t.Errorf("got %q", h.errors)
	}
}

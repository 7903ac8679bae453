package qcheck

import (
	"fmt"
	"math"

	"pgregory.net/rapid"
	"qcheck.dev/qcheck/circuit"
)

// Rule is a local rewrite rule: from parameters it draws with t (angles, a choice of gates), it
// returns the pattern a pass looks for (left) and what the pass puts in its place (right), two
// circuits of the same small width whose qubit i is the rule's i-th operand.
type Rule func(t *rapid.T) (left, right *circuit.Circuit)

// Limits of the random surroundings CheckRule embeds a rule in.
const (
	ruleExtraQubits = 3 // at most this many qubits besides the rule's
	ruleContextOps  = 6 // at most this many ops before and after the rule
)

// ruleContextGates are the common gates CheckRule surrounds a rule with.
var ruleContextGates = []string{"h", "x", "s", "t", "sdg", "rz", "rx", "cx", "cz"}

// CheckRule checks a rewrite rule in two steps, each over many draws of its parameters:
//
//  1. the rule itself: left and right must be equivalent under the options;
//  2. the pass that applies it, in context: left is embedded at a random position of a random
//     circuit on a wider register, its qubits mapped to random qubits of that register, and the
//     pass must keep that circuit's meaning. The surrounding ops are drawn from common gates and
//     from the rule's own gates, so that a matcher that ignores qubits, reads through
//     intervening gates or misplaces its result is caught.
//
// With a nil pass only the first step runs. The options apply to both steps; options that name
// qubits (OutputPermutation, Ancillas, Measured) describe a whole register, not a rule, and are
// refused. Like Preserves, a failure is shrunk and reported once, with rapid's replay line.
func CheckRule(t TB, rule Rule, pass Pass, opts ...Option) {
	t.Helper()
	cfg, err := ruleConfig(opts)
	if err != nil {
		t.Fatalf("qcheck.CheckRule: %v", err)
		return
	}
	runProperty(t, "qcheck.CheckRule", ruleProperty(cfg, rule, pass))
}

// RuleProperty returns the property CheckRule checks, for rapid.Check and rapid.MakeFuzz (see
// Property for the fuzz target). Bad options fail every check with their error.
func RuleProperty(rule Rule, pass Pass, opts ...Option) func(*rapid.T) {
	cfg, err := ruleConfig(opts)
	if err != nil {
		return func(t *rapid.T) { t.Fatalf("qcheck: %v", err) }
	}
	return ruleProperty(cfg, rule, pass)
}

func ruleConfig(opts []Option) (*config, error) {
	cfg, err := newConfig(opts)
	if err != nil {
		return nil, err
	}
	if cfg.perm != nil || len(cfg.ancillas) > 0 || cfg.measuredSet {
		return nil, fmt.Errorf("rule checks take no OutputPermutation, Ancillas or Measured option: a rule's qubits are mapped onto random registers")
	}
	return cfg, nil
}

func ruleProperty(cfg *config, rule Rule, pass Pass) func(*rapid.T) {
	var s subject
	if pass != nil {
		s = pass.subject()
	}
	return func(t *rapid.T) {
		left, right := rule(t)
		if err := checkSides(left, right); err != nil {
			t.Fatalf("qcheck: the rule is ill formed: %v", err)
		}
		r, err := compare(cfg, left, right, false)
		if err != nil {
			t.Fatalf("qcheck: comparing the rule's sides: %v", err)
		}
		if !r.Equivalent {
			t.Log(lazyResult{&r})
			t.Fatalf("qcheck: the rule itself is wrong: %s %.4g > tolerance %g between its left and right sides (want = left, got = right)", r.Measure, r.Distance, r.Tolerance)
		}
		if s == nil {
			return
		}
		in, at := embed(t, left)
		if f := trial(cfg, s, in); f != nil {
			t.Logf("the rule's left side was placed at ops %d–%d, its qubits 0..%d on qubits %v", at.start, at.start+left.Len()-1, left.Qubits()-1, at.qubits)
			failWith(t, f)
		}
	}
}

// checkSides checks that the two sides of a rule are valid circuits of the same width.
func checkSides(left, right *circuit.Circuit) error {
	switch {
	case left == nil || right == nil:
		return fmt.Errorf("a side is nil")
	case left.Qubits() != right.Qubits():
		return fmt.Errorf("left has %d qubit(s) and right %d; both sides act on the rule's operands", left.Qubits(), right.Qubits())
	}
	if err := left.Validate(); err != nil {
		return fmt.Errorf("left: %w", err)
	}
	if err := right.Validate(); err != nil {
		return fmt.Errorf("right: %w", err)
	}
	return nil
}

// placement records where embed put the rule.
type placement struct {
	start  int
	qubits []int
}

// embed draws a wider register, a mapping of the rule's qubits into it, and random ops before and
// after, and returns the circuit with left in the middle.
func embed(t *rapid.T, left *circuit.Circuit) (*circuit.Circuit, placement) {
	k := left.Qubits()
	w := k + rapid.IntRange(0, ruleExtraQubits).Draw(t, "extra qubits")
	all := make([]int, w)
	for i := range all {
		all[i] = i
	}
	mapping := rapid.Permutation(all).Draw(t, "qubit mapping")[:k]
	ops := rapid.Map(rapid.SliceOfN(contextOps(left, w), 0, ruleContextOps), func(ops []circuit.Op) drawn {
		c := circuit.New(w)
		c.Ops = ops
		return drawn{c}
	})
	before := ops.Draw(t, "ops before").c
	after := ops.Draw(t, "ops after").c
	c := circuit.New(w)
	c.Ops = append(c.Ops, before.Ops...)
	c.Ops = append(c.Ops, relabel(left, mapping, w).Ops...)
	c.Ops = append(c.Ops, after.Ops...)
	return c.Clone(), placement{start: before.Len(), qubits: mapping}
}

// contextOps generates single ops on a register of w qubits: common gates, and the gates of the
// rule's left side with fresh angles.
func contextOps(left *circuit.Circuit, w int) *rapid.Generator[circuit.Op] {
	var gates []circuit.Gate
	seen := map[string]bool{}
	for _, op := range left.Ops {
		if op.Gate.Unitary() && !seen[op.Gate.Name] && op.Gate.Qubits() <= w {
			seen[op.Gate.Name] = true
			gates = append(gates, op.Gate)
		}
	}
	for _, name := range ruleContextGates {
		spec, _ := circuit.Lookup(name)
		if !seen[name] && spec.Qubits <= w {
			g, _ := circuit.NewGate(name, make([]float64, spec.Params)...)
			gates = append(gates, g)
		}
	}
	return rapid.Custom(func(t *rapid.T) circuit.Op {
		g := rapid.SampledFrom(gates).Draw(t, "gate").Clone()
		for i := range g.Params {
			g.Params[i] = contextAngle.Draw(t, "angle")
		}
		all := make([]int, w)
		for i := range all {
			all[i] = i
		}
		qs := rapid.Permutation(all).Draw(t, "qubits")[:g.Qubits()]
		return circuit.Op{Gate: g, Qubits: qs}
	})
}

// contextAngle draws multiples of π/4 (where rewrite rules have special cases) or any angle.
var contextAngle = rapid.OneOf(
	rapid.Map(rapid.IntRange(-8, 8), func(k int) float64 { return float64(k) * math.Pi / 4 }),
	rapid.Float64Range(-2*math.Pi, 2*math.Pi),
)

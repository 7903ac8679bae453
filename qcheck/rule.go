package qcheck

import (
	"fmt"

	"pgregory.net/rapid"
	"qcheck.dev/gen"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/param"
)

// sides are what a rule returns: two circuits, or two parametric circuits of package param, whose
// angles are affine expressions of named parameters (rz(a+b)).
type sides interface {
	*circuit.Circuit | *param.Circuit
}

// Limits of the random surroundings CheckRule embeds a rule in.
const (
	ruleExtraQubits = 3 // at most this many qubits besides the rule's
	ruleContextOps  = 6 // at most this many ops before and after the rule
)

// ruleGateWeight is how much more often the rule's own gates appear around it than the common
// gates: a matcher bug needs a gate of the pattern nearby to show.
const ruleGateWeight = 4

// ruleContextGates are the common gates CheckRule surrounds a rule with.
var ruleContextGates = []string{"h", "x", "s", "t", "sdg", "rz", "rx", "cx", "cz"}

// CheckRule checks a local rewrite rule. The rule, from parameters it draws with t (angles, a
// choice of gates), returns the pattern a pass looks for (left) and what the pass puts in its
// place (right): two circuits of the same small width whose qubit i is the rule's i-th operand.
// It is checked in two steps, each over many draws of its parameters:
//
//  1. the rule itself: left and right must be equivalent under the options;
//  2. the pass that applies it, in context: left is embedded at a random position of a random
//     circuit on a wider register, its qubits mapped to random qubits of that register, and the
//     pass must keep that circuit's meaning. The surrounding ops are drawn by gen.Circuit from
//     common gates and the rule's own gates, so that a matcher that ignores qubits, reads
//     through intervening gates or misplaces its result is caught.
//
// With a nil pass only the first step runs. The options apply to both steps; options that name
// qubits (OutputPermutation, Ancillas, Measured) describe a whole register, not a rule, and are
// refused. Like Preserves, a failure is shrunk and reported once, with rapid's replay line.
//
// When the rule returns parametric circuits (package param), step 1 is a proof for every value
// of the parameters (param.Prove, up to global phase or exactly with ExactPhase, in the operator
// norm), made once for each distinct pair the rule returns; a refutation fails with its
// counterexample, and a pair that can be neither proved nor refuted fails as undecided. Step 2
// then draws each parameter with gen.Angle, which favours branch points, and checks the pass on
// the bound left side as above.
func CheckRule[S interface {
	*circuit.Circuit | *param.Circuit
}](t TB, rule func(t *rapid.T) (left, right S), pass Pass, opts ...Option) {
	t.Helper()
	cfg, err := ruleConfig[S](rule == nil, opts)
	if err != nil {
		t.Fatalf("qcheck.CheckRule: %v", err)
		return
	}
	runProperty(t, "qcheck.CheckRule", ruleProperty(cfg, rule, pass))
}

// RuleProperty returns the property CheckRule checks, for rapid.Check and rapid.MakeFuzz (see
// Property for the fuzz target). Bad options fail every check with their error.
func RuleProperty[S interface {
	*circuit.Circuit | *param.Circuit
}](rule func(t *rapid.T) (left, right S), pass Pass, opts ...Option) func(*rapid.T) {
	cfg, err := ruleConfig[S](rule == nil, opts)
	if err != nil {
		return func(t *rapid.T) {
			t.Helper()
			t.Fatalf("qcheck: %v", err)
		}
	}
	return ruleProperty(cfg, rule, pass)
}

func ruleConfig[S sides](nilRule bool, opts []Option) (*config, error) {
	if nilRule {
		return nil, fmt.Errorf("the rule is nil")
	}
	cfg, err := newConfig(opts)
	if err != nil {
		return nil, err
	}
	if err := cfg.registerFree(); err != nil {
		return nil, err
	}
	var zero S
	if _, ok := any(zero).(*param.Circuit); ok && cfg.measure != OperatorNorm {
		return nil, fmt.Errorf("a rule with parameters is proved in the operator norm; UseMeasure(%v) does not apply to it", cfg.measure)
	}
	return cfg, nil
}

func ruleProperty[S sides](cfg *config, rule func(t *rapid.T) (left, right S), pass Pass) func(*rapid.T) {
	var s subject
	if pass != nil {
		s = pass.subject()
	}
	var proofs proofCache
	return func(t *rapid.T) {
		t.Helper()
		l, r := rule(t)
		var left *circuit.Circuit
		switch l := any(l).(type) {
		case *circuit.Circuit:
			left = checkRuleSides(t, cfg, l, any(r).(*circuit.Circuit))
		case *param.Circuit:
			left = proveRuleSides(t, cfg, &proofs, l, any(r).(*param.Circuit))
		}
		if s == nil {
			return
		}
		in, at := embed(t, left)
		if f := trial(cfg, s, in); f != nil {
			t.Logf("the rule's left side was placed at ops %d–%d, its qubits 0..%d on qubits %v", at.start, at.start+left.Len()-1, left.Qubits()-1, at.qubits)
			failWith(t, f, nil)
		}
	}
}

// checkRuleSides is step 1 of CheckRule for circuits: the sides must be equivalent. It returns
// the left side.
func checkRuleSides(t *rapid.T, cfg *config, left, right *circuit.Circuit) *circuit.Circuit {
	if err := checkSides(left, right); err != nil {
		t.Fatalf("qcheck: the rule is ill formed: %v", err)
	}
	r, err := compare(cfg, left, right, false)
	if err != nil {
		t.Fatalf("qcheck: comparing the rule's sides: %v", err)
	}
	if !r.Equivalent {
		t.Log(lazyResult{&r})
		t.Fatalf("qcheck: the rule itself is wrong: %s between its left and right sides (want = left, got = right)", r.verdict())
	}
	return left
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

// embed draws a wider register, a placement of the rule's qubits on it (gen.Embed) and random
// circuits before and after (gen.Circuit), and returns the circuit with left in the middle.
func embed(t *rapid.T, left *circuit.Circuit) (*circuit.Circuit, placement) {
	w := left.Qubits() + rapid.IntRange(0, ruleExtraQubits).Draw(t, "extra qubits")
	placed := rapid.Map(gen.Embed(left, w), func(e gen.Embedding) drawnPlacement { return drawnPlacement(e) }).Draw(t, "placement")
	around := gen.Circuit(contextOptions(left, w))
	before := around.Draw(t, "ops before")
	after := around.Draw(t, "ops after")
	c := circuit.New(w)
	c.Ops = append(c.Ops, before.Ops...)
	c.Ops = append(c.Ops, placed.Circuit.Ops...)
	c.Ops = append(c.Ops, after.Ops...)
	return c.Clone(), placement{start: before.Len(), qubits: placed.Qubits}
}

// drawnPlacement logs a placement by where the rule's qubits went.
type drawnPlacement gen.Embedding

// GoString implements fmt.GoStringer for rapid's log of draws.
func (d drawnPlacement) GoString() string { return fmt.Sprintf("rule qubits on %v", d.Qubits) }

// contextOptions are the surroundings of a rule on w qubits: the rule's own gates (custom ones
// included, listed first and drawn more often) and common gates, so that a matcher that ignores qubits, reads through
// intervening gates or misplaces its result meets the situations that expose it.
func contextOptions(left *circuit.Circuit, w int) gen.Options {
	opts := gen.Options{Qubits: w, MaxOps: ruleContextOps}
	seen := map[string]bool{}
	add := func(g circuit.Gate) {
		if seen[g.Name] || !g.Unitary() || g.Qubits() > w {
			return
		}
		seen[g.Name] = true
		if g.IsCustom() {
			opts.Custom = append(opts.Custom, g)
		} else {
			opts.GateSet = append(opts.GateSet, g.Name)
		}
	}
	opts.Weights = map[string]int{}
	for _, op := range left.Ops {
		add(op.Gate)
		opts.Weights[op.Gate.Name] = ruleGateWeight
	}
	for _, name := range ruleContextGates {
		spec, _ := circuit.Lookup(name)
		g, _ := circuit.NewGate(name, make([]float64, spec.Params)...)
		add(g)
	}
	return opts
}

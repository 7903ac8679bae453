package budget

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/mat"
	"pgregory.net/rapid"

	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// approximatePass is a random approximate rewrite of a whole circuit, made in test code: the
// circuit after, the windows it replaced, and the pieces cut out by hand (independently of the
// ledger's own cutting).
type approximatePass struct {
	before, after *circuit.Circuit
	rewrites      []Rewrite
}

// drawApproximatePass walks a random circuit and replaces some ops, alone or with a disjoint op
// let through the window, by a perturbed gate, the gate followed by a small rotation, or an
// arbitrary small circuit.
func drawApproximatePass(t *rapid.T, n, maxOps int) approximatePass {
	before := drawCircuit(t, n, maxOps, "before")
	after := circuit.New(n)
	var p approximatePass
	p.before = before
	for i := 0; i < before.Len(); i++ {
		op := before.Ops[i]
		if !rapid.Bool().Draw(t, "replace") {
			after.AppendOp(op)
			continue
		}
		local := circuit.New(len(op.Qubits))
		lop := op.Clone()
		lop.Qubits = allQubits(len(op.Qubits))
		local.AppendOp(lop)
		repl := circuit.New(len(op.Qubits))
		switch rapid.IntRange(0, 2).Draw(t, "kind") {
		case 0: // the gate with its angles nudged, or the gate itself when it has none
			g := lop.Gate.Clone()
			for k := range g.Params {
				g.Params[k] += drawAngle(t, -0.05, 0.05, "nudge")
			}
			repl.Append(g, lop.Qubits...)
		case 1: // the gate, then a small rotation on one of its qubits
			repl.AppendOp(lop)
			q := rapid.IntRange(0, len(op.Qubits)-1).Draw(t, "extra qubit")
			repl.RX(drawAngle(t, -0.05, 0.05, "extra angle"), q)
		default: // anything at all on the same qubits
			if len(op.Qubits) == 1 {
				repl.U(drawAngle(t, -4, 4, "θ"), drawAngle(t, -4, 4, "φ"), drawAngle(t, -4, 4, "λ"), 0)
			} else {
				repl = drawCircuit(t, 2, 3, "arbitrary")
			}
		}
		w := Window{Before: circuit.Span{Start: i, End: i + 1}, After: circuit.Span{Start: after.Len(), End: after.Len()}, Qubits: append([]int(nil), op.Qubits...)}
		// Let the next op through the window when it acts on other qubits, on either side of
		// the replacement.
		var passer *circuit.Op
		if i+1 < before.Len() && disjoint(before.Ops[i+1].Qubits, op.Qubits) && rapid.Bool().Draw(t, "let through") {
			passer = &before.Ops[i+1]
			w.Before.End++
			i++
		}
		first := passer != nil && rapid.Bool().Draw(t, "passer first")
		if first {
			after.AppendOp(*passer)
		}
		for _, rop := range repl.Ops {
			rop = rop.Clone()
			for k, q := range rop.Qubits {
				rop.Qubits[k] = op.Qubits[q]
			}
			after.AppendOp(rop)
		}
		if passer != nil && !first {
			after.AppendOp(*passer)
		}
		w.After.End = after.Len()
		p.rewrites = append(p.rewrites, Rewrite{Window: w, Piece: local, Replacement: repl})
	}
	p.after = after
	return p
}

func disjoint(a, b []int) bool {
	for _, x := range a {
		for _, y := range b {
			if x == y {
				return false
			}
		}
	}
	return true
}

func mustUnitary(t *rapid.T, c *circuit.Circuit) *mat.CDense {
	u, err := sim.Unitary(c)
	if err != nil {
		t.Fatalf("sim.Unitary: %v", err)
	}
	return u
}

// The true phase-free distance of the whole circuits never exceeds the certified bound Σ δ_k
// (Nielsen & Chuang §4.5.3, with the phase chosen per factor), whether the ledger is filled by
// the pass or rebuilt from its windows; and with a single rewrite the bound is exact, since the
// operator norm is unchanged by the unitaries before and after the window and by tensoring with
// the identity on the other qubits.
func TestBoundCoversTrueDistance(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		p := drawApproximatePass(t, 3, 10)
		var l Ledger
		for _, r := range p.rewrites {
			if err := l.Record(r); err != nil {
				t.Fatalf("Record: %v", err)
			}
		}
		if err := l.Covers(p.before, p.after); err != nil {
			t.Fatalf("Covers: %v", err)
		}
		truth := metric.PhaseDistance(mustUnitary(t, p.before), mustUnitary(t, p.after))
		if truth > l.Bound()+floatSlack {
			t.Fatalf("true distance %.15g exceeds the certified bound %.15g", truth, l.Bound())
		}
		if len(p.rewrites) == 1 && math.Abs(truth-l.Bound()) > 1e-9 {
			t.Fatalf("one rewrite: true distance %.15g, δ %.15g; they should agree", truth, l.Bound())
		}
		windows := make([]Window, len(p.rewrites))
		for k, r := range p.rewrites {
			windows[k] = r.Window
		}
		rebuilt, err := FromWindows(p.before, p.after, windows)
		if err != nil {
			t.Fatalf("FromWindows: %v", err)
		}
		if math.Abs(rebuilt.Bound()-l.Bound()) > floatSlack {
			t.Fatalf("rebuilt bound %.15g, recorded %.15g", rebuilt.Bound(), l.Bound())
		}
	})
}

// Subadditivity, Nielsen & Chuang §4.5.3: ‖U₂U₁ − V₂V₁‖ ≤ ‖U₁ − V₁‖ + ‖U₂ − V₂‖ for
// unitaries, in operator norm and in the phase-free distance (choose each factor's phase on its
// own).
func TestSubadditivity(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		c1, c2 := drawCircuit(t, 2, 6, "U1"), drawCircuit(t, 2, 6, "U2")
		d1, d2 := drawCircuit(t, 2, 6, "V1"), drawCircuit(t, 2, 6, "V2")
		u1, u2, v1, v2 := mustUnitary(t, c1), mustUnitary(t, c2), mustUnitary(t, d1), mustUnitary(t, d2)
		// U₂U₁ applies U₁ first: the circuit c1 then c2.
		u21 := mustUnitary(t, c1.Clone().Compose(c2))
		v21 := mustUnitary(t, d1.Clone().Compose(d2))
		if lhs, rhs := metric.Distance(u21, v21), metric.Distance(u1, v1)+metric.Distance(u2, v2); lhs > rhs+floatSlack {
			t.Fatalf("‖U₂U₁ − V₂V₁‖ = %.15g > %.15g", lhs, rhs)
		}
		if lhs, rhs := metric.PhaseDistance(u21, v21), metric.PhaseDistance(u1, v1)+metric.PhaseDistance(u2, v2); lhs > rhs+floatSlack {
			t.Fatalf("phase-free: %.15g > %.15g", lhs, rhs)
		}
	})
}

// The probability bound, Nielsen & Chuang §4.5.3: if ‖U − V‖ ≤ ε then, for any state
// and any measurement outcome, |P_U − P_V| ≤ 2ε. The state is a random circuit applied to |0…0⟩;
// the measurement is in the computational basis after it (any basis is a unitary away).
func TestProbabilityBound(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		prep := drawCircuit(t, 3, 8, "state")
		u := drawCircuit(t, 3, 8, "U")
		// V is U with one op's angle nudged or one op dropped.
		v := u.Clone()
		k := rapid.IntRange(0, v.Len()-1).Draw(t, "changed op")
		if len(v.Ops[k].Gate.Params) > 0 {
			v.Ops[k].Gate.Params[0] += drawAngle(t, -0.3, 0.3, "nudge")
		} else {
			v.Ops = append(v.Ops[:k], v.Ops[k+1:]...)
		}
		eps := metric.Distance(mustUnitary(t, u), mustUnitary(t, v))
		pu, pv := outcomes(t, prep, u), outcomes(t, prep, v)
		for x := range pu {
			if d := math.Abs(pu[x] - pv[x]); d > 2*eps+floatSlack {
				t.Fatalf("outcome %d: |P_U − P_V| = %.15g > 2‖U − V‖ = %.15g", x, d, 2*eps)
			}
		}
	})
}

// outcomes returns the computational-basis probabilities of c applied to prep|0…0⟩.
func outcomes(t *rapid.T, prep, c *circuit.Circuit) []float64 {
	state := make([]complex128, 1<<prep.Qubits())
	state[0] = 1
	if err := sim.Apply(prep.Clone().Compose(c), state); err != nil {
		t.Fatalf("sim.Apply: %v", err)
	}
	p := make([]float64, len(state))
	for i, a := range state {
		p[i] = real(a)*real(a) + imag(a)*imag(a)
	}
	return p
}

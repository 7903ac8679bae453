package sim

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"
	"pgregory.net/rapid"
	"qcheck.dev/gen"
	"qcheck.dev/qcheck/circuit"
)

// controlled returns the gate g controlled by k qubits placed before its operands: the identity
// except on the block where every control is 1, which holds g's matrix.
func controlled(t *rapid.T, g circuit.Gate, k int) circuit.Gate {
	m := g.Elements()
	d := 1 << g.Qubits()
	D := d << k
	full := mat.NewCDense(D, D, nil)
	for i := 0; i < D-d; i++ {
		full.Set(i, i, 1)
	}
	for i := 0; i < d; i++ {
		for j := 0; j < d; j++ {
			full.Set(D-d+i, D-d+j, m[i*d+j])
		}
	}
	cg, err := circuit.Custom(fmt.Sprintf("c%d_%s", k, g.Name), full)
	if err != nil {
		t.Fatal(err)
	}
	return cg
}

// deferred rewrites a program by the principle of deferred measurement (Nielsen & Chuang §4.4):
// each measurement becomes a CNOT onto a fresh ancilla, which then stands for its bit; each
// reset becomes a CNOT onto a fresh ancilla and a CNOT back, which returns the qubit to 0 and
// carries the discarded value off; each classically controlled gate becomes the gate controlled
// by the ancillas of the bits it reads (with x before and after where a bit must be 0); and the
// ancillas are measured into their bits at the end. The result measures only at the end.
func deferred(t *rapid.T, c *circuit.Circuit) *circuit.Circuit {
	extra := 0
	for _, op := range c.Ops {
		if op.Gate.Name == "measure" || op.Gate.Name == "reset" {
			extra++
		}
	}
	n := c.Qubits()
	d := circuit.New(n + extra).SetBits(c.Bits())
	source := map[int]int{} // bit → ancilla holding it
	next := n
	for _, op := range c.Ops {
		switch op.Gate.Name {
		case "measure":
			d.CX(op.Qubits[0], next)
			source[op.Bits[0]] = next
			next++
			continue
		case "reset":
			d.CX(op.Qubits[0], next).CX(next, op.Qubits[0])
			next++
			continue
		}
		if op.If == nil {
			d.AppendOp(op)
			continue
		}
		var controls, flips []int
		possible := true
		for i, b := range op.If.Bits {
			want1 := op.If.Value>>i&1 == 1
			a, ok := source[b]
			switch {
			case !ok && want1: // the bit is still 0
				possible = false
			case ok:
				controls = append(controls, a)
				if !want1 {
					flips = append(flips, a)
				}
			}
		}
		if op.If.Not {
			// "differ": the gate acts unless every read bit matches. Apply it, then undo it
			// where they all match: G, then (G⁻¹ controlled on the match).
			plain := op
			plain.If = nil
			d.AppendOp(plain)
			if !possible {
				continue
			}
			op.Gate = op.Gate.Inverse()
		}
		if !possible {
			continue
		}
		for _, a := range flips {
			d.X(a)
		}
		g := op.Gate
		if len(controls) > 0 {
			g = controlled(t, op.Gate, len(controls))
		}
		d.Append(g, append(controls, op.Qubits...)...)
		for _, a := range flips {
			d.X(a)
		}
	}
	for b, a := range source {
		d.Measure(a, b)
	}
	return d
}

// programs draws small programs with every kind of step.
func programs(qubits int, gates []string) *rapid.Generator[*circuit.Circuit] {
	return gen.Program(gen.ProgramOptions{
		Options: gen.Options{Qubits: qubits, MaxOps: 12, GateSet: gates, Motifs: -1},
		Measure: 3, Reset: 2, If: 4,
	})
}

func TestDeferredMeasurement(t *testing.T) {
	// Nielsen & Chuang §4.4: measurements can always be moved to the end, classically
	// controlled operations becoming quantum-controlled ones. The branch engine on the
	// program and one statevector run on its deferred form must give the same distribution.
	rapid.Check(t, func(t *rapid.T) {
		c := programs(3, []string{"h", "x", "t", "cx", "ry", "s"}).Draw(t, "program")
		d := deferred(t, c)
		if d.Qubits() > 12 {
			t.Skip("too many measurements for the deferred form")
		}
		g, err := ComparePrograms(c, d, ProgramOptions{})
		if err != nil {
			t.Fatal(err)
		}
		if g.Distance > 1e-9 {
			t.Fatalf("program and its deferred form differ by %g at %s (%g, %g)\n%v\n%v", g.Distance, g.Outcome, g.Want, g.Got, c.Ops, d.Ops)
		}
	})
}

// enginesAgree fails unless the statevector distribution of c and the stabilizer distribution
// of wide (c, or c with its qubits placed elsewhere) are the same.
func enginesAgree(t *rapid.T, c, wide *circuit.Circuit) {
	sv, err := ProgramOutcomes(c, ProgramOptions{})
	if err != nil {
		t.Skip(err)
	}
	st, err := StabilizerProgramOutcomes(wide, ProgramOptions{})
	if err != nil {
		t.Fatal(err)
	}
	listed, err := st.Outcomes(1 << 16)
	if err != nil {
		t.Fatal(err)
	}
	if g := TotalVariation(sv, listed); g.Distance > 1e-9 {
		t.Fatalf("stabilizer and statevector differ by %g at %s: %g against %g\n%v", g.Distance, g.Outcome, g.Got, g.Want, c.Ops)
	}
}

var cliffordGates = []string{"h", "s", "x", "cx", "sdg", "z", "y", "cz", "swap", "sx"}

func TestCliffordProgramsAgainstStatevector(t *testing.T) {
	// The stabilizer engine's affine sets against the branch engine's distributions, on
	// Clifford programs of up to 12 qubits with measurements, resets and feed-forward.
	for _, width := range []int{1, 2, 5, 12} {
		t.Run(fmt.Sprint(width), func(t *testing.T) {
			rapid.Check(t, func(t *rapid.T) {
				gates := cliffordGates
				if width == 1 {
					gates = []string{"h", "s", "x", "sdg", "z", "y", "sx"}
				}
				c := gen.Program(gen.ProgramOptions{
					Options: gen.Options{Qubits: width, MaxOps: 3 * width, GateSet: gates, Motifs: -1},
					Measure: 3, Reset: 2, If: 4,
				}).Draw(t, "program")
				enginesAgree(t, c, c)
			})
		})
	}
}

func TestCliffordProgramGapsAgainstStatevector(t *testing.T) {
	// The distance the stabilizer engine derives from two affine sets (or lists, for
	// mixtures) against the distance between the statevector distributions.
	rapid.Check(t, func(t *rapid.T) {
		opts := gen.ProgramOptions{
			Options: gen.Options{Qubits: 4, MaxOps: 8, GateSet: cliffordGates, Motifs: -1},
			Measure: 3, Reset: 1, If: 3,
		}
		a := gen.Program(opts).Draw(t, "want")
		b := gen.Program(opts).Draw(t, "got")
		want, err := ComparePrograms(a, b, ProgramOptions{})
		if err != nil {
			t.Fatal(err)
		}
		got, err := CompareCliffordPrograms(a, b, ProgramOptions{})
		if err != nil {
			t.Fatal(err)
		}
		if d := want.Distance - got.Distance; d > 1e-9 || d < -1e-9 {
			t.Fatalf("stabilizer distance %g, statevector %g\n%v\n%v", got.Distance, want.Distance, a.Ops, b.Ops)
		}
		if got.Distance > 0 {
			// The worst outcome's probabilities must be the statevector's, and its gap the largest.
			oa, _ := ProgramOutcomes(a, ProgramOptions{})
			ob, _ := ProgramOutcomes(b, ProgramOptions{})
			pa, pb := oa.Probability(got.Outcome), ob.Probability(got.Outcome)
			if abs(pa-got.Want) > 1e-9 || abs(pb-got.Got) > 1e-9 || abs(abs(pa-pb)-abs(want.Want-want.Got)) > 1e-9 {
				t.Fatalf("worst outcome %s: stabilizer says %g, %g; statevector %g, %g (largest gap %g)", got.Outcome, got.Want, got.Got, pa, pb, abs(want.Want-want.Got))
			}
		}
	})
}

func abs(x float64) float64 { return max(x, -x) }

func TestStabilizerFeedForward(t *testing.T) {
	// Derived by hand. Outcomes are written c2 c1 c0.
	x, h := gate(t, "x"), gate(t, "h")
	cases := []struct {
		name    string
		program *circuit.Circuit
		want    map[string]float64
		uniform bool
	}{{
		// x on q2 when c0 = c1 = 1: c2 = c0·c1, not affine; a mixture of two sets.
		name:    "and",
		program: when(circuit.New(3).H(0).H(1).Measure(0, 0).Measure(1, 1), []int{0, 1}, 3, x, 2).Measure(2, 2),
		want:    map[string]float64{"000": .25, "001": .25, "010": .25, "111": .25},
	}, {
		// x on q2 when c0 = 1 (a Pauli on one random bit): c2 = c0, one affine set.
		name:    "copy",
		program: when(circuit.New(3).H(0).Measure(0, 0), []int{0}, 1, x, 2).Measure(2, 2),
		want:    map[string]float64{"000": .5, "101": .5},
		uniform: true,
	}, {
		// h on q1 when c0 = 1: c1 = 0 if c0 = 0, uniform if c0 = 1.
		name:    "hadamard",
		program: when(circuit.New(2).H(0).Measure(0, 0), []int{0}, 1, h, 1).Measure(1, 1),
		want:    map[string]float64{"00": .5, "01": .25, "11": .25},
	}, {
		// else branch: x on q1 unless c0 = 1, so c1 = 1 − c0.
		name: "else",
		program: circuit.New(2).H(0).Measure(0, 0).AppendOp(circuit.Op{Gate: x, Qubits: []int{1},
			If: &circuit.Condition{Bits: []int{0}, Value: 1, Not: true}}).Measure(1, 1),
		want:    map[string]float64{"10": .5, "01": .5},
		uniform: true,
	}, {
		// reset of half a Bell pair: q0 reads 0, q1 stays random.
		name:    "reset",
		program: circuit.New(2).H(0).CX(0, 1).Reset(0).Measure(0, 0).Measure(1, 1),
		want:    map[string]float64{"00": .5, "10": .5},
		uniform: true,
	}, {
		// a measurement repeated gives the same value (N&C §2.2.3, projective measurement).
		name:    "repeat",
		program: circuit.New(2).H(0).S(0).H(0).Measure(0, 0).Measure(0, 1),
		want:    map[string]float64{"00": .5, "11": .5},
		uniform: true,
	}}
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			st, err := StabilizerProgramOutcomes(tc.program, ProgramOptions{})
			if err != nil {
				t.Fatal(err)
			}
			if _, ok := st.Uniform(); ok != tc.uniform {
				t.Errorf("Uniform = %v, want %v", ok, tc.uniform)
			}
			listed, err := st.Outcomes(100)
			if err != nil {
				t.Fatal(err)
			}
			checkDistribution(t, listed, tc.want)
			checkDistribution(t, outcomes(t, tc.program), tc.want)
		})
	}
}

func TestStabilizerRefusals(t *testing.T) {
	if _, err := StabilizerProgramOutcomes(circuit.New(1).T(0).Measure(0, 0), ProgramOptions{}); err == nil {
		t.Error("t accepted")
	}
	// Twelve conditioned Hadamards on independent random bits need 2^12 parts.
	c := circuit.New(13)
	for i := 0; i < 12; i++ {
		c.H(i).Measure(i, i)
		when(c, []int{i}, 1, gate(t, "h"), 12)
	}
	if _, err := StabilizerProgramOutcomes(c, ProgramOptions{MaxBranches: 1000}); err == nil {
		t.Error("4096 parts accepted with a limit of 1000")
	}
}

// scatter places a program's qubits at the given positions of a wider register, bits unchanged.
func scatter(c *circuit.Circuit, width int, at []int) *circuit.Circuit {
	d := circuit.New(width).SetBits(c.Bits())
	for _, op := range c.Ops {
		op = op.Clone()
		for i, q := range op.Qubits {
			op.Qubits[i] = at[q]
		}
		d.AppendOp(op)
	}
	return d
}

func TestStabilizerAtWidth(t *testing.T) {
	// The tableau packs 64 rows to a word; small programs fit in one. The same programs with
	// their qubits scattered over 150 (rows across five words, common practice: relabelling
	// idle qubits changes nothing) must give the distributions the statevector gives.
	rapid.Check(t, func(t *rapid.T) {
		c := gen.Program(gen.ProgramOptions{
			Options: gen.Options{Qubits: 6, MaxOps: 24, GateSet: cliffordGates, Motifs: -1},
			Measure: 3, Reset: 2, If: 4,
		}).Draw(t, "program")
		at := rapid.Permutation(func() []int {
			s := make([]int, 150)
			for i := range s {
				s[i] = i
			}
			return s
		}()).Draw(t, "positions")[:6]
		enginesAgree(t, c, scatter(c, 150, at))
	})
}

func TestStabilizerGHZ(t *testing.T) {
	// By hand (N&C §2.6 for the GHZ state): h and a chain of cx make (|0…0⟩ + |1…1⟩)/√2 on
	// 1,000 qubits. Measuring qubit 0 mid-circuit picks 0…0 or 1…1; every later measurement
	// repeats it. Resetting qubit 0 and measuring all 1,000 reads 0 on bit 0 and the common
	// value elsewhere: a set of two outcomes, each with probability ½.
	const n = 1000
	c := circuit.New(n).H(0)
	for q := 0; q+1 < n; q++ {
		c.CX(q, q+1)
	}
	c.Measure(0, 0).Reset(0)
	for q := 0; q < n; q++ {
		c.Measure(q, q)
	}
	st, err := StabilizerProgramOutcomes(c, ProgramOptions{})
	if err != nil {
		t.Fatal(err)
	}
	if dim, ok := st.Uniform(); !ok || dim != 1 {
		t.Fatalf("Uniform = %d, %v; want a set of 2", dim, ok)
	}
	listed, err := st.Outcomes(4)
	if err != nil {
		t.Fatal(err)
	}
	ones := strings.Repeat("1", n-1) + "0"
	checkDistribution(t, listed, map[string]float64{strings.Repeat("0", n): 0.5, ones: 0.5})
}

func TestStabilizerRandomCliffordsAtWidth(t *testing.T) {
	// Uniformly random Clifford unitaries (gen.Clifford) make stabilizers with X and Z parts
	// spread over every qubit, so that a fixed measurement outcome is a product of many rows
	// across words. Two of them, each followed by a measurement of every qubit, scattered over
	// 150 qubits, against the statevector on 6.
	rapid.Check(t, func(t *rapid.T) {
		const k = 6
		c := circuit.New(k).SetBits(2 * k)
		c.Compose(gen.Clifford(k).Draw(t, "U"))
		for q := 0; q < k; q++ {
			c.Measure(q, q)
		}
		c.Compose(gen.Clifford(k).Draw(t, "V"))
		for q := 0; q < k; q++ {
			c.Measure(q, k+q)
		}
		at := rapid.Permutation(func() []int {
			s := make([]int, 150)
			for i := range s {
				s[i] = i
			}
			return s
		}()).Draw(t, "positions")[:k]
		enginesAgree(t, c, scatter(c, 150, at))
	})
}

func TestStabilizerRounding(t *testing.T) {
	// rz(π/2 + 1e-13) is accepted as s, 1e-13 away in angle and so at most 1e-13 in operator
	// norm; the comparison says so. A custom gate has no angle to bound by.
	a := circuit.New(1).H(0).RZ(math.Pi/2+1e-13, 0).H(0).Measure(0, 0)
	b := circuit.New(1).H(0).S(0).H(0).Measure(0, 0)
	g, err := CompareCliffordPrograms(a, b, ProgramOptions{Bits: []int{0}})
	if err != nil {
		t.Fatal(err)
	}
	if g.Distance != 0 || g.Rounding < 0.9e-13 || g.Rounding > 1.1e-13 {
		t.Errorf("%+v; want distance 0 within about 1e-13", g)
	}
	if g, _ := CompareCliffordPrograms(b, b, ProgramOptions{}); g.Rounding != 0 {
		t.Errorf("rounding %g without angles, want 0", g.Rounding)
	}
}

func TestCliffordProgram(t *testing.T) {
	if err := CliffordProgram(when(circuit.New(2).H(0).Measure(0, 0).Reset(0), []int{0}, 1, gate(t, "cx"), 0, 1)); err != nil {
		t.Errorf("a Clifford program refused: %v", err)
	}
	if err := CliffordProgram(when(circuit.New(2).Measure(0, 0), []int{0}, 1, gate(t, "t"), 1)); err == nil || !strings.Contains(err.Error(), "op 1") {
		t.Errorf("a conditioned t: %v, want an error naming op 1", err)
	}
}

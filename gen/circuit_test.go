package gen

import (
	"fmt"
	"math"
	"slices"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"
	"pgregory.net/rapid"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/shrink"
)

func TestCircuitZeroOptions(t *testing.T) {
	// The zero Options: 3 qubits, at most 20 ops, gates from DefaultGateSet.
	set := DefaultGateSet()
	longest := 0
	for seed := range 300 {
		c := Circuit(Options{}).Example(seed)
		if err := c.Validate(); err != nil {
			t.Fatalf("seed %d: invalid circuit: %v\n%v", seed, err, c)
		}
		if c.Qubits() != 3 || c.Len() > 20 {
			t.Fatalf("seed %d: %d qubits, %d ops; want 3 qubits, ≤ 20 ops", seed, c.Qubits(), c.Len())
		}
		for i, op := range c.Ops {
			if !slices.Contains(set, op.Gate.Name) {
				t.Fatalf("seed %d: op %d is %v, not in DefaultGateSet", seed, i, op)
			}
		}
		longest = max(longest, c.Len())
	}
	if longest != 20 {
		t.Errorf("no draw in 300 reached MaxOps = 20 (longest %d)", longest)
	}
}

func TestCircuitRespectsOptions(t *testing.T) {
	opts := Options{Qubits: 5, MinOps: 7, MaxOps: 12, GateSet: []string{"rz", "sx", "cx"}}
	for seed := range 200 {
		c := Circuit(opts).Example(seed)
		if err := c.Validate(); err != nil {
			t.Fatalf("seed %d: %v", seed, err)
		}
		if c.Qubits() != 5 || c.Len() < 7 || c.Len() > 12 {
			t.Fatalf("seed %d: %d qubits, %d ops; want 5 qubits, 7..12 ops", seed, c.Qubits(), c.Len())
		}
		for i, op := range c.Ops {
			if !slices.Contains(opts.GateSet, op.Gate.Name) {
				t.Fatalf("seed %d: op %d is %v, outside the gate set %v", seed, i, op, opts.GateSet)
			}
		}
	}
}

func TestCircuitWeights(t *testing.T) {
	// Without motifs each op's gate is drawn independently with probability
	// weight/total: h with 3/4, x with 1/4, cx never. Binomial count of h
	// against its mean by the normal approximation (n ≈ 10^4 ops, so the
	// approximation error is far below the margin), z for 5e-7 two-sided;
	// two checks (Example, rapid.Check): false failure ≤ 1e-6 per run.
	opts := Options{Qubits: 2, MaxOps: 40, GateSet: []string{"h", "x", "cx"},
		Weights: map[string]int{"h": 3, "cx": 0}, Motifs: -1}
	example, checked := drawAll(t, Circuit(opts), 500, 1)
	for name, sample := range map[string][]*circuit.Circuit{"Example": example, "rapid.Check": checked} {
		counts := map[string]int{}
		total := 0
		for _, c := range sample {
			for _, op := range c.Ops {
				counts[op.Gate.Name]++
				total++
			}
		}
		if counts["cx"] != 0 {
			t.Errorf("via %s: cx has weight 0 but was drawn %d times", name, counts["cx"])
		}
		mean, sd := 0.75*float64(total), math.Sqrt(float64(total)*0.75*0.25)
		if z := math.Abs(float64(counts["h"])-mean) / sd; z > normalCritical(falseFailure/2) {
			t.Errorf("via %s: h drawn %d times in %d ops, want about %.0f (z = %.1f)", name, counts["h"], total, mean, z)
		}
	}
}

func TestCircuitOperandsEven(t *testing.T) {
	// Every qubit, the last included, is as likely as any other to be an
	// op's first operand (without motifs: operands are drawn uniformly among
	// the free qubits). Chi-square over 3 qubits, 2 degrees of freedom,
	// critical value −2·ln(alpha) exactly (Abramowitz & Stegun 26.4.21); two
	// checks: false failure ≤ 1e-6 per run. Ops within one circuit are
	// independent, so their operands may be pooled.
	alpha := falseFailure / 2
	example, checked := drawAll(t, Circuit(Options{Motifs: -1}), 1500, 1)
	for name, sample := range map[string][]*circuit.Circuit{"Example": example, "rapid.Check": checked} {
		counts := map[string]int{}
		for _, c := range sample {
			for _, op := range c.Ops {
				counts[fmt.Sprint(op.Qubits[0])]++
			}
		}
		if chi2, seen := chiSquareUniform(counts, 3); seen != 3 || chi2 > -2*math.Log(alpha) {
			t.Errorf("via %s: first operands %v give chi-square %.1f", name, counts, chi2)
		}
	}
}

func TestCircuitLengthsEven(t *testing.T) {
	// Without motifs the length is uniform on [MinOps, MaxOps]: chi-square
	// over the 10 lengths 0..9, 9 degrees of freedom, critical value
	// chi2.isf(5e-7, 9) = 46.43 from SciPy (testdata/gen/reference.txt); two
	// checks: false failure ≤ 1e-6 per run.
	const crit = 46.4348367220341
	example, checked := drawAll(t, Circuit(Options{MaxOps: 9, Motifs: -1}), 3000, 1)
	for name, sample := range map[string][]*circuit.Circuit{"Example": example, "rapid.Check": checked} {
		counts := map[string]int{}
		for _, c := range sample {
			counts[fmt.Sprint(c.Len())]++
		}
		if chi2, seen := chiSquareUniform(counts, 10); seen > 10 || chi2 > crit {
			t.Errorf("via %s: lengths %v give chi-square %.1f > %.1f", name, counts, chi2, crit)
		}
	}
}

// structure counts, over a circuit, the four shapes that motifs make:
// an op and its exact inverse on the same qubits with nothing between them on
// those qubits; ops in runs of three or more diagonal gates; an op followed
// by two ops confined to its qubits; a block of 1 to 3 ops written twice in
// a row.
type structure struct{ inverse, diagonal, run, repeat int }

func structureOf(c *circuit.Circuit) structure {
	var s structure
	ops := c.Ops
	touches := func(op circuit.Op, qs []int) bool {
		return slices.ContainsFunc(op.Qubits, func(q int) bool { return slices.Contains(qs, q) })
	}
	within := func(op circuit.Op, qs []int) bool {
		return !slices.ContainsFunc(op.Qubits, func(q int) bool { return !slices.Contains(qs, q) })
	}
	diagonalRun := 0
	for i, op := range ops {
		for j := i + 1; j < len(ops); j++ {
			if slices.Equal(ops[j].Qubits, op.Qubits) && op.Gate.Inverse().Equal(ops[j].Gate) {
				s.inverse++
				break
			}
			if touches(ops[j], op.Qubits) {
				break
			}
		}
		if slices.Contains(diagonalGates, op.Gate.Name) {
			diagonalRun++
			switch {
			case diagonalRun == 3:
				s.diagonal += 3
			case diagonalRun > 3:
				s.diagonal++
			}
		} else {
			diagonalRun = 0
		}
		if i+2 < len(ops) && within(ops[i+1], op.Qubits) && within(ops[i+2], op.Qubits) {
			s.run++
		}
		for l := 1; l <= 3 && i+2*l <= len(ops); l++ {
			same := true
			for k := range l {
				same = same && ops[i+k].Equal(ops[i+l+k])
			}
			if same {
				s.repeat++
				break
			}
		}
	}
	return s
}

func TestCircuitMotifs(t *testing.T) {
	// With motifs each shape is common; without them it is rare.
	// Deterministic (fixed seeds); the thresholds leave a wide margin.
	count := func(motifs int) structure {
		opts := Options{Qubits: 4, MinOps: 40, MaxOps: 40, Motifs: motifs,
			GateSet: []string{"h", "x", "y", "sx", "rx", "ry", "cx", "swap", "rz", "cz"}}
		var total structure
		for seed := range 200 {
			s := structureOf(Circuit(opts).Example(seed))
			total.inverse += s.inverse
			total.diagonal += s.diagonal
			total.run += s.run
			total.repeat += s.repeat
		}
		return total
	}
	plain, rich := count(-1), count(100)
	t.Logf("in 8000 ops without → with motifs: %+v → %+v", plain, rich)
	for _, c := range []struct {
		name          string
		without, with int
	}{
		{"inverse pairs", plain.inverse, rich.inverse},
		{"diagonal runs", plain.diagonal, rich.diagonal},
		{"same-qubit runs", plain.run, rich.run},
		{"repeated blocks", plain.repeat, rich.repeat},
	} {
		if c.with < 2*c.without+20 {
			t.Errorf("%s: %d without motifs, %d with; want at least twice as many with", c.name, c.without, c.with)
		}
	}
}

func TestCircuitCustomGates(t *testing.T) {
	// A Hermitian custom gate (the two-qubit XX = X⊗X) is its own inverse; a
	// non-Hermitian one (√iSWAP-like phase gate diag(1, 1, 1, i)) has none in
	// the set unless listed.
	xx, err := circuit.Custom("xx", mat.NewCDense(4, 4, []complex128{
		0, 0, 0, 1,
		0, 0, 1, 0,
		0, 1, 0, 0,
		1, 0, 0, 0}))
	if err != nil {
		t.Fatal(err)
	}
	cs, err := circuit.Custom("cs", mat.NewCDense(4, 4, []complex128{1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1i}))
	if err != nil {
		t.Fatal(err)
	}
	opts := Options{Qubits: 3, MaxOps: 30, GateSet: []string{"h"}, Custom: []circuit.Gate{xx, cs},
		Weights: map[string]int{"h": 1, "xx": 2, "cs": 2}, Motifs: 100}
	seen := map[string]int{}
	for seed := range 100 {
		c := Circuit(opts).Example(seed)
		if err := c.Validate(); err != nil {
			t.Fatalf("seed %d: %v", seed, err)
		}
		for _, op := range c.Ops {
			seen[op.Gate.Name]++
			if op.Gate.Name == "csdg" {
				t.Fatalf("seed %d: drew csdg, which is not in the set", seed)
			}
		}
	}
	if seen["xx"] == 0 || seen["cs"] == 0 || seen["h"] == 0 {
		t.Errorf("gate counts %v: every gate of the set should appear", seen)
	}
	p, err := opts.resolve()
	if err != nil {
		t.Fatal(err)
	}
	if p.choices[1].inverse != 1 || p.choices[2].inverse != -1 || !p.choices[2].diagonal || p.choices[1].diagonal {
		t.Errorf("xx: inverse %d diagonal %v; cs: inverse %d diagonal %v; want 1 false, -1 true",
			p.choices[1].inverse, p.choices[1].diagonal, p.choices[2].inverse, p.choices[2].diagonal)
	}
}

func TestCircuitOptionErrors(t *testing.T) {
	notCustom, _ := circuit.NewGate("h")
	for _, c := range []struct {
		opts Options
		want string
	}{
		{Options{Qubits: -1}, "Qubits = -1"},
		{Options{MaxOps: -2}, "MaxOps = -2"},
		{Options{MinOps: 30}, "MinOps = 30"},
		{Options{GateSet: []string{"h", "hadamard"}}, `GateSet[1] = "hadamard" is not a standard gate`},
		{Options{GateSet: []string{"measure"}}, `GateSet[0] = "measure" is not a unitary gate`},
		{Options{Qubits: 2, GateSet: []string{"ccx"}}, `GateSet[0] = "ccx" acts on 3 qubits`},
		{Options{GateSet: []string{"h", "h"}}, `GateSet[1] = "h" is listed twice`},
		{Options{Custom: []circuit.Gate{notCustom}}, "Custom[0]"},
		{Options{GateSet: []string{"h"}, Weights: map[string]int{"x": 1}}, `Weights names "x"`},
		{Options{GateSet: []string{"h"}, Weights: map[string]int{"h": -1}}, `Weights["h"] = -1`},
		{Options{GateSet: []string{"h"}, Weights: map[string]int{"h": 0}}, "every gate has weight 0"},
		{Options{Motifs: 101}, "Motifs = 101"},
	} {
		failed, out := report(t, Circuit(c.opts))
		if !failed || !strings.Contains(out, c.want) {
			t.Errorf("%+v: failed=%v, report %q; want a failure containing %q", c.opts, failed, out, c.want)
		}
	}
}

func TestCircuitShrinksToMinimalCounterexample(t *testing.T) {
	// The property "no cx with target 2 follows an h on qubit 2" fails; from
	// circuits of up to 200 ops rapid, and shrink.Minimize after it, must
	// reach the two-op counterexample h q2; cx q0,q2 (lowest control,
	// nothing else). rapid alone may stop at two ops whose qubits were drawn
	// together (a pattern's), which Minimize then lowers one at a time.
	fails := func(c *circuit.Circuit) bool {
		hOn2 := false
		for _, op := range c.Ops {
			switch {
			case op.Gate.Name == "h" && op.Qubits[0] == 2:
				hOn2 = true
			case hOn2 && op.Gate.Name == "cx" && op.Qubits[1] == 2:
				return true
			}
		}
		return false
	}
	shrunk, first := shrunkFrom(t, Circuit(Options{Qubits: 4, MaxOps: 200}), fails)
	minimal := shrink.Minimize(shrunk, fails)
	want := circuit.New(4).H(2).CX(0, 2)
	if !minimal.Equal(want) {
		t.Errorf("shrunk to %d ops (from %d):\n%v\nwant\n%v", minimal.Len(), first.Len(), minimal, want)
	}
	if first.Len() < 50 {
		t.Errorf("the first failing circuit had only %d ops; the test should shrink from a long one", first.Len())
	}
	t.Logf("shrunk from %d ops to %d by rapid, %d by Minimize", first.Len(), shrunk.Len(), minimal.Len())
}

func TestCircuitShrinksTowardSimpleGatesAndAngles(t *testing.T) {
	opts := Options{Qubits: 4, MaxOps: 50}
	// Any two-qubit gate: one op on qubits 0, 1 (cx, the first two-qubit
	// gate of DefaultGateSet, when rapid reaches it; a gate written by a
	// motif, whose choice rapid cannot lower alone, otherwise).
	twoQubit := func(c *circuit.Circuit) bool {
		return slices.ContainsFunc(c.Ops, func(op circuit.Op) bool { return len(op.Qubits) == 2 })
	}
	got := shrink.Minimize(shrunk(t, Circuit(opts), twoQubit), twoQubit)
	if len(got.Ops) != 1 || !slices.Equal(got.Ops[0].Qubits, []int{0, 1}) || slices.ContainsFunc(got.Ops[0].Gate.Params, func(a float64) bool { return a != 0 }) {
		t.Errorf("a circuit with a two-qubit gate shrinks to\n%v\nwant one op on qubits 0, 1 with angles 0", got)
	}
	// Any gate with a nonzero angle: one op, on the lowest qubits, with π/4,
	// the first nonzero special angle (rz, the first gate with an angle,
	// when rapid reaches it; a pattern's gate with an angle otherwise).
	angled := func(c *circuit.Circuit) bool {
		return slices.ContainsFunc(c.Ops, func(op circuit.Op) bool {
			return slices.ContainsFunc(op.Gate.Params, func(a float64) bool { return a != 0 })
		})
	}
	got = shrink.Minimize(shrunk(t, Circuit(opts), angled), angled)
	if len(got.Ops) != 1 || !slices.Contains(got.Ops[0].Gate.Params, math.Pi/4) || got.Ops[0].Qubits[0] != 0 {
		t.Errorf("a circuit with a nonzero angle shrinks to\n%v\nwant one op on qubit 0 with angle π/4", got)
	}
}

func TestCircuitAnyOptions(t *testing.T) {
	// Whatever sensible options a test passes, every draw is a valid circuit
	// within them (a property test over Options themselves).
	var unitary []string
	for _, s := range circuit.Standard() {
		if g, err := circuit.NewGate(s.Name, make([]float64, s.Params)...); err == nil && g.Unitary() {
			unitary = append(unitary, s.Name)
		}
	}
	rapid.Check(t, func(rt *rapid.T) {
		qubits := rapid.IntRange(1, 5).Draw(rt, "qubits")
		maxOps := rapid.IntRange(1, 30).Draw(rt, "maxOps")
		minOps := rapid.IntRange(0, maxOps).Draw(rt, "minOps")
		set := rapid.SliceOfNDistinct(rapid.SampledFrom(unitary), 1, 6, rapid.ID[string]).
			Filter(func(names []string) bool {
				for _, n := range names {
					if s, _ := circuit.Lookup(n); s.Qubits > qubits {
						return false
					}
				}
				return true
			}).Draw(rt, "gates")
		opts := Options{Qubits: qubits, MinOps: minOps, MaxOps: maxOps, GateSet: set,
			Motifs: rapid.IntRange(-1, 100).Draw(rt, "motifs")}
		c := Circuit(opts).Draw(rt, "circuit")
		if err := c.Validate(); err != nil {
			rt.Fatalf("invalid circuit: %v\n%v", err, c)
		}
		if c.Qubits() != qubits || c.Len() < minOps || c.Len() > maxOps {
			rt.Fatalf("%d qubits, %d ops; want %d qubits, %d..%d ops", c.Qubits(), c.Len(), qubits, minOps, maxOps)
		}
		for i, op := range c.Ops {
			if !slices.Contains(set, op.Gate.Name) {
				rt.Fatalf("op %d is %v, outside the set %v", i, op, set)
			}
		}
	})
}

package sim

import (
	"math"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// when appends gate g on the qubits, controlled by the classical bits reading value.
func when(c *circuit.Circuit, bits []int, value uint64, g circuit.Gate, qubits ...int) *circuit.Circuit {
	return c.AppendOp(circuit.Op{Gate: g, Qubits: qubits, If: &circuit.Condition{Bits: bits, Value: value}})
}

func gate(t testing.TB, name string, params ...float64) circuit.Gate {
	t.Helper()
	g, err := circuit.NewGate(name, params...)
	if err != nil {
		t.Fatal(err)
	}
	return g
}

func outcomes(t testing.TB, c *circuit.Circuit) *Outcomes {
	t.Helper()
	o, err := ProgramOutcomes(c, ProgramOptions{})
	if err != nil {
		t.Fatal(err)
	}
	return o
}

// checkDistribution fails unless o gives exactly the listed probabilities (within 1e-12) and
// nothing else.
func checkDistribution(t *testing.T, o *Outcomes, want map[string]float64) {
	t.Helper()
	total := 0.0
	for k, p := range want {
		if got := o.Probability(k); math.Abs(got-p) > 1e-12 {
			t.Errorf("P(%s) = %.15g, want %.15g", k, got, p)
		}
		total += p
	}
	for _, k := range o.Support() {
		if _, ok := want[k]; !ok && o.Probability(k) > 1e-12 {
			t.Errorf("P(%s) = %.15g, want 0", k, o.Probability(k))
		}
	}
	if math.Abs(total-1) > 1e-12 {
		t.Fatalf("the expected distribution sums to %g", total)
	}
}

// teleport is the teleportation program of Cross, Bishop, Smolin & Gambetta, "Open Quantum
// Assembly Language" (arXiv:1707.03429, 2017), written from the paper's description: q0 holds
// u3(θ,φ,λ)|0⟩, q1 and q2 share a Bell pair, Alice measures q0 and q1 into c0 and c1, and Bob
// applies z if c0 and x if c1, then measures q2 into c2. With fix false the corrections are left
// out.
func teleport(t testing.TB, theta, phi, lambda float64, fix bool) *circuit.Circuit {
	c := circuit.New(3).SetBits(3)
	c.U(theta, phi, lambda, 0)
	c.H(1).CX(1, 2).Barrier(0, 1, 2)
	c.CX(0, 1).H(0).Measure(0, 0).Measure(1, 1)
	if fix {
		when(c, []int{0}, 1, gate(t, "z"), 2)
		when(c, []int{1}, 1, gate(t, "x"), 2)
	}
	return c.Measure(2, 2)
}

func TestTeleportation(t *testing.T) {
	// By hand: Alice's outcomes c0, c1 are uniform and independent (the reduced state of q0,q1
	// after the Bell-basis rotation is maximally mixed), and after Bob's correction q2 holds
	// u3(θ,φ,λ)|0⟩ = cos(θ/2)|0⟩ + e^{iφ} sin(θ/2)|1⟩, so c2 = 1 with probability sin²(θ/2),
	// independently of c0 and c1. Outcomes are written c2 c1 c0.
	const theta = 0.3
	s := math.Pow(math.Sin(theta/2), 2)
	want := map[string]float64{}
	for _, ab := range []string{"00", "01", "10", "11"} {
		want["0"+ab] = (1 - s) / 4
		want["1"+ab] = s / 4
	}
	checkDistribution(t, outcomes(t, teleport(t, theta, 0.2, 0.1, true)), want)

	// Without the corrections, q2 holds X^{c1} Z^{c0} u3|0⟩: for c1 = 1 it reads 1 with
	// probability cos²(θ/2). The distance to the corrected program is then
	// ½ Σ |p − q| = ½ · 2 · (¼·|cos² − sin²| · 2) = |cos θ| / 2.
	g, err := ComparePrograms(teleport(t, theta, 0.2, 0.1, true), teleport(t, theta, 0.2, 0.1, false), ProgramOptions{})
	if err != nil {
		t.Fatal(err)
	}
	if want := math.Abs(math.Cos(theta)) / 2; math.Abs(g.Distance-want) > 1e-12 {
		t.Errorf("distance without corrections = %.15g, want |cos θ|/2 = %.15g", g.Distance, want)
	}
	if g.Outcome == "" || math.Abs(math.Abs(g.Want-g.Got)-math.Abs(math.Cos(theta))/4) > 1e-12 {
		t.Errorf("worst outcome %q: %g against %g, want a gap of |cos θ|/4", g.Outcome, g.Want, g.Got)
	}
}

// semiclassicalQFT measures a 3-qubit Fourier state the way the semiclassical (measure and
// feed forward) inverse QFT of Griffiths & Niu does, as arXiv:1707.03429 presents it: qubit j
// starts in (|0⟩ + e^{2πi k/2^{j+1}}|1⟩)/√2; each qubit is rotated back by the phases the bits
// already measured predict, then measured in the X basis. drop names a correction to leave out
// (-1 for none).
func semiclassicalQFT(t testing.TB, k float64, drop int) *circuit.Circuit {
	c := circuit.New(3).SetBits(3)
	for j := 0; j < 3; j++ {
		c.H(j).P(2*math.Pi*k/float64(int(2)<<j), j)
	}
	correction := 0
	for j := 0; j < 3; j++ {
		for b := 0; b < j; b++ {
			// bit b carries 2^b; on qubit j its phase is π·2^b/2^j.
			if correction != drop {
				when(c, []int{b}, 1, gate(t, "p", -math.Pi*float64(int(1)<<b)/float64(int(1)<<j)), j)
			}
			correction++
		}
		c.H(j).Measure(j, j)
	}
	return c
}

func TestSemiclassicalQFT(t *testing.T) {
	// By hand: with every correction, qubit j reaches (|0⟩ + (−1)^{k_j}|1⟩)/√2 and h sends it
	// to |k_j⟩, so the program reads k exactly (written c2 c1 c0 = k in binary).
	for k := 0; k < 8; k++ {
		want := map[string]float64{string([]byte{'0' + byte(k>>2&1), '0' + byte(k>>1&1), '0' + byte(k&1)}): 1}
		checkDistribution(t, outcomes(t, semiclassicalQFT(t, float64(k), -1)), want)
	}
	// Leaving out the correction of q2 by bit 0 (the second of three) when k = 1: q2 keeps the
	// phase e^{iπ/4}, so it reads 1 with probability sin²(π/8), and the distance to the point
	// mass at 001 is sin²(π/8).
	g, err := ComparePrograms(semiclassicalQFT(t, 1, -1), semiclassicalQFT(t, 1, 1), ProgramOptions{})
	if err != nil {
		t.Fatal(err)
	}
	if want := math.Pow(math.Sin(math.Pi/8), 2); math.Abs(g.Distance-want) > 1e-12 {
		t.Errorf("distance = %.15g, want sin²(π/8) = %.15g", g.Distance, want)
	}
	if g.Outcome != "001" && g.Outcome != "101" {
		t.Errorf("worst outcome %q, want 001 or 101", g.Outcome)
	}
}

func TestResetAndFinalMeasurement(t *testing.T) {
	// Common practice, derived by hand: reset after h returns q0 to |0⟩ whatever was measured,
	// so the program reads c0 = 0 always; a Bell pair measured at the end reads 00 or 11
	// with probability ½ each (Nielsen & Chuang §1.3.6).
	c := circuit.New(2).H(0).Reset(0).Measure(0, 0)
	checkDistribution(t, outcomes(t, c), map[string]float64{"0": 1})
	bell := circuit.New(2).H(0).CX(0, 1).Measure(0, 0).Measure(1, 1)
	checkDistribution(t, outcomes(t, bell), map[string]float64{"00": 0.5, "11": 0.5})
	// Resetting half of a Bell pair leaves the other half mixed: two runs, not one.
	half := circuit.New(2).H(0).CX(0, 1).Reset(0).Measure(0, 0).Measure(1, 1)
	checkDistribution(t, outcomes(t, half), map[string]float64{"00": 0.5, "10": 0.5})
}

func TestRoutedMeasurementsAreComparedThroughBits(t *testing.T) {
	// The cases issue 12 names: measurements mapped to swapped bits differ (distance 1), and a
	// program routed onto other qubits that measures back into the same bits agrees.
	a := circuit.New(2).X(0).Measure(0, 0).Measure(1, 1)
	b := circuit.New(2).X(0).Measure(0, 1).Measure(1, 0)
	g, err := ComparePrograms(a, b, ProgramOptions{})
	if err != nil {
		t.Fatal(err)
	}
	if g.Distance != 1 || g.Outcome == "" {
		t.Errorf("swapped bits: %+v, want distance 1", g)
	}
	routed := circuit.New(3).X(2).Measure(2, 0).Measure(1, 1)
	if g, err := ComparePrograms(a, routed, ProgramOptions{}); err != nil || g.Distance != 0 {
		t.Errorf("routed program: %+v, %v; want distance 0", g, err)
	}
}

func TestProgramRefusals(t *testing.T) {
	c := circuit.New(1)
	for i := 0; i < 13; i++ {
		c.H(0).Measure(0, i)
	}
	if _, err := ProgramOutcomes(c, ProgramOptions{MaxBranches: 100}); err == nil {
		t.Error("2^13 runs accepted with a limit of 100")
	}
	if _, err := ProgramOutcomes(circuit.New(40), ProgramOptions{}); err == nil {
		t.Error("a 40-qubit statevector accepted")
	}
	bad := circuit.New(1)
	bad.Ops = append(bad.Ops, circuit.Op{Gate: gate(t, "measure"), Qubits: []int{3}, Bits: []int{0}})
	if _, err := ProgramOutcomes(bad, ProgramOptions{}); err == nil {
		t.Error("a measure of qubit 3 on one qubit accepted")
	}
}

func TestCompareFromZero(t *testing.T) {
	// A gate that only adds phases to states other than |00⟩ (cz) is invisible from |00⟩;
	// rx(θ) on |0⟩ has overlap cos(θ/2) with |0⟩, so the distance is
	// min_φ ‖|0⟩ − e^{iφ}(cos(θ/2)|0⟩ − i sin(θ/2)|1⟩)‖ = √(2 − 2cos(θ/2)) (N&C §4.2).
	g, err := CompareFromZero(circuit.New(2).H(0), circuit.New(2).CZ(0, 1).H(0))
	if err != nil || g.Distance > 1e-15 || math.Abs(g.Fidelity()-1) > 1e-15 {
		t.Errorf("cz before h: %+v, %v; want distance 0", g, err)
	}
	const theta = 0.7
	g, err = CompareFromZero(circuit.New(1), circuit.New(1).RX(theta, 0))
	if err != nil {
		t.Fatal(err)
	}
	if want := math.Sqrt(2 - 2*math.Cos(theta/2)); math.Abs(g.Distance-want) > 1e-15 {
		t.Errorf("distance %.17g, want %.17g", g.Distance, want)
	}
	if math.Abs(g.Fidelity()-math.Pow(math.Cos(theta/2), 2)) > 1e-15 {
		t.Errorf("fidelity %g, want cos²(θ/2)", g.Fidelity())
	}
	if _, err := CompareFromZero(circuit.New(1).Measure(0, 0), circuit.New(1)); err == nil {
		t.Error("a measurement accepted by the zero-input comparison")
	}
}

func TestMeasuredSubsetAndMarginals(t *testing.T) {
	// By hand: h q0; cx q0,q1 makes a Bell pair (N&C §1.3.6). Measured on both qubits it reads
	// 00 or 11; measured on qubit 1 alone, 0 or 1 with ½ each, the same as h q1 alone, while
	// measured on both it differs from h q1 (|0⟩|+⟩ reads 00 or 10) by TV ½.
	bell := circuit.New(2).H(0).CX(0, 1)
	plus := circuit.New(2).H(1)
	g, err := ComparePrograms(MeasureAtEnd(bell, 1), MeasureAtEnd(plus, 1), ProgramOptions{})
	if err != nil || g.Distance > 1e-15 {
		t.Errorf("qubit 1 alone: %+v, %v; want distance 0", g, err)
	}
	g, err = ComparePrograms(MeasureAtEnd(bell, 0, 1), MeasureAtEnd(plus, 0, 1), ProgramOptions{})
	if err != nil || math.Abs(g.Distance-0.5) > 1e-15 {
		t.Errorf("both qubits: %+v, %v; want distance ½", g, err)
	}
	// Reading only bit 1 of the measured Bell pair, in both engines.
	a, b := MeasureAtEnd(bell, 0, 1), MeasureAtEnd(plus, 0, 1)
	for name, compare := range map[string]func(a, b *circuit.Circuit, o ProgramOptions) (OutcomeGap, error){
		"statevector": ComparePrograms, "stabilizer": CompareCliffordPrograms} {
		g, err := compare(a, b, ProgramOptions{Bits: []int{1}})
		if err != nil || g.Distance > 1e-15 {
			t.Errorf("%s, bit 1 only: %+v, %v; want 0", name, g, err)
		}
		g, err = compare(a, b, ProgramOptions{Bits: []int{1, 0}})
		if err != nil || math.Abs(g.Distance-0.5) > 1e-15 {
			t.Errorf("%s, bits 1 and 0: %+v, %v; want ½", name, g, err)
		}
		if _, err := compare(a, b, ProgramOptions{Bits: []int{1, 1}}); err == nil {
			t.Errorf("%s: a bit listed twice accepted", name)
		}
	}
}

func TestDroppedBranches(t *testing.T) {
	// ry(θ) then a measurement reads 1 with probability sin²(θ/2) (N&C §4.2): for θ = 1e-11
	// that is 2.5e-23, below PruneBelow, so the branch is dropped and counted, and half of it
	// bounds the error of a distance.
	c := circuit.New(1).RY(1e-11, 0).Measure(0, 0).H(0)
	o := outcomes(t, c)
	if want := math.Pow(math.Sin(5e-12), 2); math.Abs(o.Dropped-want) > 1e-30 || o.Probability("1") != 0 {
		t.Errorf("dropped %g, P(1) = %g; want %g dropped and 0", o.Dropped, o.Probability("1"), want)
	}
	g, err := ComparePrograms(c, circuit.New(1).Measure(0, 0), ProgramOptions{})
	if err != nil || g.Distance > 1e-15 || math.Abs(g.Rounding-o.Dropped/2) > 1e-30 {
		t.Errorf("%+v, %v; want distance 0 with rounding %g", g, err, o.Dropped/2)
	}
}

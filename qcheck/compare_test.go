package qcheck

import (
	"math"
	"math/cmplx"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"
	"pgregory.net/rapid"
	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

func mustCompare(t *testing.T, want, got *circuit.Circuit, opts ...Option) Result {
	t.Helper()
	r, err := Compare(want, got, opts...)
	if err != nil {
		t.Fatalf("Compare: %v", err)
	}
	return r
}

// p(θ) = e^{iθ/2}·rz(θ) (package circuit's gate definitions): equal up to global phase, and
// ‖p(θ) − rz(θ)‖ = |1 − e^{−iθ/2}| = 2|sin(θ/4)| with the phase fixed (derived by hand from the
// two diagonal matrices).
func TestGlobalPhaseOnly(t *testing.T) {
	for _, theta := range []float64{0.3, math.Pi / 2, -2.1, 3} {
		want, got := circuit.New(1).P(theta, 0), circuit.New(1).RZ(theta, 0)
		r := mustCompare(t, want, got)
		if !r.Equivalent || r.Distance > 1e-15 {
			t.Errorf("θ=%g: default mode flags a global phase: %s", theta, r.Headline())
		}
		if math.Abs(r.Phase-theta/2) > 1e-12 {
			t.Errorf("θ=%g: optimal phase %g, want θ/2", theta, r.Phase)
		}
		e := mustCompare(t, want, got, ExactPhase())
		if e.Equivalent || math.Abs(e.Distance-2*math.Abs(math.Sin(theta/4))) > 1e-12 {
			t.Errorf("θ=%g: ExactPhase distance %g, want %g", theta, e.Distance, 2*math.Abs(math.Sin(theta/4)))
		}
		if e.Measurement.Input != nil {
			t.Errorf("θ=%g: a measurement was named for a global phase: %+v", theta, e.Measurement)
		}
	}
}

// Closed forms for rz(θ) against the identity (eigenvalues e^{∓iθ/2}, package metric's documentation):
// phase-free distance 2 sin(θ/4), diamond distance 2 sin(θ/2), average fidelity
// (2 + 4cos²(θ/2))/6 by Nielsen's formula (d + |tr U†V|²)/(d(d+1)).
func TestMeasuresClosedForm(t *testing.T) {
	theta := 0.8
	want, got := circuit.New(1), circuit.New(1).RZ(theta, 0)
	cases := []struct {
		opt  Option
		want float64
	}{
		{UseMeasure(OperatorNorm), 2 * math.Sin(theta/4)},
		{UseMeasure(Diamond), 2 * math.Sin(theta/2)},
		{UseMeasure(AverageFidelity), 1 - (2+4*math.Pow(math.Cos(theta/2), 2))/6},
	}
	for _, tc := range cases {
		r := mustCompare(t, want, got, tc.opt)
		if math.Abs(r.Distance-tc.want) > 1e-12 {
			t.Errorf("%v: %g, want %g", r.Measure, r.Distance, tc.want)
		}
		if math.Abs(r.OperatorDistance-2*math.Sin(theta/4)) > 1e-12 {
			t.Errorf("%v: operator distance %g", r.Measure, r.OperatorDistance)
		}
	}
}

func TestBadInput(t *testing.T) {
	c2, c3 := circuit.New(2).H(0), circuit.New(3).H(0)
	// A wide non-Clifford circuit with a gate of the user's own: no engine takes it by itself.
	wideCustom := circuit.New(25).Append(phaseFlipOnAllOnes(t, 1), 0).T(1)
	cases := []struct {
		name      string
		want, got *circuit.Circuit
		opts      []Option
		says      string
	}{
		{"width mismatch", c2, c3, nil, "want has 2 qubit(s) and got has 3"},
		{"nil circuit", nil, c2, nil, "want is nil"},
		{"ill-formed got", c2, circuit.New(2).H(0).CX(0, 5), nil, "op 1 (cx): qubit 5 out of range"},
		{"NaN angle", c2, circuit.New(2).RZ(math.NaN(), 0), nil, "op 0 (rz)"},
		{"zero tolerance", c2, c2, []Option{Tolerance(0)}, "Tolerance(0)"},
		{"negative tolerance", c2, c2, []Option{Tolerance(-1e-9)}, "must be positive"},
		{"NaN tolerance", c2, c2, []Option{Tolerance(math.NaN())}, "Tolerance(NaN)"},
		{"infinite tolerance", c2, c2, []Option{Tolerance(math.Inf(1))}, "Tolerance(+Inf)"},
		{"permutation too short", c3, c3, []Option{OutputPermutation([]int{0, 1})}, "has 2 entries for got's 3 qubits"},
		{"permutation repeats", c3, c3, []Option{OutputPermutation([]int{0, 1, 1})}, "OutputPermutation[2] = 1 repeats OutputPermutation[1]"},
		{"permutation out of range", c3, c3, []Option{OutputPermutation([]int{0, 3, 1})}, "OutputPermutation[1] = 3 is outside"},
		{"ancilla out of range", c2, c3, []Option{Ancillas([]int{3}, Clean)}, "ancilla qubit 3 is outside got's register [0, 3)"},
		{"ancilla negative", c2, c3, []Option{Ancillas([]int{-1}, Clean)}, "ancilla qubit -1"},
		{"ancilla twice", c2, c3, []Option{Ancillas([]int{2, 2}, Clean)}, "declared twice"},
		{"ancilla count", c2, circuit.New(5), []Option{Ancillas([]int{4}, Dirty)}, "want must have 4 qubits"},
		{"ancilla state", c2, c3, []Option{Ancillas([]int{2}, AncillaState(7))}, "must be Clean or Dirty"},
		{"mixed ancillas", c2, circuit.New(4), []Option{Ancillas([]int{2}, Clean), Ancillas([]int{3}, Dirty)}, "mixing clean and dirty"},
		{"measured out of range", c2, c2, []Option{Measured(2)}, "measured qubit 2 is outside want's register [0, 2)"},
		{"exact phase with diamond", c2, c2, []Option{ExactPhase(), UseMeasure(Diamond)}, "ExactPhase with the diamond norm"},
		{"measure ops with UseEngine(Dense)", circuit.New(1).H(0).Measure(0, 0), circuit.New(1).H(0).Measure(0, 0), []Option{UseEngine(Dense)}, "the dense engine compares unitaries on every input, not program meanings"},
		{"unknown measure", c2, c2, []Option{UseMeasure(Measure(42))}, "UseMeasure(Measure(42))"},
		{"too wide for auto", wideCustom, wideCustom, nil, "tableau: want is not a circuit the tableau engine can answer for: circuit: op 1 (t): not a Clifford gate; the tableau engine needs a Clifford circuit; dense: 25 qubits is wider than the dense engine takes automatically (12)"},
		{"too wide for auto, matrix-free", wideCustom, wideCustom, nil, "matrix-free: 25 qubits is wider than the matrix-free engine takes automatically (22)"},
		{"too wide for auto, zx", wideCustom, wideCustom, nil, "zx: the zx engine has no ZX-diagram for op 0"},
		{"measured at width", circuit.New(13).T(0), circuit.New(13).T(0), []Option{Measured(0)}, "13 qubits is wider than the dense engine"},
	}
	for _, tc := range cases {
		_, err := Compare(tc.want, tc.got, tc.opts...)
		if err == nil {
			t.Errorf("%s: no error", tc.name)
			continue
		}
		if !strings.Contains(err.Error(), tc.says) {
			t.Errorf("%s: error %q does not say %q", tc.name, err, tc.says)
		}
	}
}

func TestOptionsCompose(t *testing.T) {
	want, got := circuit.New(1), circuit.New(1).RZ(1e-4, 0) // phase-free distance 2 sin(1e-4/4) ≈ 5e-5
	loose := Options{Tolerance(1e-3), UseMeasure(OperatorNorm)}
	if r := mustCompare(t, want, got, loose); !r.Equivalent || r.Tolerance != 1e-3 {
		t.Errorf("bundled options not applied: %s", r.Headline())
	}
	// Later options of the same kind win.
	if r := mustCompare(t, want, got, loose, Tolerance(1e-6)); r.Equivalent || r.Tolerance != 1e-6 {
		t.Errorf("later tolerance did not override: %s", r.Headline())
	}
	if r := mustCompare(t, want, got, nil, Options{nil}); r.Tolerance != DefaultTolerance || r.Engine != Dense {
		t.Errorf("defaults: %+v", r)
	}
}

// Compare agrees with package metric on random pairs, and with an independent computation of
// min over φ of ‖U − e^{iφ}V‖: gonum's SVD of the real embedding [[Re, −Im], [Im, Re]] (whose
// singular values are those of the complex matrix, each twice) on a grid of phases refined by
// golden-section search. The witness gap is a lower bound, reaching the distance when it is at
// most √2 (metric.Witness's contract).
func TestCompareAgreesWithMetricAndSVD(t *testing.T) {
	g := circuits(3, 12)
	rapid.Check(t, func(rt *rapid.T) {
		a, b := g.Draw(rt, "want"), g.Draw(rt, "got")
		r, err := Compare(a, b)
		if err != nil {
			rt.Fatal(err)
		}
		u, _ := sim.Unitary(a)
		v, _ := sim.Unitary(b)
		if m := metric.PhaseDistance(u, v); math.Abs(m-r.Distance) > 1e-12 {
			rt.Fatalf("Compare %g, metric %g", r.Distance, m)
		}
		if s := svdPhaseDistance(u, v); math.Abs(s-r.Distance) > 1e-8 {
			rt.Fatalf("Compare %g, SVD search %g", r.Distance, s)
		}
		if r.WitnessGap > r.Distance+1e-9 || r.WitnessGap < math.Min(r.Distance, math.Sqrt2)-1e-9 {
			rt.Fatalf("witness gap %g for distance %g", r.WitnessGap, r.Distance)
		}
		if d := math.Abs(r.Measurement.Want - r.Measurement.Got); r.Measurement.Input != nil && d > 2*r.Distance+1e-9 {
			rt.Fatalf("probabilities differ by %g, beyond the bound 2×%g (Nielsen & Chuang §4.5.3)", d, r.Distance)
		}
	})
}

// svdPhaseDistance is min over φ of σ_max(U − e^{iφ}V), found by a grid of 180 phases and a
// golden-section search around each local minimum of the grid.
func svdPhaseDistance(u, v *mat.CDense) float64 {
	n, _ := u.Dims()
	f := func(phi float64) float64 {
		e := cmplx.Exp(complex(0, phi))
		emb := mat.NewDense(2*n, 2*n, nil)
		for i := 0; i < n; i++ {
			for j := 0; j < n; j++ {
				z := u.At(i, j) - e*v.At(i, j)
				emb.Set(i, j, real(z))
				emb.Set(n+i, n+j, real(z))
				emb.Set(i, n+j, -imag(z))
				emb.Set(n+i, j, imag(z))
			}
		}
		var svd mat.SVD
		svd.Factorize(emb, mat.SVDNone)
		return svd.Values(nil)[0]
	}
	const grid = 180
	vals := make([]float64, grid)
	for k := range vals {
		vals[k] = f(2 * math.Pi * float64(k) / grid)
	}
	// Refine every local minimum of the grid: the function has one per gap between eigenvalues,
	// and near distance 2 they can be within the grid's error of each other.
	best := math.Inf(1)
	for k := range vals {
		if vals[k] > vals[(k+1)%grid] || vals[k] > vals[(k+grid-1)%grid] {
			continue
		}
		at := 2 * math.Pi * float64(k) / grid
		lo, hi := at-2*math.Pi/grid, at+2*math.Pi/grid
		r := (math.Sqrt(5) - 1) / 2
		a, b := hi-r*(hi-lo), lo+r*(hi-lo)
		fa, fb := f(a), f(b)
		for i := 0; i < 40; i++ {
			if fa < fb {
				hi, b, fb = b, a, fa
				a = hi - r*(hi-lo)
				fa = f(a)
			} else {
				lo, a, fa = a, b, fb
				b = lo + r*(hi-lo)
				fb = f(b)
			}
		}
		best = math.Min(best, math.Min(vals[k], math.Min(fa, fb)))
	}
	return best
}

// want = H and got = X·H give the same distribution from every basis input (a uniform coin),
// but from |+⟩ want gives 0 and got gives 1 with certainty: total-variation distance 1 (derived
// by hand: H|+⟩ = |0⟩). The witness of the two unitaries finds that input.
func TestMeasuredUsesSuperposedInputs(t *testing.T) {
	want, got := circuit.New(1).H(0), circuit.New(1).H(0).X(0)
	r := mustCompare(t, want, got, Measured(0))
	if r.Equivalent || math.Abs(r.Distance-1) > 1e-12 || r.Measure != Distribution {
		t.Fatalf("got %s", r.Headline())
	}
	m := r.Measurement
	if math.Abs(m.Want-m.Got) < 1-1e-12 || m.InputBasis >= 0 {
		t.Errorf("measurement %+v should be certain and from a superposition", m)
	}
}

// Dropping a final rz before measuring keeps every distribution (rz is diagonal in the
// computational basis); the measure ops themselves are ignored by Measured.
func TestMeasuredIgnoresFinalDiagonalGates(t *testing.T) {
	want := circuit.New(2).H(0).CX(0, 1).RZ(0.7, 1).Measure(0, 0).Measure(1, 1)
	got := circuit.New(2).H(0).CX(0, 1).Measure(0, 0).Measure(1, 1)
	if r := mustCompare(t, want, got, Measured()); !r.Equivalent || r.Distance > 1e-12 {
		t.Errorf("measured comparison flags a final rz: %s", r.Headline())
	}
	if r := mustCompare(t, want, got, Measured(0)); !r.Equivalent {
		t.Errorf("measuring q0 only: %s", r.Headline())
	}
	// Without the measurements, the unitaries differ by the rz.
	if r := mustCompare(t, circuit.New(2).RZ(0.7, 1), circuit.New(2)); r.Equivalent {
		t.Error("rz(0.7) equivalent to nothing")
	}
	// Unmeasured qubits may differ arbitrarily.
	if r := mustCompare(t, circuit.New(2).H(0), circuit.New(2).H(0).X(1), Measured(0)); !r.Equivalent {
		t.Errorf("a gate on an unmeasured qubit was flagged: %s", r.Headline())
	}
}

// want = I, got = X: from |0⟩, outcome |1⟩ has probability 0 after want and 1 after got.
func TestMeasurementFromBasisInput(t *testing.T) {
	r := mustCompare(t, circuit.New(1), circuit.New(1).X(0))
	m := r.Measurement
	if !m.Basis || m.InputBasis < 0 || math.Abs(m.Want-m.Got) != 1 {
		t.Errorf("measurement %+v, want a certain difference from a basis input", m)
	}
}

// Z against I: no computational-basis measurement tells them apart from any input (Z only
// changes a relative phase), so the report falls back to testing for want's output state.
func TestMeasurementOfRelativePhase(t *testing.T) {
	r := mustCompare(t, circuit.New(1), circuit.New(1).Z(0))
	m := r.Measurement
	if m.Basis || m.Want != 1 || math.Abs(m.Got) > 1e-12 {
		t.Errorf("measurement %+v, want a projection passed by want only", m)
	}
	if k := Ket(r.Witness, 1); k != "(|0⟩ + |1⟩)/√2" && k != "(|0⟩ − |1⟩)/√2" {
		t.Errorf("witness %s, want |+⟩ or |−⟩", k)
	}
}

// A clean ancilla that is not uncomputed leaves a distance of √2 (orthogonal columns, found by
// hand and by compare_reference.py); the witness keeps the ancilla in |0⟩.
func TestCleanAncillaWitness(t *testing.T) {
	want := circuit.New(3).CCX(0, 1, 2)
	got := circuit.New(4).CCX(0, 1, 3).CX(3, 2)
	r := mustCompare(t, want, got, Ancillas([]int{3}, Clean))
	if math.Abs(r.Distance-math.Sqrt2) > 1e-9 {
		t.Errorf("distance %g, want √2", r.Distance)
	}
	for x, a := range r.Witness {
		if x&8 != 0 && a != 0 {
			t.Fatalf("witness has amplitude %v on ancilla-1 state %d", a, x)
		}
	}
	if r.WitnessGap < math.Sqrt2-1e-9 {
		t.Errorf("witness gap %g", r.WitnessGap)
	}
}

func TestEngine(t *testing.T) {
	r := mustCompare(t, circuit.New(2).H(0), circuit.New(2).H(0), UseEngine(Dense))
	if r.Engine != Dense || r.Certifies == "" {
		t.Errorf("engine %v, certifies %q", r.Engine, r.Certifies)
	}
	if _, err := Compare(circuit.New(1), circuit.New(1), UseEngine(Engine("nine"))); err == nil {
		t.Error("unknown engine accepted")
	}
	// Every engine of the table is reachable by its name, and answers a comparison it takes.
	for _, eng := range engines {
		var e Engine
		if err := e.UnmarshalText([]byte(eng.name())); err != nil || e != eng.name() {
			t.Errorf("%s: read back as %q, %v", eng.name(), e, err)
		}
		c, opts := circuit.New(2).H(0).CX(0, 1), []Option{UseEngine(e)}
		switch e {
		case "program", "stabilizer-program", "final-measure":
			c.Measure(0, 0).Measure(1, 1)
		case "zero-state":
			opts = append(opts, FromZero())
		}
		r := mustCompare(t, c, c.Clone(), opts...)
		if r.Engine != e || !r.Equivalent {
			t.Errorf("%s: engine %v, equivalent %v", e, r.Engine, r.Equivalent)
		}
	}
	var e Engine
	if err := e.UnmarshalText([]byte("fast")); err == nil || !strings.Contains(err.Error(), "choose auto, tableau, dense, zx, matrix-free") {
		t.Errorf("unknown name read as %q, %v", e, err)
	}
}

func TestBlamePrefix(t *testing.T) {
	want := circuit.New(2).H(0).CX(0, 1).T(1).H(1)
	got := circuit.New(2).H(0).CX(0, 1).Tdg(1).H(1)
	b := mustCompare(t, want, got).Blame
	if b.FirstDiff != 2 || b.WantOps != (circuit.Span{Start: 2, End: 3}) || b.GotOps != (circuit.Span{Start: 2, End: 3}) || b.Prefix != 3 {
		t.Errorf("blame %+v", b)
	}
	// After a reordering the first prefixes already differ, though the whole would not without
	// the final change: the prefix blame points at the first differing op, as it is defined to.
	want = circuit.New(2).Z(0).X(1).T(1)
	got = circuit.New(2).X(1).Z(0).Tdg(1)
	if b := mustCompare(t, want, got).Blame; b.Prefix != 1 || b.FirstDiff != 0 || b.WantOps != (circuit.Span{Start: 0, End: 3}) {
		t.Errorf("blame %+v", b)
	}
	if b := mustCompare(t, want, want).Blame; b.Found || b.FirstDiff != -1 {
		t.Errorf("blame of equal circuits %+v", b)
	}
}

func TestResultReportFitsTheTerminal(t *testing.T) {
	r := mustCompare(t, circuit.New(4).H(0).CX(0, 1).CCX(0, 1, 3).RZ(0.1234567, 2), circuit.New(4).H(0).CX(0, 1).CCX(1, 0, 3).RZ(0.1234, 2))
	rep := r.Report()
	for _, s := range []string{"differs from want", "rz(0.12346) q2", "witness input", "kets are |q3 q2 q1 q0⟩"} {
		if !strings.Contains(rep, s) {
			t.Errorf("report lacks %q:\n%s", s, rep)
		}
	}
	reports := []string{
		rep,
		mustCompare(t, circuit.New(2).H(0).CX(0, 1), circuit.New(2).H(0).CX(0, 1).X(0).H(1), Measured(0)).Report(),
		mustCompare(t, circuit.New(3).CCX(0, 1, 2), circuit.New(4).CCX(0, 1, 3).CX(3, 2), Ancillas([]int{3}, Clean)).Report(),
		mustCompare(t, circuit.New(1).P(1, 0), circuit.New(1).RZ(1, 0), ExactPhase()).Report(),
		mustCompare(t, circuit.New(8).H(7), circuit.New(8).H(7).RX(0.3, 0).RY(0.2, 3).CX(3, 5), UseMeasure(AverageFidelity)).Report(),
	}
	for k, rep := range reports {
		for i, line := range strings.Split(rep, "\n") {
			if n := len([]rune(line)); n > circuit.DrawWidth {
				t.Errorf("report %d, line %d has %d columns: %q", k, i, n, line)
			}
		}
	}
}

// toffoliFig49 appends the Toffoli of Nielsen & Chuang Fig. 4.9 (controls a, b, target c),
// whose matrix has rounding noise where the exact one has zeros.
func toffoliFig49(c *circuit.Circuit, a, b, t int) *circuit.Circuit {
	return c.H(t).CX(b, t).Tdg(t).CX(a, t).T(t).CX(b, t).Tdg(t).CX(a, t).
		T(b).T(t).H(t).CX(a, b).T(a).Tdg(b).CX(a, b)
}

// Clean ancillas at the edge of the tolerance: a decomposition with rounding noise on the
// ancilla passes, and a rotation of the ancilla by rx(θ), which leaves amplitude sin(θ/2) on
// |1⟩, gives the distance 2·sin(θ/4) (derived by hand: ‖(cos(θ/2) − 1)|0⟩ − i·sin(θ/2)|1⟩‖),
// resolved far below 1e-8.
func TestCleanAncillaNearTolerance(t *testing.T) {
	want := circuit.New(3).CCX(0, 1, 2)
	exact := toffoliFig49(toffoliFig49(circuit.New(4), 0, 1, 3).CX(3, 2), 0, 1, 3)
	if r := mustCompare(t, want, exact, Ancillas([]int{3}, Clean)); !r.Equivalent {
		t.Errorf("Fig. 4.9 Toffoli into a clean ancilla flagged: %s", r.Headline())
	}
	for _, theta := range []float64{2e-7, 4e-9, 1e-3} {
		got := exact.Clone().RX(theta, 3)
		r := mustCompare(t, want, got, Ancillas([]int{3}, Clean))
		if d := 2 * math.Sin(theta/4); math.Abs(r.Distance-d) > 1e-3*d {
			t.Errorf("rx(%g) on the ancilla: distance %g, want %g", theta, r.Distance, d)
		}
	}
}

func TestReportOfEquivalentCircuitsIsShort(t *testing.T) {
	rep := mustCompare(t, circuit.New(1).P(0.3, 0), circuit.New(1).RZ(0.3, 0)).Report()
	if !strings.HasPrefix(rep, "qcheck: got is equivalent to want") || strings.Contains(rep, "witness") {
		t.Errorf("report of equivalent circuits:\n%s", rep)
	}
}

func TestMeasureAndEngineEncodeAsText(t *testing.T) {
	for v, want := range map[interface{ MarshalText() ([]byte, error) }]string{
		Diamond: "diamond norm", OperatorNorm: "operator norm", Dense: "dense", Auto: "auto",
	} {
		if b, _ := v.MarshalText(); string(b) != want {
			t.Errorf("%v encodes as %q", v, b)
		}
	}
}

// The verdict-only path compares just the ops between the common start and end of the two
// circuits; by the unitary invariance of the operator norm (and the similarity of V†U to B†A for
// the diamond distance and the average fidelity) it must give the whole circuits' distance.
func TestDifferingWindowsKeepTheDistance(t *testing.T) {
	g := circuits(3, 8)
	rapid.Check(t, func(rt *rapid.T) {
		s, a, b, p := g.Draw(rt, "start"), g.Draw(rt, "a"), g.Draw(rt, "b"), g.Draw(rt, "end")
		want := circuit.New(3).Compose(s).Compose(a).Compose(p)
		got := circuit.New(3).Compose(s).Compose(b).Compose(p)
		for _, opts := range [][]Option{nil, {ExactPhase()}, {UseMeasure(Diamond)}, {UseMeasure(AverageFidelity)}} {
			cfg, _ := newConfig(opts)
			quick, err := compare(cfg, want, got, false)
			if err != nil {
				rt.Fatal(err)
			}
			whole := mustCompare(t, want, got, opts...)
			if math.Abs(quick.Distance-whole.Distance) > 1e-9 {
				rt.Fatalf("%v: windows give %g, whole circuits %g", whole.Measure, quick.Distance, whole.Distance)
			}
		}
	})
}

package peephole_test

import (
	"math"
	"math/cmplx"
	"testing"

	"pgregory.net/rapid"
	"qcheck.dev/examples/peephole"
	"qcheck.dev/examples/peephole/shortcut"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// entryGap returns the largest |U_ij − e^{iφ}V_ij| over entries, with φ = 0 when exact is set and
// φ = arg tr(V†U) otherwise (if U = e^{iφ}V then tr(V†U) = d·e^{iφ}: the phase is read off the
// trace, common practice). It is a plain check written in the test, independent of qcheck.
func entryGap(t *testing.T, want, got *circuit.Circuit, exact bool) float64 {
	t.Helper()
	u, err := sim.Unitary(want)
	if err != nil {
		t.Fatal(err)
	}
	v, err := sim.Unitary(got)
	if err != nil {
		t.Fatal(err)
	}
	d, _ := u.Dims()
	ph := complex(1, 0)
	if !exact {
		var tr complex128
		for i := 0; i < d; i++ {
			for k := 0; k < d; k++ {
				tr += cmplx.Conj(v.At(k, i)) * u.At(k, i)
			}
		}
		if cmplx.Abs(tr) > 0 {
			ph = tr / complex(cmplx.Abs(tr), 0)
		}
	}
	gap := 0.0
	for i := 0; i < d; i++ {
		for k := 0; k < d; k++ {
			gap = math.Max(gap, cmplx.Abs(u.At(i, k)-ph*v.At(i, k)))
		}
	}
	return gap
}

// testAngles are angles in (−π/2, π/2), so that sums of two stay inside (−π, π) where no pass
// reduces them, plus a few special ones.
var testAngles = []float64{0.3, -0.7, 1.1, math.Pi / 4, -math.Pi / 3, 1e-3}

func TestCatalogueSidesHaveTheSameUnitary(t *testing.T) {
	for _, rw := range peephole.Catalogue() {
		for _, a := range testAngles {
			angles := []float64{a, 0.5 - a/3}[:rw.Angles]
			before, after := rw.Build(angles)
			// Each rule is an exact identity, global phase included: N&C §4.2 (rotations add
			// angles about one axis; z = s² = t⁴) and §4.3 (Z on a CNOT control and X on its target
			// commute with it).
			if gap := entryGap(t, before, after, true); gap > 1e-12 {
				t.Errorf("%s with angles %v: sides differ by %g entrywise", rw.Name, angles, gap)
			}
		}
	}
}

func TestOptimizeMakesEachCatalogueRewrite(t *testing.T) {
	for _, rw := range peephole.Catalogue() {
		angles := []float64{0.3, -1.2}[:rw.Angles]
		before, after := rw.Build(angles)
		got, err := peephole.Optimize(before)
		if err != nil {
			t.Fatalf("%s: %v", rw.Name, err)
		}
		if !got.Equal(after) {
			t.Errorf("%s: Optimize gave\n%vwant\n%v", rw.Name, got, after)
		}
	}
}

// TestToffoliNetworkStaysToffoli optimizes the standard Toffoli network and compares it with the
// textbook ccx matrix, which the network equals exactly: N&C Fig. 4.9.
func TestToffoliNetworkStaysToffoli(t *testing.T) {
	c := toffoliNetwork()
	for name, pass := range map[string]func(*circuit.Circuit) (*circuit.Circuit, error){
		"CancelInverses": peephole.CancelInverses, "MergeRotations": peephole.MergeRotations, "Optimize": peephole.Optimize,
	} {
		got, err := pass(c)
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		if gap := entryGap(t, circuit.New(3).CCX(0, 1, 2), got, true); gap > 1e-12 {
			t.Errorf("%s changed the Toffoli network: gap %g\n%v", name, gap, got)
		}
	}
}

// toffoliNetwork is N&C Fig. 4.9: ccx with controls 0, 1 and target 2 from H, T, T† and six CNOTs,
// followed here by an extra h·h and t·tdg that the optimizer must remove.
func toffoliNetwork() *circuit.Circuit {
	return circuit.New(3).
		H(2).CX(1, 2).Tdg(2).CX(0, 2).T(2).CX(1, 2).Tdg(2).CX(0, 2).T(1).T(2).H(2).
		CX(0, 1).T(0).Tdg(1).CX(0, 1).H(2).H(2).T(0).Tdg(0)
}

func TestOptimizeShortensToffoliNetwork(t *testing.T) {
	got, err := peephole.Optimize(toffoliNetwork())
	if err != nil {
		t.Fatal(err)
	}
	// The network of N&C Fig. 4.9 has 15 gates; the h·h and t·tdg added after it must go. The
	// t on q0 after the second cx(0,1) and the t on q0 between them merge through the cx control.
	if got.Len() > 15 {
		t.Errorf("Optimize left %d ops, want at most 15:\n%v", got.Len(), got)
	}
}

// gateSet is what the test's own circuit generator draws from; qcheck's gen package replaces it.
var gateSet = []string{"h", "x", "z", "s", "sdg", "t", "tdg", "rz", "rx", "p", "cx", "cz", "cp", "crz", "rzz", "swap"}

// randomCircuit draws a circuit on n qubits from gateSet; angles are special multiples of π/4 half
// of the time, so that merges reach named gates and the identity.
func randomCircuit(n, maxOps int) *rapid.Generator[*circuit.Circuit] {
	return rapid.Custom(func(t *rapid.T) *circuit.Circuit {
		c := circuit.New(n)
		ops := rapid.IntRange(0, maxOps).Draw(t, "ops")
		for i := 0; i < ops; i++ {
			spec, _ := circuit.Lookup(rapid.SampledFrom(gateSet).Draw(t, "gate"))
			qubits := rapid.SliceOfNDistinct(rapid.IntRange(0, n-1), spec.Qubits, spec.Qubits, rapid.ID[int]).Draw(t, "qubits")
			params := make([]float64, spec.Params)
			for k := range params {
				if rapid.Bool().Draw(t, "special") {
					params[k] = float64(rapid.IntRange(-8, 8).Draw(t, "eighths")) * math.Pi / 4
				} else {
					params[k] = rapid.Float64Range(-2*math.Pi, 2*math.Pi).Draw(t, "angle")
				}
			}
			g, err := circuit.NewGate(spec.Name, params...)
			if err != nil {
				t.Fatal(err)
			}
			c.Append(g, qubits...)
		}
		return c
	})
}

func TestPassesKeepTheUnitaryExactly(t *testing.T) {
	passes := map[string]func(*circuit.Circuit) (*circuit.Circuit, error){
		"CancelInverses": peephole.CancelInverses, "MergeRotations": peephole.MergeRotations, "Optimize": peephole.Optimize,
	}
	rapid.Check(t, func(rt *rapid.T) {
		c := randomCircuit(3, 30).Draw(rt, "circuit")
		keep := c.Clone()
		for name, pass := range passes {
			got, err := pass(c)
			if err != nil {
				rt.Fatalf("%s: %v", name, err)
			}
			if !c.Equal(keep) {
				rt.Fatalf("%s modified its input", name)
			}
			if got.Len() > c.Len() {
				rt.Fatalf("%s lengthened the circuit from %d to %d ops", name, c.Len(), got.Len())
			}
			// Exact rewrites: the only error is rounding in added angles, far below 1e-9.
			if gap := entryGap(t, c, got, true); gap > 1e-9 {
				rt.Fatalf("%s changed the unitary by %g entrywise:\nin\n%vout\n%v", name, gap, c, got)
			}
		}
	})
}

func TestShortcutBugsOnTheirSmallestCircuits(t *testing.T) {
	cases := []struct {
		name string
		pass func(*circuit.Circuit) (*circuit.Circuit, error)
		c    *circuit.Circuit
	}{
		{"ZThroughTarget", shortcut.ZThroughTarget, circuit.New(2).RZ(0.3, 1).CX(0, 1).RZ(0.4, 1)},
		{"CPAsCRZ", shortcut.CPAsCRZ, circuit.New(2).CP(0.3, 0, 1).CRZ(0.4, 0, 1)},
	}
	for _, tc := range cases {
		good, err := peephole.Optimize(tc.c)
		if err != nil {
			t.Fatal(err)
		}
		bad, err := tc.pass(tc.c)
		if err != nil {
			t.Fatal(err)
		}
		if gap := entryGap(t, tc.c, good, false); gap > 1e-12 {
			t.Errorf("%s: the correct optimizer changed the circuit by %g", tc.name, gap)
		}
		// The dropped factor is rzz(θ)·rz(θ)† or p(−θ/2) on the control, θ = 0.4: either moves
		// some entry by |1 − e^{iθ/2}|-ish amounts, well above 0.05 (see package shortcut's doc).
		if gap := entryGap(t, tc.c, bad, false); gap < 0.05 {
			t.Errorf("%s: the planted bug did not change the circuit (gap %g):\n%v", tc.name, gap, bad)
		}
	}
}

func TestBadInputIsAnError(t *testing.T) {
	c := circuit.New(2).H(0).CX(0, 2)
	if _, err := peephole.Optimize(c); err == nil {
		t.Fatal("Optimize accepted a cx on qubit 2 of a 2-qubit circuit")
	}
	bad := peephole.Rules{Commutes: peephole.Commutes, Merge: func(a, b circuit.Op) ([]circuit.Op, bool) {
		return []circuit.Op{a, b}, true
	}}
	if _, err := bad.Apply(circuit.New(1).H(0).H(0)); err == nil {
		t.Fatal("Apply accepted a rule that lengthens the circuit")
	}
}

func TestBarriersAndMeasurementsAreNotCrossed(t *testing.T) {
	c := circuit.New(2).H(0).Barrier(0, 1).H(0).RZ(0.2, 1).Measure(1, 0).RZ(0.3, 1)
	got, err := peephole.Optimize(c)
	if err != nil {
		t.Fatal(err)
	}
	if !got.Equal(c) {
		t.Errorf("Optimize moved a gate across a barrier or measurement:\n%v", got)
	}
}

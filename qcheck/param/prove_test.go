package param

import (
	"math"
	"math/big"
	"slices"
	"strings"
	"testing"

	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

var a, b, c = Var("a"), Var("b"), Var("c")

// identity is a rule the sources say holds for every value of its parameters.
type identity struct {
	name, source string
	left, right  *Circuit
	exact        bool
}

func identities() []identity {
	half, negHalf := a.Times(1, 2), a.Times(-1, 2)
	// The ABC construction: W = Rz(β)·Ry(γ)·Rz(δ) with β = a, γ = b, δ = c (determinant 1, so
	// α = 0), A = Rz(β)·Ry(γ/2), B = Ry(−γ/2)·Rz(−(δ+β)/2), C = Rz((δ−β)/2), and controlled-W =
	// C, CX, B, CX, A in circuit order. Controlled-W itself is crz(δ), cry(γ), crz(β) in circuit
	// order: a controlled product is the product of the controlled factors.
	abcLeft := New(2).CRZ(c, 0, 1).CRY(b, 0, 1).CRZ(a, 0, 1)
	abcRight := New(2).
		RZ(c.Minus(a).Times(1, 2), 1).
		CX(0, 1).
		RZ(c.Plus(a).Times(-1, 2), 1).RY(b.Times(-1, 2), 1).
		CX(0, 1).
		RY(b.Times(1, 2), 1).RZ(a, 1)
	return []identity{
		{"rz(a)·rz(b) = rz(a+b)", "Nielsen & Chuang §4.2, eq. (4.6): rotations about one axis add",
			New(1).RZ(a, 0).RZ(b, 0), New(1).RZ(a.Plus(b), 0), true},
		{"rx(a)·rx(b) = rx(a+b)", "Nielsen & Chuang §4.2, eq. (4.4)",
			New(1).RX(a, 0).RX(b, 0), New(1).RX(a.Plus(b), 0), true},
		{"u(a,b,c) = rz(b)·ry(a)·rz(c) up to phase", "Nielsen & Chuang §4.2, Theorem 4.1 (Z-Y decomposition), with the u matrix of package circuit",
			New(1).U(a, b, c, 0), New(1).RZ(c, 0).RY(a, 0).RZ(b, 0), false},
		{"u(a,b,c) = p(b)·ry(a)·p(c)", "Theorem 4.1 with the phase e^{i(b+c)/2} absorbed: p(λ) = e^{iλ/2}·rz(λ) (N&C eq. 4.6)",
			New(1).U(a, b, c, 0), New(1).P(c, 0).RY(a, 0).P(b, 0), true},
		{"rz on the control commutes with cx", "Nielsen & Chuang §4.3: cx is block diagonal in the control's Z basis, where rz is diagonal",
			New(2).RZ(a, 0).CX(0, 1), New(2).CX(0, 1).RZ(a, 0), true},
		{"rzz(a) = cx·(I⊗rz(a))·cx", "Nielsen & Chuang §4.7.3: the parity computed by cx, rotated by rz, uncomputed",
			New(2).RZZ(a, 0, 1), New(2).CX(0, 1).RZ(a, 1).CX(0, 1), true},
		{"crz(a) = rz(a/2)·cx·rz(−a/2)·cx", "Nielsen & Chuang §4.3, Corollary 4.2 and Fig. 4.6 with A = Rz(a/2), B = Rz(−a/2), C = I",
			New(2).CRZ(a, 0, 1), New(2).RZ(half, 1).CX(0, 1).RZ(negHalf, 1).CX(0, 1), true},
		{"cry(a) = ry(a/2)·cx·ry(−a/2)·cx", "Nielsen & Chuang §4.3, Corollary 4.2 and Fig. 4.6 with A = Ry(a/2), B = Ry(−a/2), C = I",
			New(2).CRY(a, 0, 1), New(2).RY(half, 1).CX(0, 1).RY(negHalf, 1).CX(0, 1), true},
		{"cp(a) = p(a/2)⊗p(a/2)·cx·p(−a/2)·cx", "Nielsen & Chuang §4.3, Fig. 4.6: the phase e^{iα} with α = a/2 as a phase gate on the control",
			New(2).CP(a, 0, 1), New(2).P(half, 0).P(half, 1).CX(0, 1).P(negHalf, 1).CX(0, 1), true},
		{"controlled Rz(a)·Ry(b)·Rz(c) by the ABC construction", "Barenco et al. 1995, Lemma 5.1; Nielsen & Chuang §4.3, Corollary 4.2 and Fig. 4.6",
			abcLeft, abcRight, true},
		{"rz(a+2π) = rz(a) up to phase", "rz(a+2π) = −rz(a) (N&C eq. 4.6), equal up to the global phase −1",
			New(1).RZ(a.Plus(Pi(2, 1)), 0), New(1).RZ(a, 0), false},
		{"rz(a+4π) = rz(a)", "N&C eq. 4.6: e^{∓i(a+4π)/2} = e^{∓ia/2}",
			New(1).RZ(a.Plus(Pi(4, 1)), 0), New(1).RZ(a, 0), true},
		{"rz(2a−π/2) then rz(−a/2) = rz(3a/2 − π/2)", "N&C eq. 4.6, rational coefficients",
			New(1).RZ(a.Times(2, 1).Minus(Pi(1, 2)), 0).RZ(a.Times(-1, 2), 0), New(1).RZ(a.Times(3, 2).Minus(Pi(1, 2)), 0), true},
	}
}

func TestProveIdentities(t *testing.T) {
	for _, id := range identities() {
		t.Run(id.name, func(t *testing.T) {
			res, err := Prove(id.left, id.right, Options{ExactPhase: id.exact})
			if err != nil {
				t.Fatal(err)
			}
			if res.Verdict != Proved || res.Method != Grid {
				t.Fatalf("%s (%s): %v", id.name, id.source, res)
			}
			if !(res.Bound <= res.Tolerance) || res.Bound <= 0 {
				t.Errorf("bound %g, tolerance %g", res.Bound, res.Tolerance)
			}
			want := 1
			for _, d := range res.Degrees {
				want *= 2*d.Degree + 1
			}
			if res.Points != want {
				t.Errorf("%d points, want the grid's %d", res.Points, want)
			}
			// Brute force: the dense engine at random values well outside one period.
			names := mergeNames(id.left.Params(), id.right.Params())
			for k := range 50 {
				v := Values{}
				for i, n := range names {
					v[n] = 40 * math.Sin(float64(7*k+3*i+1)) // values in (−40, 40)
				}
				if d, err := distanceAt(id.left, id.right, v, id.exact); err != nil || d > res.Bound {
					t.Fatalf("at %v the distance is %g, above the certified bound %g (err %v)", v, d, res.Bound, err)
				}
			}
		})
	}
}

// wrong is a rule that does not hold, with what is known of its distance.
type wrong struct {
	name, why   string
	left, right *Circuit
	exact       bool
	// worst is the largest distance over all values, when known in closed form (0: unknown)
	worst float64
	// needs are the parameters a counterexample cannot fix, when known
	needs []string
}

func wrongRules() []wrong {
	return []wrong{
		{"Euler angles in the wrong order", "rz(b)·ry(a)·rz(c) is u(a,b,c); swapping b and c transposes the off-diagonal phases",
			New(1).U(a, b, c, 0), New(1).RZ(b, 0).RY(a, 0).RZ(c, 0), false, 0, nil},
		{"sign flip: rz(a)·rz(b) = rz(a−b)", "rotations add (N&C eq. 4.6); the error is rz(2b), which fails at the special value b = π/2 with a = 0; phase distance 2·sin(|2b|/4) mod the period, at most √2",
			New(1).RZ(a, 0).RZ(b, 0), New(1).RZ(a.Minus(b), 0), false, math.Sqrt2, []string{}},
		{"crz taken for cp", "V†U = diag(1, 1, e^{ia/2}, e^{ia/2}): eigenphases 0 and a/2, phase distance 2·sin(|a/2|/4), largest (√2) at a = 2π",
			New(2).CP(a, 0, 1), New(2).CRZ(a, 0, 1), false, math.Sqrt2, []string{}},
		{"rz(a+2π) = rz(a) exactly", "rz(a+2π) = −rz(a): ‖−R − R‖ = 2 for every a",
			New(1).RZ(a.Plus(Pi(2, 1)), 0), New(1).RZ(a, 0), true, 2, []string{}},
		{"crz(a+2π) = crz(a) up to phase", "V†U = diag(1, 1, −1, −1) for every a: eigenphases 0 and π, phase distance 2·sin(π/4) = √2",
			New(2).CRZ(a.Plus(Pi(2, 1)), 0, 1), New(2).CRZ(a, 0, 1), false, math.Sqrt2, []string{}},
		{"crz(a) with the halves' signs swapped", "X·Rz(θ)·X = Rz(−θ) (N&C §4.3), so swapping the signs gives crz(−a) up to a phase on the control",
			New(2).CRZ(a, 0, 1), New(2).RZ(a.Times(-1, 2), 1).CX(0, 1).RZ(a.Times(1, 2), 1).CX(0, 1), false, 0, nil},
		{"rz(4a) = identity", "rz(4a) is ±I at every special value of a but rz(π/2) at a = π/8: V†U = rz(4a), phase distance 2·sin(|4a|/4) folded, at most √2; no special value of a fails",
			New(1).RZ(a.Times(4, 1), 0), New(1), false, math.Sqrt2, []string{"a"}},
		{"cp(a) without the phase on the control", "Fig. 4.6 of N&C needs the phase e^{iα} on the control",
			New(2).CP(a, 0, 1), New(2).P(a.Times(1, 2), 1).CX(0, 1).P(a.Times(-1, 2), 1).CX(0, 1), false, 0, nil},
	}
}

func TestProveRefutes(t *testing.T) {
	for _, w := range wrongRules() {
		t.Run(w.name, func(t *testing.T) {
			res, err := Prove(w.left, w.right, Options{ExactPhase: w.exact})
			if err != nil {
				t.Fatal(err)
			}
			f := res.Failure
			if res.Verdict != Refuted || f == nil || f.At == nil {
				t.Fatalf("%s (%s): %v", w.name, w.why, res)
			}
			// The dense engine, called here directly, confirms the counterexample.
			lc, err := w.left.Bind(f.At)
			if err != nil {
				t.Fatal(err)
			}
			rc, err := w.right.Bind(f.At)
			if err != nil {
				t.Fatal(err)
			}
			u, _ := sim.Unitary(lc)
			v, _ := sim.Unitary(rc)
			d := metric.PhaseDistance(u, v)
			if w.exact {
				d = metric.Distance(u, v)
			}
			if !(d > res.Tolerance) || math.Abs(d-f.Distance) > 1e-12 {
				t.Errorf("at %v the dense engine gives %g; the failure says %g", f.At, d, f.Distance)
			}
			for name, r := range f.Pi {
				x, _ := r.Float64()
				if math.Abs(x*math.Pi-f.At[name]) > 1e-12*(1+math.Abs(f.At[name])) {
					t.Errorf("%s = %v but its exact value is %s·π", name, f.At[name], r)
				}
			}
			if !(f.Worst >= f.Distance) || f.Worst > res.Bound {
				t.Errorf("worst found %g, counterexample %g, certified bound %g", f.Worst, f.Distance, res.Bound)
			}
			if w.worst != 0 && math.Abs(f.Worst-w.worst) > 1e-6 {
				t.Errorf("worst distance found %.9g, want %.9g (%s)", f.Worst, w.worst, w.why)
			}
			if w.needs != nil && !slices.Equal(f.Needs, w.needs) {
				t.Errorf("needs %q, want %q: %v", f.Needs, w.needs, f)
			}
			for name, x := range f.At {
				if slices.Contains(f.Needs, name) {
					continue
				}
				if r, ok := f.Pi[name]; !ok || !slices.ContainsFunc(specialValues, func(s *big.Rat) bool { return s.Cmp(r) == 0 }) {
					t.Errorf("%s = %v is fixed but not to a special value", name, x)
				}
			}
		})
	}
}

func TestProveExactPhaseDependsOnParameters(t *testing.T) {
	// u(a,b,c) = e^{i(b+c)/2}·rz(b)·ry(a)·rz(c) (Theorem 4.1 of N&C with our u): equal up to a
	// phase that depends on b and c, so the exact comparison must fail, at values where b+c is
	// not a multiple of 4π.
	res, err := Prove(New(1).U(a, b, c, 0), New(1).RZ(c, 0).RY(a, 0).RZ(b, 0), Options{ExactPhase: true})
	if err != nil {
		t.Fatal(err)
	}
	if res.Verdict != Refuted {
		t.Fatalf("%v", res)
	}
	f := res.Failure
	// ‖e^{iφ}R − R‖ = |e^{iφ} − 1| = 2·|sin(φ/2)| with φ = (b+c)/2.
	if want := 2 * math.Abs(math.Sin((f.At["b"]+f.At["c"])/4)); math.Abs(f.Distance-want) > 1e-12 {
		t.Errorf("distance %g at %v, want 2|sin((b+c)/4)| = %g", f.Distance, f.At, want)
	}
	if !slices.Equal(f.Needs, []string{}) && len(f.Needs) > 1 {
		t.Errorf("needs %v: fixing all but one of b, c still fails", f.Needs)
	}
}

func TestProveUndecided(t *testing.T) {
	// rz(a) against rz(a + 3e-10): the phase distance is 2·sin(3e-10/4) ≈ 1.5e-10 everywhere,
	// below the tolerance, but the pair is not equal, so no bound below the tolerance can be
	// certified: the honest verdict is undecided.
	res, err := Prove(New(1).RZ(a, 0), New(1).RZ(a.Plus(Const(3e-10)), 0), Options{})
	if err != nil {
		t.Fatal(err)
	}
	if res.Verdict != Undecided || res.Failure == nil || res.Failure.At != nil {
		t.Fatalf("%v", res)
	}
	if w := res.Failure.Worst; math.Abs(w-2*math.Sin(3e-10/4)) > 1e-15 || w > res.Bound {
		t.Errorf("worst %g, bound %g", w, res.Bound)
	}
}

func TestProveRandomFallback(t *testing.T) {
	// With MaxPoints below the grid, the test is randomized and labelled so.
	id := identities()[2] // Euler angles: 245 grid points
	res, err := Prove(id.left, id.right, Options{MaxPoints: 100, Seed: 7})
	if err != nil {
		t.Fatal(err)
	}
	if res.Verdict != Probable || res.Method != Random || res.Points != randomPoints || !math.IsInf(res.Bound, 1) {
		t.Fatalf("%v", res)
	}
	// d = 2·(2+3+3) = 16: (16/2^32)^16.
	if want := math.Pow(16/math.Exp2(32), 16); math.Abs(res.ErrorProbability-want) > 1e-9*want {
		t.Errorf("error probability %g, want %g", res.ErrorProbability, want)
	}
	w := wrongRules()[0]
	res, err = Prove(w.left, w.right, Options{MaxPoints: 100, Seed: 7})
	if err != nil {
		t.Fatal(err)
	}
	if res.Verdict != Refuted || !(res.Failure.Distance > res.Tolerance) {
		t.Fatalf("%v", res)
	}
}

func TestProveErrors(t *testing.T) {
	for _, tc := range []struct {
		name        string
		left, right *Circuit
		opts        Options
		want        string // in the error
	}{
		{"widths", New(1).RZ(a, 0), New(2).RZ(a, 0), Options{}, "left has 1 qubit(s) and right 2"},
		{"qubit out of range", New(1).H(0).RZ(a, 1), New(1).RZ(a, 0), Options{}, "left: param: circuit: op 1 (rz): qubit 1 out of range"},
		{"bad name", New(1).RZ(a, 0), New(1).RZ(Var("1a"), 0), Options{}, `right: param: op 0 (rz): angle 1: parameter name "1a" is not an identifier`},
		{"zero denominator", New(1).RZ(a.Times(1, 0), 0), New(1).RZ(a, 0), Options{}, "zero denominator"},
		{"not finite", New(1).RZ(a.Plus(Const(math.Inf(1))), 0), New(1).RZ(a, 0), Options{}, "constant +Inf is not finite"},
		{"wrong number of angles", New(1).Gate(circuit.Gate{Name: "rz"}, []Expr{a, b}, 0), New(1), Options{}, "takes 1 angle(s), got 2"},
		{"negative tolerance", New(1).RZ(a, 0), New(1).RZ(a, 0), Options{Tolerance: -1}, "tolerance -1"},
		{"too wide", New(MaxQubits+1).RZ(a, 0), New(MaxQubits+1).RZ(a, 0), Options{}, "above the limit of 10"},
		{"too fine", New(1).RZ(a.Times(1, 1<<21), 0), New(1).RZ(a, 0), Options{}, "parameter a: the denominators"},
		{"unitary only", New(1).Gate(circuit.Gate{Name: "measure"}, nil, 0), New(1), Options{}, "measure"},
	} {
		res, err := Prove(tc.left, tc.right, tc.opts)
		if err == nil || !strings.Contains(err.Error(), tc.want) {
			t.Errorf("%s: got error %v (result %v), want one saying %q", tc.name, err, res, tc.want)
		}
	}
}

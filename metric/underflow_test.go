package metric

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/mat"
	"pgregory.net/rapid"
)

// A difference of two nearly equal unitaries can hold a rounding error beside a term hundreds of
// orders of magnitude smaller (found by the peephole example's rule check: rx(4.5e-131) before
// t·t against s). Its norm is the rounding error, to double precision: the tiny terms move it by
// about 1e-147 (first-order perturbation of a singular value, common practice). The tridiagonal
// reduction used to square the 1e-147 term to zero, divide by the zero norm of its column, and
// hand NaN to Dsterf.
func TestOperatorNormOfWidelyScaledEntries(t *testing.T) {
	a := mat.NewCDense(4, 4, []complex128{
		0, 0, 0, 0,
		-5.0052077379577523e-147i, 2.220446049250313e-16, 0, 0,
		0, 0, 0, 0,
		0, 0, -5.0052077379577523e-147i, 2.220446049250313e-16,
	})
	got := OperatorNorm(a)
	if want := 2.220446049250313e-16; math.Abs(got-want) > 1e-30 {
		t.Errorf("OperatorNorm = %g, want %g", got, want)
	}
}

// rx and ry are exp(−iθX/2) and exp(−iθY/2) (package circuit's conventions; Nielsen & Chuang §4.2).
func rx(theta float64) *mat.CDense {
	c, s := math.Cos(theta/2), math.Sin(theta/2)
	return gate(complex(c, 0), complex(0, -s), complex(0, -s), complex(c, 0))
}

func ry(theta float64) *mat.CDense {
	c, s := math.Cos(theta/2), math.Sin(theta/2)
	return gate(complex(c, 0), complex(-s, 0), complex(s, 0), complex(c, 0))
}

// onQubit returns the 2^n×2^n matrix of the 2×2 gate g on qubit q, qubit 0
// being the least significant bit of the index (package circuit's conventions): the Kronecker
// product with g at place q counted from the right.
func onQubit(g *mat.CDense, q, n int) *mat.CDense {
	m := identity(1)
	for k := n - 1; k >= 0; k-- {
		if k == q {
			m = kron(m, g)
		} else {
			m = kron(m, gateI)
		}
	}
	return m
}

// cx returns the 2^n×2^n matrix of CX with control c and target t: it flips
// bit t of the index where bit c is set (package circuit's conventions).
func cx(c, t, n int) *mat.CDense {
	m := mat.NewCDense(1<<n, 1<<n, nil)
	for x := 0; x < 1<<n; x++ {
		y := x
		if x>>c&1 == 1 {
			y ^= 1 << t
		}
		m.Set(y, x, 1)
	}
	return m
}

// The circuit found by review: rx(θ) q[0]; cx q[0],q[1]; ry(θ) q[2] against
// cx q[0],q[1]; t q[2], with θ = 1e-300 (Distance gave NaN, earlier a panic in
// Dsterf), and the other tiny angles of earlier reports. Expected values by
// hand: up to the tiny rotations the pair is CX against CX·T on q[2], so
// V†U = T† on q[2]: eigenphases 0 and −π/4 (Nielsen & Chuang §4.2). Hence
// ‖U − V‖ = |1 − e^{iπ/4}| = 2 sin(π/8), PhaseDistance = 2 sin(π/16) (arc
// π/4, the package documentation), Diamond = 2 sin(π/8), the witness reaches PhaseDistance
// (arc below π), and U's eigenphases are CX's {0, 0, 0, π} twice. The tiny
// rotations move each value by at most |θ| (each is within |θ|/2 of I in
// norm, Nielsen & Chuang §4.5.3).
//
// Against the plain CX, U − CX ≈ −i(θ/2)(Y₂ + X₀X₁)·CX to first order
// (CX·X₀·CX = X₀X₁, Nielsen & Chuang §4.3), and Y₂ + X₀X₁ is a sum of two
// commuting involutions with eigenvalues ±2, so ‖U − CX‖ = |θ| to relative
// order θ: a norm that the Gram matrix used to underflow to 0.
func TestTinyAnglesCircuit(t *testing.T) {
	const n = 3
	plain := cx(0, 1, n)
	v := mul(onQubit(gateT, 2, n), plain)
	wantPhases := []float64{0, 0, 0, 0, 0, 0, math.Pi, math.Pi}
	for _, theta := range []float64{1e-300, 5e-324, -1e-310, 2.2e-162, 4.66e-156, 1e-45, 1e-61, -3e-200} {
		u := mul(onQubit(ry(theta), 2, n), mul(plain, onQubit(rx(theta), 0, n)))
		near(t, "Distance", Distance(u, v), 2*math.Sin(math.Pi/8), 1e-15)
		near(t, "OperatorNorm(u)", OperatorNorm(u), 1, 1e-15)
		near(t, "PhaseDistance", PhaseDistance(u, v), 2*math.Sin(math.Pi/16), 1e-14)
		near(t, "Diamond", Diamond(u, v), 2*math.Sin(math.Pi/8), 1e-14)
		psi, dist := Witness(u, v)
		near(t, "Witness distance", dist, 2*math.Sin(math.Pi/16), 1e-14)
		near(t, "witness length", norm2(psi), 1, 1e-14)
		if e := phaseError(Eigenphases(u), wantPhases); e > 1e-14 || math.IsNaN(e) {
			t.Errorf("θ = %g: eigenphases %v, want %v", theta, Eigenphases(u), wantPhases)
		}
		near(t, "PhaseDistance(u, CX)", PhaseDistance(u, plain), 0, 1e-15)
		if math.Abs(theta) >= 1e-300 {
			// Relative check where θ/2 is a normal number, so the entries
			// carry it to full precision.
			d := Distance(u, plain)
			if math.Abs(d-math.Abs(theta)) > 1e-14*math.Abs(theta) {
				t.Errorf("θ = %g: ‖U − CX‖ = %g, want |θ|", theta, d)
			}
		}
	}
}

// tinyGate is one gate of a drawn circuit for TestPropertyTinyAngles.
type tinyGate struct {
	name   string // "rx", "ry", "rz", "h", "s", "t" or "cx"
	q, r   int    // the qubit; for cx the control q and target r
	angle  float64
	inBoth bool // whether the gate is in v as well as in u
}

// circuitMatrices returns the unitaries of the drawn gates (u) and of those
// with inBoth (v) on n qubits, with every angle of magnitude below cut set to
// exactly 0.
func circuitMatrices(gates []tinyGate, n int, cut float64) (u, v *mat.CDense) {
	u, v = identity(1<<n), identity(1<<n)
	for _, g := range gates {
		a := g.angle
		if math.Abs(a) < cut {
			a = 0
		}
		var m *mat.CDense
		switch g.name {
		case "rx":
			m = onQubit(rx(a), g.q, n)
		case "ry":
			m = onQubit(ry(a), g.q, n)
		case "rz":
			m = onQubit(rz(a), g.q, n)
		case "h":
			m = onQubit(gateH, g.q, n)
		case "s":
			m = onQubit(gateS, g.q, n)
		case "t":
			m = onQubit(gateT, g.q, n)
		case "cx":
			m = cx(g.q, g.r, n)
		}
		u = mul(m, u)
		if g.inBoth {
			v = mul(m, v)
		}
	}
	return u, v
}

// Circuits of rotations by angles drawn from the whole float64 range
// (subnormals, 1e-300, 1e300 and all between) mixed with Clifford and T gates: no function panics, every result is
// finite, and each agrees within 1e-12 with the same circuits where the
// angles below 1e-15 are set to 0. Setting them to 0 moves each gate by at
// most 5e-16 in operator norm, so the circuits by at most 6e-15 (errors add
// up, Nielsen & Chuang §4.5.3), and every measure here is 1-Lipschitz or
// 2-Lipschitz in that norm; 1e-12 leaves room for the package's accuracy
// (about 1e-14 at this size, package comment). v keeps a drawn subset of u's
// gates, so u and v often differ by the tiny rotations alone.
func TestPropertyTinyAngles(t *testing.T) {
	names := []string{"rx", "ry", "rz", "h", "s", "t", "cx"}
	// rapid.Float64 over the whole range, and as often a mantissa in
	// [−1, 1] times 2^k with k uniform over [−1074, 4], so that every scale
	// of tiny angle, subnormals included, comes up in a default run.
	angles := rapid.OneOf(rapid.Float64(), rapid.Custom(func(t *rapid.T) float64 {
		return math.Ldexp(rapid.Float64Range(-1, 1).Draw(t, "mantissa"), rapid.IntRange(-1074, 4).Draw(t, "exponent"))
	}))
	rapid.Check(t, func(t *rapid.T) {
		n := rapid.IntRange(1, 3).Draw(t, "qubits")
		count := rapid.IntRange(1, 12).Draw(t, "gates")
		gates := make([]tinyGate, count)
		for i := range gates {
			g := tinyGate{name: rapid.SampledFrom(names).Draw(t, "gate")}
			if g.name == "cx" && n < 2 {
				g.name = "rx"
			}
			g.q = rapid.IntRange(0, n-1).Draw(t, "qubit")
			if g.name == "cx" {
				g.r = (g.q + rapid.IntRange(1, n-1).Draw(t, "target offset")) % n
			}
			g.angle = angles.Draw(t, "angle")
			g.inBoth = rapid.Bool().Draw(t, "in both")
			gates[i] = g
		}
		u, v := circuitMatrices(gates, n, 0)
		u0, v0 := circuitMatrices(gates, n, 1e-15)
		const tol = 1e-12
		check := func(what string, got, want float64) {
			if math.IsNaN(got) || math.IsInf(got, 0) || math.Abs(got-want) > tol {
				t.Fatalf("%s = %.17g, with the tiny angles at 0 %.17g", what, got, want)
			}
		}
		check("Distance", Distance(u, v), Distance(u0, v0))
		check("OperatorNorm(u)", OperatorNorm(u), OperatorNorm(u0))
		check("OperatorNorm(u − v)", OperatorNorm(minus(u, v)), OperatorNorm(minus(u0, v0)))
		check("PhaseDistance", PhaseDistance(u, v), PhaseDistance(u0, v0))
		check("Diamond", Diamond(u, v), Diamond(u0, v0))
		psi, dist := Witness(u, v)
		_, dist0 := Witness(u0, v0)
		check("Witness distance", dist, dist0)
		check("witness length", norm2(psi), 1)
		for _, w := range [][2]*mat.CDense{{u, u0}, {mul(adjoint(v), u), mul(adjoint(v0), u0)}} {
			got, want := Eigenphases(w[0]), Eigenphases(w[1])
			for _, p := range got {
				if math.IsNaN(p) || math.IsInf(p, 0) {
					t.Fatalf("eigenphases %v", got)
				}
			}
			if e := phaseError(got, want); e > tol {
				t.Fatalf("eigenphases %v, with the tiny angles at 0 %v", got, want)
			}
		}
	})
}

// minus returns a − b, by the plain loop.
func minus(a, b mat.CMatrix) *mat.CDense {
	r, c := a.Dims()
	m := mat.NewCDense(r, c, nil)
	for i := 0; i < r; i++ {
		for j := 0; j < c; j++ {
			m.Set(i, j, a.At(i, j)-b.At(i, j))
		}
	}
	return m
}

// ‖s·A‖ = |s|·‖A‖ (a norm is absolutely homogeneous) for s of any size, so
// OperatorNorm(s·u) = |s| for a unitary u and Distance(s·u, s·v) =
// |s|·Distance(u, v), from subnormal s to s near the largest float64. Where
// s·u has subnormal entries they hold the product only to within 2^-1075
// each, which moves the norm by at most 2·n·2^-1075 = n·2^-1074 (the
// Frobenius bound, common practice);
// the margin allows that on top of 1e-13 relative. Distance is checked up to
// |s| = 2^1020, so that 2|s| stays representable.
func TestPropertyNormOfAnyScale(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		n := 1 << rapid.IntRange(0, 3).Draw(t, "qubits")
		u := drawUnitary(t, n, "u")
		v := drawNear(t, u, "v")
		s := math.Ldexp(rapid.Float64Range(0.5, 1).Draw(t, "mantissa"), rapid.IntRange(-1074, 1023).Draw(t, "exponent"))
		if rapid.Bool().Draw(t, "negative") {
			s = -s
		}
		margin := func(want float64) float64 { return 1e-13*want + float64(n)*0x1p-1074 }
		if got, want := OperatorNorm(scale(complex(s, 0), u)), math.Abs(s); !(math.Abs(got-want) <= margin(want)) {
			t.Fatalf("OperatorNorm(s·u) = %g, want |s| = %g", got, want)
		}
		if math.Abs(s) <= 0x1p1020 {
			got, want := Distance(scale(complex(s, 0), u), scale(complex(s, 0), v)), math.Abs(s)*Distance(u, v)
			if !(math.Abs(got-want) <= margin(want)+1e-13*math.Abs(s)) {
				t.Fatalf("Distance(s·u, s·v) = %g, want |s|·Distance(u, v) = %g", got, want)
			}
		}
	})
}

// StateDistance and StateFidelity depend only on the directions of the two
// vectors (their doc comments; Nielsen & Chuang §9.2 define them on unit
// states), so multiplying either state by any non-zero s, subnormal or near
// the largest float64, changes nothing beyond rounding. (Scales go down to
// 2^-1061: the largest amplitude of a unit state of 8 entries, at least
// 1/√8, stays non-zero; below that a state can truly round to the zero
// vector.) A state of tiny
// entries used to have a squared length of 0 and be refused as the zero
// vector.
func TestPropertyStatesOfAnyScale(t *testing.T) {
	scaleOf := func(t *rapid.T, label string) complex128 {
		return complex(math.Ldexp(rapid.Float64Range(0.5, 1).Draw(t, label+" mantissa"), rapid.IntRange(-1060, 1023).Draw(t, label+" exponent")), 0)
	}
	rapid.Check(t, func(t *rapid.T) {
		n := 1 << rapid.IntRange(0, 3).Draw(t, "qubits")
		a := haarState(newRand(rapid.Uint64().Draw(t, "a")), n)
		b := haarState(newRand(rapid.Uint64().Draw(t, "b")), n)
		if rapid.Bool().Draw(t, "near") {
			copy(b, a)
			b[0] += 1e-9
		}
		sa, sb := scaleOf(t, "a"), scaleOf(t, "b")
		xa, xb := make([]complex128, n), make([]complex128, n)
		for i := range a {
			xa[i], xb[i] = sa*a[i], sb*b[i]
		}
		// Subnormal scales keep only a few digits of each amplitude: the
		// tolerance grows as the smallest scale nears 2^-1074 (relative
		// rounding of an entry of size |s|/√n is at most 2^-1074·√n/|s|).
		tol := 1e-13 + 4*float64(n)*0x1p-1074/math.Min(real(sa), real(sb))
		if got, want := StateDistance(xa, xb), StateDistance(a, b); !(math.Abs(got-want) <= tol) {
			t.Fatalf("StateDistance of scaled states = %g, want %g", got, want)
		}
		if got, want := StateFidelity(xa, xb), StateFidelity(a, b); !(math.Abs(got-want) <= tol) {
			t.Fatalf("StateFidelity of scaled states = %g, want %g", got, want)
		}
	})
}

// Package param proves rewrite rules for every value of their angles.
//
// A rewrite rule is written with symbolic angles: rz(a)·rz(b) → rz(a+b), u(a,b,c) →
// rz(c)·ry(a)·rz(b). Drawing random angles catches most wrong rules but proves nothing, and a rule
// that is wrong only on a thin set (a sign at a = π, a 4π period taken for 2π) passes thousands
// of draws. This package builds circuits whose angles are affine expressions of named real
// parameters ([Expr], [Circuit]) and proves two of them equal for every value of the parameters
// ([Prove]), or refutes them with values at which they differ.
//
//	a, b := param.Var("a"), param.Var("b")
//	left := param.New(1).RZ(a, 0).RZ(b, 0)
//	right := param.New(1).RZ(a.Plus(b), 0)
//	res, err := param.Prove(left, right, param.Options{})
//	// res.Verdict == param.Proved, for every real a and b
//
// [Circuit.Bind] turns a parametric circuit into a circuit.Circuit for given values.
//
// # What a proof certifies
//
// Let U(θ) and V(θ) be the unitaries of the two sides, n×n with n = 2^qubits, and M(θ) = V(θ)†U(θ).
// The pair is equal up to a global phase at θ exactly when M(θ) is a multiple of the identity,
// that is when the conditions
//
//	M_ij(θ) = 0 (i ≠ j)   and   M_ii(θ) − M_00(θ) = 0
//
// all hold; the phase M_00(θ) may depend on θ. With ExactPhase the conditions are
// M_ij(θ) − δ_ij = 0. Both are finite sets of trigonometric polynomial identities, because:
//
// Frequencies. A gate's angle is φ = Σ_k c_k·θ_k + c_0 with rational c_k. Every entry of a gate
// matrix is a combination of e^{i·m·h·φ}, m ∈ {−1, 0, 1}, with h = 1/2 for the rotations (rx,
// ry, rz, their controlled forms, rxx, ryy, rzz, and the θ of u: cos(θ/2), e^{±iθ/2}) and h = 1
// for p, cp and the φ and λ of u (e^{iλ}). An entry of a product of gates is a sum of products
// of entries, so as a function of θ_k it is a combination of e^{i·f·θ_k} whose frequencies f are
// sums of m·h·c_k over the occurrences of θ_k. Let L_k be the least common denominator of the
// numbers h·c_k over all occurrences in both circuits, and substitute θ_k = L_k·t_k: every
// frequency in t_k is then an integer, of absolute value at most
//
//	D_k = L_k · Σ h·|c_k|   (the sum over every angle of both circuits in which θ_k occurs).
//
// Conjugation (V†) negates frequencies and products add them, so every entry of M, and every
// condition, is a trigonometric polynomial of degree at most D_k in each t_k, of period 2π in
// t_k: θ_k needs the whole period 2π·L_k, so that rz(a) is examined over 4π, not 2π. For
// rz(a)·rz(b) against rz(a+b): L = 2 and D = 2 for both a and b, 5×5 = 25 points. For
// u(a,b,c) against rz(c)·ry(a)·rz(b): a has D = 2·(1/2+1/2) = 2, b and c have D = 2·(1+1/2) = 3,
// 5×7×7 = 245 points. [Degree] reports L_k and D_k; the tests check the bound against the
// discrete Fourier transform of the dense matrices on a fine grid.
//
// One variable. A trigonometric polynomial f(t) = Σ_{|m|≤D} a_m·e^{imt} that vanishes at 2D+1
// distinct points of [0, 2π) is zero: z^D·f is a polynomial of degree at most 2D in z = e^{it}
// with 2D+1 distinct roots on the unit circle.
//
// Several variables, by induction on their number. Write f = Σ_{|m|≤D_N} a_m(t_1, …, t_{N−1})·
// e^{i·m·t_N}. At every point g of the grid of the first N−1 variables, f(g, ·) vanishes at the
// 2D_N+1 grid values of t_N, so every a_m(g) = 0. Each a_m is itself a trigonometric polynomial of
// degree at most D_k in t_k (it is the discrete Fourier coefficient (1/(2D_N+1))·Σ_j f(·, s_j)·
// e^{−i·m·s_j}, exact because the 2D_N+1 nodes see no aliasing of frequencies |m| ≤ D_N), and it
// vanishes on the grid of N−1 variables, so by induction every a_m is zero, and so is f. Hence the
// tensor grid of 2D_k+1 equally spaced values s_j = 2πj/(2D_k+1) of each t_k decides every
// condition: Π_k (2D_k+1) evaluations, each of two dense unitaries (package sim).
//
// From numbers to a bound. The evaluations are in floating point, so Prove does not claim that
// the conditions vanish exactly; it certifies a bound on the distance for every value of the
// parameters. Trigonometric interpolation at N = 2D+1 equally spaced nodes reproduces f:
//
//	f(t) = Σ_j f(s_j)·K(t − s_j),   K(s) = (1/N)·Σ_{|m|≤D} e^{ims} = sin(Ns/2) / (N·sin(s/2)),
//
// and on the tensor grid K is replaced by the product of the one-variable kernels. Hence
//
//	max over all θ of |f(θ)|  ≤  Λ · max over the grid of |f|,   Λ = Π_k Λ_{D_k},
//
// with Λ_D = max_t Σ_j |K(t − s_j)| the Lebesgue constant. Λ_D ≤ 2 + H_D (H_D = 1 + 1/2 + … +
// 1/D): let t lie between consecutive nodes and number the nodes k = 0, …, N−1 going right from
// t; node k is at distance at least (2π/N)·min(k, N−1−k) from t around the circle. The two
// nearest nodes give |K| ≤ 1 each (|sin(Nx)| ≤ N·|sin x|); for the others |sin(s/2)| ≥ |s|/π
// gives |K| ≤ 1/(2·min(k, N−1−k)), and those 2D−1 terms sum to H_{D−1} + 1/(2D) ≤ H_D. (The
// tests compare the bound with the constant computed on a fine grid.)
//
// If every condition is at most ρ in absolute value at θ, then E = M − M_00·I has entries at most
// ρ, ‖E‖ ≤ ‖E‖_F ≤ n·ρ, and since M is unitary |M_00| is within ‖E‖ of 1, so
//
//	min over φ of ‖U − e^{iφ}V‖ = min over φ of ‖M − e^{iφ}I‖ ≤ ‖E‖ + |1 − |M_00|| ≤ 2·n·ρ,
//
// and with ExactPhase ‖U − V‖ = ‖M − I‖ ≤ n·ρ. Let r_j be the largest condition computed at grid
// point j and η_j the rounding allowance of that evaluation: 2^−52·(8·(gates + n) + 2·Σ|φ|) over
// the angles φ of both circuits at that point. It is a first-order estimate, not a proven
// floating-point bound: applying a gate to a unit column costs at most about 8·2^−53 in norm (a
// few rounded complex products and sums, and the gate's own entries), an entry of M = V†U adds
// n·2^−53 by Cauchy–Schwarz, an angle of size |φ| is off by |φ|·2^−53, which moves its gate by at
// most 2·|φ|·2^−53, and a condition M_ii − M_00 is the difference of two entries (the leading 2).
// Prove reports
//
//	Result.Bound = (2)·n · Λ · max_j (r_j + η_j),
//
// the factor 2 only up to phase, and the verdict [Proved] when Bound ≤ Tolerance. What is
// certified is exactly this: for every real value of every parameter, the distance between the
// two sides (PhaseDistance, or ‖U − V‖ with ExactPhase) is at most Bound, given that η bounds the
// rounding of each evaluation. For the rules of the tests Bound is between 1.5e-13 and 2.6e-11, far
// below the default tolerance 1e-9.
//
// # When the grid is too large
//
// Beyond Options.MaxPoints grid points (DefaultMaxPoints) Prove evaluates 16 random points instead,
// each t_k drawn uniformly from the 2^32 equally spaced values 2πj/2^32, and labels a pass
// [Probable], not proved. Substituting z_k = e^{i·t_k}, a condition times Π z_k^{D_k} is a
// polynomial of total degree at most d = Σ 2D_k; if it is not identically zero it vanishes at one
// random point with probability at most d/2^32 (Schwartz–Zippel lemma), so at all 16 independent
// points with probability at most (d/2^32)^16, which Result.ErrorProbability reports. This
// concerns exact zeros: the test passes when the conditions are within the tolerance at those
// points, and a pair that differs by less than the tolerance there can pass. No bound is
// certified (Result.Bound is +Inf).
//
// # On failure
//
// When the bound is above the tolerance, Prove searches for the worst distance: the dense engine
// and metric.PhaseDistance (or metric.Distance) at every grid point, over one period of every
// parameter, then golden-section search along each parameter within one grid step of the worst
// point. If a grid point exceeds the tolerance the verdict is [Refuted], and the counterexample is
// shrunk: in name order each parameter is fixed to the first of 0, π, π/2, −π/2, 2π at which the
// remaining pair still fails somewhere on its own grid. Failure.At gives the values (exact
// multiples of π in Failure.Pi), Failure.Distance the distance there from the dense engine,
// Failure.Needs the parameters left free, and Failure.Worst the largest distance found with how
// it was searched. If no point exceeds the tolerance the verdict is [Undecided].
package param

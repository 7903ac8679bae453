package metric

import (
	"math"
	"math/cmplx"
	"sort"

	"gonum.org/v1/gonum/mat"
)

// DistributionGap bounds the largest total-variation distance, over all input states ψ, between
// the outcome distributions of measuring U|ψ⟩ and V|ψ⟩ in the computational basis, where basis
// state z of U's output reads as outcome outU[z] and basis state z of V's output as outcome
// outV[z]. Reading through a map covers measuring only some qubits (the others are forgotten)
// and measuring different qubits into the same classical bits. u and v must be square of equal
// order d, and outU, outV of length d with entries ≥ 0; otherwise DistributionGap panics.
//
// Let Π_c^U project onto U's output basis states that read as outcome c and Π_c^V likewise for V,
// and W = U·V†. The distributions agree for every input exactly when W maps each V-block into
// the U-block of the same outcome, that is when the off-block part
//
//	E = W − Σ_c Π_c^U W Π_c^V
//
// is zero. Proof: the probability of c is ⟨ψ|U†Π_c^U U|ψ⟩ after U and ⟨ψ|V†Π_c^V V|ψ⟩ after V;
// two Hermitian operators with equal quadratic forms on every ψ are equal, so the distributions
// agree for all inputs iff U†Π_c^U U = V†Π_c^V V for every c, iff Π_c^U W = W Π_c^V for every c
// (multiply by U on the left and V† on the right), iff W = Σ_c Π_c^U W Π_c^V.
//
// The bound. Let B = W − E, the block part. From W†W = I and the block structure,
// B†B = I − Σ_c Π_c^V E†E Π_c^V (the cross terms B†E and E†B map between different blocks), so
// every singular value σ of B has 1 − σ ≤ 1 − √(1 − ‖E‖²) ≤ ‖E‖², and when ‖E‖ < 1 the unitary
// polar factor Θ of B maps each V-block onto the U-block of the same outcome, with
// ‖W − Θ‖ ≤ ‖E‖ + ‖B − Θ‖ ≤ ‖E‖ + ‖E‖². For an input ψ put φ = Vψ, a = Wφ = Uψ and b = Θφ; then
// ‖Π_c^U b‖ = ‖Π_c^V φ‖, so b gives V's distribution, and
//
//	TV = ½ Σ_c |‖Π_c^U a‖² − ‖Π_c^U b‖²| ≤ ½ Σ_c ‖Π_c^U (a − b)‖ (‖Π_c^U a‖ + ‖Π_c^U b‖) ≤ ‖a − b‖
//
// by Cauchy–Schwarz and ‖a‖ = ‖b‖ = 1. Hence the largest total-variation distance is at most
// ‖E‖ + ‖E‖² (and at most 1), which is Upper, with ‖E‖ bounded from above by the smaller of its
// Frobenius norm and √(‖E‖₁‖E‖∞) (largest column and row sums of |E_ij|, Hölder's inequality),
// plus d·2⁻⁵², an allowance for the rounding of the product W (like every dense result, the bound
// holds up to floating-point rounding of U and V). The bound is first order in E, and so is the
// truth in general: on the input with Vψ = (|x⟩ + e^{iα}|y⟩)/√2, for x in another V-block than y,
// the probability of y's outcome moves by |(W†Π^U W)_yx| to first order, so Lower and Upper
// usually lie within a small factor of each other.
//
// Lower is the total-variation distance on Input, an input state built that way from the largest
// entries of E (or a basis input when that shows more); it is a lower bound on the largest
// total-variation distance, exact up to rounding. Computing W costs d³ complex multiply-adds.
func DistributionGap(u, v mat.CMatrix, outU, outV []int) Gap {
	d := pairSize("DistributionGap", u, v)
	if len(outU) != d || len(outV) != d {
		inputPanic("DistributionGap", "outcome maps have lengths %d and %d, want %d", len(outU), len(outV), d)
	}
	outcomes := 0
	for z := 0; z < d; z++ {
		if outU[z] < 0 || outV[z] < 0 {
			inputPanic("DistributionGap", "outcome of basis state %d is negative", z)
		}
		outcomes = max(outcomes, outU[z]+1, outV[z]+1)
	}
	ud, vd := rowMajor(u, nil), rowMajor(v, nil)
	// W = U·V† row-major is (W^T) column-major = conj(V)·U^T, with U^T column-major being U's
	// row-major buffer and conj(V) column-major the conjugate transpose of V's.
	cv := make([]complex128, d*d)
	for i := 0; i < d; i++ {
		for j := 0; j < d; j++ {
			cv[i+j*d] = cmplx.Conj(vd[i*d+j])
		}
	}
	w := make([]complex128, d*d)
	mulAdd(d, d, d, 1, cv, d, ud, d, w, d)

	// ‖E‖ from above.
	rows, cols := make([]float64, d), make([]float64, d)
	frob := 0.0
	var e []complex128 // the off-block part, kept only where its norm is computed exactly
	if d <= exactLeakOrder {
		e = make([]complex128, d*d)
	}
	for z := 0; z < d; z++ {
		for x := 0; x < d; x++ {
			if outU[z] != outV[x] {
				a := cmplx.Abs(w[z*d+x])
				rows[z] += a
				cols[x] += a
				frob += a * a
				if e != nil {
					e[z*d+x] = w[z*d+x]
				}
			}
		}
	}
	leak := math.Min(math.Sqrt(frob), math.Sqrt(maxOf(rows)*maxOf(cols)))
	if e != nil && leak > 0 {
		leak = math.Min(leak, operatorNorm(e, d, d))
	}
	leak += float64(d) * 0x1p-52
	g := Gap{Leak: leak, Upper: math.Min(1, leak+leak*leak)}

	// Lower: basis inputs Vψ = |x⟩ for the columns that leak most, and pair inputs for the
	// largest off-block entries.
	tv := newOutcomeTV(w, d, outU, outV, outcomes)
	best := func(lower float64, phi []amp) {
		if lower > g.Lower || g.Input == nil {
			g.Lower = lower
			g.Input = inputFor(vd, d, phi)
		}
	}
	type entry struct {
		z, x int
		a    float64
	}
	var top []entry
	const keep = 8
	for z := 0; z < d; z++ {
		for x := 0; x < d; x++ {
			if outU[z] == outV[x] {
				continue
			}
			if a := cmplx.Abs(w[z*d+x]); a > 0 && (len(top) < keep || a > top[len(top)-1].a) {
				top = append(top, entry{z, x, a})
				sort.Slice(top, func(i, j int) bool { return top[i].a > top[j].a })
				if len(top) > keep {
					top = top[:keep]
				}
			}
		}
	}
	if len(top) == 0 {
		best(tv.of([]amp{{0, 1}}), []amp{{0, 1}})
		return g
	}
	polished := map[int]bool{}
	for _, e := range top {
		basis := []amp{{e.x, 1}}
		best(tv.of(basis), basis)
		c := outU[e.z]
		y, wy := -1, -1.0
		for j := 0; j < d; j++ {
			if outV[j] == c {
				if a := cmplx.Abs(w[e.z*d+j]); a > wy {
					y, wy = j, a
				}
			}
		}
		if y < 0 {
			continue
		}
		var start []amp
		startTV := -1.0
		for k := 0; k < 8; k++ {
			phi := []amp{{e.x, complex(math.Sqrt2/2, 0)}, {y, cmplx.Rect(math.Sqrt2/2, float64(k)*math.Pi/4)}}
			v := tv.of(phi)
			best(v, phi)
			if v > startTV {
				start, startTV = phi, v
			}
		}
		if len(polished) < polishOutcomes && !polished[c] {
			polished[c] = true
			psi, v := polish(w, d, outU, outV, c, start, tv)
			if v > g.Lower {
				g.Lower, g.Input = v, inputForDense(vd, d, psi)
			}
		}
	}
	return g
}

// exactLeakOrder is the largest order at which DistributionGap computes ‖E‖ exactly (an
// eigenvalue problem of the same size) rather than bounding it by norms of its entries.
const exactLeakOrder = 1 << 10

// polishOutcomes and polishSteps bound the power iteration that sharpens Lower: for this many
// outcomes, this many steps.
const polishOutcomes, polishSteps = 2, 12

// polish improves an input for outcome c by power iteration on F = W†Π_c^U W − Π_c^V, whose
// quadratic form ⟨φ|F|φ⟩ is the change of c's probability for the input with Vψ = φ; the
// largest |⟨φ|F|φ⟩| is ‖F‖, a lower bound on the largest total-variation distance (exact when
// there are two outcomes). It starts from a sparse φ and returns the best φ met, with its
// total-variation distance.
func polish(w []complex128, d int, outU, outV []int, c int, start []amp, tv *outcomeTV) ([]complex128, float64) {
	phi := make([]complex128, d)
	for _, e := range start {
		phi[e.i] = e.c
	}
	bestPhi, bestTV := append([]complex128(nil), phi...), tv.ofDense(phi)
	a, f := make([]complex128, d), make([]complex128, d)
	for step := 0; step < polishSteps; step++ {
		// a = Π_c^U W φ; f = W† a − Π_c^V φ.
		for z := 0; z < d; z++ {
			a[z] = 0
			if outU[z] == c {
				var s complex128
				for x, p := range phi {
					s += w[z*d+x] * p
				}
				a[z] = s
			}
		}
		clear(f)
		for z, az := range a {
			if az != 0 {
				for x := 0; x < d; x++ {
					f[x] += cmplx.Conj(w[z*d+x]) * az
				}
			}
		}
		norm := 0.0
		for x := range f {
			if outV[x] == c {
				f[x] -= phi[x]
			}
			norm += real(f[x])*real(f[x]) + imag(f[x])*imag(f[x])
		}
		if norm == 0 {
			break
		}
		norm = math.Sqrt(norm)
		for x := range f {
			phi[x] = f[x] / complex(norm, 0)
		}
		if v := tv.ofDense(phi); v > bestTV {
			bestTV = v
			copy(bestPhi, phi)
		}
	}
	return bestPhi, bestTV
}

// Gap is DistributionGap's answer: a certified upper bound on the largest total-variation
// distance of the outcome distributions over all inputs, an input and its total-variation
// distance (a lower bound), and the bound on the operator norm of the off-block part of U·V†
// that gives Upper.
type Gap struct {
	Upper, Lower float64
	Input        []complex128
	Leak         float64
}

// amp is one amplitude of a sparse state: c on basis state i.
type amp struct {
	i int
	c complex128
}

// outcomeTV computes total-variation distances from W for inputs given by Vψ = φ.
type outcomeTV struct {
	w          []complex128
	d          int
	outU, outV []int
	pu, pv     []float64
	a          []complex128
}

func newOutcomeTV(w []complex128, d int, outU, outV []int, outcomes int) *outcomeTV {
	return &outcomeTV{w: w, d: d, outU: outU, outV: outV, pu: make([]float64, outcomes), pv: make([]float64, outcomes), a: make([]complex128, d)}
}

// of returns the total-variation distance for the sparse φ = Vψ: U's output is Wφ and V's is φ.
func (t *outcomeTV) of(phi []amp) float64 {
	clear(t.pu)
	clear(t.pv)
	clear(t.a)
	for _, e := range phi {
		x, c := e.i, e.c
		for z := 0; z < t.d; z++ {
			t.a[z] += t.w[z*t.d+x] * c
		}
		t.pv[t.outV[x]] += real(c)*real(c) + imag(c)*imag(c)
	}
	for z, c := range t.a {
		t.pu[t.outU[z]] += real(c)*real(c) + imag(c)*imag(c)
	}
	s := 0.0
	for o := range t.pu {
		s += math.Abs(t.pu[o] - t.pv[o])
	}
	return s / 2
}

// ofDense is of for a dense φ.
func (t *outcomeTV) ofDense(phi []complex128) float64 {
	sparse := make([]amp, 0, len(phi))
	for x, c := range phi {
		if c != 0 {
			sparse = append(sparse, amp{x, c})
		}
	}
	return t.of(sparse)
}

// inputForDense returns ψ = V†φ, given V row-major.
func inputForDense(vd []complex128, d int, phi []complex128) []complex128 {
	sparse := make([]amp, 0, len(phi))
	for x, c := range phi {
		if c != 0 {
			sparse = append(sparse, amp{x, c})
		}
	}
	return inputFor(vd, d, sparse)
}

// inputFor returns ψ = V†φ for a sparse φ, given V row-major.
func inputFor(vd []complex128, d int, phi []amp) []complex128 {
	psi := make([]complex128, d)
	for _, e := range phi {
		x, c := e.i, e.c
		for j := 0; j < d; j++ {
			psi[j] += cmplx.Conj(vd[x*d+j]) * c
		}
	}
	return psi
}

func maxOf(xs []float64) float64 {
	m := 0.0
	for _, x := range xs {
		m = math.Max(m, x)
	}
	return m
}

package gen

import (
	"math"
	"slices"

	"gonum.org/v1/gonum/mat"
)

// eigenphases returns the eigenphases of the unitary u, each in [−π, π),
// sorted. Test-only: it serves the spacing test and is checked against
// unitaries built with known eigenphases.
//
// Method: the Cayley transform H = i(I − W)(I + W)^{−1} of a unitary W is
// Hermitian, with eigenvalue tan(θ/2) for each eigenvalue e^{iθ} of W (the
// map λ ↦ i(1 − λ)/(1 + λ) sends the unit circle to the real line; e.g.
// Horn & Johnson, Matrix Analysis, §2.1, problems on the Cayley transform).
// Complex products and inverses are done in the real embedding
// A + iB ↦ [[A, −B], [B, A]], where a Hermitian matrix becomes a symmetric one
// with every eigenvalue twice, so gonum's real routines serve. W = e^{iφ}u
// with φ chosen so that no eigenvalue of W sits near −1, where the transform
// loses accuracy.
func eigenphases(u *mat.CDense) []float64 {
	n, _ := u.Dims()
	for attempt := 0; ; attempt++ {
		phi := 0.37 * float64(attempt) // any sequence of distinct shifts serves
		rot := complex(math.Cos(phi), math.Sin(phi))
		plus := mat.NewDense(2*n, 2*n, nil)
		minus := mat.NewDense(2*n, 2*n, nil)
		for i := range n {
			for j := range n {
				w := rot * u.At(i, j)
				var id complex128
				if i == j {
					id = 1
				}
				embed(plus, i, j, n, id+w)
				embed(minus, i, j, n, id-w)
			}
		}
		var inv, x mat.Dense
		if err := inv.Inverse(plus); err != nil {
			continue
		}
		x.Mul(minus, &inv)
		// H = i·X: with X = P + iQ, iX = −Q + iP.
		h := mat.NewSymDense(2*n, nil)
		for i := range 2 * n {
			for j := i; j < 2*n; j++ {
				h.SetSym(i, j, (hEntry(&x, i, j, n)+hEntry(&x, j, i, n))/2)
			}
		}
		var eig mat.EigenSym
		if !eig.Factorize(h, false) {
			continue
		}
		vals := eig.Values(nil)
		slices.Sort(vals)
		if math.Max(-vals[0], vals[len(vals)-1]) > 1e4 {
			continue // an eigenvalue of W lies within ~2e-4 of −1
		}
		phases := make([]float64, n)
		for k := range n {
			theta := 2*math.Atan(vals[2*k]) - phi
			phases[k] = theta - 2*math.Pi*math.Floor((theta+math.Pi)/(2*math.Pi))
		}
		slices.Sort(phases)
		return phases
	}
}

// embed writes the complex entry z at (i, j) of an n×n matrix into its real
// embedding m = [[Re, −Im], [Im, Re]].
func embed(m *mat.Dense, i, j, n int, z complex128) {
	m.Set(i, j, real(z))
	m.Set(i, j+n, -imag(z))
	m.Set(i+n, j, imag(z))
	m.Set(i+n, j+n, real(z))
}

// hEntry returns entry (i, j) of the real embedding of i·X, given the real
// embedding x of X: iX has real part −Im X and imaginary part Re X.
func hEntry(x *mat.Dense, i, j, n int) float64 {
	// In the embedding of Y = iX: block (0,0) = Re Y = −Im X = x[n+·, ·];
	// block (1,0) = Im Y = Re X = x[·, ·]; the other blocks follow.
	bi, bj := i/n, j/n
	ri, rj := i%n, j%n
	reX := x.At(ri, rj)
	imX := x.At(ri+n, rj)
	reY, imY := -imX, reX
	switch {
	case bi == bj:
		return reY
	case bi == 1:
		return imY
	default:
		return -imY
	}
}

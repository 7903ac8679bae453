package synthesis

import (
	"math"
	"math/cmplx"
)

// quat is an element of SU(2) as a unit quaternion: (a, b, c, d) stands for
// a·I − i(b·X + c·Y + d·Z). Quaternion multiplication is then matrix multiplication, since
// (−iX)(−iY) = −iZ matches i·j = k. q and −q are the same operator up to global phase.
type quat [4]float64

// mul returns the product p·q (q applied first).
func (p quat) mul(q quat) quat {
	return quat{
		p[0]*q[0] - p[1]*q[1] - p[2]*q[2] - p[3]*q[3],
		p[0]*q[1] + p[1]*q[0] + p[2]*q[3] - p[3]*q[2],
		p[0]*q[2] - p[1]*q[3] + p[2]*q[0] + p[3]*q[1],
		p[0]*q[3] + p[1]*q[2] - p[2]*q[1] + p[3]*q[0],
	}
}

// inv returns the inverse (the conjugate quaternion, the adjoint matrix).
func (p quat) inv() quat { return quat{p[0], -p[1], -p[2], -p[3]} }

// dot returns the inner product of p and q as vectors of R⁴, which is Re tr(q†p)/2.
func (p quat) dot(q quat) float64 { return p[0]*q[0] + p[1]*q[1] + p[2]*q[2] + p[3]*q[3] }

// distance returns the phase-free operator-norm distance min_φ ‖P − e^{iφ}Q‖ of two elements of
// SU(2): Q†P has eigenvalues e^{±iα} with cos α = p·q, so the eigenphases fit in an arc of
// 2·min(α, π − α) and the distance is 2·sin(min(α, π − α)/2) = √(2 − 2|p·q|) (the shortest-arc
// formula of package metric's documentation). That is the shorter of the chords ‖p − q‖ and ‖p + q‖,
// which is how it is computed: without the cancellation of 2 − 2|p·q| near 0.
func (p quat) distance(q quat) float64 {
	var minus, plus float64
	for i := range p {
		a, b := p[i]-q[i], p[i]+q[i]
		minus += a * a
		plus += b * b
	}
	return math.Sqrt(math.Min(minus, plus))
}

// canonical returns ±p with a positive first component that is not negligible, one
// representative per operator modulo global phase (the same for operators that agree to within
// keyGrid).
func (p quat) canonical() quat {
	for _, x := range p {
		if x > keyGrid {
			return p
		}
		if x < -keyGrid {
			return quat{-p[0], -p[1], -p[2], -p[3]}
		}
	}
	return p
}

// rotation returns the rotation by angle phi about the unit axis n: cos(φ/2)·I − i·sin(φ/2)·n·σ.
func rotation(phi float64, n [3]float64) quat {
	s, c := math.Sincos(phi / 2)
	return quat{c, s * n[0], s * n[1], s * n[2]}
}

// angleAxis returns the rotation angle θ ∈ [0, π] of ±p and its unit axis (any axis when θ = 0).
func (p quat) angleAxis() (float64, [3]float64) {
	if p[0] < 0 {
		p = quat{-p[0], -p[1], -p[2], -p[3]}
	}
	s := math.Sqrt(p[1]*p[1] + p[2]*p[2] + p[3]*p[3])
	if s == 0 {
		return 0, [3]float64{0, 0, 1}
	}
	return 2 * math.Atan2(s, p[0]), [3]float64{p[1] / s, p[2] / s, p[3] / s}
}

// fromMatrix returns the element of SU(2) equal to the 2×2 unitary m (row-major) up to global
// phase: m/√det m, read off as a quaternion.
func fromMatrix(m []complex128) quat {
	det := m[0]*m[3] - m[1]*m[2]
	r := 1 / cmplx.Sqrt(det)
	u00, u10 := m[0]*r, m[2]*r
	q := quat{real(u00), -imag(u10), real(u10), -imag(u00)}
	n := math.Sqrt(q.dot(q))
	return quat{q[0] / n, q[1] / n, q[2] / n, q[3] / n}
}

// matrix returns the 2×2 matrix of p, row-major: [[a − id, −c − ib], [c − ib, a + id]].
func (p quat) matrix() []complex128 {
	a, b, c, d := p[0], p[1], p[2], p[3]
	return []complex128{complex(a, -d), complex(-c, -b), complex(c, -b), complex(a, d)}
}

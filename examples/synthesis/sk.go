package synthesis

import "math"

// approximation is a word with its operator.
type approximation struct {
	w word
	q quat
}

// approximate returns the word of the first level of the recursion, from 0 up to maxLevels, whose
// operator is within eps of u, with its distance (recomputed from the word's letters) and the
// level; when no level reaches eps, the deepest level's word.
func (n *Net) approximate(u quat, eps float64, maxLevels int) (word, float64, int) {
	var (
		w     word
		dist  float64
		level int
	)
	for level = 0; level <= maxLevels; level++ {
		w = n.solovayKitaev(u, level).w
		if dist = u.distance(w.element()); dist <= eps {
			break
		}
	}
	return w, dist, min(level, maxLevels)
}

// solovayKitaev returns a word approximating u with n levels of the recursion of Dawson &
// Nielsen (2006), as their algorithm states it, on top of the net's basic approximations:
//
//	U₀ = nearest word in the net
//	Uₙ = Vₙ₋₁·Wₙ₋₁·Vₙ₋₁†·Wₙ₋₁†·Uₙ₋₁, where V·W·V†·W† = U·Uₙ₋₁† (balanced group commutator)
//
// and Vₙ₋₁, Wₙ₋₁ approximate V and W with n − 1 levels.
func (n *Net) solovayKitaev(u quat, level int) approximation {
	if level == 0 {
		w, q := n.nearest(u)
		return approximation{w, q}
	}
	prev := n.solovayKitaev(u, level-1)
	v, w := groupCommutator(u.mul(prev.q.inv()))
	av := n.solovayKitaev(v, level-1)
	aw := n.solovayKitaev(w, level-1)
	// In circuit order the product V·W·V†·W†·U₀ applies U₀ first, then W†, V†, W, V.
	out := make(word, 0, len(prev.w)+2*len(av.w)+2*len(aw.w))
	out = append(out, prev.w...)
	out = append(out, aw.w.inverse()...)
	out = append(out, av.w.inverse()...)
	out = append(out, aw.w...)
	out = append(out, av.w...)
	q := av.q.mul(aw.q).mul(av.q.inv()).mul(aw.q.inv()).mul(prev.q)
	return approximation{out.simplify(), q}
}

// groupCommutator returns V and W with V·W·V†·W† = Δ, balanced so that both are rotations by the
// same small angle φ (the construction of Dawson & Nielsen 2006; TestGroupCommutator checks the
// product reproduces Δ). For Δ a rotation by θ about n̂, take
// V = Rx(φ) and W = Ry(φ) with
//
//	sin(θ/2) = 2·sin²(φ/2)·√(1 − sin⁴(φ/2)),
//
// whose commutator is a rotation by θ about some axis m̂; conjugating both by the rotation S that
// takes m̂ to n̂ makes the commutator S·(V·W·V†·W†)·S† = Δ. Solving for s = sin²(φ/2):
// 4s²(1 − s²) = sin²(θ/2), so s² = (1 − cos(θ/2))/2, the root with φ ≤ π/2.
func groupCommutator(delta quat) (quat, quat) {
	theta, axis := delta.angleAxis()
	if theta == 0 {
		return quat{1, 0, 0, 0}, quat{1, 0, 0, 0}
	}
	s := math.Sqrt((1 - math.Cos(theta/2)) / 2)
	phi := 2 * math.Asin(math.Sqrt(s))
	v := rotation(phi, [3]float64{1, 0, 0})
	w := rotation(phi, [3]float64{0, 1, 0})
	_, m := v.mul(w).mul(v.inv()).mul(w.inv()).angleAxis()
	r := rotationBetween(m, axis)
	return r.mul(v).mul(r.inv()), r.mul(w).mul(r.inv())
}

// rotationBetween returns a rotation that takes the unit vector a to the unit vector b (about
// a × b by the angle between them; about any axis perpendicular to a when they are opposite).
func rotationBetween(a, b [3]float64) quat {
	cross := [3]float64{a[1]*b[2] - a[2]*b[1], a[2]*b[0] - a[0]*b[2], a[0]*b[1] - a[1]*b[0]}
	dot := a[0]*b[0] + a[1]*b[1] + a[2]*b[2]
	s := math.Sqrt(cross[0]*cross[0] + cross[1]*cross[1] + cross[2]*cross[2])
	if s < 1e-12 {
		if dot > 0 {
			return quat{1, 0, 0, 0}
		}
		// Opposite: turn by π about an axis perpendicular to a.
		p := [3]float64{-a[1], a[0], 0}
		if math.Abs(a[2]) > 0.9 {
			p = [3]float64{0, -a[2], a[1]}
		}
		l := math.Sqrt(p[0]*p[0] + p[1]*p[1] + p[2]*p[2])
		return rotation(math.Pi, [3]float64{p[0] / l, p[1] / l, p[2] / l})
	}
	return rotation(math.Atan2(s, dot), [3]float64{cross[0] / s, cross[1] / s, cross[2] / s})
}

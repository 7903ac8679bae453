package zx

import (
	"math"

	"qcheck.dev/qcheck/circuit"
)

// quarter is π/4 in float64, the unit of the exact part of a phase.
const quarter = math.Pi / 4

// eps is the unit roundoff of float64, 2^-53.
const eps = 0x1p-53

// phase is a spider's phase k·π/4 + r: k, taken mod 8, is exact; r is the residual in radians, a
// signed sum of the residuals of the circuits' angles, computed in floating point. Constants of
// the rules (π/2 for a local complementation, π for a pivot) only ever touch k, so they carry no
// rounding.
type phase struct {
	k int8
	r float64
}

func exact(k int) phase { return phase{k: int8(((k % 8) + 8) % 8)} }

func (p phase) add(q phase, g *graph) phase {
	s := phase{k: int8((int(p.k) + int(q.k)) % 8), r: p.r + q.r}
	if p.r != 0 && q.r != 0 {
		g.slack += eps * math.Abs(s.r)
	}
	return s
}

func (p phase) neg() phase { return phase{k: int8((8 - int(p.k)) % 8), r: -p.r} }

// near returns the multiple m of π/4 nearest to the residual and the distance d = r − m·π/4.
func (p phase) near() (m int, d float64) {
	m = int(math.Round(p.r / quarter))
	return m, p.r - float64(m)*quarter
}

// class reports the phase as a multiple of π/4 when it is within tol of one: ok is false for a
// phase farther than tol from every multiple of π/4.
func (p phase) class(tol float64) (k int, ok bool) {
	m, d := p.near()
	if math.Abs(d) > tol {
		return 0, false
	}
	return ((int(p.k)+m)%8 + 8) % 8, true
}

// angleToPhase converts an angle in radians exactly (circuit.QuarterTurns reduces it against a
// many-digit π), adding to g.slack the half ulp by which the residual may be off.
func angleToPhase(theta float64, g *graph) phase {
	k, off := circuit.QuarterTurns(theta)
	g.slack += eps * math.Abs(off)
	return phase{k: int8(2 * k % 8), r: off}
}

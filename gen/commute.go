package gen

import (
	"math/cmplx"

	"qcheck.dev/qcheck/circuit"
)

// genericAngle is the angle given to every parameter of a gate whose
// commutation Circuit tests: one that is not a multiple of π/4, so that a
// rotation commutes with another gate only where its axis does (common
// practice; any such angle serves).
const genericAngle = 0.7

// blocks returns, for each operand of gate g, whether the single-qubit gate
// a placed on that operand fails to commute with g. Those are the roles in
// which a sandwich's single-qubit first op, written again after g, may not
// be moved across it: where a pass with a wrong commutation rule merges the
// two anyway. Both matrices are in the order of circuit.Gate.Matrix.
func blocks(a, g circuit.Gate) []bool {
	a, g = withGenericAngles(a), withGenericAngles(g)
	am, gm := a.Elements(), g.Elements()
	k := g.Qubits()
	out := make([]bool, k)
	if len(am) != 4 || gm == nil {
		return out
	}
	d := 1 << k
	for pos := range k {
		bit := k - 1 - pos // the first operand is the most significant bit
		// e = a on operand pos, identity elsewhere.
		e := make([]complex128, d*d)
		for r := range d {
			for c := range d {
				if r&^(1<<bit) == c&^(1<<bit) {
					e[r*d+c] = am[(r>>bit&1)*2+c>>bit&1]
				}
			}
		}
		for r := range d {
			for c := range d {
				var eg, ge complex128
				for m := range d {
					eg += e[r*d+m] * gm[m*d+c]
					ge += gm[r*d+m] * e[m*d+c]
				}
				if cmplx.Abs(eg-ge) > 1e-9 {
					out[pos] = true
				}
			}
		}
	}
	return out
}

// withGenericAngles returns g with every angle set to genericAngle.
func withGenericAngles(g circuit.Gate) circuit.Gate {
	if len(g.Params) == 0 {
		return g
	}
	g.Params = make([]float64, len(g.Params))
	for i := range g.Params {
		g.Params[i] = genericAngle
	}
	return g
}

package gen

import (
	"math"

	"pgregory.net/rapid"
)

// specialMagnitudes are the sizes of the angles at which rotation gates
// become Cliffords, identities or their negatives, simplest first so that
// shrinking, which lowers the index, ends on the simplest one that still
// fails. A sign is drawn for each.
var specialMagnitudes = []float64{0, math.Pi / 4, math.Pi / 2, 3 * math.Pi / 4, math.Pi, 2 * math.Pi, 4 * math.Pi}

// tinyBases are the angles a tiny angle is close to.
var tinyBases = []float64{0, 2 * math.Pi, -2 * math.Pi}

// Tiny offsets are 10^−e for tinyExponents values of e from 5.
const tinyExponents = 11

// Kinds of angle, with their weights out of 8. Order matters: shrinking moves
// toward kind 0.
const (
	angleSpecial    = iota // ± one of specialMagnitudes
	angleContinuous        // uniform on (−2π, 2π)
	angleTiny              // a tiny base plus or minus 10^−e, 5 ≤ e ≤ 15
)

var angleWeights = []int{angleSpecial: 4, angleContinuous: 3, angleTiny: 1}

// angleSteps is the size of the one integer every angle is built from. It is
// a multiple of 7 (special magnitudes) and of 33 (tiny bases × exponents), so
// each kind reads its fields from it without bias; continuous angles are
// multiples of 2π/angleSteps, a step below 5e-10.
const angleSteps = 7 * 3 * tinyExponents * (1 << 26)

// Angle returns a generator of rotation angles in radians that reaches the
// values where compiler bugs hide. Half of the draws are special angles (0,
// ±π/4, ±π/2, ±3π/4, ±π, ±2π, ±4π; 0 twice as often as each other), three
// in eight are continuous (uniform on (−2π, 2π) in steps below 5e-10), and one
// in eight is tiny: ±10^−e with 5 ≤ e ≤ 15 added to 0 or to ±2π, where a pass
// that rounds angles or treats rz(2π) as the identity shows itself. A failing
// angle shrinks toward 0, then through the special angles in the order
// listed, positive before negative.
func Angle() *rapid.Generator[float64] {
	return rapid.Custom(drawAngle)
}

// drawAngle draws a kind, one integer and a sign, whatever the kind, so that
// when shrinking changes the kind the draws that follow keep their meaning.
func drawAngle(t *rapid.T) float64 {
	kind := drawWeighted(t, angleWeights)
	v := drawBelow(t, angleSteps)
	negative := bit.Draw(t, "negative")
	var theta float64
	switch kind {
	case angleSpecial:
		theta = specialMagnitudes[v%len(specialMagnitudes)]
	case angleContinuous:
		theta = 2 * math.Pi * float64(v) / angleSteps
	default:
		delta := math.Pow(10, -float64(5+v%tinyExponents))
		if negative {
			delta = -delta
		}
		return tinyBases[v/tinyExponents%len(tinyBases)] + delta
	}
	if negative {
		theta = -theta
	}
	return theta
}

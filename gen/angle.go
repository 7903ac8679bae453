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

// tinyMagnitudes are the sizes of the branch points a tiny angle is close
// to, where rotation gates become identities, their negatives or Paulis and
// where a pass that rounds π or reduces modulo 2π (where 4π is needed)
// changes its answer. A sign is drawn for each; 0 is listed twice, so that it
// comes as often as each signed point.
var tinyMagnitudes = []float64{0, 2 * math.Pi, math.Pi, math.Pi / 2, 4 * math.Pi, 0}

// Tiny offsets are 10^−e for tinyExponents values of e from 5.
const tinyExponents = 11

// Kinds of angle, with their weights out of 8. Order matters: shrinking moves
// toward kind 0.
const (
	angleSpecial    = iota // ± one of specialMagnitudes
	angleContinuous        // uniform on (−2π, 2π)
	angleTiny              // a tiny base plus or minus 10^−e, 5 ≤ e ≤ 15
)

var angleWeights = []int{angleSpecial: 4, angleContinuous: 2, angleTiny: 2}

// angleSteps is the size of the one integer every angle is built from. It is
// a multiple of 7 (special magnitudes) and of 132 (tiny exponents × tiny
// magnitudes × the sign of the magnitude), so each kind reads its fields from
// it without bias; continuous angles are multiples of 2π/angleSteps, a step
// below 5e-10.
const angleSteps = 7 * 3 * tinyExponents * (1 << 26)

// Angle returns a generator of rotation angles in radians that reaches the
// values where compiler bugs hide. Half of the draws are special angles (0,
// ±π/4, ±π/2, ±3π/4, ±π, ±2π, ±4π; 0 twice as often as each other), one in
// four is continuous (uniform on (−2π, 2π) in steps below 5e-10), and one in
// four is a hair off a branch point: ±10^−e with 5 ≤ e ≤ 15 added to 0, ±π/2,
// ±π, ±2π or ±4π (0 a third of the time, each other point one time in
// twelve), where a pass that rounds angles, treats rz(2π) as the identity or
// reduces modulo 2π where 4π is needed shows itself. A failing angle shrinks
// toward 0, then through the special angles in the order listed, positive
// before negative.
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
		w := v / tinyExponents
		base := tinyMagnitudes[w%len(tinyMagnitudes)]
		if w/len(tinyMagnitudes)%2 == 1 {
			base = -base
		}
		return base + delta
	}
	if negative {
		theta = -theta
	}
	return theta
}

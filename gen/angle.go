package gen

import (
	"math"

	"pgregory.net/rapid"
)

// specialAngles are the angles at which rotation gates become Cliffords,
// identities or their negatives, ordered from simplest to least simple so that
// shrinking, which lowers the index, ends on the simplest angle that still
// fails.
var specialAngles = []float64{
	0,
	math.Pi / 4, -math.Pi / 4,
	math.Pi / 2, -math.Pi / 2,
	3 * math.Pi / 4, -3 * math.Pi / 4,
	math.Pi, -math.Pi,
	2 * math.Pi, -2 * math.Pi,
	4 * math.Pi, -4 * math.Pi,
}

// Kinds of angle, with their weights out of angleWeightTotal. Order matters:
// shrinking moves toward kind 0.
const (
	angleSpecial    = iota // one of specialAngles
	angleContinuous        // uniform on (−2π, 2π)
	angleTiny              // 0 or ±2π plus or minus 10^−e, 5 ≤ e ≤ 15
)

var angleWeights = []int{angleSpecial: 4, angleContinuous: 3, angleTiny: 1}

// continuousBits is the resolution of a continuous angle: steps of 2π/2^32.
const continuousBits = 32

// Angle returns a generator of rotation angles in radians that reaches the
// values where compiler bugs hide. Half of the draws are special angles (0,
// ±π/4, ±π/2, ±3π/4, ±π, ±2π, ±4π), three in eight are continuous (uniform on
// (−2π, 2π) in steps of 2π/2^32), and one in eight is tiny: ±10^−e with
// 5 ≤ e ≤ 15 added to 0 or to ±2π, where a pass that rounds angles or
// treats rz(2π) as the identity shows itself. A failing angle shrinks toward
// 0 and then through the special angles in the order listed.
func Angle() *rapid.Generator[float64] {
	return rapid.Custom(drawAngle)
}

func drawAngle(t *rapid.T) float64 {
	switch drawWeighted(t, angleWeights) {
	case angleSpecial:
		return specialAngles[drawBelow(t, len(specialAngles))]
	case angleContinuous:
		theta := 2 * math.Pi * float64(drawBits(t, continuousBits)) / (1 << continuousBits)
		if bit.Draw(t, "negative") {
			theta = -theta
		}
		return theta
	default:
		base := []float64{0, 2 * math.Pi, -2 * math.Pi}[drawBelow(t, 3)]
		delta := math.Pow(10, -float64(5+drawBelow(t, 11)))
		if bit.Draw(t, "negative") {
			delta = -delta
		}
		return base + delta
	}
}

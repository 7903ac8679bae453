package qcheck

import (
	"fmt"
	"math"
)

// DefaultWorkLimit is the work a comparison may take when no WorkLimit option is given: 10¹²
// amplitude updates, a few minutes of one core. It admits every comparison the engines make
// automatically at their usual sizes (a 12-qubit dense comparison of a few thousand gates, a
// 22-qubit matrix-free one of a few hundred) and refuses, before starting, inputs such as 2²¹
// gates on 14 qubits that would run for hours.
const DefaultWorkLimit = 1e12

// WorkLimit sets the most work a comparison may take, in amplitude updates (one gate applied to
// one amplitude, or one complex multiply-add of the dense linear algebra). Compare estimates the
// work of the engine it chose before starting and returns an error with the estimate when it
// exceeds the limit; raise the limit for comparisons that are worth the wait. It must be
// positive; +Inf removes the limit.
func WorkLimit(units float64) Option {
	return optionFunc(func(c *config) error {
		if !(units > 0) {
			return fmt.Errorf("qcheck: WorkLimit(%v): the limit must be positive", units)
		}
		c.workLimit = units
		return nil
	})
}

// workEstimate is the work, in amplitude updates, an engine takes on the pair, counting
// k = len(want) + len(got) ops on m qubits:
//
//	dense:       k·4^m to build both unitaries (each gate runs over 2^m columns of 2^m entries)
//	             + 6·8^m for the distance (a Cayley transform costs 2·8^m, and up to two are
//	             built) and, with Measured, the product U·V†
//	tableau:     k·⌈2m/64⌉ words for the gates + 2m·⌈2m/64⌉ to compare
//	matrix-free: 60·k·2^m (about 52 Krylov steps, each running both circuits over a statevector)
//
// These are estimates of the engines' main loops, good to a small factor; they exist to refuse,
// before starting, what would run for hours.
func workEstimate(e Engine, f *frame) float64 {
	k := float64(len(f.want.Ops) + len(f.got.Ops))
	m := float64(f.m)
	switch e {
	case Dense:
		return k*math.Exp2(2*m) + 6*math.Exp2(3*m)
	case Tableau:
		words := math.Ceil(2 * m / 64)
		return k*words + 2*m*words
	case MatrixFree:
		return 60 * k * math.Exp2(m)
	}
	return 0
}

// checkWork refuses a comparison whose estimated work exceeds the limit.
func checkWork(cfg *config, f *frame, e Engine) error {
	if w := workEstimate(e, f); w > cfg.workLimit {
		return fmt.Errorf("qcheck: the %v engine would take about %.2g amplitude updates for %d + %d ops on %d qubits, over the work limit of %.2g; raise it with WorkLimit (the command's -work) if the wait is worth it", e, w, len(f.want.Ops), len(f.got.Ops), f.m, cfg.workLimit)
	}
	return nil
}

package qcheck

import (
	"fmt"
)

// defaultWorkLimit is the work a comparison may take when no WorkLimit option is given: 10¹²
// amplitude updates, a few minutes of one core. It admits every comparison the engines make
// automatically at their usual sizes (a 12-qubit dense comparison of a few thousand gates, a
// 22-qubit matrix-free one of a few hundred) and refuses, before starting, inputs such as 2²¹
// gates on 14 qubits that would run for hours.
const defaultWorkLimit = 1e12

// WorkLimit sets the most work a comparison may take, in amplitude updates (one gate applied to
// one amplitude, or one complex multiply-add of the dense linear algebra). Compare estimates the
// work of the engine it chose before starting and returns an error with the estimate when it
// exceeds the limit (Auto first tries the engines after it); raise the limit for comparisons that
// are worth the wait. It must be positive; +Inf removes the limit. Without it the limit is 10¹²,
// a few minutes of one core.
func WorkLimit(units float64) Option {
	return optionFunc(func(c *config) error {
		if !(units > 0) {
			return fmt.Errorf("qcheck: WorkLimit(%v): the limit must be positive", units)
		}
		c.workLimit = units
		return nil
	})
}

// overWork says why the engine's estimated work on the pair exceeds the limit, or returns nil.
func overWork(cfg *config, f *frame, e engine) error {
	if w := e.work(f); w > cfg.workLimit {
		return fmt.Errorf("the %v engine would take about %.2g amplitude updates for %d + %d ops on %d qubits, over the work limit of %.2g; raise it with WorkLimit (the command's -work) if the wait is worth it", e.name(), w, len(f.want.Ops), len(f.got.Ops), f.m, cfg.workLimit)
	}
	return nil
}

// opsOf is the number of ops of both circuits, the k of the engines' work estimates.
func opsOf(f *frame) float64 { return float64(len(f.want.Ops) + len(f.got.Ops)) }

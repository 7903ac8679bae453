package qcheck

import (
	"fmt"

	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/zx"
)

// zxAutoFrom is the narrowest register Auto gives to the ZX engine: wider than any other engine
// takes automatically (dense to 12 qubits, matrix-free to 22), so that the automatic choice
// below is unchanged. UseEngine(ZX) takes any width.
const zxAutoFrom = matrixFreeAuto + 1

// zxEngine simplifies the ZX-diagram of V†U (package zx, after the exact difference window of
// sim.DifferenceWindow): a proof of equivalence within a stated bound, or the exact distance when
// what is left is small or splits into small parts, at any width. A pair it reduces neither way
// is undecided; on registers the matrix-free engine holds, that engine then answers.
type zxEngine struct{}

var _ engine = zxEngine{}

func (zxEngine) name() Engine { return ZX }

// work is the rewriting budget: about ten vertices per op and at most zx's default 200 edge
// operations per vertex, plus, where an undecided pair falls back to it, the matrix-free engine's.
func (zxEngine) work(f *frame) float64 {
	w := 2000 * opsOf(f)
	if f.m <= matrixFreeAuto {
		w += matrixFreeEngine{}.work(f)
	}
	return w
}

func (zxEngine) refuses(cfg *config, f *frame, auto bool) error {
	if err := unitaryUpToPhase(cfg, f, ZX); err != nil {
		return err
	}
	if f.anc != nil {
		return fmt.Errorf("the %s engine compares whole unitaries; ancillas need the dense or matrix-free engine", ZX)
	}
	for _, c := range []struct {
		role string
		c    *circuit.Circuit
	}{{"want", f.want}, {"got", f.got}} {
		for i, op := range c.c.Ops {
			if op.Gate.Name != "barrier" && (!op.Unitary() || op.Gate.IsCustom()) {
				return fmt.Errorf("the %s engine has no ZX-diagram for op %d (%s) of %s", ZX, i, op, c.role)
			}
		}
	}
	if auto && f.m < zxAutoFrom {
		return fmt.Errorf("%d qubits is narrower than the ZX engine takes automatically (%d)", f.m, zxAutoFrom)
	}
	return nil
}

func (zxEngine) certifies(cfg *config, f *frame) string {
	return "ZX-calculus rewriting of V†U: equivalence proved within a stated bound, or the distance computed exactly from what is left"
}

func (zxEngine) compare(cfg *config, f *frame, r *Result, full bool) error {
	got := undoLayout(f.got, f.perm)
	res, err := zx.Compare(f.want, got, zx.Options{})
	if err != nil {
		return err
	}
	switch {
	case res.Verdict == zx.Undecided:
		if f.m <= matrixFreeAuto {
			r.Engine = MatrixFree
			r.Certifies = "ZX undecided (" + res.Reason + "); matrix-free: " + matrixFreeEngine{}.certifies(cfg, f)
			return matrixFreeEngine{}.compare(cfg, f, r, full)
		}
		r.Undecided = "the ZX-diagram of V†U did not reduce: " + res.Reason
		r.Certifies = "unsettled, so not counted as equivalent: " + r.Undecided
		return nil
	case res.Upper() <= cfg.tol:
		r.Equivalent = true
		if res.Known {
			r.Distance, r.OperatorDistance = res.Distance, res.Distance
			r.Certifies = fmt.Sprintf("exact: distance %.3g from the remainder's matrix, within %.2g", res.Distance, res.Bound)
		} else {
			r.Certifies = fmt.Sprintf("proved: V†U rewrites to the identity; the distance is at most %.2g (an upper bound; phases within 1e-12 of multiples of π/4 treated as such)", res.Bound)
		}
		return nil
	case res.Known && res.Lower() > cfg.tol:
		r.Distance, r.OperatorDistance = res.Distance, res.Distance
		r.Certifies = fmt.Sprintf("exact: distance %.4g (certified at least %.4g) from the matrix of what V†U rewrites to", res.Distance, res.Lower())
	default:
		r.Undecided = fmt.Sprintf("the distance is %.3g within %.2g, which does not settle the tolerance %g", res.Distance, res.Bound, cfg.tol)
		r.Certifies = "unsettled, so not counted as equivalent: " + r.Undecided
		return nil
	}
	r.Blame = blame(cfg, f, r.Want, r.Got)
	return nil
}

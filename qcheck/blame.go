package qcheck

import (
	"gonum.org/v1/gonum/mat"
	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// Limits of the prefix search, which applies every op of both circuits to full matrices.
const (
	blameMaxQubits = 6
	blameMaxOps    = 2000
)

// blame finds the ops that explain a difference: where the circuits first differ as op lists,
// the window that differs once their common prefix and suffix are removed, and, when both have
// the same length on the same register, the shortest prefix whose meaning already differs.
func blame(cfg *config, f *frame, want, got *circuit.Circuit) Blame {
	b := Blame{FirstDiff: -1}
	wo, gops := want.Ops, got.Ops
	pre, suf := circuit.CommonEnds(want, got)
	if pre == len(wo) && pre == len(gops) {
		return b
	}
	b.Found = true
	b.FirstDiff = pre
	b.WantOps = circuit.Span{Start: pre, End: len(wo) - suf}
	b.GotOps = circuit.Span{Start: pre, End: len(gops) - suf}
	if len(wo) == len(gops) && f.data == nil && f.perm == nil && f.anc == nil && f.measured == nil &&
		f.m <= blameMaxQubits && len(wo) <= blameMaxOps {
		b.Prefix = firstDifferingPrefix(cfg, f.m, wo, gops, pre)
	}
	return b
}

// firstDifferingPrefix returns the smallest k such that the first k ops of got differ beyond the
// tolerance from the first k ops of want, or 0 if there is none; the first from ops are known to be equal. It grows both unitaries one op
// at a time, column by column.
func firstDifferingPrefix(cfg *config, n int, wo, gops []circuit.Op, from int) int {
	dim := 1 << n
	u, v := identityColumns(dim), identityColumns(dim)
	ud, vd := make([]complex128, dim*dim), make([]complex128, dim*dim)
	for k := range wo {
		if !stepColumns(n, wo[k], u) || !stepColumns(n, gops[k], v) {
			return 0
		}
		if k < from {
			continue // structurally equal prefixes have equal unitaries
		}
		columnsTo(u, ud)
		columnsTo(v, vd)
		um, vm := mat.NewCDense(dim, dim, ud), mat.NewCDense(dim, dim, vd)
		var d float64
		if cfg.exactPhase {
			d = metric.Distance(um, vm)
		} else {
			d = metric.PhaseDistance(um, vm)
		}
		if d > cfg.tol {
			return k + 1
		}
	}
	return 0
}

func identityColumns(dim int) [][]complex128 {
	cols := make([][]complex128, dim)
	for j := range cols {
		cols[j] = basisState(dim, j)
	}
	return cols
}

// stepColumns applies op to every column; it reports false for an op with no unitary.
func stepColumns(n int, op circuit.Op, cols [][]complex128) bool {
	if op.Gate.Name == "barrier" {
		return true
	}
	c := circuit.New(n).AppendOp(op)
	for _, col := range cols {
		if sim.Apply(c, col) != nil {
			return false
		}
	}
	return true
}

// columnsTo writes the columns into a row-major matrix.
func columnsTo(cols [][]complex128, dst []complex128) {
	dim := len(cols)
	for j, col := range cols {
		for i, z := range col {
			dst[i*dim+j] = z
		}
	}
}

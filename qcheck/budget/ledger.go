package budget

import (
	"fmt"
	"math"
	"sort"
	"sync"

	"gonum.org/v1/gonum/mat"

	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// MaxPieceQubits is the widest piece a Ledger accepts. Each entry's error is computed on the
// dense matrices of the piece and its replacement, so a piece must stay small; passes that
// approximate wider blocks should record them as several narrower rewrites.
const MaxPieceQubits = 8

// Rewrite is one approximate replacement made by a pass: where it happened, the exact piece it
// took out and the circuit it put in. Piece and Replacement are small circuits on
// len(Window.Qubits) qubits, where local qubit i stands for the circuit's qubit Window.Qubits[i].
type Rewrite struct {
	Window      Window
	Piece       *circuit.Circuit
	Replacement *circuit.Circuit
	// Share is the part of the error budget the pass allotted to this rewrite (see EvenSplit and
	// WeightedSplit); zero means the pass allotted none, and CheckShares skips the entry.
	Share float64
}

// Entry is a recorded rewrite with its error δ: the phase-free operator-norm distance
// min_φ ‖P − e^{iφ}R‖ between the unitaries of the piece and of its replacement, computed on the
// piece's own qubits.
type Entry struct {
	Rewrite
	// Delta is the rewrite's error δ.
	Delta float64
	// Seq is the entry's position in the order of recording, from 0.
	Seq int
}

// Recorder is what an approximating pass calls at each rewrite. *Ledger is one; a pass that takes
// a Recorder keeps its own structure and may be handed nil when nobody is counting.
type Recorder interface {
	Record(r Rewrite) error
}

// Ledger accounts for the error of an approximate pass run on one circuit. Each entry holds a
// replaced piece, its replacement and its error δ_k, computed exactly (in floating point) on the
// piece's own qubits, so a ledger serves circuits far too wide for any dense check.
//
// Bound returns Σ δ_k, a certified bound on the phase-free operator-norm distance between the
// circuit before and after the pass: errors of unitary factors add at most linearly
// (Nielsen & Chuang §4.5.3), and the phase of each factor may be chosen on its own. The bound
// holds for the whole circuits when the recorded windows account for every difference between
// them, which Covers checks.
//
// The zero Ledger is empty and ready to use. A Ledger is safe for concurrent use: a pass may
// record from many goroutines.
type Ledger struct {
	mu      sync.Mutex
	entries []Entry
	sum     float64
}

var _ Recorder = (*Ledger)(nil)

// Record checks the rewrite, computes its δ and adds it to the ledger. It refuses a window with no
// qubits, repeated or negative qubits, or a bad span; pieces whose width is not len(Window.Qubits)
// or is over MaxPieceQubits; and pieces that are not unitary (measure, reset), since the linear
// bound does not hold for non-unitary factors. Custom gates are unitary by construction
// (circuit.Custom refuses other matrices). The ledger keeps its own copies of both circuits.
func (l *Ledger) Record(r Rewrite) error {
	e, err := newEntry(r)
	if err != nil {
		return err
	}
	l.mu.Lock()
	e.Seq = len(l.entries)
	l.entries = append(l.entries, e)
	l.sum += e.Delta
	l.mu.Unlock()
	return nil
}

// newEntry validates a rewrite and computes its δ; it touches no ledger, so it runs outside the
// lock.
func newEntry(r Rewrite) (Entry, error) {
	if err := r.Window.check(); err != nil {
		return Entry{}, err
	}
	// NaN fails the comparison; +Inf would be a share no δ can exceed, so OverShare would never
	// flag the entry.
	if !(r.Share >= 0) || math.IsInf(r.Share, 1) {
		return Entry{}, fmt.Errorf("budget: rewrite at %s has share %v; a share is a finite non-negative number (0 for none)", r.Window, r.Share)
	}
	k := len(r.Window.Qubits)
	if k > MaxPieceQubits {
		return Entry{}, fmt.Errorf("budget: rewrite at %s spans %d qubits, over the limit of %d; record it as narrower pieces", r.Window, k, MaxPieceQubits)
	}
	u, err := pieceUnitary(r.Window, "piece", r.Piece, k)
	if err != nil {
		return Entry{}, err
	}
	v, err := pieceUnitary(r.Window, "replacement", r.Replacement, k)
	if err != nil {
		return Entry{}, err
	}
	r.Window.Qubits = append([]int(nil), r.Window.Qubits...)
	r.Piece, r.Replacement = r.Piece.Clone(), r.Replacement.Clone()
	return Entry{Rewrite: r, Delta: metric.PhaseDistance(u, v)}, nil
}

// pieceUnitary returns the dense unitary of one side of a rewrite, refusing what the linear bound
// does not cover.
func pieceUnitary(w Window, side string, c *circuit.Circuit, k int) (*mat.CDense, error) {
	if c == nil {
		return nil, fmt.Errorf("budget: rewrite at %s has no %s circuit", w, side)
	}
	if c.Qubits() != k {
		return nil, fmt.Errorf("budget: rewrite at %s: the %s has %d qubits, the window names %d (local qubit i stands for Window.Qubits[i])", w, side, c.Qubits(), k)
	}
	if err := c.Validate(); err != nil {
		return nil, fmt.Errorf("budget: rewrite at %s: %s: %w", w, side, err)
	}
	for i, op := range c.Ops {
		if !op.Unitary() && op.Gate.Name != "barrier" {
			return nil, fmt.Errorf("budget: rewrite at %s: %s op %d (%s) is not unitary; the linear error bound holds only for unitary pieces", w, side, i, op)
		}
	}
	return sim.Unitary(c)
}

// Bound returns the certified bound Σ δ_k on the phase-free operator-norm distance between the
// circuit before and after the pass (Nielsen & Chuang §4.5.3); twice it bounds the change of
// any measurement outcome's probability. Each δ_k is computed in floating
// point from the pieces' small matrices, good to about 1e-15 each; the bound is exact up to that
// rounding.
func (l *Ledger) Bound() float64 {
	l.mu.Lock()
	defer l.mu.Unlock()
	return l.sum
}

// Len returns the number of entries.
func (l *Ledger) Len() int {
	l.mu.Lock()
	defer l.mu.Unlock()
	return len(l.entries)
}

// Entries returns a copy of the entries in the order they were recorded.
func (l *Ledger) Entries() []Entry {
	l.mu.Lock()
	defer l.mu.Unlock()
	return append([]Entry(nil), l.entries...)
}

// Largest returns up to n entries with the largest δ, largest first (ties in recording order).
func (l *Ledger) Largest(n int) []Entry {
	es := l.Entries()
	sort.SliceStable(es, func(i, j int) bool { return es[i].Delta > es[j].Delta })
	if n < len(es) {
		es = es[:n]
	}
	return es
}

package budget

import (
	"fmt"
	"sort"
	"strings"

	"qcheck.dev/qcheck/circuit"
)

// Window says where a rewrite happened: the ops it took out of the circuit before the pass, the
// ops it put into the circuit after the pass, and the qubits the piece acts on, in the order that
// gives local qubit i of the piece as Qubits[i].
//
// A span may hold ops on other qubits that the rewrite let through untouched (a block of two
// qubits, say, interleaved with gates elsewhere): such ops must act only on qubits outside the
// window, so they commute with the piece, and they must appear in the same order on both sides.
type Window struct {
	Before circuit.Span
	After  circuit.Span
	Qubits []int
}

// String writes the window as "op 7 → ops 7–9 on q3", the place shown in budget reports; a side
// that is empty reads "op 7 → removed (at op 6) on q3" or "inserted (at op 2) → op 2 on q1".
func (w Window) String() string {
	before, after := w.Before.String(), w.After.String()
	if w.Before.Len() == 0 {
		before = fmt.Sprintf("inserted (at op %d)", w.Before.Start)
	}
	if w.After.Len() == 0 {
		after = fmt.Sprintf("removed (at op %d)", w.After.Start)
	}
	return fmt.Sprintf("%s → %s on %s", before, after, qubitList(w.Qubits))
}

// check reports a malformed window.
func (w Window) check() error {
	if len(w.Qubits) == 0 {
		return fmt.Errorf("budget: window %s names no qubits", w)
	}
	for i, q := range w.Qubits {
		if q < 0 {
			return fmt.Errorf("budget: window %s: negative qubit %d", w, q)
		}
		for _, p := range w.Qubits[:i] {
			if p == q {
				return fmt.Errorf("budget: window %s: qubit %d repeated", w, q)
			}
		}
	}
	for _, s := range []circuit.Span{w.Before, w.After} {
		if s.Start < 0 || s.End < s.Start {
			return fmt.Errorf("budget: window has bad span [%d, %d)", s.Start, s.End)
		}
	}
	return nil
}

// FromWindows rebuilds the ledger of a pass that reports only which windows it replaced:
// it cuts each window's piece out of before and its replacement out of after, records them, and
// checks with Covers that the windows account for every difference between the two circuits.
// Each window's share of the budget is left at zero.
func FromWindows(before, after *circuit.Circuit, windows []Window) (*Ledger, error) {
	if err := checkPair(before, after); err != nil {
		return nil, err
	}
	l := new(Ledger)
	for k, w := range windows {
		if err := w.check(); err != nil {
			return nil, fmt.Errorf("window %d: %w", k, err)
		}
		piece, err := cut(before, "before", w.Before, w.Qubits)
		if err != nil {
			return nil, fmt.Errorf("window %d: %w", k, err)
		}
		repl, err := cut(after, "after", w.After, w.Qubits)
		if err != nil {
			return nil, fmt.Errorf("window %d: %w", k, err)
		}
		if err := l.Record(Rewrite{Window: w, Piece: piece, Replacement: repl}); err != nil {
			return nil, fmt.Errorf("window %d: %w", k, err)
		}
	}
	if err := l.Covers(before, after); err != nil {
		return nil, err
	}
	return l, nil
}

// Covers checks that the ledger is a certificate for this pair of circuits: that each entry's
// piece and replacement are what its window holds in before and in after, that no two windows
// overlap, and that outside the windows the two circuits have the same ops in the same order. When
// it returns nil, the phase-free distance between before and after is at most Bound (for circuits
// with no measure or reset).
func (l *Ledger) Covers(before, after *circuit.Circuit) error {
	if err := checkPair(before, after); err != nil {
		return err
	}
	es := l.Entries()
	windows := make([]Window, len(es))
	for k, e := range es {
		windows[k] = e.Window
		piece, err := cut(before, "before", e.Window.Before, e.Window.Qubits)
		if err != nil {
			return fmt.Errorf("entry %d: %w", e.Seq, err)
		}
		if !piece.Equal(e.Piece) {
			return fmt.Errorf("budget: entry %d at %s: the recorded piece is not what the circuit before holds there", e.Seq, e.Window)
		}
		repl, err := cut(after, "after", e.Window.After, e.Window.Qubits)
		if err != nil {
			return fmt.Errorf("entry %d: %w", e.Seq, err)
		}
		if !repl.Equal(e.Replacement) {
			return fmt.Errorf("budget: entry %d at %s: the recorded replacement is not what the circuit after holds there", e.Seq, e.Window)
		}
	}
	tb, err := outline(before, windows, func(w Window) circuit.Span { return w.Before })
	if err != nil {
		return fmt.Errorf("budget: circuit before: %w", err)
	}
	ta, err := outline(after, windows, func(w Window) circuit.Span { return w.After })
	if err != nil {
		return fmt.Errorf("budget: circuit after: %w", err)
	}
	for i := 0; i < len(tb) || i < len(ta); i++ {
		switch {
		case i >= len(tb):
			return fmt.Errorf("budget: after op %d (%s) is in no window and has no counterpart before", ta[i].op, after.Ops[ta[i].op])
		case i >= len(ta):
			return fmt.Errorf("budget: before op %d (%s) is in no window and has no counterpart after", tb[i].op, before.Ops[tb[i].op])
		case tb[i].window >= 0 || ta[i].window >= 0:
			if tb[i].window != ta[i].window {
				return fmt.Errorf("budget: the windows and the unchanged ops come in a different order before (%s) and after (%s)", tb[i].describe(before, windows), ta[i].describe(after, windows))
			}
		case !before.Ops[tb[i].op].Equal(after.Ops[ta[i].op]):
			return fmt.Errorf("budget: before op %d (%s) and after op %d (%s) differ outside every window", tb[i].op, before.Ops[tb[i].op], ta[i].op, after.Ops[ta[i].op])
		}
	}
	return nil
}

func checkPair(before, after *circuit.Circuit) error {
	if before == nil || after == nil {
		return fmt.Errorf("budget: nil circuit")
	}
	if before.Qubits() != after.Qubits() {
		return fmt.Errorf("budget: circuits of different widths: %d qubits before, %d after", before.Qubits(), after.Qubits())
	}
	if err := before.Validate(); err != nil {
		return fmt.Errorf("budget: circuit before: %w", err)
	}
	if err := after.Validate(); err != nil {
		return fmt.Errorf("budget: circuit after: %w", err)
	}
	return nil
}

// qubitList writes qubits as "q0, q2".
func qubitList(qs []int) string {
	s := make([]string, len(qs))
	for i, q := range qs {
		s[i] = fmt.Sprintf("q%d", q)
	}
	return strings.Join(s, ", ")
}

// inside reports whether every qubit of op is among qs (all true) or none is (all false); an op
// that straddles is neither.
func inside(op circuit.Op, qs []int) (all, none bool) {
	all, none = true, true
	for _, q := range op.Qubits {
		in := false
		for _, p := range qs {
			if p == q {
				in = true
				break
			}
		}
		all = all && in
		none = none && !in
	}
	return all, none
}

// cut returns the piece of c that a window's span holds on the window's qubits, as a circuit on
// len(qs) qubits. Ops of the span on other qubits are let through; an op on some of the window's
// qubits and some others is an error.
func cut(c *circuit.Circuit, side string, s circuit.Span, qs []int) (*circuit.Circuit, error) {
	if s.End > c.Len() {
		return nil, fmt.Errorf("budget: span [%d, %d) runs past the %d ops of the circuit %s", s.Start, s.End, c.Len(), side)
	}
	local := make(map[int]int, len(qs))
	for i, q := range qs {
		if q >= c.Qubits() {
			return nil, fmt.Errorf("budget: window qubit %d out of range [0, %d) of the circuit %s", q, c.Qubits(), side)
		}
		local[q] = i
	}
	p := circuit.New(len(qs))
	for i := s.Start; i < s.End; i++ {
		op := c.Ops[i]
		all, none := inside(op, qs)
		switch {
		case all:
			op = op.Clone()
			for j, q := range op.Qubits {
				op.Qubits[j] = local[q]
			}
			p.AppendOp(op)
		case !none:
			return nil, fmt.Errorf("budget: %s op %d (%s) acts on some of the window's qubits %s and some others", side, i, op, qubitList(qs))
		}
	}
	return p, nil
}

// mark is one item of a circuit's outline: a window (window ≥ 0) or an op outside every window.
type mark struct {
	window int
	op     int
}

func (m mark) describe(c *circuit.Circuit, ws []Window) string {
	if m.window >= 0 {
		return "window " + ws[m.window].String()
	}
	return fmt.Sprintf("op %d %s", m.op, c.Ops[m.op])
}

// outline lists a circuit as windows (each at the start of its span) and the ops outside them,
// in order. Ops let through a window's span stay in the list after the window: they commute with
// the piece, so moving the piece to the start of its span keeps the circuit's unitary.
func outline(c *circuit.Circuit, ws []Window, span func(Window) circuit.Span) ([]mark, error) {
	order := make([]int, len(ws))
	for k := range order {
		order[k] = k
	}
	sort.SliceStable(order, func(i, j int) bool {
		a, b := span(ws[order[i]]), span(ws[order[j]])
		return a.Start < b.Start || a.Start == b.Start && a.End < b.End
	})
	owner := make([]int, c.Len()) // window that takes op i into its piece, or -1
	for i := range owner {
		owner[i] = -1
	}
	starts := make(map[int][]int)
	prevEnd, prev := 0, -1
	for _, k := range order {
		s := span(ws[k])
		if prev >= 0 && s.Start < prevEnd {
			return nil, fmt.Errorf("windows %s and %s overlap", ws[prev], ws[k])
		}
		prevEnd, prev = s.End, k
		starts[s.Start] = append(starts[s.Start], k)
		for i := s.Start; i < s.End && i < c.Len(); i++ {
			if all, _ := inside(c.Ops[i], ws[k].Qubits); all {
				owner[i] = k
			}
		}
	}
	var out []mark
	for i := 0; i <= c.Len(); i++ {
		for _, k := range starts[i] {
			out = append(out, mark{window: k, op: -1})
		}
		if i < c.Len() && owner[i] < 0 {
			out = append(out, mark{window: -1, op: i})
		}
	}
	return out, nil
}

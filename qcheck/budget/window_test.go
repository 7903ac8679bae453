package budget

import (
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// A two-qubit block on q0,q1 interleaved with a gate on q2 that the window lets through.
func TestFromWindowsLetsDisjointOpsThrough(t *testing.T) {
	before := circuit.New(3).H(0).CX(0, 1).X(2).RZ(0.3, 1).CX(0, 1).H(2)
	// The block cx·rz·cx on (q0, q1) is rzz(0.3) exactly (the CNOT-conjugated Z rotation for
	// exp(−iθZ⊗Z/2), Nielsen & Chuang §4.7.3, from memory); the pass wrote it as rzz(0.31), with
	// x q2 moved ahead of it.
	after := circuit.New(3).H(0).X(2).RZZ(0.31, 0, 1).H(2)
	w := Window{Before: circuit.Span{Start: 1, End: 5}, After: circuit.Span{Start: 1, End: 3}, Qubits: []int{0, 1}}
	l, err := FromWindows(before, after, []Window{w})
	if err != nil {
		t.Fatal(err)
	}
	e := l.Entries()[0]
	if e.Piece.Len() != 3 || e.Replacement.Len() != 1 {
		t.Fatalf("piece %v, replacement %v: want the three block ops and the one rzz", e.Piece.Ops, e.Replacement.Ops)
	}
	// rzz(0.3) against rzz(0.31): V†U has eigenphases ±0.005, arc 0.01, δ = 2 sin(0.01/4).
	if want := 2 * 0.0024999973958; absDiff(e.Delta, want) > 1e-12 {
		t.Errorf("δ = %.15g, want %.15g", e.Delta, want)
	}
}

func absDiff(a, b float64) float64 {
	if a > b {
		return a - b
	}
	return b - a
}

func TestCoversFindsUnaccountedChanges(t *testing.T) {
	before := circuit.New(3).H(0).RZ(0.2, 1).CX(1, 2).T(2)
	one := Window{Before: circuit.Span{Start: 1, End: 2}, After: circuit.Span{Start: 1, End: 2}, Qubits: []int{1}}
	for _, c := range []struct {
		name    string
		after   *circuit.Circuit
		windows []Window
		want    string
	}{
		{"changed outside", circuit.New(3).H(0).S(1).CX(1, 2).Tdg(2), []Window{one},
			"before op 3 (t q2) and after op 3 (tdg q2) differ outside every window"},
		{"dropped outside", circuit.New(3).H(0).S(1).CX(1, 2), []Window{one},
			"before op 3 (t q2) is in no window and has no counterpart after"},
		{"added outside", circuit.New(3).H(0).S(1).CX(1, 2).T(2).X(0), []Window{one},
			"after op 4 (x q0) is in no window"},
		{"straddling", circuit.New(3).H(0).S(1).CX(1, 2).T(2),
			[]Window{{Before: circuit.Span{Start: 1, End: 3}, After: circuit.Span{Start: 1, End: 3}, Qubits: []int{1}}},
			"before op 2 (cx q1,q2) acts on some of the window's qubits q1 and some others"},
		{"overlapping", circuit.New(3).H(0).S(1).CX(1, 2).T(2),
			[]Window{one, {Before: circuit.Span{Start: 1, End: 2}, After: circuit.Span{Start: 1, End: 2}, Qubits: []int{0}}},
			"overlap"},
		{"past the end", circuit.New(3).H(0).S(1),
			[]Window{{Before: circuit.Span{Start: 1, End: 4}, After: circuit.Span{Start: 1, End: 9}, Qubits: []int{1, 2}}},
			"span [1, 9) runs past the 2 ops of the circuit after"},
		{"width", circuit.New(4), nil, "different widths: 3 qubits before, 4 after"},
	} {
		if _, err := FromWindows(before, c.after, c.windows); err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%s: FromWindows = %v, want an error containing %q", c.name, err, c.want)
		}
	}
}

// A ledger filled by a pass is checked against what the circuits hold.
func TestCoversChecksRecordedPieces(t *testing.T) {
	before := circuit.New(2).RZ(0.2, 1).CX(0, 1)
	after := circuit.New(2).S(1).CX(0, 1)
	var l Ledger
	// The pass claims it replaced rz(0.25), not the rz(0.2) that is there.
	if err := l.Record(Rewrite{Window: Window{Before: circuit.Span{Start: 0, End: 1}, After: circuit.Span{Start: 0, End: 1}, Qubits: []int{1}},
		Piece: circuit.New(1).RZ(0.25, 0), Replacement: circuit.New(1).S(0)}); err != nil {
		t.Fatal(err)
	}
	if err := l.Covers(before, after); err == nil || !strings.Contains(err.Error(), "entry 0 at op 0 → op 0 on q1: the recorded piece is not what the circuit before holds") {
		t.Errorf("Covers = %v, want the wrong piece named", err)
	}
}

// Recording one entry for a one- or two-qubit piece: the cost a pass pays per rewrite.
func BenchmarkRecord1Qubit(b *testing.B) {
	piece := circuit.New(1).RZ(0.123, 0)
	repl := circuit.New(1).H(0).T(0).H(0).T(0).H(0).Tdg(0).H(0).S(0).T(0).H(0)
	var l Ledger
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		if err := l.Record(Rewrite{Window: Window{Before: circuit.Span{Start: i, End: i + 1}, After: circuit.Span{Start: 0, End: 10}, Qubits: []int{7}}, Piece: piece, Replacement: repl}); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkRecord2Qubit(b *testing.B) {
	piece := circuit.New(2).CX(0, 1).RZ(0.3, 1).CX(0, 1)
	repl := circuit.New(2).RZZ(0.31, 0, 1)
	var l Ledger
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		if err := l.Record(Rewrite{Window: Window{Before: circuit.Span{Start: i, End: i + 3}, After: circuit.Span{Start: 0, End: 1}, Qubits: []int{3, 9}}, Piece: piece, Replacement: repl}); err != nil {
			b.Fatal(err)
		}
	}
}

package budget

import (
	"math"
	"strings"
	"sync"
	"testing"

	"gonum.org/v1/gonum/mat"

	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
)

// floatSlack allows for rounding in δ: each is computed from matrices of a few gates, good to a
// few ulps; the properties below run on circuits of at most a few dozen gates. Common practice,
// no source.
const floatSlack = 1e-12

func TestRecordKnownDistances(t *testing.T) {
	// The phase-free distance of two unitaries is 2·sin(θ/4), θ the shortest arc holding the
	// eigenphases of V†U (package metric's documentation). rz(θ) against the identity has eigenphases
	// ∓θ/2, so θ-arc = |θ| for |θ| ≤ π; t against the identity has eigenphases 0 and π/4.
	cases := []struct {
		name        string
		piece, repl *circuit.Circuit
		want        float64
	}{
		{"rz(0.3) by nothing", circuit.New(1).RZ(0.3, 0), circuit.New(1), 2 * math.Sin(0.3/4)},
		{"t by nothing", circuit.New(1).T(0), circuit.New(1), 2 * math.Sin(math.Pi/16)},
		// p(λ) and rz(λ) differ only by a global phase, so the phase-free distance is 0.
		{"p by rz", circuit.New(1).P(1.1, 0), circuit.New(1).RZ(1.1, 0), 0},
		// crz(θ) against cp(θ): V†U = diag(1, 1, e^{-iθ/2}, e^{-iθ/2}), arc θ/2.
		{"crz by cp", circuit.New(2).CRZ(0.8, 0, 1), circuit.New(2).CP(0.8, 0, 1), 2 * math.Sin(0.8/8)},
	}
	for _, c := range cases {
		var l Ledger
		w := Window{Before: circuit.Span{Start: 4, End: 5}, After: circuit.Span{Start: 4, End: 4 + c.repl.Len()}, Qubits: allQubits(c.piece.Qubits())}
		if err := l.Record(Rewrite{Window: w, Piece: c.piece, Replacement: c.repl}); err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		if got := l.Bound(); math.Abs(got-c.want) > 1e-12 {
			t.Errorf("%s: δ = %.15g, want %.15g", c.name, got, c.want)
		}
	}
}

func TestRecordRefusesNonUnitary(t *testing.T) {
	w := Window{Before: circuit.Span{Start: 7, End: 8}, After: circuit.Span{Start: 7, End: 8}, Qubits: []int{3}}
	measured := circuit.New(1).H(0).Measure(0, 0)
	reset := circuit.New(1).Reset(0)
	var l Ledger
	for _, c := range []struct {
		r    Rewrite
		want string
	}{
		{Rewrite{Window: w, Piece: circuit.New(1).H(0), Replacement: measured}, "replacement op 1 (measure q0 -> c0) is not unitary"},
		{Rewrite{Window: w, Piece: reset, Replacement: circuit.New(1)}, "piece op 0 (reset q0) is not unitary"},
	} {
		err := l.Record(c.r)
		if err == nil || !strings.Contains(err.Error(), c.want) || !strings.Contains(err.Error(), "op 7 → op 7 on q3") {
			t.Errorf("Record = %v, want an error naming %q and the window", err, c.want)
		}
	}
	if l.Len() != 0 {
		t.Errorf("refused rewrites were recorded: %d entries", l.Len())
	}
}

// A scaled matrix breaks the linear bound, which is why the ledger takes only unitary pieces.
// Nielsen & Chuang §4.5.3 prove ‖U₂U₁ − V₂V₁‖ ≤ ‖U₁ − V₁‖ + ‖U₂ − V₂‖ using ‖U₂‖ = ‖V₁‖ = 1;
// with A = 2I and B = 2(1+η)I the factors are η-apart up to the scale, yet the three-fold
// products drift apart eight times as fast: ‖A³ − B³‖ = 8((1+η)³ − 1) ≈ 24η > 3·‖A − B‖ = 6η.
func TestScaledFactorsBreakTheLinearBound(t *testing.T) {
	const eta = 1e-3
	a := []complex128{2, 0, 0, 2}
	b := []complex128{2 * (1 + eta), 0, 0, 2 * (1 + eta)}
	mul := func(x, y []complex128) []complex128 {
		return []complex128{
			x[0]*y[0] + x[1]*y[2], x[0]*y[1] + x[1]*y[3],
			x[2]*y[0] + x[3]*y[2], x[2]*y[1] + x[3]*y[3],
		}
	}
	dist := func(x, y []complex128) float64 {
		return metric.Distance(matrix2(x), matrix2(y))
	}
	a3, b3 := mul(a, mul(a, a)), mul(b, mul(b, b))
	sum := 3 * dist(a, b)
	if got := dist(a3, b3); !(got > sum) {
		t.Fatalf("‖A³ − B³‖ = %g, not above Σ‖A − B‖ = %g: the counterexample failed", got, sum)
	}
	// The same matrix cannot enter a piece: circuit.Custom refuses it, so no ledger entry can
	// hold it.
	if _, err := circuit.Custom("twice", matrix2(a)); err == nil || !strings.Contains(err.Error(), "not unitary") {
		t.Errorf("Custom(2I) = %v, want a refusal as not unitary", err)
	}
}

func TestRecordRefusesBadRewrites(t *testing.T) {
	one := circuit.New(1).H(0)
	for _, c := range []struct {
		name string
		r    Rewrite
		want string
	}{
		{"no qubits", Rewrite{Window: Window{}, Piece: one, Replacement: one}, "names no qubits"},
		{"repeated qubit", Rewrite{Window: Window{Qubits: []int{2, 2}}, Piece: one, Replacement: one}, "qubit 2 repeated"},
		{"negative qubit", Rewrite{Window: Window{Qubits: []int{-1}}, Piece: one, Replacement: one}, "negative qubit -1"},
		{"reversed span", Rewrite{Window: Window{Before: circuit.Span{Start: 5, End: 3}, Qubits: []int{0}}, Piece: one, Replacement: one}, "bad span [5, 3)"},
		{"width", Rewrite{Window: Window{Qubits: []int{0, 1}}, Piece: one, Replacement: circuit.New(2)}, "the piece has 1 qubits, the window names 2"},
		{"nil", Rewrite{Window: Window{Qubits: []int{0}}, Piece: one}, "no replacement circuit"},
		{"bad op", Rewrite{Window: Window{Qubits: []int{0}}, Piece: one, Replacement: circuit.New(1).RZ(math.NaN(), 0)}, "op 0 (rz)"},
		{"share", Rewrite{Window: Window{Qubits: []int{0}}, Piece: one, Replacement: one, Share: -1}, "share -1"},
		{"NaN share", Rewrite{Window: Window{Qubits: []int{0}}, Piece: one, Replacement: one, Share: math.NaN()}, "share NaN"},
		// A share of +Inf used to be accepted, and OverShare could then never flag the entry.
		{"infinite share", Rewrite{Window: Window{Qubits: []int{0}}, Piece: one, Replacement: one, Share: math.Inf(1)}, "share +Inf"},
		{"-Inf share", Rewrite{Window: Window{Qubits: []int{0}}, Piece: one, Replacement: one, Share: math.Inf(-1)}, "share -Inf"},
		{"too wide", Rewrite{Window: Window{Qubits: allQubits(MaxPieceQubits + 1)}, Piece: one, Replacement: one}, "over the limit"},
	} {
		var l Ledger
		if err := l.Record(c.r); err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%s: Record = %v, want an error containing %q", c.name, err, c.want)
		}
	}
}

// Recording from many goroutines keeps every entry and the exact sum; run with -race.
func TestLedgerConcurrent(t *testing.T) {
	var l Ledger
	const workers, each = 8, 50
	var wg sync.WaitGroup
	for w := 0; w < workers; w++ {
		wg.Add(1)
		go func(w int) {
			defer wg.Done()
			for i := 0; i < each; i++ {
				k := w*each + i
				// rz(θ) by nothing has δ = 2 sin(θ/4) (see TestRecordKnownDistances).
				r := Rewrite{Window: Window{Before: circuit.Span{Start: k, End: k + 1}, After: circuit.Span{Start: 0, End: 0}, Qubits: []int{w}},
					Piece: circuit.New(1).RZ(1e-3, 0), Replacement: circuit.New(1), Share: 1}
				if err := l.Record(r); err != nil {
					t.Error(err)
					return
				}
				_ = l.Bound()
			}
		}(w)
	}
	wg.Wait()
	if l.Len() != workers*each {
		t.Fatalf("%d entries, want %d", l.Len(), workers*each)
	}
	want := workers * each * 2 * math.Sin(1e-3/4)
	if got := l.Bound(); math.Abs(got-want) > 1e-12 {
		t.Errorf("bound %.15g, want %.15g", got, want)
	}
	seen := make([]bool, workers*each)
	for _, e := range l.Entries() {
		seen[e.Seq] = true
	}
	for k, ok := range seen {
		if !ok {
			t.Fatalf("no entry has Seq %d", k)
		}
	}
}

// matrix2 wraps a copy of a row-major 2×2 matrix.
func matrix2(x []complex128) *mat.CDense { return mat.NewCDense(2, 2, append([]complex128(nil), x...)) }

package qcheck

import (
	"math"
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// Issue 17, reproducer 9: a comparison that would run for hours is refused before it starts,
// with the estimate, and WorkLimit raises the limit. 3,000 + 3,000 T gates on 22 qubits go to
// the matrix-free engine: 60·6000·2^22 ≈ 1.5e12 amplitude updates, over the default 1e12.
func TestWorkLimitRefusesBeforeStarting(t *testing.T) {
	c := circuit.New(22)
	for i := range 3000 {
		c.T(i % 22)
	}
	_, err := Compare(c, c.Clone())
	if err == nil || !strings.Contains(err.Error(), "about 1.5e+12 amplitude updates") || !strings.Contains(err.Error(), "WorkLimit") {
		t.Fatalf("error %v, want a refusal with the estimate 1.5e12", err)
	}
	// The same pair on 12 qubits is dense and well within the limit: 6000·4^12 + 6·8^12 ≈ 5e11.
	small := circuit.New(12)
	for i := range 3000 {
		small.T(i % 12)
	}
	if got := (denseEngine{}).work(&frame{m: 12, want: small, got: small}); math.Abs(got-(6000*math.Exp2(24)+6*math.Exp2(36))) > 1 {
		t.Errorf("dense estimate %g", got)
	}
	for _, bad := range []float64{0, -1, math.NaN()} {
		if _, err := Compare(small, small, WorkLimit(bad)); err == nil {
			t.Errorf("WorkLimit(%v) accepted", bad)
		}
	}
	// A lowered limit refuses a small comparison; +Inf removes the limit.
	if _, err := Compare(circuit.New(2).T(0), circuit.New(2).T(0), WorkLimit(10)); err == nil {
		t.Error("WorkLimit(10) admitted a dense 2-qubit comparison (about 400 updates)")
	}
	// Auto passes over an engine whose work is over the limit to one within it: on 10 qubits
	// the tableau compares two H gates in 22 words, the dense engine would take 6e9 updates.
	if r, err := Compare(circuit.New(10).H(0), circuit.New(10).H(0), WorkLimit(100)); err != nil || r.Engine != Tableau {
		t.Errorf("WorkLimit(100) on a Clifford pair: %v, engine %v; want the tableau", err, r.Engine)
	}
	if r, err := Compare(circuit.New(2).H(0), circuit.New(2).H(0), WorkLimit(math.Inf(1))); err != nil || !r.Equivalent {
		t.Errorf("WorkLimit(+Inf): %v", err)
	}
}

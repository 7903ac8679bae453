package qcheck

import (
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// A difference smaller than the printed digits (issue 16): rz(0.3) against rz(0.3 + 1e-6) differ
// by a relative phase, rz(1e-6) up to phase, at distance 2·sin(1e-6/4) ≈ 5e-7 (the phase-free
// distance of rz(δ), from its eigenphases ∓δ/2). The report must not call the ops the same nor the
// difference a global phase, must print both angles in full, and writes e^{−iθ} for a negative
// phase.
func TestReportOfADifferenceBelowThePrintedDigits(t *testing.T) {
	r, err := Compare(circuit.New(1).RZ(0.3, 0), circuit.New(1).RZ(0.3+1e-6, 0))
	if err != nil || r.Equivalent {
		t.Fatalf("Compare = %v, %v; want not equivalent", r.Equivalent, err)
	}
	rep := r.Report()
	for _, bad := range []string{"have the same ops", "differ only by a global phase", "e^{i-"} {
		if strings.Contains(rep, bad) {
			t.Errorf("report says %q:\n%s", bad, rep)
		}
	}
	for _, want := range []string{"0.3 in want", "0.300001 in got", "e^{−i0.3}"} {
		if !strings.Contains(rep, want) {
			t.Errorf("report lacks %q:\n%s", want, rep)
		}
	}
}

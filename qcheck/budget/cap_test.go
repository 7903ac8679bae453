package budget

import (
	"strings"
	"testing"
)

// A bound of 2·Σδ ≥ 1 says nothing about probabilities, which change by at most 1: the report
// says so instead of printing a "probability change" above 1 (issue 16). Four rz(2) removed:
// δ = 2·sin(2/4) ≈ 0.959 each (the phase-free distance of rz(θ)), Σδ ≈ 3.84.
func TestWithinCapsTheProbabilityBound(t *testing.T) {
	var l Ledger
	for k := range 4 {
		recordRZ(t, &l, 2*k, 0, 2, 0)
	}
	var f fakeTB
	Within(&f, &l, 0.1)
	if len(f.errors) != 1 {
		t.Fatalf("Within on an exceeded budget reported %v", f.errors)
	}
	msg := f.errors[0]
	if strings.Contains(msg, "changes by at most") || !strings.Contains(msg, "at least 1, the most a probability can change") {
		t.Errorf("report does not cap the probability bound at 1:\n%s", msg)
	}
}

package qcheck

import (
	"math"
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

func mustCompare(t *testing.T, want, got *circuit.Circuit, opts ...Option) Result {
	t.Helper()
	r, err := Compare(want, got, opts...)
	if err != nil {
		t.Fatalf("Compare: %v", err)
	}
	return r
}

func TestQuickReport(t *testing.T) {
	r := mustCompare(t, circuit.New(3).H(0).CX(0, 1).T(1), circuit.New(3).H(0).CX(0, 1).Tdg(1))
	t.Log("\n" + r.Report())
	r = mustCompare(t, circuit.New(1).P(0.3, 0), circuit.New(1).RZ(0.3, 0), ExactPhase())
	t.Log("\n" + r.Report())
	_ = math.Pi
	_ = strings.Contains
}

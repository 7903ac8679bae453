package qcheck

import (
	"encoding/json"
	"math"
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// The tableau reports the distance itself where V†U splits into small factors: a GHZ ladder on 20
// qubits with one CX dropped differs from the original by that CX, conjugated by the gates after
// it. CX has eigenvalues 1, 1, 1, −1 (Nielsen & Chuang §4.3), so its phase-free distance from the
// identity is min over φ of max(|1 − e^{iφ}|, |−1 − e^{iφ}|) = √2, at φ = π/2.
func TestTableauGivesExactDistanceOfDroppedCX(t *testing.T) {
	ladder := func(skip int) *circuit.Circuit {
		c := circuit.New(20).H(0)
		for q := 0; q+1 < 20; q++ {
			if q != skip {
				c.CX(q, q+1)
			}
		}
		return c
	}
	r, err := Compare(ladder(-1), ladder(18))
	if err != nil {
		t.Fatal(err)
	}
	if r.Engine != Tableau || r.Equivalent || r.LowerBound || math.Abs(r.Distance-math.Sqrt2) > 1e-9 {
		t.Fatalf("engine %v, equivalent %v, lower bound %v, distance %.12g; want the tableau's exact √2", r.Engine, r.Equivalent, r.LowerBound, r.Distance)
	}
	if h := strings.SplitN(r.Report(), "\n", 2)[0]; !strings.Contains(h, "1.414 >") || strings.Contains(h, "at least") {
		t.Errorf("headline %q", h)
	}
}

// Where the tableau knows only a lower bound, the Result, the headline and the JSON say so.
func TestTableauLowerBoundIsLabelled(t *testing.T) {
	r := Result{Distance: 1, LowerBound: true, Measure: OperatorNorm, Tolerance: 1e-9}
	if h := strings.SplitN(r.Report(), "\n", 2)[0]; !strings.Contains(h, "at least 1 > tolerance") {
		t.Errorf("headline %q does not call the figure a lower bound", h)
	}
	b, err := json.Marshal(r)
	if err != nil || !strings.Contains(string(b), `"lower_bound":true`) {
		t.Errorf("JSON %s (err %v) lacks lower_bound", b, err)
	}
}

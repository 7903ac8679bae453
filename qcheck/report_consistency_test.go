package qcheck

import (
	"encoding/json"
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// A report never contradicts its own headline (found by trying realistic OpenQASM files): when
// two circuits with the same unitary differ only in which qubit writes a classical bit, the
// distributions differ (total variation 1, derived by hand: want ends with c0 = 0 from q1, got
// with c0 = 1 from q0) while the unitaries agree, so neither the witness (gap 0) nor the bound
// "2 × operator-norm distance" (which assumes both circuits are read alike) may be printed.
func TestReportDoesNotBoundByEqualUnitaries(t *testing.T) {
	want := circuit.New(2).X(0).Measure(0, 0).Measure(1, 0)
	got := circuit.New(2).X(0).Measure(0, 0)
	r, err := Compare(want, got, Measured())
	if err != nil {
		t.Fatal(err)
	}
	if r.Equivalent || r.Distance != 1 {
		t.Fatalf("verdict %v, distance %g; want differs with total variation 1", r.Equivalent, r.Distance)
	}
	rep := r.Report()
	for _, bad := range []string{"2 × 0 = 0", "witness input"} {
		if strings.Contains(rep, bad) {
			t.Errorf("report contains %q:\n%s", bad, rep)
		}
	}
	var v struct {
		Witness [][2]float64 `json:"witness"`
	}
	b, err := json.Marshal(r)
	if err != nil {
		t.Fatal(err)
	}
	if err := json.Unmarshal(b, &v); err != nil || len(v.Witness) != 0 {
		t.Errorf("JSON witness %v (err %v); want [] for a witness that shows no gap", v.Witness, err)
	}
}

// An equivalent program pair names no outcome "that tells them apart", and the JSON of a
// differing one reports probabilities within [0, 1].
func TestProgramOutcomeOnlyWhenDifferent(t *testing.T) {
	ghz := func(extra bool) *circuit.Circuit {
		c := circuit.New(3).H(0).CX(0, 1).CX(1, 2)
		if extra {
			c.Z(2) // diagonal before a final measurement: the same distribution (common practice)
		}
		return c.Measure(0, 0).Measure(1, 1).Measure(2, 2)
	}
	r, err := Compare(ghz(false), ghz(true))
	if err != nil {
		t.Fatal(err)
	}
	if !r.Equivalent || r.Outcome != "" {
		t.Errorf("equivalent %v, outcome %q; want equivalent with no outcome", r.Equivalent, r.Outcome)
	}
	bad := circuit.New(3).H(0).CX(0, 1).Measure(0, 0).Measure(1, 1).Measure(2, 2)
	r, err = Compare(ghz(false), bad)
	if err != nil {
		t.Fatal(err)
	}
	if r.Equivalent || r.Outcome == "" || r.OutcomeWant < 0 || r.OutcomeWant > 1 || r.OutcomeGot < 0 || r.OutcomeGot > 1 {
		t.Errorf("equivalent %v, outcome %q with %g and %g", r.Equivalent, r.Outcome, r.OutcomeWant, r.OutcomeGot)
	}
}

// The op diff never shows two different ops as one common line: rz(0.3) and rz(0.3 + 1e-6) print
// alike with five digits, so when the lists also differ otherwise, both are written with every
// digit (the difference the verdict is about: operator norm 2·sin(1e-6/4) ≈ 5e-7, from the
// eigenphases ∓θ/2 of rz, Nielsen & Chuang §4.2).
func TestDiffShowsAnglesThatDiffer(t *testing.T) {
	r, err := Compare(circuit.New(1).RZ(0.3, 0), circuit.New(1).RZ(0.3+1e-6, 0).Z(0).Z(0))
	if err != nil {
		t.Fatal(err)
	}
	rep := r.Report()
	if r.Equivalent || !strings.Contains(rep, `- 	"rz(0.3) q0"`) || !strings.Contains(rep, `+ 	"rz(0.300001) q0"`) {
		t.Errorf("the diff hides the changed angle:\n%s", rep)
	}
}

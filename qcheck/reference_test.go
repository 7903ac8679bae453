package qcheck

import (
	"encoding/json"
	"math"
	"os"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// referenceCase is one pair of testdata/qcheck/compare_reference.json, made by
// compare_reference.py with NumPy (versions recorded in the file): full matrices built by index
// mapping from textbook gate matrices, the phase-free distance by brute-force search over the
// global phase, the diamond distance from the numerical range of U†V (Watrous 2018, §3.3) and the
// average fidelity by Nielsen's formula (Phys. Lett. A 303 (2002)).
type referenceCase struct {
	Name            string   `json:"name"`
	Qubits          int      `json:"qubits"`
	WantQubits      int      `json:"want_qubits"`
	Want            [][3]any `json:"want"`
	Got             [][3]any `json:"got"`
	Ancillas        []int    `json:"ancillas"`
	Clean           bool     `json:"clean"`
	Perm            []int    `json:"perm"`
	PhaseDistance   float64  `json:"phase_distance"`
	ExactDistance   float64  `json:"exact_distance"`
	Diamond         *float64 `json:"diamond"`
	AverageFidelity *float64 `json:"average_fidelity"`
}

func loadReference(t *testing.T) []referenceCase {
	t.Helper()
	data, err := os.ReadFile("../testdata/qcheck/compare_reference.json")
	if err != nil {
		t.Fatal(err)
	}
	var file struct {
		Cases []referenceCase `json:"cases"`
	}
	if err := json.Unmarshal(data, &file); err != nil {
		t.Fatal(err)
	}
	return file.Cases
}

// buildOps makes a circuit from the script's [name, params, qubits] triples.
func buildOps(t *testing.T, n int, ops [][3]any) *circuit.Circuit {
	t.Helper()
	c := circuit.New(n)
	for _, op := range ops {
		var params []float64
		for _, p := range op[1].([]any) {
			params = append(params, p.(float64))
		}
		var qs []int
		for _, q := range op[2].([]any) {
			qs = append(qs, int(q.(float64)))
		}
		g, err := circuit.NewGate(op[0].(string), params...)
		if err != nil {
			t.Fatal(err)
		}
		c.Append(g, qs...)
	}
	return c
}

func TestCompareAgreesWithNumPy(t *testing.T) {
	for _, rc := range loadReference(t) {
		want := buildOps(t, rc.WantQubits, rc.Want)
		got := buildOps(t, rc.Qubits, rc.Got)
		var base []Option
		if len(rc.Ancillas) > 0 {
			state := Dirty
			if rc.Clean {
				state = Clean
			}
			base = append(base, Ancillas(rc.Ancillas, state))
		}
		if rc.Perm != nil {
			base = append(base, OutputPermutation(rc.Perm))
		}
		check := func(what string, ref float64, tol float64, opts ...Option) {
			r, err := Compare(want, got, append(append([]Option{}, base...), opts...)...)
			if err != nil {
				t.Errorf("%s, %s: %v", rc.Name, what, err)
				return
			}
			if math.Abs(r.Distance-ref) > tol {
				t.Errorf("%s, %s: Compare says %.15g, NumPy reference %.15g", rc.Name, what, r.Distance, ref)
			}
			if r.Equivalent != (r.Distance <= DefaultTolerance) {
				t.Errorf("%s, %s: verdict %v for distance %g", rc.Name, what, r.Equivalent, r.Distance)
			}
		}
		check("phase-free operator norm", rc.PhaseDistance, 1e-9)
		check("exact-phase operator norm", rc.ExactDistance, 1e-9, ExactPhase())
		if rc.Diamond != nil {
			// The reference's 2·sqrt(1 − ν²) loses half the digits near 0 (sqrt of rounding
			// error), hence the looser bound.
			check("diamond", *rc.Diamond, 1e-7, UseMeasure(Diamond))
		}
		if rc.AverageFidelity != nil {
			check("average infidelity", 1-*rc.AverageFidelity, 1e-9, UseMeasure(AverageFidelity))
		}
	}
}

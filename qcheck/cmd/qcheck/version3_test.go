package main

import (
	"encoding/json"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// qcheck equiv compares a 2.0 file with a 3 file as easily as two of one version: every pair of
// the corpus, with the before side in 2.0 and the after side in its OpenQASM 3 form
// (testdata/identities/v3), gets NumPy's verdict and distance from the manifest.
func TestEquivAcrossVersions(t *testing.T) {
	for _, e := range manifest(t) {
		a, _ := pairFiles(e.name)
		b := filepath.Join(corpus, "v3", e.name+".after.qasm")
		code, out, errOut := runCmd("equiv", "-json", a, b)
		want := exitOK
		if !e.equivalent {
			want = exitDiffer
		}
		var v struct {
			Distance *float64 `json:"distance"`
		}
		if code != want || json.Unmarshal([]byte(out), &v) != nil || v.Distance == nil || math.Abs(*v.Distance-e.distance) > 1e-9 {
			t.Errorf("%s (2.0 vs 3): exit %d, %s%s; NumPy says equivalent=%v distance=%.15g", e.name, code, out, errOut, e.equivalent, e.distance)
		}
	}
	if code, out, errOut := runCmd("pairs", "-expect", filepath.Join(corpus, "manifest.txt"), filepath.Join(corpus, "v3")); code != exitOK {
		t.Errorf("pairs on the 3 corpus: exit %d\n%s%s", code, out, errOut)
	}
}

// random -version 3 writes files that read back to the circuit random -version 2 writes for the
// same seed: equivalent with the global phase counted.
func TestRandomVersion3(t *testing.T) {
	dir := t.TempDir()
	for _, v := range []string{"2", "3"} {
		code, out, errOut := runCmd("random", "-version", v, "-qubits", "4", "-gates", "40", "-seed", "9")
		if code != exitOK || !strings.Contains(out, "OPENQASM "+v) {
			t.Fatalf("-version %s: exit %d %s", v, code, errOut)
		}
		if err := os.WriteFile(filepath.Join(dir, "v"+v+".qasm"), []byte(out), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	if code, out, errOut := runCmd("equiv", "-exact-phase", filepath.Join(dir, "v2.qasm"), filepath.Join(dir, "v3.qasm")); code != exitOK {
		t.Errorf("2.0 vs 3 of one seed: exit %d\n%s%s", code, out, errOut)
	}
	if code, _, errOut := runCmd("random", "-version", "4"); code != exitBadUsed || !strings.Contains(errOut, "want 2 or 3") {
		t.Errorf("-version 4: exit %d, %s", code, errOut)
	}
}

// An OpenQASM 3 input angle cannot be a free parameter (its value is reduced modulo 2π): without
// -input the command says so at its line and column; with it, the value is used.
func TestInputFlag(t *testing.T) {
	dir := t.TempDir()
	a, b := filepath.Join(dir, "a.qasm"), filepath.Join(dir, "b.qasm")
	os.WriteFile(a, []byte("OPENQASM 3;\ninclude \"stdgates.inc\";\ninput angle θ;\nqubit q;\nrz(θ) q;\n"), 0o644)
	os.WriteFile(b, []byte("OPENQASM 2.0;\ninclude \"qelib1.inc\";\nqreg q[1];\nrz(0.25) q[0];\n"), 0o644)
	if code, _, errOut := runCmd("equiv", a, b); code != exitBadUsed || !strings.Contains(errOut, "a.qasm:3:7: input θ of type angle cannot be a free parameter") || !strings.Contains(errOut, "-input θ=VALUE") {
		t.Errorf("no -input: exit %d, %s", code, errOut)
	}
	if code, out, errOut := runCmd("equiv", "-input", "θ=0.25", a, b); code != exitOK {
		t.Errorf("-input θ=0.25: exit %d %s%s", code, out, errOut)
	}
	if code, _, _ := runCmd("equiv", "-input", "θ=0.5", a, b); code != exitDiffer {
		t.Errorf("-input θ=0.5: exit %d, want 1", code)
	}
	if code, _, errOut := runCmd("equiv", "-input", "θ", a, b); code != exitBadUsed || !strings.Contains(errOut, "NAME=VALUE") {
		t.Errorf("-input θ: exit %d, %s", code, errOut)
	}
}

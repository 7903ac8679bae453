package qasm

import (
	"os"
	"path/filepath"
	"testing"
)

// The OpenQASM 3 form of the identity corpus (testdata/identities/v3, written by convert.py with
// ctrl @, ctrl(n) @ and inv @ in place of the controlled and inverse gates of qelib1) reads to
// exactly the unitary of the 2.0 form, global phase included, side for side: the 2.0 and 3
// forms of the same published identities are the same circuits.
func TestCorpus3MatchesCorpus2(t *testing.T) {
	entries := readManifest(t)
	files, _ := filepath.Glob(filepath.Join(corpusDir, "v3", "*.qasm"))
	if len(files) != 2*len(entries) {
		t.Errorf("%d files in v3 for %d pairs", len(files), len(entries))
	}
	for _, e := range entries {
		for _, side := range []string{".before.qasm", ".after.qasm"} {
			src2, err := os.ReadFile(filepath.Join(corpusDir, e.name+side))
			if err != nil {
				t.Fatal(err)
			}
			src3, err := os.ReadFile(filepath.Join(corpusDir, "v3", e.name+side))
			if err != nil {
				t.Fatal(err)
			}
			p3 := mustParse(t, string(src3))
			if p3.Version != 3 {
				t.Errorf("%s%s: version %d", e.name, side, p3.Version)
			}
			want := unitaryOfSource(t, string(src2))
			n, _ := want.Dims()
			flat := make([]complex128, 0, n*n)
			for i := 0; i < n; i++ {
				for j := 0; j < n; j++ {
					flat = append(flat, want.At(i, j))
				}
			}
			if d := maxEntryDiff(unitaryOfCircuit(t, p3), flat); d > 1e-12 {
				t.Errorf("%s%s: the 3 form is off by %.3g from the 2.0 form", e.name, side, d)
			}
		}
	}
}

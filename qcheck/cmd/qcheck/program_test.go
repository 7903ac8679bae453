package main

import (
	"encoding/json"
	"path/filepath"
	"strings"
	"testing"
)

// The teleportation program of Cross, Bishop, Smolin & Gambetta (arXiv:1707.03429), written from
// the paper's description, with Bob's corrections controlled by the measured qubits themselves
// rather than by if (Nielsen & Chuang §4.4: a quantum-controlled gate after a measurement acts
// as the classically controlled one). By hand: with both corrections, c2 reads 1 with
// probability sin²(θ/2) whatever c0 and c1; without the x correction, c2 flips when c1 = 1, a
// distance of |cos θ|/2.
const teleport = `qreg q[3];
creg c0[1];
creg c1[1];
creg c2[1];
u3(0.3,0.2,0.1) q[0];
h q[1];
cx q[1],q[2];
barrier q;
cx q[0],q[1];
h q[0];
%s
measure q[2] -> c2[0];
`

// Bob's corrections after the measurements (mid-circuit: the measured qubits are used again), the
// same deferred to before them, and the program without the x correction.
var (
	measureFirst = strings.Replace(teleport, "%s", "measure q[0] -> c0[0];\nmeasure q[1] -> c1[0];\ncz q[0],q[2];\ncx q[1],q[2];", 1)
	deferred     = strings.Replace(teleport, "%s", "cz q[0],q[2];\ncx q[1],q[2];\nmeasure q[0] -> c0[0];\nmeasure q[1] -> c1[0];", 1)
	noFix        = strings.Replace(teleport, "%s", "measure q[0] -> c0[0];\nmeasure q[1] -> c1[0];\ncz q[0],q[2];", 1)
)

func TestEquivPrograms(t *testing.T) {
	dir := writeFiles(t, map[string]string{
		"teleport.qasm":       measureFirst,
		"teleport_copy.qasm":  measureFirst,
		"teleport_late.qasm":  deferred,
		"teleport_nofix.qasm": noFix,
	})
	f := func(name string) string { return filepath.Join(dir, name) }
	code, out, errOut := runCmd("equiv", f("teleport.qasm"), f("teleport_copy.qasm"))
	if code != exitOK {
		t.Fatalf("two copies of a program: exit %d, %s%s", code, out, errOut)
	}
	if first, _, _ := strings.Cut(out, "\n"); !strings.Contains(first, "as programs") {
		t.Errorf("first line %q does not say the files were compared as programs", first)
	}
	if code, out, errOut := runCmd("equiv", f("teleport.qasm"), f("teleport_late.qasm")); code != exitOK {
		t.Errorf("measurements first and deferred: exit %d, %s%s", code, out, errOut)
	}
	code, out, _ = runCmd("equiv", "-json", f("teleport.qasm"), f("teleport_nofix.qasm"))
	if code != exitDiffer {
		t.Fatalf("without the correction: exit %d\n%s", code, out)
	}
	var r struct {
		Meaning  string  `json:"meaning"`
		Distance float64 `json:"distance"`
		Outcome  struct {
			Bits string `json:"bits"`
		} `json:"outcome"`
	}
	if err := json.Unmarshal([]byte(out), &r); err != nil {
		t.Fatal(err)
	}
	// |cos θ|/2 by hand (see package sim's teleportation test).
	if r.Meaning != "program" || r.Distance < 0.4776 || r.Distance > 0.4777 || len(r.Outcome.Bits) != 3 {
		t.Errorf("JSON %+v; want meaning program, distance |cos 0.3|/2 ≈ 0.47767 and a 3-bit outcome", r)
	}
}

func TestPairsMixMeanings(t *testing.T) {
	// A unitary pair and a program pair in one folder, each checked by its own meaning.
	dir := writeFiles(t, map[string]string{
		"bell.before.qasm":     "qreg q[2];\ncreg c[2];\nh q[0];\ncx q[0],q[1];\nmeasure q -> c;\n",
		"bell.after.qasm":      "qreg q[2];\ncreg c[2];\nh q[0];\ncx q[0],q[1];\nz q[1];\nmeasure q -> c;\n",
		"unitary.before.qasm":  "qreg q[1];\nh q[0];\n",
		"unitary.after.qasm":   "qreg q[1];\nh q[0];\nz q[0];\n",
		"teleport.before.qasm": measureFirst,
		"teleport.after.qasm":  deferred,
	})
	code, out, errOut := runCmd("pairs", "-json", dir)
	var res struct {
		Pairs []struct {
			Pair       string `json:"pair"`
			Meaning    string `json:"meaning"`
			Equivalent bool   `json:"equivalent"`
		} `json:"pairs"`
	}
	if err := json.Unmarshal([]byte(out), &res); err != nil {
		t.Fatalf("%v\n%s%s", err, out, errOut)
	}
	want := map[string]struct {
		meaning    string
		equivalent bool
	}{"bell": {"program", true}, "teleport": {"program", true}, "unitary": {"unitary", false}}
	for _, p := range res.Pairs {
		if w := want[p.Pair]; p.Meaning != w.meaning || p.Equivalent != w.equivalent {
			t.Errorf("%s: meaning %q, equivalent %v; want %q, %v", p.Pair, p.Meaning, p.Equivalent, w.meaning, w.equivalent)
		}
	}
	if code != exitDiffer || len(res.Pairs) != 3 {
		t.Errorf("exit %d with %d pairs, want 1 (the unitary pair differs) and 3", code, len(res.Pairs))
	}
}

func TestEquivPaperPrograms(t *testing.T) {
	// Issue 12's test of done: two copies of a real program with if statements and final
	// measurements are equivalent, and the command says it compared programs.
	for _, name := range []string{"teleport.qasm", "semiclassical_qft.qasm"} {
		p := filepath.Join("..", "..", "..", "testdata", "programs", name)
		code, out, errOut := runCmd("equiv", p, p)
		if first, _, _ := strings.Cut(out, "\n"); code != exitOK || !strings.Contains(first, "as programs") {
			t.Errorf("%s against itself: exit %d, %s%s", name, code, out, errOut)
		}
	}
	// Teleportation with if, against the version whose corrections are controlled by the
	// measured qubits (N&C §4.4): the same distribution.
	dir := writeFiles(t, map[string]string{"late.qasm": deferred})
	code, out, errOut := runCmd("equiv", filepath.Join("..", "..", "..", "testdata", "programs", "teleport.qasm"), filepath.Join(dir, "late.qasm"))
	if code != exitOK {
		t.Errorf("teleport.qasm against its deferred form: exit %d, %s%s", code, out, errOut)
	}
}

// -measured on files that measure, reset or branch before the end is refused at the line of the
// op at fault, saying that -measured takes final measurements only and that without it the files
// are compared as programs — not with advice to compare measured distributions, nor with "want
// measures nothing" when want's only measurement is followed by a gate.
func TestEquivMeasuredRefusesPrograms(t *testing.T) {
	cases := []struct {
		pair, at, why string
	}{
		{"mid005_deferred", "mid005_deferred.before.qasm:7: measure q0 -> c5", "followed by reset q0"},
		{"probe002_gateafter", "probe002_gateafter.before.qasm:6: measure q0 -> c0", "followed by x q0 on the same qubit, so it is not final"},
		{"probe002_measuretwice", "probe002_measuretwice.before.qasm:6: measure q0 -> c0", "followed by measure q0 -> c1"},
	}
	for _, c := range cases {
		a := filepath.Join(realisticDir, c.pair+".before.qasm")
		b := filepath.Join(realisticDir, c.pair+".after.qasm")
		code, out, errOut := runCmd("equiv", "-measured", a, b)
		if code != exitBadUsed {
			t.Errorf("%s: exit %d, want %d\n%s%s", c.pair, code, exitBadUsed, out, errOut)
		}
		for _, s := range []string{c.at, c.why, "-measured takes circuits whose measurements are all final", "Without -measured", "compared as programs"} {
			if !strings.Contains(errOut, s) {
				t.Errorf("%s: %q does not say %q", c.pair, errOut, s)
			}
		}
		if strings.Contains(errOut, "measures nothing") || strings.Contains(errOut, "compare measured distributions") {
			t.Errorf("%s: circular advice: %q", c.pair, errOut)
		}
	}
}

// Files whose classical registers are not one register c get a legend of the report's bits in
// the files' register names, and the outcome that tells programs apart in those names. By hand
// for mid005_dropreset: with the reset, m[0]=1 (probability ½) leaves q0 at 0 and q1 at 1, and
// c[2]=c[3] is 0 with probability ½, so m[0]=1 c[1]=1 and the rest 0 has probability ¼; without
// the reset, m[0]=1 makes c[0]=c[4]=1, so that outcome cannot occur.
func TestEquivRegisterNames(t *testing.T) {
	a := filepath.Join(realisticDir, "mid005_dropreset.before.qasm")
	b := filepath.Join(realisticDir, "mid005_dropreset.after.qasm")
	code, out, errOut := runCmd("equiv", a, b)
	if code != exitDiffer {
		t.Fatalf("exit %d, want %d\n%s%s", code, exitDiffer, out, errOut)
	}
	for _, s := range []string{
		"c0…c4 are c[0]…c[4]; c5 is m[0]",
		"outcome 100010: m[0]=1 c[4]=0 c[3]=0 c[2]=0 c[1]=1 c[0]=0",
		"100010 with probability 0.25 after want, 0 after got",
	} {
		if !strings.Contains(out, s) {
			t.Errorf("report does not say %q:\n%s", s, out)
		}
	}
	// One register c: the report's c0, c1, … already name c[0], c[1], …; no legend.
	dir := writeFiles(t, map[string]string{
		"a.qasm": "qreg q[1];\ncreg c[1];\nh q[0];\nmeasure q[0] -> c[0];\n",
		"b.qasm": "qreg q[1];\ncreg c[1];\nmeasure q[0] -> c[0];\n",
	})
	code, out, errOut = runCmd("equiv", filepath.Join(dir, "a.qasm"), filepath.Join(dir, "b.qasm"))
	if code != exitDiffer || !strings.Contains(out, "outcome that tells them apart") || strings.Contains(out, "registers") {
		t.Errorf("one register c: exit %d, want %d and no legend:\n%s%s", code, exitDiffer, out, errOut)
	}
}

package main

import (
	"bufio"
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"math"
	"os"
	"os/exec"
	"path/filepath"
	"reflect"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"qcheck.dev/qcheck"
	"qcheck.dev/qcheck/qasm"
)

const corpus = "../../../testdata/identities"

// runCmd runs one command line through run and returns the exit code, stdout and stderr.
func runCmd(args ...string) (int, string, string) {
	var out, errOut bytes.Buffer
	code := run(args, &out, &errOut)
	return code, out.String(), errOut.String()
}

type entry struct {
	name       string
	equivalent bool
	distance   float64
}

// manifest reads testdata/identities/manifest.txt, whose distances NumPy computed
// (testdata/identities/distances.py).
func manifest(t *testing.T) []entry {
	t.Helper()
	f, err := os.Open(filepath.Join(corpus, "manifest.txt"))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	var out []entry
	s := bufio.NewScanner(f)
	for s.Scan() {
		fields := strings.Fields(s.Text())
		if len(fields) != 3 || strings.HasPrefix(fields[0], "#") {
			continue
		}
		d, err := strconv.ParseFloat(fields[2], 64)
		if err != nil {
			t.Fatal(err)
		}
		out = append(out, entry{fields[0], fields[1] == "equivalent", d})
	}
	if len(out) < 25 {
		t.Fatalf("manifest has %d pairs", len(out))
	}
	return out
}

func pairFiles(name string) (string, string) {
	return filepath.Join(corpus, name+".before.qasm"), filepath.Join(corpus, name+".after.qasm")
}

// equiv on every pair of the corpus: exit 0 or 1 as NumPy's verdict says, and the JSON distance
// equal to NumPy's to 1e-9.
func TestEquivCorpus(t *testing.T) {
	for _, e := range manifest(t) {
		a, b := pairFiles(e.name)
		code, out, errOut := runCmd("equiv", "-json", a, b)
		want := exitOK
		if !e.equivalent {
			want = exitDiffer
		}
		if code != want {
			t.Errorf("%s: exit %d, want %d; stderr %s", e.name, code, want, errOut)
			continue
		}
		var v struct {
			Equivalent *bool    `json:"equivalent"`
			Distance   *float64 `json:"distance"`
			Tolerance  float64  `json:"tolerance"`
			Measure    string   `json:"measure"`
		}
		if err := json.Unmarshal([]byte(out), &v); err != nil || v.Equivalent == nil || v.Distance == nil {
			t.Fatalf("%s: JSON %q: %v", e.name, out, err)
		}
		if *v.Equivalent != e.equivalent || math.Abs(*v.Distance-e.distance) > 1e-9 || v.Tolerance != 1e-9 || v.Measure != "operator norm" {
			t.Errorf("%s: JSON %+v, NumPy says equivalent=%v distance=%.15g", e.name, v, e.equivalent, e.distance)
		}
	}
}

// Human output: a line naming which file is want and which got, then the verdict line (with the
// measure and the phase convention) when equivalent, or the report (headline first, then a
// witness and a measurement) on a difference.
func TestEquivHumanOutput(t *testing.T) {
	a, b := pairFiles("toffoli")
	code, out, _ := runCmd("equiv", a, b)
	lines := strings.Split(strings.TrimSuffix(out, "\n"), "\n")
	if code != exitOK || len(lines) != 2 || lines[0] != a+" (want) vs "+b+" (got):" ||
		!strings.HasPrefix(lines[1], "qcheck: got is equivalent to want: operator norm ") ||
		!strings.HasSuffix(lines[1], "(up to global phase)") {
		t.Errorf("toffoli: exit %d, output %q", code, out)
	}
	a, b = pairFiles("cp_in_place_of_crz")
	code, out, _ = runCmd("equiv", a, b)
	if code != exitDiffer || !strings.HasPrefix(out, a+" (want) vs "+b+" (got):\nqcheck: got differs from want: operator norm 0.1748") {
		t.Errorf("cp_in_place_of_crz: exit %d, output %q", code, out)
	}
}

// The JSON measurement uses null, not a made-up index, where a field does not apply. Worked by
// hand: cx q[0],q[1] against cx q[1],q[0] on the basis input |q1 q0⟩ = |01⟩ (index 1) gives |11⟩
// (index 3) after want and |01⟩ after got, so measuring tells them apart with certainty. cp and
// crz are both diagonal (Nielsen & Chuang §4.3), so no basis input and basis measurement can
// tell them apart: the measurement is the projection onto want's output, with no outcome index.
func TestEquivJSONMeasurement(t *testing.T) {
	type meas struct {
		InputBasis *int     `json:"input_basis"`
		Basis      *bool    `json:"basis"`
		Outcome    *int     `json:"outcome"`
		Want       *float64 `json:"want"`
		Got        *float64 `json:"got"`
	}
	read := func(name string) (*meas, map[string]json.RawMessage) {
		t.Helper()
		a, b := pairFiles(name)
		code, out, errOut := runCmd("equiv", "-json", a, b)
		var v struct {
			Measurement *meas `json:"measurement"`
		}
		var raw map[string]json.RawMessage
		if err := json.Unmarshal([]byte(out), &v); err != nil || code != exitDiffer || v.Measurement == nil {
			t.Fatalf("%s: exit %d, %v, %s%s", name, code, err, out, errOut)
		}
		json.Unmarshal([]byte(out), &raw)
		var rawMeas map[string]json.RawMessage
		json.Unmarshal(raw["measurement"], &rawMeas)
		return v.Measurement, rawMeas
	}
	m, _ := read("cnot_swapped_roles")
	if m.InputBasis == nil || m.Outcome == nil || m.Basis == nil || !*m.Basis {
		t.Fatalf("cnot_swapped_roles: %+v", m)
	}
	// want: b1 ^= b0; got: b0 ^= b1 (index Σ b_q·2^q).
	wantOut := *m.InputBasis ^ (*m.InputBasis & 1 << 1)
	gotOut := *m.InputBasis ^ (*m.InputBasis >> 1 & 1)
	indicator := func(ok bool) float64 {
		if ok {
			return 1
		}
		return 0
	}
	if math.Abs(*m.Want-indicator(wantOut == *m.Outcome)) > 1e-12 || math.Abs(*m.Got-indicator(gotOut == *m.Outcome)) > 1e-12 || *m.Want == *m.Got {
		t.Errorf("cnot_swapped_roles: input %d outcome %d: want %g got %g", *m.InputBasis, *m.Outcome, *m.Want, *m.Got)
	}
	m, raw := read("cp_in_place_of_crz")
	if *m.Basis || string(raw["input_basis"]) != "null" || string(raw["outcome"]) != "null" || *m.Want != 1 || *m.Got >= 1 {
		t.Errorf("cp_in_place_of_crz: %s %s %+v", raw["input_basis"], raw["outcome"], m)
	}
}

// -engine picks qcheck's engine: tableau on Clifford circuits (CX is Clifford, Gottesman 1998),
// refused on a circuit with T, which is not; the verdicts agree with the dense engine's.
func TestEquivEngineFlag(t *testing.T) {
	engineOf := func(args ...string) (int, string, string) {
		code, out, errOut := runCmd(append([]string{"equiv", "-json"}, args...)...)
		var v struct {
			Engine string `json:"engine"`
		}
		json.Unmarshal([]byte(out), &v)
		return code, v.Engine, errOut
	}
	ca, cb := pairFiles("cnot_swapped_roles")
	ta, tb := pairFiles("toffoli")
	for _, c := range []struct {
		args   []string
		code   int
		engine string
	}{
		{[]string{ca, cb}, exitDiffer, "dense"},
		{[]string{"-engine", "tableau", ca, cb}, exitDiffer, "tableau"},
		{[]string{"-engine", "matrix-free", ta, tb}, exitOK, "matrix-free"},
		{[]string{"-engine", "dense", ta, tb}, exitOK, "dense"},
	} {
		if code, engine, errOut := engineOf(c.args...); code != c.code || engine != c.engine {
			t.Errorf("equiv %v: exit %d engine %q (%s); want exit %d engine %q", c.args, code, engine, errOut, c.code, c.engine)
		}
	}
	for _, c := range []struct {
		args   []string
		stderr string
	}{
		{[]string{"-engine", "tableau", ta, tb}, "Clifford"},
		{[]string{"-engine", "fast", ta, tb}, "flag -engine: unknown engine; choose auto, tableau, dense, zx, matrix-free, stabilizer-program, program, zero-state or final-measure"},
	} {
		if code, _, errOut := engineOf(c.args...); code != exitBadUsed || !strings.Contains(errOut, c.stderr) {
			t.Errorf("equiv %v: exit %d, stderr %q; want exit 2 and …%s…", c.args, code, errOut, c.stderr)
		}
	}
}

func writeFiles(t *testing.T, files map[string]string) string {
	t.Helper()
	return writeFilesWith(t, "OPENQASM 2.0;\ninclude \"qelib1.inc\";\n", files)
}

// writeFilesWith writes each named source, after head, into a temporary directory it returns.
func writeFilesWith(t *testing.T, head string, files map[string]string) string {
	t.Helper()
	dir := t.TempDir()
	for name, src := range files {
		if err := os.WriteFile(filepath.Join(dir, name), []byte(head+src), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	return dir
}

// The comparison flags. Expected verdicts by hand: a SWAP only relabels qubits (N&C §1.3.4), so
// with the permutation that undoes it the circuits agree; rz and p differ by a global phase only
// (package circuit's documentation); Z before a computational-basis measurement changes no probability (N&C §2.2.5,
// the measurement postulate: |e^{iπ}a|² = |a|²).
func TestEquivFlags(t *testing.T) {
	dir := writeFiles(t, map[string]string{
		"routed_want.qasm": "qreg q[2];\nh q[0];\ncx q[0],q[1];\nx q[0];\n",
		"routed_got.qasm":  "qreg q[2];\nh q[0];\ncx q[0],q[1];\nswap q[0],q[1];\nx q[1];\n",
		"rz.qasm":          "qreg q[1];\nrz(0.5) q[0];\n",
		"p.qasm":           "qreg q[1];\np(0.5) q[0];\n",
		"bell.qasm":        "qreg q[2];\ncreg c[2];\nh q[0];\ncx q[0],q[1];\nmeasure q -> c;\n",
		"bell_z.qasm":      "qreg q[2];\ncreg c[2];\nh q[0];\ncx q[0],q[1];\nz q[1];\nmeasure q -> c;\n",
		"three.qasm":       "qreg q[3];\nh q[0];\n",
		"bad.qasm":         "qreg q[2];\nh q[0];\ncx q[0] q[1];\n",
		"ancilla.qasm":     "qreg q[5];\nccx q[0],q[1],q[4];\nccx q[2],q[4],q[3];\nccx q[0],q[1],q[4];\nccx q[2],q[4],q[3];\n",
		"c3x.qasm":         "qreg q[4];\nc3x q[0],q[1],q[2],q[3];\n",
		// Issue 12: from |000⟩, want gives c ∈ {001, 111}; the routed program swaps logical 0
		// and 1 and measures them back into their own bits (the same distribution, for every
		// input), the wrongly remapped one gives {010, 111}.
		"remap_want.qasm":  "qreg q[3];\ncreg c[3];\nx q[0];\nh q[1];\ncx q[1],q[2];\nmeasure q -> c;\n",
		"remap_right.qasm": "qreg q[3];\ncreg c[3];\nswap q[0],q[1];\nx q[1];\nh q[0];\ncx q[0],q[2];\nmeasure q[1] -> c[0];\nmeasure q[0] -> c[1];\nmeasure q[2] -> c[2];\n",
		"remap_wrong.qasm": "qreg q[3];\ncreg c[3];\nswap q[0],q[1];\nx q[1];\nh q[0];\ncx q[0],q[2];\nmeasure q -> c;\n",
	})
	f := func(name string) string { return filepath.Join(dir, name) }
	cases := []struct {
		args   []string
		code   int
		stderr string
	}{
		{[]string{"equiv", f("routed_want.qasm"), f("routed_got.qasm")}, exitDiffer, ""},
		{[]string{"equiv", "-perm", "1,0", f("routed_want.qasm"), f("routed_got.qasm")}, exitOK, ""},
		{[]string{"equiv", f("routed_want.qasm"), f("routed_got.qasm"), "-perm", "1,0"}, exitOK, ""}, // flags after files
		{[]string{"equiv", f("rz.qasm"), f("p.qasm")}, exitOK, ""},
		{[]string{"equiv", "-exact-phase", f("rz.qasm"), f("p.qasm")}, exitDiffer, ""},
		// ‖rz(0.5) − p(0.5)‖ = |1 − e^{i0.25}| = 2 sin(0.125) ≈ 0.2493 (by hand): within -tol 0.3.
		{[]string{"equiv", "-exact-phase", "-tol", "0.3", f("rz.qasm"), f("p.qasm")}, exitOK, ""},
		{[]string{"equiv", "-exact-phase", "-tol", "0.2", f("rz.qasm"), f("p.qasm")}, exitDiffer, ""},
		{[]string{"equiv", "-measured", f("bell.qasm"), f("bell_z.qasm")}, exitOK, ""},
		// Files that measure are compared as programs (issue 12): z before the final
		// measurement changes no outcome.
		{[]string{"equiv", f("bell.qasm"), f("bell_z.qasm")}, exitOK, ""},
		{[]string{"equiv", "-from-zero", f("bell.qasm"), f("bell_z.qasm")}, exitBadUsed, "bell.qasm:7: measure has no unitary; without -from-zero, files that measure are compared as programs"},
		{[]string{"equiv", "-measured", f("remap_want.qasm"), f("remap_right.qasm")}, exitOK, ""},
		{[]string{"equiv", "-measured", "-perm", "1,0,2", f("remap_want.qasm"), f("remap_right.qasm")}, exitOK, ""},
		{[]string{"equiv", "-measured", "-perm", "1,0,2", f("remap_want.qasm"), f("remap_wrong.qasm")}, exitDiffer, ""},
		// Barenco et al. 1995, Lemma 7.2: the ancilla may hold anything and is restored.
		{[]string{"equiv", "-ancillas", "4", "-dirty", f("c3x.qasm"), f("ancilla.qasm")}, exitOK, ""},
		{[]string{"equiv", "-dirty", f("rz.qasm"), f("p.qasm")}, exitBadUsed, "-dirty needs -ancillas"},
		{[]string{"equiv", "-measure", "diamond", f("rz.qasm"), f("p.qasm")}, exitOK, ""},
		{[]string{"equiv", "-measure", "fidelity", f("routed_want.qasm"), f("routed_got.qasm")}, exitDiffer, ""},
		{[]string{"equiv", "-measure", "loud", f("rz.qasm"), f("p.qasm")}, exitBadUsed, "choose operator, diamond or fidelity"},
		{[]string{"equiv", "-perm", "1,x", f("rz.qasm"), f("p.qasm")}, exitBadUsed, "-perm"},
		{[]string{"equiv", "-perm", "0,0", f("routed_want.qasm"), f("routed_got.qasm")}, exitBadUsed, "-perm[1] = 0 repeats -perm[0]"},
		{[]string{"equiv", f("rz.qasm"), f("three.qasm")}, exitBadUsed, "rz.qasm vs"},
		{[]string{"equiv", f("bad.qasm"), f("rz.qasm")}, exitBadUsed, "bad.qasm:5:9: expected \";\""},
		{[]string{"equiv", f("missing.qasm"), f("rz.qasm")}, exitBadUsed, "missing.qasm"},
		{[]string{"equiv", f("rz.qasm")}, exitBadUsed, "want 2 argument(s), got 1"},
		{[]string{"equiv", "-tol", "-1", f("rz.qasm"), f("p.qasm")}, exitBadUsed, "tolerance"},
		{[]string{"equiv", "-bogus", f("rz.qasm"), f("p.qasm")}, exitBadUsed, "flag provided but not defined"},
		{[]string{"frobnicate"}, exitBadUsed, "unknown command"},
		{nil, exitBadUsed, "Usage:"},
	}
	for _, tc := range cases {
		code, _, errOut := runCmd(tc.args...)
		if code != tc.code || !strings.Contains(errOut, tc.stderr) {
			t.Errorf("qcheck %s: exit %d, stderr %q; want exit %d and …%s…", strings.Join(tc.args, " "), code, errOut, tc.code, tc.stderr)
		}
		if tc.code == exitBadUsed && errOut == "" {
			t.Errorf("qcheck %s: bad input with nothing on stderr", strings.Join(tc.args, " "))
		}
	}
}

// measures for CX(0,1) against CX(1,0), worked by hand: V†U is a 3-cycle on the basis states
// 1, 2, 3 fixing 0, with eigenvalues 1, 1, ω, ω² (ω = e^{2πi/3}). So ‖U − V‖ = |ω − 1| = √3;
// the shortest arc holding 0, 2π/3, 4π/3 is 4π/3, so the phase-free distance is 2 sin(π/3) = √3;
// 0 lies in the convex hull of the eigenvalues, so the diamond distance is 2 (package metric's documentation formula);
// tr U†V = 1, so the average fidelity is (4 + 1)/(4·5) = 1/4 and the process fidelity 1/16.
func TestMeasures(t *testing.T) {
	a, b := pairFiles("cnot_swapped_roles")
	code, out, errOut := runCmd("measures", "-json", a, b)
	if code != exitOK {
		t.Fatalf("exit %d: %s", code, errOut)
	}
	var m allMeasures
	if err := json.Unmarshal([]byte(out), &m); err != nil {
		t.Fatal(err)
	}
	want := allMeasures{Operator: math.Sqrt(3), PhaseFree: math.Sqrt(3), Diamond: 2, AverageFidelity: 0.25, ProcessFidelity: 1.0 / 16}
	for _, c := range []struct {
		name      string
		got, want float64
	}{
		{"operator", m.Operator, want.Operator}, {"phase-free", m.PhaseFree, want.PhaseFree},
		{"diamond", m.Diamond, want.Diamond}, {"average", m.AverageFidelity, want.AverageFidelity},
		{"process", m.ProcessFidelity, want.ProcessFidelity},
	} {
		if math.Abs(c.got-c.want) > 1e-9 {
			t.Errorf("%s = %.15g, want %.15g", c.name, c.got, c.want)
		}
	}
	code, out, _ = runCmd("measures", a, b)
	if code != exitOK || !strings.Contains(out, "diamond     2\n") || !strings.Contains(out, "average     0.25\n") {
		t.Errorf("human output (exit %d):\n%s", code, out)
	}
	dir := writeFiles(t, map[string]string{"m.qasm": "qreg q[1];\ncreg c[1];\nmeasure q[0] -> c[0];\n"})
	if code, _, errOut := runCmd("measures", filepath.Join(dir, "m.qasm"), a); code != exitBadUsed || !strings.Contains(errOut, "m.qasm:5: measure") {
		t.Errorf("measure in input: exit %d, stderr %q", code, errOut)
	}
	// The φ of the 3-cycle's eigenvalues: ±2π/3 (either attains the minimum, by the symmetry of
	// 1, ω, ω² about the real axis).
	code, out, _ = runCmd("measures", a, b)
	if code != exitOK || !strings.Contains(out, "phase-free  1.73205  (φ = ") || !strings.Contains(out, "2.0944: U ≈ e^{iφ}V)\n") {
		t.Errorf("phase-free line (exit %d):\n%s", code, out)
	}
}

// measures refuses circuits wider than its limit before building any matrix, and accepts the
// limit itself.
func TestMeasuresWidthLimit(t *testing.T) {
	dir := writeFiles(t, map[string]string{
		"wide.qasm":  "qreg q[11];\nh q[0];\n",
		"wide2.qasm": "qreg q[11];\nx q[10];\n",
		"edge.qasm":  "qreg q[10];\nh q[0];\n",
		"edge2.qasm": "qreg q[10];\nh q[0];\nx q[9];\nx q[9];\n",
	})
	f := func(name string) string { return filepath.Join(dir, name) }
	code, out, errOut := runCmd("measures", f("wide.qasm"), f("wide2.qasm"))
	if code != exitBadUsed || out != "" || !strings.Contains(errOut, "11 qubits, more than the 10 that measures handles") {
		t.Errorf("11 qubits: exit %d, stdout %q, stderr %q", code, out, errOut)
	}
	if testing.Short() {
		return
	}
	// X·X = I (Nielsen & Chuang §2.1.3), so the two 10-qubit circuits are equal: distance 0.
	code, out, errOut = runCmd("measures", "-json", f("edge.qasm"), f("edge2.qasm"))
	var m allMeasures
	if err := json.Unmarshal([]byte(out), &m); code != exitOK || err != nil || m.Operator > 1e-9 || math.Abs(m.ProcessFidelity-1) > 1e-9 {
		t.Errorf("10 qubits: exit %d, %+v, %v, %s", code, m, err, errOut)
	}
}

// pairs over the corpus: with the manifest as expectation every pair passes; without it the
// eight near misses fail; a half pair is an error.
func TestPairs(t *testing.T) {
	code, out, errOut := runCmd("pairs", "-expect", filepath.Join(corpus, "manifest.txt"), corpus)
	if code != exitOK || !strings.Contains(out, "41 pairs: 41 passed, 0 failed, 0 errors") {
		t.Errorf("with -expect: exit %d\n%s%s", code, out, errOut)
	}
	code, out, _ = runCmd("pairs", corpus)
	if code != exitDiffer || !strings.Contains(out, "41 pairs: 33 passed, 8 failed, 0 errors") ||
		!strings.Contains(out, "cp_in_place_of_crz") {
		t.Errorf("without -expect: exit %d\n%s", code, out)
	}
	code, out, _ = runCmd("pairs", "-json", corpus)
	var summary struct {
		Pairs []struct {
			Pair string `json:"pair"`
			Pass bool   `json:"pass"`
		} `json:"pairs"`
		Passed, Failed, Errors int
	}
	if err := json.Unmarshal([]byte(out), &summary); err != nil || code != exitDiffer || summary.Passed != 33 || summary.Failed != 8 || len(summary.Pairs) != 41 {
		t.Errorf("-json: exit %d, %+v, %v", code, summary, err)
	}

	dir := writeFiles(t, map[string]string{
		"a.before.qasm": "qreg q[1];\nh q[0];\nh q[0];\n",
		"a.after.qasm":  "qreg q[1];\n",
		"b.before.qasm": "qreg q[1];\nh q[0];\n",
	})
	code, out, errOut = runCmd("pairs", dir)
	if code != exitBadUsed || !strings.Contains(errOut, "no b.after.qasm") || !strings.Contains(out, "2 pairs: 1 passed, 0 failed, 1 errors") {
		t.Errorf("half pair: exit %d\n%s%s", code, out, errOut)
	}
	expect := filepath.Join(dir, "expect.txt")
	os.WriteFile(expect, []byte("a different 0.5\n"), 0o644)
	os.Remove(filepath.Join(dir, "b.before.qasm"))
	if code, out, _ := runCmd("pairs", "-expect", expect, dir); code != exitDiffer || !strings.Contains(out, "FAIL") {
		t.Errorf("wrong expectation: exit %d\n%s", code, out)
	}
	os.WriteFile(expect, []byte("a sideways\n"), 0o644)
	if code, _, errOut := runCmd("pairs", "-expect", expect, dir); code != exitBadUsed || !strings.Contains(errOut, "expect.txt:1:") {
		t.Errorf("bad expectation file: exit %d, %s", code, errOut)
	}
}

// random: the same flags give the same circuits; each file parses to the asked width and length,
// using only the asked gates.
func TestRandom(t *testing.T) {
	args := []string{"random", "-qubits", "4", "-gates", "25", "-set", "h,t,cx,rz", "-seed", "3"}
	code, out1, errOut := runCmd(args...)
	_, out2, _ := runCmd(args...)
	if code != exitOK || out1 != out2 {
		t.Fatalf("exit %d (%s); outputs equal: %v", code, errOut, out1 == out2)
	}
	c, err := qasm.Parse([]byte(out1))
	if err != nil {
		t.Fatal(err)
	}
	if c.Qubits() != 4 || c.Len() != 25 {
		t.Errorf("%d qubits, %d ops; want 4, 25", c.Qubits(), c.Len())
	}
	for _, op := range c.Ops {
		if !strings.Contains(",h,t,cx,rz,", ","+op.Gate.Name+",") {
			t.Errorf("gate %s not in the set", op.Gate.Name)
		}
	}
	if !strings.HasPrefix(out1, "// qcheck random -qubits 4 -gates 25 -set h,t,cx,rz -motifs 0 -seed 3\n") {
		t.Errorf("header: %q", strings.SplitN(out1, "\n", 2)[0])
	}

	dir := t.TempDir()
	code, out, _ := runCmd("random", "-count", "3", "-seed", "10", "-out", dir)
	files, _ := filepath.Glob(filepath.Join(dir, "random-*.qasm"))
	if code != exitOK || len(files) != 3 || strings.Count(out, "\n") != 3 {
		t.Errorf("-count 3: exit %d, files %v", code, files)
	}
	for _, bad := range [][]string{
		{"random", "-set", "h,foo"}, {"random", "-qubits", "1", "-set", "cx"},
		{"random", "-count", "2"}, {"random", "-qubits", "0"}, {"random", "-motifs", "101"},
	} {
		if code, _, errOut := runCmd(bad...); code != exitBadUsed || errOut == "" {
			t.Errorf("qcheck %s: exit %d, stderr %q", strings.Join(bad, " "), code, errOut)
		}
	}
}

func TestHelp(t *testing.T) {
	for _, cmd := range []string{"equiv", "measures", "random", "pairs", "demo"} {
		code, out, errOut := runCmd(cmd, "-h")
		if code != exitOK || !strings.HasPrefix(out, "usage: qcheck "+cmd) || errOut != "" {
			t.Errorf("%s -h: exit %d, stdout %q, stderr %q", cmd, code, out, errOut)
		}
	}
	if code, out, _ := runCmd("-h"); code != exitOK || !strings.Contains(out, "qcheck pairs") {
		t.Errorf("-h: exit %d, %q", code, out)
	}
}

// Every JSON field that equiv and measures write is described in their -h (equiv lists one field
// a line), and so are their costs (the widths at which each engine takes over, from
// denseAuto in qcheck/dense.go and matrixFreeAuto in qcheck/matrixfree.go).
func TestHelpDescribesJSONAndCost(t *testing.T) {
	jsonKeys := func(t *testing.T, v any, linePattern string) []string {
		t.Helper()
		data, err := json.Marshal(v)
		if err != nil {
			t.Fatal(err)
		}
		var out []string
		var walk func(any)
		walk = func(x any) {
			if m, ok := x.(map[string]any); ok {
				for k, y := range m {
					out = append(out, fmt.Sprintf(linePattern, regexp.QuoteMeta(k)))
					walk(y)
				}
			}
		}
		var top any
		if err := json.Unmarshal(data, &top); err != nil {
			t.Fatal(err)
		}
		walk(top)
		if len(out) < 20 {
			t.Fatalf("only %d keys in %s", len(out), data)
		}
		return out
	}
	fieldsOf := func(v any, linePattern string) []string {
		var out []string
		ty := reflect.TypeOf(v)
		for i := range ty.NumField() {
			name, _, _ := strings.Cut(ty.Field(i).Tag.Get("json"), ",")
			out = append(out, fmt.Sprintf(linePattern, regexp.QuoteMeta(name)))
		}
		return out
	}
	const listed, inline = `(?m)^ +%s[ ,]`, `[\s(]%s[\s,.)]`
	// A result with every optional part present, so that its encoding has every key.
	full := qcheck.Result{
		Undecided: "bounds straddle the tolerance", Measured: []int{0}, Bits: []int{0},
		Measurement: qcheck.Measurement{Input: []complex128{1, 0}, InputBasis: 0, Basis: true},
		Pauli:       &qcheck.PauliEvidence{Generator: "+X0", Want: "+X0", Got: "+Z0"},
		Blame:       qcheck.Blame{Found: true},
	}
	for _, c := range []struct {
		cmd  string
		want []string
	}{
		{"equiv", append(jsonKeys(t, full, listed),
			"else null", "up to 12 qubits", "tableau engine when both circuits are Clifford",
			"matrix-free estimate up to 22 qubits", "-engine dense")},
		{"measures", append(fieldsOf(allMeasures{}, inline), "wider than 10 qubits")},
	} {
		_, out, _ := runCmd(c.cmd, "-h")
		about, _, _ := strings.Cut(out, "\nflags:")
		words := strings.Join(strings.Fields(about), " ")
		for _, w := range c.want {
			if re := regexp.MustCompile(w); !re.MatchString(about) && !strings.Contains(words, w) {
				t.Errorf("%s -h does not mention %q", c.cmd, w)
			}
		}
	}
}

func TestDemo(t *testing.T) {
	code, out, errOut := runCmd("demo", "-seed", "1")
	if code != exitOK || !strings.Contains(out, "Shrunk report") {
		t.Errorf("demo: exit %d\n%s%s", code, out, errOut)
	}
}

// The built command, run as another toolchain's CI would: the exit status carries the verdict.
func TestBuiltBinary(t *testing.T) {
	if testing.Short() {
		t.Skip("builds the command")
	}
	bin := filepath.Join(t.TempDir(), "qcheck")
	if out, err := exec.Command("go", "build", "-o", bin, ".").CombinedOutput(); err != nil {
		t.Fatalf("go build: %v\n%s", err, out)
	}
	out, err := exec.Command(bin, "pairs", "-expect", filepath.Join(corpus, "manifest.txt"), corpus).Output()
	if err != nil || !strings.Contains(string(out), "41 pairs: 41 passed") {
		t.Errorf("pairs: %v\n%s", err, out)
	}
	a, b := pairFiles("toffoli_one_t_daggered")
	out, err = exec.Command(bin, "equiv", "-json", a, b).Output()
	var exit *exec.ExitError
	if !errors.As(err, &exit) || exit.ExitCode() != exitDiffer || !strings.Contains(string(out), `"equivalent": false`) {
		t.Errorf("equiv near miss: %v\n%s", err, out)
	}
	a, b = pairFiles("toffoli")
	if err := exec.Command(bin, "equiv", a, b).Run(); err != nil {
		t.Errorf("equiv toffoli: %v", err)
	}
}

// Issue 17, reproducer 9: the command bounds a comparison's cost before starting (-work) and its
// wall-clock time (-timeout); both give exit 2 with the reason.
func TestEquivWorkAndTimeout(t *testing.T) {
	var b strings.Builder
	b.WriteString("qreg q[10];\n")
	for i := 0; i < 200; i++ {
		fmt.Fprintf(&b, "t q[%d];\ncx q[%d],q[%d];\n", i%10, i%10, (i+1)%10)
	}
	dir := writeFiles(t, map[string]string{"a.qasm": b.String(), "b.qasm": b.String() + "h q[0];\n"})
	a, c := filepath.Join(dir, "a.qasm"), filepath.Join(dir, "b.qasm")
	// 401 + 400 ops on 10 qubits, dense: 801·4^10 + 6·8^10 ≈ 7.3e9 amplitude updates.
	if code, _, stderr := runCmd("equiv", "-engine", "dense", "-work", "1e9", a, c); code != exitBadUsed || !strings.Contains(stderr, "about 7.3e+09 amplitude updates") {
		t.Errorf("-engine dense -work 1e9: exit %d, stderr %q", code, stderr)
	}
	// Left to choose, the command passes over the dense engine to one whose work fits: the
	// matrix-free engine, 60·801·2^10 ≈ 4.9e7 updates, finds the added h.
	if code, stdout, _ := runCmd("equiv", "-work", "1e9", a, c); code != exitDiffer || !strings.Contains(stdout, "matrix-free") {
		t.Errorf("-work 1e9: exit %d, stdout %q", code, stdout)
	}
	// With no engine within the limit, the refusal lists each engine's reason.
	if code, _, stderr := runCmd("equiv", "-work", "1e3", a, c); code != exitBadUsed || !strings.Contains(stderr, "over the work limit") {
		t.Errorf("-work 1e3: exit %d, stderr %q", code, stderr)
	}
	if code, _, stderr := runCmd("equiv", "-engine", "dense", "-timeout", "1ms", a, c); code != exitBadUsed || !strings.Contains(stderr, "gave up after -timeout 1ms") {
		t.Errorf("-timeout 1ms: exit %d, stderr %q", code, stderr)
	}
	if code, _, stderr := runCmd("equiv", "-timeout", "-1s", a, c); code != exitBadUsed || !strings.Contains(stderr, "must not be negative") {
		t.Errorf("-timeout -1s: exit %d, stderr %q", code, stderr)
	}
}

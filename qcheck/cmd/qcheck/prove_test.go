package main

import (
	"encoding/json"
	"math"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
)

const head3 = "OPENQASM 3.0;\ninclude \"stdgates.inc\";\n"

// writeFiles3 writes each named OpenQASM 3 source (after the header head3) into a temporary
// directory and returns the paths.
func writeFiles3(t *testing.T, srcs map[string]string) map[string]string {
	t.Helper()
	files, paths := map[string]string{}, map[string]string{}
	for name, src := range srcs {
		files[name+".qasm"] = src
	}
	dir := writeFilesWith(t, head3, files)
	for name := range srcs {
		paths[name] = filepath.Join(dir, name+".qasm")
	}
	return paths
}

// Rules with input float parameters are proved for every value through the command.
func TestEquivProvesForEveryValue(t *testing.T) {
	f := writeFiles3(t, map[string]string{
		// rzz, read from its canonical definition as the gate exp(−iθ Z⊗Z/2), against the
		// circuit of Nielsen & Chuang §4.7.3 (Figure 4.19, with one Z): cx · rz(a) · cx.
		"rzz":    "input float a;\nqubit[2] q;\ngate rzz(theta) a, b { cx a, b; rz(theta) b; cx a, b; }\nrzz(a) q[0], q[1];\n",
		"rzz_cx": "input float a;\nqubit[2] q;\ncx q[0], q[1];\nrz(a) q[1];\ncx q[0], q[1];\n",
		// The Z-Y decomposition, Nielsen & Chuang Theorem 4.1 (§4.2), for U(θ, φ, λ) as the
		// OpenQASM 3 specification defines it: U(θ,φ,λ) = e^{i(φ+λ)/2}·Rz(φ)Ry(θ)Rz(λ).
		"euler":   "input float a;\ninput float b;\ninput float c;\nqubit q;\nU(a, b, c) q;\n",
		"euler_z": "input float a;\ninput float b;\ninput float c;\nqubit q;\nrz(c) q;\nry(a) q;\nrz(b) q;\n",
		// Nielsen & Chuang §4.3 (Figure 4.6): controlled-(e^{iα}W) is controlled-W followed by
		// diag(1, e^{iα}) on the control; p(a) = e^{ia/2}·rz(a), so cp(a) = crz(a) then p(a/2)
		// on the control.
		"cp":     "input float a;\nqubit[2] q;\ncp(a) q[0], q[1];\n",
		"crz_p":  "input float a;\nqubit[2] q;\ncrz(a) q[0], q[1];\np(a/2) q[0];\n",
		"crz":    "input float a;\nqubit[2] q;\ncrz(a) q[0], q[1];\n",
		"rz_sum": "input float a;\ninput float b;\nqubit q;\nrz(a) q;\nrz(b) q;\n",
		"rz_one": "input float a;\ninput float b;\nqubit q;\nrz(b + a) q;\n",
	})
	for _, c := range []struct {
		a, b  string
		flags []string
	}{
		{"rzz", "rzz_cx", []string{"-exact-phase"}},
		{"euler", "euler_z", nil},
		{"cp", "crz_p", []string{"-exact-phase"}},
		{"rz_sum", "rz_one", []string{"-exact-phase"}},
	} {
		args := append(append([]string{"equiv"}, c.flags...), f[c.a], f[c.b])
		code, out, errOut := runCmd(args...)
		if code != exitOK || !strings.Contains(out, "proved for every value of") {
			t.Errorf("%s vs %s %v: exit %d\n%s%s", c.a, c.b, c.flags, code, out, errOut)
		}
	}
	// The global phase e^{i(φ+λ)/2} of the Z-Y decomposition counts with -exact-phase.
	if code, out, _ := runCmd("equiv", "-exact-phase", f["euler"], f["euler_z"]); code != exitDiffer || !strings.Contains(out, "refuted") {
		t.Errorf("euler -exact-phase: exit %d\n%s", code, out)
	}
}

// A wrong rule (crz taken for cp, which differ by the phase gate of Nielsen & Chuang §4.3 on the
// control) is refuted with values; binding those values with -input, the numeric comparison
// (the dense engine) finds the same distance.
func TestEquivRefutesWithValues(t *testing.T) {
	f := writeFiles3(t, map[string]string{
		"cp":  "input float a;\nqubit[2] q;\ncp(a) q[0], q[1];\n",
		"crz": "input float a;\nqubit[2] q;\ncrz(a) q[0], q[1];\n",
	})
	code, out, errOut := runCmd("equiv", "-json", f["cp"], f["crz"])
	if code != exitDiffer {
		t.Fatalf("exit %d\n%s%s", code, out, errOut)
	}
	var res struct {
		Verdict        string
		Counterexample *struct {
			Values   map[string]float64
			Distance float64
		}
	}
	if err := json.Unmarshal([]byte(out), &res); err != nil || res.Verdict != "refuted" || res.Counterexample == nil {
		t.Fatalf("%v: %s", err, out)
	}
	x := res.Counterexample.Values["a"]
	code, out, errOut = runCmd("equiv", "-json", "-input", "a="+strconv.FormatFloat(x, 'g', -1, 64), f["cp"], f["crz"])
	var num struct{ Distance float64 }
	if code != exitDiffer || json.Unmarshal([]byte(out), &num) != nil {
		t.Fatalf("-input a=%v: exit %d\n%s%s", x, code, out, errOut)
	}
	if math.Abs(num.Distance-res.Counterexample.Distance) > 1e-9 {
		t.Errorf("a = %v: counterexample distance %v, numeric distance %v", x, res.Counterexample.Distance, num.Distance)
	}
	// Human output names the values.
	if _, out, _ := runCmd("equiv", f["cp"], f["crz"]); !strings.Contains(out, "refuted") || !strings.Contains(out, "a = ") {
		t.Errorf("human output:\n%s", out)
	}
}

// Inputs are matched by name; flags without meaning for every value, and non-affine uses, are
// refused with the file, line and column.
func TestEquivFreeInputsRefused(t *testing.T) {
	f := writeFiles3(t, map[string]string{
		"a":      "input float a;\nqubit q;\nrz(a) q;\n",
		"b":      "input float b;\nqubit q;\nrz(b) q;\n",
		"square": "input float a;\nqubit q;\nrz(a*a) q;\n",
		"meas":   "input float a;\nqubit q;\nbit c;\nrz(a) q;\nc = measure q;\n",
	})
	for _, c := range []struct {
		args []string
		want string
	}{
		{[]string{f["a"], f["b"]}, "a.qasm: input a is a free parameter of this file but not of " + f["b"]},
		{[]string{f["a"], f["square"]}, "square.qasm:5:5: multiplication of a free parameter"},
		{[]string{f["meas"], f["a"]}, "meas.qasm:7: measure: a file with free input parameters (a) must be a circuit of gates only"},
		{[]string{"-perm", "0", f["a"], f["a"]}, "-perm is not supported with free input parameters"},
		{[]string{"-measure", "diamond", f["a"], f["a"]}, "-measure diamond is not supported"},
	} {
		code, _, errOut := runCmd(append([]string{"equiv"}, c.args...)...)
		if code != exitBadUsed || !strings.Contains(errOut, c.want) {
			t.Errorf("%v: exit %d, %s", c.args, code, errOut)
		}
	}
}

// A pair whose grid is above param.DefaultMaxPoints gets the randomized test: it passes, is
// labelled "not a proof", and exits exitOpen, never 0. Seven rotations about Z compose to one
// whose angle is the sum (common practice: rotations about one axis add angles); each parameter
// has degree 2, so the grid would have 5^7 = 78125 points.
func TestEquivProbableIsNotProved(t *testing.T) {
	names := []string{"a", "b", "c", "d", "e", "f", "g"}
	var decl, seq strings.Builder
	for _, n := range names {
		decl.WriteString("input float " + n + ";\n")
		seq.WriteString("rz(" + n + ") q;\n")
	}
	f := writeFiles3(t, map[string]string{
		"seq": decl.String() + "qubit q;\n" + seq.String(),
		"sum": decl.String() + "qubit q;\nrz(" + strings.Join(names, " + ") + ") q;\n",
	})
	code, out, errOut := runCmd("equiv", "-exact-phase", f["seq"], f["sum"])
	if code != exitOpen || !strings.Contains(out, "not a proof") {
		t.Errorf("exit %d\n%s%s", code, out, errOut)
	}
}

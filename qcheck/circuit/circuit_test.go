package circuit

import (
	"errors"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
	"unicode/utf8"
)

// Validate names the op index and what is wrong for each kind of bad input, and engines rely on
// it (package circuit's documentation, Errors).
func TestValidateNamesTheOp(t *testing.T) {
	rz, _ := NewGate("rz", 0.5)
	cases := []struct {
		name  string
		c     *Circuit
		index int
		want  string
	}{
		{"qubit out of range", New(2).H(0).CX(0, 2), 1, "qubit 2 out of range [0, 2)"},
		{"negative qubit", New(2).H(0).X(1).Z(-1), 2, "qubit -1 out of range"},
		{"repeated operand", New(3).H(0).CX(1, 1), 1, "qubit 1 repeated"},
		{"too few operands", New(3).Append(Gate{Name: "cx"}, 0), 0, "acts on 2 qubit(s), got 1"},
		{"too many operands", New(3).H(0).Append(rz, 0, 1), 1, "acts on 1 qubit(s), got 2"},
		{"missing angle", New(1).H(0).Append(Gate{Name: "rz"}, 0), 1, "takes 1 angle(s), got 0"},
		{"NaN angle", New(1).RZ(0.1, 0).RZ(math.NaN(), 0), 1, "angle 1 (θ) is NaN"},
		{"+Inf angle", New(2).U(0, 0, math.Inf(1), 1), 0, "angle 3 (λ) is +Inf"},
		{"-Inf angle", New(2).H(0).H(1).CP(math.Inf(-1), 0, 1), 2, "angle 1 (λ) is -Inf"},
		{"unknown gate", New(1).H(0).H(0).Append(Gate{Name: "frobnicate"}, 0), 2, "unknown gate"},
		{"nameless gate", New(1).Append(Gate{}, 0), 0, "no name"},
		{"measure without bit", New(1).Append(Gate{Name: "measure"}, 0), 0, "one classical bit"},
		{"barrier on nothing", New(1).Barrier(), 0, "no qubits"},
	}
	for _, tc := range cases {
		err := tc.c.Validate()
		var oe *OpError
		if !errors.As(err, &oe) {
			t.Errorf("%s: Validate returned %v, want an *OpError", tc.name, err)
			continue
		}
		if oe.Index != tc.index || !strings.Contains(err.Error(), tc.want) {
			t.Errorf("%s: got %q (index %d), want op %d and %q", tc.name, err, oe.Index, tc.index, tc.want)
		}
		if !strings.Contains(err.Error(), "op "+strconv.Itoa(tc.index)) {
			t.Errorf("%s: message %q does not say which op", tc.name, err)
		}
	}
	if err := New(-1).Validate(); err == nil || !strings.Contains(err.Error(), "negative width") {
		t.Errorf("negative width: got %v", err)
	}
	var nilCircuit *Circuit
	if err := nilCircuit.Validate(); err == nil {
		t.Error("nil circuit validated")
	}
	good := New(3).H(0).CX(0, 1).CCX(0, 1, 2).RZ(0.25, 2).Barrier(0, 1, 2).Measure(2, 0)
	if err := good.Validate(); err != nil {
		t.Errorf("well-formed circuit refused: %v", err)
	}
}

// Clone is deep: changing the clone's ops, operands or angles leaves the original alone.
func TestCloneIsDeep(t *testing.T) {
	c := New(2).RZ(0.5, 0).CX(0, 1).Measure(1, 0)
	d := c.Clone()
	if !d.Equal(c) || d.Qubits() != 2 || d.Bits() != 1 {
		t.Fatalf("clone differs from the original:\n%v\n%v", c, d)
	}
	d.Ops[0].Gate.Params[0] = 9
	d.Ops[1].Qubits[0] = 1
	d.Ops[1].Qubits[1] = 0
	d.Ops[2].Bits[0] = 5
	d.Ops = append(d.Ops[:1], d.Ops[2:]...)
	if c.Ops[0].Gate.Params[0] != 0.5 || c.Ops[1].Qubits[0] != 0 || c.Ops[1].Qubits[1] != 1 || c.Ops[2].Bits[0] != 0 || len(c.Ops) != 3 {
		t.Errorf("changing the clone changed the original: %v", c.Ops)
	}
	// Append copies its operands and the gate's angles too.
	qs := []int{0, 1}
	g, _ := NewGate("crz", 0.3)
	e := New(2).Append(g, qs...)
	qs[0] = 1
	g.Params[0] = 7
	if e.Ops[0].Qubits[0] != 0 || e.Ops[0].Gate.Params[0] != 0.3 {
		t.Errorf("Append kept references to its arguments: %v", e.Ops[0])
	}
}

// Inverse reverses the ops and inverts each one: pairs swap (s ↔ sdg, t ↔ tdg), rotation angles
// are negated, u(θ, φ, λ) becomes u(−θ, −λ, −φ) (the conjugate transpose of the OpenQASM 2.0
// matrix), self-inverse gates stay, and barriers stay in place.
func TestCircuitInverse(t *testing.T) {
	c := New(3).H(0).S(1).T(2).CX(0, 1).RZ(0.3, 1).U(0.1, 0.2, 0.3, 2).Barrier(0, 1).CRY(-0.4, 2, 0).ISWAP(0, 2)
	want := New(3).Append(gate(t, "iswapdg"), 0, 2).CRY(0.4, 2, 0).Barrier(0, 1).U(-0.1, -0.3, -0.2, 2).
		RZ(-0.3, 1).CX(0, 1).Tdg(2).Sdg(1).H(0)
	got := c.Inverse()
	if !got.Equal(want) {
		t.Errorf("Inverse:\n%v\nwant:\n%v", got, want)
	}
	if !got.Inverse().Equal(c) {
		t.Errorf("Inverse of the inverse is not the circuit:\n%v", got.Inverse())
	}
	if c.Ops[0].Gate.Name != "h" || c.Ops[4].Gate.Params[0] != 0.3 {
		t.Error("Inverse changed its receiver")
	}
}

func gate(t *testing.T, name string, params ...float64) Gate {
	t.Helper()
	g, err := NewGate(name, params...)
	if err != nil {
		t.Fatal(err)
	}
	return g
}

// String draws one row per qubit with controls, swap ends and joined operands; the golden file
// testdata/circuit/draw.golden was checked by eye against the circuit below (common practice for
// text output, no outside source). Run with -update to rewrite it after a deliberate change.
func TestDrawGolden(t *testing.T) {
	c := New(4).H(0).CX(0, 1).RZ(math.Pi/4, 2).CCX(0, 1, 3).SWAP(2, 3).CP(0.125, 3, 0).
		Barrier(0, 1, 2, 3).CSWAP(1, 0, 2).Measure(3, 0)
	got := c.String()
	path := filepath.Join("..", "..", "testdata", "circuit", "draw.golden")
	if *update {
		if err := os.WriteFile(path, []byte(got), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	if got != string(want) {
		t.Errorf("drawing changed:\n%s\nwant:\n%s", got, want)
	}
	// An ill-formed circuit is listed op by op with the validation error.
	bad := New(2).H(0).CX(0, 5).String()
	if !strings.Contains(bad, "op 1 (cx)") || !strings.Contains(bad, "1: cx q0,q5") {
		t.Errorf("ill-formed circuit drawn as:\n%s", bad)
	}
}

// A classically controlled op is drawn with its condition, and ops are ordered through the
// classical bits as the program runs them (Cross, Bishop, Smolin & Gambetta 2017, §3: statements
// execute in order, so if(c==1) reads what an earlier measure wrote): a condition after the
// measurement that writes its bit, a measurement after an earlier condition reading its bit, and
// two measurements of the same bit in their order — even on qubits the other op does not touch.
func TestDrawConditions(t *testing.T) {
	// column returns where label starts on qubit q's row of the drawing, in runes.
	column := func(t *testing.T, drawing string, q int, label string) int {
		t.Helper()
		for _, row := range strings.Split(drawing, "\n") {
			if strings.HasPrefix(row, fmt.Sprintf("q%d:", q)) {
				if i := strings.Index(row, label); i >= 0 {
					return utf8.RuneCountInString(row[:i])
				}
			}
		}
		t.Fatalf("no %q on qubit %d's row of\n%s", label, q, drawing)
		return 0
	}
	conditioned := func(c *Circuit, cond *Condition) *Circuit {
		c.Ops[len(c.Ops)-1].If = cond
		return c
	}

	// Read after write: X on q1 if c5 is 1, after q0 is measured into c5.
	c := conditioned(New(2).H(0).Measure(0, 5).X(1), &Condition{Bits: []int{5}, Value: 1})
	d := c.String()
	if m, x := column(t, d, 0, "M→c5"), column(t, d, 1, "X if c5==1"); x <= m {
		t.Errorf("the conditioned X (rune %d) is not drawn after the measurement it reads (rune %d):\n%s", x, m, d)
	}
	// An else branch and a condition on several bits read as Op.String writes them.
	c = conditioned(New(2).Measure(0, 0).Measure(1, 1).CX(0, 1), &Condition{Bits: []int{0, 1}, Value: 2, Not: true})
	d = c.String()
	if m, x := column(t, d, 1, "M→c1"), column(t, d, 1, "X if c0,c1!=2"); x <= m {
		t.Errorf("the conditioned CX is not drawn after the measurements:\n%s", d)
	}
	// Write after read: measuring q2 into c0 comes after the condition that reads the c0 that
	// measuring q0 wrote, though q2 is free from the start.
	c = conditioned(New(3).Measure(0, 0).X(1), &Condition{Bits: []int{0}, Value: 1}).Measure(2, 0)
	d = c.String()
	if x, m := column(t, d, 1, "X if c0==1"), column(t, d, 2, "M→c0"); m <= x {
		t.Errorf("measure q2 -> c0 (rune %d) is drawn before the condition reading c0 (rune %d):\n%s", m, x, d)
	}
	// Write after write: two measurements into c0 keep their order across qubits.
	d = New(2).H(0).Measure(0, 0).Measure(1, 0).String()
	if first, second := column(t, d, 0, "M→c0"), column(t, d, 1, "M→c0"); second <= first {
		t.Errorf("measure q1 -> c0 (rune %d) is drawn before measure q0 -> c0 (rune %d):\n%s", second, first, d)
	}
}

// A nil circuit draws as a short note instead of panicking, so that a failure report can always
// print what a pass returned (common practice for String methods; no outside source).
func TestDrawNil(t *testing.T) {
	var c *Circuit
	if got := c.String(); got != "(nil circuit)\n" {
		t.Errorf("nil circuit drawn as %q", got)
	}
}

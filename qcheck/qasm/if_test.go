package qasm

import (
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// cond is the condition if(creg==v) makes for a register whose bits are bits.
func cond(v uint64, bits ...int) *circuit.Condition {
	return &circuit.Condition{Bits: bits, Value: v}
}

// The teleportation program of the OpenQASM 2.0 paper (Cross, Bishop, Smolin, Gambetta,
// arXiv:1707.03429, §3, the example with if), written here from its description: the corrections
// are conditioned on whole one-bit registers. The expected ops are written by hand from the
// paper's rule that if(creg==n) applies the operation when the register, read as an integer with
// element 0 least significant, equals n.
func TestParseIfTeleport(t *testing.T) {
	src := head + `qreg q[3];
creg c0[1];
creg c1[1];
h q[1];
cx q[1],q[2];
cx q[0],q[1];
h q[0];
measure q[0] -> c0[0];
measure q[1] -> c1[0];
if(c0==1) z q[2];
if(c1==1) x q[2];
`
	p := mustParse(t, src)
	want := circuit.New(3).H(1).CX(1, 2).CX(0, 1).H(0).Measure(0, 0).Measure(1, 1).Z(2).X(2)
	want.Ops[6].If = cond(1, 0)
	want.Ops[7].If = cond(1, 1)
	if !p.Circuit.Equal(want) {
		t.Fatalf("got %v\nwant %v", p.Circuit.Ops, want.Ops)
	}
	if p.Lines[7] != 13 {
		t.Errorf("the last op is on line %d, want 13", p.Lines[7])
	}
}

// A condition covers every op its statement makes: broadcasts, gate expansions, measure and
// reset; the register's element 0 is Bits[0].
func TestParseIfEveryOp(t *testing.T) {
	src := head + `gate pair a,b { h a; cx a,b; }
qreg q[2];
creg m[2];
creg c[3];
if(c==5) pair q[0],q[1];
if(c==0) h q;
if (c == 7) measure q -> m;
if(c==1) reset q[1];
`
	p := mustParse(t, src)
	want := circuit.New(2).H(0).CX(0, 1).H(0).H(1).Measure(0, 0).Measure(1, 1).Reset(1)
	for i, v := range []uint64{5, 5, 0, 0, 7, 7, 1} {
		want.Ops[i].If = cond(v, 2, 3, 4)
	}
	if !p.Circuit.Equal(want) {
		t.Fatalf("got %v\nwant %v", p.Circuit.Ops, want.Ops)
	}
	// Each op has its own condition: changing one leaves the others alone.
	p.Circuit.Ops[0].If.Bits[0] = 9
	if p.Circuit.Ops[1].If.Bits[0] != 2 {
		t.Error("ops share a condition")
	}
}

// Conditions survive FormatProgram and Format; one that OpenQASM 2.0 cannot write (part of a
// register, or an else branch) is an error naming the op, and FormatProgram(nil) is an error,
// not a panic (issue 17, item 11).
func TestFormatConditions(t *testing.T) {
	src := head + `qreg q[2];
creg a[1];
creg b[2];
measure q[0] -> a[0];
if(a==1) x q[1];
if(b==3) cx q[0],q[1];
`
	p := mustParse(t, src)
	out, err := FormatProgram(p)
	if err != nil {
		t.Fatal(err)
	}
	back := mustParse(t, string(out))
	if !back.Circuit.Equal(p.Circuit) {
		t.Fatalf("round trip changed the program:\n%s", out)
	}
	if !strings.Contains(string(out), "if(b==3) cx q[0],q[1];") {
		t.Errorf("wrote\n%s", out)
	}
	// Format has one register c: a condition on all of it is written, part of it is not.
	c := circuit.New(1).X(0)
	c.SetBits(2)
	c.Ops[0].If = cond(2, 0, 1)
	roundTrip(t, c)
	c.Ops[0].If = cond(1, 1)
	if _, err := Format(c); err == nil || !strings.Contains(err.Error(), "op 0 (x): its condition c[1]==1") {
		t.Errorf("part of a register: got %v", err)
	}
	c.Ops[0].If = &circuit.Condition{Bits: []int{0, 1}, Value: 2, Not: true}
	if _, err := Format(c); err == nil || !strings.Contains(err.Error(), "c[0],c[1]!=2") {
		t.Errorf("else branch: got %v", err)
	}
	for _, p := range []*Program{nil, {}} {
		if _, err := FormatProgram(p); err == nil {
			t.Errorf("FormatProgram(%v): no error", p)
		}
	}
}

package circuit

import (
	"strings"
	"testing"
)

// OpenQASM 2.0's if(c==n) compares a whole register, read with its bit 0 least significant
// (Cross, Bishop, Smolin & Gambetta 2017, §3); Holds must read the bits the same way.
func TestConditionHolds(t *testing.T) {
	bits := map[int]bool{3: true, 5: false, 7: true} // bits 3,5,7 read 1,0,1 = 5
	read := func(b int) bool { return bits[b] }
	for _, tc := range []struct {
		c    Condition
		want bool
	}{
		{Condition{Bits: []int{3, 5, 7}, Value: 5}, true},
		{Condition{Bits: []int{3, 5, 7}, Value: 4}, false},
		{Condition{Bits: []int{3, 5, 7}, Value: 5, Not: true}, false},
		{Condition{Bits: []int{5}, Value: 0}, true},
		{Condition{Bits: []int{7, 3}, Value: 3}, true},
	} {
		if got := tc.c.Holds(read); got != tc.want {
			t.Errorf("%+v.Holds = %v, want %v", tc.c, got, tc.want)
		}
	}
}

func TestConditionValidateCloneEqual(t *testing.T) {
	c := New(2).H(0).Measure(0, 0)
	c.AppendOp(Op{Gate: Gate{Name: "x"}, Qubits: []int{1}, If: &Condition{Bits: []int{0, 2}, Value: 2}})
	if err := c.Validate(); err != nil {
		t.Fatal(err)
	}
	if c.Bits() != 3 {
		t.Errorf("Bits() = %d, want 3 (the condition reads bit 2)", c.Bits())
	}
	if c.Unitary() || c.Ops[2].Unitary() {
		t.Error("a classically controlled op has no unitary matrix")
	}
	if s := c.Ops[2].String(); s != "if c0,c2==2: x q1" {
		t.Errorf("String = %q", s)
	}
	d := c.Clone()
	if !d.Equal(c) {
		t.Fatal("clone differs")
	}
	d.Ops[2].If.Bits[0] = 1
	if c.Ops[2].If.Bits[0] != 0 || d.Equal(c) {
		t.Error("clone shares the condition's bits")
	}
	for _, tc := range []struct {
		cond Condition
		want string
	}{
		{Condition{}, "reads no classical bits"},
		{Condition{Bits: []int{0}, Value: 2}, "cannot hold"},
		{Condition{Bits: []int{-1}}, "out of range"},
		{Condition{Bits: []int{1, 1}}, "twice"},
	} {
		bad := New(1).AppendOp(Op{Gate: Gate{Name: "x"}, Qubits: []int{0}, If: &tc.cond})
		if err := bad.Validate(); err == nil || !strings.Contains(err.Error(), tc.want) {
			t.Errorf("Validate(%+v) = %v, want an error containing %q", tc.cond, err, tc.want)
		}
	}
}

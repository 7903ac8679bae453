package zx

import (
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"
	"qcheck.dev/qcheck/circuit"
)

// Bad input gets an error naming what is wrong, never a panic or a verdict.
func TestErrors(t *testing.T) {
	ok := circuit.New(2).H(0)
	custom, err := circuit.Custom("mine", mat.NewCDense(2, 2, []complex128{0, 1, 1, 0}))
	if err != nil {
		t.Fatal(err)
	}
	cond := circuit.New(2).H(0)
	cond.AppendOp(circuit.Op{Gate: gate("x"), Qubits: []int{1}, If: &circuit.Condition{Bits: []int{0}, Value: 1}})
	for _, tc := range []struct {
		name string
		u, v *circuit.Circuit
		want string
	}{
		{"nil", nil, ok, "nil circuit"},
		{"widths", ok, circuit.New(3), "2 and 3 qubits"},
		{"measure", ok, circuit.New(2).Append(gate("measure"), 0), ""},
		{"condition", cond, ok, "not unitary"},
		{"invalid", circuit.New(2).CX(0, 0), ok, "repeated"},
	} {
		for _, f := range []func(u, v *circuit.Circuit, o Options) (Result, error){Check, Compare} {
			_, err := f(tc.u, tc.v, Options{})
			if err == nil || !strings.Contains(err.Error(), tc.want) {
				t.Errorf("%s: error %v, want one containing %q", tc.name, err, tc.want)
			}
		}
	}
	// A custom gate has no diagram: Check refuses it, while Compare measures a small window
	// densely (X in place of H: XH is a rotation by π/4 with eigenphases ±π/4,
	// so the distance is 2·sin(π/8)).
	v := circuit.New(2).Append(custom, 0)
	if _, err := Check(ok, v, Options{}); err == nil || !strings.Contains(err.Error(), "custom gate") {
		t.Errorf("custom: Check error %v", err)
	}
	if r, err := Compare(ok, v, Options{}); err != nil || !r.Known || abs(r.Distance-2*math.Sin(math.Pi/8)) > 1e-12 {
		t.Errorf("custom: Compare %+v, %v; want 2·sin(π/8)", r, err)
	}
}

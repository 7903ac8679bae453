package qasm_test

import (
	"fmt"

	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/qasm"
)

func ExampleParseProgram() {
	src := []byte(`OPENQASM 2.0;
include "qelib1.inc";
qreg data[2];
qreg anc[1];
creg out[1];
gate majority a, b, c { cx c, b; cx c, a; ccx a, b, c; }
majority data[0], data[1], anc[0];
measure anc[0] -> out[0];
`)
	p, err := qasm.ParseProgram(src)
	if err != nil {
		fmt.Println(err)
		return
	}
	anc, _ := p.Qubit("anc", 0)
	fmt.Println("anc[0] is qubit", anc)
	for i, op := range p.Circuit.Ops {
		fmt.Printf("line %d: %v\n", p.Lines[i], op)
	}
	// Output:
	// anc[0] is qubit 2
	// line 7: cx q2,q1
	// line 7: cx q2,q0
	// line 7: ccx q0,q1,q2
	// line 8: measure q2 -> c0
}

func ExampleFormat() {
	c := circuit.New(2).H(0).CX(0, 1).RZ(0.25, 1).ISWAP(0, 1)
	src, err := qasm.Format(c)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Print(string(src))
	back, _ := qasm.Parse(src)
	fmt.Println("round trip equal:", back.Equal(c))
	// Output:
	// OPENQASM 2.0;
	// include "qelib1.inc";
	// gate iswap a,b { s a; s b; h a; cx a,b; cx b,a; h b; }
	// qreg q[2];
	// h q[0];
	// cx q[0],q[1];
	// rz(0.25) q[1];
	// iswap q[0],q[1];
	// round trip equal: true
}

func ExampleParse_error() {
	_, err := qasm.Parse([]byte("OPENQASM 2.0;\ninclude \"qelib1.inc\";\nqreg q[2];\ncreg c[2];\nif (c[0] == 1) x q[0];\n"))
	fmt.Println(err)
	// Output:
	// qasm: 5:6: OpenQASM 2.0 compares a whole register in if, not an element
}

// An OpenQASM 3 program: a loop, a modifier, and a correction conditioned on a measured bit.
func ExampleParseProgram_openQASM3() {
	src := []byte(`OPENQASM 3.0;
include "stdgates.inc";
qubit[3] q;
bit[2] c;
for int i in [0:1] { h q[i]; }
ctrl @ s q[0], q[2];
c[0] = measure q[0];
if (c[0]) x q[1]; else inv @ sx q[1];
`)
	p, err := qasm.ParseProgram(src)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println("version", p.Version)
	for i, op := range p.Circuit.Ops {
		fmt.Printf("line %d: %v\n", p.Lines[i], op)
	}
	// Output:
	// version 3
	// line 5: h q0
	// line 5: h q1
	// line 6: cp(π/2) q0,q2
	// line 7: measure q0 -> c0
	// line 8: if c0==1: x q1
	// line 8: if c0!=1: sxdg q1
}

func ExampleFormat3() {
	c := circuit.New(3).H(0).CCZ(0, 1, 2).U(1, 2, 3, 2)
	src, err := qasm.Format3(c)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Print(string(src))
	back, _ := qasm.Parse(src)
	fmt.Println("round trip equal:", back.Equal(c))
	// Output:
	// OPENQASM 3.0;
	// include "stdgates.inc";
	// qubit[3] q;
	// h q[0];
	// ctrl(2) @ z q[0], q[1], q[2];
	// U(1, 2, 3) q[2];
	// round trip equal: true
}

// cnot_reversed_by_hadamards (before side).
// Source: Nielsen & Chuang, Exercise 4.20: H⊗H conjugates a CNOT into the CNOT with control and target exchanged.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
h q[0];
h q[1];
cx q[0],q[1];
h q[0];
h q[1];

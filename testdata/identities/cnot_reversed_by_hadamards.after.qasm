// cnot_reversed_by_hadamards (after side).
// Source: Nielsen & Chuang, Exercise 4.20: H⊗H conjugates a CNOT into the CNOT with control and target exchanged.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
cx q[1],q[0];

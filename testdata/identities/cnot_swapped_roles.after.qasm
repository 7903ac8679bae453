// cnot_swapped_roles (after side).
// Source: NEAR MISS. Nielsen & Chuang, Exercise 4.20 without the Hadamards: a CNOT with control and target exchanged is a different gate.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
cx q[1],q[0];

// cz_missing_hadamard (after side).
// Source: NEAR MISS. Nielsen & Chuang, Exercise 4.17 with the second Hadamard left out (a deliberate error).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
h q[1];
cx q[0],q[1];

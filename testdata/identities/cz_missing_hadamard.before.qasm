// cz_missing_hadamard (before side).
// Source: NEAR MISS. Nielsen & Chuang, Exercise 4.17 with the second Hadamard left out (a deliberate error).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
cz q[0],q[1];

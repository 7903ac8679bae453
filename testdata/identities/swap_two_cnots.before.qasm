// swap_two_cnots (before side).
// Source: NEAR MISS. Nielsen & Chuang, Fig. 1.7 with the third CNOT left out (a deliberate error).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
swap q[0],q[1];

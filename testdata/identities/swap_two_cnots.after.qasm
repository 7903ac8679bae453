// swap_two_cnots (after side).
// Source: NEAR MISS. Nielsen & Chuang, Fig. 1.7 with the third CNOT left out (a deliberate error).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
cx q[0],q[1];
cx q[1],q[0];

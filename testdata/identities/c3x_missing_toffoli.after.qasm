// c3x_missing_toffoli (after side).
// Source: NEAR MISS. Barenco et al. Lemma 7.2 with the last Toffoli left out (a deliberate error).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[5];
ccx q[0],q[1],q[4];
ccx q[2],q[4],q[3];
ccx q[0],q[1],q[4];

// cry_sign_error (after side).
// Source: NEAR MISS. Barenco et al. Lemma 5.1 for R_y with the second half-angle's sign flipped (a deliberate error).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
ry(0.65) q[1];
cx q[0],q[1];
ry(0.65) q[1];
cx q[0],q[1];

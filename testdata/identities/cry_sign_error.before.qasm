// cry_sign_error (before side).
// Source: NEAR MISS. Barenco et al. Lemma 5.1 for R_y with the second half-angle's sign flipped (a deliberate error).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
cry(1.3) q[0],q[1];

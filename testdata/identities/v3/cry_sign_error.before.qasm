// cry_sign_error (before side, OpenQASM 3 form).
// Source: NEAR MISS. Barenco et al. Lemma 5.1 for R_y with the second half-angle's sign flipped (a deliberate error).
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
ctrl @ ry(1.3) q[0], q[1];

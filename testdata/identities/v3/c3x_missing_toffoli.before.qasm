// c3x_missing_toffoli (before side, OpenQASM 3 form).
// Source: NEAR MISS. Barenco et al. Lemma 7.2 with the last Toffoli left out (a deliberate error).
OPENQASM 3.0;
include "stdgates.inc";
qubit[5] q;
ctrl(3) @ x q[0], q[1], q[2], q[3];

// crx_abc (before side, OpenQASM 3 form).
// Source: Barenco et al., Phys. Rev. A 52 (1995), Lemma 5.1 with H R_z H = R_x (Nielsen & Chuang Fig. 4.6): controlled-R_x(θ).
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
ctrl @ rx(1.3) q[0], q[1];

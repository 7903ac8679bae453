// crx_abc (after side, OpenQASM 3 form).
// Source: Barenco et al., Phys. Rev. A 52 (1995), Lemma 5.1 with H R_z H = R_x (Nielsen & Chuang Fig. 4.6): controlled-R_x(θ).
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
h q[1];
rz(0.65) q[1];
ctrl @ x q[0], q[1];
rz(-0.65) q[1];
ctrl @ x q[0], q[1];
h q[1];

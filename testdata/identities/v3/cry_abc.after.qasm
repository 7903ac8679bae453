// cry_abc (after side, OpenQASM 3 form).
// Source: Barenco et al., Phys. Rev. A 52 (1995), Lemma 5.1, Nielsen & Chuang Fig. 4.6: controlled-R_y(θ) from two CNOTs.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
ry(0.65) q[1];
ctrl @ x q[0], q[1];
ry(-0.65) q[1];
ctrl @ x q[0], q[1];

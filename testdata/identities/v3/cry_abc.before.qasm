// cry_abc (before side, OpenQASM 3 form).
// Source: Barenco et al., Phys. Rev. A 52 (1995), Lemma 5.1, Nielsen & Chuang Fig. 4.6: controlled-R_y(θ) from two CNOTs.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
ctrl @ ry(1.3) q[0], q[1];

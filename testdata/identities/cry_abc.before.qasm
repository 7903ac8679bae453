// cry_abc (before side).
// Source: Barenco et al., Phys. Rev. A 52 (1995), Lemma 5.1, Nielsen & Chuang Fig. 4.6: controlled-R_y(θ) from two CNOTs.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
cry(1.3) q[0],q[1];

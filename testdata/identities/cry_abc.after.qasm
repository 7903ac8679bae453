// cry_abc (after side).
// Source: Barenco et al., Phys. Rev. A 52 (1995), Lemma 5.1, Nielsen & Chuang Fig. 4.6: controlled-R_y(θ) from two CNOTs.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
ry(0.65) q[1];
cx q[0],q[1];
ry(-0.65) q[1];
cx q[0],q[1];

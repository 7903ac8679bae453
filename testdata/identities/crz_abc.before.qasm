// crz_abc (before side).
// Source: Barenco et al., Phys. Rev. A 52 (1995), Lemma 5.1 (A X B X C with ABC = I), Nielsen & Chuang Corollary 4.2 and Fig. 4.6: controlled-R_z(θ) from two CNOTs.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
crz(0.7) q[0],q[1];

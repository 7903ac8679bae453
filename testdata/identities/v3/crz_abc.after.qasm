// crz_abc (after side, OpenQASM 3 form).
// Source: Barenco et al., Phys. Rev. A 52 (1995), Lemma 5.1 (A X B X C with ABC = I), Nielsen & Chuang Corollary 4.2 and Fig. 4.6: controlled-R_z(θ) from two CNOTs.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
rz(0.35) q[1];
ctrl @ x q[0], q[1];
rz(-0.35) q[1];
ctrl @ x q[0], q[1];

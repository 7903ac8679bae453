// cp_from_cnots (after side).
// Source: Barenco et al., Phys. Rev. A 52 (1995), Lemma 5.1 with the phase on the control (Nielsen & Chuang, Fig. 4.6 and Exercise 4.18 style): controlled-P(λ) from P gates and two CNOTs.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
p(0.35) q[0];
cx q[0],q[1];
p(-0.35) q[1];
cx q[0],q[1];
p(0.35) q[1];

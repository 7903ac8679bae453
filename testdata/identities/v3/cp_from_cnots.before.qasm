// cp_from_cnots (before side, OpenQASM 3 form).
// Source: Barenco et al., Phys. Rev. A 52 (1995), Lemma 5.1 with the phase on the control (Nielsen & Chuang, Fig. 4.6 and Exercise 4.18 style): controlled-P(λ) from P gates and two CNOTs.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
ctrl @ p(0.7) q[0], q[1];

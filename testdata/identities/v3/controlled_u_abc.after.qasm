// controlled_u_abc (after side, OpenQASM 3 form).
// Source: Nielsen & Chuang, Corollary 4.2 and Fig. 4.6 (Barenco et al. 1995, Lemma 5.1): for U = e^{iα} R_z(β) R_y(γ) R_z(δ), controlled-U = P(α) on the control and A X B X C on the target with A = R_z(β)R_y(γ/2), B = R_y(−γ/2)R_z(−(δ+β)/2), C = R_z((δ−β)/2). Here U = u(1.1, 0.3, −0.8): α = −0.25, β = 0.3, γ = 1.1, δ = −0.8.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
rz((-0.8-0.3)/2) q[1];
ctrl @ x q[0], q[1];
rz(-(-0.8+0.3)/2) q[1];
ry(-1.1/2) q[1];
ctrl @ x q[0], q[1];
ry(1.1/2) q[1];
rz(0.3) q[1];
p(-0.25) q[0];

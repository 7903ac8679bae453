// u_zyz (after side, OpenQASM 3 form).
// Source: Nielsen & Chuang, Theorem 4.1 (Z-Y decomposition): u(θ,φ,λ) = e^{i(φ+λ)/2} R_z(φ) R_y(θ) R_z(λ).
OPENQASM 3.0;
include "stdgates.inc";
qubit[1] q;
rz(-0.8) q[0];
ry(1.1) q[0];
rz(0.3) q[0];

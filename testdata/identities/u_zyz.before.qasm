// u_zyz (before side).
// Source: Nielsen & Chuang, Theorem 4.1 (Z-Y decomposition): u(θ,φ,λ) = e^{i(φ+λ)/2} R_z(φ) R_y(θ) R_z(λ).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
u(1.1,0.3,-0.8) q[0];

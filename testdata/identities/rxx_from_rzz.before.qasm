// rxx_from_rzz (before side).
// Source: Clifford conjugation H Z H = X (Nielsen & Chuang, Exercise 4.14) applied to exp(−iθ Z⊗Z/2).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
rxx(0.6) q[0],q[1];

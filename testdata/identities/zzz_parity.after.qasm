// zzz_parity (after side).
// Source: Nielsen & Chuang, Fig. 4.19: exp(−iθ Z⊗Z⊗Z/2) by computing the parity onto the last qubit with CNOTs, either with a chain or a fan-in.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[3];
cx q[0],q[2];
cx q[1],q[2];
rz(0.6) q[2];
cx q[1],q[2];
cx q[0],q[2];

// zzz_parity (before side, OpenQASM 3 form).
// Source: Nielsen & Chuang, Fig. 4.19: exp(−iθ Z⊗Z⊗Z/2) by computing the parity onto the last qubit with CNOTs, either with a chain or a fan-in.
OPENQASM 3.0;
include "stdgates.inc";
qubit[3] q;
ctrl @ x q[0], q[1];
ctrl @ x q[1], q[2];
rz(0.6) q[2];
ctrl @ x q[1], q[2];
ctrl @ x q[0], q[1];

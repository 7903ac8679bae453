// rzz_from_cnots (before side).
// Source: Nielsen & Chuang, Fig. 4.19 (two-qubit case): exp(−iθ Z⊗Z/2) as CNOT, R_z(θ) on the target, CNOT.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
rzz(0.6) q[0],q[1];

// rzz_from_cnots (after side, OpenQASM 3 form).
// Source: Nielsen & Chuang, Fig. 4.19 (two-qubit case): exp(−iθ Z⊗Z/2) as CNOT, R_z(θ) on the target, CNOT.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
ctrl @ x q[0], q[1];
rz(0.6) q[1];
ctrl @ x q[0], q[1];

// rzz_from_cnots (before side, OpenQASM 3 form).
// Source: Nielsen & Chuang, Fig. 4.19 (two-qubit case): exp(−iθ Z⊗Z/2) as CNOT, R_z(θ) on the target, CNOT.
OPENQASM 3.0;
include "stdgates.inc";
gate rzz(theta) a, b { cx a, b; rz(theta) b; cx a, b; }
qubit[2] q;
rzz(0.6) q[0], q[1];

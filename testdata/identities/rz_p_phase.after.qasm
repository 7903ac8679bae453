// rz_p_phase (after side).
// Source: Nielsen & Chuang, eq. (4.6) and the phase gate: R_z(θ) = e^{−iθ/2} diag(1, e^{iθ}), equal up to a global phase.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
p(0.9) q[0];

// rz_p_phase (before side, OpenQASM 3 form).
// Source: Nielsen & Chuang, eq. (4.6) and the phase gate: R_z(θ) = e^{−iθ/2} diag(1, e^{iθ}), equal up to a global phase.
OPENQASM 3.0;
include "stdgates.inc";
qubit[1] q;
rz(0.9) q[0];

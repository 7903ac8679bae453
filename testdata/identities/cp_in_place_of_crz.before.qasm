// cp_in_place_of_crz (before side).
// Source: NEAR MISS. DESIGN.md: cp(λ) and crz(λ) differ by the relative phase diag(1, e^{iλ/2}) on the control, a classic bug.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
crz(0.7) q[0],q[1];

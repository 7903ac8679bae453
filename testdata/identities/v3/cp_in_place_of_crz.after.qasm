// cp_in_place_of_crz (after side, OpenQASM 3 form).
// Source: NEAR MISS. DESIGN.md: cp(λ) and crz(λ) differ by the relative phase diag(1, e^{iλ/2}) on the control, a classic bug.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
ctrl @ p(0.7) q[0], q[1];

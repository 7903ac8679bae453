// cnot_swapped_roles (before side, OpenQASM 3 form).
// Source: NEAR MISS. Nielsen & Chuang, Exercise 4.20 without the Hadamards: a CNOT with control and target exchanged is a different gate.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
ctrl @ x q[0], q[1];

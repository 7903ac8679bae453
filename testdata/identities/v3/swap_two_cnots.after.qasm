// swap_two_cnots (after side, OpenQASM 3 form).
// Source: NEAR MISS. Nielsen & Chuang, Fig. 1.7 with the third CNOT left out (a deliberate error).
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
ctrl @ x q[0], q[1];
ctrl @ x q[1], q[0];

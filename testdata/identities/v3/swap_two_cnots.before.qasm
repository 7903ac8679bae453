// swap_two_cnots (before side, OpenQASM 3 form).
// Source: NEAR MISS. Nielsen & Chuang, Fig. 1.7 with the third CNOT left out (a deliberate error).
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
swap q[0], q[1];

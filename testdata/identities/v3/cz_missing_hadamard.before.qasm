// cz_missing_hadamard (before side, OpenQASM 3 form).
// Source: NEAR MISS. Nielsen & Chuang, Exercise 4.17 with the second Hadamard left out (a deliberate error).
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
ctrl @ z q[0], q[1];

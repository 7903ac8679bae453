// toffoli_one_t_daggered (after side, OpenQASM 3 form).
// Source: NEAR MISS. Nielsen & Chuang, Fig. 4.9 with the T on the target after the second CNOT replaced by T† (a deliberate error).
OPENQASM 3.0;
include "stdgates.inc";
qubit[3] q;
h q[2];
ctrl @ x q[1], q[2];
inv @ t q[2];
ctrl @ x q[0], q[2];
inv @ t q[2];
ctrl @ x q[1], q[2];
inv @ t q[2];
ctrl @ x q[0], q[2];
t q[1];
t q[2];
h q[2];
ctrl @ x q[0], q[1];
t q[0];
inv @ t q[1];
ctrl @ x q[0], q[1];

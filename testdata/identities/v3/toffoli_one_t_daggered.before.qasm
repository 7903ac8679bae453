// toffoli_one_t_daggered (before side, OpenQASM 3 form).
// Source: NEAR MISS. Nielsen & Chuang, Fig. 4.9 with the T on the target after the second CNOT replaced by T† (a deliberate error).
OPENQASM 3.0;
include "stdgates.inc";
qubit[3] q;
ctrl(2) @ x q[0], q[1], q[2];

// toffoli_one_t_daggered (before side).
// Source: NEAR MISS. Nielsen & Chuang, Fig. 4.9 with the T on the target after the second CNOT replaced by T† (a deliberate error).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[3];
ccx q[0],q[1],q[2];

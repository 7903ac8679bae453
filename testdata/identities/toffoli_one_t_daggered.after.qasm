// toffoli_one_t_daggered (after side).
// Source: NEAR MISS. Nielsen & Chuang, Fig. 4.9 with the T on the target after the second CNOT replaced by T† (a deliberate error).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[3];
h q[2];
cx q[1],q[2];
tdg q[2];
cx q[0],q[2];
tdg q[2];
cx q[1],q[2];
tdg q[2];
cx q[0],q[2];
t q[1];
t q[2];
h q[2];
cx q[0],q[1];
t q[0];
tdg q[1];
cx q[0],q[1];

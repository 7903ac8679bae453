// cy_from_cnot (after side).
// Source: Nielsen & Chuang, §4.3 with Y = S X S†: controlled-Y is a CNOT conjugated by S on the target.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
sdg q[1];
cx q[0],q[1];
s q[1];

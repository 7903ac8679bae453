// cz_from_cnot (after side).
// Source: Nielsen & Chuang, Exercise 4.17 and §4.3: controlled-Z is a CNOT conjugated by H on the target.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
h q[1];
cx q[0],q[1];
h q[1];

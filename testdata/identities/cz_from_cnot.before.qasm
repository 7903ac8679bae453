// cz_from_cnot (before side).
// Source: Nielsen & Chuang, Exercise 4.17 and §4.3: controlled-Z is a CNOT conjugated by H on the target.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
cz q[0],q[1];

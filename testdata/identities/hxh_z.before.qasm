// hxh_z (before side).
// Source: Nielsen & Chuang, Exercise 4.14: HXH = Z.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
h q[0];
x q[0];
h q[0];

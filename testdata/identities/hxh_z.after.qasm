// hxh_z (after side).
// Source: Nielsen & Chuang, Exercise 4.14: HXH = Z.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
z q[0];

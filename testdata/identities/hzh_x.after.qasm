// hzh_x (after side).
// Source: Nielsen & Chuang, Exercise 4.14: HZH = X.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
x q[0];

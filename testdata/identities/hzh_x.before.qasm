// hzh_x (before side).
// Source: Nielsen & Chuang, Exercise 4.14: HZH = X.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
h q[0];
z q[0];
h q[0];

// hyh_minus_y (before side).
// Source: Nielsen & Chuang, Exercise 4.14: HYH = −Y, equal to Y up to the global phase −1.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
h q[0];
y q[0];
h q[0];

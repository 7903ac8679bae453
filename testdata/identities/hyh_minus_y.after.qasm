// hyh_minus_y (after side).
// Source: Nielsen & Chuang, Exercise 4.14: HYH = −Y, equal to Y up to the global phase −1.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
y q[0];

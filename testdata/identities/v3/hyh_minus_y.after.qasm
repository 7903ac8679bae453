// hyh_minus_y (after side, OpenQASM 3 form).
// Source: Nielsen & Chuang, Exercise 4.14: HYH = −Y, equal to Y up to the global phase −1.
OPENQASM 3.0;
include "stdgates.inc";
qubit[1] q;
y q[0];

// hyh_minus_y (before side, OpenQASM 3 form).
// Source: Nielsen & Chuang, Exercise 4.14: HYH = −Y, equal to Y up to the global phase −1.
OPENQASM 3.0;
include "stdgates.inc";
qubit[1] q;
h q[0];
y q[0];
h q[0];

// hzh_x (after side, OpenQASM 3 form).
// Source: Nielsen & Chuang, Exercise 4.14: HZH = X.
OPENQASM 3.0;
include "stdgates.inc";
qubit[1] q;
x q[0];

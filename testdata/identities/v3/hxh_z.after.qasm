// hxh_z (after side, OpenQASM 3 form).
// Source: Nielsen & Chuang, Exercise 4.14: HXH = Z.
OPENQASM 3.0;
include "stdgates.inc";
qubit[1] q;
z q[0];

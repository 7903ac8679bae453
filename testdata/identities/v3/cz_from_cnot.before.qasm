// cz_from_cnot (before side, OpenQASM 3 form).
// Source: Nielsen & Chuang, Exercise 4.17 and §4.3: controlled-Z is a CNOT conjugated by H on the target.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
ctrl @ z q[0], q[1];

// cz_from_cnot (after side, OpenQASM 3 form).
// Source: Nielsen & Chuang, Exercise 4.17 and §4.3: controlled-Z is a CNOT conjugated by H on the target.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
h q[1];
ctrl @ x q[0], q[1];
h q[1];

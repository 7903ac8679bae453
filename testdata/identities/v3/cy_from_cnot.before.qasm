// cy_from_cnot (before side, OpenQASM 3 form).
// Source: Nielsen & Chuang, §4.3 with Y = S X S†: controlled-Y is a CNOT conjugated by S on the target.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
ctrl @ y q[0], q[1];

// ch_from_cz (after side, OpenQASM 3 form).
// Source: Nielsen & Chuang, §4.3: since H = R_y(π/4) Z R_y(−π/4), controlled-H is controlled-Z conjugated by R_y(π/4) on the target (controlled-Z written as H CNOT H, Exercise 4.17).
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
ry(-pi/4) q[1];
h q[1];
ctrl @ x q[0], q[1];
h q[1];
ry(pi/4) q[1];

// ch_from_cz (after side).
// Source: Nielsen & Chuang, §4.3: since H = R_y(π/4) Z R_y(−π/4), controlled-H is controlled-Z conjugated by R_y(π/4) on the target (controlled-Z written as H CNOT H, Exercise 4.17).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
ry(-pi/4) q[1];
h q[1];
cx q[0],q[1];
h q[1];
ry(pi/4) q[1];

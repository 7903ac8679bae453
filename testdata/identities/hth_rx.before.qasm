// hth_rx (before side).
// Source: Nielsen & Chuang, Exercise 4.14: HTH = R_x(π/4) up to a global phase.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
h q[0];
t q[0];
h q[0];

// hth_rx_wrong_angle (before side).
// Source: NEAR MISS. Nielsen & Chuang, Exercise 4.14 with R_x(π/8) in place of R_x(π/4) (a deliberate error).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
h q[0];
t q[0];
h q[0];

// hth_rx_wrong_angle (before side, OpenQASM 3 form).
// Source: NEAR MISS. Nielsen & Chuang, Exercise 4.14 with R_x(π/8) in place of R_x(π/4) (a deliberate error).
OPENQASM 3.0;
include "stdgates.inc";
qubit[1] q;
h q[0];
t q[0];
h q[0];

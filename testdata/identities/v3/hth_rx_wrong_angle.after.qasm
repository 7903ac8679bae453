// hth_rx_wrong_angle (after side, OpenQASM 3 form).
// Source: NEAR MISS. Nielsen & Chuang, Exercise 4.14 with R_x(π/8) in place of R_x(π/4) (a deliberate error).
OPENQASM 3.0;
include "stdgates.inc";
qubit[1] q;
rx(pi/8) q[0];

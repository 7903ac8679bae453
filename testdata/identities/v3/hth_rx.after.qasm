// hth_rx (after side, OpenQASM 3 form).
// Source: Nielsen & Chuang, Exercise 4.14: HTH = R_x(π/4) up to a global phase.
OPENQASM 3.0;
include "stdgates.inc";
qubit[1] q;
rx(pi/4) q[0];

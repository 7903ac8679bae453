// t_squared_s (before side, OpenQASM 3 form).
// Source: Nielsen & Chuang, §4.2: the π/8 gate squares to the phase gate, T² = S.
OPENQASM 3.0;
include "stdgates.inc";
qubit[1] q;
t q[0];
t q[0];

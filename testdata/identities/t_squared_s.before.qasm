// t_squared_s (before side).
// Source: Nielsen & Chuang, §4.2: the π/8 gate squares to the phase gate, T² = S.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
t q[0];
t q[0];

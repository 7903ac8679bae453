// Every operator and function of OpenQASM 2.0 angle expressions (arXiv:1707.03429 §3).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
rz(-2^2) q[0];
rz(2^-1) q[0];
rz(1 + 2 * 3 - 4 / 8) q[0];
rz(sin(pi/6) + cos(0) + tan(0) + exp(0) + ln(1) + sqrt(4)) q[0];
rz(1.5e-3) q[0];
rz(.5) q[0];
rz(-(1 - 3)) q[0];

// h_from_rz_sx (before side).
// Source: H = e^{iπ/4} R_z(π/2) √X R_z(π/2), the usual Euler form over rz and sx (common practice, no source).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
h q[0];

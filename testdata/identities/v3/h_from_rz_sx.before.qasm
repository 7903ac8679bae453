// h_from_rz_sx (before side, OpenQASM 3 form).
// Source: H = e^{iπ/4} R_z(π/2) √X R_z(π/2), the usual Euler form over rz and sx (common practice, no source).
OPENQASM 3.0;
include "stdgates.inc";
qubit[1] q;
h q[0];

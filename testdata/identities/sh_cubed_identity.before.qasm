// sh_cubed_identity (before side).
// Source: Clifford group relation (SH)³ = e^{iπ/4} I (from memory; checkable by hand, common practice).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
h q[0];
s q[0];
h q[0];
s q[0];
h q[0];
s q[0];

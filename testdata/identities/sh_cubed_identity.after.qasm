// sh_cubed_identity (after side).
// Source: Clifford group relation (SH)³ = e^{iπ/4} I (from memory; checkable by hand, common practice).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
id q[0];

// sh_cubed_identity (before side, OpenQASM 3 form).
// Source: Clifford group relation (SH)³ = e^{iπ/4} I (from memory; checkable by hand, common practice).
OPENQASM 3.0;
include "stdgates.inc";
qubit[1] q;
h q[0];
s q[0];
h q[0];
s q[0];
h q[0];
s q[0];

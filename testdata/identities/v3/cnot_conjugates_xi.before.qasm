// cnot_conjugates_xi (before side, OpenQASM 3 form).
// Source: Clifford conjugation rules, Nielsen & Chuang §10.5.2 (from memory): CNOT (X⊗I) CNOT = X⊗X, control first.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
ctrl @ x q[0], q[1];
x q[0];
ctrl @ x q[0], q[1];

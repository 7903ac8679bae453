// cnot_conjugates_xi (after side, OpenQASM 3 form).
// Source: Clifford conjugation rules, Nielsen & Chuang §10.5.2 (from memory): CNOT (X⊗I) CNOT = X⊗X, control first.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
x q[0];
x q[1];

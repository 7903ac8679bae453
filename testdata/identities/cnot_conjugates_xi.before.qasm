// cnot_conjugates_xi (before side).
// Source: Clifford conjugation rules, Nielsen & Chuang §10.5.2 (from memory): CNOT (X⊗I) CNOT = X⊗X, control first.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
cx q[0],q[1];
x q[0];
cx q[0],q[1];

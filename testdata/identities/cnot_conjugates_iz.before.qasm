// cnot_conjugates_iz (before side).
// Source: Clifford conjugation rules, Nielsen & Chuang §10.5.2 (from memory): CNOT (I⊗Z) CNOT = Z⊗Z, control first.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
cx q[0],q[1];
z q[1];
cx q[0],q[1];

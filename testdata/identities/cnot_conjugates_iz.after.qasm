// cnot_conjugates_iz (after side).
// Source: Clifford conjugation rules, Nielsen & Chuang §10.5.2 (from memory): CNOT (I⊗Z) CNOT = Z⊗Z, control first.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
z q[0];
z q[1];

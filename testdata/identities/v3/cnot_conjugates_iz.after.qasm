// cnot_conjugates_iz (after side, OpenQASM 3 form).
// Source: Clifford conjugation rules, Nielsen & Chuang §10.5.2 (from memory): CNOT (I⊗Z) CNOT = Z⊗Z, control first.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
z q[0];
z q[1];

// cnot_conjugates_iz (before side, OpenQASM 3 form).
// Source: Clifford conjugation rules, Nielsen & Chuang §10.5.2 (from memory): CNOT (I⊗Z) CNOT = Z⊗Z, control first.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
ctrl @ x q[0], q[1];
z q[1];
ctrl @ x q[0], q[1];

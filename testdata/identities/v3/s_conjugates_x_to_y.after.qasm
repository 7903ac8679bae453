// s_conjugates_x_to_y (after side, OpenQASM 3 form).
// Source: Clifford conjugation rules, Nielsen & Chuang §10.5.2 (from memory): S X S† = Y.
OPENQASM 3.0;
include "stdgates.inc";
qubit[1] q;
y q[0];

// s_conjugates_x_to_y (before side, OpenQASM 3 form).
// Source: Clifford conjugation rules, Nielsen & Chuang §10.5.2 (from memory): S X S† = Y.
OPENQASM 3.0;
include "stdgates.inc";
qubit[1] q;
inv @ s q[0];
x q[0];
s q[0];

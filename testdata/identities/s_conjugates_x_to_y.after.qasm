// s_conjugates_x_to_y (after side).
// Source: Clifford conjugation rules, Nielsen & Chuang §10.5.2 (from memory): S X S† = Y.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
y q[0];

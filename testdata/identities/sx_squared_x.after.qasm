// sx_squared_x (after side).
// Source: √X squared is X (definition of sx, DESIGN.md; common practice).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
x q[0];

// sx_squared_x (after side, OpenQASM 3 form).
// Source: √X squared is X (definition of sx, DESIGN.md; common practice).
OPENQASM 3.0;
include "stdgates.inc";
qubit[1] q;
x q[0];

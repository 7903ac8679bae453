// xz_y (before side, OpenQASM 3 form).
// Source: Nielsen & Chuang, §2.1.3 (Pauli relations): XZ = −iY, so Z then X equals Y up to a global phase.
OPENQASM 3.0;
include "stdgates.inc";
qubit[1] q;
z q[0];
x q[0];

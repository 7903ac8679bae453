// xz_y (before side).
// Source: Nielsen & Chuang, §2.1.3 (Pauli relations): XZ = −iY, so Z then X equals Y up to a global phase.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
z q[0];
x q[0];

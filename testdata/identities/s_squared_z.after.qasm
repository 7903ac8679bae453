// s_squared_z (after side).
// Source: Nielsen & Chuang, Fig. 4.2 and §4.2: S = T², so S² = Z.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[1];
z q[0];

// s_squared_z (before side, OpenQASM 3 form).
// Source: Nielsen & Chuang, Fig. 4.2 and §4.2: S = T², so S² = Z.
OPENQASM 3.0;
include "stdgates.inc";
qubit[1] q;
s q[0];
s q[0];

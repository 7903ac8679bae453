// cz_symmetric (before side).
// Source: Nielsen & Chuang, §4.3: controlled-Z acts symmetrically on its two qubits.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
cz q[0],q[1];

// cz_symmetric (before side, OpenQASM 3 form).
// Source: Nielsen & Chuang, §4.3: controlled-Z acts symmetrically on its two qubits.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
ctrl @ z q[0], q[1];

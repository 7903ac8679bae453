// cswap_from_toffoli (before side, OpenQASM 3 form).
// Source: Nielsen & Chuang, §1.4.1 and Exercise 4.25 (from memory): the Fredkin gate as a Toffoli between two CNOTs.
OPENQASM 3.0;
include "stdgates.inc";
qubit[3] q;
ctrl @ swap q[0], q[1], q[2];

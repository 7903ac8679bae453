// cswap_from_toffoli (before side).
// Source: Nielsen & Chuang, §1.4.1 and Exercise 4.25 (from memory): the Fredkin gate as a Toffoli between two CNOTs.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[3];
cswap q[0],q[1],q[2];

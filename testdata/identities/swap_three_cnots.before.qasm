// swap_three_cnots (before side).
// Source: Nielsen & Chuang, §1.3.4 and Fig. 1.7: SWAP from three alternating CNOTs.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[2];
swap q[0],q[1];

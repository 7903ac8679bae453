// swap_three_cnots (after side, OpenQASM 3 form).
// Source: Nielsen & Chuang, §1.3.4 and Fig. 1.7: SWAP from three alternating CNOTs.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
ctrl @ x q[0], q[1];
ctrl @ x q[1], q[0];
ctrl @ x q[0], q[1];

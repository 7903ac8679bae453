// toffoli (before side, OpenQASM 3 form).
// Source: Nielsen & Chuang, Fig. 4.9: the Toffoli gate from H, T, T† and six CNOTs (controls q[0], q[1], target q[2]).
OPENQASM 3.0;
include "stdgates.inc";
qubit[3] q;
ctrl(2) @ x q[0], q[1], q[2];

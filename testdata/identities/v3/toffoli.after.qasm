// toffoli (after side, OpenQASM 3 form).
// Source: Nielsen & Chuang, Fig. 4.9: the Toffoli gate from H, T, T† and six CNOTs (controls q[0], q[1], target q[2]).
OPENQASM 3.0;
include "stdgates.inc";
qubit[3] q;
h q[2];
ctrl @ x q[1], q[2];
inv @ t q[2];
ctrl @ x q[0], q[2];
t q[2];
ctrl @ x q[1], q[2];
inv @ t q[2];
ctrl @ x q[0], q[2];
t q[1];
t q[2];
h q[2];
ctrl @ x q[0], q[1];
t q[0];
inv @ t q[1];
ctrl @ x q[0], q[1];

// toffoli (before side).
// Source: Nielsen & Chuang, Fig. 4.9: the Toffoli gate from H, T, T† and six CNOTs (controls q[0], q[1], target q[2]).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[3];
ccx q[0],q[1],q[2];

// cnot_reversed_by_hadamards (after side, OpenQASM 3 form).
// Source: Nielsen & Chuang, Exercise 4.20: H⊗H conjugates a CNOT into the CNOT with control and target exchanged.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
ctrl @ x q[1], q[0];

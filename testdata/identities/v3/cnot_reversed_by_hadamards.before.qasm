// cnot_reversed_by_hadamards (before side, OpenQASM 3 form).
// Source: Nielsen & Chuang, Exercise 4.20: H⊗H conjugates a CNOT into the CNOT with control and target exchanged.
OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
h q[0];
h q[1];
ctrl @ x q[0], q[1];
h q[0];
h q[1];

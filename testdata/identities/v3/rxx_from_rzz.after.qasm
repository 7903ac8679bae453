// rxx_from_rzz (after side, OpenQASM 3 form).
// Source: Clifford conjugation H Z H = X (Nielsen & Chuang, Exercise 4.14) applied to exp(−iθ Z⊗Z/2).
OPENQASM 3.0;
include "stdgates.inc";
gate rzz(theta) a, b { cx a, b; rz(theta) b; cx a, b; }
qubit[2] q;
h q[0];
h q[1];
rzz(0.6) q[0], q[1];
h q[0];
h q[1];

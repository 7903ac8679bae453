// rxx_from_rzz (before side, OpenQASM 3 form).
// Source: Clifford conjugation H Z H = X (Nielsen & Chuang, Exercise 4.14) applied to exp(−iθ Z⊗Z/2).
OPENQASM 3.0;
include "stdgates.inc";
gate rxx(theta) a, b { h a; h b; cx a, b; rz(theta) b; cx a, b; h a; h b; }
qubit[2] q;
rxx(0.6) q[0], q[1];

// Quantum teleportation as the OpenQASM 2.0 paper (Cross, Bishop, Smolin & Gambetta,
// arXiv:1707.03429) describes it, written for qcheck's tests: q[0] holds u3(0.3,0.2,0.1)|0>,
// q[1] and q[2] share a Bell pair, Alice measures, Bob corrects by the bits she sends.
// By hand: c0 and c1 are fair coins; c2 reads 1 with probability sin^2(0.15).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[3];
creg c0[1];
creg c1[1];
creg c2[1];
u3(0.3,0.2,0.1) q[0];
h q[1];
cx q[1],q[2];
barrier q;
cx q[0],q[1];
h q[0];
measure q[0] -> c0[0];
measure q[1] -> c1[0];
if(c0==1) z q[2];
if(c1==1) x q[2];
measure q[2] -> c2[0];

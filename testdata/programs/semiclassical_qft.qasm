// The semiclassical inverse QFT (measure, then rotate the next qubit by what was read) on three
// qubits, as the OpenQASM 2.0 paper (arXiv:1707.03429) presents it, written for qcheck's tests.
// The input is the Fourier state of k = 5: qubit j holds (|0> + e^{2 pi i k / 2^(j+1)}|1>)/sqrt 2.
// By hand: each correction removes the phase of the bits already read, so the program reads
// c2 c1 c0 = 101 with certainty.
OPENQASM 2.0;
include "qelib1.inc";
qreg q[3];
creg c0[1];
creg c1[1];
creg c2[1];
h q;
u1(5*pi) q[0];
u1(5*pi/2) q[1];
u1(5*pi/4) q[2];
h q[0];
measure q[0] -> c0[0];
if(c0==1) u1(-pi/2) q[1];
h q[1];
measure q[1] -> c1[0];
if(c0==1) u1(-pi/4) q[2];
if(c1==1) u1(-pi/2) q[2];
h q[2];
measure q[2] -> c2[0];

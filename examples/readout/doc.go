// Package readout is the readout stage of Quillwort, the compiler an invented team at
// Brackenmoor Qubitworks writes for its invented Sedge devices. On a Sedge chip every gate costs
// fidelity and a SWAP costs three two-qubit gates, while reading a qubit into any classical bit is
// free; so before a program runs, this stage strips what its final measurements cannot see.
//
// Both passes rely on the meaning of a program, not of a unitary: the result of a program is the
// distribution of its classical bits at the end, and measuring in the computational basis is
// blind to phases. DropDiagonals removes diagonal gates (z, s, t, rz, p, cz, cp, crz, rzz, …)
// that only measurements follow on every one of their qubits; RelabelSwaps removes SWAPs that
// only measurements follow and measures each qubit where the SWAP would have moved it. Neither
// keeps the circuit's unitary, and both keep the program's distribution exactly, which is what
// their tests check. Package careless holds wrong variants of both, which the tests catch.
package readout

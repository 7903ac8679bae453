// Package sim gives circuits their meaning: engines that compute a circuit's unitary matrix or
// apply it to a state, in the qubit order of package circuit (qubit 0 is the least-significant
// bit of a basis index).
//
// Every engine validates the circuit first and returns an error, never a panic, for an ill-formed
// circuit, a non-unitary op (measure, reset), or a size it cannot hold.
package sim

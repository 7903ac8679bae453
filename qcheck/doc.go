// Package qcheck checks that quantum circuit transformations keep a circuit's meaning: that a
// compiler pass, optimizer, router or synthesis step returns a circuit with the same unitary
// within a tolerance in operator norm, by default up to a global phase.
package qcheck

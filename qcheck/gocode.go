package qcheck

import "qcheck.dev/qcheck/circuit"

// GoCode writes Go code that rebuilds the circuit with package circuit's builder, such as
// "circuit.New(2).H(0).CX(0, 1)", with every angle written exactly, so that a counterexample found
// by a property test can be pasted into a regression test. It is the circuit's GoString.
func GoCode(c *circuit.Circuit) string { return c.GoString() }

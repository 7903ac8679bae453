// Package campaign is qcheck's built-in demonstration: the planted bugs of the example passes,
// each with the circuits it is hunted on, and Run, which hunts one of them and prints what
// qcheck found. `go run ./examples/demo` and the command-line tool's demo subcommand call Run.
//
// The scenario is invented: Fieldfare is the compiler an invented team at Thistlewick Qubit Foundry writes
// for its invented Tarn devices. A contributor's patch to its peephole optimizer (package
// shortcut) claims to save more gates with two shortcuts; both are wrong, and qcheck finds one
// of them on random circuits and shrinks it to a two- or three-gate counterexample.
package campaign

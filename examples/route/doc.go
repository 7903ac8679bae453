// Package route is the qubit router of Fieldfare, the compiler an invented team at Thistlewick Qubit Foundry
// writes for its invented Tarn devices. On a Tarn chip a two-qubit gate can act only on coupled
// qubits: Tarn-6 is a line of six qubits, Tarn-9 a 3×3 grid. Circuits arrive written for
// all-to-all connectivity, and the router inserts SWAP gates so that every two-qubit gate acts on
// neighbours.
//
// The router starts from the trivial layout (logical qubit i on physical qubit i) and never
// swaps back at the end, so the qubits of the routed circuit are permuted: it reports its final
// layout, perm, with logical qubit i ending on physical qubit perm[i]. Checking the router means
// comparing the routed circuit with the original followed by that permutation, which is what
// qcheck's OutputPermutation option does.
package route

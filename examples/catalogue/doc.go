// Package catalogue is a catalogue of realistic compiler-pass bugs, each a wrong pass beside its
// correct twin, for measuring how fast qcheck's generators find bugs they were not tuned for.
//
// The scenario is invented: Pellmoor Quantum Works keeps a review log of the mistakes its
// contributors made in the peephole, lowering and decomposition passes of Quillfen, its
// compiler. Each entry (a Bug) is one mistake: a rewrite that slides a gate through the wrong
// operand, cancels cx gates without looking at their orientation, merges rotations about
// different axes, takes 2π for the period of a controlled rotation, drops a relative phase, emits
// Euler angles in the wrong order, writes a gate on the wrong qubit, and so on. Each bug has the
// pass that contains it (Wrong) and the pass as it should have been written (Correct), so that a
// test can show that the correct pass keeps the meaning of every circuit and the wrong one does
// not, and a measurement can count how often a random search finds the wrong one (Detect).
//
// Every pass here follows the qcheck.Pass contract: it returns a new circuit and never modifies
// its input.
package catalogue

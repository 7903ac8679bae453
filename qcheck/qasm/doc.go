// Package qasm reads and writes OpenQASM 2.0 (Cross, Bishop, Smolin and Gambetta,
// arXiv:1707.03429), so that circuits from any toolchain can be checked by qcheck.
//
// # What Parse accepts
//
// The header OPENQASM 2.0; then any of: include "qelib1.inc"; (built in, never read from disk;
// no other file can be included), qreg and creg declarations, gate definitions with parameters
// (bodies may call U, CX, qelib1 gates and gates defined earlier, and may hold barriers), gate
// calls, measure, reset, barrier, and // comments. Several qregs are laid end to end in the
// order of declaration; ParseProgram returns the registers with the flat index of each. Calls
// broadcast over whole registers of equal size (h q; cx a, b;), and measure q -> c; pairs two
// registers of equal size. Angles are expressions of numbers, pi, the parameters in scope,
// + - * / ^ (power binds tightest and to the right; -2^2 is -4), unary minus, and sin, cos, tan,
// exp, ln, sqrt. An angle that evaluates to NaN or ±Inf is an error at its expression, naming
// the angle as package circuit does, counted from 1 ("angle 1 (θ) of rz"): every angle of a call
// must be finite, even one the gate ignores, and an angle computed in the body of the source's
// own gate is reported at its expression in the body, with the line and column of the call.
//
// if(creg==n) op; applies to a gate call, measure or reset: every op it makes carries a
// circuit.Condition whose Bits are the register's bits (element 0 first, least significant) and
// whose Value is n; registers of more than 64 bits cannot be compared.
//
// opaque, block comments, other includes and anything else the grammar does not have are
// errors naming the construct at its line and column. Every error is an *Error. A source may
// redefine a qelib1 gate (their libraries differ between toolchains); the definition then
// applies to later calls. It may not redefine U, CX or its own gates.
//
// Barriers are kept as barrier ops unless DropBarriers is given; measure and reset become
// measure and reset ops, measure with the classical bit it writes.
//
// # How qelib1 gates map onto package circuit
//
// OpenQASM 2.0 defines its built-in U(θ,φ,λ) as Rz(φ)Ry(θ)Rz(λ), which is e^{−i(φ+λ)/2} times
// the u(θ,φ,λ) of package circuit, and so defines every gate only up to a global phase. Parse
// gives each gate name the textbook matrix of package circuit. testdata/qasm/qelib1_phases.py
// (NumPy) compares the qelib1 bodies of the 2017 paper, read with the spec's U, against these
// matrices; its output, qelib1_phases.out, gives the global phase of each:
//
//   - the same name, our matrix: id x y z h s sdg t tdg sx sxdg rx ry rz p u cx cy cz ch cp crx
//     cry crz swap rxx rzz ccx cswap. Where qelib1 has a body it differs from ours by a global
//     phase only: u3 and u2 by e^{−i(φ+λ)/2}, x y z h by e^{−iπ/2}, s t and u1 by e^{−iλ/2},
//     cz by −1, ch by e^{−iπ/4}; rx, ry, rz, cy and crz agree exactly.
//   - U → u; CX → cx; u3(θ,φ,λ) → u(θ,φ,λ); u2(φ,λ) → u(π/2,φ,λ); u1(λ) → p(λ) (the spec's u1
//     is Rz(λ), equal to p(λ) up to e^{−iλ/2}); u0(γ) → id; cu1(λ) → cp(λ) (up to a global
//     phase).
//   - expanded into exact sequences, phase included: cu3(θ,φ,λ) → the controlled form of the
//     matrix Parse gives u3, controlled-u(θ,φ,λ), in five gates; cu(θ,φ,λ,γ) → p(γ) on the
//     control then cu3; csx → h, cp(π/2), h; c3x, c3sqrtx and c4x → multiply controlled X or
//     √X built from cp, cx, ccx and h (Barenco et al., Phys. Rev. A 52 (1995), Lemma 7.1).
//     Beware: the 2017 body of cu3, read with the spec's U, is controlled-Rz(φ)Ry(θ)Rz(λ),
//     which differs from controlled-u by the relative phase p(−(φ+λ)/2) on the control; a file
//     that relies on that body should define its own gate instead of calling cu3.
//   - not supported (an error naming them): the relative-phase Toffolis rccx and rc3x.
//
// # Entry points
//
// Parse returns the circuit; ParseProgram also returns the registers (Program.Qregs and Cregs,
// each with the flat index of its element 0, and the lookups Program.Qubit and Program.Bit) and
// the source line of every op (Program.Lines), so that a report about op k can point into the
// file. Options: DropBarriers, and MaxOps, which bounds how many ops a source may expand to
// (DefaultMaxOps; gate definitions can double the count at each level of nesting). Each gate
// definition's expanded size is counted when it is read, so a call that would pass the limit is
// refused at its line and column before it is expanded. MaxOps also bounds the operands of all
// ops (4 × MaxOps: a barrier over a wide register is as long as the register) and the work of
// expanding gate calls (8 × MaxOps steps, counting calls, barriers and the arithmetic of angle
// expressions in bodies, so that empty bodies are not free); each definition's angle
// expressions are compiled once, when it is read. Qelib1 lists the gate names the include
// provides.
//
// # Writing
//
// Format (one register q, one register c) and FormatProgram (the program's own registers) write
// valid OpenQASM 2.0 that Parse reads back to an equal circuit:
// angles are printed in the shortest form that round-trips exactly, and gates qelib1.inc lacks
// (iswap, iswapdg, ccz, ryy) are written as exact definitions that Parse recognises. See Format
// for custom gates.
package qasm

// Package qasm reads and writes OpenQASM 2.0 (Cross, Bishop, Smolin and Gambetta,
// arXiv:1707.03429) and the subset of OpenQASM 3 (Cross et al., ACM Trans. Quantum Comput. 3(3),
// 2022) that compilers write today, so that circuits from any toolchain can be checked by
// qcheck. The version is read from the source's header: OPENQASM 2.0; (or 2) for 2.0, OPENQASM 3;
// (3.0, 3.1, …) or no header at all for 3. An empty source is an error.
//
// # What Parse accepts in OpenQASM 2.0
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
// # What Parse accepts in OpenQASM 3
//
// Parse reads an OpenQASM 3 source as a program run while it is read: classical values that do
// not depend on measurements are computed, loops are unrolled, and branches on known values
// are chosen; only what the circuit does remains. The subset:
//
//   - include "stdgates.inc"; (built in); the built-in U and gphase; gate definitions whose
//     bodies hold gate calls (with modifiers), gphase and barriers, with angle arithmetic over
//     their parameters compiled once;
//   - qubit q; qubit[n] q; bit c; bit[n] c; and the old qreg and creg; physical qubits $n (in a
//     source that declares no qubits; Program.Qregs is then one register named "$");
//   - c = measure q; c[i] = measure q[j]; measure q -> c; bit[n] c = measure q; with indices,
//     negative indices, slices a:b and a:step:b (the end included) and sets {i, j}; reset and
//     barrier (barrier; alone is every qubit); calls broadcast over registers and slices of one
//     length;
//   - the modifiers ctrl @, ctrl(n) @, negctrl @, negctrl(n) @, inv @, pow(k) @ (see below);
//   - constants pi/π, tau/τ, euler/ℇ, true, false; integer literals in decimal, 0x, 0o, 0b, with _;
//     bit string literals "0101";
//   - const declarations and int, uint, float, angle, bool variables (with or without a width;
//     angle values live in [0, 2π), angle[n] in steps of 2π/2^n; int[n] and uint[n] wrap),
//     assignments and compound assignments (+= -= *= /= %= &= |= ^= <<= >>= **=), indexing of
//     integers' bits, casts (bool(a[i]), int[4](c), float(x), angle(x), …), the arithmetic,
//     comparison, logical and bitwise operators with the specification's precedence (** binds
//     tighter than unary minus), and sin, cos, tan, arcsin, arccos, arctan, exp, log, sqrt,
//     ceiling, floor, mod, popcount;
//   - for loops over ranges [a:b] and [a:step:b] (negative steps too) and sets {a, b}, with a
//     typed or untyped loop variable; a loop may run at most MaxOps/32 times (32,768 at the
//     default), so a loop of 10⁶ iterations is refused at its line and column before it runs;
//   - if (condition) statement [else statement]: a condition known while reading chooses the
//     branch; a condition on measured bits becomes the circuit.Condition of every op of the
//     branch (and its negation, Not, of the else branch). Conditions on bits are c[i], !c[i],
//     c == n, c != n, c[i] == 0, casts of bit registers compared with a value, and && of
//     equalities on distinct bits; anything else (||, a comparison <, an if on measured bits
//     inside another) is refused at its line and column. Bits are never evaluated while
//     reading, even before their first measurement; values that depend on them cannot be
//     stored in variables, and bits cannot be set other than by measurement (they start at 0);
//   - input angle θ; and input float θ; (any numeric type): named parameters whose values the
//     Inputs option gives (Program.Inputs lists them); with the FreeInputs option, an input
//     float given no value is a free real parameter instead (Program.Free, Program.Angles),
//     allowed only in affine angles of rotation and phase gates (see FreeInputs);
//   - // and /* */ comments.
//
// Everything else is refused at its line and column with the construct's name: def, while,
// extern, defcal, cal, defcalgrammar, delay, box, durations (10ns) and the duration and stretch
// types, arrays, switch, let, output, return, break, continue, end, opaque, complex, pragmas and
// annotations. A branch not taken and a loop over nothing are checked only for balanced
// brackets.
//
// # How stdgates.inc maps onto package circuit
//
// OpenQASM 3 fixes the phase of its built-in U: U(θ,φ,λ) is exactly the u(θ,φ,λ) of package
// circuit, so every stdgates.inc gate has a definite matrix, global phase included, and Parse
// gives each exactly that matrix (stdgates_test.go checks each against the specification's
// definition, written out by us, by dense matrices):
//
//   - the same gate of package circuit: p x y z h s sdg t tdg sx rx ry rz cx cy cz cp crx cry crz
//     ch swap ccx cswap id; and CX → cx, phase → p, cphase → cp, u1 → p;
//   - u3(θ,φ,λ) = gphase(−(φ+λ)/2)·U(θ,φ,λ) → rz(λ), ry(θ), rz(φ); u2(φ,λ) = u3(π/2,φ,λ) likewise;
//     cu(θ,φ,λ,γ) → p(γ) on the control, then the controlled U (see ctrl below).
//
// Where the global phases differ from qelib1.inc (which Parse reads with the matrices of
// package circuit): 3's u3 and u2 are e^{−i(φ+λ)/2} times the u that 2.0's u3 and u2 become,
// so a 2.0 file and a 3 file with the same u3 calls are equal up to a global phase only (which
// counts under control and with an exact-phase comparison); 3's u1 equals p exactly, where the
// 2.0 specification's u1 is Rz(λ), e^{−iλ/2}·p; 3's x, y, z, h, s, t, rz and cz are exactly the
// library matrices, where qelib1's bodies read with 2.0's U differ by the phases listed above.
//
// # Modifiers and global phase
//
// Modifiers are applied as the specification defines them, exactly, in library gates: ctrl @
// adds a control (a controlled library gate maps to cx, ccx, cz, ccz, cy, ch, cp, crx, cry, crz
// or cswap; more controls to multiply controlled X and phase gates after Barenco et al., Phys.
// Rev. A 52 (1995), Lemma 7.1; any other single-qubit gate by the A·X·B·X·C construction of
// Nielsen & Chuang, Corollary 4.2); negctrl @ is ctrl @ between X gates; inv @ reverses a body
// and inverts each gate; pow(k) @ repeats the gate k times for an integer k (inverted for
// k < 0) and, for any other k, takes the principal power (eigenphases in (−π, π] multiplied by
// k) of a single-qubit gate, of a controlled one, of gphase, and of rzz, rxx, ryy, swap, iswap
// and iswapdg; the powers of other gates on several qubits are refused. The package circuit has
// no global-phase op, so gphase(γ) with no control is written exactly as p(2γ) followed by
// rz(−2γ) on a qubit of the call (the first qubit of the program at the top level), which is
// e^{iγ}·I; under ctrl @ it is a phase gate on the controls, as the specification says.
//
// # Entry points
//
// Parse returns the circuit; ParseProgram also returns the version, the input parameters, the
// registers (Program.Qregs and Cregs,
// each with the flat index of its element 0, and the lookups Program.Qubit and Program.Bit) and
// the source line of every op (Program.Lines), so that a report about op k can point into the
// file. Options: DropBarriers, Inputs, FreeInputs, and MaxOps, which bounds how many ops a source may expand to
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
// Format (one register q, one register c) and FormatProgram (the program's own registers, in
// the program's Version) write valid OpenQASM 2.0 that Parse reads back to an equal circuit;
// Format3, and FormatProgram for Version 3, write OpenQASM 3 likewise (u as U, sxdg as inv @ sx,
// ccz as ctrl(2) @ z, exact definitions of rzz, rxx, ryy, iswap and iswapdg, conditions as
// c == n for a whole register and as && of bit equalities otherwise). In 2.0:
// angles are printed in the shortest form that round-trips exactly, and gates qelib1.inc lacks
// (iswap, iswapdg, ccz, ryy) are written as exact definitions that Parse recognises. See Format
// for custom gates.
package qasm

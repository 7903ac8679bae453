// Package metric measures how far apart two quantum operations, channels or
// states are, exactly and fast.
//
// The central measure is the operator norm of a difference, ‖U − V‖, the
// largest singular value: it adds up linearly over a sequence of gates and
// bounds how far any measurement's probabilities can move (Nielsen & Chuang
// §4.5.3). PhaseDistance is the same measure with the global phase taken out,
// computed in closed form from the eigenphases of V†U. Diamond,
// AverageFidelity and ProcessFidelity give the channel view; StateDistance,
// StateFidelity and TraceDistance compare states. EquateUnitaries and
// EquateStates turn these into go-cmp options for cmp.Diff in tests.
//
// # Mathematics
//
// For unitaries U and V, let θ be the length of the shortest arc of the unit circle that holds
// every eigenphase of V†U. Then
//
//	min over φ of ‖U − e^{iφ}·V‖ = 2·sin(θ/4)         (PhaseDistance)
//	diamond distance = 2·sin(θ/2) for θ < π, else 2     (Diamond)
//
// The first minimum is attained at φ the midpoint of the arc (PhaseAlign): ‖U − e^{iφ}·V‖ is
// ‖e^{−iφ}·V†U − I‖, a normal matrix whose eigenvalues e^{iα} − 1 have modulus 2·sin(|α|/2), and
// every α lies within θ/2 of 0 at that φ. The second is Watrous's theorem on unitary channels
// (The Theory of Quantum Information, 2018, chapter 3). rz(θ) against the identity
// has eigenphases ∓θ/2, so its phase-free distance is 2·sin(|θ|/4) for |θ| ≤ π. Errors of
// unitary factors add at most linearly, and for any state and measurement
//
//	|P_U(outcome) − P_V(outcome)| ≤ 2·‖U − V‖
//
// (Nielsen & Chuang §4.5.3); the phase of each factor may be chosen on its own, so the same holds
// with the phase-free distance. Average gate fidelity and process fidelity of d-dimensional
// unitaries are
//
//	F_avg = (d + |tr U†V|²) / (d·(d + 1)),   F_pro = |tr U†V|² / d²
//
// (Nielsen, Phys. Lett. A 303 (2002), for the first).
//
// # Inputs and programmer errors
//
// Matrices are gonum mat.CMatrix values; pure states are []complex128 holding
// the amplitudes, basis index = Σ_q b_q·2^q. Functions that take two
// operators expect square matrices of equal size; functions that take two
// states expect equal lengths. As with gonum's mat package, breaking these
// preconditions is a programmer error: the function panics with an *InputError
// that names the function, the argument and the sizes or values it saw. Every function
// in the package follows this rule. Inputs said to be unitary or unit vectors
// are trusted to be so up to rounding; the package does not check it.
// Entries that are NaN or infinite make the results NaN.
//
// # Numerics
//
// gonum has no complex LAPACK, so the package carries its own small complex
// kernels (a blocked product, LU factorisation with partial pivoting,
// triangular solves, Householder reduction of a Hermitian matrix to real
// tridiagonal form, inverse iteration for the few eigenvectors a witness
// needs) and hands the real tridiagonal eigenvalues to gonum's LAPACK
// (Dsterf). Matrices of any scale are handled: each Hermitian and
// tridiagonal matrix is scaled by a power of two into [0.5, 1) and parts
// below 2^-300 of its largest entry are set to zero before reduction, which
// moves no eigenvalue by more than about 2^-280 of the norm (far below
// rounding) and keeps tiny and subnormal entries out of the paths where they
// would overflow or trip gonum's rescaling. On amd64 the innermost loops use AVX2 with FMA
// when the processor has them; large products and reductions are shared out
// over the available cores.
//
// Eigenphases of a unitary W come from the Hermitian matrix
// C = i(I + cW)(I − cW)⁻¹, |c| = 1 (a Cayley transform), whose eigenvalue
// x = −cot(φ/2) determines each eigenphase φ of cW one to one. Hermitian
// eigensolvers are backward stable and keep degenerate and clustered spectra
// accurate. The accuracy of C itself falls like ε·‖C‖², and ‖C‖ grows as the
// pole c̄ nears an eigenvalue, so the pole is placed opposite the mean
// eigenvalue (ideal when U and V nearly agree, the usual case) and, if that
// first choice falls within about 2e-3 of an eigenvalue, the transform is
// built a second time with the pole in the middle of the widest gap of the
// spectrum just found. Each eigenphase is then accurate to about 1e-14 for
// the sizes of the tests (2.5e-14 at worst against NumPy up to 64×64). For a
// pair (U, V) the transform is built from V ± cU directly, so V†U is never
// formed. One transform costs about 2n³ complex multiply-adds: LU (n³/3),
// the solve (n³) and the reduction (2n³/3); spread spectra of large unitaries
// need the second transform about half the time.
package metric

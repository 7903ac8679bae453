// c4x_dirty_ancillas (before side, OpenQASM 3 form).
// Source: Barenco et al., Phys. Rev. A 52 (1995), Lemma 7.2: C⁴X on q[4] with controls q[0..3] from eight Toffolis and two ancillas q[5], q[6] in any state, which are restored.
OPENQASM 3.0;
include "stdgates.inc";
qubit[7] q;
ctrl(4) @ x q[0], q[1], q[2], q[3], q[4];

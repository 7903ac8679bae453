// c4x_dirty_ancillas (after side, OpenQASM 3 form).
// Source: Barenco et al., Phys. Rev. A 52 (1995), Lemma 7.2: C⁴X on q[4] with controls q[0..3] from eight Toffolis and two ancillas q[5], q[6] in any state, which are restored.
OPENQASM 3.0;
include "stdgates.inc";
qubit[7] q;
ctrl(2) @ x q[3], q[6], q[4];
ctrl(2) @ x q[2], q[5], q[6];
ctrl(2) @ x q[0], q[1], q[5];
ctrl(2) @ x q[2], q[5], q[6];
ctrl(2) @ x q[3], q[6], q[4];
ctrl(2) @ x q[2], q[5], q[6];
ctrl(2) @ x q[0], q[1], q[5];
ctrl(2) @ x q[2], q[5], q[6];

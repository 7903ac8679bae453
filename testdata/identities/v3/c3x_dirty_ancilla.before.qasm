// c3x_dirty_ancilla (before side, OpenQASM 3 form).
// Source: Barenco et al., Phys. Rev. A 52 (1995), Lemma 7.2: C³X on q[3] with controls q[0], q[1], q[2] from four Toffolis and one ancilla q[4] in any state, which is restored (so the two unitaries agree on the whole space).
OPENQASM 3.0;
include "stdgates.inc";
qubit[5] q;
ctrl(3) @ x q[0], q[1], q[2], q[3];

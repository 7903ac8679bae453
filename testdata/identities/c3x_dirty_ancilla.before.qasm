// c3x_dirty_ancilla (before side).
// Source: Barenco et al., Phys. Rev. A 52 (1995), Lemma 7.2: C³X on q[3] with controls q[0], q[1], q[2] from four Toffolis and one ancilla q[4] in any state, which is restored (so the two unitaries agree on the whole space).
OPENQASM 2.0;
include "qelib1.inc";
qreg q[5];
c3x q[0],q[1],q[2],q[3];

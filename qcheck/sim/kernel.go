package sim

// applyRows applies a k-qubit gate g (row-major 2^k × 2^k, textbook operand order: qubits[0] is
// the most significant bit of the gate's local index) to a row-major array whose rows are indexed
// by basis states of an n-qubit register and which has cols columns. A statevector is the case
// cols = 1; a unitary being built is the case cols = 2^n, where the gate acts on every column.
//
// It works in place over the strided sets of 2^k rows that differ only in the gate's qubits, and
// allocates only the small per-call index tables.
func applyRows(data []complex128, n, cols int, g []complex128, qubits []int) {
	k := len(qubits)
	d := 1 << k
	// offsets[a] is the row offset of local index a: bit (k-1-j) of a sets qubit qubits[j].
	offsets := make([]int, d)
	mask := 0
	for a := 0; a < d; a++ {
		off := 0
		for j, q := range qubits {
			if a>>(k-1-j)&1 == 1 {
				off |= 1 << q
			}
		}
		offsets[a] = off
	}
	for _, q := range qubits {
		mask |= 1 << q
	}
	in := make([]complex128, d)
	rows := 1 << n
	for base := 0; base < rows; base++ {
		if base&mask != 0 {
			continue
		}
		for col := 0; col < cols; col++ {
			for a := 0; a < d; a++ {
				in[a] = data[(base|offsets[a])*cols+col]
			}
			for a := 0; a < d; a++ {
				var s complex128
				row := g[a*d : a*d+d]
				for b, v := range in {
					s += row[b] * v
				}
				data[(base|offsets[a])*cols+col] = s
			}
		}
	}
}

package metric

// solveLowerUnit overwrites the n×nrhs block b with L⁻¹·b, where L is the
// unit lower triangle of the n×n block l (its diagonal and upper part are not
// read). Like luFactor it recurses on halves so the bulk is in mulAdd.
func solveLowerUnit(n, nrhs int, l []complex128, ldl int, b []complex128, ldb int) {
	if n <= 32 {
		for j := 0; j < nrhs; j++ {
			col := b[j*ldb : j*ldb+n]
			for k := 0; k < n; k++ {
				s := col[k]
				if s == 0 {
					continue
				}
				lk := l[k*ldl+k+1 : k*ldl+n]
				rest := col[k+1:]
				rest = rest[:len(lk)]
				for i, x := range lk {
					rest[i] -= s * x
				}
			}
		}
		return
	}
	n1 := n / 2
	solveLowerUnit(n1, nrhs, l, ldl, b, ldb)
	mulAdd(n-n1, nrhs, n1, -1, l[n1:], ldl, b, ldb, b[n1:], ldb)
	solveLowerUnit(n-n1, nrhs, l[n1*ldl+n1:], ldl, b[n1:], ldb)
}

// solveUpper overwrites the n×nrhs block b with U⁻¹·b, where U is the upper
// triangle of the n×n block u (its strictly lower part is not read).
func solveUpper(n, nrhs int, u []complex128, ldu int, b []complex128, ldb int) {
	if n <= 32 {
		var inv [32]complex128
		for k := 0; k < n; k++ {
			inv[k] = 1 / u[k*ldu+k]
		}
		for j := 0; j < nrhs; j++ {
			col := b[j*ldb : j*ldb+n]
			for k := n - 1; k >= 0; k-- {
				s := col[k] * inv[k]
				col[k] = s
				if s == 0 {
					continue
				}
				uk := u[k*ldu : k*ldu+k]
				head := col[:len(uk)]
				for i, x := range uk {
					head[i] -= s * x
				}
			}
		}
		return
	}
	n1 := n / 2
	solveUpper(n-n1, nrhs, u[n1*ldu+n1:], ldu, b[n1:], ldb)
	mulAdd(n1, nrhs, n-n1, -1, u[n1*ldu:], ldu, b[n1:], ldb, b, ldb)
	solveUpper(n1, nrhs, u, ldu, b, ldb)
}

package param

import "testing"

// BenchmarkProveRZZ proves a one-parameter two-qubit rule, rzz(a) = cx·(I⊗rz(a))·cx: 5 grid
// points.
func BenchmarkProveRZZ(b *testing.B) {
	a := Var("a")
	left, right := New(2).RZZ(a, 0, 1), New(2).CX(0, 1).RZ(a, 1).CX(0, 1)
	for b.Loop() {
		if res, err := Prove(left, right, Options{ExactPhase: true}); err != nil || res.Verdict != Proved {
			b.Fatal(res, err)
		}
	}
}

// BenchmarkProveEuler proves a three-parameter single-qubit rule, u(a,b,c) = rz(b)·ry(a)·rz(c)
// up to phase: 5×7×7 = 245 grid points.
func BenchmarkProveEuler(b *testing.B) {
	a, bb, c := Var("a"), Var("b"), Var("c")
	left, right := New(1).U(a, bb, c, 0), New(1).RZ(c, 0).RY(a, 0).RZ(bb, 0)
	for b.Loop() {
		if res, err := Prove(left, right, Options{}); err != nil || res.Verdict != Proved {
			b.Fatal(res, err)
		}
	}
}

// BenchmarkProveABC proves the three-parameter two-qubit ABC construction of a controlled
// rotation (Barenco et al. Lemma 5.1): scale 4 for every parameter (the halves of halves),
// degrees 6, 4, 4, 13×9×9 = 1053 grid points.
func BenchmarkProveABC(b *testing.B) {
	id := identities()[9]
	for b.Loop() {
		if res, err := Prove(id.left, id.right, Options{ExactPhase: true}); err != nil || res.Verdict != Proved {
			b.Fatal(res, err)
		}
	}
}

// BenchmarkRefuteCPForCRZ refutes crz(a) taken for cp(a): grid, worst-distance search and
// shrinking.
func BenchmarkRefuteCPForCRZ(b *testing.B) {
	a := Var("a")
	left, right := New(2).CP(a, 0, 1), New(2).CRZ(a, 0, 1)
	for b.Loop() {
		if res, err := Prove(left, right, Options{}); err != nil || res.Verdict != Refuted {
			b.Fatal(res, err)
		}
	}
}

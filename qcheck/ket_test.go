package qcheck

import (
	"math"
	"testing"
)

func TestKet(t *testing.T) {
	s := 1 / math.Sqrt2
	cases := []struct {
		psi  []complex128
		n    int
		want string
	}{
		{[]complex128{0, 0, 1, 0}, 2, "|10⟩"},
		{[]complex128{0, 0, complex(s, 0), complex(s, 0), 0, 0, 0, 0}, 3, "(|010⟩ + |011⟩)/√2"},
		{[]complex128{complex(s, 0), complex(-s, 0)}, 1, "(|0⟩ − |1⟩)/√2"},
		{[]complex128{complex(0, s), complex(s, 0)}, 1, "(|0⟩ − i|1⟩)/√2"}, // global phase i taken out
		{[]complex128{0.5, 0.5, 0.5, -0.5}, 2, "(|00⟩ + |01⟩ + |10⟩ − |11⟩)/2"},
		{[]complex128{0.6, 0, 0, complex(0, 0.8)}, 2, "0.6|00⟩ + 0.8i|11⟩"},
		{[]complex128{1, 5e-7}, 1, "≈ |0⟩"},
		{[]complex128{1, 1e-12}, 1, "|0⟩"},
		{[]complex128{0.99, 0.1 + 0.1i}, 1, "0.99|0⟩ + (0.1+0.1i)|1⟩"},
	}
	for _, tc := range cases {
		if got := Ket(tc.psi, tc.n); got != tc.want {
			t.Errorf("Ket(%v) = %q, want %q", tc.psi, got, tc.want)
		}
	}
}

package sim

import (
	"fmt"
	"math"
	"math/bits"

	"gonum.org/v1/gonum/mat"
	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
)

// maxCliffordFactor is the largest tensor factor, in qubits, whose matrix CliffordDistance builds.
const maxCliffordFactor = 10

// CliffordDistanceResult is what CliffordDistance finds about D = min over φ of ‖U − e^{iφ}V‖.
type CliffordDistanceResult struct {
	// Lower is a certified lower bound on D.
	Lower float64
	// Exact is D for the Clifford unitaries the tableau uses, when Known; the circuits' own
	// distance is within Deviation of it.
	Exact float64
	Known bool
	// Deviation bounds how far the circuits are from the Clifford unitaries the tableau uses
	// (CliffordDeviation of each, added): 0 when every angle is an exact multiple of π/2.
	Deviation float64
	// Largest is the number of qubits of the largest tensor factor of V†U.
	Largest int
}

// CliffordDistance computes the phase-free operator-norm distance of two Clifford circuits from
// the tableau of C = V†U, at any width, exactly when C splits into tensor factors of at most 10
// qubits each. It also tries UV† = U·C·U†, which has the same spectrum and is local where C is
// not when the circuits differ near their end.
//
// The qubits split into the classes of the relation "the image of X_q or Z_q under C acts on p";
// C is the tensor product of a Clifford C_j on each class, because it maps the Paulis of each
// class to Paulis of that class. A factor on k ≤ 10 qubits is built as a matrix from its images
// alone: its first column C|0…0⟩ is, up to phase, the state stabilized by the images S_q of the
// Z_q, obtained by applying the projector Π_q (I + S_q)/2 to a basis state it does not annihilate,
// and column x is (Π_{q: x_q = 1} C X_q C†)·C|0…0⟩. The eigenphases of C are the sums of one
// eigenphase of each factor (metric.TensorPhaseDistance).
//
// Otherwise Lower is a bound from the Pauli P = X_q or Z_q whose image Q = CPC† differs most
// from P: for any φ, ‖C − e^{iφ}I‖ ≥ ‖[C, P]‖/2 = ‖Q − P‖/2, which is 1 when Q = −P or Q
// commutes with P, and 1/√2 when Q anticommutes with P ((Q − P)² = 2I); and from the factors
// that were built, since a factor's distance bounds that of the product below.
//
// It fails where NewTableau or CliffordDeviation fails, and for different widths.
func CliffordDistance(u, v *circuit.Circuit) (CliffordDistanceResult, error) {
	if u == nil || v == nil {
		return CliffordDistanceResult{}, fmt.Errorf("sim: nil circuit")
	}
	if u.Qubits() != v.Qubits() {
		return CliffordDistanceResult{}, fmt.Errorf("sim: circuits of %d and %d qubits", u.Qubits(), v.Qubits())
	}
	var r CliffordDistanceResult
	for _, c := range []*circuit.Circuit{u, v} {
		d, err := CliffordDeviation(c)
		if err != nil {
			return r, err
		}
		r.Deviation += d
	}
	// V†U and UV† = U·(V†U)·U† have the same spectrum; a change at the end of the circuits is
	// local in the second, one at the start in the first. Use the one that splits finer.
	t, err := NewTableau(u.Clone().Compose(v.Inverse()))
	if err != nil {
		return r, err
	}
	classes := t.factors()
	t2, err := NewTableau(v.Inverse().Compose(u))
	if err != nil {
		return r, err
	}
	if c2 := t2.factors(); largest(c2) < largest(classes) {
		t, classes = t2, c2
	}
	n := t.n
	exact := true
	var spectra [][]float64
	for _, qs := range classes {
		r.Largest = max(r.Largest, len(qs))
		if len(qs) > maxCliffordFactor {
			exact = false
			continue
		}
		w := t.factorMatrix(qs)
		if w == nil {
			exact = false
			continue
		}
		ph := metric.Eigenphases(w)
		spectra = append(spectra, ph)
		if d, ok := metric.TensorPhaseDistance(ph); ok {
			r.Lower = max(r.Lower, d)
		}
	}
	if exact {
		if d, ok := metric.TensorPhaseDistance(spectra...); ok {
			r.Exact, r.Known, r.Lower = d, true, d
			return r, nil
		}
	}
	for q := range n {
		for _, pair := range [][2]Pauli{{PauliX(n, q), t.ImageX(q)}, {PauliZ(n, q), t.ImageZ(q)}} {
			p, img := pair[0], pair[1]
			switch {
			case img.Equal(p):
			case p.Anticommutes(img):
				r.Lower = max(r.Lower, 1/math.Sqrt2)
			default:
				r.Lower = max(r.Lower, 1)
			}
		}
	}
	return r, nil
}

func largest(classes [][]int) int {
	m := 0
	for _, c := range classes {
		m = max(m, len(c))
	}
	return m
}

// factors returns the classes of qubits that the images of X_q and Z_q join, each sorted.
func (t *Tableau) factors() [][]int {
	parent := make([]int, t.n)
	for i := range parent {
		parent[i] = i
	}
	find := func(x int) int {
		for parent[x] != x {
			parent[x] = parent[parent[x]]
			x = parent[x]
		}
		return x
	}
	for q := range t.n {
		for _, img := range []Pauli{t.ImageX(q), t.ImageZ(q)} {
			for w := range img.x {
				m := img.x[w] | img.z[w]
				for m != 0 {
					p := w*64 + bits.TrailingZeros64(m)
					m &= m - 1
					parent[find(p)] = find(q)
				}
			}
		}
	}
	index := map[int]int{}
	var out [][]int
	for q := range t.n {
		r := find(q)
		i, ok := index[r]
		if !ok {
			i = len(out)
			index[r] = i
			out = append(out, nil)
		}
		out[i] = append(out[i], q)
	}
	return out
}

// localPauli is a Pauli string restricted to k qubits, qubit j of the factor being bit j:
// P|i⟩ = phase·(−1)^{|i ∧ z|}·|i ⊕ x⟩, with phase = ±i^{#Y}.
type localPauli struct {
	x, z  int
	phase complex128
}

func (t *Tableau) local(p Pauli, qs []int) localPauli {
	var lp localPauli
	ys := 0
	for j, q := range qs {
		xb := p.x[q/64]>>uint(q%64)&1 == 1
		zb := p.z[q/64]>>uint(q%64)&1 == 1
		if xb {
			lp.x |= 1 << j
		}
		if zb {
			lp.z |= 1 << j
		}
		if xb && zb {
			ys++
		}
	}
	lp.phase = []complex128{1, 1i, -1, -1i}[ys%4]
	if p.neg {
		lp.phase = -lp.phase
	}
	return lp
}

// apply returns P·s.
func (p localPauli) apply(s []complex128) []complex128 {
	out := make([]complex128, len(s))
	for i, a := range s {
		if a == 0 {
			continue
		}
		v := p.phase * a
		if bits.OnesCount(uint(i&p.z))%2 == 1 {
			v = -v
		}
		out[i^p.x] = v
	}
	return out
}

// factorMatrix builds the 2^k × 2^k unitary of the factor of the tableau's Clifford on qubits qs
// (qs[0] the least significant bit), up to a global phase, or returns nil if no stabilizer state
// was found (which a valid tableau never causes).
func (t *Tableau) factorMatrix(qs []int) *mat.CDense {
	k := len(qs)
	dim := 1 << k
	xs := make([]localPauli, k)
	zs := make([]localPauli, k)
	for j, q := range qs {
		xs[j] = t.local(t.ImageX(q), qs)
		zs[j] = t.local(t.ImageZ(q), qs)
	}
	var psi []complex128
	for y := 0; y < dim && psi == nil; y++ {
		s := make([]complex128, dim)
		s[y] = 1
		for _, st := range zs {
			ps := st.apply(s)
			for i := range s {
				s[i] = (s[i] + ps[i]) / 2
			}
		}
		var norm float64
		for _, a := range s {
			norm += real(a)*real(a) + imag(a)*imag(a)
		}
		if norm > 1e-6 {
			f := complex(1/math.Sqrt(norm), 0)
			for i := range s {
				s[i] *= f
			}
			psi = s
		}
	}
	if psi == nil {
		return nil
	}
	m := mat.NewCDense(dim, dim, nil)
	for x := range dim {
		col := psi
		for j := range k {
			if x>>j&1 == 1 {
				col = xs[j].apply(col)
			}
		}
		for i, a := range col {
			m.Set(i, x, a)
		}
	}
	return m
}

package qcheck

import (
	"math"
	"math/rand/v2"
)

// randomInputs is how many fixed pseudo-random input states a measured comparison tries besides
// the basis states and the witness.
const randomInputs = 4

// distributions compares the output distributions of measuring the measured qubits, from every
// allowed basis input, the witness and a few fixed random inputs. It returns the largest
// total-variation distance found and the input and outcome whose probabilities differ most.
// Outcomes are bit strings over the measured qubits, measured[0] as the least-significant bit.
func (p *densePair) distributions(witness []complex128) (float64, Measurement) {
	meas := p.f.measured
	outcomes := 1 << len(meas)
	pu, pv := make([]float64, outcomes), make([]float64, outcomes)
	worst := 0.0
	gap := newLargestGap()
	consider := func(a, b []complex128, input []complex128, basis int) {
		marginal(a, meas, pu)
		marginal(b, meas, pv)
		tv := 0.0
		for o := range pu {
			tv += math.Abs(pu[o] - pv[o])
			gap.offer(input, basis, o, pu[o], pv[o])
		}
		worst = math.Max(worst, tv/2)
	}
	a, b := make([]complex128, p.dim), make([]complex128, p.dim)
	for x := 0; x < p.dim; x++ {
		if !p.allowed(x) {
			continue
		}
		for y := 0; y < p.dim; y++ {
			a[y], b[y] = p.ud[y*p.dim+x], p.vd[y*p.dim+x]
		}
		consider(a, b, nil, x)
	}
	gap.fillBasisInput(p.dim)
	inputs := [][]complex128{witness}
	rng := rand.New(rand.NewPCG(1, 2))
	for k := 0; k < randomInputs; k++ {
		inputs = append(inputs, p.randomInput(rng))
	}
	for _, psi := range inputs {
		if psi != nil {
			consider(apply(p.ud, p.dim, psi), apply(p.vd, p.dim, psi), psi, -1)
		}
	}
	return worst, gap.best
}

// marginal writes into probs the distribution of measuring the given qubits of state.
func marginal(state []complex128, qubits []int, probs []float64) {
	for o := range probs {
		probs[o] = 0
	}
	for y, z := range state {
		o := 0
		for i, q := range qubits {
			o |= (y >> q & 1) << i
		}
		probs[o] += abs2(z)
	}
}

// randomInput returns a normalised state with independent Gaussian amplitudes on the allowed
// basis states: a fixed, reproducible probe in general position.
func (p *densePair) randomInput(rng *rand.Rand) []complex128 {
	psi := make([]complex128, p.dim)
	norm := 0.0
	for x := range psi {
		if p.allowed(x) {
			psi[x] = complex(rng.NormFloat64(), rng.NormFloat64())
			norm += abs2(psi[x])
		}
	}
	norm = math.Sqrt(norm)
	for x := range psi {
		psi[x] /= complex(norm, 0)
	}
	return psi
}

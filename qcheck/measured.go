package qcheck

import (
	"math"
	"math/rand/v2"

	"qcheck.dev/metric"
)

// randomInputs is how many fixed pseudo-random input states a measured comparison tries for its
// lower bound, besides the basis states, the witness and the input metric.DistributionGap builds.
const randomInputs = 4

// distributions bounds the largest total-variation distance, over every allowed input, between
// the outcome distributions of want and got (see frame.measured for what an outcome is). It
// returns a certified upper bound (metric.DistributionGap, from the part of U·V† that moves
// probability between outcomes) and a lower bound: the largest total-variation distance on the
// inputs tried (every allowed basis input, the witness, a few fixed random inputs and the input
// DistributionGap builds), each computed directly from both unitaries, with the input and outcome
// whose probabilities differ most. Outcomes are bit strings, outcome bit 0 least significant.
func (p *densePair) distributions(witness []complex128) (lower, upper float64, best Measurement) {
	mw, mg := p.f.measuredWant, p.f.measured
	outcomes := 1 << len(mg)
	pu, pv := make([]float64, outcomes), make([]float64, outcomes)
	largest := newLargestGap()
	consider := func(a, b []complex128, input []complex128, basis int) {
		marginal(a, mw, pu)
		marginal(b, mg, pv)
		tv := 0.0
		for o := range pu {
			tv += math.Abs(pu[o] - pv[o])
			largest.offer(input, basis, o, pu[o], pv[o])
		}
		lower = math.Max(lower, tv/2)
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
	largest.fillBasisInput(p.dim)
	outU, outV := make([]int, p.dim), make([]int, p.dim)
	for z := range outU {
		outU[z], outV[z] = outcomeOf(z, mw), outcomeOf(z, mg)
	}
	gap := metric.DistributionGap(p.u, p.v, outU, outV)
	inputs := [][]complex128{witness}
	if !p.f.clean { // DistributionGap's input may put ancillas outside |0⟩
		inputs = append(inputs, gap.Input)
	}
	rng := rand.New(rand.NewPCG(1, 2))
	for k := 0; k < randomInputs; k++ {
		inputs = append(inputs, p.randomInput(rng))
	}
	for _, psi := range inputs {
		if psi != nil {
			consider(apply(p.ud, p.dim, psi), apply(p.vd, p.dim, psi), psi, -1)
		}
	}
	return lower, math.Max(gap.Upper, lower), largest.best
}

// outcomeOf returns the outcome that basis state z reads as when outcome bit i is the value of
// qubit qubits[i], or 0 where qubits[i] is −1.
func outcomeOf(z int, qubits []int) int {
	o := 0
	for i, q := range qubits {
		if q >= 0 {
			o |= (z >> q & 1) << i
		}
	}
	return o
}

// marginal writes into probs the distribution of the outcome of state, read as outcomeOf does.
func marginal(state []complex128, qubits []int, probs []float64) {
	for o := range probs {
		probs[o] = 0
	}
	for y, z := range state {
		probs[outcomeOf(y, qubits)] += abs2(z)
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

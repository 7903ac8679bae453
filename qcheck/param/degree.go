package param

import (
	"fmt"
	"math"
	"math/big"
)

// angleFrequency gives, for each gate of the standard library with angles, twice the frequency
// with which each angle enters the gate's matrix: every entry is a combination of e^{i·m·h·φ}
// for integers m with |m·h| ≤ h, where h is half the listed number. Rotations use half angles
// (cos(θ/2), e^{±iθ/2}: h = 1/2); p, cp and the φ, λ angles of u use whole ones (e^{iλ}: h = 1).
// The tests check every entry against the gate matrices of package circuit.
var angleFrequency = map[string][]int64{
	"rx": {1}, "ry": {1}, "rz": {1},
	"crx": {1}, "cry": {1}, "crz": {1},
	"rxx": {1}, "ryy": {1}, "rzz": {1},
	"p": {2}, "cp": {2},
	"u": {1, 2, 2},
}

// Limits on the scale and degree of a parameter, far above what a rewrite rule needs; they keep
// a coefficient such as 1/1000003 from asking for a grid nobody can evaluate.
const (
	maxScale  = 1 << 20
	maxDegree = 1 << 20
)

// Degree describes how one parameter θ enters a pair of circuits. With θ = Scale·t, every entry
// of V(θ)†U(θ) is a trigonometric polynomial in t with integer frequencies of absolute value at
// most Degree, so the conditions Prove checks are too; 2·Degree+1 equally spaced values of t in
// one period [0, 2π), that is of θ in [0, 2π·Scale), determine them.
type Degree struct {
	Name   string // the parameter
	Scale  int64  // L: the least common denominator of the frequencies h·c of θ's occurrences
	Degree int    // D = L·Σ h·|c| over every angle of both circuits in which θ occurs
}

// Points returns 2·Degree+1, the number of grid values Prove uses for this parameter.
func (d Degree) Points() int { return 2*d.Degree + 1 }

// Period returns 2π·Scale, the period in θ of every entry of V†U.
func (d Degree) Period() float64 { return 2 * math.Pi * float64(d.Scale) }

// degrees works out the Degree of every parameter of the pair, sorted by name.
func degrees(names []string, circuits ...*Circuit) ([]Degree, error) {
	out := make([]Degree, len(names))
	for i, name := range names {
		lcm := big.NewInt(1)
		sum := new(big.Rat)
		for _, c := range circuits {
			for n, op := range c.Ops {
				for k, a := range op.Angles {
					coef := a.Coef(name)
					if coef.Sign() == 0 {
						continue
					}
					freq, ok := angleFrequency[op.Gate.Name]
					if !ok || k >= len(freq) {
						return nil, fmt.Errorf("param: op %d (%s): the frequencies of its angles are not known", n, op.Gate.Name)
					}
					hc := new(big.Rat).Mul(coef, big.NewRat(freq[k], 2))
					hc.Abs(hc)
					sum.Add(sum, hc)
					g := new(big.Int).GCD(nil, nil, lcm, hc.Denom())
					lcm.Mul(lcm, new(big.Int).Quo(hc.Denom(), g))
					if lcm.Cmp(big.NewInt(maxScale)) > 0 {
						return nil, fmt.Errorf("param: parameter %s: the denominators of its coefficients need a scale above %d", name, maxScale)
					}
				}
			}
		}
		deg := new(big.Rat).Mul(sum, new(big.Rat).SetInt(lcm))
		if !deg.IsInt() || deg.Num().Cmp(big.NewInt(maxDegree)) > 0 {
			return nil, fmt.Errorf("param: parameter %s: degree %s is above the limit %d", name, deg.RatString(), maxDegree)
		}
		out[i] = Degree{Name: name, Scale: lcm.Int64(), Degree: int(deg.Num().Int64())}
	}
	return out, nil
}

// lebesgue returns an upper bound on the Lebesgue constant Λ_D of trigonometric interpolation at
// N = 2D+1 equally spaced points: max over t of Σ_j |K(t − t_j)| with the normalized Dirichlet
// kernel K(s) = sin(Ns/2) / (N sin(s/2)). The bound 2 + H_D (H_D the D-th harmonic number) is
// derived in the package documentation; Λ_0 = 1.
func lebesgue(d int) float64 {
	if d == 0 {
		return 1
	}
	h := 0.0
	for k := d; k >= 1; k-- {
		h += 1 / float64(k)
	}
	return 2 + h
}

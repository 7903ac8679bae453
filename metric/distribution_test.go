package metric

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/mat"
)

// distributionCase is one pair of testdata/metric/distribution.json.gz, made by NumPy
// (testdata/metric/distribution.py): the exact largest total-variation distance over all inputs
// (by eigenvalues of sums of outcome operators over every subset of outcomes) and the operator
// norm of the off-block part of U·V† (by SVD).
type distributionCase struct {
	Qubits   int       `json:"qubits"`
	Measured []int     `json:"measured"`
	Eps      float64   `json:"eps"`
	URe      []float64 `json:"u_re"`
	UIm      []float64 `json:"u_im"`
	VRe      []float64 `json:"v_re"`
	VIm      []float64 `json:"v_im"`
	MaxTV    float64   `json:"max_tv"`
	Leak     float64   `json:"leak"`
}

func complexMatrix(d int, re, im []float64) *mat.CDense {
	data := make([]complex128, d*d)
	for i := range data {
		data[i] = complex(re[i], im[i])
	}
	return mat.NewCDense(d, d, data)
}

// DistributionGap against NumPy on random near-block-diagonal pairs: Lower ≤ the exact largest
// total-variation distance ≤ Upper, Leak ≥ the exact off-block norm, and the bounds within a
// factor 2 of the truth (common practice for a first-order bound; the doc comment explains why it
// is first order).
func TestDistributionGapAgainstNumPy(t *testing.T) {
	var ref struct {
		Provenance string
		Cases      []distributionCase
	}
	readGzipJSON(t, "../testdata/metric/distribution.json.gz", &ref)
	if len(ref.Cases) < 30 {
		t.Fatalf("only %d cases", len(ref.Cases))
	}
	for i, c := range ref.Cases {
		d := 1 << c.Qubits
		u, v := complexMatrix(d, c.URe, c.UIm), complexMatrix(d, c.VRe, c.VIm)
		out := make([]int, d)
		for z := range out {
			for k, q := range c.Measured {
				out[z] |= (z >> q & 1) << k
			}
		}
		g := DistributionGap(u, v, out, out)
		const slack = 1e-13
		if g.Lower > c.MaxTV+slack || g.Upper < c.MaxTV-slack || g.Leak < c.Leak-slack {
			t.Errorf("case %d (%d qubits, measured %v, ε %g): lower %.6g, upper %.6g, leak %.6g; NumPy: max TV %.6g, leak %.6g",
				i, c.Qubits, c.Measured, c.Eps, g.Lower, g.Upper, g.Leak, c.MaxTV, c.Leak)
		}
		if c.MaxTV > 1e-7 && (g.Upper > 2*c.MaxTV || g.Lower < c.MaxTV/2) {
			t.Errorf("case %d (%d qubits, measured %v, ε %g): bounds [%.6g, %.6g] not within a factor 2 of NumPy's %.6g",
				i, c.Qubits, c.Measured, c.Eps, g.Lower, g.Upper, c.MaxTV)
		}
		if math.IsNaN(g.Upper) || len(g.Input) != d {
			t.Errorf("case %d: upper %v, input of length %d", i, g.Upper, len(g.Input))
		}
	}
}

package metric

import (
	"compress/gzip"
	"encoding/json"
	"math"
	"math/cmplx"
	"os"
	"testing"

	"gonum.org/v1/gonum/mat"
)

// reference is testdata/metric/reference.json.gz, made by
// testdata/metric/make_reference.py with NumPy and SciPy (versions in its
// provenance field): brute-force minima over φ of SVD norms, eigenvalues from
// numpy.linalg.eigvals, and the other values described in the script.
type reference struct {
	Provenance     map[string]any `json:"provenance"`
	Random         []pairValues   `json:"random"`
	Adversarial    []pairValues   `json:"adversarial"`
	OperatorNorms  []normValue    `json:"operator_norms"`
	TraceDistances []traceValue   `json:"trace_distances"`
}

type pairValues struct {
	Name            string       `json:"name"`
	N               int          `json:"n"`
	U               [][2]float64 `json:"u"`
	V               [][2]float64 `json:"v"`
	Eigenphases     []float64    `json:"eigenphases"`
	Distance        float64      `json:"distance"`
	PhaseDistance   float64      `json:"phase_distance"`
	Diamond         float64      `json:"diamond"`
	AverageFidelity float64      `json:"average_fidelity"`
	ProcessFidelity float64      `json:"process_fidelity"`
}

type normValue struct {
	Rows, Cols int
	A          [][2]float64 `json:"a"`
	Norm       float64      `json:"norm"`
}

type traceValue struct {
	N             int          `json:"n"`
	Rho           [][2]float64 `json:"rho"`
	Sigma         [][2]float64 `json:"sigma"`
	TraceDistance float64      `json:"trace_distance"`
}

func loadReference(t *testing.T) reference {
	t.Helper()
	var r reference
	readGzipJSON(t, "../testdata/metric/reference.json.gz", &r)
	if len(r.Random) < 50 || len(r.Adversarial) < 20 {
		t.Fatalf("reference holds %d random and %d adversarial pairs, want at least 50 and 20", len(r.Random), len(r.Adversarial))
	}
	return r
}

// readGzipJSON decodes the gzipped JSON file at path into v, failing the test on any error.
func readGzipJSON(t *testing.T, path string, v any) {
	t.Helper()
	f, err := os.Open(path)
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	z, err := gzip.NewReader(f)
	if err != nil {
		t.Fatal(err)
	}
	if err := json.NewDecoder(z).Decode(v); err != nil {
		t.Fatalf("%s: %v", path, err)
	}
}

func unpack(r, c int, data [][2]float64) *mat.CDense {
	m := mat.NewCDense(r, c, nil)
	for i := 0; i < r; i++ {
		for j := 0; j < c; j++ {
			x := data[i*c+j]
			m.Set(i, j, complex(x[0], x[1]))
		}
	}
	return m
}

// Agreement with NumPy/SciPy to 1e-10 on every pair (issue 3).
func TestReferencePairs(t *testing.T) {
	const tol = 1e-10
	ref := loadReference(t)
	pairs := append(append([]pairValues(nil), ref.Random...), ref.Adversarial...)
	for _, p := range pairs {
		u, v := unpack(p.N, p.N, p.U), unpack(p.N, p.N, p.V)
		check := func(what string, got, want float64) {
			if math.Abs(got-want) > tol || math.IsNaN(got) {
				t.Errorf("%s: %s = %.17g, NumPy/SciPy %.17g (differ by %.3g)", p.Name, what, got, want, math.Abs(got-want))
			}
		}
		check("Distance", Distance(u, v), p.Distance)
		check("PhaseDistance", PhaseDistance(u, v), p.PhaseDistance)
		check("Diamond", Diamond(u, v), p.Diamond)
		check("AverageFidelity", AverageFidelity(u, v), p.AverageFidelity)
		check("ProcessFidelity", ProcessFidelity(u, v), p.ProcessFidelity)
		if e := phaseError(Eigenphases(mul(adjoint(v), u)), p.Eigenphases); e > tol {
			t.Errorf("%s: eigenphases of v†u differ from numpy.linalg.eigvals by %.3g", p.Name, e)
		}
		// The phase PhaseAlign returns attains the reference minimum.
		_, phase := PhaseAlign(u, v)
		check("‖u − e^{iφ}v‖ at PhaseAlign's φ", Distance(u, scale(cmplx.Exp(complex(0, phase)), v)), p.PhaseDistance)
		// The witness deviation is the reference minimum capped at √2.
		_, dist := Witness(u, v)
		check("Witness deviation", dist, math.Min(p.PhaseDistance, math.Sqrt2))
	}
}

func TestReferenceNorms(t *testing.T) {
	ref := loadReference(t)
	for _, r := range ref.OperatorNorms {
		got := OperatorNorm(unpack(r.Rows, r.Cols, r.A))
		if math.Abs(got-r.Norm) > 1e-10*r.Norm {
			t.Errorf("OperatorNorm of a %d×%d matrix = %.17g, numpy.linalg.norm(a, 2) = %.17g", r.Rows, r.Cols, got, r.Norm)
		}
	}
	for _, r := range ref.TraceDistances {
		got := TraceDistance(unpack(r.N, r.N, r.Rho), unpack(r.N, r.N, r.Sigma))
		if math.Abs(got-r.TraceDistance) > 1e-10 {
			t.Errorf("TraceDistance of %d×%d density matrices = %.17g, NumPy eigvalsh gives %.17g", r.N, r.N, got, r.TraceDistance)
		}
	}
}

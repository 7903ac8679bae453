package circuit

import (
	"bufio"
	"math"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"
	"qcheck.dev/metric"
)

// angleReference is one line of testdata/circuit/angles.txt: an angle with its offset from the
// nearest multiple of π/2 and its half-angle cosine and sine, computed by mpmath at 2,000 bits
// (testdata/circuit/angles.py) and rounded once to float64.
type angleReference struct {
	x, offset, cos, sin float64
	k                   int
}

func readAngleReferences(t *testing.T) []angleReference {
	t.Helper()
	f, err := os.Open(filepath.Join("..", "..", "testdata", "circuit", "angles.txt"))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	var out []angleReference
	sc := bufio.NewScanner(f)
	for sc.Scan() {
		line := sc.Text()
		if strings.HasPrefix(line, "#") {
			continue
		}
		fs := strings.Fields(line)
		if len(fs) != 5 {
			t.Fatalf("angles.txt: bad line %q", line)
		}
		var r angleReference
		var v [4]float64
		for i, j := range []int{0, 2, 3, 4} {
			if v[i], err = strconv.ParseFloat(fs[j], 64); err != nil {
				t.Fatalf("angles.txt: %v", err)
			}
		}
		r.x, r.offset, r.cos, r.sin = v[0], v[1], v[2], v[3]
		if r.k, err = strconv.Atoi(fs[1]); err != nil {
			t.Fatalf("angles.txt: %v", err)
		}
		out = append(out, r)
	}
	if len(out) < 50 {
		t.Fatalf("angles.txt: only %d angles", len(out))
	}
	return out
}

// Offsets from multiples of π/2 against mpmath at 2,000 bits: the multiple mod 8 exactly, the
// offset to within one ulp (both sides round the exact offset once).
func TestQuarterTurnsAgainstMpmath(t *testing.T) {
	for _, r := range readAngleReferences(t) {
		k, off := QuarterTurns(r.x)
		if k != r.k {
			t.Errorf("QuarterTurns(%v): K mod 8 = %d, mpmath %d", r.x, k, r.k)
		}
		if d := math.Abs(off - r.offset); d > ulp(r.offset) {
			t.Errorf("QuarterTurns(%v): offset %v, mpmath %v (difference %.3g)", r.x, off, r.offset, d)
		}
	}
}

func ulp(x float64) float64 {
	return math.Nextafter(math.Abs(x), math.Inf(1)) - math.Abs(x)
}

// Issue 17 (reproducers 1 and 3): the gate matrix of an angle of any finite size is the matrix of
// that exact angle. rz(x) = diag(e^{−ix/2}, e^{ix/2}) (N&C eq. 4.6) against mpmath's cos(x/2) and
// sin(x/2); u(x, x, x) is finite and unitary, where φ+λ once overflowed to NaN.
func TestLargeAngleMatrices(t *testing.T) {
	for _, r := range readAngleReferences(t) {
		m := Gate{Name: "rz", Params: []float64{r.x}}.Elements()
		want := complex(r.cos, r.sin)
		if d := cmplxAbs(m[3] - want); d > 4e-16 {
			t.Errorf("rz(%v)[1][1] = %v, mpmath e^{ix/2} = %v (off by %.3g)", r.x, m[3], want, d)
		}
		u := Gate{Name: "u", Params: []float64{r.x, r.x, r.x}}.Elements()
		for i, z := range u {
			if math.IsNaN(real(z)) || math.IsNaN(imag(z)) {
				t.Fatalf("u(%v, %v, %v)[%d] is NaN", r.x, r.x, r.x, i)
			}
		}
		if e := metric.UnitarityDeviation(mat.NewCDense(2, 2, u)); e > 1e-14 {
			t.Errorf("u(%v, %v, %v) is %.3g from unitary", r.x, r.x, r.x, e)
		}
	}
}

func cmplxAbs(z complex128) float64 { return math.Hypot(real(z), imag(z)) }

package param

import (
	"fmt"
	"math"
	"math/cmplx"
	"testing"

	"pgregory.net/rapid"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// dft returns the discrete Fourier coefficients c_m = (1/N)·Σ_j f_j·e^{−2πimj/N} of N samples,
// for m = 0, …, N−1 (m > N/2 stands for m − N).
func dft(f []complex128) []complex128 {
	n := len(f)
	root := make([]complex128, n) // e^{−2πik/N}
	for k := range root {
		root[k] = cmplx.Exp(complex(0, -2*math.Pi*float64(k)/float64(n)))
	}
	out := make([]complex128, n)
	for m := range n {
		var s complex128
		for j, x := range f {
			s += x * root[m*j%n]
		}
		out[m] = s / complex(float64(n), 0)
	}
	return out
}

// signedFrequency maps a DFT index to its frequency in (−N/2, N/2].
func signedFrequency(m, n int) int {
	if m > n/2 {
		return m - n
	}
	return m
}

func TestAngleFrequencies(t *testing.T) {
	// Every gate of the library with angles has an entry, and its matrices, sampled with the
	// angle φ = 2t over t ∈ [0, 2π), contain only the frequencies 0 and ±freq[k] in t (that is,
	// e^{±i·h·φ} with h = freq[k]/2), the largest of them with a nonzero coefficient. The
	// matrices are those of package circuit, written from Nielsen & Chuang §4.2–4.3.
	const n = 32
	for _, spec := range circuit.Standard() {
		if spec.Params == 0 {
			continue
		}
		freq, ok := angleFrequency[spec.Name]
		if !ok || len(freq) != spec.Params {
			t.Errorf("%s: angleFrequency has %v for %d angle(s)", spec.Name, freq, spec.Params)
			continue
		}
		for k := range spec.Params {
			samples := make([][]complex128, 1<<(2*spec.Qubits))
			for j := range n {
				params := []float64{0.7, -1.3, 2.1}[:spec.Params]
				params[k] = 2 * 2 * math.Pi * float64(j) / n
				g, err := circuit.NewGate(spec.Name, params...)
				if err != nil {
					t.Fatal(err)
				}
				for e, x := range g.Elements() {
					samples[e] = append(samples[e], x)
				}
			}
			top := 0.0
			for e := range samples {
				for m, x := range dft(samples[e]) {
					f := signedFrequency(m, n)
					switch {
					case f == int(freq[k]) || f == -int(freq[k]):
						top = math.Max(top, cmplx.Abs(x))
					case f != 0 && cmplx.Abs(x) > 1e-13:
						t.Errorf("%s angle %d: entry %d has frequency %d in t (coefficient %g), outside {0, ±%d}", spec.Name, k+1, e, f, cmplx.Abs(x), freq[k])
					}
				}
			}
			if top < 0.1 {
				t.Errorf("%s angle %d: no entry reaches frequency ±%d; the table overstates it", spec.Name, k+1, freq[k])
			}
		}
	}
}

// drawCircuit draws a parametric circuit on two qubits whose angles are small rational
// combinations of the given parameters plus a constant.
func drawCircuit(t *rapid.T, label string, names []string, maxOps int) *Circuit {
	c := New(2)
	gates := []string{"rz", "rx", "ry", "p", "u", "cp", "crz", "cry", "rzz", "rxx", "cx", "h"}
	for i := range rapid.IntRange(1, maxOps).Draw(t, label+" ops") {
		name := rapid.SampledFrom(gates).Draw(t, fmt.Sprintf("%s gate %d", label, i))
		spec, _ := circuit.Lookup(name)
		angles := make([]Expr, spec.Params)
		for k := range angles {
			e := Const(rapid.Float64Range(-4, 4).Draw(t, "constant"))
			for _, n := range names {
				num := rapid.Int64Range(-3, 3).Draw(t, "numerator")
				den := rapid.Int64Range(1, 3).Draw(t, "denominator")
				e = e.Plus(Var(n).Times(num, den))
			}
			angles[k] = e
		}
		q := rapid.IntRange(0, 1).Draw(t, "qubit")
		qubits := []int{q}
		if spec.Qubits == 2 {
			qubits = append(qubits, 1-q)
		}
		c.Gate(circuit.Gate{Name: name}, angles, qubits...)
	}
	return c
}

// product returns V†U, computed here from the dense engine.
func product(t *rapid.T, left, right *Circuit, v Values) []complex128 {
	lc, err := left.Bind(v)
	if err != nil {
		t.Fatal(err)
	}
	rc, err := right.Bind(v)
	if err != nil {
		t.Fatal(err)
	}
	u, err := sim.Unitary(lc)
	if err != nil {
		t.Fatal(err)
	}
	w, err := sim.Unitary(rc)
	if err != nil {
		t.Fatal(err)
	}
	n, _ := u.Dims()
	m := make([]complex128, n*n)
	for i := range n {
		for j := range n {
			for k := range n {
				m[i*n+j] += cmplx.Conj(w.At(k, i)) * u.At(k, j)
			}
		}
	}
	return m
}

func TestDegreeBoundBruteForce(t *testing.T) {
	// The stated degrees against brute force: V(θ)†U(θ) from the dense engine on a fine grid of
	// one parameter θ_k = L_k·t (the others fixed at drawn values), and its discrete Fourier
	// transform in t. If L_k were too small the entries would not be 2π-periodic in t and every
	// frequency would leak; if D_k were too small a coefficient above it would show.
	names := []string{"a", "b"}
	rapid.Check(t, func(rt *rapid.T) {
		left, right := drawCircuit(rt, "left", names, 5), drawCircuit(rt, "right", names, 5)
		p, err := newPair(left, right, false)
		if err != nil {
			rt.Fatal(err)
		}
		for k, d := range p.degrees {
			n := 4*d.Degree + 8
			fixed := Values{}
			for _, name := range names {
				fixed[name] = rapid.Float64Range(-10, 10).Draw(rt, "fixed "+name)
			}
			var samples [][]complex128
			for j := range n {
				fixed[p.names[k]] = float64(d.Scale) * 2 * math.Pi * float64(j) / float64(n)
				m := product(rt, left, right, fixed)
				if samples == nil {
					samples = make([][]complex128, len(m))
				}
				for e, x := range m {
					samples[e] = append(samples[e], x)
				}
			}
			for e := range samples {
				for m, x := range dft(samples[e]) {
					if f := signedFrequency(m, n); (f > d.Degree || f < -d.Degree) && cmplx.Abs(x) > 1e-12 {
						rt.Fatalf("%s (scale %d, degree %d): entry %d has frequency %d with coefficient %g\nleft:\n%vright:\n%v",
							d.Name, d.Scale, d.Degree, e, f, cmplx.Abs(x), left, right)
					}
				}
			}
		}
	})
}

func TestLebesgueBound(t *testing.T) {
	// The bound 2 + H_D of the package doc against the Lebesgue constant computed by brute force:
	// max over a fine grid of t of Σ_j |K(t − s_j)| with the Dirichlet kernel. The bound must hold
	// and be at most twice the constant (it is 3.5 against 1.99 at D = 2, 6.3 against 3.7 at
	// D = 40).
	for d := 0; d <= 40; d++ {
		n := 2*d + 1
		kernel := func(s float64) float64 {
			den := float64(n) * math.Sin(s/2)
			if math.Abs(den) < 1e-300 {
				return 1
			}
			return math.Sin(float64(n)*s/2) / den
		}
		worst := 0.0
		steps := 64 * n
		for i := range steps {
			x := 2 * math.Pi * float64(i) / float64(steps)
			sum := 0.0
			for j := range n {
				sum += math.Abs(kernel(x - 2*math.Pi*float64(j)/float64(n)))
			}
			worst = math.Max(worst, sum)
		}
		if b := lebesgue(d); worst > b || b > 2*worst {
			t.Errorf("D = %d: Lebesgue constant %.6f, bound %.6f", d, worst, b)
		}
	}
}

func TestBoundIsCertified(t *testing.T) {
	// Result.Bound bounds the distance at every value: pairs that differ by a drawn constant
	// shift of one angle (so most are not equal), against the dense engine at random values far
	// outside one period.
	names := []string{"a", "b"}
	rapid.Check(t, func(rt *rapid.T) {
		left := drawCircuit(rt, "left", names, 2)
		right := New(2)
		right.Ops = append(right.Ops, left.Ops...)
		shift := rapid.Float64Range(-12, -2).Draw(rt, "log10 shift")
		at := rapid.IntRange(0, left.Len()-1).Draw(rt, "shifted op")
		if len(right.Ops[at].Angles) > 0 {
			op := right.Ops[at]
			op.Angles = append([]Expr(nil), op.Angles...)
			op.Angles[0] = op.Angles[0].Plus(Const(math.Pow(10, shift)))
			right.Ops[at] = op
		}
		res, err := Prove(left, right, Options{})
		if err != nil {
			rt.Fatal(err)
		}
		if res.Method != Grid {
			// A grid above DefaultMaxPoints: no bound is claimed.
			if !math.IsInf(res.Bound, 1) || res.Verdict == Proved {
				rt.Fatalf("random method with %v", res)
			}
			return
		}
		for range 20 {
			v := Values{"a": rapid.Float64Range(-100, 100).Draw(rt, "a"), "b": rapid.Float64Range(-100, 100).Draw(rt, "b")}
			d, err := distanceAt(left, right, v, false)
			if err != nil {
				rt.Fatal(err)
			}
			if d > res.Bound {
				rt.Fatalf("distance %g at %v above the certified bound %g", d, v, res.Bound)
			}
			if d > res.Tolerance && res.Verdict == Proved {
				rt.Fatalf("proved, but the distance at %v is %g", v, d)
			}
		}
	})
}

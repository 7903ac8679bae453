package gen

import (
	"flag"
	"math"
	"slices"
	"strconv"
	"testing"

	"gonum.org/v1/gonum/mat"
	"pgregory.net/rapid"
)

// Shared machinery of the statistical tests.
//
// Every statistical test in this package fixes its seeds, so a run is
// reproducible, and is built so that a correct sampler fails it with
// probability at most 1e-6 over the choice of seeds (written beside each
// test). When one test makes several checks it splits that budget evenly
// among them (Bonferroni).

// falseFailure is the false-failure probability allowed per test function.
const falseFailure = 1e-6

// long selects larger samples for the statistical tests, for a thorough run:
//
//	go test ./gen/ -run 'Law|Moments|Uniform' -gen.long
var long = flag.Bool("gen.long", false, "run the statistical tests of package gen on larger samples")

// sampleSize returns n, or n times factor with -gen.long.
func sampleSize(n, factor int) int {
	if *long {
		return n * factor
	}
	return n
}

// ksDistance returns the Kolmogorov–Smirnov statistic
// D = sup_x |F_N(x) − F(x)| of the sample against the continuous CDF cdf.
// It sorts sample in place.
func ksDistance(sample []float64, cdf func(float64) float64) float64 {
	slices.Sort(sample)
	n := float64(len(sample))
	var d float64
	for i, x := range sample {
		f := cdf(x)
		d = max(d, float64(i+1)/n-f, f-float64(i)/n)
	}
	return d
}

// ksCritical returns ε with P(D > ε) ≤ alpha for a sample of size n from a
// continuous law: the Dvoretzky–Kiefer–Wolfowitz inequality with Massart's
// constant, P(D > ε) ≤ 2·exp(−2nε²), valid for every n when exp(−2nε²) ≤ 1/2
// (Massart, Ann. Probab. 18 (1990) 1269–1283). It is the leading term of
// Kolmogorov's asymptotic law, so it is tight for the small alphas used here,
// and, unlike the asymptotic law, it needs no large-n argument.
func ksCritical(n int, alpha float64) float64 {
	return math.Sqrt(math.Log(2/alpha) / (2 * float64(n)))
}

// betaOneCDF is the CDF of Beta(1, d−1), 1 − (1 − x)^(d−1) on [0, 1]: the law
// of |U_ij|² for a Haar unitary and of |ψ_i|² for a Haar state of dimension d
// (the squared modulus of one coordinate of a uniform unit vector in C^d;
// Mezzadri 2007 §2, and common knowledge of random matrix theory).
func betaOneCDF(d int) func(float64) float64 {
	return func(x float64) float64 {
		switch {
		case x <= 0:
			return 0
		case x >= 1:
			return 1
		}
		return 1 - math.Pow(1-x, float64(d-1))
	}
}

// normalCritical returns z with P(|Z| > z) = alpha for a standard normal Z.
func normalCritical(alpha float64) float64 {
	return math.Sqrt2 * math.Erfcinv(alpha)
}

// checkSeeded runs rapid.Check with rapid's base seed fixed, so that the
// values drawn, and a statistical verdict on them, repeat from run to run.
func checkSeeded(t *testing.T, seed uint64, prop func(*rapid.T)) {
	t.Helper()
	defer setFlag(t, "rapid.seed", strconv.FormatUint(seed, 10))()
	rapid.Check(t, prop)
}

// drawAll collects n values of g: half through Generator.Example with seeds
// base, base+1, …, and half through Draw inside rapid.Check with a fixed seed,
// so that a test sees values exactly as a property test would.
func drawAll[V any](t *testing.T, g *rapid.Generator[V], n int, base int) (example, checked []V) {
	t.Helper()
	for i := range n {
		example = append(example, g.Example(base+i))
	}
	checks, err := strconv.Atoi(flag.Lookup("rapid.checks").Value.String())
	if err != nil || checks <= 0 {
		t.Fatalf("cannot read -rapid.checks: %v", err)
	}
	if testing.Short() {
		checks /= 5 // rapid.Check runs a fifth of its cases in -short mode
	}
	perCase := (n + checks - 1) / checks
	checkSeeded(t, uint64(base), func(rt *rapid.T) {
		for range perCase {
			checked = append(checked, g.Draw(rt, "value"))
		}
	})
	return example, checked
}

func TestKSCriticalMatchesKolmogorovTail(t *testing.T) {
	// Kolmogorov's limit law: P(√n·D > x) → 2Σ_{k≥1} (−1)^{k−1} e^{−2k²x²}
	// (Kolmogorov 1933; e.g. Feller, An Introduction to Probability Theory,
	// vol. 2). At the critical value for alpha = 1e-6 the series must give
	// alpha back: the terms after the first are below 1e-40.
	const n = 10000
	x := ksCritical(n, falseFailure) * math.Sqrt(n)
	var tail float64
	for k := 1; k <= 5; k++ {
		tail += 2 * math.Pow(-1, float64(k-1)) * math.Exp(-2*float64(k*k)*x*x)
	}
	if math.Abs(tail-falseFailure) > 1e-12 {
		t.Fatalf("Kolmogorov tail at the critical value = %g, want %g", tail, falseFailure)
	}
	// The value for alpha = 1e-6 is √(ln(2e6)/2) = 2.6934 (from memory of the
	// formula, checked by the series above).
	if math.Abs(x-2.6934) > 1e-4 {
		t.Fatalf("√n·ε = %.5f, want 2.6934", x)
	}
}

func TestNormalCritical(t *testing.T) {
	// Two-sided normal quantiles from standard tables (Abramowitz & Stegun,
	// Table 26.1): 1.95996 for 5%, 4.89164 for 1e-6.
	for _, c := range []struct{ alpha, z float64 }{{0.05, 1.959964}, {1e-6, 4.891638}} {
		if z := normalCritical(c.alpha); math.Abs(z-c.z) > 1e-5 {
			t.Errorf("normalCritical(%g) = %.6f, want %.6f", c.alpha, z, c.z)
		}
	}
}

// product returns a·b for complex matrices (gonum's CDense has no product);
// test-only, naive triple loop.
func product(a, b mat.CMatrix) *mat.CDense {
	r, inner := a.Dims()
	_, c := b.Dims()
	p := mat.NewCDense(r, c, nil)
	for i := range r {
		for k := range inner {
			x := a.At(i, k)
			if x == 0 {
				continue
			}
			for j := range c {
				p.Set(i, j, p.At(i, j)+x*b.At(k, j))
			}
		}
	}
	return p
}

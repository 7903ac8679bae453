package synthesis

import (
	"fmt"
	"math"
	"math/rand"
	"strings"
	"testing"
)

// T-count against ε: Dawson & Nielsen (2006) show that the Solovay–Kitaev recursion reaches ε
// with words of length O(log^c(1/ε)), c = ln 5/ln(3/2) ≈ 3.97: each level multiplies the length
// by 5 and raises the error to the power 3/2 (the figure as stated in their paper, from memory).
// The table here measures the mean T-count over random rotations when each stops at the first
// level within ε, as the pass does, and fits ln T = c·ln ln(1/ε) + b by least squares. The
// default run uses the small net and ε down to 1e-3 and checks only that the T-count does not
// fall as ε shrinks; -long uses the scenario's net, 50 rotations and ε down to 1e-6 (its output
// is kept in testdata/synthesis/tcount.txt).
func TestTCountAgainstEpsilon(t *testing.T) {
	net, epsilons, levels, count := smallNet(), []float64{0.1, 0.03, 0.01, 3e-3, 1e-3}, 4, 20
	if *long {
		net, epsilons, levels, count = scenarioNet(), []float64{0.1, 0.03, 0.01, 3e-3, 1e-3, 3e-4, 1e-4, 3e-5, 1e-5, 3e-6, 1e-6}, 7, 50
	}
	r := rand.New(rand.NewSource(42))
	targets := make([]quat, count)
	for i := range targets {
		targets[i] = randomSU2(r)
	}
	var b strings.Builder
	fmt.Fprintf(&b, "net of words up to %d letters (%d operators), %d random rotations\n", net.MaxLength, net.Len(), len(targets))
	fmt.Fprintf(&b, "%-8s %10s %10s %10s %12s\n", "ε", "mean T", "max T", "mean lvl", "worst dist")
	var xs, ys []float64
	tail := 0 // index in xs of the first ε ≤ 1e-3
	prev := 0.0
	for _, eps := range epsilons {
		sumT, maxT, sumL, worst := 0, 0, 0, 0.0
		for _, u := range targets {
			w, d, level := net.approximate(u, eps, levels)
			if d > eps {
				t.Fatalf("ε = %g: no word within ε after %d levels (best %.3g)", eps, levels, d)
			}
			tc := w.tCount()
			sumT += tc
			maxT = max(maxT, tc)
			sumL += level
			worst = math.Max(worst, d)
		}
		mean := float64(sumT) / float64(len(targets))
		fmt.Fprintf(&b, "%-8g %10.1f %10d %10.2f %12.3g\n", eps, mean, maxT, float64(sumL)/float64(len(targets)), worst)
		if mean < prev {
			t.Errorf("ε = %g: mean T-count %.1f fell below %.1f of the larger ε", eps, mean, prev)
		}
		prev = mean
		if eps > 1e-3 {
			tail = len(xs) + 1
		}
		if mean > 0 {
			xs = append(xs, math.Log(math.Log(1/eps)))
			ys = append(ys, math.Log(mean))
		}
	}
	c, _ := leastSquares(xs, ys)
	fmt.Fprintf(&b, "fitted T ~ log^c(1/ε) over all rows: c = %.2f (Dawson & Nielsen 2006: c = ln 5/ln 1.5 ≈ 3.97 for the length)\n", c)
	if len(xs)-tail >= 3 {
		c, _ := leastSquares(xs[tail:], ys[tail:])
		fmt.Fprintf(&b, "fitted over ε ≤ 1e-3 only: c = %.2f\n", c)
	}
	t.Log("\n" + b.String())
}

// leastSquares fits y = c·x + b.
func leastSquares(xs, ys []float64) (c, b float64) {
	n := float64(len(xs))
	var sx, sy, sxx, sxy float64
	for i := range xs {
		sx += xs[i]
		sy += ys[i]
		sxx += xs[i] * xs[i]
		sxy += xs[i] * ys[i]
	}
	c = (n*sxy - sx*sy) / (n*sxx - sx*sx)
	return c, (sy - c*sx) / n
}

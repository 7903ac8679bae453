package gen

import (
	"math"
	"slices"
	"testing"
)

// angleKind classifies an angle drawn by Angle: special (exactly one of
// specialAngles), tiny (0 or ±2π plus ±10^−e, 5 ≤ e ≤ 15) or continuous.
func angleKind(theta float64) int {
	if slices.Contains(specialMagnitudes, math.Abs(theta)) {
		return angleSpecial
	}
	for _, base := range tinyBases {
		delta := math.Abs(theta - base)
		if delta == 0 || delta > 1.5e-5 {
			continue
		}
		// near 2π the offset 10^−15 is rounded to one ulp (8.9e-16)
		if e := -math.Log10(delta); e > 4.7 && e < 15.3 && math.Abs(e-math.Round(e)) < 0.3 {
			return angleTiny
		}
	}
	return angleContinuous
}

func TestAngleMixture(t *testing.T) {
	// The three kinds come with frequencies 4/8, 3/8, 1/8: chi-square with 2
	// degrees of freedom, whose upper quantile is exactly −2·ln(alpha) (the
	// chi-square law with 2 degrees of freedom is exponential with mean 2;
	// e.g. Abramowitz & Stegun 26.4.21). Continuous angles are uniform on
	// (−2π, 2π): KS against the uniform CDF. Four checks (two sources × two
	// tests) at 1e-6/4: false failure ≤ 1e-6 per run. (A continuous angle is
	// misread as tiny with probability about 1e-6 per draw, which moves one
	// count; negligible against the critical value.)
	const n = 8000
	alpha := falseFailure / 4
	example, checked := drawAll(t, Angle(), n, 1)
	for name, sample := range map[string][]float64{"Example": example, "rapid.Check": checked} {
		counts := make([]int, len(angleWeights))
		var continuous []float64
		seen := map[float64]bool{}
		for _, theta := range sample {
			k := angleKind(theta)
			counts[k]++
			switch k {
			case angleSpecial:
				seen[theta] = true
			case angleContinuous:
				continuous = append(continuous, theta)
			}
		}
		var chi2 float64
		for k, w := range angleWeights {
			want := float64(len(sample)) * float64(w) / 8
			chi2 += (float64(counts[k]) - want) * (float64(counts[k]) - want) / want
		}
		if crit := -2 * math.Log(alpha); chi2 > crit {
			t.Errorf("via %s: kinds %v against weights %v: chi-square %.2f > %.2f", name, counts, angleWeights, chi2, crit)
		}
		if len(seen) != 2*len(specialMagnitudes)-1 {
			// each special angle has probability at least 1/28 per draw:
			// missing one in 4000 draws has probability below 1e-60
			t.Errorf("via %s: only %d of the %d special angles appeared", name, len(seen), 2*len(specialMagnitudes)-1)
		}
		uniform := func(x float64) float64 { return math.Min(1, math.Max(0, (x+2*math.Pi)/(4*math.Pi))) }
		if d, eps := ksDistance(continuous, uniform), ksCritical(len(continuous), alpha); d > eps {
			t.Errorf("via %s: continuous angles against uniform(−2π, 2π): KS %.4f > %.4f", name, d, eps)
		}
	}
}

func TestAngleShrinks(t *testing.T) {
	// Toward 0 first, then through the special angles in order.
	if got := shrunk(t, Angle(), func(theta float64) bool { return theta != 0 }); got != math.Pi/4 {
		t.Errorf("smallest nonzero angle shrinks to %v, want π/4", got)
	}
	if got := shrunk(t, Angle(), func(theta float64) bool { return theta >= 1 }); got != math.Pi/2 {
		t.Errorf("an angle ≥ 1 shrinks to %v, want π/2", got)
	}
	if got := shrunk(t, Angle(), func(theta float64) bool { return theta < -3 }); got != -math.Pi {
		t.Errorf("an angle < −3 shrinks to %v, want −π", got)
	}
	// A property only a continuous angle breaks ends on the smallest
	// continuous step.
	fails := func(theta float64) bool { return angleKind(theta) == angleContinuous && theta != 0 }
	if got, want := shrunk(t, Angle(), fails), 2*math.Pi/angleSteps; math.Abs(got-want) > 1e-15*want {
		t.Errorf("a continuous angle shrinks to %v, want the step 2π/%d = %v", got, angleSteps, want)
	}
	// A tiny angle shrinks to 0 + 10^−5.
	if got := shrunk(t, Angle(), func(theta float64) bool { return angleKind(theta) == angleTiny }); got != 1e-5 {
		t.Errorf("a tiny angle shrinks to %v, want 1e-5", got)
	}
}

package gen

import (
	"math"
	"slices"
	"testing"
)

// angleKind classifies an angle drawn by Angle: special (exactly one of
// specialAngles), tiny (a branch point plus ±10^−e, 5 ≤ e ≤ 15) or continuous.
func angleKind(theta float64) int {
	if slices.Contains(specialMagnitudes, math.Abs(theta)) {
		return angleSpecial
	}
	if _, ok := tinyBase(theta); ok {
		return angleTiny
	}
	return angleContinuous
}

// tinyBase returns the branch point a tiny angle is a hair off. Adding 10^−e
// to a base of size at most 4π rounds by at most half an ulp of 4π, below
// 1e-15.
func tinyBase(theta float64) (float64, bool) {
	for _, m := range tinyMagnitudes {
		for _, base := range []float64{m, -m} {
			delta := math.Abs(theta - base)
			for e := 5; e <= 15; e++ {
				if math.Abs(delta-math.Pow(10, -float64(e))) <= 1e-15 {
					return base, true
				}
			}
		}
	}
	return 0, false
}

func TestAngleBranchPoints(t *testing.T) {
	// Every signed branch point is reached by tiny angles, 0 a third of the
	// time and each of the eight others one time in twelve: chi-square with 8
	// degrees of freedom, whose upper tail for an even number 2m of degrees
	// of freedom is e^{−x/2}·Σ_{j<m} (x/2)^j/j! (Abramowitz & Stegun
	// 26.4.21); fail below falseFailure.
	sample, _ := drawAll(t, Angle(), 8000, 3)
	counts := map[float64]int{}
	total := 0
	for _, theta := range sample {
		if base, ok := tinyBase(theta); ok && angleKind(theta) == angleTiny {
			counts[base]++
			total++
		}
	}
	want := map[float64]float64{0: 1.0 / 3}
	for _, m := range tinyMagnitudes[1:5] {
		want[m], want[-m] = 1.0/12, 1.0/12
	}
	chi2 := 0.0
	for base, p := range want {
		e := p * float64(total)
		chi2 += (float64(counts[base]) - e) * (float64(counts[base]) - e) / e
	}
	y := chi2 / 2
	tail := math.Exp(-y) * (1 + y + y*y/2 + y*y*y/6)
	if len(counts) != len(want) || tail < falseFailure {
		t.Errorf("tiny angles by branch point %v (%d in all): chi-square %.2f, upper tail %.3g", counts, total, chi2, tail)
	}
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

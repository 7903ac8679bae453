package catalogue

import (
	"fmt"

	"gonum.org/v1/gonum/stat/distuv"
)

// ClopperPearson returns the exact (Clopper–Pearson) two-sided confidence interval, at the given
// level (0.95 for 95%), for the success probability of a binomial law from k successes in n
// trials:
//
//	lo = B⁻¹(α/2; k, n−k+1),  hi = B⁻¹(1−α/2; k+1, n−k),  α = 1 − level,
//
// where B⁻¹(p; a, b) is the p-quantile of the Beta(a, b) law, with lo = 0 when k = 0 and hi = 1
// when k = n (Clopper & Pearson, Biometrika 26, 1934). The interval covers the true probability
// with probability at least level, whatever it is.
func ClopperPearson(k, n int, level float64) (lo, hi float64, err error) {
	if n < 1 || k < 0 || k > n {
		return 0, 0, fmt.Errorf("catalogue: %d successes in %d trials; want 0 ≤ k ≤ n, n ≥ 1", k, n)
	}
	if !(level > 0 && level < 1) {
		return 0, 0, fmt.Errorf("catalogue: confidence level %v; want 0 < level < 1", level)
	}
	alpha := 1 - level
	lo, hi = 0, 1
	if k > 0 {
		lo = distuv.Beta{Alpha: float64(k), Beta: float64(n - k + 1)}.Quantile(alpha / 2)
	}
	if k < n {
		hi = distuv.Beta{Alpha: float64(k + 1), Beta: float64(n - k)}.Quantile(1 - alpha/2)
	}
	return lo, hi, nil
}

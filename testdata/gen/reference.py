#!/usr/bin/python3
"""Reference values for the statistical tests of package gen (qcheck.dev/gen).

Run: /usr/bin/python3 testdata/gen/reference.py > testdata/gen/reference.txt
The Go tests read nothing from here at run time; the values they use are
copied into gen/*_test.go with a comment pointing to this file.

1. Chi-square upper critical values chi2.isf(alpha, df) for the uniformity
   tests: circuit lengths (10 classes), embeddings (12), layouts and one-qubit
   Cliffords (24), two-qubit Cliffords (11520).
2. The nearest-neighbour spacing law of the circular unitary ensemble for
   N = 64, computed exactly as a Fredholm determinant (Gaudin; Mehta, Random
   Matrices, 3rd ed., ch. 11; quadrature method of Bornemann, Markov Processes
   Relat. Fields 16 (2010) 803-866), and its largest distance to the Wigner
   surmise for beta = 2, p(s) = (32/pi^2) s^2 exp(-4 s^2/pi).
"""
import numpy as np
import scipy
from scipy import special, stats

N = 64
M = 60  # Gauss-Legendre nodes; E(s) converges to ~1e-14 well before this


def gap_probability(s):
    """E(s): probability that an arc of s mean spacings holds no eigenvalue of CUE(N)."""
    theta = 2 * np.pi * s / N
    x, w = np.polynomial.legendre.leggauss(M)
    x = (x + 1) * theta / 2
    w = w * theta / 2
    d = x[:, None] - x[None, :]
    with np.errstate(invalid="ignore", divide="ignore"):
        k = np.sin(N * d / 2) / (2 * np.pi * np.sin(d / 2))
    k[np.abs(d) < 1e-300] = N / (2 * np.pi)
    sw = np.sqrt(w)
    return np.linalg.det(np.eye(M) - sw[:, None] * k * sw[None, :])


def spacing_cdf(s, h=1e-4):
    """F(s) = 1 + E'(s) (Mehta ch. 6), E' by a central difference."""
    return 1 + (gap_probability(s + h) - gap_probability(s - h)) / (2 * h)


def surmise_cdf(s):
    a = 4 / np.pi
    return (32 / np.pi**2) * (np.sqrt(np.pi) * special.erf(np.sqrt(a) * s) / (4 * a**1.5)
                              - s * np.exp(-a * s * s) / (2 * a))


print("# numpy", np.__version__, "scipy", scipy.__version__)
print("# chi-square upper critical values: df alpha chi2.isf(alpha, df)")
for df in (9, 11, 23, 11519):
    for alpha in (1e-6, 5e-7, 2.5e-7):
        print("chi2", df, alpha, repr(float(stats.chi2.isf(alpha, df))))

print("# CUE(%d) spacing CDF F(s) against the beta=2 Wigner surmise" % N)
grid = np.linspace(0.01, 4.0, 400)
diffs = []
for s in grid:
    f = spacing_cdf(s)
    g = surmise_cdf(s)
    diffs.append(abs(f - g))
for s in (0.25, 0.5, 0.75, 1.0, 1.5, 2.0, 3.0):
    print("cdf", s, repr(float(spacing_cdf(s))), repr(float(surmise_cdf(s))))
# Self-check: the spacing law has mean 1 (unit mean spacing), i.e. the
# integral of 1 - F over [0, inf) is 1; the tail beyond s = 4 is below 1e-9.
xs = np.linspace(0, 4.0, 801)
tail = np.array([1 - spacing_cdf(x) if x > 0 else 1.0 for x in xs])
print("mean spacing (want 1)", repr(float(np.trapz(tail, xs))))
i = int(np.argmax(diffs))
print("maxdiff", repr(float(diffs[i])), "at s =", repr(float(grid[i])))

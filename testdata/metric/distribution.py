"""Reference for metric.DistributionGap (metric/distribution_test.go).

For random pairs (U, V) on n qubits, with V chosen so that W = U V^dagger nearly maps each
block of outcomes to itself (W = K Theta, Theta block-diagonal unitary, K = expm(i eps H) for a
random Hermitian H of norm 1), it records the exact largest total-variation distance, over all
input states, between the distributions of measuring the qubits in `measured` (outcome bit i is
qubit measured[i]; basis index = sum_q b_q 2^q) after U and after V:

    max_psi TV = max over subsets S of outcomes of lambda_max(sum_{c in S} (A_c - B_c)),
    A_c = U^dagger P_c U,  B_c = V^dagger P_c V,

because TV(psi) = max_S sum_{c in S} (p_U(c) - p_V(c)) and max_psi <psi|X|psi> = lambda_max(X)
(numpy.linalg.eigvalsh; the outcomes are few, so all subsets are tried). It also records the
operator norm of the off-block part E of W (numpy.linalg.norm(E, 2), an SVD).

Run with Debian's python3-numpy from the repository root:

    /usr/bin/python3 testdata/metric/distribution.py | gzip > testdata/metric/distribution.json.gz
"""
import itertools
import json
import sys

import numpy as np

rng = np.random.default_rng(20261201)


def haar(d):
    z = (rng.standard_normal((d, d)) + 1j * rng.standard_normal((d, d))) / np.sqrt(2)
    q, r = np.linalg.qr(z)
    return q * (np.diag(r) / np.abs(np.diag(r)))


def expm_herm(h):
    w, v = np.linalg.eigh(h)
    return (v * np.exp(1j * w)) @ v.conj().T


def outcome(z, measured):
    return sum(((z >> q) & 1) << i for i, q in enumerate(measured))


cases = []
for n, measured in [(1, [0]), (2, [0]), (2, [1, 0]), (3, [1]), (3, [0, 2]), (4, [2]), (4, [3, 1]), (5, [0, 4])]:
    d = 1 << n
    out = [outcome(z, measured) for z in range(d)]
    k = 1 << len(measured)
    for eps in [1e-9, 1e-6, 1e-3, 0.05]:
        # Theta: a random unitary inside each block of outcomes.
        theta = np.zeros((d, d), complex)
        for c in range(k):
            idx = [z for z in range(d) if out[z] == c]
            theta[np.ix_(idx, idx)] = haar(len(idx))
        h = rng.standard_normal((d, d)) + 1j * rng.standard_normal((d, d))
        h = (h + h.conj().T) / 2
        h /= np.linalg.norm(h, 2)
        w = expm_herm(eps * h) @ theta
        u = haar(d)
        v = w.conj().T @ u  # W = U V^dagger  =>  V = W^dagger U
        proj = [np.diag([1.0 if out[z] == c else 0.0 for z in range(d)]) for c in range(k)]
        diffs = [u.conj().T @ p @ u - v.conj().T @ p @ v for p in proj]
        best = 0.0
        for r in range(1, k):
            for s in itertools.combinations(range(k), r):
                x = sum(diffs[c] for c in s)
                best = max(best, float(np.linalg.eigvalsh((x + x.conj().T) / 2)[-1]))
        wuv = u @ v.conj().T
        e = np.array([[wuv[z, x] if out[z] != out[x] else 0 for x in range(d)] for z in range(d)])
        cases.append({
            "qubits": n, "measured": measured, "eps": eps,
            "u_re": u.real.ravel().tolist(), "u_im": u.imag.ravel().tolist(),
            "v_re": v.real.ravel().tolist(), "v_im": v.imag.ravel().tolist(),
            "max_tv": best, "leak": float(np.linalg.norm(e, 2)),
        })

json.dump({"provenance": "numpy %s, python %s, seed 20261201" % (np.__version__, sys.version.split()[0]),
           "cases": cases}, sys.stdout)

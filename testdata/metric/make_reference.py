#!/usr/bin/python3
"""Reference values for package metric, computed with NumPy and SciPy only.

Run from the repository root:  /usr/bin/python3 testdata/metric/make_reference.py
It writes testdata/metric/reference.json.gz. The Go tests read that file and
never need Python.

Every value here is computed by brute force from general-purpose routines,
not from the closed forms the Go code uses:
  - distance:        numpy.linalg.norm(u - v, 2)  (largest singular value, SVD)
  - phase_distance:  min over phi of numpy.linalg.norm(u - e^{i phi} v, 2), by a
                     4096-point grid over [0, 2 pi) refined around the best
                     points with scipy.optimize.minimize_scalar (bounded), the
                     bracket re-centred three times so the absolute tolerance
                     on phi reaches ~1e-15
  - eigenphases:     numpy.angle(numpy.linalg.eigvals(v^H u)), sorted
  - diamond:         Watrous (2018), chapter 3 (the theorem on unitary channels): 2 sqrt(1 - nu^2), nu the distance
                     from 0 to the convex hull of the eigenvalues of u^H v;
                     found as nu = cos(min over beta of max_k |angle(l_k e^{-i beta})|)
                     (0 if that minimum exceeds pi/2) by the same grid and
                     refinement, and written as 2 sin(min) to keep precision
  - average/process fidelity: Nielsen, Phys. Lett. A 303 (2002), from
                     numpy.trace(u^H v)
  - operator_norms:  numpy.linalg.norm(a, 2) of random rectangular matrices
  - trace_distances: half the sum of |numpy.linalg.eigvalsh(rho - sigma)|
"""
import gzip, json, math, platform, sys

import numpy as np
import scipy
from scipy.optimize import minimize_scalar

rng = np.random.default_rng(20261201)
TWO_PI = 2 * math.pi


def haar(n):
    # Mezzadri, Notices AMS 54 (2007): QR of a complex Ginibre matrix, phases of R fixed.
    z = (rng.standard_normal((n, n)) + 1j * rng.standard_normal((n, n))) / math.sqrt(2)
    q, r = np.linalg.qr(z)
    d = np.diag(r)
    return q * (d / abs(d))


def diag_unitary(phases, q=None):
    d = np.diag(np.exp(1j * np.asarray(phases, dtype=float)))
    if q is None:
        return d
    return q @ d @ q.conj().T


def refine_min(f, grid=4096):
    """Global minimum of f on the circle: grid, then re-centred bounded refinement."""
    xs = np.arange(grid) * (TWO_PI / grid)
    ys = np.array([f(x) for x in xs])
    best = math.inf
    for i in np.argsort(ys)[:6]:
        centre, h = xs[i], TWO_PI / grid
        for _ in range(4):
            r = minimize_scalar(lambda t: f(centre + t), bounds=(-h, h), method="bounded",
                                options={"xatol": 1e-17, "maxiter": 2000})
            centre += r.x
            h *= 1e-3
        best = min(best, f(centre), ys[i])
    return best


def phase_distance(u, v):
    return refine_min(lambda p: np.linalg.norm(u - np.exp(1j * p) * v, 2))


def diamond(u, v):
    lam = np.linalg.eigvals(u.conj().T @ v)
    ang = np.angle(lam)
    spread = refine_min(lambda b: np.max(np.abs(np.angle(np.exp(1j * (ang - b))))))
    if spread >= math.pi / 2:
        return 2.0
    return 2 * math.sin(spread)


def record(name, u, v):
    n = u.shape[0]
    w = v.conj().T @ u
    t = np.trace(u.conj().T @ v)
    d = float(n)
    return {
        "name": name,
        "n": n,
        "u": pack(u),
        "v": pack(v),
        "eigenphases": sorted(float(x) for x in np.angle(np.linalg.eigvals(w))),
        "distance": float(np.linalg.norm(u - v, 2)),
        "phase_distance": float(phase_distance(u, v)),
        "diamond": float(diamond(u, v)),
        "average_fidelity": float((d + abs(t) ** 2) / (d * (d + 1))),
        "process_fidelity": float(abs(t) ** 2 / d ** 2),
    }


def pack(m):
    m = np.asarray(m, dtype=complex)
    return [[float(x.real), float(x.imag)] for x in m.reshape(-1)]


X = np.array([[0, 1], [1, 0]], dtype=complex)
Y = np.array([[0, -1j], [1j, 0]])
Z = np.diag([1, -1]).astype(complex)
I2 = np.eye(2, dtype=complex)
H = np.array([[1, 1], [1, -1]], dtype=complex) / math.sqrt(2)


def kron(*ms):
    out = np.eye(1, dtype=complex)
    for m in ms:
        out = np.kron(out, m)
    return out


def random_pairs():
    out = []
    for qubits, count in [(1, 10), (2, 10), (3, 10), (4, 9), (5, 7), (6, 4)]:
        n = 1 << qubits
        for k in range(count):
            out.append(record(f"haar q={qubits} #{k}", haar(n), haar(n)))
    return out


def adversarial_pairs():
    out = []
    add = lambda name, u, v: out.append(record(name, u, v))
    for q in (1, 3, 6):
        n = 1 << q
        add(f"identity q={q}", np.eye(n, dtype=complex), np.eye(n, dtype=complex))
        add(f"minus identity q={q}", -np.eye(n, dtype=complex), np.eye(n, dtype=complex))
    v = haar(16)
    add("global phase only q=4", np.exp(0.7j) * v, v)
    h = haar(32)
    add("same haar q=5", h, h.copy())
    q = haar(8)
    base = 0.3
    add("cluster 1e-10 q=3", diag_unitary(base + 1e-10 * rng.standard_normal(8), q), np.eye(8, dtype=complex))
    q = haar(16)
    ph = np.concatenate([0.2 + 1e-10 * rng.standard_normal(8), 1.4 + 1e-10 * rng.standard_normal(8)])
    w = haar(16)
    add("two clusters 1e-10 q=4", w @ diag_unitary(ph, q), w)
    q = haar(32)
    add("spread 1.2 pi q=5", diag_unitary(np.sort(rng.uniform(0, 1.2 * math.pi, 32)), q), np.eye(32, dtype=complex))
    add("arc exactly pi (Z,I) q=1", Z, I2)
    q = haar(8)
    add("arc pi + 1e-9 q=3", diag_unitary([0, 0.5, 1, 2, math.pi + 1e-9, 1.5, 0.2, 3], q), np.eye(8, dtype=complex))
    add("arc pi - 1e-9 q=3", diag_unitary([0, 0.5, 1, 2, math.pi - 1e-9, 1.5, 0.2, 3], q), np.eye(8, dtype=complex))
    q = haar(16)
    add("straddling -1 q=4", diag_unitary(math.pi + 1e-3 * rng.standard_normal(16), q), np.eye(16, dtype=complex))
    add("XZ vs YY q=2", kron(X, Z), kron(Y, Y))
    add("Rz(1e-9) tensor I q=3", kron(np.diag(np.exp([-0.5e-9j, 0.5e-9j])), I2, I2), np.eye(8, dtype=complex))
    q = haar(64)
    add("one outlier 1e-8 q=6", diag_unitary([0.0] * 63 + [1e-8], q), np.eye(64, dtype=complex))
    q = haar(16)
    add("degenerate 1 and i q=4", diag_unitary([0.0] * 8 + [math.pi / 2] * 8, q), np.eye(16, dtype=complex))
    shift = np.roll(np.eye(16, dtype=complex), 1, axis=0)
    add("cyclic shift (equal gaps) q=4", shift, np.eye(16, dtype=complex))
    add("CZ vs I q=2", np.diag([1, 1, 1, -1]).astype(complex), np.eye(4, dtype=complex))
    lam = 0.8
    cp = np.diag([1, 1, 1, np.exp(1j * lam)])
    crz = np.diag([1, 1, np.exp(-0.5j * lam), np.exp(0.5j * lam)])
    add("CP vs CRZ q=2", cp, crz)
    q = haar(8)
    add("T-gate spectra q=3", diag_unitary([k * math.pi / 4 for k in range(8)], q), np.eye(8, dtype=complex))
    q = haar(2)
    add("eigenphases at 2.1 and 2.1+pi q=1", diag_unitary([2.1, 2.1 - math.pi], q), np.eye(2, dtype=complex))
    q = haar(64)
    add("near-identity random basis q=6", diag_unitary(1e-7 * rng.standard_normal(64), q), np.eye(64, dtype=complex))
    add("H tensor 3 vs itself times tiny rz q=3", kron(H, H, H), kron(H, H, H) @ kron(np.diag(np.exp([-1e-6j, 1e-6j])), I2, I2))
    return out


def operator_norms():
    out = []
    for r, c in [(1, 1), (2, 3), (3, 2), (5, 5), (8, 3), (16, 16), (7, 20)]:
        a = rng.standard_normal((r, c)) + 1j * rng.standard_normal((r, c))
        out.append({"rows": r, "cols": c, "a": pack(a), "norm": float(np.linalg.norm(a, 2))})
    return out


def density(n, rank):
    g = rng.standard_normal((n, rank)) + 1j * rng.standard_normal((n, rank))
    rho = g @ g.conj().T
    return rho / np.trace(rho).real


def trace_distances():
    out = []
    for n, ra, rb in [(2, 1, 2), (4, 2, 4), (8, 8, 3), (16, 5, 16), (32, 1, 1)]:
        a, b = density(n, ra), density(n, rb)
        out.append({"n": n, "rho": pack(a), "sigma": pack(b),
                    "trace_distance": float(0.5 * np.sum(np.abs(np.linalg.eigvalsh(a - b))))})
    return out


def main():
    data = {
        "provenance": {
            "script": "testdata/metric/make_reference.py",
            "python": platform.python_version(),
            "numpy": np.__version__,
            "scipy": scipy.__version__,
            "seed": 20261201,
        },
        "random": random_pairs(),
        "adversarial": adversarial_pairs(),
        "operator_norms": operator_norms(),
        "trace_distances": trace_distances(),
    }
    with gzip.open("testdata/metric/reference.json.gz", "wt", compresslevel=9) as f:
        json.dump(data, f, separators=(",", ":"))
    print(data["provenance"], len(data["random"]), len(data["adversarial"]), file=sys.stderr)


if __name__ == "__main__":
    main()

#!/usr/bin/python3
"""Reference distances for qcheck.Compare, computed independently of the Go code.

Gate matrices are written out from their textbook definitions (package circuit's gate definitions),
full-register matrices are built by explicit index mapping (qubit 0 is the least-significant bit
of a basis index; a gate's first operand is the most significant bit of its local index), and the
phase-free distance is found by brute force: a dense grid over the global phase followed by
a golden-section search of numpy's spectral norm. The eigenphase formula of package metric's documentation
is evaluated too and must agree, as a check of this script.

Run: /usr/bin/python3 testdata/qcheck/compare_reference.py > testdata/qcheck/compare_reference.json
"""
import json
import sys

import numpy as np
import scipy

PI = np.pi


def u3(t, p, l):
    return np.array([[np.cos(t / 2), -np.exp(1j * l) * np.sin(t / 2)],
                     [np.exp(1j * p) * np.sin(t / 2), np.exp(1j * (p + l)) * np.cos(t / 2)]])


def rot(pauli, t):
    return np.cos(t / 2) * np.eye(len(pauli)) - 1j * np.sin(t / 2) * pauli


X = np.array([[0, 1], [1, 0]], dtype=complex)
Y = np.array([[0, -1j], [1j, 0]])
Z = np.diag([1, -1]).astype(complex)
H = np.array([[1, 1], [1, -1]]) / np.sqrt(2)


def ctrl(m):
    d = len(m)
    out = np.eye(2 * d, dtype=complex)
    out[d:, d:] = m
    return out


GATES = {
    "id": lambda: np.eye(2), "x": lambda: X, "y": lambda: Y, "z": lambda: Z, "h": lambda: H,
    "s": lambda: np.diag([1, 1j]), "sdg": lambda: np.diag([1, -1j]),
    "t": lambda: np.diag([1, np.exp(1j * PI / 4)]), "tdg": lambda: np.diag([1, np.exp(-1j * PI / 4)]),
    "rx": lambda t: rot(X, t), "ry": lambda t: rot(Y, t), "rz": lambda t: rot(Z, t),
    "p": lambda l: np.diag([1, np.exp(1j * l)]), "u": u3,
    "cx": lambda: ctrl(X), "cz": lambda: ctrl(Z), "cp": lambda l: ctrl(np.diag([1, np.exp(1j * l)])),
    "crz": lambda t: ctrl(rot(Z, t)),
    "swap": lambda: np.array([[1, 0, 0, 0], [0, 0, 1, 0], [0, 1, 0, 0], [0, 0, 0, 1]], dtype=complex),
    "ccx": lambda: ctrl(ctrl(X)),
}


def full(n, ops):
    """The 2^n x 2^n matrix of a list of (name, params, qubits), first op applied first."""
    dim = 2 ** n
    u = np.eye(dim, dtype=complex)
    for name, params, qubits in ops:
        g = np.asarray(GATES[name](*params), dtype=complex)
        k = len(qubits)
        m = np.zeros((dim, dim), dtype=complex)
        for col in range(dim):
            local_in = sum(((col >> q) & 1) << (k - 1 - j) for j, q in enumerate(qubits))
            rest = col
            for q in qubits:
                rest &= ~(1 << q)
            for local_out in range(2 ** k):
                row = rest | sum(((local_out >> (k - 1 - j)) & 1) << q for j, q in enumerate(qubits))
                m[row, col] += g[local_out, local_in]
        u = m @ u
    return u


def min_over_phase(f):
    grid = np.linspace(-PI, PI, 2001)
    vals = [f(p) for p in grid]
    i = int(np.argmin(vals))
    # The minimum often sits at a kink (two singular values cross), where smooth minimisers
    # stall; a golden-section search on the grid cell around it converges regardless.
    lo, hi = grid[max(i - 1, 0)], grid[min(i + 1, len(grid) - 1)]
    r = (np.sqrt(5) - 1) / 2
    a, b = hi - r * (hi - lo), lo + r * (hi - lo)
    fa, fb = f(a), f(b)
    for _ in range(200):
        if fa < fb:
            hi, b, fb = b, a, fa
            a = hi - r * (hi - lo)
            fa = f(a)
        else:
            lo, a, fa = a, b, fb
            b = lo + r * (hi - lo)
            fb = f(b)
    return min(fa, fb, vals[i])


def eigen_arc_distance(u, v):
    ph = np.sort(np.angle(np.linalg.eigvals(v.conj().T @ u)))
    gaps = np.diff(np.concatenate([ph, [ph[0] + 2 * PI]]))
    arc = 2 * PI - gaps.max()
    return 2 * np.sin(arc / 4)


def case(name, n, want, got, m=None, ancillas=(), clean=True, perm=None):
    m = n if m is None else m
    # want moved onto got's register: its qubit i on the i-th non-ancilla qubit of got.
    data = [q for q in range(m) if q not in ancillas]
    moved = [(g, p, [data[q] for q in qs]) for g, p, qs in want]
    u, v = full(m, moved), full(m, got)
    if perm is not None:
        dim = 2 ** m
        pm = np.zeros((dim, dim))
        for x in range(dim):
            y = sum(((x >> p) & 1) << i for i, p in enumerate(perm))
            pm[y, x] = 1
        v = pm @ v
    out = {"name": name, "qubits": m, "want_qubits": n, "want": want, "got": got,
           "ancillas": list(ancillas), "clean": clean, "perm": perm}
    if ancillas and clean:
        cols = [x for x in range(2 ** m) if all(((x >> a) & 1) == 0 for a in ancillas)]
        yw, xg = u[:, cols], v[:, cols]
        out["phase_distance"] = min_over_phase(lambda p: np.linalg.norm(xg - np.exp(1j * p) * yw, 2))
        out["exact_distance"] = np.linalg.norm(xg - yw, 2)
        return out
    d = 2 ** m
    out["phase_distance"] = min_over_phase(lambda p: np.linalg.norm(u - np.exp(1j * p) * v, 2))
    arc = eigen_arc_distance(u, v)
    if abs(arc - out["phase_distance"]) > 1e-9:
        sys.exit(f"{name}: brute force {out['phase_distance']} and eigenphase formula {arc} disagree")
    out["exact_distance"] = np.linalg.norm(u - v, 2)
    tr = np.trace(u.conj().T @ v)
    out["average_fidelity"] = (d + abs(tr) ** 2) / (d * (d + 1))
    # Diamond distance of unitary channels, 2*sqrt(1 - nu^2), nu the distance from 0 to the
    # convex hull of the eigenvalues of u^dagger v (Watrous 2018, §3.3): by brute force over the
    # direction of the supporting line.
    lam = np.linalg.eigvals(u.conj().T @ v)
    nu = max(0.0, -min_over_phase(lambda p: -min(np.real(np.exp(-1j * p) * lam))))
    out["diamond"] = 2 * np.sqrt(max(0.0, 1 - nu ** 2))
    return out


def g(name, *args):
    *params, = args[:-1] if isinstance(args[-1], list) else args
    return [name, list(params), args[-1]]


TOFFOLI = [g("h", [2]), g("cx", [1, 2]), g("tdg", [2]), g("cx", [0, 2]), g("t", [2]), g("cx", [1, 2]),
           g("tdg", [2]), g("cx", [0, 2]), g("t", [1]), g("t", [2]), g("h", [2]), g("cx", [0, 1]),
           g("t", [0]), g("tdg", [1]), g("cx", [0, 1])]
TOFFOLI_BAD = [op if i != 4 else g("tdg", [2]) for i, op in enumerate(TOFFOLI)]
A = [g("h", [0]), g("rz", 0.7, [1]), g("cx", [0, 2]), g("ry", -1.1, [2]), g("cp", 0.4, [1, 0]),
     g("u", 0.3, -0.2, 1.9, [1]), g("swap", [0, 2]), g("rx", 2.5, [0]), g("crz", -0.9, [2, 1])]
B = [g("h", [0]), g("rz", 0.7, [1]), g("cx", [0, 2]), g("ry", -1.1, [2]), g("crz", 0.4, [1, 0]),
     g("u", 0.3, -0.2, 1.9, [1]), g("swap", [0, 2]), g("rx", 2.5, [0]), g("crz", -0.9, [2, 1])]

cases = [
    case("p(0.3) vs rz(0.3): global phase only", 1, [g("p", 0.3, [0])], [g("rz", 0.3, [0])]),
    case("t vs tdg after h, cx", 3, [g("h", [0]), g("cx", [0, 1]), g("t", [1])],
         [g("h", [0]), g("cx", [0, 1]), g("tdg", [1])]),
    case("near identity: rz(1e-3)", 2, [], [g("rz", 1e-3, [1])]),
    case("cp vs crz (relative phase)", 2, [g("cp", 0.9, [0, 1])], [g("crz", 0.9, [0, 1])]),
    case("control and target swapped", 2, [g("cx", [0, 1])], [g("cx", [1, 0])]),
    case("Toffoli, N&C Fig. 4.9, exact", 3, [g("ccx", [0, 1, 2])], TOFFOLI),
    case("Toffoli, N&C Fig. 4.9, one t as tdg", 3, [g("ccx", [0, 1, 2])], TOFFOLI_BAD),
    case("mixed circuit, cp replaced by crz", 3, A, B),
    case("mixed circuit against its reverse order", 3, A, list(reversed(A))),
    case("clean ancilla, correct", 3, [g("ccx", [0, 1, 2])],
         [g("ccx", [0, 1, 3]), g("cx", [3, 2]), g("ccx", [0, 1, 3])], m=4, ancillas=(3,)),
    case("clean ancilla, not uncomputed", 3, [g("ccx", [0, 1, 2])],
         [g("ccx", [0, 1, 3]), g("cx", [3, 2])], m=4, ancillas=(3,)),
    case("clean ancilla, partly rotated", 3, [g("ccx", [0, 1, 2])],
         [g("ccx", [0, 1, 3]), g("cx", [3, 2]), g("rx", 0.2, [3]), g("ccx", [0, 1, 3])], m=4,
         ancillas=(3,)),
    case("clean ancilla in the middle, phase error", 2, [g("cz", [0, 1])],
         [g("cx", [0, 1]), g("crz", 0.5, [1, 2]), g("cz", [0, 2]), g("cx", [0, 1])], m=3,
         ancillas=(1,)),
    case("dirty ancilla, clean-only decomposition", 3, [g("ccx", [0, 1, 2])],
         [g("ccx", [0, 1, 3]), g("cx", [3, 2]), g("ccx", [0, 1, 3])], m=4, ancillas=(3,), clean=False),
    case("dirty ancilla, correct", 3, [g("ccx", [0, 1, 2])],
         [g("ccx", [0, 1, 3]), g("cx", [3, 2]), g("ccx", [0, 1, 3]), g("cx", [3, 2])], m=4,
         ancillas=(3,), clean=False),
    case("routed with a final swap, right layout", 2, [g("cx", [0, 1]), g("rz", 0.4, [1])],
         [g("cx", [0, 1]), g("swap", [0, 1]), g("rz", 0.4, [0])], perm=[1, 0]),
    case("routed, layout reported wrong", 3, [g("cx", [0, 2]), g("h", [1])],
         [g("swap", [0, 1]), g("cx", [1, 2]), g("h", [0])], perm=[1, 2, 0]),
    case("routed, right layout", 3, [g("cx", [0, 2]), g("h", [1])],
         [g("swap", [0, 1]), g("cx", [1, 2]), g("h", [0])], perm=[1, 0, 2]),
]

json.dump({"numpy": np.__version__, "scipy": scipy.__version__, "cases": cases}, sys.stdout, indent=1,
          default=float)
print()

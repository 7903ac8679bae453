"""Reference distances for the identity corpus, computed independently of the Go code.

For every pair NAME.before.qasm / NAME.after.qasm in this folder, build both unitaries with
NumPy from textbook gate matrices (package circuit's documentation conventions: qubit 0 is the least-significant bit
of a basis index; a gate's first operand is the most significant bit of its own matrix) and
compute the phase-free operator-norm distance min_phi ||U - e^{i phi} V|| two ways:
  A. from the eigenphases of V^dagger U: 2 sin(theta/4), theta the shortest arc holding them all;
  B. by direct minimisation over phi of the largest singular value (grid of 3600 points, then
     a ternary search around the best point).
The two must agree to 1e-9; A is written to manifest.txt.

This reader takes only the flat files of this corpus (one register q, gate calls with literal or
pi arithmetic angles); it shares nothing with package qasm.

Run: /usr/bin/python3 distances.py > manifest.txt
"""
import glob
import math
import os
import re
import sys

import numpy as np

I2 = np.eye(2, dtype=complex)
X = np.array([[0, 1], [1, 0]], dtype=complex)
Y = np.array([[0, -1j], [1j, 0]])
Z = np.diag([1, -1]).astype(complex)
H = np.array([[1, 1], [1, -1]], dtype=complex) / math.sqrt(2)
S = np.diag([1, 1j])
T = np.diag([1, np.exp(1j * math.pi / 4)])
SX = np.array([[1 + 1j, 1 - 1j], [1 - 1j, 1 + 1j]]) / 2


def rx(t): return math.cos(t / 2) * I2 - 1j * math.sin(t / 2) * X
def ry(t): return math.cos(t / 2) * I2 - 1j * math.sin(t / 2) * Y
def rz(t): return np.diag([np.exp(-1j * t / 2), np.exp(1j * t / 2)])
def p(l): return np.diag([1, np.exp(1j * l)])


def u(t, f, l):
    return np.array([[math.cos(t / 2), -np.exp(1j * l) * math.sin(t / 2)],
                     [np.exp(1j * f) * math.sin(t / 2), np.exp(1j * (f + l)) * math.cos(t / 2)]])


def ctrl(m, k=1):
    d = m.shape[0]
    out = np.eye(d << k, dtype=complex)
    out[-d:, -d:] = m
    return out


def pauli2(t, P):
    return math.cos(t / 2) * np.eye(4) - 1j * math.sin(t / 2) * np.kron(P, P)


SWAP = np.array([[1, 0, 0, 0], [0, 0, 1, 0], [0, 1, 0, 0], [0, 0, 0, 1]], dtype=complex)
GATES = {
    "id": lambda: I2, "x": lambda: X, "y": lambda: Y, "z": lambda: Z, "h": lambda: H,
    "s": lambda: S, "sdg": lambda: S.conj().T, "t": lambda: T, "tdg": lambda: T.conj().T,
    "sx": lambda: SX, "sxdg": lambda: SX.conj().T,
    "rx": rx, "ry": ry, "rz": rz, "p": p, "u1": p, "u": u, "u3": u,
    "cx": lambda: ctrl(X), "cy": lambda: ctrl(Y), "cz": lambda: ctrl(Z), "ch": lambda: ctrl(H),
    "cp": lambda l: ctrl(p(l)), "crx": lambda t: ctrl(rx(t)), "cry": lambda t: ctrl(ry(t)),
    "crz": lambda t: ctrl(rz(t)), "cu3": lambda t, f, l: ctrl(u(t, f, l)),
    "swap": lambda: SWAP, "rxx": lambda t: pauli2(t, X), "rzz": lambda t: pauli2(t, Z),
    "ccx": lambda: ctrl(X, 2), "cswap": lambda: ctrl(SWAP), "c3x": lambda: ctrl(X, 3),
    "c4x": lambda: ctrl(X, 4),
}

CALL = re.compile(r"^([a-z0-9]+)(?:\((.*)\))?\s+(.*);$")


def unitary(path):
    n, ops = None, []
    for line in open(path, encoding="utf-8"):
        line = line.split("//")[0].strip()
        if not line or line.startswith("OPENQASM") or line.startswith("include"):
            continue
        m = re.match(r"^qreg q\[(\d+)\];$", line)
        if m:
            n = int(m.group(1))
            continue
        m = CALL.match(line)
        if not m:
            sys.exit(f"{path}: cannot read {line!r}")
        name, args, qs = m.groups()
        params = [eval(a.replace("^", "**"), {"pi": math.pi}) for a in args.split(",")] if args else []
        qubits = [int(q) for q in re.findall(r"q\[(\d+)\]", qs)]
        ops.append((GATES[name](*params), qubits))
    dim = 1 << n
    U = np.eye(dim, dtype=complex)
    for g, qs in ops:
        U = embed(g, qs, n) @ U
    return U


def embed(g, qs, n):
    """The 2^n x 2^n matrix of gate g on qubits qs (qs[0] is the gate's most significant bit)."""
    k, dim = len(qs), 1 << n
    full = np.zeros((dim, dim), dtype=complex)
    for col in range(dim):
        local = 0
        for q in qs:
            local = (local << 1) | ((col >> q) & 1)
        for out in range(1 << k):
            amp = g[out, local]
            if amp == 0:
                continue
            row = col
            for j, q in enumerate(qs):
                bit = (out >> (k - 1 - j)) & 1
                row = (row & ~(1 << q)) | (bit << q)
            full[row, col] += amp
    return full


def by_eigenphases(U, V):
    ph = np.sort(np.angle(np.linalg.eigvals(V.conj().T @ U)))
    gaps = np.diff(np.concatenate([ph, [ph[0] + 2 * math.pi]]))
    arc = 2 * math.pi - gaps.max()
    return 2 * math.sin(arc / 4)


def by_search(U, V):
    f = lambda phi: np.linalg.norm(U - np.exp(1j * phi) * V, 2)
    grid = np.linspace(-math.pi, math.pi, 3600, endpoint=False)
    best = grid[np.argmin([f(x) for x in grid])]
    step = 2 * math.pi / 3600
    lo, hi = best - step, best + step
    for _ in range(200):  # ternary search: f is unimodal this close to its minimum
        a, b = lo + (hi - lo) / 3, hi - (hi - lo) / 3
        if f(a) < f(b):
            hi = b
        else:
            lo = a
    return min(f((lo + hi) / 2), f(best))


def main():
    here = os.path.dirname(os.path.abspath(__file__))
    print(f"# Phase-free operator-norm distances min_phi ||U_before - e^(i phi) U_after||,")
    print(f"# written by distances.py with Python {sys.version.split()[0]}, NumPy {np.__version__}.")
    print("# Columns: name, verdict (equivalent when the distance is below 1e-9), distance.")
    for before in sorted(glob.glob(os.path.join(here, "*.before.qasm"))):
        name = os.path.basename(before)[: -len(".before.qasm")]
        U = unitary(before)
        V = unitary(before.replace(".before.qasm", ".after.qasm"))
        a, b = by_eigenphases(U, V), by_search(U, V)
        if abs(a - b) > 1e-9:
            sys.exit(f"{name}: eigenphase distance {a} and searched distance {b} disagree")
        verdict = "equivalent" if a < 1e-9 else "different"
        print(f"{name} {verdict} {a:.15e}")


main()

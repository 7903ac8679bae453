#!/usr/bin/python3
"""Reference values for the tests of package sim, computed with NumPy only.

Every gate matrix below is written from its textbook definition (Nielsen & Chuang, Quantum
Computation and Quantum Information, §4.2-4.3; the OpenQASM 2.0 specification, Cross et al.,
arXiv:1707.03429, for u; exp(-iθ P⊗P/2) for the two-qubit Pauli rotations), independently of the
Go code. A circuit's full unitary is built by contracting each gate into a tensor of the unitary
with numpy.tensordot; a statevector likewise.

Conventions (package circuit's documentation): qubit 0 is the least-significant bit of a basis index; a gate's first
operand is the most significant bit of its own matrix.

Writes, next to this script:
  reference.json  small random circuits (every library gate, both operand orders, 1-4 qubits)
                  with their full unitaries, and a fixed 16-qubit circuit with a fingerprint of
                  the statevector it produces from a fixed input state.
  bench.json      the circuits of the speed benchmarks (read by the Go benchmarks and by
                  bench_numpy.py).

Run: /usr/bin/python3 testdata/sim/reference.py
"""
import json
import math
import os
import sys

import numpy as np

HERE = os.path.dirname(os.path.abspath(__file__))
S2 = 1 / math.sqrt(2)


def ctrl(u):
    """block diag(I, u): control is the first (most significant) operand (N&C Fig. 4.4)."""
    d = u.shape[0]
    out = np.eye(2 * d, dtype=complex)
    out[d:, d:] = u
    return out


def pauli_rot(theta, p):
    """exp(-iθP/2) = cos(θ/2) I - i sin(θ/2) P for P with P² = I (N&C eq. 4.4-4.6 form)."""
    return math.cos(theta / 2) * np.eye(p.shape[0]) - 1j * math.sin(theta / 2) * p


X = np.array([[0, 1], [1, 0]], dtype=complex)
Y = np.array([[0, -1j], [1j, 0]], dtype=complex)
Z = np.array([[1, 0], [0, -1]], dtype=complex)
I2 = np.eye(2, dtype=complex)
H = np.array([[1, 1], [1, -1]], dtype=complex) * S2
SX = 0.5 * np.array([[1 + 1j, 1 - 1j], [1 - 1j, 1 + 1j]])
SWAP = np.array([[1, 0, 0, 0], [0, 0, 1, 0], [0, 1, 0, 0], [0, 0, 0, 1]], dtype=complex)
ISWAP = np.array([[1, 0, 0, 0], [0, 0, 1j, 0], [0, 1j, 0, 0], [0, 0, 0, 1]], dtype=complex)


def u3(t, p, l):
    return np.array([[math.cos(t / 2), -np.exp(1j * l) * math.sin(t / 2)],
                     [np.exp(1j * p) * math.sin(t / 2), np.exp(1j * (p + l)) * math.cos(t / 2)]])


def phase(l):
    return np.diag([1, np.exp(1j * l)])


# name -> (qubits, number of angles, matrix function)
GATES = {
    "id": (1, 0, lambda: I2),
    "x": (1, 0, lambda: X),
    "y": (1, 0, lambda: Y),
    "z": (1, 0, lambda: Z),
    "h": (1, 0, lambda: H),
    "s": (1, 0, lambda: np.diag([1, 1j])),
    "sdg": (1, 0, lambda: np.diag([1, -1j])),
    "t": (1, 0, lambda: np.diag([1, np.exp(1j * math.pi / 4)])),
    "tdg": (1, 0, lambda: np.diag([1, np.exp(-1j * math.pi / 4)])),
    "sx": (1, 0, lambda: SX),
    "sxdg": (1, 0, lambda: SX.conj().T),
    "rx": (1, 1, lambda t: pauli_rot(t, X)),
    "ry": (1, 1, lambda t: pauli_rot(t, Y)),
    "rz": (1, 1, lambda t: pauli_rot(t, Z)),
    "p": (1, 1, phase),
    "u": (1, 3, u3),
    "cx": (2, 0, lambda: ctrl(X)),
    "cy": (2, 0, lambda: ctrl(Y)),
    "cz": (2, 0, lambda: ctrl(Z)),
    "ch": (2, 0, lambda: ctrl(H)),
    "cp": (2, 1, lambda l: ctrl(phase(l))),
    "crx": (2, 1, lambda t: ctrl(pauli_rot(t, X))),
    "cry": (2, 1, lambda t: ctrl(pauli_rot(t, Y))),
    "crz": (2, 1, lambda t: ctrl(pauli_rot(t, Z))),
    "swap": (2, 0, lambda: SWAP),
    "iswap": (2, 0, lambda: ISWAP),
    "iswapdg": (2, 0, lambda: ISWAP.conj().T),
    "rxx": (2, 1, lambda t: pauli_rot(t, np.kron(X, X))),
    "ryy": (2, 1, lambda t: pauli_rot(t, np.kron(Y, Y))),
    "rzz": (2, 1, lambda t: pauli_rot(t, np.kron(Z, Z))),
    "ccx": (3, 0, lambda: ctrl(ctrl(X))),
    "ccz": (3, 0, lambda: ctrl(ctrl(Z))),
    "cswap": (3, 0, lambda: ctrl(SWAP)),
}


def apply_gate(tensor, n, m, qubits):
    """Contract the 2^k×2^k gate m into tensor, whose first n axes are qubits n-1, ..., 0."""
    k = len(qubits)
    g = m.reshape((2,) * (2 * k))
    axes = [n - 1 - q for q in qubits]
    out = np.tensordot(g, tensor, axes=(list(range(k, 2 * k)), axes))
    return np.moveaxis(out, list(range(k)), axes)


def unitary(n, ops):
    dim = 2 ** n
    t = np.eye(dim, dtype=complex).reshape((2,) * n + (dim,))
    for name, params, qubits in ops:
        t = apply_gate(t, n, GATES[name][2](*params), qubits)
    return t.reshape(dim, dim)


def statevector(n, ops, psi):
    t = psi.reshape((2,) * n)
    for name, params, qubits in ops:
        t = apply_gate(t, n, GATES[name][2](*params), qubits)
    return t.reshape(-1)


SPECIAL = [0.0, math.pi / 2, math.pi, -math.pi / 4, 2 * math.pi]


def angle(rng):
    if rng.random() < 0.25:
        return SPECIAL[rng.integers(len(SPECIAL))]
    return float(rng.uniform(-2 * math.pi, 2 * math.pi))


def random_op(rng, n, names):
    name = names[rng.integers(len(names))]
    k, npar, _ = GATES[name]
    qubits = [int(q) for q in rng.permutation(n)[:k]]
    return (name, [angle(rng) for _ in range(npar)], qubits)


def fits(n):
    return [g for g in GATES if GATES[g][0] <= n]


def encode(ops):
    return [{"gate": g, "params": p, "qubits": q} for g, p, q in ops]


def complex_list(a):
    return [[float(v.real), float(v.imag)] for v in a.reshape(-1)]


def input_state(n):
    """The fixed input of the 16-qubit check: ψ_i ∝ cos(0.37 i) + i sin(0.11 i + 0.5)."""
    i = np.arange(2 ** n)
    psi = np.cos(0.37 * i) + 1j * np.sin(0.11 * i + 0.5)
    return psi / np.linalg.norm(psi)


def main():
    rng = np.random.default_rng(20261201)
    cases = []
    # Every gate alone and in context, in both operand orders (reversed operands), on the
    # smallest register that holds it and on one more qubit.
    for name, (k, npar, _) in GATES.items():
        for n in (k, k + 1):
            for reverse in (False, True):
                qubits = list(range(k))
                if n > k:
                    qubits = [q + 1 for q in qubits]  # leave qubit 0 out
                if reverse:
                    qubits = qubits[::-1]
                ops = [(name, [angle(rng) for _ in range(npar)], qubits)]
                if n > 1:
                    pre = [random_op(rng, n, fits(n)) for _ in range(2)]
                    ops = pre + ops + [random_op(rng, n, fits(n))]
                cases.append((n, ops))
    # Random circuits of 1-4 qubits over the whole library.
    for n in (1, 2, 3, 4):
        for _ in range(6):
            ops = [random_op(rng, n, fits(n)) for _ in range(int(rng.integers(5, 40)))]
            cases.append((n, ops))
    # Long runs on a few qubits, so that fusion merges many gates.
    for n in (2, 3):
        for _ in range(3):
            q = [int(x) for x in rng.permutation(n)[:2]]
            ops = []
            for _ in range(30):
                name = fits(2)[rng.integers(len(fits(2)))]
                k, npar, _ = GATES[name]
                qs = q[:k] if rng.random() < 0.5 else q[::-1][:k]
                ops.append((name, [angle(rng) for _ in range(npar)], qs))
            cases.append((n, ops))

    out_cases = []
    for n, ops in cases:
        u = unitary(n, ops)
        assert np.allclose(u.conj().T @ u, np.eye(2 ** n), atol=1e-12)
        out_cases.append({"qubits": n, "ops": encode(ops), "unitary": complex_list(u)})

    # The fixed 16-qubit statevector check (issue 8).
    n = 16
    ops = [random_op(rng, n, list(GATES)) for _ in range(300)]
    psi = statevector(n, ops, input_state(n))
    probe_idx = sorted(int(i) for i in rng.choice(2 ** n, size=128, replace=False))
    prob = np.abs(psi) ** 2
    idx = np.arange(2 ** n)
    marginals = [float(prob[(idx >> q) & 1 == 1].sum()) for q in range(n)]
    phases = [complex(np.vdot(np.exp(1j * 0.001 * (k + 1) * idx), psi)) for k in range(4)]
    state = {
        "qubits": n,
        "ops": encode(ops),
        "input": "psi_i proportional to cos(0.37 i) + i sin(0.11 i + 0.5), normalised",
        "indices": probe_idx,
        "amplitudes": complex_list(psi[probe_idx]),
        "marginals_one": marginals,
        "overlaps": [[z.real, z.imag] for z in phases],
        "overlaps_probe": "sum_i exp(-i 0.001 (k+1) i) psi_i for k = 0..3",
        "norm": float(np.linalg.norm(psi)),
    }

    ref = {
        "source": "testdata/sim/reference.py",
        "numpy": np.__version__,
        "python": sys.version.split()[0],
        "cases": out_cases,
        "statevector": state,
    }
    with open(os.path.join(HERE, "reference.json"), "w") as f:
        json.dump(ref, f, separators=(",", ":"))

    # Benchmark circuits: random one- and two-qubit gates of the library.
    brng = np.random.default_rng(7)
    small = fits(2)
    bench = {"source": "testdata/sim/reference.py", "circuits": []}

    def add(label, n, count, names):
        bench["circuits"].append({"name": label, "qubits": n,
                                  "ops": encode([random_op(brng, n, names) for _ in range(count)])})

    add("10q-1000g", 10, 1000, small)
    add("12q-200g", 12, 200, small)
    for n in range(6, 13):
        add("sweep-%dq-200g" % n, n, 200, small)
    add("24q-300g", 24, 300, small)
    with open(os.path.join(HERE, "bench.json"), "w") as f:
        json.dump(bench, f, separators=(",", ":"))


if __name__ == "__main__":
    main()

#!/usr/bin/python3
"""Reference distributions for programs with measurements, resets and classical control,
computed with NumPy only, for the tests of package sim (programs_reference_test.go).

The meaning is OpenQASM 2.0's (Cross, Bishop, Smolin & Gambetta, arXiv:1707.03429): every qubit and
classical bit starts at 0, and the result is the joint distribution of the classical bits at the
end. It is computed here by a method independent of the Go engine: the program's state is kept as
a map from each value of the classical bits to an unnormalised density matrix (Nielsen & Chuang
§2.4); a gate maps rho to U rho U^dagger, a measurement of qubit q into bit b splits rho into
P0 rho P0 and P1 rho P1 (§2.4.1) under the two values of b, a reset maps rho to
P0 rho P0 + X P1 rho P1 X, and a classically controlled gate acts on the entries whose bits satisfy
its condition (the bits read as an unsigned integer, the first least significant, equal to the
value, or differ from it when "not" is set). The probability of an outcome is the trace of its
density matrix. Gate matrices are written from their textbook definitions (N&C §4.2-4.3).

Conventions: qubit 0 is the least-significant bit of a basis index; a gate's first operand is the
most significant bit of its own matrix; an outcome is written bit n-1 first.

Run: /usr/bin/python3 testdata/programs/reference.py   (writes reference.json beside it)
"""
import json
import math
import os

import numpy as np

HERE = os.path.dirname(os.path.abspath(__file__))
S2 = 1 / math.sqrt(2)


def rx(t):
    c, s = math.cos(t / 2), math.sin(t / 2)
    return np.array([[c, -1j * s], [-1j * s, c]])


def ry(t):
    c, s = math.cos(t / 2), math.sin(t / 2)
    return np.array([[c, -s], [s, c]])


def rz(t):
    return np.diag([np.exp(-0.5j * t), np.exp(0.5j * t)])


FIXED = {
    "h": np.array([[S2, S2], [S2, -S2]]),
    "x": np.array([[0, 1], [1, 0]]),
    "z": np.diag([1, -1]),
    "s": np.diag([1, 1j]),
    "t": np.diag([1, np.exp(0.25j * math.pi)]),
    "cx": np.array([[1, 0, 0, 0], [0, 1, 0, 0], [0, 0, 0, 1], [0, 0, 1, 0]]),
    "cz": np.diag([1, 1, 1, -1]),
    "swap": np.array([[1, 0, 0, 0], [0, 0, 1, 0], [0, 1, 0, 0], [0, 0, 0, 1]]),
}
ROTATIONS = {"rx": rx, "ry": ry, "rz": rz}


def full(m, qubits, n):
    """The 2^n x 2^n matrix of gate m on the given qubits (operand 0 most significant in m)."""
    k = len(qubits)
    d = 1 << n
    out = np.zeros((d, d), dtype=complex)
    rest = ~sum(1 << q for q in qubits)
    for i in range(d):
        li = sum(((i >> q) & 1) << (k - 1 - a) for a, q in enumerate(qubits))
        for j in range(d):
            if i & rest != j & rest:
                continue
            lj = sum(((j >> q) & 1) << (k - 1 - a) for a, q in enumerate(qubits))
            out[i, j] = m[li, lj]
    return out


def holds(cond, bits):
    v = sum(bits[b] << i for i, b in enumerate(cond["bits"]))
    return (v == cond["value"]) != cond["not"]


def distribution(prog):
    n, nb = prog["qubits"], prog["bits"]
    d = 1 << n
    rho = np.zeros((d, d), dtype=complex)
    rho[0, 0] = 1
    states = {tuple([0] * nb): rho}
    for op in prog["ops"]:
        name, qs = op["gate"], op["qubits"]
        nxt = {}

        def add(key, r):
            nxt[key] = nxt.get(key, 0) + r

        for bits, r in states.items():
            if op.get("if") and not holds(op["if"], bits):
                add(bits, r)
                continue
            if name in ("measure", "reset"):
                p0 = full(np.diag([1, 0]), qs, n)
                p1 = full(np.diag([0, 1]), qs, n)
                r0, r1 = p0 @ r @ p0, p1 @ r @ p1
                if name == "measure":
                    b = op["bits"][0]
                    k0, k1 = list(bits), list(bits)
                    k0[b], k1[b] = 0, 1
                    add(tuple(k0), r0)
                    add(tuple(k1), r1)
                else:
                    x = full(FIXED["x"], qs, n)
                    add(bits, r0 + x @ r1 @ x)
                continue
            m = FIXED[name] if name in FIXED else ROTATIONS[name](*op["params"])
            u = full(m, qs, n)
            add(bits, u @ r @ u.conj().T)
        states = nxt
    out = {}
    for bits, r in states.items():
        p = float(np.real(np.trace(r)))
        if p > 1e-15:
            out["".join(str(b) for b in reversed(bits))] = p
    return out


def random_program(rng, index):
    n = int(rng.integers(2, 5))
    nb = int(rng.integers(2, 4))
    # A first layer of ry at random angles puts every qubit in superposition.
    ops = [{"gate": "ry", "qubits": [q], "params": [float(rng.uniform(-math.pi, math.pi))]} for q in range(n)]
    for _ in range(int(rng.integers(6, 15))):
        kind = rng.random()
        q = int(rng.integers(n))
        if kind < 0.15:
            ops.append({"gate": "measure", "qubits": [q], "bits": [int(rng.integers(nb))]})
            continue
        if kind < 0.25:
            ops.append({"gate": "reset", "qubits": [q]})
            continue
        name = str(rng.choice(sorted(FIXED) + sorted(ROTATIONS)))
        k = 2 if name in ("cx", "cz", "swap") else 1
        qs = [int(x) for x in rng.choice(n, size=k, replace=False)]
        op = {"gate": name, "qubits": qs}
        if name in ROTATIONS:
            op["params"] = [float(rng.uniform(-math.pi, math.pi))]
        if kind > 0.75:
            cb = [int(x) for x in rng.choice(nb, size=int(rng.integers(1, 3)), replace=False)]
            op["if"] = {"bits": cb, "value": int(rng.integers(1 << len(cb))), "not": bool(rng.random() < 0.3)}
        ops.append(op)
    if index % 4 != 3:
        for q in range(min(n, nb)):
            ops.append({"gate": "measure", "qubits": [q], "bits": [q]})
    return {"name": "program-%d" % index, "qubits": n, "bits": nb, "ops": ops}


def main():
    rng = np.random.default_rng(20261201)
    cases = []
    for i in range(40):
        prog = random_program(rng, i)
        prog["distribution"] = distribution(prog)
        cases.append(prog)
    with open(os.path.join(HERE, "reference.json"), "w") as f:
        json.dump({"numpy": np.__version__, "cases": cases}, f, indent=1, sort_keys=True)
        f.write("\n")


if __name__ == "__main__":
    main()

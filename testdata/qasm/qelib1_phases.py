"""How the gate bodies of qelib1.inc, read with the OpenQASM 2.0 definition of the built-in
U(theta,phi,lambda) = Rz(phi) Ry(theta) Rz(lambda) (Cross et al., arXiv:1707.03429, eq. 2 and
the text around it), relate to the textbook matrices package qasm gives each gate name.

The bodies below are those of the qelib1.inc listed in the appendix of arXiv:1707.03429, written
here from memory (the file is not read from anywhere). For each gate it prints the phase-free
operator-norm distance to our matrix (0 means equal up to a global phase) and that global phase.
Angles used: theta=0.7, phi=-1.3, lambda=2.9.

Run: /usr/bin/python3 qelib1_phases.py > qelib1_phases.out
"""
import math
import sys

import numpy as np

I2 = np.eye(2, dtype=complex)
X = np.array([[0, 1], [1, 0]], dtype=complex)
Y = np.array([[0, -1j], [1j, 0]])
Z = np.diag([1, -1]).astype(complex)


def Rz(t): return np.diag([np.exp(-1j * t / 2), np.exp(1j * t / 2)])
def Ry(t): return math.cos(t / 2) * I2 - 1j * math.sin(t / 2) * Y
def Rx(t): return math.cos(t / 2) * I2 - 1j * math.sin(t / 2) * X
def spec_U(t, f, l): return Rz(f) @ Ry(t) @ Rz(l)


def textbook_u(t, f, l):
    return np.array([[math.cos(t / 2), -np.exp(1j * l) * math.sin(t / 2)],
                     [np.exp(1j * f) * math.sin(t / 2), np.exp(1j * (f + l)) * math.cos(t / 2)]])


def p(l): return np.diag([1, np.exp(1j * l)])


def ctrl(m):
    out = np.eye(4, dtype=complex)
    out[2:, 2:] = m
    return out


CX = ctrl(X)
SWAP = np.array([[1, 0, 0, 0], [0, 0, 1, 0], [0, 1, 0, 0], [0, 0, 0, 1]], dtype=complex)


def on(g, q, n=2):
    """g on operand q of an n-operand gate (operand 0 is the most significant bit)."""
    m = np.eye(1)
    for k in range(n):
        m = np.kron(m, g if k == q else I2)
    return m


def cx(a, b):
    return CX if (a, b) == (0, 1) else SWAP @ CX @ SWAP


def seq(*ms):
    r = np.eye(ms[0].shape[0], dtype=complex)
    for m in ms:
        r = m @ r
    return r


# qelib1 one-qubit gates in spec semantics.
u3 = spec_U
def u2(f, l): return spec_U(math.pi / 2, f, l)
def u1(l): return spec_U(0, 0, l)


th, ph, la = 0.7, -1.3, 2.9
S, T = np.diag([1, 1j]), np.diag([1, np.exp(1j * math.pi / 4)])
H = np.array([[1, 1], [1, -1]], dtype=complex) / math.sqrt(2)
h_q, s_q, sdg_q, t_q = u2(0, math.pi), u1(math.pi / 2), u1(-math.pi / 2), u1(math.pi / 4)
x_q = u3(math.pi, 0, math.pi)

rows = [
    ("u3 -> u", u3(th, ph, la), textbook_u(th, ph, la)),
    ("u2 -> u(pi/2,.,.)", u2(ph, la), textbook_u(math.pi / 2, ph, la)),
    ("u1 -> p", u1(la), p(la)),
    ("id", spec_U(0, 0, 0), I2),
    ("x", x_q, X),
    ("y", u3(math.pi, math.pi / 2, math.pi / 2), Y),
    ("z", u1(math.pi), Z),
    ("h", h_q, H),
    ("s", s_q, S),
    ("sdg", sdg_q, S.conj().T),
    ("t", t_q, T),
    ("tdg", u1(-math.pi / 4), T.conj().T),
    ("rx", u3(th, -math.pi / 2, math.pi / 2), Rx(th)),
    ("ry", u3(th, 0, 0), Ry(th)),
    ("rz", u1(th), Rz(th)),
    ("cz", seq(on(h_q, 1), cx(0, 1), on(h_q, 1)), ctrl(Z)),
    ("cy", seq(on(sdg_q, 1), cx(0, 1), on(s_q, 1)), ctrl(Y)),
    ("ch", seq(on(h_q, 1), on(sdg_q, 1), cx(0, 1), on(h_q, 1), on(t_q, 1), cx(0, 1), on(t_q, 1),
               on(h_q, 1), on(s_q, 1), on(x_q, 1), on(s_q, 0)), ctrl(H)),
    ("crz", seq(on(u1(la / 2), 1), cx(0, 1), on(u1(-la / 2), 1), cx(0, 1)), ctrl(Rz(la))),
    ("cu1 -> cp", seq(on(u1(la / 2), 0), cx(0, 1), on(u1(-la / 2), 1), cx(0, 1), on(u1(la / 2), 1)), ctrl(p(la))),
    ("cu3 -> controlled u", seq(on(u1((la - ph) / 2), 1), cx(0, 1), on(u3(-th / 2, 0, -(ph + la) / 2), 1), cx(0, 1),
                                on(u3(th / 2, ph, 0), 1)), ctrl(textbook_u(th, ph, la))),
    # The same body against the controlled form of the spec's own U: equal up to a global phase,
    # so the 2017 cu3 is controlled-Rz(phi)Ry(theta)Rz(lambda), not controlled textbook u.
    ("cu3 (body) vs ctrl(spec U)", seq(on(u1((la - ph) / 2), 1), cx(0, 1), on(u3(-th / 2, 0, -(ph + la) / 2), 1),
                                       cx(0, 1), on(u3(th / 2, ph, 0), 1)), ctrl(spec_U(th, ph, la))),
]


def phase_free(U, V):
    ev = np.linalg.eigvals(V.conj().T @ U)
    ph = np.sort(np.angle(ev))
    gaps = np.diff(np.concatenate([ph, [ph[0] + 2 * math.pi]]))
    k = int(np.argmax(gaps))
    arc = 2 * math.pi - gaps[k]
    start = ph[(k + 1) % len(ph)]
    mid = math.remainder(start + arc / 2, 2 * math.pi)
    return 2 * math.sin(arc / 4), mid


print(f"# qelib1 body (spec U) against our matrix; Python {sys.version.split()[0]}, NumPy {np.__version__}")
print("# gate  phase-free-distance  global-phase(body = e^{i phase} ours)")
for name, body, ours in rows:
    d, phase = phase_free(body, ours)
    print(f"{name:24s} {d:.3e} {phase:+.6f}")

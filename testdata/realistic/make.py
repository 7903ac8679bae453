#!/usr/bin/env python3
"""Writes the realistic corpus: OpenQASM programs in the style compilers emit, in pairs
NAME.before.qasm (the reference) and NAME.after.qasm (a transformation of it), and
manifest.txt, which says for each pair what it must mean and why.

Every expected verdict comes from how the pair is built (the reason is written beside it in the
manifest), never from running qcheck. Three meanings are recorded per pair:

  unitary    the circuits' unitaries agree up to a global phase (files without measurements);
             "-" when a file measures, resets or is classically controlled
  allinputs  the distributions of the classical bits agree for EVERY input state of the qubits
             ("-" when a file has mid-circuit measurement, reset or classical control, where
             "every input" is not what the program means)
  program    the programs agree as OpenQASM 2.0 defines them: qubits and bits start at 0, the
             result is the joint distribution of all classical bits at the end

Each entry is "equivalent", "different" or "-" (not applicable / not claimed).

As an independent cross-check of the construction (not the source of the verdicts), pairs of
at most 12 qubits are simulated by the small statevector simulator below (pure Python, written
for this corpus): program distributions from |0...0> exactly by enumerating measurement branches,
unitaries on random input states. It prints any disagreement with the manifest and exits 1.

Run: python3 testdata/realistic/make.py   (Python 3.11+, standard library only)
"""

import cmath
import math
import os
import random
import sys

PI = math.pi
HERE = os.path.dirname(os.path.abspath(__file__))

# ---------------------------------------------------------------- circuits


class Prog:
    """A program: n qubits in register q, classical registers, and ops.

    ops: ('g', name, params, qubits) | ('measure', q, reg, idx) | ('measure_all', reg)
         | ('reset', q) | ('barrier',) | ('if', reg, value, gate-op) | ('gphase', angle)
    """

    def __init__(self, n, cregs=None):
        self.n = n
        self.cregs = cregs or []  # [(name, size)]
        self.ops = []

    def copy(self):
        p = Prog(self.n, list(self.cregs))
        p.ops = list(self.ops)
        return p

    def g(self, name, qubits, *params):
        self.ops.append(('g', name, list(params), list(qubits)))
        return self

    def has_dynamic(self):
        # mid-circuit measurement, reset or classical control
        seen_measure = False
        for op in self.ops:
            if op[0] in ('reset', 'if'):
                return True
            if op[0] in ('measure', 'measure_all'):
                seen_measure = True
            elif seen_measure and op[0] in ('g',):
                return True
        return False

    def measures(self):
        return any(op[0] in ('measure', 'measure_all') for op in self.ops)


def fmt_angle(x):
    if x == 0:
        return '0'
    for den in (1, 2, 4, 8, 16, 32, 64, 128, 256, 512, 1024):
        num = x * den / PI
        r = round(num)
        if r != 0 and abs(num - r) < 1e-12 and abs(r) < 4 * den:
            s = '-' if r < 0 else ''
            r = abs(r)
            top = 'pi' if r == 1 else '%d*pi' % r
            return s + (top if den == 1 else '%s/%d' % (top, den))
    return repr(x)


NAMES3 = {'u': 'U'}  # stdgates.inc has no u; OpenQASM 3 writes the built-in U


def emit(p, version):
    out = []
    if version == 2:
        out += ['OPENQASM 2.0;', 'include "qelib1.inc";', 'qreg q[%d];' % p.n]
        out += ['creg %s[%d];' % (r, s) for r, s in p.cregs]
    else:
        out += ['OPENQASM 3.0;', 'include "stdgates.inc";', 'qubit[%d] q;' % p.n]
        out += ['bit[%d] %s;' % (s, r) for r, s in p.cregs]

    def gate(op):
        _, name, params, qs = op
        if version == 3:
            name = NAMES3.get(name, name)
        ps = '(%s)' % ','.join(fmt_angle(a) for a in params) if params else ''
        return '%s%s %s;' % (name, ps, ','.join('q[%d]' % q for q in qs))

    for op in p.ops:
        k = op[0]
        if k == 'g':
            out.append(gate(op))
        elif k == 'measure':
            if version == 2:
                out.append('measure q[%d] -> %s[%d];' % (op[1], op[2], op[3]))
            else:
                out.append('%s[%d] = measure q[%d];' % (op[2], op[3], op[1]))
        elif k == 'measure_all':
            out.append('measure q -> %s;' % op[1] if version == 2 else '%s = measure q;' % op[1])
        elif k == 'reset':
            out.append('reset q[%d];' % op[1])
        elif k == 'barrier':
            out.append('barrier q;')
        elif k == 'if':
            if version == 2:
                out.append('if(%s==%d) %s' % (op[1], op[2], gate(op[3])))
            else:
                out.append('if (%s == %d) %s' % (op[1], op[2], gate(op[3])))
        elif k == 'gphase':
            if version == 3:
                out.append('gphase(%s);' % fmt_angle(op[1]))
            # OpenQASM 2.0 has no global phase statement; the phase is dropped, which is
            # harmless up to a global phase
        else:
            raise ValueError(k)
    return '\n'.join(out) + '\n'


# ---------------------------------------------------------------- building blocks


def ccx_clifford_t(p, a, b, c):
    """Toffoli as Clifford+T: Nielsen & Chuang Fig. 4.9 (exact, no phase)."""
    for name, qs in [('h', [c]), ('cx', [b, c]), ('tdg', [c]), ('cx', [a, c]), ('t', [c]),
                     ('cx', [b, c]), ('tdg', [c]), ('cx', [a, c]), ('t', [b]), ('t', [c]),
                     ('h', [c]), ('cx', [a, b]), ('t', [a]), ('tdg', [b]), ('cx', [a, b])]:
        p.g(name, qs)


def translate(p):
    """Basis translation to {rz, sx, x, cx}, with the global phases it introduces (emitted as
    gphase in OpenQASM 3). Each rule is an exact identity (checked on matrices by selfcheck)."""
    q = Prog(p.n, list(p.cregs))
    for op in p.ops:
        if op[0] == 'if' or op[0] != 'g':
            q.ops.append(op)
            continue
        _, name, ps, qs = op
        for o in rule(name, ps, qs):
            q.ops.append(o)
    return q


def G(name, qs, *ps):
    return ('g', name, list(ps), list(qs))


def rule(name, ps, qs):
    a = qs[0]
    if name in ('rz', 'x', 'sx', 'cx'):
        return [G(name, qs, *ps)]
    if name == 'h':  # H = e^{iπ/4}·rz(π/2) sx rz(π/2)
        return [G('rz', [a], PI / 2), G('sx', [a]), G('rz', [a], PI / 2), ('gphase', PI / 4)]
    if name in ('t', 'tdg', 's', 'sdg', 'z', 'p'):
        th = {'t': PI / 4, 'tdg': -PI / 4, 's': PI / 2, 'sdg': -PI / 2, 'z': PI}.get(name)
        if name == 'p':
            th = ps[0]
        return [G('rz', [a], th), ('gphase', th / 2)]  # p(θ) = e^{iθ/2} rz(θ)
    if name == 'u':  # u(θ,φ,λ) = e^{i((φ+λ)/2+π/2)} rz(φ+π) sx rz(θ+π) sx rz(λ)
        th, ph, la = ps
        return [G('rz', [a], la), G('sx', [a]), G('rz', [a], th + PI), G('sx', [a]),
                G('rz', [a], ph + PI), ('gphase', (ph + la) / 2 + PI / 2)]
    if name == 'ry':  # ry(θ) = u(θ, 0, 0) exactly
        return rule('u', [ps[0], 0.0, 0.0], qs)
    if name == 'cz':
        b = qs[1]
        return rule('h', [], [b]) + [G('cx', [a, b])] + rule('h', [], [b])
    if name == 'cp':  # cp(θ) = p(θ/2)⊗p(θ/2) · cx · (1⊗p(−θ/2)) · cx
        b = qs[1]
        th = ps[0]
        return (rule('p', [th / 2], [a]) + [G('cx', [a, b])] + rule('p', [-th / 2], [b]) +
                [G('cx', [a, b])] + rule('p', [th / 2], [b]))
    if name == 'swap':
        b = qs[1]
        return [G('cx', [a, b]), G('cx', [b, a]), G('cx', [a, b])]
    if name == 'ccx':
        t = Prog(3)
        ccx_clifford_t(t, *qs)
        out = []
        for o in t.ops:
            out += rule(o[1], o[2], o[3])
        return out
    raise ValueError('no rule for ' + name)


def route_line(p):
    """Routes p onto a line of physical qubits 0-1-…-(n−1), starting from the trivial layout:
    before each two-qubit gate whose qubits are not neighbours, SWAPs (as three cx, as compilers
    emit them) move the first qubit next to the second. Final measurements are rewritten to
    measure the physical qubit that holds each logical qubit into the same classical bit.
    Returns the routed program and the final layout (logical -> physical)."""
    phys = list(range(p.n))  # logical -> physical
    log = list(range(p.n))  # physical -> logical
    q = Prog(p.n, list(p.cregs))
    for op in p.ops:
        if op[0] == 'g' and len(op[3]) == 2:
            a, b = op[3]
            while abs(phys[a] - phys[b]) > 1:
                pa = phys[a]
                step = 1 if phys[b] > pa else -1
                pb = pa + step
                q.ops += [G('cx', [pa, pb]), G('cx', [pb, pa]), G('cx', [pa, pb])]
                la, lb = log[pa], log[pb]
                log[pa], log[pb] = lb, la
                phys[la], phys[lb] = pb, pa
            q.ops.append(G(op[1], [phys[a], phys[b]], *op[2]))
        elif op[0] == 'g':
            q.ops.append(G(op[1], [phys[x] for x in op[3]], *op[2]))
        elif op[0] == 'measure_all':
            for l in range(p.n):
                q.ops.append(('measure', phys[l], op[1], l))
        elif op[0] == 'measure':
            q.ops.append(('measure', phys[op[1]], op[2], op[3]))
        elif op[0] == 'barrier':
            q.ops.append(op)
        else:
            raise ValueError('route: ' + op[0])
    return q, phys


# ---------------------------------------------------------------- families


def ghz(n, measure=True):
    """GHZ ladder with a Clifford tail that cancels (s then sdg): outcomes 0…0 and 1…1, each 1/2."""
    p = Prog(n, [('c', n)] if measure else [])
    p.g('h', [0])
    for i in range(n - 1):
        p.g('cx', [i, i + 1])
    for i in range(0, n, 3):
        p.g('s', [i])
    for i in range(0, n, 3):
        p.g('sdg', [i])
    if measure:
        p.ops.append(('barrier',))
        p.ops.append(('measure_all', 'c'))
    return p


def bv(n, s, zflip=None):
    """Bernstein–Vazirani on n−1 data qubits and ancilla q[n−1]: the outcome is s with certainty
    (Nielsen & Chuang Exercise 1.1 / the hidden-string problem). zflip=j inserts z q[j] before the
    final Hadamards, which flips outcome bit j."""
    d = n - 1
    p = Prog(n, [('c', d)])
    p.g('x', [d])
    for i in range(n):
        p.g('h', [i])
    for i in range(d):
        if s >> i & 1:
            p.g('cx', [i, d])
    if zflip is not None:
        p.g('z', [zflip])
    for i in range(d):
        p.g('h', [i])
    p.ops.append(('barrier',))
    for i in range(d):
        p.ops.append(('measure', i, 'c', i))
    return p


def qft_inverse_program(n, k, measure=True, swaps=True):
    """Prepares the Fourier state of k (h on every qubit, then p(2π·k·2^j/2^n) on qubit j), then
    applies the inverse QFT (Nielsen & Chuang §5.1: the QFT circuit of Fig. 5.1 read backwards,
    with its final swaps), so measuring gives k with certainty (bit j of k in c[j])."""
    p = Prog(n, [('c', n)] if measure else [])
    for j in range(n):
        p.g('h', [j])
    for j in range(n):
        th = 2 * PI * ((k << j) % (1 << n)) / (1 << n) if n < 60 else 2 * PI * math.fmod(k * 2.0 ** (j - n), 1.0)
        if th != 0:
            p.g('p', [j], th)
    if swaps:
        for j in range(n // 2):
            p.g('swap', [j, n - 1 - j])
    # inverse QFT: for the most significant qubit down: inverse rotations then h
    for j in range(n):
        t = n - 1 - j  # target, processed from the top... see selfcheck
        for m in range(j):
            c = n - 1 - m
            p.g('cp', [c, t], -PI / 2 ** (j - m))
        p.g('h', [t])
    if measure:
        p.ops.append(('barrier',))
        p.ops.append(('measure_all', 'c'))
    return p


def adder(nbits, a, b, measure=True, toffoli=True):
    """Cuccaro–Draper–Kutin–Moulton ripple-carry adder (quant-ph/0410184): qubits c0, then a_i at
    1+2i and b_i at 2+2i, carry-out z last (2n+2 qubits). Inputs a and b are prepared with x gates;
    b becomes a+b mod 2^n and z the carry. Measured: b into c[0..n−1], z into c[n], so the outcome
    is a+b with certainty."""
    n = 2 * nbits + 2
    p = Prog(n, [('c', nbits + 1)] if measure else [])
    A = [1 + 2 * i for i in range(nbits)]
    B = [2 + 2 * i for i in range(nbits)]
    c0, z = 0, n - 1
    for i in range(nbits):
        if a >> i & 1:
            p.g('x', [A[i]])
        if b >> i & 1:
            p.g('x', [B[i]])

    def ccx(x, y, t):
        if toffoli:
            p.g('ccx', [x, y, t])
        else:
            ccx_clifford_t(p, x, y, t)

    def maj(x, y, w):
        p.g('cx', [w, y])
        p.g('cx', [w, x])
        ccx(x, y, w)

    def uma(x, y, w):
        ccx(x, y, w)
        p.g('cx', [w, x])
        p.g('cx', [x, y])

    maj(c0, B[0], A[0])
    for i in range(1, nbits):
        maj(A[i - 1], B[i], A[i])
    p.g('cx', [A[nbits - 1], z])
    for i in range(nbits - 1, 0, -1):
        uma(A[i - 1], B[i], A[i])
    uma(c0, B[0], A[0])
    if measure:
        p.ops.append(('barrier',))
        for i in range(nbits):
            p.ops.append(('measure', B[i], 'c', i))
        p.ops.append(('measure', z, 'c', nbits))
    return p


def random_blocks(n, depth, seed):
    """Random two-qubit-block circuit: each layer pairs the qubits at random and applies to each
    pair u⊗u, cx, ry⊗rz, cx, u⊗u with random angles (no measurement: unitary meaning)."""
    rng = random.Random(seed)
    p = Prog(n)

    def ang():
        return rng.uniform(-PI, PI)

    for _ in range(depth):
        qs = list(range(n))
        rng.shuffle(qs)
        for i in range(0, n - 1, 2):
            a, b = qs[i], qs[i + 1]
            p.g('u', [a], ang(), ang(), ang())
            p.g('u', [b], ang(), ang(), ang())
            p.g('cx', [a, b])
            p.g('ry', [a], ang())
            p.g('rz', [b], ang())
            p.g('cx', [a, b])
            p.g('u', [a], ang(), ang(), ang())
            p.g('u', [b], ang(), ang(), ang())
    return p


def midcircuit(n):
    """A dynamic program: q[0] in |+>, measured into m, its result copied to q[1] by a classically
    controlled x, q[0] reset and reused as the control of a cx onto q[4], and a Bell pair on q[2],
    q[3]; everything measured into c. Distribution: m uniform; c[1] = m; c[0] = c[4] = 0;
    (c[2], c[3]) = 00 or 11, each 1/2, independent of m; other bits 0."""
    p = Prog(n, [('c', n), ('m', 1)])
    p.g('h', [0])
    p.ops.append(('measure', 0, 'm', 0))
    p.ops.append(('if', 'm', 1, G('x', [1])))
    p.ops.append(('reset', 0))
    p.g('h', [2])
    p.g('cx', [2, 3])
    p.g('cx', [0, 4])
    p.ops.append(('barrier',))
    p.ops.append(('measure_all', 'c'))
    return p


# ---------------------------------------------------------------- transformations


def drop_op(p, pred):
    """Removes the first op for which pred(index, op) holds."""
    q = p.copy()
    for i, op in enumerate(q.ops):
        if pred(i, op):
            del q.ops[i]
            return q
    raise ValueError('nothing to drop')


def nth_gate(p, name, k):
    """Index of the k-th gate op called name."""
    seen = 0
    for i, op in enumerate(p.ops):
        if op[0] == 'g' and op[1] == name:
            if seen == k:
                return i
            seen += 1
    raise ValueError('no %s #%d' % (name, k))


def replace(p, i, op):
    q = p.copy()
    q.ops[i] = op
    return q


def commute_reorder(p):
    """Reorders gates without changing the unitary: repeatedly moves a gate before its
    predecessor when they act on disjoint qubits (they commute), a scheduler's ASAP reorder in
    reverse. Only gate ops move; nothing crosses a barrier or measurement."""
    q = p.copy()
    ops = q.ops
    rng = random.Random(7)
    for _ in range(len(ops) * 2):
        i = rng.randrange(1, len(ops)) if len(ops) > 1 else 0
        a, b = ops[i - 1], ops[i]
        if a[0] == 'g' and b[0] == 'g' and not set(a[3]) & set(b[3]):
            ops[i - 1], ops[i] = b, a
    # and cp gates commute with each other even when they share qubits (both diagonal)
    for i in range(1, len(ops)):
        a, b = ops[i - 1], ops[i]
        if a[0] == 'g' and b[0] == 'g' and a[1] == 'cp' and b[1] == 'cp':
            ops[i - 1], ops[i] = b, a
    return q


def add_final_diagonals(p, rng):
    """Inserts diagonal gates (rz, t, cz, cp) right before the final measurements (after the
    barrier), as an unoptimised compiler output has them."""
    q = p.copy()
    i = next(j for j, op in enumerate(q.ops) if op[0] in ('barrier', 'measure', 'measure_all'))
    if q.ops[i][0] == 'barrier':
        i += 1
    diag = []
    for a in range(0, q.n - 1, 2):
        diag.append(G('rz', [a], rng.uniform(-PI, PI)))
        diag.append(G('cz', [a, a + 1]))
        diag.append(G('t', [a + 1]))
    diag.append(G('cp', [0, q.n - 1], 0.7))
    q.ops[i:i] = diag
    return q


def strip_final_diagonals(p):
    """What a compiler's pass does: drops the diagonal gates between the barrier and the final
    measurement."""
    q = p.copy()
    i = next(j for j, op in enumerate(q.ops) if op[0] == 'barrier')
    j = i + 1
    while q.ops[j][0] == 'g' and q.ops[j][1] in ('rz', 'cz', 't', 'cp', 's', 'z', 'p'):
        j += 1
    del q.ops[i + 1:j]
    return q


def unmeasured(p):
    """The same circuit without barrier and measurements (unitary meaning)."""
    q = Prog(p.n)
    q.ops = [op for op in p.ops if op[0] == 'g']
    return q


# ---------------------------------------------------------------- the corpus

PAIRS = []  # (name, before, after, v_before, v_after, unitary, allinputs, program, wide, reason)


def pair(name, before, after, unitary, allinputs, program, reason, v=(2, 2)):
    PAIRS.append((name, before, after, v[0], v[1], unitary, allinputs, program, reason))


E, D, NA = 'equivalent', 'different', '-'


def build():
    rng = random.Random(2026)
    for n in (5, 12, 20, 30, 64, 130):
        w = '%03d' % n
        # --- GHZ / Clifford ladder
        g = ghz(n)
        pair('ghz%s_basis' % w, g, translate(g), NA, E, E,
             'basis translation to rz/sx/x/cx with exact rules (H = e^{iπ/4} rz(π/2) sx rz(π/2), S = e^{iπ/4} rz(π/2)): same unitary up to phase, same measurements', (2, 3))
        pair('ghz%s_v3' % w, g, g, NA, E, E, 'the same program written in OpenQASM 3 (c = measure q;)', (2, 3))
        rg, _ = route_line(g)
        pair('ghz%s_route' % w, g, rg, NA, E, E,
             'routed on a line (the ladder is already nearest-neighbour, so no swaps) with per-bit measures q[p] -> c[l] of the final layout')
        pair('ghz%s_dropcx' % w, g, drop_op(g, lambda i, op: i == nth_gate(g, 'cx', n // 2)), NA, D, D,
             'dropped cx in the ladder: qubits above it stay 0 while those below follow q[0]: outcomes 0…0 and 0…01…1 instead of 0…0 and 1…1')
        i = nth_gate(g, 'cx', n // 2)
        pair('ghz%s_flipcx' % w, g, replace(g, i, G('cx', list(reversed(g.ops[i][3])))), NA, D, D,
             'flipped cx (control and target exchanged) in the ladder: the target is |0> there, so the flipped gate does nothing and the rest stays 0: outcome 1…10…0 possible instead of 1…1')
        # --- Bernstein–Vazirani
        s = rng.getrandbits(n - 1) | 1 | (1 << (n - 2))
        b = bv(n, s)
        pair('bv%s_basis' % w, b, translate(b), NA, E, E, 'basis translation; outcome s=%d with certainty in both' % s, (2, 3))
        pair('bv%s_diag' % w, add_final_diagonals(b, rng), strip_final_diagonals(add_final_diagonals(b, random.Random(n))), NA, E, E,
             'diagonal gates right before the final measurement removed: a diagonal gate before a computational-basis measurement changes no outcome probability, for any input; the unitaries differ')
        j = next(x for x in range(n - 1) if s >> x & 1)
        bug = drop_op(b, lambda i, op: op[0] == 'g' and op[1] == 'cx' and op[3][0] == j)
        pair('bv%s_dropcx' % w, b, bug, NA, D, D, 'oracle cx from data qubit %d dropped: outcome bit %d becomes 0 instead of 1 (s=%d, deterministic)' % (j, j, s))
        pair('bv%s_dropz' % w, bv(n, s, zflip=1), b, NA, D, D,
             'a z on data qubit 1 BEFORE the final h (not diagonal-before-measurement) dropped: the reference outcome is s xor 2, the other s, each with certainty')
        # routed BV: ancilla is far from data qubits on a line
        rb, lay = route_line(b)
        pair('bv%s_route' % w, b, rb, NA, E, E,
             'routed on a line with swaps (3 cx each); each measurement reads the physical qubit holding its logical qubit into the same classical bit; final layout %s' % ('…' if n > 12 else lay))
        # wrong measurement map: exchange the classical targets of two measured bits with different values
        j0 = next(x for x in range(n - 1) if s >> x & 1)
        j1 = next(x for x in range(n - 1) if not s >> x & 1)
        wrong = rb.copy()
        for k, op in enumerate(wrong.ops):
            if op[0] == 'measure' and op[3] in (j0, j1):
                wrong.ops[k] = ('measure', op[1], op[2], j1 if op[3] == j0 else j0)
        pair('bv%s_route_wrongmap' % w, b, wrong, NA, D, D,
             'routed, but the measurements of logical qubits %d and %d write each other\'s classical bits; those bits are 1 and 0 in s, so the outcome changes with certainty' % (j0, j1))
        # the same GHZ and hidden-string circuits without measurement: unitary meaning (Clifford)
        gu = unmeasured(g)
        pair('ghz%s_u_basis' % w, gu, translate(gu), E, NA, NA, 'basis translation, no measurement: the same unitary up to a global phase (every rule exact)', (2, 3))
        pair('ghz%s_u_dropcx' % w, gu, unmeasured(drop_op(g, lambda i, op: i == nth_gate(g, 'cx', n // 2))), D, NA, NA,
             'one cx dropped, no measurement: d(A·CX·B, A·B) = d(CX, I) > 0 (unitary invariance)')
        bu = unmeasured(b)
        pair('bv%s_u_basis' % w, bu, translate(bu), E, NA, NA, 'basis translation, no measurement', (2, 3))
        pair('bv%s_u_route' % w, bu, unmeasured(rb), D, NA, NA,
             'routed with swaps but no measurement to relabel: the routed unitary is the original followed by a qubit permutation that is not the identity (final layout moved the ancilla), so they differ without -perm')
        pair('bv%s_u_diag' % w, unmeasured(add_final_diagonals(b, random.Random(n))), bu, D, NA, NA,
             'trailing diagonal gates (rz of a random angle, cz, t, cp(0.7)) removed with no measurement after them: the unitaries differ by that diagonal, which is not a scalar')
        # --- inverse QFT on a Fourier state
        k = rng.getrandbits(n) | 1
        k &= ~2  # bit 1 is 0, bit 0 is 1
        f = qft_inverse_program(n, k)
        pair('qft%s_basis' % w, f, translate(f), NA, E, E, 'basis translation (cp into rz and cx, h into rz sx rz, p into rz with gphase); outcome k with certainty', (2, 3))
        pair('qft%s_reorder' % w, f, commute_reorder(f), NA, E, E, 'gates on disjoint qubits exchanged, and neighbouring cp gates exchanged (diagonal gates commute): same unitary')
        ci = nth_gate(f, 'cp', 0)
        op = f.ops[ci]
        pair('qft%s_angle' % w, unmeasured(f), unmeasured(replace(f, ci, G('cp', op[3], op[2][0] / 2))), D, NA, NA,
             'one cp angle halved (−π/2 to −π/4), no measurement: A·G·B against A·G\'·B differ by d(G,G\') > 0 (unitary invariance)')
        # the same bug with measurement: the first cp of the inverse QFT acts on the top two qubits, which hold
        # the two most significant phases; halving its angle leaves the top qubit in a superposition
        pair('qft%s_angle_measured' % w, f, replace(f, ci, G('cp', op[3], op[2][0] / 2)), NA, D, D,
             'one cp angle halved in the measured program: the qubit it corrects is no longer returned to a basis state, so the outcome k is no longer certain (probability of k is cos²(π/8) or less)')
        # final swaps replaced by relabelled measurements
        ns = qft_inverse_program(n, k, swaps=False)
        pair('qft%s_swapsrelabel' % w, unmeasured(f), unmeasured(ns), D, NA, NA,
             'the swaps removed WITHOUT relabelling, as unitaries (no measurement): a permutation of the state is not the identity (the states differ on basis inputs)')
        # --- adders
        if n >= 6:
            nb = (n - 2) // 2
            if 2 * nb + 2 != n:
                nb = None
        else:
            nb = 2  # 6 qubits at the smallest width
        if nb:
            av, bv_ = rng.getrandbits(nb) | 1, rng.getrandbits(nb) | 1
            ad = adder(nb, av, bv_)
            wa = '%03d' % (2 * nb + 2)
            pair('adder%s_cliffordt' % wa, ad, adder(nb, av, bv_, toffoli=False), NA, E, E,
                 'each ccx replaced by its Clifford+T decomposition (Nielsen & Chuang Fig. 4.9, exact); outcome a+b=%d+%d with certainty' % (av, bv_), (2, 3))
            cq = adder(nb, av, bv_, toffoli=False)
            pair('adder%s_basis' % wa, ad, translate(ad), NA, E, E, 'Toffolis decomposed and then translated to rz/sx/x/cx with global phases', (2, 3))
            # drop the cx of the first MAJ: cx a0,b0 (a0 = 1 as a is odd), so b0 is not flipped
            first = nth_gate(cq, 'cx', 0)
            pair('adder%s_dropcx' % wa, cq, drop_op(cq, lambda i, op: i == first), NA, D, D,
                 'the first MAJ\'s cx a0->b0 dropped; a0=1 so b0 keeps its value: the sum read out changes (checked by classical simulation in make.py)')
            pair('adder%s_flipcx' % wa, cq, replace(cq, first, G('cx', list(reversed(cq.ops[first][3])))), NA, D, D,
                 'the first MAJ\'s cx a0->b0 flipped to b0->a0: changes the classical computation (checked by classical simulation in make.py)')
            ti = nth_gate(cq, 't', 0)
            pair('adder%s_tangle' % wa, unmeasured(cq), unmeasured(replace(cq, ti, G('rz', cq.ops[ti][3], PI / 8))), D, NA, NA,
                 'one t replaced by rz(π/8) (wrong angle), no measurement: unitaries differ by d(T, rz(π/8)) > 0 up to phase (unitary invariance)')
            pair('adder%s_wrongmap' % wa, ad, swap_measure_targets(ad, av + bv_), NA, D, D,
                 'two measurements write each other\'s classical bits, chosen where the bits of a+b differ (one 1, one 0), so the outcome changes with certainty (checked by classical simulation in make.py)')
        # --- random two-qubit blocks (unitary meaning)
        if n <= 30:
            rc = random_blocks(n, min(n, 12) if n > 12 else n, seed=n)
            pair('rand%s_basis' % w, rc, translate(rc), E, NA, NA, 'basis translation of every u, ry, rz, cx to rz/sx/x/cx (ry(θ) written as u(θ,0,0)), with global phases', (2, 3))
            pair('rand%s_reorder' % w, rc, commute_reorder(rc), E, NA, NA, 'blocks on disjoint qubits interleaved differently (commuting reorder)')
            ci = nth_gate(rc, 'cx', len(rc.ops) // 16)
            pair('rand%s_dropcx' % w, rc, drop_op(rc, lambda i, op: i == ci), D, NA, NA, 'one cx dropped: d(A·CX·B, A·B) = d(CX, I) = √2·… > 0 (unitary invariance)')
            pair('rand%s_flipcx' % w, rc, replace(rc, ci, G('cx', list(reversed(rc.ops[ci][3])))), D, NA, NA, 'one cx flipped: CX(a,b) ≠ CX(b,a) up to phase')
            ri = nth_gate(rc, 'rz', len(rc.ops) // 40)
            pair('rand%s_angle' % w, rc, replace(rc, ri, G('rz', rc.ops[ri][3], rc.ops[ri][2][0] + 0.1)), D, NA, NA, 'one rz angle off by 0.1: d = |1 − e^{i0.05}|·… > 0')
    # --- dynamic programs (mid-circuit measure, reset, classical control)
    for n in (5, 12):
        w = '%03d' % n
        m = midcircuit(n)
        deferred = m.copy()
        k = next(i for i, op in enumerate(deferred.ops) if op[0] == 'if')
        deferred.ops[k] = ('barrier',)
        deferred.ops.insert(1, G('cx', [0, 1]))
        # barrier in place of the if keeps the op order; cx before the measurement
        pair('mid%s_deferred' % w, m, deferred, NA, NA, E,
             'deferred measurement (Nielsen & Chuang §4.4): "measure q0 -> m; if(m==1) x q1" replaced by "cx q0,q1; measure q0 -> m"; both leave q1 = m', (2, 2))
        viaif = m.copy()
        k = next(i for i, op in enumerate(viaif.ops) if op[0] == 'reset')
        viaif.ops[k] = ('if', 'm', 1, G('x', [0]))
        pair('mid%s_resetif' % w, m, viaif, NA, NA, E,
             'reset after a measurement replaced by "if(m==1) x q[0]": the qubit is in |m> after the measurement, so both leave |0>', (2, 3))
        wrong = m.copy()
        k = next(i for i, op in enumerate(wrong.ops) if op[0] == 'if')
        wrong.ops[k] = ('if', 'm', 0, wrong.ops[k][3])
        pair('mid%s_wrongcond' % w, m, wrong, NA, NA, D, 'condition value 1 changed to 0: c[1] becomes not m instead of m, so the joint distribution of (m, c) changes')
        noreset = drop_op(m, lambda i, op: op[0] == 'reset')
        pair('mid%s_dropreset' % w, m, noreset, NA, NA, D, 'reset dropped: q[0] keeps m and the cx copies it to q[4], so c[0] = c[4] = m instead of 0')
        # if(c==1) on the final register: x q[0] after measuring it
        cc = Prog(n, [('c', n)])
        cc.g('h', [0])
        cc.ops.append(('measure', 0, 'c', 0))
        cc.ops.append(('if', 'c', 1, G('x', [0])))
        cc.g('h', [1])
        cc.g('cx', [1, 2])
        cc.ops.append(('barrier',))
        cc.ops.append(('measure_all', 'c'))
        cc2 = cc.copy()
        k = next(i for i, op in enumerate(cc2.ops) if op[0] == 'if')
        cc2.ops[k] = ('reset', 0)
        pair('condc%s_reset' % w, cc, cc2, NA, NA, E,
             '"if(c==1) x q[0]" right after "measure q[0] -> c[0]" (the other bits of c still 0, so c==1 iff c[0]=1) replaced by reset: both leave q[0]=|0>; final measure q -> c overwrites c: c[0]=0, c[1]=c[2] uniform', (2, 3))
        cc3 = cc.copy()
        cc3.ops[k] = ('if', 'c', 2, G('x', [0]))
        pair('condc%s_wrongcond' % w, cc, cc3, NA, NA, D, 'condition c==1 changed to c==2 (never true there): q[0] keeps the measured value, so c[0] is uniform instead of 0')

    # --- small probes of how final measurements are read (2 qubits)
    ow = Prog(2, [('c', 2)])
    ow.g('x', [0])
    ow.ops += [('measure', 0, 'c', 0), ('measure', 1, 'c', 0)]
    ow2 = Prog(2, [('c', 2)])
    ow2.g('x', [0])
    ow2.ops += [('measure', 0, 'c', 0)]
    pair('probe002_overwrite', ow, ow2, NA, D, D,
         'the reference writes c[0] twice, last from q[1] (0 from |00>), the other once from q[0] after x (1): c[0] differs with certainty')
    tw = ow2.copy()
    tw.ops.append(('measure', 0, 'c', 1))
    pair('probe002_measuretwice', tw, ow2, NA, D, D,
         'the reference measures q[0] (1 after x) into c[0] and again into c[1]; the other leaves c[1] = 0: outcome 11 against 01')
    ga = Prog(2, [('c', 2)])
    ga.g('h', [0])
    ga.ops.append(('measure', 0, 'c', 0))
    gb = ga.copy()
    ga.g('x', [0])
    pair('probe002_gateafter', ga, gb, NA, E, E,
         'an x on q[0] after its last measurement changes no classical bit, for any input')


def swap_measure_targets(p, value):
    """Exchanges the classical targets of two measurements whose bits differ in value (the
    outcome the program gives with certainty), so the outcome changes with certainty."""
    q = p.copy()
    i0 = next(i for i in range(64) if value >> i & 1)
    i1 = next(i for i in range(64) if not value >> i & 1)
    for k, op in enumerate(q.ops):
        if op[0] == 'measure' and op[3] in (i0, i1):
            q.ops[k] = ('measure', op[1], op[2], i1 if op[3] == i0 else i0)
    return q


# ---------------------------------------------------------------- simulator (cross-check only)

SQ = 1 / math.sqrt(2)


def mat1(name, ps):
    if name == 'h':
        return [[SQ, SQ], [SQ, -SQ]]
    if name == 'x':
        return [[0, 1], [1, 0]]
    if name == 'z':
        return [[1, 0], [0, -1]]
    if name == 's':
        return [[1, 0], [0, 1j]]
    if name == 'sdg':
        return [[1, 0], [0, -1j]]
    if name == 't':
        return [[1, 0], [0, cmath.exp(1j * PI / 4)]]
    if name == 'tdg':
        return [[1, 0], [0, cmath.exp(-1j * PI / 4)]]
    if name == 'sx':
        return [[(1 + 1j) / 2, (1 - 1j) / 2], [(1 - 1j) / 2, (1 + 1j) / 2]]
    if name == 'rz':
        t = ps[0]
        return [[cmath.exp(-1j * t / 2), 0], [0, cmath.exp(1j * t / 2)]]
    if name == 'ry':
        t = ps[0]
        return [[math.cos(t / 2), -math.sin(t / 2)], [math.sin(t / 2), math.cos(t / 2)]]
    if name == 'p':
        return [[1, 0], [0, cmath.exp(1j * ps[0])]]
    if name == 'u':
        t, f, l = ps
        return [[math.cos(t / 2), -cmath.exp(1j * l) * math.sin(t / 2)],
                [cmath.exp(1j * f) * math.sin(t / 2), cmath.exp(1j * (f + l)) * math.cos(t / 2)]]
    raise ValueError(name)


def apply(state, n, name, ps, qs):
    if name in ('cx', 'cz', 'cp', 'swap', 'ccx'):
        out = list(state)
        for i in range(len(state)):
            bits = [(i >> q) & 1 for q in qs]
            if name == 'cx' and bits[0]:
                out[i] = state[i ^ (1 << qs[1])]
            elif name == 'ccx' and bits[0] and bits[1]:
                out[i] = state[i ^ (1 << qs[2])]
            elif name == 'cz' and bits[0] and bits[1]:
                out[i] = -state[i]
            elif name == 'cp' and bits[0] and bits[1]:
                out[i] = state[i] * cmath.exp(1j * ps[0])
            elif name == 'swap' and bits[0] != bits[1]:
                out[i] = state[i ^ (1 << qs[0]) ^ (1 << qs[1])]
        return out
    m = mat1(name, ps)
    b = 1 << qs[0]
    out = list(state)
    for i in range(len(state)):
        if not i & b:
            a0, a1 = state[i], state[i | b]
            out[i] = m[0][0] * a0 + m[0][1] * a1
            out[i | b] = m[1][0] * a0 + m[1][1] * a1
    return out


def run_unitary(p, state):
    ph = 1
    for op in p.ops:
        if op[0] == 'g':
            state = apply(state, p.n, op[1], op[2], op[3])
        elif op[0] == 'gphase':
            ph *= cmath.exp(1j * op[1])
    return [ph * a for a in state]


def run_program(p, state=None):
    """Exact distribution of all classical bits (registers in declaration order, each bit
    named reg[i]) by enumerating measurement branches."""
    dim = 1 << p.n
    if state is None:
        state = [0j] * dim
        state[0] = 1
    bits = {}
    for r, s in p.cregs:
        for i in range(s):
            bits[(r, i)] = 0
    branches = [(1.0, state, bits)]
    for op in p.ops:
        nb = []
        for pr, st, bt in branches:
            k = op[0]
            if k == 'g':
                nb.append((pr, apply(st, p.n, op[1], op[2], op[3]), bt))
            elif k in ('barrier', 'gphase'):
                nb.append((pr, st, bt))
            elif k == 'if':
                size = dict(p.cregs)[op[1]]
                val = sum(bt[(op[1], i)] << i for i in range(size))
                g = op[3]
                nb.append((pr, apply(st, p.n, g[1], g[2], g[3]) if val == op[2] else st, bt))
            elif k in ('measure', 'reset', 'measure_all'):
                targets = [(op[1], (op[2], op[3]))] if k == 'measure' else (
                    [(op[1], None)] if k == 'reset' else [(q, (op[1], q)) for q in range(p.n)])
                cur = [(pr, st, bt)]
                for q, bit in targets:
                    nxt = []
                    for pr2, st2, bt2 in cur:
                        for v in (0, 1):
                            amp = [a if ((i >> q) & 1) == v else 0 for i, a in enumerate(st2)]
                            w = sum(abs(a) ** 2 for a in amp)
                            if w < 1e-14:
                                continue
                            amp = [a / math.sqrt(w) for a in amp]
                            b2 = dict(bt2)
                            if bit is not None:
                                b2[bit] = v
                            elif v == 1:  # reset: flip to 0
                                amp2 = [0j] * dim
                                for i, a in enumerate(amp):
                                    if a:
                                        amp2[i ^ (1 << q)] = a
                                amp = amp2
                            nxt.append((pr2 * w, amp, b2))
                    cur = nxt
                nb += cur
        branches = nb
    dist = {}
    for pr, st, bt in branches:
        key = tuple(sorted(bt.items()))
        dist[key] = dist.get(key, 0) + pr
    return dist


def tv(d1, d2):
    keys = set(d1) | set(d2)
    return 0.5 * sum(abs(d1.get(k, 0) - d2.get(k, 0)) for k in keys)


def rand_state(n, rng):
    v = [complex(rng.gauss(0, 1), rng.gauss(0, 1)) for _ in range(1 << n)]
    s = math.sqrt(sum(abs(a) ** 2 for a in v))
    return [a / s for a in v]


def phase_free_dist(u, v):
    """min over φ of ||u − e^{iφ} v||, computed from the differences (no cancellation)."""
    ip = sum(a.conjugate() * b for a, b in zip(u, v))
    ph = ip / abs(ip) if abs(ip) > 0 else 1
    return math.sqrt(sum(abs(a - b / ph) ** 2 for a, b in zip(u, v)))


def classical_outcome(p):
    """Runs a program of x, cx, ccx (or its Clifford+T form is not classical: not used) on basis
    states; returns the classical bits."""
    st = 0
    bits = {}
    for op in p.ops:
        if op[0] == 'g':
            name, qs = op[1], op[3]
            if name == 'x':
                st ^= 1 << qs[0]
            elif name == 'cx':
                if st >> qs[0] & 1:
                    st ^= 1 << qs[1]
            elif name == 'ccx':
                if st >> qs[0] & 1 and st >> qs[1] & 1:
                    st ^= 1 << qs[2]
            else:
                return None
        elif op[0] == 'measure':
            bits[(op[2], op[3])] = st >> op[1] & 1
    return bits


def selfcheck():
    bad = 0
    rng = random.Random(1)
    # the translation rules on single gates and ccx: exact including phase
    for name, ps, qs, n in [('h', [], [0], 1), ('t', [], [0], 1), ('s', [], [0], 1), ('sdg', [], [0], 1),
                            ('z', [], [0], 1), ('p', [0.37], [0], 1), ('u', [0.3, -1.1, 2.2], [0], 1),
                            ('cz', [], [0, 1], 2), ('cp', [-0.9], [1, 0], 2), ('swap', [], [0, 1], 2),
                            ('ccx', [], [2, 0, 1], 3)]:
        a, b = Prog(n), Prog(n)
        a.ops = [G(name, qs, *ps)]
        b.ops = rule(name, ps, qs)
        for _ in range(3):
            s = rand_state(n, rng)
            x, y = run_unitary(a, s), run_unitary(b, s)
            if max(abs(p - q) for p, q in zip(x, y)) > 1e-12:
                print('rule %s is not exact' % name)
                bad += 1
    for name, before, after, _, _, un, al, pg, reason in PAIRS:
        n = before.n
        # adders: classical simulation at every width
        if name.startswith('adder') and not name.endswith('tangle'):
            cb, ca = classical_outcome(before), classical_outcome(after)
            if cb is not None and ca is not None:
                got = E if cb == ca else D
                if got != pg:
                    print('%s: classical simulation says %s, manifest %s' % (name, got, pg))
                    bad += 1
        if n > 12:
            continue
        if pg != NA:
            got = E if tv(run_program(before), run_program(after)) < 1e-9 else D
            if got != pg:
                print('%s: simulated program %s, manifest %s' % (name, got, pg))
                bad += 1
        if al != NA:
            # distributions for a few random inputs: evidence for "equivalent", proof for "different"
            got = E
            for _ in range(2):
                s = rand_state(n, rng)
                if tv(run_program(before, s), run_program(after, s)) > 1e-9:
                    got = D
            if got != al and not (al == D and pg == D):
                print('%s: simulated all-inputs %s, manifest %s' % (name, got, al))
                bad += 1
        if un != NA:
            got = E
            for _ in range(2):
                s = rand_state(n, rng)
                if phase_free_dist(run_unitary(before, s), run_unitary(after, s)) > 1e-9:
                    got = D
            if got != un:
                print('%s: simulated unitary %s, manifest %s' % (name, got, un))
                bad += 1
    return bad


def main():
    build()
    names = set()
    lines = ['# Realistic corpus: NAME  unitary  allinputs  program  qubits  reason',
             '# written by make.py; each verdict comes from the construction (see make.py and the reason).',
             '# "-": not applicable to this pair (measurements present, or dynamic ops).']
    for name, before, after, vb, va, un, al, pg, reason in PAIRS:
        assert name not in names, name
        names.add(name)
        with open(os.path.join(HERE, name + '.before.qasm'), 'w') as f:
            f.write(emit(before, vb))
        with open(os.path.join(HERE, name + '.after.qasm'), 'w') as f:
            f.write(emit(after, va))
        lines.append('%s %s %s %s %d %s' % (name, un, al, pg, before.n, reason))
    with open(os.path.join(HERE, 'manifest.txt'), 'w') as f:
        f.write('\n'.join(lines) + '\n')
    if '-nocheck' not in sys.argv:
        bad = selfcheck()
        print('%d pairs, %d disagreements with the simulator' % (len(PAIRS), bad))
        sys.exit(1 if bad else 0)


if __name__ == '__main__':
    main()

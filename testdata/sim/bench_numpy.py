#!/usr/bin/python3
"""Times the straightforward NumPy approach on the benchmark circuits of bench.json: each gate
contracted into the unitary (or the statevector) with numpy.tensordot, as in reference.py.
Compare with `go test ./qcheck/sim -run '^$' -bench .` (see the README for the exact command).

Run: /usr/bin/python3 testdata/sim/bench_numpy.py [name-substring ...]
"""
import json
import os
import sys
import time

import numpy as np

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import reference  # noqa: E402


def ops_of(c):
    return [(o["gate"], o["params"], o["qubits"]) for o in c["ops"]]


def best_of(f, repeat):
    """Best and median wall time, and the median process CPU time (all threads), in seconds."""
    walls, cpus = [], []
    for _ in range(repeat):
        t, c = time.perf_counter(), time.process_time()
        f()
        walls.append(time.perf_counter() - t)
        cpus.append(time.process_time() - c)
    return min(walls), sorted(walls)[len(walls) // 2], sorted(cpus)[len(cpus) // 2]


def main():
    with open(os.path.join(reference.HERE, "bench.json")) as f:
        bench = json.load(f)
    want = sys.argv[1:]
    print("numpy", np.__version__, "python", sys.version.split()[0])
    for c in bench["circuits"]:
        if want and not any(w in c["name"] for w in want):
            continue
        n, ops = c["qubits"], ops_of(c)
        if n <= 14:
            f = lambda: reference.unitary(n, ops)
            kind = "unitary"
        else:
            psi = np.zeros(2 ** n, dtype=complex)
            psi[0] = 1
            f = lambda: reference.statevector(n, ops, psi)
            kind = "statevector"
        repeat = 1 if n >= 12 else 3 if n >= 11 else 5
        best, median, cpu = best_of(f, repeat)
        print("%-16s %-11s wall best %10.3f s  median %10.3f s  cpu median %10.3f s  (%d runs)"
              % (c["name"], kind, best, median, cpu, repeat), flush=True)


if __name__ == "__main__":
    main()

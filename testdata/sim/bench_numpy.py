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
    times = []
    for _ in range(repeat):
        t = time.perf_counter()
        f()
        times.append(time.perf_counter() - t)
    return min(times), sorted(times)[len(times) // 2]


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
        repeat = 3 if n >= 11 else 5
        best, median = best_of(f, repeat)
        print("%-16s %-11s best %10.1f ms  median %10.1f ms  (%d runs)" % (c["name"], kind, best * 1e3, median * 1e3, repeat))


if __name__ == "__main__":
    main()

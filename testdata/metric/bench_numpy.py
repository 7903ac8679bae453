#!/usr/bin/python3
"""NumPy's side of issue 3's speed check: numpy.linalg.eigvals of V^H U for two
1024x1024 Haar-random unitaries (10 qubits).

  /usr/bin/python3 testdata/metric/bench_numpy.py [repeats] [pair-file]

Prints wall-clock and process CPU seconds per eigvals call. If pair-file is
given, U and V are also written there (raw little-endian complex128, U then V,
row-major) so that the Go benchmark can time PhaseDistance on the very same
pair:

  METRIC_BENCH_PAIR=pair-file go test ./metric -run XXX \
      -bench PhaseDistanceFile -benchtime 3x
"""
import sys, time

import numpy as np

rng = np.random.default_rng(10)


def haar(n):
    # Mezzadri, Notices AMS 54 (2007): QR of a complex Ginibre matrix, phases of R fixed.
    z = (rng.standard_normal((n, n)) + 1j * rng.standard_normal((n, n))) / np.sqrt(2)
    q, r = np.linalg.qr(z)
    d = np.diag(r)
    return q * (d / abs(d))


n = 1024
u, v = haar(n), haar(n)
if len(sys.argv) > 2:
    with open(sys.argv[2], "wb") as f:
        f.write(np.ascontiguousarray(u, dtype="<c16").tobytes())
        f.write(np.ascontiguousarray(v, dtype="<c16").tobytes())
w = v.conj().T @ u
repeats = int(sys.argv[1]) if len(sys.argv) > 1 else 3
print("numpy", np.__version__)
for _ in range(repeats):
    c0, t0 = time.process_time(), time.perf_counter()
    np.linalg.eigvals(w)
    t1, c1 = time.perf_counter(), time.process_time()
    print("numpy.linalg.eigvals 1024x1024: wall %.3f s, cpu %.3f s" % (t1 - t0, c1 - c0), flush=True)

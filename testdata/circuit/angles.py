"""Reference offsets of float64 angles from the nearest multiple of pi/2, for qcheck/circuit's
TestQuarterTurnsAgainstMpmath. Each float64 is an exact rational; mpmath at 2,000 bits computes
K = round(x/(pi/2)) and offset = x - K*pi/2 and rounds the offset once to float64.

Run from testdata/circuit: python3 angles.py > angles.txt (made with mpmath 1.3.0 under
Python 3.11.7; the version is recorded in the output's first line).
"""
import random
import struct

import mpmath

mpmath.mp.prec = 2000


def f64(h):
    return struct.unpack("<d", struct.pack("<Q", h))[0]


angles = [
    0.1, -0.1, 1.5707963267948966, 3.141592653589793, 1000.0, -1000.0,
    2 * 3.141592653589793 * 2050,        # issue 17, reproducer 1
    6697.8755374534385,                  # issue 17, reproducer 1 (Go)
    1e20, -1e20, 1e100, 1e300, 1e308, -1e308, 1.7976931348623157e308,
    float(6381956970095103 * 2**797),    # a float64 very close to a multiple of pi/2
    2.0**60, 2.0**-30, 5e-324,
]
rng = random.Random(17)
for _ in range(40):
    # random finite doubles of every magnitude
    while True:
        x = f64(rng.getrandbits(64))
        if x == x and abs(x) != float("inf"):
            break
    angles.append(x)
for _ in range(20):
    angles.append(rng.uniform(-1e6, 1e6))

print("# mpmath", mpmath.__version__, "prec", mpmath.mp.prec)
print("# x (hex float)  K mod 8  offset (hex float)  cos(x/2)  sin(x/2)")
half_pi = mpmath.pi / 2
for x in angles:
    mx = mpmath.mpf(x)
    k = int(mpmath.nint(mx / half_pi))
    off = mx - k * half_pi
    print(x.hex(), k % 8, float(off).hex(), float(mpmath.cos(mx / 2)).hex(), float(mpmath.sin(mx / 2)).hex())

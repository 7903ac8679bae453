#!/usr/bin/python3
"""Writes the OpenQASM 3 form of every pair of the identity corpus (../NAME.*.qasm) into this
folder, using the modifiers of OpenQASM 3 for controlled and inverse gates (ctrl @ x for cx,
ctrl(3) @ x for c3x, inv @ s for sdg, ...). Run from this folder: /usr/bin/python3 convert.py
The Go tests read the files it writes; they never run Python."""
import glob, os, re

CONTROLLED = {
    "cx": "ctrl @ x", "ccx": "ctrl(2) @ x", "c3x": "ctrl(3) @ x", "c4x": "ctrl(4) @ x",
    "cy": "ctrl @ y", "cz": "ctrl @ z", "ch": "ctrl @ h", "cswap": "ctrl @ swap",
    "cp": "ctrl @ p", "crx": "ctrl @ rx", "cry": "ctrl @ ry", "crz": "ctrl @ rz",
    "cu3": "ctrl @ U", "sdg": "inv @ s", "tdg": "inv @ t", "u": "U",
}
# Gates stdgates.inc lacks, defined exactly as the OpenQASM 3 writer defines them.
DEFS = {
    "rzz": "gate rzz(theta) a, b { cx a, b; rz(theta) b; cx a, b; }",
    "rxx": "gate rxx(theta) a, b { h a; h b; cx a, b; rz(theta) b; cx a, b; h a; h b; }",
}

for path in sorted(glob.glob("../*.qasm")):
    lines = open(path).read().splitlines()
    out, used = [], set()
    for line in lines:
        if line.startswith("//"):
            out.append(line.replace(" side).", " side, OpenQASM 3 form)."))
            continue
        if line.startswith("OPENQASM"):
            out.append("OPENQASM 3.0;")
            continue
        if line.startswith("include"):
            out.append('include "stdgates.inc";')
            continue
        m = re.match(r"qreg (\w+)\[(\d+)\];", line)
        if m:
            out.append("qubit[%s] %s;" % (m.group(2), m.group(1)))
            continue
        m = re.match(r"(\w+)(\(.*\))?\s+(.*);$", line)
        if not m:
            raise SystemExit("cannot convert %s: %r" % (path, line))
        name, args, operands = m.group(1), m.group(2) or "", m.group(3)
        if name in DEFS:
            used.add(name)
        name = CONTROLLED.get(name, name)
        out.append("%s%s %s;" % (name, args, operands.replace(",", ", ")))
    at = next(i for i, l in enumerate(out) if l.startswith("qubit"))
    out[at:at] = [DEFS[n] for n in sorted(used)]
    with open(os.path.basename(path), "w") as f:
        f.write("\n".join(out) + "\n")

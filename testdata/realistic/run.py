#!/usr/bin/env python3
"""Runs the qcheck command on every pair of this corpus as a user would: `qcheck equiv -json`
with the default meaning, and again with -measured for pairs whose files measure. Writes one
tab-separated line per run:

  NAME MODE EXIT WALL_S CPU_S MAXRSS_KB JSON_BYTES VERDICT EXPECTED ENGINE DISTANCE MESSAGE

VERDICT is equivalent / differs / refused (exit 2) / timeout / crash (any other exit);
EXPECTED is the manifest's entry for the meaning that mode claims (default: unitary when no
file measures, else program; -measured: allinputs).

Usage: python3 run.py QCHECK [TIMEOUT_S] [NAME_REGEX] [MODE_REGEX] > results.tsv
"""
import json
import os
import re
import subprocess
import sys

qc = sys.argv[1]
timeout = float(sys.argv[2]) if len(sys.argv) > 2 else 60
pat = re.compile(sys.argv[3] if len(sys.argv) > 3 else '')
modepat = re.compile(sys.argv[4] if len(sys.argv) > 4 else '')
here = os.path.dirname(os.path.abspath(__file__))
os.chdir(here)
tf = '/tmp/realistic.%d.time' % os.getpid()
for line in open('manifest.txt'):
    if line.startswith('#') or not line.strip():
        continue
    name, un, al, pg, n = line.split()[:5]
    if not pat.search(name):
        continue
    a, b = name + '.before.qasm', name + '.after.qasm'
    measures = 'measure' in open(a).read() + open(b).read()
    for mode in (['default', 'measured'] if measures else ['default']):
        if not modepat.search(mode):
            continue
        args = [qc, 'equiv', '-json'] + (['-measured'] if mode == 'measured' else []) + [a, b]
        expected = (pg if measures else un) if mode == 'default' else al
        cmd = ['/usr/bin/time', '-f', '%e %U %S %M', '-o', tf,
               'timeout', str(int(timeout))] + args
        p = subprocess.run(cmd, capture_output=True)
        wall, user, sys_, rss = open(tf).read().split('\n')[-2].split()[-4:]
        rc = p.returncode
        engine = dist = ''
        msg = p.stderr.decode(errors='replace').strip().split('\n')[0][:300]
        if rc in (0, 1):
            try:
                d = json.loads(p.stdout)
                engine, dist = d.get('engine', ''), d.get('distance', '')
                verdict = 'equivalent' if d['equivalent'] else 'differs'
                if (rc == 0) != d['equivalent']:
                    verdict += '(exit/json disagree)'
                msg = d.get('certifies', '')[:120]
            except Exception as e:
                verdict = 'badjson'
                msg = str(e)[:200]
        elif rc == 2:
            verdict = 'refused'
        elif rc == 124:
            verdict = 'timeout'
        else:
            verdict = 'crash'
        print('\t'.join(str(x) for x in [name, mode, rc, wall, '%.2f' % (float(user) + float(sys_)),
                                          rss, len(p.stdout), verdict, expected, engine, dist, msg]), flush=True)

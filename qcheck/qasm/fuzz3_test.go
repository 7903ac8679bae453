package qasm

import (
	"os"
	"path/filepath"
	"testing"
)

// seeds3 are OpenQASM 3 sources for the fuzzer's corpus, one per construct the reader takes.
var seeds3 = []string{
	"OPENQASM 3;\ninclude \"stdgates.inc\";\nqubit[2] q;\nbit[2] c;\nh q[0];\ncx q[0], q[1];\nc = measure q;\n",
	"qubit q;\nU(π/2, 0, π) q;\ngphase(-τ/4);\n",
	"include \"stdgates.inc\";\nqubit[3] q;\nctrl @ x q[0], q[1];\nnegctrl(2) @ inv @ s q[0], q[1], q[2];\npow(0.5) @ x q[2];\nctrl(2) @ rz(ℇ) q[2], q[0], q[1];\n",
	"include \"stdgates.inc\";\nqubit[4] q;\nfor int i in [0:3] { rx(i * pi / 4) q[i]; }\nfor i in [3:-1:0] { h q[i]; }\nfor uint j in {1, 3} { z q[j]; }\n",
	"include \"stdgates.inc\";\nqubit[2] q;\nbit[2] c;\nc[0] = measure q[0];\nif (c[0]) x q[1]; else { y q[1]; }\nif (c == 2) z q[0];\nif (!(c[0] == 1 && c[1] == 0)) h q[0];\nmeasure q[0:1] -> c[0:1];\n",
	"const int n = 3;\nint[8] k = 2 ** n - 1;\nfloat[64] x = k / 2.0;\nangle a = -x;\nbool b = k > 5 && !false;\nqubit[n] q;\nif (b) U(a, x, 0) q[k % n];\n",
	"include \"stdgates.inc\";\ngate g(t) a, b { ctrl @ rz(t / 2) a, b; gphase(t); inv @ pow(2) @ sx b; }\nqubit[3] q;\ng(0.3) q[0], q[2];\nctrl @ g(1) q[1], q[0], q[2];\ninv @ g(2) q[2], q[1];\n",
	"include \"stdgates.inc\";\nx $0;\ncx $0, $3;\nbarrier;\nreset $3;\n",
	"OPENQASM 3.0;\nqreg q[2];\ncreg c[2];\nU(1, 2, 3) q[0];\nmeasure q -> c;\n/* block */ barrier q;\n",
	"include \"stdgates.inc\";\nqubit[2] q;\nwhile (true) { x q[0]; }\n",
	"include \"stdgates.inc\";\nqubit[2] q;\nfor int i in [0:1000000] { x q[0]; }\n",
	"int x = 0x1F + 0b101 + 0o7 + 1_000;\nqubit q;\nU(x, 0, 0) q;\n",
}

// FuzzParse3 feeds arbitrary bytes to the OpenQASM 3 reader (the seeds are 3 sources; a source
// without a header is read as 3). It must not panic or hang; every failure must be an *Error
// with a position inside the source, and every success must survive a round trip through
// FormatProgram, which writes version 3 back, to an equal circuit.
func FuzzParse3(f *testing.F) {
	files, _ := filepath.Glob("../../testdata/identities/v3/*.qasm")
	for _, name := range files {
		src, err := os.ReadFile(name)
		if err != nil {
			f.Fatal(err)
		}
		f.Add(src)
	}
	for _, s := range seeds3 {
		f.Add([]byte(s))
	}
	f.Add([]byte("OPENQASM 3;\ninclude \"stdgates.inc\";\ninput float a;\nqubit[2] q;\ncp(2*a - 0.5) q[0], q[1];\nU(a, -a/3, pi) q[1];\n"))
	f.Fuzz(func(t *testing.T, src []byte) {
		checkFree(t, src)
		p, err := ParseProgram(src, MaxOps(1<<16), Inputs(map[string]float64{"θ": 0.5}))
		if err != nil {
			e, ok := err.(*Error)
			if !ok {
				t.Fatalf("error %v is a %T, not *Error", err, err)
			}
			if line, _ := position(src, len(src)); e.Line < 1 || e.Line > line || e.Col < 1 {
				t.Fatalf("error position %d:%d outside the source: %v", e.Line, e.Col, err)
			}
			return
		}
		if p.Circuit.Qubits() > 1<<12 || p.Version != 3 {
			return
		}
		out, err := FormatProgram(p)
		if err != nil {
			t.Fatalf("FormatProgram: %v", err)
		}
		back, err := ParseProgram(out)
		if err != nil {
			t.Fatalf("reading back: %v\n%s", err, out)
		}
		if !back.Circuit.Equal(p.Circuit) || back.Circuit.Bits() != p.Circuit.Bits() {
			t.Fatalf("round trip changed the circuit\nread: %v\nwrote:\n%s\nread back: %v", p.Circuit.Ops, out, back.Circuit.Ops)
		}
	})
}

// checkFree reads src with FreeInputs: errors are *Error, and the angles recorded for free
// parameters belong to ops of the circuit, one per angle, whose placeholders are the angles'
// constants.
func checkFree(t *testing.T, src []byte) {
	p, err := ParseProgram(src, MaxOps(1<<16), FreeInputs())
	if err != nil {
		if _, ok := err.(*Error); !ok {
			t.Fatalf("FreeInputs: error %v is a %T, not *Error", err, err)
		}
		return
	}
	if len(p.Free) == 0 && len(p.Angles) > 0 {
		t.Fatalf("free %v with angles %v", p.Free, p.Angles)
	}
	for i, angles := range p.Angles {
		if i < 0 || i >= len(p.Circuit.Ops) || len(angles) != len(p.Circuit.Ops[i].Gate.Params) {
			t.Fatalf("angles %v recorded for op %d of %v", angles, i, p.Circuit.Ops)
		}
		for k, a := range angles {
			if x := p.Circuit.Ops[i].Gate.Params[k]; x != a.Const {
				t.Fatalf("op %d angle %d: placeholder %v, constant %v", i, k, x, a.Const)
			}
		}
	}
}

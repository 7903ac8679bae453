package qasm

import (
	"os"
	"path/filepath"
	"testing"
)

// FuzzParse feeds arbitrary bytes to Parse. Parse must not panic or hang, every failure must be
// an *Error with a position inside the source, and every success must survive a round trip:
// Format writes it and Parse reads back an equal circuit. The seed corpus (the files under
// testdata/qasm and testdata/identities, plus the sources below) runs in every go test.
func FuzzParse(f *testing.F) {
	for _, dir := range []string{"../../testdata/qasm", "../../testdata/identities"} {
		files, _ := filepath.Glob(filepath.Join(dir, "*.qasm"))
		for _, name := range files {
			src, err := os.ReadFile(name)
			if err != nil {
				f.Fatal(err)
			}
			f.Add(src)
		}
	}
	for _, s := range []string{
		"OPENQASM 2.0;",
		"OPENQASM 2.0;\nqreg q[1];\nU(pi/2,0,pi) q[0];\nCX q[0],q[0];",
		"OPENQASM 2.0;\ninclude \"qelib1.inc\";\nqreg q[3];\nccx q[0],q[1],q[2];\nc3x q[0],q[1],q[2],q[0];",
		"OPENQASM 2.0;\ninclude \"qelib1.inc\";\ngate g(a) x { rz(a) x; }\ngate h2(a) x,y { g(a*2) x; g(-a) y; cx x,y; }\nqreg q[2];\nh2(ln(0)) q[0],q[1];",
		"OPENQASM 2.0;\ninclude \"qelib1.inc\";\nqreg q[2];\nif (c==1) x q[0];",
		"OPENQASM 2.0;\ninclude \"qelib1.inc\";\nqreg q[2];\ncreg c[2];\nmeasure q[0] -> c;",
		"OPENQASM 2.0;\ninclude \"qelib1.inc\";\nqreg q[1];\nrz(((((1))))) q;\nrz(--1) q;\nrz(2^2^3) q;",
		"OPENQASM 2.0;\ninclude \"qelib1.inc\";\ngate iswap a,b { s a; s b; h a; cx a,b; cx b,a; h b; }\nqreg q[2];\niswap q[1],q[0];",
	} {
		f.Add([]byte(s))
	}
	f.Fuzz(func(t *testing.T, src []byte) {
		c, err := Parse(src, MaxOps(1<<16))
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
		if c.Qubits() > 1<<12 {
			// Writing and re-reading a register this wide (a barrier over it is megabytes) is too
			// slow for the fuzzer's hang detector; TestWideBarrierRoundTrip covers it.
			return
		}
		roundTrip(t, c)
	})
}

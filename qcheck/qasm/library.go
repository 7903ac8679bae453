package qasm

import (
	"sort"
	"sync"

	"qcheck.dev/qcheck/circuit"
)

// qelib1Native are the gates of qelib1.inc that package circuit has under the same name. Each
// call becomes that gate, with the textbook matrix of package circuit.
var qelib1Native = []string{
	"id", "x", "y", "z", "h", "s", "sdg", "t", "tdg", "sx", "sxdg", "rx", "ry", "rz", "p", "u",
	"cx", "cy", "cz", "ch", "cp", "crx", "cry", "crz", "swap", "rxx", "rzz", "ccx", "cswap",
}

// prelude defines the other gates of qelib1.inc in terms of the gates of package circuit. Every
// body is exact: it has the textbook matrix of the gate, global phase included (the tests check
// each against a matrix built from its definition). Names starting with mcp are helpers that
// sources cannot call: mcpN(λ) is the phase λ on |1…1⟩ of N+1 qubits, built by Barenco et al.,
// Phys. Rev. A 52 (1995), Lemma 7.1 with V = P(λ/2).
const prelude = `OPENQASM 2.0;
gate u3(theta,phi,lambda) q { u(theta,phi,lambda) q; }
gate u2(phi,lambda) q { u(pi/2,phi,lambda) q; }
gate u1(lambda) q { p(lambda) q; }
gate u0(gamma) q { id q; }
gate cu1(lambda) a,b { cp(lambda) a,b; }
gate cu3(theta,phi,lambda) c,t { p((lambda+phi)/2) c; p((lambda-phi)/2) t; cx c,t; u(-theta/2,0,-(phi+lambda)/2) t; cx c,t; u(theta/2,phi,0) t; }
gate cu(theta,phi,lambda,gamma) c,t { p(gamma) c; cu3(theta,phi,lambda) c,t; }
gate csx a,b { h b; cp(pi/2) a,b; h b; }
gate mcp2(lambda) a,b,t { cp(lambda/2) b,t; cx a,b; cp(-lambda/2) b,t; cx a,b; cp(lambda/2) a,t; }
gate mcp3(lambda) a,b,c,t { cp(lambda/2) c,t; ccx a,b,c; cp(-lambda/2) c,t; ccx a,b,c; mcp2(lambda/2) a,b,t; }
gate c3x a,b,c,d { h d; mcp3(pi) a,b,c,d; h d; }
gate c3sqrtx a,b,c,d { h d; mcp3(pi/2) a,b,c,d; h d; }
gate mcp4(lambda) a,b,c,d,t { cp(lambda/2) d,t; c3x a,b,c,d; cp(-lambda/2) d,t; c3x a,b,c,d; mcp3(lambda/2) a,b,c,t; }
gate c4x a,b,c,d,e { h e; mcp4(pi) a,b,c,d,e; h e; }
`

// formatDefs are the definitions Format writes for the gates of package circuit that qelib1.inc
// lacks, in qelib1's gates only. Each is exact, global phase included (checked against NumPy in
// testdata/qasm and by the tests). Parse reads a definition that matches one of these token for
// token back as the gate itself.
var formatDefs = map[string]string{
	"iswap":   "gate iswap a,b { s a; s b; h a; cx a,b; cx b,a; h b; }",
	"iswapdg": "gate iswapdg a,b { h b; cx b,a; cx a,b; h a; sdg b; sdg a; }",
	"ccz":     "gate ccz a,b,c { h c; ccx a,b,c; h c; }",
	"ryy":     "gate ryy(theta) a,b { rx(pi/2) a; rx(pi/2) b; rzz(theta) a,b; rx(-pi/2) a; rx(-pi/2) b; }",
}

var (
	builtinOnce sync.Once
	builtinDefs map[string]*gateDef
)

// builtins returns every gate a source can call without defining it: U and CX (always), the
// gates of qelib1.inc (after the include), and the prelude's hidden helpers.
func builtins() map[string]*gateDef {
	builtinOnce.Do(func() {
		prim := map[string]*gateDef{}
		for _, s := range circuit.Standard() {
			if g, err := circuit.NewGate(s.Name, make([]float64, s.Params)...); err == nil && g.Unitary() {
				d := &gateDef{name: s.Name, native: s.Name, nparams: s.Params, nqubits: s.Qubits}
				for k := range s.Params {
					d.params = append(d.params, s.AngleName(k))
				}
				prim[s.Name] = d
			}
		}
		p := &parser{src: []byte(prelude), lx: lexer{src: []byte(prelude)}, cfg: config{maxOps: 1},
			gates: prim, regs: map[string]*register{}}
		if err := p.advance(); err != nil {
			panic("qasm: built-in prelude: " + err.Error())
		}
		if err := p.program(); err != nil {
			panic("qasm: built-in prelude: " + err.Error())
		}
		out := map[string]*gateDef{
			"U":  {name: "U", native: "u", nparams: 3, nqubits: 1, params: prim["u"].params, keyword: true},
			"CX": {name: "CX", native: "cx", nqubits: 2, keyword: true},
		}
		for _, name := range qelib1Native {
			out[name] = prim[name]
		}
		for name, d := range p.gates {
			if d.user {
				d.user = false
				d.hidden = len(name) > 3 && name[:3] == "mcp"
				out[name] = d
			}
		}
		builtinDefs = out
	})
	return builtinDefs
}

// Qelib1 returns the names of the gates a source may call after include "qelib1.inc", sorted.
func Qelib1() []string {
	var out []string
	for name, d := range builtins() {
		if !d.hidden && !d.keyword {
			out = append(out, name)
		}
	}
	sort.Strings(out)
	return out
}
